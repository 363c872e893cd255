//! The lunar time scales: TCL, the coordinate time of the Lunar Celestial Reference System
//! (IAU 2024 Resolution II), and TL, a lunar surface time proposed by Turyshev, Williams,
//! Boggs & Park (arXiv:2406.16147, v5): TCL scaled by the constant [`L_L`].
//!
//! TCB - TCL at the Moon's centre is the time-dilation integral of IAU 2000 Resolution B1.5
//! (IERS Conventions (2010) eq. 10.4 with the 1/c^4 terms of eq. 10.5) with the Moon in place
//! of the Earth, integrated offline from JPL DE440 by `tools/make_ephemeris_time.py` (the same
//! integral function as the ephemeris TDB - TT) and fitted with Chebyshev pieces as a function
//! of TDB (`data/tcl_ephemeris_de440.txt`, described in `data/tcl_ephemeris_README.md`).
//! Origin: TCL = TCB at TCB = T0 = 1977-01-01T00:00:32.184 (the origin TCG and TCB share,
//! IAU 1991 Resolution A4 and IAU 2000 Resolution B1.3), at the Moon's centre.
//!
//! Span: 1959-12-30T00:00 to 2101-01-02T00:00 TDB ([`SPAN_TEXT`]).

#[cfg(test)]
mod tests;

use super::tdb_ephemeris::table::{tcl_table, COEFFICIENT_COUNT};
use super::tdb_ephemeris::{clenshaw, locate};
use crate::physics::constants::{
    MOON_MEAN_RADIUS_M, MOON_ROTATION_RAD_S, SECONDS_PER_DAY, SPEED_OF_LIGHT_SQUARED_M2_S2,
};

/// GM of the Moon, m^3/s^2: DE440's 4 902.800118 km^3/s^2 (Park et al. 2021), the value the
/// integral used (also in `solar_system::gm`, which this module may not import: layer rule).
const GM_MOON_DE440_M3_S2: f64 = 4.902_800_118e12;

/// The span of the TCB - TCL representation, as people read it.
pub const SPAN_TEXT: &str = "1959-12-30T00:00:00 TDB to 2101-01-02T00:00:00 TDB";

/// L_L = 1 - d(TL)/d(TCL): the mean rate of a clock on the lunar reference surface against
/// TCL, the definition of TL in Turyshev et al. (arXiv:2406.16147 v5). Computed here as
/// `GM_M / (c^2 R_M) + (omega_M R_M)^2 / (2 c^2)` (the Moon's own potential and rotation on
/// its mean sphere; the tidal potentials of the Earth and the Sun average to zero over the
/// sphere), with GM_M of DE440 (Park et al. 2021), R_M = 1737.4 km (IAU WGCCRE, Archinal et
/// al. 2018) and the sidereal rotation rate: 3.1398e-11. Turyshev et al.'s own numerical value
/// was not available to this project (see DEVELOPERS.md); their TL - TT drift of
/// 56.0256 us/day is checked in the tests.
pub const L_L: f64 = GM_MOON_DE440_M3_S2 / (SPEED_OF_LIGHT_SQUARED_M2_S2 * MOON_MEAN_RADIUS_M)
    + (MOON_ROTATION_RAD_S * MOON_ROTATION_RAD_S * MOON_MEAN_RADIUS_M * MOON_MEAN_RADIUS_M)
        / (2.0 * SPEED_OF_LIGHT_SQUARED_M2_S2);

/// The warning every answer that uses TL carries.
pub const TL_WARNING: &str = "TL (lunar surface time) is a proposal, not a standard: TCL scaled by L_L = 3.1398e-11 so that it ticks at the mean rate of clocks on the lunar reference surface (Turyshev, Williams, Boggs & Park, arXiv:2406.16147 v5; L_L computed here from GM of the Moon (DE440) and R = 1737.4 km)";

/// TCB - TCL at the Moon's centre (seconds) at TDB seconds since J2000.0, from the fitted
/// DE440 integral; `None` outside [`SPAN_TEXT`] (or for a non-finite time).
///
/// Reference: IAU 2000 Resolution B1.5 / IERS Conventions (2010) eq. 10.4-10.5 with the Moon
/// in place of the Earth (the form of TCL in IAU 2024 Resolution II, from memory), DE440.
pub fn tcb_minus_tcl_s(tdb_since_j2000_s: f64) -> Option<f64> {
    let (index, x) = locate(tdb_since_j2000_s / SECONDS_PER_DAY)?;
    let start = index * COEFFICIENT_COUNT;
    let coefficients = tcl_table()?
        .coefficients
        .get(start..start + COEFFICIENT_COUNT)?;
    Some(clenshaw(coefficients, x))
}

/// TL - TCL at a TCL count: `-L_L (TCL - T0)` (Turyshev et al. 2024, the analogue of
/// IERS Conventions (2010) eq. 10.1 for TT; origin T0 = 1977-01-01T00:00:32.184 chosen here,
/// TL = TCL there). `tcl_since_t0_s`: TCL seconds since T0.
pub fn tl_minus_tcl_s(tcl_since_t0_s: f64) -> f64 {
    -L_L * tcl_since_t0_s
}

/// TCL - TL at a TL count: `L_L / (1 - L_L) (TL - T0)` (the relation above solved for TCL).
pub fn tcl_minus_tl_s(tl_since_t0_s: f64) -> f64 {
    L_L / (1.0 - L_L) * tl_since_t0_s
}
