//! Proper time along an ephemeris track: validation, interpolation, time scales and frames
//! joined to [`crate::physics::proper_time::integrate_proper_time`].
//!
//! Coordinate time is TT: every epoch is converted to TT through the engine, so a UTC track
//! across a leap second keeps a continuous time axis. The rate function must therefore be
//! relative to TT (or the caller accepts the L_G rate difference of TCG). Earth-fixed tracks go
//! into the GCRS at every epoch with the Earth orientation from the EOP table (see
//! [`crate::physics::proper_time::EarthFixed`]); a track outside the table is refused
//! (`eop_before_table`, `eop_after_table`) naming its first or last state.

use super::error::{epoch_error_code, TrajectoryError};
use super::interpolate::{attos_difference_s, InterpolationOptions, Interpolator};
use super::{Frame, ObjectTrack, TrajectorySet};
use crate::physics::constants::TT_MINUS_TAI_ATTOS;
use crate::physics::earth::eop::{EopLookupError, EopTable};
use crate::physics::earth::orientation::span::{EopAtEpoch, OrientationSpan};
use crate::physics::earth::orientation::ARCSEC_TO_RAD;
use crate::physics::proper_time::{
    integrate_proper_time_at, EarthFixed, ProperTimeError, ProperTimeOptions, ProperTimeSeries,
    Trajectory,
};
use crate::physics::readable::readable;
use crate::physics::time::convert::{from_tt_attos, to_tt_attos, ConversionContext};
use crate::physics::time::formats::{day_reading, write_iso, ISO_DECIMALS};
use crate::physics::time::instant::{seconds_f64_to_attos, Instant};
use crate::physics::time::leap_seconds::LeapTable;

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
/// rate offset relative to TT, from a GCRS state; `eop` is the Earth orientation table that
/// takes Earth-fixed tracks into the GCRS. For a rate that depends on the epoch too (the Sun
/// and Moon tides), see [`proper_time_of_track_at`].
pub fn proper_time_of_track<R>(
    track: &ObjectTrack,
    interpolation: &InterpolationOptions,
    options: &ProperTimeOptions,
    context: &ConversionContext<'_>,
    eop: &EopTable,
    rate: R,
) -> Result<TrackProperTime, TrajectoryError>
where
    R: Fn(&[f64; 3], &[f64; 3]) -> (f64, f64),
{
    proper_time_of_track_at(
        track,
        interpolation,
        options,
        context,
        eop,
        |_t_s: f64, position_m: &[f64; 3], velocity_m_s: &[f64; 3]| {
            let (velocity, gravity) = rate(position_m, velocity_m_s);
            [velocity, gravity, 0.0]
        },
    )
}

/// [`proper_time_of_track`] with a rate of the time as well: `rate(t_s, position_m,
/// velocity_m_s)` with `t_s` in TT seconds since the track's first epoch (see
/// [`track_tt_extent`]) returns the [velocity, gravity, tidal] parts
/// ([`crate::physics::proper_time::integrate_proper_time_at`]).
pub fn proper_time_of_track_at<R>(
    track: &ObjectTrack,
    interpolation: &InterpolationOptions,
    options: &ProperTimeOptions,
    context: &ConversionContext<'_>,
    eop: &EopTable,
    rate: R,
) -> Result<TrackProperTime, TrajectoryError>
where
    R: Fn(f64, &[f64; 3], &[f64; 3]) -> [f64; 3],
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
        Frame::Inertial => integrate_proper_time_at(&interpolator, &epochs_s, rate, options),
        Frame::EarthFixed => {
            let span_s = interpolator.times_s().last().copied().unwrap_or(0.0);
            let orientation = orientation_over_track(track, span_s, context, eop)?;
            let rotating = EarthFixed {
                track: |t_s: f64| interpolator.state_at(t_s),
                orientation: &orientation,
            };
            integrate_proper_time_at(&rotating, &epochs_s, rate, options)
        }
        Frame::LunarInertial => {
            return Err(TrajectoryError::new(
                "frame_center_mismatch",
                "a selenocentric track takes the lunar-orbit rate (trajectory::lunar), not a geocentric one",
            )
            .for_object(&track.id))
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

/// A track's first epoch in TT (attoseconds since J2000.0 TT) and its span in TT seconds: the
/// time axis of [`proper_time_of_track_at`]'s `t_s`. Errors: a track without states, an epoch
/// without TT (only UT1 outside the EOP table, which the readers refuse), naming the object.
pub fn track_tt_extent(
    track: &ObjectTrack,
    context: &ConversionContext<'_>,
) -> Result<(i128, f64), TrajectoryError> {
    let (Some(first), Some(last)) = (track.states.first(), track.states.last()) else {
        return Err(
            TrajectoryError::new("too_few_states", "the track has no states").for_object(&track.id),
        );
    };
    let tt = |epoch: &Instant| {
        to_tt_attos(epoch, context).map_err(|e| {
            TrajectoryError::new(epoch_error_code(&e), e.to_string()).for_object(&track.id)
        })
    };
    let first_tt = tt(&first.epoch)?;
    let last_tt = tt(&last.epoch)?;
    Ok((first_tt, attos_difference_s(last_tt - first_tt)))
}

/// The Earth orientation parameters at TT `tt_attos` from `eop` (4-point Lagrange, as the
/// table interpolates): UT1 - TT = (UT1 - UTC) - (TAI - UTC) - 32.184 s, the pole and dX, dY
/// (zero where the table has none) in radians.
pub fn eop_at_tt(
    eop: &EopTable,
    leaps: &LeapTable,
    tt_attos: i128,
) -> Result<EopAtEpoch, EopLookupError> {
    let (utc_mjd, sod_attos) = leaps
        .utc_from_tai(tt_attos - TT_MINUS_TAI_ATTOS)
        .map_err(|_| EopLookupError::BeforeTable {
            // before 1960 there is no UTC, and the table (from 1962) has no values either
            first_mjd: eop.first_mjd().unwrap_or(0),
        })?;
    let tai_minus_utc_attos = leaps.tai_minus_utc_attos(utc_mjd, sod_attos).unwrap_or(0);
    let values = eop.at_utc_attos(leaps, utc_mjd, sod_attos)?;
    let tt_minus_utc_s = (tai_minus_utc_attos + TT_MINUS_TAI_ATTOS) as f64 / 1e18;
    Ok(EopAtEpoch {
        ut1_minus_tt_s: values.ut1_minus_utc_s - tt_minus_utc_s,
        xp_rad: values.xp_arcsec * ARCSEC_TO_RAD,
        yp_rad: values.yp_arcsec * ARCSEC_TO_RAD,
        dx_rad: values.dx_arcsec.unwrap_or(0.0) * ARCSEC_TO_RAD,
        dy_rad: values.dy_arcsec.unwrap_or(0.0) * ARCSEC_TO_RAD,
    })
}

/// The Earth orientation over an Earth-fixed track's span; outside the EOP table a problem
/// naming the state (first or last) whose epoch the table does not cover.
fn orientation_over_track(
    track: &ObjectTrack,
    span_s: f64,
    context: &ConversionContext<'_>,
    eop: &EopTable,
) -> Result<OrientationSpan, TrajectoryError> {
    let refuse = |error: EopLookupError, index: usize| {
        let epoch = track
            .states
            .get(index)
            .and_then(|s| day_reading(&s.epoch, context.table).ok())
            .map(|reading| write_iso(&reading, ISO_DECIMALS))
            .unwrap_or_default();
        let mut problem = TrajectoryError::new(
            error.code(),
            format!(
                "the state at {epoch} {scale}: {error}; an Earth-fixed track goes into the GCRS with the Earth orientation at each epoch, which the table in force must cover",
                scale = track.scale.as_str()
            ),
        )
        .for_object(&track.id);
        problem.index = Some(index);
        problem
    };
    let start = track.states.first().map(|s| s.epoch);
    let start_tt = start
        .map(|epoch| to_tt_attos(&epoch, context))
        .transpose()
        .map_err(|e| {
            TrajectoryError::new(epoch_error_code(&e), e.to_string()).for_object(&track.id)
        })?
        .unwrap_or(0);
    let last_index = track.states.len().saturating_sub(1);
    OrientationSpan::new(start_tt, span_s, |tt_attos| {
        eop_at_tt(eop, context.table, tt_attos).map_err(|error| {
            let index = if tt_attos == start_tt { 0 } else { last_index };
            (error, index)
        })
    })
    .map_err(|(error, index)| refuse(error, index))
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
    let start_tt = to_tt_attos(&start, context).map_err(|e| {
        TrajectoryError::new(epoch_error_code(&e), e.to_string()).for_object(&track.id)
    })?;
    let epochs = epochs_s
        .iter()
        .map(|t_s| {
            from_tt_attos(start_tt + seconds_f64_to_attos(*t_s), track.scale, context).map_err(
                |e| TrajectoryError::new(epoch_error_code(&e), e.to_string()).for_object(&track.id),
            )
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
    eop: &EopTable,
    rate_for_track: F,
) -> Result<Vec<TrackProperTime>, TrajectoryError>
where
    F: Fn(&ObjectTrack) -> R,
    R: Fn(&[f64; 3], &[f64; 3]) -> (f64, f64),
{
    proper_time_of_ephemeris_at(
        ephemeris,
        interpolation,
        options,
        context,
        eop,
        |track: &ObjectTrack| {
            let rate = rate_for_track(track);
            Ok(
                move |_t_s: f64, position_m: &[f64; 3], velocity_m_s: &[f64; 3]| {
                    let (velocity, gravity) = rate(position_m, velocity_m_s);
                    [velocity, gravity, 0.0]
                },
            )
        },
    )
}

/// Integrates every track of an ephemeris with a rate of the time as well (see
/// [`proper_time_of_track_at`]); `rate_for_track` may refuse a track (e.g. one outside the
/// planetary ephemeris). Stops at the first error, which names the object.
pub fn proper_time_of_ephemeris_at<F, R>(
    ephemeris: &TrajectorySet,
    interpolation: &InterpolationOptions,
    options: &ProperTimeOptions,
    context: &ConversionContext<'_>,
    eop: &EopTable,
    rate_for_track: F,
) -> Result<Vec<TrackProperTime>, TrajectoryError>
where
    F: Fn(&ObjectTrack) -> Result<R, TrajectoryError>,
    R: Fn(f64, &[f64; 3], &[f64; 3]) -> [f64; 3],
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
            let rate = rate_for_track(track)?;
            proper_time_of_track_at(track, interpolation, options, context, eop, &rate)
        })
        .collect()
}
