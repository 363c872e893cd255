//! Proper time along a selenocentric track: epochs on TCL, the Earth and the Sun from the
//! planetary ephemeris, [`integrate_lunar_proper_time`], then the answer against TCL, TL or TT.
//!
//! Coordinate time is TCL: every epoch goes to TCL through the engine (at the Moon's centre,
//! `physics::time::lunar`; TCL - TT at hourly nodes, [`super::tcl_axis`]), so the interpolation and the integral run on TCL seconds since the
//! first epoch, and an output step is in TCL seconds. The ephemeris is read at TDB, mapped
//! linearly from TCL between the first and last epochs (TDB - TCL has periodic terms of at
//! most 1.7 ms, Lu, Yang & Xie 2025, which move the Moon by under 2 m: below 1e-21 of rate).

use super::super::error::TrajectoryError;
use super::super::interpolate::{validate_track, InterpolationOptions, Interpolator};
use super::super::ObjectTrack;
use super::tcl_axis::TclAxis;
use crate::physics::lunar_orbit::{
    integrate_lunar_proper_time, LunarEnvironment, LunarProperTimeSeries, LunarReference,
};
use crate::physics::moon::gravity::LunarGravityModel;
use crate::physics::proper_time::ProperTimeOptions;
use crate::physics::readable::readable;
use crate::physics::solar_system::Ephemeris;
use crate::physics::time::convert::{convert, from_tt_attos, to_tt_attos, ConversionContext};
use crate::physics::time::instant::{seconds_f64_to_attos, Instant};
use crate::physics::time::lunar::L_L;
use crate::physics::time::scale::Scale;
use crate::trajectory::track_proper_time::MAX_OUTPUT_EPOCHS;

/// The proper time of one selenocentric object.
#[derive(Debug, Clone, PartialEq)]
pub struct LunarTrackProperTime {
    /// The object's id.
    pub id: String,
    /// First epoch (in the track's scale).
    pub start: Instant,
    /// Last epoch.
    pub end: Instant,
    /// The output epochs, in the track's scale.
    pub epochs: Vec<Instant>,
    /// The series against the chosen reference.
    pub series: LunarProperTimeSeries,
}

/// What the lunar integration needs besides the track.
#[derive(Debug, Clone, Copy)]
pub struct LunarSettings<'a> {
    /// The planetary ephemeris (the Earth and the Sun about the Moon).
    pub ephemeris: &'a Ephemeris,
    /// The scale tau is compared with.
    pub reference: LunarReference,
    /// The Moon's field.
    pub gravity_model: LunarGravityModel,
}

fn seconds(attos: i128) -> f64 {
    attos as f64 / 1e18
}

/// Integrates the proper time of a selenocentric track at its own epochs (or on a TCL grid of
/// `interpolation.output_step_s`). Errors name the object and, for an epoch, the state.
pub fn lunar_proper_time_of_track(
    track: &ObjectTrack,
    interpolation: &InterpolationOptions,
    options: &ProperTimeOptions,
    context: &ConversionContext<'_>,
    settings: &LunarSettings<'_>,
) -> Result<LunarTrackProperTime, TrajectoryError> {
    let times_tt_s = validate_track(track, interpolation, context)?;
    let id = track.id.as_str();
    let in_scale = |epoch: &Instant, scale: Scale, index: usize| {
        convert(epoch, scale, context)
            .map_err(|e| TrajectoryError::at_state("bad_epoch", id, index, e.to_string()))
    };
    let (Some(first), Some(last)) = (track.states.first(), track.states.last()) else {
        return Err(
            TrajectoryError::new("too_few_states", "the track has no states").for_object(id),
        );
    };
    let last_index = track.states.len() - 1;
    // The ends in TCL and TDB: an epoch outside the lunar time span is named here.
    in_scale(&first.epoch, Scale::Tcl, 0)?;
    in_scale(&last.epoch, Scale::Tcl, last_index)?;
    let first_tdb = in_scale(&first.epoch, Scale::Tdb, 0)?.count_attos();
    let last_tdb = in_scale(&last.epoch, Scale::Tdb, last_index)?.count_attos();
    let first_tt = to_tt_attos(&first.epoch, context)
        .map_err(|e| TrajectoryError::at_state("bad_epoch", id, 0, e.to_string()))?;
    let span_tt_s = times_tt_s.last().copied().unwrap_or(0.0);
    let axis = TclAxis::new(first_tt, span_tt_s, context, id)?;
    let times_s: Vec<f64> = times_tt_s.iter().map(|t| axis.tcl_s(*t)).collect();
    let span_s = times_s.last().copied().unwrap_or(0.0);
    let positions_m = track.states.iter().map(|s| s.position_m).collect();
    let velocities_m_s = track.has_velocities().then(|| {
        track
            .states
            .iter()
            .map(|s| s.velocity_m_s.unwrap_or([0.0; 3]))
            .collect()
    });
    let interpolator = Interpolator::new(
        times_s.clone(),
        positions_m,
        velocities_m_s,
        interpolation.points,
    )
    .map_err(|e| TrajectoryError {
        object: Some(id.to_string()),
        ..e
    })?;
    let (epochs_s, output_tt_s, epochs) = match interpolation.output_step_s {
        None => (
            times_s,
            times_tt_s,
            track.states.iter().map(|s| s.epoch).collect::<Vec<_>>(),
        ),
        Some(step_s) => {
            let count = (span_s / step_s).floor() as usize + 1;
            if count > MAX_OUTPUT_EPOCHS {
                return Err(TrajectoryError::new(
                    "bad_option",
                    format!("an output step of {} s over {} s gives {count} epochs; at most {MAX_OUTPUT_EPOCHS} per object", readable(step_s), readable(span_s)),
                )
                .for_object(id));
            }
            let mut grid: Vec<f64> = (0..count)
                .map(|k| k as f64 * step_s)
                .filter(|t| *t < span_s)
                .collect();
            grid.push(span_s);
            let tt_s: Vec<f64> = grid.iter().map(|t| axis.tt_s(*t)).collect();
            let epochs = tt_s
                .iter()
                .map(|t| from_tt_attos(first_tt + seconds_f64_to_attos(*t), track.scale, context))
                .collect::<Result<Vec<_>, _>>()
                .map_err(|e| TrajectoryError::new("bad_epoch", e.to_string()).for_object(id))?;
            (grid, tt_s, epochs)
        }
    };
    let first_tdb_s = seconds(first_tdb);
    let tdb_per_tcl = if span_s > 0.0 {
        seconds(last_tdb - first_tdb) / span_s
    } else {
        1.0
    };
    let environment = LunarEnvironment::new(settings.ephemeris, first_tdb_s, seconds(last_tdb))
        .map_err(|e| TrajectoryError::new(e.code(), e.to_string()).for_object(id))?;
    let series = integrate_lunar_proper_time(
        &interpolator,
        &epochs_s,
        |t_s| environment.at(first_tdb_s + t_s * tdb_per_tcl),
        settings.gravity_model,
        options,
    )
    .map_err(|e| TrajectoryError {
        code: e.code,
        message: e.message,
        line: None,
        object: Some(id.to_string()),
        index: e.index,
        field: None,
    })?;
    let series = match settings.reference {
        LunarReference::Tcl => series,
        LunarReference::Tl => {
            // TL - TCL = -L_L (TCL - T0): TCL elapsed minus TL elapsed is L_L times the TCL
            // elapsed (Turyshev et al. arXiv:2406.16147; `physics::time::lunar`).
            let parts: Vec<f64> = epochs_s.iter().map(|t| L_L * t).collect();
            series.relative_to(&parts).unwrap_or(series)
        }
        LunarReference::Tt => {
            // TCL elapsed minus TT elapsed: the change of TCL - TT since the first epoch.
            let parts: Vec<f64> = output_tt_s.iter().map(|t| axis.offset_s(*t)).collect();
            series.relative_to(&parts).unwrap_or(series)
        }
    };
    Ok(LunarTrackProperTime {
        id: track.id.clone(),
        start: first.epoch,
        end: last.epoch,
        epochs,
        series,
    })
}
