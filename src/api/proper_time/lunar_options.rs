//! The options of a selenocentric proper-time request: the reference (TCL, TL, TT) and the
//! Moon's field (grail_gl0660b_degree2, j2, point_mass), and the checks that the ephemeris has one centre.

use super::types::ProperTimeOptionsInput;
use crate::api::error::ApiError;
use crate::physics::lunar_orbit::LunarReference;
use crate::physics::moon::gravity::LunarGravityModel;
use crate::physics::rate::RateErrorKind;
use crate::trajectory::{Frame, TrajectorySet};

/// The options of a selenocentric request.
#[derive(Debug, Clone, Copy)]
pub struct LunarOptions {
    /// TCL (default), TL or TT.
    pub reference: LunarReference,
    /// The Moon's field: its degree-2 field (default), the zonal J2 or the point mass.
    pub gravity_model: LunarGravityModel,
}

fn mismatch(message: &str, field: &str) -> ApiError {
    ApiError::unprocessable("frame_center_mismatch", message).with_field(field)
}

/// The lunar options when every object is selenocentric, `None` when none is; a mix, or a
/// reference or field model of the other centre, is a 422 naming the object or field.
pub fn lunar_options(
    ephemeris: &TrajectorySet,
    options: &ProperTimeOptionsInput,
) -> Result<Option<LunarOptions>, ApiError> {
    let is_lunar = |frame: Frame| frame == Frame::LunarInertial;
    let lunar_count = ephemeris
        .objects
        .iter()
        .filter(|o| is_lunar(o.frame))
        .count();
    let reference = options.reference.as_deref();
    if lunar_count == 0 {
        if matches!(reference, Some("TCL" | "TL")) {
            return Err(mismatch(
                "TCL and TL are lunar time scales: they take a selenocentric ephemeris (center moon, or OEM CENTER_NAME = MOON); for geocentric tracks use TT or TCG",
                "reference",
            ));
        }
        return Ok(None);
    }
    if let Some(other) = ephemeris.objects.iter().find(|o| !is_lunar(o.frame)) {
        return Err(ApiError::unprocessable(
            "frame_center_mismatch",
            "this object is geocentric while others are selenocentric; send Earth- and Moon-centred tracks in separate requests",
        )
        .with_object(Some(other.id.clone()), None));
    }
    let reference = match reference {
        None => LunarReference::Tcl,
        Some(text) => LunarReference::from_name(text).ok_or_else(|| {
            mismatch(
                &format!("{text} is a geocentric reference; a selenocentric ephemeris is compared with TCL, TL or TT"),
                "reference",
            )
        })?,
    };
    let gravity_model = match options.gravity_model.as_deref() {
        None => LunarGravityModel::GrailDegree2,
        Some(text) => LunarGravityModel::from_name(text).ok_or_else(|| {
            ApiError::unprocessable(
                RateErrorKind::UnsupportedGravityModel.as_str(),
                format!("{text} is a model of the Earth's field; a selenocentric ephemeris takes {} (the Moon's degree-2 field, default), {} (its zonal J2) or {} (its point mass), all with the Earth's and the Sun's tides", LunarGravityModel::GrailDegree2.as_str(), LunarGravityModel::J2.as_str(), LunarGravityModel::PointMass.as_str()),
            )
            .with_field("gravity_model")
        })?,
    };
    Ok(Some(LunarOptions {
        reference,
        gravity_model,
    }))
}
