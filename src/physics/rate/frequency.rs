//! From a fractional rate to frequencies: the offset seen from the ground and the factory setting.

use crate::physics::rate::error::{require_finite, RateError, RateErrorKind};
use crate::physics::readable::readable;

/// Frequency consequences of a fractional rate offset y = d(tau)/d(t) - 1.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct FrequencyOffset {
    /// The nominal frequency f0, Hz.
    pub nominal_hz: f64,
    /// f0 * y: how far a clock built to f0 (in its proper time) appears off when counted in the
    /// reference scale, Hz.
    pub offset_hz: f64,
    /// f0 / (1 + y): the proper frequency to set before launch so that the clock reads f0 in the
    /// reference scale once in place, Hz.
    pub factory_setting_hz: f64,
}

/// Largest magnitude of a fractional rate accepted here (1e-3: far above any first-order
/// relativistic offset, which is of order 1e-9; common practice).
pub const MAX_FRACTIONAL_RATE: f64 = 1.0e-3;

/// Largest nominal frequency accepted, Hz: 9e15, above every optical and nuclear-transition
/// clock (about 4e14 to 2.1e15 Hz; common practice) and below 2^53, so that every whole number
/// of hertz up to it is exact in binary64. It keeps f0 y and f0 / (1 + y) finite for every
/// accepted y (without it, f0 near the largest f64 overflowed f0 / (1 + y) to infinity).
pub const MAX_NOMINAL_FREQUENCY_HZ: f64 = 9.0e15;

/// Offset and factory setting of an oscillator for a fractional rate offset.
///
/// Inputs: `nominal_hz` (finite, in (0, 9e15]), `fractional_rate` (finite, |y| <= 1e-3; use
/// [`super::RateParts::total`]). Result: offset_hz = f0 y; factory_setting_hz = f0 / (1 + y).
///
/// Reference: IS-GPS-200 3.3.1.1 (10.23 MHz nominal, 10.22999999543 MHz set on the ground,
/// for y = +4.4647e-10).
pub fn frequency_offset(
    nominal_hz: f64,
    fractional_rate: f64,
) -> Result<FrequencyOffset, RateError> {
    require_finite("nominal_hz", nominal_hz)?;
    if nominal_hz <= 0.0 || nominal_hz > MAX_NOMINAL_FREQUENCY_HZ {
        return Err(RateError::new(
            "nominal_hz",
            format!(
                "must be positive and at most {MAX_NOMINAL_FREQUENCY_HZ:e} Hz, got {nominal_hz}",
                nominal_hz = readable(nominal_hz)
            ),
        )
        .with_kind(RateErrorKind::InvalidFrequency));
    }
    require_finite("fractional_rate", fractional_rate)?;
    if fractional_rate.abs() > MAX_FRACTIONAL_RATE {
        return Err(RateError::new(
            "fractional_rate",
            format!(
                "must be at most {MAX_FRACTIONAL_RATE} in magnitude, got {fractional_rate}",
                fractional_rate = readable(fractional_rate)
            ),
        )
        .with_kind(RateErrorKind::RateOutOfRange));
    }
    Ok(FrequencyOffset {
        nominal_hz,
        offset_hz: nominal_hz * fractional_rate,
        factory_setting_hz: nominal_hz / (1.0 + fractional_rate),
    })
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::physics::constants::GM_EARTH_GPS_M3_S2;
    use crate::physics::rate::orbit::keplerian_mean_rate_parts;
    use crate::physics::rate::RateReference;

    #[test]
    fn navigation_clock_factory_setting() {
        // IS-GPS-200 3.3.1.1: 10.23 MHz nominal is set to 10.22999999543 MHz on the ground,
        // for the navigation orbit a = 26 561.75 km (IS-GPS-200).
        let y =
            keplerian_mean_rate_parts(GM_EARTH_GPS_M3_S2, 26_561_750.0, RateReference::Tt).total();
        let frequency = frequency_offset(10.23e6, y).unwrap();
        // Within the digits given: 10.22999999543 MHz = 10 229 999.99543 Hz (+-0.5e-5 Hz).
        assert!(
            (frequency.factory_setting_hz - 10_229_999.995_43).abs() < 0.5e-5,
            "{}",
            frequency.factory_setting_hz
        );
        // IS-GPS-200 3.3.1.1: the offset is 4.5674e-3 Hz in magnitude (from memory).
        assert!(
            (frequency.offset_hz - 4.5674e-3).abs() < 0.0001e-3,
            "{}",
            frequency.offset_hz
        );
    }

    #[test]
    fn bad_frequency_inputs_name_the_field() {
        // Input validation (common practice).
        assert_eq!(
            frequency_offset(0.0, 1e-10).unwrap_err().field,
            "nominal_hz"
        );
        assert_eq!(
            frequency_offset(f64::NAN, 1e-10).unwrap_err().field,
            "nominal_hz"
        );
        assert_eq!(
            frequency_offset(1e7, f64::INFINITY).unwrap_err().field,
            "fractional_rate"
        );
        assert_eq!(
            frequency_offset(1e7, -1.0).unwrap_err().field,
            "fractional_rate"
        );
    }

    #[test]
    fn largest_frequencies_give_finite_answers() {
        // Regression (found by the contract test): f0 = the largest f64 with y < 0 overflowed
        // f0 / (1 + y) to infinity, answered as null. Overflow bound of IEEE 754 binary64
        // (common practice).
        assert_eq!(
            frequency_offset(f64::MAX, -1e-10).unwrap_err().field,
            "nominal_hz"
        );
        let frequency = frequency_offset(MAX_NOMINAL_FREQUENCY_HZ, -MAX_FRACTIONAL_RATE).unwrap();
        assert!(frequency.factory_setting_hz.is_finite() && frequency.offset_hz.is_finite());
    }
}
