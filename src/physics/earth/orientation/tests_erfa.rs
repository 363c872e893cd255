//! The ERFA test values of `t_erfa_c.c` (pyerfa 2.0.1.5 source distribution, ERFA 2.0.1), at
//! the tolerances ERFA's own test suite states. Each test names its `t_*` function. The values
//! are copied verbatim (all the digits ERFA prints), hence the `excessive_precision` allowance.

#![allow(clippy::excessive_precision)]

use super::cio::{
    celestial_to_intermediate_matrix, cio_locator_s_rad, cip_xy_from_npb, polar_motion_matrix,
    tio_locator_sprime_rad,
};
use super::matrix::Matrix3;
use super::nutation::{nutation_iau2000a, nutation_iau2006a};
use super::precession::{
    bias_precession_nutation_matrix, fukushima_williams, fukushima_williams_matrix,
    mean_obliquity_rad,
};
use super::rotation::{
    celestial_to_terrestrial_matrix, earth_rotation_angle_rad, equation_of_the_origins_rad,
    greenwich_apparent_sidereal_time_rad, greenwich_mean_sidereal_time_rad,
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

fn assert_matrix(m: &Matrix3, expected: [[f64; 3]; 3], tolerances: [[f64; 3]; 3], what: &str) {
    for i in 0..3 {
        for j in 0..3 {
            let label = format!("{what} {}{}", i + 1, j + 1);
            assert_close(m[i][j], expected[i][j], tolerances[i][j], &label);
        }
    }
}

const ALL_1E12: [[f64; 3]; 3] = [[1e-12; 3]; 3];

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

/// ERFA t_c2t06a: the GCRS -> ITRS matrix at MJD 53736.0 TT = UT1, xp = 2.55060238e-7,
/// yp = 1.860359247e-6, each element 1e-12.
#[test]
fn t_c2t06a() {
    let orientation = earth_orientation(MJD_53736, MJD_53736, 2.55060238e-7, 1.860359247e-6, None);
    let expected = [
        [
            -0.1810332128305897282,
            0.9834769806938592296,
            0.6555550962998436505e-4,
        ],
        [
            -0.9834768134136214897,
            -0.1810332203649130832,
            0.5749800844905594110e-3,
        ],
        [
            0.5773474024748545878e-3,
            0.3961816829632690581e-4,
            0.9999998325501747785,
        ],
    ];
    assert_matrix(&orientation.matrix, expected, ALL_1E12, "c2t06a");
}

/// ERFA t_pom00: the polar-motion matrix for xp, yp, s' given (diagonal 1e-12, others 1e-16).
#[test]
fn t_pom00() {
    let m = polar_motion_matrix(2.55060238e-7, 1.860359247e-6, -0.1367174580728891460e-10);
    let expected = [
        [
            0.9999999999999674721,
            -0.1367174580728846989e-10,
            0.2550602379999972345e-6,
        ],
        [
            0.1414624947957029801e-10,
            0.9999999999982695317,
            -0.1860359246998866389e-5,
        ],
        [
            -0.2550602379741215021e-6,
            0.1860359247002414021e-5,
            0.9999999999982370039,
        ],
    ];
    let tolerances = [
        [1e-12, 1e-16, 1e-16],
        [1e-16, 1e-12, 1e-16],
        [1e-16, 1e-16, 1e-12],
    ];
    assert_matrix(&m, expected, tolerances, "pom00");
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

/// ERFA t_fw2m: the matrix from given Fukushima-Williams angles, 1e-12 each.
#[test]
fn t_fw2m() {
    let m = fukushima_williams_matrix(
        -0.2243387670997992368e-5,
        0.4091014602391312982,
        -0.9501954178013015092e-3,
        0.4091014316587367472,
    );
    let expected = [
        [
            0.9999995505176007047,
            0.8695404617348192957e-3,
            0.3779735201865582571e-3,
        ],
        [
            -0.8695404723772016038e-3,
            0.9999996219496027161,
            -0.1361752496887100026e-6,
        ],
        [
            -0.3779734957034082790e-3,
            -0.1924880848087615651e-6,
            0.9999999285679971958,
        ],
    ];
    assert_matrix(&m, expected, ALL_1E12, "fw2m");
}

/// ERFA t_pnm06a: the NPB matrix at MJD 50123.9999 (diagonal 1e-12, others 1e-14), and
/// t_bpn2xy (X, Y are the third row).
#[test]
fn t_pnm06a_and_t_bpn2xy() {
    let t = JulianDate::new(2_400_000.5, 50_123.999_9).julian_centuries_since_j2000();
    let m = bias_precession_nutation_matrix(t);
    let expected = [
        [
            0.9999995832794205484,
            0.8372382772630962111e-3,
            0.3639684771140623099e-3,
        ],
        [
            -0.8372533744743683605e-3,
            0.9999996486492861646,
            0.4132905944611019498e-4,
        ],
        [
            -0.3639337469629464969e-3,
            -0.4163377605910663999e-4,
            0.9999999329094260057,
        ],
    ];
    let tolerances = [
        [1e-12, 1e-14, 1e-14],
        [1e-14, 1e-12, 1e-14],
        [1e-14, 1e-14, 1e-12],
    ];
    assert_matrix(&m, expected, tolerances, "pnm06a");
    let (x, y) = cip_xy_from_npb(&m);
    assert_eq!((x, y), (m[2][0], m[2][1]));
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

/// ERFA t_c2ixys: the celestial-to-intermediate matrix from given X, Y, s, 1e-12 each.
#[test]
fn t_c2ixys() {
    let m = celestial_to_intermediate_matrix(
        0.5791308486706011000e-3,
        0.4020579816732961219e-4,
        -0.1220040848472271978e-7,
    );
    let expected = [
        [
            0.9999998323037157138,
            0.5581984869168499149e-9,
            -0.5791308491611282180e-3,
        ],
        [
            -0.2384261642670440317e-7,
            0.9999999991917468964,
            -0.4020579110169668931e-4,
        ],
        [
            0.5791308486706011000e-3,
            0.4020579816732961219e-4,
            0.9999998314954627590,
        ],
    ];
    assert_matrix(&m, expected, ALL_1E12, "c2ixys");
}

/// ERFA t_c2tcio: the GCRS -> ITRS matrix from given C2I, ERA and polar-motion matrices.
#[test]
fn t_c2tcio() {
    let c2i = [
        [
            0.9999998323037164738,
            0.5581526271714303683e-9,
            -0.5791308477073443903e-3,
        ],
        [
            -0.2384266227524722273e-7,
            0.9999999991917404296,
            -0.4020594955030704125e-4,
        ],
        [
            0.5791308472168153320e-3,
            0.4020595661593994396e-4,
            0.9999998314954572365,
        ],
    ];
    let pom = [
        [
            0.9999999999999674705,
            -0.1367174580728847031e-10,
            0.2550602379999972723e-6,
        ],
        [
            0.1414624947957029721e-10,
            0.9999999999982694954,
            -0.1860359246998866338e-5,
        ],
        [
            -0.2550602379741215275e-6,
            0.1860359247002413923e-5,
            0.9999999999982369658,
        ],
    ];
    let m = celestial_to_terrestrial_matrix(&c2i, 1.75283325530307, &pom);
    let expected = [
        [
            -0.1810332128307110439,
            0.9834769806938470149,
            0.6555535638685466874e-4,
        ],
        [
            -0.9834768134135996657,
            -0.1810332203649448367,
            0.5749801116141106528e-3,
        ],
        [
            0.5773474014081407076e-3,
            0.3961832391772658944e-4,
            0.9999998325501691969,
        ],
    ];
    assert_matrix(&m, expected, ALL_1E12, "c2tcio");
}
