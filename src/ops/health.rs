//! Liveness, readiness and the metrics endpoint.

use axum::extract::State;
use axum::http::{header, StatusCode};
use axum::response::{IntoResponse, Response};
use axum::routing::get;
use axum::{Json, Router};
use serde::Serialize;
use utoipa::ToSchema;

use crate::api::solar_system::state::ephemeris_info;
use crate::api::solar_system::types::EphemerisInfo;
use crate::api::state::unix_now_s;
use crate::api::time::reference::iso_date;

use super::metrics::Gauges;
use super::state::{RefreshStatus, ServiceState};

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
    /// The Earth orientation (EOP) table in force and its refresh.
    pub eop: EopReadiness,
    /// The planetary ephemeris in force and its span.
    pub ephemeris: EphemerisInfo,
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
    /// How the refresh from the configured URL went.
    #[serde(flatten)]
    pub refresh: RefreshReadiness,
}

/// The EOP part of the readiness answer.
#[derive(Debug, Serialize, ToSchema)]
pub struct EopReadiness {
    /// Where the table came from.
    pub source: String,
    /// Last day with observed polar motion and UT1 (UTC, ISO date).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub last_observed: Option<String>,
    /// MJD of that day.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub last_observed_mjd: Option<i64>,
    /// Last predicted day (UTC, ISO date); absent when the table holds no predictions.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub end_of_predictions: Option<String>,
    /// MJD of that day.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub end_of_predictions_mjd: Option<i64>,
    /// How the refresh from the configured URL went.
    #[serde(flatten)]
    pub refresh: RefreshReadiness,
}

/// How the refresh of a table from its configured URL went.
#[derive(Debug, Serialize, ToSchema)]
pub struct RefreshReadiness {
    /// Unix time of the last successful refresh from the configured URL.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub last_refresh_unix_s: Option<u64>,
    /// Why the last refresh failed (the table in force was kept).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub last_refresh_error: Option<String>,
}

impl From<RefreshStatus> for RefreshReadiness {
    fn from(status: RefreshStatus) -> Self {
        Self {
            last_refresh_unix_s: status.last_success_unix_s,
            last_refresh_error: status.last_error,
        }
    }
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
    LeapReadiness {
        source: table.source().to_string(),
        expires: iso_date(table.expiry_mjd()),
        expires_in_days: table.days_to_expiry(unix_now_s()),
        refresh: state.leap().refresh_status().into(),
    }
}

fn eop_readiness(state: &ServiceState) -> EopReadiness {
    let table = state.eop_table();
    EopReadiness {
        source: table.source().to_string(),
        last_observed: table.last_observed_mjd().map(iso_date),
        last_observed_mjd: table.last_observed_mjd(),
        end_of_predictions: table.end_of_predictions_mjd().map(iso_date),
        end_of_predictions_mjd: table.end_of_predictions_mjd(),
        refresh: state.eop().refresh_status().into(),
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
        eop: eop_readiness(&state),
        ephemeris: ephemeris_info(&state.api().ephemeris()),
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
    let eop = state.eop_table();
    let now_s = unix_now_s();
    let gauges = Gauges {
        leap_source: table.source().to_string(),
        leap_expiry_days: table.days_to_expiry(now_s),
        eop_source: eop.source().to_string(),
        eop_last_observed_mjd: eop.last_observed_mjd(),
        eop_end_of_predictions_mjd: eop.end_of_predictions_mjd(),
        eop_table_end_days: eop.days_to_end(now_s),
        ready: state.is_ready(),
        ephemeris: {
            let info = ephemeris_info(&state.api().ephemeris());
            [info.name, info.first_tdb, info.last_tdb]
        },
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
