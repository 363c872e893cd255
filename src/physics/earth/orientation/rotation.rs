//! Earth rotation: the Earth rotation angle, its rate, Greenwich mean and apparent sidereal time,
//! the equation of the origins, and the assembly of the GCRS-to-ITRS matrix (IERS Conventions
//! (2010) ch. 5; ERFA `eraEra00`, `eraGmst06`, `eraEors`, `eraGst06`, `eraC2tcio`).

use super::matrix::{multiply, rotate_z, Matrix3};
use super::{JulianDate, ARCSEC_TO_RAD, J2000_JD, TWO_PI};

/// d(ERA)/d(UT1), radians per UT1 second: 2 pi x 1.00273781191135448 / 86400 (the derivative of
/// IERS Conventions (2010) eq. 5.15; the rate ERFA uses in `eraPvtob`). The factor is written to
/// the digits that fix its double (the same double as ERFA's 1.00273781191135448).
pub const EARTH_ROTATION_RATE_RAD_S: f64 = TWO_PI * 1.002_737_811_911_354_6 / 86_400.0;

/// `angle_rad` reduced to [0, 2 pi) (ERFA `eraAnp`).
pub fn normalize_angle_rad(angle_rad: f64) -> f64 {
    let w = angle_rad % TWO_PI;
    if w < 0.0 {
        w + TWO_PI
    } else {
        w
    }
}

/// theta, the Earth rotation angle, `2 pi (0.7790572732640 + 1.00273781191135448 Tu)`, Tu = UT1
/// Julian days since J2000.0, in [0, 2 pi) (IERS Conventions (2010) eq. 5.15; ERFA `eraEra00`,
/// which keeps the day fractions apart to retain precision).
pub fn earth_rotation_angle_rad(ut1: JulianDate) -> f64 {
    let (d1, d2) = if ut1.jd1 < ut1.jd2 {
        (ut1.jd1, ut1.jd2)
    } else {
        (ut1.jd2, ut1.jd1)
    };
    let t = d1 + (d2 - J2000_JD);
    let f = d1 % 1.0 + d2 % 1.0;
    normalize_angle_rad(TWO_PI * (f + 0.779_057_273_264_0 + 0.002_737_811_911_354_48 * t))
}

/// GMST, IAU 2006: ERA plus the polynomial in TT centuries (Capitaine, Wallace & Chapront 2005,
/// Astron. Astrophys. 432, 355; IERS Conventions (2010) ch. 5; ERFA `eraGmst06`), in [0, 2 pi).
pub fn greenwich_mean_sidereal_time_rad(ut1: JulianDate, tt: JulianDate) -> f64 {
    let t = tt.julian_centuries_since_j2000();
    normalize_angle_rad(
        earth_rotation_angle_rad(ut1)
            + (0.014_506
                + (4_612.156_534
                    + (1.391_581_7
                        + (-0.000_000_44 + (-0.000_029_956 + (-0.000_000_036_8) * t) * t) * t)
                        * t)
                    * t)
                * ARCSEC_TO_RAD,
    )
}

/// EO, the equation of the origins, from the equinox-based NPB matrix and s (Wallace & Capitaine
/// 2006, Astron. Astrophys. 459, 981, expression 16; ERFA `eraEors`): the CIO right ascension of
/// the true equinox, so that GAST = ERA - EO.
pub fn equation_of_the_origins_rad(npb: &Matrix3, s_rad: f64) -> f64 {
    let x = npb[2][0];
    let ax = x / (1.0 + npb[2][2]);
    let xs = 1.0 - ax * x;
    let ys = -ax * npb[2][1];
    let zs = -x;
    let p = npb[0][0] * xs + npb[0][1] * ys + npb[0][2] * zs;
    let q = npb[1][0] * xs + npb[1][1] * ys + npb[1][2] * zs;
    if p != 0.0 || q != 0.0 {
        s_rad - q.atan2(p)
    } else {
        s_rad
    }
}

/// GAST = ERA - EO, in [0, 2 pi) (Wallace & Capitaine 2006, Astron. Astrophys. 459, 981;
/// IERS Conventions (2010) ch. 5; ERFA `eraGst06`).
pub fn greenwich_apparent_sidereal_time_rad(era_rad: f64, eo_rad: f64) -> f64 {
    normalize_angle_rad(era_rad - eo_rad)
}

/// The GCRS-to-ITRS matrix `W^T R3(theta) Q^T` from the celestial-to-intermediate matrix
/// (`Q^T`), the Earth rotation angle and the polar-motion matrix (`W^T`) (IERS Conventions
/// (2010) eq. 5.1 inverted; ERFA `eraC2tcio`).
pub fn celestial_to_terrestrial_matrix(
    c2i: &Matrix3,
    era_rad: f64,
    polar_motion: &Matrix3,
) -> Matrix3 {
    let mut r = *c2i;
    rotate_z(era_rad, &mut r);
    multiply(polar_motion, &r)
}
