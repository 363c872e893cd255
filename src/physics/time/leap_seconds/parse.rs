//! Readers of the two published leap-second file formats.
//!
//! - IERS `Leap_Second.dat` (IERS Earth Orientation Centre, Paris Observatory): `#` comments,
//!   one of which reads "File expires on D Month YYYY"; data lines `MJD day month year TAI-UTC`.
//! - IETF/tz `leap-seconds.list` (distributed with the IANA time-zone database): data lines
//!   `NTP-seconds TAI-UTC # comment`; `#$` last update and `#@` expiry in NTP seconds (since
//!   1900-01-01 = MJD 15020); `#h` SHA-1 of the digits of the `#$`, `#@` and data lines.
//!
//! Both give only the 1972+ part, which is validated (starts 1972-01-01 with 10 s, dates
//! increase, steps of +/-1 s, expiry present and after the last step) and appended to the
//! built-in drift era.

use super::builtin::drift_era_segments;
use super::civil::{iso_date, mjd_from_ymd, month_from_name};
use super::segment::Segment;
use super::sha1::sha1_words;
use super::{LeapFileError, LeapTable, FIRST_LEAP_STEP_MJD};

/// MJD of the NTP epoch 1900-01-01 (RFC 5905).
const NTP_EPOCH_MJD: i64 = 15_020;
/// Last day accepted in a file: 9999-12-31.
const LAST_ACCEPTED_MJD: i64 = 2_973_483;
/// TAI - UTC on 1972-01-01 (IERS Bulletin C; ITU-R TF.460-6).
const FIRST_STEP_OFFSET_S: i64 = 10;

/// A data line: the day TAI - UTC becomes `offset_s`.
struct Entry {
    line: usize,
    mjd: i64,
    offset_s: i64,
}

/// What a file says besides its entries.
#[derive(Default)]
struct Header {
    expiry: Option<(usize, i64)>,
    last_updated: String,
}

impl Header {
    fn set_expiry(&mut self, line: usize, mjd: i64, text: &str) -> Result<(), LeapFileError> {
        if self.expiry.is_some() {
            return Err(LeapFileError::malformed(line, "a single expiry date", text));
        }
        self.expiry = Some((line, mjd));
        Ok(())
    }
}

/// Reads the IERS `Leap_Second.dat` format.
pub(crate) fn parse_iers(text: &str) -> Result<LeapTable, LeapFileError> {
    let mut entries = Vec::new();
    let mut header = Header::default();
    let mut lines_read = 0;
    for (index, raw) in text.lines().enumerate() {
        let line = index + 1;
        lines_read = line;
        let trimmed = raw.trim();
        if let Some(comment) = trimmed.strip_prefix('#') {
            let comment = comment.trim();
            if let Some(date) = after_ignoring_case(comment, "file expires on") {
                let mjd = day_month_name_year(date).ok_or_else(|| {
                    LeapFileError::malformed(
                        line,
                        "a date 'D Month YYYY' after 'File expires on'",
                        date,
                    )
                })?;
                header.set_expiry(line, mjd, comment)?;
            } else if after_ignoring_case(comment, "updated through").is_some() {
                header.last_updated = comment.to_string();
            }
        } else if !trimmed.is_empty() {
            entries.push(iers_entry(line, trimmed)?);
        }
    }
    finish(entries, header, lines_read, "IERS Leap_Second.dat")
}

/// One IERS data line: `41317.0    1  1 1972       10`.
fn iers_entry(line: usize, text: &str) -> Result<Entry, LeapFileError> {
    let bad = |expected| LeapFileError::malformed(line, expected, text);
    let fields: Vec<&str> = text.split_whitespace().collect();
    let [mjd, day, month, year, offset] = fields[..] else {
        return Err(bad("five fields: MJD, day, month, year, TAI-UTC"));
    };
    let mjd = whole_number(mjd).ok_or_else(|| bad("an MJD at 0h UTC such as 41317.0"))?;
    let day = day.parse::<i64>().map_err(|_| bad("a day number"))?;
    let month = month.parse::<i64>().map_err(|_| bad("a month number"))?;
    let year = year.parse::<i64>().map_err(|_| bad("a year"))?;
    if mjd_from_ymd(year, month, day) != Some(mjd) {
        return Err(bad("a valid date (years 1-9999) equal to the MJD"));
    }
    let offset_s = whole_number(offset).ok_or_else(|| bad("TAI-UTC in whole seconds"))?;
    Ok(Entry {
        line,
        mjd,
        offset_s,
    })
}

/// Reads the IETF/tz `leap-seconds.list` format.
pub(crate) fn parse_ietf(text: &str) -> Result<LeapTable, LeapFileError> {
    let mut entries = Vec::new();
    let mut header = Header::default();
    let mut hashed_digits = String::new();
    let mut stated_hash: Option<(usize, &str)> = None;
    let mut lines_read = 0;
    for (index, raw) in text.lines().enumerate() {
        let line = index + 1;
        lines_read = line;
        let trimmed = raw.trim();
        if let Some(value) = trimmed.strip_prefix("#@") {
            let mjd = ntp_day(line, value.trim(), "expiry in NTP seconds after #@")?;
            header.set_expiry(line, mjd, trimmed)?;
            hashed_digits.extend(value.chars().filter(char::is_ascii_digit));
        } else if let Some(value) = trimmed.strip_prefix("#$") {
            let mjd = ntp_day(line, value.trim(), "last update in NTP seconds after #$")?;
            header.last_updated = format!("{} (NTP {})", iso_date(mjd), value.trim());
            hashed_digits.extend(value.chars().filter(char::is_ascii_digit));
        } else if let Some(value) = trimmed.strip_prefix("#h") {
            stated_hash = Some((line, value.trim()));
        } else if !trimmed.starts_with('#') && !trimmed.is_empty() {
            let data = trimmed.split('#').next().unwrap_or_default();
            entries.push(ietf_entry(line, data)?);
            hashed_digits.extend(data.chars().filter(char::is_ascii_digit));
        }
    }
    if let Some((line, stated)) = stated_hash {
        check_hash(line, stated, &hashed_digits)?;
    }
    finish(entries, header, lines_read, "IETF leap-seconds.list")
}

/// One IETF data line (comment removed): `2272060800      10`.
fn ietf_entry(line: usize, data: &str) -> Result<Entry, LeapFileError> {
    let bad = |expected| LeapFileError::malformed(line, expected, data.trim());
    let fields: Vec<&str> = data.split_whitespace().collect();
    let [ntp, offset] = fields[..] else {
        return Err(bad("two fields: NTP seconds, TAI-UTC"));
    };
    let mjd = ntp_day(line, ntp, "NTP seconds at 0h UTC (a multiple of 86400)")?;
    if ntp.parse::<u64>().map_or(true, |n| n % 86_400 != 0) {
        return Err(bad("NTP seconds at 0h UTC (a multiple of 86400)"));
    }
    let offset_s = offset
        .parse::<i64>()
        .map_err(|_| bad("TAI-UTC in whole seconds"))?;
    Ok(Entry {
        line,
        mjd,
        offset_s,
    })
}

/// The UTC day (MJD) of an NTP timestamp (seconds since 1900-01-01T00:00:00, RFC 5905).
fn ntp_day(line: usize, text: &str, expected: &'static str) -> Result<i64, LeapFileError> {
    text.parse::<u64>()
        .ok()
        .and_then(|n| i64::try_from(n / 86_400).ok())
        .map(|days| days + NTP_EPOCH_MJD)
        .filter(|mjd| *mjd <= LAST_ACCEPTED_MJD)
        .ok_or_else(|| LeapFileError::malformed(line, expected, text))
}

/// Compares the `#h` words with the SHA-1 of the file's digits.
fn check_hash(line: usize, stated: &str, digits: &str) -> Result<(), LeapFileError> {
    let words: Option<Vec<u32>> = stated
        .split_whitespace()
        .map(|w| u32::from_str_radix(w, 16).ok())
        .collect();
    let words = words
        .filter(|w| w.len() == 5)
        .ok_or_else(|| LeapFileError::malformed(line, "five hexadecimal words after #h", stated))?;
    let computed = sha1_words(digits.as_bytes());
    if words[..] == computed[..] {
        Ok(())
    } else {
        Err(LeapFileError::HashMismatch {
            line,
            stated: stated.chars().take(60).collect(),
            computed: computed.map(|w| format!("{w:08x}")).join(" "),
        })
    }
}

/// Validates the entries and joins them to the built-in drift era.
fn finish(
    entries: Vec<Entry>,
    header: Header,
    lines_read: usize,
    source: &str,
) -> Result<LeapTable, LeapFileError> {
    let first = entries
        .first()
        .ok_or(LeapFileError::NoEntries { line: lines_read })?;
    if first.mjd != FIRST_LEAP_STEP_MJD || first.offset_s != FIRST_STEP_OFFSET_S {
        return Err(LeapFileError::WrongStart {
            line: first.line,
            utc_mjd: first.mjd,
            offset_s: first.offset_s,
        });
    }
    for (previous, entry) in entries.iter().zip(entries.iter().skip(1)) {
        if entry.mjd <= previous.mjd {
            return Err(LeapFileError::NotIncreasing {
                line: entry.line,
                utc_mjd: entry.mjd,
                previous_mjd: previous.mjd,
            });
        }
        let step_s = entry.offset_s.saturating_sub(previous.offset_s);
        if step_s.abs() != 1 {
            return Err(LeapFileError::StepNotOneSecond {
                line: entry.line,
                utc_mjd: entry.mjd,
                step_s,
            });
        }
    }
    let (expiry_line, expiry_mjd) = header
        .expiry
        .ok_or(LeapFileError::MissingExpiry { line: lines_read })?;
    let last_mjd = entries.last().map_or(FIRST_LEAP_STEP_MJD, |e| e.mjd);
    if expiry_mjd <= last_mjd {
        return Err(LeapFileError::malformed(
            expiry_line,
            "an expiry date after the last leap second",
            &iso_date(expiry_mjd),
        ));
    }
    let mut segments = drift_era_segments();
    for entry in &entries {
        let segment = Segment::step(entry.mjd, entry.offset_s).ok_or_else(|| {
            LeapFileError::malformed(entry.line, "TAI-UTC in whole seconds", "out of range")
        })?;
        segments.push(segment);
    }
    Ok(LeapTable::from_segments(
        segments,
        expiry_mjd,
        source.to_string(),
        header.last_updated,
    ))
}

/// Which format `text` is in: true for IETF `leap-seconds.list`.
pub(crate) fn looks_like_ietf(text: &str) -> bool {
    let first_data = text
        .lines()
        .map(str::trim)
        .find(|l| !l.is_empty() && !l.starts_with('#'));
    match first_data.map(|l| {
        l.split('#')
            .next()
            .unwrap_or_default()
            .split_whitespace()
            .count()
    }) {
        Some(2) => true,
        Some(5) => false,
        _ => text
            .lines()
            .map(str::trim)
            .any(|l| l.starts_with("#@") || l.starts_with("#$")),
    }
}

/// The text after `needle` in `haystack`, comparing ASCII case-insensitively.
fn after_ignoring_case<'a>(haystack: &'a str, needle: &str) -> Option<&'a str> {
    let lower = haystack.to_ascii_lowercase();
    let at = lower.find(needle)?;
    haystack.get(at + needle.len()..).map(str::trim)
}

/// `28 June 2027` to its MJD.
fn day_month_name_year(text: &str) -> Option<i64> {
    let fields: Vec<&str> = text.split_whitespace().collect();
    let [day, month, year] = fields[..] else {
        return None;
    };
    mjd_from_ymd(
        year.parse().ok()?,
        month_from_name(month)?,
        day.parse().ok()?,
    )
}

/// An integer written with an optional all-zero fraction: `41317`, `41317.0`, `10.000`.
fn whole_number(text: &str) -> Option<i64> {
    let (whole, fraction) = text.split_once('.').unwrap_or((text, ""));
    if !fraction.chars().all(|c| c == '0') {
        return None;
    }
    whole.parse().ok()
}
