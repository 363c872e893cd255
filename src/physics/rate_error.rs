//! The error of every rate, potential and geodesy function: the offending input field, a stable
//! kind (with its snake_case code) and why.

use crate::physics::readable::{readable, readable_vector};
use std::fmt;

use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// What kind of failure a [`RateError`] is; its spelling ([`RateErrorKind::code`]) is the
    /// stable problem code, written only here.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum RateErrorKind {
        /// A value that is not a finite number (NaN, infinite, or a norm that overflows).
        NotFinite = "not_finite",
        /// An inertial speed at or above the speed of light.
        SpeedNotBelowC = "speed_not_below_c",
        /// A position (or periapsis, or height) inside the body, deeper than any real clock.
        BelowSurface = "below_surface",
        /// A position (or apoapsis, or height) beyond the range where the model applies.
        BeyondModelRange = "beyond_model_range",
        /// A semi-major axis that is zero or negative.
        InvalidSemiMajorAxis = "invalid_semi_major_axis",
        /// An eccentricity outside [0, 1).
        InvalidEccentricity = "invalid_eccentricity",
        /// A latitude outside [-90, 90] degrees.
        LatitudeOutOfRange = "latitude_out_of_range",
        /// An angle so large that its fraction of a turn is lost (|value| above 1e6 degrees).
        AngleOutOfRange = "angle_out_of_range",
        /// A gravity model the computation does not offer.
        UnsupportedGravityModel = "unsupported_gravity_model",
        /// A value that the chosen model needs and the input lacks (an orbit's inclination for
        /// J2).
        InputRequired = "input_required",
        /// A nominal frequency that is zero or negative.
        InvalidFrequency = "invalid_frequency",
        /// A fractional rate too large for the frequency answer (|y| above 1e-3).
        RateOutOfRange = "rate_out_of_range",
        /// Any other value that cannot be used.
        InvalidValue = "invalid_value",
    }
}

impl RateErrorKind {
    /// The stable snake_case code of this kind (for example `speed_not_below_c`).
    pub const fn code(self) -> &'static str {
        self.as_str()
    }
}

/// Bad input to a clock-rate computation. `field` names the input (for example
/// `"velocity_m_s"`, `"eccentricity"`, `"latitude_deg"`) so that a caller can point at it;
/// `kind` says what is wrong in a stable, machine-readable way.
#[derive(Debug, Clone, PartialEq)]
pub struct RateError {
    /// The input field at fault, in snake_case with its unit suffix.
    pub field: &'static str,
    /// What is wrong with it, for a person to act on.
    pub message: String,
    /// The kind of failure ([`RateErrorKind::InvalidValue`] unless set with [`Self::with_kind`]).
    pub kind: RateErrorKind,
}

impl RateError {
    /// A new error for `field`, of kind [`RateErrorKind::InvalidValue`].
    pub fn new(field: &'static str, message: impl Into<String>) -> Self {
        Self {
            field,
            message: message.into(),
            kind: RateErrorKind::InvalidValue,
        }
    }

    /// The same error with its kind set.
    pub fn with_kind(mut self, kind: RateErrorKind) -> Self {
        self.kind = kind;
        self
    }

    /// The stable snake_case code of the failure (see [`RateErrorKind::code`]).
    pub fn code(&self) -> &'static str {
        self.kind.code()
    }
}

impl fmt::Display for RateError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(f, "{}: {}", self.field, self.message)
    }
}

impl std::error::Error for RateError {}

/// Checks that `value` is a finite number (not NaN, not infinite).
pub fn require_finite(field: &'static str, value: f64) -> Result<f64, RateError> {
    if value.is_finite() {
        Ok(value)
    } else {
        Err(RateError::new(
            field,
            format!(
                "must be a finite number, got {value}",
                value = readable(value)
            ),
        )
        .with_kind(RateErrorKind::NotFinite))
    }
}

/// Checks that every component of a 3-vector is finite.
pub fn require_finite_vector(field: &'static str, value: [f64; 3]) -> Result<[f64; 3], RateError> {
    if value.iter().all(|component| component.is_finite()) {
        Ok(value)
    } else {
        Err(RateError::new(
            field,
            format!(
                "every component must be a finite number, got {}",
                readable_vector(&value)
            ),
        )
        .with_kind(RateErrorKind::NotFinite))
    }
}

/// Checks that a latitude in degrees is finite and within [-90, 90].
pub fn require_latitude_deg(field: &'static str, latitude_deg: f64) -> Result<f64, RateError> {
    require_finite(field, latitude_deg)?;
    if (-90.0..=90.0).contains(&latitude_deg) {
        Ok(latitude_deg)
    } else {
        Err(RateError::new(
            field,
            format!(
                "must lie in [-90, 90] degrees, got {latitude_deg}",
                latitude_deg = readable(latitude_deg)
            ),
        )
        .with_kind(RateErrorKind::LatitudeOutOfRange))
    }
}

/// Checks that a longitude in degrees is finite (any finite value is accepted and wraps).
pub fn require_longitude_deg(field: &'static str, longitude_deg: f64) -> Result<f64, RateError> {
    require_finite(field, longitude_deg)?;
    if longitude_deg.abs() <= 1.0e6 {
        Ok(longitude_deg)
    } else {
        Err(RateError::new(
            field,
            format!(
                "must be an angle in degrees (|value| <= 1e6), got {longitude_deg}",
                longitude_deg = readable(longitude_deg)
            ),
        )
        .with_kind(RateErrorKind::AngleOutOfRange))
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn codes_are_stable_and_default_is_invalid_value() {
        // The codes are part of the HTTP contract (the README and OpenAPI document: stable `code`).
        assert_eq!(RateError::new("x_m", "bad").code(), "invalid_value");
        assert_eq!(
            require_finite("x_m", f64::NAN).unwrap_err().code(),
            "not_finite"
        );
        assert_eq!(
            require_latitude_deg("latitude_deg", 90.5)
                .unwrap_err()
                .code(),
            "latitude_out_of_range"
        );
        assert_eq!(
            require_longitude_deg("longitude_deg", 2e6)
                .unwrap_err()
                .code(),
            "angle_out_of_range"
        );
        assert_eq!(
            RateError::new("velocity_m_s", "too fast")
                .with_kind(RateErrorKind::SpeedNotBelowC)
                .code(),
            "speed_not_below_c"
        );
    }
}
