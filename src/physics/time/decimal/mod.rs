//! Exact decimal text for time values.
//!
//! Instants travel as decimal strings so that no precision is lost in binary floating point.
//! Reading keeps every digit up to 10^-24 of the unit (then rounds half away from zero); writing
//! uses integer long division (in blocks, see [`write`]). Values are scaled to attoseconds (10^-18 s).

use std::fmt;

pub mod write;
#[cfg(test)]
mod write_tests;

/// Digits kept after the decimal point when reading.
const KEPT_FRACTION_DIGITS: u32 = 24;
/// 10^24.
const TEN_POW_24: i128 = 1_000_000_000_000_000_000_000_000;
/// 10^12.
const TEN_POW_12: i128 = 1_000_000_000_000;
/// Largest integer part accepted (keeps every product inside i128).
const MAX_INTEGER_PART: i128 = 1_000_000_000_000_000;

/// A decimal number read exactly from text: sign, integer part and a 24-digit fraction.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct ExactDecimal {
    /// True for a leading minus sign.
    pub negative: bool,
    /// The digits before the point.
    pub integer_part: i128,
    /// The digits after the point, scaled by 10^24 (rounded beyond the 24th digit).
    pub fraction_e24: i128,
}

/// Why a decimal string was refused.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum DecimalError {
    /// Empty text.
    Empty,
    /// A character that is not a digit, sign or point.
    UnexpectedCharacter { position: usize, found: char },
    /// No digits at all, or a point with no digits around it.
    NoDigits,
    /// More than one decimal point.
    SecondPoint,
    /// The magnitude is beyond 10^15.
    OutOfRange,
}

impl fmt::Display for DecimalError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Self::Empty => write!(f, "expected a decimal number, found empty text"),
            Self::UnexpectedCharacter { position, found } => write!(
                f,
                "expected a plain decimal number (digits, optional sign and point), found {found:?} at character {}",
                position + 1
            ),
            Self::NoDigits => write!(f, "expected digits in the decimal number"),
            Self::SecondPoint => write!(f, "expected at most one decimal point"),
            Self::OutOfRange => write!(f, "the number is out of range (magnitude above 10^15)"),
        }
    }
}

impl std::error::Error for DecimalError {}

impl ExactDecimal {
    /// Reads `[+-]digits[.digits]` exactly. No exponent, no spaces, no thousands separators.
    pub fn parse(text: &str) -> Result<Self, DecimalError> {
        if text.is_empty() {
            return Err(DecimalError::Empty);
        }
        let (negative, body, offset) = match text.as_bytes()[0] {
            b'-' => (true, &text[1..], 1),
            b'+' => (false, &text[1..], 1),
            _ => (false, text, 0),
        };
        let mut integer_part: i128 = 0;
        let mut fraction_e24: i128 = 0;
        let mut fraction_digits: u32 = 0;
        let mut round_up = false;
        let mut seen_point = false;
        let mut digits = 0usize;
        for (index, character) in body.char_indices() {
            match character {
                '0'..='9' => {
                    let digit = i128::from(character as u8 - b'0');
                    digits += 1;
                    if !seen_point {
                        integer_part = integer_part * 10 + digit;
                        if integer_part > MAX_INTEGER_PART {
                            return Err(DecimalError::OutOfRange);
                        }
                    } else if fraction_digits < KEPT_FRACTION_DIGITS {
                        fraction_e24 = fraction_e24 * 10 + digit;
                        fraction_digits += 1;
                    } else if fraction_digits == KEPT_FRACTION_DIGITS {
                        round_up = digit >= 5;
                        fraction_digits += 1;
                    }
                }
                '.' if seen_point => return Err(DecimalError::SecondPoint),
                '.' => seen_point = true,
                other => {
                    return Err(DecimalError::UnexpectedCharacter {
                        position: index + offset,
                        found: other,
                    })
                }
            }
        }
        if digits == 0 {
            return Err(DecimalError::NoDigits);
        }
        let kept = fraction_digits.min(KEPT_FRACTION_DIGITS);
        fraction_e24 *= 10_i128.pow(KEPT_FRACTION_DIGITS - kept);
        if round_up {
            fraction_e24 += 1;
            if fraction_e24 == TEN_POW_24 {
                fraction_e24 = 0;
                integer_part += 1;
            }
        }
        // The magnitude itself is bounded (not only the digits before the point), so that a
        // value rounded to the attosecond and written out reads back within the same bound.
        if integer_part > MAX_INTEGER_PART || (integer_part == MAX_INTEGER_PART && fraction_e24 > 0)
        {
            return Err(DecimalError::OutOfRange);
        }
        Ok(Self {
            negative,
            integer_part,
            fraction_e24,
        })
    }

    /// True when the number has no fractional digits.
    pub fn is_integer(&self) -> bool {
        self.fraction_e24 == 0
    }

    /// The signed integer part (the digits before the point, with the sign).
    pub fn signed_integer_part(&self) -> i128 {
        if self.negative {
            -self.integer_part
        } else {
            self.integer_part
        }
    }

    /// The value times `unit_attos` (e.g. 10^18 for seconds, 86 400 * 10^18 for days), rounded
    /// to the nearest attosecond. `unit_attos` must be below 10^23.
    pub fn times_attos(&self, unit_attos: i128) -> i128 {
        let magnitude =
            self.integer_part * unit_attos + fraction_times(self.fraction_e24, unit_attos);
        if self.negative {
            -magnitude
        } else {
            magnitude
        }
    }

    /// The floor split into a signed whole number and a non-negative fraction scaled by 10^24.
    pub fn floor_split(&self) -> (i128, i128) {
        if self.negative && self.fraction_e24 != 0 {
            (-self.integer_part - 1, TEN_POW_24 - self.fraction_e24)
        } else {
            (self.signed_integer_part(), self.fraction_e24)
        }
    }
}

/// Reads the digits after a decimal point (`"123456"` for `.123456`) as attoseconds of one
/// second, rounding half up beyond the 18th digit. `None` when a character is not a digit.
pub fn fraction_digits_to_attos(digits: &str) -> Option<i128> {
    let mut attos: i128 = 0;
    let mut round_up = false;
    for (index, byte) in digits.bytes().enumerate() {
        if !byte.is_ascii_digit() {
            return None;
        }
        let digit = i128::from(byte - b'0');
        match index {
            0..=17 => attos = attos * 10 + digit,
            18 => round_up = digit >= 5,
            _ => {}
        }
    }
    let kept = digits.len().min(18) as u32;
    Some(attos * 10_i128.pow(18 - kept) + i128::from(round_up))
}

/// `fraction_e24 / 10^24 * length_attos`, rounded half up, exactly, for `length_attos < 10^23`.
pub fn fraction_times(fraction_e24: i128, length_attos: i128) -> i128 {
    let high = length_attos / TEN_POW_12;
    let low = length_attos % TEN_POW_12;
    let product_high = fraction_e24 * high;
    let product_low = fraction_e24 * low;
    let quotient_high = product_high / TEN_POW_12;
    let remainder_high = product_high % TEN_POW_12;
    let rest = remainder_high * TEN_POW_12 + product_low;
    quotient_high + (rest + TEN_POW_24 / 2) / TEN_POW_24
}

/// Writes `numerator / denominator` (denominator > 0) with `digits` decimals, rounded to nearest
/// (half away from zero), trailing zeros trimmed (at least one decimal kept).
pub fn format_ratio(numerator: i128, denominator: i128, digits: u32) -> String {
    let mut out = Vec::with_capacity(48);
    write::push_ratio(&mut out, numerator, denominator, digits);
    write::ascii_string(out)
}

/// Writes an attosecond count as seconds, exactly (up to 18 decimals, trailing zeros trimmed).
pub fn format_attos_as_seconds(attos: i128) -> String {
    let mut out = Vec::with_capacity(40);
    write::push_attos_as_seconds(&mut out, attos);
    write::ascii_string(out)
}

#[cfg(test)]
mod tests {
    use super::*;

    const SECOND: i128 = 1_000_000_000_000_000_000;

    #[test]
    fn reads_exactly() {
        let value =
            ExactDecimal::parse("820497669.123456789012345678").map(|d| d.times_attos(SECOND));
        assert_eq!(value, Ok(820_497_669_123_456_789_012_345_678));
        let value = ExactDecimal::parse("-0.5").map(|d| d.times_attos(SECOND));
        assert_eq!(value, Ok(-SECOND / 2));
        // A day fraction of 1/86400 written with 24 digits gives one second to the attosecond.
        let day = 86_400 * SECOND;
        let value = ExactDecimal::parse("0.000011574074074074074074").map(|d| d.times_attos(day));
        assert_eq!(value, Ok(SECOND));
    }

    #[test]
    fn fraction_digits() {
        assert_eq!(fraction_digits_to_attos("5"), Some(SECOND / 2));
        assert_eq!(
            fraction_digits_to_attos("123456789012345678"),
            Some(123_456_789_012_345_678)
        );
        assert_eq!(fraction_digits_to_attos("0000000000000000005"), Some(1));
        assert_eq!(fraction_digits_to_attos("12a"), None);
    }

    #[test]
    fn refuses_non_decimals() {
        for text in [
            "", "-", ".", "1e5", "1.2.3", " 1", "0x10", "NaN", "inf", "1,5",
        ] {
            assert!(ExactDecimal::parse(text).is_err(), "{text}");
        }
        assert_eq!(
            ExactDecimal::parse("10000000000000000"),
            Err(DecimalError::OutOfRange)
        );
        // Found by the `decimal` fuzz target: rounding the 25th decimal up carried the integer
        // part past the limit, so a number was accepted that its own written form was not.
        assert_eq!(
            ExactDecimal::parse("1000000000000000.9999999999999999999999999"),
            Err(DecimalError::OutOfRange)
        );
        assert_eq!(
            ExactDecimal::parse("1000000000000000.9999999999999999999999"),
            Err(DecimalError::OutOfRange)
        );
        assert!(ExactDecimal::parse("1000000000000000.0").is_ok());
        // Just below the bound, it rounds to the bound itself, which reads back.
        let near = ExactDecimal::parse("999999999999999.9999999999999999999999");
        let attos = near.map(|d| d.times_attos(SECOND));
        assert_eq!(attos, Ok(1_000_000_000_000_000 * SECOND));
        assert!(
            ExactDecimal::parse(&format_attos_as_seconds(1_000_000_000_000_000 * SECOND)).is_ok()
        );
    }

    #[test]
    fn writes_exactly_and_rounds() {
        assert_eq!(format_attos_as_seconds(37 * SECOND), "37.0");
        assert_eq!(format_attos_as_seconds(-SECOND / 4), "-0.25");
        assert_eq!(format_attos_as_seconds(1), "0.000000000000000001");
        assert_eq!(format_ratio(2, 3, 4), "0.6667");
        assert_eq!(format_ratio(999_999, 1_000_000, 3), "1.0");
        assert_eq!(format_ratio(-1, 3, 2), "-0.33");
    }

    #[test]
    fn day_fraction_round_trip_is_exact() {
        let day = 86_400 * SECOND;
        for attos in [0, 1, 12_345_678_901_234_567, day / 3, day - 1] {
            let text = format_ratio(attos, day, 24);
            let back = ExactDecimal::parse(&text).map(|d| d.times_attos(day));
            assert_eq!(back, Ok(attos), "{text}");
        }
    }
}
