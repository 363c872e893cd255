//! Reader of the IERS EOP C04 series (Paris Observatory), in two layouts recognized per line
//! by the number of fields:
//!
//! - EOP 20 C04 (`eopc04.1962-now`, as shipped in astropy-iers-data 0.2026.11.2.0.34.55 with
//!   its `ReadMe.eopc04`): 21 fields: year, month, day, hour (0), MJD, x_p ("), y_p ("),
//!   UT1-UTC (s), dX ("), dY ("), x_p rate, y_p rate ("/day), LOD (s), then the errors of
//!   x_p, y_p, UT1-UTC, dX, dY, the two rates and LOD. Header lines start with `#`.
//! - EOP 14 C04 (`eopc04_14_IAU2000.62-now`), layout from memory (not checked against a real
//!   file here): 16 fields: year, month, day, MJD, x_p, y_p, UT1-UTC, LOD, dX, dY, then the
//!   errors of x_p, y_p, UT1-UTC, LOD, dX, dY; a free-text header whose lines do not start
//!   with a digit.
//!
//! Every C04 day is observed. After the first data line, every non-blank, non-`#` line must be
//! a data line of the same layout.

use super::error::{EopErrorCode, EopFileError};
use super::fields::{check_date, number_in, small_int, whole_mjd};
use super::finals::{
    LOD_LIMIT_S, NUTATION_LIMIT_ARCSEC, POLE_LIMIT_ARCSEC, SIGMA_LIMIT, UT1_LIMIT_S,
};
use super::table::{EopDay, EopSigma, EopStatus, EopTable};

/// Field positions of one layout: (number of fields, has hour, MJD, x, y, UT1, dX, dY, LOD,
/// error of x, y, UT1).
#[derive(Clone, Copy, PartialEq, Eq, Debug)]
struct Layout {
    fields: usize,
    hour: bool,
    at: [usize; 10],
    name: &'static str,
}

const C04_20: Layout = Layout {
    fields: 21,
    hour: true,
    at: [4, 5, 6, 7, 8, 9, 12, 13, 14, 15],
    name: "IERS EOP 20 C04",
};

const C04_14: Layout = Layout {
    fields: 16,
    hour: false,
    at: [3, 4, 5, 6, 8, 9, 7, 10, 11, 12],
    name: "IERS EOP 14 C04",
};

/// Reads a C04 file into a table (source: "IERS EOP 20 C04" or "IERS EOP 14 C04").
pub fn parse_c04(text: &str) -> Result<EopTable, EopFileError> {
    let mut days = Vec::new();
    let mut lines = Vec::new();
    let mut layout: Option<Layout> = None;
    let mut count = 0;
    for (index, line) in text.lines().enumerate() {
        count = index + 1;
        let trimmed = line.trim();
        if trimmed.is_empty() || trimmed.starts_with('#') {
            continue;
        }
        let starts_with_digit = trimmed.bytes().next().is_some_and(|b| b.is_ascii_digit());
        if layout.is_none() && !starts_with_digit {
            continue; // free-text header (EOP 14 C04)
        }
        let fields: Vec<&str> = trimmed.split_whitespace().collect();
        let this = match fields.len() {
            21 => C04_20,
            16 => C04_14,
            _ => {
                return Err(EopFileError::new(
                    count,
                    EopErrorCode::Truncated,
                    "a C04 data line of 21 fields (EOP 20 C04) or 16 (EOP 14 C04)",
                    line,
                ))
            }
        };
        if layout.is_some_and(|l| l != this) {
            return Err(EopFileError::new(
                count,
                EopErrorCode::UnknownFormat,
                "the same C04 layout as the first data line",
                line,
            ));
        }
        layout = Some(this);
        days.push(parse_fields(&fields, this, count)?);
        lines.push(count);
    }
    let source = layout.map_or("IERS EOP C04", |l| l.name).to_string();
    EopTable::from_days(days, &lines, count, source)
}

fn parse_fields(f: &[&str], layout: Layout, n: usize) -> Result<EopDay, EopFileError> {
    let year = small_int(f[0], n, "year")?;
    let month = small_int(f[1], n, "month")?;
    let day = small_int(f[2], n, "day")?;
    if layout.hour && small_int(f[3], n, "hour")? != 0 {
        return Err(EopFileError::new(
            n,
            EopErrorCode::OutOfRange,
            "hour 0 (C04 is sampled at 0h UTC)",
            f[3],
        ));
    }
    let [mjd_at, x, y, ut, dx, dy, lod, ex, ey, eut] = layout.at;
    let mjd = whole_mjd(f[mjd_at], n)?;
    check_date((year, month, day), mjd, n)?;
    let sigma = EopSigma {
        xp_arcsec: number_in(f[ex], n, "error of x_p", SIGMA_LIMIT)?,
        yp_arcsec: number_in(f[ey], n, "error of y_p", SIGMA_LIMIT)?,
        ut1_minus_utc_s: number_in(f[eut], n, "error of UT1-UTC", SIGMA_LIMIT)?,
    };
    Ok(EopDay {
        mjd,
        ut1_minus_utc_s: number_in(f[ut], n, "UT1-UTC", UT1_LIMIT_S)?,
        xp_arcsec: number_in(f[x], n, "x_p", POLE_LIMIT_ARCSEC)?,
        yp_arcsec: number_in(f[y], n, "y_p", POLE_LIMIT_ARCSEC)?,
        dx_arcsec: Some(number_in(f[dx], n, "dX", NUTATION_LIMIT_ARCSEC)?),
        dy_arcsec: Some(number_in(f[dy], n, "dY", NUTATION_LIMIT_ARCSEC)?),
        lod_s: Some(number_in(f[lod], n, "LOD", LOD_LIMIT_S)?),
        status: EopStatus::Observed,
        nutation_status: EopStatus::Observed,
        sigma: Some(sigma),
    })
}
