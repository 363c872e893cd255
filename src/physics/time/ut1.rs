//! UT1, the Earth's rotation as a time scale, through UTC.
//!
//! UT1 - UTC is measured, not defined: it comes from a source of Earth orientation parameters
//! (in the service, `physics::earth::eop::EopTable` implements [`Ut1Source`]; this module knows
//! no table, so that `time` does not depend on `earth`). A UT1 instant counts its reading as
//! the other uniform scales do: attoseconds since J2000.0 of UT1, 86 400 s per day. UT1 is
//! continuous, so at a leap second the jump of UT1 - UTC cancels that of UTC; the lookup is
//! therefore made through UT1 - TAI, which is smooth:
//!
//! UT1 = UTC + (UT1 - UTC)(UTC) (IERS Conventions (2010) ch. 5.4.2, UT1 - UTC interpolated at
//! the UTC epoch as IERS Conventions (2010) ch. 5.5.1 says).

use std::fmt;

use super::error::TimeError;
use super::instant::{seconds_f64_to_attos, uniform_count_attos, uniform_day_reading, Instant};
use super::leap_seconds::LeapTable;
use super::scale::Scale;

/// UT1 - UTC at one UTC reading, with how well it is known.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Ut1Offset {
    /// UT1 - UTC, seconds.
    pub ut1_minus_utc_s: f64,
    /// True when the value rests on predicted days (IERS Bulletin A predictions).
    pub predicted: bool,
    /// On predicted values, the likely error (1 sigma) the source states, seconds.
    pub likely_error_s: Option<f64>,
}

/// A source of UT1 - UTC (an Earth orientation table).
pub trait Ut1Source: Sync {
    /// UT1 - UTC at UTC day `utc_mjd`, `sod_attos` attoseconds after 0h UTC (`leaps` gives
    /// TAI - UTC); `Err` with a sentence saying why the source has no value (e.g. the epoch is
    /// after the end of its predictions).
    fn ut1_minus_utc(
        &self,
        leaps: &LeapTable,
        utc_mjd: i64,
        sod_attos: i128,
    ) -> Result<Ut1Offset, String>;
}

impl fmt::Debug for dyn Ut1Source + '_ {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str("Ut1Source")
    }
}

/// |UT1 - UTC| stays below 0.9 s (ITU-R TF.460-6), in attoseconds.
const MAX_UT1_MINUS_UTC_ATTOS: i128 = 900_000_000_000_000_000;

/// Iterations of [`tai_from_ut1_attos`] at most (see there for the convergence).
pub const UT1_INVERSE_MAX_ITERATIONS: usize = 5;

/// The error of a conversion that needs UT1 where `source` gives none.
fn unavailable(reason: &str) -> TimeError {
    TimeError::Ut1Unavailable(format!(
        "UT1 needs UT1 - UTC from the Earth orientation table at this epoch: {reason}"
    ))
}

/// UT1 - UTC at the event of TAI count `tai_attos`.
pub fn ut1_offset_at_tai(
    tai_attos: i128,
    leaps: &LeapTable,
    source: Option<&dyn Ut1Source>,
) -> Result<Ut1Offset, TimeError> {
    offset_and_utc_reading(tai_attos, leaps, source).map(|(offset, _)| offset)
}

/// UT1 - UTC at the event of TAI count `tai_attos`, and the UTC reading's uniform count
/// (86 400 s per day since J2000.0; a leap second shares the next day's first second).
fn offset_and_utc_reading(
    tai_attos: i128,
    leaps: &LeapTable,
    source: Option<&dyn Ut1Source>,
) -> Result<(Ut1Offset, i128), TimeError> {
    let source = source.ok_or_else(|| unavailable("no Earth orientation table is given"))?;
    let (mjd, sod) = leaps
        .utc_from_tai(tai_attos)
        .map_err(|e| unavailable(&e.to_string()))?;
    let offset = source
        .ut1_minus_utc(leaps, mjd, sod)
        .map_err(|reason| unavailable(&reason))?;
    Ok((offset, uniform_count_attos(mjd, sod)))
}

/// UT1 - TAI in attoseconds at TAI count `tai_attos`: UT1 = UTC + (UT1 - UTC) with the UTC
/// reading counted at 86 400 s per day (IERS Conventions (2010) ch. 5.4.2), minus TAI.
pub fn ut1_minus_tai_attos(
    tai_attos: i128,
    leaps: &LeapTable,
    source: Option<&dyn Ut1Source>,
) -> Result<i128, TimeError> {
    let (offset, utc_reading) = offset_and_utc_reading(tai_attos, leaps, source)?;
    Ok(utc_reading + seconds_f64_to_attos(offset.ut1_minus_utc_s) - tai_attos)
}

/// The UT1 instant of the event at TAI count `tai_attos`.
pub fn ut1_from_tai(
    tai_attos: i128,
    leaps: &LeapTable,
    source: Option<&dyn Ut1Source>,
) -> Result<Instant, TimeError> {
    let count = tai_attos + ut1_minus_tai_attos(tai_attos, leaps, source)?;
    Ok(Instant::from_count_attos(Scale::Ut1, count))
}

/// The TAI count of the event whose UT1 count is `ut1_attos`.
///
/// UT1 - TAI is looked up at the UTC (hence TAI) epoch, so TAI = UT1 - (UT1 - TAI)(TAI) is
/// solved by fixed-point iteration. It starts from the UTC reading equal to the UT1 reading,
/// off by |UT1 - UTC| <= 0.9 s (ITU-R TF.460-6); when the table has no value there (the event
/// within 0.9 s of one of its ends), from 0.9 s later or earlier, whichever it covers.
/// Convergence: each step shrinks the error by |d(UT1 - TAI)/dt|, the excess length of day
/// over 86 400 s, below 5e-8 since 1962 (it has stayed within about -1 ms .. +4 ms per day,
/// from memory), so the errors are < 5e-8 s, < 3e-15 s and < 2e-22 s after one, two and three
/// steps: three steps reach the attosecond, and the loop stops at the first step that changes
/// nothing (at most [`UT1_INVERSE_MAX_ITERATIONS`]). An event less than 5e-8 s inside an end of
/// the table may be refused as outside it.
pub fn tai_from_ut1_attos(
    ut1_attos: i128,
    leaps: &LeapTable,
    source: Option<&dyn Ut1Source>,
) -> Result<i128, TimeError> {
    solve_tai_from_ut1(ut1_attos, leaps, source).map(|(tai, _)| tai)
}

/// [`tai_from_ut1_attos`] with the number of steps that changed the estimate.
pub(crate) fn solve_tai_from_ut1(
    ut1_attos: i128,
    leaps: &LeapTable,
    source: Option<&dyn Ut1Source>,
) -> Result<(i128, usize), TimeError> {
    let (mut tai, mut ut1_minus_tai) = start_guess(ut1_attos, leaps, source)?;
    for steps in 0..UT1_INVERSE_MAX_ITERATIONS {
        let next = ut1_attos - ut1_minus_tai;
        if next == tai {
            return Ok((tai, steps));
        }
        tai = next;
        ut1_minus_tai = ut1_minus_tai_attos(tai, leaps, source)?;
    }
    Ok((tai, UT1_INVERSE_MAX_ITERATIONS))
}

/// The start of [`tai_from_ut1_attos`]: the TAI count of the UTC reading equal to the UT1
/// reading, or 0.9 s after or before it, the first the source covers; with UT1 - TAI there.
fn start_guess(
    ut1_attos: i128,
    leaps: &LeapTable,
    source: Option<&dyn Ut1Source>,
) -> Result<(i128, i128), TimeError> {
    let reading = uniform_day_reading(ut1_attos);
    let tai = leaps
        .tai_from_utc(reading.mjd, reading.seconds_of_day_attos)
        .map_err(|e| unavailable(&e.to_string()))?;
    let margin = MAX_UT1_MINUS_UTC_ATTOS;
    match ut1_minus_tai_attos(tai, leaps, source) {
        Ok(value) => Ok((tai, value)),
        Err(error) => [tai + margin, tai - margin]
            .into_iter()
            .find_map(|candidate| {
                ut1_minus_tai_attos(candidate, leaps, source)
                    .ok()
                    .map(|value| (candidate, value))
            })
            .ok_or(error),
    }
}
