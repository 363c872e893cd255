//! The solar-system endpoint: where a body is relative to a centre, from the planetary
//! ephemeris in force (the built-in excerpt of JPL DE440 or a kernel the operator loaded).

pub mod state;
pub mod types;

use axum::routing::get;
use axum::Router;

use super::state::AppState;

/// Routes under `/v1/solar-system`.
pub fn router() -> Router<AppState> {
    Router::new().route("/v1/solar-system/state", get(state::body_state))
}
