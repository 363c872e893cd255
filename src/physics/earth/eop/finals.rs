//! Reader of IERS Bulletin A `finals2000A.all` / `.data` / `.daily` (USNO).
//!
//! Column layout (1-based bytes) from `ReadMe.finals2000A` as shipped in astropy-iers-data
//! 0.2026.11.2.0.34.55 ("adapted from readme.finals2000A"): 1-2 year (add 1900 for
//! MJD <= 51543, else 2000), 3-4 month, 5-6 day, 8-15 MJD (F8.2), 17 polar motion flag
//! (I IERS, P prediction), 19-27 x_p (arcsec), 28-36 its error, 38-46 y_p, 47-55 its error,
//! 58 UT1 flag, 59-68 UT1-UTC (s), 69-78 its error, 80-86 LOD (ms, not always filled),
//! 87-93 its error, 96 nutation flag, 98-106 dX (mas), 107-115 its error, 117-125 dY (mas),
//! 126-134 its error; 135-185 Bulletin B values, not used here.
//!
//! Lines that carry a date but no values (the file's last days) are skipped; a value line after
//! such a gap is refused as not daily.

use super::error::{EopErrorCode, EopFileError};
use super::fields::{check_date, columns, optional, required, small_int, whole_mjd};
use super::table::{EopDay, EopSigma, EopStatus, EopTable};

/// |x_p|, |y_p| above this (arcsec) is refused: the pole wanders within about 0.6".
pub(crate) const POLE_LIMIT_ARCSEC: f64 = 2.0;
/// |UT1 - UTC| above this (s) is refused: UTC is kept within 0.9 s of UT1 (ITU-R TF.460-6).
pub(crate) const UT1_LIMIT_S: f64 = 1.0;
/// |dX|, |dY| above this (arcsec) is refused.
pub(crate) const NUTATION_LIMIT_ARCSEC: f64 = 1.0;
/// |LOD| above this (s) is refused: the excess length of day stays within a few ms.
pub(crate) const LOD_LIMIT_S: f64 = 0.01;
/// Stated errors above this (arcsec or s) are refused.
pub(crate) const SIGMA_LIMIT: f64 = 10.0;

/// Reads a `finals2000A` file into a table (source: "IERS Bulletin A finals2000A").
pub fn parse_finals2000a(text: &str) -> Result<EopTable, EopFileError> {
    let mut days = Vec::new();
    let mut lines = Vec::new();
    let mut count = 0;
    for (index, line) in text.lines().enumerate() {
        count = index + 1;
        if line.trim().is_empty() {
            continue;
        }
        if let Some(day) = parse_line(line, count)? {
            days.push(day);
            lines.push(count);
        }
    }
    EopTable::from_days(
        days,
        &lines,
        count,
        "IERS Bulletin A finals2000A".to_string(),
    )
}

/// One line: `Ok(None)` for a dated line without values.
fn parse_line(line: &str, n: usize) -> Result<Option<EopDay>, EopFileError> {
    let mjd_text = columns(line, 8, 15).unwrap_or(line);
    let mjd = whole_mjd(mjd_text, n)?;
    let mut date = [0_i64; 3];
    for (slot, (first, name)) in date.iter_mut().zip([(1, "year"), (3, "month"), (5, "day")]) {
        *slot = small_int(columns(line, first, first + 1).unwrap_or(line), n, name)?;
    }
    let year = date[0] + if mjd <= 51_543 { 1900 } else { 2000 };
    check_date((year, date[1], date[2]), mjd, n)?;
    let pm_flag = columns(line, 17, 17).unwrap_or(line);
    let ut_flag = columns(line, 58, 58).unwrap_or(line);
    let xp_text = columns(line, 19, 27).unwrap_or(line);
    let ut_text = columns(line, 59, 68).unwrap_or(line);
    if pm_flag.is_empty() && ut_flag.is_empty() && xp_text.is_empty() && ut_text.is_empty() {
        return Ok(None);
    }
    let pm_status = flag(pm_flag, n, "polar motion flag (column 17)")?;
    let ut_status = flag(ut_flag, n, "UT1 flag (column 58)")?;
    let xp = required(line, n, (19, 27), "x_p", POLE_LIMIT_ARCSEC)?;
    let yp = required(line, n, (38, 46), "y_p", POLE_LIMIT_ARCSEC)?;
    let ut1 = required(line, n, (59, 68), "UT1-UTC", UT1_LIMIT_S)?;
    let lod_ms = optional(line, n, (80, 86), "LOD", LOD_LIMIT_S * 1e3)?;
    let dx_mas = optional(line, n, (98, 106), "dX", NUTATION_LIMIT_ARCSEC * 1e3)?;
    let dy_mas = optional(line, n, (117, 125), "dY", NUTATION_LIMIT_ARCSEC * 1e3)?;
    if dx_mas.is_some() != dy_mas.is_some() {
        return Err(EopFileError::new(
            n,
            EopErrorCode::Truncated,
            "both dX (columns 98-106) and dY (117-125) or neither",
            line,
        ));
    }
    let nutation_status = match dx_mas {
        Some(_) => flag(
            columns(line, 96, 96).unwrap_or(line),
            n,
            "nutation flag (column 96)",
        )?,
        None => EopStatus::Predicted,
    };
    let sigma = match (
        optional(line, n, (28, 36), "error of x_p", SIGMA_LIMIT)?,
        optional(line, n, (47, 55), "error of y_p", SIGMA_LIMIT)?,
        optional(line, n, (69, 78), "error of UT1-UTC", SIGMA_LIMIT)?,
    ) {
        (Some(x), Some(y), Some(t)) => Some(EopSigma {
            xp_arcsec: x,
            yp_arcsec: y,
            ut1_minus_utc_s: t,
        }),
        _ => None,
    };
    let status = if pm_status == EopStatus::Predicted || ut_status == EopStatus::Predicted {
        EopStatus::Predicted
    } else {
        EopStatus::Observed
    };
    Ok(Some(EopDay {
        mjd,
        ut1_minus_utc_s: ut1,
        xp_arcsec: xp,
        yp_arcsec: yp,
        dx_arcsec: dx_mas.map(|v| v / 1e3),
        dy_arcsec: dy_mas.map(|v| v / 1e3),
        lod_s: lod_ms.map(|v| v / 1e3),
        status,
        nutation_status,
        sigma,
    }))
}

/// An `I`/`P` flag (IERS `readme.finals2000A`).
fn flag(text: &str, n: usize, name: &str) -> Result<EopStatus, EopFileError> {
    match text {
        "I" => Ok(EopStatus::Observed),
        "P" => Ok(EopStatus::Predicted),
        "" => Err(EopFileError::new(
            n,
            EopErrorCode::Truncated,
            &format!("I or P for the {name}"),
            "nothing",
        )),
        _ => Err(EopFileError::new(
            n,
            EopErrorCode::BadFlag,
            &format!("I or P for the {name}"),
            text,
        )),
    }
}
