//! Refused inputs: readings outside UTC and malformed leap-second files.

use proptest::prelude::*;

use super::{LeapFileError, LeapTable, UtcRangeError};

const ATTOS: i128 = 1_000_000_000_000_000_000;
const IERS_FILE: &str = include_str!("../../../../tests/reference/Leap_Second.dat");
const IETF_FILE: &str = include_str!("../../../../tests/reference/leap-seconds.list");

/// A small valid IERS file (format of IERS Leap_Second.dat; values of IERS Bulletin C).
const IERS_SMALL: &str = "#  File expires on 28 June 2027
    41317.0    1  1 1972       10
    41499.0    1  7 1972       11
    41683.0    1  1 1973       12
";

/// A small valid IETF file (format of leap-seconds.list; values of IERS Bulletin C), no hash.
const IETF_SMALL: &str = "#@\t3991593600
2272060800\t10\t# 1 Jan 1972
2287785600\t11\t# 1 Jul 1972
";

#[test]
fn readings_outside_utc_are_refused() {
    let table = LeapTable::builtin();
    // UTC begins 1960-01-01 (ERFA dat.c note 1): 1959-12-31 is refused
    assert_eq!(table.tai_from_utc(36_933, 0), Err(UtcRangeError::BeforeUtc));
    assert_eq!(table.tai_minus_utc_attos(36_933, 0), None);
    assert_eq!(table.tai_minus_utc_attos(36_934, -1), None);
    // the TAI count of 1960-01-01T00:00:00 UTC is the first one with a UTC reading
    let start = table.tai_from_utc(36_934, 0);
    assert_eq!(start.and_then(|t| table.utc_from_tai(t)), Ok((36_934, 0)));
    assert_eq!(
        start.and_then(|t| table.utc_from_tai(t - 1)),
        Err(UtcRangeError::BeforeUtc)
    );
    assert_eq!(table.utc_from_tai(i128::MIN), Err(UtcRangeError::BeforeUtc));
    // 2017-01-01 is a normal day of 86400 s (IERS Bulletin C): 86400.5 s does not exist
    let err = table.tai_from_utc(57_754, 86_400 * ATTOS + ATTOS / 2);
    assert_eq!(
        err,
        Err(UtcRangeError::SecondOutsideDay {
            utc_mjd: 57_754,
            sod_attos: 86_400 * ATTOS + ATTOS / 2,
            day_length_attos: 86_400 * ATTOS
        })
    );
    assert!(table.tai_from_utc(57_754, -1).is_err());
    // 2016-12-31 (leap second day, IERS Bulletin C): 86401.0 s does not exist
    assert!(table.tai_from_utc(57_753, 86_401 * ATTOS).is_err());
    // 1961-07-31 was 0.05 s short (TAI - UTC fell 0.05 s on 1961-08-01, USNO tai-utc.dat)
    assert!(table
        .tai_from_utc(37_511, 86_399_960_000_000_000_000_000)
        .is_err());
    // absurd inputs: errors, not panics (project rule: no panics on any input)
    assert_eq!(
        table.tai_from_utc(i64::MAX, 0),
        Err(UtcRangeError::Overflow)
    );
    assert!(table.utc_from_tai(i128::MAX).is_err());
    assert!(table.tai_minus_utc_attos(36_934, i128::MAX).is_none());
    // far future: the last value of the table simply continues (IERS Bulletin C: 37 s)
    assert_eq!(
        table.tai_minus_utc_attos(i64::MAX, i128::MAX),
        Some(37 * ATTOS)
    );
    assert_eq!(table.utc_day_length_attos(i64::MIN), 86_400 * ATTOS);
}

/// The error of parsing a text that must be refused.
fn error_of(result: Result<LeapTable, LeapFileError>) -> LeapFileError {
    match result {
        Ok(t) => panic!(
            "expected an error, got a table of {} steps",
            t.steps().len()
        ),
        Err(e) => e,
    }
}

#[test]
fn small_files_parse() {
    // both formats merged with the drift era: 14 drift expressions + 3 (or 2) steps
    assert_eq!(
        LeapTable::parse_any(IERS_SMALL).map(|t| t.steps().len()),
        Ok(17)
    );
    assert_eq!(
        LeapTable::parse_any(IETF_SMALL).map(|t| t.steps().len()),
        Ok(16)
    );
}

#[test]
fn a_negative_leap_second_shortens_the_day() {
    // ITU-R TF.460-6 allows a negative leap second: TAI - UTC 11 s -> 10 s from 1973-01-01,
    // so 1972-12-31 (MJD 41682) has 86 399 s, 23:59:59 being skipped
    let text = IERS_SMALL.replace("1973       12", "1973       10");
    let table = LeapTable::parse_iers_leap_second_dat(&text);
    assert!(table.is_ok(), "{table:?}");
    if let Ok(table) = table {
        assert_eq!(table.utc_day_length_attos(41_682), 86_399 * ATTOS);
        assert!(table.tai_from_utc(41_682, 86_399 * ATTOS).is_err());
        let last = table.tai_from_utc(41_682, 86_399 * ATTOS - 1);
        let next = table.tai_from_utc(41_683, 0);
        // the last attosecond of the short day is followed by the next day (common practice)
        assert_eq!(last.map(|t| t + 1), next);
        assert_eq!(
            last.and_then(|t| table.utc_from_tai(t)),
            Ok((41_682, 86_399 * ATTOS - 1))
        );
        assert_eq!(next.and_then(|t| table.utc_from_tai(t)), Ok((41_683, 0)));
        assert_eq!(table.tai_minus_utc_attos(41_683, 0), Some(10 * ATTOS));
    }
}

#[test]
fn malformed_iers_files_give_line_numbers() {
    // each case: (text, expected line); the checks follow the IERS Leap_Second.dat format
    let cases: [(&str, usize, &str); 8] = [
        (
            &IERS_SMALL.replace("41499.0", "41499.5"),
            3,
            "an MJD at 0h UTC",
        ),
        (
            &IERS_SMALL.replace("41499.0", "4x499.0"),
            3,
            "an MJD at 0h UTC",
        ),
        (
            &IERS_SMALL.replace(" 1  7 1972", " 2  7 1972"),
            3,
            "equal to the MJD",
        ),
        (
            &IERS_SMALL.replace("7 1972       11", "7 1972"),
            3,
            "five fields",
        ),
        (
            &IERS_SMALL.replace("1973       12", "1973       13"),
            4,
            "+1 s or -1 s",
        ),
        (
            &IERS_SMALL.replace("28 June 2027", "28 Juin 2027"),
            1,
            "D Month YYYY",
        ),
        (
            &IERS_SMALL.replace("28 June 2027", "28 June 1972"),
            1,
            "after the last",
        ),
        (
            &IERS_SMALL.replace("1972       10", "1972       11"),
            2,
            "TAI-UTC 10 s",
        ),
    ];
    for (text, line, expected) in cases {
        let err = error_of(LeapTable::parse_iers_leap_second_dat(text));
        assert_eq!(err.line(), line, "{err}");
        assert!(err.to_string().contains(expected), "{err}");
        assert!(
            err.to_string().starts_with(&format!("line {line}:")),
            "{err}"
        );
    }
    // dates out of order (line 4 before line 3's date)
    let swapped = "#  File expires on 28 June 2027\n 41317.0 1 1 1972 10\n 41683.0 1 1 1973 11\n 41499.0 1 7 1972 12\n";
    let err = error_of(LeapTable::parse_iers_leap_second_dat(swapped));
    assert!(
        matches!(err, LeapFileError::NotIncreasing { line: 4, .. }),
        "{err}"
    );
    // expiry missing: reported at the end of the file (line 3)
    let no_expiry = " 41317.0 1 1 1972 10\n 41499.0 1 7 1972 11\n#\n";
    let err = error_of(LeapTable::parse_iers_leap_second_dat(no_expiry));
    assert_eq!(err, LeapFileError::MissingExpiry { line: 3 });
    // no entries at all
    let err = error_of(LeapTable::parse_any("#  File expires on 28 June 2027\n"));
    assert_eq!(err, LeapFileError::NoEntries { line: 1 });
}

#[test]
fn malformed_ietf_files_give_line_numbers() {
    // leap-seconds.list format (IETF/tz): NTP seconds must be whole days, numbers must parse
    let cases: [(&str, usize, &str); 5] = [
        (
            &IETF_SMALL.replace("2287785600", "2287785601"),
            3,
            "multiple of 86400",
        ),
        (
            &IETF_SMALL.replace("\t11\t", "\televen\t"),
            3,
            "whole seconds",
        ),
        (&IETF_SMALL.replace("3991593600", "soon"), 1, "#@"),
        (&IETF_SMALL.replace("\t11\t", "\t13\t"), 3, "+1 s or -1 s"),
        (&IETF_SMALL.replace("#@\t3991593600\n", ""), 2, "expiry"),
    ];
    for (text, line, expected) in cases {
        let err = error_of(LeapTable::parse_ietf_leap_seconds_list(text));
        assert_eq!(err.line(), line, "{err}");
        assert!(err.to_string().contains(expected), "{err}");
    }
    // a changed value breaks the file's SHA-1 (#h on line 120 of the tzdata file)
    let tampered = IETF_FILE.replace("3692217600      37", "3692217600      38");
    let err = error_of(LeapTable::parse_any(&tampered));
    assert!(
        matches!(err, LeapFileError::HashMismatch { line: 120, .. }),
        "{err}"
    );
    let bad_hash = IETF_FILE.replace("#h\t49db2447", "#h\tzzzz");
    let err = error_of(LeapTable::parse_any(&bad_hash));
    assert_eq!(err.line(), 120, "{err}");
}

proptest! {
    #![proptest_config(ProptestConfig::with_cases(512))]

    /// Any text: the parsers return a table or an error, never panic (project rule).
    #[test]
    fn arbitrary_text_never_panics(text in ".{0,400}") {
        let _ = LeapTable::parse_iers_leap_second_dat(&text);
        let _ = LeapTable::parse_ietf_leap_seconds_list(&text);
        let _ = LeapTable::parse_any(&text);
    }

    /// Real files with one line replaced by arbitrary text: never a panic; errors name a line
    /// inside the file.
    #[test]
    fn corrupted_real_files_never_panic(line in 0usize..130, junk in "[ -~\t]{0,40}", ietf in any::<bool>()) {
        let file = if ietf { IETF_FILE } else { IERS_FILE };
        let text: String = file
            .lines()
            .enumerate()
            .map(|(i, l)| if i == line { junk.clone() } else { l.to_string() })
            .collect::<Vec<_>>()
            .join("\n");
        if let Err(e) = LeapTable::parse_any(&text) {
            prop_assert!(e.line() <= text.lines().count().max(1), "{}", e);
        }
    }

    /// Any UTC reading and any TAI count: a result or an error, never a panic.
    #[test]
    fn arbitrary_readings_never_panic(mjd in any::<i64>(), sod in any::<i128>(), t in any::<i128>()) {
        let table = LeapTable::builtin();
        let _ = table.tai_minus_utc_attos(mjd, sod);
        let _ = table.utc_day_length_attos(mjd);
        let _ = table.tai_from_utc(mjd, sod);
        let _ = table.utc_from_tai(t);
    }
}
