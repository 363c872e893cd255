//! The embedded series tables (extracted from ERFA's `nut00a.c` and `s06.c` by
//! `tools/extract_iau2006_series.py`; see the headers of the files in `data/`), parsed once.

use std::fmt;
use std::sync::OnceLock;

const LUNI_SOLAR_TEXT: &str = include_str!("data/nutation_iau2000a_luni_solar.txt");
const PLANETARY_TEXT: &str = include_str!("data/nutation_iau2000a_planetary.txt");
const CIO_LOCATOR_TEXT: &str = include_str!("data/cio_locator_iau2006_s06.txt");

/// One luni-solar nutation term (IERS Conventions (2010) table 5.3a), units 0.1 uas (and per
/// Julian century for the `_t` rates).
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct LuniSolarTerm {
    /// Multipliers of l, l', F, D, Omega.
    pub(crate) multipliers: [f64; 5],
    pub(crate) longitude_sin: f64,
    pub(crate) longitude_sin_t: f64,
    pub(crate) longitude_cos: f64,
    pub(crate) obliquity_cos: f64,
    pub(crate) obliquity_cos_t: f64,
    pub(crate) obliquity_sin: f64,
}

/// One planetary nutation term (IERS Conventions (2010) table 5.3b), units 0.1 uas.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct PlanetaryTerm {
    /// Multipliers of l, F, D, Omega, Me, Ve, E, Ma, Ju, Sa, Ur, Ne, p_A.
    pub(crate) multipliers: [f64; 13],
    pub(crate) longitude_sin: f64,
    pub(crate) longitude_cos: f64,
    pub(crate) obliquity_sin: f64,
    pub(crate) obliquity_cos: f64,
}

/// One periodic term of s + XY/2 (IERS Conventions (2010) table 5.2d), arcseconds.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct CioTerm {
    /// Multipliers of l, l', F, D, Omega, L_Ve, L_E, p_A.
    pub(crate) multipliers: [f64; 8],
    pub(crate) sin_arcsec: f64,
    pub(crate) cos_arcsec: f64,
}

/// The series for s + XY/2: polynomial coefficients (t^0..t^5) and the periodic terms that
/// multiply t^0..t^4, in table order.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct CioSeries {
    pub(crate) polynomial_arcsec: [f64; 6],
    pub(crate) periodic: [Vec<CioTerm>; 5],
}

/// All three tables.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct SeriesTables {
    pub(crate) luni_solar: Vec<LuniSolarTerm>,
    pub(crate) planetary: Vec<PlanetaryTerm>,
    pub(crate) cio: CioSeries,
}

/// Why an embedded table could not be read (a build-time data error, never user input).
#[derive(Debug, Clone, PartialEq, Eq)]
pub(crate) struct SeriesDataError {
    pub(crate) file: &'static str,
    pub(crate) line_number: usize,
    pub(crate) reason: &'static str,
}

impl fmt::Display for SeriesDataError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(
            f,
            "{} line {}: {}",
            self.file, self.line_number, self.reason
        )
    }
}

/// The data lines of `text` (not blank, not `#`), with their 1-based line numbers, split into
/// fields and parsed as finite numbers (or a leading keyword, kept as text).
fn data_lines(text: &str) -> impl Iterator<Item = (usize, Vec<&str>)> {
    text.lines().enumerate().filter_map(|(index, raw)| {
        let line = raw.trim();
        (!line.is_empty() && !line.starts_with('#'))
            .then(|| (index + 1, line.split_whitespace().collect()))
    })
}

fn numbers<const N: usize>(fields: &[&str]) -> Option<[f64; N]> {
    if fields.len() != N {
        return None;
    }
    let mut out = [0.0; N];
    for (slot, field) in out.iter_mut().zip(fields) {
        *slot = field.parse::<f64>().ok().filter(|v| v.is_finite())?;
    }
    Some(out)
}

/// Parse the luni-solar table: `nl nlp nf nd nom sp spt cp ce cet se` per line.
pub(crate) fn parse_luni_solar(text: &str) -> Result<Vec<LuniSolarTerm>, SeriesDataError> {
    data_lines(text)
        .map(|(line_number, fields)| {
            let [l, lp, f, d, om, sp, spt, cp, ce, cet, se] =
                numbers::<11>(&fields).ok_or(SeriesDataError {
                    file: "nutation_iau2000a_luni_solar.txt",
                    line_number,
                    reason: "expected 11 numbers",
                })?;
            Ok(LuniSolarTerm {
                multipliers: [l, lp, f, d, om],
                longitude_sin: sp,
                longitude_sin_t: spt,
                longitude_cos: cp,
                obliquity_cos: ce,
                obliquity_cos_t: cet,
                obliquity_sin: se,
            })
        })
        .collect()
}

/// Parse the planetary table: 13 multipliers then `sp cp se ce` per line.
pub(crate) fn parse_planetary(text: &str) -> Result<Vec<PlanetaryTerm>, SeriesDataError> {
    data_lines(text)
        .map(|(line_number, fields)| {
            let row = numbers::<17>(&fields).ok_or(SeriesDataError {
                file: "nutation_iau2000a_planetary.txt",
                line_number,
                reason: "expected 17 numbers",
            })?;
            let mut multipliers = [0.0; 13];
            multipliers.copy_from_slice(&row[..13]);
            Ok(PlanetaryTerm {
                multipliers,
                longitude_sin: row[13],
                longitude_cos: row[14],
                obliquity_sin: row[15],
                obliquity_cos: row[16],
            })
        })
        .collect()
}

/// Parse the CIO-locator table: `POLY power coefficient` and
/// `TERM power m1 .. m8 sin cos` lines.
pub(crate) fn parse_cio(text: &str) -> Result<CioSeries, SeriesDataError> {
    let mut series = CioSeries {
        polynomial_arcsec: [f64::NAN; 6],
        periodic: Default::default(),
    };
    for (line_number, fields) in data_lines(text) {
        let err = |reason| SeriesDataError {
            file: "cio_locator_iau2006_s06.txt",
            line_number,
            reason,
        };
        let power: usize = fields
            .get(1)
            .and_then(|p| p.parse().ok())
            .ok_or(err("bad power"))?;
        match fields[0] {
            "POLY" => {
                let [value] = numbers::<1>(&fields[2..]).ok_or(err("bad coefficient"))?;
                *series
                    .polynomial_arcsec
                    .get_mut(power)
                    .ok_or(err("POLY power above 5"))? = value;
            }
            "TERM" => {
                let row = numbers::<10>(&fields[2..]).ok_or(err("expected 10 numbers"))?;
                let mut multipliers = [0.0; 8];
                multipliers.copy_from_slice(&row[..8]);
                series
                    .periodic
                    .get_mut(power)
                    .ok_or(err("TERM power above 4"))?
                    .push(CioTerm {
                        multipliers,
                        sin_arcsec: row[8],
                        cos_arcsec: row[9],
                    });
            }
            _ => return Err(err("unknown kind")),
        }
    }
    if series.polynomial_arcsec.iter().any(|c| c.is_nan()) {
        return Err(SeriesDataError {
            file: "cio_locator_iau2006_s06.txt",
            line_number: 0,
            reason: "missing POLY coefficient",
        });
    }
    Ok(series)
}

fn parse_all() -> Result<SeriesTables, SeriesDataError> {
    Ok(SeriesTables {
        luni_solar: parse_luni_solar(LUNI_SOLAR_TEXT)?,
        planetary: parse_planetary(PLANETARY_TEXT)?,
        cio: parse_cio(CIO_LOCATOR_TEXT)?,
    })
}

/// The embedded tables, parsed on first use. The files are part of the build and checked by the
/// tests below, so a failure here is a packaging error: it panics with the file and line.
pub(crate) fn tables() -> &'static SeriesTables {
    static TABLES: OnceLock<SeriesTables> = OnceLock::new();
    TABLES.get_or_init(|| match parse_all() {
        Ok(tables) => tables,
        Err(error) => panic!("embedded IAU 2006 series table is corrupt: {error}"),
    })
}

#[cfg(test)]
mod tests {
    use super::*;

    /// Term counts of IERS Conventions (2010) tables 5.3a (678), 5.3b (687) and 5.2d (33, 3, 25,
    /// 4, 1), which are also ERFA's nut00a.c and s06.c table sizes.
    #[test]
    fn tables_have_the_published_term_counts() {
        let tables = parse_all().expect("embedded tables parse");
        assert_eq!(tables.luni_solar.len(), 678);
        assert_eq!(tables.planetary.len(), 687);
        let counts: Vec<usize> = tables.cio.periodic.iter().map(Vec::len).collect();
        assert_eq!(counts, [33, 3, 25, 4, 1]);
    }

    /// The leading 18.6-year term (IERS Conventions (2010) table 5.3a, first row:
    /// -17.2064161" sin Omega in longitude, 9.2052331" cos Omega in obliquity) and the leading
    /// s + XY/2 term (table 5.2d: -2640.73 uas sin Omega).
    #[test]
    fn leading_terms_are_the_published_ones() {
        let tables = tables();
        let first = tables.luni_solar[0];
        assert_eq!(first.multipliers, [0.0, 0.0, 0.0, 0.0, 1.0]);
        assert_eq!(first.longitude_sin, -172_064_161.0);
        assert_eq!(first.obliquity_cos, 92_052_331.0);
        assert_eq!(tables.cio.periodic[0][0].sin_arcsec, -2640.73e-6);
        assert_eq!(tables.cio.polynomial_arcsec[3], -72_574.11e-6);
    }

    /// Bad rows are rejected with their line number (so a damaged file cannot load silently).
    #[test]
    fn bad_rows_are_rejected_with_line_numbers() {
        let error = parse_luni_solar("# c\n0 0 0 0 1 2 3\n").unwrap_err();
        assert_eq!(error.line_number, 2);
        assert!(parse_planetary("0 0 x 0 0 0 0 0 0 0 0 0 0 1 2 3 4\n").is_err());
        assert!(parse_cio("TERM 9 0 0 0 0 1 0 0 0 1 2\n").is_err());
        assert!(parse_cio("POLY 0 1\n").is_err(), "missing coefficients");
    }
}
