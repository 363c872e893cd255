//! Interpolation: exactness on cubics, leap seconds, the drift era, the ends of the table and
//! predicted values.

use super::table::{EopDay, EopTable};
use super::{lagrange_weights, EopLookupError, EopStatus};
use crate::physics::time::leap_seconds::LeapTable;

/// A synthetic table of `n` days from `first` with UT1-UTC = p(t) and x_p = q(t), t in days
/// from `first` (cubics), no leap second in between (2019-2020, IERS Bulletin C).
fn synthetic(first: i64, n: i64) -> EopTable {
    let days = (0..n)
        .map(|i| {
            let t = i as f64;
            EopDay {
                mjd: first + i,
                ut1_minus_utc_s: 0.1 - 1e-3 * t + 2e-5 * t * t - 3e-7 * t * t * t,
                xp_arcsec: 0.2 + 1e-3 * t - 1e-5 * t * t + 1e-7 * t * t * t,
                yp_arcsec: 0.3,
                dx_arcsec: None,
                dy_arcsec: Some(0.0),
                lod_s: Some(1e-3),
                status: if i < n - 3 {
                    EopStatus::Observed
                } else {
                    EopStatus::Predicted
                },
                nutation_status: EopStatus::Observed,
                sigma: None,
            }
        })
        .collect::<Vec<_>>();
    let lines = vec![1; days.len()];
    EopTable::from_days(days, &lines, 1, "synthetic".into()).unwrap()
}

#[test]
fn cubics_are_reproduced_everywhere_including_the_ends() {
    // source: a 4-point Lagrange polynomial is exact on cubics (Numerical Recipes 3.2)
    let t = synthetic(58_849, 12); // from 2020-01-01
    let leaps = LeapTable::builtin();
    for k in 0..=110 {
        let x = k as f64 * 0.1;
        let day = 58_849 + x.floor() as i64;
        let v = t.at_utc(leaps, day, (x - x.floor()) * 86_400.0).unwrap();
        let ut1 = 0.1 - 1e-3 * x + 2e-5 * x * x - 3e-7 * x * x * x;
        let xp = 0.2 + 1e-3 * x - 1e-5 * x * x + 1e-7 * x * x * x;
        assert!((v.ut1_minus_utc_s - ut1).abs() < 1e-14, "x {x}");
        assert!((v.xp_arcsec - xp).abs() < 1e-15, "x {x}");
        assert_eq!(
            (v.dx_arcsec, v.dy_arcsec, v.lod_s.map(|l| (l * 1e9).round())),
            (None, Some(0.0), Some(1e6))
        );
    }
    // weights sum to 1 and pick the node at a node
    let w = lagrange_weights(1.0, 4);
    assert_eq!(w, [0.0, 1.0, 0.0, 0.0]);
    assert!((lagrange_weights(1.37, 4).iter().sum::<f64>() - 1.0).abs() < 1e-15);
}

#[test]
fn ends_of_the_table_and_bad_instants() {
    // source: the lookup contract (module documentation of eop)
    let t = synthetic(58_849, 12);
    let leaps = LeapTable::builtin();
    assert_eq!(
        t.at_utc(leaps, 58_848, 86_399.0),
        Err(EopLookupError::BeforeTable { first_mjd: 58_849 })
    );
    assert!(t.at_utc(leaps, 58_849, 0.0).is_ok());
    assert!(t.at_utc(leaps, 58_860, 0.0).is_ok());
    assert_eq!(
        t.at_utc(leaps, 58_860, 1e-3),
        Err(EopLookupError::AfterTable { last_mjd: 58_860 })
    );
    assert_eq!(
        t.at_utc(leaps, 58_850, f64::NAN),
        Err(EopLookupError::NotFinite)
    );
    assert!(matches!(
        t.at_utc(leaps, 58_850, 86_400.0),
        Err(EopLookupError::Utc(_))
    ));
    assert!(matches!(
        t.at_utc(leaps, 58_850, -1.0),
        Err(EopLookupError::Utc(_))
    ));
    let empty = EopTable::empty("none".into());
    assert!(empty.at_utc(leaps, 58_850, 0.0).is_err());
    // one day only: the constant
    let one = EopTable::from_days(vec![t.days()[0]], &[1], 1, "one".into()).unwrap();
    assert_eq!(one.at_utc(leaps, 58_849, 0.0).unwrap().xp_arcsec, 0.2);
}

#[test]
fn predicted_days_say_so_with_the_bulletin_a_error() {
    // source: finals2000A.all in astropy-iers-data 0.2026.11.2.0.34.55: last I day MJD 61335;
    // e_x 0.000600", e_UT1 0.0000297 s on 61336; 0.017516", 0.0254096 s on 61707 (the
    // likely error is the one of the next tabulated day)
    let t = EopTable::builtin();
    let leaps = LeapTable::builtin();
    let old = t.at_utc(leaps, 61_000, 43_200.0).unwrap();
    assert_eq!(
        (old.status, old.likely_error, old.days_after_observed),
        (EopStatus::Observed, None, 0.0)
    );
    let next = t.at_utc(leaps, 61_335, 43_200.0).unwrap();
    assert_eq!(next.status, EopStatus::Predicted);
    assert_eq!(next.days_after_observed, 0.5);
    let e = next.likely_error.unwrap();
    assert_eq!((e.xp_arcsec, e.ut1_minus_utc_s), (0.000600, 0.0000297));
    let far = t.at_utc(leaps, 61_706, 43_200.0).unwrap();
    let e = far.likely_error.unwrap();
    assert_eq!((e.xp_arcsec, e.ut1_minus_utc_s), (0.017516, 0.0254096));
    assert_eq!(far.dx_arcsec, None); // Bulletin A gives dX, dY only to MJD 61416
    assert_eq!(far.nutation_status, EopStatus::Predicted);
}

/// UT1 - TAI at UTC (`mjd`, `sod_s`), from the table's UT1 - UTC and the leap table.
fn ut1_minus_tai(mjd: i64, sod_s: f64) -> f64 {
    let leaps = LeapTable::builtin();
    let v = EopTable::builtin().at_utc(leaps, mjd, sod_s).unwrap();
    let sod_attos = (sod_s * 1e18) as i128;
    v.ut1_minus_utc_s - leaps.tai_minus_utc_attos(mjd, sod_attos).unwrap() as f64 / 1e18
}

#[test]
fn leap_seconds_do_not_disturb_ut1() {
    // source: IERS Bulletin C: TAI-UTC 36 s -> 37 s at 2017-01-01 (MJD 57754); eopc04.1962-now:
    // UT1-UTC -0.4077697 s on 2016-12-31 and +0.5912870 s on 2017-01-01
    let t = EopTable::builtin();
    let leaps = LeapTable::builtin();
    let before = t
        .at_utc(leaps, 57_753, 86_400.999_999)
        .unwrap()
        .ut1_minus_utc_s;
    let after = t.at_utc(leaps, 57_754, 0.0).unwrap().ut1_minus_utc_s;
    assert!(
        (after - before - 1.0).abs() < 1e-6,
        "jump {}",
        after - before
    );
    // UT1 - TAI is continuous across the leap second (its rate is about 1 ms/day)
    assert!((ut1_minus_tai(57_753, 86_400.999_999) - ut1_minus_tai(57_754, 0.0)).abs() < 1e-7);
    // mid-day before the leap: the naive cubic of UT1-UTC through the jump would give about
    // +0.09 s here, 0.5 s off; the UT1-TAI interpolation stays on the smooth curve (within
    // 0.1 ms of the straight line between the two days, which differ by 0.94 ms)
    let mid = t.at_utc(leaps, 57_753, 43_200.0).unwrap().ut1_minus_utc_s;
    let line = (-0.4077697 + (0.5912870 - 1.0)) / 2.0;
    assert!((mid - line).abs() < 1e-4, "mid {mid} line {line}");
}

#[test]
fn drift_era_steps_do_not_disturb_ut1() {
    // source: eopc04.1962-now: UT1-UTC -0.1264278 s on 1963-10-31, -0.0283989 s on 1963-11-01,
    // where TAI-UTC stepped by 0.1 s (BIH/USNO tai-utc.dat)
    let before = ut1_minus_tai(38_333, 86_399.999);
    let after = ut1_minus_tai(38_334, 0.0);
    assert!((before - after).abs() < 1e-6, "{before} {after}");
}
