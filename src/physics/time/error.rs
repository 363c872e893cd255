//! Why an instant could not be read, converted or written.

use std::fmt;

use super::format_name::InstantFormat;
use super::scale::Scale;
use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// The kinds of [`TimeError`]; each spelling is the stable problem code, written only here.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum TimeErrorKind {
        /// [`TimeError::UnknownScale`].
        UnknownScale = "unknown_scale",
        /// [`TimeError::UnknownFormat`].
        UnknownFormat = "unknown_format",
        /// [`TimeError::Malformed`].
        Malformed = "malformed_instant",
        /// [`TimeError::ImpossibleDate`].
        ImpossibleDate = "impossible_date",
        /// [`TimeError::InvalidLeapSecond`].
        InvalidLeapSecond = "invalid_leap_second",
        /// [`TimeError::FormatNotForScale`].
        FormatNotForScale = "format_not_for_scale",
        /// [`TimeError::BeforeUtc`].
        BeforeUtc = "utc_before_1960",
        /// [`TimeError::OutOfRange`].
        OutOfRange = "instant_out_of_range",
        /// [`TimeError::Ut1Unavailable`].
        Ut1Unavailable = "ut1_outside_eop_table",
        /// [`TimeError::OutsideTdbModelSpan`].
        OutsideTdbModelSpan = "outside_tdb_model_span",
        /// [`TimeError::OutsideLunarTimeSpan`].
        OutsideLunarTimeSpan = "outside_lunar_time_span",
    }
}

/// An error of the time engine. Each variant has a stable machine-readable [`TimeError::code`]
/// and a message a person can act on.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum TimeError {
    /// A scale name that is not one of the supported scales.
    UnknownScale(String),
    /// A format name that is not one of the supported formats.
    UnknownFormat(String),
    /// The text does not have the shape of the format.
    Malformed {
        /// What the format expects.
        expected: String,
        /// What was found instead.
        found: String,
    },
    /// The text has the right shape but names a date or time that does not exist.
    ImpossibleDate(String),
    /// A second 60 where no leap second exists (or in a scale without leap seconds).
    InvalidLeapSecond(String),
    /// The format does not apply to the scale (e.g. `unix_s` outside UTC).
    FormatNotForScale {
        /// The format name.
        format: &'static str,
        /// The scale name.
        scale: &'static str,
        /// Which scales take the format.
        allowed: &'static str,
    },
    /// A UTC instant before 1960-01-01, where UTC is not defined by the table.
    BeforeUtc(String),
    /// A value outside the range the engine supports.
    OutOfRange(String),
    /// UT1 is needed at an epoch the Earth orientation table does not cover (or no table is
    /// given to the conversion).
    Ut1Unavailable(String),
    /// TDB - TT is needed at an epoch outside the span of the chosen TDB model (the
    /// ephemeris model covers 1959-12-30 to 2101-01-02 TT).
    OutsideTdbModelSpan(String),
    /// TCL or TL is needed at an epoch outside the fitted TCB - TCL representation
    /// (1959-12-30 to 2101-01-02 TDB).
    OutsideLunarTimeSpan(String),
}

impl TimeError {
    /// What kind of error this is.
    pub const fn kind(&self) -> TimeErrorKind {
        match self {
            Self::UnknownScale(_) => TimeErrorKind::UnknownScale,
            Self::UnknownFormat(_) => TimeErrorKind::UnknownFormat,
            Self::Malformed { .. } => TimeErrorKind::Malformed,
            Self::ImpossibleDate(_) => TimeErrorKind::ImpossibleDate,
            Self::InvalidLeapSecond(_) => TimeErrorKind::InvalidLeapSecond,
            Self::FormatNotForScale { .. } => TimeErrorKind::FormatNotForScale,
            Self::BeforeUtc(_) => TimeErrorKind::BeforeUtc,
            Self::OutOfRange(_) => TimeErrorKind::OutOfRange,
            Self::Ut1Unavailable(_) => TimeErrorKind::Ut1Unavailable,
            Self::OutsideTdbModelSpan(_) => TimeErrorKind::OutsideTdbModelSpan,
            Self::OutsideLunarTimeSpan(_) => TimeErrorKind::OutsideLunarTimeSpan,
        }
    }

    /// Stable code for clients (the spelling of [`TimeError::kind`]).
    pub const fn code(&self) -> &'static str {
        self.kind().as_str()
    }

    /// Shorthand for [`TimeError::Malformed`].
    pub fn malformed(expected: impl Into<String>, found: impl Into<String>) -> Self {
        Self::Malformed {
            expected: expected.into(),
            found: found.into(),
        }
    }
}

impl fmt::Display for TimeError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Self::UnknownScale(name) => write!(
                f,
                "unknown time scale {name:?}; expected one of {}",
                Scale::NAMES.join(", ")
            ),
            Self::UnknownFormat(name) => write!(
                f,
                "unknown instant format {name:?}; expected one of {}",
                InstantFormat::NAMES.join(", ")
            ),
            Self::Malformed { expected, found } => {
                write!(f, "expected {expected}, found {found:?}")
            }
            Self::ImpossibleDate(message)
            | Self::InvalidLeapSecond(message)
            | Self::BeforeUtc(message)
            | Self::OutOfRange(message)
            | Self::Ut1Unavailable(message)
            | Self::OutsideTdbModelSpan(message)
            | Self::OutsideLunarTimeSpan(message) => f.write_str(message),
            Self::FormatNotForScale {
                format,
                scale,
                allowed,
            } => write!(
                f,
                "format {format} does not apply to scale {scale}; it is for {allowed}"
            ),
        }
    }
}

impl std::error::Error for TimeError {}
