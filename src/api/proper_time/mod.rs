//! `POST /v1/clock/proper-time`: proper time accumulated along an uploaded ephemeris
//! (JSON, CCSDS OEM in KVN form, SP3-c/d), answered as JSON or CSV.

mod answer;
mod body;
mod lunar;
mod lunar_options;
pub use body::ephemeris_problem;
mod options;
pub mod plot;
pub mod types;
mod types_lunar;

use axum::extract::State;
use axum::http::{header, HeaderMap};
use axum::response::{IntoResponse, Response};
use axum::routing::post;
use axum::{Json, Router};

use super::error::ApiError;
use super::extract::QueryParams;
use super::negotiate::{answer_type_among, AnswerType};
use super::state::AppState;
use types::ProperTimeOptionsInput;

/// Routes `/v1/clock/proper-time`.
pub fn router() -> Router<AppState> {
    Router::new().route("/v1/clock/proper-time", post(proper_time))
}

/// Proper time accumulated by each object's clock along an uploaded ephemeris.
#[utoipa::path(post, path = "/v1/clock/proper-time", tag = "clock",
    params(ProperTimeOptionsInput),
    request_body(description = "The ephemeris: JSON (application/json), CCSDS OEM KVN (application/ccsds-oem) or SP3-c/d (application/sp3); text/plain with `format`, or sniffed from the first line.",
        content(
            (types::EphemerisInput = "application/json", examples(
                ("geocentric" = (summary = "An invented low-orbit clock in the GCRF (TT reference)", value = json!({
                    "frame": "GCRF", "time_scale": "UTC",
                    "objects": [{"id": "KESTREL-1", "states": [
                        {"epoch": "2026-05-20T00:00:00", "position_m": [6828137.0, 0.0, 0.0], "velocity_m_s": [0.0, 4747.3, 5887.4]},
                        {"epoch": "2026-05-20T00:01:00", "position_m": [6816514.4, 284532.4, 352852.0], "velocity_m_s": [-387.4, 4739.2, 5877.4]}
                    ]}],
                    "options": {"reference": "TT", "interpolation_points": 2}}))),
                ("lunar" = (summary = "The invented lunar orbiter TERN-1 about the Moon (ICRF axes), against TL", value = json!({
                    "frame": "ICRF", "center": "moon", "time_scale": "TDB",
                    "objects": [{"id": "TERN-1", "states": [
                        {"epoch": "2026-05-20T00:00:00", "position_m": [1837400.0, 0.0, 0.0], "velocity_m_s": [0.0, 0.0, 1633.5]},
                        {"epoch": "2026-05-20T00:01:00", "position_m": [1834786.6, 0.0, 97963.8], "velocity_m_s": [-87.1, 0.0, 1631.2]}
                    ]}],
                    "options": {"reference": "TL", "interpolation_points": 2}})))
            )),
            (String = "application/ccsds-oem"),
            (String = "application/sp3"),
            (String = "text/plain"))),
    responses(
        (status = 200, description = "Per object: summary and series. CSV when `Accept` prefers `text/csv` to JSON and SVG: the series (object_id, epoch, elapsed_s, tau_minus_t_s, velocity_part_s, gravity_part_s, tidal_part_s, periodic_s, residual_s; tau - t = initial offset + velocity + gravity + tidal parts). SVG when `Accept` prefers `image/svg+xml`: a plot per object of tau - t with its velocity and gravity parts, on its own panel the periodic part and, with the tides (`j2_sun_moon`), on a third the tidal part, against the time since the object's first epoch (the series are drawn even with `include_series=false`; above 2 000 samples one in k is drawn, the CSV has all).",
            content((types::ProperTimeAnswer = "application/json"), (String = "text/csv"), (String = "image/svg+xml", example = "<svg xmlns=\"http://www.w3.org/2000/svg\" ...>...</svg>")),
            headers(("Vary" = String, description = "`accept`"))),
        (status = 400, description = "The query string cannot be read (`invalid_query`: an unknown parameter or `format`, a wrong type), the body is not UTF-8 (`unreadable_body`), or a body sent as application/json is not the JSON ephemeris (`invalid_json`, `invalid_body`)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 413, description = "Body above the configured limit (`body_too_large`)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 415, description = "A Content-Type the endpoint does not read (`unsupported_media_type`)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 422, description = "The ephemeris or an option cannot be used: `code` says why (a file that does not follow its format: unknown_ephemeris_format, json_invalid, the OEM and SP3 reader codes; unsupported_frame, unknown_scale, unsupported_time_scale (UT1), unknown_format, bad_epoch, mixed_velocity, not_finite, below_surface, beyond_model_range, speed_not_below_c, epochs_not_increasing, gap_too_long, too_few_states, sampling_too_coarse, bad_option, empty_batch, batch_too_large, unknown_reference, unknown_gravity_model, integration_failed; outside_ephemeris_span (a track beyond the planetary ephemeris in force when the Sun and Moon tide model is asked for by name; without a model the default falls back to J2 alone, with a note); unknown_tdb_model, outside_tdb_model_span (`tdb_model=ephemeris` for epochs outside 1959-12-30 to 2101-01-02 TT); for Earth-fixed tracks eop_before_table, eop_after_table: their epochs must lie inside the Earth orientation table in force; for selenocentric tracks (OEM CENTER_NAME = MOON, JSON center moon) frame_center_mismatch (a frame or reference of the other centre, or mixed centres), unknown_center, outside_ephemeris_span and outside_lunar_time_span via bad_epoch (epochs outside 1960-2100), below_surface (below the Moon's mean radius, 1 737 400 m), beyond_model_range (beyond 60 000 km from the Moon)); `line` (files), `object`, `index` and `field` say where", body = crate::api::error::Problem, content_type = "application/problem+json"),
        crate::api::error::TimeoutProblem))]
pub async fn proper_time(
    State(state): State<AppState>,
    QueryParams(query): QueryParams<ProperTimeOptionsInput>,
    headers: HeaderMap,
    body: Result<axum::body::Bytes, axum::extract::rejection::BytesRejection>,
) -> Result<Response, ApiError> {
    let body = body.map_err(|rejection| {
        if rejection.status() == axum::http::StatusCode::PAYLOAD_TOO_LARGE {
            super::extract::body_too_large()
        } else {
            ApiError::bad_request("unreadable_body", rejection.body_text())
        }
    })?;
    let kind = answer_type_among(
        &headers,
        &[AnswerType::Json, AnswerType::Csv, AnswerType::Svg],
    );
    let table = state.leap_table();
    let eop = state.eop_table();
    let ephemeris = state.ephemeris();
    let settings = state.limits().clone();
    let work = move || -> Result<Response, ApiError> {
        let mut request = body::read_request(&headers, query, &body, &table, &settings)?;
        // A plot draws the series, whatever `include_series` says.
        request.include_series |= kind == AnswerType::Svg;
        let answer = match &request.lunar {
            Some(lunar) => lunar::compute(&request, lunar, &table, &ephemeris)?,
            None => answer::compute(&request, &table, &eop, &ephemeris)?,
        };
        let text = match kind {
            AnswerType::Json => {
                return Ok(([(header::VARY, "accept")], Json(answer)).into_response())
            }
            AnswerType::Csv => answer::to_csv(&answer),
            AnswerType::Svg => super::plots::svg::to_svg(&plot::figure(&answer)),
        };
        Ok((
            [
                (header::CONTENT_TYPE, kind.content_type()),
                (header::VARY, "accept"),
            ],
            text,
        )
            .into_response())
    };
    tokio::task::spawn_blocking(work).await.map_err(|e| {
        ApiError::new(
            axum::http::StatusCode::INTERNAL_SERVER_ERROR,
            "internal",
            e.to_string(),
        )
    })?
}
