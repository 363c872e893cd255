//! The Moon's gravity field at a lunar clock: point mass with the degree-2 terms J2 and C22 of
//! a GRAIL lunar gravity model.
//!
//! Model `grail_gl0660b_degree2`: GL0660B (Konopliv et al. 2013, J. Geophys. Res. Planets
//! 118, 1415), reference radius 1738.0 km, J2 = 2.0323e-4 and C22 = 2.2356e-5 (unnormalized;
//! **from memory**: the normalized C20 = -9.088e-5 and C22 = 3.4674e-5 of the GRAIL models,
//! Lemoine et al. 2013 giving the same to four digits). The monopole GM is DE440's
//! (4902.800118 km^3/s^2, Park et al. 2021), the value TCL and L_L use. The coefficients are in
//! the principal-axis frame; they are applied here in the IAU mean-Earth frame of
//! [`super::orientation`] (the two differ by below 0.03 deg, from memory: a change of the C22
//! potential by below 0.3 m^2/s^2 at the surface, 3e-18 of rate).
//!
//! Size at the surface: the J2 term is up to GM/R J2 (R_ref/R)^2 = 570 m^2/s^2 (6.3e-15 of rate,
//! 0.00055 us/day) between pole and equator, the C22 term 3 GM/R C22 = 190 m^2/s^2 (2.1e-15).
//! Left out: degree 3 and above (C30 about -8e-6, from memory: below 30 m^2/s^2, 3e-16) and
//! the topography-correlated field (up to a few hundred m^2/s^2 at the surface, from memory of
//! the GRAIL geoid heights of +-500 m times g = 1.62 m/s^2; a site's height is taken above the
//! 1737.4 km sphere, not above the selenoid).

use crate::physics::solar_system::gm::GM_MOON_M3_S2;
use crate::physics::vocabulary::vocabulary;

/// Reference radius of GL0660B, m (Konopliv et al. 2013; from memory).
pub const GL0660B_REFERENCE_RADIUS_M: f64 = 1_738_000.0;
/// J2 = -C20 (unnormalized) of GL0660B (from memory).
pub const GL0660B_J2: f64 = 2.0323e-4;
/// C22 (unnormalized) of GL0660B (from memory).
pub const GL0660B_C22: f64 = 2.2356e-5;

vocabulary! {
    /// The Moon's field a lunar clock's rate uses.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum LunarGravityModel {
        /// The Moon's point mass: U = GM_M / r.
        PointMass = "point_mass",
        /// The point mass with the zonal J2 of GL0660B about the lunar pole.
        J2 = "j2",
        /// The degree-2 field of GL0660B, J2 and C22, in the body-fixed axes of the IAU
        /// rotation model ([`moon_potential_m2_s2`]): the default, and the surface clocks'.
        GrailDegree2 = "grail_gl0660b_degree2",
    }
}

/// The lunar gravity model's name, as answers give it.
pub const LUNAR_GRAVITY_MODEL: &str = LunarGravityModel::GrailDegree2.as_str();

/// The Moon's potential (positive, m^2/s^2) at the body-fixed position `body_fixed_m` (m,
/// IAU mean-Earth frame):
/// U = GM/r [1 + (R/r)^2 (-J2 P2(sin phi) + 3 C22 cos^2 phi cos 2 lambda)],
/// P2(x) = (3x^2 - 1)/2, phi the latitude and lambda the east longitude.
///
/// Reference: the spherical-harmonic expansion of an exterior potential to degree 2 (Kaula
/// 1966, eq. 1.31, with C20 = -J2 and P22 = 3 cos^2 phi); coefficients of GL0660B
/// (Konopliv et al. 2013, from memory). `None` at the centre.
pub fn moon_potential_m2_s2(body_fixed_m: [f64; 3]) -> Option<f64> {
    let [x, y, z] = body_fixed_m;
    let rho2 = x * x + y * y;
    let r2 = rho2 + z * z;
    if r2.is_nan() || r2 <= 0.0 || r2.is_infinite() {
        return None;
    }
    let r = r2.sqrt();
    let sin2_lat = z * z / r2;
    let p2 = 1.5 * sin2_lat - 0.5;
    // cos^2(phi) cos(2 lambda) = (x^2 - y^2) / r^2.
    let sectoral = (x * x - y * y) / r2;
    let scale = GL0660B_REFERENCE_RADIUS_M * GL0660B_REFERENCE_RADIUS_M / r2;
    Some(GM_MOON_M3_S2 / r * (1.0 + scale * (-GL0660B_J2 * p2 + 3.0 * GL0660B_C22 * sectoral)))
}

#[cfg(test)]
mod tests {
    use super::*;

    /// Arithmetic of the expansion (Kaula 1966 eq. 1.31): at the pole of a 1738 km sphere the
    /// J2 term is -J2 GM/R (P2 = 1) and C22 vanishes; on the equator at longitude 0 it is
    /// +J2/2 + 3 C22, at longitude 90 deg +J2/2 - 3 C22.
    #[test]
    fn degree_two_terms() {
        let r = GL0660B_REFERENCE_RADIUS_M;
        let gm_r = GM_MOON_M3_S2 / r;
        let pole = moon_potential_m2_s2([0.0, 0.0, r]).unwrap();
        assert!((pole / gm_r - (1.0 - GL0660B_J2)).abs() < 1e-15);
        let lon0 = moon_potential_m2_s2([r, 0.0, 0.0]).unwrap();
        assert!((lon0 / gm_r - (1.0 + GL0660B_J2 / 2.0 + 3.0 * GL0660B_C22)).abs() < 1e-15);
        let lon90 = moon_potential_m2_s2([0.0, r, 0.0]).unwrap();
        assert!((lon90 / gm_r - (1.0 + GL0660B_J2 / 2.0 - 3.0 * GL0660B_C22)).abs() < 1e-15);
        assert!(moon_potential_m2_s2([0.0; 3]).is_none());
    }
}
