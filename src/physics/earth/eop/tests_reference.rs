//! The built-in snapshot and the interpolation against the IERS tables of astropy-iers-data
//! 0.2026.11.2.0.34.55 (tests/reference/make_eop_reference.py, seed 20261202).

use super::{parse_c04, parse_finals2000a, EopStatus, EopTable};
use crate::physics::time::leap_seconds::LeapTable;

const CSV: &str = include_str!("../../../../tests/reference/eop_interp_reference.csv");
const FINALS_2026: &str = include_str!("../../../../tests/reference/eop_finals2000A_2026_2027.all");
const FINALS_2016: &str = include_str!("../../../../tests/reference/eop_finals2000A_leap_2016.all");
const C04_1963: &str = include_str!("../../../../tests/reference/eop_c04_1963.txt");
const C04_2016: &str = include_str!("../../../../tests/reference/eop_c04_leap_2016.txt");

fn num(text: &str) -> f64 {
    text.parse().expect("reference CSV number")
}

#[test]
fn builtin_snapshot_is_complete() {
    // source: tools/make_eop_snapshot.py on astropy-iers-data 0.2026.11.2.0.34.55
    let t = EopTable::builtin();
    assert!(t.source().contains("0.2026.11.2.0.34.55"), "{}", t.source());
    assert_eq!(t.first_mjd(), Some(37_665)); // 1962-01-01, first day of eopc04.1962-now
    assert_eq!(t.last_observed_mjd(), Some(61_335)); // 2026-10-22, last I line of finals2000A
    assert_eq!(t.end_of_predictions_mjd(), Some(61_707)); // 2027-10-29, last P line
    assert_eq!(t.days().len(), 61_707 - 37_665 + 1);
    // The owned copy is the same table, day for day (the same parse of the same text).
    assert_eq!(&EopTable::builtin_owned(), t);
}

#[test]
fn tabulated_days_equal_the_files_exactly() {
    // source: eopc04.1962-now (to MJD 61312) and finals2000A.all (after), astropy-iers-data
    // 0.2026.11.2.0.34.55, values as printed
    let t = EopTable::builtin();
    let mut n = 0;
    for row in CSV.lines().filter(|l| l.starts_with("tab,")) {
        let f: Vec<&str> = row.split(',').collect();
        let day = t.day(f[1].parse().unwrap()).expect("tabulated day");
        assert_eq!(day.ut1_minus_utc_s, num(f[3]), "{row}");
        assert_eq!(day.xp_arcsec, num(f[4]), "{row}");
        assert_eq!(day.yp_arcsec, num(f[5]), "{row}");
        n += 1;
    }
    assert_eq!(n, 302);
}

#[test]
fn interpolation_matches_the_independent_script() {
    // source: 4-point Lagrange of UT1-TAI, x_p, y_p in tests/reference/make_eop_reference.py
    // (plain Python, TAI-UTC from the package's Leap_Second.dat); same algorithm, separate code
    let t = EopTable::builtin();
    let leaps = LeapTable::builtin();
    let (mut worst_ut1, mut worst_pm, mut n) = (0.0_f64, 0.0_f64, 0);
    for row in CSV.lines().filter(|l| l.starts_with("interp,")) {
        let f: Vec<&str> = row.split(',').collect();
        let v = t
            .at_utc(leaps, f[1].parse().unwrap(), num(f[2]))
            .unwrap_or_else(|e| panic!("{row}: {e}"));
        worst_ut1 = worst_ut1.max((v.ut1_minus_utc_s - num(f[3])).abs());
        worst_pm = worst_pm
            .max((v.xp_arcsec - num(f[4])).abs())
            .max((v.yp_arcsec - num(f[5])).abs());
        n += 1;
    }
    assert_eq!(n, 463);
    // rounding only: 1e-13 s of UT1 and 1e-13 arcsec (3e-12 mm on the ground)
    assert!(worst_ut1 < 1e-13, "UT1-UTC worst {worst_ut1:e} s");
    assert!(worst_pm < 1e-13, "polar motion worst {worst_pm:e} arcsec");
}

/// Every day of `file` equals the snapshot day (xp, yp, UT1 exactly; dX, dY, LOD to 1 ulp).
fn same_days(file: &EopTable, from_mjd: i64) -> usize {
    let snap = EopTable::builtin();
    let mut n = 0;
    for d in file.days().iter().filter(|d| d.mjd >= from_mjd) {
        let s = snap.day(d.mjd).expect("day in snapshot");
        assert_eq!(
            (s.ut1_minus_utc_s, s.xp_arcsec, s.yp_arcsec, s.status),
            (d.ut1_minus_utc_s, d.xp_arcsec, d.yp_arcsec, d.status),
            "MJD {}",
            d.mjd
        );
        for (a, b) in [
            (s.dx_arcsec, d.dx_arcsec),
            (s.dy_arcsec, d.dy_arcsec),
            (s.lod_s, d.lod_s),
        ] {
            match (a, b) {
                (Some(a), Some(b)) => assert!((a - b).abs() <= 1e-15 * b.abs().max(1e-3)),
                (a, b) => assert_eq!(a.is_some(), b.is_some(), "MJD {}", d.mjd),
            }
        }
        n += 1;
    }
    n
}

#[test]
fn the_readers_reproduce_the_snapshot_from_the_real_files() {
    // source: unchanged excerpts of eopc04.1962-now and finals2000A.all (astropy-iers-data
    // 0.2026.11.2.0.34.55), tests/reference/eop_*.{txt,all}
    let c04_1963 = parse_c04(C04_1963).unwrap();
    assert_eq!(c04_1963.source(), "IERS EOP 20 C04");
    assert_eq!(same_days(&c04_1963, 0), 121);
    let c04_2016 = parse_c04(C04_2016).unwrap();
    assert_eq!(same_days(&c04_2016, 0), 62);
    // finals after the last C04 day (MJD 61312) is what the snapshot holds
    let finals = parse_finals2000a(FINALS_2026).unwrap();
    assert_eq!(same_days(&finals, 61_313), 61_707 - 61_313 + 1);
    assert_eq!(finals.last_observed_mjd(), Some(61_335));
    assert_eq!(finals.end_of_predictions_mjd(), Some(61_707));
    // Bulletin A and C04 agree to a few tenths of a mas and tens of us in 2016
    let a = parse_finals2000a(FINALS_2016).unwrap();
    for d in a.days() {
        let c = c04_2016.day(d.mjd).unwrap();
        assert!((d.xp_arcsec - c.xp_arcsec).abs() < 1e-3, "MJD {}", d.mjd);
        assert!(
            (d.ut1_minus_utc_s - c.ut1_minus_utc_s).abs() < 1e-4,
            "MJD {}",
            d.mjd
        );
    }
    assert_eq!(a.days()[0].status, EopStatus::Observed);
}
