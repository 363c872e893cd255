//! ISO 8601 calendar and ordinal text: `2026-03-14T06:30:00.123456789012` and
//! `2026-073T06:30:00`, with an optional `Z` (UTC) and a second 60 inside a leap second.

use super::super::calendar::CalendarDate;
use super::super::decimal::fraction_digits_to_attos;
use super::super::decimal::write::{ascii_string, push_fixed, push_u64};
use super::super::error::TimeError;
use super::super::instant::{DayReading, ATTOS_PER_SECOND};

const EXPECTED: &str =
    "an ISO 8601 instant YYYY-MM-DDThh:mm:ss[.fraction] or YYYY-DDDThh:mm:ss[.fraction]";

/// The parts of an ISO 8601 instant, before any scale-specific check.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct IsoReading {
    /// The calendar date.
    pub date: CalendarDate,
    /// Time of day in attoseconds; at or above 86 400 s when the second is 60.
    pub seconds_of_day_attos: i128,
    /// True when the text ended in `Z`.
    pub utc_designator: bool,
    /// True when the second field was 60.
    pub second_is_60: bool,
}

fn two_digits(text: &str, what: &str, found: &str) -> Result<u32, TimeError> {
    if text.len() == 2 && text.bytes().all(|b| b.is_ascii_digit()) {
        text.parse::<u32>()
            .map_err(|_| TimeError::malformed(format!("two digits for the {what}"), found))
    } else {
        Err(TimeError::malformed(
            format!("{EXPECTED} (two digits for the {what})"),
            found,
        ))
    }
}

fn parse_date(text: &str, found: &str) -> Result<CalendarDate, TimeError> {
    let bytes = text.as_bytes();
    let year_ok = bytes.len() >= 5 && bytes[..4].iter().all(u8::is_ascii_digit) && bytes[4] == b'-';
    if !year_ok {
        return Err(TimeError::malformed(
            format!("{EXPECTED} (a four-digit year first)"),
            found,
        ));
    }
    let year: i64 = text[..4]
        .parse()
        .map_err(|_| TimeError::malformed(EXPECTED, found))?;
    let rest = &text[5..];
    if rest.len() == 3 && rest.bytes().all(|b| b.is_ascii_digit()) {
        let day_of_year: u32 = rest
            .parse()
            .map_err(|_| TimeError::malformed(EXPECTED, found))?;
        return CalendarDate::from_ordinal(year, day_of_year).ok_or_else(|| {
            TimeError::ImpossibleDate(format!(
                "day of year {day_of_year:03} does not exist in {year} (it has {} days)",
                super::super::calendar::days_in_year(year)
            ))
        });
    }
    let (month_text, day_text) = rest
        .split_once('-')
        .ok_or_else(|| TimeError::malformed(EXPECTED, found))?;
    let month = two_digits(month_text, "month", found)?;
    let day = two_digits(day_text, "day", found)?;
    CalendarDate::new(year, month, day).ok_or_else(|| {
        TimeError::ImpossibleDate(format!(
            "the date {year:04}-{month:02}-{day:02} does not exist"
        ))
    })
}

fn parse_time_of_day(text: &str, found: &str) -> Result<(i128, bool), TimeError> {
    let mut fields = text.splitn(3, ':');
    let hour = two_digits(fields.next().unwrap_or(""), "hour", found)?;
    let minute = two_digits(fields.next().unwrap_or(""), "minute", found)?;
    let (second, fraction_attos) = match fields.next() {
        None => (0, 0),
        Some(seconds_text) => {
            let (whole, fraction) = match seconds_text.split_once('.') {
                Some((whole, fraction)) => (whole, Some(fraction)),
                None => (seconds_text, None),
            };
            let second = two_digits(whole, "second", found)?;
            let fraction_attos = match fraction {
                None => 0,
                Some(digits) => match fraction_digits_to_attos(digits) {
                    Some(attos) if !digits.is_empty() => attos,
                    _ => {
                        return Err(TimeError::malformed(
                            format!("{EXPECTED} (digits after the decimal point)"),
                            found,
                        ))
                    }
                },
            };
            (second, fraction_attos)
        }
    };
    if hour > 23 {
        return Err(TimeError::ImpossibleDate(format!(
            "hour {hour:02} does not exist; expected 00 to 23"
        )));
    }
    if minute > 59 {
        return Err(TimeError::ImpossibleDate(format!(
            "minute {minute:02} does not exist; expected 00 to 59"
        )));
    }
    if second > 60 {
        return Err(TimeError::ImpossibleDate(format!(
            "second {second:02} does not exist; expected 00 to 59 (60 only inside a UTC leap second)"
        )));
    }
    if second == 60 && (hour != 23 || minute != 59) {
        return Err(TimeError::InvalidLeapSecond(format!(
            "second 60 at {hour:02}:{minute:02} is not a leap second; a leap second is 23:59:60"
        )));
    }
    let seconds = i128::from(hour * 3600 + minute * 60 + second);
    Ok((seconds * ATTOS_PER_SECOND + fraction_attos, second == 60))
}

/// Reads the shape of an ISO 8601 instant and checks that the date and time exist (except
/// whether a second 60 is a real leap second, which depends on the scale and the table).
pub fn parse_iso(text: &str) -> Result<IsoReading, TimeError> {
    let (body, utc_designator) = match text.strip_suffix('Z') {
        Some(body) => (body, true),
        None => (text, false),
    };
    let (date_text, time_text) = match body.find(['T', ' ']) {
        Some(index) => (&body[..index], Some(&body[index + 1..])),
        None => (body, None),
    };
    let date = parse_date(date_text, text)?;
    let (seconds_of_day_attos, second_is_60) = match time_text {
        Some(time) => parse_time_of_day(time, text)?,
        None => (0, false),
    };
    Ok(IsoReading {
        date,
        seconds_of_day_attos,
        utc_designator,
        second_is_60,
    })
}

/// Writes a day reading as `YYYY-MM-DDThh:mm:ss.ffffffffffff` with `decimals` digits,
/// truncated (never rounded up into the next second, day or leap second).
pub fn write_iso(reading: &DayReading, decimals: u32) -> String {
    let sod = reading.seconds_of_day_attos;
    let year = CalendarDate::from_mjd(reading.mjd).year;
    let seconds = u64::try_from(sod.div_euclid(ATTOS_PER_SECOND));
    match seconds {
        Ok(seconds) if (0..=9999).contains(&year) => {
            let attos = sod.rem_euclid(ATTOS_PER_SECOND) as u64;
            let mut out = Vec::with_capacity(40);
            push_iso_parts(&mut out, reading.mjd, seconds, attos, decimals);
            ascii_string(out)
        }
        _ => write_iso_by_format(reading, decimals),
    }
}

/// Appends the ISO 8601 form of a time of day (whole seconds, 86 400 and up inside a leap
/// second, and attoseconds) on an MJD day of the years 0000 to 9999.
pub(super) fn push_iso_parts(
    out: &mut Vec<u8>,
    mjd: i64,
    day_seconds: u64,
    day_attos: u64,
    decimals: u32,
) {
    let date = CalendarDate::from_mjd(mjd);
    let (hour, minute, second) = if day_seconds >= 86_400 {
        (23, 59, 60 + (day_seconds - 86_400))
    } else {
        (
            day_seconds / 3600,
            (day_seconds / 60) % 60,
            day_seconds % 60,
        )
    };
    push_fixed(out, date.year.unsigned_abs(), 4);
    out.push(b'-');
    push_fixed(out, u64::from(date.month), 2);
    out.push(b'-');
    push_fixed(out, u64::from(date.day), 2);
    out.push(b'T');
    push_fixed(out, hour, 2);
    out.push(b':');
    push_fixed(out, minute, 2);
    out.push(b':');
    if second < 100 {
        push_fixed(out, second, 2);
    } else {
        push_u64(out, second);
    }
    if decimals > 0 {
        let digits = decimals.min(18);
        out.push(b'.');
        push_fixed(out, day_attos / 10_u64.pow(18 - digits), digits as usize);
    }
}

/// The general writer (any year, through `format!`).
fn write_iso_by_format(reading: &DayReading, decimals: u32) -> String {
    let date = CalendarDate::from_mjd(reading.mjd);
    let whole_seconds = reading.seconds_of_day_attos.div_euclid(ATTOS_PER_SECOND);
    let fraction_attos = reading.seconds_of_day_attos.rem_euclid(ATTOS_PER_SECOND);
    let (hour, minute, second) = if whole_seconds >= 86_400 {
        (23, 59, 60 + (whole_seconds - 86_400))
    } else {
        (
            whole_seconds / 3600,
            (whole_seconds / 60) % 60,
            whole_seconds % 60,
        )
    };
    let mut text = format!(
        "{:04}-{:02}-{:02}T{hour:02}:{minute:02}:{second:02}",
        date.year, date.month, date.day
    );
    if decimals > 0 {
        let digits = decimals.min(18);
        let scaled = fraction_attos / 10_i128.pow(18 - digits);
        text.push_str(&format!(".{scaled:0width$}", width = digits as usize));
    }
    text
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn reads_calendar_and_ordinal_forms() {
        let calendar = parse_iso("2026-03-14T06:30:00.123456789012");
        let ordinal = parse_iso("2026-073T06:30:00.123456789012");
        assert!(calendar.is_ok());
        assert_eq!(calendar, ordinal);
        let reading = calendar.unwrap_or_else(|e| panic!("{e}"));
        assert_eq!(reading.date.to_mjd(), 61_113);
        assert_eq!(reading.seconds_of_day_attos, 23_400_123_456_789_012_000_000);
        assert!(parse_iso("2026-03-14T06:30:00Z").map(|r| r.utc_designator) == Ok(true));
        assert!(parse_iso("2026-03-14").is_ok());
        assert!(parse_iso("2016-12-31T23:59:60.5").map(|r| r.second_is_60) == Ok(true));
    }

    #[test]
    fn refuses_impossible_and_malformed() {
        for (text, code) in [
            ("2026-02-30T00:00:00", "impossible_date"),
            ("2026-02-29", "impossible_date"),
            ("2026-366T00:00:00", "impossible_date"),
            ("2026-03-14T24:00:01", "impossible_date"),
            ("2026-03-14T23:60:00", "impossible_date"),
            ("2026-03-14T12:59:60", "invalid_leap_second"),
            ("2026-3-14T00:00:00", "malformed_instant"),
            ("26-03-14", "malformed_instant"),
            ("2026-03-14T00:00:00.", "malformed_instant"),
            ("2026-03-14T00:00:00.1x", "malformed_instant"),
            ("", "malformed_instant"),
            ("2026-03-14T", "malformed_instant"),
        ] {
            match parse_iso(text) {
                Err(error) => assert_eq!(error.code(), code, "{text}: {error}"),
                Ok(reading) => panic!("{text} was accepted as {reading:?}"),
            }
        }
    }

    #[test]
    fn writes_truncated_and_leap_second() {
        let reading = DayReading {
            mjd: 57_753,
            seconds_of_day_attos: 86_400 * ATTOS_PER_SECOND + 999_999_999_999_999_999,
            day_length_attos: 86_401 * ATTOS_PER_SECOND,
        };
        assert_eq!(write_iso(&reading, 12), "2016-12-31T23:59:60.999999999999");
    }
}
