//! Broadcast (truncated) GNSS week numbers in the conversion requests: `week_counter` names the
//! counter the week was read from, `week_near` the date it is resolved near (default: today on
//! the server's clock); the instant text is rewritten with the full week before it is read, and
//! the answer's `warnings` say which rollover was chosen.

use super::conversion::FieldName;
use crate::api::error::ApiError;
use crate::api::names::parse_named;
use crate::physics::time::calendar::{CalendarDate, UNIX_EPOCH_MJD};
use crate::physics::time::error::TimeError;
use crate::physics::time::formats::{
    gnss_week_origin_mjd, resolve_broadcast_week, InstantFormat, WeekCounter,
};
use crate::physics::time::scale::Scale;

/// The week counter and reference of a request, read once.
#[derive(Debug, Clone, Copy)]
pub struct BroadcastWeek {
    counter: WeekCounter,
    reference_mjd: i64,
    reference_given: bool,
}

/// Reads `week_counter` and `week_near` (`YYYY-MM-DD`); `None` when no counter is named.
pub fn read_broadcast_week(
    counter: Option<&str>,
    near: Option<&str>,
    format: InstantFormat,
    scale: Scale,
    counter_field: &str,
    near_field: &str,
) -> Result<Option<BroadcastWeek>, ApiError> {
    let Some(name) = counter else {
        if near.is_some() {
            return Err(ApiError::unprocessable(
                "week_counter_needs_gnss_week",
                "`week_near` resolves a broadcast week: name its `week_counter` too",
            )
            .with_field(counter_field));
        }
        return Ok(None);
    };
    let counter: WeekCounter =
        parse_named(name, "unknown_week_counter", "week counter", counter_field)?;
    if format != InstantFormat::GnssWeek {
        return Err(ApiError::unprocessable(
            "week_counter_needs_gnss_week",
            format!("a week counter applies to instants written as gnss_week, not {format}"),
        )
        .with_field(counter_field));
    }
    if !counter.fits(scale) {
        let error = resolve_broadcast_week(counter, scale, 0, 0).err();
        return Err(ApiError::from_time(
            &error.unwrap_or(TimeError::UnknownScale(scale.as_str().to_string())),
            counter_field,
        ));
    }
    let (reference_mjd, reference_given) = match near {
        Some(text) => (
            read_date(text).ok_or_else(|| {
                ApiError::from_time(
                    &TimeError::malformed("a calendar date YYYY-MM-DD (years 1980 to 9999)", text),
                    near_field,
                )
            })?,
            true,
        ),
        None => {
            let seconds = std::time::SystemTime::now()
                .duration_since(std::time::UNIX_EPOCH)
                .map(|d| d.as_secs())
                .unwrap_or(0);
            (UNIX_EPOCH_MJD + (seconds / 86_400) as i64, false)
        }
    };
    Ok(Some(BroadcastWeek {
        counter,
        reference_mjd,
        reference_given,
    }))
}

fn read_date(text: &str) -> Option<i64> {
    let bytes = text.as_bytes();
    if bytes.len() != 10 || bytes[4] != b'-' || bytes[7] != b'-' {
        return None;
    }
    let number = |range: std::ops::Range<usize>| -> Option<i64> {
        let part = text.get(range)?;
        part.bytes()
            .all(|b| b.is_ascii_digit())
            .then(|| part.parse().ok())?
    };
    let (year, month, day) = (number(0..4)?, number(5..7)?, number(8..10)?);
    if year < 1980 {
        return None;
    }
    CalendarDate::new(year, u32::try_from(month).ok()?, u32::try_from(day).ok()?)
        .map(|date| date.to_mjd())
}

impl BroadcastWeek {
    /// The instant text with the full week, and the note saying which rollover was chosen.
    pub fn resolve(
        &self,
        text: &str,
        scale: Scale,
        field: FieldName<'_>,
    ) -> Result<(String, String), ApiError> {
        let problem = |error: TimeError| ApiError::from_time(&error, field.text());
        let malformed = || {
            problem(TimeError::malformed(
                format!(
                    "BROADCAST_WEEK:SECONDS, a week number from 0 to {} and seconds of week",
                    self.counter.cycle_weeks() - 1
                ),
                text,
            ))
        };
        let (week_text, seconds) = text.split_once(':').ok_or_else(malformed)?;
        if week_text.is_empty()
            || week_text.len() > 5
            || !week_text.bytes().all(|b| b.is_ascii_digit())
        {
            return Err(malformed());
        }
        let week: i64 = week_text.parse().map_err(|_| malformed())?;
        let origin = gnss_week_origin_mjd(scale).unwrap_or(0);
        let reference_week = (self.reference_mjd - origin).div_euclid(7);
        let resolved =
            resolve_broadcast_week(self.counter, scale, week, reference_week).map_err(problem)?;
        let near = CalendarDate::from_mjd(self.reference_mjd);
        let source = if self.reference_given {
            "week_near"
        } else {
            "today on the server's clock"
        };
        let note = format!(
            "broadcast {} week {} ({} bits) read as full week {}: {} rollovers of {} weeks, the nearest to week {} ({near}, {source})",
            self.counter,
            resolved.broadcast_week,
            self.counter.bits(),
            resolved.full_week,
            resolved.rollovers,
            self.counter.cycle_weeks(),
            resolved.reference_week,
        );
        Ok((format!("{}:{seconds}", resolved.full_week), note))
    }
}
