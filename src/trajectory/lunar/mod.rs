//! Lunar-orbit ephemerides: selenocentric tracks with ICRF axes ([`Frame::LunarInertial`]),
//! their frame and centre checks, and their proper time against TCL, TL or TT
//! ([`proper_time`]).
//!
//! A track is selenocentric when its file says so: CCSDS OEM `CENTER_NAME = MOON` with
//! `REF_FRAME = ICRF` or `EME2000` (CCSDS 502.0-B-2 sec. 5.2.3: the frame names the axes, the
//! centre the origin), a JSON ephemeris with `"center": "moon"` and frame ICRF, EME2000 or
//! J2000, or an SP3 file read with the centre named by the request (SP3 has no centre field) and
//! the coordinate system `ICRF` or `J2000` in its header ([`super::sp3::read_sp3_about`]).
//! Lunar body-fixed frames (MOON_PA, MOON_ME...) are refused: they are realized by the
//! libration angles of the DE ephemerides, which the embedded product does not carry, and the
//! IAU rotation model of [`crate::physics::moon::orientation`] only approximates them.

pub mod proper_time;
pub mod tcl_axis;
#[cfg(test)]
mod tests;

use super::error::TrajectoryError;
use super::Frame;
use crate::physics::lunar_orbit::TrajectoryCenter;

/// Frame names that give ICRF axes about the Moon (JSON); the OEM reader takes ICRF, EME2000.
pub const LUNAR_AXES_NAMES: &[&str] = &["ICRF", "EME2000", "J2000"];

/// Names of lunar body-fixed frames recognised (and refused) so that the answer says why.
pub const LUNAR_BODY_FIXED_NAMES: &[&str] = &[
    "MOON_PA",
    "MOON_ME",
    "MOON_PA_DE440",
    "MOON_ME_DE440",
    "MOON_PA_DE421",
    "MOON_ME_DE421",
    "MCMF",
];

/// True for a name of a lunar frame (body-fixed): an Earth-centred file may not use it.
pub fn is_lunar_frame(name: &str) -> bool {
    LUNAR_BODY_FIXED_NAMES.contains(&name)
}

/// Reads a centre name written exactly (`earth`, `moon`); 422 `unknown_center` naming the
/// field `center` otherwise (a JSON document's member and the request's query parameter share
/// the name).
pub fn parse_center(name: &str) -> Result<TrajectoryCenter, TrajectoryError> {
    TrajectoryCenter::from_name(name).ok_or_else(|| {
        TrajectoryError::new(
            "unknown_center",
            format!(
                "center {name:?} is not known; expected {} (written exactly so)",
                TrajectoryCenter::NAMES.join(" or ")
            ),
        )
        .with_field("center")
    })
}

/// Why a (centre, frame) pair was refused: (code, message). The caller adds line or field.
pub fn check_center_frame(
    center: TrajectoryCenter,
    frame_name: &str,
) -> Result<Frame, (&'static str, String)> {
    match center {
        TrajectoryCenter::Moon if LUNAR_AXES_NAMES.contains(&frame_name) => Ok(Frame::LunarInertial),
        TrajectoryCenter::Moon if is_lunar_frame(frame_name) => Err((
            "unsupported_frame",
            format!("{frame_name} is a lunar body-fixed frame, not supported yet (its libration angles are not in the embedded ephemeris); give selenocentric states with ICRF axes (ICRF or EME2000)"),
        )),
        TrajectoryCenter::Moon => Err((
            "frame_center_mismatch",
            format!("{frame_name} is not a frame for Moon-centred states; a selenocentric ephemeris takes ICRF axes: {}", LUNAR_AXES_NAMES.join(", ")),
        )),
        TrajectoryCenter::Earth if is_lunar_frame(frame_name) => Err((
            "frame_center_mismatch",
            format!("{frame_name} is a lunar frame but the centre is the Earth; give the Moon as centre (and ICRF axes) or a geocentric frame"),
        )),
        TrajectoryCenter::Earth => Frame::from_name(frame_name).ok_or_else(|| {
            (
                "unsupported_frame",
                format!(
                    "frame {frame_name:?} is not supported; expected {}, in upper case",
                    Frame::names_in_words()
                ),
            )
        }),
    }
}

/// The problem for a JSON document: field `frame`.
pub fn json_frame(center: TrajectoryCenter, frame_name: &str) -> Result<Frame, TrajectoryError> {
    check_center_frame(center, frame_name)
        .map_err(|(code, message)| TrajectoryError::new(code, message).with_field("frame"))
}
