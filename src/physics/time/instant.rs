//! An instant: a scale and an attosecond count.
//!
//! The count is an `i128` of attoseconds (10^-18 s), which holds +-5e12 years exactly, so every
//! offset of the engine is added without rounding and conversion chains round-trip far below a
//! picosecond.

use super::scale::Scale;

/// Attoseconds in one second.
pub const ATTOS_PER_SECOND: i128 = 1_000_000_000_000_000_000;
/// Attoseconds in one day of 86 400 s.
pub const ATTOS_PER_DAY: i128 = 86_400 * ATTOS_PER_SECOND;
/// Attoseconds from 2000-01-01T00:00:00 to J2000.0 (12:00:00).
pub const ATTOS_MIDNIGHT_TO_J2000: i128 = 43_200 * ATTOS_PER_SECOND;

/// One event labelled in one scale.
///
/// For every scale but UTC, `count_attos` is the reading of the scale expressed as time elapsed
/// since J2000.0 of that same scale (2000-01-01T12:00:00 in that scale's calendar, days of
/// 86 400 s). UTC is not uniform (leap seconds), so a UTC instant keeps the count of the same
/// event in TAI and its calendar reading is derived through the leap-second table.
#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord, Hash)]
pub struct Instant {
    scale: Scale,
    count_attos: i128,
}

impl Instant {
    /// An instant of a uniform scale (not UTC) from its count since J2000.0 of that scale.
    /// For UTC, pass the TAI count of the event.
    pub fn from_count_attos(scale: Scale, count_attos: i128) -> Self {
        Self { scale, count_attos }
    }

    /// The scale the instant is labelled in.
    pub fn scale(&self) -> Scale {
        self.scale
    }

    /// The count in attoseconds (see the type's documentation for UTC).
    pub fn count_attos(&self) -> i128 {
        self.count_attos
    }

    /// The count in seconds as `f64` (for series arguments; loses precision below ~1e-7 s).
    pub fn count_s(&self) -> f64 {
        attos_to_seconds_f64(self.count_attos)
    }
}

/// Converts attoseconds to seconds in `f64`, keeping the fraction as well as f64 allows.
pub fn attos_to_seconds_f64(attos: i128) -> f64 {
    let whole = attos.div_euclid(ATTOS_PER_SECOND);
    let fraction = attos.rem_euclid(ATTOS_PER_SECOND);
    whole as f64 + fraction as f64 / ATTOS_PER_SECOND as f64
}

/// Converts a (small) offset in seconds to attoseconds, rounding to the nearest attosecond.
/// The whole and fractional parts are scaled separately so that an offset of tens of seconds
/// keeps its sub-femtosecond digits.
pub fn seconds_f64_to_attos(seconds: f64) -> i128 {
    let whole = seconds.trunc();
    let fraction = seconds - whole;
    (whole as i128) * ATTOS_PER_SECOND + (fraction * ATTOS_PER_SECOND as f64).round() as i128
}

/// A calendar reading: Modified Julian Date day number and time of day.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct DayReading {
    /// MJD day number.
    pub mjd: i64,
    /// Time since the start of the day in attoseconds (at or above 86 400 s only inside a
    /// positive leap second).
    pub seconds_of_day_attos: i128,
    /// Length of this day in attoseconds (86 400 s except on UTC days with a leap second or a
    /// drift-era step).
    pub day_length_attos: i128,
}

/// Splits a uniform count since J2000.0 into an MJD day and time of day (days of 86 400 s).
pub fn uniform_day_reading(count_attos: i128) -> DayReading {
    let since_midnight = count_attos + ATTOS_MIDNIGHT_TO_J2000;
    DayReading {
        mjd: 51_544 + since_midnight.div_euclid(ATTOS_PER_DAY) as i64,
        seconds_of_day_attos: since_midnight.rem_euclid(ATTOS_PER_DAY),
        day_length_attos: ATTOS_PER_DAY,
    }
}

/// The uniform count since J2000.0 of an MJD day and time of day (days of 86 400 s).
pub fn uniform_count_attos(mjd: i64, seconds_of_day_attos: i128) -> i128 {
    i128::from(mjd - 51_544) * ATTOS_PER_DAY - ATTOS_MIDNIGHT_TO_J2000 + seconds_of_day_attos
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn day_reading_round_trip() {
        for count in [
            0,
            -1,
            1,
            -ATTOS_MIDNIGHT_TO_J2000,
            ATTOS_PER_DAY * 9_000 + 17,
            -ATTOS_PER_DAY * 20_000 - 3,
        ] {
            let reading = uniform_day_reading(count);
            assert!(
                reading.seconds_of_day_attos >= 0 && reading.seconds_of_day_attos < ATTOS_PER_DAY
            );
            assert_eq!(
                uniform_count_attos(reading.mjd, reading.seconds_of_day_attos),
                count
            );
        }
        // J2000.0 is MJD 51544.5 (IAU 1976 definition of J2000.0).
        let reading = uniform_day_reading(0);
        assert_eq!(reading.mjd, 51_544);
        assert_eq!(reading.seconds_of_day_attos, 43_200 * ATTOS_PER_SECOND);
    }

    #[test]
    fn offsets_keep_their_digits() {
        // 32.25 and -0.5 are exact binary fractions, so the attosecond count must be exact.
        assert_eq!(seconds_f64_to_attos(32.25), 32_250_000_000_000_000_000);
        assert_eq!(seconds_f64_to_attos(-0.5), -ATTOS_PER_SECOND / 2);
        // 32.184 is not exact in binary: its f64 differs from the decimal by ~1e-15 s.
        assert!((seconds_f64_to_attos(32.184) - 32_184_000_000_000_000_000).abs() < 10_000);
        let back = attos_to_seconds_f64(seconds_f64_to_attos(0.505_833_278_5));
        assert!((back - 0.505_833_278_5).abs() < 1e-16);
    }
}
