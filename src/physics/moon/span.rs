//! A lunar clock over a span: its mean rate and the proper time it accumulates against TCL,
//! TL, TT and TCG, with the periodic part kept apart from the secular rate.
//!
//! The rates of [`super::site`] are sampled every `h` <= 1 hour of TDB (an even number of
//! steps) and integrated by the composite Simpson rule; the accumulated offset tau - X is
//! known at every second node. Error of the rule for the monthly terms (the shortest periods
//! here, 13.7 days for the Sun's tide): h^4 omega^4 / 180 of their amplitude with omega h below
//! 1.3e-2, below 1e-10 of it. The integration variable is TDB: tau - X = integral (d tau/dX - 1)
//! dX is taken over dTDB instead of dX, an error of |dX/dTDB - 1| (below 1.6e-8) of the
//! accumulated offset (below 1 ps a year).
//!
//! Secular and periodic parts: the mean rate is (tau - X)(end) / (end - start); the periodic
//! part is what remains after that line, p(t) = (tau - X)(t) - mean (t - start), zero at both
//! ends; the answer gives its smallest and largest values over the span.
//!
//! The scales' TL - TT over the same span ([`super::site::tl_minus_tt_at_centres_s`]) minus the
//! clocks' (tau - TT) - (tau - TL) is the coordinate-simultaneity term (see
//! [`super::site`]): reported apart, never added to the clock's proper time.

use super::site::{rates_at, site_body_fixed_m, tl_minus_tt_at_centres_s, LunarClockError};
use crate::physics::constants::{L_G, SECONDS_PER_DAY};
use crate::physics::rate::lunar::LunarSite;
use crate::physics::rate::{RateError, RateErrorKind};
use crate::physics::readable::readable;
use crate::physics::solar_system::Ephemeris;
use crate::physics::time::lunar::L_L;

/// The longest span accepted, days (about ten years: 87 840 hourly samples).
pub const MAX_SPAN_DAYS: f64 = 3660.0;
/// The integration step of spans asked for, s (at most).
pub const MAX_STEP_S: f64 = 3600.0;
/// The largest step [`lunar_site_over_span`] accepts, s (the anomalistic-month mean).
const LARGEST_STEP_S: f64 = 6.0 * 3600.0;
/// The anomalistic month, days (27.554550 d, the mean perigee-to-perigee period; from
/// memory, e.g. the Astronomical Almanac's value).
pub const ANOMALISTIC_MONTH_DAYS: f64 = 27.554_550;

/// Proper time accumulated against one scale over a span.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Accumulated {
    /// (tau - X)(end) - (tau - X)(start), s.
    pub offset_s: f64,
    /// The mean fractional rate, offset_s / (end - start).
    pub mean_rate: f64,
    /// The smallest value of the periodic part over the span, s (never positive).
    pub periodic_min_s: f64,
    /// The largest value of the periodic part over the span, s (never negative).
    pub periodic_max_s: f64,
}

impl Accumulated {
    /// periodic_max_s - periodic_min_s.
    pub fn periodic_peak_to_peak_s(&self) -> f64 {
        self.periodic_max_s - self.periodic_min_s
    }
}

/// A lunar clock over a span.
#[derive(Debug, Clone, PartialEq)]
pub struct LunarSiteSpan {
    /// Against TCL.
    pub tcl: Accumulated,
    /// Against TL (a proposal).
    pub tl: Accumulated,
    /// Against TT (geocentric frame).
    pub tt: Accumulated,
    /// Against TCG (geocentric frame).
    pub tcg: Accumulated,
    /// The scales' (TL - TT)(end) - (TL - TT)(start) at the two centres, s.
    pub tl_minus_tt_scales_s: f64,
    /// The coordinate-simultaneity term over the span: the scales' TL - TT change minus the
    /// clocks' ((tau - TT) - (tau - TL)), s.
    pub simultaneity_s: f64,
    /// The mean velocity part of the rate against TT and TCG, -<v^2>/(2 c^2) (geocentric).
    pub geocentric_sr_mean: f64,
    /// The mean velocity part of the rate against TCL and TL, -<v_s^2>/(2 c^2)
    /// (selenocentric).
    pub selenocentric_sr_mean: f64,
    /// The integration step used, s.
    pub step_s: f64,
    /// The periodic part against TT at every second node: (TDB s since J2000, value s).
    pub tt_periodic_s: Vec<(f64, f64)>,
}

fn span_error(message: String, kind: RateErrorKind) -> LunarClockError {
    LunarClockError::Input(RateError::new("span", message).with_kind(kind))
}

/// Integrates the rates of a clock at `site` from `start_tdb_s` to `end_tdb_s` (TDB seconds
/// since J2000.0) with steps of at most `max_step_s` (clamped to [1 s, 6 h]).
///
/// Reference: the composite Simpson rule (Abramowitz & Stegun 25.4.6); the rates of
/// [`super::site`].
pub fn lunar_site_over_span(
    site: &LunarSite,
    start_tdb_s: f64,
    end_tdb_s: f64,
    max_step_s: f64,
    ephemeris: &Ephemeris,
) -> Result<LunarSiteSpan, LunarClockError> {
    let body_fixed_m = site_body_fixed_m(site)?;
    let length_s = end_tdb_s - start_tdb_s;
    if length_s.is_nan() || length_s <= 0.0 {
        return Err(span_error(
            "the end must come after the start".to_string(),
            RateErrorKind::InvalidValue,
        ));
    }
    if length_s > MAX_SPAN_DAYS * SECONDS_PER_DAY {
        return Err(span_error(
            format!(
                "must be at most {MAX_SPAN_DAYS} days long, got {} days",
                readable(length_s / SECONDS_PER_DAY)
            ),
            RateErrorKind::BeyondModelRange,
        ));
    }
    let step_limit_s = max_step_s.clamp(1.0, LARGEST_STEP_S);
    let half_steps = ((length_s / step_limit_s / 2.0).ceil() as usize).max(1);
    let steps = 2 * half_steps;
    let h = length_s / steps as f64;
    let mut tcl = vec![0.0; steps + 1];
    let mut tt = vec![0.0; steps + 1];
    let mut geo_sr = vec![0.0; steps + 1];
    let mut sel_sr = vec![0.0; steps + 1];
    for k in 0..=steps {
        let t = if k == steps {
            end_tdb_s
        } else {
            start_tdb_s + k as f64 * h
        };
        let rates = rates_at(body_fixed_m, t, ephemeris)?;
        tcl[k] = rates.tcl.total();
        tt[k] = rates.tt.total();
        geo_sr[k] = rates.tt.sr;
        sel_sr[k] = rates.tcl.sr;
    }
    let (tcl_curve, tt_curve) = (cumulative_simpson(&tcl, h), cumulative_simpson(&tt, h));
    let tl_minus_tt_scales_s =
        tl_minus_tt_at_centres_s(end_tdb_s)? - tl_minus_tt_at_centres_s(start_tdb_s)?;
    let tcl_acc = accumulated(&tcl_curve, 2.0 * h, length_s, 0.0);
    let tt_acc = accumulated(&tt_curve, 2.0 * h, length_s, 0.0);
    let tl_acc = accumulated(&tcl_curve, 2.0 * h, length_s, L_L);
    let clocks_tl_minus_tt_s = tt_acc.offset_s - tl_acc.offset_s;
    let mean = tt_acc.mean_rate;
    Ok(LunarSiteSpan {
        tcl: tcl_acc,
        tl: tl_acc,
        tcg: accumulated(&tt_curve, 2.0 * h, length_s, -L_G),
        tt: tt_acc,
        tl_minus_tt_scales_s,
        simultaneity_s: tl_minus_tt_scales_s - clocks_tl_minus_tt_s,
        geocentric_sr_mean: cumulative_simpson(&geo_sr, h)
            .last()
            .copied()
            .unwrap_or(0.0)
            / length_s,
        selenocentric_sr_mean: cumulative_simpson(&sel_sr, h)
            .last()
            .copied()
            .unwrap_or(0.0)
            / length_s,
        step_s: h,
        tt_periodic_s: tt_curve
            .iter()
            .enumerate()
            .map(|(i, &value)| {
                let dt = i as f64 * 2.0 * h;
                (start_tdb_s + dt, value - mean * dt)
            })
            .collect(),
    })
}

/// The integral of `samples` (spacing `h`, an even number of intervals) from the first sample
/// to every second one: 0, then Simpson over each pair of intervals, summed.
fn cumulative_simpson(samples: &[f64], h: f64) -> Vec<f64> {
    let mut out = Vec::with_capacity(samples.len() / 2 + 1);
    let mut sum = 0.0;
    out.push(sum);
    for pair in samples.windows(3).step_by(2) {
        sum += h / 3.0 * (pair[0] + 4.0 * pair[1] + pair[2]);
        out.push(sum);
    }
    out
}

/// The summary of an accumulated curve (values every `spacing_s`, over `length_s`) with a
/// constant rate `shift` added (TL = TCL + L_L, TCG = TT - L_G, first order).
fn accumulated(curve: &[f64], spacing_s: f64, length_s: f64, shift: f64) -> Accumulated {
    let offset_s = curve.last().copied().unwrap_or(0.0) + shift * length_s;
    let mean_rate = offset_s / length_s;
    let (mut low, mut high) = (0.0_f64, 0.0_f64);
    for (i, value) in curve.iter().enumerate() {
        let dt = (i as f64 * spacing_s).min(length_s);
        let periodic = value + shift * dt - mean_rate * dt;
        low = low.min(periodic);
        high = high.max(periodic);
    }
    Accumulated {
        offset_s,
        mean_rate,
        periodic_min_s: low,
        periodic_max_s: high,
    }
}

/// The mean rates of a clock at `site` over the anomalistic month centred on `tdb_s` (6-hour
/// steps: Simpson's error below 1e-7 of the monthly amplitude), the "mean" beside an
/// instantaneous rate.
pub fn mean_over_anomalistic_month(
    site: &LunarSite,
    tdb_s: f64,
    ephemeris: &Ephemeris,
) -> Result<LunarSiteSpan, LunarClockError> {
    let half_s = 0.5 * ANOMALISTIC_MONTH_DAYS * SECONDS_PER_DAY;
    lunar_site_over_span(
        site,
        tdb_s - half_s,
        tdb_s + half_s,
        6.0 * 3600.0,
        ephemeris,
    )
}
