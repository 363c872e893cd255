//! The CIP coordinates X, Y straight from the IAU 2006/2000A series (IERS Conventions (2010)
//! ch. 5, eq. 5.16 with tables 5.2a and 5.2b; Capitaine & Wallace 2006, Astron. Astrophys. 450,
//! 855; ERFA `eraXy06`), the table extracted from ERFA's `xy06.c` by
//! `tools/extract_iau2006_series.py` (`data/cip_xy_iau2006_xy06.txt`).
//!
//! This is the series route to X, Y. The service keeps the matrix route
//! ([`super::cio::cip_xy_from_npb`] of the bias-precession-nutation matrix, as ERFA's
//! `eraXys06a` and `eraC2t06a` do): the two agree to about 1 uas (ERFA `xy06.c` note 4), and
//! s, the equation of the origins and GAST are formed from the same matrix, which ERFA advises
//! not to mix with the series (same note). See DEVELOPERS.md, "Earth orientation".

use super::arguments::{
    earth_longitude_rad, general_precession_rad, jupiter_longitude_rad, mars_longitude_rad,
    mercury_longitude_rad, moon_argument_of_latitude_rad, moon_mean_anomaly_rad,
    moon_mean_elongation_rad, moon_node_longitude_rad, neptune_longitude_rad, saturn_longitude_rad,
    sun_mean_anomaly_rad, uranus_longitude_rad, venus_longitude_rad,
};
use super::series_data::SeriesDataError;
use super::{JulianDate, ARCSEC_TO_RAD};
use std::sync::OnceLock;

const XY06_TEXT: &str = include_str!("data/cip_xy_iau2006_xy06.txt");
const FILE: &str = "cip_xy_iau2006_xy06.txt";

/// Which of X (0) or Y (1) the k-th amplitude of a frequency feeds (ERFA `xy06.c`, `jaxy`).
const AXIS: [usize; 20] = [0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1];
/// Whether it multiplies the sine (0) or the cosine (1) of the argument (`jasc`).
const SIN_COS: [usize; 20] = [0, 1, 1, 0, 1, 0, 0, 1, 0, 1, 1, 0, 1, 0, 0, 1, 0, 1, 1, 0];
/// The power of t it multiplies (`japt`).
const POWER: [usize; 20] = [0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2, 2, 3, 3, 3, 3, 4, 4, 4, 4];

/// One frequency of the series: multipliers of the 14 fundamental arguments (l, l', F, D, Om,
/// Me, Ve, E, Ma, Ju, Sa, Ur, Ne, pA; zero past Om for a luni-solar frequency) and its 1 to 20
/// amplitudes in microarcseconds, read by [`AXIS`], [`SIN_COS`], [`POWER`].
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct XyFrequency {
    pub(crate) multipliers: [f64; 14],
    pub(crate) amplitudes_uas: Vec<f64>,
}

/// The whole series: polynomials of X and Y (arcsec, t^0..t^5), then the luni-solar and the
/// planetary frequencies in table order.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct XySeries {
    pub(crate) polynomial_arcsec: [[f64; 6]; 2],
    pub(crate) luni_solar: Vec<XyFrequency>,
    pub(crate) planetary: Vec<XyFrequency>,
}

fn field(fields: &[&str], index: usize, line_number: usize) -> Result<f64, SeriesDataError> {
    fields
        .get(index)
        .and_then(|f| f.parse::<f64>().ok())
        .filter(|v| v.is_finite())
        .ok_or(SeriesDataError {
            file: FILE,
            line_number,
            reason: "missing or bad number",
        })
}

/// One `LS`/`PL` row: `arguments` multipliers, the amplitude count n, then n amplitudes.
fn frequency(
    fields: &[&str],
    arguments: usize,
    line_number: usize,
) -> Result<XyFrequency, SeriesDataError> {
    let mut multipliers = [0.0; 14];
    for (k, slot) in multipliers.iter_mut().take(arguments).enumerate() {
        *slot = field(fields, 1 + k, line_number)?;
    }
    let count = field(fields, 1 + arguments, line_number)?;
    let amplitudes_uas = (0..count as usize)
        .map(|k| field(fields, 2 + arguments + k, line_number))
        .collect::<Result<Vec<_>, _>>()?;
    if !(1.0..=20.0).contains(&count) || fields.len() != 2 + arguments + amplitudes_uas.len() {
        return Err(SeriesDataError {
            file: FILE,
            line_number,
            reason: "amplitude count is not 1..20 or does not match the row",
        });
    }
    Ok(XyFrequency {
        multipliers,
        amplitudes_uas,
    })
}

/// Parse the table: `POLY x|y power coefficient`, `LS` and `PL` rows (see the file's header).
pub(crate) fn parse_xy_series(text: &str) -> Result<XySeries, SeriesDataError> {
    let mut series = XySeries {
        polynomial_arcsec: [[f64::NAN; 6]; 2],
        luni_solar: Vec::new(),
        planetary: Vec::new(),
    };
    for (index, raw) in text.lines().enumerate() {
        let line_number = index + 1;
        let fields: Vec<&str> = raw.split_whitespace().collect();
        let err = |reason| SeriesDataError {
            file: FILE,
            line_number,
            reason,
        };
        match fields.first().copied() {
            None => {}
            Some(first) if first.starts_with('#') => {}
            Some("POLY") => {
                let axis = match fields.get(1).copied() {
                    Some("x") => 0,
                    Some("y") => 1,
                    _ => return Err(err("POLY axis is not x or y")),
                };
                let power = fields
                    .get(2)
                    .and_then(|p| p.parse::<usize>().ok())
                    .filter(|p| *p < 6)
                    .ok_or(err("POLY power is not 0..5"))?;
                if fields.len() != 4 {
                    return Err(err("POLY takes one coefficient"));
                }
                series.polynomial_arcsec[axis][power] = field(&fields, 3, line_number)?;
            }
            Some("LS") => series.luni_solar.push(frequency(&fields, 5, line_number)?),
            Some("PL") => series.planetary.push(frequency(&fields, 14, line_number)?),
            Some(_) => return Err(err("unknown kind")),
        }
    }
    if series
        .polynomial_arcsec
        .iter()
        .flatten()
        .any(|c| c.is_nan())
    {
        return Err(SeriesDataError {
            file: FILE,
            line_number: 0,
            reason: "missing POLY coefficient",
        });
    }
    Ok(series)
}

/// The embedded series, parsed on first use (a packaging error panics with file and line; the
/// tests below read the file).
pub(crate) fn xy_series() -> &'static XySeries {
    static SERIES: OnceLock<XySeries> = OnceLock::new();
    SERIES.get_or_init(|| match parse_xy_series(XY06_TEXT) {
        Ok(series) => series,
        Err(error) => panic!("embedded IAU 2006 X, Y series table is corrupt: {error}"),
    })
}

/// Add the frequencies to `totals` (uas), last frequency first and, within one, last
/// amplitude first, as ERFA sums.
fn sum_frequencies(frequencies: &[XyFrequency], fa: &[f64; 14], pt: &[f64; 6]) -> [f64; 2] {
    let mut totals = [0.0; 2];
    for frequency in frequencies.iter().rev() {
        let argument = frequency
            .multipliers
            .iter()
            .zip(fa)
            .fold(0.0, |sum, (m, f)| sum + m * f);
        let sc = [argument.sin(), argument.cos()];
        for (k, a) in frequency.amplitudes_uas.iter().enumerate().rev() {
            totals[AXIS[k]] += a * sc[SIN_COS[k]] * pt[POWER[k]];
        }
    }
    totals
}

/// X, Y of the CIP in the GCRS, radians, at TT `tt`, from the IAU 2006/2000A series (IERS
/// Conventions (2010) eq. 5.16, tables 5.2a-b; ERFA `eraXy06`, summed in ERFA's order:
/// polynomial, planetary terms, luni-solar terms).
pub fn cip_xy_series_rad(tt: JulianDate) -> (f64, f64) {
    let t = tt.julian_centuries_since_j2000();
    let mut pt = [1.0; 6];
    for power in 1..6 {
        pt[power] = pt[power - 1] * t;
    }
    let fa = [
        moon_mean_anomaly_rad(t),
        sun_mean_anomaly_rad(t),
        moon_argument_of_latitude_rad(t),
        moon_mean_elongation_rad(t),
        moon_node_longitude_rad(t),
        mercury_longitude_rad(t),
        venus_longitude_rad(t),
        earth_longitude_rad(t),
        mars_longitude_rad(t),
        jupiter_longitude_rad(t),
        saturn_longitude_rad(t),
        uranus_longitude_rad(t),
        neptune_longitude_rad(t),
        general_precession_rad(t),
    ];
    let series = xy_series();
    let polynomial = series
        .polynomial_arcsec
        .map(|c| (0..6).rev().fold(0.0, |sum, j| sum + c[j] * pt[j]));
    let planetary = sum_frequencies(&series.planetary, &fa, &pt);
    let luni_solar = sum_frequencies(&series.luni_solar, &fa, &pt);
    let axis = |k: usize| ARCSEC_TO_RAD * (polynomial[k] + (luni_solar[k] + planetary[k]) / 1e6);
    (axis(0), axis(1))
}

#[cfg(test)]
#[path = "tests_xy_series.rs"]
mod tests;
