//! Writing the forms of one instant fast, with the same text as long division digit by digit.
//!
//! [`InstantDigits`] reads an instant once (calendar day, time of day and the count since
//! J2000.0, each split into whole seconds and attoseconds) and then appends any form to a byte
//! buffer without further `i128` division: day fractions come from two 12-digit long-division
//! steps in `u64` (`decimal::write::day_fraction_e24`) whenever the day is a whole number of
//! seconds, which is every day but the UTC days of 1961-1971 (their lengths include a drift;
//! those take the general digit-at-a-time path).

use super::super::calendar::UNIX_EPOCH_MJD;
use super::super::decimal::write::{
    day_fraction_e24, push_attos_fraction, push_fraction_e24, push_ratio_by_digits, push_u64,
    ATTOS_PER_SECOND_U64,
};
use super::super::error::TimeError;
use super::super::format_name::InstantFormat;
use super::super::instant::{Instant, ATTOS_MIDNIGHT_TO_J2000, ATTOS_PER_SECOND};
use super::super::leap_seconds::LeapTable;
use super::super::scale::Scale;
use super::gnss_week::{gnss_week_origin_mjd, SECONDS_PER_WEEK};
use super::iso::push_iso_parts;
use super::{check_mjd_range, day_reading, ISO_DECIMALS};

const SECONDS_PER_DAY: i64 = 86_400;
/// MJD of 2000-01-01, the day of J2000.0.
const J2000_DAY_MJD: i64 = 51_544;
/// Seconds from 2000-01-01T00:00:00 to J2000.0.
const MIDNIGHT_TO_J2000_S: i64 = 43_200;
/// JD - MJD, whole days (the other half day is added to the fraction).
const JD_MINUS_MJD_WHOLE_DAYS: i64 = 2_400_000;

/// One instant, read once, ready to be written in any form.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct InstantDigits {
    scale: Scale,
    /// MJD day number of the calendar reading.
    mjd: i64,
    /// Time of day: whole seconds (86 400 and up inside a leap second) and attoseconds.
    day_seconds: u64,
    day_attos: u64,
    /// The day's length in attoseconds.
    day_length_attos: i128,
    /// The count since J2000.0 of the reading (UTC: 86 400 s per day), split by floor into
    /// whole seconds and attoseconds (`0 <= count_attos < 10^18`).
    count_seconds: i64,
    count_attos: u64,
}

/// Splits a non-negative attosecond count below 2^64 seconds into seconds and attoseconds.
fn split_non_negative(attos: i128) -> (u64, u64) {
    let magnitude = attos.unsigned_abs();
    let second = u128::from(ATTOS_PER_SECOND_U64);
    ((magnitude / second) as u64, (magnitude % second) as u64)
}

impl InstantDigits {
    /// Reads `instant` in its own scale; refuses instants outside the years 0001 to 9999.
    pub fn new(instant: &Instant, table: &LeapTable) -> Result<Self, TimeError> {
        let scale = instant.scale();
        let digits = if scale == Scale::Utc {
            let reading = day_reading(instant, table)?;
            let (day_seconds, day_attos) = split_non_negative(reading.seconds_of_day_attos);
            // 86 400 s per day, so a leap second shares its count with the next day's first.
            let count_seconds = (reading.mjd - J2000_DAY_MJD) * SECONDS_PER_DAY
                - MIDNIGHT_TO_J2000_S
                + day_seconds as i64;
            Self {
                scale,
                mjd: reading.mjd,
                day_seconds,
                day_attos,
                day_length_attos: reading.day_length_attos,
                count_seconds,
                count_attos: day_attos,
            }
        } else {
            let count = instant.count_attos();
            let seconds = count.div_euclid(ATTOS_PER_SECOND);
            let count_attos = count.rem_euclid(ATTOS_PER_SECOND) as u64;
            let count_seconds = i64::try_from(seconds).map_err(|_| {
                TimeError::OutOfRange("the instant is outside the supported years".to_string())
            })?;
            let since_midnight = count_seconds + MIDNIGHT_TO_J2000_S;
            Self {
                scale,
                mjd: J2000_DAY_MJD + since_midnight.div_euclid(SECONDS_PER_DAY),
                day_seconds: since_midnight.rem_euclid(SECONDS_PER_DAY) as u64,
                day_attos: count_attos,
                day_length_attos: i128::from(SECONDS_PER_DAY) * ATTOS_PER_SECOND,
                count_seconds,
                count_attos,
            }
        };
        check_mjd_range(digits.mjd)?;
        Ok(digits)
    }

    /// The scale of the instant.
    pub fn scale(&self) -> Scale {
        self.scale
    }

    /// The MJD day number of the calendar reading.
    pub fn mjd(&self) -> i64 {
        self.mjd
    }

    /// The reading as attoseconds since J2000.0 of the scale (UTC: 86 400 s per day), the
    /// value of [`super::reading_count_attos`] without reading the instant again.
    pub fn reading_count_attos(&self) -> i128 {
        i128::from(self.count_seconds) * ATTOS_PER_SECOND + i128::from(self.count_attos)
    }

    fn seconds_of_day_attos(&self) -> i128 {
        i128::from(self.day_seconds) * ATTOS_PER_SECOND + i128::from(self.day_attos)
    }

    /// The day's length in whole seconds, when it is one and the time of day is inside it.
    fn whole_day_s(&self) -> Option<u64> {
        let day_s = u64::try_from(self.day_length_attos / ATTOS_PER_SECOND).ok()?;
        let whole = self.day_length_attos % ATTOS_PER_SECOND == 0;
        (whole && self.day_seconds < day_s && day_s < 500_000).then_some(day_s)
    }

    /// ISO 8601 with `decimals` digits (at most 18), truncated: `2026-03-14T06:30:00.123...`.
    pub fn push_iso(&self, out: &mut Vec<u8>, decimals: u32) {
        push_iso_parts(out, self.mjd, self.day_seconds, self.day_attos, decimals);
    }

    /// The Modified Julian Date, 24 decimals, rounded, trailing zeros trimmed.
    pub fn push_mjd(&self, out: &mut Vec<u8>) {
        let Some(day_s) = self.whole_day_s() else {
            let numerator =
                i128::from(self.mjd) * self.day_length_attos + self.seconds_of_day_attos();
            return push_ratio_by_digits(out, numerator, self.day_length_attos, 24);
        };
        let at_midnight = self.day_seconds == 0 && self.day_attos == 0;
        // The magnitude of a negative MJD counts back from the next midnight.
        let (negative, mut whole, seconds, attos) = if self.mjd >= 0 {
            (
                false,
                self.mjd.unsigned_abs(),
                self.day_seconds,
                self.day_attos,
            )
        } else if at_midnight {
            (true, self.mjd.unsigned_abs(), 0, 0)
        } else if self.day_attos == 0 {
            (
                true,
                self.mjd.unsigned_abs() - 1,
                day_s - self.day_seconds,
                0,
            )
        } else {
            let attos = ATTOS_PER_SECOND_U64 - self.day_attos;
            (
                true,
                self.mjd.unsigned_abs() - 1,
                day_s - self.day_seconds - 1,
                attos,
            )
        };
        let (blocks, carry) = day_fraction_e24(seconds, attos, day_s);
        whole += u64::from(carry);
        if negative && (whole != 0 || blocks != [0, 0]) {
            out.push(b'-');
        }
        push_u64(out, whole);
        push_fraction_e24(out, blocks);
    }

    /// The Julian Date (MJD + 2 400 000.5), 24 decimals, rounded, trailing zeros trimmed.
    pub fn push_jd(&self, out: &mut Vec<u8>) {
        let whole = self.mjd + JD_MINUS_MJD_WHOLE_DAYS;
        let day_s = self.whole_day_s().filter(|_| whole >= 0);
        let Some(day_s) = day_s else {
            // Over a denominator of two days, so that half of an odd day length stays exact.
            let day = self.day_length_attos;
            let mjd_numerator = i128::from(self.mjd) * day + self.seconds_of_day_attos();
            let numerator = 2 * mjd_numerator + (2 * JD_MINUS_MJD_WHOLE_DAYS as i128 + 1) * day;
            return push_ratio_by_digits(out, numerator, 2 * day, 24);
        };
        // Fraction of the JD day in halves: (half a day + time of day) / day.
        let doubled_attos = 2 * self.day_attos;
        let mut seconds = day_s + 2 * self.day_seconds + doubled_attos / ATTOS_PER_SECOND_U64;
        let attos = doubled_attos % ATTOS_PER_SECOND_U64;
        let mut whole = whole.unsigned_abs();
        if seconds >= 2 * day_s {
            seconds -= 2 * day_s;
            whole += 1;
        }
        let (blocks, carry) = day_fraction_e24(seconds, attos, 2 * day_s);
        push_u64(out, whole + u64::from(carry));
        push_fraction_e24(out, blocks);
    }

    /// Seconds since J2000.0 of the scale (UTC: 86 400 s per day), exact.
    pub fn push_j2000_s(&self, out: &mut Vec<u8>) {
        let (negative, whole, attos) = if self.count_seconds >= 0 || self.count_attos == 0 {
            (
                self.count_seconds < 0,
                self.count_seconds.unsigned_abs(),
                self.count_attos,
            )
        } else {
            let attos = ATTOS_PER_SECOND_U64 - self.count_attos;
            (true, self.count_seconds.unsigned_abs() - 1, attos)
        };
        if negative && (whole != 0 || attos != 0) {
            out.push(b'-');
        }
        push_u64(out, whole);
        push_attos_fraction(out, attos);
    }

    /// Seconds since 1970-01-01T00:00:00 UTC, 86 400 s per day, exact: for UTC only (false,
    /// nothing written, otherwise). A leap second shares its count with the next second, as in
    /// POSIX time.
    pub fn push_unix_s(&self, out: &mut Vec<u8>) -> bool {
        if self.scale != Scale::Utc {
            return false;
        }
        let unix_to_j2000_s =
            (J2000_DAY_MJD - UNIX_EPOCH_MJD) * SECONDS_PER_DAY + MIDNIGHT_TO_J2000_S;
        let shifted = Self {
            count_seconds: self.count_seconds + unix_to_j2000_s,
            ..*self
        };
        shifted.push_j2000_s(out);
        true
    }

    /// Appends the form `form` (ISO with 12 decimals); false (nothing written) when the form
    /// does not exist for the instant's scale (`unix_s` outside UTC, `gnss_week` outside the
    /// GNSS scales or before their week 0).
    pub fn push_form(&self, form: InstantFormat, out: &mut Vec<u8>) -> bool {
        match form {
            InstantFormat::Iso => self.push_iso(out, ISO_DECIMALS),
            InstantFormat::Mjd => self.push_mjd(out),
            InstantFormat::Jd => self.push_jd(out),
            InstantFormat::J2000S => self.push_j2000_s(out),
            InstantFormat::UnixS => return self.push_unix_s(out),
            InstantFormat::GnssWeek => return self.push_gnss_week(out),
        }
        true
    }

    /// `WEEK:SECONDS` in a GNSS scale from week 0 on; false (nothing written) otherwise.
    pub fn push_gnss_week(&self, out: &mut Vec<u8>) -> bool {
        let Some(origin_mjd) = gnss_week_origin_mjd(self.scale) else {
            return false;
        };
        let origin_s = (origin_mjd - J2000_DAY_MJD) * SECONDS_PER_DAY
            - i64::try_from(ATTOS_MIDNIGHT_TO_J2000 / ATTOS_PER_SECOND).unwrap_or(0);
        let since_s = self.count_seconds - origin_s;
        if since_s < 0 {
            return false;
        }
        let week = since_s / SECONDS_PER_WEEK as i64;
        let seconds = since_s % SECONDS_PER_WEEK as i64;
        push_u64(out, week.unsigned_abs());
        out.push(b':');
        push_u64(out, seconds.unsigned_abs());
        push_attos_fraction(out, self.count_attos);
        true
    }
}
