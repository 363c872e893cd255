//! Reading a proper-time request: the body format, the ephemeris and the options.

use axum::http::{header, HeaderMap, StatusCode};

use super::options::check_options;
use super::types::{ProperTimeBodyOptions, ProperTimeOptionsInput};
use crate::api::clock::evaluate::{parse_gravity_model, parse_reference};
use crate::api::error::ApiError;
use crate::api::extract::{check_batch_size, parse_json};
use crate::api::names::{one_of, parse_tdb_model};
use crate::api::state::Limits;
use crate::physics::constants::MAX_GEOCENTRIC_DISTANCE_M;
use crate::physics::gravity::GravityModel;
use crate::physics::lunar_orbit::TrajectoryCenter;
use crate::physics::moon::gravity::LunarGravityModel;
use crate::physics::rate::RateErrorKind;
use crate::physics::rate::RateReference;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::tdb_model::TdbModel;
use crate::trajectory::json::{from_document, JsonEphemeris};
use crate::trajectory::sp3::read_sp3_about;
use crate::trajectory::{read_oem, Frame, InterpolationOptions, TrajectoryError, TrajectorySet};

/// The formats the endpoint reads.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
enum BodyFormat {
    Json,
    Oem,
    Sp3,
}

/// A request, read and checked.
pub struct ProperTimeRequest {
    /// The ephemeris.
    pub ephemeris: TrajectorySet,
    /// TT or TCG.
    pub reference: RateReference,
    /// The potential model asked for; `None`: the default, the Sun and Moon tides with J2
    /// (`j2_sun_moon`) where the planetary ephemeris covers the tracks, J2 elsewhere.
    pub gravity_model: Option<GravityModel>,
    /// Interpolation window, gap limit and output grid.
    pub interpolation: InterpolationOptions,
    /// tau - t at the first epoch, s.
    pub initial_offset_s: f64,
    /// Whether to answer the series.
    pub include_series: bool,
    /// The model of TDB - TT (TDB and TCB epochs, the TDB of the Sun and the Moon).
    pub tdb_model: TdbModel,
    /// For a selenocentric ephemeris: its reference and field (then `reference` and
    /// `gravity_model` above are not used).
    pub lunar: Option<super::lunar_options::LunarOptions>,
}

/// An ephemeris error as a 422 problem naming the line, object and index.
pub fn ephemeris_problem(error: TrajectoryError) -> ApiError {
    let problem = ApiError::unprocessable(error.code, error.message)
        .with_line(error.line)
        .with_object(error.object, error.index);
    match error.field {
        Some(field) => problem.with_field(field),
        None => problem,
    }
}

fn format_from_name(name: &str) -> Result<BodyFormat, ApiError> {
    one_of(
        name,
        &[
            ("json", BodyFormat::Json),
            ("oem", BodyFormat::Oem),
            ("sp3", BodyFormat::Sp3),
        ],
    )
    .ok_or_else(|| {
        ApiError::bad_request(
            "invalid_query",
            format!(
                "unknown ephemeris format `{name}`; expected json, oem or sp3 (written exactly so)"
            ),
        )
        .with_field("format")
    })
}

/// Whether the Content-Type declares JSON (then a body that is not the JSON ephemeris is a
/// 400, as for every JSON body; a JSON text sent as a file type is a 422 like any bad file).
fn declared_json(headers: &HeaderMap) -> bool {
    headers
        .get(header::CONTENT_TYPE)
        .and_then(|value| value.to_str().ok())
        .and_then(|value| value.split(';').next())
        .is_some_and(|media| {
            let media = media.trim().to_ascii_lowercase();
            media == "application/json" || media.ends_with("+json")
        })
}

/// Refuses positions beyond the geocentric range of the rate model (the Earth's Hill sphere,
/// 1.5e9 m), where the Sun's potential, not in the model, dominates.
fn check_geocentric_range(ephemeris: &TrajectorySet) -> Result<(), ApiError> {
    for object in &ephemeris.objects {
        for (index, state) in object.states.iter().enumerate() {
            let p = state.position_m;
            let radius_m = (p[0] * p[0] + p[1] * p[1] + p[2] * p[2]).sqrt();
            if radius_m > MAX_GEOCENTRIC_DISTANCE_M {
                return Err(ApiError::unprocessable(
                    "beyond_model_range",
                    format!(
                        "the geocentric distance is {radius_m:e} m, beyond the Earth's Hill sphere ({MAX_GEOCENTRIC_DISTANCE_M:e} m), where this geocentric model does not apply"
                    ),
                )
                .with_object(Some(object.id.clone()), Some(index)));
            }
        }
    }
    Ok(())
}

fn sniff(body: &str) -> Result<BodyFormat, ApiError> {
    let start = body.trim_start_matches('\u{feff}').trim_start();
    if start.starts_with('{') {
        Ok(BodyFormat::Json)
    } else if start.starts_with("CCSDS_OEM_VERS") {
        Ok(BodyFormat::Oem)
    } else if start.starts_with("#c") || start.starts_with("#d") {
        Ok(BodyFormat::Sp3)
    } else {
        Err(ApiError::unprocessable(
            "unknown_ephemeris_format",
            "cannot tell the ephemeris format: expected a JSON object, a CCSDS OEM starting with CCSDS_OEM_VERS, or an SP3-c/d file starting with #c or #d (or say it with ?format=)",
        )
        .with_line(Some(1)))
    }
}

fn body_format(
    headers: &HeaderMap,
    query: Option<&str>,
    body: &str,
) -> Result<BodyFormat, ApiError> {
    if let Some(name) = query {
        return format_from_name(name);
    }
    let media = headers
        .get(header::CONTENT_TYPE)
        .and_then(|value| value.to_str().ok())
        .and_then(|value| value.split(';').next())
        .map(|media| media.trim().to_ascii_lowercase());
    match media.as_deref() {
        Some("application/json") => Ok(BodyFormat::Json),
        Some(m) if m.ends_with("+json") => Ok(BodyFormat::Json),
        Some("application/ccsds-oem" | "application/x-ccsds-oem" | "text/x-ccsds-oem") => {
            Ok(BodyFormat::Oem)
        }
        Some("application/sp3" | "application/x-sp3" | "text/x-sp3") => Ok(BodyFormat::Sp3),
        None | Some("text/plain" | "application/octet-stream") => sniff(body),
        Some(other) => Err(ApiError::new(
            StatusCode::UNSUPPORTED_MEDIA_TYPE,
            "unsupported_media_type",
            format!("cannot read a body of type {other}; send application/json, application/ccsds-oem, application/sp3 or text/plain"),
        )),
    }
}

/// Body options override query options field by field (each source checked on its own first).
fn merge(
    query: ProperTimeOptionsInput,
    body: Option<ProperTimeOptionsInput>,
) -> ProperTimeOptionsInput {
    let Some(body) = body else { return query };
    ProperTimeOptionsInput {
        format: body.format.or(query.format),
        reference: body.reference.or(query.reference),
        gravity_model: body.gravity_model.or(query.gravity_model),
        step_s: body.step_s.or(query.step_s),
        initial_offset_s: body.initial_offset_s.or(query.initial_offset_s),
        interpolation_points: body.interpolation_points.or(query.interpolation_points),
        max_gap_s: body.max_gap_s.or(query.max_gap_s),
        include_series: body.include_series.or(query.include_series),
        tdb_model: body.tdb_model.or(query.tdb_model),
        center: query.center,
    }
}

/// The `center` query parameter (422 `unknown_center` naming `center` for an unknown name).
fn parse_center(name: Option<&str>) -> Result<Option<TrajectoryCenter>, ApiError> {
    name.map(|name| crate::trajectory::lunar::parse_center(name).map_err(ephemeris_problem))
        .transpose()
}

/// A centre named in the query must be the file's own (OEM `CENTER_NAME`, JSON `center`; SP3
/// was read about it): 422 `frame_center_mismatch` naming `center` otherwise.
fn check_named_center(ephemeris: &TrajectorySet, center: TrajectoryCenter) -> Result<(), ApiError> {
    let lunar = |frame: Frame| frame == Frame::LunarInertial;
    match ephemeris
        .objects
        .iter()
        .find(|track| lunar(track.frame) != (center == TrajectoryCenter::Moon))
    {
        None => Ok(()),
        Some(track) => Err(ApiError::unprocessable(
            "frame_center_mismatch",
            format!(
                "center is {} but the file gives object {} about the {}; OEM (CENTER_NAME) and JSON (center) name their centre themselves",
                center.as_str(),
                track.id,
                if lunar(track.frame) { "Moon" } else { "Earth" }
            ),
        )
        .with_field("center")),
    }
}

/// Reads the body in its format and resolves the options.
pub fn read_request(
    headers: &HeaderMap,
    query: ProperTimeOptionsInput,
    body: &[u8],
    table: &LeapTable,
    settings: &Limits,
) -> Result<ProperTimeRequest, ApiError> {
    let text = std::str::from_utf8(body).map_err(|e| {
        ApiError::bad_request(
            "unreadable_body",
            format!("the body is not UTF-8 text: {e}"),
        )
    })?;
    check_options(&query, "")?;
    let center = parse_center(query.center.as_deref())?;
    let query_model = parse_tdb_model(query.tdb_model.as_deref(), "tdb_model")?;
    let context = ConversionContext::geocentric(table).with_tdb_model(query_model);
    let (ephemeris, options) = match body_format(headers, query.format.as_deref(), text)? {
        BodyFormat::Json => {
            let input: JsonEphemeris<ProperTimeBodyOptions> = if declared_json(headers) {
                parse_json(body)?
            } else {
                parse_json(body).map_err(|error| {
                    ApiError::unprocessable("json_invalid", error.problem().detail.clone())
                        .with_line(Some(1))
                })?
            };
            if let Some(name) = input.options.as_ref().and_then(|o| o.format.as_deref()) {
                format_from_name(name).map_err(|_| {
                    ApiError::unprocessable(
                        "bad_option",
                        format!("unknown ephemeris format `{name}`; expected json, oem or sp3"),
                    )
                    .with_field("options.format")
                })?;
            }
            let body_options = input.options.clone().map(ProperTimeOptionsInput::from);
            if let Some(body_options) = &body_options {
                check_options(body_options, "options.")?;
            }
            let model = body_options
                .as_ref()
                .and_then(|options| options.tdb_model.as_deref())
                .map(|text| parse_tdb_model(Some(text), "options.tdb_model"))
                .transpose()?
                .unwrap_or(query_model);
            let ephemeris =
                from_document(&input, &context.with_tdb_model(model)).map_err(ephemeris_problem)?;
            (ephemeris, merge(query, body_options))
        }
        BodyFormat::Oem => (read_oem(text, &context).map_err(ephemeris_problem)?, query),
        BodyFormat::Sp3 => (
            read_sp3_about(text, &context, center.unwrap_or(TrajectoryCenter::Earth))
                .map_err(ephemeris_problem)?,
            query,
        ),
    };
    if let Some(center) = center {
        check_named_center(&ephemeris, center)?;
    }
    check_geocentric_range(&ephemeris)?;
    let states: usize = ephemeris.objects.iter().map(|o| o.states.len()).sum();
    check_batch_size(states, settings.batch_limit, "objects", "ephemeris state")?;
    let lunar = super::lunar_options::lunar_options(&ephemeris, &options)?;
    let reference = match (options.reference.as_deref(), &lunar) {
        (Some(text), None) => parse_reference(text, "reference")?,
        _ => RateReference::Tt,
    };
    let gravity_model = match (options.gravity_model.as_deref(), &lunar) {
        (Some(text), None)
            if GravityModel::from_name(text).is_none()
                && LunarGravityModel::from_name(text).is_some() =>
        {
            return Err(ApiError::unprocessable(
                RateErrorKind::UnsupportedGravityModel.as_str(),
                format!("{text} is the Moon's field; it takes a selenocentric ephemeris (center moon, or OEM CENTER_NAME = MOON)"),
            )
            .with_field("gravity_model"))
        }
        (Some(text), None) => match parse_gravity_model(text, "gravity_model")? {
            GravityModel::Egm2008 => {
                return Err(ApiError::unprocessable(
                    RateErrorKind::UnsupportedGravityModel.as_str(),
                    crate::physics::gravity::EGM2008_GROUND_ONLY,
                )
                .with_field("gravity_model"))
            }
            model => Some(model),
        },
        _ => None,
    };
    let interpolation = InterpolationOptions {
        points: options.interpolation_points.unwrap_or(8),
        max_gap_s: options.max_gap_s.unwrap_or(settings.max_ephemeris_gap_s),
        output_step_s: options.step_s,
    };
    interpolation.check().map_err(ephemeris_problem)?;
    let tdb_model = parse_tdb_model(options.tdb_model.as_deref(), "tdb_model")?;
    Ok(ProperTimeRequest {
        tdb_model,
        ephemeris,
        reference,
        gravity_model,
        interpolation,
        initial_offset_s: options.initial_offset_s.unwrap_or(0.0),
        include_series: options.include_series.unwrap_or(true),
        lunar,
    })
}
