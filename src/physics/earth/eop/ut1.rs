//! The EOP table as the time engine's source of UT1 - UTC.

use super::table::{EopStatus, EopTable};
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::ut1::{Ut1Offset, Ut1Source};

impl Ut1Source for EopTable {
    /// UT1 - UTC from [`EopTable::at_utc_attos`] (4-point Lagrange through UT1 - TAI), with
    /// its status and, on predicted days, Bulletin A's stated error; outside the table the
    /// reason names the table's first or last day.
    fn ut1_minus_utc(
        &self,
        leaps: &LeapTable,
        utc_mjd: i64,
        sod_attos: i128,
    ) -> Result<Ut1Offset, String> {
        let values = self
            .at_utc_attos(leaps, utc_mjd, sod_attos)
            .map_err(|error| {
                let edge = match error {
                    super::EopLookupError::BeforeTable { first_mjd } => Some(first_mjd),
                    super::EopLookupError::AfterTable { last_mjd } => Some(last_mjd),
                    _ => None,
                };
                match edge {
                    Some(mjd) => format!("{error} ({})", CalendarDate::from_mjd(mjd)),
                    None => error.to_string(),
                }
            })?;
        Ok(Ut1Offset {
            ut1_minus_utc_s: values.ut1_minus_utc_s,
            predicted: values.status == EopStatus::Predicted,
            likely_error_s: values.likely_error.map(|sigma| sigma.ut1_minus_utc_s),
        })
    }
}
