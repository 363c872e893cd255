//! A piecewise Chebyshev representation of the geocentric series, built lazily.
//!
//! The time line from `FIRST_INTERVAL_START_DAYS` (1899-12-31 TT) to
//! `FIRST_INTERVAL_START_DAYS + INTERVAL_COUNT * INTERVAL_DAYS` (2200-01-07 TT) is cut into
//! 16-day intervals. On first use, an interval's `COEFFICIENT_COUNT` Chebyshev coefficients are
//! computed from the full series at the Chebyshev nodes (interpolation at the zeros of
//! T_N, which is within a small factor of the best polynomial approximation); afterwards a call
//! costs one Clenshaw recurrence. Each interval has its own `OnceLock`, so threads share the work
//! without locks on the hot path and without `unsafe`.
//!
//! Truncation error measured with 20 coefficients on 16-day intervals: about 1e-16 s, at the
//! level of the rounding noise of the series sum itself (the module tests compare with the full
//! series on 20 000 epochs and at every interval boundary from 1960 to 2100).
//!
//! Reference: Press, W.H. et al., Numerical Recipes, 3rd ed., section 5.8 (Chebyshev
//! approximation and Clenshaw's recurrence).

use std::sync::OnceLock;

use super::series::geocentric_s;
use crate::physics::constants::{DAYS_PER_JULIAN_MILLENNIUM, SECONDS_PER_DAY};

/// Length of one fitted interval, days.
pub(crate) const INTERVAL_DAYS: f64 = 16.0;
/// Number of Chebyshev coefficients per interval (polynomial degree + 1).
pub(crate) const COEFFICIENT_COUNT: usize = 20;
/// Start of the first interval: TT days since J2000.0 (-36 528 d = 1899-12-31T12:00 TT).
pub(crate) const FIRST_INTERVAL_START_DAYS: f64 = -36_528.0;
/// Number of intervals: 6849 x 16 d = 109 584 d, to 2200-01-07T12:00 TT.
pub(crate) const INTERVAL_COUNT: usize = 6_849;

type Coefficients = [f64; COEFFICIENT_COUNT];

/// Geocentric series at a time given in TT days since J2000.0 (`days / 365250` millennia).
fn geocentric_at_days_s(days: f64) -> f64 {
    geocentric_s(days / DAYS_PER_JULIAN_MILLENNIUM)
}

/// Chebyshev coefficients of the geocentric series on `[start_days, start_days + INTERVAL_DAYS]`,
/// from its values at the N Chebyshev nodes `x_k = cos(pi (k + 1/2) / N)`:
/// `c_j = (2/N) sum_k f(x_k) cos(pi j (k + 1/2) / N)`, with `c_0` halved
/// (Numerical Recipes, 3rd ed., eq. 5.8.7).
fn fit_interval(start_days: f64) -> Coefficients {
    let n = COEFFICIENT_COUNT as f64;
    let half_width_days = 0.5 * INTERVAL_DAYS;
    let mut values = [0.0; COEFFICIENT_COUNT];
    for (k, value) in values.iter_mut().enumerate() {
        let x = (std::f64::consts::PI * (k as f64 + 0.5) / n).cos();
        *value = geocentric_at_days_s(start_days + (x + 1.0) * half_width_days);
    }
    let mut coefficients = [0.0; COEFFICIENT_COUNT];
    for (j, coefficient) in coefficients.iter_mut().enumerate() {
        let sum: f64 = values
            .iter()
            .enumerate()
            .map(|(k, value)| {
                value * (std::f64::consts::PI * j as f64 * (k as f64 + 0.5) / n).cos()
            })
            .sum();
        *coefficient = 2.0 * sum / n;
    }
    coefficients[0] *= 0.5;
    coefficients
}

/// Clenshaw's recurrence for `sum_j c_j T_j(x)`, x in [-1, 1] (Numerical Recipes, 3rd ed.,
/// eq. 5.8.11, with the full `c_0`).
fn clenshaw(coefficients: &Coefficients, x: f64) -> f64 {
    let two_x = 2.0 * x;
    let (mut b1, mut b2) = (0.0, 0.0);
    for &c in coefficients.iter().skip(1).rev() {
        let b0 = two_x * b1 - b2 + c;
        b2 = b1;
        b1 = b0;
    }
    x * b1 - b2 + coefficients[0]
}

/// The per-interval cells, created on first use (about 1.2 MB when all are filled).
fn intervals() -> &'static [OnceLock<Coefficients>] {
    static INTERVALS: OnceLock<Vec<OnceLock<Coefficients>>> = OnceLock::new();
    INTERVALS.get_or_init(|| (0..INTERVAL_COUNT).map(|_| OnceLock::new()).collect())
}

/// The interval that holds `days` and the normalized time x in [-1, 1] inside it, or `None`
/// outside the fitted span (or for a non-finite time).
pub(crate) fn locate(days: f64) -> Option<(usize, f64)> {
    let offset_days = days - FIRST_INTERVAL_START_DAYS;
    let span_days = INTERVAL_COUNT as f64 * INTERVAL_DAYS;
    // Written so that NaN fails the test.
    if !(offset_days >= 0.0 && offset_days < span_days) {
        return None;
    }
    let index = ((offset_days / INTERVAL_DAYS).floor() as usize).min(INTERVAL_COUNT - 1);
    let local_days = offset_days - index as f64 * INTERVAL_DAYS;
    let x = (local_days / (0.5 * INTERVAL_DAYS) - 1.0).clamp(-1.0, 1.0);
    Some((index, x))
}

/// Geocentric TDB - TT in seconds from the fitted representation.
///
/// Given: `tt_since_j2000_s`, TT seconds since J2000.0.
/// Returns: `Some(seconds)` inside the fitted span (1899-12-31 to 2200-01-07 TT), `None`
/// outside it or for a non-finite time; the caller then uses the full series.
pub(crate) fn geocentric_fitted_s(tt_since_j2000_s: f64) -> Option<f64> {
    let (index, x) = locate(tt_since_j2000_s / SECONDS_PER_DAY)?;
    let cell = intervals().get(index)?;
    let coefficients =
        cell.get_or_init(|| fit_interval(FIRST_INTERVAL_START_DAYS + index as f64 * INTERVAL_DAYS));
    Some(clenshaw(coefficients, x))
}
