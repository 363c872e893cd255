//! The server's lifecycle: bind, serve, and on SIGTERM or SIGINT turn unready, let in-flight
//! requests finish (bounded by the drain timeout) and exit.

use std::future::Future;

use tokio::net::TcpListener;

use crate::physics::earth::eop::EopTable;
use crate::physics::time::leap_seconds::LeapTable;

use super::config::{duration_from_s, Settings};
use super::refresh::{initial_table, spawn_poller};
use super::state::ServiceState;

/// Resolves on SIGTERM or SIGINT. The handlers are installed when this is called, not when the
/// future is first polled, so that a signal sent right after start-up is not lost (it would
/// otherwise end the process with the default action, without draining).
pub fn shutdown_signal() -> impl Future<Output = ()> + Send + 'static {
    #[cfg(unix)]
    let (terminate, interrupt) = {
        use tokio::signal::unix::{signal, SignalKind};
        (
            signal(SignalKind::terminate()).ok(),
            signal(SignalKind::interrupt()).ok(),
        )
    };
    async move {
        #[cfg(unix)]
        {
            let terminate = async {
                match terminate {
                    Some(mut signal) => {
                        signal.recv().await;
                    }
                    None => std::future::pending::<()>().await,
                }
            };
            let interrupt = async {
                match interrupt {
                    Some(mut signal) => {
                        signal.recv().await;
                    }
                    None => {
                        let _ = tokio::signal::ctrl_c().await;
                    }
                }
            };
            tokio::select! {
                _ = terminate => {},
                _ = interrupt => {},
            }
        }
        #[cfg(not(unix))]
        {
            let _ = tokio::signal::ctrl_c().await;
        }
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
    let pollers: Vec<_> = [
        spawn_poller::<LeapTable>(&state),
        spawn_poller::<EopTable>(&state),
    ]
    .into_iter()
    .flatten()
    .collect();
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
    for poller in pollers {
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

/// Starts the service with `settings`: logs, leap-second and EOP tables, listener, serve until
/// a signal.
pub async fn run(settings: Settings) -> Result<(), String> {
    settings.validate()?;
    super::telemetry::init_logging(&settings);
    let table = initial_table::<LeapTable>(&settings)?;
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
    let eop_table = initial_table::<EopTable>(&settings)?;
    log_eop_table(&eop_table);
    let ephemeris = super::ephemeris::initial_ephemeris(&settings)?;
    let listener = TcpListener::bind(settings.addr)
        .await
        .map_err(|e| format!("cannot listen on {}: {e}", settings.addr))?;
    let local = listener.local_addr().map_err(|e| e.to_string())?;
    // Built before the `serving` line, which callers take as ready for requests and signals.
    let state = ServiceState::new(
        settings,
        table,
        eop_table,
        ephemeris,
        super::openapi::document_json(),
    );
    let shutdown = shutdown_signal();
    tracing::info!(addr = %local, "eigenzeit serving");
    serve(listener, state, shutdown)
        .await
        .map_err(|e| format!("server error: {e}"))?;
    tracing::info!("eigenzeit stopped");
    Ok(())
}

/// Logs the EOP table at start-up, with a warning when its last day is already past.
fn log_eop_table(table: &EopTable) {
    let days_to_end = table.days_to_end(crate::api::state::unix_now_s());
    tracing::info!(
        source = table.source(),
        first_mjd = table.first_mjd(),
        last_observed_mjd = table.last_observed_mjd(),
        end_of_predictions_mjd = table.end_of_predictions_mjd(),
        days_to_end,
        "EOP table loaded"
    );
    if days_to_end.is_some_and(|days| days < 0.0) {
        tracing::warn!(
            last_mjd = table.last_mjd(),
            "the EOP table ends before today: Earth orientation lookups after its last day are \
             refused; give a newer file (--eop-file) or a URL to poll (--eop-url)"
        );
    }
}
