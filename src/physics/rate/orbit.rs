//! Mean rate and periodic term of a clock on a Keplerian orbit around the Earth.

use crate::physics::readable::readable;
use std::f64::consts::PI;

use crate::physics::constants::{
    GM_EARTH_M3_S2, MAX_GEOCENTRIC_DISTANCE_M, SPEED_OF_LIGHT_SQUARED_M2_S2,
};
use crate::physics::gravity::GravityModel;
use crate::physics::rate::error::{require_finite, RateError, RateErrorKind};
use crate::physics::rate::state::MIN_GCRS_DISTANCE_M;
use crate::physics::rate::{RateParts, RateReference};

/// Where on the orbit the periodic term is wanted.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Anomaly {
    /// True anomaly nu, degrees.
    TrueDeg(f64),
    /// Mean anomaly M, degrees.
    MeanDeg(f64),
    /// Eccentric anomaly E, degrees.
    EccentricDeg(f64),
}

/// A Keplerian orbit around the Earth. The inclination, node and argument of perigee are not
/// inputs: a point-mass orbit's clock rate and periodic term do not depend on them.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct KeplerianOrbit {
    /// Semi-major axis a, m.
    pub semi_major_axis_m: f64,
    /// Eccentricity e in [0, 1).
    pub eccentricity: f64,
    /// Optional point on the orbit for the periodic value.
    pub anomaly: Option<Anomaly>,
}

/// The periodic (eccentricity) part of tau - t.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct PeriodicTerm {
    /// Amplitude 2 sqrt(GM a) e / c^2, s.
    pub amplitude_s: f64,
    /// Value -2 sqrt(GM a) e sin(E) / c^2 at the given anomaly, s (None without an anomaly).
    pub value_s: Option<f64>,
}

/// Result of [`orbit_rate`].
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct OrbitRate {
    /// Time-averaged fractional rate over one orbit, split (see [`keplerian_mean_rate_parts`]).
    pub mean: RateParts,
    /// Periodic term.
    pub periodic: PeriodicTerm,
}

/// Largest |angle| accepted for an anomaly, degrees (beyond it f64 loses the fraction of a turn).
pub const MAX_ANGLE_DEG: f64 = 1.0e6;

/// The model notes of [`orbit_rate`] (Ashby (2003) Living Rev. Relativity 6, 1).
pub const ORBIT_NOTES: [&str; 3] = [
    "mean rate over one revolution of a point-mass Keplerian orbit: sr = -GM/(2ac^2), gr = (W0 - GM/a)/c^2 against TT (Ashby (2003) Living Rev. Relativity 6, 1)",
    "GM = 3.986004418e14 m^3/s^2 (IERS Conventions (2010), TCG-compatible); the IS-GPS-200 value 3.986005e14 changes the total by less than 1e-16 and the periodic amplitude by about 7e-8 of itself",
    "inclination, node and argument of perigee do not change the first-order rate or the periodic term",
];
/// The model note of an orbit when J2 (or the GRS80 field) was asked for at a level that also
/// covers other subjects: [`orbit_rate`] has no J2 mean rate.
pub const ORBIT_J2_NOT_APPLIED_NOTE: &str = "the request-level gravity_model j2 does not apply to orbit mean rates (the J2 average needs the inclination and a definition of a at the level of the J2 effect); point_mass used: give gravity_model j2 and inclination_deg on the orbit's item, or a state vector";

/// The same note for a request-level `grs80`.
pub const ORBIT_GRS80_NOT_APPLIED_NOTE: &str = "the request-level gravity_model grs80 does not apply to orbit mean rates (the average of its zonal terms depends on the definition of a and e at their own level); point_mass used: give a state vector for grs80";

/// The note of an orbit under a request-level `egm2008`.
pub const ORBIT_EGM2008_NOT_APPLIED_NOTE: &str = "the request-level gravity_model egm2008 applies to ground sites (the field at a fixed ITRS position); point_mass used for orbit mean rates";

/// Mean rate and periodic term of a clock on a Keplerian orbit (GM of IERS Conventions (2010)
/// table 1.1, TCG-compatible).
///
/// Inputs: `orbit`, `reference` (TT or TCG), `model`: only [`GravityModel::PointMass`]. The
/// J2 orbit average depends on the inclination and on how a is defined at the level of the J2
/// effect itself: it is `physics::clock_data::orbit_j2::orbit_rate_j2` (a the energy semi-major axis);
/// another model here returns an error naming `gravity_model`.
///
/// Errors: a not finite or not positive, periapsis a(1 - e) deeper than 11 km below the
/// GRS80 polar radius, apoapsis beyond 1.5e9 m, e outside [0, 1), anomaly not finite.
///
/// References: IS-GPS-200 20.3.3.3.3.1; Ashby (2003) Living Rev. Relativity 6, 1, eq. (38)-(40).
pub fn orbit_rate(
    orbit: &KeplerianOrbit,
    reference: RateReference,
    model: GravityModel,
) -> Result<OrbitRate, RateError> {
    if model != GravityModel::PointMass {
        return Err(RateError::new(
            "gravity_model",
            "orbit mean rates use the point-mass model; give a state vector to include J2",
        )
        .with_kind(RateErrorKind::UnsupportedGravityModel));
    }
    let a_m = validate_orbit(orbit)?;
    let e = orbit.eccentricity;
    let value_s = match orbit.anomaly {
        None => None,
        Some(anomaly) => {
            let eccentric_anomaly_rad = eccentric_anomaly_rad(anomaly, e)?;
            Some(periodic_value_at_anomaly_s(
                GM_EARTH_M3_S2,
                a_m,
                e,
                eccentric_anomaly_rad,
            ))
        }
    };
    Ok(OrbitRate {
        mean: keplerian_mean_rate_parts(GM_EARTH_M3_S2, a_m, reference),
        periodic: PeriodicTerm {
            amplitude_s: periodic_amplitude_s(GM_EARTH_M3_S2, a_m, e),
            value_s,
        },
    })
}

/// Orbit-averaged rate parts of a Keplerian orbit.
///
/// Inputs: `gm_m3_s2`, `semi_major_axis_m` (validated by the caller), `reference`.
/// Split used: over one period the time averages are <v^2>/2 = GM/(2a) and <U> = <GM/r> = GM/a
/// for any e, so `sr = -GM/(2 a c^2)` and `gr = -GM/(a c^2)` (+ L_G relative to TT); the total
/// -(3GM/(2a) - W0)/c^2 is the secular term of tau - t.
///
/// References: Ashby (2003) Living Rev. Relativity 6, 1, eq. (38); IS-GPS-200 (the 10.23 MHz
/// factory offset follows from this total).
pub fn keplerian_mean_rate_parts(
    gm_m3_s2: f64,
    semi_major_axis_m: f64,
    reference: RateReference,
) -> RateParts {
    let gm_over_a = gm_m3_s2 / semi_major_axis_m;
    RateParts::from_speed_and_potential(reference, gm_over_a, gm_over_a)
}

/// Amplitude of the periodic term, 2 sqrt(GM a) e / c^2, s (IS-GPS-200 20.3.3.3.3.1:
/// |F| e sqrt(A); Ashby (2003) eq. (40)).
pub fn periodic_amplitude_s(gm_m3_s2: f64, semi_major_axis_m: f64, eccentricity: f64) -> f64 {
    2.0 * (gm_m3_s2 * semi_major_axis_m).sqrt() * eccentricity / SPEED_OF_LIGHT_SQUARED_M2_S2
}

/// Periodic term of tau - t at eccentric anomaly E: -2 sqrt(GM a) e sin(E) / c^2, s
/// (IS-GPS-200 20.3.3.3.3.1, dt_r = F e sqrt(A) sin E_k).
pub fn periodic_value_at_anomaly_s(
    gm_m3_s2: f64,
    semi_major_axis_m: f64,
    eccentricity: f64,
    eccentric_anomaly_rad: f64,
) -> f64 {
    -periodic_amplitude_s(gm_m3_s2, semi_major_axis_m, eccentricity) * eccentric_anomaly_rad.sin()
}

/// The relativistic correction constant F = -2 sqrt(mu)/c^2, s/m^(1/2) (IS-GPS-200
/// 20.3.3.3.3.1; -4.442807633e-10 with the GPS mu = 3.986005e14 m^3/s^2).
pub fn relativistic_correction_constant_s_per_sqrt_m(gm_m3_s2: f64) -> f64 {
    -2.0 * gm_m3_s2.sqrt() / SPEED_OF_LIGHT_SQUARED_M2_S2
}

/// Eccentric anomaly E (rad) from a true, mean or eccentric anomaly, for 0 <= e < 1.
///
/// True: E = 2 atan2(sqrt(1 - e) sin(nu/2), sqrt(1 + e) cos(nu/2)). Mean: Kepler's equation,
/// by [`solve_kepler_equation_rad`]. References: Vallado, Fundamentals of Astrodynamics and
/// Applications, algorithms 2 and 5 (from memory); Kepler's equation.
pub fn eccentric_anomaly_rad(anomaly: Anomaly, eccentricity: f64) -> Result<f64, RateError> {
    let (field, angle_deg) = match anomaly {
        Anomaly::TrueDeg(value) => ("true_anomaly_deg", value),
        Anomaly::MeanDeg(value) => ("mean_anomaly_deg", value),
        Anomaly::EccentricDeg(value) => ("eccentric_anomaly_deg", value),
    };
    require_finite(field, angle_deg)?;
    if angle_deg.abs() > MAX_ANGLE_DEG {
        return Err(RateError::new(
            field,
            format!(
                "must be at most {MAX_ANGLE_DEG} degrees in magnitude, got {angle_deg}",
                angle_deg = readable(angle_deg)
            ),
        )
        .with_kind(RateErrorKind::AngleOutOfRange));
    }
    let e = eccentricity;
    let angle_rad = angle_deg.to_radians().rem_euclid(2.0 * PI);
    Ok(match anomaly {
        Anomaly::EccentricDeg(_) => angle_rad,
        Anomaly::TrueDeg(_) => {
            let half = 0.5 * angle_rad;
            2.0 * ((1.0 - e).sqrt() * half.sin()).atan2((1.0 + e).sqrt() * half.cos())
        }
        Anomaly::MeanDeg(_) => solve_kepler_equation_rad(angle_rad, e),
    })
}

/// Eccentric anomaly E in [0, 2 pi) (up to the last Newton step) of the mean anomaly `mean_rad`
/// (any finite value; reduced to [0, 2 pi) first, so a large M loses no accuracy) for
/// 0 <= e < 1: Kepler's equation E - e sin E = M by Newton's method, starting at E = M, or at
/// pi for e > 0.8 (which converges for every M), at most 50 steps, stopping below 1e-15 rad.
/// References: Kepler's equation; Vallado, Fundamentals of Astrodynamics and Applications,
/// algorithm 2 (from memory). The one solver of the crate.
pub fn solve_kepler_equation_rad(mean_rad: f64, eccentricity: f64) -> f64 {
    let e = eccentricity;
    let mean_rad = mean_rad.rem_euclid(2.0 * PI);
    let mut ecc = if e > 0.8 { PI } else { mean_rad };
    for _ in 0..50 {
        let step = (ecc - e * ecc.sin() - mean_rad) / (1.0 - e * ecc.cos());
        ecc -= step;
        if step.abs() < 1e-15 {
            break;
        }
    }
    ecc
}

fn validate_orbit(orbit: &KeplerianOrbit) -> Result<f64, RateError> {
    let a_m = require_finite("semi_major_axis_m", orbit.semi_major_axis_m)?;
    let e = require_finite("eccentricity", orbit.eccentricity)?;
    if !(0.0..1.0).contains(&e) {
        return Err(RateError::new(
            "eccentricity",
            format!(
                "must lie in [0, 1) for a closed orbit, got {e}",
                e = readable(e)
            ),
        )
        .with_kind(RateErrorKind::InvalidEccentricity));
    }
    if !(MIN_GCRS_DISTANCE_M..=MAX_GEOCENTRIC_DISTANCE_M).contains(&a_m) {
        let kind = if a_m <= 0.0 {
            RateErrorKind::InvalidSemiMajorAxis
        } else if a_m < MIN_GCRS_DISTANCE_M {
            RateErrorKind::BelowSurface
        } else {
            RateErrorKind::BeyondModelRange
        };
        return Err(RateError::new(
            "semi_major_axis_m",
            format!(
                "must lie in [{MIN_GCRS_DISTANCE_M}, {MAX_GEOCENTRIC_DISTANCE_M}] m (above the Earth, inside its Hill sphere), got {a_m}", a_m = readable(a_m)
            ),
        )
        .with_kind(kind));
    }
    let periapsis_m = a_m * (1.0 - e);
    if periapsis_m < MIN_GCRS_DISTANCE_M {
        return Err(RateError::new(
            "eccentricity",
            format!("periapsis a(1 - e) = {periapsis_m} m is inside the Earth (below {MIN_GCRS_DISTANCE_M} m)", periapsis_m = readable(periapsis_m)),
        )
        .with_kind(RateErrorKind::BelowSurface));
    }
    let apoapsis_m = a_m * (1.0 + e);
    if apoapsis_m > MAX_GEOCENTRIC_DISTANCE_M {
        return Err(RateError::new(
            "eccentricity",
            format!("apoapsis a(1 + e) = {apoapsis_m} m is beyond the Earth's Hill sphere ({MAX_GEOCENTRIC_DISTANCE_M} m)", apoapsis_m = readable(apoapsis_m)),
        )
        .with_kind(RateErrorKind::BeyondModelRange));
    }
    Ok(a_m)
}

#[cfg(test)]
#[path = "orbit_tests.rs"]
mod tests;
