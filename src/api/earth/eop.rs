//! `GET /v1/earth/eop`: the Earth orientation table in force, and its values at an instant.

use axum::extract::State;
use axum::Json;

use super::types::{EopLikelyError, EopQuery, EopTableAnswer, EopValuesAnswer};
use crate::api::error::ApiError;
use crate::api::extract::QueryParams;
use crate::api::state::AppState;
use crate::api::time::reference::iso_date;
use crate::physics::earth::eop::{EopTable, EopValues};
use crate::physics::time::formats::{day_reading, parse_instant, InstantFormat};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;

const ATTOS_PER_S: f64 = 1e18;

/// The values of `table` at the UTC instant `text` (ISO 8601); problems name `at`.
fn values_at(text: &str, table: &EopTable, leaps: &LeapTable) -> Result<EopValues, ApiError> {
    let instant = parse_instant(text, InstantFormat::Iso, Scale::Utc, leaps)
        .map_err(|e| ApiError::from_time(&e, "at"))?;
    let reading = day_reading(&instant, leaps).map_err(|e| ApiError::from_time(&e, "at"))?;
    let sod_s = reading.seconds_of_day_attos as f64 / ATTOS_PER_S;
    table
        .at_utc(leaps, reading.mjd, sod_s)
        .map_err(|e| ApiError::unprocessable(e.code(), e.to_string()).with_field("at"))
}

fn values_answer(utc: String, values: &EopValues) -> EopValuesAnswer {
    EopValuesAnswer {
        utc,
        ut1_minus_utc_s: values.ut1_minus_utc_s,
        xp_arcsec: values.xp_arcsec,
        yp_arcsec: values.yp_arcsec,
        dx_arcsec: values.dx_arcsec,
        dy_arcsec: values.dy_arcsec,
        lod_s: values.lod_s,
        status: values.status.as_str().to_string(),
        nutation_status: values.nutation_status.as_str().to_string(),
        days_after_observed: values.days_after_observed,
        likely_error: values.likely_error.map(|sigma| EopLikelyError {
            xp_arcsec: sigma.xp_arcsec,
            yp_arcsec: sigma.yp_arcsec,
            ut1_minus_utc_s: sigma.ut1_minus_utc_s,
        }),
    }
}

/// The Earth orientation (EOP) table in force: where it came from, its days, its last observed
/// day and the end of its predictions; with `at`, the interpolated values at that UTC instant.
#[utoipa::path(get, path = "/v1/earth/eop", tag = "earth",
    params(EopQuery),
    responses(
        (status = 200, description = "The table in force (and its values at `at`)", body = EopTableAnswer),
        crate::api::error::QueryProblems,
        (status = 422, description = "`at` cannot be used (`field` is `at`); `code` says why: malformed_instant (not ISO 8601), impossible_date (2026-02-30), invalid_leap_second, utc_before_1960, instant_out_of_range, eop_before_table (before the first tabulated day), eop_after_table (after the end of the predictions)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        crate::api::error::TimeoutProblem))]
pub async fn eop(
    State(state): State<AppState>,
    QueryParams(query): QueryParams<EopQuery>,
) -> Result<Json<EopTableAnswer>, ApiError> {
    let table = state.eop_table();
    let at = match query.at {
        Some(text) => {
            let values = values_at(&text, &table, &state.leap_table())?;
            Some(values_answer(text, &values))
        }
        None => None,
    };
    Ok(Json(EopTableAnswer {
        source: table.source().to_string(),
        first_day: table.first_mjd().map(iso_date),
        first_mjd: table.first_mjd(),
        last_day: table.last_mjd().map(iso_date),
        last_mjd: table.last_mjd(),
        last_observed: table.last_observed_mjd().map(iso_date),
        last_observed_mjd: table.last_observed_mjd(),
        end_of_predictions: table.end_of_predictions_mjd().map(iso_date),
        end_of_predictions_mjd: table.end_of_predictions_mjd(),
        day_count: table.days().len(),
        at,
    }))
}
