//! Proper time of selenocentric ephemerides (`center: moon`, OEM `CENTER_NAME = MOON`):
//! options, the integration of `trajectory::lunar` and the answer.

use super::answer::{instant_forms, iso_text};
use super::body::{ephemeris_problem, ProperTimeRequest};
use super::lunar_options::LunarOptions;
use super::types::{
    LunarSampleOutput, LunarSummaryOutput, ObjectOutput, ProperTimeAnswer, SampleOutput,
    SummaryOutput,
};
use crate::api::error::ApiError;
use crate::physics::lunar_orbit::integrate::LUNAR_PERIODIC_NOTE;
use crate::physics::lunar_orbit::{LunarReference, LUNAR_INTEGRATION_NOTE};
use crate::physics::proper_time::ProperTimeOptions;
use crate::physics::solar_system::Ephemeris;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::lunar::TL_WARNING;
use crate::trajectory::lunar::proper_time::{lunar_proper_time_of_track, LunarSettings};
use crate::trajectory::Frame;

/// The model note of the coordinate time of lunar tracks.
const LUNAR_TIME_NOTE: &str = "lunar tracks: every epoch goes to TCL through the service's TCB - TCL at the Moon's centre (DE440 integral); interpolation, integration and `step_s` run on TCL seconds; against TL the reference part is L_L t, against TT the TCL - TT relation at the Moon's centre (its annual and monthly terms are in reference_part_s, not in the clock's periodic part)";

/// Integrates every selenocentric object and shapes the answer.
pub fn compute(
    request: &ProperTimeRequest,
    lunar: &LunarOptions,
    table: &LeapTable,
    ephemeris: &Ephemeris,
) -> Result<ProperTimeAnswer, ApiError> {
    let context = ConversionContext::geocentric(table).with_tdb_model(request.tdb_model);
    let settings = LunarSettings {
        ephemeris,
        reference: lunar.reference,
        gravity_model: lunar.gravity_model,
    };
    let mut objects = Vec::with_capacity(request.ephemeris.objects.len());
    for input in &request.ephemeris.objects {
        let track = lunar_proper_time_of_track(
            input,
            &request.interpolation,
            &ProperTimeOptions::default(),
            &context,
            &settings,
        )
        .map_err(ephemeris_problem)?;
        let summary = track.series.summary;
        if !(summary.accumulated_s.is_finite() && summary.mean_rate.is_finite()) {
            return Err(ApiError::unprocessable(
                "integration_failed",
                "the integration gave a non-finite result; check the positions and velocities of this object",
            )
            .with_object(Some(track.id), None));
        }
        let samples = &track.series.samples;
        let residual = |s: &crate::physics::lunar_orbit::LunarProperTimeSample| {
            s.periodic_s - s.kepler_periodic_s
        };
        let (low, high) = samples
            .iter()
            .fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), s| {
                (lo.min(s.kepler_periodic_s), hi.max(s.kepler_periodic_s))
            });
        let rms = (samples.iter().map(|s| residual(s).powi(2)).sum::<f64>()
            / samples.len().max(1) as f64)
            .sqrt();
        let series = request.include_series.then(|| {
            samples
                .iter()
                .zip(&track.epochs)
                .map(|(s, epoch)| SampleOutput {
                    epoch: iso_text(epoch, table),
                    elapsed_s: s.t_s,
                    tau_minus_t_s: request.initial_offset_s + s.tau_minus_t_s,
                    velocity_part_s: s.velocity_part_s,
                    gravity_part_s: s.moon_gravity_part_s + s.reference_part_s,
                    tidal_part_s: s.tidal_part_s,
                    periodic_s: s.kepler_periodic_s,
                    residual_s: residual(s),
                    lunar: Some(LunarSampleOutput {
                        moon_gravity_part_s: s.moon_gravity_part_s,
                        tidal_part_s: s.tidal_part_s,
                        reference_part_s: s.reference_part_s,
                        clock_periodic_s: s.periodic_s,
                        simultaneity_s: s.simultaneity_s,
                    }),
                })
                .collect()
        });
        objects.push(ObjectOutput {
            time_scale: input.scale.as_str().to_string(),
            frame: Frame::LunarInertial.as_str().to_string(),
            state_count: input.states.len(),
            summary: SummaryOutput {
                start: instant_forms(&track.start, table)?,
                end: instant_forms(&track.end, table)?,
                span_s: summary.span_s,
                accumulated_s: summary.accumulated_s,
                tidal_part_s: samples.last().map_or(0.0, |s| s.tidal_part_s),
                mean_rate: summary.mean_rate,
                mean_rate_us_per_day: summary.mean_rate_us_per_day,
                periodic_amplitude_s: if high >= low { 0.5 * (high - low) } else { 0.0 },
                kepler_residual_rms_s: rms,
                lunar: Some(LunarSummaryOutput {
                    center: "moon".to_string(),
                    tidal_mean_rate: summary.tidal_mean_rate,
                    clock_periodic_amplitude_s: summary.periodic_amplitude_s,
                    simultaneity_amplitude_s: summary.simultaneity_amplitude_s,
                }),
            },
            id: track.id,
            series,
        });
    }
    Ok(ProperTimeAnswer {
        reference: lunar.reference.as_str().to_string(),
        gravity_model: lunar.gravity_model.as_str().to_string(),
        tdb_model: request.tdb_model.as_str().to_string(),
        objects,
        model_notes: [LUNAR_INTEGRATION_NOTE, LUNAR_TIME_NOTE, LUNAR_PERIODIC_NOTE]
            .map(String::from)
            .to_vec(),
        warnings: (lunar.reference == LunarReference::Tl).then(|| vec![TL_WARNING.to_string()]),
    })
}
