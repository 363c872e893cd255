//! The clock-stability endpoint: `POST /v1/clock/stability` (NIST SP 1065 deviations of a
//! phase or frequency series).

pub mod handler;
pub mod types;

use axum::routing::post;
use axum::Router;

use super::state::AppState;

/// Routes served by this module.
pub fn router() -> Router<AppState> {
    Router::new().route("/v1/clock/stability", post(handler::stability))
}
