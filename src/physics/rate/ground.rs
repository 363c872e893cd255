//! Rate of a clock fixed on the rotating Earth.

use crate::physics::constants::{EARTH_ROTATION_RAD_S, L_G, SPEED_OF_LIGHT_SQUARED_M2_S2};
use crate::physics::earth::geopotential::egm2008;
use crate::physics::earth::normal_field::grs80_normal_potential_drop_at_m2_s2;
use crate::physics::geodesy::geodetic_to_ecef_m;
use crate::physics::gravity::{centrifugal_potential_m2_s2, earth_potential_m2_s2, GravityModel};
use crate::physics::rate::error::{RateError, RateErrorKind};
use crate::physics::rate::{RateParts, RateReference};
use crate::physics::vocabulary::vocabulary;

/// How the height of a ground site is given.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum GroundHeight {
    /// Height above the GRS80 ellipsoid, m: the rate comes from the model potential W(x).
    EllipsoidalM(f64),
    /// Height above the geoid (orthometric height), m: W0 - W = the GRS80 normal-potential drop
    /// over the height (closed form); the gravity model is not used.
    AboveGeoidM(f64),
}

vocabulary! {
    /// What the height of a ground site is measured from.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum HeightReference {
        /// The GRS80 ellipsoid ([`GroundHeight::EllipsoidalM`]).
        Ellipsoid = "ellipsoid",
        /// The geoid, i.e. orthometric height ([`GroundHeight::AboveGeoidM`]).
        Geoid = "geoid",
    }
}

impl HeightReference {
    /// A height of `height_m` metres above this reference.
    pub fn height(self, height_m: f64) -> GroundHeight {
        match self {
            Self::Ellipsoid => GroundHeight::EllipsoidalM(height_m),
            Self::Geoid => GroundHeight::AboveGeoidM(height_m),
        }
    }
}

/// A clock at rest on the rotating Earth.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct GroundSite {
    /// Geodetic latitude (GRS80), degrees in [-90, 90].
    pub latitude_deg: f64,
    /// Longitude, degrees east (any finite value).
    pub longitude_deg: f64,
    /// Height, in [-11 km, 1e8 m].
    pub height: GroundHeight,
}

/// The model note of every [`ground_site_rate`].
pub const GROUND_NOTE: &str = "clock at rest on the Earth rotating at omega_E = 7.292115e-5 rad/s; tides and polar motion are not modelled; length-of-day variations change the rotation term by below 1e-19";

/// The model note of the height model [`ground_site_rate`] uses for `height_reference` and
/// `model` (the model is not used for a height above the geoid).
pub fn ground_height_note(height_reference: HeightReference, model: GravityModel) -> &'static str {
    match (height_reference, model) {
        (HeightReference::Geoid, _) => "height above the geoid: W0 - W from GRS80 normal gravity (Heiskanen & Moritz (1967) eq. 2-215), so a clock on the geoid has rate 0 against TT; gravity_model is not used",
        (HeightReference::Ellipsoid, GravityModel::Grs80) => "height above the GRS80 ellipsoid with the GRS80 normal field in closed form (Heiskanen & Moritz (1967) eq. 2-126, Moritz (2000)): W0 - W = U0 - U(x), the ellipsoid taken as the geoid (undulation N = 0), so a site on the ellipsoid has rate 0 against TT and the answer equals height_reference geoid at the same height; the real N, up to about +-100 m (about +-1.1e-14 per 100 m), is not in the model: egm2008 (the default for ellipsoidal heights) has it, or give height_reference geoid with the orthometric height. A normal field with no disturbing potential instead (T = 0) would add (W0 - U0)/c^2 = (62 636 856.0 - 62 636 860.850)/c^2 = -5.4e-17 (IERS Conventions (2010) table 1.1 W0; Moritz (2000) U0); TT's L_G c^2 = 62 636 856.0 m^2/s^2 is itself about 2.6 m^2/s^2 (2.9e-17) above the present best geoid potential 62 636 853.4 (IAG 2015 Resolution 1; from memory)",
        (HeightReference::Ellipsoid, GravityModel::J2) => "height above the GRS80 ellipsoid with a J2 Earth: within 1.8e-15 of W0 on the ellipsoid (the truncated J4 term); grs80 is the exact normal field; the geoid undulation (up to about +-100 m, +-1.1e-14) is in neither: egm2008 (the default for ellipsoidal heights) has it, or give height_reference geoid",
        (HeightReference::Ellipsoid, GravityModel::J2SunMoon) => "j2_sun_moon needs an epoch, which a ground site does not have: refused (give an ITRF state with its epoch for the Sun and Moon tides)",
        (HeightReference::Ellipsoid, GravityModel::Egm2008) => "height above the GRS80 ellipsoid with the EGM2008 geopotential to degree and order 120 (Pavlis et al. 2012, tide-free) and the centrifugal potential at the site's ITRS position: W0 - W with the real geoid undulation N (up to about +-100 m) in it. Left out: the field beyond degree 120 (geoid about 0.5 m rms, a few metres at most in mountains: about 5e-17 rms, 3e-16 at most, from memory of the EGM2008 degree-variance), the permanent and periodic tides (zero-tide and tide-free fields differ by up to 0.3 m^2/s^2, 3e-18), the height of the site itself against the real ground (topography between the site and the geoid is outside the model's validity below the surface, a few 1e-17). A clock on the geoid has rate (W0 - W_geoid)/c^2 = +2.9e-17 against TT: TT's L_G c^2 = 62 636 856.0 m^2/s^2 lies about 2.6 m^2/s^2 above the present best geoid potential 62 636 853.4 (IAG 2015 Resolution 1; from memory)",
        (HeightReference::Ellipsoid, GravityModel::PointMass) => "height above the GRS80 ellipsoid with a point-mass Earth: ignores the Earth's flattening, off by up to about 7e-13 on the ground; egm2008 (the default for ellipsoidal heights) is the real field",
    }
}

/// Fractional rate of a clock fixed on the rotating Earth.
///
/// Model: d(tau)/d(TT) = 1 + (W0 - W(x))/c^2 with W = U + omega_E^2 (x^2 + y^2)/2 the gravity plus
/// centrifugal potential (IERS Conventions (2010) ch. 10 eq. 10.6 with v = omega_E x r, and
/// L_G = W0/c^2, IAU 2000 Resolution B1.9). Split: `sr = -omega_E^2 (x^2 + y^2)/(2c^2)` (the
/// rotation speed), `gr = (W0 - U)/c^2` (TT) or `-U/c^2` (TCG).
///
/// * [`GroundHeight::EllipsoidalM`] with [`GravityModel::Grs80`]: x from
///   GRS80 geodetic coordinates and W0 - W = U0 - U(x), the GRS80 normal potential in closed
///   form (Heiskanen & Moritz 1967 eq. 2-126; Moritz 2000), the ellipsoid taken as the geoid
///   (N = 0): the same answer as [`GroundHeight::AboveGeoidM`] at the same height. A real clock
///   also sees the geoid undulation N, up to about +-100 m (about +-1.1e-14), which no
///   ellipsoidal model knows: for 1e-16 work give the height above the geoid instead.
/// * [`GroundHeight::EllipsoidalM`] with [`GravityModel::Egm2008`] (the API's default):
///   W = V(x) + Phi(x) with V
///   the EGM2008 geopotential to degree 120 at the site's ITRS position
///   ([`crate::physics::earth::geopotential`]): the real field, geoid undulation included.
/// * [`GroundHeight::EllipsoidalM`] with point mass or J2: U from `model` against W0. With J2
///   the model potential on the ellipsoid (h = 0) is within 1.8e-15 of W0 (measured: +6.7e-16
///   at the equator, -6.3e-16 at 45 deg, +1.7e-15 at the poles; the rest is the truncated J4
///   term, about 150 m^2/s^2 at the poles).
/// * [`GroundHeight::AboveGeoidM`]: W0 - W = U0 - U(phi, h), the drop of the GRS80 normal
///   potential in closed form from the ellipsoid to h above it (Heiskanen & Moritz 1967
///   eq. 2-126; exact at every accepted height, unlike the free-air series of eq. 2-215, which
///   is off by 3.6e-13 at 1000 km and diverges at geostationary heights), so a site on the
///   geoid has rate 0 against TT by definition of TT. The normal field stands in for the real
///   one between the geoid and the site (gravity anomalies, a few 1e-5 of g, change the drop
///   by about as much of itself near the ground). `model` is not used; `sr` is the
///   rotation speed at the point taken as h above the ellipsoid (the geoid undulation changes it
///   by under 5e-17) and `gr` is the rest of the total.
///
/// Errors name `latitude_deg`, `longitude_deg` or `height_m`.
pub fn ground_site_rate(
    site: &GroundSite,
    reference: RateReference,
    model: GravityModel,
) -> Result<RateParts, RateError> {
    if model == GravityModel::J2SunMoon {
        return Err(RateError::new(
            "gravity_model",
            "j2_sun_moon needs the clock's epoch (the Sun and the Moon move), which a ground site does not have: give an ITRF state with `epoch` for the tides, or grs80, j2 or point_mass here",
        )
        .with_kind(RateErrorKind::BeyondModelRange));
    }
    let height_m = match site.height {
        GroundHeight::EllipsoidalM(height_m) | GroundHeight::AboveGeoidM(height_m) => height_m,
    };
    let position_m = geodetic_to_ecef_m(site.latitude_deg, site.longitude_deg, height_m)?;
    let centrifugal_m2_s2 = centrifugal_potential_m2_s2(position_m)?;
    let speed_squared_m2_s2 = 2.0 * centrifugal_m2_s2;
    let potential_m2_s2 = match (site.height, model) {
        (
            GroundHeight::EllipsoidalM(_),
            GravityModel::PointMass | GravityModel::J2 | GravityModel::J2SunMoon,
        ) => earth_potential_m2_s2(model, position_m)?,
        (GroundHeight::EllipsoidalM(_), GravityModel::Egm2008) => {
            let model = egm2008().map_err(|e| {
                RateError::new(
                    "gravity_model",
                    format!("the built-in EGM2008 model cannot be read: {e}"),
                )
            })?;
            model.potential_m2_s2(position_m, model.max_degree)
        }
        (GroundHeight::EllipsoidalM(_), GravityModel::Grs80)
        | (GroundHeight::AboveGeoidM(_), _) => {
            let w0_m2_s2 = L_G * SPEED_OF_LIGHT_SQUARED_M2_S2;
            let drop_m2_s2 = grs80_normal_potential_drop_at_m2_s2(position_m)?;
            w0_m2_s2 - drop_m2_s2 - centrifugal_m2_s2
        }
    };
    Ok(RateParts::from_speed_and_potential(
        reference,
        speed_squared_m2_s2,
        potential_m2_s2,
    ))
}

/// Rotation speed of a point fixed on the Earth at axial distance rho, omega_E rho, in m/s
/// (IERS Conventions (2010) table 1.1 omega_E).
pub fn rotation_speed_m_s(axial_distance_m: f64) -> f64 {
    EARTH_ROTATION_RAD_S * axial_distance_m
}

#[cfg(test)]
#[path = "ground_tests.rs"]
mod tests;

#[cfg(test)]
#[path = "ground_grs80_tests.rs"]
mod grs80_tests;
