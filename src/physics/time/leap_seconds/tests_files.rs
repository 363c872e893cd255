//! The published leap-second files parse and agree with the built-in table step for step.

use super::{LeapTable, UtcRangeError};

/// IERS `Leap_Second.dat` as shipped in astropy-iers-data (tests/reference/copy_leap_second_files.sh).
const IERS_FILE: &str = include_str!("../../../../tests/reference/Leap_Second.dat");
/// IETF/tz `leap-seconds.list` as shipped in Debian tzdata (same script).
const IETF_FILE: &str = include_str!("../../../../tests/reference/leap-seconds.list");

const ATTOS: i128 = 1_000_000_000_000_000_000;

fn assert_same_steps(parsed: &LeapTable) {
    let builtin = LeapTable::builtin();
    assert_eq!(parsed.steps().len(), builtin.steps().len());
    for (p, b) in parsed.steps().iter().zip(builtin.steps()) {
        assert_eq!(p, b, "step at MJD {}", b.utc_mjd);
    }
}

#[test]
fn iers_file_matches_builtin_and_expiry() {
    let table = LeapTable::parse_iers_leap_second_dat(IERS_FILE);
    let table = table.as_ref().map_err(ToString::to_string);
    assert!(table.is_ok(), "{table:?}");
    if let Ok(table) = table {
        // IERS Leap_Second.dat: 28 steps 1972-2017 identical to ERFA dat.c's table
        assert_same_steps(table);
        // "File expires on 28 June 2027" (IERS Bulletin C 72 file) = MJD 61584 (pyerfa cal2jd)
        assert_eq!(table.expiry_mjd(), 61_584);
        assert_eq!(table.expiry_mjd(), LeapTable::builtin().expiry_mjd());
        // the file's own "Updated through IERS Bulletin 72 issued in July 2026"
        assert!(table.last_updated().contains("Bulletin 72"));
        assert_eq!(table.source(), "IERS Leap_Second.dat");
    }
    // format detection (common practice): the same text through parse_any
    assert_eq!(
        LeapTable::parse_any(IERS_FILE).map(|t| t.expiry_mjd()),
        Ok(61_584)
    );
}

#[test]
fn ietf_file_matches_builtin_and_hash() {
    let table = LeapTable::parse_ietf_leap_seconds_list(IETF_FILE);
    let table = table.as_ref().map_err(ToString::to_string);
    assert!(table.is_ok(), "{table:?}");
    if let Ok(table) = table {
        // tzdata leap-seconds.list: same 28 steps as ERFA dat.c (its #h SHA-1 verified on parse)
        assert_same_steps(table);
        // "#@ 3991593600" = "File expires on 28 June 2026" (comment in the same file)
        // = MJD 61219 (pyerfa cal2jd)
        assert_eq!(table.expiry_mjd(), 61_219);
        // "#$ 3960835200": 3960835200 / 86400 + 15020 = MJD 60863 = 2025-07-07 (pyerfa jd2cal)
        assert_eq!(table.last_updated(), "2025-07-07 (NTP 3960835200)");
    }
    assert_eq!(
        LeapTable::parse_any(IETF_FILE).map(|t| t.expiry_mjd()),
        Ok(61_219)
    );
}

#[test]
fn builtin_table_shape() {
    let table = LeapTable::builtin();
    // UTC starts 1960-01-01 = MJD 36934 (ERFA dat.c note 1)
    assert_eq!(table.first_utc_mjd(), 36_934);
    // 14 drift-era expressions + 28 integer values 1972-2017 (ERFA dat.c table)
    assert_eq!(table.steps().len(), 42);
    // 1966-1968 expression: 4.3131700 s + (MJD - 39126) x 0.002592 s (USNO tai-utc.dat)
    let s = table.steps().iter().find(|s| s.utc_mjd == 39_126);
    assert_eq!(
        s.map(|s| (s.offset_s, s.drift_reference_mjd, s.drift_s_per_day)),
        Some((4.31317, 39_126.0, 0.002592))
    );
    // expiry of the built-in data: 28 June 2027 (IERS Bulletin C 72)
    assert!(!table.is_beyond_expiry(61_583));
    assert!(table.is_beyond_expiry(61_584));
}

#[test]
fn tai_minus_utc_is_37_s_from_2017() {
    let table = LeapTable::builtin();
    // IERS Bulletin C: TAI - UTC = 37 s from 2017-01-01 (MJD 57754) on
    assert_eq!(table.tai_minus_utc_attos(57_754, 0), Some(37 * ATTOS));
    assert_eq!(
        table.tai_minus_utc_attos(61_000, 12 * 3600 * ATTOS),
        Some(37 * ATTOS)
    );
    // IERS Bulletin C: 36 s during 2016-12-31, including its leap second 23:59:60.5
    assert_eq!(
        table.tai_minus_utc_attos(57_753, 86_400 * ATTOS + ATTOS / 2),
        Some(36 * ATTOS)
    );
    // 2016-12-31 had 86 401 s (IERS Bulletin C 52 announced the leap second)
    assert_eq!(table.utc_day_length_attos(57_753), 86_401 * ATTOS);
    assert_eq!(table.utc_day_length_attos(57_754), 86_400 * ATTOS);
    // 2017-01-01T00:00:00 UTC = 2017-01-01T00:00:37 TAI (IERS Bulletin C):
    // TAI count = (57754 - 51544) d * 86400 s - 43200 s + 37 s
    let expected = ((57_754 - 51_544) * 86_400 - 43_200 + 37) * ATTOS;
    assert_eq!(table.tai_from_utc(57_754, 0), Ok(expected));
    // the leap second 2016-12-31T23:59:60 is the TAI second just before (IERS Bulletin C)
    assert_eq!(
        table.tai_from_utc(57_753, 86_400 * ATTOS),
        Ok(expected - ATTOS)
    );
    assert_eq!(
        table.utc_from_tai(expected - ATTOS / 2),
        Ok((57_753, 86_400 * ATTOS + ATTOS / 2))
    );
    // a normal day has no second 86400 (ITU-R TF.460-6)
    assert!(matches!(
        table.tai_from_utc(57_754, 86_400 * ATTOS),
        Err(UtcRangeError::SecondOutsideDay { .. })
    ));
}
