//! OEM header and metadata keywords (CCSDS 502.0-B-2 sections 5.2.2 and 5.2.3; 502.0-B-3
//! adds MESSAGE_ID to the header and keeps the metadata keywords).

use super::super::error::TrajectoryError;
use super::super::lunar::{check_center_frame, is_lunar_frame};
use super::super::text::{epoch_error, parse_epoch};
use super::super::Frame;
use crate::physics::lunar_orbit::TrajectoryCenter;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::instant::Instant;
use crate::physics::time::scale::Scale;

/// Header keywords other than the version and COMMENT.
pub const HEADER_KEYWORDS: [&str; 4] = [
    "CREATION_DATE",
    "ORIGINATOR",
    "MESSAGE_ID",
    "CLASSIFICATION",
];

/// The time systems read (CCSDS SANA time-system names) and the engine scale of each.
pub fn scale_of_time_system(name: &str) -> Option<Scale> {
    match name {
        "UTC" => Some(Scale::Utc),
        "TAI" => Some(Scale::Tai),
        "TT" => Some(Scale::Tt),
        "GPS" => Some(Scale::Gpst),
        "TDB" => Some(Scale::Tdb),
        "TCG" => Some(Scale::Tcg),
        "TCB" => Some(Scale::Tcb),
        _ => None,
    }
}

/// Reference frames read by the OEM reader: EME2000, GCRF, ICRF (inertial) and the ITRF
/// realizations ITRF, ITRF-93, ITRF-97, ITRF2000, ITRF2005, ITRF2008, ITRF2014, ITRF2020.
/// REF_FRAME takes the values of the CCSDS (SANA) registry, which names the IAU's GCRS by its
/// realisation GCRF; `GCRS` is refused here (with a hint) so that a file this reader accepts
/// stays readable by other CCSDS tools, while the JSON ephemeris takes both names.
pub fn frame_of_ref_frame(name: &str) -> Option<Frame> {
    match name {
        "EME2000" | "GCRF" | "ICRF" => Some(Frame::Inertial),
        _ if name.starts_with("ITRF") => Some(Frame::EarthFixed),
        _ => None,
    }
}

/// The metadata of one segment, as read between META_START and META_STOP.
#[derive(Debug, Default)]
pub struct MetadataBlock {
    /// Line of META_START.
    pub start_line: usize,
    pub object_name: Option<String>,
    pub object_id: Option<String>,
    pub center_name: Option<String>,
    pub ref_frame: Option<(String, usize)>,
    pub time_system: Option<(String, usize)>,
    pub start_time: Option<(String, usize)>,
    pub stop_time: Option<(String, usize)>,
}

/// The checked metadata of one segment.
#[derive(Debug, Clone)]
pub struct Segment {
    /// Track id: OBJECT_NAME.
    pub object: String,
    pub frame: Frame,
    /// The scale the epochs are written in.
    pub scale: Scale,
    pub start: Instant,
    pub stop: Instant,
}

impl MetadataBlock {
    /// Takes one `KEY = VALUE` line of the metadata block.
    pub fn take(&mut self, key: &str, value: &str, line: usize) -> Result<(), TrajectoryError> {
        let owned = || Some(value.to_string());
        match key {
            "OBJECT_NAME" => self.object_name = owned(),
            "OBJECT_ID" => self.object_id = owned(),
            "CENTER_NAME" => self.center_name = owned(),
            "REF_FRAME" => self.ref_frame = Some((value.to_string(), line)),
            "TIME_SYSTEM" => self.time_system = Some((value.to_string(), line)),
            "START_TIME" => self.start_time = Some((value.to_string(), line)),
            "STOP_TIME" => self.stop_time = Some((value.to_string(), line)),
            "REF_FRAME_EPOCH"
            | "USEABLE_START_TIME"
            | "USEABLE_STOP_TIME"
            | "INTERPOLATION"
            | "INTERPOLATION_DEGREE" => {}
            _ => {
                return Err(TrajectoryError::at_line(
                    "oem_unknown_keyword",
                    line,
                    format!(
                        "unknown metadata keyword {key:?}; expected OBJECT_NAME, OBJECT_ID, CENTER_NAME, REF_FRAME, REF_FRAME_EPOCH, TIME_SYSTEM, START_TIME, USEABLE_START_TIME, USEABLE_STOP_TIME, STOP_TIME, INTERPOLATION, INTERPOLATION_DEGREE or COMMENT"
                    ),
                ))
            }
        }
        Ok(())
    }

    /// Checks the block at META_STOP (line `stop_line`) and reads its frame, scale and times.
    pub fn finish(
        self,
        stop_line: usize,
        context: &ConversionContext<'_>,
    ) -> Result<Segment, TrajectoryError> {
        let missing = |keyword: &str| {
            TrajectoryError::at_line(
                "oem_missing_keyword",
                stop_line,
                format!(
                    "the metadata block starting at line {} has no {keyword}; it is required by CCSDS 502.0-B-2",
                    self.start_line
                ),
            )
        };
        let object = self
            .object_name
            .clone()
            .ok_or_else(|| missing("OBJECT_NAME"))?;
        self.object_id
            .as_ref()
            .ok_or_else(|| missing("OBJECT_ID"))?;
        let center = self
            .center_name
            .as_ref()
            .ok_or_else(|| missing("CENTER_NAME"))?;
        let (frame_name, frame_line) =
            self.ref_frame.clone().ok_or_else(|| missing("REF_FRAME"))?;
        let (system, system_line) = self
            .time_system
            .clone()
            .ok_or_else(|| missing("TIME_SYSTEM"))?;
        let (start_text, start_line) = self
            .start_time
            .clone()
            .ok_or_else(|| missing("START_TIME"))?;
        let (stop_text, stop_time_line) =
            self.stop_time.clone().ok_or_else(|| missing("STOP_TIME"))?;
        let center = match center.to_ascii_uppercase().as_str() {
            "EARTH" => TrajectoryCenter::Earth,
            "MOON" => TrajectoryCenter::Moon,
            _ => {
                return Err(TrajectoryError::at_line(
                    "oem_unsupported_center",
                    self.start_line,
                    format!("CENTER_NAME is {center:?}; EARTH (geocentric states) and MOON (selenocentric states, ICRF axes) are supported"),
                ))
            }
        };
        let frame = if center == TrajectoryCenter::Moon || is_lunar_frame(&frame_name) {
            if frame_name == "J2000" {
                // Selenocentric states take ICRF axes, named ICRF or EME2000 in the CCSDS
                // (SANA) registry; J2000 is not one of its names.
                return Err(TrajectoryError::at_line(
                    "oem_unsupported_frame",
                    frame_line,
                    "REF_FRAME J2000 is not a CCSDS frame name; write EME2000 (or ICRF)",
                ));
            }
            check_center_frame(center, &frame_name).map_err(|(code, message)| {
                let code = if code == "unsupported_frame" {
                    "oem_unsupported_frame"
                } else {
                    code
                };
                TrajectoryError::at_line(code, frame_line, format!("REF_FRAME: {message}"))
            })?
        } else {
            frame_of_ref_frame(&frame_name).ok_or_else(|| {
                TrajectoryError::at_line(
                    "oem_unsupported_frame",
                    frame_line,
                    format!("REF_FRAME {frame_name:?} is not supported; expected EME2000, GCRF, ICRF (inertial) or ITRF, ITRF-93, ITRF2000, ITRF2014, ITRF2020 (Earth-fixed){}", if frame_name == "GCRS" { "; CCSDS names the GCRS `GCRF`" } else { "" }),
                )
            })?
        };
        let scale = scale_of_time_system(&system).ok_or_else(|| {
            TrajectoryError::at_line(
                "oem_unsupported_time_system",
                system_line,
                format!("TIME_SYSTEM {system:?} is not supported; expected UTC, TAI, TT, GPS, TDB, TCG or TCB"),
            )
        })?;
        let start = parse_epoch(&start_text, scale, context)
            .map_err(|e| epoch_error(&e, start_line, &start_text))?;
        let stop = parse_epoch(&stop_text, scale, context)
            .map_err(|e| epoch_error(&e, stop_time_line, &stop_text))?;
        if stop < start {
            return Err(TrajectoryError::at_line(
                "oem_bad_time_range",
                stop_time_line,
                format!("STOP_TIME {stop_text} is before START_TIME {start_text}"),
            ));
        }
        Ok(Segment {
            object,
            frame,
            scale,
            start,
            stop,
        })
    }
}
