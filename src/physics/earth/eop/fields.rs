//! Reading numbers out of fixed-column and whitespace-separated lines, without panicking.

use super::error::{EopErrorCode, EopFileError};
use crate::physics::time::calendar::CalendarDate;

/// Largest MJD accepted in a file (year 2406): keeps the calendar arithmetic small.
pub(crate) const MAX_MJD: i64 = 200_000;

/// The text of 1-based columns `first..=last` of `line`, trimmed; empty when the line is
/// shorter. `None` when the columns do not fall on character boundaries (non-ASCII input).
pub(crate) fn columns(line: &str, first: usize, last: usize) -> Option<&str> {
    let start = first.saturating_sub(1);
    if start >= line.len() {
        return Some("");
    }
    let end = last.min(line.len());
    line.get(start..end).map(str::trim)
}

/// A required number in columns `first..=last`, checked to be finite and within
/// `-limit..=limit`. `name` names the field in the error.
pub(crate) fn required(
    line: &str,
    number: usize,
    (first, last): (usize, usize),
    name: &str,
    limit: f64,
) -> Result<f64, EopFileError> {
    match optional(line, number, (first, last), name, limit)? {
        Some(v) => Ok(v),
        None => Err(EopFileError::new(
            number,
            EopErrorCode::Truncated,
            &format!("{name} in columns {first}-{last}"),
            columns(line, first, last).unwrap_or(line),
        )),
    }
}

/// An optional number in columns `first..=last` (blank: None), checked as [`required`].
pub(crate) fn optional(
    line: &str,
    number: usize,
    (first, last): (usize, usize),
    name: &str,
    limit: f64,
) -> Result<Option<f64>, EopFileError> {
    let Some(text) = columns(line, first, last) else {
        return Err(EopFileError::new(
            number,
            EopErrorCode::BadNumber,
            &format!("{name} in columns {first}-{last}"),
            line,
        ));
    };
    if text.is_empty() {
        return Ok(None);
    }
    number_in(text, number, name, limit).map(Some)
}

/// Parses a decimal number (digits, sign, point only: no `NaN`, `inf` or exponent), checked
/// to lie within `-limit..=limit`.
pub(crate) fn number_in(
    text: &str,
    number: usize,
    name: &str,
    limit: f64,
) -> Result<f64, EopFileError> {
    let plain = !text.is_empty()
        && text
            .bytes()
            .all(|b| b.is_ascii_digit() || b == b'.' || b == b'-' || b == b'+');
    let value = if plain {
        text.parse::<f64>().ok()
    } else {
        None
    };
    match value {
        Some(v) if v.abs() <= limit => Ok(v),
        Some(_) => Err(EopFileError::new(
            number,
            EopErrorCode::OutOfRange,
            &format!("{name} within +-{limit}"),
            text,
        )),
        None => Err(EopFileError::new(
            number,
            EopErrorCode::BadNumber,
            &format!("a decimal number for {name}"),
            text,
        )),
    }
}

/// A whole MJD from a decimal field such as `41684.00`, within `0..=MAX_MJD`.
pub(crate) fn whole_mjd(text: &str, number: usize) -> Result<i64, EopFileError> {
    let value = number_in(text, number, "MJD", MAX_MJD as f64)?;
    if value < 0.0 || value.fract() != 0.0 {
        return Err(EopFileError::new(
            number,
            EopErrorCode::OutOfRange,
            "a whole MJD between 0 and 200000 (0h UTC)",
            text,
        ));
    }
    Ok(value as i64)
}

/// Checks that the calendar date of a line is the date of its MJD.
pub(crate) fn check_date(
    (year, month, day): (i64, i64, i64),
    mjd: i64,
    number: usize,
) -> Result<(), EopFileError> {
    let date = CalendarDate::from_mjd(mjd);
    if date.year == year && i64::from(date.month) == month && i64::from(date.day) == day {
        Ok(())
    } else {
        Err(EopFileError::new(
            number,
            EopErrorCode::DateMismatch,
            &format!("the date of MJD {mjd} ({date})"),
            &format!("{year:04}-{month:02}-{day:02}"),
        ))
    }
}

/// A small integer field (year, month, day, hour), or a `BadNumber` error.
pub(crate) fn small_int(text: &str, number: usize, name: &str) -> Result<i64, EopFileError> {
    let ok = !text.is_empty() && text.len() <= 5 && text.bytes().all(|b| b.is_ascii_digit());
    match text.parse::<i64>() {
        Ok(v) if ok => Ok(v),
        _ => Err(EopFileError::new(
            number,
            EopErrorCode::BadNumber,
            &format!("a whole number for {name}"),
            text,
        )),
    }
}
