//! The readers: real files, the refused shapes with their line numbers, and no panic on any
//! text (real lines of astropy-iers-data 0.2026.11.2.0.34.55 corrupted, and random strings).

use proptest::prelude::*;

use super::{parse_any, parse_c04, parse_finals2000a, parse_snapshot, EopErrorCode, EopStatus};

const FINALS: &str = include_str!("../../../../tests/reference/eop_finals2000A_2026_2027.all");
const C04: &str = include_str!("../../../../tests/reference/eop_c04_leap_2016.txt");
const SNAPSHOT: &str = include_str!("../data/eop_snapshot.txt");

/// `text` with line `n` (1-based) replaced by `with`.
fn replace_line(text: &str, n: usize, with: &str) -> String {
    let mut lines: Vec<&str> = text.lines().collect();
    lines[n - 1] = with;
    lines.join("\n")
}

fn line(text: &str, n: usize) -> &str {
    text.lines().nth(n - 1).unwrap()
}

#[test]
fn finals_excerpt_reads_with_flags_and_missing_columns() {
    // source: finals2000A.all 2026-08-01 .. end (astropy-iers-data 0.2026.11.2.0.34.55)
    let t = parse_finals2000a(FINALS).unwrap();
    assert_eq!(t.source(), "IERS Bulletin A finals2000A");
    assert_eq!(t.first_mjd(), Some(61_253));
    assert_eq!(t.last_mjd(), Some(61_707)); // the 50 dated lines without values are skipped
    let d = t.day(61_335).unwrap(); // "261022 61335.00 I  0.149159 ... I-0.0428601"
    assert_eq!((d.xp_arcsec, d.ut1_minus_utc_s), (0.149159, -0.0428601));
    assert_eq!((d.status, d.lod_s), (EopStatus::Observed, None));
    let p = t.day(61_336).unwrap(); // first P line, e_x 0.000600, e_UT1 0.0000297
    assert_eq!(p.status, EopStatus::Predicted);
    assert_eq!(p.sigma.map(|s| s.xp_arcsec), Some(0.000600));
    assert_eq!(p.sigma.map(|s| s.ut1_minus_utc_s), Some(0.0000297));
    assert_eq!(t.day(61_416).unwrap().dx_arcsec, Some(0.478 / 1e3));
    assert_eq!(t.day(61_417).unwrap().dx_arcsec, None);
    assert_eq!(t.day(61_326).unwrap().nutation_status, EopStatus::Observed);
    assert_eq!(t.day(61_327).unwrap().nutation_status, EopStatus::Predicted);
    assert_eq!(parse_any(FINALS).unwrap(), t);
}

#[test]
fn c04_formats_read() {
    // source: eopc04.1962-now (EOP 20 C04); the EOP 14 C04 line is in the 14 C04 layout from
    // memory, with the values of the 20 C04 line of 2017-01-01
    let t = parse_c04(C04).unwrap();
    let d = t.day(57_754).unwrap();
    assert_eq!((d.xp_arcsec, d.yp_arcsec), (0.080549, 0.263128));
    assert_eq!(d.ut1_minus_utc_s, 0.5912870);
    assert_eq!(parse_any(C04).unwrap(), t);
    let c14 = "  EOP (IERS) 14 C04 TIME SERIES\n\
               2017   1   1  57754   0.080549   0.263128   0.5912870   0.0008303   0.000120  -0.000023   0.000037   0.000036   0.0000122   0.0000099   0.000060   0.000060\n";
    let t14 = parse_any(c14).unwrap();
    assert_eq!(t14.source(), "IERS EOP 14 C04");
    let e = t14.day(57_754).unwrap();
    assert_eq!(
        (e.xp_arcsec, e.ut1_minus_utc_s, e.lod_s),
        (0.080549, 0.5912870, Some(0.0008303))
    );
    assert_eq!(
        (e.dx_arcsec, e.dy_arcsec),
        (Some(0.000120), Some(-0.000023))
    );
}

#[test]
fn malformed_finals_lines_are_named() {
    // source: finals2000A.all excerpt, line 10 altered (column layout of ReadMe.finals2000A)
    let good = line(FINALS, 10).to_string();
    let cases: [(String, EopErrorCode); 7] = [
        (good[..50].to_string(), EopErrorCode::Truncated), // truncated before y_p
        (
            format!("{}X{}", &good[..16], &good[17..]),
            EopErrorCode::BadFlag,
        ),
        (
            format!("{}NaN      {}", &good[..18], &good[27..]),
            EopErrorCode::BadNumber,
        ),
        (
            format!("{} 3.000000{}", &good[..18], &good[27..]),
            EopErrorCode::OutOfRange,
        ),
        (
            format!("{}2{}", &good[..4], &good[5..]),
            EopErrorCode::DateMismatch,
        ),
        (
            format!("{}é{}", &good[..20], &good[22..]),
            EopErrorCode::BadNumber,
        ),
        (String::new() + "garbage", EopErrorCode::BadNumber),
    ];
    for (text, code) in cases {
        let err = parse_finals2000a(&replace_line(FINALS, 10, &text)).unwrap_err();
        assert_eq!((err.line, err.code), (10, code), "{text:?}: {err}");
    }
    // a missing day: the line after the gap is named
    let mut lines: Vec<&str> = FINALS.lines().collect();
    lines.remove(9);
    let err = parse_finals2000a(&lines.join("\n")).unwrap_err();
    assert_eq!((err.line, err.code), (10, EopErrorCode::NotDaily), "{err}");
    assert!(
        err.to_string().starts_with("line 10: expected MJD 61262"),
        "{err}"
    );
    // nothing at all
    let err = parse_finals2000a("\n\n").unwrap_err();
    assert_eq!((err.line, err.code), (2, EopErrorCode::NoData));
}

#[test]
fn malformed_c04_lines_are_named() {
    // source: eopc04.1962-now excerpt (2016-12-01 .. 2017-01-31), line 10 altered
    let good = line(C04, 10).to_string();
    let fields: Vec<&str> = good.split_whitespace().collect();
    let cases: [(String, EopErrorCode); 4] = [
        (fields[..12].join(" "), EopErrorCode::Truncated),
        (
            good.replacen("   0  ", "  12  ", 1),
            EopErrorCode::OutOfRange,
        ),
        (
            good.replacen(fields[7], "1.5e0", 1),
            EopErrorCode::BadNumber,
        ),
        (
            good.replacen(fields[2], "31", 1),
            EopErrorCode::DateMismatch,
        ),
    ];
    for (text, code) in cases {
        let err = parse_c04(&replace_line(C04, 10, &text)).unwrap_err();
        assert_eq!((err.line, err.code), (10, code), "{text:?}: {err}");
    }
    let truncated: String = C04.chars().take(C04.len() - 100).collect();
    let err = parse_c04(&truncated).unwrap_err();
    assert_eq!(err.line, truncated.lines().count());
    assert_eq!(err.code, EopErrorCode::Truncated);
}

#[test]
fn truncated_snapshot_is_refused() {
    // source: src/physics/earth/data/eop_snapshot.txt cut in the middle of a column
    let cut: String = SNAPSHOT.lines().take(2000).collect::<Vec<_>>().join("\n");
    let err = parse_snapshot(&cut).unwrap_err();
    assert_eq!(
        (err.line, err.code),
        (2000, EopErrorCode::BadSnapshot),
        "{err}"
    );
    assert!(parse_snapshot(SNAPSHOT).is_ok());
}

/// A small deterministic generator (Knuth MMIX LCG) so the corruption is reproducible.
fn lcg(state: &mut u64) -> u64 {
    *state = state
        .wrapping_mul(6_364_136_223_846_793_005)
        .wrapping_add(1_442_695_040_888_963_407);
    *state >> 33
}

#[test]
fn corrupted_real_lines_never_panic() {
    // source: the excerpts above, each of 3000 variants with a few bytes replaced, a line cut
    // or a multi-byte character inserted; every reader must return, Ok or Err
    let mut state = 20_261_202_u64;
    let pieces = [' ', '.', '-', '9', 'P', 'I', '#', 'é', '\t', '0'];
    for base in [FINALS, C04, &SNAPSHOT[..20_000]] {
        let base: Vec<char> = base.chars().collect();
        for _ in 0..3000 {
            let mut text = base.clone();
            for _ in 0..(lcg(&mut state) % 4 + 1) {
                let at = (lcg(&mut state) as usize) % text.len();
                match lcg(&mut state) % 3 {
                    0 => text[at] = pieces[(lcg(&mut state) % 10) as usize],
                    1 => text.truncate(at.max(1)),
                    _ => text.insert(at, pieces[(lcg(&mut state) % 10) as usize]),
                }
            }
            let text: String = text.into_iter().collect();
            let _ = parse_any(&text);
            let _ = parse_finals2000a(&text);
            let _ = parse_c04(&text);
            let _ = parse_snapshot(&text);
        }
    }
}

proptest! {
    #[test]
    fn random_text_never_panics(text in "\\PC{0,400}") {
        let _ = parse_any(&text);
        let _ = parse_finals2000a(&text);
        let _ = parse_c04(&text);
        let _ = parse_snapshot(&text);
    }

    #[test]
    fn random_digits_in_finals_columns_never_panic(text in "[0-9 .IP+-]{0,200}(\n[0-9 .IP+-]{0,200}){0,5}") {
        let _ = parse_finals2000a(&text);
        let _ = parse_c04(&text);
    }
}
