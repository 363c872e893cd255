//! The Earth endpoints: the Earth orientation (EOP) table in force and its values at an
//! instant, and the Earth's orientation (IAU 2006/2000A, the GCRS <-> ITRS rotation) at an
//! instant.

pub mod eop;
pub mod orientation;
pub mod orientation_answer;
pub mod orientation_types;
pub mod types;

use axum::routing::get;
use axum::Router;

use super::state::AppState;

/// Routes under `/v1/earth`.
pub fn router() -> Router<AppState> {
    Router::new().route("/v1/earth/eop", get(eop::eop)).route(
        "/v1/earth/orientation",
        get(orientation::orientation_get).post(orientation::orientation_post),
    )
}
