//! The leap-second table built into the binary.
//!
//! Sources:
//! - Drift era 1961-01-01 .. 1971-12-31: the BIH expressions as distributed by the USNO
//!   (`tai-utc.dat`), transcribed from the table of ERFA `dat.c` (pyerfa 2.0.1.5 source
//!   distribution, BSD-3-Clause), which quotes them.
//! - 1960-01-01 .. 1960-12-31: the expression of the Explanatory Supplement to the
//!   Astronomical Almanac (1992), 2.58.1, p. 87 (also in ERFA `dat.c`), 5 ms below the 1961 one.
//! - 1972-01-01 on: TAI - UTC = 10 s and the leap seconds announced in IERS Bulletin C, up to
//!   the last one at the end of 2016-12-31 (TAI - UTC = 37 s from 2017-01-01), transcribed from
//!   the same ERFA table.
//! - Expiry: IERS Bulletin C 72 (July 2026): no leap second at the end of December 2026; data
//!   valid until 28 June 2027 (as in the IERS `Leap_Second.dat` of that bulletin).

use std::sync::OnceLock;

use super::civil::mjd_from_ymd;
use super::segment::Segment;
use super::LeapTable;

/// Drift era: (year, month) of 0h UTC on day 1 where the expression starts; constant part of
/// TAI - UTC in 1e-7 s; MJD0; rate in 1e-7 s/day. TAI - UTC = c + (MJD - MJD0) * rate.
const DRIFT_ERA: [(i64, i64, i64, i64, i64); 14] = [
    (1960, 1, 14_178_180, 37_300, 12_960),
    (1961, 1, 14_228_180, 37_300, 12_960),
    (1961, 8, 13_728_180, 37_300, 12_960),
    (1962, 1, 18_458_580, 37_665, 11_232),
    (1963, 11, 19_458_580, 37_665, 11_232),
    (1964, 1, 32_401_300, 38_761, 12_960),
    (1964, 4, 33_401_300, 38_761, 12_960),
    (1964, 9, 34_401_300, 38_761, 12_960),
    (1965, 1, 35_401_300, 38_761, 12_960),
    (1965, 3, 36_401_300, 38_761, 12_960),
    (1965, 7, 37_401_300, 38_761, 12_960),
    (1965, 9, 38_401_300, 38_761, 12_960),
    (1966, 1, 43_131_700, 39_126, 25_920),
    (1968, 2, 42_131_700, 39_126, 25_920),
];

/// From 1972: (year, month) of 0h UTC on day 1, TAI - UTC in seconds from then on.
const STEPS: [(i64, i64, i64); 28] = [
    (1972, 1, 10),
    (1972, 7, 11),
    (1973, 1, 12),
    (1974, 1, 13),
    (1975, 1, 14),
    (1976, 1, 15),
    (1977, 1, 16),
    (1978, 1, 17),
    (1979, 1, 18),
    (1980, 1, 19),
    (1981, 7, 20),
    (1982, 7, 21),
    (1983, 7, 22),
    (1985, 7, 23),
    (1988, 1, 24),
    (1990, 1, 25),
    (1991, 1, 26),
    (1992, 7, 27),
    (1993, 7, 28),
    (1994, 7, 29),
    (1996, 1, 30),
    (1997, 7, 31),
    (1999, 1, 32),
    (2006, 1, 33),
    (2009, 1, 34),
    (2012, 7, 35),
    (2015, 7, 36),
    (2017, 1, 37),
];

/// Expiry of the built-in data: 28 June 2027 (IERS Bulletin C 72).
const EXPIRY_YMD: (i64, i64, i64) = (2027, 6, 28);

/// The drift-era expressions (1960-01-01 .. 1971-12-31), which every table starts with.
pub(crate) fn drift_era_segments() -> Vec<Segment> {
    DRIFT_ERA
        .iter()
        .filter_map(
            |&(year, month, offset_e7, reference_mjd, rate_e7_per_day)| {
                Some(Segment {
                    start_mjd: mjd_from_ymd(year, month, 1)?,
                    offset_e7,
                    reference_mjd,
                    rate_e7_per_day,
                })
            },
        )
        .collect()
}

fn build() -> LeapTable {
    let mut segments = drift_era_segments();
    segments.extend(STEPS.iter().filter_map(|&(year, month, offset_s)| {
        Segment::step(mjd_from_ymd(year, month, 1)?, offset_s)
    }));
    let (y, m, d) = EXPIRY_YMD;
    LeapTable::from_segments(
        segments,
        mjd_from_ymd(y, m, d).unwrap_or(i64::MIN),
        "built-in: drift era 1960-1971 (BIH/USNO tai-utc.dat; Explanatory Supplement 1992 \
         2.58.1), leap seconds 1972-2017 (IERS Bulletin C), expiry from IERS Bulletin C 72"
            .to_string(),
        "IERS Bulletin C 72 (July 2026)".to_string(),
    )
}

/// The built-in table, built once.
pub(crate) fn table() -> &'static LeapTable {
    static TABLE: OnceLock<LeapTable> = OnceLock::new();
    TABLE.get_or_init(build)
}
