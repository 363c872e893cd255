//! Checks of a signal path's endpoints: finite, inside the Earth's neighbourhood, slower than
//! light.

use crate::physics::constants::{
    MAX_DEPTH_BELOW_SURFACE_M, MAX_GEOCENTRIC_DISTANCE_M, SPEED_OF_LIGHT_M_S,
};
use crate::physics::geodesy::{is_deep_inside_earth, itrf_to_inertial_velocity_m_s};
use crate::physics::gravity::norm;
use crate::physics::rate::state::MIN_GCRS_DISTANCE_M;
use crate::physics::rate::Frame;
use crate::physics::readable::readable;
use crate::physics::signal::error::{SignalError, SignalErrorKind};

/// The inertial velocity of an ITRF velocity at `position_m` (v + omega_E x r).
pub fn itrf_velocity(position_m: [f64; 3], velocity_m_s: [f64; 3]) -> [f64; 3] {
    // Inputs are finite (checked), so the geodesy helper cannot fail; fall back to the
    // Earth-fixed velocity to stay panic-free.
    itrf_to_inertial_velocity_m_s(position_m, velocity_m_s).unwrap_or(velocity_m_s)
}

/// Checks one endpoint; errors name `owner.position_m` or `owner.velocity_m_s`.
pub fn validate_endpoint(
    frame: Frame,
    owner: &str,
    position_m: [f64; 3],
    velocity_m_s: Option<[f64; 3]>,
) -> Result<(), SignalError> {
    let position_field = format!("{owner}.position_m");
    let velocity_field = format!("{owner}.velocity_m_s");
    if !position_m.iter().all(|value| value.is_finite()) {
        return Err(SignalError::new(
            SignalErrorKind::NotFinite,
            position_field,
            "every component must be a finite number",
        ));
    }
    let distance_m = norm(position_m);
    if !distance_m.is_finite() || distance_m > MAX_GEOCENTRIC_DISTANCE_M {
        return Err(SignalError::new(
            SignalErrorKind::BeyondRange,
            position_field,
            format!(
                "geocentric distance {distance_m} m is beyond {MAX_GEOCENTRIC_DISTANCE_M} m, where the Sun's delay (not modelled) dominates the Earth's", distance_m = readable(distance_m)
            ),
        ));
    }
    let inside = match frame {
        Frame::Gcrs => distance_m < MIN_GCRS_DISTANCE_M,
        Frame::Itrf => is_deep_inside_earth(position_m),
    };
    if inside {
        return Err(SignalError::new(
            SignalErrorKind::InsideEarth,
            position_field,
            format!(
                "the position (geocentric distance {distance_m:.1} m) is more than {MAX_DEPTH_BELOW_SURFACE_M} m inside the Earth"
            ),
        ));
    }
    if let Some(velocity_m_s) = velocity_m_s {
        if !velocity_m_s.iter().all(|value| value.is_finite()) {
            return Err(SignalError::new(
                SignalErrorKind::NotFinite,
                velocity_field,
                "every component must be a finite number",
            ));
        }
        let inertial_m_s = match frame {
            Frame::Gcrs => velocity_m_s,
            Frame::Itrf => itrf_velocity(position_m, velocity_m_s),
        };
        let speed_m_s = norm(inertial_m_s);
        if speed_m_s.is_nan() || speed_m_s >= SPEED_OF_LIGHT_M_S {
            return Err(SignalError::new(
                SignalErrorKind::SpeedNotBelowC,
                velocity_field,
                format!(
                    "inertial speed must be below c = {SPEED_OF_LIGHT_M_S} m/s, got {speed_m_s}",
                    speed_m_s = readable(speed_m_s)
                ),
            ));
        }
    }
    Ok(())
}
