//! Why the ephemeris has no state for a request.

use std::fmt;

use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// The kinds of [`EphemerisError`]; each spelling is the stable problem code, written only
    /// here.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum EphemerisErrorKind {
        /// [`EphemerisError::OutsideSpan`].
        OutsideSpan = "outside_ephemeris_span",
        /// [`EphemerisError::NotFinite`].
        NotFinite = "ephemeris_epoch_not_finite",
        /// A body or centre the ephemeris does not know (a name outside [`super::Body`]).
        UnknownBody = "unknown_body",
    }
}

/// Why a state cannot be given.
#[derive(Debug, Clone, PartialEq)]
pub enum EphemerisError {
    /// The epoch lies outside the ephemeris's span; the texts name the epoch and the span (TDB).
    OutsideSpan {
        /// The ephemeris's name.
        ephemeris: String,
        /// The epoch asked for, as text (TDB).
        epoch: String,
        /// The first epoch covered, as text (TDB).
        first: String,
        /// The last epoch covered, as text (TDB).
        last: String,
    },
    /// The epoch is not a finite number.
    NotFinite,
}

impl EphemerisError {
    /// What kind of error this is.
    pub const fn kind(&self) -> EphemerisErrorKind {
        match self {
            Self::OutsideSpan { .. } => EphemerisErrorKind::OutsideSpan,
            Self::NotFinite => EphemerisErrorKind::NotFinite,
        }
    }

    /// Stable code text.
    pub const fn code(&self) -> &'static str {
        self.kind().as_str()
    }
}

impl fmt::Display for EphemerisError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Self::OutsideSpan {
                ephemeris,
                epoch,
                first,
                last,
            } => write!(
                f,
                "the epoch {epoch} TDB is outside the span of the ephemeris {ephemeris}, {first} .. {last} TDB"
            ),
            Self::NotFinite => write!(f, "the epoch is not a finite number"),
        }
    }
}

impl std::error::Error for EphemerisError {}
