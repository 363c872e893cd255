//! The rate of a clock on circular orbits of the Earth across altitudes, with the radius where
//! the velocity and gravity parts cancel against TT and the radii of the orbit classes marked on
//! the rate-profile plot.

use super::orbit::keplerian_mean_rate_parts;
use super::{RateParts, RateReference};
use crate::physics::constants::{
    EARTH_ROTATION_RAD_S, EQUATORIAL_RADIUS_EARTH_M, GM_EARTH_M3_S2, W0_M2_S2,
};

/// One point of a rate profile: the altitude above the equatorial radius and the rate parts of
/// a clock on the circular orbit there.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ProfilePoint {
    /// Altitude above the IERS equatorial radius a_E, m (the orbit radius is a_E + altitude).
    pub altitude_m: f64,
    /// The rate parts (fractional) of a clock on the circular orbit of that radius.
    pub rate: RateParts,
}

/// Rate parts of a clock on a circular orbit of radius `radius_m` about a point-mass Earth.
///
/// On a circular orbit v^2 = GM/r and U = GM/r, so sr = -GM/(2 r c^2) and gr = -GM/(r c^2)
/// (+ L_G against TT): the Keplerian mean rate of Ashby (2003) Living Rev. Relativity 6, 1,
/// eq. (38), exact at e = 0. GM of IERS Conventions (2010) table 1.1.
pub fn circular_orbit_rate(radius_m: f64, reference: RateReference) -> RateParts {
    keplerian_mean_rate_parts(GM_EARTH_M3_S2, radius_m, reference)
}

/// `count` altitudes evenly spaced from `min_altitude_m` to `max_altitude_m` (both included;
/// `count` >= 2) with the rate of a circular orbit at each ([`circular_orbit_rate`]).
pub fn circular_rate_profile(
    min_altitude_m: f64,
    max_altitude_m: f64,
    count: usize,
    reference: RateReference,
) -> Vec<ProfilePoint> {
    let intervals = count.max(2) - 1;
    (0..=intervals)
        .map(|index| {
            let fraction = index as f64 / intervals as f64;
            let altitude_m = if index == intervals {
                max_altitude_m
            } else {
                min_altitude_m + (max_altitude_m - min_altitude_m) * fraction
            };
            ProfilePoint {
                altitude_m,
                rate: circular_orbit_rate(EQUATORIAL_RADIUS_EARTH_M + altitude_m, reference),
            }
        })
        .collect()
}

/// Radius at which a clock on a circular orbit keeps the rate of TT (velocity and gravity parts
/// cancel): L_G - 3GM/(2 r c^2) = 0 with L_G c^2 = W0, so r = 3 GM / (2 W0), m.
///
/// References: Ashby (2003) Living Rev. Relativity 6, 1, sec. 5 (about 9 545 km; "from memory"
/// for the figure), W0 and GM of IERS Conventions (2010) table 1.1.
pub fn zero_rate_radius_m() -> f64 {
    3.0 * GM_EARTH_M3_S2 / (2.0 * W0_M2_S2)
}

/// Radius of a circular orbit of the Earth with `revolutions_per_sidereal_day` revolutions per
/// sidereal day (Kepler's third law r^3 = GM / n^2 with n = k * omega_E), m. One revolution is the
/// geostationary radius (about 42 164 km); two are the half-sidereal-day navigation MEO radius
/// of IS-GPS-200 (about 26 562 km). GM and omega_E of IERS Conventions (2010) table 1.1.
pub fn sidereal_resonant_radius_m(revolutions_per_sidereal_day: f64) -> f64 {
    let mean_motion_rad_s = revolutions_per_sidereal_day * EARTH_ROTATION_RAD_S;
    (GM_EARTH_M3_S2 / (mean_motion_rad_s * mean_motion_rad_s)).cbrt()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn zero_crossing_and_resonant_radii() {
        // Ashby (2003) sec. 5: the rates cancel near r = 9 545 km (from memory); the profile's
        // total changes sign there.
        let r0 = zero_rate_radius_m();
        assert!((r0 - 9_545_000.0).abs() < 2_000.0, "{r0}");
        let at = |r: f64| circular_orbit_rate(r, RateReference::Tt).total();
        assert!(at(r0).abs() < 1e-18);
        assert!(at(r0 - 1_000.0) < 0.0 && at(r0 + 1_000.0) > 0.0);
        // Geostationary radius 42 164 km (common practice); GPS nominal semi-major axis
        // 26 561.75 km (IS-GPS-200, table 20-IV region; as used in the README tour).
        assert!((sidereal_resonant_radius_m(1.0) - 42_164_170.0).abs() < 100.0);
        assert!((sidereal_resonant_radius_m(2.0) - 26_561_750.0).abs() < 500.0);
    }

    #[test]
    fn profile_matches_the_orbit_rate_at_each_altitude() {
        // IS-GPS-200 20.3.3.3.3.1 via the README's MEO example: at a = 26 561.75 km the total is
        // about +38.6 us/day against TT (from memory: the well-known 38 us/day).
        let points = circular_rate_profile(200e3, 50_000e3, 11, RateReference::Tt);
        assert_eq!(points.len(), 11);
        assert_eq!(points[0].altitude_m, 200e3);
        assert_eq!(points[10].altitude_m, 50_000e3);
        let meo = circular_orbit_rate(26_561_750.0, RateReference::Tt);
        let us_day = meo.to_microseconds_per_day();
        assert!((us_day.total - 38.6).abs() < 0.3, "{}", us_day.total);
        assert!((us_day.sr + 7.2).abs() < 0.1 && (us_day.gr - 45.8).abs() < 0.3);
        for point in points {
            let expect = circular_orbit_rate(
                EQUATORIAL_RADIUS_EARTH_M + point.altitude_m,
                RateReference::Tt,
            );
            assert_eq!(point.rate, expect);
        }
    }
}
