//! The Moon's own potential for orbiting clocks: point mass, the zonal J2 term about the lunar
//! pole, or the degree-2 field (J2 and C22) in the Moon's body-fixed axes; and the range of
//! selenocentric positions the model takes.

use crate::physics::gravity::dot;
use crate::physics::moon::gravity::{
    moon_potential_m2_s2, LunarGravityModel, GL0660B_J2, GL0660B_REFERENCE_RADIUS_M,
};
use crate::physics::moon::orientation::moon_orientation;
use crate::physics::solar_system::gm::GM_MOON_M3_S2;

/// The farthest selenocentric distance taken, m: 60 000 km, just inside the Moon's Hill
/// sphere (a (m_M / 3 M_E)^(1/3) = 384 400 km x 0.16 = 61 500 km, common practice). Beyond it
/// the Earth's field is no longer a small tide about the Moon and the LCRS is not a sensible
/// frame for the clock.
pub const MAX_SELENOCENTRIC_DISTANCE_M: f64 = 6.0e7;

/// The Moon's body-fixed axes in ICRF axes at a TDB epoch.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarAxes {
    /// Unit vector of the north pole (body-fixed z).
    pub pole: [f64; 3],
    /// Unit vector of the prime meridian on the equator (body-fixed x).
    pub x_axis: [f64; 3],
    /// Body-fixed y (90 deg east on the equator).
    pub y_axis: [f64; 3],
}

impl LunarAxes {
    /// The axes at `tdb_s` TDB seconds since J2000.0: the rows of the ICRF-to-body-fixed
    /// rotation of the IAU rotation model of the Moon (Archinal et al. 2018, Celest. Mech. Dyn.
    /// Astr. 130:22), the same model the lunar surface clocks use ([`moon_orientation`]); the
    /// pole is (cos delta0 cos alpha0, cos delta0 sin alpha0, sin delta0).
    pub fn at_tdb_s(tdb_s: f64) -> Self {
        let [x_axis, y_axis, pole] = moon_orientation(tdb_s).icrf_to_body_fixed();
        Self {
            pole,
            x_axis,
            y_axis,
        }
    }

    /// A selenocentric ICRF vector in body-fixed axes.
    pub fn body_fixed(&self, icrf: &[f64; 3]) -> [f64; 3] {
        [self.x_axis, self.y_axis, self.pole]
            .map(|axis| axis[0] * icrf[0] + axis[1] * icrf[1] + axis[2] * icrf[2])
    }
}

/// The Moon's potential (m^2/s^2, positive) at selenocentric `position_m` (ICRF axes, m) for
/// `model`: the point mass, the zonal J2 ([`moon_zonal_potential_m2_s2`]) or the degree-2
/// field of the surface clocks ([`moon_potential_m2_s2`], Kaula 1966 eq. 1.31 to degree 2
/// with J2 and C22 of GL0660B) in the body-fixed axes `axes`. NaN at the centre.
pub fn moon_field_potential_m2_s2(
    position_m: &[f64; 3],
    axes: &LunarAxes,
    model: LunarGravityModel,
) -> f64 {
    match model {
        LunarGravityModel::PointMass => moon_zonal_potential_m2_s2(position_m, &axes.pole, false),
        LunarGravityModel::J2 => moon_zonal_potential_m2_s2(position_m, &axes.pole, true),
        LunarGravityModel::GrailDegree2 => {
            // Interpolated axes are not exactly unit vectors (a chord between nodes is up to
            // 1.2e-5 short): the body-fixed vector keeps its direction and takes the ICRF
            // length, so that the monopole GM/r stays exact.
            let body = axes.body_fixed(position_m);
            let scale = (dot(*position_m, *position_m) / dot(body, body)).sqrt();
            moon_potential_m2_s2(body.map(|c| c * scale)).unwrap_or(f64::NAN)
        }
    }
}

/// The Moon's potential at selenocentric `position_m` (ICRF axes, m), m^2/s^2, positive (the
/// IERS sign convention of U): point mass and zonal J2,
///
/// U = GM_M / r [1 - J2 (R/r)^2 P2(sin phi)], P2(s) = (3 s^2 - 1)/2,
///
/// phi the selenocentric latitude from the unit vector `pole` (the standard zonal expansion, e.g. Kaula,
/// Theory of Satellite Geodesy (1966) eq. 1.31 truncated at degree 2; sign with J2 = -C20).
/// GM_M of DE440 (Park et al. 2021). `j2` selects the J2 term (false: point mass only).
pub fn moon_zonal_potential_m2_s2(position_m: &[f64; 3], pole: &[f64; 3], j2: bool) -> f64 {
    let r2 = position_m[0] * position_m[0]
        + position_m[1] * position_m[1]
        + position_m[2] * position_m[2];
    let r = r2.sqrt();
    let point = GM_MOON_M3_S2 / r;
    if !j2 {
        return point;
    }
    let z = position_m[0] * pole[0] + position_m[1] * pole[1] + position_m[2] * pole[2];
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
