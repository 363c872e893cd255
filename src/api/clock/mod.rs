//! The clock-rate endpoints: `POST /v1/clock/rate` (many clocks against TT or TCG) and
//! `POST /v1/clock/compare` (how fast one clock runs relative to another).

pub mod answer;
pub mod compare;
pub mod evaluate;
pub mod lunar;
pub mod lunar_answer;
pub mod notes;
mod orbit_item;
pub mod rate;
pub mod tides;
pub mod types;

use axum::routing::post;
use axum::Router;

use super::state::AppState;

/// Routes under `/v1/clock` served by this module.
pub fn router() -> Router<AppState> {
    Router::new()
        .route("/v1/clock/rate", post(rate::rate))
        .route("/v1/clock/compare", post(compare::compare))
}
