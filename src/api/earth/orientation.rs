//! `GET` and `POST /v1/earth/orientation`: the Earth's orientation at an instant (IAU
//! 2006/2000A, CIO based, with the EOP table in force).

use axum::extract::State;
use axum::Json;

use super::orientation_answer::{orientation_one, OrientationRequest};
use super::orientation_types::{
    EarthOrientationAnswer, OrientationBatch, OrientationBatchRequest, OrientationQuery,
};
use crate::api::error::{ApiError, JsonBodyProblems, Problem, QueryProblems, TimeoutProblem};
use crate::api::extract::{check_batch_size, compute, JsonBody, QueryParams};
use crate::api::names::{parse_format, parse_scale};
use crate::api::state::AppState;
use crate::api::time::conversion::FieldName;

/// The Earth's orientation at one instant: the Earth rotation angle, GMST, GAST, UT1 - UTC,
/// polar motion, CIP X, Y, s, s', dX, dY, LOD and the GCRS -> ITRS matrix, with the EOP
/// values' source and status (a warning on predicted values names the quantity and its likely
/// error).
#[utoipa::path(get, path = "/v1/earth/orientation", tag = "earth",
    params(OrientationQuery),
    responses(
        (status = 200, description = "The orientation at `at`", body = EarthOrientationAnswer),
        QueryProblems,
        (status = 422, description = "A value cannot be used; `field` names it and `code` says why: unknown_scale, unknown_format, malformed_instant, impossible_date, invalid_leap_second, utc_before_1960, instant_out_of_range, format_not_for_scale, not_finite, eop_before_table (before the first day of the EOP table in force), eop_after_table (after the end of its predictions)", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn orientation_get(
    State(state): State<AppState>,
    QueryParams(query): QueryParams<OrientationQuery>,
) -> Result<Json<EarthOrientationAnswer>, ApiError> {
    let scale = parse_scale(query.scale.as_deref().unwrap_or("UTC"), "scale")?;
    let format = parse_format(query.format.as_deref(), "format")?;
    let (leaps, eop) = (state.leap_table(), state.eop_table());
    let request = OrientationRequest {
        format,
        scale,
        pole_offsets: query.pole_offsets.unwrap_or(true),
        leaps: &leaps,
        eop: &eop,
    };
    orientation_one(&query.at, &request, FieldName::Named("at")).map(Json)
}

/// The Earth's orientation at many instants, as the single form answers each.
#[utoipa::path(post, path = "/v1/earth/orientation", tag = "earth",
    request_body = OrientationBatchRequest,
    responses(
        (status = 200, description = "One orientation per epoch, in order", body = OrientationBatch),
        JsonBodyProblems,
        (status = 422, description = "A value cannot be used; `field` names it (e.g. `epochs[3]`) and `code` says why: the codes of `GET /v1/earth/orientation`, plus empty_batch, batch_too_large (above the configured limit)", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn orientation_post(
    State(state): State<AppState>,
    JsonBody(body): JsonBody<OrientationBatchRequest>,
) -> Result<Json<OrientationBatch>, ApiError> {
    let scale = parse_scale(body.scale.as_deref().unwrap_or("UTC"), "scale")?;
    let format = parse_format(body.format.as_deref(), "format")?;
    check_batch_size(
        body.epochs.len(),
        state.limits().batch_limit,
        "epochs",
        "epoch",
    )?;
    let (leaps, eop) = (state.leap_table(), state.eop_table());
    let pole_offsets = body.pole_offsets.unwrap_or(true);
    let items = body.epochs.len();
    let work = move || {
        let request = OrientationRequest {
            format,
            scale,
            pole_offsets,
            leaps: &leaps,
            eop: &eop,
        };
        let orientations = body
            .epochs
            .iter()
            .enumerate()
            .map(|(index, text)| orientation_one(text, &request, FieldName::Item("epochs", index)))
            .collect::<Result<Vec<_>, _>>()?;
        Ok(OrientationBatch { orientations })
    };
    compute(items, work).await.map(Json)
}
