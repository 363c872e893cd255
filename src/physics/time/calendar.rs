//! The proleptic Gregorian calendar and the Modified Julian Date day number.
//!
//! Day numbers use the algorithm of Fliegel & Van Flandern (Communications of the ACM 11, 657,
//! 1968) in the form published by H. Hinnant ("chrono-Compatible Low-Level Date Algorithms",
//! days_from_civil / civil_from_days), which is exact for every year representable in `i64`
//! arithmetic used here.

/// MJD of 1970-01-01 (the Unix epoch).
pub const UNIX_EPOCH_MJD: i64 = 40_587;

/// MJD of 2000-01-01 (J2000.0 is noon of this day).
pub const J2000_DAY_MJD: i64 = 51_544;

/// A calendar date (proleptic Gregorian).
#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord)]
pub struct CalendarDate {
    /// Year, e.g. 2026.
    pub year: i64,
    /// Month 1..=12.
    pub month: u32,
    /// Day of month 1..=31.
    pub day: u32,
}

/// Whether `year` is a Gregorian leap year.
pub fn is_leap_year(year: i64) -> bool {
    (year % 4 == 0 && year % 100 != 0) || year % 400 == 0
}

/// Number of days in `month` (1..=12) of `year`; 0 for an invalid month.
pub fn days_in_month(year: i64, month: u32) -> u32 {
    match month {
        1 | 3 | 5 | 7 | 8 | 10 | 12 => 31,
        4 | 6 | 9 | 11 => 30,
        2 if is_leap_year(year) => 29,
        2 => 28,
        _ => 0,
    }
}

/// Number of days in `year`.
pub fn days_in_year(year: i64) -> u32 {
    if is_leap_year(year) {
        366
    } else {
        365
    }
}

impl CalendarDate {
    /// Builds a date, or `None` when the month or day does not exist (e.g. 2026-02-30).
    pub fn new(year: i64, month: u32, day: u32) -> Option<Self> {
        if (1..=12).contains(&month) && day >= 1 && day <= days_in_month(year, month) {
            Some(Self { year, month, day })
        } else {
            None
        }
    }

    /// Builds a date from a year and a day of year (1..=365 or 366), or `None`.
    pub fn from_ordinal(year: i64, day_of_year: u32) -> Option<Self> {
        if day_of_year == 0 || day_of_year > days_in_year(year) {
            return None;
        }
        let mut remaining = day_of_year;
        for month in 1..=12 {
            let length = days_in_month(year, month);
            if remaining <= length {
                return Some(Self {
                    year,
                    month,
                    day: remaining,
                });
            }
            remaining -= length;
        }
        None
    }

    /// Day of year, 1-based.
    pub fn day_of_year(&self) -> u32 {
        (1..self.month)
            .map(|m| days_in_month(self.year, m))
            .sum::<u32>()
            + self.day
    }

    /// Modified Julian Date day number of this date (MJD 0 = 1858-11-17).
    ///
    /// Hinnant's days_from_civil, shifted from the Unix epoch to the MJD origin.
    pub fn to_mjd(&self) -> i64 {
        let y = if self.month <= 2 {
            self.year - 1
        } else {
            self.year
        };
        let era = y.div_euclid(400);
        let yoe = y - era * 400;
        let m = i64::from(self.month);
        let doy = (153 * (if m > 2 { m - 3 } else { m + 9 }) + 2) / 5 + i64::from(self.day) - 1;
        let doe = yoe * 365 + yoe / 4 - yoe / 100 + doy;
        era * 146_097 + doe - 719_468 + UNIX_EPOCH_MJD
    }

    /// The date of a Modified Julian Date day number (Hinnant's civil_from_days).
    pub fn from_mjd(mjd: i64) -> Self {
        let z = mjd - UNIX_EPOCH_MJD + 719_468;
        let era = z.div_euclid(146_097);
        let doe = z - era * 146_097;
        let yoe = (doe - doe / 1460 + doe / 36_524 - doe / 146_096) / 365;
        let doy = doe - (365 * yoe + yoe / 4 - yoe / 100);
        let mp = (5 * doy + 2) / 153;
        let day = (doy - (153 * mp + 2) / 5 + 1) as u32;
        let month = if mp < 10 { mp + 3 } else { mp - 9 } as u32;
        let year = yoe + era * 400 + i64::from(month <= 2);
        Self { year, month, day }
    }
}

impl std::fmt::Display for CalendarDate {
    /// ISO 8601 calendar date, `YYYY-MM-DD`.
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        write!(f, "{:04}-{:02}-{:02}", self.year, self.month, self.day)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn known_day_numbers() {
        // MJD 51544 = 2000-01-01 and MJD 0 = 1858-11-17 (definition of MJD; IAU 1973).
        assert_eq!(
            CalendarDate::new(2000, 1, 1).map(|d| d.to_mjd()),
            Some(51_544)
        );
        assert_eq!(CalendarDate::new(1858, 11, 17).map(|d| d.to_mjd()), Some(0));
        // GPS epoch 1980-01-06 is MJD 44244 (IS-GPS-200).
        assert_eq!(
            CalendarDate::new(1980, 1, 6).map(|d| d.to_mjd()),
            Some(44_244)
        );
        // 1972-01-01 is MJD 41317 (IERS Leap_Second.dat first line).
        assert_eq!(
            CalendarDate::new(1972, 1, 1).map(|d| d.to_mjd()),
            Some(41_317)
        );
    }

    #[test]
    fn round_trip_every_day_1900_to_2200() {
        let start = CalendarDate::new(1900, 1, 1)
            .map(|d| d.to_mjd())
            .unwrap_or(0);
        let end = CalendarDate::new(2200, 12, 31)
            .map(|d| d.to_mjd())
            .unwrap_or(0);
        for mjd in start..=end {
            let date = CalendarDate::from_mjd(mjd);
            assert_eq!(date.to_mjd(), mjd);
            assert_eq!(
                CalendarDate::from_ordinal(date.year, date.day_of_year()),
                Some(date)
            );
        }
    }

    #[test]
    fn impossible_dates_are_refused() {
        assert!(CalendarDate::new(2026, 2, 29).is_none());
        assert!(CalendarDate::new(2026, 2, 30).is_none());
        assert!(CalendarDate::new(2024, 2, 29).is_some());
        assert!(CalendarDate::new(1900, 2, 29).is_none());
        assert!(CalendarDate::new(2000, 2, 29).is_some());
        assert!(CalendarDate::new(2026, 13, 1).is_none());
        assert!(CalendarDate::from_ordinal(2026, 366).is_none());
        assert!(CalendarDate::from_ordinal(2024, 366).is_some());
    }
}
