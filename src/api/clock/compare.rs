//! `POST /v1/clock/compare`.

use axum::extract::State;
use axum::Json;

use super::answer::{CompareAnswer, RateDifferenceAnswer};
use super::evaluate::{evaluate_item, Defaults};
use super::lunar::uses_lunar_ephemeris;
use super::types::CompareRequest;
use crate::api::error::{ApiError, JsonBodyProblems, Problem, TimeoutProblem};
use crate::api::extract::compute;
use crate::api::extract::JsonBody;
use crate::api::state::AppState;
use crate::physics::rate::{
    fractional_to_microseconds_per_day, fractional_to_nanoseconds_per_day, rate_difference,
};

/// How fast clock A runs relative to clock B: the rate of each against the common reference
/// and their difference, to first order. Positive: A runs fast relative to B.
#[utoipa::path(post, path = "/v1/clock/compare", tag = "clock",
    request_body = CompareRequest,
    responses(
        (status = 200, description = "The rate of each clock and how fast A runs relative to B", body = CompareAnswer),
        JsonBodyProblems,
        (status = 422, description = "A value cannot be used; `field` names it (e.g. `clock_b.ground_site.latitude_deg`); the codes are those of `POST /v1/clock/rate`, plus reference_mismatch when the two clocks use different references", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn compare(
    State(state): State<AppState>,
    JsonBody(request): JsonBody<CompareRequest>,
) -> Result<Json<CompareAnswer>, ApiError> {
    let eop = state.eop_table();
    let leaps = state.leap_table();
    let ephemeris = state.ephemeris();
    let defaults = Defaults::parse(
        request.reference.as_deref(),
        request.gravity_model.as_deref(),
        request.nominal_frequency_hz,
    )?;
    // Lunar sites on the DE440 orbit take milliseconds to a second each: on the blocking pool.
    let lunar = [&request.clock_a, &request.clock_b]
        .into_iter()
        .any(uses_lunar_ephemeris);
    let (clock_a, clock_b) = (request.clock_a.clone(), request.clock_b.clone());
    let (a, b) = compute(if lunar { usize::MAX } else { 2 }, move || {
        let tables = (&*leaps, &*eop);
        let a = evaluate_item(&clock_a, &defaults, "clock_a", tables, &ephemeris)?;
        let b = evaluate_item(&clock_b, &defaults, "clock_b", tables, &ephemeris)?;
        Ok((a, b))
    })
    .await?;
    let fractional = rate_difference(&a.parts, &b.parts).map_err(|_| {
        let field = if request.clock_b.reference.is_some() {
            "clock_b.reference"
        } else {
            "clock_a.reference"
        };
        ApiError::unprocessable(
            "reference_mismatch",
            format!(
                "clock_a is relative to {} and clock_b to {}; compare clocks against one reference",
                a.answer.reference, b.answer.reference
            ),
        )
        .with_field(field)
    })?;
    Ok(Json(CompareAnswer {
        clock_a: a.answer,
        clock_b: b.answer,
        a_minus_b: RateDifferenceAnswer {
            fractional,
            us_per_day: fractional_to_microseconds_per_day(fractional),
            ns_per_day: fractional_to_nanoseconds_per_day(fractional),
        },
    }))
}
