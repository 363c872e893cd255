//! The error of every signal-path function: a stable code, the input at fault and why.

use std::fmt;

use crate::physics::rate::error::RateError;
use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// The stable codes of [`SignalError`], written only here.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum SignalErrorKind {
        /// An end point inside the Earth.
        InsideEarth = "inside_earth",
        /// An end point beyond the model's range.
        BeyondRange = "beyond_range",
        /// Transmitter and receiver at one place.
        CoincidentEndpoints = "coincident_endpoints",
        /// The straight path passes through the Earth.
        PathThroughEarth = "path_through_earth",
        /// The light-time iteration did not converge.
        NoConvergence = "no_convergence",
        /// A speed at or above c.
        SpeedNotBelowC = "speed_not_below_c",
        /// A value that is not finite.
        NotFinite = "not_finite",
        /// The satellite is below a station's horizon.
        NotVisible = "not_visible",
        /// Any other value that cannot be used.
        InvalidValue = "invalid_value",
    }
}

/// Bad input to a signal-path computation.
#[derive(Debug, Clone, PartialEq)]
pub struct SignalError {
    /// Stable machine-readable code (for example `inside_earth`, `speed_not_below_c`).
    pub code: &'static str,
    /// The input at fault as a dotted path with its unit suffix, for example
    /// `transmitter.position_m` or `station_b.latitude_deg`.
    pub field: String,
    /// What is wrong with it, for a person to act on.
    pub message: String,
}

impl SignalError {
    /// A new error with `code` about `field`.
    pub fn new(
        kind: SignalErrorKind,
        field: impl Into<String>,
        message: impl Into<String>,
    ) -> Self {
        Self {
            code: kind.as_str(),
            field: field.into(),
            message: message.into(),
        }
    }

    /// Wraps an error of the shared geodesy / rate checks, prefixing its field with `owner`
    /// (for example `station_a` + `latitude_deg` gives `station_a.latitude_deg`).
    pub fn from_rate(owner: &str, error: RateError) -> Self {
        Self::new(
            SignalErrorKind::InvalidValue,
            format!("{owner}.{}", error.field),
            error.message,
        )
    }
}

impl fmt::Display for SignalError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "{}: {}", self.field, self.message)
    }
}

impl std::error::Error for SignalError {}
