//! The server's lifecycle: bind, serve, and on SIGTERM or SIGINT turn unready, let in-flight
//! requests finish (bounded by the drain timeout) and exit.

use std::future::Future;

use tokio::net::TcpListener;

use super::config::{duration_from_s, Settings};
use super::leap_source;
use super::state::ServiceState;

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

/// Serves `state` on `listener` until `shutdown` resolves, then drains: the service turns
/// unready, keeps accepting for the shutdown delay (so load balancers see `/readyz` answer
/// 503), stops accepting, and waits for in-flight requests at most the drain timeout. Returns
/// early with the error if the server stops by itself.
pub async fn serve(
    listener: TcpListener,
    state: ServiceState,
    shutdown: impl Future<Output = ()> + Send + 'static,
) -> std::io::Result<()> {
    let settings = state.settings().clone();
    let poller = settings.leap_seconds_url.clone().map(|url| {
        let interval = duration_from_s(settings.leap_seconds_refresh_s);
        tokio::spawn(leap_source::poll_forever(state.clone(), url, interval))
    });
    let (begin_drain, drain_started) = tokio::sync::watch::channel(false);
    let app = super::app(state.clone());
    let server = axum::serve(listener, app).with_graceful_shutdown(async move {
        let mut receiver = drain_started;
        let _ = receiver.wait_for(|draining| *draining).await;
    });
    let mut server = tokio::spawn(async move { server.await });
    let outcome = tokio::select! {
        finished = &mut server => Some(finished),
        () = shutdown => None,
    };
    if let Some(poller) = poller {
        poller.abort();
    }
    if let Some(finished) = outcome {
        // The server stopped without being asked to (it only does so on an error).
        state.set_ready(false);
        return joined(finished);
    }
    state.set_ready(false);
    tracing::info!(
        in_flight = state.metrics().in_flight(),
        shutdown_delay_s = settings.shutdown_delay_s,
        drain_timeout_s = settings.drain_timeout_s,
        "shutdown requested: unready, draining in-flight requests"
    );
    let delay = duration_from_s(settings.shutdown_delay_s);
    if !delay.is_zero() {
        tokio::time::sleep(delay).await;
    }
    let _ = begin_drain.send(true);
    let drain = duration_from_s(settings.drain_timeout_s);
    match tokio::time::timeout(drain, &mut server).await {
        Ok(finished) => joined(finished),
        Err(_) => {
            tracing::warn!(
                in_flight = state.metrics().in_flight(),
                "drain timeout reached; exiting with requests still in flight"
            );
            server.abort();
            Ok(())
        }
    }
}

fn joined(finished: Result<std::io::Result<()>, tokio::task::JoinError>) -> std::io::Result<()> {
    finished.unwrap_or_else(|join_error| Err(std::io::Error::other(join_error.to_string())))
}

/// Starts the service with `settings`: logs, leap-second table, listener, serve until a signal.
pub async fn run(settings: Settings) -> Result<(), String> {
    settings.validate()?;
    super::telemetry::init_logging(&settings);
    let table = leap_source::initial_table(&settings)?;
    let expires_in_days = table.days_to_expiry(crate::api::state::unix_now_s());
    tracing::info!(
        source = table.source(),
        expiry_mjd = table.expiry_mjd(),
        expires_in_days,
        "leap-second table loaded"
    );
    if expires_in_days < 0.0 {
        tracing::warn!(
            expiry_mjd = table.expiry_mjd(),
            "the leap-second table has expired: UTC answers after its expiry carry a warning; \
             give a newer file (--leap-seconds-file) or a URL to poll (--leap-seconds-url)"
        );
    }
    let listener = TcpListener::bind(settings.addr)
        .await
        .map_err(|e| format!("cannot listen on {}: {e}", settings.addr))?;
    let local = listener.local_addr().map_err(|e| e.to_string())?;
    tracing::info!(addr = %local, "eigenzeit serving");
    let state = ServiceState::new(settings, table, super::openapi::document_json());
    serve(listener, state, shutdown_signal())
        .await
        .map_err(|e| format!("server error: {e}"))?;
    tracing::info!("eigenzeit stopped");
    Ok(())
}
