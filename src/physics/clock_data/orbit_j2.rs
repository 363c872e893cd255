//! J2 terms of a clock on an orbit: the mean rate change and the periodic term (the formulas
//! and their derivation are in [`super::terms`] and the module notes of [`super`]).

use super::terms::{
    j2_mean_rate_change, j2_mean_rate_parts, j2_periodic_amplitude_s, j2_periodic_period_s,
};
use crate::physics::rate::error::{require_finite, RateError, RateErrorKind};
use crate::physics::rate::orbit::{orbit_rate, KeplerianOrbit, OrbitRate, MAX_ANGLE_DEG};
use crate::physics::rate::{GravityModel, RateReference};
use crate::physics::readable::readable;

/// The model notes of an orbit rate with J2.
pub const ORBIT_J2_NOTES: [&str; 3] = [
    "J2 mean rate: -(3GM/(2a) + 4<U_J2>)/c^2 (+ L_G against TT) with <U_J2> = -(GM J2 a_E^2/(2a^3(1-e^2)^(3/2)))((3/2)sin^2 i - 1), first order in J2; a is the energy semi-major axis (E = v^2/2 - GM/r - U_J2 = -GM/(2a)); derived from the J2 potential (IERS Conventions (2010) eq. 10.6 and ch. 6), checked against a numerically integrated J2 orbit",
    "J2 periodic term -(3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i) sin(2u), period half the orbit (Kouba (2004) GPS Solutions 8:170-180); its neglected parts are of order e and J2 of itself (a few ps for e = 0.01)",
    "the conventional periodic term (amplitude 2 sqrt(GM a) e/c^2) is unchanged by J2 as -2 r.v/c^2 of the actual state",
];

/// The J2 terms of an orbit rate.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct OrbitJ2Terms {
    /// Change of the mean fractional rate from J2, -4<U_J2>/c^2.
    pub mean_rate_change: f64,
    /// Amplitude of the J2 periodic term, s.
    pub periodic_amplitude_s: f64,
    /// Period of the J2 periodic term, s (half the orbital period).
    pub periodic_period_s: f64,
    /// Value -amplitude sin(2u) at the given argument of latitude u, s.
    pub periodic_value_s: Option<f64>,
}

/// Mean rate (with J2) and periodic terms of a clock on an orbit of inclination `inclination_deg`
/// in [0, 180] (required: field `inclination_deg`, kind `input_required`), energy semi-major
/// axis a, eccentricity e; optional argument of latitude u (degrees) for the periodic value.
/// The point-mass checks of [`orbit_rate`] apply. References: see [`ORBIT_J2_NOTES`].
pub fn orbit_rate_j2(
    orbit: &KeplerianOrbit,
    inclination_deg: Option<f64>,
    argument_of_latitude_deg: Option<f64>,
    reference: RateReference,
) -> Result<(OrbitRate, OrbitJ2Terms), RateError> {
    let point_mass = orbit_rate(orbit, reference, GravityModel::PointMass)?;
    let Some(inclination_deg) = inclination_deg else {
        return Err(RateError::new(
            "inclination_deg",
            "the J2 terms of an orbit depend on its inclination: give inclination_deg",
        )
        .with_kind(RateErrorKind::InputRequired));
    };
    require_finite("inclination_deg", inclination_deg)?;
    if !(0.0..=180.0).contains(&inclination_deg) {
        return Err(RateError::new(
            "inclination_deg",
            format!(
                "must lie in [0, 180] degrees, got {i}",
                i = readable(inclination_deg)
            ),
        )
        .with_kind(RateErrorKind::AngleOutOfRange));
    }
    let u_rad = match argument_of_latitude_deg {
        None => None,
        Some(u_deg) => {
            require_finite("argument_of_latitude_deg", u_deg)?;
            if u_deg.abs() > MAX_ANGLE_DEG {
                return Err(RateError::new(
                    "argument_of_latitude_deg",
                    format!(
                        "must be at most {MAX_ANGLE_DEG} degrees in magnitude, got {u}",
                        u = readable(u_deg)
                    ),
                )
                .with_kind(RateErrorKind::AngleOutOfRange));
            }
            Some(u_deg.rem_euclid(360.0).to_radians())
        }
    };
    let a_m = orbit.semi_major_axis_m;
    let e = orbit.eccentricity;
    let sin2_i = inclination_deg.to_radians().sin().powi(2);
    let amplitude_s = j2_periodic_amplitude_s(a_m, sin2_i);
    let terms = OrbitJ2Terms {
        mean_rate_change: j2_mean_rate_change(a_m, e, sin2_i),
        periodic_amplitude_s: amplitude_s,
        periodic_period_s: j2_periodic_period_s(a_m),
        periodic_value_s: u_rad.map(|u| -amplitude_s * (2.0 * u).sin()),
    };
    let rate = OrbitRate {
        mean: j2_mean_rate_parts(a_m, e, sin2_i, reference),
        periodic: point_mass.periodic,
    };
    Ok((rate, terms))
}

#[cfg(test)]
mod tests {
    use super::*;

    fn nav() -> KeplerianOrbit {
        KeplerianOrbit {
            semi_major_axis_m: 26_561_750.0,
            eccentricity: 0.0,
            anomaly: None,
        }
    }

    #[test]
    fn navigation_orbit_j2_terms() {
        let (rate, terms) =
            orbit_rate_j2(&nav(), Some(55.0), Some(45.0), RateReference::Tt).unwrap();
        // Kouba (2004): about 0.07 ns, half-orbit period (formula: 71.9 ps, 5.98 h).
        assert!((terms.periodic_amplitude_s - 71.9e-12).abs() < 0.3e-12);
        assert!((terms.periodic_period_s / 3600.0 - 5.98).abs() < 0.01);
        // sin(2u) = 1 at u = 45 deg: the value is minus the amplitude (the formula's sign).
        assert_eq!(terms.periodic_value_s, Some(-terms.periodic_amplitude_s));
        // The J2 change is the difference to the point-mass mean (the formula, by construction
        // of the split); near the critical inclination it is small (|.| < 1e-15, formula).
        let pm = orbit_rate(&nav(), RateReference::Tt, GravityModel::PointMass).unwrap();
        let change = rate.mean.total() - pm.mean.total();
        assert!(
            (change - terms.mean_rate_change).abs() < 1e-22,
            "{change:e}"
        );
        assert!(change.abs() < 1e-15 && change != 0.0, "{change:e}");
    }

    #[test]
    fn j2_orbit_needs_an_inclination_in_range() {
        let err = orbit_rate_j2(&nav(), None, None, RateReference::Tt).unwrap_err();
        assert_eq!(
            (err.field, err.code()),
            ("inclination_deg", "input_required")
        );
        let err = orbit_rate_j2(&nav(), Some(190.0), None, RateReference::Tt).unwrap_err();
        assert_eq!(
            (err.field, err.code()),
            ("inclination_deg", "angle_out_of_range")
        );
        let err = orbit_rate_j2(&nav(), Some(50.0), Some(f64::NAN), RateReference::Tt).unwrap_err();
        assert_eq!(
            (err.field, err.code()),
            ("argument_of_latitude_deg", "not_finite")
        );
    }
}
