//! Proleptic Gregorian calendar dates and Modified Julian Day numbers (private helpers of the
//! leap-second table; the service-wide calendar lives elsewhere).

/// MJD of 1970-01-01 (JD 2440587.5).
const MJD_OF_1970_01_01: i64 = 40_587;

/// Modified Julian Day number of a Gregorian calendar date.
///
/// Given: `year`, `month` (1..=12), `day` (1..=31).
/// Returns: the MJD, or `None` for a date that does not exist or a year outside 1..=9999.
///
/// Reference: H. Hinnant, "chrono-Compatible Low-Level Date Algorithms", `days_from_civil`
/// (public domain), shifted from the 1970-01-01 epoch to MJD.
pub(crate) fn mjd_from_ymd(year: i64, month: i64, day: i64) -> Option<i64> {
    if !(1..=9999).contains(&year) || !(1..=12).contains(&month) {
        return None;
    }
    if day < 1 || day > days_in_month(year, month) {
        return None;
    }
    let y = if month <= 2 { year - 1 } else { year };
    let era = y.div_euclid(400);
    let yoe = y - era * 400;
    let mp = (month + 9) % 12;
    let doy = (153 * mp + 2) / 5 + day - 1;
    let doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;
    Some(era * 146_097 + doe - 719_468 + MJD_OF_1970_01_01)
}

/// Gregorian calendar date (year, month, day) of a Modified Julian Day number.
///
/// Reference: H. Hinnant, "chrono-Compatible Low-Level Date Algorithms", `civil_from_days`.
/// Valid for any MJD whose year fits in `i64` (callers pass table dates only).
pub(crate) fn ymd_from_mjd(mjd: i64) -> (i64, i64, i64) {
    let z = mjd
        .saturating_sub(MJD_OF_1970_01_01)
        .saturating_add(719_468);
    let era = z.div_euclid(146_097);
    let doe = z - era * 146_097;
    let yoe = (doe - doe / 1460 + doe / 36_524 - doe / 146_096) / 365;
    let doy = doe - (365 * yoe + yoe / 4 - yoe / 100);
    let mp = (5 * doy + 2) / 153;
    let day = doy - (153 * mp + 2) / 5 + 1;
    let month = if mp < 10 { mp + 3 } else { mp - 9 };
    let year = yoe + era * 400 + i64::from(month <= 2);
    (year, month, day)
}

fn days_in_month(year: i64, month: i64) -> i64 {
    match month {
        2 if (year % 4 == 0 && year % 100 != 0) || year % 400 == 0 => 29,
        2 => 28,
        4 | 6 | 9 | 11 => 30,
        _ => 31,
    }
}

/// English month name (as in IERS files) to its number 1..=12; case-insensitive.
pub(crate) fn month_from_name(name: &str) -> Option<i64> {
    const NAMES: [&str; 12] = [
        "january",
        "february",
        "march",
        "april",
        "may",
        "june",
        "july",
        "august",
        "september",
        "october",
        "november",
        "december",
    ];
    let lower = name.to_ascii_lowercase();
    NAMES
        .iter()
        .zip(1..)
        .find(|(n, _)| **n == lower || (lower.len() == 3 && n.starts_with(&lower)))
        .map(|(_, m)| m)
}

/// ISO 8601 calendar date text of an MJD, e.g. `2017-01-01`.
pub(crate) fn iso_date(mjd: i64) -> String {
    let (y, m, d) = ymd_from_mjd(mjd);
    format!("{y:04}-{m:02}-{d:02}")
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn known_dates() {
        // J2000.0 day 2000-01-01 is MJD 51544 (IERS Conventions 2010, ch. 10)
        assert_eq!(mjd_from_ymd(2000, 1, 1), Some(51_544));
        // UTC start 1960-01-01 = JD 2436934.5 (ERFA dat.c note 1)
        assert_eq!(mjd_from_ymd(1960, 1, 1), Some(36_934));
        // 1972-01-01 = MJD 41317 (IERS Leap_Second.dat, first line)
        assert_eq!(mjd_from_ymd(1972, 1, 1), Some(41_317));
        // calendar validity (common practice: Gregorian rules)
        assert_eq!(mjd_from_ymd(1900, 2, 29), None);
        assert_eq!(mjd_from_ymd(2000, 2, 29), Some(51_603));
        assert_eq!(mjd_from_ymd(2023, 4, 31), None);
        assert_eq!(month_from_name("June"), Some(6));
        assert_eq!(month_from_name("Sept"), None);
    }

    #[test]
    fn round_trip_every_day_1900_2200() {
        // inverse pair (Hinnant's algorithms): every day maps back to itself
        let start = mjd_from_ymd(1900, 1, 1).unwrap_or(0);
        let end = mjd_from_ymd(2200, 12, 31).unwrap_or(0);
        assert!(end > start);
        for mjd in start..=end {
            let (y, m, d) = ymd_from_mjd(mjd);
            assert_eq!(mjd_from_ymd(y, m, d), Some(mjd));
        }
    }
}
