//! Proper time accumulated along a trajectory.
//!
//! The integrand is the fractional rate offset d(tau)/dt - 1 of the clock, supplied by the
//! caller as a function of position and velocity (for example, relative to TT,
//! `-(v^2/2 + U - W0)/c^2`; IERS Conventions (2010) eq. 10.6 at first post-Newtonian order),
//! split into a velocity part and a gravity part. The coordinate time t is whatever time the
//! trajectory is parameterized by (TT seconds for the ephemeris readers); the rate function
//! must be relative to that same time.
//!
//! Each interval between consecutive output epochs is integrated by Gauss-Legendre quadrature
//! whose node count (2 to 8, with halving of the interval if needed) follows from the interval
//! length times the local angular rate |v|/|r| (see [`quadrature::GaussLegendre::plan`]); the
//! interval integrals are accumulated with Neumaier's compensated summation.
//!
//! For every output epoch the result also gives the Keplerian periodic term `-2 r.v / c^2`
//! (IS-GPS-200 section 20.3.3.3.3.1; Ashby, Living Rev. Relativity 6 (2003) 1, eq. 52) and the
//! residual of tau - t after removing that term and a least-squares straight line: for an
//! unperturbed orbit around a point mass the residual is zero, so its RMS measures how far the
//! trajectory departs from a Keplerian clock behaviour (J2, drag, manoeuvres, interpolation).
//!
//! Earth-fixed trajectories: [`EarthFixed`] takes each ITRS state into the GCRS with the full
//! IERS Conventions (2010) ch. 5 transformation at that epoch (precession-nutation, the Earth
//! rotation angle from UT1, polar motion with s'), velocities with the rates of all three
//! ([`crate::physics::earth::orientation::span`]), so the rate function sees an inertial state
//! and takes the zonal field about the CIP as for GCRS trajectories.

pub mod kepler;
mod quadrature;
mod series;
pub mod tides;

pub use quadrature::{CompensatedSum, GaussLegendre, MAX_NODES};
pub use series::{
    kepler_periodic_term_s, relative_to_tcg, ProperTimeSample, ProperTimeSeries, ProperTimeSummary,
    PERIODIC_NOTE,
};

use crate::physics::readable::readable;
use std::fmt;

use crate::physics::vocabulary::vocabulary;

use crate::physics::constants::SPEED_OF_LIGHT_SQUARED_M2_S2;
use crate::physics::earth::orientation::span::OrientationSpan;

/// A trajectory: inertial-equivalent geocentric position (m) and velocity (m/s) at coordinate
/// time `t_s` (seconds since the first output epoch).
pub trait Trajectory {
    /// The state at `t_s`.
    fn state_at(&self, t_s: f64) -> ([f64; 3], [f64; 3]);
}

impl<F> Trajectory for F
where
    F: Fn(f64) -> ([f64; 3], [f64; 3]),
{
    fn state_at(&self, t_s: f64) -> ([f64; 3], [f64; 3]) {
        self(t_s)
    }
}

/// The model note of [`EarthFixed`] trajectories.
pub const EARTH_FIXED_NOTE: &str = "Earth-fixed tracks (SP3, ITRF OEM and JSON) go into the GCRS at every epoch with the IERS Conventions (2010) ch. 5 transformation (IAU 2006/2000A X, Y, s with dX, dY; the Earth rotation angle from UT1; polar motion with s'), parameters from the Earth orientation table in force; velocities are the time derivative of that rotation (Earth rotation rate with the length-of-day variation, and the precession-nutation and polar-motion rates); then the field is taken about the CIP as for GCRS tracks. Predicted table values are used as they are: a UT1 error only turns the orbit about the CIP (no change in rate), a polar-motion error of 50 mas tilts the figure axis by 2.4e-7 rad (below 1e-18 in rate); the sub-daily tidal EOP terms are not applied";

/// An Earth-fixed (ITRS) trajectory seen in the GCRS: each state goes through
/// [`OrientationSpan::itrs_to_gcrs`] at its time (the span must start at the trajectory's
/// `t_s = 0`).
#[derive(Debug, Clone)]
pub struct EarthFixed<'a, T> {
    /// The trajectory in the ITRS.
    pub track: T,
    /// The Earth's orientation over the trajectory's span.
    pub orientation: &'a OrientationSpan,
}

impl<T: Trajectory> Trajectory for EarthFixed<'_, T> {
    fn state_at(&self, t_s: f64) -> ([f64; 3], [f64; 3]) {
        let (position_m, velocity_m_s) = self.track.state_at(t_s);
        self.orientation
            .itrs_to_gcrs(t_s, &position_m, &velocity_m_s)
    }
}

/// Settings of the integration.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ProperTimeOptions {
    /// Bound on (m-node error constant) * (h |v|/|r|)^(2m) per interval (default 1e-13): the
    /// quadrature error relative to the variation of the rate.
    pub relative_tolerance: f64,
}

impl Default for ProperTimeOptions {
    fn default() -> Self {
        Self {
            relative_tolerance: 1e-13,
        }
    }
}

vocabulary! {
    /// The stable codes of [`ProperTimeError`], written only here.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum ProperTimeErrorKind {
        /// An option out of range.
        BadOption = "bad_option",
        /// Fewer than two output epochs.
        TooFewEpochs = "too_few_epochs",
        /// A value that is not finite.
        NotFinite = "not_finite",
        /// Epochs that do not increase strictly.
        EpochsNotIncreasing = "epochs_not_increasing",
        /// A speed at or above c along the trajectory.
        SpeedNotBelowC = "speed_not_below_c",
        /// Samples too far apart for the motion.
        SamplingTooCoarse = "sampling_too_coarse",
    }
}

/// Why an integration was refused.
#[derive(Debug, Clone, PartialEq)]
pub struct ProperTimeError {
    /// Stable code: `too_few_epochs`, `epochs_not_increasing`, `not_finite`, `bad_option`.
    pub code: &'static str,
    /// What is wrong.
    pub message: String,
    /// The output epoch (or interval start) concerned.
    pub index: Option<usize>,
}

impl fmt::Display for ProperTimeError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self.index {
            Some(index) => write!(f, "epoch {index}: {} ({})", self.message, self.code),
            None => write!(f, "{} ({})", self.message, self.code),
        }
    }
}

impl std::error::Error for ProperTimeError {}

fn error(
    kind: ProperTimeErrorKind,
    index: Option<usize>,
    message: impl Into<String>,
) -> ProperTimeError {
    ProperTimeError {
        code: kind.as_str(),
        message: message.into(),
        index,
    }
}

/// The model note of [`integrate_proper_time`] with the rate against TT.
pub const INTEGRATION_NOTE: &str = "d(tau)/dt - 1 = -(v^2/2 + U)/c^2 + L_G against TT (IERS Conventions (2010) eq. 10.6), integrated with Gauss-Legendre quadrature between output epochs and compensated summation";

/// Integrates d(tau)/dt - 1 along `trajectory` between consecutive `epochs_s`.
///
/// Inputs: `epochs_s`, output epochs in coordinate seconds (strictly increasing, at least two;
/// tau - t is zero at the first); `rate(position_m, velocity_m_s)` returns the fractional rate
/// offset as (velocity part, gravity part), dimensionless. Result: per epoch tau - t, its
/// parts (the tidal part zero), the periodic term and the residual, plus a summary. For a rate
/// that depends on the time as well, see [`integrate_proper_time_at`].
pub fn integrate_proper_time<T, R>(
    trajectory: &T,
    epochs_s: &[f64],
    rate: R,
    options: &ProperTimeOptions,
) -> Result<ProperTimeSeries, ProperTimeError>
where
    T: Trajectory + ?Sized,
    R: Fn(&[f64; 3], &[f64; 3]) -> (f64, f64),
{
    integrate_proper_time_at(
        trajectory,
        epochs_s,
        |_t_s: f64, position_m: &[f64; 3], velocity_m_s: &[f64; 3]| {
            let (velocity, gravity) = rate(position_m, velocity_m_s);
            [velocity, gravity, 0.0]
        },
        options,
    )
}

/// [`integrate_proper_time`] with a rate that also depends on the coordinate time:
/// `rate(t_s, position_m, velocity_m_s)` (t_s in the epochs' seconds, at each quadrature node)
/// returns the fractional rate offset as [velocity part, gravity part, tidal part]; the three
/// are accumulated separately (the tidal part: the potentials of external bodies, whose
/// positions depend on the epoch; [`tides::TidalIntegrand`]).
pub fn integrate_proper_time_at<T, R>(
    trajectory: &T,
    epochs_s: &[f64],
    rate: R,
    options: &ProperTimeOptions,
) -> Result<ProperTimeSeries, ProperTimeError>
where
    T: Trajectory + ?Sized,
    R: Fn(f64, &[f64; 3], &[f64; 3]) -> [f64; 3],
{
    if options.relative_tolerance.is_nan() || options.relative_tolerance <= 0.0 {
        return Err(error(
            ProperTimeErrorKind::BadOption,
            None,
            "relative_tolerance must be positive",
        ));
    }
    if epochs_s.len() < 2 {
        return Err(error(
            ProperTimeErrorKind::TooFewEpochs,
            None,
            format!("{} output epochs; at least two are needed", epochs_s.len()),
        ));
    }
    if let Some(index) = epochs_s.iter().position(|t| !t.is_finite()) {
        return Err(error(
            ProperTimeErrorKind::NotFinite,
            Some(index),
            "the epoch is not finite",
        ));
    }
    if let Some(index) = epochs_s.windows(2).position(|pair| pair[1] <= pair[0]) {
        return Err(error(
            ProperTimeErrorKind::EpochsNotIncreasing,
            Some(index + 1),
            "output epochs must be strictly increasing",
        ));
    }
    let rules = GaussLegendre::new();
    let mut velocity_sum = CompensatedSum::default();
    let mut gravity_sum = CompensatedSum::default();
    let mut tidal_sum = CompensatedSum::default();
    let mut periodic_s = Vec::with_capacity(epochs_s.len());
    let mut parts = Vec::with_capacity(epochs_s.len());
    let first = trajectory.state_at(epochs_s.first().copied().unwrap_or(0.0));
    periodic_s.push(kepler_periodic_term_s(&first.0, &first.1));
    parts.push([0.0; 3]);
    let mut start_state = first;
    for (index, pair) in epochs_s.windows(2).enumerate() {
        let (start_s, end_s) = (pair[0], pair[1]);
        let (position_m, velocity_m_s) = start_state;
        let angular_rate = norm(&velocity_m_s) / norm(&position_m);
        let length_s = end_s - start_s;
        if !(length_s * angular_rate).is_finite() {
            return Err(error(
                ProperTimeErrorKind::NotFinite,
                Some(index),
                "the state at the start of this interval has a zero or non-finite position or velocity",
            ));
        }
        if dot3(&velocity_m_s, &velocity_m_s) >= SPEED_OF_LIGHT_SQUARED_M2_S2 {
            return Err(error(
                ProperTimeErrorKind::SpeedNotBelowC,
                Some(index),
                "the (interpolated) speed at the start of this interval is at or above c; near-duplicate epochs or inconsistent positions make the derived velocity meaningless",
            ));
        }
        let Some((nodes, pieces)) = rules.plan(length_s * angular_rate, options.relative_tolerance)
        else {
            return Err(error(
                ProperTimeErrorKind::SamplingTooCoarse,
                Some(index),
                format!(
                    "the object moves through {} rad of its geocentric direction in this interval of {length_s} s; sample the trajectory more densely",
                    readable((length_s * angular_rate).round()), length_s = readable(length_s)
                ),
            ));
        };
        let piece_s = length_s / pieces as f64;
        let (mut velocity_part, mut gravity_part, mut tidal_part) = (0.0, 0.0, 0.0);
        for piece in 0..pieces {
            let middle_s = start_s + (piece as f64 + 0.5) * piece_s;
            for (node, weight) in rules.rule(nodes) {
                let t_s = middle_s + 0.5 * piece_s * node;
                let (p, v) = trajectory.state_at(t_s);
                let [sr, gr, tidal] = rate(t_s, &p, &v);
                velocity_part += weight * sr;
                gravity_part += weight * gr;
                tidal_part += weight * tidal;
            }
        }
        velocity_part *= 0.5 * piece_s;
        gravity_part *= 0.5 * piece_s;
        tidal_part *= 0.5 * piece_s;
        if !(velocity_part.is_finite() && gravity_part.is_finite() && tidal_part.is_finite()) {
            return Err(error(
                ProperTimeErrorKind::NotFinite,
                Some(index),
                "the rate is not finite inside this interval (check the trajectory and the rate function)",
            ));
        }
        velocity_sum.add(velocity_part);
        gravity_sum.add(gravity_part);
        tidal_sum.add(tidal_part);
        start_state = trajectory.state_at(end_s);
        periodic_s.push(kepler_periodic_term_s(&start_state.0, &start_state.1));
        parts.push([velocity_sum.value(), gravity_sum.value(), tidal_sum.value()]);
    }
    Ok(series::build(epochs_s, periodic_s, &parts))
}

fn dot3(a: &[f64; 3], b: &[f64; 3]) -> f64 {
    a[0] * b[0] + a[1] * b[1] + a[2] * b[2]
}

fn norm(vector: &[f64; 3]) -> f64 {
    (vector[0] * vector[0] + vector[1] * vector[1] + vector[2] * vector[2]).sqrt()
}

#[cfg(test)]
pub(crate) mod tests;
