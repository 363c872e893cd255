//! Newtonian potentials of the Earth and the Moon, in the sign convention of the IERS Conventions
//! (2010) ch. 10: the potential U is positive (U = GM/r for a point mass) and a clock runs slower
//! where U is larger.
//!
//! All positions are in metres, geocentric (or selenocentric for the Moon), potentials in
//! m^2/s^2. Every function validates its inputs and returns a [`RateError`] naming the field.

use crate::physics::constants::{
    EARTH_ROTATION_RAD_S, EQUATORIAL_RADIUS_EARTH_M, GM_EARTH_M3_S2, GM_MOON_M3_S2, J2_EARTH,
};
use crate::physics::earth::normal_field::grs80_normal_gravitational_potential_m2_s2;
use crate::physics::rate_error::{require_finite, require_finite_vector, RateError, RateErrorKind};
use crate::physics::readable::readable;
use crate::physics::vocabulary::vocabulary;

/// Smallest distance from a body's centre at which a potential is evaluated, m. Below it the
/// point-mass potential is meaningless (and 1/r would overflow); callers apply tighter bounds.
pub const MIN_DISTANCE_M: f64 = 1.0;

/// Euclidean norm of a 3-vector.
pub fn norm(vector: [f64; 3]) -> f64 {
    (vector[0] * vector[0] + vector[1] * vector[1] + vector[2] * vector[2]).sqrt()
}

/// Dot product of two 3-vectors.
pub fn dot(a: [f64; 3], b: [f64; 3]) -> f64 {
    a[0] * b[0] + a[1] * b[1] + a[2] * b[2]
}

fn distance_m(field: &'static str, position_m: [f64; 3]) -> Result<f64, RateError> {
    require_finite_vector(field, position_m)?;
    let r_m = norm(position_m);
    if !r_m.is_finite() || r_m < MIN_DISTANCE_M {
        let kind = if r_m.is_finite() {
            RateErrorKind::BelowSurface
        } else {
            RateErrorKind::NotFinite
        };
        return Err(RateError::new(
            field,
            format!("distance from the body's centre must be at least {MIN_DISTANCE_M} m and finite, got {r_m}", r_m = readable(r_m)),
        )
        .with_kind(kind));
    }
    Ok(r_m)
}

/// Point-mass potential U = GM/r.
///
/// Inputs: `gm_m3_s2` gravitational constant of the body (m^3/s^2), `position_m` position
/// relative to the body's centre (m). Result: U in m^2/s^2 (positive).
///
/// Reference: IERS Conventions (2010) ch. 10, eq. 10.6 with U_E = GM/r (monopole).
pub fn point_mass_potential_m2_s2(gm_m3_s2: f64, position_m: [f64; 3]) -> Result<f64, RateError> {
    require_finite("gm_m3_s2", gm_m3_s2)?;
    let r_m = distance_m("position_m", position_m)?;
    Ok(gm_m3_s2 / r_m)
}

/// Earth potential with the J2 zonal term:
/// U = GM/r * (1 - J2 (a_E/r)^2 P2(sin phi)), P2(s) = (3 s^2 - 1)/2, sin phi = z/r.
///
/// Inputs: `position_m` geocentric position (m) whose z axis is the Earth's figure (rotation)
/// axis: ITRF coordinates are exact; GCRS coordinates use the GCRS pole instead, which differs
/// from the true pole by precession-nutation (about 0.15 deg in 2026), an error below 3e-15 of
/// the fractional rate for low orbits. Result: U in m^2/s^2.
/// Constants: GM (TCG-compatible), J2 and a_E of IERS Conventions (2010) table 1.1.
///
/// Reference: IERS Conventions (2010) ch. 6 eq. 6.6 truncated at degree 2 (C20 = -J2);
/// Ashby (2003) Living Rev. Relativity 6, 1, eq. (13).
pub fn earth_j2_potential_m2_s2(position_m: [f64; 3]) -> Result<f64, RateError> {
    let r_m = distance_m("position_m", position_m)?;
    let sin_latitude = position_m[2] / r_m;
    let p2 = 0.5 * (3.0 * sin_latitude * sin_latitude - 1.0);
    let ratio = EQUATORIAL_RADIUS_EARTH_M / r_m;
    Ok(GM_EARTH_M3_S2 / r_m * (1.0 - J2_EARTH * ratio * ratio * p2))
}

/// The position in a frame whose z axis is `axis_unit` (a unit vector in the position's frame),
/// for fields symmetric about that axis: `[rho, 0, z']` with `z' = r . axis` and
/// `rho = sqrt(r^2 - z'^2)`, so that |r| and the latitude about the axis are kept.
///
/// Used to evaluate the Earth's zonal fields (J2, GRS80) about the Celestial Intermediate Pole
/// for GCRS positions: in the GCRS the CIP is the unit vector (X, Y, sqrt(1 - X^2 - Y^2))
/// (IERS Conventions (2010) sec. 5.4.4).
pub fn position_about_axis_m(position_m: [f64; 3], axis_unit: [f64; 3]) -> [f64; 3] {
    let along_m = dot(position_m, axis_unit);
    let across_squared_m2 = (dot(position_m, position_m) - along_m * along_m).max(0.0);
    [across_squared_m2.sqrt(), 0.0, along_m]
}

/// Earth point-mass potential with the IERS Conventions (2010) table 1.1 GM (TCG-compatible).
pub fn earth_point_mass_potential_m2_s2(position_m: [f64; 3]) -> Result<f64, RateError> {
    point_mass_potential_m2_s2(GM_EARTH_M3_S2, position_m)
}

/// Centrifugal potential of the rotating Earth, Phi = omega_E^2 (x^2 + y^2) / 2.
///
/// Inputs: `position_m` Earth-fixed (ITRF) position (m). Result: m^2/s^2 (positive).
/// omega_E is the nominal 7.292115e-5 rad/s (IERS Conventions (2010) table 1.1).
///
/// Reference: IERS Conventions (2010) ch. 10 (W = U + centrifugal potential defines W0);
/// Moritz, Geodetic Reference System 1980 (normal potential).
pub fn centrifugal_potential_m2_s2(position_m: [f64; 3]) -> Result<f64, RateError> {
    require_finite_vector("position_m", position_m)?;
    let axial_distance_squared_m2 = position_m[0] * position_m[0] + position_m[1] * position_m[1];
    Ok(0.5 * EARTH_ROTATION_RAD_S * EARTH_ROTATION_RAD_S * axial_distance_squared_m2)
}

vocabulary! {
    /// Which Earth gravity model a computation uses.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum GravityModel {
        /// U = GM/r.
        PointMass = "point_mass",
        /// U = GM/r (1 - J2 (a_E/r)^2 P2(sin phi)).
        J2 = "j2",
        /// The GRS80 normal field in closed form: the potential of the level ellipsoid with
        /// every zonal term (Heiskanen & Moritz 1967 eq. 2-126; Moritz 2000): the ellipsoid
        /// taken as the geoid for ground sites.
        Grs80 = "grs80",
        /// The J2 Earth plus the tidal potentials of the Sun and the Moon at the clock, from
        /// the planetary ephemeris at the epoch (IAU 2000 Resolution B1.3; IERS Conventions
        /// (2010) eq. 10.6): needs the epoch; the default for states with an epoch.
        J2SunMoon = "j2_sun_moon",
        /// The EGM2008 geopotential to degree and order 120 (Pavlis et al. 2012), tide-free,
        /// in the ITRS: the Earth's real field with its geoid undulations, for ground sites
        /// given by ellipsoidal height, and their default
        /// ([`crate::physics::earth::geopotential`]).
        Egm2008 = "egm2008",
    }
}

/// The Earth's Newtonian potential U(x) for the chosen model (m^2/s^2); for
/// [`GravityModel::J2SunMoon`] the Earth's part only (J2): the tides need the epoch and are
/// added by the callers that have it (`rate::state_rate_with_tides`). For
/// [`GravityModel::Grs80`] the attraction of the GRS80 level ellipsoid, V = U_normal - Phi
/// (no disturbing potential: T = 0); `position_m` has the Earth's axis as z, as for J2.
pub fn earth_potential_m2_s2(model: GravityModel, position_m: [f64; 3]) -> Result<f64, RateError> {
    match model {
        GravityModel::PointMass => earth_point_mass_potential_m2_s2(position_m),
        GravityModel::J2 | GravityModel::J2SunMoon => earth_j2_potential_m2_s2(position_m),
        GravityModel::Grs80 => {
            distance_m("position_m", position_m)?;
            grs80_normal_gravitational_potential_m2_s2(position_m)
        }
        GravityModel::Egm2008 => Err(RateError::new("gravity_model", EGM2008_GROUND_ONLY)
            .with_kind(RateErrorKind::UnsupportedGravityModel)),
    }
}

/// Why `egm2008` is refused where the position is not a ground site's.
pub const EGM2008_GROUND_ONLY: &str = "egm2008 is offered for ground sites given by ellipsoidal height (the field is evaluated at the site's ITRS position); states and ephemerides take j2_sun_moon, j2, grs80 or point_mass";

/// Earth-fixed gravity plus centrifugal potential W(x) = U(x) + omega_E^2 (x^2 + y^2)/2.
///
/// Inputs: `model`, `position_m` ITRF position (m). Result: W in m^2/s^2; on the geoid W = W0
/// = 62 636 856.0 m^2/s^2 (IERS Conventions (2010) table 1.1). With only J2, W on the GRS80
/// ellipsoid is within about 160 m^2/s^2 of W0 (the truncated J4 term; see the ground tests).
///
/// Reference: IERS Conventions (2010) ch. 10, eq. 10.6 and the definition of L_G = W0/c^2
/// (IAU 2000 Resolution B1.9).
pub fn earth_fixed_potential_m2_s2(
    model: GravityModel,
    position_m: [f64; 3],
) -> Result<f64, RateError> {
    Ok(earth_potential_m2_s2(model, position_m)? + centrifugal_potential_m2_s2(position_m)?)
}

/// Point-mass potential of the Moon, GM_Moon / |x - x_Moon|.
///
/// Inputs: `position_from_moon_m` position relative to the Moon's centre (m). Result: m^2/s^2.
/// GM_Moon = 4.902800066e12 m^3/s^2 (JPL DE430, Folkner et al. 2014).
pub fn moon_point_mass_potential_m2_s2(position_from_moon_m: [f64; 3]) -> Result<f64, RateError> {
    point_mass_potential_m2_s2(GM_MOON_M3_S2, position_from_moon_m)
}

/// Tidal part of an external point-mass potential in the geocentric frame:
/// U_tidal(x) = U_ext(x) - U_ext(0) - x . grad U_ext(0), with U_ext(x) = GM / |x - x_body|.
///
/// Inputs: `gm_m3_s2` of the external body, `body_position_m` its geocentric position (m),
/// `position_m` geocentric position of the clock (m). Result: m^2/s^2.
/// The two subtracted terms are the body's potential at the geocentre (already in TCG - TCB)
/// and the inertial potential of the geocentre's free fall towards the body.
///
/// Reference: IERS Conventions (2010) ch. 10, eq. 10.6 (external potential terms);
/// IAU 2000 Resolution B1.3.
pub fn tidal_potential_m2_s2(
    gm_m3_s2: f64,
    body_position_m: [f64; 3],
    position_m: [f64; 3],
) -> Result<f64, RateError> {
    require_finite("gm_m3_s2", gm_m3_s2)?;
    require_finite_vector("position_m", position_m)?;
    distance_m("body_position_m", body_position_m)?;
    let from_body_m = [
        position_m[0] - body_position_m[0],
        position_m[1] - body_position_m[1],
        position_m[2] - body_position_m[2],
    ];
    distance_m("position_m", from_body_m)?;
    Ok(tidal_potential_unchecked_m2_s2(
        gm_m3_s2,
        body_position_m,
        position_m,
    ))
}

/// [`tidal_potential_m2_s2`] without its checks, for integrands evaluated many times along a
/// track whose bodies come from the ephemeris: the same formula, GM [1/|x - x_A| - 1/|x_A| -
/// x . x_A/|x_A|^3] (IERS Conventions (2010) ch. 10, eq. 10.6; IAU 2000 Resolution B1.3), in
/// m^2/s^2. A non-finite input or a clock at the body's centre gives a non-finite or infinite
/// result, which the caller must refuse (the proper-time integrator does).
#[inline]
pub fn tidal_potential_unchecked_m2_s2(
    gm_m3_s2: f64,
    body_position_m: [f64; 3],
    position_m: [f64; 3],
) -> f64 {
    let from_body_m = [
        position_m[0] - body_position_m[0],
        position_m[1] - body_position_m[1],
        position_m[2] - body_position_m[2],
    ];
    let inverse_body_distance = 1.0 / dot(body_position_m, body_position_m).sqrt();
    let inverse_distance = 1.0 / dot(from_body_m, from_body_m).sqrt();
    let gradient_term = dot(position_m, body_position_m)
        * (inverse_body_distance * inverse_body_distance * inverse_body_distance);
    gm_m3_s2 * (inverse_distance - inverse_body_distance - gradient_term)
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::physics::constants::W0_M2_S2;

    #[test]
    fn point_mass_is_gm_over_r() {
        // Newton; IERS Conventions (2010) ch. 10 eq. 10.6 monopole term.
        let u = point_mass_potential_m2_s2(4.0e14, [0.0, 3.0e6, 4.0e6]).unwrap();
        assert!((u - 8.0e7).abs() < 1e-6);
    }

    #[test]
    fn j2_term_raises_equator_and_lowers_pole() {
        // Sign of the J2 term: oblate Earth, more mass near the equator (IERS Conventions (2010)
        // table 1.1, J2 > 0); |delta U| = GM J2 / (2 r) at the equator, GM J2 / r at the pole.
        let r = 7.0e6;
        let mono = GM_EARTH_M3_S2 / r;
        let ratio = EQUATORIAL_RADIUS_EARTH_M / r;
        let equator = earth_j2_potential_m2_s2([r, 0.0, 0.0]).unwrap();
        let pole = earth_j2_potential_m2_s2([0.0, 0.0, r]).unwrap();
        assert!((equator - mono - 0.5 * mono * J2_EARTH * ratio * ratio).abs() < 1e-6);
        assert!((pole - mono + mono * J2_EARTH * ratio * ratio).abs() < 1e-6);
    }

    #[test]
    fn earth_fixed_potential_is_near_w0_on_the_equator() {
        // IERS Conventions (2010) table 1.1: W0 = 62 636 856.0 m^2/s^2. At the GRS80 equator the
        // J2 field misses the J4 term, GM/a |J4| P4(0) = 3/8 * 2.37e-6 * GM/a ~ 56 m^2/s^2
        // (GRS80 J4 = -2.37e-6, Moritz; from memory), and U0 - W0 = 4.85 m^2/s^2 (GRS80
        // U0 = 62 636 860.850; from memory): |W - W0| below 70 m^2/s^2.
        let w = earth_fixed_potential_m2_s2(GravityModel::J2, [6_378_137.0, 0.0, 0.0]).unwrap();
        assert!((w - W0_M2_S2).abs() < 70.0, "W - W0 = {}", w - W0_M2_S2);
    }

    #[test]
    fn tidal_potential_vanishes_at_the_geocentre_and_is_quadratic_nearby() {
        // Definition, IERS Conventions (2010) eq. 10.6: U_tidal(0) = 0 and its gradient is 0;
        // to second order U_tidal = GM (3 (x.n)^2 - x^2) / (2 d^3) (Taylor expansion).
        let moon = [3.844e8, 0.0, 0.0];
        let at_zero = tidal_potential_m2_s2(GM_MOON_M3_S2, moon, [0.0; 3]).unwrap();
        assert!(at_zero.abs() < 1e-9);
        let x = [6.4e6, 0.0, 0.0];
        let tidal = tidal_potential_m2_s2(GM_MOON_M3_S2, moon, x).unwrap();
        let quadratic =
            GM_MOON_M3_S2 * (3.0 * 6.4e6 * 6.4e6 - 6.4e6 * 6.4e6) / (2.0 * 3.844e8f64.powi(3));
        assert!(
            (tidal / quadratic - 1.0).abs() < 0.03,
            "{tidal} vs {quadratic}"
        );
    }

    #[test]
    fn bad_positions_name_the_field() {
        // Input validation (common practice): NaN, infinity and the centre itself are rejected.
        for bad in [
            [f64::NAN, 0.0, 0.0],
            [f64::INFINITY, 0.0, 0.0],
            [0.0; 3],
            [1e300, 1e300, 1e300],
        ] {
            let err = earth_j2_potential_m2_s2(bad).unwrap_err();
            assert_eq!(err.field, "position_m");
        }
        assert_eq!(
            point_mass_potential_m2_s2(f64::NAN, [7e6, 0.0, 0.0])
                .unwrap_err()
                .field,
            "gm_m3_s2"
        );
    }
}
