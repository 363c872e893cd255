//! The tidal part of the proper-time integrand: the tidal potentials of the Sun and the Moon at
//! the clock, at the epoch of each quadrature node.
//!
//! In the geocentric metric (IAU 2000 Resolution B1.3; IERS Conventions (2010) eq. 10.6) the
//! rate of a clock against TCG (or TT) has, beside -(v^2/2 + U_E)/c^2, the term -w_tidal/c^2
//! with w_tidal the external potential less its value and gradient at the geocentre
//! ([`crate::physics::solar_system::sun_moon_tidal_potential_m2_s2`]). Unlike the Earth's part it depends on the epoch: the
//! integrand reads the Sun and the Moon at the TDB of each node, from a [`TidalTrack`] with
//! nodes every hour of TT along the track, each node read from the ephemeris at
//! TDB = TT + (TDB - TT) with the conversion context's model of TDB - TT.
//!
//! Kept apart from the Earth's part so that any integrator with a time argument
//! ([`super::integrate_proper_time_at`]) can add it to its own rate.

use std::fmt;

use crate::physics::constants::SPEED_OF_LIGHT_SQUARED_M2_S2;
use crate::physics::gravity::tidal_potential_unchecked_m2_s2;
use crate::physics::solar_system::gm::{GM_MOON_M3_S2, GM_SUN_M3_S2};
use crate::physics::solar_system::{Ephemeris, EphemerisError, TidalTrack};
use crate::physics::time::convert::{tdb_minus_tt_s, ConversionContext};
use crate::physics::time::error::TimeError;
use crate::physics::time::instant::seconds_f64_to_attos;

/// The model note of proper time with the Sun and Moon tides (gravity model `j2_sun_moon`).
pub const PROPER_TIME_TIDES_NOTE: &str = "tidal potentials of the Sun and the Moon at the clock (IAU 2000 Resolution B1.3, IERS Conventions (2010) eq. 10.6: the external potential less its value and gradient at the geocentre), integrated as their own part (tidal_part_s; tau - t = velocity + gravity + tidal parts); the Sun and the Moon from the planetary ephemeris in force at the TDB of every quadrature node (nodes of the bodies every hour of TT, TDB - TT from the fitted Fairhead & Bretagnon series unless tdb_model says otherwise, cubic Hermite between them: below 2e-24 of rate), GM of DE440 (Park et al. 2021). Up to 1.24e-15 of rate for a navigation MEO clock and 3.19e-15 at GEO. Left out: the planets' tides (below 2e-19), the Earth's harmonics beyond J2 (up to about 2.5e-17 at navigation MEO), the 1/c^4 terms (about 3e-20)";

/// Why the tidal integrand cannot be set up over a track.
#[derive(Debug, Clone, PartialEq)]
pub enum TidalIntegrandError {
    /// A node outside the planetary ephemeris's span (the text names the span).
    Ephemeris(EphemerisError),
    /// TT to TDB failed (the `ephemeris` TDB - TT model outside its span).
    Time(TimeError),
}

impl TidalIntegrandError {
    /// Stable code: the ephemeris's or the time conversion's.
    pub fn code(&self) -> &'static str {
        match self {
            Self::Ephemeris(error) => error.code(),
            Self::Time(error) => error.code(),
        }
    }
}

impl From<EphemerisError> for TidalIntegrandError {
    fn from(error: EphemerisError) -> Self {
        Self::Ephemeris(error)
    }
}

impl fmt::Display for TidalIntegrandError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        match self {
            Self::Ephemeris(error) => error.fmt(f),
            Self::Time(error) => error.fmt(f),
        }
    }
}

impl std::error::Error for TidalIntegrandError {}

/// The Sun and the Moon along a track whose coordinate time is TT seconds since a first epoch.
#[derive(Debug, Clone)]
pub struct TidalIntegrand {
    bodies: TidalTrack,
}

impl TidalIntegrand {
    /// The bodies over `0 ..= span_s` TT seconds after `start_tt_attos` (attoseconds since
    /// J2000.0 TT), each hourly node read at its TDB (TT + TDB - TT of `context`). Errors: a
    /// node outside the ephemeris (naming its span), TDB - TT unavailable, a span that is not
    /// finite or negative.
    pub fn over_tt(
        ephemeris: &Ephemeris,
        start_tt_attos: i128,
        span_s: f64,
        context: &ConversionContext<'_>,
    ) -> Result<Self, TidalIntegrandError> {
        let tdb_attos_at = |t_s: f64| -> Result<i128, TidalIntegrandError> {
            let tt_attos = start_tt_attos + seconds_f64_to_attos(t_s);
            let tdb_minus_tt =
                tdb_minus_tt_s(tt_attos, context).map_err(TidalIntegrandError::Time)?;
            Ok(tt_attos + seconds_f64_to_attos(tdb_minus_tt))
        };
        let bodies = TidalTrack::over_argument(ephemeris, 0.0, span_s, tdb_attos_at)?;
        Ok(Self { bodies })
    }

    /// The tidal part of d(tau)/dt - 1 at TT seconds `t_s` after the first epoch for a clock at
    /// the geocentric (GCRS) position `position_m`: -w_tidal/c^2 (IERS Conventions (2010)
    /// eq. 10.6; [`crate::physics::solar_system::sun_moon_tidal_potential_m2_s2`]), dimensionless. NaN outside the span or
    /// for a position where the potential is undefined (the integrator refuses non-finite
    /// parts).
    pub fn rate_part(&self, t_s: f64, position_m: &[f64; 3]) -> f64 {
        let Some(bodies) = self.bodies.bodies_at(t_s) else {
            return f64::NAN;
        };
        // The formula of `sun_moon_tidal_potential_m2_s2` without its input checks: the bodies
        // come from the ephemeris, and a non-finite result is refused by the integrator.
        let w_m2_s2 = tidal_potential_unchecked_m2_s2(GM_SUN_M3_S2, bodies.sun_m, *position_m)
            + tidal_potential_unchecked_m2_s2(GM_MOON_M3_S2, bodies.moon_m, *position_m);
        -w_m2_s2 / SPEED_OF_LIGHT_SQUARED_M2_S2
    }
}

#[cfg(test)]
#[path = "tides_tests.rs"]
mod tests;
