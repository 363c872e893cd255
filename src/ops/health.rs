//! Liveness, readiness and the metrics endpoint.

use axum::extract::State;
use axum::http::{header, StatusCode};
use axum::response::{IntoResponse, Response};
use axum::routing::get;
use axum::{Json, Router};
use serde::Serialize;
use utoipa::ToSchema;

use crate::api::state::unix_now_s;

use super::metrics::Gauges;
use super::state::ServiceState;

/// Liveness answer.
#[derive(Debug, Serialize, ToSchema)]
pub struct Health {
    /// Always `ok` while the process serves.
    pub status: String,
    /// Service version.
    pub version: String,
}

/// Readiness answer.
#[derive(Debug, Serialize, ToSchema)]
pub struct Readiness {
    /// `ready`, or `draining` during shutdown.
    pub status: String,
    /// The leap-second table in force and its refresh.
    pub leap_seconds: LeapReadiness,
}

/// The leap-second part of the readiness answer.
#[derive(Debug, Serialize, ToSchema)]
pub struct LeapReadiness {
    /// Where the table came from.
    pub source: String,
    /// Expiry date of the table (UTC, ISO date).
    pub expires: String,
    /// Days from now to the expiry (negative once expired).
    pub expires_in_days: f64,
    /// Unix time of the last successful refresh from the configured URL.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub last_refresh_unix_s: Option<u64>,
    /// Why the last refresh failed (the table in force was kept).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub last_refresh_error: Option<String>,
}

/// Liveness: the process is up and serving.
#[utoipa::path(get, path = "/healthz", tag = "operations",
    responses((status = 200, description = "The process serves", body = Health)))]
pub async fn healthz() -> Json<Health> {
    Json(Health {
        status: "ok".to_string(),
        version: env!("CARGO_PKG_VERSION").to_string(),
    })
}

fn leap_readiness(state: &ServiceState) -> LeapReadiness {
    let table = state.leap_table();
    let refresh = state.leap_refresh_status();
    let expiry = crate::physics::time::calendar::CalendarDate::from_mjd(table.expiry_mjd());
    LeapReadiness {
        source: table.source().to_string(),
        expires: expiry.to_string(),
        expires_in_days: table.days_to_expiry(unix_now_s()),
        last_refresh_unix_s: refresh.last_success_unix_s,
        last_refresh_error: refresh.last_error,
    }
}

/// Readiness: 200 while taking work, 503 while draining before shutdown.
#[utoipa::path(get, path = "/readyz", tag = "operations",
    responses(
        (status = 200, description = "Ready for work", body = Readiness),
        (status = 503, description = "Draining before shutdown", body = Readiness)))]
pub async fn readyz(State(state): State<ServiceState>) -> Response {
    let ready = state.is_ready();
    let body = Readiness {
        status: if ready { "ready" } else { "draining" }.to_string(),
        leap_seconds: leap_readiness(&state),
    };
    let status = if ready {
        StatusCode::OK
    } else {
        StatusCode::SERVICE_UNAVAILABLE
    };
    (status, Json(body)).into_response()
}

/// Prometheus metrics in the text exposition format.
#[utoipa::path(get, path = "/metrics", tag = "operations",
    responses((status = 200, description = "Prometheus text format 0.0.4", body = String, content_type = "text/plain")))]
pub async fn metrics(State(state): State<ServiceState>) -> Response {
    let table = state.leap_table();
    let gauges = Gauges {
        leap_source: table.source().to_string(),
        leap_expiry_days: table.days_to_expiry(unix_now_s()),
        ready: state.is_ready(),
    };
    (
        [(header::CONTENT_TYPE, super::metrics::CONTENT_TYPE)],
        state.metrics().render(&gauges),
    )
        .into_response()
}

/// Routes `/healthz`, `/readyz` and `/metrics`.
pub fn router(state: ServiceState) -> Router {
    Router::new()
        .route("/healthz", get(healthz))
        .route("/readyz", get(readyz))
        .route("/metrics", get(metrics))
        .with_state(state)
}
