//! Clock rate offsets at first post-Newtonian order.
//!
//! A clock with GCRS velocity v at geocentric position x, where U is the Earth's Newtonian
//! potential (positive), ticks proper time tau at
//!
//! ```text
//! d(tau)/d(TCG) = 1 - (v^2/2 + U(x)) / c^2                    IERS Conventions (2010) eq. 10.6
//! d(tau)/d(TT)  = d(tau)/d(TCG) / (1 - L_G)                   d(TT)/d(TCG) = 1 - L_G, eq. 10.1
//!               = 1 + (L_G - (v^2/2 + U)/c^2) / (1 - L_G)
//! ```
//!
//! The fractional rate is split into a velocity part `sr` and a gravity part `gr`
//! ([`RateParts`]):
//!
//! * relative to TCG: `sr = -v^2/(2c^2)`, `gr = -U/c^2`;
//! * relative to TT: `sr = -v^2/(2c^2)`, `gr = L_G - U/c^2 = (W0 - U)/c^2` (L_G = W0/c^2 by
//!   IAU 2000 Resolution B1.9; the code uses the defining L_G, which equals W0/c^2 of IERS
//!   Conventions (2010) table 1.1 to 6e-20).
//!
//! **The 1/(1 - L_G) factor.** [`RateParts::total`] is the first-order sum `sr + gr`, so the
//! parts always add up to the total. The exact quotient above is
//! [`RateParts::total_exact`] = `(sr + gr)/(1 - L_G)` for TT (identical to `total` for TCG);
//! the two differ by `L_G * total`, at most about 1e-18 for Earth-bound clocks: the same order
//! as the 1/c^4 terms the first post-Newtonian model neglects, so neither is "more right" at
//! that level. All the derived answers (microseconds per day, frequency) use `total`.
//!
//! Sub-modules: [`state`] (a position and velocity), [`orbit`] (Keplerian elements),
//! [`ground`] (a site fixed on the rotating Earth), [`lunar`] (a site on the Moon's surface),
//! [`frequency`] (nominal frequency to offset and factory setting).

pub use super::rate_error as error;
pub mod frequency;
pub mod ground;
pub mod lunar;
pub mod orbit;
pub mod profile;
pub mod state;
pub mod state_tides;

#[cfg(test)]
mod robustness_tests;

pub use crate::physics::gravity::GravityModel;
pub use error::{RateError, RateErrorKind};
pub use frequency::{frequency_offset, FrequencyOffset};
pub use ground::{ground_site_rate, GroundHeight, GroundSite, HeightReference};
pub use lunar::{lunar_site_rate, LunarSite};
pub use orbit::{orbit_rate, Anomaly, KeplerianOrbit, OrbitRate, PeriodicTerm};
pub use state::{state_rate, Frame, StateRate, StateVector};
pub use state_tides::state_rate_with_tides;

use crate::physics::constants::{L_G, MICROSECONDS_PER_DAY, SPEED_OF_LIGHT_SQUARED_M2_S2};
use crate::physics::gravity::{dot, earth_potential_m2_s2, position_about_axis_m};
use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// The coordinate time a rate is measured against.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum RateReference {
        /// Terrestrial Time: a clock on the geoid has rate 0.
        Tt = "TT",
        /// Geocentric Coordinate Time.
        Tcg = "TCG",
    }
}

/// The model note of every rate answer: the order of the model and what [`RateParts::total`]
/// leaves out (see the module notes).
pub const FIRST_ORDER_NOTE: &str = "first post-Newtonian order, d(tau)/dt - 1 = -(v^2/2 + U)/c^2 (+ L_G against TT), IERS Conventions (2010) eq. 10.6; total = sr + gr, the 1/(1 - L_G) factor and 1/c^4 terms (about 1e-18) are not included";

/// A fractional rate offset d(tau)/d(t) - 1 split into its velocity and gravity parts.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct RateParts {
    /// The reference time scale t.
    pub reference: RateReference,
    /// Velocity ("special-relativistic") part, -v^2/(2 c^2); dimensionless, never positive.
    pub sr: f64,
    /// Gravity part: -U/c^2 (TCG) or L_G - U/c^2 (TT); dimensionless.
    pub gr: f64,
}

impl RateParts {
    /// Builds the parts from the squared inertial speed and the Newtonian potential U
    /// (IERS Conventions (2010) eq. 10.6; L_G from IAU 2000 Resolution B1.9).
    pub fn from_speed_and_potential(
        reference: RateReference,
        speed_squared_m2_s2: f64,
        potential_m2_s2: f64,
    ) -> Self {
        let sr = -0.5 * speed_squared_m2_s2 / SPEED_OF_LIGHT_SQUARED_M2_S2;
        let gr_tcg = -potential_m2_s2 / SPEED_OF_LIGHT_SQUARED_M2_S2;
        let gr = match reference {
            RateReference::Tcg => gr_tcg,
            RateReference::Tt => L_G + gr_tcg,
        };
        Self { reference, sr, gr }
    }

    /// First-order total `sr + gr` (fractional). See the module notes on 1/(1 - L_G).
    pub fn total(&self) -> f64 {
        self.sr + self.gr
    }

    /// Exact quotient of the first post-Newtonian metric: `(sr + gr)/(1 - L_G)` relative to TT,
    /// `sr + gr` relative to TCG (IERS Conventions (2010) eq. 10.1 and 10.6).
    pub fn total_exact(&self) -> f64 {
        match self.reference {
            RateReference::Tcg => self.total(),
            RateReference::Tt => self.total() / (1.0 - L_G),
        }
    }

    /// The parts in microseconds per day (fractional * 86 400e6).
    pub fn to_microseconds_per_day(&self) -> MicrosecondsPerDay {
        MicrosecondsPerDay {
            sr: fractional_to_microseconds_per_day(self.sr),
            gr: fractional_to_microseconds_per_day(self.gr),
            total: fractional_to_microseconds_per_day(self.total()),
        }
    }
}

/// Rate parts expressed as microseconds gained per day of the reference scale.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct MicrosecondsPerDay {
    /// Velocity part, us/day.
    pub sr: f64,
    /// Gravity part, us/day.
    pub gr: f64,
    /// Total, us/day.
    pub total: f64,
}

/// The model note of [`inertial_rate_function`] with [`GravityModel::J2`].
pub const INERTIAL_J2_NOTE: &str = "J2 potential with the IERS Conventions (2010) GM, J2 and a_E";

/// The model note of [`inertial_rate_function`] with [`GravityModel::Grs80`].
pub const INERTIAL_GRS80_NOTE: &str = "GRS80 normal field in closed form (every zonal term of the level ellipsoid; Heiskanen & Moritz (1967) eq. 2-126, Moritz (2000)) with the GRS80 GM 3.986005e14, 1.5e-9 above the IERS Conventions (2010) GM (about 1e-16 of rate near the Earth)";

/// The model note of the pole of the zonal fields for tracks (J2 and GRS80).
pub const TRACK_POLE_NOTE: &str = "the zonal field is taken about the Celestial Intermediate Pole at the track's middle epoch (IAU 2006/2000A, IERS Conventions (2010) ch. 5; without dX, dY), about 0.15 deg from the GCRS z axis in 2026, for GCRS tracks and for Earth-fixed tracks after their rotation into the GCRS (which brings polar motion in); its motion over a track of days changes the rate by below 1e-18";

/// The model note of an inertial rate with `model`, if it has one (J2 or GRS80).
pub fn inertial_model_note(model: GravityModel) -> Option<&'static str> {
    match model {
        GravityModel::PointMass | GravityModel::Egm2008 => None,
        GravityModel::J2 | GravityModel::J2SunMoon => Some(INERTIAL_J2_NOTE),
        GravityModel::Grs80 => Some(INERTIAL_GRS80_NOTE),
    }
}

/// The rate function of a clock at an inertial geocentric state, for `reference` and `model`:
/// `rate(position_m, velocity_m_s)` gives the (velocity, gravity) parts of d(tau)/dt - 1, i.e.
/// `-v^2/(2c^2)` and `-U/c^2` (+ L_G against TT), IERS Conventions (2010) eq. 10.6 through
/// [`RateParts::from_speed_and_potential`]. A position where the potential is undefined (not
/// finite, at the geocentre) gives a NaN gravity part, which the integrator's callers refuse.
/// What the proper-time integrators take.
pub fn inertial_rate_function(
    reference: RateReference,
    model: GravityModel,
) -> impl Fn(&[f64; 3], &[f64; 3]) -> (f64, f64) + Copy {
    inertial_rate_function_about_axis(reference, model, [0.0, 0.0, 1.0])
}

/// [`inertial_rate_function`] with the Earth's figure axis along `axis_unit` (a unit vector in
/// the positions' frame; the CIP for GCRS tracks) instead of the frame's z axis: the zonal
/// fields are evaluated at [`position_about_axis_m`].
pub fn inertial_rate_function_about_axis(
    reference: RateReference,
    model: GravityModel,
    axis_unit: [f64; 3],
) -> impl Fn(&[f64; 3], &[f64; 3]) -> (f64, f64) + Copy {
    move |position_m, velocity_m_s| {
        let about_axis_m = position_about_axis_m(*position_m, axis_unit);
        let potential_m2_s2 = earth_potential_m2_s2(model, about_axis_m).unwrap_or(f64::NAN);
        let parts = RateParts::from_speed_and_potential(
            reference,
            dot(*velocity_m_s, *velocity_m_s),
            potential_m2_s2,
        );
        (parts.sr, parts.gr)
    }
}

/// Converts a fractional rate to microseconds per day (86 400 s/day, 1e6 us/s).
pub fn fractional_to_microseconds_per_day(fractional: f64) -> f64 {
    fractional * MICROSECONDS_PER_DAY
}

/// Converts a fractional rate to nanoseconds per day (86 400 s/day, 1e9 ns/s).
pub fn fractional_to_nanoseconds_per_day(fractional: f64) -> f64 {
    fractional * MICROSECONDS_PER_DAY * 1.0e3
}

/// How fast clock A runs relative to clock B, to first order: y_A - y_B, dimensionless
/// (positive when A gains on B).
///
/// Inputs: the rates of A and B against the same reference (TT or TCG). The exact ratio of the
/// two proper-time rates is (1 + y_A)/(1 + y_B) - 1 = (y_A - y_B)/(1 + y_B); the first-order
/// difference returned here departs from it by y_B (y_A - y_B), below 1e-18 for clocks near the
/// Earth (|y| of order 1e-9), the order of the terms the first post-Newtonian model neglects.
/// The reference drops out (L_G cancels), which is why both must use the same one.
///
/// Errors: the two rates use different references (`reference`).
/// Reference: IERS Conventions (2010) ch. 10 eq. 10.6 applied to each clock.
pub fn rate_difference(a: &RateParts, b: &RateParts) -> Result<f64, RateError> {
    if a.reference != b.reference {
        return Err(RateError::new(
            "reference",
            "both rates must be relative to the same reference (TT or TCG)",
        ));
    }
    Ok(a.total() - b.total())
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::physics::constants::W0_M2_S2;

    #[test]
    fn l_g_equals_w0_over_c_squared() {
        // IAU 2000 Resolution B1.9 / IERS Conventions (2010) table 1.1: L_G = W0/c^2.
        assert!((W0_M2_S2 / SPEED_OF_LIGHT_SQUARED_M2_S2 - L_G).abs() < 1e-19);
    }

    #[test]
    fn tt_and_tcg_differ_by_l_g_and_exact_total_by_the_factor() {
        // IERS Conventions (2010) eq. 10.1: d(TT)/d(TCG) = 1 - L_G.
        let tcg = RateParts::from_speed_and_potential(RateReference::Tcg, 1.5e7, 4.0e7);
        let tt = RateParts::from_speed_and_potential(RateReference::Tt, 1.5e7, 4.0e7);
        assert_eq!(tcg.sr, tt.sr);
        assert!((tt.gr - tcg.gr - L_G).abs() < 1e-24);
        // Exact: (1 + total_tcg)/(1 - L_G) - 1 = (total_tcg + L_G)/(1 - L_G), so the exact total
        // exceeds the first-order one by L_G * total / (1 - L_G).
        let excess = tt.total_exact() - tt.total();
        assert!(
            (excess - L_G * tt.total() / (1.0 - L_G)).abs() < 1e-25,
            "{excess:e}"
        );
        assert_eq!(tcg.total_exact(), tcg.total());
    }

    #[test]
    fn microseconds_per_day() {
        // 1e-10 fractional = 8.64 us/day = 8640 ns/day (86 400 s/day; common practice).
        assert!((fractional_to_microseconds_per_day(1e-10) - 8.64).abs() < 1e-12);
        assert!((fractional_to_nanoseconds_per_day(1e-10) - 8640.0).abs() < 1e-9);
    }

    #[test]
    fn difference_is_reference_free_and_needs_one_reference() {
        // IERS Conventions (2010) eq. 10.6: L_G cancels in y_A - y_B.
        let parts = |reference, v2, u| RateParts::from_speed_and_potential(reference, v2, u);
        let tt = rate_difference(
            &parts(RateReference::Tt, 1.5e7, 1.5e7),
            &parts(RateReference::Tt, 2.0e5, 6.26e7),
        )
        .unwrap();
        let tcg = rate_difference(
            &parts(RateReference::Tcg, 1.5e7, 1.5e7),
            &parts(RateReference::Tcg, 2.0e5, 6.26e7),
        )
        .unwrap();
        assert!((tt - tcg).abs() < 1e-24, "{tt:e} {tcg:e}");
        let mixed = rate_difference(
            &parts(RateReference::Tt, 1.5e7, 1.5e7),
            &parts(RateReference::Tcg, 1.5e7, 1.5e7),
        );
        assert_eq!(mixed.unwrap_err().field, "reference");
    }
}
