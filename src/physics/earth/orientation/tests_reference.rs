//! Earth orientation against pyerfa (ERFA 2.0.1) at 200 epochs 1962-2100: ERA, GMST, GAST, X, Y,
//! s and the GCRS -> ITRS matrix, all to 1e-12 rad.
//!
//! Reference: tests/reference/earth_orientation_erfa.csv, made by the seeded script
//! tests/reference/make_orientation_reference.py (erfa.era00, gmst06, gst06a, xys06a, c2t06a,
//! and c2ixys/c2tcio/pom00/sp00 for the rows with celestial-pole offsets).

use super::{earth_orientation, earth_orientation_fast, CelestialPoleOffsets, EarthOrientation};
use super::{JulianDate, TWO_PI};

const CSV: &str = include_str!("../../../../tests/reference/earth_orientation_erfa.csv");
/// The agreement required (the task's target).
const TOLERANCE_RAD: f64 = 1e-12;

struct Row {
    tt: JulianDate,
    ut1: JulianDate,
    xp: f64,
    yp: f64,
    offsets: CelestialPoleOffsets,
    /// era, gmst, gast, x, y, s.
    angles: [f64; 6],
    matrix: [[f64; 3]; 3],
}

fn rows() -> Vec<Row> {
    CSV.lines()
        .filter(|line| !line.starts_with('#') && !line.starts_with("mjd_tt"))
        .map(|line| {
            let v: Vec<f64> = line
                .split(',')
                .map(|f| f.parse().expect("number"))
                .collect();
            assert_eq!(v.len(), 21, "{line}");
            Row {
                tt: JulianDate::new(2_400_000.5, v[0]),
                ut1: JulianDate::new(2_400_000.5, v[1]),
                xp: v[2],
                yp: v[3],
                offsets: CelestialPoleOffsets {
                    dx_rad: v[4],
                    dy_rad: v[5],
                },
                angles: [v[6], v[7], v[8], v[9], v[10], v[11]],
                matrix: [
                    [v[12], v[13], v[14]],
                    [v[15], v[16], v[17]],
                    [v[18], v[19], v[20]],
                ],
            }
        })
        .collect()
}

/// |a - b| for angles, taken across the 0 / 2 pi seam.
fn angle_difference_rad(a: f64, b: f64) -> f64 {
    let d = (a - b).rem_euclid(TWO_PI);
    d.min(TWO_PI - d)
}

/// The worst difference per quantity (era, gmst, gast, x, y, s, matrix) over all rows.
fn worst_differences(compute: fn(&Row) -> EarthOrientation) -> [f64; 7] {
    let rows = rows();
    assert_eq!(rows.len(), 200);
    let mut worst = [0.0f64; 7];
    for row in &rows {
        let o = compute(row);
        let ours = [o.era_rad, o.gmst_rad, o.gast_rad];
        for k in 0..3 {
            worst[k] = worst[k].max(angle_difference_rad(ours[k], row.angles[k]));
        }
        // The CSV's x, y are the model's; ours include the offsets.
        worst[3] = worst[3].max((o.x_rad - row.offsets.dx_rad - row.angles[3]).abs());
        worst[4] = worst[4].max((o.y_rad - row.offsets.dy_rad - row.angles[4]).abs());
        worst[5] = worst[5].max((o.s_rad - row.angles[5]).abs());
        for i in 0..3 {
            for j in 0..3 {
                worst[6] = worst[6].max((o.matrix[i][j] - row.matrix[i][j]).abs());
            }
        }
    }
    worst
}

fn check(worst: [f64; 7], what: &str) {
    let names = ["era", "gmst", "gast", "x", "y", "s", "matrix"];
    for (name, value) in names.iter().zip(worst) {
        // Metres at the Earth's surface: the angle times the GRS80 equatorial radius (Moritz
        // 2000); for the matrix, the largest element difference times the same radius.
        eprintln!(
            "{what}: worst {name} difference from ERFA {value:.3e} rad ({:.3e} m at the surface)",
            value * 6_378_137.0
        );
        assert!(value <= TOLERANCE_RAD, "{what} {name}: {value:e}");
    }
}

/// Full series against pyerfa, every quantity to 1e-12 rad (tests/reference CSV, see above).
#[test]
fn full_series_matches_pyerfa_reference() {
    check(
        worst_differences(|r| earth_orientation(r.tt, r.ut1, r.xp, r.yp, Some(r.offsets))),
        "full series",
    );
}

/// The fast path against the same pyerfa reference, every quantity to 1e-12 rad.
#[test]
fn fast_path_matches_pyerfa_reference() {
    check(
        worst_differences(|r| earth_orientation_fast(r.tt, r.ut1, r.xp, r.yp, Some(r.offsets))),
        "fast path",
    );
}
