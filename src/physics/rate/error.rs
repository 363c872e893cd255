//! The error of every rate, potential and geodesy function: the offending input field and why.

use std::fmt;

/// Bad input to a clock-rate computation. `field` names the input (for example
/// `"velocity_m_s"`, `"eccentricity"`, `"latitude_deg"`) so that a caller can point at it.
#[derive(Debug, Clone, PartialEq)]
pub struct RateError {
    /// The input field at fault, in snake_case with its unit suffix.
    pub field: &'static str,
    /// What is wrong with it, for a person to act on.
    pub message: String,
}

impl RateError {
    /// A new error for `field`.
    pub fn new(field: &'static str, message: impl Into<String>) -> Self {
        Self {
            field,
            message: message.into(),
        }
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
            format!("must be a finite number, got {value}"),
        ))
    }
}

/// Checks that every component of a 3-vector is finite.
pub fn require_finite_vector(field: &'static str, value: [f64; 3]) -> Result<[f64; 3], RateError> {
    if value.iter().all(|component| component.is_finite()) {
        Ok(value)
    } else {
        Err(RateError::new(
            field,
            format!("every component must be a finite number, got {value:?}"),
        ))
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
            format!("must lie in [-90, 90] degrees, got {latitude_deg}"),
        ))
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
            format!("must be an angle in degrees (|value| <= 1e6), got {longitude_deg}"),
        ))
    }
}
