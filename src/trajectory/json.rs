//! The JSON ephemeris document:
//!
//! ```json
//! {"frame": "GCRF", "time_scale": "UTC", "epoch_format": "iso",
//!  "objects": [{"id": "LYR-01", "states": [
//!     {"epoch": "2026-05-20T00:00:00", "position_m": [x, y, z], "velocity_m_s": [vx, vy, vz]}]}]}
//! ```
//!
//! `frame` is a frame name read by [`Frame::from_name`]; `time_scale` one of the engine's
//! scales; `epoch_format` one of the instant formats (default `iso`). `velocity_m_s` is optional
//! but must be given for all states of an object or for none.

use serde::Deserialize;

use super::error::TrajectoryError;
use super::text::to_storage;
use super::{Frame, ObjectTrack, TrajectorySet, TrajectoryState};
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::formats::{parse_instant, InstantFormat};
use crate::physics::time::scale::Scale;

/// The document as sent.
#[derive(Debug, Clone, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct JsonEphemeris {
    /// Frame name (GCRF, EME2000, ICRF, ITRF...).
    pub frame: String,
    /// Time scale of the epochs.
    pub time_scale: String,
    /// Instant format of the epochs (default `iso`).
    #[serde(default)]
    pub epoch_format: Option<String>,
    /// The objects.
    pub objects: Vec<JsonObject>,
}

/// One object of the document.
#[derive(Debug, Clone, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct JsonObject {
    /// Identifier.
    pub id: String,
    /// States in time order.
    pub states: Vec<JsonState>,
}

/// One state of the document.
#[derive(Debug, Clone, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct JsonState {
    /// Epoch text in the document's format and scale.
    pub epoch: String,
    /// Position, m.
    pub position_m: [f64; 3],
    /// Velocity, m/s.
    #[serde(default)]
    pub velocity_m_s: Option<[f64; 3]>,
}

/// Parses JSON text into a [`TrajectorySet`].
pub fn read_json(
    text: &str,
    context: &ConversionContext<'_>,
) -> Result<TrajectorySet, TrajectoryError> {
    let document: JsonEphemeris = serde_json::from_str(text).map_err(|error| {
        TrajectoryError::at_line(
            "json_invalid",
            error.line(),
            format!("the JSON ephemeris could not be read: {error}"),
        )
    })?;
    from_document(&document, context)
}

/// Converts an already deserialized document (for an HTTP layer that embeds it in a request).
pub fn from_document(
    document: &JsonEphemeris,
    context: &ConversionContext<'_>,
) -> Result<TrajectorySet, TrajectoryError> {
    let frame = Frame::from_name(&document.frame).ok_or_else(|| {
        TrajectoryError::new(
            "unsupported_frame",
            format!(
                "frame {:?} is not supported; expected {}, in upper case",
                document.frame,
                Frame::names_in_words()
            ),
        )
    })?;
    let scale: Scale = document
        .time_scale
        .parse()
        .map_err(|e| TrajectoryError::new("unknown_scale", format!("time_scale: {e}")))?;
    if scale.needs_earth_orientation() {
        return Err(TrajectoryError::new(
            "unsupported_time_scale",
            format!("time_scale: {scale} follows the Earth's rotation and is not taken for trajectories; give the epochs in UTC or a uniform scale (TAI, TT, TDB, GPST, ...)"),
        ));
    }
    let format = match &document.epoch_format {
        Some(name) => name
            .parse::<InstantFormat>()
            .map_err(|e| TrajectoryError::new("unknown_format", format!("epoch_format: {e}")))?,
        None => InstantFormat::Iso,
    };
    let mut objects = Vec::with_capacity(document.objects.len());
    for object in &document.objects {
        let with_velocity = object
            .states
            .iter()
            .filter(|s| s.velocity_m_s.is_some())
            .count();
        if with_velocity != 0 && with_velocity != object.states.len() {
            return Err(TrajectoryError::new(
                "mixed_velocity",
                format!(
                    "{with_velocity} of {} states carry velocity_m_s; give it for every state of the object or for none",
                    object.states.len()
                ),
            )
            .for_object(&object.id));
        }
        let mut states = Vec::with_capacity(object.states.len());
        for (index, state) in object.states.iter().enumerate() {
            let epoch = parse_instant(&state.epoch, format, scale, context.table).map_err(|e| {
                TrajectoryError::at_state(
                    "bad_epoch",
                    &object.id,
                    index,
                    format!("cannot read the epoch {:?}: {e}", state.epoch),
                )
            })?;
            states.push(TrajectoryState {
                epoch: to_storage(epoch, context).map_err(|e| {
                    TrajectoryError::at_state("bad_epoch", &object.id, index, e.to_string())
                })?,
                position_m: state.position_m,
                velocity_m_s: state.velocity_m_s,
            });
        }
        objects.push(ObjectTrack {
            id: object.id.clone(),
            frame,
            scale: super::text::storage_scale(scale),
            states,
        });
    }
    Ok(TrajectorySet { objects })
}
