//! Clock values joined with their satellite's orbit: the interpolated state at each clock epoch.

use super::{ClockData, ClockValue};
use crate::physics::clock_data::series::ClockSample;
use crate::physics::clock_data::terms::inertial_velocity_m_s;
use crate::physics::time::convert::{to_tt_attos, ConversionContext};
use crate::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use crate::trajectory::interpolate::{InterpolationOptions, Interpolator};
use crate::trajectory::{Frame, TrajectorySet};

/// At most this many epochs are named one by one per satellite in the warnings.
const NAMED_EPOCHS: usize = 5;

/// One satellite's clock values with the states at their epochs.
#[derive(Debug, Clone, PartialEq)]
pub struct PairedSeries {
    /// Satellite id.
    pub id: String,
    /// The first paired clock epoch (t = 0 of the samples).
    pub reference_epoch: Instant,
    /// The clock values that have a state, in file order.
    pub values: Vec<ClockValue>,
    /// The samples (t since the reference epoch, clock, state with inertial velocity).
    pub samples: Vec<ClockSample>,
}

/// Joins clocks to orbits. Returns the paired series and warnings naming each satellite (and
/// the file lines of clock epochs) that could not be paired: receiver clocks, satellites with
/// clocks and no orbit or an orbit and no clock, orbits that cannot be interpolated, clock
/// epochs outside the orbit's span.
pub fn pair_clocks_with_orbits(
    clocks: &ClockData,
    orbits: &TrajectorySet,
    options: &InterpolationOptions,
    context: &ConversionContext<'_>,
) -> (Vec<PairedSeries>, Vec<String>) {
    let mut warnings = Vec::new();
    let mut paired = Vec::new();
    for series in &clocks.series {
        if series.receiver {
            warnings.push(format!(
                "receiver {}: {} clock values read; receiver clocks have no orbit and are not corrected",
                series.id,
                series.values.len()
            ));
            continue;
        }
        let Some(track) = orbits.objects.iter().find(|t| t.id == series.id) else {
            warnings.push(format!(
                "satellite {}: clock values from line {} but no orbit; not corrected",
                series.id,
                series.values.first().map_or(0, |v| v.line)
            ));
            continue;
        };
        let interpolator = match Interpolator::from_track(track, options, context) {
            Ok(interpolator) => interpolator,
            Err(error) => {
                warnings.push(format!(
                    "satellite {}: the orbit cannot be interpolated ({}); not corrected",
                    series.id, error.message
                ));
                continue;
            }
        };
        let (Some(first), Some(last_s)) = (track.states.first(), interpolator.times_s().last())
        else {
            continue;
        };
        let Ok(start_tt) = to_tt_attos(&first.epoch, context) else {
            continue;
        };
        let mut values = Vec::new();
        let mut samples = Vec::new();
        let mut outside: Vec<usize> = Vec::new();
        let mut reference: Option<(Instant, i128)> = None;
        for value in &series.values {
            let Ok(tt) = to_tt_attos(&value.epoch, context) else {
                outside.push(value.line);
                continue;
            };
            let t_orbit_s = seconds(tt - start_tt);
            if !(0.0..=*last_s).contains(&t_orbit_s) {
                outside.push(value.line);
                continue;
            }
            let (position_m, velocity_m_s) = interpolator.state_at(t_orbit_s);
            let inertial = match track.frame {
                Frame::EarthFixed => inertial_velocity_m_s(position_m, velocity_m_s),
                // SP3 files are geocentric: the reader never gives a lunar track.
                Frame::Inertial | Frame::LunarInertial => velocity_m_s,
            };
            let (_, reference_tt) = *reference.get_or_insert((value.epoch, tt));
            samples.push(ClockSample {
                t_s: seconds(tt - reference_tt),
                clock_s: value.clock_s,
                position_m,
                inertial_velocity_m_s: inertial,
            });
            values.push(*value);
        }
        if !outside.is_empty() {
            let named: Vec<String> = outside
                .iter()
                .take(NAMED_EPOCHS)
                .map(|l| l.to_string())
                .collect();
            let more = if outside.len() > NAMED_EPOCHS {
                ", ..."
            } else {
                ""
            };
            warnings.push(format!(
                "satellite {}: {} clock epochs outside the orbit's span (lines {}{more}); not corrected",
                series.id,
                outside.len(),
                named.join(", ")
            ));
        }
        if let Some((reference_epoch, _)) = reference {
            paired.push(PairedSeries {
                id: series.id.clone(),
                reference_epoch,
                values,
                samples,
            });
        }
    }
    for track in &orbits.objects {
        if !clocks
            .series
            .iter()
            .any(|s| !s.receiver && s.id == track.id)
        {
            warnings.push(format!("satellite {}: orbit but no clock values", track.id));
        }
    }
    (paired, warnings)
}

fn seconds(attos: i128) -> f64 {
    let whole = attos.div_euclid(ATTOS_PER_SECOND);
    let fraction = attos.rem_euclid(ATTOS_PER_SECOND);
    whole as f64 + fraction as f64 / ATTOS_PER_SECOND as f64
}
