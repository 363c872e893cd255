//! Mean rate of a clock on the Moon's surface, relative to TT (or TCG), in the geocentric frame.

use crate::physics::constants::{
    EARTH_MOON_MEAN_DISTANCE_M, GM_EARTH_M3_S2, GM_MOON_M3_S2, MAX_DEPTH_BELOW_SURFACE_M,
    MOON_MEAN_RADIUS_M, MOON_ROTATION_RAD_S,
};
use crate::physics::gravity::{dot, point_mass_potential_m2_s2, tidal_potential_m2_s2};
use crate::physics::rate::error::{
    require_finite, require_latitude_deg, require_longitude_deg, RateError, RateErrorKind,
};
use crate::physics::rate::{RateParts, RateReference};
use crate::physics::readable::readable;

/// A clock fixed on the Moon.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarSite {
    /// Selenographic latitude, degrees in [-90, 90] (IAU mean-Earth/polar-axis system).
    pub latitude_deg: f64,
    /// Selenographic longitude, degrees east; 0 is the mean sub-Earth point.
    pub longitude_deg: f64,
    /// Height above the mean lunar sphere of radius 1737.4 km, m, in [-11 km, 100 km].
    pub height_m: f64,
}

/// Largest height above the mean lunar radius accepted for a site fixed to the Moon, m.
pub const MAX_LUNAR_SITE_HEIGHT_M: f64 = 100_000.0;

/// Checks a lunar site (latitude in [-90, 90] deg, |longitude| <= 1e6 deg, height in
/// [-11 km, 100 km] above the 1737.4 km sphere: the deepest lunar basin floor lies about 9 km
/// below it and the highest terrain about 11 km above, from memory; a clock above 100 km is in
/// orbit, not fixed to the Moon) and gives its distance from the Moon's centre, m. Errors name
/// `latitude_deg`, `longitude_deg` or `height_m`.
pub fn lunar_site_radius_m(site: &LunarSite) -> Result<f64, RateError> {
    require_latitude_deg("latitude_deg", site.latitude_deg)?;
    require_longitude_deg("longitude_deg", site.longitude_deg)?;
    let height_m = require_finite("height_m", site.height_m)?;
    if !(-MAX_DEPTH_BELOW_SURFACE_M..=MAX_LUNAR_SITE_HEIGHT_M).contains(&height_m) {
        return Err(RateError::new(
            "height_m",
            format!(
                "must lie in [-{MAX_DEPTH_BELOW_SURFACE_M}, {MAX_LUNAR_SITE_HEIGHT_M}] m above the mean lunar radius, got {height_m}", height_m = readable(height_m)
            ),
        )
        .with_kind(if height_m < 0.0 {
            RateErrorKind::BelowSurface
        } else {
            RateErrorKind::BeyondModelRange
        }));
    }
    Ok(MOON_MEAN_RADIUS_M + height_m)
}

/// Geocentric position (m) and velocity (m/s) of a lunar site in the model below, on axes
/// x = Earth towards the Moon, y = along the Moon's orbital motion, z = orbit normal.
pub fn lunar_site_geocentric_state(site: &LunarSite) -> Result<([f64; 3], [f64; 3]), RateError> {
    let radius_m = lunar_site_radius_m(site)?;
    let (sin_lat, cos_lat) = site.latitude_deg.to_radians().sin_cos();
    let (sin_lon, cos_lon) = site.longitude_deg.to_radians().sin_cos();
    // Selenographic x points to the Earth (-x here), z is the spin axis (= orbit normal), so
    // selenographic y is -y here.
    let from_moon_m = [
        -radius_m * cos_lat * cos_lon,
        -radius_m * cos_lat * sin_lon,
        radius_m * sin_lat,
    ];
    let position_m = [
        EARTH_MOON_MEAN_DISTANCE_M + from_moon_m[0],
        from_moon_m[1],
        from_moon_m[2],
    ];
    let orbital_speed_m_s = ((GM_EARTH_M3_S2 + GM_MOON_M3_S2) / EARTH_MOON_MEAN_DISTANCE_M).sqrt();
    let velocity_m_s = [
        -MOON_ROTATION_RAD_S * from_moon_m[1],
        orbital_speed_m_s + MOON_ROTATION_RAD_S * from_moon_m[0],
        0.0,
    ];
    Ok((position_m, velocity_m_s))
}

/// The model notes of [`lunar_site_rate`].
pub const LUNAR_NOTES: [&str; 2] = [
    "lunar_site model circular_orbit (give `epoch` or `span` for the de440_ephemeris model): mean rate in the geocentric frame, the Moon on a circular orbit of 384 400 km at the two-body speed, rotating synchronously; the monthly periodic term of the lunar eccentricity (about 0.47 us amplitude) is not included",
    "the Moon's own potential as a point mass (GM of JPL DE430) through its geocentric tidal part; the Sun's tidal potential (GM_Sun D^2/d^3 P2 with D the Earth-Moon distance: a mean of +1.6e-14, 0.0014 us/day, varying over a month between about -3.3e-14 and +6.5e-14, -0.003 to +0.006 us/day), the lunar J2 (about 6e-15), librations and the tilts of the lunar axis and orbit are neglected",
];
/// The model note of [`lunar_site_rate`] when J2 was asked for: the Earth is a point mass there.
pub const LUNAR_EARTH_J2_NOTE: &str = "the Earth's J2 (or GRS80 normal field) changes the potential at the Moon by less than 1 m^2/s^2 (below 1e-17 of rate): a point-mass Earth is used";

/// Mean fractional rate of a clock fixed on the Moon's surface.
///
/// Model (first post-Newtonian, geocentric frame, IERS Conventions (2010) ch. 10 eq. 10.6):
/// d(tau)/d(TCG) = 1 - (v^2/2 + U_E(x) + U_tidal,Moon(x))/c^2, then / (1 - L_G) for TT, where
/// * the Moon moves on a circular orbit of radius D = 384 400 km at the two-body speed
///   sqrt((GM_E + GM_Moon)/D) = 1.0245 km/s (the mean rate of an eccentric orbit is the same at
///   first order; the eccentricity 0.055 adds a monthly periodic term of about 0.47 us
///   amplitude, not included);
/// * the Moon rotates synchronously about the orbit normal at the IAU rate 13.17635815 deg/day
///   (Archinal et al. 2011), so the site adds omega_M x s to the orbital velocity (about
///   4.6 m/s at the equator);
/// * U_E = GM_E/|x| (point mass: the Earth's J2 at the Moon is below 1 m^2/s^2);
/// * the Moon's potential enters through its geocentric tidal part,
///   GM_M/|x - x_M| - GM_M/D - x . grad(GM_M/|x - x_M|) at the geocentre: GM_M/R at the site
///   (2.82e6 m^2/s^2, R = 1737.4 km plus the height; point mass, the lunar J2 changes it by
///   about 6e-15 of rate) minus 2 GM_M/D for the geocentre's share (about 2.8e-13, 0.025
///   us/day).
///
/// Neglected: the Sun's tidal potential in the geocentric frame (GM_Sun D^2/d^3 P2(cos theta):
/// mean +1.6e-14, between about -3.3e-14 and +6.5e-14 over a month, i.e. -0.003 to +0.006
/// us/day) and the solar perturbation of
/// the lunar orbit; the tilts of the lunar spin axis (1.5 deg) and orbit (5.1 deg); librations.
///
/// Reference: IERS Conventions (2010) ch. 10 eq. 10.6; Ashby & Patla (2024), Astron. J. 168,
/// 112 (about +56 us/day against TT; from memory).
pub fn lunar_site_rate(site: &LunarSite, reference: RateReference) -> Result<RateParts, RateError> {
    let (position_m, velocity_m_s) = lunar_site_geocentric_state(site)?;
    let moon_m = [EARTH_MOON_MEAN_DISTANCE_M, 0.0, 0.0];
    let earth_m2_s2 = point_mass_potential_m2_s2(GM_EARTH_M3_S2, position_m)?;
    let moon_tidal_m2_s2 = tidal_potential_m2_s2(GM_MOON_M3_S2, moon_m, position_m)?;
    Ok(RateParts::from_speed_and_potential(
        reference,
        dot(velocity_m_s, velocity_m_s),
        earth_m2_s2 + moon_tidal_m2_s2,
    ))
}

#[cfg(test)]
#[path = "lunar_tests.rs"]
mod tests;
