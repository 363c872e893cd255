//! `GET /v1/plots/scale-offsets`: the offsets between the time scales over a span of UTC
//! (TAI - UTC with its leap-second steps, the GNSS system times against UTC, TT - TAI,
//! TDB - TT, UT1 - UTC where the Earth orientation table covers the instant, and TCL - TT and
//! TL - TT at the Moon's centre inside the span of the lunar time relation, TL being a
//! proposal); SVG, or CSV when preferred.

use axum::extract::State;
use axum::http::HeaderMap;
use axum::response::Response;
use serde::Deserialize;
use utoipa::IntoParams;

use super::figure::{seconds_unit, short_iso, AxisUnit, Figure, Panel, Series, XTicks};
use super::{answer_plot, check_points};
use crate::api::error::ApiError;
use crate::api::extract::QueryParams;
use crate::api::state::AppState;
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::formats::{instant_from_day_reading, parse_iso, write_iso};
use crate::physics::time::instant::{DayReading, ATTOS_PER_DAY};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::lunar::TL_WARNING;
use crate::physics::time::offsets::{offsets_at, offsets_over_span, OffsetSample};
use crate::physics::time::scale::Scale;

/// Instants drawn when the query names no `points`: about 18 a year over the default span,
/// enough to show the annual term of TDB - TT.
pub const DEFAULT_POINTS: usize = 1_000;

/// Query of `GET /v1/plots/scale-offsets`.
#[derive(Debug, Clone, Default, Deserialize, IntoParams)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct ScaleOffsetsQuery {
    /// First UTC instant, ISO 8601 (`2026-03-14` or `2026-03-14T06:30:00`); default
    /// 1972-01-01, from 1960-01-01 on.
    #[param(value_type = Option<crate::api::earth::types::UtcIsoInstant>, example = "1972-01-01")]
    pub from: Option<String>,
    /// Last UTC instant, after `from`; default: the expiry date of the leap-second table in
    /// force.
    #[param(value_type = Option<crate::api::earth::types::UtcIsoInstant>, example = "2027-01-01")]
    pub to: Option<String>,
    /// Number of evenly spaced instants (2 to 5 000, default 1 000); two more at every
    /// leap-second step inside the span (23:59:59 before it and 0h after it).
    #[param(value_type = Option<u32>, minimum = 2, maximum = 5000, example = 1000)]
    pub points: Option<usize>,
}

/// Reads a UTC reading (MJD, time of day) of `field`.
fn utc_reading(
    text: &str,
    field: &str,
    context: &ConversionContext<'_>,
) -> Result<(i64, i128), ApiError> {
    let reading = parse_iso(text).map_err(|e| ApiError::from_time(&e, field))?;
    let mjd = reading.date.to_mjd();
    instant_from_day_reading(Scale::Utc, mjd, reading.seconds_of_day_attos, context.table)
        .map_err(|e| ApiError::from_time(&e, field))?;
    offsets_at(
        mjd,
        reading.seconds_of_day_attos.min(ATTOS_PER_DAY - 1),
        context,
    )
    .map_err(|e| ApiError::from_time(&e, field))?;
    Ok((mjd, reading.seconds_of_day_attos))
}

/// Reads the query and computes the samples.
pub fn samples(
    query: &ScaleOffsetsQuery,
    context: &ConversionContext<'_>,
) -> Result<Vec<OffsetSample>, ApiError> {
    let from = utc_reading(
        query.from.as_deref().unwrap_or("1972-01-01"),
        "from",
        context,
    )?;
    let to = match &query.to {
        Some(text) => utc_reading(text, "to", context)?,
        None => (context.table.expiry_mjd(), 0),
    };
    let points = check_points(query.points, DEFAULT_POINTS)?;
    let later = (to.0, to.1) > (from.0, from.1);
    if !later {
        return Err(ApiError::unprocessable(
            "bad_option",
            "to must be after from (both UTC instants)",
        )
        .with_field("to"));
    }
    offsets_over_span(from, to, points, context).map_err(|e| ApiError::from_time(&e, "to"))
}

fn iso_of(sample: &OffsetSample) -> String {
    write_iso(
        &DayReading {
            mjd: sample.utc_mjd,
            seconds_of_day_attos: sample.utc_seconds_of_day_attos,
            day_length_attos: ATTOS_PER_DAY,
        },
        3,
    )
}

/// Ticks on 1 January of every k-th year, the 1st of every k-th month, or every k-th day, as
/// the span needs (about eight ticks).
fn calendar_ticks(first_mjd: f64, last_mjd: f64) -> Vec<(f64, String)> {
    let span_days = last_mjd - first_mjd;
    let first = CalendarDate::from_mjd(first_mjd.floor() as i64);
    let last = CalendarDate::from_mjd(last_mjd.ceil() as i64);
    let mut out = Vec::new();
    if span_days >= 2.0 * 365.25 {
        let step = [1, 2, 5, 10, 20, 25, 50, 100]
            .into_iter()
            .find(|k| span_days / 365.25 / f64::from(*k) <= 10.0)
            .unwrap_or(100);
        let mut year = first.year
            + (i64::from(step) - first.year.rem_euclid(i64::from(step))) % i64::from(step);
        while year <= last.year {
            if let Some(date) = CalendarDate::new(year, 1, 1) {
                out.push((date.to_mjd() as f64, format!("{year}")));
            }
            year += i64::from(step);
        }
    } else if span_days >= 60.0 {
        let step = [1u32, 2, 3, 6]
            .into_iter()
            .find(|k| span_days / 30.44 / f64::from(*k) <= 10.0)
            .unwrap_or(6);
        let (mut year, mut month) = (first.year, first.month);
        while year <= last.year {
            if (month - 1) % step == 0 {
                if let Some(date) = CalendarDate::new(year, month, 1) {
                    out.push((date.to_mjd() as f64, format!("{year}-{month:02}")));
                }
            }
            month += 1;
            if month > 12 {
                month = 1;
                year += 1;
            }
        }
    } else {
        let step = [1i64, 2, 5, 7, 10, 14]
            .into_iter()
            .find(|k| span_days / *k as f64 <= 10.0)
            .unwrap_or(14);
        let mut mjd = first_mjd.floor() as i64;
        while (mjd as f64) <= last_mjd {
            if mjd.rem_euclid(step) == 0 {
                out.push((mjd as f64, CalendarDate::from_mjd(mjd).to_string()));
            }
            mjd += 1;
        }
    }
    out
}

fn series(name: &str, column: &str, values: Vec<Option<f64>>) -> Series {
    Series {
        name: name.to_string(),
        column: column.to_string(),
        values,
    }
}

/// The figure of the offsets.
pub fn figure(samples: &[OffsetSample], table: &LeapTable) -> Figure {
    let x: Vec<f64> = samples.iter().map(OffsetSample::utc_mjd_f64).collect();
    let take = |part: fn(&OffsetSample) -> f64| -> Vec<Option<f64>> {
        samples.iter().map(|s| Some(part(s))).collect()
    };
    let tdb = take(|s| s.tdb_minus_tt_s);
    let tdb_largest = tdb.iter().flatten().fold(0.0f64, |m, v| m.max(v.abs()));
    let mut panels = vec![
        Panel {
            x: x.clone(),
            heading: "Offsets of whole seconds: leap seconds step TAI - UTC and the GNSS times against UTC".to_string(),
            y_quantity: "offset".to_string(),
            y_unit: AxisUnit::new("s", 1.0),
            series: vec![
                series("TAI - UTC", "tai_minus_utc_s", take(|s| s.tai_minus_utc_s)),
                series("TT - TAI", "tt_minus_tai_s", take(|s| s.tt_minus_tai_s)),
                series("GPST - UTC (GST, QZSST the same)", "gpst_minus_utc_s", take(|s| s.gpst_minus_utc_s)),
                series("BDT - UTC", "bdt_minus_utc_s", take(|s| s.bdt_minus_utc_s)),
            ],
            marks: Vec::new(),
            zero_line: true,
        },
        Panel {
            x: x.clone(),
            heading: "TDB - TT at the geocentre (Fairhead & Bretagnon 1990 series)".to_string(),
            y_quantity: "TDB - TT".to_string(),
            y_unit: seconds_unit(tdb_largest),
            series: vec![series("TDB - TT", "tdb_minus_tt_s", tdb)],
            marks: Vec::new(),
            zero_line: true,
        },
    ];
    let ut1: Vec<Option<f64>> = samples.iter().map(|s| s.ut1_minus_utc_s).collect();
    panels.push(Panel {
        x: x.clone(),
        heading: if ut1.iter().any(Option::is_some) {
            "UT1 - UTC from the Earth orientation table (blank outside it)".to_string()
        } else {
            "UT1 - UTC: the Earth orientation table does not cover this span".to_string()
        },
        y_quantity: "UT1 - UTC".to_string(),
        y_unit: AxisUnit::new("s", 1.0),
        series: vec![series("UT1 - UTC", "ut1_minus_utc_s", ut1)],
        marks: Vec::new(),
        zero_line: true,
    });
    let tcl: Vec<Option<f64>> = samples.iter().map(|s| s.tcl_minus_tt_s).collect();
    let tl: Vec<Option<f64>> = samples.iter().map(|s| s.tl_minus_tt_s).collect();
    let lunar_largest = tcl
        .iter()
        .chain(&tl)
        .flatten()
        .fold(0.0f64, |m, v| m.max(v.abs()));
    panels.push(Panel {
        x: x.clone(),
        heading: if tcl.iter().any(Option::is_some) {
            "TCL - TT and TL - TT at the Moon's centre (TL is a proposal, not a standard; blank outside 1960-2100)".to_string()
        } else {
            "TCL - TT and TL - TT: the lunar time relation does not cover this span (1960-2100)".to_string()
        },
        y_quantity: "offset".to_string(),
        y_unit: seconds_unit(lunar_largest),
        series: vec![
            series("TCL - TT", "tcl_minus_tt_s", tcl),
            series("TL - TT (proposal)", "tl_minus_tt_s", tl),
        ],
        marks: Vec::new(),
        zero_line: true,
    });
    let first = samples
        .first()
        .map(|s| short_iso(&iso_of(s)))
        .unwrap_or_default();
    let last = samples
        .last()
        .map(|s| short_iso(&iso_of(s)))
        .unwrap_or_default();
    Figure {
        title: format!("Offsets between time scales, UTC {first} to {last}"),
        subtitle: format!(
            "reading of one scale minus the other for the same event; leap-second table: {}",
            table.source()
        ),
        x_quantity: "UTC".to_string(),
        x_column: "utc_mjd".to_string(),
        x_unit: AxisUnit::new("MJD; ticks at calendar dates", 1.0),
        x_ticks: XTicks::Given(calendar_ticks(
            x.first().copied().unwrap_or(0.0),
            x.last().copied().unwrap_or(1.0),
        )),
        labels: vec![
            ("utc".to_string(), samples.iter().map(iso_of).collect()),
            (
                "warnings".to_string(),
                samples
                    .iter()
                    .map(|s| match s.tl_minus_tt_s {
                        Some(_) => TL_WARNING.to_string(),
                        None => String::new(),
                    })
                    .collect(),
            ),
        ],
        panels,
    }
}

/// The offsets between the time scales over a span of UTC, as a plot.
#[utoipa::path(get, path = "/v1/plots/scale-offsets", tag = "plots",
    params(ScaleOffsetsQuery),
    responses(
        (status = 200, description = "The plot (SVG 1.1, self-contained), or when `Accept` prefers `text/csv` its numbers: utc, warnings (that TL is a proposal, not a standard, on the rows that give it), utc_mjd, tai_minus_utc_s, tt_minus_tai_s, gpst_minus_utc_s, bdt_minus_utc_s, tdb_minus_tt_s, ut1_minus_utc_s (empty outside the Earth orientation table), tcl_minus_tt_s and tl_minus_tt_s (at the Moon's centre; empty outside 1960-2100), one row per instant",
            content(
                (String = "image/svg+xml", example = "<svg xmlns=\"http://www.w3.org/2000/svg\" ...>...</svg>"),
                (String = "text/csv", example = "utc,warnings,utc_mjd,tai_minus_utc_s,tt_minus_tai_s,gpst_minus_utc_s,bdt_minus_utc_s,tdb_minus_tt_s,ut1_minus_utc_s,tcl_minus_tt_s,tl_minus_tt_s\n2020-01-01T00:00:00.000,\"TL (lunar surface time) is a proposal, not a standard: ...\",58849,37,32.184,18,4,-0.00010131283377201594,-0.1771665,0.9224961523738299,0.8798915706611172\n")),
            headers(("Vary" = String, description = "`accept`"))),
        (status = 400, description = "The query string cannot be read (`invalid_query`: an unknown parameter, a value of the wrong type)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 422, description = "`from` or `to` is not an ISO UTC instant from 1960 on (`malformed_instant`, `impossible_date`, `invalid_leap_second`, `utc_before_1960`, `instant_out_of_range`), `to` not after `from` or `points` outside 2 to 5 000 (`bad_option`); `field` names it", body = crate::api::error::Problem, content_type = "application/problem+json"),
        crate::api::error::TimeoutProblem))]
pub async fn scale_offsets(
    State(state): State<AppState>,
    QueryParams(query): QueryParams<ScaleOffsetsQuery>,
    headers: HeaderMap,
) -> Result<Response, ApiError> {
    let table = state.leap_table();
    let eop = state.eop_table();
    let work = move || -> Result<Response, ApiError> {
        let context = ConversionContext::geocentric(&table).with_ut1(eop.as_ref());
        let samples = samples(&query, &context)?;
        Ok(answer_plot(&headers, &figure(&samples, &table)))
    };
    tokio::task::spawn_blocking(work).await.map_err(|e| {
        ApiError::new(
            axum::http::StatusCode::INTERNAL_SERVER_ERROR,
            "internal",
            e.to_string(),
        )
    })?
}
