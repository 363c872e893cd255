//! Computing the proper time of every object and shaping the answer (JSON or CSV).

use std::fmt::Write as _;

use super::body::{ephemeris_problem, ProperTimeRequest};
use super::types::{ObjectOutput, ProperTimeAnswer, SampleOutput, SummaryOutput};
use crate::api::error::ApiError;
use crate::api::time::types::InstantForms;
use crate::physics::earth::eop::EopTable;
use crate::physics::earth::orientation::fast::celestial_pole_fast;
use crate::physics::earth::orientation::JulianDate;
use crate::physics::gravity::GravityModel;
use crate::physics::proper_time::tides::{TidalIntegrand, PROPER_TIME_TIDES_NOTE};
use crate::physics::proper_time::{
    relative_to_tcg, ProperTimeOptions, EARTH_FIXED_NOTE, INTEGRATION_NOTE, PERIODIC_NOTE,
};
use crate::physics::rate::{
    inertial_model_note, inertial_rate_function_about_axis, RateReference, TRACK_POLE_NOTE,
};
use crate::physics::solar_system::{Ephemeris, EphemerisErrorKind};
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::error::TimeErrorKind;
use crate::physics::time::formats::{day_reading, write_instant, write_iso, ISO_DECIMALS};
use crate::physics::time::instant::Instant;
use crate::physics::time::leap_seconds::LeapTable;
use crate::trajectory::track_proper_time::middle_tt_attos;
use crate::trajectory::track_proper_time::COORDINATE_TIME_NOTE;
use crate::trajectory::{
    proper_time_of_ephemeris_at, track_tt_extent, Frame, ObjectTrack, TrackProperTime,
    TrajectoryError,
};

/// The model note of a default that fell back from `j2_sun_moon` to `j2`.
const TIDES_FALLBACK_NOTE: &str = "the default model j2_sun_moon needs the Sun and the Moon at every epoch, and a track lies outside the planetary ephemeris in force (its span is in /readyz): the tides were left out and J2 alone was used (the tides reach about 1.2e-15 of rate at navigation MEO, 3.2e-15 at GEO)";

/// The model note of an asked-for model without the tides.
const NO_TIDES_NOTE: &str = "the tidal potentials of the Sun and the Moon are not in this model (up to about 1.2e-15 of rate at navigation MEO, 3.2e-15 at GEO; daily means up to tens of ps/day); gravity_model j2_sun_moon (the default) includes them";

fn model_notes(model: GravityModel, fell_back: bool) -> Vec<String> {
    let j2 = inertial_model_note(model);
    let tides = match (model, fell_back) {
        (GravityModel::J2SunMoon, _) => PROPER_TIME_TIDES_NOTE,
        (_, true) => TIDES_FALLBACK_NOTE,
        (_, false) => NO_TIDES_NOTE,
    };
    [
        INTEGRATION_NOTE,
        COORDINATE_TIME_NOTE,
        EARTH_FIXED_NOTE,
        PERIODIC_NOTE,
    ]
    .into_iter()
    .chain(j2)
    .chain(j2.map(|_| TRACK_POLE_NOTE))
    .chain([tides])
    .map(String::from)
    .collect()
}

/// The Earth's figure axis in the GCRS, where every track is integrated (Earth-fixed ones are
/// rotated into it): the CIP at the track's middle epoch.
fn figure_axis(track: &ObjectTrack, context: &ConversionContext<'_>) -> [f64; 3] {
    match middle_tt_attos(track, context) {
        Some(tt_attos) => celestial_pole_fast(JulianDate::from_count_attos_since_j2000(tt_attos))
            .unit_vector_gcrs(),
        None => [0.0, 0.0, 1.0],
    }
}

pub(super) fn instant_forms(
    instant: &Instant,
    table: &LeapTable,
) -> Result<InstantForms, ApiError> {
    write_instant(instant, table)
        .map(InstantForms::from)
        .map_err(|e| ApiError::from_time(&e, "ephemeris"))
}

pub(super) fn iso_text(instant: &Instant, table: &LeapTable) -> String {
    day_reading(instant, table)
        .map(|reading| write_iso(&reading, ISO_DECIMALS))
        .unwrap_or_default()
}

fn object_output(
    track: TrackProperTime,
    request: &ProperTimeRequest,
    table: &LeapTable,
    frame: Frame,
    state_count: usize,
) -> Result<ObjectOutput, ApiError> {
    let series = match request.reference {
        RateReference::Tt => track.series,
        RateReference::Tcg => relative_to_tcg(&track.series),
    };
    let summary = series.summary;
    let finite = [
        summary.accumulated_s,
        summary.mean_rate,
        summary.kepler_residual_rms_s,
    ];
    if !finite.iter().all(|v| v.is_finite()) {
        return Err(ApiError::unprocessable(
            "integration_failed",
            "the integration gave a non-finite result; check the positions and velocities of this object",
        )
        .with_object(Some(track.id), None));
    }
    let samples = request.include_series.then(|| {
        series
            .samples
            .iter()
            .zip(&track.epochs)
            .map(|(sample, epoch)| SampleOutput {
                epoch: iso_text(epoch, table),
                elapsed_s: sample.t_s,
                tau_minus_t_s: request.initial_offset_s + sample.tau_minus_t_s,
                velocity_part_s: sample.velocity_part_s,
                gravity_part_s: sample.gravity_part_s,
                tidal_part_s: sample.tidal_part_s,
                periodic_s: sample.periodic_s,
                residual_s: sample.residual_s,
                lunar: None,
            })
            .collect()
    });
    Ok(ObjectOutput {
        time_scale: track.start.scale().as_str().to_string(),
        frame: frame.as_str().to_string(),
        state_count,
        summary: SummaryOutput {
            start: instant_forms(&track.start, table)?,
            end: instant_forms(&track.end, table)?,
            span_s: summary.span_s,
            accumulated_s: summary.accumulated_s,
            tidal_part_s: series.samples.last().map_or(0.0, |s| s.tidal_part_s),
            mean_rate: summary.mean_rate,
            mean_rate_us_per_day: summary.mean_rate_us_per_day,
            periodic_amplitude_s: summary.periodic_amplitude_s,
            kepler_residual_rms_s: summary.kepler_residual_rms_s,
            lunar: None,
        },
        id: track.id,
        series: samples,
    })
}

/// Integrates every track with `model`: the Earth's part from the figure axis at the track's
/// middle epoch, and for `j2_sun_moon` the Sun and Moon tides at each node's epoch.
fn integrate(
    request: &ProperTimeRequest,
    model: GravityModel,
    context: &ConversionContext<'_>,
    eop: &EopTable,
    ephemeris: &Ephemeris,
) -> Result<Vec<TrackProperTime>, TrajectoryError> {
    proper_time_of_ephemeris_at(
        &request.ephemeris,
        &request.interpolation,
        &ProperTimeOptions::default(),
        context,
        eop,
        |track| {
            let axis = figure_axis(track, context);
            let earth = inertial_rate_function_about_axis(RateReference::Tt, model, axis);
            let tides = if model == GravityModel::J2SunMoon {
                let (start_tt_attos, span_s) = track_tt_extent(track, context)?;
                let tides = TidalIntegrand::over_tt(ephemeris, start_tt_attos, span_s, context)
                    .map_err(|e| {
                        let mut problem = TrajectoryError::new(
                            e.code(),
                            format!("{e} (the Sun and Moon tides need the bodies over the whole track; give another gravity_model to go without them)"),
                        )
                        .for_object(&track.id);
                        // TDB - TT with `tdb_model=ephemeris` outside its span, or the
                        // planetary ephemeris outside its own.
                        problem.field = Some(if e.code() == TimeErrorKind::OutsideTdbModelSpan.as_str() {
                            "tdb_model"
                        } else {
                            "gravity_model"
                        });
                        problem
                    })?;
                Some(tides)
            } else {
                None
            };
            Ok(
                move |t_s: f64, position_m: &[f64; 3], velocity_m_s: &[f64; 3]| {
                    let (velocity, gravity) = earth(position_m, velocity_m_s);
                    let tidal = tides
                        .as_ref()
                        .map_or(0.0, |tides| tides.rate_part(t_s, position_m));
                    [velocity, gravity, tidal]
                },
            )
        },
    )
}

/// Integrates every object and shapes the answer. Without a model in the request the Sun and
/// Moon tides are included (`j2_sun_moon`) unless a track lies outside the planetary ephemeris,
/// then J2 alone, with a note.
pub fn compute(
    request: &ProperTimeRequest,
    table: &LeapTable,
    eop: &EopTable,
    ephemeris: &Ephemeris,
) -> Result<ProperTimeAnswer, ApiError> {
    let context = ConversionContext::geocentric(table).with_tdb_model(request.tdb_model);
    let model = request.gravity_model.unwrap_or(GravityModel::J2SunMoon);
    let (model, fell_back, tracks) = match integrate(request, model, &context, eop, ephemeris) {
        Err(error)
            if request.gravity_model.is_none()
                && error.code == EphemerisErrorKind::OutsideSpan.as_str() =>
        {
            let tracks = integrate(request, GravityModel::J2, &context, eop, ephemeris);
            (GravityModel::J2, true, tracks)
        }
        other => (model, false, other),
    };
    let tracks = tracks.map_err(ephemeris_problem)?;
    let objects = tracks
        .into_iter()
        .zip(&request.ephemeris.objects)
        .map(|(track, input)| object_output(track, request, table, input.frame, input.states.len()))
        .collect::<Result<Vec<_>, _>>()?;
    Ok(ProperTimeAnswer {
        reference: request.reference.as_str().to_string(),
        gravity_model: model.as_str().to_string(),
        tdb_model: request.tdb_model.as_str().to_string(),
        objects,
        model_notes: model_notes(model, fell_back),
        warnings: None,
    })
}

/// The series of every object as CSV: one header line, then one line per sample; numbers in
/// shortest round-trip form (offsets in scientific notation).
pub fn to_csv(answer: &ProperTimeAnswer) -> String {
    let mut out = String::from(
        "object_id,epoch,elapsed_s,tau_minus_t_s,velocity_part_s,gravity_part_s,tidal_part_s,periodic_s,residual_s\n",
    );
    for object in &answer.objects {
        let id = if object.id.contains([',', '"', '\n']) {
            format!("\"{}\"", object.id.replace('"', "\"\""))
        } else {
            object.id.clone()
        };
        for sample in object.series.iter().flatten() {
            let _ = writeln!(
                out,
                "{id},{},{},{:e},{:e},{:e},{:e},{:e},{:e}",
                sample.epoch,
                sample.elapsed_s,
                sample.tau_minus_t_s,
                sample.velocity_part_s,
                sample.gravity_part_s,
                sample.tidal_part_s,
                sample.periodic_s,
                sample.residual_s
            );
        }
    }
    out
}
