//! UT1 in the time engine with the EOP table as its source: UT1 - UTC at tabulated days, the
//! inverse iteration, leap seconds, the ends of the table and the topocentric TDB term.

use super::EopTable;
use crate::physics::time::convert::{convert, tdb_minus_tt_s, ConversionContext};
use crate::physics::time::error::TimeErrorKind;
use crate::physics::time::instant::{uniform_count_attos, Instant, ATTOS_PER_SECOND};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::physics::time::tdb_series::TopocentricObserver;
use crate::physics::time::ut1::solve_tai_from_ut1;

fn context() -> ConversionContext<'static> {
    ConversionContext::geocentric(LeapTable::builtin()).with_ut1(EopTable::builtin())
}

/// The UTC instant of UTC day `mjd`, `sod_attos` after 0h.
fn utc(mjd: i64, sod_attos: i128) -> Instant {
    let tai = LeapTable::builtin()
        .tai_from_utc(mjd, sod_attos)
        .unwrap_or_else(|e| panic!("{e}"));
    Instant::from_count_attos(Scale::Utc, tai)
}

fn to(instant: &Instant, scale: Scale) -> Instant {
    convert(instant, scale, &context()).unwrap_or_else(|e| panic!("{instant:?}: {e}"))
}

#[test]
fn ut1_minus_utc_at_tabulated_days_is_the_tabulated_value() {
    // At 0h UTC of a tabulated day the interpolation returns the day's own value (Lagrange
    // interpolation at a node), and UT1 = UTC + (UT1 - UTC) (IERS Conventions (2010) 5.4.2).
    let table = EopTable::builtin();
    for mjd in [37_665, 41_317, 51_544, 57_754, 61_000, 61_336, 61_600] {
        let day = table
            .day(mjd)
            .unwrap_or_else(|| panic!("MJD {mjd} tabulated"));
        let ut1 = to(&utc(mjd, 0), Scale::Ut1);
        let ut1_minus_utc_attos = ut1.count_attos() - uniform_count_attos(mjd, 0);
        let expected = (day.ut1_minus_utc_s * 1e18).round() as i128;
        assert!(
            (ut1_minus_utc_attos - expected).abs() <= 1_000,
            "MJD {mjd}: {ut1_minus_utc_attos} as, table {expected} as"
        );
    }
}

#[test]
fn utc_ut1_utc_round_trips_exactly_and_the_inverse_converges_in_three_steps() {
    // Requirement of the brief: UTC -> UT1 -> UTC exact to the 1e-15 s level; the fixed-point
    // iteration's bound (ut1.rs: three steps reach the attosecond) is checked step by step.
    let leaps = LeapTable::builtin();
    let mut worst_attos = 0_i128;
    let mut most_steps = 0;
    let mut random = 0x2545_f491_4f6c_dd1d_u64;
    for _ in 0..4_000 {
        // xorshift64 (Marsaglia 2003), seeded: days 1962-01-01 .. 2027-10-28, any second
        random ^= random << 13;
        random ^= random >> 7;
        random ^= random << 17;
        let mjd = 37_665 + (random % 23_676) as i64;
        let sod = i128::from(random >> 20) % (86_400 * ATTOS_PER_SECOND);
        let start = utc(mjd, sod);
        let ut1 = to(&start, Scale::Ut1);
        let (tai, steps) = solve_tai_from_ut1(ut1.count_attos(), leaps, context().ut1)
            .unwrap_or_else(|e| panic!("{e}"));
        most_steps = most_steps.max(steps);
        let back = to(&ut1, Scale::Utc);
        assert_eq!(back.count_attos(), tai);
        worst_attos = worst_attos.max((back.count_attos() - start.count_attos()).abs());
    }
    assert!(worst_attos <= 1, "worst round trip {worst_attos} as");
    assert!(most_steps <= 3, "{most_steps} steps changed the estimate");
}

#[test]
fn ut1_is_continuous_across_a_leap_second() {
    // 2016-12-31T23:59:60.5 and 2017-01-01T00:00:00.5 UTC are one SI second apart (IERS
    // Bulletin C 52); UT1 runs on, so its readings differ by 1 s times the rotation rate
    // (within 1e-7 s of 1 s: |excess length of day| < 5 ms, from memory), not by 0 or 2 s.
    let during = to(
        &utc(57_753, 86_400 * ATTOS_PER_SECOND + ATTOS_PER_SECOND / 2),
        Scale::Ut1,
    );
    let after = to(&utc(57_754, ATTOS_PER_SECOND / 2), Scale::Ut1);
    let step = after.count_attos() - during.count_attos();
    assert!(
        (step - ATTOS_PER_SECOND).abs() < ATTOS_PER_SECOND / 10_000_000,
        "{step} as"
    );
    // And the leap second reads back as itself.
    let back = to(&during, Scale::Utc);
    assert_eq!(
        back.count_attos(),
        utc(57_753, 86_400 * ATTOS_PER_SECOND + ATTOS_PER_SECOND / 2).count_attos()
    );
}

#[test]
fn ut1_to_tai_is_ut1_minus_utc_minus_tai_minus_utc() {
    // UT1 - TAI = (UT1 - UTC) - (TAI - UTC): at 2017-01-01 0h UTC, TAI - UTC = 37 s (IERS
    // Bulletin C 52) and UT1 - UTC is the table's value for MJD 57754.
    let day = EopTable::builtin().day(57_754).map(|d| d.ut1_minus_utc_s);
    let ut1 = to(&utc(57_754, 0), Scale::Ut1);
    let tai = to(&ut1, Scale::Tai);
    let ut1_minus_tai_s = (ut1.count_attos() - tai.count_attos()) as f64 / 1e18;
    let expected = day.map(|d| d - 37.0).unwrap_or(f64::NAN);
    assert!(
        (ut1_minus_tai_s - expected).abs() < 1e-15,
        "{ut1_minus_tai_s} vs {expected}"
    );
    // The same event through TT (TT = TAI + 32.184 s, IAU 1991 A4).
    let tt = to(&ut1, Scale::Tt);
    assert_eq!(
        tt.count_attos() - tai.count_attos(),
        32_184 * ATTOS_PER_SECOND / 1000
    );
    assert_eq!(to(&tt, Scale::Ut1), ut1);
}

#[test]
fn outside_the_table_ut1_is_refused_with_its_code() {
    // The built-in table ends with the predictions for 2027-10-29 (MJD 61707) and starts on
    // 1962-01-01 (MJD 37665) (mod.rs, from astropy-iers-data 0.2026.11.2.0.34.55).
    let kind = |instant: &Instant, scale| convert(instant, scale, &context()).map_err(|e| e.kind());
    let after = utc(61_708, 0);
    assert_eq!(kind(&after, Scale::Ut1), Err(TimeErrorKind::Ut1Unavailable));
    let before = Instant::from_count_attos(Scale::Ut1, uniform_count_attos(37_000, 0));
    assert_eq!(
        kind(&before, Scale::Tai),
        Err(TimeErrorKind::Ut1Unavailable)
    );
    let message = convert(&after, Scale::Ut1, &context())
        .err()
        .map(|e| e.to_string())
        .unwrap_or_default();
    assert!(message.contains("2027-10-29"), "{message}");
    // No source at all: refused the same way, not guessed.
    let bare = ConversionContext::geocentric(LeapTable::builtin());
    assert_eq!(
        convert(&utc(61_000, 0), Scale::Ut1, &bare).map_err(|e| e.kind()),
        Err(TimeErrorKind::Ut1Unavailable)
    );
}

#[test]
fn topocentric_tdb_term_takes_ut1_inside_the_table() {
    // ERFA `eraDtdb` takes UT1 as the fraction of day of the topocentric term; with UTC in its
    // place the diurnal term (amplitude ~2 us, ERFA dtdb.c: 3.17679e-10 * u with u ~ 6 000 km)
    // shifts by at most 2.1e-6 s * 2 pi |UT1 - UTC| / 86 400 s.
    let observer = Some(TopocentricObserver::from_itrf_m([
        4_027_894.0,
        307_045.0,
        4_919_474.9,
    ]));
    let with_utc = ConversionContext {
        observer,
        ..ConversionContext::geocentric(LeapTable::builtin())
    };
    let with_ut1 = with_utc.with_ut1(EopTable::builtin());
    let mut largest_s = 0.0_f64;
    for mjd in [44_000, 51_544, 57_000, 61_000] {
        let day = EopTable::builtin()
            .day(mjd)
            .map_or(0.0, |d| d.ut1_minus_utc_s);
        let tt = to(&utc(mjd, 21_600 * ATTOS_PER_SECOND), Scale::Tt).count_attos();
        let shift_s = tdb_minus_tt_s(tt, &with_ut1).expect("series: any epoch")
            - tdb_minus_tt_s(tt, &with_utc).expect("series: any epoch");
        let bound_s = 2.1e-6 * std::f64::consts::TAU * day.abs() / 86_400.0;
        assert!(
            shift_s.abs() <= bound_s + 1e-18,
            "MJD {mjd}: {shift_s} s > {bound_s} s"
        );
        largest_s = largest_s.max(shift_s.abs());
    }
    assert!(largest_s > 1e-13, "UT1 changed nothing ({largest_s} s)");
    // After the table the UTC fraction stands in (convert.rs): both contexts agree.
    let late = to(&utc(62_000, 0), Scale::Tt).count_attos();
    assert_eq!(
        tdb_minus_tt_s(late, &with_ut1),
        tdb_minus_tt_s(late, &with_utc)
    );
}
