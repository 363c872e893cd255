//! `GET` and `POST /v1/time/convert`.

use axum::extract::State;
use axum::http::{header, HeaderMap};
use axum::response::{IntoResponse, Response};

use super::broadcast_week::read_broadcast_week;
use super::conversion::{convert_one_observed, uses_tdb, FieldName};
use super::csv::{self, CSV_CONTENT_TYPE};
use super::forms::FormSelection;
use super::json_view::{conversion_bytes_hint, json_bytes, BatchJson, ConversionJson};
use super::lunar_observer::{lunar_observer, parse_lunar_observer_query};
use super::observer::{observer_from_input, parse_observer_query};
use super::types::{Conversion, ConversionBatch, ConvertBatchRequest, ConvertQuery};
use crate::api::error::{ApiError, JsonBodyProblems, Problem, QueryProblems, TimeoutProblem};
use crate::api::extract::{check_batch_size, compute, JsonBody, QueryParams};
use crate::api::names::{parse_format, parse_scale, parse_tdb_model, ALL_SCALES};
use crate::api::negotiate::{answer_type, AnswerType};
use crate::api::state::AppState;
use crate::physics::time::convert::{ConversionContext, TdbEvaluation};
use crate::physics::time::scale::Scale;

fn parse_targets<'a>(
    names: impl Iterator<Item = &'a str>,
    field: &str,
) -> Result<Vec<Scale>, ApiError> {
    let mut scales = Vec::new();
    for (index, name) in names.enumerate() {
        if name == ALL_SCALES {
            scales.extend(Scale::any_epoch());
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

fn respond((content_type, body): (&'static str, Vec<u8>)) -> Response {
    (
        [
            (header::CONTENT_TYPE, content_type),
            (header::VARY, "accept"),
        ],
        body,
    )
        .into_response()
}

/// An example CSV answer (UTC -> TAI, TDB with `forms=iso,j2000_s`).
const CSV_EXAMPLE: &str = "epoch,TAI_iso,TAI_j2000_s,TDB_iso,TDB_j2000_s,tdb_model,warnings\r\n2026-03-14T06:30:00.123456789012,2026-03-14T06:30:37.123456789012,826741837.123456789012,2026-03-14T06:31:09.308982770736,826741869.308982770736444629,series,\r\n";

/// Converts one instant into one or more scales.
#[utoipa::path(get, path = "/v1/time/convert", tag = "time",
    params(ConvertQuery),
    responses(
        (status = 200, description = "The instant in each target scale: JSON, or CSV (RFC 4180, a header row and one row; a `tdb_model` column before `warnings` names the model of TDB - TT when TDB, TCB, TCL or TL is involved, as `tdb_model` does in JSON) when `Accept` prefers `text/csv`", content(
            (Conversion = "application/json"),
            (String = "text/csv", example = json!(CSV_EXAMPLE)))),
        QueryProblems,
        (status = 422, description = "A value cannot be used; `field` names it and `code` says why: unknown_scale, unknown_format (also for a name in `forms`), no_target_scale, no_form, malformed_instant (the text does not fit `format`), impossible_date (2026-02-30), invalid_leap_second, utc_before_1960, instant_out_of_range, format_not_for_scale (unix_s outside UTC, gnss_week outside GNSS scales, a week_counter of another system than the scale), unknown_week_counter, week_counter_needs_gnss_week (a week_counter with another format, or week_near without week_counter), ut1_outside_eop_table (UT1 asked for, or given, at an epoch the Earth orientation table does not cover: before 1962 or after the end of its predictions), not_finite, observer_not_on_ground, unknown_tdb_model, outside_tdb_model_span (TDB or TCB with the ephemeris model outside 1959-12-30 to 2101-01-02 TT), outside_lunar_time_span (TCL or TL outside 1959-12-30 to 2101-01-02 TDB); for selenocentric_observer_m: below_surface (below the lunar surface), beyond_model_range (beyond 60 000 km from the Moon), invalid_observer (with observer_itrf_m too), outside_ephemeris_span", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn convert_get(
    State(state): State<AppState>,
    headers: HeaderMap,
    QueryParams(query): QueryParams<ConvertQuery>,
) -> Result<Response, ApiError> {
    let from = parse_scale(query.from.as_deref().unwrap_or("UTC"), "from")?;
    let targets = parse_targets(query.to.as_deref().unwrap_or("all").split(','), "to")?;
    let format = parse_format(query.format.as_deref(), "format")?;
    let forms = FormSelection::from_query(query.forms.as_deref(), "forms")?;
    let tdb_model = parse_tdb_model(query.tdb_model.as_deref(), "tdb_model")?;
    let broadcast = read_broadcast_week(
        query.week_counter.as_deref(),
        query.week_near.as_deref(),
        format,
        from,
        "week_counter",
        "week_near",
    )?;
    let table = state.leap_table();
    let observer = query
        .observer_itrf_m
        .as_deref()
        .map(parse_observer_query)
        .transpose()?;
    let lunar = query
        .selenocentric_observer_m
        .as_deref()
        .map(|text| parse_lunar_observer_query(text, state.ephemeris(), "selenocentric_observer_m"))
        .transpose()?;
    one_observer(
        observer.is_some(),
        lunar.is_some(),
        "selenocentric_observer_m",
    )?;
    let eop = state.eop_table();
    let context = ConversionContext {
        table: &table,
        observer,
        tdb_evaluation: TdbEvaluation::Fitted,
        tdb_model,
        ut1: Some(&*eop),
    };
    let (at, note) = match &broadcast {
        Some(week) => {
            let (text, note) = week.resolve(&query.at, from, FieldName::Named("at"))?;
            (text, Some(note))
        }
        None => (query.at.clone(), None),
    };
    let mut converted = convert_one_observed(
        &at,
        format,
        from,
        &targets,
        &context,
        FieldName::Named("at"),
        lunar.as_ref(),
    )?;
    converted.warnings.extend(note);
    let written = match answer_type(&headers) {
        // `answer_type` offers JSON and CSV only.
        AnswerType::Json | AnswerType::Svg => (
            "application/json",
            json_bytes(
                &ConversionJson(&converted, &forms),
                conversion_bytes_hint(targets.len()),
            )?,
        ),
        AnswerType::Csv => {
            let mut out = Vec::with_capacity(256);
            let names_model = uses_tdb(from, &targets);
            csv::push_header(&targets, &forms, names_model, &mut out);
            csv::push_row(&query.at, &converted, &forms, names_model, &mut out);
            (CSV_CONTENT_TYPE, out)
        }
    };
    Ok(respond(written))
}

/// Converts many instants into one or more scales.
#[utoipa::path(post, path = "/v1/time/convert", tag = "time",
    request_body = ConvertBatchRequest,
    responses(
        (status = 200, description = "One conversion per epoch, in order: JSON, or CSV (RFC 4180: a header row `epoch,<SCALE>_<form>...,warnings`, with `tdb_model` before `warnings` when TDB, TCB, TCL or TL is involved, as in JSON; then one row per epoch) when `Accept` prefers `text/csv`", content(
            (ConversionBatch = "application/json"),
            (String = "text/csv", example = json!(CSV_EXAMPLE)))),
        JsonBodyProblems,
        (status = 422, description = "A value cannot be used; `field` names it (e.g. `epochs[3]`, `forms[1]`) and `code` says why: the codes of `GET /v1/time/convert`, plus empty_batch, batch_too_large (above the configured limit), invalid_observer (also for observer with selenocentric_observer_m)", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn convert_post(
    State(state): State<AppState>,
    headers: HeaderMap,
    JsonBody(request): JsonBody<ConvertBatchRequest>,
) -> Result<Response, ApiError> {
    let from = parse_scale(&request.from, "from")?;
    let targets = parse_targets(request.to.iter().map(String::as_str), "to")?;
    let format = parse_format(request.format.as_deref(), "format")?;
    let forms = match &request.forms {
        None => FormSelection::default(),
        Some(names) => FormSelection::parse(names.iter().map(String::as_str), "forms")?,
    };
    let tdb_model = parse_tdb_model(request.tdb_model.as_deref(), "tdb_model")?;
    let broadcast = read_broadcast_week(
        request.week_counter.as_deref(),
        request.week_near.as_deref(),
        format,
        from,
        "week_counter",
        "week_near",
    )?;
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
    let lunar = request
        .selenocentric_observer_m
        .map(|position| lunar_observer(position, state.ephemeris(), "selenocentric_observer_m"))
        .transpose()?;
    one_observer(
        observer.is_some(),
        lunar.is_some(),
        "selenocentric_observer_m",
    )?;
    let table = state.leap_table();
    let eop = state.eop_table();
    let items = request.epochs.len();
    let answer_type = answer_type(&headers);
    let work = move || {
        let context = ConversionContext {
            table: &table,
            observer,
            tdb_evaluation: TdbEvaluation::Fitted,
            tdb_model,
            ut1: Some(&*eop),
        };
        let convert_at = |index: usize, text: &str| {
            let field = FieldName::Item("epochs", index);
            let Some(week) = &broadcast else {
                return convert_one_observed(
                    text,
                    format,
                    from,
                    &targets,
                    &context,
                    field,
                    lunar.as_ref(),
                );
            };
            let (full, note) = week.resolve(text, from, field)?;
            let mut converted = convert_one_observed(
                &full,
                format,
                from,
                &targets,
                &context,
                field,
                lunar.as_ref(),
            )?;
            converted.warnings.push(note);
            Ok(converted)
        };
        // Written here, in the blocking pool: a 100 000-epoch answer takes as long to write as
        // to compute, and written on an async worker it delays the shutdown signal.
        match answer_type {
            AnswerType::Json | AnswerType::Svg => {
                let conversions = request
                    .epochs
                    .iter()
                    .enumerate()
                    .map(|(index, text)| convert_at(index, text))
                    .collect::<Result<Vec<_>, _>>()?;
                Ok((
                    "application/json",
                    json_bytes(
                        &BatchJson(&conversions, &forms),
                        conversion_bytes_hint(targets.len()) * conversions.len(),
                    )?,
                ))
            }
            AnswerType::Csv => {
                let mut out = Vec::with_capacity(64 * request.epochs.len());
                let names_model = uses_tdb(from, &targets);
                csv::push_header(&targets, &forms, names_model, &mut out);
                for (index, text) in request.epochs.iter().enumerate() {
                    csv::push_row(
                        text,
                        &convert_at(index, text)?,
                        &forms,
                        names_model,
                        &mut out,
                    );
                }
                Ok((CSV_CONTENT_TYPE, out))
            }
        }
    };
    compute(items, work).await.map(respond)
}

/// Refuses an observer on the Earth together with one near the Moon: an event is at one place.
fn one_observer(on_earth: bool, near_moon: bool, field: &str) -> Result<(), ApiError> {
    if on_earth && near_moon {
        return Err(ApiError::unprocessable(
            "invalid_observer",
            "give an observer on the Earth (for TDB - TT) or one near the Moon (for TCB - TCL), not both: an event is at one place",
        )
        .with_field(field));
    }
    Ok(())
}
