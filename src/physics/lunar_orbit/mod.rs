//! Proper time along an orbit about the Moon, in the Lunar Celestial Reference System (LCRS).
//!
//! The rate of a clock at selenocentric position x with velocity v (LCRS, ICRF axes) against
//! TCL, the coordinate time of the LCRS, is
//!
//! d(tau)/d(TCL) = 1 - (v^2/2 + U_Moon(x) + w_tidal(x))/c^2
//!
//! the form of IAU 2000 Resolution B1.3 (the GCRS metric; IERS Conventions (2010) eq. 10.6)
//! with the Moon in place of the Earth: U_Moon is the Moon's own potential ([`field`]: by
//! default the degree-2 field of the lunar surface clocks, GM of DE440 with J2 and C22 of
//! GL0660B in the body-fixed axes of the IAU rotation model), w_tidal the tidal potential of
//! the Earth and the Sun expanded about the Moon's centre without its monopole and dipole
//! terms ([`environment`]). The integration ([`integrate`]) keeps three quantities apart:
//!
//! * the rate (mean of d(tau)/d(TCL) - 1 over the span, from tau - TCL at the last epoch);
//! * the clock-rate periodic part: tau - TCL minus its least-squares line (eccentricity, J2,
//!   tides), and within it the Keplerian term -2 x.v/c^2 for comparison;
//! * the coordinate-simultaneity term v_M.(x - x_M)/c^2 (v_M the Moon's barycentric velocity):
//!   the position-dependent part of TCB - TCL at the clock (IAU 2000 Resolution B1.5 form with
//!   the Moon for the Earth). It is not a clock rate: it says how TCL labels of events at the
//!   clock map to TCB (and so to TDB and TT) and is never added to tau - TCL.
//!
//! Left out (sizes at a 100 km circular orbit, rate): the Moon's degree 3 and above (C31 about
//! 2.7e-5, from memory: about 1e-15; the mass concentrations of the higher degrees are not
//! estimated here), C22 when `j2` is asked for instead of the default degree-2 field (up to
//! 1.8e-15, 8.9e-16 in a polar orbit's mean over a revolution), the J2 of the Earth in its tide (below
//! 1e-22), the other planets' tides (below 1e-20), c^-4 terms (about 1e-19), the difference
//! between TDB-compatible and LCRS coordinates (a scale of about 1.5e-8 on x and v: below
//! 1e-18 of rate).

pub mod environment;
pub mod field;
pub mod integrate;
pub mod observer;
#[cfg(test)]
mod tests;

use crate::physics::vocabulary::vocabulary;

pub use environment::{LunarEnvironment, LunarSurroundings};
pub use field::{
    check_orbit_distance, moon_field_potential_m2_s2, moon_zonal_potential_m2_s2, LunarAxes,
    MAX_SELENOCENTRIC_DISTANCE_M,
};
pub use integrate::{
    integrate_lunar_proper_time, LunarProperTimeSample, LunarProperTimeSeries,
    LunarProperTimeSummary, LUNAR_INTEGRATION_NOTE,
};
pub use observer::SelenocentricObserver;

vocabulary! {
    /// The centre of an uploaded ephemeris's positions.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum TrajectoryCenter {
        /// The Earth's centre of mass (the GCRS origin): geocentric states.
        Earth = "earth",
        /// The Moon's centre of mass (the LCRS origin): selenocentric states, ICRF axes.
        Moon = "moon",
    }
}

vocabulary! {
    /// The time scale a lunar-orbit clock's proper time is compared with.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum LunarReference {
        /// TCL, the coordinate time of the LCRS (IAU 2024 Resolution II).
        Tcl = "TCL",
        /// TL, the lunar surface time proposed by Turyshev et al. (arXiv:2406.16147): a
        /// proposal, not a standard.
        Tl = "TL",
        /// TT, through the service's TCL - TT relation at the Moon's centre.
        Tt = "TT",
    }
}
