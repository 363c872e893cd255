//! The rate of a clock fixed on the Moon at one instant, from the real lunar orbit (DE440),
//! the Moon's orientation (IAU, [`super::orientation`]) and its degree-2 field
//! ([`super::gravity`]).
//!
//! Two frames, first post-Newtonian order:
//!
//! * **Against TCL** (the Lunar Celestial Reference System, IAU 2024 Resolution II; metric of
//!   IAU 2000 Resolution B1.3 with the Moon for the Earth, IERS Conventions (2010) eq. 10.6
//!   transposed): d(tau)/d(TCL) = 1 - (v_s^2/2 + U_M(s) + w_E(s) + w_S(s))/c^2, with s the
//!   site relative to the Moon's centre, v_s = d s/dt its velocity from the Moon's rotation
//!   (about 4.6 m/s at the equator), U_M the lunar field and w_E, w_S the tidal potentials of
//!   the Earth and the Sun about the Moon's centre (the same tidal function as the Earth's
//!   clocks, [`crate::physics::gravity::tidal_potential_m2_s2`]). Against TL, + L_L
//!   ([`crate::physics::time::lunar::L_L`]; TL is a proposal).
//! * **Against TT and TCG** (the geocentric metric of IAU 2000 Resolution B1.3, in which TT and
//!   TCG are defined; IERS Conventions (2010) eq. 10.6): d(tau)/d(TCG) = 1 - (v^2/2 + U_E(x) +
//!   w_M(x) + w_S(x))/c^2, x = x_M + s and v = v_M + v_s geocentric, U_E = GM_E/|x| (the Earth's
//!   J2 changes it at the Moon by below 1 m^2/s^2), w_M the Moon's own potential at the site
//!   minus its value and gradient at the geocentre, w_S the Sun's tide; + L_G against TT. This
//!   is the rate of the lunar clock as an Earth station compares it (the comparison of
//!   Ashby & Patla 2024 and of Turyshev et al. 2024).
//!
//! **The coordinate-simultaneity term.** Going from TT to TCL through the scale relations at
//! the two centres (TT -> TDB -> TCB -> TCL, as the conversions do) adds the derivative of the
//! terms v . (x - x_centre)/c^2 of the two transformations (barycentric simultaneity against
//! geocentric): about 126 us monthly in TCL - TDB, tens of us/day in rate. It is a property of
//! the coordinates, not of the clock, and is kept apart: [`tl_minus_tt_at_centres_s`] gives the
//! scales' TL - TT, and its rate minus the clocks' TL-against-TT rate is reported separately.
//!
//! Neglected: the 1/c^4 terms (about 1e-18 here), the planets' tides at the Moon (Venus at its
//! closest about 1 m^2/s^2, 1e-17), the Earth's J2 at the Moon (below 1 m^2/s^2).

use super::gravity::moon_potential_m2_s2;
use super::orientation::{moon_orientation, selenographic_to_body_fixed_m};
use crate::physics::constants::{GM_EARTH_M3_S2, SPEED_OF_LIGHT_SQUARED_M2_S2, T0_TO_J2000_ATTOS};
use crate::physics::gravity::{dot, norm, tidal_potential_m2_s2};
use crate::physics::rate::lunar::{lunar_site_radius_m, LunarSite};
use crate::physics::rate::{RateError, RateErrorKind, RateParts, RateReference};
use crate::physics::solar_system::gm::{GM_MOON_M3_S2, GM_SUN_M3_S2};
use crate::physics::solar_system::{Body, Ephemeris, EphemerisError};
use crate::physics::time::convert::tcb_minus_tdb_s;
use crate::physics::time::error::TimeError;
use crate::physics::time::instant::{seconds_f64_to_attos, ATTOS_PER_SECOND};
use crate::physics::time::lunar::{tcb_minus_tcl_s, tl_minus_tcl_s, L_L, SPAN_TEXT};
use crate::physics::time::tdb_ephemeris::tdb_minus_tt_ephemeris_s;

/// What can go wrong with a lunar clock.
#[derive(Debug, Clone, PartialEq)]
pub enum LunarClockError {
    /// A bad site or span value (the field and kind say which).
    Input(RateError),
    /// An epoch outside the planetary ephemeris.
    Ephemeris(EphemerisError),
    /// An epoch outside the TCL representation.
    Time(TimeError),
}

impl From<RateError> for LunarClockError {
    fn from(error: RateError) -> Self {
        Self::Input(error)
    }
}
impl From<EphemerisError> for LunarClockError {
    fn from(error: EphemerisError) -> Self {
        Self::Ephemeris(error)
    }
}
impl From<TimeError> for LunarClockError {
    fn from(error: TimeError) -> Self {
        Self::Time(error)
    }
}

/// A fractional rate against a lunar scale split into its velocity and gravity parts.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarParts {
    /// -v_s^2/(2 c^2), v_s the site's selenocentric speed.
    pub sr: f64,
    /// The rest: -(U_M + tides)/c^2 (TCL), + L_L (TL).
    pub gr: f64,
}

impl LunarParts {
    /// First-order total sr + gr.
    pub fn total(&self) -> f64 {
        self.sr + self.gr
    }
}

/// The rates of one lunar clock at one instant.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarSiteRates {
    /// Against TCL (selenocentric frame).
    pub tcl: LunarParts,
    /// Against TL (a proposal): TCL's plus L_L.
    pub tl: LunarParts,
    /// Against TT (geocentric frame).
    pub tt: RateParts,
    /// Against TCG (geocentric frame).
    pub tcg: RateParts,
}

/// Where the site is: selenocentric position (m) and velocity (m/s), ICRF axes.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SiteState {
    /// Body-fixed position, m (IAU mean-Earth frame).
    pub body_fixed_m: [f64; 3],
    /// Position relative to the Moon's centre, ICRF axes, m.
    pub position_m: [f64; 3],
    /// Velocity relative to the Moon's centre, ICRF axes, m/s.
    pub velocity_m_s: [f64; 3],
}

/// Half-step of the central difference that gives the site's velocity, s: the relative error
/// (omega h)^2/6 = 4e-12 with omega = 2.66e-6 rad/s.
const VELOCITY_HALF_STEP_S: f64 = 60.0;

/// The selenocentric state of a body-fixed point at `tdb_s` (TDB seconds since J2000.0):
/// position R^T s, velocity by a central difference of R^T s over +-60 s (R the IAU rotation,
/// Archinal et al. 2018).
pub fn site_state(body_fixed_m: [f64; 3], tdb_s: f64) -> SiteState {
    let at = |t: f64| moon_orientation(t).body_fixed_to_icrf(body_fixed_m);
    let (after, before) = (
        at(tdb_s + VELOCITY_HALF_STEP_S),
        at(tdb_s - VELOCITY_HALF_STEP_S),
    );
    SiteState {
        body_fixed_m,
        position_m: at(tdb_s),
        velocity_m_s: [0, 1, 2].map(|k| (after[k] - before[k]) / (2.0 * VELOCITY_HALF_STEP_S)),
    }
}

/// The body-fixed position of a checked site, m (errors name the site's fields).
pub fn site_body_fixed_m(site: &LunarSite) -> Result<[f64; 3], RateError> {
    let radius_m = lunar_site_radius_m(site)?;
    Ok(selenographic_to_body_fixed_m(
        site.latitude_deg,
        site.longitude_deg,
        radius_m,
    ))
}

/// The rates of a clock at the body-fixed point `body_fixed_m` (checked) at `tdb_s`, with the
/// Earth and the Sun from `ephemeris`. See the module notes for the formulas.
pub fn rates_at(
    body_fixed_m: [f64; 3],
    tdb_s: f64,
    ephemeris: &Ephemeris,
) -> Result<LunarSiteRates, LunarClockError> {
    let [earth, sun] = ephemeris.states_m(
        [(Body::Earth, Body::Moon), (Body::Sun, Body::Moon)],
        seconds_f64_to_attos(tdb_s),
    )?;
    let site = site_state(body_fixed_m, tdb_s);
    let c2 = SPEED_OF_LIGHT_SQUARED_M2_S2;
    let moon_own_m2_s2 = moon_potential_m2_s2(body_fixed_m).ok_or_else(|| {
        RateError::new("height_m", "the site must not be at the Moon's centre")
            .with_kind(RateErrorKind::BelowSurface)
    })?;
    // Selenocentric: the Earth's and the Sun's tides about the Moon's centre.
    let lunar_tides_m2_s2 =
        tidal_potential_m2_s2(GM_EARTH_M3_S2, earth.position_m, site.position_m)?
            + tidal_potential_m2_s2(GM_SUN_M3_S2, sun.position_m, site.position_m)?;
    let tcl = LunarParts {
        sr: -0.5 * dot(site.velocity_m_s, site.velocity_m_s) / c2,
        gr: -(moon_own_m2_s2 + lunar_tides_m2_s2) / c2,
    };
    // Geocentric: the site, the Moon and the Sun about the Earth's centre.
    let moon_geo_m = earth.position_m.map(|x| -x);
    let moon_geo_m_s = earth.velocity_m_s.map(|v| -v);
    let x = [0, 1, 2].map(|k| moon_geo_m[k] + site.position_m[k]);
    let v = [0, 1, 2].map(|k| moon_geo_m_s[k] + site.velocity_m_s[k]);
    let sun_geo_m = [0, 1, 2].map(|k| sun.position_m[k] + moon_geo_m[k]);
    let distance_m = norm(moon_geo_m);
    let moon_tide_m2_s2 = moon_own_m2_s2
        - GM_MOON_M3_S2 / distance_m
        - GM_MOON_M3_S2 * dot(x, moon_geo_m) / (distance_m * distance_m * distance_m);
    let potential_m2_s2 = GM_EARTH_M3_S2 / norm(x)
        + moon_tide_m2_s2
        + tidal_potential_m2_s2(GM_SUN_M3_S2, sun_geo_m, x)?;
    let speed2 = dot(v, v);
    Ok(LunarSiteRates {
        tcl,
        tl: LunarParts {
            sr: tcl.sr,
            gr: tcl.gr + L_L,
        },
        tt: RateParts::from_speed_and_potential(RateReference::Tt, speed2, potential_m2_s2),
        tcg: RateParts::from_speed_and_potential(RateReference::Tcg, speed2, potential_m2_s2),
    })
}

/// The rates of a clock at `site` at `tdb_s` (TDB seconds since J2000.0).
///
/// Reference: see the module notes (IAU 2000 Resolution B1.3 / IERS Conventions (2010)
/// eq. 10.6 in the geocentric frame and, with the Moon for the Earth, in the LCRS of IAU 2024
/// Resolution II; Archinal et al. 2018; Konopliv et al. 2013; DE440).
pub fn lunar_site_rates(
    site: &LunarSite,
    tdb_s: f64,
    ephemeris: &Ephemeris,
) -> Result<LunarSiteRates, LunarClockError> {
    let body_fixed_m = site_body_fixed_m(site)?;
    rates_at(body_fixed_m, tdb_s, ephemeris)
}

/// TL - TT (seconds) at the TDB instant `tdb_s`, through the scale relations at the centres:
/// TDB - TT from the DE440 integral at the geocentre, TCB - TDB of IAU 2006 Resolution B3,
/// TCB - TCL from the DE440 integral at the Moon's centre, TL - TCL = -L_L (TCL - T0); the
/// same relations as the conversions. An error naming the TCL span outside it.
pub fn tl_minus_tt_at_centres_s(tdb_s: f64) -> Result<f64, TimeError> {
    let outside = || {
        TimeError::OutsideLunarTimeSpan(format!(
            "the epoch lies outside the span of the TCL representation ({SPAN_TEXT})"
        ))
    };
    // TDB - TT at TT = TDB - (TDB - TT): two fixed-point steps (d(TDB - TT)/dTT is below
    // 3e-8), carrying the small difference itself (TT as a float near 1e9 s would round it to
    // 1e-7 s).
    let mut tdb_minus_tt = 0.0;
    for _ in 0..2 {
        tdb_minus_tt = tdb_minus_tt_ephemeris_s(tdb_s - tdb_minus_tt).ok_or_else(outside)?;
    }
    let tcb_minus_tdb = tcb_minus_tdb_s(seconds_f64_to_attos(tdb_s));
    let tcb_minus_tcl = tcb_minus_tcl_s(tdb_s).ok_or_else(outside)?;
    let tcl_since_t0_s =
        tdb_s + tcb_minus_tdb - tcb_minus_tcl + T0_TO_J2000_ATTOS as f64 / ATTOS_PER_SECOND as f64;
    Ok(tdb_minus_tt + tcb_minus_tdb - tcb_minus_tcl + tl_minus_tcl_s(tcl_since_t0_s))
}

/// The rate of TL against TT through the scale relations at the centres at `tdb_s`: the
/// central difference of [`tl_minus_tt_at_centres_s`] over +-300 s (truncation below 1e-16 for
/// the monthly 126 us term: h^2/6 |f'''| = 300^2/6 126e-6 (2.7e-6)^3).
pub fn tl_rate_against_tt_at_centres(tdb_s: f64) -> Result<f64, TimeError> {
    const H_S: f64 = 300.0;
    Ok(
        (tl_minus_tt_at_centres_s(tdb_s + H_S)? - tl_minus_tt_at_centres_s(tdb_s - H_S)?)
            / (2.0 * H_S),
    )
}

/// The model notes of the `de440_ephemeris` lunar-site model.
pub const LUNAR_EPHEMERIS_NOTES: [&str; 4] = [
    "lunar_site model de440_ephemeris: the Moon's orbit from DE440 (Park et al. 2021), its orientation from the IAU rotation model (Archinal et al. 2018, coefficients from memory; sub-Earth librations checked), the lunar field to degree 2 (GRAIL GL0660B J2 and C22, Konopliv et al. 2013, from memory), the Earth's and the Sun's tidal potentials at the site",
    "against TT and TCG: geocentric frame (IAU 2000 Resolution B1.3, IERS Conventions (2010) eq. 10.6), as an Earth station compares the clock; against TCL: selenocentric frame (IAU 2024 Resolution II, the same metric with the Moon for the Earth); against TL: TCL's plus L_L = 3.1398e-11 (TL is a proposal, Turyshev et al. arXiv:2406.16147)",
    "the coordinate-simultaneity term (TL - TT through the scale relations at the two centres minus the clocks' TL against TT; the v.x/c^2 parts of the transformations, about 126 us monthly) is a property of the coordinates, reported apart and never added to the clock",
    "left out: the 1/c^4 terms (about 1e-18), the planets' tides at the Moon (below 1e-17), lunar degree 3 and above and the topography-correlated field (up to a few 1e-15), the height above the 1737.4 km sphere rather than the selenoid",
];
