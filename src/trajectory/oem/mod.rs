//! CCSDS Orbit Ephemeris Message, KVN form (CCSDS 502.0-B-2, 502.0-B-3).
//!
//! Read: the header (`CCSDS_OEM_VERS`, `CREATION_DATE`, `ORIGINATOR`, optional `MESSAGE_ID`),
//! any number of segments (`META_START` ... `META_STOP` then data lines
//! `epoch x y z vx vy vz [ax ay az]` in km and km/s), `COMMENT` lines, and optional covariance
//! blocks (`COVARIANCE_START` ... `COVARIANCE_STOP`, skipped). Segments of the same
//! `OBJECT_NAME` are concatenated into one track, in file order; a state that repeats the last
//! epoch of the previous segment is dropped (segments commonly share their boundary epoch).
//! Segments of one object must share the frame family and the time system.
//!
//! Epochs in TDB, TCG or TCB are converted to TT through the time engine on reading; UTC, TAI,
//! TT and GPS epochs are kept in their scale. Accelerations are read for shape but not kept.

mod metadata;

use super::error::TrajectoryError;
use super::text::{epoch_error, parse_epoch, parse_number, storage_scale, to_storage};
use super::{ObjectTrack, TrajectorySet, TrajectoryState};
use crate::physics::time::convert::ConversionContext;
use metadata::{MetadataBlock, Segment, HEADER_KEYWORDS};

/// Where the reader is in the message.
enum Section {
    /// Before `CCSDS_OEM_VERS`.
    Start,
    /// In the header.
    Header,
    /// Inside `META_START` ... `META_STOP`.
    Metadata(MetadataBlock),
    /// After `META_STOP`: data lines of this segment.
    Data(Segment, usize),
    /// Inside a covariance block (the line of `COVARIANCE_START`).
    Covariance(usize),
    /// After `COVARIANCE_STOP`: only `META_START` or the end may follow.
    AfterCovariance,
}

/// Splits `KEY = VALUE`, trimming both.
fn key_value(line: &str) -> Option<(&str, &str)> {
    line.split_once('=')
        .map(|(key, value)| (key.trim(), value.trim()))
}

/// Reads an OEM in KVN form. `context` supplies the leap-second table (UTC epochs) and the
/// TDB series (TDB epochs).
pub fn read_oem(
    text: &str,
    context: &ConversionContext<'_>,
) -> Result<TrajectorySet, TrajectoryError> {
    let text = text.strip_prefix('\u{feff}').unwrap_or(text);
    let mut ephemeris = TrajectorySet::default();
    let mut section = Section::Start;
    let mut header_seen = (false, false);
    let mut last_line = 0;
    for (index, raw) in text.split('\n').enumerate() {
        let number = index + 1;
        let line = raw.trim();
        if !line.is_empty() {
            last_line = number;
        }
        if line.is_empty() || line.starts_with("COMMENT") {
            if matches!(section, Section::Start) && line.starts_with("COMMENT") {
                return Err(version_first(number));
            }
            continue;
        }
        section = match section {
            Section::Start => match key_value(line) {
                Some(("CCSDS_OEM_VERS", version)) => {
                    if !matches!(version, "1.0" | "2.0" | "3.0") {
                        return Err(TrajectoryError::at_line(
                            "oem_unsupported_version",
                            number,
                            format!("CCSDS_OEM_VERS is {version:?}; expected 1.0, 2.0 or 3.0"),
                        ));
                    }
                    Section::Header
                }
                _ => return Err(version_first(number)),
            },
            Section::Header => {
                if line == "META_START" {
                    check_header(header_seen, number)?;
                    start_metadata(number)
                } else {
                    match key_value(line) {
                        Some(("CREATION_DATE", _)) => header_seen.0 = true,
                        Some(("ORIGINATOR", _)) => header_seen.1 = true,
                        Some((key, _)) if HEADER_KEYWORDS.contains(&key) => {}
                        _ => {
                            return Err(TrajectoryError::at_line(
                                "oem_unknown_keyword",
                                number,
                                format!("expected a header keyword (CREATION_DATE, ORIGINATOR, MESSAGE_ID, COMMENT) or META_START, found {:?}", clip(line)),
                            ))
                        }
                    }
                    Section::Header
                }
            }
            Section::Metadata(mut block) => {
                if line == "META_STOP" {
                    let segment = block.finish(number, context)?;
                    open_track(&mut ephemeris, &segment, number)?;
                    Section::Data(segment, 0)
                } else {
                    match key_value(line) {
                        Some((key, value)) => block.take(key, value, number)?,
                        None => {
                            return Err(TrajectoryError::at_line(
                                "oem_bad_metadata_line",
                                number,
                                format!("expected KEY = VALUE or META_STOP inside the metadata block, found {:?}", clip(line)),
                            ))
                        }
                    }
                    Section::Metadata(block)
                }
            }
            Section::Data(segment, count) => match line {
                "META_START" => {
                    check_segment_not_empty(&segment, count, number)?;
                    start_metadata(number)
                }
                "COVARIANCE_START" => {
                    check_segment_not_empty(&segment, count, number)?;
                    Section::Covariance(number)
                }
                _ => {
                    read_data_line(&mut ephemeris, &segment, line, number, count == 0, context)?;
                    Section::Data(segment, count + 1)
                }
            },
            Section::Covariance(start) => {
                if line == "COVARIANCE_STOP" {
                    Section::AfterCovariance
                } else {
                    Section::Covariance(start)
                }
            }
            Section::AfterCovariance => {
                if line == "META_START" {
                    start_metadata(number)
                } else {
                    return Err(TrajectoryError::at_line(
                        "oem_unexpected_line",
                        number,
                        format!("after COVARIANCE_STOP expected META_START or the end of the message, found {:?}", clip(line)),
                    ));
                }
            }
        };
    }
    match section {
        Section::Start => Err(version_first(last_line.max(1))),
        Section::Header => Err(TrajectoryError::at_line(
            "oem_missing_keyword",
            last_line,
            "the message ends before any META_START; an OEM needs at least one segment",
        )),
        Section::Metadata(block) => Err(TrajectoryError::at_line(
            "oem_missing_keyword",
            last_line,
            format!(
                "the metadata block starting at line {} has no META_STOP",
                block.start_line
            ),
        )),
        Section::Data(segment, count) => {
            check_segment_not_empty(&segment, count, last_line)?;
            Ok(ephemeris)
        }
        Section::Covariance(start) => Err(TrajectoryError::at_line(
            "oem_missing_keyword",
            last_line,
            format!("the covariance block starting at line {start} has no COVARIANCE_STOP"),
        )),
        Section::AfterCovariance => Ok(ephemeris),
    }
}

fn start_metadata(line: usize) -> Section {
    Section::Metadata(MetadataBlock {
        start_line: line,
        ..MetadataBlock::default()
    })
}

/// At most 60 characters of a line, for messages.
fn clip(line: &str) -> &str {
    match line.char_indices().nth(60) {
        Some((end, _)) => &line[..end],
        None => line,
    }
}

fn version_first(line: usize) -> TrajectoryError {
    TrajectoryError::at_line(
        "oem_missing_keyword",
        line,
        "expected CCSDS_OEM_VERS = 2.0 (or 1.0, 3.0) as the first keyword of the message",
    )
}

fn check_header(seen: (bool, bool), line: usize) -> Result<(), TrajectoryError> {
    for (present, keyword) in [(seen.0, "CREATION_DATE"), (seen.1, "ORIGINATOR")] {
        if !present {
            return Err(TrajectoryError::at_line(
                "oem_missing_keyword",
                line,
                format!("the header has no {keyword}; it is required before the first META_START"),
            ));
        }
    }
    Ok(())
}

fn check_segment_not_empty(
    segment: &Segment,
    count: usize,
    line: usize,
) -> Result<(), TrajectoryError> {
    if count == 0 {
        return Err(TrajectoryError::at_line(
            "oem_empty_segment",
            line,
            format!(
                "the segment of {:?} has no data lines; expected lines `epoch x y z vx vy vz`",
                segment.object
            ),
        ));
    }
    Ok(())
}

/// Finds or creates the track of a segment's object, checking that segments agree.
fn open_track(
    ephemeris: &mut TrajectorySet,
    segment: &Segment,
    line: usize,
) -> Result<(), TrajectoryError> {
    let scale = storage_scale(segment.scale);
    match ephemeris.objects.iter().find(|t| t.id == segment.object) {
        Some(track) if track.frame != segment.frame || track.scale != scale => {
            Err(TrajectoryError::at_line(
                "oem_inconsistent_segments",
                line,
                format!(
                    "this segment of {:?} is {} in {}, an earlier one is {} in {}; segments of one object must share frame family and time system",
                    segment.object,
                    segment.frame.as_str(),
                    segment.scale,
                    track.frame.as_str(),
                    track.scale
                ),
            )
            .for_object(&segment.object))
        }
        Some(_) => Ok(()),
        None => {
            ephemeris.objects.push(ObjectTrack {
                id: segment.object.clone(),
                frame: segment.frame,
                scale,
                states: Vec::new(),
            });
            Ok(())
        }
    }
}

/// Reads `epoch x y z vx vy vz [ax ay az]` (km, km/s, km/s^2) and appends the state. The
/// first line of a segment is dropped when it repeats the previous segment's last epoch.
fn read_data_line(
    ephemeris: &mut TrajectorySet,
    segment: &Segment,
    line: &str,
    number: usize,
    first_in_segment: bool,
    context: &ConversionContext<'_>,
) -> Result<(), TrajectoryError> {
    let mut fields = line.split_ascii_whitespace();
    let epoch_text = fields.next().unwrap_or("");
    let mut values = [0.0_f64; 6];
    let mut count = 0;
    for field in fields {
        if count < 6 {
            values[count] = parse_number(field, DATA_FIELDS[count], number)?;
        } else if count < 9 {
            parse_number(field, "an acceleration component", number)?;
        }
        count += 1;
    }
    if count != 6 && count != 9 {
        return Err(TrajectoryError::at_line(
            "oem_bad_data_line",
            number,
            format!(
                "expected a data line `epoch x y z vx vy vz [ax ay az]` (km, km/s) with 6 or 9 numbers after the epoch, found {count}: {:?}",
                clip(line)
            ),
        ));
    }
    let epoch = parse_epoch(epoch_text, segment.scale, context)
        .map_err(|e| epoch_error(&e, number, epoch_text))?;
    if epoch < segment.start || epoch > segment.stop {
        return Err(TrajectoryError::at_line(
            "oem_epoch_outside_segment",
            number,
            format!("the epoch {epoch_text} lies outside the segment's START_TIME..STOP_TIME"),
        )
        .for_object(&segment.object));
    }
    let epoch = to_storage(epoch, context).map_err(|e| epoch_error(&e, number, epoch_text))?;
    let Some(track) = ephemeris
        .objects
        .iter_mut()
        .rev()
        .find(|t| t.id == segment.object)
    else {
        return Err(TrajectoryError::new(
            "oem_internal",
            "no track for the segment (a reader defect; please report it)",
        ));
    };
    if first_in_segment && track.states.last().map(|s| s.epoch) == Some(epoch) {
        return Ok(());
    }
    track.states.push(TrajectoryState {
        epoch,
        position_m: [values[0] * 1e3, values[1] * 1e3, values[2] * 1e3],
        velocity_m_s: Some([values[3] * 1e3, values[4] * 1e3, values[5] * 1e3]),
    });
    Ok(())
}

const DATA_FIELDS: [&str; 6] = [
    "x (km)",
    "y (km)",
    "z (km)",
    "vx (km/s)",
    "vy (km/s)",
    "vz (km/s)",
];

#[cfg(test)]
mod tests;
