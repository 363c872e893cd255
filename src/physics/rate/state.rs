//! Rate of a clock given by its geocentric position and velocity.

use crate::physics::constants::{
    GM_EARTH_M3_S2, MAX_DEPTH_BELOW_SURFACE_M, MAX_GEOCENTRIC_DISTANCE_M, SPEED_OF_LIGHT_M_S,
    SPEED_OF_LIGHT_SQUARED_M2_S2,
};
use crate::physics::geodesy::{
    is_deep_inside_earth, itrf_to_inertial_velocity_m_s, GRS80_SEMI_MINOR_AXIS_M,
};
use crate::physics::gravity::{
    dot, earth_potential_m2_s2, norm, position_about_axis_m, GravityModel,
};
use crate::physics::rate::error::{require_finite_vector, RateError, RateErrorKind};
use crate::physics::rate::{RateParts, RateReference};
use crate::physics::readable::readable;
use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// Coordinate frame of a state vector.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum Frame {
        /// Geocentric Celestial Reference System (non-rotating).
        Gcrs = "GCRS",
        /// International Terrestrial Reference Frame (rotating with the Earth).
        Itrf = "ITRF",
    }
}

/// A geocentric state: position (m) and velocity (m/s) in `frame`.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct StateVector {
    /// Frame of both vectors.
    pub frame: Frame,
    /// Geocentric position, m.
    pub position_m: [f64; 3],
    /// Velocity in that frame, m/s (for ITRF: relative to the rotating Earth).
    pub velocity_m_s: [f64; 3],
}

/// The rate of a clock at a state, with the periodic (eccentricity) term at that state.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct StateRate {
    /// Instantaneous fractional rate, split.
    pub parts: RateParts,
    /// Periodic part of tau - t at this state, -2 (r . v)/c^2, in seconds (IS-GPS-200
    /// 20.3.3.3.3.1: equal to the broadcast correction dt_r = F e sqrt(A) sin E_k for a Keplerian
    /// orbit). Meaningful for bound orbits; for a ground clock it is 0 up to the Earth's rotation.
    pub periodic_value_s: f64,
    /// Amplitude of the periodic term of the osculating point-mass Keplerian orbit through this
    /// state, s (see [`osculating_periodic_amplitude_s`]); None when the state is not on a
    /// closed orbit whose periapsis clears the Earth (a ground clock, an escape trajectory).
    pub osculating_amplitude_s: Option<f64>,
}

/// Smallest geocentric distance accepted for a GCRS position: the GRS80 polar radius less
/// 11 km (6 345 752.3 m). GCRS axes do not tell where the equator bulge is, so this bound is the
/// deepest a clock can be anywhere; ITRF positions are checked against the ellipsoid instead.
pub const MIN_GCRS_DISTANCE_M: f64 = GRS80_SEMI_MINOR_AXIS_M - MAX_DEPTH_BELOW_SURFACE_M;

/// The model notes of [`state_rate`]: what the instantaneous rate neglects, and where the
/// periodic values come from.
pub const STATE_NOTES: [&str; 2] = [
    "instantaneous rate at this state",
    "periodic.value_at_state_s = -2 (r . v)/c^2 (IS-GPS-200 20.3.3.3.3.1); periodic.amplitude_s is that of the osculating point-mass Keplerian orbit (IERS Conventions (2010) GM), absent when the state is not on a closed orbit above the Earth",
];
/// The model note of [`state_rate`] with [`GravityModel::J2`].
pub const STATE_J2_NOTE: &str = "J2 about the Earth's figure axis: the Celestial Intermediate Pole at the state's epoch (IAU 2006/2000A, IERS Conventions (2010) ch. 5) for GCRS states and ITRF states with an epoch, the ITRF z axis for ITRF states without one";

/// The model note of an ITRF state given with its epoch.
pub const ITRF_EPOCH_NOTE: &str = "ITRF state with its epoch: taken into the GCRS with the IERS Conventions (2010) ch. 5 transformation at that epoch (IAU 2006/2000A with dX, dY; Earth rotation angle from UT1; polar motion with s'; EOP from the table in force), velocity with the rotation's rates (length of day, precession-nutation, polar motion); the zonal field about the CIP there";

/// The model note of an ITRF state given without an epoch.
pub const ITRF_WITHOUT_EPOCH_NOTE: &str = "ITRF state without an epoch: inertial velocity v + omega_E x r with the nominal omega_E about the ITRF z axis, and the zonal field about that axis; polar motion (the true pole is up to 2.5e-6 rad from the z axis), the length-of-day variation and the precession-nutation rate are neglected, up to about 1.6e-16 in rate; give `epoch` to apply them";

/// The model note of [`state_rate`] with [`GravityModel::Grs80`].
pub const STATE_GRS80_NOTE: &str = "GRS80 normal field in closed form about the Earth's figure axis (Heiskanen & Moritz (1967) eq. 2-126, Moritz (2000)), with no disturbing potential and the GRS80 GM 3.986005e14 (1.5e-9 above the IERS Conventions (2010) GM, about 1e-16 of rate near the Earth): a state at rest on the ellipsoid gets (W0 - U0)/c^2 = -5.4e-17 where a ground_site (taken on the geoid) gets 0; the axis is that of j2 (the CIP at the state's epoch for GCRS states and ITRF states with an epoch, the ITRF z axis for ITRF states without one)";

/// Instantaneous fractional rate of a clock at a geocentric state (first post-Newtonian order).
///
/// Inputs: `state` (GCRS or ITRF position in m and velocity in m/s), `reference` (TT or TCG),
/// `model` (point-mass or J2 Earth potential). Result: [`StateRate`] with
/// `sr = -v^2/(2c^2)` (v the inertial speed; for ITRF v = v_ecef + omega_E x r) and
/// `gr = (W0 - U)/c^2` (TT) or `-U/c^2` (TCG), plus the periodic value -2 r.v/c^2.
///
/// Notes: J2 uses the frame's z axis as the Earth's figure axis (exact for ITRF; for GCRS off by
/// precession-nutation, below 3e-15 fractional for low orbits in 2026). External bodies (Moon,
/// Sun) enter only through their tidal potential, neglected here (see
/// [`crate::physics::rate::state_rate_with_tides`]): at GEO up to 2.4e-15 (Moon, near
/// perigee) and 3.2e-15 together, up to 1.24e-15 together for a navigation MEO clock
/// (measured over 2020-2030 on DE440, see the tides tests).
///
/// Errors: non-finite components; inertial speed >= c (`velocity_m_s`); a position deeper than
/// 11 km below the GRS80 ellipsoid (ITRF) or closer than [`MIN_GCRS_DISTANCE_M`] (GCRS), or
/// farther than the Earth's Hill sphere, 1.5e9 m (`position_m`).
///
/// References: IERS Conventions (2010) ch. 10 eq. 10.6; IS-GPS-200 20.3.3.3.3.1; Ashby (2003)
/// Living Rev. Relativity 6, 1, eq. (21) and (38).
pub fn state_rate(
    state: &StateVector,
    reference: RateReference,
    model: GravityModel,
) -> Result<StateRate, RateError> {
    state_rate_about_axis(state, reference, model, [0.0, 0.0, 1.0])
}

/// [`state_rate`] with the Earth's figure axis along `axis_unit` (a unit vector in the state's
/// frame; the CIP at the state's epoch for GCRS states): the zonal fields are evaluated at
/// [`position_about_axis_m`].
pub fn state_rate_about_axis(
    state: &StateVector,
    reference: RateReference,
    model: GravityModel,
    axis_unit: [f64; 3],
) -> Result<StateRate, RateError> {
    let position_m = require_finite_vector("position_m", state.position_m)?;
    let velocity_m_s = require_finite_vector("velocity_m_s", state.velocity_m_s)?;
    validate_position(state.frame, position_m)?;
    let inertial_velocity_m_s = match state.frame {
        Frame::Gcrs => velocity_m_s,
        Frame::Itrf => itrf_to_inertial_velocity_m_s(position_m, velocity_m_s)?,
    };
    let speed_m_s = norm(inertial_velocity_m_s);
    if speed_m_s.is_nan() || speed_m_s >= SPEED_OF_LIGHT_M_S {
        return Err(RateError::new(
            "velocity_m_s",
            format!(
                "inertial speed must be below c = {SPEED_OF_LIGHT_M_S} m/s, got {speed_m_s}",
                speed_m_s = readable(speed_m_s)
            ),
        )
        .with_kind(RateErrorKind::SpeedNotBelowC));
    }
    let potential_m2_s2 =
        earth_potential_m2_s2(model, position_about_axis_m(position_m, axis_unit))?;
    let parts =
        RateParts::from_speed_and_potential(reference, speed_m_s * speed_m_s, potential_m2_s2);
    Ok(StateRate {
        parts,
        periodic_value_s: periodic_value_s(position_m, inertial_velocity_m_s),
        osculating_amplitude_s: osculating_periodic_amplitude_s(
            GM_EARTH_M3_S2,
            position_m,
            inertial_velocity_m_s,
        ),
    })
}

/// Amplitude of the periodic relativistic term of the osculating Keplerian orbit through a
/// state, 2 sqrt(GM a) e / c^2, in seconds.
///
/// Inputs: `gm_m3_s2`, geocentric inertial `position_m` and `velocity_m_s`. With the specific
/// energy v^2/2 - GM/r = -GM/(2a) and the angular momentum h = |r x v| = sqrt(GM a (1 - e^2)),
/// GM a e^2 = GM a - h^2, so the amplitude is 2 sqrt(GM a - h^2) / c^2 (no division by e).
/// Result: None when the orbit is not closed (energy >= 0) or its periapsis a (1 - e) lies
/// below [`MIN_GCRS_DISTANCE_M`] (the state is then not a free fall around the Earth, e.g. a
/// clock at rest on the ground), or the inputs are not finite.
///
/// References: vis-viva and angular-momentum relations of the two-body problem; IS-GPS-200
/// 20.3.3.3.3.1 (|F| e sqrt(A)); Ashby (2003) Living Rev. Relativity 6, 1, eq. (40).
pub fn osculating_periodic_amplitude_s(
    gm_m3_s2: f64,
    position_m: [f64; 3],
    velocity_m_s: [f64; 3],
) -> Option<f64> {
    let r_m = norm(position_m);
    let energy_m2_s2 = 0.5 * dot(velocity_m_s, velocity_m_s) - gm_m3_s2 / r_m;
    if !energy_m2_s2.is_finite() || energy_m2_s2 >= 0.0 {
        return None;
    }
    let a_m = -gm_m3_s2 / (2.0 * energy_m2_s2);
    let [x, y, z] = position_m;
    let [vx, vy, vz] = velocity_m_s;
    let momentum = [y * vz - z * vy, z * vx - x * vz, x * vy - y * vx];
    let gm_a = gm_m3_s2 * a_m;
    let gm_a_e_squared = (gm_a - dot(momentum, momentum)).max(0.0);
    let eccentricity = (gm_a_e_squared / gm_a).sqrt();
    let periapsis_m = a_m * (1.0 - eccentricity);
    if !periapsis_m.is_finite() || periapsis_m < MIN_GCRS_DISTANCE_M {
        return None;
    }
    Some(2.0 * gm_a_e_squared.sqrt() / SPEED_OF_LIGHT_SQUARED_M2_S2)
}

/// Periodic relativistic term of tau - t at a state, -2 (r . v)/c^2, in seconds.
///
/// Inputs: geocentric inertial `position_m` and `velocity_m_s`. For a Keplerian orbit
/// r . v = sqrt(GM a) e sin E, so this equals -2 sqrt(GM a) e sin(E)/c^2 = F e sqrt(a) sin E.
/// Reference: IS-GPS-200 20.3.3.3.3.1; Ashby (2003) Living Rev. Relativity 6, 1, eq. (40).
pub fn periodic_value_s(position_m: [f64; 3], velocity_m_s: [f64; 3]) -> f64 {
    -2.0 * dot(position_m, velocity_m_s) / SPEED_OF_LIGHT_SQUARED_M2_S2
}

fn validate_position(frame: Frame, position_m: [f64; 3]) -> Result<(), RateError> {
    let r_m = norm(position_m);
    if r_m.is_nan() || r_m > MAX_GEOCENTRIC_DISTANCE_M {
        return Err(RateError::new(
            "position_m",
            format!(
                "geocentric distance {r_m} m is beyond the Earth's Hill sphere ({MAX_GEOCENTRIC_DISTANCE_M} m), where this geocentric model does not apply", r_m = readable(r_m)
            ),
        )
        .with_kind(if r_m.is_nan() {
            RateErrorKind::NotFinite
        } else {
            RateErrorKind::BeyondModelRange
        }));
    }
    let inside = match frame {
        Frame::Gcrs => r_m < MIN_GCRS_DISTANCE_M,
        Frame::Itrf => is_deep_inside_earth(position_m),
    };
    if inside {
        return Err(RateError::new(
            "position_m",
            format!(
                "position (geocentric distance {r_m} m) is more than {MAX_DEPTH_BELOW_SURFACE_M} m inside the Earth", r_m = readable(r_m)
            ),
        )
        .with_kind(RateErrorKind::BelowSurface));
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::physics::constants::{EARTH_ROTATION_RAD_S, GM_EARTH_M3_S2, L_G};
    use crate::physics::geodesy::geodetic_to_ecef_m;

    fn circular_gcrs(radius_m: f64) -> StateVector {
        let speed = (GM_EARTH_M3_S2 / radius_m).sqrt();
        StateVector {
            frame: Frame::Gcrs,
            position_m: [radius_m, 0.0, 0.0],
            velocity_m_s: [0.0, speed * 0.6, speed * 0.8],
        }
    }

    #[test]
    fn circular_state_matches_three_halves_gm_over_a() {
        // IERS Conventions (2010) eq. 10.6 with v^2 = GM/a: total = L_G - 3GM/(2ac^2);
        // navigation orbit a = 26 561.75 km gives about +4.4647e-10 (IS-GPS-200).
        let a = 26_561_750.0;
        let rate = state_rate(
            &circular_gcrs(a),
            RateReference::Tt,
            GravityModel::PointMass,
        )
        .unwrap();
        let expected = L_G - 1.5 * GM_EARTH_M3_S2 / a / SPEED_OF_LIGHT_SQUARED_M2_S2;
        assert!((rate.parts.total() - expected).abs() < 1e-22);
        assert!((rate.parts.total() - 4.4647e-10).abs() < 0.00005e-10);
        assert!(
            rate.periodic_value_s.abs() < 1e-20,
            "circular orbit: r.v = 0"
        );
        // Circular: e = 0, so the osculating amplitude is 0 (to rounding of GM a - h^2).
        let amplitude = rate.osculating_amplitude_s.unwrap();
        assert!(amplitude < 1e-12, "{amplitude:e}");
    }

    #[test]
    fn osculating_amplitude_matches_the_orbit_form_and_is_absent_on_the_ground() {
        // IS-GPS-200 20.3.3.3.3.1: amplitude |F| e sqrt(A) = 2 sqrt(GM a) e / c^2; the state at
        // eccentric anomaly 1.1 rad of an e = 0.02 orbit has the same osculating a and e.
        let (a, e, ecc_anomaly) = (26_561_750.0f64, 0.02f64, 1.1f64);
        let mu = GM_EARTH_M3_S2;
        let (sin_e, cos_e) = ecc_anomaly.sin_cos();
        let b = a * (1.0 - e * e).sqrt();
        let rate_e = (mu / a.powi(3)).sqrt() / (1.0 - e * cos_e);
        let state = StateVector {
            frame: Frame::Gcrs,
            position_m: [a * (cos_e - e), b * sin_e, 0.0],
            velocity_m_s: [-a * sin_e * rate_e, b * cos_e * rate_e, 0.0],
        };
        let rate = state_rate(&state, RateReference::Tt, GravityModel::PointMass).unwrap();
        let expected = 2.0 * (mu * a).sqrt() * e / SPEED_OF_LIGHT_SQUARED_M2_S2;
        let got = rate.osculating_amplitude_s.unwrap();
        assert!(
            (got - expected).abs() < 1e-9 * expected,
            "{got:e} vs {expected:e}"
        );
        // A clock at rest in ITRF is not in free fall: no osculating amplitude (common practice).
        let ground = StateVector {
            frame: Frame::Itrf,
            position_m: geodetic_to_ecef_m(10.0, 20.0, 0.0).unwrap(),
            velocity_m_s: [0.0; 3],
        };
        let rate = state_rate(&ground, RateReference::Tt, GravityModel::J2).unwrap();
        assert_eq!(rate.osculating_amplitude_s, None);
        // Escape speed: no closed orbit.
        let escape = StateVector {
            velocity_m_s: [0.0, 12_000.0, 0.0],
            position_m: [7.0e6, 0.0, 0.0],
            frame: Frame::Gcrs,
        };
        let rate = state_rate(&escape, RateReference::Tt, GravityModel::PointMass).unwrap();
        assert_eq!(rate.osculating_amplitude_s, None);
    }

    #[test]
    fn itrf_ground_clock_equals_rotating_frame_formula() {
        // Ashby (2003) eq. (21): a clock at rest in ITRF has v = omega_E x r, so the state rate
        // equals (W0 - W)/c^2 with W = U + omega^2 (x^2+y^2)/2 (IERS Conventions (2010) ch. 10).
        // The invented Tessaro station of the demo scenario.
        let position = geodetic_to_ecef_m(46.1, 11.2, 1050.0).unwrap();
        let state = StateVector {
            frame: Frame::Itrf,
            position_m: position,
            velocity_m_s: [0.0; 3],
        };
        let rate = state_rate(&state, RateReference::Tt, GravityModel::J2).unwrap();
        let w = crate::physics::gravity::earth_fixed_potential_m2_s2(GravityModel::J2, position)
            .unwrap();
        let expected = L_G - w / SPEED_OF_LIGHT_SQUARED_M2_S2;
        assert!((rate.parts.total() - expected).abs() < 1e-22);
        let axial = (position[0].powi(2) + position[1].powi(2)).sqrt();
        let speed = EARTH_ROTATION_RAD_S * axial;
        assert!((rate.parts.sr + 0.5 * speed * speed / SPEED_OF_LIGHT_SQUARED_M2_S2).abs() < 1e-24);
    }

    #[test]
    fn periodic_value_matches_is_gps_200_form() {
        // IS-GPS-200 20.3.3.3.3.1: dt_r = F e sqrt(A) sin E, F = -2 sqrt(mu)/c^2; at perigee
        // plus 90 deg of eccentric anomaly, r.v = sqrt(mu a) e sin E.
        let (a, e, ecc_anomaly) = (26_561_750.0f64, 0.02f64, 1.1f64);
        let mu = GM_EARTH_M3_S2;
        let (sin_e, cos_e) = ecc_anomaly.sin_cos();
        let b = a * (1.0 - e * e).sqrt();
        let r = [a * (cos_e - e), b * sin_e, 0.0];
        let rate_e = (mu / a.powi(3)).sqrt() / (1.0 - e * cos_e);
        let v = [-a * sin_e * rate_e, b * cos_e * rate_e, 0.0];
        let f = -2.0 * mu.sqrt() / SPEED_OF_LIGHT_SQUARED_M2_S2;
        let expected = f * e * a.sqrt() * sin_e;
        let got = periodic_value_s(r, v);
        assert!(
            (got - expected).abs() < 1e-12 * expected.abs(),
            "{got:e} vs {expected:e}"
        );
    }

    #[test]
    fn bad_states_name_the_field() {
        // Input validation (common practice; bounds documented on state_rate).
        let good = circular_gcrs(7.0e6);
        let cases = [
            (
                StateVector {
                    velocity_m_s: [3.0e8, 0.0, 0.0],
                    ..good
                },
                "velocity_m_s",
            ),
            (
                StateVector {
                    velocity_m_s: [f64::NAN, 0.0, 0.0],
                    ..good
                },
                "velocity_m_s",
            ),
            (
                StateVector {
                    position_m: [6.3e6, 0.0, 0.0],
                    ..good
                },
                "position_m",
            ),
            (
                StateVector {
                    position_m: [0.0, 0.0, f64::NEG_INFINITY],
                    ..good
                },
                "position_m",
            ),
            (
                StateVector {
                    position_m: [2.0e9, 0.0, 0.0],
                    ..good
                },
                "position_m",
            ),
            (
                StateVector {
                    frame: Frame::Itrf,
                    position_m: [0.0, 0.0, 6.34e6],
                    ..good
                },
                "position_m",
            ),
        ];
        for (state, field) in cases {
            let err = state_rate(&state, RateReference::Tt, GravityModel::J2).unwrap_err();
            assert_eq!(err.field, field, "{err}");
        }
        // Stable codes (the HTTP layer answers them): speed, depth, distance.
        let code = |state: StateVector| {
            state_rate(&state, RateReference::Tt, GravityModel::J2)
                .unwrap_err()
                .code()
        };
        let fast = StateVector {
            velocity_m_s: [3.0e8, 0.0, 0.0],
            ..good
        };
        assert_eq!(code(fast), "speed_not_below_c");
        let deep = StateVector {
            position_m: [6.3e6, 0.0, 0.0],
            ..good
        };
        assert_eq!(code(deep), "below_surface");
        let far = StateVector {
            position_m: [2.0e9, 0.0, 0.0],
            ..good
        };
        assert_eq!(code(far), "beyond_model_range");
        let huge = StateVector {
            position_m: [1e300, 1e300, 0.0],
            ..good
        };
        assert_eq!(code(huge), "beyond_model_range");
        // An ITRF point 6.36e6 m from the centre on the pole axis is above the surface there.
        let polar = StateVector {
            frame: Frame::Itrf,
            position_m: [0.0, 0.0, 6.36e6],
            ..good
        };
        assert!(state_rate(&polar, RateReference::Tt, GravityModel::J2).is_ok());
    }
}
