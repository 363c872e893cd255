//! The time-scale endpoints: conversion, the scales, the leap-second table and now.

pub mod broadcast_week;
pub mod conversion;
pub mod convert;
pub mod csv;
pub mod forms;
pub mod json_view;
pub mod lunar_observer;
pub mod observer;
pub mod reference;
pub mod types;
pub mod ut1_warning;

use axum::routing::get;
use axum::Router;

use super::state::AppState;

/// Routes under `/v1/time`.
pub fn router() -> Router<AppState> {
    Router::new()
        .route(
            "/v1/time/convert",
            get(convert::convert_get).post(convert::convert_post),
        )
        .route("/v1/time/scales", get(reference::scales))
        .route("/v1/time/leap-seconds", get(reference::leap_seconds))
        .route("/v1/time/now", get(reference::now))
}
