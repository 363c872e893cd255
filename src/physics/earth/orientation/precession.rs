//! IAU 2006 bias-precession in Fukushima-Williams angles, the mean obliquity, and the
//! bias-precession-nutation matrix built from them (IERS Conventions (2010) ch. 5, the
//! equinox-based route; Hilton et al. 2006, Celest. Mech. Dyn. Astron. 94, 351; Capitaine &
//! Wallace 2006, Astron. Astrophys. 450, 855; ERFA `eraPfw06`, `eraObl06`, `eraFw2m`,
//! `eraPnm06a`).

use super::matrix::{rotate_x, rotate_z, Matrix3, IDENTITY};
use super::nutation::nutation_iau2006a;
use super::ARCSEC_TO_RAD;

/// The four Fukushima-Williams bias-precession angles, radians.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct FukushimaWilliams {
    /// gamma_bar: GCRS right ascension of the intersection of the ecliptic of date and the GCRS
    /// equator.
    pub gamma_bar_rad: f64,
    /// phi_bar: obliquity of the ecliptic of date on the GCRS equator.
    pub phi_bar_rad: f64,
    /// psi_bar: precession angle plus bias in longitude along the ecliptic of date.
    pub psi_bar_rad: f64,
    /// epsilon_A: mean obliquity of date.
    pub eps_a_rad: f64,
}

/// epsilon_A, IAU 2006 (P03) mean obliquity of the ecliptic of date (Hilton et al. 2006, Celest.
/// Mech. Dyn. Astron. 94, 351; IERS Conventions (2010) ch. 5; ERFA `eraObl06`), `t` in TT Julian
/// centuries since J2000.0.
pub fn mean_obliquity_rad(t: f64) -> f64 {
    (84_381.406
        + (-46.836_769
            + (-0.000_183_1 + (0.002_003_40 + (-0.000_000_576 + (-0.000_000_043_4) * t) * t) * t)
                * t)
            * t)
        * ARCSEC_TO_RAD
}

/// The IAU 2006 Fukushima-Williams angles of bias-precession (Hilton et al. 2006, Celest. Mech.
/// Dyn. Astron. 94, 351; IERS Conventions (2010) ch. 5; ERFA `eraPfw06`), `t` in TT Julian
/// centuries since J2000.0.
pub fn fukushima_williams(t: f64) -> FukushimaWilliams {
    let gamma_bar = (-0.052_928
        + (10.556_378
            + (0.493_204_4 + (-0.000_312_38 + (-0.000_002_788 + 0.000_000_026_0 * t) * t) * t)
                * t)
            * t)
        * ARCSEC_TO_RAD;
    let phi_bar = (84_381.412_819
        + (-46.811_016
            + (0.051_126_8 + (0.000_532_89 + (-0.000_000_440 + (-0.000_000_017_6) * t) * t) * t)
                * t)
            * t)
        * ARCSEC_TO_RAD;
    let psi_bar = (-0.041_775
        + (5_038.481_484
            + (1.558_417_5 + (-0.000_185_22 + (-0.000_026_452 + (-0.000_000_014_8) * t) * t) * t)
                * t)
            * t)
        * ARCSEC_TO_RAD;
    FukushimaWilliams {
        gamma_bar_rad: gamma_bar,
        phi_bar_rad: phi_bar,
        psi_bar_rad: psi_bar,
        eps_a_rad: mean_obliquity_rad(t),
    }
}

/// The rotation `R1(-eps) R3(-psi) R1(phi_bar) R3(gamma_bar)` from Fukushima-Williams angles
/// (Capitaine & Wallace 2006, Astron. Astrophys. 450, 855; with psi = psi_bar + dpsi and
/// eps = eps_A + deps it is bias-precession-nutation; ERFA `eraFw2m`).
pub fn fukushima_williams_matrix(
    gamma_bar_rad: f64,
    phi_bar_rad: f64,
    psi_rad: f64,
    eps_rad: f64,
) -> Matrix3 {
    let mut r = IDENTITY;
    rotate_z(gamma_bar_rad, &mut r);
    rotate_x(phi_bar_rad, &mut r);
    rotate_z(-psi_rad, &mut r);
    rotate_x(-eps_rad, &mut r);
    r
}

/// The IAU 2006/2000A bias-precession-nutation matrix, GCRS to true equator and equinox of date
/// (Capitaine & Wallace 2006, Astron. Astrophys. 450, 855; ERFA `eraPnm06a`),
/// `t` in TT Julian centuries since J2000.0.
pub fn bias_precession_nutation_matrix(t: f64) -> Matrix3 {
    let fw = fukushima_williams(t);
    let nutation = nutation_iau2006a(t);
    fukushima_williams_matrix(
        fw.gamma_bar_rad,
        fw.phi_bar_rad,
        fw.psi_bar_rad + nutation.dpsi_rad,
        fw.eps_a_rad + nutation.deps_rad,
    )
}
