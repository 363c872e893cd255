//! The transmitter's motion over the light time: free fall in the Earth's field (a satellite)
//! or uniform motion in the frame of the input (anything else given with a velocity).

use crate::physics::constants::{
    EARTH_ROTATION_RAD_S, EQUATORIAL_RADIUS_EARTH_M, GM_EARTH_M3_S2, J2_EARTH,
};
use crate::physics::rate::Frame;
use crate::physics::signal::formulas::rotate_about_z_m;
use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// How a transmitter given with a velocity moves between emission and reception.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum TransmitterMotion {
        /// Free fall in the Earth's field, point mass plus J2 (a satellite): the default.
        FreeFall = "free_fall",
        /// Uniform motion in the frame of the input (a vehicle, or anything not in free fall).
        Uniform = "uniform",
    }
}

/// Longest step of the free-fall integration, s. One classical Runge-Kutta step over the
/// 0.07 s flight of a navigation signal errs by below 1e-15 m; over 1 s in a low orbit
/// (mean motion 1.2e-3 rad/s) by about 1e-10 m (the h^5 n^5 r / 120 of the method).
pub const MAX_FREE_FALL_STEP_S: f64 = 1.0;

/// Acceleration of a body in free fall in the Earth's point-mass plus J2 field, m/s^2:
/// a = -GM x/r^3 - (3/2) J2 GM a_E^2 / r^5 [x (1 - 5 z^2/r^2), y (1 - 5 z^2/r^2),
/// z (3 - 5 z^2/r^2)], the gradient of U = GM/r (1 - J2 (a_E/r)^2 P2(z/r)).
///
/// Inputs: `position_m` geocentric with the Earth's axis as z, `j2` the zonal coefficient
/// (0 for a point mass). GM and a_E of IERS Conventions (2010) table 1.1.
///
/// Reference: IERS Conventions (2010) ch. 6 eq. 6.6 truncated at degree 2 (its gradient);
/// Montenbruck & Gill, Satellite Orbits (2000) section 3.2 (from memory).
pub fn j2_acceleration_m_s2(position_m: [f64; 3], j2: f64) -> [f64; 3] {
    let r2 = position_m[0] * position_m[0]
        + position_m[1] * position_m[1]
        + position_m[2] * position_m[2];
    let r = r2.sqrt();
    let monopole = -GM_EARTH_M3_S2 / (r2 * r);
    let zonal = -1.5 * j2 * GM_EARTH_M3_S2 * EQUATORIAL_RADIUS_EARTH_M.powi(2) / (r2 * r2 * r);
    let z2_over_r2 = position_m[2] * position_m[2] / r2;
    [
        position_m[0] * (monopole + zonal * (1.0 - 5.0 * z2_over_r2)),
        position_m[1] * (monopole + zonal * (1.0 - 5.0 * z2_over_r2)),
        position_m[2] * (monopole + zonal * (3.0 - 5.0 * z2_over_r2)),
    ]
}

fn add_scaled(base: [f64; 3], scale: f64, direction: [f64; 3]) -> [f64; 3] {
    [
        base[0] + scale * direction[0],
        base[1] + scale * direction[1],
        base[2] + scale * direction[2],
    ]
}

/// Position and velocity of a body in free fall `duration_s` after the state
/// (`position_m`, `velocity_m_s`) in a non-rotating geocentric frame (negative: before),
/// by classical fourth-order Runge-Kutta steps of at most [`MAX_FREE_FALL_STEP_S`] in the
/// field of [`j2_acceleration_m_s2`].
///
/// Reference: Press et al., Numerical Recipes (3rd ed. 2007) eq. 17.1.3 (from memory; the classical
/// Runge-Kutta method).
pub fn free_fall_state(
    position_m: [f64; 3],
    velocity_m_s: [f64; 3],
    duration_s: f64,
    j2: f64,
) -> ([f64; 3], [f64; 3]) {
    let steps = (duration_s.abs() / MAX_FREE_FALL_STEP_S)
        .ceil()
        .clamp(1.0, 1.0e6);
    let h = duration_s / steps;
    let (mut x, mut v) = (position_m, velocity_m_s);
    // `steps` is a whole number in [1, 1e6].
    for _ in 0..steps as u32 {
        let a1 = j2_acceleration_m_s2(x, j2);
        let x2 = add_scaled(x, 0.5 * h, v);
        let v2 = add_scaled(v, 0.5 * h, a1);
        let a2 = j2_acceleration_m_s2(x2, j2);
        let x3 = add_scaled(x, 0.5 * h, v2);
        let v3 = add_scaled(v, 0.5 * h, a2);
        let a3 = j2_acceleration_m_s2(x3, j2);
        let x4 = add_scaled(x, h, v3);
        let v4 = add_scaled(v, h, a3);
        let a4 = j2_acceleration_m_s2(x4, j2);
        for axis in 0..3 {
            x[axis] += h / 6.0 * (v[axis] + 2.0 * v2[axis] + 2.0 * v3[axis] + v4[axis]);
            v[axis] += h / 6.0 * (a1[axis] + 2.0 * a2[axis] + 2.0 * a3[axis] + a4[axis]);
        }
    }
    (x, v)
}

/// Where the transmitter was at emission, `light_time_s` before reception.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Emission {
    /// Position in the frame of the input, m (ITRF: Earth-fixed at the emission instant).
    pub frame_m: [f64; 3],
    /// Position in the non-rotating frame whose axes are the input frame's at reception, m.
    pub inertial_m: [f64; 3],
    /// Inertial velocity at emission (same axes), m/s, when the transmitter is in free fall.
    pub inertial_velocity_m_s: Option<[f64; 3]>,
}

/// The transmitter's emission state `light_time_s` before reception, from its state at
/// reception (`position_m`, `velocity_m_s` in `frame`; no velocity: at rest in `frame`).
///
/// * At rest: GCRS, the same point; ITRF, the Earth-fixed point carried by the Earth's
///   rotation (its acceleration is centripetal, omega x (omega x r), not free fall), exactly.
/// * [`TransmitterMotion::Uniform`]: x - v tau in the input frame (for ITRF, then rotated as
///   a point fixed on the Earth would be); off by about a tau^2/2 for an accelerated body.
/// * [`TransmitterMotion::FreeFall`]: the inertial state (ITRF: v + omega_E x r) integrated
///   back by [`free_fall_state`] in the point-mass plus J2 field (IERS Conventions (2010)
///   table 1.1 GM, J2, a_E; the frame's z axis as the Earth's, so for GCRS the pole's
///   0.15 deg precession-nutation tilt changes the J2 acceleration by about 1e-2 of itself,
///   5e-7 m/s^2 at navigation orbits, 1e-9 m over 0.07 s). The higher zonal terms (J4/J2
///   about 2e-3) and the Moon and Sun (about 5e-6 m/s^2 of tidal acceleration at navigation
///   orbits) move the transmitter by about 1e-8 m over 0.07 s.
///
/// The Earth-fixed position at emission is the inertial one rotated by +omega_E tau about z
/// (IS-GPS-200 20.3.3.4.3.3.2, the inverse of the rotation applied to a fixed point).
pub fn emission(
    frame: Frame,
    position_m: [f64; 3],
    velocity_m_s: Option<[f64; 3]>,
    motion: TransmitterMotion,
    light_time_s: f64,
) -> Emission {
    let angle_rad = EARTH_ROTATION_RAD_S * light_time_s;
    match (velocity_m_s, motion) {
        (Some(velocity), TransmitterMotion::FreeFall) => {
            let inertial_velocity = match frame {
                Frame::Gcrs => velocity,
                Frame::Itrf => add_scaled(
                    velocity,
                    EARTH_ROTATION_RAD_S,
                    [-position_m[1], position_m[0], 0.0],
                ),
            };
            let (inertial_m, inertial_velocity_m_s) =
                free_fall_state(position_m, inertial_velocity, -light_time_s, J2_EARTH);
            let frame_m = match frame {
                Frame::Gcrs => inertial_m,
                Frame::Itrf => rotate_about_z_m(inertial_m, angle_rad),
            };
            Emission {
                frame_m,
                inertial_m,
                inertial_velocity_m_s: Some(inertial_velocity_m_s),
            }
        }
        _ => {
            let frame_m = add_scaled(position_m, -light_time_s, velocity_m_s.unwrap_or([0.0; 3]));
            let inertial_m = match frame {
                Frame::Gcrs => frame_m,
                Frame::Itrf => rotate_about_z_m(frame_m, -angle_rad),
            };
            Emission {
                frame_m,
                inertial_m,
                inertial_velocity_m_s: None,
            }
        }
    }
}

#[cfg(test)]
#[path = "motion_tests.rs"]
mod tests;
