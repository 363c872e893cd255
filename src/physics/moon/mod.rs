//! The Moon as a place for clocks: its orientation ([`orientation`]), its gravity field
//! ([`gravity`]) and the rates and proper time of clocks fixed on its surface ([`site`],
//! [`span`]), against TCL, TL, TT and TCG.

pub mod gravity;
pub mod orientation;
pub mod site;
pub mod span;

pub use orientation::{moon_orientation, MoonOrientation};
pub use site::{lunar_site_rates, LunarSiteRates};

#[cfg(test)]
mod independent_tests;
#[cfg(test)]
mod tests;

use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// The model of a lunar-site clock rate.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum LunarSiteModel {
        /// The Moon on a circular orbit, rotating synchronously about the orbit normal; a mean
        /// rate against TT or TCG only ([`crate::physics::rate::lunar`]).
        CircularOrbit = "circular_orbit",
        /// The lunar orbit of DE440, the IAU rotation of the Moon, the GL0660B degree-2 field
        /// and the Earth's and the Sun's tides ([`site`], [`span`]).
        De440Ephemeris = "de440_ephemeris",
    }
}

/// The name of the orientation model, as answers give it.
pub const ORIENTATION_MODEL: &str = "iau_wgccre_2018";
