//! `POST /v1/clock/rate`.

use axum::extract::State;
use axum::Json;

use super::answer::RateBatchAnswer;
use super::evaluate::{evaluate_item, Defaults};
use super::lunar::check_lunar_items;
use super::types::RateRequest;
use crate::api::error::{ApiError, JsonBodyProblems, Problem, TimeoutProblem};
use crate::api::extract::{check_batch_size, compute, JsonBody};
use crate::api::state::AppState;

/// Rate offsets of clocks (state vectors, orbits, ground sites, lunar sites) relative to TT or
/// TCG (lunar sites with an epoch or a span also against TCL and TL, and the proper time over
/// the span), split into the velocity and gravity parts, with the frequency offset and the periodic
/// term where they apply. Positive rates: the clock runs fast relative to the reference.
#[utoipa::path(post, path = "/v1/clock/rate", tag = "clock",
    request_body = RateRequest,
    responses(
        (status = 200, description = "One answer per item, in order", body = RateBatchAnswer),
        JsonBodyProblems,
        (status = 422, description = "A value cannot be used; `field` names it (e.g. `items[3].orbit.eccentricity`) and `code` says why: epoch_required (a GCRS state with a zonal model and no epoch, any state with the Sun and Moon tide model and no epoch; outside_ephemeris_span for that model at an epoch outside the planetary ephemeris; the epoch's own codes malformed_instant, impossible_date, unknown_scale; for an ITRF state with an epoch eop_before_table, eop_after_table: the epoch must lie inside the Earth orientation table in force), subject_missing, subject_ambiguous, unknown_reference, unknown_gravity_model, unknown_frame, unknown_height_reference, anomaly_ambiguous, empty_batch, batch_too_large (also above 100 lunar sites with an epoch or a span), not_finite, speed_not_below_c, below_surface, beyond_model_range, invalid_semi_major_axis, invalid_eccentricity, latitude_out_of_range, angle_out_of_range, unsupported_gravity_model, input_required, invalid_frequency, rate_out_of_range; a lunar site with `epoch` or `span`: outside_ephemeris_span, outside_lunar_time_span (the epoch, the anomalistic month around it or a span end outside 1959-12-30 .. 2101-01-02 TDB), the epoch's own codes (malformed_instant, impossible_date, unknown_scale, utc_before_1960, ...), invalid_value (a span that does not end after its start), beyond_model_range (a span longer than 3660 days, or a height above 100 km)", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn rate(
    State(state): State<AppState>,
    JsonBody(request): JsonBody<RateRequest>,
) -> Result<Json<RateBatchAnswer>, ApiError> {
    check_batch_size(
        request.items.len(),
        state.limits().batch_limit,
        "items",
        "item",
    )?;
    let defaults = Defaults::parse(
        request.reference.as_deref(),
        request.gravity_model.as_deref(),
        request.nominal_frequency_hz,
    )?;
    let items = request.items.len();
    // Lunar sites on the DE440 orbit take milliseconds to a second each: never inline.
    let lunar = check_lunar_items(&request.items, "items")?;
    let weight = if lunar > 0 { usize::MAX } else { items };
    let eop = state.eop_table();
    let leaps = state.leap_table();
    let ephemeris = state.ephemeris();
    let work = move || {
        request
            .items
            .iter()
            .enumerate()
            .map(|(index, item)| {
                evaluate_item(
                    item,
                    &defaults,
                    &format!("items[{index}]"),
                    (&leaps, &eop),
                    &ephemeris,
                )
                .map(|evaluated| evaluated.answer)
            })
            .collect::<Result<Vec<_>, _>>()
    };
    let results = compute(weight, work).await?;
    Ok(Json(RateBatchAnswer { results }))
}
