//! The Earth endpoints: the Earth orientation (EOP) table in force and its values at an
//! instant. (Earth orientation itself, UT1 as a scale and the rotation to ITRF, comes next.)

pub mod eop;
pub mod types;

use axum::routing::get;
use axum::Router;

use super::state::AppState;

/// Routes under `/v1/earth`.
pub fn router() -> Router<AppState> {
    Router::new().route("/v1/earth/eop", get(eop::eop))
}
