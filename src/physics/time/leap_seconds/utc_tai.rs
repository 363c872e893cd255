//! UTC readings and TAI counts through the table.
//!
//! A TAI count is attoseconds since J2000.0 = 2000-01-01T12:00:00 TAI:
//! `(mjd - 51544) * 86400 s - 43200 s + sod` for a TAI reading (IERS Conventions 2010, ch. 10).
//! A UTC reading (mjd, sod) is the event with TAI = UTC reading + (TAI - UTC)(mjd, sod).

use super::segment::{Segment, ATTOS_PER_DAY};
use super::{LeapTable, UtcRangeError};

/// MJD of 2000-01-01 (J2000.0 is 12h of that day).
const J2000_DAY_MJD: i64 = 51_544;
/// Half a day in attoseconds.
const HALF_DAY_ATTOS: i128 = ATTOS_PER_DAY / 2;

impl LeapTable {
    /// The expression in force on UTC day `mjd`, or `None` before the table.
    fn segment_of(&self, mjd: i64) -> Option<&Segment> {
        let n = self.segments.partition_point(|s| s.start_mjd <= mjd);
        self.segments.get(n.checked_sub(1)?)
    }

    /// TAI count of 0h UTC of day `mjd`.
    fn day_start_tai(&self, mjd: i64) -> Result<i128, UtcRangeError> {
        let seg = self.segment_of(mjd).ok_or(UtcRangeError::BeforeUtc)?;
        day_start_tai_with(seg, mjd).ok_or(UtcRangeError::Overflow)
    }

    /// Length of UTC day `mjd` in UTC seconds (attoseconds), or an error before 1960.
    fn day_length(&self, mjd: i64) -> Result<i128, UtcRangeError> {
        let seg = self.segment_of(mjd).ok_or(UtcRangeError::BeforeUtc)?;
        let next = mjd.checked_add(1).ok_or(UtcRangeError::Overflow)?;
        let tai_span = self
            .day_start_tai(next)?
            .checked_sub(self.day_start_tai(mjd)?)
            .ok_or(UtcRangeError::Overflow)?;
        // the first second of day s whose TAI reaches the next day's 0h UTC
        seg.sod_from_tai_since_day_start(tai_span.saturating_sub(1))
            .and_then(|s| s.checked_add(1))
            .ok_or(UtcRangeError::Overflow)
    }

    /// TAI - UTC in attoseconds at UTC day `utc_mjd`, `sod_attos` into the day.
    ///
    /// Returns `None` before 1960-01-01, for a negative `sod_attos`, or on overflow. The day's
    /// expression is evaluated at MJD = `utc_mjd` + `sod_attos` / 86400 s exactly (ERFA
    /// `eraDat` with fraction of day `fd`), the drift part rounded down to an attosecond.
    /// Inside a leap second (sod >= 86 400 s) the value is still the ending day's.
    pub fn tai_minus_utc_attos(&self, utc_mjd: i64, sod_attos: i128) -> Option<i128> {
        if sod_attos < 0 {
            return None;
        }
        self.segment_of(utc_mjd)?
            .tai_minus_utc_attos(utc_mjd, sod_attos)
    }

    /// Length of UTC day `utc_mjd` in attoseconds of UTC reading.
    ///
    /// 86 400 s; 86 401 s on a day ending with a positive leap second (86 399 s for a
    /// negative one). In the drift era the day before a jump of TAI - UTC is longer or
    /// shorter: ERFA `eraUtctai` takes dleap = TAI-UTC(next day, 0h) - TAI-UTC(this day's
    /// expression at 24h) and a day of 86 400 s + dleap. Here the day ends exactly where its
    /// TAI reaches the next day's 0h UTC, i.e. 86 400 s + dleap / (1 + rate / 86 400 s), so
    /// that every TAI count has one UTC reading; this differs from ERFA's length by
    /// dleap * rate / 86 400 s, at most 3.3e-9 s (1971-12-31) and zero from 1972 on.
    /// Days before 1960 (no UTC) and out-of-range days give the nominal 86 400 s.
    pub fn utc_day_length_attos(&self, utc_mjd: i64) -> i128 {
        self.day_length(utc_mjd).unwrap_or(ATTOS_PER_DAY)
    }

    /// TAI count (attoseconds since J2000.0 TAI) of the UTC reading (`utc_mjd`, `sod_attos`).
    ///
    /// Errors: [`UtcRangeError::BeforeUtc`] before 1960-01-01;
    /// [`UtcRangeError::SecondOutsideDay`] unless 0 <= `sod_attos` < the day's length
    /// ([`Self::utc_day_length_attos`]); [`UtcRangeError::Overflow`] for absurd day numbers.
    pub fn tai_from_utc(&self, utc_mjd: i64, sod_attos: i128) -> Result<i128, UtcRangeError> {
        let seg = self.segment_of(utc_mjd).ok_or(UtcRangeError::BeforeUtc)?;
        let day_length_attos = self.day_length(utc_mjd)?;
        if sod_attos < 0 || sod_attos >= day_length_attos {
            return Err(UtcRangeError::SecondOutsideDay {
                utc_mjd,
                sod_attos,
                day_length_attos,
            });
        }
        let elapsed = seg
            .tai_since_day_start_attos(sod_attos)
            .ok_or(UtcRangeError::Overflow)?;
        self.day_start_tai(utc_mjd)?
            .checked_add(elapsed)
            .ok_or(UtcRangeError::Overflow)
    }

    /// The UTC reading (mjd, sod in attoseconds) of a TAI count (attoseconds since J2000.0
    /// TAI); sod is >= 86 400 s inside a leap second.
    ///
    /// The reading is the latest one whose TAI count is not after the given count, so
    /// `utc_from_tai(tai_from_utc(m, s)) == (m, s)` exactly. Errors:
    /// [`UtcRangeError::BeforeUtc`] before 1960-01-01T00:00:00 UTC; [`UtcRangeError::Overflow`].
    pub fn utc_from_tai(&self, tai_attos_since_j2000: i128) -> Result<(i64, i128), UtcRangeError> {
        let t = tai_attos_since_j2000;
        let n = self
            .segments
            .partition_point(|s| day_start_tai_with(s, s.start_mjd).is_some_and(|t0| t0 <= t));
        let index = n.checked_sub(1).ok_or(UtcRangeError::BeforeUtc)?;
        let seg = self.segments.get(index).ok_or(UtcRangeError::BeforeUtc)?;
        let overflow = || UtcRangeError::Overflow;
        let seg_start_tai = day_start_tai_with(seg, seg.start_mjd).ok_or_else(overflow)?;
        let per_day = seg.tai_per_day_attos().ok_or_else(overflow)?;
        // whole days since the expression began; the last day before a jump may run past a
        // nominal day (positive jump or leap second), so clamp to the expression's last day
        let days = floor_div(t.checked_sub(seg_start_tai).ok_or_else(overflow)?, per_day);
        let mut mjd = i64::try_from(days)
            .ok()
            .and_then(|d| seg.start_mjd.checked_add(d))
            .ok_or_else(overflow)?;
        if let Some(next) = self.segments.get(index + 1) {
            mjd = mjd.min(next.start_mjd - 1);
        }
        let day_tai = day_start_tai_with(seg, mjd).ok_or_else(overflow)?;
        let sod = seg
            .sod_from_tai_since_day_start(t.checked_sub(day_tai).ok_or_else(overflow)?)
            .ok_or_else(overflow)?;
        Ok((mjd, sod))
    }
}

/// TAI count of 0h UTC of day `mjd` under expression `seg`.
fn day_start_tai_with(seg: &Segment, mjd: i64) -> Option<i128> {
    let days = i128::from(mjd) - i128::from(J2000_DAY_MJD);
    days.checked_mul(ATTOS_PER_DAY)?
        .checked_sub(HALF_DAY_ATTOS)?
        .checked_add(seg.tai_minus_utc_attos(mjd, 0)?)
}

/// `numerator.div_euclid(denominator)` for a positive `denominator`, by a floating-point
/// estimate corrected with exact multiplications (a 128-bit division is the slowest step of a
/// UTC reading otherwise). The estimate is off by at most one day for any count the engine
/// holds (|count| < 2^100 as: the f64 quotient's relative error is 2^-52); the loops fix it.
fn floor_div(numerator: i128, denominator: i128) -> i128 {
    let mut quotient = (numerator as f64 / denominator as f64).floor() as i128;
    // Correct until quotient * denominator <= numerator < (quotient + 1) * denominator.
    while quotient.saturating_mul(denominator) > numerator {
        quotient -= 1;
    }
    while (quotient + 1).saturating_mul(denominator) <= numerator {
        quotient += 1;
    }
    quotient
}

#[cfg(test)]
mod floor_div_tests {
    use super::*;

    #[test]
    fn floor_div_is_div_euclid() {
        // Against the integer division of the standard library (common practice), at the edges
        // of days and far from J2000.0.
        let day = ATTOS_PER_DAY;
        let mut values = vec![0_i128, 1, -1, day, day - 1, -day, -day - 1, day + 1];
        for k in [1_i128, 7, 365, 36_525, 2_914_695, 10_000_000] {
            for delta in [-1_i128, 0, 1] {
                values.push(k * day + delta);
                values.push(-k * day + delta);
            }
        }
        let mut x: u64 = 88_172_645_463_325_252;
        for _ in 0..100_000 {
            x ^= x << 13;
            x ^= x >> 7;
            x ^= x << 17;
            values.push(i128::from(x as i64) * 1_000_003 + i128::from(x % 977));
        }
        for per_day in [
            day,
            day + 1_000_000_000_000_000_000,
            day + 13 * 100_000_000_000,
        ] {
            for &v in &values {
                assert_eq!(
                    floor_div(v, per_day),
                    v.div_euclid(per_day),
                    "{v} / {per_day}"
                );
            }
        }
    }
}
