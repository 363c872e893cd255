//! The ERFA test values of `t_erfa_c.c` (pyerfa 2.0.1.5 source distribution, ERFA 2.0.1), at
//! the tolerances ERFA's own test suite states. Each test names its `t_*` function. The values
//! are copied verbatim (all the digits ERFA prints), hence the `excessive_precision` allowance.

#![allow(clippy::excessive_precision)]

use super::cio::{cio_locator_s_rad, cip_xy_from_npb, tio_locator_sprime_rad};
use super::matrix::Matrix3;
use super::nutation::{nutation_iau2000a, nutation_iau2006a};
use super::precession::{fukushima_williams, mean_obliquity_rad};
use super::rotation::{
    earth_rotation_angle_rad, equation_of_the_origins_rad, greenwich_apparent_sidereal_time_rad,
    greenwich_mean_sidereal_time_rad,
};
use super::{celestial_pole_series, earth_orientation, JulianDate};

/// MJD 53736.0 (2006-01-01), the epoch of most ERFA tests.
const MJD_53736: JulianDate = JulianDate {
    jd1: 2_400_000.5,
    jd2: 53_736.0,
};

fn assert_close(value: f64, expected: f64, tolerance: f64, what: &str) {
    assert!(
        (value - expected).abs() <= tolerance,
        "{what}: {value:e} vs {expected:e} (tolerance {tolerance:e})"
    );
}

/// ERFA t_era00: eraEra00(2400000.5, 54388.0) = 0.4022837240028158102, 1e-12.
#[test]
fn t_era00() {
    let era = earth_rotation_angle_rad(JulianDate::new(2_400_000.5, 54_388.0));
    assert_close(era, 0.4022837240028158102, 1e-12, "era00");
}

/// ERFA t_gmst06: eraGmst06(2400000.5, 53736.0, 2400000.5, 53736.0) = 1.754174971870091203.
#[test]
fn t_gmst06() {
    let gmst = greenwich_mean_sidereal_time_rad(MJD_53736, MJD_53736);
    assert_close(gmst, 1.754174971870091203, 1e-12, "gmst06");
}

/// ERFA t_gst06a: eraGst06a(2400000.5, 53736.0, 2400000.5, 53736.0) = 1.754166137675019159.
#[test]
fn t_gst06a() {
    let pole = celestial_pole_series(MJD_53736);
    let gast =
        greenwich_apparent_sidereal_time_rad(earth_rotation_angle_rad(MJD_53736), pole.eo_rad);
    assert_close(gast, 1.754166137675019159, 1e-12, "gst06a");
    let orientation = earth_orientation(MJD_53736, MJD_53736, 0.0, 0.0, None);
    assert_close(
        orientation.gast_rad,
        1.754166137675019159,
        1e-12,
        "gst06a via value",
    );
}

/// ERFA t_xys06a: X, Y, s at MJD 53736.0 TT (x 1e-14, y 1e-15, s 1e-18). ERFA's eraXys06a takes
/// X, Y from the NPB matrix (eraBpn2xy of eraPnm06a), as here.
#[test]
fn t_xys06a() {
    let pole = celestial_pole_series(MJD_53736);
    assert_close(pole.x_rad, 0.5791308482835292617e-3, 1e-14, "xys06a x");
    assert_close(pole.y_rad, 0.4020580099454020310e-4, 1e-15, "xys06a y");
    assert_close(pole.s_rad, -0.1220032294164579896e-7, 1e-18, "xys06a s");
}

/// ERFA t_s06: eraS06 at MJD 53736.0 with the given X, Y = -0.1220032213076463117e-7, 1e-18.
#[test]
fn t_s06() {
    let t = MJD_53736.julian_centuries_since_j2000();
    let s = cio_locator_s_rad(t, 0.5791308486706011000e-3, 0.4020579816732961219e-4);
    assert_close(s, -0.1220032213076463117e-7, 1e-18, "s06");
}

/// ERFA t_sp00: eraSp00(2400000.5, 52541.0) = -0.6216698469981019309e-11, 1e-12.
#[test]
fn t_sp00() {
    let t = JulianDate::new(2_400_000.5, 52_541.0).julian_centuries_since_j2000();
    assert_close(
        tio_locator_sprime_rad(t),
        -0.6216698469981019309e-11,
        1e-12,
        "sp00",
    );
}

/// ERFA t_nut00a and t_nut06a: nutation at MJD 53736.0, 1e-13 each.
#[test]
fn t_nut00a_and_t_nut06a() {
    let t = MJD_53736.julian_centuries_since_j2000();
    let n00 = nutation_iau2000a(t);
    assert_close(
        n00.dpsi_rad,
        -0.9630909107115518431e-5,
        1e-13,
        "nut00a dpsi",
    );
    assert_close(n00.deps_rad, 0.4063239174001678710e-4, 1e-13, "nut00a deps");
    let n06 = nutation_iau2006a(t);
    assert_close(
        n06.dpsi_rad,
        -0.9630912025820308797e-5,
        1e-13,
        "nut06a dpsi",
    );
    assert_close(n06.deps_rad, 0.4063238496887249798e-4, 1e-13, "nut06a deps");
}

/// ERFA t_pfw06 (MJD 50123.9999: gamb 1e-16, phib 1e-12, psib 1e-14, epsa 1e-12) and t_obl06
/// (MJD 54388.0: 0.4090749229387258204, 1e-14).
#[test]
fn t_pfw06_and_t_obl06() {
    let t = JulianDate::new(2_400_000.5, 50_123.999_9).julian_centuries_since_j2000();
    let fw = fukushima_williams(t);
    assert_close(
        fw.gamma_bar_rad,
        -0.2243387670997995690e-5,
        1e-16,
        "pfw06 gamb",
    );
    assert_close(fw.phi_bar_rad, 0.4091014602391312808, 1e-12, "pfw06 phib");
    assert_close(
        fw.psi_bar_rad,
        -0.9501954178013031895e-3,
        1e-14,
        "pfw06 psib",
    );
    assert_close(fw.eps_a_rad, 0.4091014316587367491, 1e-12, "pfw06 epsa");
    let t = JulianDate::new(2_400_000.5, 54_388.0).julian_centuries_since_j2000();
    assert_close(mean_obliquity_rad(t), 0.4090749229387258204, 1e-14, "obl06");
}

/// The NPB matrix of ERFA's t_eors and t_gst06.
const T_EORS_NPB: Matrix3 = [
    [
        0.9999989440476103608,
        -0.1332881761240011518e-2,
        -0.5790767434730085097e-3,
    ],
    [
        0.1332858254308954453e-2,
        0.9999991109044505944,
        -0.4097782710401555759e-4,
    ],
    [
        0.5791308472168153320e-3,
        0.4020595661593994396e-4,
        0.9999998314954572365,
    ],
];

/// ERFA t_eors (eo = -0.1332882715130744606e-2, 1e-14) and t_gst06 (GAST from that matrix at
/// MJD 53736.0 = 1.754166138018167568, 1e-12).
#[test]
fn t_eors_and_t_gst06() {
    let eo = equation_of_the_origins_rad(&T_EORS_NPB, -0.1220040848472271978e-7);
    assert_close(eo, -0.1332882715130744606e-2, 1e-14, "eors");
    let t = MJD_53736.julian_centuries_since_j2000();
    let (x, y) = cip_xy_from_npb(&T_EORS_NPB);
    let s = cio_locator_s_rad(t, x, y);
    let eo = equation_of_the_origins_rad(&T_EORS_NPB, s);
    let gast = greenwich_apparent_sidereal_time_rad(earth_rotation_angle_rad(MJD_53736), eo);
    assert_close(gast, 1.754166138018167568, 1e-12, "gst06");
}
