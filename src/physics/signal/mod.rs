//! Relativistic corrections of a signal between two points near the Earth.
//!
//! * [`light_time`]: the one-way light time by iteration, with its Sagnac term (Earth-fixed
//!   input), the Earth's Shapiro delay and the transmitter clock's periodic term.
//! * [`two_way`]: the Sagnac correction of a two-way satellite time transfer.
//! * [`formulas`]: the published formulas, one function each.
//!
//! Sign convention of the one-way path terms: each term is *added* to the geometric range
//! divided by c to obtain the light time, `light_time = range/c + sagnac + shapiro`.
//! The clock term `-2 r.v/c^2` is the transmitter clock's reading minus coordinate time
//! (IS-GPS-200 20.3.3.3.3.1) and is not part of the light time.

pub mod error;
pub mod formulas;
pub mod light_time;
pub mod motion;
pub mod two_way;
pub mod validate;

pub use crate::physics::rate::Frame;
pub use error::{SignalError, SignalErrorKind};
pub use light_time::{signal_path, Endpoint, PathGeometry, SignalPath};
pub use motion::TransmitterMotion;
pub use two_way::{two_way_sagnac, Station, TwoWayLink, TwoWaySagnac};
