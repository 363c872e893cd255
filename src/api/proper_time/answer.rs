//! Computing the proper time of every object and shaping the answer (JSON or CSV).

use std::fmt::Write as _;

use super::body::{ephemeris_problem, ProperTimeRequest};
use super::types::{ObjectOutput, ProperTimeAnswer, SampleOutput, SummaryOutput};
use crate::api::error::ApiError;
use crate::api::time::types::InstantForms;
use crate::physics::earth::eop::EopTable;
use crate::physics::earth::orientation::fast::celestial_pole_fast;
use crate::physics::earth::orientation::JulianDate;
use crate::physics::proper_time::{
    relative_to_tcg, ProperTimeOptions, EARTH_FIXED_NOTE, INTEGRATION_NOTE, PERIODIC_NOTE,
};
use crate::physics::rate::{
    inertial_model_note, inertial_rate_function_about_axis, RateReference, TRACK_POLE_NOTE,
};
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::formats::{day_reading, write_instant, write_iso, ISO_DECIMALS};
use crate::physics::time::instant::Instant;
use crate::physics::time::leap_seconds::LeapTable;
use crate::trajectory::track_proper_time::middle_tt_attos;
use crate::trajectory::track_proper_time::COORDINATE_TIME_NOTE;
use crate::trajectory::{proper_time_of_ephemeris, Frame, ObjectTrack, TrackProperTime};

fn model_notes(request: &ProperTimeRequest) -> Vec<String> {
    let j2 = inertial_model_note(request.gravity_model);
    [
        INTEGRATION_NOTE,
        COORDINATE_TIME_NOTE,
        EARTH_FIXED_NOTE,
        PERIODIC_NOTE,
    ]
    .into_iter()
    .chain(j2)
    .chain(j2.map(|_| TRACK_POLE_NOTE))
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

/// Integrates every object and shapes the answer.
pub fn compute(
    request: &ProperTimeRequest,
    table: &LeapTable,
    eop: &EopTable,
) -> Result<ProperTimeAnswer, ApiError> {
    let context = ConversionContext::geocentric(table);
    let tracks = proper_time_of_ephemeris(
        &request.ephemeris,
        &request.interpolation,
        &ProperTimeOptions::default(),
        &context,
        eop,
        |track| {
            let axis = figure_axis(track, &context);
            inertial_rate_function_about_axis(RateReference::Tt, request.gravity_model, axis)
        },
    )
    .map_err(ephemeris_problem)?;
    let objects = tracks
        .into_iter()
        .zip(&request.ephemeris.objects)
        .map(|(track, input)| object_output(track, request, table, input.frame, input.states.len()))
        .collect::<Result<Vec<_>, _>>()?;
    Ok(ProperTimeAnswer {
        reference: request.reference.as_str().to_string(),
        gravity_model: request.gravity_model.as_str().to_string(),
        objects,
        model_notes: model_notes(request),
        warnings: None,
    })
}

/// The series of every object as CSV: one header line, then one line per sample; numbers in
/// shortest round-trip form (offsets in scientific notation).
pub fn to_csv(answer: &ProperTimeAnswer) -> String {
    let mut out = String::from(
        "object_id,epoch,elapsed_s,tau_minus_t_s,velocity_part_s,gravity_part_s,periodic_s,residual_s\n",
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
                "{id},{},{},{:e},{:e},{:e},{:e},{:e}",
                sample.epoch,
                sample.elapsed_s,
                sample.tau_minus_t_s,
                sample.velocity_part_s,
                sample.gravity_part_s,
                sample.periodic_s,
                sample.residual_s
            );
        }
    }
    out
}
