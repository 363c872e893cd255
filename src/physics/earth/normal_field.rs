//! The GRS80 normal gravity field in closed form: the potential of the level ellipsoid
//! (gravitation plus centrifugal), exact at every height, not a series in h/a.
//!
//! The level ellipsoid is the GRS80 one (Moritz, "Geodetic Reference System 1980", J. Geodesy
//! 74 (2000) 128-133): a, f, GM and omega of [`crate::physics::constants`]. Its surface is an
//! equipotential surface of U with U = U0 (62 636 860.850 m^2/s^2 in that publication).

use crate::physics::constants::{EARTH_ROTATION_RAD_S, GRS80_GM_M3_S2, GRS80_SEMI_MAJOR_AXIS_M};
use crate::physics::geodesy::{geodetic_to_ecef_m, GRS80_SEMI_MINOR_AXIS_M};
use crate::physics::rate_error::{require_finite_vector, RateError, RateErrorKind};

/// GRS80 linear eccentricity E = sqrt(a^2 - b^2), m (521 854.0097 m, Moritz 2000).
pub fn grs80_linear_eccentricity_m() -> f64 {
    let a = GRS80_SEMI_MAJOR_AXIS_M;
    let b = GRS80_SEMI_MINOR_AXIS_M;
    ((a - b) * (a + b)).sqrt()
}

/// Ellipsoidal-harmonic coordinates of a point: u, the semi-minor axis of the confocal
/// ellipsoid through it (m), and the reduced latitude beta (as sin^2 beta).
///
/// Formula: with r^2 = x^2 + y^2 + z^2, u^2 = (r^2 - E^2)/2 (1 + sqrt(1 + 4 E^2 z^2 /
/// (r^2 - E^2)^2)) and sin^2 beta = z^2 / u^2 (Heiskanen & Moritz, Physical Geodesy (1967)
/// eqs. 1-151 and 6-8; the two-root solution of x^2+y^2 over u^2+E^2 plus z^2 over u^2 = 1).
///
/// Inputs: `position_m` Earth-fixed position. Result `(u_m, sin2_beta)`; points closer to the
/// centre than E (inside the focal disc's reach) are refused as inside the Earth.
pub fn ellipsoidal_coordinates(position_m: [f64; 3]) -> Result<(f64, f64), RateError> {
    require_finite_vector("position_m", position_m)?;
    let e2 = grs80_linear_eccentricity_m().powi(2);
    let z2 = position_m[2] * position_m[2];
    let r2 = position_m[0] * position_m[0] + position_m[1] * position_m[1] + z2;
    let excess_m2 = r2 - e2;
    if excess_m2 <= 0.0 {
        return Err(RateError::new(
            "position_m",
            "the point is deep inside the Earth, where no normal field applies",
        )
        .with_kind(RateErrorKind::BelowSurface));
    }
    let u2 = 0.5 * excess_m2 * (1.0 + (1.0 + 4.0 * e2 * z2 / (excess_m2 * excess_m2)).sqrt());
    let sin2_beta = (z2 / u2).min(1.0);
    Ok((u2.sqrt(), sin2_beta))
}

/// The function q(u) = ((1 + 3 u^2/E^2) arctan(E/u) - 3 u/E) / 2 of the level ellipsoid, from
/// its series in x = E/u: q = sum over n >= 1 of (-1)^(n+1) 2n x^(2n+1) / ((2n+1)(2n+3)),
/// which avoids the cancellation of the closed form (x <= 0.083 anywhere outside the Earth);
/// for x > 0.3 (points deep inside the Earth) the closed form, whose cancellation is mild there.
///
/// Reference: Heiskanen & Moritz, Physical Geodesy (1967) eq. 2-57 (closed form); the series
/// is its Taylor expansion (arctan), derived here term by term.
pub fn level_ellipsoid_q(eccentricity_over_u: f64) -> f64 {
    if eccentricity_over_u > 0.3 {
        let x = eccentricity_over_u;
        return 0.5 * ((1.0 + 3.0 / (x * x)) * x.atan() - 3.0 / x);
    }
    let x2 = eccentricity_over_u * eccentricity_over_u;
    let mut power = eccentricity_over_u * x2;
    let mut sum = 0.0;
    let mut sign = 1.0;
    for n in 1..=40 {
        let n = f64::from(n);
        let term = sign * 2.0 * n * power / ((2.0 * n + 1.0) * (2.0 * n + 3.0));
        sum += term;
        if term.abs() < 1e-20 * sum.abs() {
            break;
        }
        power *= x2;
        sign = -sign;
    }
    sum
}

/// GRS80 normal potential U = V + Phi (gravitation plus centrifugal) at an Earth-fixed point,
/// in closed form:
///
/// U(u, beta) = GM/E arctan(E/u) + (omega^2 a^2 / 2) (q/q0) (sin^2 beta - 1/3)
///              + (omega^2 / 2) (u^2 + E^2) cos^2 beta
///
/// with q0 = q(b). Inputs: `position_m` Earth-fixed (ITRF-aligned) position, m. Result:
/// m^2/s^2; U0 = 62 636 860.850 on the ellipsoid.
///
/// Reference: Heiskanen & Moritz, Physical Geodesy (1967) eq. 2-126; Moritz, Geodetic
/// Reference System 1980, J. Geodesy 74 (2000) 128-133 (constants).
pub fn grs80_normal_potential_m2_s2(position_m: [f64; 3]) -> Result<f64, RateError> {
    let (u_m, sin2_beta) = ellipsoidal_coordinates(position_m)?;
    let linear_eccentricity_m = grs80_linear_eccentricity_m();
    let omega2 = EARTH_ROTATION_RAD_S * EARTH_ROTATION_RAD_S;
    let a = GRS80_SEMI_MAJOR_AXIS_M;
    let q = level_ellipsoid_q(linear_eccentricity_m / u_m);
    let q0 = level_ellipsoid_q(linear_eccentricity_m / GRS80_SEMI_MINOR_AXIS_M);
    let gravitation = GRS80_GM_M3_S2 / linear_eccentricity_m * (linear_eccentricity_m / u_m).atan();
    let flattening_term = 0.5 * omega2 * a * a * (q / q0) * (sin2_beta - 1.0 / 3.0);
    let centrifugal = 0.5
        * omega2
        * (u_m * u_m + linear_eccentricity_m * linear_eccentricity_m)
        * (1.0 - sin2_beta);
    Ok(gravitation + flattening_term + centrifugal)
}

/// GRS80 normal gravitational potential V = U - Phi (the level ellipsoid's attraction alone,
/// without the centrifugal term omega^2 (x^2 + y^2)/2), m^2/s^2, at an Earth-fixed point.
///
/// Reference: Heiskanen & Moritz, Physical Geodesy (1967) eq. 2-126 less the centrifugal
/// potential (eq. 2-37, from memory); GRS80 constants (Moritz 2000). The GM is GRS80's, 3.986 005e14, not
/// the IERS 3.986 004 418e14: the degree-0 terms differ by 1.5e-9 of GM/r (about 9 m^2/s^2,
/// 1e-16 of a rate, on the ground).
pub fn grs80_normal_gravitational_potential_m2_s2(position_m: [f64; 3]) -> Result<f64, RateError> {
    let normal_m2_s2 = grs80_normal_potential_m2_s2(position_m)?;
    let axial_squared_m2 = position_m[0] * position_m[0] + position_m[1] * position_m[1];
    Ok(normal_m2_s2 - 0.5 * EARTH_ROTATION_RAD_S * EARTH_ROTATION_RAD_S * axial_squared_m2)
}

/// GRS80 normal potential on the ellipsoid, U0, m^2/s^2, from the closed form at the equator
/// (the same at every latitude: the ellipsoid is a level surface).
pub fn grs80_surface_potential_m2_s2() -> f64 {
    grs80_normal_potential_m2_s2([GRS80_SEMI_MAJOR_AXIS_M, 0.0, 0.0]).unwrap_or(f64::NAN)
}

/// Normal-potential difference between the ellipsoid and a point h above it along the normal,
/// U0 - U(phi, h), exact at every height (closed form, not the free-air series).
///
/// Inputs: `latitude_deg` geodetic in [-90, 90], `height_m` in [-11 km, 1e8 m]. Result:
/// m^2/s^2, positive above the surface (about 9.8 per metre near the ground).
///
/// Reference: Heiskanen & Moritz, Physical Geodesy (1967) eq. 2-126 with GRS80 constants
/// (Moritz 2000).
pub fn grs80_normal_potential_drop_m2_s2(
    latitude_deg: f64,
    height_m: f64,
) -> Result<f64, RateError> {
    let position_m = geodetic_to_ecef_m(latitude_deg, 0.0, height_m)?;
    grs80_normal_potential_drop_at_m2_s2(position_m)
}

/// The same drop U0 - U(x) at an Earth-fixed point `position_m` (m), m^2/s^2.
///
/// Reference: Heiskanen & Moritz, Physical Geodesy (1967) eq. 2-126 with GRS80 constants
/// (Moritz 2000).
pub fn grs80_normal_potential_drop_at_m2_s2(position_m: [f64; 3]) -> Result<f64, RateError> {
    Ok(grs80_surface_potential_m2_s2() - grs80_normal_potential_m2_s2(position_m)?)
}

#[cfg(test)]
#[path = "normal_field_tests.rs"]
mod tests;
