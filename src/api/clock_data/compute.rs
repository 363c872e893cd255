//! Reading a corrections request, correcting every satellite, shaping the answer.

use super::types::{
    ClockSeriesInput, CorrectedEpoch, CorrectionsAnswer, CorrectionsRequest, SatelliteCorrections,
};
use crate::api::error::ApiError;
use crate::api::names::{parse_named, parse_scale};
use crate::api::proper_time::ephemeris_problem;
use crate::api::state::Limits;
use crate::physics::clock_data::series::{
    correct_sample, factory_setting_rate, summarize, ClockConvention, ClockSample,
};
use crate::physics::clock_data::terms::inertial_velocity_m_s;
use crate::physics::rate::state::Frame;
use crate::physics::time::convert::{to_tt_attos, ConversionContext};
use crate::physics::time::formats::{day_reading, write_iso};
use crate::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::trajectory::clock::pair::{pair_clocks_with_orbits, PairedSeries};
use crate::trajectory::clock::{read_rinex_clock, ClockValue};
use crate::trajectory::sp3::read_sp3_with_clocks;
use crate::trajectory::text::parse_epoch;
use crate::trajectory::InterpolationOptions;

/// The model notes of every answer.
pub const NOTES: [&str; 4] = [
    "conventional periodic term -2 r.v/c^2 (IS-GPS-200 20.3.3.3.3.1); IGS clock products leave it out of their values and the user adds it for the satellite's actual clock (common practice)",
    "J2 periodic term -(3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i) sin(2u) (Kouba (2004) GPS Solutions 8:170-180), osculating a, i and u from the state (IERS Conventions (2010) GM, J2, a_E); it stays in IGS clock products",
    "Earth-fixed (SP3, ITRF) velocities are made inertial with omega_E x r about the z axis (polar motion and precession-nutation left out: below 1 ps in the J2 term; -2 r.v/c^2 is the same in both frames)",
    "orbit states at clock epochs: Lagrange (positions only) or Hermite (with velocities) interpolation of degree 7 of the SP3 orbit",
];

/// A satellite's paired values: values (None for JSON series), epochs and samples.
struct Satellite {
    id: String,
    reference_epoch: Instant,
    epochs: Vec<Instant>,
    lines: Vec<Option<usize>>,
    samples: Vec<ClockSample>,
}

fn from_paired(paired: PairedSeries) -> Satellite {
    Satellite {
        id: paired.id,
        reference_epoch: paired.reference_epoch,
        epochs: paired.values.iter().map(|v: &ClockValue| v.epoch).collect(),
        lines: paired.values.iter().map(|v| Some(v.line)).collect(),
        samples: paired.samples,
    }
}

fn text_problem(field: &'static str) -> impl Fn(crate::trajectory::TrajectoryError) -> ApiError {
    move |error| ephemeris_problem(error).with_field(field)
}

/// Reads the request and answers it.
pub fn correct(
    request: &CorrectionsRequest,
    table: &LeapTable,
    limits: &Limits,
) -> Result<CorrectionsAnswer, ApiError> {
    let context = ConversionContext::geocentric(table);
    let convention: ClockConvention = match request.convention.as_deref() {
        None => ClockConvention::Igs,
        Some(text) => parse_named(text, "unknown_convention", "clock convention", "convention")?,
    };
    let (satellites, mut warnings, source) =
        match (&request.sp3, &request.rinex_clock, &request.series) {
            (Some(sp3), rinex, None) => {
                let (orbits, sp3_clocks) =
                    read_sp3_with_clocks(sp3, &context).map_err(text_problem("sp3"))?;
                let (clocks, source) = match rinex {
                    Some(text) => (
                        read_rinex_clock(text, &context).map_err(text_problem("rinex_clock"))?,
                        "rinex_clock",
                    ),
                    None => (sp3_clocks, "sp3"),
                };
                let count: usize = clocks.series.iter().map(|s| s.values.len()).sum();
                crate::api::extract::check_batch_size(
                    count,
                    limits.batch_limit,
                    "sp3",
                    "clock value",
                )?;
                let mut warnings = clocks.warnings.clone();
                if clocks.absent_values > 0 {
                    warnings.push(format!(
                        "{} clock values marked bad or absent were left out",
                        clocks.absent_values
                    ));
                }
                let (paired, pair_warnings) = pair_clocks_with_orbits(
                    &clocks,
                    &orbits,
                    &InterpolationOptions::default(),
                    &context,
                );
                warnings.extend(pair_warnings);
                (
                    paired.into_iter().map(from_paired).collect::<Vec<_>>(),
                    warnings,
                    source,
                )
            }
            (None, None, Some(series)) => (
                json_series(series, request, &context, limits)?,
                Vec::new(),
                "series",
            ),
            (None, Some(_), _) => {
                return Err(ApiError::unprocessable(
                    "orbit_required",
                    "rinex_clock needs the orbit: give the SP3 text in `sp3`",
                )
                .with_field("sp3"))
            }
            (Some(_), _, Some(_)) => {
                return Err(ApiError::unprocessable(
                    "input_ambiguous",
                    "give either files (`sp3`, optionally `rinex_clock`) or `series`, not both",
                )
                .with_field("series"))
            }
            (None, None, None) => {
                return Err(ApiError::unprocessable(
                    "input_missing",
                    "give `sp3` (with `rinex_clock` optionally) or `series`",
                )
                .with_field("sp3"))
            }
        };
    let include_series = request.include_series.unwrap_or(true);
    let mut answers = Vec::new();
    for satellite in satellites {
        if let Some(answer) =
            satellite_answer(&satellite, convention, include_series, table, &mut warnings)?
        {
            answers.push(answer);
        }
    }
    if answers.is_empty() {
        return Err(ApiError::unprocessable(
            "nothing_to_correct",
            format!(
                "no satellite has two or more clock values with an orbit: {}",
                warnings.join("; ")
            ),
        ));
    }
    Ok(CorrectionsAnswer {
        convention: convention.as_str().to_string(),
        clock_source: source.to_string(),
        factory_setting_rate: factory_setting_rate(),
        satellites: answers,
        warnings,
        model_notes: NOTES.iter().map(|n| n.to_string()).collect(),
    })
}

fn iso(instant: &Instant, table: &LeapTable) -> Result<String, ApiError> {
    let reading = day_reading(instant, table).map_err(|e| ApiError::from_time(&e, "epoch"))?;
    Ok(format!(
        "{} {}",
        write_iso(&reading, 6),
        instant.scale().as_str()
    ))
}

fn satellite_answer(
    satellite: &Satellite,
    convention: ClockConvention,
    include_series: bool,
    table: &LeapTable,
    warnings: &mut Vec<String>,
) -> Result<Option<SatelliteCorrections>, ApiError> {
    let mut corrected = Vec::with_capacity(satellite.samples.len());
    let mut kept = Vec::with_capacity(satellite.samples.len());
    for (index, sample) in satellite.samples.iter().enumerate() {
        match correct_sample(sample, convention) {
            Some(c) => {
                corrected.push(c);
                kept.push(index);
            }
            None => warnings.push(format!(
                "satellite {}: the state at sample {index} is not on a closed orbit; not corrected",
                satellite.id
            )),
        }
    }
    let Some(summary) = summarize(&corrected) else {
        warnings.push(format!(
            "satellite {}: fewer than two corrected epochs; no fit",
            satellite.id
        ));
        return Ok(None);
    };
    let series = if include_series {
        let mut rows = Vec::with_capacity(corrected.len());
        for (c, index) in corrected.iter().zip(&kept) {
            rows.push(CorrectedEpoch {
                epoch: iso(&satellite.epochs[*index], table)?,
                line: satellite.lines[*index],
                clock_s: c.clock_s,
                conventional_s: c.conventional_s,
                j2_s: c.j2_s,
                corrected_s: c.corrected_s,
                residual_s: c.corrected_s - summary.fit.offset_s - summary.fit.rate * c.t_s,
            });
        }
        Some(rows)
    } else {
        None
    };
    Ok(Some(SatelliteCorrections {
        id: satellite.id.clone(),
        reference_epoch: iso(&satellite.reference_epoch, table)?,
        count: summary.fit.count,
        offset_s: summary.fit.offset_s,
        rate: summary.fit.rate,
        rate_us_per_day: summary.rate_us_per_day,
        rate_minus_factory_setting: summary.rate_minus_factory_setting,
        residual_rms_s: summary.fit.residual_rms_s,
        series,
    }))
}

fn json_series(
    series: &[ClockSeriesInput],
    request: &CorrectionsRequest,
    context: &ConversionContext<'_>,
    limits: &Limits,
) -> Result<Vec<Satellite>, ApiError> {
    let scale = match request.epoch_scale.as_deref() {
        None => Scale::Gpst,
        Some(text) => parse_scale(text, "epoch_scale")?,
    };
    let count: usize = series.iter().map(|s| s.samples.len()).sum();
    crate::api::extract::check_batch_size(count, limits.batch_limit, "series", "clock value")?;
    let mut satellites = Vec::new();
    for (k, input) in series.iter().enumerate() {
        let frame: Frame = match input.frame.as_deref() {
            None => Frame::Itrf,
            Some(text) => {
                parse_named(text, "unknown_frame", "frame", format!("series[{k}].frame"))?
            }
        };
        let mut epochs = Vec::new();
        let mut samples = Vec::new();
        let mut reference_tt: Option<i128> = None;
        for (i, sample) in input.samples.iter().enumerate() {
            let field = format!("series[{k}].samples[{i}]");
            let epoch = parse_epoch(&sample.epoch, scale, context)
                .map_err(|e| ApiError::from_time(&e, format!("{field}.epoch")))?;
            let tt = to_tt_attos(&epoch, context)
                .map_err(|e| ApiError::from_time(&e, format!("{field}.epoch")))?;
            let values = [sample.clock_s]
                .into_iter()
                .chain(sample.position_m)
                .chain(sample.velocity_m_s);
            if values.into_iter().any(|v| !v.is_finite()) {
                return Err(ApiError::unprocessable(
                    "not_finite",
                    format!("{field}: every number must be finite"),
                )
                .with_field(field));
            }
            let reference = *reference_tt.get_or_insert(tt);
            if let Some(previous) = samples.last().map(|s: &ClockSample| s.t_s) {
                let t_s = attos_to_s(tt - reference);
                if t_s <= previous {
                    return Err(ApiError::unprocessable(
                        "epochs_not_increasing",
                        format!("{field}.epoch is not after the previous epoch"),
                    )
                    .with_field(format!("{field}.epoch")));
                }
            }
            let inertial = match frame {
                Frame::Gcrs => sample.velocity_m_s,
                Frame::Itrf => inertial_velocity_m_s(sample.position_m, sample.velocity_m_s),
            };
            epochs.push(epoch);
            samples.push(ClockSample {
                t_s: attos_to_s(tt - reference),
                clock_s: sample.clock_s,
                position_m: sample.position_m,
                inertial_velocity_m_s: inertial,
            });
        }
        let Some(first) = epochs.first().copied() else {
            return Err(ApiError::unprocessable(
                "empty_batch",
                format!("series[{k}] has no samples"),
            )
            .with_field(format!("series[{k}].samples")));
        };
        satellites.push(Satellite {
            id: input.id.clone(),
            reference_epoch: first,
            lines: vec![None; epochs.len()],
            epochs,
            samples,
        });
    }
    Ok(satellites)
}

fn attos_to_s(attos: i128) -> f64 {
    let whole = attos.div_euclid(ATTOS_PER_SECOND);
    whole as f64 + attos.rem_euclid(ATTOS_PER_SECOND) as f64 / ATTOS_PER_SECOND as f64
}
