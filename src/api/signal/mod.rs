//! The signal endpoints: one-way path corrections and the two-way time-transfer Sagnac term.

pub mod path;
pub mod two_way;
pub mod types;

use axum::routing::post;
use axum::Router;

use super::error::ApiError;
use super::state::AppState;
use crate::physics::signal::SignalError;

/// Routes under `/v1/signal`.
pub fn router() -> Router<AppState> {
    Router::new()
        .route("/v1/signal/path", post(path::signal_path))
        .route("/v1/signal/two-way", post(two_way::two_way))
}

impl From<SignalError> for ApiError {
    fn from(error: SignalError) -> Self {
        ApiError::unprocessable(error.code, error.message).with_field(error.field)
    }
}
