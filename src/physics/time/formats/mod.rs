//! Text forms of an instant: reading a string in a named format and scale, and writing every
//! form of an instant.
//!
//! Formats: `iso` (calendar or ordinal), `mjd`, `jd`, `j2000_s` (seconds since J2000.0 in the
//! scale), `unix_s` (UTC only) and `gnss_week` (`WEEK:SECONDS`, GNSS scales only). For UTC the
//! day-based forms follow the ERFA/SOFA quasi-JD convention: a day fraction is time of day
//! divided by that day's length (86 401 s on a leap-second day). `j2000_s` and `unix_s` of UTC
//! count 86 400 s per day (a leap second cannot be written in them; use `iso`).

mod broadcast_week;
mod gnss_week;
mod iso;
mod write;
#[cfg(test)]
mod write_tests;

use std::str::FromStr;

pub use broadcast_week::{resolve_broadcast_week, ResolvedWeek, WeekCounter};
pub use gnss_week::{gnss_week_origin_mjd, write_gnss_week, SECONDS_PER_WEEK};
pub use iso::{parse_iso, write_iso, IsoReading};
pub use write::InstantDigits;

use super::calendar::UNIX_EPOCH_MJD;
use super::decimal::write::ascii_string;
use super::decimal::{format_attos_as_seconds, ExactDecimal};
use super::error::TimeError;
use super::instant::{
    uniform_count_attos, uniform_day_reading, DayReading, Instant, ATTOS_PER_DAY, ATTOS_PER_SECOND,
};
use super::leap_seconds::LeapTable;
use super::scale::Scale;

/// Decimals written in the `iso` form.
pub const ISO_DECIMALS: u32 = 12;
/// Decimals written in the `mjd` and `jd` forms (1e-24 day is below one attosecond, so the
/// text reads back to the same attosecond).
pub const DAY_DECIMALS: u32 = 24;
/// First MJD accepted (0001-01-01).
pub const FIRST_MJD: i64 = -678_575;
/// Last MJD accepted (9999-12-31).
pub const LAST_MJD: i64 = 2_973_483;

pub use super::format_name::InstantFormat;

impl FromStr for InstantFormat {
    type Err = TimeError;
    /// Reads a format name, ignoring ASCII case.
    fn from_str(text: &str) -> Result<Self, Self::Err> {
        Self::ALL
            .into_iter()
            .find(|format| format.as_str().eq_ignore_ascii_case(text))
            .ok_or_else(|| TimeError::UnknownFormat(text.to_string()))
    }
}

/// Every written form of an instant.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct InstantText {
    /// The scale.
    pub scale: Scale,
    /// ISO 8601 with 12 decimals (truncated).
    pub iso: String,
    /// MJD, decimal, lossless.
    pub mjd: String,
    /// JD, decimal, lossless.
    pub jd: String,
    /// Seconds since J2000.0 in the scale, exact.
    pub j2000_s: String,
    /// `WEEK:SECONDS` for GNSS scales (from week 0 on).
    pub gnss_week: Option<String>,
}

fn check_mjd_range(mjd: i64) -> Result<(), TimeError> {
    if (FIRST_MJD..=LAST_MJD).contains(&mjd) {
        Ok(())
    } else {
        Err(TimeError::OutOfRange(format!(
            "the instant falls on MJD {mjd}, outside the supported years 0001 to 9999"
        )))
    }
}

/// Turns a calendar reading in `scale` into an instant, checking seconds of day against the
/// day's length (leap seconds exist only in UTC, on the days the table says).
pub fn instant_from_day_reading(
    scale: Scale,
    mjd: i64,
    seconds_of_day_attos: i128,
    table: &LeapTable,
) -> Result<Instant, TimeError> {
    check_mjd_range(mjd)?;
    if scale != Scale::Utc {
        if seconds_of_day_attos >= ATTOS_PER_DAY {
            return Err(TimeError::InvalidLeapSecond(format!(
                "second 60 exists only in UTC; {scale} has no leap seconds"
            )));
        }
        return Ok(Instant::from_count_attos(
            scale,
            uniform_count_attos(mjd, seconds_of_day_attos),
        ));
    }
    utc_instant(mjd, seconds_of_day_attos, table)
}

fn utc_instant(
    mjd: i64,
    seconds_of_day_attos: i128,
    table: &LeapTable,
) -> Result<Instant, TimeError> {
    if mjd < table.first_utc_mjd() {
        return Err(TimeError::BeforeUtc(format!(
            "UTC is defined here from 1960-01-01 (MJD {}); the instant is on MJD {mjd}",
            table.first_utc_mjd()
        )));
    }
    let day_length = table.utc_day_length_attos(mjd);
    if seconds_of_day_attos >= day_length {
        let date = super::calendar::CalendarDate::from_mjd(mjd);
        return Err(TimeError::InvalidLeapSecond(format!(
            "{:04}-{:02}-{:02} has no such second: that UTC day is {} s long (no leap second at its end in the table in use)",
            date.year,
            date.month,
            date.day,
            format_attos_as_seconds(day_length)
        )));
    }
    table
        .tai_from_utc(mjd, seconds_of_day_attos)
        .map(|tai| Instant::from_count_attos(Scale::Utc, tai))
        .map_err(|error| TimeError::BeforeUtc(error.to_string()))
}

fn day_length_of(scale: Scale, mjd: i64, table: &LeapTable) -> i128 {
    if scale == Scale::Utc && mjd >= table.first_utc_mjd() {
        table.utc_day_length_attos(mjd)
    } else {
        ATTOS_PER_DAY
    }
}

/// Reads an instant from text in `format` and `scale`.
pub fn parse_instant(
    text: &str,
    format: InstantFormat,
    scale: Scale,
    table: &LeapTable,
) -> Result<Instant, TimeError> {
    match format {
        InstantFormat::Iso => {
            let reading = parse_iso(text)?;
            if reading.utc_designator && scale != Scale::Utc {
                return Err(TimeError::malformed(
                    format!("no trailing Z: Z marks UTC, and the scale is {scale}"),
                    text,
                ));
            }
            instant_from_day_reading(
                scale,
                reading.date.to_mjd(),
                reading.seconds_of_day_attos,
                table,
            )
        }
        InstantFormat::Mjd | InstantFormat::Jd => {
            let value = ExactDecimal::parse(text)
                .map_err(|e| TimeError::malformed(format!("a decimal {format} ({e})"), text))?;
            // Shift a JD by half a day to an MJD without leaving exact arithmetic.
            let (whole, fraction_e24) = value.floor_split();
            let (whole, fraction_e24) = if format == InstantFormat::Jd {
                let half = 500_000_000_000_000_000_000_000;
                let shifted = fraction_e24 - half;
                if shifted < 0 {
                    (whole - 2_400_001, shifted + 2 * half)
                } else {
                    (whole - 2_400_000, shifted)
                }
            } else {
                (whole, fraction_e24)
            };
            let mjd = i64::try_from(whole).map_err(|_| {
                TimeError::OutOfRange(format!("{format} {text} is outside the supported range"))
            })?;
            check_mjd_range(mjd)?;
            let day_length = day_length_of(scale, mjd, table);
            let seconds_of_day = super::decimal::fraction_times(fraction_e24, day_length);
            instant_from_day_reading(scale, mjd, seconds_of_day, table)
        }
        InstantFormat::J2000S | InstantFormat::UnixS => {
            if format == InstantFormat::UnixS && scale != Scale::Utc {
                return Err(TimeError::FormatNotForScale {
                    format: "unix_s",
                    scale: scale.as_str(),
                    allowed: "UTC only",
                });
            }
            let seconds = ExactDecimal::parse(text)
                .map_err(|e| TimeError::malformed(format!("decimal seconds ({e})"), text))?
                .times_attos(ATTOS_PER_SECOND);
            let count = if format == InstantFormat::UnixS {
                uniform_count_attos(UNIX_EPOCH_MJD, 0) + seconds
            } else {
                seconds
            };
            let reading = uniform_day_reading(count);
            instant_from_day_reading(scale, reading.mjd, reading.seconds_of_day_attos, table)
        }
        InstantFormat::GnssWeek => {
            let count = gnss_week::parse_gnss_week(text, scale)?;
            let reading = uniform_day_reading(count);
            instant_from_day_reading(scale, reading.mjd, reading.seconds_of_day_attos, table)
        }
    }
}

/// The calendar reading of an instant in its own scale.
pub fn day_reading(instant: &Instant, table: &LeapTable) -> Result<DayReading, TimeError> {
    if instant.scale() != Scale::Utc {
        return Ok(uniform_day_reading(instant.count_attos()));
    }
    let (mjd, seconds_of_day_attos) = table
        .utc_from_tai(instant.count_attos())
        .map_err(|error| TimeError::BeforeUtc(error.to_string()))?;
    Ok(DayReading {
        mjd,
        seconds_of_day_attos,
        day_length_attos: table.utc_day_length_attos(mjd),
    })
}

/// The reading of an instant as seconds since J2000.0 of its scale (for UTC: 86 400 s per
/// day, so a leap second shares its count with the first second of the next day).
pub fn reading_count_attos(instant: &Instant, table: &LeapTable) -> Result<i128, TimeError> {
    if instant.scale() != Scale::Utc {
        return Ok(instant.count_attos());
    }
    let reading = day_reading(instant, table)?;
    Ok(uniform_count_attos(
        reading.mjd,
        reading.seconds_of_day_attos,
    ))
}

/// Writes every form of an instant.
pub fn write_instant(instant: &Instant, table: &LeapTable) -> Result<InstantText, TimeError> {
    let digits = InstantDigits::new(instant, table)?;
    let form = |push: &dyn Fn(&mut Vec<u8>)| {
        let mut out = Vec::with_capacity(40);
        push(&mut out);
        ascii_string(out)
    };
    let mut gnss = Vec::new();
    let gnss_week = digits.push_gnss_week(&mut gnss).then(|| ascii_string(gnss));
    Ok(InstantText {
        scale: instant.scale(),
        iso: form(&|out| digits.push_iso(out, ISO_DECIMALS)),
        mjd: form(&|out| digits.push_mjd(out)),
        jd: form(&|out| digits.push_jd(out)),
        j2000_s: form(&|out| digits.push_j2000_s(out)),
        gnss_week,
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn jd_of_an_odd_length_utc_day_reads_back() {
        // Found by tests/parsers_proptest.rs: a 1968 UTC day (drift era) whose length in
        // attoseconds is odd lost half an attosecond in the JD form. The written forms must
        // read back exactly (the README: instants in answers are lossless decimal strings).
        let table = LeapTable::builtin();
        let instant = Instant::from_count_attos(Scale::Utc, -1_007_207_993_907_167_081_988_453_208);
        let reading = day_reading(&instant, table).map(|r| r.day_length_attos % 2);
        assert_eq!(reading, Ok(1), "the case needs an odd day length");
        let written = write_instant(&instant, table);
        let jd = written.and_then(|w| parse_instant(&w.jd, InstantFormat::Jd, Scale::Utc, table));
        assert_eq!(jd, Ok(instant));
    }
}
