//! `POST /v1/clock/corrections`: relativistic periodic corrections of satellite clock data
//! (SP3 clock column, or RINEX clock with an SP3 orbit, or JSON series with states), the fitted
//! offset and rate of each corrected clock, answered as JSON or CSV.
//!
//! Design: one JSON body carries the texts (`sp3`, `rinex_clock`) as strings, so that both
//! files travel in one request without multipart; `series` is the JSON form.

pub mod compute;
pub mod types;

use axum::extract::State;
use axum::http::{header, HeaderMap};
use axum::response::{IntoResponse, Response};
use axum::routing::post;
use axum::{Json, Router};

use super::error::ApiError;
use super::extract::JsonBody;
use super::negotiate::{answer_type, AnswerType};
use super::state::AppState;
use types::{CorrectionsAnswer, CorrectionsRequest};

/// Routes `/v1/clock/corrections`.
pub fn router() -> Router<AppState> {
    Router::new().route("/v1/clock/corrections", post(corrections))
}

/// Relativistic periodic corrections of satellite clocks, and the fit of each corrected clock.
#[utoipa::path(post, path = "/v1/clock/corrections", tag = "clock",
    request_body(content = CorrectionsRequest, content_type = "application/json",
        description = "`sp3` (orbit and clock column), or `sp3` (orbit) with `rinex_clock`, or `series` (JSON clock values with states)."),
    responses(
        (status = 200, description = "Per satellite: fitted offset, rate and residual RMS of the corrected clock and (unless `include_series: false`) every epoch; warnings name what could not be answered. CSV when `Accept` prefers `text/csv`: one row per epoch (satellite, epoch, line, clock_s, conventional_s, j2_s, corrected_s, residual_s).",
            content((CorrectionsAnswer = "application/json"), (String = "text/csv"))),
        (status = 400, description = "The body is not the JSON request (`invalid_json`, `invalid_body`, `unreadable_body`)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 413, description = "Body above the configured limit (`body_too_large`)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 415, description = "Not application/json (`unsupported_media_type`)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 422, description = "The data cannot be used: `code` says why (input_missing, input_ambiguous, orbit_required, unknown_convention, unknown_scale, unknown_frame, nothing_to_correct, empty_batch, batch_too_large, not_finite, epochs_not_increasing, malformed_instant, impossible_date, the SP3 reader codes and rinex_clock_bad_header, rinex_clock_unsupported_version, rinex_clock_missing_end_of_header, rinex_clock_bad_record, rinex_clock_unsupported_time_system); `field` (`sp3`, `rinex_clock`, `series[k].samples[i]...`) and `line` say where", body = crate::api::error::Problem, content_type = "application/problem+json"),
        crate::api::error::TimeoutProblem))]
pub async fn corrections(
    State(state): State<AppState>,
    headers: HeaderMap,
    JsonBody(request): JsonBody<CorrectionsRequest>,
) -> Result<Response, ApiError> {
    let csv = answer_type(&headers) == AnswerType::Csv;
    let table = state.leap_table();
    let limits = state.limits().clone();
    let work = move || -> Result<Response, ApiError> {
        let answer = compute::correct(&request, &table, &limits)?;
        Ok(if csv {
            (
                [
                    (header::CONTENT_TYPE, "text/csv; charset=utf-8"),
                    (header::VARY, "accept"),
                ],
                to_csv(&answer),
            )
                .into_response()
        } else {
            ([(header::VARY, "accept")], Json(answer)).into_response()
        })
    };
    super::extract::compute(usize::MAX, work).await
}

/// One RFC 4180 row per corrected epoch (numbers in Rust's shortest round-trip form).
pub fn to_csv(answer: &CorrectionsAnswer) -> String {
    let mut out =
        String::from("satellite,epoch,line,clock_s,conventional_s,j2_s,corrected_s,residual_s\r\n");
    for satellite in &answer.satellites {
        for row in satellite.series.iter().flatten() {
            let line = row.line.map(|l| l.to_string()).unwrap_or_default();
            out.push_str(&format!(
                "{},{},{line},{:e},{:e},{:e},{:e},{:e}\r\n",
                csv_field(&satellite.id),
                row.epoch,
                row.clock_s,
                row.conventional_s,
                row.j2_s,
                row.corrected_s,
                row.residual_s
            ));
        }
    }
    out
}

fn csv_field(text: &str) -> String {
    if text.contains([',', '"', '\r', '\n']) {
        format!("\"{}\"", text.replace('"', "\"\""))
    } else {
        text.to_string()
    }
}
