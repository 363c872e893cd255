//! Validation and interpolation of one object's track.
//!
//! Positions are interpolated by Lagrange polynomials on a centred window of `points` states
//! (velocity from the derivative of the same polynomial) when the track has no velocities, and
//! by Hermite polynomials on `points / 2` states (values and velocities) when it has them, so
//! that both polynomials have degree `points - 1`. Times are TT seconds since the first epoch.

mod basis;
mod tt_axis;
mod validate;

pub(crate) use validate::attos_difference_s;
pub use validate::validate_track;

use super::error::TrajectoryError;
use super::ObjectTrack;
use crate::physics::readable::readable;
use crate::physics::time::convert::ConversionContext;
pub use basis::MAX_POINTS;
use basis::{hermite, lagrange, window_weights};

/// How tracks are interpolated and what is accepted.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct InterpolationOptions {
    /// Lagrange window in states (2 to 16; default 8, degree 7). Hermite uses half as many.
    pub points: usize,
    /// Longest accepted time between consecutive states, s (default 3600 s).
    pub max_gap_s: f64,
    /// Output grid: every `output_step_s` seconds of TT from the first epoch (and the last
    /// epoch); `None` (default) answers at the track's own epochs.
    pub output_step_s: Option<f64>,
}

impl Default for InterpolationOptions {
    fn default() -> Self {
        Self {
            points: 8,
            max_gap_s: 3600.0,
            output_step_s: None,
        }
    }
}

impl InterpolationOptions {
    /// Refuses a window outside 2..=16 or a gap limit that is not positive.
    pub fn check(&self) -> Result<(), TrajectoryError> {
        if !(2..=MAX_POINTS).contains(&self.points) {
            return Err(TrajectoryError::new(
                "bad_option",
                format!(
                    "interpolation points is {}; expected 2 to {MAX_POINTS}",
                    self.points
                ),
            ));
        }
        if self.max_gap_s.is_nan() || self.max_gap_s <= 0.0 {
            return Err(TrajectoryError::new(
                "bad_option",
                format!(
                    "max_gap_s is {}; expected a positive number of seconds",
                    readable(self.max_gap_s)
                ),
            ));
        }
        if let Some(step_s) = self.output_step_s {
            if !(step_s.is_finite() && step_s >= 1e-3) {
                return Err(TrajectoryError::new(
                    "bad_option",
                    format!(
                        "output step is {step_s} s; expected at least 0.001 s",
                        step_s = readable(step_s)
                    ),
                ));
            }
        }
        Ok(())
    }

    /// States in one window: `points` for Lagrange, `points / 2` (at least 2) for Hermite.
    pub fn window(&self, hermite: bool) -> usize {
        if hermite {
            (self.points / 2).max(2)
        } else {
            self.points
        }
    }
}

/// A validated track ready for interpolation at any time inside its span.
#[derive(Debug, Clone)]
pub struct Interpolator {
    times_s: Vec<f64>,
    positions_m: Vec<[f64; 3]>,
    velocities_m_s: Option<Vec<[f64; 3]>>,
    window: usize,
    /// (last - first) / (count - 1): the first guess of the interval of a time.
    mean_step_s: f64,
    /// For uniformly spaced samples: the nodes 0, h, 2h... of every window, whose weights
    /// (one set) are then shared by all windows.
    uniform_nodes_s: Option<Vec<f64>>,
    /// Barycentric weights, `window` per window start (one set when uniform).
    weights: Vec<f64>,
    /// Hermite coefficients c_j, `window` per window start.
    coefficients: Vec<f64>,
}

impl Interpolator {
    /// Validates `track` (see [`validate_track`]) and prepares its interpolation.
    pub fn from_track(
        track: &ObjectTrack,
        options: &InterpolationOptions,
        context: &ConversionContext<'_>,
    ) -> Result<Self, TrajectoryError> {
        let times_s = validate_track(track, options, context)?;
        let positions_m = track.states.iter().map(|s| s.position_m).collect();
        let velocities_m_s = if track.has_velocities() {
            Some(
                track
                    .states
                    .iter()
                    .map(|s| s.velocity_m_s.unwrap_or([0.0; 3]))
                    .collect(),
            )
        } else {
            None
        };
        Self::new(times_s, positions_m, velocities_m_s, options.points)
    }

    /// Prepares interpolation of samples at strictly increasing `times_s` (already validated
    /// data; lengths must agree and `times_s` must hold at least one window).
    pub fn new(
        times_s: Vec<f64>,
        positions_m: Vec<[f64; 3]>,
        velocities_m_s: Option<Vec<[f64; 3]>>,
        points: usize,
    ) -> Result<Self, TrajectoryError> {
        let options = InterpolationOptions {
            points,
            ..InterpolationOptions::default()
        };
        options.check()?;
        let window = options.window(velocities_m_s.is_some());
        let lengths_agree = positions_m.len() == times_s.len()
            && velocities_m_s
                .as_ref()
                .is_none_or(|v| v.len() == times_s.len());
        if !lengths_agree || times_s.len() < window {
            return Err(TrajectoryError::new(
                "too_few_states",
                format!("{} states for a window of {window}", times_s.len()),
            ));
        }
        if times_s
            .windows(2)
            .any(|pair| pair[1].partial_cmp(&pair[0]) != Some(std::cmp::Ordering::Greater))
        {
            return Err(TrajectoryError::new(
                "epochs_not_increasing",
                "sample times must be strictly increasing",
            ));
        }
        let hermite = velocities_m_s.is_some();
        if let Some(grid) = uniform_grid(&times_s) {
            let nodes: Vec<f64> = (0..window).map(|k| k as f64 * grid.1).collect();
            let mut weights = vec![0.0; window];
            let mut coefficients = vec![0.0; if hermite { window } else { 0 }];
            window_weights(
                &nodes,
                &mut weights,
                hermite.then_some(coefficients.as_mut_slice()),
            );
            return Ok(Self {
                mean_step_s: grid.1,
                times_s: grid.0,
                positions_m,
                velocities_m_s,
                window,
                uniform_nodes_s: Some(nodes),
                weights,
                coefficients,
            });
        }
        let starts = times_s.len() - window + 1;
        let mut weights = vec![0.0; starts * window];
        let mut coefficients = vec![0.0; if hermite { starts * window } else { 0 }];
        // The weights depend only on the node differences: a window spaced like the previous
        // one (uniform sampling) copies its weights instead of recomputing them.
        let mut previous: Option<(usize, [f64; MAX_POINTS])> = None;
        for (start, nodes) in times_s.windows(window).enumerate() {
            let mut offsets = [0.0; MAX_POINTS];
            for (offset, node) in offsets.iter_mut().zip(nodes) {
                *offset = node - nodes[0];
            }
            let range = start * window..(start + 1) * window;
            match previous {
                Some((earlier, earlier_offsets)) if earlier_offsets == offsets => {
                    let from = earlier * window..(earlier + 1) * window;
                    weights.copy_within(from.clone(), range.start);
                    if hermite {
                        coefficients.copy_within(from, range.start);
                    }
                }
                _ => {
                    let c = if hermite {
                        coefficients.get_mut(range.clone())
                    } else {
                        None
                    };
                    if let Some(w) = weights.get_mut(range) {
                        window_weights(nodes, w, c);
                    }
                    previous = Some((start, offsets));
                }
            }
        }
        let first_s = times_s.first().copied().unwrap_or(0.0);
        let last_s = times_s.last().copied().unwrap_or(0.0);
        let mean_step_s = (last_s - first_s) / (times_s.len() - 1).max(1) as f64;
        Ok(Self {
            mean_step_s,
            times_s,
            positions_m,
            velocities_m_s,
            window,
            uniform_nodes_s: None,
            weights,
            coefficients,
        })
    }

    /// The sample times, s since the first epoch.
    pub fn times_s(&self) -> &[f64] {
        &self.times_s
    }

    /// True when interpolation is Hermite (velocities given).
    pub fn is_hermite(&self) -> bool {
        self.velocities_m_s.is_some()
    }

    /// First index of the centred window for time `t_s` (clamped at both ends).
    fn window_start(&self, t_s: f64) -> usize {
        let interval = self.interval_of(t_s);
        let last_start = self.times_s.len() - self.window;
        (interval + 1)
            .saturating_sub(self.window / 2)
            .min(last_start)
    }

    /// The index i of the interval t_i <= t < t_(i+1) (0 before the start, the last state
    /// after the end): a guess from the mean step, then a short walk (binary search if far).
    fn interval_of(&self, t_s: f64) -> usize {
        let times = &self.times_s;
        let last = times.len().saturating_sub(1);
        let first_s = times.first().copied().unwrap_or(0.0);
        let guess = ((t_s - first_s) / self.mean_step_s).floor();
        let mut index = if guess.is_finite() && guess > 0.0 {
            (guess as usize).min(last)
        } else {
            0
        };
        for _ in 0..4 {
            let here = times.get(index).copied().unwrap_or(f64::INFINITY);
            let next = times.get(index + 1).copied().unwrap_or(f64::INFINITY);
            if here > t_s && index > 0 {
                index -= 1;
            } else if next <= t_s {
                index += 1;
            } else {
                return index;
            }
        }
        times.partition_point(|x| *x <= t_s).saturating_sub(1)
    }

    /// Position (m) and velocity (m/s) at `t_s` seconds since the first epoch. Outside the
    /// span the end windows extrapolate; callers stay inside [`Self::times_s`].
    pub fn state_at(&self, t_s: f64) -> ([f64; 3], [f64; 3]) {
        let start = self.window_start(t_s);
        let range = start..start + self.window;
        if let Some(nodes) = &self.uniform_nodes_s {
            let local_s = t_s - self.times_s.get(start).copied().unwrap_or(0.0);
            let positions = self.positions_m.get(range.clone()).unwrap_or(&[]);
            return match self.velocities_m_s.as_ref().and_then(|v| v.get(range)) {
                Some(velocities) => hermite(
                    nodes,
                    &self.weights,
                    &self.coefficients,
                    positions,
                    velocities,
                    local_s,
                ),
                None => lagrange(nodes, &self.weights, positions, local_s),
            };
        }
        let (Some(nodes), Some(positions), Some(weights), Some(coefficients)) = (
            self.times_s.get(range.clone()),
            self.positions_m.get(range.clone()),
            self.weights
                .get(start * self.window..(start + 1) * self.window),
            self.coefficients
                .get(start * self.window..(start + 1) * self.window)
                .or(Some(&[])),
        ) else {
            return ([f64::NAN; 3], [f64::NAN; 3]);
        };
        match self.velocities_m_s.as_ref().and_then(|v| v.get(range)) {
            Some(velocities) => hermite(nodes, weights, coefficients, positions, velocities, t_s),
            None => lagrange(nodes, weights, positions, t_s),
        }
    }
}

/// When the times are uniformly spaced (every t_i within 1e-13 of its magnitude, or of the
/// step, from t_0 + i h), the grid t_0 + i h and the step h. Treating such times as exactly
/// uniform moves an abscissa by at most 1e-13 of the span (below 0.1 us over ten days).
fn uniform_grid(times_s: &[f64]) -> Option<(Vec<f64>, f64)> {
    let first = *times_s.first()?;
    let last = *times_s.last()?;
    let step = (last - first) / (times_s.len().checked_sub(1)?.max(1)) as f64;
    let grid: Vec<f64> = (0..times_s.len())
        .map(|i| first + i as f64 * step)
        .collect();
    let uniform = times_s
        .iter()
        .zip(&grid)
        .all(|(t, g)| (t - g).abs() <= 1e-13 * t.abs().max(step));
    (uniform && step > 0.0).then_some((grid, step))
}

#[cfg(test)]
mod tests;
