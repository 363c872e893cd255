//! Pure computation: time scales, potentials, clock rates, proper time and signal paths.
//!
//! Nothing in here knows about HTTP, JSON or async. Each formula is a small function whose doc
//! comment names its publication and equation.

pub mod clock_data;
pub mod constants;
pub mod earth;
pub mod geodesy;
pub mod gravity;
pub mod lunar_orbit;
pub mod moon;
pub mod proper_time;
pub mod rate;
pub mod rate_error;
pub mod readable;
pub mod signal;
pub mod solar_system;
pub mod stability;
pub mod time;
pub mod vocabulary;
