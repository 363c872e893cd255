//! Readers of uploaded trajectories (JSON, CCSDS OEM, SP3) and their interpolation.
//!
//! Every reader returns a [`TrajectorySet`]: one [`ObjectTrack`] per object, with positions in
//! metres and velocities in metres per second, epochs as engine [`Instant`]s, and the frame
//! family the file declared ([`Frame::Inertial`] or [`Frame::EarthFixed`]). Every refusal is an
//! [`TrajectoryError`] with a stable code and, where it helps, the line, object and state index.
//!
//! [`interpolate`] validates a track and interpolates it (Lagrange or Hermite);
//! [`track_proper_time`] connects a track to the proper-time integrator of
//! [`crate::physics::proper_time`].

pub mod clock;
pub mod clock_values;
#[cfg(test)]
mod demo_tests;
#[cfg(test)]
mod earth_fixed_tests;
pub mod error;
pub mod interpolate;
pub mod json;
#[cfg(test)]
mod json_tests;
pub mod lunar;
pub mod oem;
pub mod sp3;
pub mod text;
pub mod track_proper_time;

pub use error::TrajectoryError;
pub use interpolate::{validate_track, InterpolationOptions, Interpolator, MAX_POINTS};
pub use json::read_json;
pub use oem::read_oem;
pub use sp3::read_sp3;
pub use track_proper_time::{
    proper_time_of_ephemeris, proper_time_of_ephemeris_at, proper_time_of_track,
    proper_time_of_track_at, track_tt_extent, TrackProperTime,
};

use crate::physics::time::instant::Instant;
use crate::physics::time::scale::Scale;

/// The frame family of an ephemeris: what the proper-time computation needs to know.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Frame {
    /// A geocentric inertial frame: EME2000, GCRF or ICRF axes centred on the Earth.
    Inertial,
    /// A geocentric frame rotating with the Earth: ITRF realizations, the IGS frames of SP3.
    EarthFixed,
    /// A selenocentric frame with ICRF axes (the LCRS's spatial axes): OEM `CENTER_NAME =
    /// MOON` with `REF_FRAME = ICRF` or `EME2000`, JSON `center: moon` (see [`lunar`]).
    LunarInertial,
}

/// Exact names of the geocentric inertial frames a JSON ephemeris may name.
pub const INERTIAL_FRAME_NAMES: &[&str] = &["GCRS", "GCRF", "EME2000", "J2000", "ICRF"];
/// Exact names of Earth-fixed frames a JSON ephemeris may name (besides the families).
pub const EARTH_FIXED_FRAME_NAMES: &[&str] = &["ECEF", "WGS84", "WGS-84"];
/// Prefixes of the Earth-fixed frame families (ITRF, ITRF2014, ITRF2020, IGS20...).
pub const EARTH_FIXED_FRAME_FAMILIES: &[&str] = &["ITRF", "IGS"];

impl Frame {
    /// Reads a frame name written exactly (upper case, no surrounding spaces):
    /// [`INERTIAL_FRAME_NAMES`] are inertial; [`EARTH_FIXED_FRAME_NAMES`] and every name that
    /// starts with one of [`EARTH_FIXED_FRAME_FAMILIES`] are Earth-fixed.
    pub fn from_name(name: &str) -> Option<Frame> {
        if INERTIAL_FRAME_NAMES.contains(&name) {
            Some(Frame::Inertial)
        } else if EARTH_FIXED_FRAME_NAMES.contains(&name)
            || EARTH_FIXED_FRAME_FAMILIES
                .iter()
                .any(|prefix| name.starts_with(prefix))
        {
            Some(Frame::EarthFixed)
        } else {
            None
        }
    }

    /// The frame names [`Frame::from_name`] reads, in words: "GCRF, EME2000, J2000, ICRF
    /// (inertial), ECEF, WGS84, WGS-84 or a name of the ITRF or IGS families (Earth-fixed)".
    pub fn names_in_words() -> String {
        format!(
            "{} (inertial), {} or a name of the {} families (Earth-fixed)",
            INERTIAL_FRAME_NAMES.join(", "),
            EARTH_FIXED_FRAME_NAMES.join(", "),
            EARTH_FIXED_FRAME_FAMILIES.join(" or ")
        )
    }

    /// The name of the family.
    pub fn as_str(self) -> &'static str {
        match self {
            Frame::Inertial => "inertial",
            Frame::EarthFixed => "earth_fixed",
            Frame::LunarInertial => "lunar_inertial",
        }
    }
}

/// One state of an object: epoch, position and (when the file has it) velocity.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TrajectoryState {
    /// The epoch, in the track's scale.
    pub epoch: Instant,
    /// Geocentric position in the track's frame, m.
    pub position_m: [f64; 3],
    /// Velocity in the track's frame (relative to that frame's axes), m/s.
    pub velocity_m_s: Option<[f64; 3]>,
}

/// The states of one object, in one frame and one time scale, in file order.
#[derive(Debug, Clone, PartialEq)]
pub struct ObjectTrack {
    /// The object's identifier (OEM OBJECT_ID or name, SP3 satellite id, JSON id).
    pub id: String,
    /// The frame family of the positions and velocities.
    pub frame: Frame,
    /// The time scale of the epochs.
    pub scale: Scale,
    /// The states, in file order (checked by [`validate_track`]).
    pub states: Vec<TrajectoryState>,
}

impl ObjectTrack {
    /// True when every state carries a velocity.
    pub fn has_velocities(&self) -> bool {
        !self.states.is_empty() && self.states.iter().all(|s| s.velocity_m_s.is_some())
    }
}

/// Everything read from one ephemeris file or document.
#[derive(Debug, Clone, PartialEq, Default)]
pub struct TrajectorySet {
    /// One track per object, in order of first appearance.
    pub objects: Vec<ObjectTrack>,
}
