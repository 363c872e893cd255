//! Rate of a clock at a GCRS state with the tidal potentials of the Sun and the Moon.

use crate::physics::constants::SPEED_OF_LIGHT_SQUARED_M2_S2;
use crate::physics::gravity::GravityModel;
use crate::physics::rate::error::{RateError, RateErrorKind};
use crate::physics::rate::state::{state_rate_about_axis, Frame, StateRate, StateVector};
use crate::physics::rate::RateReference;
use crate::physics::solar_system::{sun_moon_tidal_potential_m2_s2, TidalBodies};

/// The model note of a state rate with the Sun and Moon tides (`j2_sun_moon`).
pub const STATE_TIDES_NOTE: &str = "tidal potentials of the Sun and the Moon at the clock (IAU 2000 Resolution B1.3, IERS Conventions (2010) eq. 10.6: the external potential less its value and gradient at the geocentre), positions from the planetary ephemeris in force at the epoch's TDB, GM of DE440; up to 1.24e-15 for a navigation MEO clock and 3.19e-15 at GEO (the Moon alone up to 2.42e-15 near perigee; its quadrupole amplitude GM r^2/(d^3 c^2) averages 1.7e-15), measured over 2020-2030. Left out: the planets' tides (Venus at its closest about 1.2e-19 at GEO, Jupiter about 1e-20), the Earth's harmonics beyond J2 (C22/S22 up to about 2.5e-17 at navigation MEO and 6e-18 at GEO, J3 about 6e-18 at MEO), the 1/c^4 terms of the metric (about (GM/(r c^2))^2 = 3e-20 at navigation MEO)";

/// The model note of a state rate without the tides (every model but `j2_sun_moon`).
pub const STATE_NO_TIDES_NOTE: &str = "the tidal potentials of the Moon and the Sun are not in this model: up to 1.24e-15 for a navigation MEO clock and 3.19e-15 at GEO (the Moon alone up to 2.42e-15), measured over 2020-2030 on DE440; give the state's epoch with gravity_model j2_sun_moon to include them";

/// Instantaneous fractional rate of a clock at a GCRS state with the Earth's J2 field about
/// `axis_unit` (the CIP at the epoch) and the tidal potentials of the Sun and the Moon whose
/// geocentric positions at the epoch are `bodies`:
///
/// d(tau)/d(TCG) - 1 = -(v^2/2 + U_J2(x) + w_tidal(x))/c^2, plus L_G relative to TT.
///
/// The tidal term goes into `gr`. Errors: as [`state_rate_about_axis`]; a state that is not in
/// the GCRS (`frame`): take ITRF states into the GCRS at their epoch first.
///
/// References: IERS Conventions (2010) ch. 10 eq. 10.6 (U the sum of the Earth's potential and
/// the external tidal potential); IAU 2000 Resolution B1.3; the tidal potential in
/// [`sun_moon_tidal_potential_m2_s2`].
pub fn state_rate_with_tides(
    state: &StateVector,
    reference: RateReference,
    axis_unit: [f64; 3],
    bodies: &TidalBodies,
) -> Result<StateRate, RateError> {
    if state.frame != Frame::Gcrs {
        return Err(RateError::new(
            "frame",
            "the Sun and Moon tides are evaluated on GCRS states (ITRF states are taken into the GCRS at their epoch first)",
        )
        .with_kind(RateErrorKind::BeyondModelRange));
    }
    let mut rate = state_rate_about_axis(state, reference, GravityModel::J2, axis_unit)?;
    let tidal_m2_s2 = sun_moon_tidal_potential_m2_s2(bodies, state.position_m)?;
    rate.parts.gr -= tidal_m2_s2 / SPEED_OF_LIGHT_SQUARED_M2_S2;
    Ok(rate)
}

#[cfg(test)]
#[path = "state_tides_tests.rs"]
mod tests;
