//! Errors of the Earth orientation parameters: reading a file, and lookups the table cannot
//! answer.

use std::fmt;

use crate::physics::time::leap_seconds::UtcRangeError;
use crate::physics::vocabulary::vocabulary;

/// What is wrong with an EOP file, as a stable code (for logs, metrics and problem+json).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum EopErrorCode {
    /// The text is in none of the known formats (IERS `finals2000A`, IERS EOP 14 or 20 C04,
    /// the built-in snapshot).
    UnknownFormat,
    /// A line ends before a required field.
    Truncated,
    /// A field is not a number, or not a finite one.
    BadNumber,
    /// A value is outside the physically possible range (e.g. |UT1 - UTC| > 1 s).
    OutOfRange,
    /// An observed/predicted flag is not `I` or `P` (IERS `readme.finals2000A`).
    BadFlag,
    /// The calendar date of a line does not match its MJD.
    DateMismatch,
    /// A day does not follow the previous one by exactly one day.
    NotDaily,
    /// The file has no data lines.
    NoData,
    /// The built-in snapshot format is broken (a header, column or count is wrong).
    BadSnapshot,
}

impl EopErrorCode {
    /// The stable code text.
    pub fn as_str(self) -> &'static str {
        match self {
            Self::UnknownFormat => "eop_unknown_format",
            Self::Truncated => "eop_truncated_line",
            Self::BadNumber => "eop_bad_number",
            Self::OutOfRange => "eop_out_of_range",
            Self::BadFlag => "eop_bad_flag",
            Self::DateMismatch => "eop_date_mismatch",
            Self::NotDaily => "eop_not_daily",
            Self::NoData => "eop_no_data",
            Self::BadSnapshot => "eop_bad_snapshot",
        }
    }
}

impl fmt::Display for EopErrorCode {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(self.as_str())
    }
}

/// Why an EOP file was refused: the 1-based line (for something missing: the number of lines
/// read), a stable code and a human detail naming the field.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct EopFileError {
    /// 1-based line number.
    pub line: usize,
    /// Stable code.
    pub code: EopErrorCode,
    /// Human text: what was expected and what was found (at most 60 characters of the input).
    pub detail: String,
}

impl EopFileError {
    /// Builds an error; `found` is cut to 60 characters.
    pub(crate) fn new(line: usize, code: EopErrorCode, expected: &str, found: &str) -> Self {
        let found: String = found.chars().take(60).collect();
        Self {
            line,
            code,
            detail: format!("expected {expected}, found {found:?}"),
        }
    }
}

impl fmt::Display for EopFileError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "line {}: {} ({})", self.line, self.detail, self.code)
    }
}

impl std::error::Error for EopFileError {}

vocabulary! {
    /// The kinds of [`EopLookupError`]; each spelling is the stable problem code, written only
    /// here.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum EopLookupErrorKind {
        /// [`EopLookupError::BeforeTable`].
        BeforeTable = "eop_before_table",
        /// [`EopLookupError::AfterTable`].
        AfterTable = "eop_after_table",
        /// [`EopLookupError::NotFinite`].
        NotFinite = "eop_not_finite",
        /// [`EopLookupError::Utc`].
        BadUtc = "eop_bad_utc",
    }
}

/// Why a lookup has no answer from the table.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum EopLookupError {
    /// The instant is before the first tabulated day (MJD, 0h UTC).
    BeforeTable { first_mjd: i64 },
    /// The instant is after the last tabulated day (MJD, 0h UTC), i.e. after the end of the
    /// predictions.
    AfterTable { last_mjd: i64 },
    /// The second of day is not finite.
    NotFinite,
    /// The UTC reading does not exist (before 1960, or a second outside the day).
    Utc(UtcRangeError),
}

impl EopLookupError {
    /// What kind of error this is.
    pub const fn kind(&self) -> EopLookupErrorKind {
        match self {
            Self::BeforeTable { .. } => EopLookupErrorKind::BeforeTable,
            Self::AfterTable { .. } => EopLookupErrorKind::AfterTable,
            Self::NotFinite => EopLookupErrorKind::NotFinite,
            Self::Utc(_) => EopLookupErrorKind::BadUtc,
        }
    }

    /// Stable code text.
    pub const fn code(&self) -> &'static str {
        self.kind().as_str()
    }
}

impl fmt::Display for EopLookupError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Self::BeforeTable { first_mjd } => write!(
                f,
                "the instant is before the Earth orientation table, which starts at MJD {first_mjd}"
            ),
            Self::AfterTable { last_mjd } => write!(
                f,
                "the instant is after the Earth orientation table, whose predictions end at MJD {last_mjd}"
            ),
            Self::NotFinite => write!(f, "the second of day is not a finite number"),
            Self::Utc(e) => write!(f, "{e}"),
        }
    }
}

impl std::error::Error for EopLookupError {}
