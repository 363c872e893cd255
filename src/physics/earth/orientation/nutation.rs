//! IAU 2000A nutation (MHB2000: Mathews, Herring & Buffett 2002, J. Geophys. Res. 107, 2068)
//! with the IAU 2006 adjustments (IERS Conventions (2010) ch. 5, tables 5.3a and 5.3b; ERFA
//! `eraNut00a`, `eraNut06a`).

use super::arguments::{
    earth_longitude_rad, general_precession_rad, jupiter_longitude_rad, mars_longitude_rad,
    mercury_longitude_rad, moon_argument_of_latitude_rad, moon_mean_anomaly_rad,
    moon_node_longitude_rad, saturn_longitude_rad, uranus_longitude_rad, venus_longitude_rad,
};
use super::series_data::tables;
use super::{ARCSEC_TO_RAD, TURN_ARCSEC, TWO_PI};

/// 0.1 microarcsecond in radians, the unit of the nutation tables.
const TENTH_MICROARCSEC_TO_RAD: f64 = ARCSEC_TO_RAD / 1e7;

/// Nutation in longitude and obliquity, radians.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Nutation {
    pub dpsi_rad: f64,
    pub deps_rad: f64,
}

/// The luni-solar part of IAU 2000A nutation (IERS Conventions (2010) ch. 5, table 5.3a;
/// ERFA `eraNut00a`), `t` in TT Julian centuries since J2000.0. As in ERFA (and MHB2000),
/// l and F, Omega are the IERS 2003 expressions (eq. 5.43) while l' and D are the MHB2000 ones,
/// which differ in the last digit of their constant term. Terms are summed last to first.
pub fn luni_solar_nutation(t: f64) -> Nutation {
    let el = moon_mean_anomaly_rad(t);
    let elp = ((1_287_104.793_05
        + t * (129_596_581.048_1 + t * (-0.553_2 + t * (0.000_136 + t * (-0.000_011_49)))))
        % TURN_ARCSEC)
        * ARCSEC_TO_RAD;
    let f = moon_argument_of_latitude_rad(t);
    let d = ((1_072_260.703_69
        + t * (1_602_961_601.209_0 + t * (-6.370_6 + t * (0.006_593 + t * (-0.000_031_69)))))
        % TURN_ARCSEC)
        * ARCSEC_TO_RAD;
    let om = moon_node_longitude_rad(t);
    let (mut dp, mut de) = (0.0, 0.0);
    for term in tables().luni_solar.iter().rev() {
        let m = &term.multipliers;
        let arg = (m[0] * el + m[1] * elp + m[2] * f + m[3] * d + m[4] * om) % TWO_PI;
        let (sarg, carg) = arg.sin_cos();
        dp += (term.longitude_sin + term.longitude_sin_t * t) * sarg + term.longitude_cos * carg;
        de += (term.obliquity_cos + term.obliquity_cos_t * t) * carg + term.obliquity_sin * sarg;
    }
    Nutation {
        dpsi_rad: dp * TENTH_MICROARCSEC_TO_RAD,
        deps_rad: de * TENTH_MICROARCSEC_TO_RAD,
    }
}

/// The planetary part of IAU 2000A nutation (IERS Conventions (2010) ch. 5, table 5.3b;
/// ERFA `eraNut00a`), `t` in TT Julian centuries since J2000.0. The Delaunay arguments and
/// Neptune's longitude are MHB2000's linear forms, as in ERFA; the other planets and p_A are the
/// IERS 2003 expressions (eq. 5.44).
pub fn planetary_nutation(t: f64) -> Nutation {
    let arguments = [
        (2.355_555_98 + 8_328.691_426_955_4 * t) % TWO_PI,
        (1.627_905_234 + 8_433.466_158_131 * t) % TWO_PI,
        (5.198_466_741 + 7_771.377_146_812_1 * t) % TWO_PI,
        (2.182_439_20 - 33.757_045 * t) % TWO_PI,
        mercury_longitude_rad(t),
        venus_longitude_rad(t),
        earth_longitude_rad(t),
        mars_longitude_rad(t),
        jupiter_longitude_rad(t),
        saturn_longitude_rad(t),
        uranus_longitude_rad(t),
        (5.321_159_000 + 3.812_777_400_0 * t) % TWO_PI,
        general_precession_rad(t),
    ];
    let (mut dp, mut de) = (0.0, 0.0);
    for term in tables().planetary.iter().rev() {
        let arg = term
            .multipliers
            .iter()
            .zip(&arguments)
            .fold(0.0, |sum, (m, a)| sum + m * a)
            % TWO_PI;
        let (sarg, carg) = arg.sin_cos();
        dp += term.longitude_sin * sarg + term.longitude_cos * carg;
        de += term.obliquity_sin * sarg + term.obliquity_cos * carg;
    }
    Nutation {
        dpsi_rad: dp * TENTH_MICROARCSEC_TO_RAD,
        deps_rad: de * TENTH_MICROARCSEC_TO_RAD,
    }
}

/// IAU 2000A nutation, luni-solar plus planetary (IERS Conventions (2010) ch. 5, tables 5.3a
/// and 5.3b; ERFA `eraNut00a`), `t` in TT Julian centuries since J2000.0.
pub fn nutation_iau2000a(t: f64) -> Nutation {
    let ls = luni_solar_nutation(t);
    let pl = planetary_nutation(t);
    Nutation {
        dpsi_rad: ls.dpsi_rad + pl.dpsi_rad,
        deps_rad: ls.deps_rad + pl.deps_rad,
    }
}

/// IAU 2000A nutation adjusted to IAU 2006 precession: the J2 secular-variation factor
/// `-2.7774e-6 t` on both components and the 0.4697e-6 scaling of dpsi (Wallace & Capitaine
/// 2006, Astron. Astrophys. 459, 981, eqs. 5; ERFA `eraNut06a`), `t` in TT Julian centuries since J2000.0.
pub fn nutation_iau2006a(t: f64) -> Nutation {
    let fj2 = -2.7774e-6 * t;
    let n = nutation_iau2000a(t);
    Nutation {
        dpsi_rad: n.dpsi_rad + n.dpsi_rad * (0.4697e-6 + fj2),
        deps_rad: n.deps_rad + n.deps_rad * fj2,
    }
}
