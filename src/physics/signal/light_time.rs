//! One-way light time between a transmitter and a receiver near the Earth, with its Sagnac,
//! Shapiro and clock terms.

use crate::physics::constants::{GM_EARTH_M3_S2, MAX_DEPTH_BELOW_SURFACE_M, SPEED_OF_LIGHT_M_S};
use crate::physics::gravity::norm;
use crate::physics::rate::state::{periodic_value_s, MIN_GCRS_DISTANCE_M};
use crate::physics::rate::Frame;
use crate::physics::readable::readable;
use crate::physics::signal::error::{SignalError, SignalErrorKind};
use crate::physics::signal::formulas::{difference_m, segment_closest_approach_m, shapiro_delay_s};
use crate::physics::signal::motion::{emission, Emission, TransmitterMotion};
use crate::physics::signal::validate::{itrf_velocity, validate_endpoint};

/// Convergence threshold of the light-time iteration: the change of the light time between two
/// iterations, s. For light times above about 1.1 s the threshold is 4 ulp of the light time
/// instead, the resolution of a double there.
pub const CONVERGENCE_TOLERANCE_S: f64 = 1.0e-15;

/// Most iterations tried. Each iteration reduces the error by about |v|/c (v the transmitter's
/// speed in the frame of computation), so a navigation satellite converges in 3 or 4; only a
/// transmitter faster than about 0.5 c needs more than 50.
pub const MAX_ITERATIONS: u32 = 50;

/// Closest two points may be, m: below it the light time is not a useful quantity (and a zero
/// range makes the Shapiro formula meaningless).
pub const MIN_RANGE_M: f64 = 1.0;

/// One end of the signal path: a geocentric position and, optionally, a velocity, both in the
/// frame of the [`PathGeometry`] and both at the reception instant.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Endpoint {
    /// Geocentric position, m.
    pub position_m: [f64; 3],
    /// Velocity in the frame (for ITRF: relative to the rotating Earth), m/s. `None` means at
    /// rest in the frame (for ITRF: fixed on the Earth).
    pub velocity_m_s: Option<[f64; 3]>,
}

/// A transmitter and a receiver in one frame, their states at the reception instant.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct PathGeometry {
    /// Frame of every position and velocity: GCRS (non-rotating) or ITRF (Earth-fixed).
    pub frame: Frame,
    /// The transmitter's state at the reception instant; it is moved back to the emission time.
    pub transmitter: Endpoint,
    /// How the transmitter moves when it has a velocity (free fall or uniform; see
    /// [`emission`]). Without a velocity it is at rest in `frame`.
    pub transmitter_motion: TransmitterMotion,
    /// The receiver at the reception instant.
    pub receiver: Endpoint,
}

/// The light time and its parts. Path terms add up:
/// `light_time_s = geometric_range_m / c + sagnac_s + shapiro_s` (to rounding).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SignalPath {
    /// Coordinate time from emission to reception, s (TCG seconds; the difference from TT
    /// seconds is a factor 1 - L_G, 5e-11 s on a 0.07 s light time).
    pub light_time_s: f64,
    /// Range in the frame of the input: ITRF, |x_R(t_R) - x_T(t_T)| with both in Earth-fixed
    /// coordinates (the rotating-frame range); GCRS, the inertial range. m.
    pub geometric_range_m: f64,
    /// Range in the non-rotating frame (equal to `geometric_range_m` for GCRS), m.
    pub inertial_range_m: f64,
    /// Iterations used (the last one changed the light time by less than the tolerance).
    pub iterations: u32,
    /// Sagnac term, (inertial range - rotating-frame range)/c, s; 0 for GCRS input.
    pub sagnac_s: f64,
    /// Shapiro delay of the Earth, s (positive).
    pub shapiro_s: f64,
    /// Transmitter clock's periodic relativistic term at emission, -2 r.v/c^2, s; `None` when
    /// the transmitter's velocity is not given. A clock term: not part of `light_time_s`.
    pub clock_periodic_s: Option<f64>,
    /// The transmitter position at emission in the input frame, m.
    pub emission_position_m: [f64; 3],
}

/// Solves the light-time equation between a transmitter and a receiver near the Earth.
///
/// Equation: `tau = |x_R(t_R) - X_T(t_R - tau)| / c + Delta_Shapiro`, with X_T the transmitter
/// position in a non-rotating frame, solved by fixed-point iteration from tau_0 = |x_R - x_T|/c
/// until tau changes by less than [`CONVERGENCE_TOLERANCE_S`] (at most [`MAX_ITERATIONS`]).
///
/// * The transmitter's motion over the flight is [`emission`]'s: in free fall (the default for
///   a transmitter with a velocity) integrated in the point-mass plus J2 field, within 1e-8 m
///   of its true path for a navigation satellite; uniform in the input frame when asked (an
///   error of about a tau^2 / 2, 1 to 2 mm for a navigation satellite); at rest in the frame
///   without a velocity (ITRF: carried exactly by the Earth's rotation).
/// * GCRS input: X_T = x_T(t_T); the Sagnac term is 0 (the rotation is in the positions).
/// * ITRF input (the GNSS way): the computation runs in the non-rotating frame whose axes are
///   the Earth-fixed axes at t_R; the transmitter's Earth-fixed position at emission is rotated
///   by -omega_E tau about z (IS-GPS-200 20.3.3.4.3.3.2). The Sagnac term is reported as the
///   exact difference (inertial range - rotating-frame range)/c; to first order it is
///   (omega_E/c^2)(x_T y_R - y_T x_R) ([`super::formulas::sagnac_rotating_frame_s`]).
/// * Shapiro delay of the Earth, IERS Conventions (2010) eq. 11.17 with GM of table 1.1, from
///   the inertial range and the geocentric distances at emission and reception.
/// * Clock term of the transmitter (when its velocity is given): -2 r.v/c^2 at emission with
///   the inertial velocity (IS-GPS-200 20.3.3.3.3.1): the transmitter clock's reading minus
///   coordinate time. A receiver that reads the transmitter's time stamps sees
///   `light_time_s - clock_periodic_s`.
///
/// Errors (`code`, `field`): `not_finite`; `inside_earth` (ITRF: more than 11 km below the
/// GRS80 ellipsoid; GCRS: closer than 6 345 752 m); `beyond_range` (farther than 1.5e9 m, where
/// the Sun's delay, neglected, dominates); `speed_not_below_c` (inertial speed >= c);
/// `coincident_endpoints` (range below 1 m); `path_through_earth` (the straight path passes
/// more than 11 km below the polar radius); `no_convergence`.
///
/// References: IERS Conventions (2010) ch. 11 (light time, eq. 11.17); IS-GPS-200
/// 20.3.3.4.3.3.2 and 20.3.3.3.3.1; Ashby (2003) Living Rev. Relativity 6, 1, section 5.
pub fn signal_path(geometry: &PathGeometry) -> Result<SignalPath, SignalError> {
    let frame = geometry.frame;
    let transmitter = geometry.transmitter;
    let receiver = geometry.receiver;
    validate_endpoint(
        frame,
        "transmitter",
        transmitter.position_m,
        transmitter.velocity_m_s,
    )?;
    validate_endpoint(
        frame,
        "receiver",
        receiver.position_m,
        receiver.velocity_m_s,
    )?;
    let motion = geometry.transmitter_motion;
    let initial_range_m = norm(difference_m(receiver.position_m, transmitter.position_m));
    if initial_range_m < MIN_RANGE_M {
        return Err(SignalError::new(
            SignalErrorKind::CoincidentEndpoints,
            "receiver.position_m",
            format!(
                "transmitter and receiver are {initial_range_m} m apart; at least {MIN_RANGE_M} m is needed", initial_range_m = readable(initial_range_m)
            ),
        ));
    }
    let mut light_time_s = initial_range_m / SPEED_OF_LIGHT_M_S;
    for iteration in 1..=MAX_ITERATIONS {
        let step = evaluate(frame, &transmitter, motion, &receiver, light_time_s)?;
        let change_s = (step.light_time_s - light_time_s).abs();
        light_time_s = step.light_time_s;
        let tolerance_s = CONVERGENCE_TOLERANCE_S.max(4.0 * f64::EPSILON * light_time_s);
        if change_s <= tolerance_s {
            return finish(frame, &transmitter, motion, &receiver, step, iteration);
        }
    }
    Err(SignalError::new(
        SignalErrorKind::NoConvergence,
        "transmitter.velocity_m_s",
        format!(
            "the light-time iteration did not converge in {MAX_ITERATIONS} iterations (a transmitter speed close to c converges slowly)"
        ),
    ))
}

/// Positions and light time computed from one trial light time.
#[derive(Debug, Clone, Copy)]
struct Step {
    light_time_s: f64,
    emission: Emission,
    inertial_range_m: f64,
    shapiro_s: f64,
}

fn evaluate(
    frame: Frame,
    transmitter: &Endpoint,
    motion: TransmitterMotion,
    receiver: &Endpoint,
    light_time_s: f64,
) -> Result<Step, SignalError> {
    let emission = emission(
        frame,
        transmitter.position_m,
        transmitter.velocity_m_s,
        motion,
        light_time_s,
    );
    let inertial_range_m = norm(difference_m(receiver.position_m, emission.inertial_m));
    let shapiro_s = shapiro_delay_s(
        GM_EARTH_M3_S2,
        norm(emission.inertial_m),
        norm(receiver.position_m),
        inertial_range_m,
    )
    .ok_or_else(path_through_earth)?;
    Ok(Step {
        light_time_s: inertial_range_m / SPEED_OF_LIGHT_M_S + shapiro_s,
        emission,
        inertial_range_m,
        shapiro_s,
    })
}

fn finish(
    frame: Frame,
    transmitter: &Endpoint,
    motion: TransmitterMotion,
    receiver: &Endpoint,
    last: Step,
    iterations: u32,
) -> Result<SignalPath, SignalError> {
    // Re-evaluate at the converged light time so that every part comes from the same geometry.
    let step = evaluate(frame, transmitter, motion, receiver, last.light_time_s)?;
    let emission_frame_m = step.emission.frame_m;
    let emission_distance_m = norm(emission_frame_m);
    if emission_distance_m < MIN_GCRS_DISTANCE_M {
        return Err(SignalError::new(
            SignalErrorKind::InsideEarth,
            "transmitter.velocity_m_s",
            "moved back to the emission time, the transmitter is inside the Earth",
        ));
    }
    if segment_closest_approach_m(step.emission.inertial_m, receiver.position_m)
        < MIN_GCRS_DISTANCE_M
    {
        return Err(path_through_earth());
    }
    let geometric_range_m = match frame {
        Frame::Gcrs => step.inertial_range_m,
        Frame::Itrf => norm(difference_m(receiver.position_m, emission_frame_m)),
    };
    let clock_periodic_s = match step.emission.inertial_velocity_m_s {
        // r.v is the same on the axes at emission and at reception.
        Some(velocity) => Some(periodic_value_s(step.emission.inertial_m, velocity)),
        None => transmitter.velocity_m_s.map(|velocity| {
            let inertial_velocity_m_s = match frame {
                Frame::Gcrs => velocity,
                Frame::Itrf => itrf_velocity(emission_frame_m, velocity),
            };
            periodic_value_s(emission_frame_m, inertial_velocity_m_s)
        }),
    };
    Ok(SignalPath {
        light_time_s: step.light_time_s,
        geometric_range_m,
        inertial_range_m: step.inertial_range_m,
        iterations,
        sagnac_s: (step.inertial_range_m - geometric_range_m) / SPEED_OF_LIGHT_M_S,
        shapiro_s: step.shapiro_s,
        clock_periodic_s,
        emission_position_m: emission_frame_m,
    })
}

fn path_through_earth() -> SignalError {
    SignalError::new(
        SignalErrorKind::PathThroughEarth,
        "receiver.position_m",
        format!(
            "the straight path from the transmitter to the receiver passes more than {MAX_DEPTH_BELOW_SURFACE_M} m below the Earth's polar radius: the receiver cannot see the transmitter"
        ),
    )
}

#[cfg(test)]
#[path = "light_time_tests.rs"]
mod tests;
