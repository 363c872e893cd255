//! Proper time along an ephemeris track: validation, interpolation, time scales and frames
//! joined to [`crate::physics::proper_time::integrate_proper_time`].
//!
//! Coordinate time is TT: every epoch is converted to TT through the engine, so a UTC track
//! across a leap second keeps a continuous time axis. The rate function must therefore be
//! relative to TT (or the caller accepts the L_G rate difference of TCG). Earth-fixed tracks are
//! given inertial-equivalent velocities v + omega_E x r (see [`crate::physics::proper_time`]).

use super::error::TrajectoryError;
use super::interpolate::{InterpolationOptions, Interpolator};
use super::{Frame, ObjectTrack, TrajectorySet};
use crate::physics::proper_time::{
    integrate_proper_time, EarthFixed, ProperTimeError, ProperTimeOptions, ProperTimeSeries,
    Trajectory,
};
use crate::physics::readable::readable;
use crate::physics::time::convert::{from_tt_attos, to_tt_attos, ConversionContext};
use crate::physics::time::instant::{seconds_f64_to_attos, Instant};

/// The proper time of one object.
#[derive(Debug, Clone, PartialEq)]
pub struct TrackProperTime {
    /// The object's id.
    pub id: String,
    /// First epoch (in the track's scale).
    pub start: Instant,
    /// Last epoch.
    pub end: Instant,
    /// The output epochs: the track's epochs, in the track's scale.
    pub epochs: Vec<Instant>,
    /// The series and summary (times are TT seconds since `start`).
    pub series: ProperTimeSeries,
}

impl Trajectory for Interpolator {
    fn state_at(&self, t_s: f64) -> ([f64; 3], [f64; 3]) {
        Interpolator::state_at(self, t_s)
    }
}

fn from_physics(error: ProperTimeError, object: &str) -> TrajectoryError {
    TrajectoryError {
        code: error.code,
        message: error.message,
        line: None,
        object: Some(object.to_string()),
        index: error.index,
        field: None,
    }
}

/// The model note of [`proper_time_of_track`]: which coordinate time the integration runs on.
pub const COORDINATE_TIME_NOTE: &str = "coordinate time is TT from the ephemeris epochs (converted through the leap-second table, so a leap second inside the span is handled); against TCG the TCG - TT drift L_G/(1 - L_G) is removed";

/// Integrates the proper time of one track at its own epochs.
///
/// `rate(position_m, velocity_m_s)` returns the (velocity, gravity) parts of the fractional
/// rate offset relative to TT, from an inertial-equivalent state.
pub fn proper_time_of_track<R>(
    track: &ObjectTrack,
    interpolation: &InterpolationOptions,
    options: &ProperTimeOptions,
    context: &ConversionContext<'_>,
    rate: R,
) -> Result<TrackProperTime, TrajectoryError>
where
    R: Fn(&[f64; 3], &[f64; 3]) -> (f64, f64),
{
    let interpolator = Interpolator::from_track(track, interpolation, context)?;
    let (Some(first), Some(last)) = (track.states.first(), track.states.last()) else {
        return Err(
            TrajectoryError::new("too_few_states", "the track has no states").for_object(&track.id),
        );
    };
    let (epochs_s, epochs) = match interpolation.output_step_s {
        None => (
            interpolator.times_s().to_vec(),
            track.states.iter().map(|s| s.epoch).collect(),
        ),
        Some(step_s) => output_grid(interpolator.times_s(), step_s, first.epoch, track, context)?,
    };
    let series = match track.frame {
        Frame::Inertial => integrate_proper_time(&interpolator, &epochs_s, rate, options),
        Frame::EarthFixed => {
            let rotating = EarthFixed(|t_s: f64| interpolator.state_at(t_s));
            integrate_proper_time(&rotating, &epochs_s, rate, options)
        }
    }
    .map_err(|e| from_physics(e, &track.id))?;
    Ok(TrackProperTime {
        id: track.id.clone(),
        start: first.epoch,
        end: last.epoch,
        epochs,
        series,
    })
}

/// Most output epochs one track may ask for through a step.
pub const MAX_OUTPUT_EPOCHS: usize = 1_000_000;

/// The output grid: TT seconds 0, step, 2 step, ... up to the last state (which is always
/// included), and the same epochs as instants in the track's scale.
fn output_grid(
    times_s: &[f64],
    step_s: f64,
    start: Instant,
    track: &ObjectTrack,
    context: &ConversionContext<'_>,
) -> Result<(Vec<f64>, Vec<Instant>), TrajectoryError> {
    let end_s = times_s.last().copied().unwrap_or(0.0);
    let count = (end_s / step_s).floor() as usize + 1;
    if count > MAX_OUTPUT_EPOCHS {
        return Err(TrajectoryError::new(
            "bad_option",
            format!(
                "an output step of {step_s} s over {end_s} s gives {count} epochs; at most {MAX_OUTPUT_EPOCHS} per object", step_s = readable(step_s), end_s = readable(end_s)
            ),
        )
        .for_object(&track.id));
    }
    let mut epochs_s: Vec<f64> = (0..count).map(|k| k as f64 * step_s).collect();
    if epochs_s.last().is_some_and(|t| *t < end_s) {
        epochs_s.push(end_s);
    }
    let start_tt = to_tt_attos(&start, context)
        .map_err(|e| TrajectoryError::new("bad_epoch", e.to_string()).for_object(&track.id))?;
    let epochs = epochs_s
        .iter()
        .map(|t_s| {
            from_tt_attos(start_tt + seconds_f64_to_attos(*t_s), track.scale, context)
                .map_err(|e| TrajectoryError::new("bad_epoch", e.to_string()).for_object(&track.id))
        })
        .collect::<Result<Vec<_>, _>>()?;
    Ok((epochs_s, epochs))
}

/// TT (attoseconds since J2000.0) half-way between a track's first and last epochs; `None`
/// without states, or when an epoch has no TT (only UT1 outside the EOP table can fail, and
/// the readers refuse UT1 tracks).
pub fn middle_tt_attos(track: &ObjectTrack, context: &ConversionContext<'_>) -> Option<i128> {
    let first = to_tt_attos(&track.states.first()?.epoch, context).ok()?;
    let last = to_tt_attos(&track.states.last()?.epoch, context).ok()?;
    Some(first + (last - first) / 2)
}

/// Integrates every track of an ephemeris (see [`proper_time_of_track`]); stops at the first
/// error, which names the object.
pub fn proper_time_of_ephemeris<F, R>(
    ephemeris: &TrajectorySet,
    interpolation: &InterpolationOptions,
    options: &ProperTimeOptions,
    context: &ConversionContext<'_>,
    rate_for_track: F,
) -> Result<Vec<TrackProperTime>, TrajectoryError>
where
    F: Fn(&ObjectTrack) -> R,
    R: Fn(&[f64; 3], &[f64; 3]) -> (f64, f64),
{
    if ephemeris.objects.is_empty() {
        return Err(TrajectoryError::new(
            "no_objects",
            "the ephemeris has no objects",
        ));
    }
    ephemeris
        .objects
        .iter()
        .map(|track| {
            let rate = rate_for_track(track);
            proper_time_of_track(track, interpolation, options, context, &rate)
        })
        .collect()
}
