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
