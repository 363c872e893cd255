//! `POST /v1/clock/stability`.

use axum::http::{header, HeaderMap};
use axum::response::{IntoResponse, Response};

use super::types::{StabilityAnswer, StabilityBody, StabilityPoint};
use crate::api::error::{ApiError, JsonBodyProblems, Problem, TimeoutProblem};
use crate::api::extract::{compute, JsonBody};
use crate::api::names::parse_named;
use crate::api::negotiate::{answer_type, AnswerType};
use crate::api::time::csv::CSV_CONTENT_TYPE;
use crate::physics::readable::readable;
use crate::physics::stability::{
    analyse, DataKind, Deviation, Estimate, StabilityErrorKind, StabilityRequest,
};

/// Default two-sided confidence level ("1 sigma").
pub const DEFAULT_CONFIDENCE: f64 = 0.683;
/// Relative tolerance of an even spacing and of a whole multiple of tau0 (common practice).
const SPACING_TOLERANCE: f64 = 1e-6;

/// CSV header of the answer.
pub const CSV_HEADER: &str =
    "deviation,tau_s,factor,value,terms,noise_alpha,noise_identified,edf,edf_method,low,high\r\n";

const CSV_EXAMPLE: &str = "deviation,tau_s,factor,value,terms,noise_alpha,noise_identified,edf,edf_method,low,high\r\nadev,1.0,1,91.22944973544973,8,0,false,4.536412677211182,howe_allan_barnes,71.35097738394227,133.9398127963584\r\n";

fn tau0_and_checks(body: &StabilityBody) -> Result<f64, ApiError> {
    let Some(times) = &body.times_s else {
        let tau0 = body.tau0_s.ok_or_else(|| {
            ApiError::unprocessable(
                StabilityErrorKind::NonUniformSampling.as_str(),
                "give the sampling interval `tau0_s`, or the time tags `times_s`",
            )
            .with_field("tau0_s")
        })?;
        return Ok(tau0);
    };
    if times.len() != body.values.len() {
        return Err(ApiError::unprocessable(
            StabilityErrorKind::NonUniformSampling.as_str(),
            format!(
                "`times_s` has {} time tags for {} values; give one per value",
                times.len(),
                body.values.len()
            ),
        )
        .with_field("times_s"));
    }
    let first_step = match times.as_slice() {
        [a, b, ..] => b - a,
        _ => body.tau0_s.unwrap_or(1.0),
    };
    let tau0 = body.tau0_s.unwrap_or(first_step);
    if !(tau0.is_finite() && tau0 > 0.0) {
        return Err(ApiError::unprocessable(
            StabilityErrorKind::NonUniformSampling.as_str(),
            format!(
                "the sampling interval must be positive, not {} s",
                readable(tau0)
            ),
        )
        .with_field(if body.tau0_s.is_some() {
            "tau0_s"
        } else {
            "times_s[1]"
        }));
    }
    for (index, pair) in times.windows(2).enumerate() {
        let step = pair[1] - pair[0];
        let ratio = step / tau0;
        if (ratio - 1.0).abs() <= SPACING_TOLERANCE {
            continue;
        }
        let whole = ratio.round();
        let (code, detail) = if whole >= 2.0 && (ratio - whole).abs() <= SPACING_TOLERANCE * whole {
            (
                StabilityErrorKind::GapInSeries,
                format!(
                    "times_s[{}] follows times_s[{index}] by {} tau0: {} missing samples; gaps are not filled, send each gap-free stretch as its own request",
                    index + 1,
                    whole,
                    whole - 1.0
                ),
            )
        } else {
            (
                StabilityErrorKind::NonUniformSampling,
                format!(
                    "times_s[{}] follows times_s[{index}] by {} s, not tau0 = {} s; the deviations need evenly spaced samples",
                    index + 1,
                    readable(step),
                    readable(tau0)
                ),
            )
        };
        return Err(ApiError::unprocessable(code.as_str(), detail)
            .with_field(format!("times_s[{}]", index + 1)));
    }
    Ok(tau0)
}

fn factors(tau_s: &[f64], tau0_s: f64) -> Result<Vec<usize>, ApiError> {
    tau_s
        .iter()
        .enumerate()
        .map(|(index, &tau)| {
            let ratio = tau / tau0_s;
            let whole = ratio.round();
            let whole_multiple = ratio.is_finite()
                && (1.0..=1e12).contains(&whole)
                && (ratio - whole).abs() <= SPACING_TOLERANCE * whole;
            if whole_multiple {
                Ok(whole as usize)
            } else {
                Err(ApiError::unprocessable(
                    StabilityErrorKind::TauNotMultiple.as_str(),
                    format!(
                        "the averaging time {} s is not a whole multiple of tau0 = {} s (at least 1)",
                        readable(tau),
                        readable(tau0_s)
                    ),
                )
                .with_field(format!("tau_s[{index}]")))
            }
        })
        .collect()
}

fn point(e: &Estimate) -> StabilityPoint {
    StabilityPoint {
        deviation: e.deviation.as_str(),
        tau_s: e.tau_s,
        factor: e.factor,
        value: e.value,
        terms: e.terms,
        noise_alpha: e.noise_alpha,
        noise_identified: e.noise_identified,
        edf: e.edf,
        edf_method: e.edf_method.as_str(),
        low: e.low,
        high: e.high,
    }
}

/// The answer as CSV (RFC 4180), one row per deviation and tau.
pub fn csv_rows(points: &[StabilityPoint]) -> Vec<u8> {
    let mut out = String::with_capacity(CSV_HEADER.len() + 120 * points.len());
    out.push_str(CSV_HEADER);
    for p in points {
        out.push_str(&format!(
            "{},{:?},{},{:?},{},{},{},{:?},{},{:?},{:?}\r\n",
            p.deviation,
            p.tau_s,
            p.factor,
            p.value,
            p.terms,
            p.noise_alpha,
            p.noise_identified,
            p.edf,
            p.edf_method,
            p.low,
            p.high
        ));
    }
    out.into_bytes()
}

/// Frequency stability of a clock: Allan, overlapping Allan, modified Allan, time, Hadamard,
/// overlapping Hadamard and total deviations (NIST SP 1065) of a phase or fractional-frequency
/// series at a fixed interval, with the number of terms and chi-squared confidence intervals
/// from equivalent degrees of freedom.
#[utoipa::path(post, path = "/v1/clock/stability", tag = "clock",
    request_body = StabilityBody,
    responses(
        (status = 200, description = "The deviations at each averaging time: JSON, or CSV (RFC 4180: a header row, then one row per deviation and tau) when `Accept` prefers `text/csv`", content(
            (StabilityAnswer = "application/json"),
            (String = "text/csv", example = json!(CSV_EXAMPLE)))),
        JsonBodyProblems,
        (status = 422, description = "A value cannot be used; `field` names it (e.g. `values[17]`, `tau_s[2]`, `deviations[0]`, `times_s[5]`) and `code` says why: unknown_data_kind, unknown_deviation, empty_series, gap_in_series (a null value or a step of several tau0 in `times_s`), not_finite_sample, series_too_short (an averaging time beyond what the series allows for a deviation; the detail gives the longest), tau_not_multiple, non_uniform_sampling (uneven `times_s`, or no `tau0_s`), invalid_confidence", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn stability(
    headers: HeaderMap,
    JsonBody(body): JsonBody<StabilityBody>,
) -> Result<Response, ApiError> {
    let kind: DataKind = parse_named(&body.kind, "unknown_data_kind", "data kind", "kind")?;
    let deviations: Vec<Deviation> = match &body.deviations {
        None => Deviation::ALL.to_vec(),
        Some(names) if names.is_empty() => {
            return Err(ApiError::unprocessable(
                "unknown_deviation",
                "`deviations` names no deviation; name at least one, or leave it out for all",
            )
            .with_field("deviations"))
        }
        Some(names) => names
            .iter()
            .enumerate()
            .map(|(i, n)| {
                parse_named(
                    n,
                    "unknown_deviation",
                    "deviation",
                    format!("deviations[{i}]"),
                )
            })
            .collect::<Result<_, _>>()?,
    };
    if let Some(index) = body.values.iter().position(Option::is_none) {
        return Err(ApiError::unprocessable(
            StabilityErrorKind::GapInSeries.as_str(),
            format!("values[{index}] is null, a missing sample; gaps are not filled: send each gap-free stretch as its own request"),
        )
        .with_field(format!("values[{index}]")));
    }
    let tau0_s = tau0_and_checks(&body)?;
    let factors = body
        .tau_s
        .as_deref()
        .map(|t| factors(t, tau0_s))
        .transpose()?;
    let confidence = body.confidence.unwrap_or(DEFAULT_CONFIDENCE);
    let answer_type = answer_type(&headers);
    let items = body.values.len();
    let work = move || {
        let values: Vec<f64> = body.values.iter().map(|v| v.unwrap_or(f64::NAN)).collect();
        let estimates = analyse(&StabilityRequest {
            kind,
            values: &values,
            tau0_s,
            deviations: &deviations,
            factors: factors.as_deref(),
            confidence,
        })
        .map_err(|e| {
            let field = match (e.kind, e.index) {
                (StabilityErrorKind::NotFiniteSample, Some(i)) => format!("values[{i}]"),
                (
                    StabilityErrorKind::SeriesTooShort | StabilityErrorKind::TauNotMultiple,
                    Some(i),
                ) if body.tau_s.is_some() => {
                    format!("tau_s[{i}]")
                }
                (StabilityErrorKind::InvalidConfidence, _) => "confidence".to_string(),
                (StabilityErrorKind::NonUniformSampling, _) => "tau0_s".to_string(),
                _ => "values".to_string(),
            };
            ApiError::unprocessable(e.kind.as_str(), e.message).with_field(field)
        })?;
        let results: Vec<StabilityPoint> = estimates.iter().map(point).collect();
        Ok(match answer_type {
            AnswerType::Csv => (CSV_CONTENT_TYPE, csv_rows(&results)),
            // `answer_type` offers JSON and CSV only; SVG is never chosen here.
            AnswerType::Json | AnswerType::Svg => {
                let answer = StabilityAnswer {
                    kind: kind.as_str(),
                    tau0_s,
                    values: values.len(),
                    phase_points: values.len() + usize::from(kind == DataKind::Frequency),
                    confidence,
                    results,
                };
                let bytes = serde_json::to_vec(&answer).map_err(|e| {
                    ApiError::unprocessable(
                        "not_finite_sample",
                        format!("the answer cannot be written: {e}"),
                    )
                    .with_field("values")
                })?;
                ("application/json", bytes)
            }
        })
    };
    let (content_type, bytes) = compute(items, work).await?;
    Ok((
        [
            (header::CONTENT_TYPE, content_type),
            (header::VARY, "accept"),
        ],
        bytes,
    )
        .into_response())
}
