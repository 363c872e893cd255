//! The relativistic periodic terms of an orbiting clock and the J2 terms of an orbit's rate.

use crate::physics::constants::{
    EQUATORIAL_RADIUS_EARTH_M, GM_EARTH_M3_S2, J2_EARTH, SPEED_OF_LIGHT_SQUARED_M2_S2,
};
use crate::physics::rate::{RateParts, RateReference};
use std::f64::consts::PI;

/// The conventional periodic relativistic correction -2 r.v/c^2, s: the periodic part of the
/// satellite clock's proper time minus coordinate time (positive = the clock reads ahead).
///
/// Inputs: geocentric position (m) and velocity (m/s). r.v is the same with the inertial or the
/// Earth-fixed velocity (they differ by omega x r, which is perpendicular to r), so SP3 states
/// can be used as they are. Reference: IS-GPS-200 20.3.3.3.3.1 (dt_r = -2 r.v/c^2, equal to
/// F e sqrt(A) sin E on a Keplerian orbit).
pub fn conventional_periodic_s(position_m: [f64; 3], velocity_m_s: [f64; 3]) -> f64 {
    let r_dot_v = position_m[0] * velocity_m_s[0]
        + position_m[1] * velocity_m_s[1]
        + position_m[2] * velocity_m_s[2];
    -2.0 * r_dot_v / SPEED_OF_LIGHT_SQUARED_M2_S2
}

/// Inertial velocity from an Earth-fixed state: v_I = v_EF + omega_E x r (rotation about z at
/// the nominal 7.292115e-5 rad/s of IERS Conventions (2010) table 1.1; polar motion and
/// precession-nutation left out, which moves the J2 term by below 1 ps).
pub fn inertial_velocity_m_s(position_m: [f64; 3], earth_fixed_velocity_m_s: [f64; 3]) -> [f64; 3] {
    let w = crate::physics::constants::EARTH_ROTATION_RAD_S;
    [
        earth_fixed_velocity_m_s[0] - w * position_m[1],
        earth_fixed_velocity_m_s[1] + w * position_m[0],
        earth_fixed_velocity_m_s[2],
    ]
}

/// Osculating semi-major axis of the point-mass orbit through a state, m, from the vis-viva
/// equation 1/a = 2/r - v^2/GM (GM of IERS Conventions (2010)); None when the state is not on a
/// closed orbit (v^2 >= 2GM/r).
pub fn osculating_semi_major_axis_m(position_m: [f64; 3], velocity_m_s: [f64; 3]) -> Option<f64> {
    let r_m = norm(position_m);
    let v2 = dot(velocity_m_s, velocity_m_s);
    let inverse_a = 2.0 / r_m - v2 / GM_EARTH_M3_S2;
    (inverse_a > 0.0 && r_m > 0.0).then(|| 1.0 / inverse_a)
}

/// sin^2(i) sin(2u) of the osculating orbit through an inertial state (i the inclination to the
/// equator, u the argument of latitude), written without angles:
/// sin^2(i) sin(2u) = 2 z (y h_x - x h_y) / (r^2 |h|), h = r x v. It follows from
/// sin u = z/(r sin i), cos u = (x cos(Omega) + y sin(Omega))/r and the node direction
/// (-h_y, h_x, 0)/(|h| sin i) (Vallado, Fundamentals of Astrodynamics and Applications,
/// algorithm 9, from memory); it has no singularity at i = 0.
pub fn sin2_inclination_sin_twice_latitude_argument(
    position_m: [f64; 3],
    inertial_velocity_m_s: [f64; 3],
) -> f64 {
    let [x, y, z] = position_m;
    let h = cross(position_m, inertial_velocity_m_s);
    let h_norm = norm(h);
    let r2 = dot(position_m, position_m);
    if h_norm == 0.0 || r2 == 0.0 {
        return 0.0;
    }
    2.0 * z * (y * h[0] - x * h[1]) / (r2 * h_norm)
}

/// Amplitude of the J2 periodic clock term, (3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i), s
/// (Kouba (2004) GPS Solutions 8:170-180; derived in the module notes). About 72 ps for a
/// navigation orbit (a = 26 561.75 km, i = 55 deg).
pub fn j2_periodic_amplitude_s(semi_major_axis_m: f64, sin2_inclination: f64) -> f64 {
    let mean_motion_rad_s = (GM_EARTH_M3_S2 / semi_major_axis_m.powi(3)).sqrt();
    1.5 * J2_EARTH * EQUATORIAL_RADIUS_EARTH_M * EQUATORIAL_RADIUS_EARTH_M
        / SPEED_OF_LIGHT_SQUARED_M2_S2
        * mean_motion_rad_s
        * sin2_inclination
}

/// Period of the J2 periodic term, s: half the Keplerian period, pi sqrt(a^3/GM) (the term goes
/// with sin(2u); Kouba (2004)).
pub fn j2_periodic_period_s(semi_major_axis_m: f64) -> f64 {
    PI * (semi_major_axis_m.powi(3) / GM_EARTH_M3_S2).sqrt()
}

/// The J2 periodic clock term -(3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i) sin(2u), s, given
/// a and the product sin^2(i) sin(2u) (Kouba (2004) GPS Solutions 8:170-180).
pub fn j2_periodic_s(semi_major_axis_m: f64, sin2_inclination_sin_twice_u: f64) -> f64 {
    -j2_periodic_amplitude_s(semi_major_axis_m, sin2_inclination_sin_twice_u)
}

/// The J2 periodic clock term at an inertial state (osculating a and u from the state), s;
/// None when the state is not on a closed orbit. Kouba (2004); see [`j2_periodic_s`].
pub fn j2_periodic_at_state_s(
    position_m: [f64; 3],
    inertial_velocity_m_s: [f64; 3],
) -> Option<f64> {
    let a_m = osculating_semi_major_axis_m(position_m, inertial_velocity_m_s)?;
    let product = sin2_inclination_sin_twice_latitude_argument(position_m, inertial_velocity_m_s);
    Some(j2_periodic_s(a_m, product))
}

/// Time average of U_J2 over a Keplerian orbit, m^2/s^2:
/// <U_J2> = -(GM J2 a_E^2 / (2 a^3 (1 - e^2)^(3/2))) ((3/2) sin^2(i) - 1).
/// From <1/r^3> = a^-3 (1 - e^2)^-3/2 and <sin^2(u)/r^3> = <1/r^3>/2 (the e cos(nu) part of
/// r^-3 dt = (1 + e cos nu) du / (p h) averages out against sin^2 u); the classical secular J2
/// potential (Vallado, Fundamentals of Astrodynamics and Applications, sec. 9.6, from memory).
pub fn j2_mean_potential_m2_s2(
    semi_major_axis_m: f64,
    eccentricity: f64,
    sin2_inclination: f64,
) -> f64 {
    let p3 = (1.0 - eccentricity * eccentricity).powf(1.5);
    -GM_EARTH_M3_S2 * J2_EARTH * EQUATORIAL_RADIUS_EARTH_M * EQUATORIAL_RADIUS_EARTH_M
        / (2.0 * semi_major_axis_m.powi(3) * p3)
        * (1.5 * sin2_inclination - 1.0)
}

/// Mean rate parts of a clock on a J2 orbit whose energy semi-major axis is `a`
/// (E = v^2/2 - GM/r - U_J2 = -GM/(2a), the constant of motion), m.
///
/// From the module derivation: <v^2> = GM/a + 4 <U_J2> and <U> = GM/a + 2 <U_J2>, so the
/// J2 change of the rate is -4 <U_J2>/c^2, split -2 <U_J2>/c^2 into each of sr and gr; first
/// order in J2 ([`j2_mean_potential_m2_s2`]). With another definition of a (mean elements of
/// an orbit theory, or the osculating a of one state) the point-mass part changes at order J2
/// too, so the definition is part of the answer.
pub fn j2_mean_rate_parts(
    semi_major_axis_m: f64,
    eccentricity: f64,
    sin2_inclination: f64,
    reference: RateReference,
) -> RateParts {
    let gm_over_a = GM_EARTH_M3_S2 / semi_major_axis_m;
    let u_j2 = j2_mean_potential_m2_s2(semi_major_axis_m, eccentricity, sin2_inclination);
    RateParts::from_speed_and_potential(reference, gm_over_a + 4.0 * u_j2, gm_over_a + 2.0 * u_j2)
}

/// The J2 change of the mean fractional rate, -4 <U_J2>/c^2 (see [`j2_mean_rate_parts`]).
pub fn j2_mean_rate_change(
    semi_major_axis_m: f64,
    eccentricity: f64,
    sin2_inclination: f64,
) -> f64 {
    -4.0 * j2_mean_potential_m2_s2(semi_major_axis_m, eccentricity, sin2_inclination)
        / SPEED_OF_LIGHT_SQUARED_M2_S2
}

fn dot(a: [f64; 3], b: [f64; 3]) -> f64 {
    a[0] * b[0] + a[1] * b[1] + a[2] * b[2]
}

fn norm(a: [f64; 3]) -> f64 {
    dot(a, a).sqrt()
}

fn cross(a: [f64; 3], b: [f64; 3]) -> [f64; 3] {
    [
        a[1] * b[2] - a[2] * b[1],
        a[2] * b[0] - a[0] * b[2],
        a[0] * b[1] - a[1] * b[0],
    ]
}
