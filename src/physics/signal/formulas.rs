//! The published formulas of the signal-path corrections, one small function each.
//!
//! Positions are geocentric, in metres; times in seconds. "Rotating frame" means Earth-fixed
//! (ITRF) coordinates, rotating at the nominal omega_E = 7.292115e-5 rad/s about +z.

use crate::physics::constants::{
    EARTH_ROTATION_RAD_S, SPEED_OF_LIGHT_M_S, SPEED_OF_LIGHT_SQUARED_M2_S2,
};
use crate::physics::gravity::{dot, norm};

/// Gravitational (Shapiro) delay of a light signal in the field of a point mass, with the PPN
/// parameter gamma = 1:
///
/// `Delta_t = (2 GM / c^3) ln((r_A + r_B + rho) / (r_A + r_B - rho))`
///
/// Inputs: `gm_m3_s2` gravitational constant of the body (m^3/s^2), `transmitter_distance_m`
/// r_A and `receiver_distance_m` r_B from the body's centre (m), `range_m` rho the distance
/// between the two points (m). Result: the delay in seconds (positive: the signal arrives later
/// than rho/c), or `None` when the formula does not apply (non-finite values, or
/// r_A + r_B - rho <= 0, i.e. the straight path passes through the body's centre).
///
/// Notes: for a navigation satellite (r = 26 561.75 km) seen from the ground it is about
/// 13 mm (zenith) to 19 mm (horizon) times 1/c.
///
/// Reference: IERS Conventions (2010) ch. 11, eq. 11.17 (with gamma = 1).
pub fn shapiro_delay_s(
    gm_m3_s2: f64,
    transmitter_distance_m: f64,
    receiver_distance_m: f64,
    range_m: f64,
) -> Option<f64> {
    let sum_m = transmitter_distance_m + receiver_distance_m;
    let numerator_m = sum_m + range_m;
    let denominator_m = sum_m - range_m;
    if !(numerator_m.is_finite() && denominator_m.is_finite() && gm_m3_s2.is_finite())
        || denominator_m <= 0.0
        || range_m < 0.0
    {
        return None;
    }
    let delay_s = 2.0 * gm_m3_s2 / (SPEED_OF_LIGHT_SQUARED_M2_S2 * SPEED_OF_LIGHT_M_S)
        * (numerator_m / denominator_m).ln();
    delay_s.is_finite().then_some(delay_s)
}

/// Signed area of the projection onto the equatorial (x, y) plane of the triangle
/// geocentre - `from_m` - `to_m`: `A = (x_from y_to - y_from x_to) / 2`, in m^2.
///
/// Positive when the path from `from_m` to `to_m` runs eastward (counter-clockwise seen from
/// the north pole), i.e. with the Earth's rotation.
///
/// Reference: ITU-R Recommendation TF.1153, Annex 1 section "Sagnac-effect correction" (the
/// area A of the equatorial projection); Ashby (2003) Living Rev. Relativity 6, 1, eq. (26).
pub fn equatorial_projected_area_m2(from_m: [f64; 3], to_m: [f64; 3]) -> f64 {
    0.5 * (from_m[0] * to_m[1] - from_m[1] * to_m[0])
}

/// Sagnac correction of a one-way light time computed in the rotating (Earth-fixed) frame:
///
/// `Delta_t = (omega_E / c^2) (x_A y_B - y_A x_B) = 2 omega_E A / c^2`
///
/// Inputs: `transmitter_m` (A, at emission) and `receiver_m` (B, at reception), Earth-fixed
/// positions in metres. Result: seconds to add to the rotating-frame range divided by c to get
/// the light time (first order in omega_E). Positive for an eastward signal: the receiver moves
/// away during the flight. A the signed area of [`equatorial_projected_area_m2`].
///
/// References: IS-GPS-200 20.3.3.4.3.3.2 (Earth rotation correction); IERS Conventions (2010)
/// ch. 11; ITU-R Recommendation TF.1153 (the 2 omega_E A / c^2 form).
pub fn sagnac_rotating_frame_s(transmitter_m: [f64; 3], receiver_m: [f64; 3]) -> f64 {
    2.0 * EARTH_ROTATION_RAD_S * equatorial_projected_area_m2(transmitter_m, receiver_m)
        / SPEED_OF_LIGHT_SQUARED_M2_S2
}

/// Rotates a vector by `angle_rad` about the z axis (counter-clockwise seen from +z, an active
/// rotation): `[x cos a - y sin a, x sin a + y cos a, z]`.
///
/// A point fixed on the Earth with Earth-fixed coordinates p has, in the non-rotating frame
/// whose axes coincide with the Earth-fixed axes at time t_0, the coordinates
/// `rotate_about_z_m(p, omega_E (t - t_0))`; the emission position of a GNSS transmitter is
/// rotated by `-omega_E tau` (IS-GPS-200 20.3.3.4.3.3.2; common practice in GNSS processing).
pub fn rotate_about_z_m(vector_m: [f64; 3], angle_rad: f64) -> [f64; 3] {
    let (sin_a, cos_a) = angle_rad.sin_cos();
    [
        vector_m[0] * cos_a - vector_m[1] * sin_a,
        vector_m[0] * sin_a + vector_m[1] * cos_a,
        vector_m[2],
    ]
}

/// Smallest distance from the geocentre of the straight segment from `start_m` to `end_m`, m
/// (elementary geometry: the foot of the perpendicular, clamped to the segment).
pub fn segment_closest_approach_m(start_m: [f64; 3], end_m: [f64; 3]) -> f64 {
    let direction_m = difference_m(end_m, start_m);
    let length_squared_m2 = dot(direction_m, direction_m);
    let fraction = if length_squared_m2 > 0.0 {
        (-dot(start_m, direction_m) / length_squared_m2).clamp(0.0, 1.0)
    } else {
        0.0
    };
    norm([
        start_m[0] + fraction * direction_m[0],
        start_m[1] + fraction * direction_m[1],
        start_m[2] + fraction * direction_m[2],
    ])
}

/// Elevation of `target_m` seen from a site, in degrees above the site's horizon plane (the
/// plane normal to the GRS80 ellipsoid normal at geodetic latitude phi and longitude lambda):
/// `asin(((target - site) . n) / |target - site|)`, n = (cos phi cos lambda,
/// cos phi sin lambda, sin phi). Result in [-90, 90]; `None` if target and site coincide.
///
/// Reference: common practice (topocentric horizon system, e.g. IERS Conventions (2010) ch. 4
/// local frame; Heiskanen & Moritz (1967) ch. 5).
pub fn elevation_deg(
    site_latitude_deg: f64,
    site_longitude_deg: f64,
    site_m: [f64; 3],
    target_m: [f64; 3],
) -> Option<f64> {
    let (sin_lat, cos_lat) = site_latitude_deg.to_radians().sin_cos();
    let (sin_lon, cos_lon) = site_longitude_deg.to_radians().sin_cos();
    let up = [cos_lat * cos_lon, cos_lat * sin_lon, sin_lat];
    let line_of_sight_m = difference_m(target_m, site_m);
    let distance_m = norm(line_of_sight_m);
    if !(distance_m > 0.0 && distance_m.is_finite()) {
        return None;
    }
    let sine = (dot(line_of_sight_m, up) / distance_m).clamp(-1.0, 1.0);
    Some(sine.asin().to_degrees())
}

/// a - b for 3-vectors.
pub fn difference_m(a: [f64; 3], b: [f64; 3]) -> [f64; 3] {
    [a[0] - b[0], a[1] - b[1], a[2] - b[2]]
}
