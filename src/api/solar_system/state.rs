//! `GET /v1/solar-system/state`: a body's position and velocity relative to a centre.

use axum::extract::State;
use axum::Json;

use super::types::{BodyStateAnswer, BodyStateQuery, EphemerisInfo};
use crate::api::error::{ApiError, Problem, QueryProblems, TimeoutProblem};
use crate::api::extract::QueryParams;
use crate::api::names::{parse_format, parse_named, parse_scale};
use crate::api::state::AppState;
use crate::api::time::conversion::{convert_one, FieldName};
use crate::api::time::forms::FormSelection;
use crate::physics::solar_system::ephemeris::tdb_text;
use crate::physics::solar_system::{Body, Ephemeris, EphemerisError, EphemerisErrorKind};
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::scale::Scale;

/// The problem code of an unknown body or centre.
pub const UNKNOWN_BODY: &str = EphemerisErrorKind::UnknownBody.as_str();

/// The span of `ephemeris` as the answer states it.
pub fn ephemeris_info(ephemeris: &Ephemeris) -> EphemerisInfo {
    let span = ephemeris.span();
    EphemerisInfo {
        name: ephemeris.name().to_string(),
        first_tdb: tdb_text(span.first_tdb_s),
        last_tdb: tdb_text(span.last_tdb_s),
    }
}

fn ephemeris_problem(error: &EphemerisError) -> ApiError {
    ApiError::unprocessable(error.code(), error.to_string()).with_field("at")
}

/// Position (m) and velocity (m/s) of a body relative to a centre, ICRF axes, from the
/// planetary ephemeris in force at the TDB reading of `at`.
#[utoipa::path(get, path = "/v1/solar-system/state", tag = "solar-system",
    params(BodyStateQuery),
    responses(
        (status = 200, description = "The state of `body` about `center` at `at`", body = BodyStateAnswer),
        QueryProblems,
        (status = 422, description = "A value cannot be used; `field` names it and `code` says why: unknown_body (`body` or `center`), unknown_scale, unknown_format, malformed_instant, impossible_date, invalid_leap_second, utc_before_1960, instant_out_of_range, format_not_for_scale, not_finite, ut1_outside_eop_table, outside_ephemeris_span (the detail names the ephemeris's span)", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn body_state(
    State(state): State<AppState>,
    QueryParams(query): QueryParams<BodyStateQuery>,
) -> Result<Json<BodyStateAnswer>, ApiError> {
    let body: Body = parse_named(&query.body, UNKNOWN_BODY, "body", "body")?;
    let center: Body = parse_named(
        query.center.as_deref().unwrap_or("ssb"),
        UNKNOWN_BODY,
        "centre",
        "center",
    )?;
    let scale = parse_scale(query.scale.as_deref().unwrap_or("TDB"), "scale")?;
    let format = parse_format(query.format.as_deref(), "format")?;
    let (leaps, eop) = (state.leap_table(), state.eop_table());
    let context = ConversionContext::geocentric(&leaps).with_ut1(eop.as_ref());
    let converted = convert_one(
        &query.at,
        format,
        scale,
        &[Scale::Tdb],
        &context,
        FieldName::Named("at"),
    )?;
    let tdb = &converted.results[0].digits;
    let ephemeris = state.ephemeris();
    let found = ephemeris
        .state_m(body, center, tdb.reading_count_attos())
        .map_err(|e| ephemeris_problem(&e))?;
    let [x, y, z] = found.position_m;
    let forms = FormSelection::default();
    Ok(Json(BodyStateAnswer {
        body: body.as_str().to_string(),
        center: center.as_str().to_string(),
        frame: "ICRF".to_string(),
        input: forms.json(&converted.input),
        tdb: forms.json(tdb),
        position_m: found.position_m,
        velocity_m_s: found.velocity_m_s,
        distance_m: (x * x + y * y + z * z).sqrt(),
        ephemeris: ephemeris_info(&ephemeris),
        warnings: converted.warnings.clone(),
    }))
}
