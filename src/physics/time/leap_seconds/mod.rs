//! The UTC leap-second table: TAI - UTC from 1960-01-01 on.
//!
//! From 1960-01-01 to 1971-12-31 TAI - UTC followed the drift expressions
//! `offset + (MJD - MJD0) * rate` published by the BIH and distributed by the USNO
//! (`tai-utc.dat`); from 1972-01-01 it changes only by whole leap seconds announced in IERS
//! Bulletin C. A UTC reading is a day number `utc_mjd` and a second of day `sod_attos`
//! (attoseconds); a day is 86 401 s long when it ends with a positive leap second, and in the
//! drift era a day before a jump is longer or shorter by a fraction of a second.
//!
//! The table built into the binary is [`LeapTable::builtin`]; a newer table can be read from the
//! IERS `Leap_Second.dat` or the IETF/tz `leap-seconds.list` text ([`LeapTable::parse_any`]).
//! Such a file gives only the 1972+ part: the drift era always comes from the built-in table.

mod builtin;
mod civil;
mod error;
mod parse;
mod segment;
mod sha1;
mod utc_tai;

#[cfg(test)]
mod tests_errors;
#[cfg(test)]
mod tests_files;
#[cfg(test)]
mod tests_reference;

pub use error::{LeapFileError, UtcRangeError};

use segment::Segment;

/// MJD of 1972-01-01, the first day of integer TAI - UTC (IERS Bulletin C; ITU-R TF.460-6).
pub const FIRST_LEAP_STEP_MJD: i64 = 41_317;

/// One entry of the table: the TAI - UTC expression that holds from 0h UTC of `utc_mjd` to the
/// next entry: TAI - UTC = `offset_s + (MJD - drift_reference_mjd) * drift_s_per_day`, MJD
/// counting the UTC fraction of the day. From 1972 on the drift is zero.
///
/// These are the published decimal numbers as `f64` for display; the table computes with the
/// exact values.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LeapStep {
    /// First UTC day of the expression (MJD, at 0h UTC).
    pub utc_mjd: i64,
    /// TAI - UTC at `utc_mjd` (drift era: the constant part of the expression), seconds.
    pub offset_s: f64,
    /// MJD0 of the drift term (equal to `utc_mjd` from 1972 on).
    pub drift_reference_mjd: f64,
    /// Drift of TAI - UTC, seconds per day (0 from 1972 on).
    pub drift_s_per_day: f64,
}

/// A UTC leap-second table: the TAI - UTC expressions, the expiry date of the data and where
/// it came from.
#[derive(Debug, Clone, PartialEq)]
pub struct LeapTable {
    segments: Vec<Segment>,
    steps: Vec<LeapStep>,
    expiry_mjd: i64,
    source: String,
    last_updated: String,
}

impl LeapTable {
    /// Builds a table from expressions sorted by date (callers validate them).
    fn from_segments(
        segments: Vec<Segment>,
        expiry_mjd: i64,
        source: String,
        last_updated: String,
    ) -> Self {
        let steps = segments
            .iter()
            .map(|s| LeapStep {
                utc_mjd: s.start_mjd,
                offset_s: s.offset_e7 as f64 / 1e7,
                drift_reference_mjd: s.reference_mjd as f64,
                drift_s_per_day: s.rate_e7_per_day as f64 / 1e7,
            })
            .collect();
        Self {
            segments,
            steps,
            expiry_mjd,
            source,
            last_updated,
        }
    }

    /// The table built into the binary (see the `builtin` module for its sources).
    pub fn builtin() -> &'static LeapTable {
        builtin::table()
    }

    /// Reads the IERS `Leap_Second.dat` text and merges it with the built-in drift era.
    pub fn parse_iers_leap_second_dat(text: &str) -> Result<LeapTable, LeapFileError> {
        parse::parse_iers(text)
    }

    /// Reads the IETF/tz `leap-seconds.list` text (NTP seconds; `#@` expiry, `#$` last
    /// update, optional `#h` SHA-1 hash, checked when present) and merges it with the built-in
    /// drift era.
    pub fn parse_ietf_leap_seconds_list(text: &str) -> Result<LeapTable, LeapFileError> {
        parse::parse_ietf(text)
    }

    /// Reads either format, recognized from the shape of its first data line (five fields:
    /// IERS; two: IETF) or, without data lines, from `#@`/`#$` lines (IETF).
    pub fn parse_any(text: &str) -> Result<LeapTable, LeapFileError> {
        if parse::looks_like_ietf(text) {
            parse::parse_ietf(text)
        } else {
            parse::parse_iers(text)
        }
    }

    /// Replaces the human description of where the table came from (e.g. with a file path).
    pub fn with_source(mut self, source: impl Into<String>) -> Self {
        self.source = source.into();
        self
    }

    /// The TAI - UTC expressions, in date order, from 1960-01-01.
    pub fn steps(&self) -> &[LeapStep] {
        &self.steps
    }

    /// The data's expiry date (MJD, 0h UTC): from that day on, a future leap second may be
    /// missing from the table.
    pub fn expiry_mjd(&self) -> i64 {
        self.expiry_mjd
    }

    /// Days from the instant `unix_s` (seconds since 1970-01-01 0h UTC, leap seconds not
    /// counted, as POSIX time) to the start of the expiry day; negative once expired. MJD of
    /// 1970-01-01 is 40587 (Explanatory Supplement to the Astronomical Almanac, common practice).
    pub fn days_to_expiry(&self, unix_s: f64) -> f64 {
        let now_mjd = crate::physics::time::calendar::UNIX_EPOCH_MJD as f64 + unix_s / 86_400.0;
        self.expiry_mjd as f64 - now_mjd
    }

    /// True when UTC day `utc_mjd` is on or after the expiry date, where answers need a
    /// warning that the table may be out of date.
    pub fn is_beyond_expiry(&self, utc_mjd: i64) -> bool {
        utc_mjd >= self.expiry_mjd
    }

    /// Human text: where the table came from.
    pub fn source(&self) -> &str {
        &self.source
    }

    /// Human text: the last update the data states (bulletin or date).
    pub fn last_updated(&self) -> &str {
        &self.last_updated
    }

    /// First UTC day of the table: 36934 (1960-01-01).
    pub fn first_utc_mjd(&self) -> i64 {
        self.segments.first().map_or(i64::MAX, |s| s.start_mjd)
    }
}
