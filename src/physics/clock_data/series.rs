//! Corrections of one satellite's clock series and the fit of the corrected clock.

use super::fit::{fit_line, LineFit};
use super::terms::{conventional_periodic_s, j2_periodic_at_state_s};
use crate::physics::constants::{GM_EARTH_GPS_M3_S2, MICROSECONDS_PER_DAY};
use crate::physics::rate::orbit::keplerian_mean_rate_parts;
use crate::physics::rate::RateReference;
use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// Which relativistic periodic terms the given clock values contain.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum ClockConvention {
        /// IGS clock products (SP3, RINEX clock): the conventional term -2 r.v/c^2 was modelled
        /// in the estimation and is left out of the values; the J2 term is in them.
        Igs = "igs",
        /// Raw clock readings against system time: both periodic terms are in them.
        Raw = "raw",
    }
}

/// Nominal semi-major axis of IS-GPS-200 (26 559.7 km is the nominal radius of table 3.0-1;
/// the factory offset 10.23 MHz -> 10.22999999543 MHz corresponds to a = 26 561.75 km), m.
pub const NOMINAL_SEMI_MAJOR_AXIS_M: f64 = 26_561_750.0;

/// The fractional rate that the IS-GPS-200 factory setting (3.3.1.1: 10.23 MHz set to
/// 10.22999999543 MHz) compensates: the mean rate against TT of a clock on the nominal circular
/// orbit with the IS-GPS-200 GM, +4.4647e-10 (38.575 us/day).
pub fn factory_setting_rate() -> f64 {
    keplerian_mean_rate_parts(
        GM_EARTH_GPS_M3_S2,
        NOMINAL_SEMI_MAJOR_AXIS_M,
        RateReference::Tt,
    )
    .total()
}

/// One clock value with the satellite's state at its epoch.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ClockSample {
    /// Seconds since the series' reference epoch (system time).
    pub t_s: f64,
    /// Clock value as given: satellite clock minus system time, s.
    pub clock_s: f64,
    /// Geocentric position, m (inertial or Earth-fixed: the z axis is the Earth's).
    pub position_m: [f64; 3],
    /// Inertial (non-rotating) velocity, m/s.
    pub inertial_velocity_m_s: [f64; 3],
}

/// The corrections at one epoch.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct CorrectedSample {
    /// Seconds since the reference epoch.
    pub t_s: f64,
    /// Clock value as given, s.
    pub clock_s: f64,
    /// Conventional periodic term -2 r.v/c^2, s ([`conventional_periodic_s`]).
    pub conventional_s: f64,
    /// J2 periodic term, s ([`super::terms::j2_periodic_s`]).
    pub j2_s: f64,
    /// The clock without its relativistic periodic terms, s: `clock - conventional - j2` for
    /// raw clocks, `clock - j2` for IGS products (which leave the conventional term out).
    pub corrected_s: f64,
}

/// Corrects one epoch. None when the state is not on a closed orbit (no osculating a).
pub fn correct_sample(
    sample: &ClockSample,
    convention: ClockConvention,
) -> Option<CorrectedSample> {
    let conventional_s = conventional_periodic_s(sample.position_m, sample.inertial_velocity_m_s);
    let j2_s = j2_periodic_at_state_s(sample.position_m, sample.inertial_velocity_m_s)?;
    let removed_s = match convention {
        ClockConvention::Igs => j2_s,
        ClockConvention::Raw => conventional_s + j2_s,
    };
    Some(CorrectedSample {
        t_s: sample.t_s,
        clock_s: sample.clock_s,
        conventional_s,
        j2_s,
        corrected_s: sample.clock_s - removed_s,
    })
}

/// The fit of a corrected series and what its rate means.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ClockSummary {
    /// Offset, rate and residual RMS of the corrected clock.
    pub fit: LineFit,
    /// The fitted rate in microseconds per day.
    pub rate_us_per_day: f64,
    /// Fitted rate minus [`factory_setting_rate`]: about 0 for a clock built without the
    /// factory offset on a nominal orbit, about -4.4647e-10 for one built with it.
    pub rate_minus_factory_setting: f64,
}

/// Fits the corrected clock (None with fewer than two epochs).
pub fn summarize(samples: &[CorrectedSample]) -> Option<ClockSummary> {
    let t: Vec<f64> = samples.iter().map(|s| s.t_s).collect();
    let y: Vec<f64> = samples.iter().map(|s| s.corrected_s).collect();
    let fit = fit_line(&t, &y)?;
    Some(ClockSummary {
        fit,
        rate_us_per_day: fit.rate * MICROSECONDS_PER_DAY,
        rate_minus_factory_setting: fit.rate - factory_setting_rate(),
    })
}
