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

#[cfg(test)]
mod demo_tests;
pub mod error;
pub mod interpolate;
pub mod json;
#[cfg(test)]
mod json_tests;
pub mod oem;
pub mod sp3;
pub mod text;
pub mod track_proper_time;

pub use error::TrajectoryError;
pub use interpolate::{validate_track, InterpolationOptions, Interpolator, MAX_POINTS};
pub use json::read_json;
pub use oem::read_oem;
pub use sp3::read_sp3;
pub use track_proper_time::{proper_time_of_ephemeris, proper_time_of_track, TrackProperTime};

use crate::physics::time::instant::Instant;
use crate::physics::time::scale::Scale;

/// The frame family of an ephemeris: what the proper-time computation needs to know.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Frame {
    /// A geocentric inertial frame: EME2000, GCRF or ICRF axes centred on the Earth.
    Inertial,
    /// A geocentric frame rotating with the Earth: ITRF realizations, the IGS frames of SP3.
    EarthFixed,
}

impl Frame {
    /// Reads a frame name (ASCII case ignored): GCRS (the IAU name), GCRF, EME2000, J2000, ICRF
    /// are inertial;
    /// ITRF, ITRF93, ITRF-93, ITRF97, ITRF2000, ITRF2005, ITRF2008, ITRF2014, ITRF2020, IGS*,
    /// ECEF and WGS84 are Earth-fixed.
    pub fn from_name(name: &str) -> Option<Frame> {
        let upper = name.trim().to_ascii_uppercase();
        match upper.as_str() {
            "GCRS" | "GCRF" | "EME2000" | "J2000" | "ICRF" => Some(Frame::Inertial),
            "ECEF" | "WGS84" | "WGS-84" => Some(Frame::EarthFixed),
            _ if upper.starts_with("ITRF") || upper.starts_with("IGS") => Some(Frame::EarthFixed),
            _ => None,
        }
    }

    /// The name of the family.
    pub fn as_str(self) -> &'static str {
        match self {
            Frame::Inertial => "inertial",
            Frame::EarthFixed => "earth_fixed",
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
