//! RINEX clock files, version 3.04 (IGS/RTCM "RINEX Extensions to Handle Clock Information",
//! version 3.04, 2017); 3.00-3.03 and 2.x data records read the same way.
//!
//! The header runs to `END OF HEADER` (label in columns 61-80); the first line must carry
//! `RINEX VERSION / TYPE` with file type `C` in column 21, and `TIME SYSTEM ID` (columns 4-6)
//! names the time system (GPS when absent, as the format says). Data records are read by
//! fields separated by blanks: record type, clock name, year, month, day, hour, minute,
//! second, the number of values n (1 to 6), then the values (the clock bias, s, first), four
//! per continuation line after the first two.
//!
//! Record types: `AS` (satellite) and `AR` (receiver) clocks are read; the other types of the
//! format (`CR`, `DR`, `MS`) are skipped silently with their continuation lines; any other
//! record type is skipped with a warning naming its line (a newer format revision may add
//! types; refusing the whole file for one record would lose the rest).

use super::{ClockCollector, ClockData, ClockValue};
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::decimal::ExactDecimal;
use crate::physics::time::formats::instant_from_day_reading;
use crate::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use crate::physics::time::scale::Scale;
use crate::trajectory::error::TrajectoryError;

/// The record types of the format that carry no clock this reader uses.
const OTHER_KNOWN_TYPES: [&str; 3] = ["CR", "DR", "MS"];

fn label(line: &str) -> &str {
    line.get(60..).unwrap_or("").trim()
}

/// Reads a RINEX clock file.
pub fn read_rinex_clock(
    text: &str,
    context: &ConversionContext<'_>,
) -> Result<ClockData, TrajectoryError> {
    let text = text.strip_prefix('\u{feff}').unwrap_or(text);
    let lines: Vec<&str> = text.split('\n').map(|l| l.trim_end_matches('\r')).collect();
    let first = lines.first().copied().unwrap_or("");
    if label(first) != "RINEX VERSION / TYPE" || first.get(20..21) != Some("C") {
        return Err(TrajectoryError::at_line(
            "rinex_clock_bad_header",
            1,
            "expected the first line `RINEX VERSION / TYPE` with file type C in column 21",
        ));
    }
    let version: f64 = first.get(..9).unwrap_or("").trim().parse().map_err(|_| {
        TrajectoryError::at_line(
            "rinex_clock_bad_header",
            1,
            "columns 1-9 must hold the format version (for example 3.04)",
        )
    })?;
    if !(2.0..4.0).contains(&version) {
        return Err(TrajectoryError::at_line(
            "rinex_clock_unsupported_version",
            1,
            format!("version {version} is not supported; expected 2.xx or 3.xx (3.04)"),
        ));
    }
    let mut scale = Scale::Gpst;
    let mut index = 1;
    let mut ended = false;
    while index < lines.len() {
        let line = lines[index];
        index += 1;
        match label(line) {
            "END OF HEADER" => {
                ended = true;
                break;
            }
            "TIME SYSTEM ID" => scale = time_system(line, index)?,
            _ => {}
        }
    }
    if !ended {
        return Err(TrajectoryError::at_line(
            "rinex_clock_missing_end_of_header",
            lines.len().max(1),
            "the header has no `END OF HEADER` line (label in columns 61-80)",
        ));
    }
    let mut collector = ClockCollector::default();
    while index < lines.len() {
        let number = index + 1;
        let line = lines[index];
        index += 1;
        if line.trim().is_empty() {
            continue;
        }
        let fields: Vec<&str> = line.split_ascii_whitespace().collect();
        let kind = fields[0];
        let is_clock = kind == "AS" || kind == "AR";
        if !is_clock && !OTHER_KNOWN_TYPES.contains(&kind) {
            collector.warn(format!(
                "line {number}: record type {kind:?} is not one of AS, AR, CR, DR, MS; skipped"
            ));
            continue;
        }
        let bad = |what: String| {
            TrajectoryError::at_line(
                "rinex_clock_bad_record",
                number,
                format!("{kind} record: {what} (expected `{kind} name yyyy mm dd hh mm ss.ssssss n value...`)"),
            )
        };
        if fields.len() < 10 {
            return Err(bad(format!(
                "found {} fields, expected at least 10",
                fields.len()
            )));
        }
        let count: usize = fields[8]
            .parse()
            .ok()
            .filter(|n| (1..=6).contains(n))
            .ok_or_else(|| {
                bad(format!(
                    "the number of values {:?} is not 1 to 6",
                    fields[8]
                ))
            })?;
        // Values beyond the two on the record line continue on the next lines.
        let on_line = fields.len() - 9;
        if count > on_line {
            index += (count - on_line).div_ceil(4);
        }
        if !is_clock {
            continue;
        }
        let epoch = read_epoch(&fields[2..8], scale, context).map_err(bad)?;
        let clock_s = parse_value(fields[9])
            .ok_or_else(|| bad(format!("the clock bias {:?} is not a number", fields[9])))?;
        collector.push(
            fields[1],
            kind == "AR",
            ClockValue {
                epoch,
                clock_s,
                line: number,
            },
        );
    }
    Ok(collector.finish())
}

/// Reads a value written with E or Fortran's D exponent.
fn parse_value(text: &str) -> Option<f64> {
    text.replace(['D', 'd'], "E")
        .parse::<f64>()
        .ok()
        .filter(|v| v.is_finite())
}

fn time_system(line: &str, number: usize) -> Result<Scale, TrajectoryError> {
    let name = line.get(3..6).unwrap_or("").trim();
    Ok(match name {
        "GPS" | "" => Scale::Gpst,
        "GAL" => Scale::Gst,
        "BDT" | "BDS" => Scale::Bdt,
        "QZS" => Scale::Qzsst,
        "TAI" => Scale::Tai,
        "UTC" => Scale::Utc,
        _ => {
            return Err(TrajectoryError::at_line(
                "rinex_clock_unsupported_time_system",
                number,
                format!("time system {name:?} in columns 4-6 is not supported; expected GPS, GAL, BDT, QZS, TAI or UTC"),
            ))
        }
    })
}

/// Reads year, month, day, hour, minute, second in `scale`.
pub(crate) fn read_epoch(
    fields: &[&str],
    scale: Scale,
    context: &ConversionContext<'_>,
) -> Result<Instant, String> {
    let [year, month, day, hour, minute, second] = fields else {
        return Err("the epoch needs six fields".to_string());
    };
    let integer = |text: &str, what: &str| {
        text.parse::<u32>()
            .map_err(|_| format!("the {what} {text:?} is not a number"))
    };
    let date = CalendarDate::new(
        i64::from(integer(year, "year")?),
        integer(month, "month")?,
        integer(day, "day")?,
    )
    .ok_or_else(|| "the date does not exist".to_string())?;
    let hour = integer(hour, "hour")?;
    let minute = integer(minute, "minute")?;
    let seconds = ExactDecimal::parse(second)
        .ok()
        .filter(|s| !s.negative)
        .ok_or_else(|| format!("the seconds {second:?} are not a decimal number"))?;
    if hour > 23 || minute > 59 || seconds.integer_part > 60 {
        return Err("the time of day does not exist".to_string());
    }
    let of_day = i128::from(hour * 3600 + minute * 60) * ATTOS_PER_SECOND
        + seconds.times_attos(ATTOS_PER_SECOND);
    instant_from_day_reading(scale, date.to_mjd(), of_day, context.table).map_err(|e| e.to_string())
}
