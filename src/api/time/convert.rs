//! `GET` and `POST /v1/time/convert`.

use axum::extract::State;
use axum::http::{header, StatusCode};
use axum::response::{IntoResponse, Response};
use axum::Json;

use super::types::{
    Conversion, ConversionBatch, ConvertBatchRequest, ConvertQuery, ConvertedInstant, InstantForms,
    ObserverInput,
};
use crate::api::error::{ApiError, JsonBodyProblems, Problem, QueryProblems, TimeoutProblem};
use crate::api::extract::{check_batch_size, compute, JsonBody, QueryParams};
use crate::api::names::{parse_format, parse_scale, ALL_SCALES};
use crate::api::state::AppState;
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::convert::{convert, ConversionContext, TdbEvaluation};
use crate::physics::time::decimal::format_attos_as_seconds;
use crate::physics::time::formats::{
    day_reading, parse_instant, reading_count_attos, write_instant, InstantFormat,
};
use crate::physics::time::instant::{attos_to_seconds_f64, Instant};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::physics::time::tdb_series::{TopocentricObserver, OBSERVER_RADIUS_RANGE_M};

fn parse_targets<'a>(
    names: impl Iterator<Item = &'a str>,
    field: &str,
) -> Result<Vec<Scale>, ApiError> {
    let mut scales = Vec::new();
    for (index, name) in names.enumerate() {
        if name == ALL_SCALES {
            scales.extend(Scale::ALL);
        } else {
            scales.push(parse_scale(name, &format!("{field}[{index}]"))?);
        }
    }
    if scales.is_empty() {
        return Err(ApiError::unprocessable(
            "no_target_scale",
            "expected at least one target scale, or `all`",
        )
        .with_field(field));
    }
    scales.dedup();
    Ok(scales)
}

fn observer_from_position(
    position_m: [f64; 3],
    field: &str,
) -> Result<TopocentricObserver, ApiError> {
    if !position_m.iter().all(|v| v.is_finite()) {
        return Err(ApiError::unprocessable(
            "not_finite",
            "the observer position must be three finite numbers in metres",
        )
        .with_field(field));
    }
    let radius_m = (position_m[0].powi(2) + position_m[1].powi(2) + position_m[2].powi(2)).sqrt();
    let (low, high) = OBSERVER_RADIUS_RANGE_M;
    if !(low..=high).contains(&radius_m) {
        return Err(ApiError::unprocessable(
            "observer_not_on_ground",
            format!(
                "the observer is {radius_m:.0} m from the geocentre; expected a place near the Earth's surface ({low:.0} to {high:.0} m)"
            ),
        )
        .with_field(field));
    }
    Ok(TopocentricObserver::from_itrf_m(position_m))
}

fn observer_from_input(
    input: &ObserverInput,
    field: &str,
) -> Result<TopocentricObserver, ApiError> {
    match (input.itrf_position_m, input.latitude_deg, input.longitude_deg) {
        (Some(position), None, None) if input.height_m.is_none() => {
            observer_from_position(position, &format!("{field}.itrf_position_m"))
        }
        (None, Some(latitude_deg), Some(longitude_deg)) => {
            let height_m = input.height_m.unwrap_or(0.0);
            let position = crate::physics::geodesy::geodetic_to_ecef_m(latitude_deg, longitude_deg, height_m)
                .map_err(|e| ApiError::unprocessable("invalid_observer", e.to_string()).with_field(field))?;
            observer_from_position(position, field)
        }
        _ => Err(ApiError::unprocessable(
            "invalid_observer",
            "give either itrf_position_m, or latitude_deg and longitude_deg (and optionally height_m)",
        )
        .with_field(field)),
    }
}

fn parse_observer_query(text: &str) -> Result<TopocentricObserver, ApiError> {
    let field = "observer_itrf_m";
    let values: Vec<f64> = text
        .split(',')
        .map(str::parse::<f64>)
        .collect::<Result<_, _>>()
        .map_err(|_| {
            ApiError::bad_request("invalid_query", "expected three numbers x,y,z in metres")
                .with_field(field)
        })?;
    match values.as_slice() {
        [x, y, z] => observer_from_position([*x, *y, *z], field),
        _ => Err(
            ApiError::bad_request("invalid_query", "expected three numbers x,y,z in metres")
                .with_field(field),
        ),
    }
}

/// Warnings for a UTC reading past the table's expiry.
fn expiry_warning(instant: &Instant, table: &LeapTable) -> Option<String> {
    if instant.scale() != Scale::Utc {
        return None;
    }
    let reading = day_reading(instant, table).ok()?;
    if reading.mjd < table.expiry_mjd() {
        return None;
    }
    let expiry = CalendarDate::from_mjd(table.expiry_mjd());
    Some(format!(
        "UTC on or after {expiry}, the expiry of the leap-second table in use: TAI - UTC is held at its last value, and a leap second announced later would change this answer"
    ))
}

fn forms(instant: &Instant, table: &LeapTable, field: &str) -> Result<InstantForms, ApiError> {
    write_instant(instant, table)
        .map(InstantForms::from)
        .map_err(|e| ApiError::from_time(&e, field))
}

/// Converts one instant, written as text, into each target scale.
pub fn convert_one(
    text: &str,
    format: InstantFormat,
    from: Scale,
    targets: &[Scale],
    context: &ConversionContext<'_>,
    field: &str,
) -> Result<Conversion, ApiError> {
    let table = context.table;
    let input =
        parse_instant(text, format, from, table).map_err(|e| ApiError::from_time(&e, field))?;
    let input_reading =
        reading_count_attos(&input, table).map_err(|e| ApiError::from_time(&e, field))?;
    let mut warnings: Vec<String> = expiry_warning(&input, table).into_iter().collect();
    let mut results = Vec::with_capacity(targets.len());
    for &target in targets {
        let output =
            convert(&input, target, context).map_err(|e| ApiError::from_time(&e, field))?;
        let difference = reading_count_attos(&output, table)
            .map_err(|e| ApiError::from_time(&e, field))?
            - input_reading;
        if let Some(warning) = expiry_warning(&output, table) {
            if !warnings.contains(&warning) {
                warnings.push(warning);
            }
        }
        results.push(ConvertedInstant {
            instant: forms(&output, table, field)?,
            difference_s: attos_to_seconds_f64(difference),
            difference_exact_s: format_attos_as_seconds(difference),
        });
    }
    Ok(Conversion {
        input: forms(&input, table, field)?,
        results,
        warnings,
    })
}

/// Converts one instant into one or more scales.
#[utoipa::path(get, path = "/v1/time/convert", tag = "time",
    params(ConvertQuery),
    responses(
        (status = 200, description = "The instant in each target scale", body = Conversion),
        QueryProblems,
        (status = 422, description = "A value cannot be used; `field` names it and `code` says why: unknown_scale, unknown_format, no_target_scale, malformed_instant (the text does not fit `format`), impossible_date (2026-02-30), invalid_leap_second, utc_before_1960, instant_out_of_range, format_not_for_scale (unix_s outside UTC, gnss_week outside GNSS scales), not_finite, observer_not_on_ground", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn convert_get(
    State(state): State<AppState>,
    QueryParams(query): QueryParams<ConvertQuery>,
) -> Result<Json<Conversion>, ApiError> {
    let from = parse_scale(query.from.as_deref().unwrap_or("UTC"), "from")?;
    let targets = parse_targets(query.to.as_deref().unwrap_or("all").split(','), "to")?;
    let format = parse_format(query.format.as_deref(), "format")?;
    let table = state.leap_table();
    let observer = query
        .observer_itrf_m
        .as_deref()
        .map(parse_observer_query)
        .transpose()?;
    let context = ConversionContext {
        table: &table,
        observer,
        tdb_evaluation: TdbEvaluation::Fitted,
    };
    convert_one(&query.at, format, from, &targets, &context, "at").map(Json)
}

/// Converts many instants into one or more scales.
#[utoipa::path(post, path = "/v1/time/convert", tag = "time",
    request_body = ConvertBatchRequest,
    responses(
        (status = 200, description = "One conversion per epoch, in order", body = ConversionBatch),
        JsonBodyProblems,
        (status = 422, description = "A value cannot be used; `field` names it (e.g. `epochs[3]`) and `code` says why: the codes of `GET /v1/time/convert`, plus empty_batch, batch_too_large (above the configured limit), invalid_observer", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn convert_post(
    State(state): State<AppState>,
    JsonBody(request): JsonBody<ConvertBatchRequest>,
) -> Result<Response, ApiError> {
    let from = parse_scale(&request.from, "from")?;
    let targets = parse_targets(request.to.iter().map(String::as_str), "to")?;
    let format = parse_format(request.format.as_deref(), "format")?;
    check_batch_size(
        request.epochs.len(),
        state.limits().batch_limit,
        "epochs",
        "epoch",
    )?;
    let observer = request
        .observer
        .as_ref()
        .map(|o| observer_from_input(o, "observer"))
        .transpose()?;
    let table = state.leap_table();
    let items = request.epochs.len();
    let work = move || {
        let context = ConversionContext {
            table: &table,
            observer,
            tdb_evaluation: TdbEvaluation::Fitted,
        };
        let conversions = request
            .epochs
            .iter()
            .enumerate()
            .map(|(index, text)| {
                convert_one(
                    text,
                    format,
                    from,
                    &targets,
                    &context,
                    &format!("epochs[{index}]"),
                )
            })
            .collect::<Result<Vec<_>, _>>()?;
        // Written here, in the blocking pool: a 100 000-epoch answer takes as long to write as
        // to compute, and written on an async worker it delays the shutdown signal.
        serde_json::to_vec(&ConversionBatch { conversions }).map_err(|e| {
            ApiError::new(StatusCode::INTERNAL_SERVER_ERROR, "internal", e.to_string())
        })
    };
    let body = compute(items, work).await?;
    Ok(([(header::CONTENT_TYPE, "application/json")], body).into_response())
}
