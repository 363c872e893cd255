//! Property tests of every text parser of the time engine.
//!
//! 1. Robustness: arbitrary text and near-valid text (valid samples with random edits) give a
//!    value or an error, never a panic; an accepted instant is written and read back.
//! 2. Round trips: every form `write_instant` produces reads back to the same instant (exactly
//!    for `j2000_s`, `mjd`, `jd`, `gnss_week`; to the 12th decimal of a second for `iso`),
//!    for all scales, UTC from 1960 including inside leap seconds.
//!
//! 256 cases per property by default (`PROPTEST_CASES` overrides). Adding a parser: write its
//! valid samples, then one `proptest!` block calling it on `arbitrary_text()` and
//! `near_valid(samples)` (see `leap_second_files_never_panic`).

mod proptest_support;

use proptest::prelude::*;
use proptest_support::{arbitrary_text, config, near_valid};

use eigenzeit::physics::time::calendar::{CalendarDate, UNIX_EPOCH_MJD};
use eigenzeit::physics::time::decimal::{format_attos_as_seconds, format_ratio, ExactDecimal};
use eigenzeit::physics::time::formats::{
    day_reading, gnss_week_origin_mjd, parse_instant, parse_iso, reading_count_attos,
    write_instant, InstantFormat, FIRST_MJD, LAST_MJD,
};
use eigenzeit::physics::time::instant::{
    uniform_count_attos, Instant, ATTOS_PER_DAY, ATTOS_PER_SECOND,
};
use eigenzeit::physics::time::leap_seconds::{LeapTable, FIRST_LEAP_STEP_MJD};
use eigenzeit::physics::time::scale::Scale;

/// Every instant format, from the engine's own vocabulary.
const FORMATS: [InstantFormat; InstantFormat::ALL.len()] = InstantFormat::ALL;
/// Attoseconds below the 12th decimal of a second (the `iso` form's last digit).
const ISO_RESOLUTION_ATTOS: i128 = 1_000_000;
/// The IERS and IETF leap-second files committed as reference data.
const IERS_FILE: &str = include_str!("reference/Leap_Second.dat");
const IETF_FILE: &str = include_str!("reference/leap-seconds.list");

fn table() -> &'static LeapTable {
    LeapTable::builtin()
}

/// UTC days that end with a positive leap second (1972 on), from the built-in table.
fn leap_second_days() -> Vec<i64> {
    let steps = table().steps();
    steps
        .iter()
        .zip(steps.iter().skip(1))
        .filter(|(before, after)| {
            after.utc_mjd > FIRST_LEAP_STEP_MJD && after.offset_s > before.offset_s
        })
        .map(|(_, after)| after.utc_mjd - 1)
        .collect()
}

fn second_of_day(day_length_attos: i128) -> impl Strategy<Value = i128> {
    prop_oneof![
        0..day_length_attos,
        (0..day_length_attos / ATTOS_PER_SECOND).prop_map(|s| s * ATTOS_PER_SECOND),
        (1..=ATTOS_PER_SECOND).prop_map(move |back| day_length_attos - back),
    ]
}

/// A UTC instant from a reading (day, second of day) anywhere from 1960 to 9999, or inside
/// one of the leap seconds.
fn utc_instant() -> impl Strategy<Value = Instant> {
    let first = table().first_utc_mjd();
    let any_day = prop_oneof![first..=LAST_MJD, first..=first + 20_000];
    let leap_day = prop::sample::select(leap_second_days());
    let reading = prop_oneof![
        any_day
            .prop_flat_map(|mjd| { (Just(mjd), second_of_day(table().utc_day_length_attos(mjd))) }),
        (leap_day, 0..ATTOS_PER_SECOND).prop_map(|(mjd, f)| (mjd, 86_400 * ATTOS_PER_SECOND + f)),
    ];
    reading.prop_filter_map("a UTC reading of the table", |(mjd, sod)| {
        table()
            .tai_from_utc(mjd, sod)
            .ok()
            .map(|tai| Instant::from_count_attos(Scale::Utc, tai))
    })
}

/// An instant of a uniform scale anywhere from 0001-01-01 to 9999-12-31.
fn uniform_instant() -> impl Strategy<Value = Instant> {
    let scales: Vec<Scale> = Scale::ALL
        .into_iter()
        .filter(|s| *s != Scale::Utc)
        .collect();
    (
        prop::sample::select(scales),
        FIRST_MJD..=LAST_MJD,
        second_of_day(ATTOS_PER_DAY),
    )
        .prop_map(|(scale, mjd, sod)| {
            Instant::from_count_attos(scale, uniform_count_attos(mjd, sod))
        })
}

fn any_instant() -> impl Strategy<Value = Instant> {
    prop_oneof![uniform_instant(), utc_instant()]
}

/// Valid instant texts in each format, for mutation.
fn valid_instant_texts() -> Vec<String> {
    [
        "2026-03-14T06:30:00.123456789012",
        "2026-073T06:30:00",
        "2016-12-31T23:59:60.999999999999Z",
        "1960-01-01T00:00:00",
        "9999-12-31T23:59:59.999999999999999999",
        "61113.271527777777777777777777",
        "2461113.771527777777777777777777",
        "826000000.123456789012345678",
        "-43200",
        "1773469800.5",
        "2410:540000.000000000001",
        "0:0",
    ]
    .iter()
    .map(|s| s.to_string())
    .collect()
}

/// An accepted instant writes, and its written `mjd` and `j2000_s` read back to it.
fn check_accepted(instant: &Instant, text: &str) -> Result<(), TestCaseError> {
    let written = write_instant(instant, table());
    // A parsed instant is inside 0001..9999 and (UTC) after 1960, so it can be written
    // (common practice: what a service accepts it can answer).
    let written = written.map_err(|e| TestCaseError::fail(format!("{text:?}: {e}")))?;
    let back = parse_instant(&written.mjd, InstantFormat::Mjd, instant.scale(), table());
    // Lossless mjd form (the README: instants in answers are lossless decimal strings).
    prop_assert_eq!(back, Ok(*instant), "{:?} -> {:?}", text, written.mjd);
    Ok(())
}

proptest! {
    #![proptest_config(config(256))]

    #[test]
    fn instant_text_never_panics(
        text in prop_oneof![arbitrary_text(), near_valid(valid_instant_texts())],
        format in prop::sample::select(FORMATS.to_vec()),
        scale in prop::sample::select(Scale::ALL.to_vec()),
    ) {
        if let Ok(instant) = parse_instant(&text, format, scale, table()) {
            prop_assert_eq!(instant.scale(), scale);
            check_accepted(&instant, &text)?;
        }
        let _ = parse_iso(&text);
        let _ = text.parse::<InstantFormat>();
        let _ = text.parse::<Scale>();
        // The exact readers of the request vocabulary: a value only for a listed spelling.
        if let Some(format) = InstantFormat::from_name(&text) {
            prop_assert_eq!(format.as_str(), text.as_str());
        }
        if let Some(scale) = Scale::from_name(&text) {
            prop_assert_eq!(scale.as_str(), text.as_str());
        }
    }

    #[test]
    fn every_written_form_reads_back(instant in any_instant()) {
        let table = table();
        let scale = instant.scale();
        let written = write_instant(&instant, table)
            .map_err(|e| TestCaseError::fail(e.to_string()))?;
        let reading = day_reading(&instant, table)
            .map_err(|e| TestCaseError::fail(e.to_string()))?;
        let read = |text: &str, format| parse_instant(text, format, scale, table);

        // mjd and jd: 24 decimals of a day are below an attosecond, so exact
        // (the README: lossless decimal strings; common practice for exact decimals).
        prop_assert_eq!(read(&written.mjd, InstantFormat::Mjd), Ok(instant), "{}", written.mjd);
        prop_assert_eq!(read(&written.jd, InstantFormat::Jd), Ok(instant), "{}", written.jd);

        // iso: 12 decimals, truncated, so the same reading cut to 1e-12 s (the OpenAPI document, `InstantForms.iso`).
        let from_iso = read(&written.iso, InstantFormat::Iso)
            .and_then(|i| day_reading(&i, table));
        let cut = reading.seconds_of_day_attos
            - reading.seconds_of_day_attos.rem_euclid(ISO_RESOLUTION_ATTOS);
        prop_assert_eq!(from_iso.map(|r| (r.mjd, r.seconds_of_day_attos)), Ok((reading.mjd, cut)),
            "{}", written.iso);
        if scale == Scale::Utc {
            // Z marks UTC (ISO 8601): with or without it, the same instant.
            let zulu = format!("{}Z", written.iso);
            prop_assert_eq!(read(&zulu, InstantFormat::Iso), read(&written.iso, InstantFormat::Iso));
        }
        // The ordinal date names the same day (ISO 8601 4.1.3).
        let date = CalendarDate::from_mjd(reading.mjd);
        let ordinal = format!("{:04}-{:03}{}", date.year, date.day_of_year(), &written.iso[10..]);
        prop_assert_eq!(read(&ordinal, InstantFormat::Iso), read(&written.iso, InstantFormat::Iso));

        // j2000_s: exact, except that UTC counts 86 400 s per day, so the reading of a leap
        // second is shared with the next day's first second (ERFA quasi-JD convention).
        let from_count = read(&written.j2000_s, InstantFormat::J2000S);
        if reading.seconds_of_day_attos < ATTOS_PER_DAY {
            prop_assert_eq!(from_count.clone(), Ok(instant), "{}", written.j2000_s);
        } else {
            let next_day = from_count.clone().and_then(|i| day_reading(&i, table));
            prop_assert_eq!(next_day.map(|r| (r.mjd, r.seconds_of_day_attos)),
                Ok((reading.mjd + 1, reading.seconds_of_day_attos - ATTOS_PER_DAY)));
            if reading.mjd >= FIRST_LEAP_STEP_MJD {
                // A 1972+ leap second is one SI second (ITU-R TF.460-6).
                prop_assert_eq!(from_count.clone().map(|i| i.count_attos()),
                    Ok(instant.count_attos() + ATTOS_PER_SECOND));
            }
        }
        if scale == Scale::Utc {
            // unix_s is j2000_s shifted by the 1970-01-01 to J2000.0 span (POSIX: 86 400 s/day).
            let count = reading_count_attos(&instant, table)
                .map_err(|e| TestCaseError::fail(e.to_string()))?;
            let unix = format_attos_as_seconds(count - uniform_count_attos(UNIX_EPOCH_MJD, 0));
            prop_assert_eq!(read(&unix, InstantFormat::UnixS), from_count, "{}", unix);
        }

        // gnss_week: exact, for GNSS scales from week 0 (IS-GPS-200 6.2.4).
        match &written.gnss_week {
            Some(week) => prop_assert_eq!(read(week, InstantFormat::GnssWeek), Ok(instant)),
            None => prop_assert!(gnss_week_origin_mjd(scale)
                .is_none_or(|mjd| instant.count_attos() < uniform_count_attos(mjd, 0))),
        }
    }

    #[test]
    fn decimals_never_panic(text in prop_oneof![arbitrary_text(), near_valid(valid_instant_texts())]) {
        if let Ok(value) = ExactDecimal::parse(&text) {
            let _ = value.times_attos(ATTOS_PER_SECOND);
            let _ = value.times_attos(86_401 * ATTOS_PER_SECOND);
            let (whole, fraction) = value.floor_split();
            // floor split: 0 <= fraction < 1 and whole + fraction == value (common practice).
            prop_assert!((0..10_i128.pow(24)).contains(&fraction));
            // (Compared on the whole-part difference, which is 0 or -1, to stay inside i128.)
            let whole_difference = whole - value.signed_integer_part();
            prop_assert!(whole_difference == 0 || whole_difference == -1);
            let signed_fraction =
                if value.negative { -value.fraction_e24 } else { value.fraction_e24 };
            prop_assert_eq!(whole_difference * 10_i128.pow(24) + fraction, signed_fraction);
        }
    }

    #[test]
    fn decimals_read_their_value(
        negative in any::<bool>(),
        integer in "[0-9]{1,15}",
        fraction in proptest::option::of("[0-9]{0,18}"),
    ) {
        let text = format!(
            "{}{integer}{}",
            if negative { "-" } else { "" },
            fraction.as_deref().map(|f| format!(".{f}")).unwrap_or_default()
        );
        // Reference value by integer text arithmetic (common practice): digits padded to 18.
        let padded = format!("{:0<18}", fraction.clone().unwrap_or_default());
        let magnitude = integer.parse::<i128>().unwrap_or(i128::MAX) * ATTOS_PER_SECOND
            + padded.parse::<i128>().unwrap_or(i128::MAX);
        let expected = if negative { -magnitude } else { magnitude };
        prop_assert_eq!(ExactDecimal::parse(&text).map(|d| d.times_attos(ATTOS_PER_SECOND)),
            Ok(expected), "{}", text);
    }

    #[test]
    fn written_decimals_read_back(
        attos in -(10_i128.pow(15) * ATTOS_PER_SECOND)..10_i128.pow(15) * ATTOS_PER_SECOND,
        day_attos in 0..ATTOS_PER_DAY * 10_i128.pow(7),
    ) {
        // Exact decimal writing and reading are inverse (common practice).
        let text = format_attos_as_seconds(attos);
        prop_assert_eq!(ExactDecimal::parse(&text).map(|d| d.times_attos(ATTOS_PER_SECOND)),
            Ok(attos), "{}", text);
        // 24 decimals of an 86 401 s day are below an attosecond (the OpenAPI document: lossless mjd).
        let day = 86_401 * ATTOS_PER_SECOND;
        let text = format_ratio(day_attos, day, 24);
        prop_assert_eq!(ExactDecimal::parse(&text).map(|d| d.times_attos(day)), Ok(day_attos),
            "{}", text);
    }
}

/// The IETF file without its `#h` line, so that edits reach the checks past the hash.
fn ietf_without_hash() -> String {
    IETF_FILE
        .lines()
        .filter(|line| !line.starts_with("#h"))
        .collect::<Vec<_>>()
        .join("\n")
}

/// An IERS-format file with the given leap-second days, written from scratch.
fn iers_file(step_days: &[(i64, i64)], expiry_mjd: i64) -> String {
    let expiry = CalendarDate::from_mjd(expiry_mjd);
    let months = [
        "January",
        "February",
        "March",
        "April",
        "May",
        "June",
        "July",
        "August",
        "September",
        "October",
        "November",
        "December",
    ];
    let month_name = months
        .get(expiry.month as usize - 1)
        .copied()
        .unwrap_or("January");
    let mut text = format!(
        "#  File expires on {} {month_name} {}\n",
        expiry.day, expiry.year
    );
    for (mjd, offset) in step_days {
        let d = CalendarDate::from_mjd(*mjd);
        text.push_str(&format!(
            "    {mjd}.0   {:2} {:2} {:4}   {offset:6}\n",
            d.day, d.month, d.year
        ));
    }
    text
}

proptest! {
    #![proptest_config(config(256))]

    #[test]
    fn leap_second_files_never_panic(
        text in prop_oneof![
            arbitrary_text(),
            near_valid(vec![IERS_FILE.to_string(), IETF_FILE.to_string(), ietf_without_hash()]),
        ]
    ) {
        if let Ok(parsed) = LeapTable::parse_any(&text) {
            // An accepted table starts at 1960-01-01 (built-in drift era), its steps increase,
            // and it expires after its last step (IERS Bulletin C; the parser's contract).
            prop_assert_eq!(parsed.first_utc_mjd(), 36_934);
            let steps = parsed.steps();
            prop_assert!(steps.windows(2).all(|w| w[0].utc_mjd < w[1].utc_mjd));
            prop_assert!(steps.last().is_some_and(|s| s.utc_mjd < parsed.expiry_mjd()));
        }
    }

    #[test]
    fn generated_leap_second_files_read_back(
        gaps in prop::collection::vec((1_i64..2_000, any::<bool>()), 0..40),
        expiry_after in 1_i64..4_000,
    ) {
        let mut mjd = FIRST_LEAP_STEP_MJD;
        let mut offset = 10;
        let mut days = vec![(mjd, offset)];
        for (gap, up) in gaps {
            mjd += gap;
            offset += if up { 1 } else { -1 };
            days.push((mjd, offset));
        }
        let text = iers_file(&days, mjd + expiry_after);
        let parsed = LeapTable::parse_any(&text)
            .map_err(|e| TestCaseError::fail(format!("{e}\n{text}")))?;
        // The 1972+ steps are the file's lines (IERS Leap_Second.dat format).
        let read: Vec<(i64, i64)> = parsed
            .steps()
            .iter()
            .filter(|s| s.utc_mjd >= FIRST_LEAP_STEP_MJD)
            .map(|s| (s.utc_mjd, s.offset_s as i64))
            .collect();
        prop_assert_eq!(read, days);
        prop_assert_eq!(parsed.expiry_mjd(), mjd + expiry_after);
    }
}

#[test]
fn reference_files_parse() {
    // The committed IERS and IETF files are valid (tests/reference, with their versions);
    // a check that the near-valid samples start from accepted texts.
    for text in [
        IERS_FILE.to_string(),
        IETF_FILE.to_string(),
        ietf_without_hash(),
    ] {
        assert!(LeapTable::parse_any(&text).is_ok());
    }
    // The samples of instant text are accepted in some format and scale (common practice).
    for text in valid_instant_texts() {
        let accepted = FORMATS.iter().any(|format| {
            Scale::ALL
                .iter()
                .any(|scale| parse_instant(&text, *format, *scale, table()).is_ok())
        });
        assert!(accepted, "{text}");
    }
}
