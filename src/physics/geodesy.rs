//! GRS80 geodesy for clock rates: geodetic coordinates to Earth-fixed (ITRF) positions, Earth-fixed
//! to inertial velocities, GRS80 normal gravity, and the "inside the Earth" bound.
//!
//! Angles are in degrees at the interface (`_deg`), lengths in metres.

use crate::physics::constants::{
    EARTH_ROTATION_RAD_S, GRS80_FLATTENING, GRS80_NORMAL_GRAVITY_EQUATOR_M_S2,
    GRS80_NORMAL_GRAVITY_POLE_M_S2, GRS80_SEMI_MAJOR_AXIS_M, MAX_DEPTH_BELOW_SURFACE_M,
};
use crate::physics::rate_error::{
    require_finite, require_finite_vector, require_latitude_deg, require_longitude_deg, RateError,
    RateErrorKind,
};
use crate::physics::readable::readable;

/// GRS80 semi-minor axis b = a (1 - f), m (6 356 752.3141 m, Moritz, GRS80).
pub const GRS80_SEMI_MINOR_AXIS_M: f64 = GRS80_SEMI_MAJOR_AXIS_M * (1.0 - GRS80_FLATTENING);

/// GRS80 first eccentricity squared e^2 = f (2 - f) (0.00669438002290, Moritz, GRS80).
pub const GRS80_ECCENTRICITY_SQUARED: f64 = GRS80_FLATTENING * (2.0 - GRS80_FLATTENING);

/// GRS80 geodetic (latitude, longitude, ellipsoidal height) to Earth-fixed Cartesian coordinates.
///
/// Inputs: `latitude_deg` in [-90, 90], `longitude_deg` finite (east positive), `height_m`
/// ellipsoidal height, at least -11 km. Result: ITRF-aligned position [x, y, z] in metres.
/// Formula: N = a / sqrt(1 - e^2 sin^2 phi); x = (N + h) cos phi cos lambda,
/// y = (N + h) cos phi sin lambda, z = (N (1 - e^2) + h) sin phi.
///
/// References: Moritz, Geodetic Reference System 1980 (a, f); Heiskanen & Moritz, Physical
/// Geodesy (1967) eq. 5-3; the same algorithm as ERFA eraGd2gce (checked against eraGd2gc).
pub fn geodetic_to_ecef_m(
    latitude_deg: f64,
    longitude_deg: f64,
    height_m: f64,
) -> Result<[f64; 3], RateError> {
    require_latitude_deg("latitude_deg", latitude_deg)?;
    require_longitude_deg("longitude_deg", longitude_deg)?;
    require_height_m("height_m", height_m)?;
    let (sin_lat, cos_lat) = latitude_deg.to_radians().sin_cos();
    let (sin_lon, cos_lon) = longitude_deg.to_radians().sin_cos();
    let prime_vertical_radius_m =
        GRS80_SEMI_MAJOR_AXIS_M / (1.0 - GRS80_ECCENTRICITY_SQUARED * sin_lat * sin_lat).sqrt();
    let horizontal_m = (prime_vertical_radius_m + height_m) * cos_lat;
    Ok([
        horizontal_m * cos_lon,
        horizontal_m * sin_lon,
        (prime_vertical_radius_m * (1.0 - GRS80_ECCENTRICITY_SQUARED) + height_m) * sin_lat,
    ])
}

/// Largest height accepted for a site fixed to the rotating Earth, m. A co-rotating point at
/// 1e8 m moves at 7.3 km/s; beyond it the "site" is no longer a clock on or near the Earth.
pub const MAX_SITE_HEIGHT_M: f64 = 1.0e8;

/// Checks a height above a reference surface: finite, in [-11 km, 1e8 m].
pub fn require_height_m(field: &'static str, height_m: f64) -> Result<f64, RateError> {
    require_finite(field, height_m)?;
    if height_m < -MAX_DEPTH_BELOW_SURFACE_M {
        return Err(RateError::new(
            field,
            format!(
                "must be at least -{MAX_DEPTH_BELOW_SURFACE_M} m (deeper than any real clock), got {height_m}", height_m = readable(height_m)
            ),
        )
        .with_kind(RateErrorKind::BelowSurface));
    }
    if height_m > MAX_SITE_HEIGHT_M {
        return Err(RateError::new(
            field,
            format!("must be at most {MAX_SITE_HEIGHT_M} m for a site fixed to the body (give a `state` for a clock farther out), got {height_m}", height_m = readable(height_m)),
        )
        .with_kind(RateErrorKind::BeyondModelRange));
    }
    Ok(height_m)
}

/// Inertial velocity of a point given in the rotating Earth-fixed frame:
/// v_inertial = v_ecef + omega_E x r, omega_E = (0, 0, 7.292115e-5 rad/s).
///
/// Inputs: `position_m`, `velocity_m_s` in ITRF. Result: the velocity in a non-rotating frame
/// expressed on the ITRF axes. Precession, nutation, polar motion and UT1 - UTC are ignored:
/// a rotation of the axes changes neither |v| nor the point-mass potential, which is all a
/// rate needs; the nominal omega_E differs from the true rate by about 1e-8 relative (length of
/// day variations), i.e. below 1e-19 of the fractional rate of a ground clock.
///
/// Reference: IERS Conventions (2010) table 1.1 (omega_E); Ashby (2003) Living Rev.
/// Relativity 6, 1, section 2 (rotating frame).
pub fn itrf_to_inertial_velocity_m_s(
    position_m: [f64; 3],
    velocity_m_s: [f64; 3],
) -> Result<[f64; 3], RateError> {
    require_finite_vector("position_m", position_m)?;
    require_finite_vector("velocity_m_s", velocity_m_s)?;
    Ok([
        velocity_m_s[0] - EARTH_ROTATION_RAD_S * position_m[1],
        velocity_m_s[1] + EARTH_ROTATION_RAD_S * position_m[0],
        velocity_m_s[2],
    ])
}

/// True when an Earth-fixed position lies inside the GRS80 ellipsoid shrunk by 11 km on both
/// axes, i.e. deeper than any real clock: (x^2 + y^2)/(a - d)^2 + z^2/(b - d)^2 < 1, d = 11 km.
pub fn is_deep_inside_earth(position_m: [f64; 3]) -> bool {
    let equatorial_m = GRS80_SEMI_MAJOR_AXIS_M - MAX_DEPTH_BELOW_SURFACE_M;
    let polar_m = GRS80_SEMI_MINOR_AXIS_M - MAX_DEPTH_BELOW_SURFACE_M;
    let horizontal_sq = position_m[0] * position_m[0] + position_m[1] * position_m[1];
    horizontal_sq / (equatorial_m * equatorial_m)
        + position_m[2] * position_m[2] / (polar_m * polar_m)
        < 1.0
}

/// GRS80 normal gravity on the ellipsoid (Somigliana's closed formula):
/// gamma = gamma_e (1 + k sin^2 phi) / sqrt(1 - e^2 sin^2 phi), k = b gamma_p / (a gamma_e) - 1.
///
/// Input: `latitude_deg` geodetic latitude in [-90, 90]. Result: m/s^2 (9.7803 at the equator,
/// 9.8322 at the poles). Reference: Moritz, Geodetic Reference System 1980 (gamma_e, gamma_p);
/// Heiskanen & Moritz (1967) eq. 2-78.
pub fn normal_gravity_m_s2(latitude_deg: f64) -> Result<f64, RateError> {
    require_latitude_deg("latitude_deg", latitude_deg)?;
    let sin_sq = latitude_deg.to_radians().sin().powi(2);
    let k = GRS80_SEMI_MINOR_AXIS_M * GRS80_NORMAL_GRAVITY_POLE_M_S2
        / (GRS80_SEMI_MAJOR_AXIS_M * GRS80_NORMAL_GRAVITY_EQUATOR_M_S2)
        - 1.0;
    Ok(GRS80_NORMAL_GRAVITY_EQUATOR_M_S2 * (1.0 + k * sin_sq)
        / (1.0 - GRS80_ECCENTRICITY_SQUARED * sin_sq).sqrt())
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn geodetic_to_ecef_matches_erfa_gd2gc() {
        // Reference: pyerfa eraGd2gc(n=2, GRS80), script tests/reference/rate_geodesy_gd2gc.py.
        let reference = [
            ((0.0, 0.0, 0.0), [6378137.0, 0.0, 0.0]),
            (
                (45.0, 10.0, 250.0),
                [4449132.613524301, 784502.1205143017, 4487525.185450096],
            ),
            (
                (-33.5, -70.25, 1500.0),
                [1799514.7936955907, -5012063.8390807025, -3501162.1934023835],
            ),
            (
                (89.9, 135.0, -20.0),
                [-7897.9282630272755, 7897.928263027277, 6356722.567034951],
            ),
            (
                (52.0, 359.5, 8848.0),
                [3940257.8007928417, -34386.10888902393, 5009775.664516651],
            ),
        ];
        for ((lat, lon, h), expected) in reference {
            let got = geodetic_to_ecef_m(lat, lon, h).unwrap();
            for axis in 0..3 {
                assert!(
                    (got[axis] - expected[axis]).abs() < 1e-6,
                    "{lat} {lon} {h}: {got:?}"
                );
            }
        }
    }

    #[test]
    fn grs80_derived_constants() {
        // Moritz, Geodetic Reference System 1980: b = 6 356 752.3141 m, e^2 = 0.00669438002290.
        assert!((GRS80_SEMI_MINOR_AXIS_M - 6_356_752.314_1).abs() < 1e-4);
        assert!((GRS80_ECCENTRICITY_SQUARED - 0.006_694_380_022_90).abs() < 1e-14);
    }

    #[test]
    fn normal_gravity_at_equator_pole_and_45_degrees() {
        // Moritz, GRS80: gamma_e = 9.7803267715, gamma_p = 9.8321863685, and the normal gravity
        // at 45 deg, 9.806199203 m/s^2 (GRS80 table, from memory).
        assert!((normal_gravity_m_s2(0.0).unwrap() - 9.780_326_771_5).abs() < 1e-10);
        assert!((normal_gravity_m_s2(-90.0).unwrap() - 9.832_186_368_5).abs() < 1e-9);
        assert!((normal_gravity_m_s2(45.0).unwrap() - 9.806_199_203).abs() < 1e-8);
    }

    #[test]
    fn rotating_frame_adds_omega_cross_r() {
        // IERS Conventions (2010) table 1.1: a point at rest on the equator moves at
        // omega_E * a = 465.1 m/s eastward (common practice).
        let v = itrf_to_inertial_velocity_m_s([6_378_137.0, 0.0, 0.0], [0.0; 3]).unwrap();
        assert!(v[0].abs() < 1e-12 && v[2].abs() < 1e-12);
        assert!((v[1] - 465.101).abs() < 1e-3, "{v:?}");
    }

    #[test]
    fn deep_inside_bound() {
        // Bound documented above: 11 km below the GRS80 ellipsoid (common practice).
        assert!(!is_deep_inside_earth(
            geodetic_to_ecef_m(30.0, 40.0, -10_900.0).unwrap()
        ));
        assert!(!is_deep_inside_earth(
            geodetic_to_ecef_m(90.0, 0.0, -10_900.0).unwrap()
        ));
        assert!(is_deep_inside_earth([
            0.0,
            GRS80_SEMI_MAJOR_AXIS_M - 11_100.0,
            0.0
        ]));
        assert!(is_deep_inside_earth([
            0.0,
            0.0,
            -(GRS80_SEMI_MINOR_AXIS_M - 11_100.0)
        ]));
    }

    #[test]
    fn bad_geodetic_inputs_name_the_field() {
        // Input validation (common practice).
        assert_eq!(
            geodetic_to_ecef_m(90.5, 0.0, 0.0).unwrap_err().field,
            "latitude_deg"
        );
        assert_eq!(
            geodetic_to_ecef_m(f64::NAN, 0.0, 0.0).unwrap_err().field,
            "latitude_deg"
        );
        assert_eq!(
            geodetic_to_ecef_m(0.0, f64::INFINITY, 0.0)
                .unwrap_err()
                .field,
            "longitude_deg"
        );
        assert_eq!(
            geodetic_to_ecef_m(0.0, 0.0, -12_000.0).unwrap_err().field,
            "height_m"
        );
    }
}
