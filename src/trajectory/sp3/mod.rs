//! IGS SP3-c and SP3-d orbit files (Hilla 2010, 2016).
//!
//! Positions (`P` lines, km, columns 5-18, 19-32, 33-46) are Earth-fixed (the IGS/ITRF frame
//! named in the header), so every track has [`Frame::EarthFixed`]; SP3 has no centre field, so
//! a Moon-centred file is read only when the request names the Moon as centre
//! ([`read_sp3_about`]) and the header's coordinate system (columns 47-51 of the first line)
//! names ICRF axes (`ICRF` or `J2000`): its tracks have [`Frame::LunarInertial`]. Velocities (`V` lines) are
//! in decimetres per second and are converted to m/s. A position written as 0.000000 in all
//! three components (the SP3-c convention for bad or absent positions) or with a component of
//! magnitude 999999.999999 or more is skipped for that satellite at that epoch, together with
//! its `V` line. When some kept samples of a satellite lack a velocity, the velocities of that
//! satellite are dropped (interpolation then differentiates the positions). Satellites with no
//! valid sample are left out. `EP`/`EV` correlation lines are skipped.
//!
//! The clock column (columns 47-60 of a `P` line, microseconds) is read by
//! [`read_sp3_with_clocks`]: a value of 999999.999999 or more in magnitude, or an empty column,
//! marks a bad or absent clock (SP3-c/d) and is left out (and counted); a clock is kept even
//! when the position on its line is absent; a column that cannot be read is left out with a
//! warning naming the line.
//!
//! Time systems: GPS, GAL, BDT, QZS, TAI, UTC as their scales; GLO (GLONASS time,
//! UTC(SU) + 3 h) is read as UTC three hours earlier. A GLO epoch with second 60 is refused,
//! because the three-hour shift would move the leap second off 23:59:60.

pub mod header;

use std::collections::HashMap;

use super::clock_values::{ClockCollector, ClockData, ClockValue};
use super::error::TrajectoryError;
use super::text::parse_number;
use super::{Frame, ObjectTrack, TrajectorySet, TrajectoryState};
use crate::physics::lunar_orbit::TrajectoryCenter;
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::decimal::ExactDecimal;
use crate::physics::time::formats::instant_from_day_reading;
use crate::physics::time::instant::{Instant, ATTOS_PER_DAY, ATTOS_PER_SECOND};
use header::{normalize_id, Sp3Header, Sp3TimeSystem};

/// Absolute value from which a coordinate is read as bad or absent (999999.999999 km).
const BAD_COORDINATE_KM: f64 = 999_999.0;

/// SP3 coordinate-system labels (columns 47-51 of the first line) that give ICRF axes, the
/// only axes of a Moon-centred file.
pub const SP3_LUNAR_AXES_LABELS: &[&str] = &["ICRF", "J2000"];

/// Reads an SP3-c or SP3-d file (geocentric, Earth-fixed).
pub fn read_sp3(
    text: &str,
    context: &ConversionContext<'_>,
) -> Result<TrajectorySet, TrajectoryError> {
    read_sp3_about(text, context, TrajectoryCenter::Earth)
}

/// Reads an SP3-c or SP3-d file whose positions are about `center`, which the file itself
/// cannot say: the Earth (Earth-fixed, as IGS writes them) or the Moon (ICRF axes, with the
/// coordinate system `ICRF` or `J2000` in the header; 422 `frame_center_mismatch` at line 1
/// otherwise).
pub fn read_sp3_about(
    text: &str,
    context: &ConversionContext<'_>,
    center: TrajectoryCenter,
) -> Result<TrajectorySet, TrajectoryError> {
    read_sp3_clocks_about(text, context, center).map(|(set, _)| set)
}

/// Reads an SP3-c or SP3-d file (geocentric) with its satellite clock values.
pub fn read_sp3_with_clocks(
    text: &str,
    context: &ConversionContext<'_>,
) -> Result<(TrajectorySet, ClockData), TrajectoryError> {
    read_sp3_clocks_about(text, context, TrajectoryCenter::Earth)
}

/// The frame of the tracks: Earth-fixed about the Earth; ICRF axes about the Moon when the
/// coordinate system label says so.
fn sp3_frame(
    header: &Sp3Header,
    center: TrajectoryCenter,
    number: usize,
) -> Result<Frame, TrajectoryError> {
    let label = header.coordinate_system.as_str();
    match center {
        TrajectoryCenter::Earth if SP3_LUNAR_AXES_LABELS.contains(&label) => Err(TrajectoryError::at_line(
            "frame_center_mismatch",
            number,
            format!("the coordinate system {label:?} (columns 47-51) gives inertial axes, but an SP3 file about the Earth is read as Earth-fixed (IGS, ITRF); name the Moon as centre (center=moon) for a selenocentric file, or give a terrestrial label such as IGS20"),
        )),
        TrajectoryCenter::Earth => Ok(Frame::EarthFixed),
        TrajectoryCenter::Moon if SP3_LUNAR_AXES_LABELS.contains(&label) => Ok(Frame::LunarInertial),
        TrajectoryCenter::Moon => Err(TrajectoryError::at_line(
            "frame_center_mismatch",
            number,
            format!("the coordinate system {label:?} (columns 47-51) is not a frame for Moon-centred states; a selenocentric SP3 file takes ICRF axes, written {}", SP3_LUNAR_AXES_LABELS.join(" or ")),
        )),
    }
}

fn read_sp3_clocks_about(
    text: &str,
    context: &ConversionContext<'_>,
    center: TrajectoryCenter,
) -> Result<(TrajectorySet, ClockData), TrajectoryError> {
    let mut clocks = ClockCollector::default();
    let text = text.strip_prefix('\u{feff}').unwrap_or(text);
    let mut lines = text
        .split('\n')
        .enumerate()
        .map(|(i, l)| (i + 1, l.trim_end()));
    let (first_number, first) = lines.next().unwrap_or((1, ""));
    let mut header = Sp3Header::from_first_line(first, first_number)?;
    let frame = sp3_frame(&header, center, first_number)?;
    let mut tracks: Vec<ObjectTrack> = Vec::new();
    let mut by_id: HashMap<String, usize> = HashMap::new();
    let mut epoch: Option<Instant> = None;
    let mut in_header = true;
    let mut last_line = first_number;
    let mut ended = false;
    for (number, line) in lines.by_ref() {
        if line.is_empty() {
            continue;
        }
        last_line = number;
        let bytes = line.as_bytes();
        if in_header && bytes[0] != b'*' {
            if line.starts_with("++") || line.starts_with("##") || line.starts_with("%f") {
                continue;
            }
            if line.starts_with('+') {
                header.take_satellite_line(line, number)?;
            } else if line.starts_with("%c") {
                header.take_time_system_line(line, number)?;
            } else if line.starts_with('%') || line.starts_with("/*") {
                continue;
            } else {
                return Err(unexpected(line, number, "a header line (##, +, ++, %c, %f, %i, /*) or the first epoch line `*  YYYY MM DD hh mm ss.ssssssss`"));
            }
            continue;
        }
        if in_header {
            in_header = false;
            for id in &header.satellites {
                by_id.insert(id.clone(), tracks.len());
                tracks.push(new_track(id, &header, frame));
            }
        }
        match bytes[0] {
            b'*' => epoch = Some(read_epoch(line, number, &header, context)?),
            b'P' => {
                let at = epoch.ok_or_else(|| no_epoch(number))?;
                read_clock(line, number, at, &mut clocks);
                read_position(line, number, at, (&header, frame), &mut tracks, &mut by_id)?;
            }
            b'V' => {
                let at = epoch.ok_or_else(|| no_epoch(number))?;
                read_velocity(line, number, at, &mut tracks, &by_id)?;
            }
            b'E' if line.starts_with("EOF") => {
                ended = true;
                break;
            }
            b'E' if line.starts_with("EP") || line.starts_with("EV") => {}
            b'/' if line.starts_with("/*") => {}
            _ => {
                return Err(unexpected(
                    line,
                    number,
                    "an epoch line (*), a position line (P), a velocity line (V), EP/EV or EOF",
                ))
            }
        }
    }
    if epoch.is_none() {
        return Err(TrajectoryError::at_line(
            "sp3_no_epochs",
            last_line,
            "the file has no epoch line `*  YYYY MM DD hh mm ss.ssssssss`",
        ));
    }
    if !ended {
        return Err(TrajectoryError::at_line(
            "sp3_missing_eof",
            last_line,
            "the file ends without the EOF line; it may be truncated",
        ));
    }
    for track in &mut tracks {
        if !track.has_velocities() {
            track.states.iter_mut().for_each(|s| s.velocity_m_s = None);
        }
    }
    tracks.retain(|t| !t.states.is_empty());
    Ok((TrajectorySet { objects: tracks }, clocks.finish()))
}

fn new_track(id: &str, header: &Sp3Header, frame: Frame) -> ObjectTrack {
    ObjectTrack {
        id: id.to_string(),
        frame,
        scale: header.scale(),
        states: Vec::new(),
    }
}

fn unexpected(line: &str, number: usize, expected: &str) -> TrajectoryError {
    let shown: String = line.chars().take(40).collect();
    TrajectoryError::at_line(
        "sp3_unexpected_line",
        number,
        format!("expected {expected}, found {shown:?}"),
    )
}

fn no_epoch(number: usize) -> TrajectoryError {
    TrajectoryError::at_line(
        "sp3_unexpected_line",
        number,
        "a P or V line before the first epoch line",
    )
}

/// Reads `*  YYYY MM DD hh mm ss.ssssssss` in the header's time system.
fn read_epoch(
    line: &str,
    number: usize,
    header: &Sp3Header,
    context: &ConversionContext<'_>,
) -> Result<Instant, TrajectoryError> {
    let bad = |what: &str| {
        TrajectoryError::at_line(
            "sp3_bad_epoch",
            number,
            format!("expected an epoch line `*  YYYY MM DD hh mm ss.ssssssss`: {what}"),
        )
    };
    let fields: Vec<&str> = line
        .get(1..)
        .unwrap_or("")
        .split_ascii_whitespace()
        .collect();
    let [year, month, day, hour, minute, second] = fields[..] else {
        return Err(bad(&format!("found {} fields instead of 6", fields.len())));
    };
    let integer = |text: &str, what: &str| text.parse::<u32>().map_err(|_| bad(what));
    let year = integer(year, "the year is not a number")?;
    let date = CalendarDate::new(
        i64::from(year),
        integer(month, "the month is not a number")?,
        integer(day, "the day is not a number")?,
    )
    .ok_or_else(|| bad("the date does not exist"))?;
    let hour = integer(hour, "the hour is not a number")?;
    let minute = integer(minute, "the minute is not a number")?;
    let seconds = ExactDecimal::parse(second)
        .ok()
        .filter(|s| !s.negative)
        .ok_or_else(|| bad("the seconds are not a decimal number"))?;
    if hour > 23 || minute > 59 || seconds.integer_part > 60 {
        return Err(bad("the time of day does not exist"));
    }
    let mut mjd = date.to_mjd();
    let mut of_day = i128::from(hour * 3600 + minute * 60) * ATTOS_PER_SECOND
        + seconds.times_attos(ATTOS_PER_SECOND);
    if header.time_system == Sp3TimeSystem::Glonass {
        if seconds.integer_part >= 60 {
            return Err(bad("second 60 cannot be read in GLONASS time (GLO)"));
        }
        of_day -= 3 * 3600 * ATTOS_PER_SECOND;
        if of_day < 0 {
            mjd -= 1;
            of_day += ATTOS_PER_DAY;
        }
    }
    instant_from_day_reading(header.scale(), mjd, of_day, context.table)
        .map_err(|e| bad(&e.to_string()))
}

/// Reads three fixed-width coordinates (columns 5-18, 19-32, 33-46).
fn read_triple(line: &str, number: usize, unit: &str) -> Result<[f64; 3], TrajectoryError> {
    let mut values = [0.0; 3];
    for (axis, value) in values.iter_mut().enumerate() {
        let (first, last) = (5 + 14 * axis, 18 + 14 * axis);
        let field = line.get(first - 1..last).map(str::trim).unwrap_or("");
        let what = format!(
            "{} in columns {first}-{last} ({unit})",
            ["X", "Y", "Z"][axis]
        );
        if field.is_empty() {
            return Err(TrajectoryError::at_line(
                "sp3_bad_column",
                number,
                format!("expected {what}, found nothing"),
            ));
        }
        *value = parse_number(field, &what, number).map_err(|mut e| {
            e.code = if e.code == "bad_number" {
                "sp3_bad_column"
            } else {
                e.code
            };
            e
        })?;
    }
    Ok(values)
}

fn satellite_id(line: &str) -> String {
    normalize_id(line.get(1..4).unwrap_or(""))
}

fn read_position(
    line: &str,
    number: usize,
    epoch: Instant,
    (header, frame): (&Sp3Header, Frame),
    tracks: &mut Vec<ObjectTrack>,
    by_id: &mut HashMap<String, usize>,
) -> Result<(), TrajectoryError> {
    let id = satellite_id(line);
    let km = read_triple(line, number, "km")?;
    let absent = km.iter().all(|v| *v == 0.0) || km.iter().any(|v| v.abs() >= BAD_COORDINATE_KM);
    if absent {
        return Ok(());
    }
    let index = match by_id.get(&id) {
        Some(index) => *index,
        None => {
            by_id.insert(id.clone(), tracks.len());
            tracks.push(new_track(&id, header, frame));
            tracks.len() - 1
        }
    };
    if let Some(track) = tracks.get_mut(index) {
        track.states.push(TrajectoryState {
            epoch,
            position_m: [km[0] * 1e3, km[1] * 1e3, km[2] * 1e3],
            velocity_m_s: None,
        });
    }
    Ok(())
}

/// Magnitude from which a clock is read as bad or absent (999999.999999 us).
const BAD_CLOCK_US: f64 = 999_999.0;

/// Reads the clock column (columns 47-60, microseconds) of a `P` line. A column that cannot be
/// read is left out with a warning naming the line (the orbit of the line is still read, so
/// that reading orbits alone, as [`read_sp3`] does, never fails on a clock).
fn read_clock(line: &str, number: usize, epoch: Instant, clocks: &mut ClockCollector) {
    let field = line.get(46..60.min(line.len())).map(str::trim);
    let Some(field) = field.filter(|f| !f.is_empty()) else {
        if line.len() > 46 && field.is_none() {
            clocks.warn(format!(
                "line {number}: the clock in columns 47-60 cannot be read; left out"
            ));
        } else {
            clocks.absent();
        }
        return;
    };
    let us = match parse_number(field, "the clock in columns 47-60 (microseconds)", number) {
        Ok(us) => us,
        Err(error) => {
            clocks.warn(format!("line {number}: {}; left out", error.message));
            return;
        }
    };
    if us.abs() >= BAD_CLOCK_US {
        clocks.absent();
        return;
    }
    let value = ClockValue {
        epoch,
        clock_s: us * 1e-6,
        line: number,
    };
    clocks.push(&satellite_id(line), false, value);
}

fn read_velocity(
    line: &str,
    number: usize,
    epoch: Instant,
    tracks: &mut [ObjectTrack],
    by_id: &HashMap<String, usize>,
) -> Result<(), TrajectoryError> {
    let id = satellite_id(line);
    let dm_s = read_triple(line, number, "dm/s")?;
    let absent =
        dm_s.iter().all(|v| *v == 0.0) || dm_s.iter().any(|v| v.abs() >= BAD_COORDINATE_KM);
    let state = by_id
        .get(&id)
        .and_then(|index| tracks.get_mut(*index))
        .and_then(|track| track.states.last_mut())
        .filter(|state| state.epoch == epoch);
    if let (Some(state), false) = (state, absent) {
        state.velocity_m_s = Some([dm_s[0] * 0.1, dm_s[1] * 0.1, dm_s[2] * 0.1]);
    }
    Ok(())
}

#[cfg(test)]
mod tests;
