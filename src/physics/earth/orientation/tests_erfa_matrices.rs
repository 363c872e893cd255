//! The matrix-valued ERFA test values of `t_erfa_c.c` (pyerfa 2.0.1.5 source distribution,
//! ERFA 2.0.1), at the tolerances ERFA's own test suite states. Each test names its `t_*`
//! function. The values are copied verbatim (all the digits ERFA prints), hence the
//! `excessive_precision` allowance.

#![allow(clippy::excessive_precision)]

use super::cio::{celestial_to_intermediate_matrix, cip_xy_from_npb, polar_motion_matrix};
use super::matrix::Matrix3;
use super::precession::{bias_precession_nutation_matrix, fukushima_williams_matrix};
use super::rotation::celestial_to_terrestrial_matrix;
use super::{earth_orientation, JulianDate};

/// MJD 53736.0 (2006-01-01), the epoch of most ERFA tests.
const MJD_53736: JulianDate = JulianDate {
    jd1: 2_400_000.5,
    jd2: 53_736.0,
};

fn assert_matrix(m: &Matrix3, expected: [[f64; 3]; 3], tolerances: [[f64; 3]; 3], what: &str) {
    for i in 0..3 {
        for j in 0..3 {
            let label = format!("{what} {}{}", i + 1, j + 1);
            let (value, want) = (m[i][j], expected[i][j]);
            assert!(
                (value - want).abs() <= tolerances[i][j],
                "{label}: {value:e} vs {want:e}"
            );
        }
    }
}

const ALL_1E12: [[f64; 3]; 3] = [[1e-12; 3]; 3];

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
