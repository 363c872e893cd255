//! `POST /v1/signal/path`.

use axum::extract::State;
use axum::Json;

use super::types::{
    Correction, PathEndpointInput, SignalPathAnswer, SignalPathRequest, SignalTerms,
};
use crate::api::earth::orientation_answer::{orientation_at, OrientationRequest};
use crate::api::error::{ApiError, JsonBodyProblems, Problem, TimeoutProblem};
use crate::api::extract::JsonBody;
use crate::api::names::{parse_format, parse_named, parse_scale};
use crate::api::state::AppState;
use crate::api::time::conversion::FieldName;
use crate::api::time::types::InstantForms;
use crate::physics::constants::SPEED_OF_LIGHT_M_S;
use crate::physics::earth::orientation::EarthOrientation;
use crate::physics::geodesy::geodetic_to_ecef_m;
use crate::physics::signal::{
    signal_path as solve, Endpoint, Frame, PathGeometry, SignalError, TransmitterMotion,
};
use crate::physics::time::formats::{parse_instant, write_instant};

/// The sign convention of the path answer.
pub const PATH_SIGN_CONVENTION: &str = "Path terms are added to geometric_range_m / c to give light_time_s: light_time_s = geometric_range_m / c + sagnac.s + shapiro.s; total = sagnac + shapiro. The Sagnac term is positive for an eastward signal. clock_periodic is the transmitter clock's reading minus coordinate time (-2 r.v/c^2, IS-GPS-200); it is not in light_time_s or total.";

/// An endpoint resolved to a frame, and whether it came from a ground site.
struct Resolved {
    frame: Frame,
    endpoint: Endpoint,
    motion: TransmitterMotion,
    ground_site: bool,
}

/// Reads the endpoint's `motion` (default free fall); only a transmitter with a velocity takes
/// one (422 `invalid_endpoint` otherwise, `unknown_motion` for another name).
fn parse_motion(owner: &str, input: &PathEndpointInput) -> Result<TransmitterMotion, ApiError> {
    let Some(text) = input.motion.as_deref() else {
        return Ok(TransmitterMotion::FreeFall);
    };
    let field = format!("{owner}.motion");
    if owner != "transmitter" {
        return Err(invalid_endpoint(
            field,
            "motion applies to the transmitter only (the receiver's position at reception is all the light time needs)",
        ));
    }
    if input.velocity_m_s.is_none() {
        return Err(invalid_endpoint(
            field,
            "motion needs velocity_m_s; without one the transmitter is at rest in its frame",
        ));
    }
    parse_named(text, "unknown_motion", "transmitter motion", field)
}

fn invalid_endpoint(field: String, detail: &str) -> ApiError {
    ApiError::unprocessable("invalid_endpoint", detail.to_string()).with_field(field)
}

fn parse_frame(text: &str, field: String) -> Result<Frame, ApiError> {
    parse_named(text, "unknown_frame", "frame", field)
}

fn resolve(owner: &str, input: &PathEndpointInput) -> Result<Resolved, ApiError> {
    if let Some(site) = input.ground_site {
        if input.frame.is_some()
            || input.position_m.is_some()
            || input.velocity_m_s.is_some()
            || input.motion.is_some()
        {
            return Err(invalid_endpoint(
                format!("{owner}.ground_site"),
                "give either ground_site, or frame and position_m (and optionally velocity_m_s and motion), not both",
            ));
        }
        let position_m = geodetic_to_ecef_m(site.latitude_deg, site.longitude_deg, site.height_m)
            .map_err(|e| {
            ApiError::from(SignalError::from_rate(&format!("{owner}.ground_site"), e))
        })?;
        return Ok(Resolved {
            frame: Frame::Itrf,
            endpoint: Endpoint {
                position_m,
                velocity_m_s: None,
            },
            motion: TransmitterMotion::FreeFall,
            ground_site: true,
        });
    }
    let frame_text = input.frame.as_deref().ok_or_else(|| {
        invalid_endpoint(
            format!("{owner}.frame"),
            "missing frame (GCRS or ITRF); or give a ground_site",
        )
    })?;
    let frame = parse_frame(frame_text, format!("{owner}.frame"))?;
    let position_m = input.position_m.ok_or_else(|| {
        invalid_endpoint(
            format!("{owner}.position_m"),
            "missing position_m (three numbers in metres); or give a ground_site",
        )
    })?;
    Ok(Resolved {
        frame,
        endpoint: Endpoint {
            position_m,
            velocity_m_s: input.velocity_m_s,
        },
        motion: parse_motion(owner, input)?,
        ground_site: false,
    })
}

fn correction(seconds: f64) -> Correction {
    Correction {
        s: seconds,
        m: seconds * SPEED_OF_LIGHT_M_S,
    }
}

/// Parses the reception epoch and writes it back in every form.
fn epoch_forms(request: &SignalPathRequest, state: &AppState) -> Result<InstantForms, ApiError> {
    let scale = parse_scale(&request.scale, "scale")?;
    let format = parse_format(request.format.as_deref(), "format")?;
    let table = state.leap_table();
    let instant = parse_instant(&request.epoch, format, scale, &table)
        .map_err(|e| ApiError::from_time(&e, "epoch"))?;
    write_instant(&instant, &table)
        .map(InstantForms::from)
        .map_err(|e| ApiError::from_time(&e, "epoch"))
}

/// The Earth orientation at the reception epoch (IERS Conventions (2010) eq. 5.1, with the EOP
/// table in force), through the orientation endpoint's own computation.
fn epoch_orientation(
    request: &SignalPathRequest,
    state: &AppState,
) -> Result<EarthOrientation, ApiError> {
    let leaps = state.leap_table();
    let eop = state.eop_table();
    let orientation = OrientationRequest {
        format: parse_format(request.format.as_deref(), "format")?,
        scale: parse_scale(&request.scale, "scale")?,
        pole_offsets: true,
        leaps: &leaps,
        eop: &eop,
    };
    orientation_at(&request.epoch, &orientation, FieldName::Named("epoch"))
}

/// An ITRF endpoint as a GCRS one at the reception epoch: r_gcrs = Q R W r_itrs and, for a
/// transmitter, its time derivative (IERS Conventions (2010) eq. 5.1;
/// `EarthOrientation::itrs_to_gcrs_velocity_m_s`: the Earth rotation about the CIP and the
/// precession-nutation rate; the polar-motion and length-of-day rates, about 1e-6 and 1e-5 m/s
/// at the surface, are left out). An Earth-fixed transmitter at rest (no velocity) turns with
/// the Earth: in the GCRS it moves uniformly over the flight at that velocity (0.08 mm from the
/// circle over 70 ms); a GCRS endpoint is kept.
fn into_gcrs(resolved: Resolved, orientation: &EarthOrientation) -> Resolved {
    if resolved.frame == Frame::Gcrs {
        return resolved;
    }
    let r = resolved.endpoint.position_m;
    let (velocity_itrs, motion) = match resolved.endpoint.velocity_m_s {
        Some(v) => (v, resolved.motion),
        None => ([0.0; 3], TransmitterMotion::Uniform),
    };
    Resolved {
        frame: Frame::Gcrs,
        endpoint: Endpoint {
            position_m: orientation.itrs_to_gcrs_position_m(&r),
            velocity_m_s: Some(orientation.itrs_to_gcrs_velocity_m_s(&r, &velocity_itrs)),
        },
        motion,
        ground_site: resolved.ground_site,
    }
}

/// Light time and relativistic corrections of a signal from a transmitter to a receiver.
#[utoipa::path(post, path = "/v1/signal/path", tag = "signal",
    request_body = SignalPathRequest,
    responses(
        (status = 200, description = "The light time and its Sagnac, Shapiro and clock terms", body = SignalPathAnswer),
        JsonBodyProblems,
        (status = 422, description = "A value cannot be used; `field` names it and `code` says why: invalid_endpoint (neither or both of `ground_site` and `frame` + `position_m`; a `motion` without a velocity or on the receiver), unknown_frame, unknown_motion, inside_earth, beyond_range, speed_not_below_c, not_finite, coincident_endpoints, path_through_earth (the receiver cannot see the transmitter), no_convergence, invalid_value (a ground site's latitude, longitude or height), and the epoch codes of `GET /v1/time/convert` (unknown_scale, unknown_format, malformed_instant, impossible_date, ...); with the endpoints in different frames also eop_before_table, eop_after_table (the rotation at the epoch needs the Earth orientation table)", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn signal_path(
    State(state): State<AppState>,
    JsonBody(request): JsonBody<SignalPathRequest>,
) -> Result<Json<SignalPathAnswer>, ApiError> {
    let epoch = epoch_forms(&request, &state)?;
    let transmitter = resolve("transmitter", &request.transmitter)?;
    let receiver = resolve("receiver", &request.receiver)?;
    let (transmitter, receiver) = if transmitter.frame == receiver.frame {
        (transmitter, receiver)
    } else {
        // Mixed frames: the Earth-fixed endpoint goes into the GCRS at the reception epoch.
        let orientation = epoch_orientation(&request, &state)?;
        (
            into_gcrs(transmitter, &orientation),
            into_gcrs(receiver, &orientation),
        )
    };
    let geometry = PathGeometry {
        frame: transmitter.frame,
        transmitter: transmitter.endpoint,
        transmitter_motion: transmitter.motion,
        receiver: receiver.endpoint,
    };
    let path = solve(&geometry).map_err(|mut error| {
        // A ground site has no position_m in the request: point at the site instead.
        for (owner, resolved) in [("transmitter", &transmitter), ("receiver", &receiver)] {
            if resolved.ground_site && error.field == format!("{owner}.position_m") {
                error.field = format!("{owner}.ground_site");
            }
        }
        ApiError::from(error)
    })?;
    let frame = geometry.frame.as_str();
    Ok(Json(SignalPathAnswer {
        epoch,
        frame: frame.to_string(),
        light_time_s: path.light_time_s,
        geometric_range_m: path.geometric_range_m,
        inertial_range_m: path.inertial_range_m,
        iterations: path.iterations,
        terms: SignalTerms {
            sagnac: correction(path.sagnac_s),
            shapiro: correction(path.shapiro_s),
            clock_periodic: path.clock_periodic_s.map(correction),
        },
        total: correction(path.sagnac_s + path.shapiro_s),
        emission_position_m: path.emission_position_m,
        sign_convention: PATH_SIGN_CONVENTION.to_string(),
    }))
}
