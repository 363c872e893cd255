//! Broadcast (truncated) GNSS week numbers and their resolution to full weeks.
//!
//! Navigation messages carry the week modulo 2^bits: GPS LNAV 10 bits (IS-GPS-200, 20.3.3.3.1.1:
//! "the 10 MSBs of the 29-bit Z-count", rolling over every 1024 weeks, first on 1999-08-22);
//! GPS CNAV 13 bits (IS-GPS-200, 30.3.3.1.1.1, every 8192 weeks); Galileo 12 bits (Galileo OS
//! SIS ICD, 5.1.9.2: WN, 4096 weeks); BeiDou 13 bits (BeiDou OS SIS ICD, 5.2.4.3: WN, 8192
//! weeks). QZSS follows GPS (IS-QZSS). The full week is the one that is congruent to the
//! broadcast week and nearest to a reference week (within half a cycle), as a receiver does
//! with its own clock or the last known date (common practice).

use super::super::error::TimeError;
use super::super::scale::Scale;
use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// The broadcast week counters.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum WeekCounter {
        /// GPS (and QZSS) legacy navigation message, 10 bits.
        GpsLnav = "gps_lnav",
        /// GPS (and QZSS) civil navigation message CNAV, 13 bits.
        GpsCnav = "gps_cnav",
        /// Galileo, 12 bits.
        Galileo = "galileo",
        /// BeiDou, 13 bits.
        Beidou = "beidou",
    }
}

impl WeekCounter {
    /// Width of the counter in bits.
    pub const fn bits(self) -> u32 {
        match self {
            Self::GpsLnav => 10,
            Self::Galileo => 12,
            Self::GpsCnav | Self::Beidou => 13,
        }
    }

    /// Weeks in one cycle of the counter (2^bits).
    pub const fn cycle_weeks(self) -> i64 {
        1 << self.bits()
    }

    /// Whether the counter counts weeks of `scale`.
    pub fn fits(self, scale: Scale) -> bool {
        match self {
            Self::GpsLnav | Self::GpsCnav => matches!(scale, Scale::Gpst | Scale::Qzsst),
            Self::Galileo => scale == Scale::Gst,
            Self::Beidou => scale == Scale::Bdt,
        }
    }
}

/// A broadcast week read as a full week.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct ResolvedWeek {
    /// The counter.
    pub counter: WeekCounter,
    /// The week as broadcast (0 ..= 2^bits - 1).
    pub broadcast_week: i64,
    /// Full cycles of the counter before the full week (the rollovers chosen).
    pub rollovers: i64,
    /// The full week, `broadcast_week + rollovers * 2^bits`.
    pub full_week: i64,
    /// The week the choice was made near.
    pub reference_week: i64,
}

/// The full week congruent to `broadcast_week` modulo 2^bits nearest to `reference_week`
/// (ties to the later week), and never before week 0. Refuses a broadcast week that does not
/// fit the counter and a counter of another system than `scale`.
pub fn resolve_broadcast_week(
    counter: WeekCounter,
    scale: Scale,
    broadcast_week: i64,
    reference_week: i64,
) -> Result<ResolvedWeek, TimeError> {
    if !counter.fits(scale) {
        return Err(TimeError::FormatNotForScale {
            format: counter.as_str(),
            scale: scale.as_str(),
            allowed: match counter {
                WeekCounter::GpsLnav | WeekCounter::GpsCnav => "GPST and QZSST",
                WeekCounter::Galileo => "GST",
                WeekCounter::Beidou => "BDT",
            },
        });
    }
    let cycle = counter.cycle_weeks();
    if !(0..cycle).contains(&broadcast_week) {
        return Err(TimeError::OutOfRange(format!(
            "broadcast week {broadcast_week} does not fit the {}-bit week counter of {counter} (0 to {})",
            counter.bits(),
            cycle - 1
        )));
    }
    // Nearest: rollovers = round((reference - broadcast) / cycle), at least 0.
    let rollovers = (reference_week - broadcast_week + cycle / 2)
        .div_euclid(cycle)
        .max(0);
    Ok(ResolvedWeek {
        counter,
        broadcast_week,
        rollovers,
        full_week: broadcast_week + rollovers * cycle,
        reference_week,
    })
}

#[cfg(test)]
mod tests {
    use super::super::gnss_week::gnss_week_origin_mjd;
    use super::*;

    fn week_of(scale: Scale, mjd: i64) -> i64 {
        (mjd - gnss_week_origin_mjd(scale).unwrap_or(0)).div_euclid(7)
    }

    #[test]
    fn week_337_near_2026_is_2385_for_gps_lnav() {
        // Issue 13: GPS 10-bit week 337 near 2026 resolves to 2385 (= 337 + 2 x 1024,
        // IS-GPS-200 20.3.3.3.1.1; the second rollover was on 2019-04-07, GPS week 2048).
        let reference = week_of(Scale::Gpst, 61_041); // 2026-01-01
        let resolved = resolve_broadcast_week(WeekCounter::GpsLnav, Scale::Gpst, 337, reference);
        assert_eq!(resolved.map(|r| (r.full_week, r.rollovers)), Ok((2385, 2)));
        // The rollover dates: week 1024 began 1999-08-22, week 2048 on 2019-04-07 (IS-GPS-200;
        // widely reported, from memory): MJD 51412 and 58580.
        assert_eq!(44_244 + 1024 * 7, 51_412);
        assert_eq!(44_244 + 2048 * 7, 58_580);
        // Near 1990 the same broadcast week is the first cycle (1986-06-22, the reading the
        // issue reports without a reference).
        let early = resolve_broadcast_week(WeekCounter::GpsLnav, Scale::Gpst, 337, 520);
        assert_eq!(early.map(|r| r.full_week), Ok(337));
    }

    #[test]
    fn other_counters() {
        // Galileo: 12 bits, week 0 at 1999-08-22 (Galileo OS SIS ICD 5.1.2, 5.1.9.2); in 2026
        // the full week is about 1380, below 4096: no rollover yet (common practice).
        let reference = week_of(Scale::Gst, 61_041);
        assert_eq!(reference, 1375);
        let gal = resolve_broadcast_week(WeekCounter::Galileo, Scale::Gst, 1380, reference);
        assert_eq!(gal.map(|r| (r.full_week, r.rollovers)), Ok((1380, 0)));
        // GPS CNAV 13 bits (IS-GPS-200 30.3.3.1.1.1): the full week as broadcast until 8192.
        let gps = week_of(Scale::Gpst, 61_041);
        let cnav = resolve_broadcast_week(WeekCounter::GpsCnav, Scale::Gpst, 2399, gps);
        assert_eq!(cnav.map(|r| r.full_week), Ok(2399));
        // BeiDou 13 bits from 2006-01-01 (BeiDou OS SIS ICD 5.2.4.3): a reference after the
        // first rollover (week 8192, in 2163) takes the next cycle (common practice).
        let bds = resolve_broadcast_week(WeekCounter::Beidou, Scale::Bdt, 10, 8190);
        assert_eq!(bds.map(|r| (r.full_week, r.rollovers)), Ok((8202, 1)));
        // Halfway: of 1000 and 2024, both 512 weeks from 1512, the later is taken (the rule
        // stated above).
        let tie = resolve_broadcast_week(WeekCounter::GpsLnav, Scale::Gpst, 1000, 1512);
        assert_eq!(tie.map(|r| r.full_week), Ok(2024));
    }

    #[test]
    fn refusals() {
        assert_eq!(
            resolve_broadcast_week(WeekCounter::GpsLnav, Scale::Gpst, 1024, 2400)
                .map_err(|e| e.code()),
            Err("instant_out_of_range")
        );
        assert_eq!(
            resolve_broadcast_week(WeekCounter::Galileo, Scale::Gpst, 10, 2400)
                .map_err(|e| e.code()),
            Err("format_not_for_scale")
        );
    }
}
