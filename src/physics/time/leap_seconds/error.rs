//! Errors of the leap-second table: reading a published file, and UTC readings it cannot map.

use std::fmt;

/// Why a leap-second file was refused. Every variant carries the 1-based line number it is
/// about (for something missing: the number of lines read, i.e. the end of the file).
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum LeapFileError {
    /// A line does not have the expected shape or a number does not parse.
    Malformed {
        line: usize,
        expected: &'static str,
        found: String,
    },
    /// An entry's date is not after the previous entry's date.
    NotIncreasing {
        line: usize,
        utc_mjd: i64,
        previous_mjd: i64,
    },
    /// From 1972 on, TAI - UTC changes by exactly +1 s or -1 s (ITU-R TF.460-6).
    StepNotOneSecond {
        line: usize,
        utc_mjd: i64,
        step_s: i64,
    },
    /// The first entry must be 1972-01-01 (MJD 41317) with TAI - UTC = 10 s (IERS Bulletin C).
    WrongStart {
        line: usize,
        utc_mjd: i64,
        offset_s: i64,
    },
    /// The file has no leap-second entries.
    NoEntries { line: usize },
    /// The file gives no expiry date.
    MissingExpiry { line: usize },
    /// The file's `#h` SHA-1 hash does not match its data (IETF/tz `leap-seconds.list`).
    HashMismatch {
        line: usize,
        stated: String,
        computed: String,
    },
}

impl LeapFileError {
    /// The 1-based line number the error is about.
    pub fn line(&self) -> usize {
        match self {
            Self::Malformed { line, .. }
            | Self::NotIncreasing { line, .. }
            | Self::StepNotOneSecond { line, .. }
            | Self::WrongStart { line, .. }
            | Self::NoEntries { line }
            | Self::MissingExpiry { line }
            | Self::HashMismatch { line, .. } => *line,
        }
    }

    /// Builds a [`LeapFileError::Malformed`], keeping at most 60 characters of the text found.
    pub(crate) fn malformed(line: usize, expected: &'static str, found: &str) -> Self {
        Self::Malformed {
            line,
            expected,
            found: found.chars().take(60).collect(),
        }
    }
}

impl fmt::Display for LeapFileError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Self::Malformed {
                line,
                expected,
                found,
            } => write!(f, "line {line}: expected {expected}, found {found:?}"),
            Self::NotIncreasing {
                line,
                utc_mjd,
                previous_mjd,
            } => write!(
                f,
                "line {line}: expected a date after MJD {previous_mjd}, found MJD {utc_mjd}"
            ),
            Self::StepNotOneSecond {
                line,
                utc_mjd,
                step_s,
            } => write!(
                f,
                "line {line}: expected TAI-UTC to change by +1 s or -1 s, found {step_s:+} s at MJD {utc_mjd}"
            ),
            Self::WrongStart {
                line,
                utc_mjd,
                offset_s,
            } => write!(
                f,
                "line {line}: expected the first entry 1972-01-01 (MJD 41317) with TAI-UTC 10 s, found MJD {utc_mjd} with {offset_s} s"
            ),
            Self::NoEntries { line } => {
                write!(f, "line {line}: expected leap-second entries, found none")
            }
            Self::MissingExpiry { line } => {
                write!(f, "line {line}: expected an expiry date, found none in the file")
            }
            Self::HashMismatch {
                line,
                stated,
                computed,
            } => write!(
                f,
                "line {line}: expected the hash of the data ({computed}), found {stated}"
            ),
        }
    }
}

impl std::error::Error for LeapFileError {}

/// Why a UTC reading or a TAI count has no counterpart in the table.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum UtcRangeError {
    /// UTC begins at 1960-01-01T00:00:00 (ERFA dat.c note 1; Explanatory Supplement 1992 2.58.1).
    BeforeUtc,
    /// The second of day is negative or not less than the length of that UTC day.
    SecondOutsideDay {
        utc_mjd: i64,
        sod_attos: i128,
        day_length_attos: i128,
    },
    /// The numbers are too large for the attosecond arithmetic.
    Overflow,
}

impl fmt::Display for UtcRangeError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Self::BeforeUtc => write!(f, "UTC is defined from 1960-01-01T00:00:00 on"),
            Self::SecondOutsideDay {
                utc_mjd,
                sod_attos,
                day_length_attos,
            } => write!(
                f,
                "second of day {sod_attos} as is outside UTC day MJD {utc_mjd} (length {day_length_attos} as)"
            ),
            Self::Overflow => write!(f, "instant out of the representable range"),
        }
    }
}

impl std::error::Error for UtcRangeError {}
