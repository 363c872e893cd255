//! TDB - TT at the geocentre from the JPL DE440 planetary ephemeris: the time-dilation
//! integral of IAU 2000 Resolution B1.5 (IERS Conventions (2010) eq. 10.4 with the 1/c^4 terms
//! of eq. 10.5), integrated offline by `tools/make_ephemeris_time.py` and fitted with Chebyshev
//! pieces; this module evaluates the fit (std only).
//!
//! The integral gives TCB - TCG at the geocentre; TDB - TT follows through the defining
//! constants L_B and TDB0 (IAU 2006 Resolution B3) and L_G (IAU 2000 Resolution B1.9):
//! `TDB - TT = (1 - L_B) (TCB - TCG) + (L_G - L_B) / (1 - L_G) (TT - T0) + TDB0`.
//! The data file and its terms are described in `data/tdb_ephemeris_README.md`.
//!
//! Span: 1959-12-30T00:00 TT to 2101-01-02T00:00 TT ([`SPAN_TEXT`]); outside it the model has
//! no value ([`tdb_minus_tt_ephemeris_s`] answers `None`).
//!
//! References: Park, R.S. et al., Astron. J. 161:105 (2021) (DE440); IAU 2000 Resolution B1.5
//! and B1.9, IAU 2006 Resolution B3; IERS Conventions (2010) ch. 10, eq. 10.4-10.5.

pub(crate) mod table;

#[cfg(test)]
mod tests;

use crate::physics::constants::SECONDS_PER_DAY;
use table::{EphemerisTable, COEFFICIENT_COUNT, FIRST_PIECE_START_DAYS, PIECE_COUNT, PIECE_DAYS};

/// The span of the fitted representation, as people read it.
pub const SPAN_TEXT: &str = "1959-12-30T00:00:00 TT to 2101-01-02T00:00:00 TT";

/// The span of the fit in TT seconds since J2000.0: `[start, end)`.
pub const fn span_tt_since_j2000_s() -> (f64, f64) {
    (
        FIRST_PIECE_START_DAYS * SECONDS_PER_DAY,
        (FIRST_PIECE_START_DAYS + PIECE_COUNT as f64 * PIECE_DAYS) * SECONDS_PER_DAY,
    )
}

/// Clenshaw's recurrence for `sum_j c_j T_j(x)`, x in [-1, 1] (Numerical Recipes, 3rd ed.,
/// eq. 5.8.11, with the full `c_0`).
pub(crate) fn clenshaw(coefficients: &[f64], x: f64) -> f64 {
    let two_x = 2.0 * x;
    let (mut b1, mut b2) = (0.0, 0.0);
    for &c in coefficients.iter().skip(1).rev() {
        let b0 = two_x * b1 - b2 + c;
        b2 = b1;
        b1 = b0;
    }
    x * b1 - b2 + coefficients.first().copied().unwrap_or(0.0)
}

/// The piece that holds `days` (TT days since J2000.0) and x in [-1, 1] inside it; `None`
/// outside the span or for a non-finite time.
pub(crate) fn locate(days: f64) -> Option<(usize, f64)> {
    let offset_days = days - FIRST_PIECE_START_DAYS;
    // Written so that NaN fails the test.
    if !(offset_days >= 0.0 && offset_days < PIECE_COUNT as f64 * PIECE_DAYS) {
        return None;
    }
    let index = ((offset_days / PIECE_DAYS).floor() as usize).min(PIECE_COUNT - 1);
    let x = (2.0 * (offset_days - index as f64 * PIECE_DAYS) / PIECE_DAYS - 1.0).clamp(-1.0, 1.0);
    Some((index, x))
}

/// TDB - TT at the geocentre from the DE440 time-dilation integral (fitted form).
///
/// Given: `tt_since_j2000_s`, TT seconds since J2000.0 (JD 2451545.0 TT); the argument is TT
/// itself (the generator solves TDB = TT + (TDB - TT) before fitting).
/// Returns: TDB - TT in seconds, or `None` outside [`SPAN_TEXT`] (or for a non-finite time).
/// Fit error: below 1e-12 s against the integration (tested at 2000 random epochs).
///
/// Reference: IERS Conventions (2010) eq. 10.4-10.5 integrated from DE440 (Park et al. 2021);
/// L_B, TDB0 of IAU 2006 Resolution B3; L_G of IAU 2000 Resolution B1.9.
pub fn tdb_minus_tt_ephemeris_s(tt_since_j2000_s: f64) -> Option<f64> {
    let (index, x) = locate(tt_since_j2000_s / SECONDS_PER_DAY)?;
    let table: &EphemerisTable = table::table()?;
    let start = index * COEFFICIENT_COUNT;
    let coefficients = table.coefficients.get(start..start + COEFFICIENT_COUNT)?;
    Some(clenshaw(coefficients, x))
}
