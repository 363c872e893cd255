//! Plots as SVG, each with a CSV twin of the same numbers: the proper-time answer
//! (`POST /v1/clock/proper-time` with `Accept: image/svg+xml`, its figure in
//! `api::proper_time::plot`), the rate of a clock on circular
//! orbits by altitude (`GET /v1/plots/rate-profile`) and the offsets between time scales over
//! a span (`GET /v1/plots/scale-offsets`); and the operations page at `/` (`page/`).
//!
//! Presentation only: the numbers come from the physics library; [`figure::Figure`] holds
//! them once and both [`svg::to_svg`] and [`figure::Figure::to_csv`] write from it.

pub mod figure;
pub mod page;
pub mod rate_profile;
pub mod scale_offsets;
pub mod style;
pub mod svg;
pub mod ticks;

use axum::http::{header, HeaderMap};
use axum::response::{IntoResponse, Response};
use axum::routing::get;
use axum::Router;

use super::error::ApiError;
use super::negotiate::{answer_type_among, AnswerType};
use super::state::AppState;
use crate::physics::readable::readable;

/// Most points a plot query may ask for.
pub const MAX_POINTS: usize = 5_000;

/// Routes `/v1/plots/rate-profile`, `/v1/plots/scale-offsets` and the page at `/`.
pub fn router() -> Router<AppState> {
    Router::new()
        .route("/v1/plots/rate-profile", get(rate_profile::rate_profile))
        .route("/v1/plots/scale-offsets", get(scale_offsets::scale_offsets))
        .merge(page::router())
}

/// The `points` of a plot query: `default` when absent, 2 to [`MAX_POINTS`] (422 `bad_option`
/// naming `points` otherwise).
pub fn check_points(points: Option<usize>, default: usize) -> Result<usize, ApiError> {
    let points = points.unwrap_or(default);
    if !(2..=MAX_POINTS).contains(&points) {
        return Err(ApiError::unprocessable(
            "bad_option",
            format!(
                "points is {}; it must be from 2 to {MAX_POINTS}",
                readable(points as f64)
            ),
        )
        .with_field("points"));
    }
    Ok(points)
}

/// The figure as SVG (the default) or, when `Accept` prefers `text/csv`, as its CSV twin;
/// `Vary: accept` either way.
pub fn answer_plot(headers: &HeaderMap, figure: &figure::Figure) -> Response {
    let kind = answer_type_among(headers, &[AnswerType::Svg, AnswerType::Csv]);
    let body = match kind {
        AnswerType::Csv => figure.to_csv(),
        _ => svg::to_svg(figure),
    };
    (
        [
            (header::CONTENT_TYPE, kind.content_type()),
            (header::VARY, "accept"),
        ],
        body,
    )
        .into_response()
}

#[cfg(test)]
mod svg_tests;
