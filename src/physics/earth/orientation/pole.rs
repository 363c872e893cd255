//! The celestial pole at one TT epoch from the full IAU 2006/2000A series.

use super::cio::{cio_locator_s_rad, cip_xy_from_npb};
use super::precession::bias_precession_nutation_matrix;
use super::rotation::equation_of_the_origins_rad;
use super::JulianDate;

/// The celestial pole at one TT epoch from the IAU 2006/2000A model: CIP coordinates X, Y, the
/// CIO locator s and the equation of the origins, radians.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct CelestialPole {
    pub x_rad: f64,
    pub y_rad: f64,
    pub s_rad: f64,
    pub eo_rad: f64,
}

/// X, Y, s and EO from the full series at TT `tt`: NPB matrix (ERFA `eraPnm06a`), X, Y from it
/// (`eraBpn2xy`), s (`eraS06`), EO (`eraEors`).
pub fn celestial_pole_series(tt: JulianDate) -> CelestialPole {
    let t = tt.julian_centuries_since_j2000();
    let npb = bias_precession_nutation_matrix(t);
    let (x, y) = cip_xy_from_npb(&npb);
    let s = cio_locator_s_rad(t, x, y);
    CelestialPole {
        x_rad: x,
        y_rad: y,
        s_rad: s,
        eo_rad: equation_of_the_origins_rad(&npb, s),
    }
}

impl CelestialPole {
    /// The CIP as a unit vector of the GCRS, (X, Y, sqrt(1 - X^2 - Y^2)): X and Y are the
    /// GCRS coordinates of the CIP unit vector (IERS Conventions (2010) sec. 5.4.4).
    pub fn unit_vector_gcrs(&self) -> [f64; 3] {
        let (x, y) = (self.x_rad, self.y_rad);
        [x, y, (1.0 - x * x - y * y).sqrt()]
    }
}
