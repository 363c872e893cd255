//! Lookup with interpolation between the daily values.
//!
//! Method: 4-point Lagrange (cubic) interpolation of the daily values, the IERS recommendation
//! (IERS Conventions (2010) ch. 5.5.1 and the IERS routine `interp.f`, which interpolates with
//! `LAGINT` over the four days around the instant). The window is the two tabulated days on
//! each side; at the ends of the table it is shifted inward (as `LAGINT` does), and a table of
//! fewer than four days uses all its days.
//!
//! UT1 - UTC jumps by one second at each leap second (and by fractions of a second at the
//! 1961-1971 steps of UTC): it is interpolated as UT1 - TAI = (UT1 - UTC) - (TAI - UTC) at
//! each day's 0h UTC, which is smooth, and TAI - UTC at the instant is added back.
//!
//! Not applied: the sub-daily tidal terms, i.e. the ocean-tide variations of polar motion and
//! UT1 (IERS Conventions (2010) ch. 8.2, Tables 8.2a-8.3b; IERS `ortho_eop.f`, used as ch. 5.5.1
//! says) and the libration terms (ch. 5.5.1 and 5.5.3; `pmsdnut2.f`, `utlibr.f`). Their size,
//! from memory: ocean tides up to a few tenths of a mas in polar motion (0.1 mas is 3 mm at
//! the Earth's surface) and a few tens of microseconds in UT1 (10 us of UT1 is 4.6 mm at the
//! equator); libration some tens of microarcseconds in polar motion and a few microseconds in
//! UT1. The daily values themselves are corrected for none of these (IERS: the C04 and Bulletin
//! A values are free of the sub-daily tides), so a user who needs them adds them.

use super::error::EopLookupError;
use super::table::{EopDay, EopSigma, EopStatus, EopTable};
use crate::physics::time::leap_seconds::{LeapTable, UtcRangeError};

const ATTOS_PER_S: f64 = 1e18;

/// TAI - UTC in seconds at UTC (`mjd`, `sod_attos`), or the lookup error.
fn tai_minus_utc_s(leaps: &LeapTable, mjd: i64, sod_attos: i128) -> Result<f64, EopLookupError> {
    leaps
        .tai_minus_utc_attos(mjd, sod_attos)
        .map(|a| a as f64 / ATTOS_PER_S)
        .ok_or(EopLookupError::Utc(UtcRangeError::BeforeUtc))
}

/// Values at one instant.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct EopValues {
    /// UT1 - UTC, seconds.
    pub ut1_minus_utc_s: f64,
    /// Pole coordinate x_p, arcseconds.
    pub xp_arcsec: f64,
    /// Pole coordinate y_p, arcseconds.
    pub yp_arcsec: f64,
    /// dX, arcseconds (None when a day of the window lacks it).
    pub dx_arcsec: Option<f64>,
    /// dY, arcseconds (None when a day of the window lacks it).
    pub dy_arcsec: Option<f64>,
    /// Excess length of day, seconds (None when a day of the window lacks it).
    pub lod_s: Option<f64>,
    /// Predicted when any of the four days used for x_p, y_p, UT1 is predicted.
    pub status: EopStatus,
    /// Predicted when any day used for dX, dY is predicted.
    pub nutation_status: EopStatus,
    /// Days from the last observed day (0h UTC) to the instant; 0 when not after it.
    pub days_after_observed: f64,
    /// On predicted values: the likely error, the error the source states for the first
    /// tabulated day at or after the instant (IERS Bulletin A error columns, growing with the
    /// days ahead). None when the values are observed or the source states no errors.
    pub likely_error: Option<EopSigma>,
}

/// Lagrange weights of `x` for the nodes `x0, x0 + 1, ..., x0 + n - 1` (n <= 4), x relative to
/// x0. The classical formula (e.g. Press et al., Numerical Recipes, 3.2; IERS `LAGINT`).
pub fn lagrange_weights(x: f64, n: usize) -> [f64; 4] {
    let mut w = [0.0; 4];
    for (i, wi) in w.iter_mut().enumerate().take(n.min(4)) {
        let mut p = 1.0;
        for j in 0..n.min(4) {
            if j != i {
                p *= (x - j as f64) / (i as f64 - j as f64);
            }
        }
        *wi = p;
    }
    w
}

impl EopTable {
    /// The values at UTC day `utc_mjd`, `sod_s` seconds after 0h UTC, interpolated as the module
    /// documentation says; `leaps` gives TAI - UTC.
    pub fn at_utc(
        &self,
        leaps: &LeapTable,
        utc_mjd: i64,
        sod_s: f64,
    ) -> Result<EopValues, EopLookupError> {
        if !sod_s.is_finite() {
            return Err(EopLookupError::NotFinite);
        }
        self.at_utc_attos(leaps, utc_mjd, (sod_s * ATTOS_PER_S).round() as i128)
    }

    /// [`EopTable::at_utc`] with the second of day in attoseconds (exact, as the time engine
    /// keeps it).
    pub fn at_utc_attos(
        &self,
        leaps: &LeapTable,
        utc_mjd: i64,
        sod_attos: i128,
    ) -> Result<EopValues, EopLookupError> {
        let days = self.days();
        let (Some(first), Some(last)) = (days.first(), days.last()) else {
            return Err(EopLookupError::BeforeTable { first_mjd: 0 });
        };
        let day_attos = leaps.utc_day_length_attos(utc_mjd);
        if sod_attos < 0 || sod_attos >= day_attos {
            return Err(EopLookupError::Utc(UtcRangeError::SecondOutsideDay {
                utc_mjd,
                sod_attos,
                day_length_attos: day_attos,
            }));
        }
        let fraction = sod_attos as f64 / day_attos as f64;
        if utc_mjd < first.mjd {
            return Err(EopLookupError::BeforeTable {
                first_mjd: first.mjd,
            });
        }
        if utc_mjd > last.mjd || (utc_mjd == last.mjd && sod_attos > 0) {
            return Err(EopLookupError::AfterTable { last_mjd: last.mjd });
        }
        let tai_utc_now = tai_minus_utc_s(leaps, utc_mjd, sod_attos)?;
        let n = days.len().min(4);
        let offset = (utc_mjd - first.mjd) as usize; // >= 0 and < len, checked above
        let start = offset.saturating_sub(1).min(days.len() - n);
        let window = &days[start..start + n];
        let x = (offset - start) as f64 + fraction;
        let w = lagrange_weights(x, n);
        // UT1 - TAI, kept near UT1 - UTC by measuring TAI - UTC from the window's first day
        let reference = tai_minus_utc_s(leaps, window[0].mjd, 0)?;
        let mut ut1_tai = 0.0;
        for (wi, d) in w.iter().zip(window) {
            let step = tai_minus_utc_s(leaps, d.mjd, 0)? - reference;
            ut1_tai += wi * (d.ut1_minus_utc_s - step);
        }
        let combine = |get: fn(&EopDay) -> f64| -> f64 {
            w.iter().zip(window).map(|(wi, d)| wi * get(d)).sum()
        };
        let combine_opt = |get: fn(&EopDay) -> Option<f64>| -> Option<f64> {
            let mut s = 0.0;
            for (wi, d) in w.iter().zip(window) {
                s += wi * get(d)?;
            }
            Some(s)
        };
        let predicted = |get: fn(&EopDay) -> EopStatus| {
            if window.iter().any(|d| get(d) == EopStatus::Predicted) {
                EopStatus::Predicted
            } else {
                EopStatus::Observed
            }
        };
        let status = predicted(|d| d.status);
        let t = utc_mjd as f64 + fraction;
        let days_after_observed = self
            .last_observed_mjd()
            .map_or(t - first.mjd as f64, |m| (t - m as f64).max(0.0));
        // the stated error of the first tabulated day at or after the instant
        let at_or_after = offset + usize::from(fraction > 0.0);
        let likely_error = match status {
            EopStatus::Predicted => days.get(at_or_after).and_then(|d| d.sigma),
            EopStatus::Observed => None,
        };
        Ok(EopValues {
            ut1_minus_utc_s: ut1_tai + (tai_utc_now - reference),
            xp_arcsec: combine(|d| d.xp_arcsec),
            yp_arcsec: combine(|d| d.yp_arcsec),
            dx_arcsec: combine_opt(|d| d.dx_arcsec),
            dy_arcsec: combine_opt(|d| d.dy_arcsec),
            lod_s: combine_opt(|d| d.lod_s),
            status,
            nutation_status: predicted(|d| d.nutation_status),
            days_after_observed,
            likely_error,
        })
    }
}
