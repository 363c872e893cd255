//! `GET /v1/time/scales`, `GET /v1/time/leap-seconds` and `GET /v1/time/now`.

use std::hash::{Hash, Hasher};

use axum::extract::State;
use axum::http::{header, HeaderMap, HeaderValue, StatusCode};
use axum::response::{IntoResponse, Response};
use serde::Serialize;
use utoipa::ToSchema;

use super::conversion::{convert_one_observed, FieldName};
use super::forms::FormSelection;
use super::json_view::{conversion_bytes_hint, json_bytes, ConversionJson};
use super::lunar_observer::parse_lunar_observer_query;
use super::types::{Conversion, NowQuery};
use crate::api::error::{ApiError, QueryProblems};
use crate::api::extract::QueryParams;
use crate::api::state::unix_now_s;
use crate::api::state::AppState;
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::formats::{gnss_week_origin_mjd, InstantFormat};
use crate::physics::time::scale::Scale;

/// One time scale.
#[derive(Debug, Serialize, ToSchema)]
pub struct ScaleInfo {
    /// Abbreviation used in requests.
    pub name: String,
    /// Full name.
    pub full_name: String,
    /// What realizes the scale.
    pub realized_by: String,
    /// How it relates to the other scales.
    pub relation: String,
    /// Whether the scale has leap seconds (only UTC).
    pub has_leap_seconds: bool,
    /// Whether the scale needs the Earth orientation table (only UT1): it is answered only for
    /// epochs the table covers (`GET /v1/earth/eop` shows its span), and `all` targets leave
    /// it out.
    pub needs_earth_orientation: bool,
    /// Start of week 0 (ISO date, in the scale) for GNSS scales.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub week_zero_start: Option<String>,
}

/// All scales.
#[derive(Debug, Serialize, ToSchema)]
pub struct ScaleList {
    /// The scales in the engine's order.
    pub scales: Vec<ScaleInfo>,
}

/// One entry of the leap-second table.
#[derive(Debug, Serialize, ToSchema)]
pub struct LeapEntry {
    /// First UTC day of the entry (ISO date).
    pub utc_date: String,
    /// MJD of that day.
    pub mjd: i64,
    /// TAI - UTC from that day on, in seconds (the constant part in the drift era).
    pub tai_minus_utc_s: f64,
    /// Drift era (1961-1971): TAI - UTC = tai_minus_utc_s + (MJD - drift_reference_mjd) * drift_s_per_day.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub drift_reference_mjd: Option<f64>,
    /// Drift rate in seconds per day (drift era only).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub drift_s_per_day: Option<f64>,
}

/// The leap-second table in use.
#[derive(Debug, Serialize, ToSchema)]
pub struct LeapSecondTable {
    /// Where the table came from.
    pub source: String,
    /// Expiry date (ISO): answers for later UTC instants carry a warning.
    pub expires: String,
    /// MJD of the expiry date.
    pub expires_mjd: i64,
    /// Days from now to expiry (negative once expired).
    pub expires_in_days: f64,
    /// The entries, oldest first.
    pub entries: Vec<LeapEntry>,
}

/// The ISO date (`YYYY-MM-DD`) of the UTC day `mjd`.
pub fn iso_date(mjd: i64) -> String {
    let date = CalendarDate::from_mjd(mjd);
    date.to_string()
}

/// Answers a reference document with an ETag derived from `tag_basis`, or 304 when the
/// client's copy (If-None-Match) is current.
fn with_etag<T: Serialize>(headers: &HeaderMap, tag_basis: &[u8], body: &T) -> Response {
    let bytes = serde_json::to_vec(body).unwrap_or_default();
    let mut hasher = std::collections::hash_map::DefaultHasher::new();
    tag_basis.hash(&mut hasher);
    // A weak validator (RFC 9110 8.8.1): the answer may be sent gzip-compressed or not, so the
    // bytes differ while the representation's meaning does not.
    let opaque = format!("\"{:016x}\"", hasher.finish());
    let tag = format!("W/{opaque}");
    let matches = headers
        .get(header::IF_NONE_MATCH)
        .and_then(|value| value.to_str().ok())
        .is_some_and(|value| {
            // If-None-Match uses the weak comparison (RFC 9110 13.1.2): W/ prefixes are ignored.
            value
                .split(',')
                .map(str::trim)
                .any(|candidate| candidate == "*" || candidate.trim_start_matches("W/") == opaque)
        });
    let etag = HeaderValue::from_str(&tag).unwrap_or_else(|_| HeaderValue::from_static("\"0\""));
    let cache = HeaderValue::from_static("public, max-age=300");
    if matches {
        return (
            StatusCode::NOT_MODIFIED,
            [(header::ETAG, etag), (header::CACHE_CONTROL, cache)],
        )
            .into_response();
    }
    (
        [
            (header::ETAG, etag),
            (header::CACHE_CONTROL, cache),
            (
                header::CONTENT_TYPE,
                HeaderValue::from_static("application/json"),
            ),
        ],
        bytes,
    )
        .into_response()
}

/// The time scales, what realizes each and how they relate.
#[utoipa::path(get, path = "/v1/time/scales", tag = "time",
    params(("If-None-Match" = Option<String>, Header, nullable = false, description = "ETags of the client's copies, comma-separated (`W/` prefixes ignored) or `*`; a match answers 304")),
    responses(
        (status = 200, description = "The scales (with an ETag)", body = ScaleList,
            headers(("ETag" = String, description = "Weak validator of the list"), ("Cache-Control" = String, description = "`public, max-age=300`"))),
        (status = 304, description = "The client's copy (If-None-Match) is current",
            headers(("ETag" = String, description = "Weak validator of the list"), ("Cache-Control" = String, description = "`public, max-age=300`")))))]
pub async fn scales(headers: HeaderMap) -> Response {
    let scales = Scale::ALL
        .into_iter()
        .map(|scale| ScaleInfo {
            name: scale.as_str().to_string(),
            full_name: scale.full_name().to_string(),
            realized_by: scale.realized_by().to_string(),
            relation: scale.relation().to_string(),
            has_leap_seconds: scale == Scale::Utc,
            needs_earth_orientation: scale.needs_earth_orientation(),
            week_zero_start: gnss_week_origin_mjd(scale).map(iso_date),
        })
        .collect();
    let body = ScaleList { scales };
    let basis = serde_json::to_vec(&body).unwrap_or_default();
    with_etag(&headers, &basis, &body)
}

/// The leap-second table in use, its source and its expiry.
#[utoipa::path(get, path = "/v1/time/leap-seconds", tag = "time",
    params(("If-None-Match" = Option<String>, Header, nullable = false, description = "ETags of the client's copies, comma-separated (`W/` prefixes ignored) or `*`; a match answers 304")),
    responses(
        (status = 200, description = "The table (with an ETag)", body = LeapSecondTable,
            headers(("ETag" = String, description = "Weak validator of the table (not of the countdown)"), ("Cache-Control" = String, description = "`public, max-age=300`"))),
        (status = 304, description = "The client's copy (If-None-Match) is current",
            headers(("ETag" = String, description = "Weak validator of the table (not of the countdown)"), ("Cache-Control" = String, description = "`public, max-age=300`")))))]
pub async fn leap_seconds(State(state): State<AppState>, headers: HeaderMap) -> Response {
    let table = state.leap_table();
    let entries = table
        .steps()
        .iter()
        .map(|step| {
            let drifting = step.drift_s_per_day != 0.0;
            LeapEntry {
                utc_date: iso_date(step.utc_mjd),
                mjd: step.utc_mjd,
                tai_minus_utc_s: step.offset_s,
                drift_reference_mjd: drifting.then_some(step.drift_reference_mjd),
                drift_s_per_day: drifting.then_some(step.drift_s_per_day),
            }
        })
        .collect();
    let body = LeapSecondTable {
        source: table.source().to_string(),
        expires: iso_date(table.expiry_mjd()),
        expires_mjd: table.expiry_mjd(),
        expires_in_days: (table.days_to_expiry(unix_now_s()) * 1000.0).round() / 1000.0,
        entries,
    };
    // The countdown changes with every request; the ETag covers the table itself.
    let basis =
        serde_json::to_vec(&(&body.source, &body.expires, &body.entries)).unwrap_or_default();
    with_etag(&headers, &basis, &body)
}

/// The current instant in every scale, from this server's system clock (for dashboards).
#[utoipa::path(get, path = "/v1/time/now", tag = "time",
    params(NowQuery),
    responses(
        (status = 200, description = "Now, in every scale (never cached)", body = Conversion,
            headers(("Cache-Control" = String, description = "`no-store`"))),
        QueryProblems,
        (status = 422, description = "A name in `forms` is not a form (`unknown_format`, `field` names it), `tdb_model` is not a model (`unknown_tdb_model`), `selenocentric_observer_m` lies below the lunar surface (`below_surface`) or beyond 60 000 km from the Moon (`beyond_model_range`), or the server's clock reads outside the span of `tdb_model=ephemeris` (`outside_tdb_model_span`) or of TCL and TL (`outside_lunar_time_span`, after 2101-01-02)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 503, description = "The server's clock reads before 1970 (`clock_unavailable`), or the request took longer than the configured timeout (`request_timeout`)", body = crate::api::error::Problem, content_type = "application/problem+json")))]
pub async fn now(
    State(state): State<AppState>,
    QueryParams(query): QueryParams<NowQuery>,
) -> Result<Response, ApiError> {
    let forms = FormSelection::from_query(query.forms.as_deref(), "forms")?;
    let tdb_model = crate::api::names::parse_tdb_model(query.tdb_model.as_deref(), "tdb_model")?;
    let since_epoch = std::time::SystemTime::now()
        .duration_since(std::time::UNIX_EPOCH)
        .map_err(|_| {
            ApiError::new(
                StatusCode::SERVICE_UNAVAILABLE,
                "clock_unavailable",
                "the server's clock reads before 1970",
            )
        })?;
    let text = format!(
        "{}.{:09}",
        since_epoch.as_secs(),
        since_epoch.subsec_nanos()
    );
    let lunar = query
        .selenocentric_observer_m
        .as_deref()
        .map(|text| parse_lunar_observer_query(text, state.ephemeris(), "selenocentric_observer_m"))
        .transpose()?;
    let table = state.leap_table();
    let context = ConversionContext::geocentric(&table).with_tdb_model(tdb_model);
    let conversion = convert_one_observed(
        &text,
        InstantFormat::UnixS,
        Scale::Utc,
        &Scale::without_earth_orientation().collect::<Vec<_>>(),
        &context,
        FieldName::Named("now"),
        lunar.as_ref(),
    )?;
    let body = json_bytes(
        &ConversionJson(&conversion, &forms),
        conversion_bytes_hint(Scale::ALL.len()),
    )?;
    Ok((
        [
            (header::CACHE_CONTROL, "no-store"),
            (header::CONTENT_TYPE, "application/json"),
        ],
        body,
    )
        .into_response())
}
