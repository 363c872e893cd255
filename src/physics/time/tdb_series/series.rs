//! The geocentric Fairhead & Bretagnon (1990) series: the coefficient table and its sum.
//!
//! The table is `data/fairhead_bretagnon_1990.txt`, extracted from ERFA's `dtdb.c` by
//! `tools/extract_fairhead_bretagnon.py`. It is embedded in the binary and parsed once.

use std::fmt;
use std::sync::OnceLock;

/// The coefficient table as shipped (see the header of the file for its source).
const TABLE_TEXT: &str = include_str!("../data/fairhead_bretagnon_1990.txt");

/// Highest power of T that multiplies a block of the series (Fairhead & Bretagnon 1990: T^0..T^4).
pub(crate) const MAX_POWER: usize = 4;

/// One periodic term: `amplitude_s * sin(frequency * T + phase_rad)`, T in Julian millennia.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct Term {
    pub(crate) amplitude_s: f64,
    pub(crate) frequency_rad_per_millennium: f64,
    pub(crate) phase_rad: f64,
}

/// The parsed series.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct SeriesTable {
    /// `blocks[p]`: the Fairhead & Bretagnon terms multiplied by T^p, in table order.
    pub(crate) blocks: [Vec<Term>; MAX_POWER + 1],
    /// ERFA's adjustment for JPL planetary masses: periodic terms (T^0), in table order.
    pub(crate) adjustment: Vec<Term>,
    /// ERFA's adjustment for JPL planetary masses: polynomial terms `(power, coefficient_s)`.
    pub(crate) polynomial: Vec<(usize, f64)>,
}

/// Why the embedded table could not be read (a build-time data error, never user input).
#[derive(Debug, Clone, PartialEq, Eq)]
pub(crate) struct SeriesDataError {
    pub(crate) line_number: usize,
    pub(crate) reason: &'static str,
}

impl fmt::Display for SeriesDataError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(
            f,
            "fairhead_bretagnon_1990.txt line {}: {}",
            self.line_number, self.reason
        )
    }
}

/// Parse the text form written by `tools/extract_fairhead_bretagnon.py`.
///
/// Each data line is `kind power amplitude_s frequency_rad_per_julian_millennium phase_rad`;
/// `kind` is `FB` (series term, power 0..=4), `ADJ` (adjustment term, power 0) or `POLY`
/// (adjustment polynomial `amplitude_s * T^power`, frequency and phase 0). Lines starting with
/// `#` and blank lines are comments.
pub(crate) fn parse_table(text: &str) -> Result<SeriesTable, SeriesDataError> {
    let mut table = SeriesTable {
        blocks: Default::default(),
        adjustment: Vec::new(),
        polynomial: Vec::new(),
    };
    for (index, raw) in text.lines().enumerate() {
        let line_number = index + 1;
        let err = |reason| SeriesDataError {
            line_number,
            reason,
        };
        let line = raw.trim();
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let fields: Vec<&str> = line.split_whitespace().collect();
        let [kind, power, amplitude, frequency, phase] = fields.as_slice() else {
            return Err(err("expected 5 fields"));
        };
        let power: usize = power.parse().map_err(|_| err("bad power"))?;
        let number = |s: &str| s.parse::<f64>().ok().filter(|v| v.is_finite());
        let term = Term {
            amplitude_s: number(amplitude).ok_or_else(|| err("bad amplitude"))?,
            frequency_rad_per_millennium: number(frequency).ok_or_else(|| err("bad frequency"))?,
            phase_rad: number(phase).ok_or_else(|| err("bad phase"))?,
        };
        match *kind {
            "FB" => table
                .blocks
                .get_mut(power)
                .ok_or_else(|| err("FB power above 4"))?
                .push(term),
            "ADJ" if power == 0 => table.adjustment.push(term),
            "ADJ" => return Err(err("ADJ terms must have power 0")),
            "POLY" if power <= MAX_POWER => {
                if term.frequency_rad_per_millennium != 0.0 || term.phase_rad != 0.0 {
                    return Err(err("POLY terms must have frequency and phase 0"));
                }
                table.polynomial.push((power, term.amplitude_s));
            }
            "POLY" => return Err(err("POLY power above 4")),
            _ => return Err(err("unknown kind")),
        }
    }
    Ok(table)
}

/// The embedded table, parsed on first use.
pub(crate) fn table() -> &'static Result<SeriesTable, SeriesDataError> {
    static TABLE: OnceLock<Result<SeriesTable, SeriesDataError>> = OnceLock::new();
    TABLE.get_or_init(|| parse_table(TABLE_TEXT))
}

/// Sum of `amplitude * sin(frequency * T + phase)` over `terms`, last term first (the order of
/// ERFA's `eraDtdb` loops, which adds the small terms before the large ones).
fn sum_terms_reversed(terms: &[Term], t_millennia: f64) -> f64 {
    terms.iter().rev().fold(0.0, |sum, term| {
        sum + term.amplitude_s
            * (term.frequency_rad_per_millennium * t_millennia + term.phase_rad).sin()
    })
}

/// The two geocentric parts of TDB - TT, kept apart so that callers can add them in ERFA's order.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct GeocentricParts {
    /// The Fairhead & Bretagnon (1990) series proper, seconds.
    pub(crate) series_s: f64,
    /// ERFA's adjustment for JPL planetary masses (instead of IAU masses), seconds.
    pub(crate) planetary_mass_adjustment_s: f64,
}

/// Geocentric TDB - TT from the Fairhead & Bretagnon (1990) series with ERFA's adjustment for
/// JPL planetary masses, as two parts.
///
/// Given: `t_millennia`, TDB (or TT, see the module notes) in Julian millennia since J2000.0.
/// Returns: the two parts in seconds at the geocentre; NaN parts if the embedded table failed
/// to parse (a packaging error that the module's tests rule out).
///
/// The arithmetic follows ERFA's `eraDtdb` operation by operation: each power block summed
/// from its last term to its first, the blocks combined as
/// `T(T(T(T w4 + w3) + w2) + w1) + w0`, the adjustment terms added left to right.
///
/// References: Fairhead, L. & Bretagnon, P., Astron. Astrophys. 229, 240-247 (1990);
/// ERFA `eraDtdb` (dtdb.c), derived from the IAU SOFA library.
pub(crate) fn geocentric_parts_s(t_millennia: f64) -> GeocentricParts {
    let Ok(table) = table() else {
        return GeocentricParts {
            series_s: f64::NAN,
            planetary_mass_adjustment_s: f64::NAN,
        };
    };
    let series_s = table.blocks.iter().rev().fold(0.0, |horner, block| {
        horner * t_millennia + sum_terms_reversed(block, t_millennia)
    });
    let periodic_adjustment_s = table.adjustment.iter().fold(0.0, |sum, term| {
        sum + term.amplitude_s
            * (term.frequency_rad_per_millennium * t_millennia + term.phase_rad).sin()
    });
    let planetary_mass_adjustment_s =
        table
            .polynomial
            .iter()
            .fold(periodic_adjustment_s, |sum, &(power, coefficient_s)| {
                sum + (0..power).fold(coefficient_s, |product, _| product * t_millennia)
            });
    GeocentricParts {
        series_s,
        planetary_mass_adjustment_s,
    }
}

/// Geocentric TDB - TT in seconds: the sum of [`geocentric_parts_s`].
pub(crate) fn geocentric_s(t_millennia: f64) -> f64 {
    let parts = geocentric_parts_s(t_millennia);
    parts.series_s + parts.planetary_mass_adjustment_s
}
