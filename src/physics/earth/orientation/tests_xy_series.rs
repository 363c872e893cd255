//! The X, Y series against ERFA: `t_xy06` of `t_erfa_c.c` (pyerfa 2.0.1.5 source distribution,
//! ERFA 2.0.1) at its stated tolerances, and pyerfa `xy06` at 400 seeded epochs 1962-2100
//! (tests/reference/cip_xy06_erfa.csv, made by tests/reference/make_xy06_reference.py).

#![allow(clippy::excessive_precision)]

use super::*;
use crate::physics::earth::orientation::celestial_pole_series;

const CSV: &str = include_str!("../../../../tests/reference/cip_xy06_erfa.csv");
/// The Earth's equatorial radius, m (GRS80 a, Moritz 2000), to express angles as metres at the
/// surface.
const EARTH_RADIUS_M: f64 = 6_378_137.0;

/// (TT, [x_series, y_series, x_matrix, y_matrix]) per row of the reference.
fn reference_rows() -> Vec<(JulianDate, [f64; 4])> {
    CSV.lines()
        .filter(|line| !line.starts_with('#') && !line.starts_with("mjd_tt"))
        .map(|line| {
            let v: Vec<f64> = line
                .split(',')
                .map(|f| f.parse().expect("number"))
                .collect();
            assert_eq!(v.len(), 5, "{line}");
            (JulianDate::new(2_400_000.5, v[0]), [v[1], v[2], v[3], v[4]])
        })
        .collect()
}

/// ERFA t_xy06: eraXy06(2400000.5, 53736.0) = x 0.5791308486706010975e-3 (tolerance 1e-15),
/// y 0.4020579816732958141e-4 (1e-16).
#[test]
fn t_xy06() {
    let (x, y) = cip_xy_series_rad(JulianDate::new(2_400_000.5, 53_736.0));
    assert!((x - 0.5791308486706010975e-3).abs() <= 1e-15, "x {x:e}");
    assert!((y - 0.4020579816732958141e-4).abs() <= 1e-16, "y {y:e}");
}

/// Table sizes of ERFA's xy06.c (NFLS 653 luni-solar and NFPL 656 planetary frequencies, NA
/// 4755 amplitudes) and its leading terms (X: -6844318.44 uas sin Omega, Y: 9205236.26 uas
/// cos Omega; polynomial 2004.191898" t in X, -22.4072747" t^2 in Y; IERS Conventions (2010)
/// tables 5.2a-b and eq. 5.16).
#[test]
fn table_has_erfa_sizes_and_the_published_leading_terms() {
    let series = parse_xy_series(XY06_TEXT).expect("embedded table parses");
    assert_eq!(series.luni_solar.len(), 653);
    assert_eq!(series.planetary.len(), 656);
    let amplitudes: usize = series
        .luni_solar
        .iter()
        .chain(&series.planetary)
        .map(|f| f.amplitudes_uas.len())
        .sum();
    assert_eq!(amplitudes, 4755);
    let first = &series.luni_solar[0];
    assert_eq!(first.multipliers[..5], [0.0, 0.0, 0.0, 0.0, 1.0]);
    assert_eq!(first.amplitudes_uas[..2], [-6_844_318.44, 9_205_236.26]);
    assert_eq!(series.polynomial_arcsec[0][1], 2004.191898);
    assert_eq!(series.polynomial_arcsec[1][2], -22.4072747);
}

/// A damaged table is refused with its line number.
#[test]
fn bad_rows_are_rejected_with_line_numbers() {
    let polynomial = "POLY x 0 1\nPOLY x 1 1\nPOLY x 2 1\nPOLY x 3 1\nPOLY x 4 1\nPOLY x 5 1\n\
                      POLY y 0 1\nPOLY y 1 1\nPOLY y 2 1\nPOLY y 3 1\nPOLY y 4 1\nPOLY y 5 1\n";
    assert!(parse_xy_series(&format!("{polynomial}LS 0 0 0 0 1 2 1.0 2.0\n")).is_ok());
    let error = parse_xy_series(&format!("{polynomial}LS 0 0 0 0 1 3 1.0 2.0\n")).unwrap_err();
    assert_eq!(error.line_number, 13);
    let error = parse_xy_series(&format!("{polynomial}LS 0 0 0 0 1 1 1.0 2.0\n")).unwrap_err();
    assert_eq!(error.line_number, 13);
    assert!(parse_xy_series(&format!("{polynomial}PL 0 0 0 0 1 0 x\n")).is_err());
    assert!(parse_xy_series("POLY z 0 1\n").is_err());
    assert!(
        parse_xy_series("POLY x 0 1\n").is_err(),
        "missing coefficients"
    );
}

/// The series against pyerfa `xy06` at 400 seeded epochs 1962-2100: worst difference printed in
/// rad and in metres at the Earth's surface; required within 1e-15 rad (ERFA's own tolerance
/// for X in t_xy06; the same algorithm in the same order, only libm's sin and cos differ).
#[test]
fn series_matches_pyerfa_xy06() {
    let rows = reference_rows();
    assert_eq!(rows.len(), 400);
    let mut worst = [0.0f64; 2];
    for (tt, reference) in &rows {
        let (x, y) = cip_xy_series_rad(*tt);
        worst[0] = worst[0].max((x - reference[0]).abs());
        worst[1] = worst[1].max((y - reference[1]).abs());
    }
    for (name, value) in ["x", "y"].iter().zip(worst) {
        eprintln!(
            "xy06 series vs pyerfa xy06: worst {name} {value:.3e} rad ({:.3e} m at the surface)",
            value * EARTH_RADIUS_M
        );
        assert!(value <= 1e-15, "{name}: {value:e}");
    }
}

/// The two routes to X, Y (series; NPB matrix, the service's) differ by up to a few uas over
/// 1962-2100 (ERFA xy06.c note 4: "agree at the 1 microarcsecond level (at present)"): the
/// difference here must be ERFA's own difference (xy06 - xys06a of the reference) to 1e-15
/// rad, and it is printed in rad and in metres at the Earth's surface.
#[test]
fn series_and_matrix_routes_differ_as_in_erfa() {
    let mut worst_route = [0.0f64; 2];
    let mut worst_mismatch = 0.0f64;
    for (tt, reference) in &reference_rows() {
        let (x_series, y_series) = cip_xy_series_rad(*tt);
        let pole = celestial_pole_series(*tt);
        let ours = [x_series - pole.x_rad, y_series - pole.y_rad];
        let erfa = [reference[0] - reference[2], reference[1] - reference[3]];
        for k in 0..2 {
            worst_route[k] = worst_route[k].max(ours[k].abs());
            worst_mismatch = worst_mismatch.max((ours[k] - erfa[k]).abs());
        }
    }
    for (name, value) in ["x", "y"].iter().zip(worst_route) {
        eprintln!(
            "series - matrix route, 1962-2100: worst {name} {value:.3e} rad ({:.3e} m at the \
             surface, {:.2} uas)",
            value * EARTH_RADIUS_M,
            value / (ARCSEC_TO_RAD * 1e-6)
        );
    }
    eprintln!("route difference vs ERFA's: worst {worst_mismatch:.3e} rad");
    assert!(worst_mismatch <= 1e-15, "{worst_mismatch:e}");
    assert!(worst_route[0] > 1e-13, "the routes are distinct models");
}
