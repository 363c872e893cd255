//! Offsets between the time scales over a span of UTC: TAI - UTC (with its steps), TT - TAI,
//! TDB - TT, the GNSS system times against UTC and UT1 - UTC where an Earth orientation table
//! covers the instant. Each offset is one reading minus another for the same event.

use super::convert::{convert, ConversionContext};
use super::error::TimeError;
use super::formats::instant_from_day_reading;
use super::instant::{
    attos_to_seconds_f64, uniform_count_attos, uniform_day_reading, Instant, ATTOS_PER_DAY,
    ATTOS_PER_SECOND,
};
use super::scale::Scale;

/// The offsets at one UTC instant, seconds (reading of the first scale minus reading of the
/// second for the same event).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct OffsetSample {
    /// The UTC day (MJD) of the instant.
    pub utc_mjd: i64,
    /// The UTC time of day, attoseconds.
    pub utc_seconds_of_day_attos: i128,
    /// TAI - UTC (leap seconds; the drift expressions before 1972).
    pub tai_minus_utc_s: f64,
    /// TT - TAI (32.184 s by definition, IAU 1991 A4).
    pub tt_minus_tai_s: f64,
    /// TDB - TT at the geocentre (the context's series).
    pub tdb_minus_tt_s: f64,
    /// GPST - UTC (GST and QZSST are the same: each is TAI - 19 s).
    pub gpst_minus_utc_s: f64,
    /// BDT - UTC (BDT is TAI - 33 s).
    pub bdt_minus_utc_s: f64,
    /// UT1 - UTC where the context has a UT1 source covering the instant.
    pub ut1_minus_utc_s: Option<f64>,
    /// TCL - TT at the Moon's centre, inside the span of the lunar time relation.
    pub tcl_minus_tt_s: Option<f64>,
    /// TL - TT at the Moon's centre (TL: a proposal, not a standard), inside the same span.
    pub tl_minus_tt_s: Option<f64>,
}

impl OffsetSample {
    /// The UTC instant as a fractional MJD (days of 86 400 s: a leap second's reading is
    /// the next midnight's).
    pub fn utc_mjd_f64(&self) -> f64 {
        self.utc_mjd as f64 + self.utc_seconds_of_day_attos as f64 / ATTOS_PER_DAY as f64
    }
}

fn reading_difference_s(a_attos: i128, b_attos: i128) -> f64 {
    attos_to_seconds_f64(a_attos - b_attos)
}

/// The offsets at the UTC reading (`mjd`, `seconds_of_day_attos`).
///
/// TAI - UTC from the context's leap-second table (ITU-R TF.460-6; IERS Bulletin C);
/// TT = TAI + 32.184 s (IAU 1991 Resolution A4); TDB - TT from the Fairhead & Bretagnon (1990)
/// series as the context evaluates it (IERS Conventions (2010) ch. 10.1); GPST, GST, QZSST =
/// TAI - 19 s (IS-GPS-200 3.3.4; Galileo OS SIS ICD 5.1.2; IS-QZSS), BDT = TAI - 33 s (BeiDou
/// OS ICD 3.2); UT1 - UTC from the context's Earth orientation table (IERS Conventions (2010)
/// ch. 5.4.2).
pub fn offsets_at(
    mjd: i64,
    seconds_of_day_attos: i128,
    context: &ConversionContext<'_>,
) -> Result<OffsetSample, TimeError> {
    let utc = instant_from_day_reading(Scale::Utc, mjd, seconds_of_day_attos, context.table)?;
    let utc_reading = uniform_count_attos(mjd, seconds_of_day_attos);
    let count = |scale: Scale| -> Result<i128, TimeError> {
        convert(&utc, scale, context).map(|instant: Instant| instant.count_attos())
    };
    let tai = count(Scale::Tai)?;
    let tt = count(Scale::Tt)?;
    let tdb = count(Scale::Tdb)?;
    let gpst = count(Scale::Gpst)?;
    let bdt = count(Scale::Bdt)?;
    let ut1 = context
        .ut1
        .and_then(|_| count(Scale::Ut1).ok())
        .map(|ut1| reading_difference_s(ut1, utc_reading));
    let lunar = |scale: Scale| {
        count(scale)
            .ok()
            .map(|reading| reading_difference_s(reading, tt))
    };
    Ok(OffsetSample {
        utc_mjd: mjd,
        utc_seconds_of_day_attos: seconds_of_day_attos,
        tai_minus_utc_s: reading_difference_s(tai, utc_reading),
        tt_minus_tai_s: reading_difference_s(tt, tai),
        tdb_minus_tt_s: reading_difference_s(tdb, tt),
        gpst_minus_utc_s: reading_difference_s(gpst, utc_reading),
        bdt_minus_utc_s: reading_difference_s(bdt, utc_reading),
        ut1_minus_utc_s: ut1,
        tcl_minus_tt_s: lunar(Scale::Tcl),
        tl_minus_tt_s: lunar(Scale::Tl),
    })
}

/// The offsets at `count` UTC readings evenly spaced from `from` to `to` (each an (MJD, time of
/// day in attoseconds) UTC reading, `from` before `to`), and on each side of every step of the
/// leap-second table inside the span (23:59:59 of the day before and 0h of the day of the
/// step), so that a plot shows the steps as steps. Sorted by time, without duplicates.
pub fn offsets_over_span(
    from: (i64, i128),
    to: (i64, i128),
    count: usize,
    context: &ConversionContext<'_>,
) -> Result<Vec<OffsetSample>, TimeError> {
    let start = uniform_count_attos(from.0, from.1);
    let end = uniform_count_attos(to.0, to.1);
    let intervals = count.max(2) as i128 - 1;
    let mut readings: Vec<i128> = (0..=intervals)
        .map(|k| start + (end - start) * k / intervals)
        .collect();
    for step in context.table.steps() {
        let at = uniform_count_attos(step.utc_mjd, 0);
        if at > start && at <= end {
            readings.push(at);
            readings.push((at - ATTOS_PER_SECOND).max(start));
        }
    }
    readings.sort_unstable();
    readings.dedup();
    readings
        .into_iter()
        .map(|reading| {
            let day = uniform_day_reading(reading);
            offsets_at(day.mjd, day.seconds_of_day_attos, context)
        })
        .collect()
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::physics::time::leap_seconds::LeapTable;

    #[test]
    fn offsets_at_known_instants() {
        let table = LeapTable::builtin();
        let context = ConversionContext::geocentric(table);
        // IERS Bulletin C: TAI - UTC = 37 s since 2017-01-01 (MJD 57754), 36 s before.
        let after = offsets_at(57_754, 0, &context).expect("in table");
        assert_eq!(after.tai_minus_utc_s, 37.0);
        let before = offsets_at(57_753, 86_399 * ATTOS_PER_SECOND, &context).expect("in table");
        assert_eq!(before.tai_minus_utc_s, 36.0);
        // IAU 1991 A4: TT - TAI = 32.184 s; IS-GPS-200: GPST = TAI - 19 s; BeiDou ICD: BDT = TAI - 33 s.
        assert!((after.tt_minus_tai_s - 32.184).abs() < 1e-12);
        assert_eq!(after.gpst_minus_utc_s, 18.0);
        assert_eq!(after.bdt_minus_utc_s, 4.0);
        // Fairhead & Bretagnon (1990): |TDB - TT| stays below 1.7 ms at the geocentre.
        assert!(after.tdb_minus_tt_s.abs() < 1.7e-3);
        assert_eq!(after.ut1_minus_utc_s, None);
    }

    #[test]
    fn span_samples_each_step_on_both_sides() {
        let table = LeapTable::builtin();
        let context = ConversionContext::geocentric(table);
        // 2012-01-01 (MJD 55927) to 2018-01-01 (MJD 58119): the steps of 2012-07-01,
        // 2015-07-01 and 2017-01-01 (IERS Bulletin C), TAI - UTC 34 s -> 37 s.
        let samples = offsets_over_span((55_927, 0), (58_119, 0), 50, &context).expect("span");
        assert_eq!(samples.len(), 50 + 6);
        assert_eq!(samples[0].tai_minus_utc_s, 34.0);
        assert_eq!(samples[samples.len() - 1].tai_minus_utc_s, 37.0);
        let steps = samples
            .windows(2)
            .filter(|pair| pair[1].tai_minus_utc_s != pair[0].tai_minus_utc_s)
            .map(|pair| {
                (
                    pair[1].utc_mjd,
                    pair[1].utc_mjd_f64() - pair[0].utc_mjd_f64(),
                )
            })
            .collect::<Vec<_>>();
        let one_second_days = 1.0 / 86_400.0;
        assert_eq!(steps.len(), 3);
        for ((mjd, gap_days), expect) in steps.into_iter().zip([56_109, 57_204, 57_754]) {
            assert_eq!(mjd, expect);
            assert!((gap_days - one_second_days).abs() < 1e-9);
        }
    }

    #[test]
    fn lunar_offsets_drift_at_the_published_rates() {
        let table = LeapTable::builtin();
        let context = ConversionContext::geocentric(table);
        // 1980-01-01 (MJD 44239) and 2020-01-01 (MJD 58849): the same phase of the year, so the
        // annual term (about 1.65 ms) cancels to well below 1e-12 of the 40-year span.
        let first = offsets_at(44_239, 0, &context).expect("in table");
        let last = offsets_at(58_849, 0, &context).expect("in table");
        let span_s = (58_849.0 - 44_239.0) * 86_400.0;
        let rate = |a: Option<f64>, b: Option<f64>| {
            (b.expect("inside the lunar span") - a.expect("inside the lunar span")) / span_s
        };
        // Lu, Yang & Xie 2025 (A&A 704, A76): mean dTCL/dTDB - 1 = 6.79835524e-10, and TDB
        // keeps TT's mean rate (IAU 2006 Resolution B3).
        let tcl = rate(first.tcl_minus_tt_s, last.tcl_minus_tt_s);
        assert!((tcl - 6.79835524e-10).abs() < 1e-12, "{tcl:e}");
        // Turyshev et al. (arXiv:2406.16147 v5): TL - TT drifts 56.0256 us/day.
        let tl = rate(first.tl_minus_tt_s, last.tl_minus_tt_s);
        assert!((tl - 56.0256e-6 / 86_400.0).abs() < 1e-12, "{tl:e}");
        // Outside the span of the lunar relation (1960-2100) both are absent.
        let later = offsets_at(89_164, 0, &context).expect("in table"); // 2103-01-01
        assert_eq!((later.tcl_minus_tt_s, later.tl_minus_tt_s), (None, None));
    }
}
