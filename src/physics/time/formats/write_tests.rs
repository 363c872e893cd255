//! The block writers of every form against the previous writer (kept here, unchanged, as the
//! reference): digit-at-a-time long division and `format!`, on edge and pseudo-random instants
//! of every scale, leap seconds, the drift-era UTC days and the ends of the supported years.

use super::super::decimal::write::push_ratio_by_digits;
use super::super::instant::{uniform_count_attos, ATTOS_PER_DAY, ATTOS_PER_SECOND};
use super::gnss_week::{gnss_week_origin_mjd, SECONDS_PER_WEEK};
use super::*;

/// The previous `format_ratio` path (digit-at-a-time), as text.
fn by_digits(numerator: i128, denominator: i128, digits: u32) -> String {
    let mut out = Vec::new();
    push_ratio_by_digits(&mut out, numerator, denominator, digits);
    String::from_utf8_lossy(&out).into_owned()
}

/// The previous `write_instant`, unchanged but for calling the digit-at-a-time division.
fn reference_write_instant(instant: &Instant, table: &LeapTable) -> Option<InstantText> {
    let reading = day_reading(instant, table).ok()?;
    check_mjd_range(reading.mjd).ok()?;
    let day = reading.day_length_attos;
    let mjd_numerator = i128::from(reading.mjd) * day + reading.seconds_of_day_attos;
    let jd_numerator_halves = 2 * mjd_numerator + 4_800_001 * day;
    let count = if instant.scale() == Scale::Utc {
        uniform_count_attos(reading.mjd, reading.seconds_of_day_attos)
    } else {
        instant.count_attos()
    };
    let date = super::super::calendar::CalendarDate::from_mjd(reading.mjd);
    let whole_seconds = reading.seconds_of_day_attos.div_euclid(ATTOS_PER_SECOND);
    let fraction_attos = reading.seconds_of_day_attos.rem_euclid(ATTOS_PER_SECOND);
    let (hour, minute, second) = if whole_seconds >= 86_400 {
        (23, 59, 60 + (whole_seconds - 86_400))
    } else {
        (
            whole_seconds / 3600,
            (whole_seconds / 60) % 60,
            whole_seconds % 60,
        )
    };
    let iso = format!(
        "{:04}-{:02}-{:02}T{hour:02}:{minute:02}:{second:02}.{:012}",
        date.year,
        date.month,
        date.day,
        fraction_attos / 1_000_000
    );
    let gnss_week = gnss_week_origin_mjd(instant.scale()).and_then(|origin_mjd| {
        let since = count - uniform_count_attos(origin_mjd, 0);
        let week_attos = SECONDS_PER_WEEK * ATTOS_PER_SECOND;
        (since >= 0).then(|| {
            let seconds = by_digits(since % week_attos, ATTOS_PER_SECOND, 18);
            format!("{}:{seconds}", since / week_attos)
        })
    });
    Some(InstantText {
        scale: instant.scale(),
        iso,
        mjd: by_digits(mjd_numerator, day, DAY_DECIMALS),
        jd: by_digits(jd_numerator_halves, 2 * day, DAY_DECIMALS),
        j2000_s: by_digits(count, ATTOS_PER_SECOND, 18),
        gnss_week,
    })
}

fn check(instant: Instant, table: &LeapTable) {
    let expected = reference_write_instant(&instant, table);
    let written = write_instant(&instant, table).ok();
    assert_eq!(written, expected, "{instant:?}");
    // The reading kept by the writer is the one the reader computes.
    if let Ok(digits) = InstantDigits::new(&instant, table) {
        assert_eq!(
            Ok(digits.reading_count_attos()),
            reading_count_attos(&instant, table),
            "{instant:?}"
        );
        assert_eq!(
            day_reading(&instant, table).map(|r| r.mjd),
            Ok(digits.mjd()),
            "{instant:?}"
        );
    }
}

struct SplitMix(u64);

impl SplitMix {
    fn next(&mut self) -> u64 {
        // SplitMix64 (Steele, Lea and Flood, OOPSLA 2014).
        self.0 = self.0.wrapping_add(0x9E37_79B9_7F4A_7C15);
        let mut z = self.0;
        z = (z ^ (z >> 30)).wrapping_mul(0xBF58_476D_1CE4_E5B9);
        z = (z ^ (z >> 27)).wrapping_mul(0x94D0_49BB_1331_11EB);
        z ^ (z >> 31)
    }
    fn below(&mut self, bound: u128) -> i128 {
        let wide = (u128::from(self.next()) << 64) | u128::from(self.next());
        (wide % bound.max(1)) as i128
    }
}

#[test]
fn every_form_matches_the_previous_writer_at_the_edges() {
    let table = LeapTable::builtin();
    let first = uniform_count_attos(FIRST_MJD, 0);
    let last = uniform_count_attos(LAST_MJD + 1, 0);
    for scale in Scale::ALL {
        for count in [
            first,
            first + 1,
            last - 1,
            last,
            first - 1,
            0,
            1,
            -1,
            ATTOS_PER_DAY / 2,
        ] {
            check(Instant::from_count_attos(scale, count), table);
        }
        for mjd in [-1, 0, 1, 44_244, 51_412, 53_736, 57_753, 57_754] {
            let midnight = uniform_count_attos(mjd, 0);
            for offset in [-ATTOS_PER_SECOND, -1, 0, 1, ATTOS_PER_SECOND - 1] {
                check(Instant::from_count_attos(scale, midnight + offset), table);
            }
        }
    }
    // Inside leap seconds and on the days around them, and on drift-era days (1961-1971).
    for text in [
        "2016-12-31T23:59:60",
        "2016-12-31T23:59:60.999999999999999999",
        "2016-12-31T23:59:59.999999999999999999",
        "1972-06-30T23:59:60.5",
        "1972-01-01T00:00:00",
        "1968-02-01T00:00:00.000000000000000001",
        "1961-08-01T12:34:56.789",
        "1960-01-01T00:00:00",
    ] {
        let instant = parse_instant(text, InstantFormat::Iso, Scale::Utc, table);
        check(instant.unwrap_or_else(|e| panic!("{text}: {e}")), table);
    }
}

#[test]
fn every_form_matches_the_previous_writer_on_random_instants() {
    let table = LeapTable::builtin();
    let mut random = SplitMix(20_260_314);
    let first = uniform_count_attos(FIRST_MJD, 0);
    let span = (uniform_count_attos(LAST_MJD + 1, 0) - first) as u128;
    let utc_first = uniform_count_attos(table.first_utc_mjd(), 0);
    let utc_span = (uniform_count_attos(LAST_MJD, 0) - utc_first) as u128;
    for _ in 0..4_000 {
        for scale in Scale::ALL {
            let count = if scale == Scale::Utc {
                utc_first + random.below(utc_span)
            } else {
                first + random.below(span)
            };
            check(Instant::from_count_attos(scale, count), table);
            // Round attosecond counts (whole seconds, milliseconds) trim differently.
            let unit =
                [ATTOS_PER_SECOND, 1_000_000_000_000_000, 1_000_000][random.below(3) as usize];
            check(Instant::from_count_attos(scale, count / unit * unit), table);
        }
    }
    // Every UTC leap second of the table, at random points inside it and around it.
    for step in table.steps() {
        for _ in 0..20 {
            let second = random.below(3) - 1;
            let attos = random.below(ATTOS_PER_SECOND as u128);
            let tai = uniform_count_attos(step.utc_mjd, 0) + second * ATTOS_PER_SECOND + attos;
            for offset in [0, 10, 20, 30, 37] {
                let instant =
                    Instant::from_count_attos(Scale::Utc, tai + offset * ATTOS_PER_SECOND);
                check(instant, table);
            }
        }
    }
}

fn unix_s_of(instant: &Instant, table: &LeapTable) -> Option<String> {
    let digits = InstantDigits::new(instant, table).ok()?;
    let mut out = Vec::new();
    digits
        .push_form(InstantFormat::UnixS, &mut out)
        .then(|| String::from_utf8(out).unwrap_or_default())
}

#[test]
fn unix_seconds_are_posix_time_and_read_back() {
    // POSIX time (IEEE Std 1003.1-2017, 4.16 "Seconds Since the Epoch"): 86 400 s per day
    // since 1970-01-01; the values checked against Python's calendar.timegm (common practice).
    let table = LeapTable::builtin();
    for (iso, unix) in [
        ("2026-03-14T06:30:00", "1773469800.0"),
        ("2026-03-14T06:30:00.25", "1773469800.25"),
        ("2017-01-01T00:00:00", "1483228800.0"),
        // Inside the leap second of 2016-12-31 the count is that of the next second.
        ("2016-12-31T23:59:60.5", "1483228800.5"),
        ("1969-12-31T23:59:59.75", "-0.25"),
    ] {
        let instant = parse_instant(iso, InstantFormat::Iso, Scale::Utc, table)
            .unwrap_or_else(|e| panic!("{iso}: {e}"));
        assert_eq!(unix_s_of(&instant, table).as_deref(), Some(unix), "{iso}");
    }
    // Outside UTC there is no such form.
    let tai = Instant::from_count_attos(Scale::Tai, 0);
    assert_eq!(unix_s_of(&tai, table), None);
    // Random UTC instants outside leap seconds read back exactly.
    let mut random = SplitMix(7_070_707);
    let utc_first = uniform_count_attos(table.first_utc_mjd(), 0);
    let utc_span = (uniform_count_attos(LAST_MJD, 0) - utc_first) as u128;
    for _ in 0..2_000 {
        let instant = Instant::from_count_attos(Scale::Utc, utc_first + random.below(utc_span));
        let Some(reading) = day_reading(&instant, table).ok() else {
            continue;
        };
        if reading.seconds_of_day_attos >= 86_400 * ATTOS_PER_SECOND {
            continue;
        }
        let text = unix_s_of(&instant, table).unwrap_or_default();
        let back = parse_instant(&text, InstantFormat::UnixS, Scale::Utc, table);
        assert_eq!(back.ok(), Some(instant), "{text}");
    }
}
