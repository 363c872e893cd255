//! Calendar helpers of the leap-second file readers, on top of the service-wide
//! [`crate::physics::time::calendar`].

use crate::physics::time::calendar::CalendarDate;

/// Modified Julian Day number of a Gregorian calendar date, or `None` for a date that does not
/// exist or a year outside 1..=9999.
pub(crate) fn mjd_from_ymd(year: i64, month: i64, day: i64) -> Option<i64> {
    if !(1..=9999).contains(&year) {
        return None;
    }
    let month = u32::try_from(month).ok()?;
    let day = u32::try_from(day).ok()?;
    CalendarDate::new(year, month, day).map(|date| date.to_mjd())
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
    CalendarDate::from_mjd(mjd).to_string()
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
}
