//! The table against ERFA (through pyerfa): tests/reference/make_utc_tai_reference.py wrote
//! utc_tai_erfa.csv and utc_day_erfa.csv with pyerfa 2.0.1.5.

use super::LeapTable;

const READINGS: &str = include_str!("../../../../tests/reference/utc_tai_erfa.csv");
const DAYS: &str = include_str!("../../../../tests/reference/utc_day_erfa.csv");
const ATTOS: i128 = 1_000_000_000_000_000_000;
const DAY: i128 = 86_400 * ATTOS;

/// Decimal seconds text ("86400.0025") to attoseconds, exactly.
fn attos(text: &str) -> i128 {
    let (whole, frac) = text.split_once('.').unwrap_or((text, ""));
    let frac = format!("{frac:0<18}");
    whole.parse::<i128>().unwrap_or(i128::MIN) * ATTOS + frac.parse::<i128>().unwrap_or(i128::MIN)
}

/// Rows of a CSV file after its header, split on commas.
fn rows(text: &str) -> Vec<Vec<&str>> {
    text.lines()
        .skip(1)
        .map(|l| l.split(',').collect())
        .collect()
}

/// TAI count of a UTC reading taken as if it were a TAI reading (IERS Conventions 2010 ch. 10
/// J2000.0 = 2000-01-01T12:00:00, MJD 51544.5).
fn reading_count(mjd: i64, sod: i128) -> i128 {
    i128::from(mjd - 51_544) * DAY - DAY / 2 + sod
}

#[test]
fn tai_minus_utc_agrees_with_erfa() {
    let table = LeapTable::builtin();
    let rows = rows(READINGS);
    assert!(rows.len() > 2000);
    let (mut worst_dat, mut worst_dat_at) = (0.0_f64, String::new());
    let (mut worst_utctai, mut worst_utctai_at) = (0.0_f64, String::new());
    for row in &rows {
        let [mjd, sod, dat, method, via_utctai] = row[..] else {
            panic!("bad row {row:?}");
        };
        let mjd: i64 = mjd.parse().unwrap_or(0);
        let sod = attos(sod);
        let dat: f64 = dat.parse().unwrap_or(f64::NAN);
        let via_utctai: f64 = via_utctai.parse().unwrap_or(f64::NAN);
        let ours = table.tai_minus_utc_attos(mjd, sod);
        assert!(ours.is_some(), "{row:?}");
        let ours_s = ours.unwrap_or(0) as f64 / 1e18;
        // pyerfa erfa.dat (ERFA eraDat) at fd = sod/86400 s: agreement to 1e-12 s
        let err = (ours_s - dat).abs();
        assert!(err <= 1e-12, "{row:?}: ours {ours_s} dat ({method}) {dat}");
        if err >= worst_dat {
            (worst_dat, worst_dat_at) = (err, format!("{row:?}"));
        }
        // pyerfa erfa.utctai (ERFA eraUtctai) on a two-part quasi-JD: the day fraction is a
        // double, 2^-53 day ~ 1e-11 s, so agreement is asked to 1e-10 s
        let tai = table.tai_from_utc(mjd, sod);
        assert!(tai.is_ok(), "{row:?}: {tai:?}");
        let ours_via_tai = (tai.unwrap_or(0) - reading_count(mjd, sod)) as f64 / 1e18;
        let err = (ours_via_tai - via_utctai).abs();
        assert!(
            err <= 1e-10,
            "{row:?}: ours {ours_via_tai} utctai {via_utctai}"
        );
        if err >= worst_utctai {
            (worst_utctai, worst_utctai_at) = (err, format!("{row:?}"));
        }
        // exact inverse (common practice: a conversion pair must round-trip)
        assert_eq!(
            tai.and_then(|t| table.utc_from_tai(t)),
            Ok((mjd, sod)),
            "{row:?}"
        );
    }
    eprintln!(
        "{} readings; worst |ours - erfa.dat| = {worst_dat:e} s at {worst_dat_at}; \
         worst |ours - erfa.utctai| = {worst_utctai:e} s at {worst_utctai_at}",
        rows.len()
    );
}

#[test]
fn day_lengths_agree_with_erfa() {
    let table = LeapTable::builtin();
    let rows = rows(DAYS);
    assert!(rows.len() > 2000);
    let (mut worst, mut worst_vs_plain, mut at) = (0.0_f64, 0.0_f64, 0_i64);
    for row in &rows {
        let [mjd, _dat0, dlod, dleap] = row[..] else {
            panic!("bad row {row:?}");
        };
        let mjd: i64 = mjd.parse().unwrap_or(0);
        let dlod: f64 = dlod.parse().unwrap_or(f64::NAN);
        let dleap: f64 = dleap.parse().unwrap_or(f64::NAN);
        let extra_s = (table.utc_day_length_attos(mjd) - DAY) as f64 / 1e18;
        // ERFA eraUtctai's dleap and dlod (from pyerfa erfa.dat); the day ends where its TAI
        // reaches the next 0h: 86400 s + dleap * 86400 / (86400 + dlod)
        let expected = dleap * 86_400.0 / (86_400.0 + dlod);
        let err = (extra_s - expected).abs();
        assert!(
            err <= 1e-12,
            "MJD {mjd}: ours +{extra_s} s, expected +{expected} s"
        );
        worst = worst.max(err);
        // against ERFA's own day length 86400 s + dleap (documented difference <= 3.3e-9 s)
        let vs_plain = (extra_s - dleap).abs();
        assert!(
            vs_plain <= 3.3e-9,
            "MJD {mjd}: ours +{extra_s} s, ERFA +{dleap} s"
        );
        if vs_plain >= worst_vs_plain {
            (worst_vs_plain, at) = (vs_plain, mjd);
        }
    }
    eprintln!(
        "{} days; worst |ours - ERFA continuous| = {worst:e} s; largest difference from ERFA's \
         86400 s + dleap = {worst_vs_plain:e} s at MJD {at}",
        rows.len()
    );
}

/// A small deterministic generator (Knuth MMIX LCG constants; common practice).
struct Lcg(u64);
impl Lcg {
    fn next(&mut self, below: u64) -> u64 {
        self.0 = self
            .0
            .wrapping_mul(6_364_136_223_846_793_005)
            .wrapping_add(1_442_695_040_888_963_407);
        (self.0 >> 33) % below.max(1)
    }
}

#[test]
fn round_trip_is_exact_on_every_day_and_inside_leap_seconds() {
    // exact inverse (common practice): 1960-01-01 .. 2100-01-01, each day's first and last
    // attosecond, a random second, and the whole leap second / jump of the days that have one
    let table = LeapTable::builtin();
    let mut rng = Lcg(0x0123_4567_89ab_cdef);
    let mut checked = 0_u64;
    for mjd in 36_934..88_069_i64 {
        let length = table.utc_day_length_attos(mjd);
        let random =
            i128::from(rng.next(86_400_000_000)) * 1_000_000_000 + i128::from(rng.next(1 << 30));
        let mut sods = vec![0, 1, length - 1, random % length];
        if length > DAY {
            sods.extend([DAY, DAY + (length - DAY) / 2, DAY + 1, length - 2]);
        } else {
            sods.push(length - ATTOS / 3);
        }
        for sod in sods {
            let tai = table.tai_from_utc(mjd, sod);
            assert_eq!(
                tai.and_then(|t| table.utc_from_tai(t)),
                Ok((mjd, sod)),
                "MJD {mjd} sod {sod}"
            );
            checked += 1;
        }
        // the day's last reading and the next day's first are one TAI span apart, no overlap
        let end = table.tai_from_utc(mjd, length - 1);
        let next = table.tai_from_utc(mjd + 1, 0);
        assert!(matches!((end, next), (Ok(e), Ok(n)) if e < n), "MJD {mjd}");
    }
    eprintln!("{checked} readings round-tripped exactly");
}
