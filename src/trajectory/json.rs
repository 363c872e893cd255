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
use super::{ObjectTrack, TrajectorySet, TrajectoryState};
use crate::physics::lunar_orbit::TrajectoryCenter;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::error::TimeError;
use crate::physics::time::formats::{parse_instant, InstantFormat};
use crate::physics::time::scale::Scale;

/// The document as sent. `O` is what a layer that embeds the document in a request reads from
/// its `options` member (the HTTP API's computation options); a file read by [`read_json`]
/// takes none ([`NoOptions`]). This is the one type of the JSON ephemeris: the API reads its
/// bodies into it and documents it with a schema-only twin that a test holds to these fields.
#[derive(Debug, Clone, Deserialize)]
#[serde(deny_unknown_fields, bound(deserialize = "O: Deserialize<'de>"))]
pub struct JsonEphemeris<O = NoOptions> {
    /// Frame name (GCRF, GCRS, EME2000, ICRF, ITRF...), written exactly.
    pub frame: String,
    /// The origin of the positions: `earth` (default) or `moon` (selenocentric, ICRF axes; see
    /// [`super::lunar`]).
    #[serde(default)]
    pub center: Option<String>,
    /// Time scale of the epochs, written exactly.
    pub time_scale: String,
    /// Instant format of the epochs (default `iso`), written exactly.
    #[serde(default)]
    pub epoch_format: Option<String>,
    /// The objects.
    pub objects: Vec<JsonObject>,
    /// What the embedding layer reads (absent in files).
    #[serde(default)]
    pub options: Option<O>,
}

/// The `options` of a document read as a file: none may be given.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum NoOptions {}

impl<'de> Deserialize<'de> for NoOptions {
    fn deserialize<D: serde::Deserializer<'de>>(_: D) -> Result<Self, D::Error> {
        Err(serde::de::Error::custom(
            "`options` are request options of the HTTP API, not part of an ephemeris file",
        ))
    }
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
    let document: JsonEphemeris<NoOptions> = serde_json::from_str(text).map_err(|error| {
        TrajectoryError::at_line(
            "json_invalid",
            error.line(),
            format!("the JSON ephemeris could not be read: {error}"),
        )
    })?;
    from_document(&document, context)
}

/// Converts an already deserialized document (for an HTTP layer that embeds it in a request).
/// Names are read exactly as written (the spellings the API documents); a wrong one is an
/// error naming its member.
pub fn from_document<O>(
    document: &JsonEphemeris<O>,
    context: &ConversionContext<'_>,
) -> Result<TrajectorySet, TrajectoryError> {
    let center = match document.center.as_deref() {
        None => TrajectoryCenter::Earth,
        Some(name) => super::lunar::parse_center(name)?,
    };
    let frame = super::lunar::json_frame(center, &document.frame)?;
    let time_error = |error: TimeError, field: &'static str| {
        TrajectoryError::new(error.code(), error.to_string()).with_field(field)
    };
    let scale = Scale::from_name(&document.time_scale).ok_or_else(|| {
        time_error(
            TimeError::UnknownScale(document.time_scale.clone()),
            "time_scale",
        )
    })?;
    if scale.needs_earth_orientation() {
        return Err(TrajectoryError::new(
            "unsupported_time_scale",
            format!("time_scale: {scale} follows the Earth's rotation and is not taken for trajectories; give the epochs in UTC or a uniform scale (TAI, TT, TDB, GPST, ...)"),
        )
        .with_field("time_scale"));
    }
    let format = match &document.epoch_format {
        Some(name) => InstantFormat::from_name(name)
            .ok_or_else(|| time_error(TimeError::UnknownFormat(name.clone()), "epoch_format"))?,
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
                    TrajectoryError::at_state(
                        super::error::epoch_error_code(&e),
                        &object.id,
                        index,
                        e.to_string(),
                    )
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
