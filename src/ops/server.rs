//! The server's lifecycle: bind, serve, and on SIGTERM or SIGINT turn unready, let in-flight
//! requests finish (bounded by the drain timeout) and exit.

use std::future::Future;
use std::time::Duration;

use tokio::net::TcpListener;

use crate::api::state::AppState;

use super::config::Settings;
use super::leap_source;

/// Resolves on SIGTERM or SIGINT.
pub async fn shutdown_signal() {
    let interrupt = async {
        let _ = tokio::signal::ctrl_c().await;
    };
    #[cfg(unix)]
    let terminate = async {
        match tokio::signal::unix::signal(tokio::signal::unix::SignalKind::terminate()) {
            Ok(mut signal) => {
                signal.recv().await;
            }
            Err(_) => std::future::pending::<()>().await,
        }
    };
    #[cfg(not(unix))]
    let terminate = std::future::pending::<()>();
    tokio::select! {
        _ = interrupt => {},
        _ = terminate => {},
    }
}

/// Serves `state` on `listener` until `shutdown` resolves, then drains.
pub async fn serve(
    listener: TcpListener,
    state: AppState,
    shutdown: impl Future<Output = ()> + Send + 'static,
) -> std::io::Result<()> {
    let settings = state.settings().clone();
    if let Some(url) = settings.leap_seconds_url.clone() {
        let interval = Duration::from_secs_f64(settings.leap_seconds_refresh_s);
        tokio::spawn(leap_source::poll_forever(state.clone(), url, interval));
    }
    let (begin_drain, drain_started) = tokio::sync::watch::channel(false);
    let app = crate::api::app(state.clone());
    let server = axum::serve(listener, app).with_graceful_shutdown(async move {
        let mut receiver = drain_started;
        let _ = receiver.wait_for(|draining| *draining).await;
    });
    let server = tokio::spawn(async move { server.await });
    shutdown.await;
    state.set_ready(false);
    tracing::info!(
        in_flight = state.metrics().in_flight(),
        "shutdown requested: unready, draining in-flight requests"
    );
    let delay = Duration::from_secs_f64(settings.shutdown_delay_s);
    if !delay.is_zero() {
        tokio::time::sleep(delay).await;
    }
    let _ = begin_drain.send(true);
    let drain = Duration::from_secs_f64(settings.drain_timeout_s);
    match tokio::time::timeout(drain, server).await {
        Ok(Ok(result)) => result,
        Ok(Err(join_error)) => Err(std::io::Error::other(join_error.to_string())),
        Err(_) => {
            tracing::warn!(
                in_flight = state.metrics().in_flight(),
                "drain timeout reached; exiting with requests still in flight"
            );
            Ok(())
        }
    }
}

/// Starts the service with `settings`: logs, leap-second table, listener, serve until a signal.
pub async fn run(settings: Settings) -> Result<(), String> {
    settings.validate()?;
    super::telemetry::init_logging(&settings);
    let table = leap_source::initial_table(&settings)?;
    tracing::info!(
        source = table.source(),
        expiry_mjd = table.expiry_mjd(),
        "leap-second table loaded"
    );
    let listener = TcpListener::bind(settings.addr)
        .await
        .map_err(|e| format!("cannot listen on {}: {e}", settings.addr))?;
    let local = listener.local_addr().map_err(|e| e.to_string())?;
    tracing::info!(addr = %local, "eigenzeit serving");
    let state = AppState::new(settings, table);
    serve(listener, state, shutdown_signal())
        .await
        .map_err(|e| format!("server error: {e}"))?;
    tracing::info!("eigenzeit stopped");
    Ok(())
}
