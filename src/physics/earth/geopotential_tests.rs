//! Tests of the EGM2008 potential: the built-in file as published, the recursion against an
//! evaluation made apart (explicit Legendre polynomials in mpmath,
//! `tests/reference/make_egm2008_reference.py`)
//! and the geoid undulations it implies against the model's published extremes.

use super::*;
use crate::physics::constants::EARTH_ROTATION_RAD_S;
use crate::physics::geodesy::geodetic_to_ecef_m;

const REFERENCE: &str = include_str!("../../../tests/reference/egm2008_potential_reference.csv");

#[test]
fn built_in_model_is_egm2008_to_degree_120() {
    let model = egm2008().unwrap();
    // Pavlis et al. 2012: GM = 3.986004415e14 m^3/s^2, a = 6 378 136.3 m, C20 (fully
    // normalized, tide-free) = -4.84165143790815e-4 (the model's own file).
    assert_eq!(model.name, "EGM2008");
    assert_eq!(model.max_degree, 120);
    assert_eq!(model.gm_m3_s2, 3.986_004_415e14);
    assert_eq!(model.radius_m, 6_378_136.3);
    assert_eq!(model.c[index(2, 0)], -0.484_165_143_790_815e-3);
    assert_eq!(model.s[index(120, 120)], -0.147_710_757_794_803e-8);
}

#[test]
fn recursion_matches_an_evaluation_made_apart() {
    let model = egm2008().unwrap();
    let mut worst = 0.0f64;
    let mut rows = 0;
    for line in REFERENCE.lines().skip(1) {
        let v: Vec<f64> = line.split(',').map(|f| f.parse().unwrap()).collect();
        let position = [v[0], v[1], v[2]];
        for (degree, expected) in [(2, v[3]), (12, v[4]), (120, v[5])] {
            let ours = model.potential_m2_s2(position, degree);
            let relative = (ours - expected).abs() / expected;
            worst = worst.max(relative);
            assert!(
                relative < 1e-14,
                "{position:?} degree {degree}: {ours} vs {expected}"
            );
        }
        rows += 1;
    }
    println!("EGM2008 recursion vs mpmath: worst relative difference {worst:e} over {rows} points");
    assert_eq!(rows, 8);
}

/// Geoid undulation N = (W(P0) - U0) / gamma at the ellipsoid point P0, W = V + the
/// centrifugal potential, U0 = 62 636 860.850 m^2/s^2 (GRS80, Moritz 2000), gamma about
/// 9.78 m/s^2 near the equator (Bruns' formula, Heiskanen & Moritz 1967 eq. 2-144).
fn undulation_m(model: &Geopotential, latitude_deg: f64, longitude_deg: f64) -> f64 {
    let p = geodetic_to_ecef_m(latitude_deg, longitude_deg, 0.0).unwrap();
    let w = model.potential_m2_s2(p, 120)
        + 0.5 * EARTH_ROTATION_RAD_S * EARTH_ROTATION_RAD_S * (p[0] * p[0] + p[1] * p[1]);
    (w - 62_636_860.850) / 9.78
}

/// The EGM2008 geoid's lowest point, about -106 m in the Indian Ocean south of Sri Lanka, and
/// its highest, about +86 m over New Guinea (from memory of the published EGM2008 geoid maps):
/// the extremes of N on a 0.5 deg grid of those regions, within 6 m (the truncation at degree
/// 120 smooths the peaks by a few metres).
#[test]
fn geoid_extremes_are_where_egm2008_puts_them() {
    let model = egm2008().unwrap();
    let extreme = |lat0: f64, lon0: f64, pick: fn(f64, f64) -> f64| {
        let mut best: Option<f64> = None;
        for i in -20..=20 {
            for j in -20..=20 {
                let n = undulation_m(model, lat0 + 0.5 * f64::from(i), lon0 + 0.5 * f64::from(j));
                best = Some(best.map_or(n, |b| pick(b, n)));
            }
        }
        best.unwrap()
    };
    let low = extreme(5.0, 80.0, f64::min);
    let high = extreme(-5.0, 145.0, f64::max);
    println!("EGM2008 (degree 120) geoid: lowest {low:.1} m, highest {high:.1} m");
    assert!((low + 106.0).abs() < 6.0, "{low}");
    assert!((high - 86.0).abs() < 6.0, "{high}");
}

#[test]
fn bad_texts_name_their_line() {
    let text = "max_degree 2\nnorm fully_normalized\nend_of_head\n0 0 1.0 0.0\n2 3 0.1 0.0\n";
    let error = Geopotential::parse(text).unwrap_err();
    assert_eq!(error.line, 5);
    let error = Geopotential::parse("max_degree 2\nend_of_head\n2 0 nan 0\n").unwrap_err();
    assert_eq!(error.line, 3);
    assert!(Geopotential::parse("end_of_head\n").is_err());
    let model = egm2008().unwrap();
    assert!(model.potential_m2_s2([0.0; 3], 120).is_nan());
}
