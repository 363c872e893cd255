//! The daily Earth orientation table and its metadata.

use super::error::{EopErrorCode, EopFileError};
use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// Whether a day's values are measured or forecast.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum EopStatus {
        /// Observed (IERS flag `I`, or any C04 day).
        Observed = "observed",
        /// Predicted (IERS Bulletin A flag `P`).
        Predicted = "predicted",
    }
}

/// The 1-sigma errors the file states for a day (IERS Bulletin A / C04 error columns).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct EopSigma {
    /// Error of x_p, arcseconds.
    pub xp_arcsec: f64,
    /// Error of y_p, arcseconds.
    pub yp_arcsec: f64,
    /// Error of UT1 - UTC, seconds.
    pub ut1_minus_utc_s: f64,
}

/// One tabulated day, at 0h UTC of `mjd`.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct EopDay {
    /// Modified Julian Date of the day (0h UTC).
    pub mjd: i64,
    /// UT1 - UTC, seconds.
    pub ut1_minus_utc_s: f64,
    /// Pole coordinate x_p (IERS Conventions (2010) ch. 5.4.1), arcseconds.
    pub xp_arcsec: f64,
    /// Pole coordinate y_p, arcseconds.
    pub yp_arcsec: f64,
    /// Celestial pole offset dX with respect to IAU 2006/2000A, arcseconds (None: not given).
    pub dx_arcsec: Option<f64>,
    /// Celestial pole offset dY, arcseconds (None: not given).
    pub dy_arcsec: Option<f64>,
    /// Excess length of day, seconds (None: not given).
    pub lod_s: Option<f64>,
    /// Observed or predicted: polar motion and UT1 (predicted if either is).
    pub status: EopStatus,
    /// Observed or predicted: dX, dY.
    pub nutation_status: EopStatus,
    /// The stated errors, when the source gives them.
    pub sigma: Option<EopSigma>,
}

/// A daily table of Earth orientation parameters with where it came from.
///
/// Invariant: the days follow each other by exactly one day.
#[derive(Debug, Clone, PartialEq)]
pub struct EopTable {
    days: Vec<EopDay>,
    source: String,
    /// The last day whose polar motion and UT1 are observed (MJD), found once at construction
    /// (every lookup needs it; the search runs over the predicted days).
    last_observed_mjd: Option<i64>,
}

impl EopTable {
    /// Builds a table from consecutive days. `lines` gives each day's 1-based line for errors
    /// (same length as `days`); `last_line` is the number of lines read.
    pub(crate) fn from_days(
        days: Vec<EopDay>,
        lines: &[usize],
        last_line: usize,
        source: String,
    ) -> Result<Self, EopFileError> {
        if days.is_empty() {
            return Err(EopFileError::new(
                last_line,
                EopErrorCode::NoData,
                "daily EOP lines",
                "none",
            ));
        }
        for (i, pair) in days.windows(2).enumerate() {
            if pair[1].mjd != pair[0].mjd + 1 {
                let line = lines.get(i + 1).copied().unwrap_or(last_line);
                return Err(EopFileError::new(
                    line,
                    EopErrorCode::NotDaily,
                    &format!("MJD {}", pair[0].mjd + 1),
                    &format!("MJD {}", pair[1].mjd),
                ));
            }
        }
        let last_observed_mjd = days
            .iter()
            .rev()
            .find(|d| d.status == EopStatus::Observed)
            .map(|d| d.mjd);
        Ok(Self {
            days,
            source,
            last_observed_mjd,
        })
    }

    /// A table with no days (every lookup is outside it), e.g. as a last resort.
    pub(crate) fn empty(source: String) -> Self {
        Self {
            days: Vec::new(),
            source,
            last_observed_mjd: None,
        }
    }

    /// Replaces the human description of where the table came from (e.g. with a file path).
    pub fn with_source(mut self, source: impl Into<String>) -> Self {
        self.source = source.into();
        self
    }

    /// Human text: where the table came from.
    pub fn source(&self) -> &str {
        &self.source
    }

    /// The tabulated days, in date order.
    pub fn days(&self) -> &[EopDay] {
        &self.days
    }

    /// The day at 0h UTC of `mjd`, if tabulated.
    pub fn day(&self, mjd: i64) -> Option<&EopDay> {
        let first = self.days.first()?.mjd;
        let index = usize::try_from(mjd.checked_sub(first)?).ok()?;
        self.days.get(index)
    }

    /// First tabulated day (MJD), or None for an empty table.
    pub fn first_mjd(&self) -> Option<i64> {
        self.days.first().map(|d| d.mjd)
    }

    /// Last tabulated day (MJD): the end of the predictions when there are any.
    pub fn last_mjd(&self) -> Option<i64> {
        self.days.last().map(|d| d.mjd)
    }

    /// Last day whose polar motion and UT1 are observed (MJD).
    pub fn last_observed_mjd(&self) -> Option<i64> {
        self.last_observed_mjd
    }

    /// End of the predictions (MJD): the last day when it is predicted, else None.
    pub fn end_of_predictions_mjd(&self) -> Option<i64> {
        self.days
            .last()
            .filter(|d| d.status == EopStatus::Predicted)
            .map(|d| d.mjd)
    }

    /// Days from the Unix time `unix_s` to the last tabulated day (0h UTC), negative once past
    /// it; None for an empty table. (MJD 40587 = 1970-01-01, as in the leap-second table's
    /// `days_to_expiry`; UTC days counted as 86 400 s.)
    pub fn days_to_end(&self, unix_s: f64) -> Option<f64> {
        let now_mjd = crate::physics::time::calendar::UNIX_EPOCH_MJD as f64 + unix_s / 86_400.0;
        self.last_mjd().map(|last| last as f64 - now_mjd)
    }
}
