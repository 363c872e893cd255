//! GNSS week numbering: `WEEK:SECONDS_OF_WEEK`, full (not rolled-over) week numbers.
//!
//! Week 0 starts at 1980-01-06T00:00:00 GPST (IS-GPS-200 6.2.4; also QZSS, IS-QZSS),
//! 1999-08-22T00:00:00 GST (Galileo OS SIS ICD 5.1.2) and 2006-01-01T00:00:00 BDT (BeiDou OS
//! ICD 3.3).

use super::super::decimal::{format_attos_as_seconds, ExactDecimal};
use super::super::error::TimeError;
use super::super::instant::{uniform_count_attos, ATTOS_PER_SECOND};
use super::super::scale::Scale;

/// Seconds in a GNSS week.
pub const SECONDS_PER_WEEK: i128 = 604_800;
const ATTOS_PER_WEEK: i128 = SECONDS_PER_WEEK * ATTOS_PER_SECOND;

/// MJD of the start of week 0 of a GNSS scale, or `None` for other scales.
pub fn gnss_week_origin_mjd(scale: Scale) -> Option<i64> {
    match scale {
        Scale::Gpst | Scale::Qzsst => Some(44_244), // 1980-01-06
        Scale::Gst => Some(51_412),                 // 1999-08-22
        Scale::Bdt => Some(53_736),                 // 2006-01-01
        _ => None,
    }
}

fn origin_count(scale: Scale) -> Result<i128, TimeError> {
    gnss_week_origin_mjd(scale)
        .map(|mjd| uniform_count_attos(mjd, 0))
        .ok_or(TimeError::FormatNotForScale {
            format: "gnss_week",
            scale: scale.as_str(),
            allowed: "GPST, GST, BDT and QZSST",
        })
}

/// Reads `WEEK:SECONDS` into the scale's count since J2000.0.
pub fn parse_gnss_week(text: &str, scale: Scale) -> Result<i128, TimeError> {
    let origin = origin_count(scale)?;
    let expected =
        "WEEK:SECONDS, a whole week number from 0 and seconds of week from 0 up to 604800";
    let (week_text, seconds_text) = text
        .split_once(':')
        .ok_or_else(|| TimeError::malformed(expected, text))?;
    if week_text.is_empty() || !week_text.bytes().all(|b| b.is_ascii_digit()) || week_text.len() > 7
    {
        return Err(TimeError::malformed(expected, text));
    }
    let week: i128 = week_text
        .parse()
        .map_err(|_| TimeError::malformed(expected, text))?;
    let seconds =
        ExactDecimal::parse(seconds_text).map_err(|_| TimeError::malformed(expected, text))?;
    let seconds_attos = seconds.times_attos(ATTOS_PER_SECOND);
    if seconds.negative || seconds_attos >= ATTOS_PER_WEEK {
        return Err(TimeError::OutOfRange(format!(
            "seconds of week {seconds_text} must be at least 0 and below 604800"
        )));
    }
    Ok(origin + week * ATTOS_PER_WEEK + seconds_attos)
}

/// Writes the week form of a count in a GNSS scale; `None` for other scales and before week 0.
pub fn write_gnss_week(scale: Scale, count_attos: i128) -> Option<String> {
    let origin = origin_count(scale).ok()?;
    let since = count_attos - origin;
    if since < 0 {
        return None;
    }
    let week = since / ATTOS_PER_WEEK;
    let seconds = since % ATTOS_PER_WEEK;
    Some(format!("{week}:{}", format_attos_as_seconds(seconds)))
}

#[cfg(test)]
mod tests {
    use super::super::super::calendar::CalendarDate;
    use super::*;

    #[test]
    fn origins_are_the_published_dates() {
        // IS-GPS-200 6.2.4; Galileo OS SIS ICD 5.1.2; BeiDou OS ICD 3.3.
        let mjd = |y, m, d| CalendarDate::new(y, m, d).map(|c| c.to_mjd());
        assert_eq!(gnss_week_origin_mjd(Scale::Gpst), mjd(1980, 1, 6));
        assert_eq!(gnss_week_origin_mjd(Scale::Gst), mjd(1999, 8, 22));
        assert_eq!(gnss_week_origin_mjd(Scale::Bdt), mjd(2006, 1, 1));
        // Galileo week = GPS week - 1024 (Galileo OS SIS ICD 5.1.2): 1024 weeks apart.
        assert_eq!((51_412 - 44_244) / 7, 1024);
        assert_eq!((51_412 - 44_244) % 7, 0);
    }

    #[test]
    fn week_round_trip_and_refusals() {
        let count = parse_gnss_week("2409:345600.25", Scale::Gpst);
        assert!(count.is_ok());
        let text = count.ok().and_then(|c| write_gnss_week(Scale::Gpst, c));
        assert_eq!(text.as_deref(), Some("2409:345600.25"));
        assert!(parse_gnss_week("2409:604800", Scale::Gpst).is_err());
        assert!(parse_gnss_week("2409:-1", Scale::Gpst).is_err());
        assert!(parse_gnss_week("-1:0", Scale::Gpst).is_err());
        assert!(parse_gnss_week("2409", Scale::Gpst).is_err());
        assert_eq!(
            parse_gnss_week("2409:0", Scale::Tt).map_err(|e| e.code()),
            Err("format_not_for_scale")
        );
    }
}
