//! The precession-nutation rate: dQ/dt, the time derivative of the CIRS -> GCRS matrix Q(t) of
//! IERS Conventions (2010) eq. 5.1 (Q from X, Y, s by eq. 5.10), by a centred difference.
//!
//! Step: Q is evaluated at TT +- [`POLE_RATE_HALF_STEP_S`] from X, Y, s of the fast path
//! ([`super::fast::celestial_pole_fast`], the full series outside 1900-2200) with the same
//! celestial-pole offsets dX, dY (their own rate, below 1e-17 rad/s, is left out). The
//! difference's truncation error is (w h)^2 / 6 of the rate of a term of angular frequency w:
//! h = 1800 s gives 1.5e-5 for the 13.66-day nutation term (0.09" in X, a rate of 2.3e-12
//! rad/s, so 3.5e-17 rad/s) and 6e-5 for the 6.86-day term (3.1 mas, 1e-17 rad/s); precession
//! is smoother still. The fits' own error (4e-14 rad, smooth within an 8-day interval, a step
//! of that size at its ends) adds at most 4e-14 / 3600 s = 1e-17 rad/s. In all below 1e-16
//! rad/s: 6e-10 m/s at the Earth's surface. `tests_pole_rate.rs` measures it against pyerfa.

use super::cio::celestial_to_intermediate_matrix;
use super::fast::celestial_pole_fast;
use super::matrix::{transpose, Matrix3};
use super::JulianDate;

/// Half the step of the centred difference, seconds of TT.
pub const POLE_RATE_HALF_STEP_S: f64 = 1_800.0;

/// Q = (the celestial-to-intermediate matrix)^T at `tt` shifted by `shift_s` seconds.
fn intermediate_to_celestial(tt: JulianDate, shift_s: f64, offsets_rad: [f64; 2]) -> Matrix3 {
    let shifted = JulianDate::new(tt.jd1, tt.jd2 + shift_s / 86_400.0);
    let pole = celestial_pole_fast(shifted);
    transpose(&celestial_to_intermediate_matrix(
        pole.x_rad + offsets_rad[0],
        pole.y_rad + offsets_rad[1],
        pole.s_rad,
    ))
}

/// dQ/dt per TT second at TT `tt`: `(Q(t + h) - Q(t - h)) / 2h`, h = [`POLE_RATE_HALF_STEP_S`]
/// (IERS Conventions (2010) eq. 5.1 and 5.10 differentiated numerically; the error is stated
/// in the module documentation). `offsets_rad`: the celestial-pole offsets [dX, dY], radians,
/// held constant.
pub fn intermediate_to_celestial_rate_per_s(tt: JulianDate, offsets_rad: [f64; 2]) -> Matrix3 {
    let h = POLE_RATE_HALF_STEP_S;
    let plus = intermediate_to_celestial(tt, h, offsets_rad);
    let minus = intermediate_to_celestial(tt, -h, offsets_rad);
    [0, 1, 2].map(|i| [0, 1, 2].map(|j| (plus[i][j] - minus[i][j]) / (2.0 * h)))
}

#[cfg(test)]
#[path = "tests_pole_rate.rs"]
mod tests;
