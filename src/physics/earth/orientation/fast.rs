//! X, Y, s and the equation of the origins from piecewise Chebyshev fits of the full series,
//! built lazily: the fast path of [`super::earth_orientation_fast`].
//!
//! TT from `FIRST_INTERVAL_START_DAYS` (1899-12-31T12:00 TT) for `INTERVAL_COUNT` intervals of
//! `INTERVAL_DAYS` (to 2200-01-07T12:00 TT) is cut into intervals. On first use, an interval's
//! `COEFFICIENT_COUNT` Chebyshev coefficients per quantity are computed from the full series at
//! the Chebyshev nodes (interpolation at the zeros of T_N); afterwards a call costs four
//! Clenshaw recurrences. Each interval has its own `OnceLock`, so threads share the work without
//! locks on the hot path. Outside the span the full series is used.
//!
//! The shortest period in the nutation tables is 3.5 days (a 1.5 uas luni-solar term); the
//! terms of 5.5-6.9 days (up to 3.1 mas, at 6.86 days) set the truncation error of 8-day
//! intervals with 14 coefficients, of order 1e-14 rad (a Chebyshev coefficient of sin(w t) on a
//! half-width a is 2 J_n(w a)). The tests compare with the full series at random epochs 1962-2100 and across
//! interval boundaries: worst 4.1e-14 rad, against the 1e-12 rad required.
//!
//! Reference: Press, W.H. et al., Numerical Recipes, 3rd ed., section 5.8 (Chebyshev
//! approximation and Clenshaw's recurrence).

use std::sync::OnceLock;

use super::pole::{celestial_pole_series, CelestialPole};
use super::{JulianDate, J2000_JD};

/// Length of one fitted interval, days.
pub const INTERVAL_DAYS: f64 = 8.0;
/// Chebyshev coefficients per quantity and interval (polynomial degree + 1).
pub const COEFFICIENT_COUNT: usize = 14;
/// Start of the first interval: TT days since J2000.0 (-36 528 d = 1899-12-31T12:00 TT).
pub const FIRST_INTERVAL_START_DAYS: f64 = -36_528.0;
/// Number of intervals: 13 698 x 8 d = 109 584 d, to 2200-01-07T12:00 TT.
pub const INTERVAL_COUNT: usize = 13_698;

type Coefficients = [[f64; COEFFICIENT_COUNT]; 4];

fn pole_at_days(days: f64) -> [f64; 4] {
    let pole = celestial_pole_series(JulianDate::new(J2000_JD, days));
    [pole.x_rad, pole.y_rad, pole.s_rad, pole.eo_rad]
}

/// Chebyshev coefficients of X, Y, s, EO on `[start_days, start_days + INTERVAL_DAYS]` from
/// their values at the N nodes `x_k = cos(pi (k + 1/2) / N)`:
/// `c_j = (2/N) sum_k f(x_k) cos(pi j (k + 1/2) / N)`, with `c_0` halved (Numerical Recipes,
/// 3rd ed., eq. 5.8.7).
fn fit_interval(start_days: f64) -> Coefficients {
    let n = COEFFICIENT_COUNT as f64;
    let half_width_days = 0.5 * INTERVAL_DAYS;
    let mut values = [[0.0; 4]; COEFFICIENT_COUNT];
    for (k, value) in values.iter_mut().enumerate() {
        let x = (std::f64::consts::PI * (k as f64 + 0.5) / n).cos();
        *value = pole_at_days(start_days + (x + 1.0) * half_width_days);
    }
    let mut coefficients = [[0.0; COEFFICIENT_COUNT]; 4];
    for (q, row) in coefficients.iter_mut().enumerate() {
        for (j, coefficient) in row.iter_mut().enumerate() {
            let sum: f64 = values
                .iter()
                .enumerate()
                .map(|(k, value)| {
                    value[q] * (std::f64::consts::PI * j as f64 * (k as f64 + 0.5) / n).cos()
                })
                .sum();
            *coefficient = 2.0 * sum / n;
        }
        row[0] *= 0.5;
    }
    coefficients
}

/// Clenshaw's recurrence for `sum_j c_j T_j(x)`, x in [-1, 1] (Numerical Recipes, 3rd ed.,
/// eq. 5.8.11, with the full `c_0`).
fn clenshaw(coefficients: &[f64; COEFFICIENT_COUNT], x: f64) -> f64 {
    let two_x = 2.0 * x;
    let (mut b1, mut b2) = (0.0, 0.0);
    for &c in coefficients.iter().skip(1).rev() {
        let b0 = two_x * b1 - b2 + c;
        b2 = b1;
        b1 = b0;
    }
    x * b1 - b2 + coefficients[0]
}

/// The per-interval cells (boxed, so the empty table is about 0.2 MB).
fn intervals() -> &'static [OnceLock<Box<Coefficients>>] {
    static CELLS: OnceLock<Vec<OnceLock<Box<Coefficients>>>> = OnceLock::new();
    CELLS.get_or_init(|| (0..INTERVAL_COUNT).map(|_| OnceLock::new()).collect())
}

/// X, Y, s, EO at TT `tt` from the fits (the full series outside 1900-2200).
pub fn celestial_pole_fast(tt: JulianDate) -> CelestialPole {
    let days = (tt.jd1 - J2000_JD) + tt.jd2;
    let position = (days - FIRST_INTERVAL_START_DAYS) / INTERVAL_DAYS;
    if !(position >= 0.0 && position < INTERVAL_COUNT as f64) {
        return celestial_pole_series(tt);
    }
    let index = position as usize;
    let start_days = FIRST_INTERVAL_START_DAYS + index as f64 * INTERVAL_DAYS;
    let coefficients = intervals()[index].get_or_init(|| Box::new(fit_interval(start_days)));
    let x = ((days - start_days) / (0.5 * INTERVAL_DAYS) - 1.0).clamp(-1.0, 1.0);
    CelestialPole {
        x_rad: clenshaw(&coefficients[0], x),
        y_rad: clenshaw(&coefficients[1], x),
        s_rad: clenshaw(&coefficients[2], x),
        eo_rad: clenshaw(&coefficients[3], x),
    }
}
