//! The one error type of the ephemeris readers and of interpolation.

use std::fmt;

/// Why an ephemeris was refused: a stable `code`, a message a person can act on, and where.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct TrajectoryError {
    /// Stable machine-readable code, e.g. `oem_missing_keyword`, `sp3_bad_column`,
    /// `epochs_not_increasing`, `too_few_states`, `gap_too_long`, `below_surface`,
    /// `speed_not_below_c`, `not_finite`.
    pub code: &'static str,
    /// What is wrong and what was expected.
    pub message: String,
    /// 1-based line of the input text, when the error belongs to a line.
    pub line: Option<usize>,
    /// The object the error belongs to.
    pub object: Option<String>,
    /// 0-based index of the state within the object's track.
    pub index: Option<usize>,
    /// The member of a JSON document at fault (`frame`, `time_scale`, `epoch_format`).
    pub field: Option<&'static str>,
}

impl TrajectoryError {
    /// An error with a code and message and no location.
    pub fn new(code: &'static str, message: impl Into<String>) -> Self {
        Self {
            code,
            message: message.into(),
            line: None,
            object: None,
            index: None,
            field: None,
        }
    }

    /// The same error, attributed to a member of a JSON document.
    pub fn with_field(mut self, field: &'static str) -> Self {
        self.field = Some(field);
        self
    }

    /// An error at a line of the input.
    pub fn at_line(code: &'static str, line: usize, message: impl Into<String>) -> Self {
        Self {
            line: Some(line),
            ..Self::new(code, message)
        }
    }

    /// An error about a state of an object.
    pub fn at_state(
        code: &'static str,
        object: &str,
        index: usize,
        message: impl Into<String>,
    ) -> Self {
        Self {
            object: Some(object.to_string()),
            index: Some(index),
            ..Self::new(code, message)
        }
    }

    /// The same error, attributed to an object.
    pub fn for_object(mut self, object: &str) -> Self {
        self.object = Some(object.to_string());
        self
    }
}

impl fmt::Display for TrajectoryError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        if let Some(line) = self.line {
            write!(f, "line {line}: ")?;
        }
        if let Some(object) = &self.object {
            write!(f, "object {object:?}")?;
            if let Some(index) = self.index {
                write!(f, ", state {index}")?;
            }
            f.write_str(": ")?;
        }
        write!(f, "{} ({})", self.message, self.code)
    }
}

impl std::error::Error for TrajectoryError {}

/// The problem code of an epoch that cannot go to TT: the time engine's own code where it names
/// a span the caller can act on (`outside_tdb_model_span`: TDB or TCB epochs with
/// `tdb_model=ephemeris` outside its span), `bad_epoch` otherwise.
pub fn epoch_error_code(error: &crate::physics::time::error::TimeError) -> &'static str {
    use crate::physics::time::error::TimeErrorKind;
    if error.code() == TimeErrorKind::OutsideTdbModelSpan.as_str() {
        error.code()
    } else {
        "bad_epoch"
    }
}
