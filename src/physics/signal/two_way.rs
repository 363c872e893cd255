//! Sagnac correction of a two-way satellite time transfer through a geostationary satellite.

use crate::physics::constants::{GEOSTATIONARY_RADIUS_M, MAX_GEOCENTRIC_DISTANCE_M};
use crate::physics::geodesy::{geodetic_to_ecef_m, is_deep_inside_earth};
use crate::physics::rate::error::{require_finite, require_longitude_deg};
use crate::physics::readable::readable;
use crate::physics::signal::error::{SignalError, SignalErrorKind};
use crate::physics::signal::formulas::{elevation_deg, sagnac_rotating_frame_s};

/// A ground station: GRS80 geodetic coordinates.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Station {
    /// Geodetic latitude, degrees in [-90, 90].
    pub latitude_deg: f64,
    /// Longitude, degrees east.
    pub longitude_deg: f64,
    /// Height above the GRS80 ellipsoid, m, in [-11 km, 1e8 m].
    pub height_m: f64,
}

/// Two stations and a satellite fixed above the equator.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TwoWayLink {
    /// Station A.
    pub station_a: Station,
    /// Station B.
    pub station_b: Station,
    /// Longitude of the sub-satellite point, degrees east.
    pub satellite_longitude_deg: f64,
    /// Geocentric distance of the satellite, m (geostationary: [`GEOSTATIONARY_RADIUS_M`]).
    pub satellite_radius_m: f64,
}

impl TwoWayLink {
    /// A link through a geostationary satellite (radius 42 164 172 m).
    pub fn geostationary(station_a: Station, station_b: Station, longitude_deg: f64) -> Self {
        Self {
            station_a,
            station_b,
            satellite_longitude_deg: longitude_deg,
            satellite_radius_m: GEOSTATIONARY_RADIUS_M,
        }
    }
}

/// The Sagnac terms of a two-way link.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TwoWaySagnac {
    /// Sagnac term of the uplink from station A to the satellite, 2 omega_E A_A / c^2 with A_A
    /// the signed equatorial-projected area of the triangle geocentre - A - satellite, s. The
    /// downlink satellite -> A has the opposite sign.
    pub leg_a_s: f64,
    /// The same for station B, s.
    pub leg_b_s: f64,
    /// `leg_a_s - leg_b_s`, s: the Sagnac term of the path A -> satellite -> B, and the
    /// correction to add to (TI(A) - TI(B))/2 to obtain clock A - clock B (see [`two_way_sagnac`]).
    pub two_way_s: f64,
    /// Elevation of the satellite seen from A, degrees.
    pub elevation_a_deg: f64,
    /// Elevation of the satellite seen from B, degrees.
    pub elevation_b_deg: f64,
    /// Earth-fixed position of the satellite, m.
    pub satellite_position_m: [f64; 3],
}

/// Sagnac correction of a two-way satellite time transfer between stations A and B through a
/// satellite fixed in the Earth-fixed frame above the equator.
///
/// Each leg is 2 omega_E A / c^2 (ITU-R TF.1153, Annex 1, Sagnac-effect correction), A the
/// signed area of the equatorial projection of the triangle geocentre - station - satellite,
/// positive when station -> satellite runs eastward ([`sagnac_rotating_frame_s`]).
///
/// Sign convention (derived here from the one-way rule of IS-GPS-200 20.3.3.4.3.3.2): let
/// TI(A) be the reading of clock A when B's signal arrives minus its reading when A sent its
/// own, and TI(B) likewise. The signal A -> S -> B takes (path)/c + leg_a - leg_b and the signal
/// B -> S -> A takes (path)/c + leg_b - leg_a, so with reciprocal paths
/// `clock A - clock B = (TI(A) - TI(B))/2 + two_way_s`, `two_way_s = leg_a_s - leg_b_s`.
/// It vanishes when the equatorial projection of B - A is parallel to the satellite's position
/// (e.g. both stations on the sub-satellite meridian, whatever their latitudes); it grows with
/// the stations' separation in longitude: for two stations symmetric about the sub-satellite
/// point it is 2 leg_a_s, not 0.
///
/// Errors (`code`, `field`): `invalid_value` for a bad latitude, longitude or height
/// (`station_a.latitude_deg`, ...), `satellite_longitude_deg` or `satellite_radius_m` (not
/// finite, inside the Earth or beyond 1.5e9 m); `not_visible` when the satellite is below a
/// station's horizon (`station_a` or `station_b`).
pub fn two_way_sagnac(link: &TwoWayLink) -> Result<TwoWaySagnac, SignalError> {
    require_longitude_deg("satellite_longitude_deg", link.satellite_longitude_deg)
        .map_err(|e| SignalError::new(SignalErrorKind::InvalidValue, e.field, e.message))?;
    let radius_m = require_finite("satellite_radius_m", link.satellite_radius_m)
        .map_err(|e| SignalError::new(SignalErrorKind::InvalidValue, e.field, e.message))?;
    let (sin_lon, cos_lon) = link.satellite_longitude_deg.to_radians().sin_cos();
    let satellite_m = [radius_m * cos_lon, radius_m * sin_lon, 0.0];
    if radius_m <= 0.0 || is_deep_inside_earth(satellite_m) || radius_m > MAX_GEOCENTRIC_DISTANCE_M
    {
        return Err(SignalError::new(
            SignalErrorKind::InvalidValue,
            "satellite_radius_m",
            format!(
                "must put the satellite above the Earth and within {MAX_GEOCENTRIC_DISTANCE_M} m of the geocentre, got {radius_m}", radius_m = readable(radius_m)
            ),
        ));
    }
    let (station_a_m, elevation_a_deg) = station_view("station_a", &link.station_a, satellite_m)?;
    let (station_b_m, elevation_b_deg) = station_view("station_b", &link.station_b, satellite_m)?;
    let leg_a_s = sagnac_rotating_frame_s(station_a_m, satellite_m);
    let leg_b_s = sagnac_rotating_frame_s(station_b_m, satellite_m);
    Ok(TwoWaySagnac {
        leg_a_s,
        leg_b_s,
        two_way_s: leg_a_s - leg_b_s,
        elevation_a_deg,
        elevation_b_deg,
        satellite_position_m: satellite_m,
    })
}

/// Earth-fixed position of a station and the satellite's elevation there; an error when the
/// satellite is below the horizon.
fn station_view(
    owner: &str,
    station: &Station,
    satellite_m: [f64; 3],
) -> Result<([f64; 3], f64), SignalError> {
    let station_m = geodetic_to_ecef_m(
        station.latitude_deg,
        station.longitude_deg,
        station.height_m,
    )
    .map_err(|e| SignalError::from_rate(owner, e))?;
    let elevation = elevation_deg(
        station.latitude_deg,
        station.longitude_deg,
        station_m,
        satellite_m,
    );
    match elevation {
        Some(elevation) if elevation >= 0.0 => Ok((station_m, elevation)),
        _ => Err(SignalError::new(
            SignalErrorKind::NotVisible,
            owner,
            format!(
                "the satellite is below the station's horizon (elevation {:.2} deg)",
                elevation.unwrap_or(f64::NAN)
            ),
        )),
    }
}

#[cfg(test)]
#[path = "two_way_tests.rs"]
mod tests;
