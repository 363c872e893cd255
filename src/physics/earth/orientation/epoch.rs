//! The two Julian dates an orientation needs, TT and UT1, from the attosecond counts of the
//! time engine and the Earth orientation parameters.

use super::JulianDate;
use crate::physics::constants::TT_MINUS_TAI_ATTOS;
use crate::physics::time::instant::seconds_f64_to_attos;

/// TT as a two-part Julian date from its count since J2000.0 (TT).
pub fn tt_julian_date(tt_attos: i128) -> JulianDate {
    JulianDate::from_count_attos_since_j2000(tt_attos)
}

/// UT1 as a two-part Julian date: `UT1 = TAI + (UT1 - UTC) - (TAI - UTC)`, TAI = TT - 32.184 s
/// (IERS Conventions (2010) ch. 5.5.3 and eq. 10.2; ERFA `eraUtcut1`, which calls `eraTaiut1`
/// with `dta = dut1 - dat`). The offsets are added in attoseconds to the TAI count, so the
/// date keeps the resolution of the split in [`JulianDate::from_count_attos_since_j2000`].
pub fn ut1_julian_date(
    tt_attos: i128,
    tai_minus_utc_attos: i128,
    ut1_minus_utc_s: f64,
) -> JulianDate {
    let tai_attos = tt_attos - TT_MINUS_TAI_ATTOS;
    let ut1_attos = tai_attos - tai_minus_utc_attos + seconds_f64_to_attos(ut1_minus_utc_s);
    JulianDate::from_count_attos_since_j2000(ut1_attos)
}

#[cfg(test)]
mod tests {
    use super::*;

    /// At 2017-01-01T00:00:00 UTC (TAI - UTC = 37 s, IERS Bulletin C 52) with UT1 - UTC = +0.5 s,
    /// TT is 2017-01-01T00:01:09.184 and UT1 00:00:00.5: JD 2457754.5 + 0.5 / 86400 (the
    /// definition of UT1 - UTC, IERS Conventions (2010) ch. 5.5.3).
    #[test]
    fn ut1_from_tt_and_the_offsets() {
        let second = 1_000_000_000_000_000_000i128;
        let day = 86_400 * second;
        // 2017-01-01T00:00:00 TAI-reading is 6209.5 days after J2000.0.
        let utc_count = 6_209 * day + day / 2;
        let tt = utc_count + 37 * second + TT_MINUS_TAI_ATTOS;
        let ut1 = ut1_julian_date(tt, 37 * second, 0.5);
        assert_eq!(ut1.jd1, 2_457_754.0);
        assert!((ut1.jd2 - (0.5 + 0.5 / 86_400.0)).abs() < 1e-16, "{ut1:?}");
        let tt_jd = tt_julian_date(tt);
        assert_eq!(tt_jd.jd1, 2_457_754.0);
        assert!(
            (tt_jd.jd2 - (0.5 + 69.184 / 86_400.0)).abs() < 1e-16,
            "{tt_jd:?}"
        );
    }
}
