//! Proper time along a selenocentric track: epochs on TCL, the Earth and the Sun from the
//! planetary ephemeris, [`integrate_lunar_proper_time`], then the answer against TCL, TL or TT.
//!
//! Coordinate time is TCL: every epoch goes to TCL through the engine (at the Moon's centre,
//! `physics::time::lunar`), so the interpolation and the integral run on TCL seconds since the
//! first epoch, and an output step is in TCL seconds. The ephemeris is read at TDB, mapped
//! linearly from TCL between the first and last epochs (TDB - TCL has periodic terms of at
//! most 1.7 ms, Lu, Yang & Xie 2025, which move the Moon by under 2 m: below 1e-21 of rate).

use super::super::error::TrajectoryError;
use super::super::interpolate::{validate_track, InterpolationOptions, Interpolator};
use super::super::ObjectTrack;
use crate::physics::lunar_orbit::{
    integrate_lunar_proper_time, LunarEnvironment, LunarProperTimeSeries, LunarReference,
};
use crate::physics::proper_time::ProperTimeOptions;
use crate::physics::readable::readable;
use crate::physics::solar_system::Ephemeris;
use crate::physics::time::convert::{convert, to_tt_attos, ConversionContext};
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
    /// Whether the Moon's J2 is in the potential.
    pub j2: bool,
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
    validate_track(track, interpolation, context)?;
    let id = track.id.as_str();
    let in_scale = |epoch: &Instant, scale: Scale, index: usize| {
        convert(epoch, scale, context)
            .map_err(|e| TrajectoryError::at_state("bad_epoch", id, index, e.to_string()))
    };
    let mut tcl_attos = Vec::with_capacity(track.states.len());
    for (index, state) in track.states.iter().enumerate() {
        tcl_attos.push(in_scale(&state.epoch, Scale::Tcl, index)?.count_attos());
    }
    let (Some(&first_tcl), Some(&last_tcl)) = (tcl_attos.first(), tcl_attos.last()) else {
        return Err(
            TrajectoryError::new("too_few_states", "the track has no states").for_object(id),
        );
    };
    let times_s: Vec<f64> = tcl_attos.iter().map(|t| seconds(t - first_tcl)).collect();
    let positions_m = track.states.iter().map(|s| s.position_m).collect();
    let velocities_m_s = track.has_velocities().then(|| {
        track
            .states
            .iter()
            .map(|s| s.velocity_m_s.unwrap_or([0.0; 3]))
            .collect()
    });
    let interpolator =
        Interpolator::new(times_s, positions_m, velocities_m_s, interpolation.points).map_err(
            |e| TrajectoryError {
                object: Some(id.to_string()),
                ..e
            },
        )?;
    let span_s = seconds(last_tcl - first_tcl);
    let output_tcl: Vec<i128> = match interpolation.output_step_s {
        None => tcl_attos.clone(),
        Some(step_s) => {
            let count = (span_s / step_s).floor() as usize + 1;
            if count > MAX_OUTPUT_EPOCHS {
                return Err(TrajectoryError::new(
                    "bad_option",
                    format!("an output step of {} s over {} s gives {count} epochs; at most {MAX_OUTPUT_EPOCHS} per object", readable(step_s), readable(span_s)),
                )
                .for_object(id));
            }
            let mut grid: Vec<i128> = (0..count)
                .map(|k| first_tcl + seconds_f64_to_attos(k as f64 * step_s))
                .filter(|t| *t < last_tcl)
                .collect();
            grid.push(last_tcl);
            grid
        }
    };
    let epochs_s: Vec<f64> = output_tcl.iter().map(|t| seconds(t - first_tcl)).collect();
    let last_index = track.states.len() - 1;
    let first_tdb = in_scale(&track.states[0].epoch, Scale::Tdb, 0)?.count_attos();
    let last_tdb = in_scale(&track.states[last_index].epoch, Scale::Tdb, last_index)?.count_attos();
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
        settings.j2,
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
    let tcl_instant = |attos: i128| Instant::from_count_attos(Scale::Tcl, attos);
    let epochs = output_tcl
        .iter()
        .map(|t| convert(&tcl_instant(*t), track.scale, context))
        .collect::<Result<Vec<_>, _>>()
        .map_err(|e| TrajectoryError::new("bad_epoch", e.to_string()).for_object(id))?;
    let series = match settings.reference {
        LunarReference::Tcl => series,
        LunarReference::Tl => {
            // TL - TCL = -L_L (TCL - T0): TCL elapsed minus TL elapsed is L_L times the TCL
            // elapsed (Turyshev et al. arXiv:2406.16147; `physics::time::lunar`).
            let parts: Vec<f64> = epochs_s.iter().map(|t| L_L * t).collect();
            series.relative_to(&parts).unwrap_or(series)
        }
        LunarReference::Tt => {
            // Through the engine's TCL -> TT (at the Moon's centre): its f64 steps round at
            // about 1e-15 s per epoch.
            let reference = output_tcl
                .iter()
                .map(|t| to_tt_attos(&tcl_instant(*t), context))
                .collect::<Result<Vec<_>, _>>()
                .map_err(|e| TrajectoryError::new("bad_epoch", e.to_string()).for_object(id))?;
            let first_reference = reference.first().copied().unwrap_or(0);
            let parts: Vec<f64> = output_tcl
                .iter()
                .zip(&reference)
                .map(|(t, r)| seconds((t - first_tcl) - (r - first_reference)))
                .collect();
            series.relative_to(&parts).unwrap_or(series)
        }
    };
    Ok(LunarTrackProperTime {
        id: track.id.clone(),
        start: track.states[0].epoch,
        end: track.states[last_index].epoch,
        epochs,
        series,
    })
}
