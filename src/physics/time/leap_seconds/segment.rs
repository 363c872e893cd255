//! One TAI - UTC expression of the table, in exact integer units, and its arithmetic.
//!
//! TAI - UTC = offset + (MJD - MJD0) * rate, with MJD the UTC day number plus the UTC fraction
//! of day (USNO `tai-utc.dat`; ERFA `eraDat`). Offsets and rates are published with at most 7
//! decimals, so they are held as integers in units of 1e-7 s and 1e-7 s/day and evaluated in
//! attoseconds without floating point.

/// Attoseconds in 1e-7 s, the unit of the published constants.
pub(crate) const ATTOS_PER_TABLE_UNIT: i128 = 100_000_000_000;
/// Attoseconds in a day of 86 400 s.
pub(crate) const ATTOS_PER_DAY: i128 = 86_400 * crate::physics::constants::ATTOS_PER_SECOND;
/// `sod_attos * rate / DRIFT_DIVISOR` is the drift over `sod_attos` seconds of day in
/// attoseconds when `rate` is in 1e-7 s/day: 86 400 s/day * 1e18 as/s * 1e-18 / 1e-7.
const DRIFT_DIVISOR: i128 = 864_000_000_000;

/// A TAI - UTC expression valid from `start_mjd` (0h UTC) to the next one.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub(crate) struct Segment {
    /// First UTC day (MJD) of the expression.
    pub start_mjd: i64,
    /// Constant part of TAI - UTC, in units of 1e-7 s.
    pub offset_e7: i64,
    /// MJD0 of the drift term.
    pub reference_mjd: i64,
    /// Drift in units of 1e-7 s per day; zero from 1972 on; never negative.
    pub rate_e7_per_day: i64,
}

impl Segment {
    /// A constant step (1972 on): TAI - UTC = `offset_s` from `start_mjd`.
    pub(crate) fn step(start_mjd: i64, offset_s: i64) -> Option<Self> {
        Some(Self {
            start_mjd,
            offset_e7: offset_s.checked_mul(10_000_000)?,
            reference_mjd: start_mjd,
            rate_e7_per_day: 0,
        })
    }

    /// TAI - UTC by this expression at UTC day `mjd`, `sod_attos` into the day.
    ///
    /// Given: `mjd` UTC day number; `sod_attos` UTC seconds of day in attoseconds (>= 0).
    /// Returns: TAI - UTC in attoseconds, the drift part rounded down to a whole attosecond;
    /// `None` on overflow.
    /// Reference: USNO `tai-utc.dat` expressions as in ERFA `eraDat` (dat.c).
    pub(crate) fn tai_minus_utc_attos(&self, mjd: i64, sod_attos: i128) -> Option<i128> {
        let days = i128::from(mjd) - i128::from(self.reference_mjd);
        let whole_e7 = i128::from(self.offset_e7)
            .checked_add(days.checked_mul(i128::from(self.rate_e7_per_day))?)?;
        whole_e7
            .checked_mul(ATTOS_PER_TABLE_UNIT)?
            .checked_add(self.drift_within_day_attos(sod_attos)?)
    }

    /// Drift accumulated over `sod_attos` of the day, rounded down (floor) to an attosecond.
    fn drift_within_day_attos(&self, sod_attos: i128) -> Option<i128> {
        if self.rate_e7_per_day == 0 {
            // Every expression since 1972: no drift, and no 128-bit division to find it.
            return Some(0);
        }
        sod_attos
            .checked_mul(i128::from(self.rate_e7_per_day))?
            .checked_div_euclid(DRIFT_DIVISOR)
    }

    /// TAI elapsed since the day's 0h UTC at UTC second of day `sod_attos`:
    /// g(s) = s + drift(s), strictly increasing in s because the rate is not negative.
    pub(crate) fn tai_since_day_start_attos(&self, sod_attos: i128) -> Option<i128> {
        sod_attos.checked_add(self.drift_within_day_attos(sod_attos)?)
    }

    /// The inverse of [`Self::tai_since_day_start_attos`]: the largest second of day s with
    /// g(s) <= `tai_attos` (`tai_attos` >= 0).
    ///
    /// With r the rate and D the divisor, s0 = floor(u D / (D + r)) has g(s0) <= u and
    /// g(s0 + 2) > u, so the answer is s0 or s0 + 1.
    pub(crate) fn sod_from_tai_since_day_start(&self, tai_attos: i128) -> Option<i128> {
        if self.rate_e7_per_day == 0 {
            // g(s) = s: the inverse is the identity (s0 = u, and g(u + 1) > u).
            return Some(tai_attos);
        }
        let rate = i128::from(self.rate_e7_per_day);
        let s0 = tai_attos
            .checked_mul(DRIFT_DIVISOR)?
            .checked_div_euclid(DRIFT_DIVISOR.checked_add(rate)?)?;
        let s1 = s0.checked_add(1)?;
        if self.tai_since_day_start_attos(s1)? <= tai_attos {
            Some(s1)
        } else {
            Some(s0)
        }
    }

    /// TAI elapsed over one whole day of this expression: 86 400 s + rate * 1 day.
    pub(crate) fn tai_per_day_attos(&self) -> Option<i128> {
        i128::from(self.rate_e7_per_day)
            .checked_mul(ATTOS_PER_TABLE_UNIT)?
            .checked_add(ATTOS_PER_DAY)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn inverse_is_exact_for_a_drifting_expression() {
        // 1966-1968 expression, 0.0025920 s/day (USNO tai-utc.dat via ERFA dat.c)
        let seg = Segment {
            start_mjd: 39_126,
            offset_e7: 43_131_700,
            reference_mjd: 39_126,
            rate_e7_per_day: 25_920,
        };
        // round trip of g and its inverse (common practice: exact integer inverse)
        for s in [
            0_i128,
            1,
            333_333_333_333,
            43_200 * 10_i128.pow(18),
            ATTOS_PER_DAY - 1,
        ] {
            let u = seg.tai_since_day_start_attos(s);
            assert_eq!(u.and_then(|u| seg.sod_from_tai_since_day_start(u)), Some(s));
        }
        // a whole day of drift is exactly 0.002592 s (USNO tai-utc.dat rate)
        assert_eq!(
            seg.tai_since_day_start_attos(ATTOS_PER_DAY),
            Some(ATTOS_PER_DAY + 2_592_000_000_000_000)
        );
    }
}
