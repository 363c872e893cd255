//! Integration of d(tau)/d(TCL) along a lunar orbit and the series it gives (see the module
//! notes of [`super`]).

use super::environment::{earth_sun_tidal_potential_m2_s2, simultaneity_term_s, LunarSurroundings};
use super::field::moon_field_potential_m2_s2;
use crate::physics::constants::{SECONDS_PER_DAY, SPEED_OF_LIGHT_SQUARED_M2_S2};
use crate::physics::gravity::{dot, norm};
use crate::physics::moon::gravity::LunarGravityModel;
use crate::physics::proper_time::{
    kepler_periodic_term_s, CompensatedSum, GaussLegendre, ProperTimeError, ProperTimeErrorKind,
    ProperTimeOptions, Trajectory,
};

/// The model note of [`integrate_lunar_proper_time`].
pub const LUNAR_INTEGRATION_NOTE: &str = "lunar orbit: d(tau)/d(TCL) - 1 = -(v^2/2 + U_Moon + w_tidal)/c^2 in the LCRS (the form of IAU 2000 Resolution B1.3 with the Moon in place of the Earth); U_Moon = the gravity_model named in the answer: grail_gl0660b_degree2 (default) the point mass (GM of DE440) with J2 = 2.0323e-4 and C22 = 2.2356e-5 of the GRAIL field GL0660B (from memory; the field of the lunar surface clocks) in the body-fixed axes of the IAU rotation model of the Moon (Archinal et al. 2018), j2 the zonal J2 alone about its pole, point_mass the monopole; w_tidal of the Earth and the Sun from DE440; left out: the Moon's degree 3 and above (C31 about 2.7e-5, from memory: about 1e-15 in rate at 100 km; the mass concentrations of the higher degrees not estimated here), C22 with j2 (up to 1.8e-15 at 100 km, 8.9e-16 in a polar orbit's mean), other planets' tides (below 1e-20); selenocentric positions are taken as LCRS positions, velocities as d x / d TCL";

/// The model note of the periodic part and the simultaneity term.
pub const LUNAR_PERIODIC_NOTE: &str = "periodic_s is tau - t minus its least-squares line (the clock-rate periodic part: eccentricity, J2, tides); kepler_periodic_s is -2 x.v/c^2 for comparison; simultaneity_s = v_M.(x - x_M)/c^2 is the position-dependent part of TCB - TCL at the clock (IAU 2000 Resolution B1.5 with the Moon for the Earth): not a clock rate, never included in tau - t; add it to a TCL-derived TCB (or, scaled by 1 - L_B, TDB) of an event at the clock";

/// One output epoch.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarProperTimeSample {
    /// Coordinate time since the first epoch, s (TCL, or the reference after
    /// [`LunarProperTimeSeries::relative_to`]).
    pub t_s: f64,
    /// tau - t since the first epoch, s: the sum of the four parts below.
    pub tau_minus_t_s: f64,
    /// From -v^2/(2 c^2), s.
    pub velocity_part_s: f64,
    /// From -U_Moon/c^2, s.
    pub moon_gravity_part_s: f64,
    /// From -w_tidal/c^2 (Earth and Sun), s.
    pub tidal_part_s: f64,
    /// TCL minus the reference since the first epoch, s (0 against TCL).
    pub reference_part_s: f64,
    /// tau - t minus its least-squares line, s.
    pub periodic_s: f64,
    /// The Keplerian term -2 x.v/c^2 at this epoch, s.
    pub kepler_periodic_s: f64,
    /// The coordinate-simultaneity term v_M.(x - x_M)/c^2 at this epoch, s (never in tau - t).
    pub simultaneity_s: f64,
}

/// Summary of one series.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarProperTimeSummary {
    /// Last minus first epoch, s.
    pub span_s: f64,
    /// tau - t at the last epoch, s.
    pub accumulated_s: f64,
    /// accumulated / span.
    pub mean_rate: f64,
    /// The mean rate in microseconds per day of 86 400 s.
    pub mean_rate_us_per_day: f64,
    /// The tidal part's mean rate (tidal part at the last epoch / span).
    pub tidal_mean_rate: f64,
    /// Half the peak-to-peak of `periodic_s`, s.
    pub periodic_amplitude_s: f64,
    /// Half the peak-to-peak of `simultaneity_s`, s.
    pub simultaneity_amplitude_s: f64,
}

/// The result of an integration.
#[derive(Debug, Clone, PartialEq)]
pub struct LunarProperTimeSeries {
    /// One sample per output epoch.
    pub samples: Vec<LunarProperTimeSample>,
    /// The summary.
    pub summary: LunarProperTimeSummary,
}

fn refuse(kind: ProperTimeErrorKind, index: usize, message: impl Into<String>) -> ProperTimeError {
    ProperTimeError {
        code: kind.as_str(),
        message: message.into(),
        index: Some(index),
    }
}

/// Integrates d(tau)/d(TCL) - 1 = -(v^2/2 + U_Moon + w_tidal)/c^2 along `trajectory`
/// (selenocentric states, ICRF axes, at TCL seconds since the first epoch) between
/// consecutive `epochs_s` (TCL seconds, strictly increasing, at least two).
///
/// `surroundings(t_s)` gives the Earth, the Sun, the Moon's barycentric velocity and the pole
/// at TCL second `t_s`; `model` is the Moon's field. Quadrature as in
/// [`crate::physics::proper_time::integrate_proper_time`] (Gauss-Legendre with the node count
/// from the interval's angle of orbit, Neumaier's compensated sums).
pub fn integrate_lunar_proper_time<T, S>(
    trajectory: &T,
    epochs_s: &[f64],
    surroundings: S,
    model: LunarGravityModel,
    options: &ProperTimeOptions,
) -> Result<LunarProperTimeSeries, ProperTimeError>
where
    T: Trajectory + ?Sized,
    S: Fn(f64) -> Option<LunarSurroundings>,
{
    if epochs_s.len() < 2 {
        return Err(ProperTimeError {
            code: ProperTimeErrorKind::TooFewEpochs.as_str(),
            message: format!("{} output epochs; at least two are needed", epochs_s.len()),
            index: None,
        });
    }
    if let Some(index) = epochs_s
        .windows(2)
        .position(|p| p[1].partial_cmp(&p[0]) != Some(std::cmp::Ordering::Greater))
    {
        return Err(refuse(
            ProperTimeErrorKind::EpochsNotIncreasing,
            index + 1,
            "output epochs must be strictly increasing",
        ));
    }
    let outside = |index: usize| {
        refuse(
            ProperTimeErrorKind::NotFinite,
            index,
            "no Earth and Sun positions at this epoch (outside the prepared span)",
        )
    };
    let rules = GaussLegendre::new();
    let mut sums = [CompensatedSum::default(); 3];
    let mut samples = Vec::with_capacity(epochs_s.len());
    let mut push = |t_s: f64, state: ([f64; 3], [f64; 3]), sums: &[CompensatedSum; 3], index| {
        let around = surroundings(t_s).ok_or_else(|| outside(index))?;
        let parts = sums.map(|s| s.value());
        samples.push(LunarProperTimeSample {
            t_s,
            tau_minus_t_s: parts[0] + parts[1] + parts[2],
            velocity_part_s: parts[0],
            moon_gravity_part_s: parts[1],
            tidal_part_s: parts[2],
            reference_part_s: 0.0,
            periodic_s: 0.0,
            kepler_periodic_s: kepler_periodic_term_s(&state.0, &state.1),
            simultaneity_s: simultaneity_term_s(&around.moon_velocity_m_s, &state.0),
        });
        Ok::<(), ProperTimeError>(())
    };
    let first_s = epochs_s.first().copied().unwrap_or(0.0);
    let mut start_state = trajectory.state_at(first_s);
    push(first_s, start_state, &sums, 0)?;
    for (index, pair) in epochs_s.windows(2).enumerate() {
        let (start_s, end_s) = (pair[0], pair[1]);
        let (position_m, velocity_m_s) = start_state;
        let length_s = end_s - start_s;
        let angle = length_s * norm(velocity_m_s) / norm(position_m);
        if !angle.is_finite() {
            return Err(refuse(
                ProperTimeErrorKind::NotFinite,
                index,
                "the state at the start of this interval has a zero or non-finite position or velocity",
            ));
        }
        if dot(velocity_m_s, velocity_m_s) >= SPEED_OF_LIGHT_SQUARED_M2_S2 {
            return Err(refuse(
                ProperTimeErrorKind::SpeedNotBelowC,
                index,
                "the (interpolated) speed at the start of this interval is at or above c",
            ));
        }
        let Some((nodes, pieces)) = rules.plan(angle, options.relative_tolerance) else {
            return Err(refuse(
                ProperTimeErrorKind::SamplingTooCoarse,
                index,
                format!("the object moves through {angle:.0} rad of its selenocentric direction in this interval; sample the trajectory more densely"),
            ));
        };
        let piece_s = length_s / pieces as f64;
        let mut parts = [0.0; 3];
        for piece in 0..pieces {
            let middle_s = start_s + (piece as f64 + 0.5) * piece_s;
            for (node, weight) in rules.rule(nodes) {
                let t_s = middle_s + 0.5 * piece_s * node;
                let (p, v) = trajectory.state_at(t_s);
                let around = surroundings(t_s).ok_or_else(|| outside(index))?;
                parts[0] += weight * 0.5 * dot(v, v);
                parts[1] += weight * moon_field_potential_m2_s2(&p, &around.axes, model);
                parts[2] += weight * earth_sun_tidal_potential_m2_s2(&around, &p);
            }
        }
        let scale = -0.5 * piece_s / SPEED_OF_LIGHT_SQUARED_M2_S2;
        if !parts.iter().all(|p| p.is_finite()) {
            return Err(refuse(
                ProperTimeErrorKind::NotFinite,
                index,
                "the rate is not finite inside this interval (check the trajectory)",
            ));
        }
        for (sum, part) in sums.iter_mut().zip(parts) {
            sum.add(scale * part);
        }
        start_state = trajectory.state_at(end_s);
        push(end_s, start_state, &sums, index + 1)?;
    }
    Ok(finish(samples))
}

impl LunarProperTimeSeries {
    /// The same series against another reference scale: `reference_part_s[k]` is TCL
    /// elapsed minus the reference's elapsed seconds at output epoch k (from the scale
    /// relations, computed exactly by the caller). tau - ref = (tau - TCL) + that difference,
    /// kept as `reference_part_s`; the periodic part and the rates are recomputed on the
    /// reference's time axis (t - reference part). `None` when the lengths differ.
    pub fn relative_to(&self, reference_part_s: &[f64]) -> Option<Self> {
        if reference_part_s.len() != self.samples.len() {
            return None;
        }
        let samples = self
            .samples
            .iter()
            .zip(reference_part_s)
            .map(|(sample, part)| LunarProperTimeSample {
                t_s: sample.t_s - part,
                tau_minus_t_s: sample.velocity_part_s
                    + sample.moon_gravity_part_s
                    + sample.tidal_part_s
                    + part,
                reference_part_s: *part,
                ..*sample
            })
            .collect();
        Some(finish(samples))
    }
}

/// Fills the periodic part (tau - t minus its least-squares line; ordinary least squares,
/// e.g. Press et al., Numerical Recipes, 3rd ed., section 15.2) and the summary.
fn finish(mut samples: Vec<LunarProperTimeSample>) -> LunarProperTimeSeries {
    let count = samples.len().max(1) as f64;
    let mean_t = samples.iter().map(|s| s.t_s).sum::<f64>() / count;
    let mean_y = samples.iter().map(|s| s.tau_minus_t_s).sum::<f64>() / count;
    let (mut sty, mut stt) = (0.0, 0.0);
    for s in &samples {
        sty += (s.t_s - mean_t) * (s.tau_minus_t_s - mean_y);
        stt += (s.t_s - mean_t) * (s.t_s - mean_t);
    }
    let slope = if stt > 0.0 { sty / stt } else { 0.0 };
    for s in &mut samples {
        s.periodic_s = s.tau_minus_t_s - mean_y - slope * (s.t_s - mean_t);
    }
    let half_range = |values: &mut dyn Iterator<Item = f64>| {
        let (low, high) = values.fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), v| {
            (lo.min(v), hi.max(v))
        });
        if high >= low {
            0.5 * (high - low)
        } else {
            0.0
        }
    };
    let first = samples.first().copied();
    let last = samples.last().copied();
    let span_s = match (first, last) {
        (Some(a), Some(b)) => b.t_s - a.t_s,
        _ => 0.0,
    };
    let per_span = |value: f64| if span_s > 0.0 { value / span_s } else { 0.0 };
    let accumulated_s = last.map_or(0.0, |s| s.tau_minus_t_s);
    let mean_rate = per_span(accumulated_s);
    LunarProperTimeSeries {
        summary: LunarProperTimeSummary {
            span_s,
            accumulated_s,
            mean_rate,
            mean_rate_us_per_day: mean_rate * SECONDS_PER_DAY * 1e6,
            tidal_mean_rate: per_span(last.map_or(0.0, |s| s.tidal_part_s)),
            periodic_amplitude_s: half_range(&mut samples.iter().map(|s| s.periodic_s)),
            simultaneity_amplitude_s: half_range(&mut samples.iter().map(|s| s.simultaneity_s)),
        },
        samples,
    }
}
