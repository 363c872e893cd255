//! The Moon's own potential for orbiting clocks: point mass plus the zonal J2 term about the
//! lunar pole, and the range of selenocentric positions the model takes.

use crate::physics::moon::gravity::{GL0660B_J2, GL0660B_REFERENCE_RADIUS_M};
use crate::physics::moon::orientation::moon_orientation;
use crate::physics::solar_system::gm::GM_MOON_M3_S2;

/// The farthest selenocentric distance taken, m: 60 000 km, just inside the Moon's Hill
/// sphere (a (m_M / 3 M_E)^(1/3) = 384 400 km x 0.16 = 61 500 km, common practice). Beyond it
/// the Earth's field is no longer a small tide about the Moon and the LCRS is not a sensible
/// frame for the clock.
pub const MAX_SELENOCENTRIC_DISTANCE_M: f64 = 6.0e7;

/// The direction of the Moon's north pole in ICRF axes at a TDB epoch.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarPole {
    /// Unit vector of the pole, ICRF axes.
    pub unit: [f64; 3],
}

impl LunarPole {
    /// The pole at `tdb_s` TDB seconds since J2000.0: alpha0 and delta0 of the IAU rotation
    /// model of the Moon (Archinal et al. 2018, Celest. Mech. Dyn. Astr. 130:22), the same
    /// model the lunar surface clocks use ([`moon_orientation`]), as a unit vector
    /// (cos delta0 cos alpha0, cos delta0 sin alpha0, sin delta0) in ICRF axes.
    pub fn at_tdb_s(tdb_s: f64) -> Self {
        let orientation = moon_orientation(tdb_s);
        let (sin_dec, cos_dec) = orientation.pole_dec_rad.sin_cos();
        let (sin_ra, cos_ra) = orientation.pole_ra_rad.sin_cos();
        Self {
            unit: [cos_dec * cos_ra, cos_dec * sin_ra, sin_dec],
        }
    }
}

/// The Moon's potential at selenocentric `position_m` (ICRF axes, m), m^2/s^2, positive (the
/// IERS sign convention of U): point mass and zonal J2,
///
/// U = GM_M / r [1 - J2 (R/r)^2 P2(sin phi)], P2(s) = (3 s^2 - 1)/2,
///
/// phi the selenocentric latitude from `pole` (the standard zonal expansion, e.g. Kaula,
/// Theory of Satellite Geodesy (1966) eq. 1.31 truncated at degree 2; sign with J2 = -C20).
/// GM_M of DE440 (Park et al. 2021). `j2` selects the J2 term (false: point mass only).
pub fn moon_zonal_potential_m2_s2(position_m: &[f64; 3], pole: &LunarPole, j2: bool) -> f64 {
    let r2 = position_m[0] * position_m[0]
        + position_m[1] * position_m[1]
        + position_m[2] * position_m[2];
    let r = r2.sqrt();
    let point = GM_MOON_M3_S2 / r;
    if !j2 {
        return point;
    }
    let z =
        position_m[0] * pole.unit[0] + position_m[1] * pole.unit[1] + position_m[2] * pole.unit[2];
    let sin2 = z * z / r2;
    point
        * (1.0
            - GL0660B_J2 * GL0660B_REFERENCE_RADIUS_M * GL0660B_REFERENCE_RADIUS_M / r2
                * 0.5
                * (3.0 * sin2 - 1.0))
}

/// Refuses a selenocentric distance (m) of an orbiting clock below the Moon's mean radius
/// (1 737 400 m, IAU WGCCRE, Archinal et al. 2018): (`below_surface`, message); or beyond
/// [`MAX_SELENOCENTRIC_DISTANCE_M`]: (`beyond_model_range`, message).
pub fn check_orbit_distance(radius_m: f64) -> Result<(), (&'static str, String)> {
    if radius_m < crate::physics::constants::MOON_MEAN_RADIUS_M {
        return Err((
            "below_surface",
            format!("the selenocentric distance is {radius_m:.1} m, below the Moon's mean radius (1 737 400 m); positions must be Moon-centred and in metres"),
        ));
    }
    if radius_m > MAX_SELENOCENTRIC_DISTANCE_M {
        return Err((
            "beyond_model_range",
            format!("the selenocentric distance is {radius_m:.4e} m, beyond 6e7 m (60 000 km, inside the Moon's Hill sphere of about 61 500 km), where the Earth's field is no longer a small tide about the Moon"),
        ));
    }
    Ok(())
}
