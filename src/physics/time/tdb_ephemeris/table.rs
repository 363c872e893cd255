//! The embedded Chebyshev pieces (`data/tdb_ephemeris_de440.txt`), parsed once.

use std::sync::OnceLock;

/// The table as shipped, written by `tools/make_ephemeris_time.py`.
const TABLE_TEXT: &str = include_str!("../data/tdb_ephemeris_de440.txt");

/// Start of the first piece: TT days since J2000.0 (1959-12-30T00:00 TT, JD 2436932.5).
pub(crate) const FIRST_PIECE_START_DAYS: f64 = -14_612.5;
/// Length of a piece, days.
pub(crate) const PIECE_DAYS: f64 = 16.0;
/// Number of pieces (to 2101-01-02T00:00 TT).
pub(crate) const PIECE_COUNT: usize = 3_197;
/// Chebyshev coefficients per piece.
pub(crate) const COEFFICIENT_COUNT: usize = 18;

/// The parsed pieces: `COEFFICIENT_COUNT` coefficients (seconds) per piece, piece after piece.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct EphemerisTable {
    pub(crate) coefficients: Vec<f64>,
}

/// Why the embedded table could not be read (a build-time data error, never user input).
#[derive(Debug, Clone, PartialEq, Eq)]
pub(crate) struct TableError {
    pub(crate) line_number: usize,
    pub(crate) reason: &'static str,
}

/// Reads a header value `# <key> <value>`.
fn header_value<'a>(line: &'a str, key: &str) -> Option<&'a str> {
    line.strip_prefix('#')?
        .trim()
        .strip_prefix(key)?
        .trim()
        .into()
}

/// Parses the text: header lines start with `#` and must state the layout the constants above
/// describe; every other line is one piece.
pub(crate) fn parse(text: &str) -> Result<EphemerisTable, TableError> {
    let mut coefficients = Vec::with_capacity(PIECE_COUNT * COEFFICIENT_COUNT);
    let mut layout_seen = 0;
    for (index, line) in text.lines().enumerate() {
        let line_number = index + 1;
        let error = |reason| TableError {
            line_number,
            reason,
        };
        if line.starts_with('#') {
            let expected = [
                ("start_days_tt_since_j2000", FIRST_PIECE_START_DAYS),
                ("piece_days", PIECE_DAYS),
                ("piece_count", PIECE_COUNT as f64),
                ("coefficient_count", COEFFICIENT_COUNT as f64),
            ];
            for (key, value) in expected {
                if let Some(text) = header_value(line, key) {
                    if text.parse::<f64>().ok() != Some(value) {
                        return Err(error("header value differs from the evaluator's layout"));
                    }
                    layout_seen += 1;
                }
            }
            continue;
        }
        let before = coefficients.len();
        for field in line.split_ascii_whitespace() {
            let value: f64 = field.parse().map_err(|_| error("not a number"))?;
            if !value.is_finite() {
                return Err(error("not a finite number"));
            }
            coefficients.push(value);
        }
        if coefficients.len() - before != COEFFICIENT_COUNT {
            return Err(error("wrong number of coefficients"));
        }
    }
    if layout_seen != 4 {
        return Err(TableError {
            line_number: 0,
            reason: "layout header incomplete",
        });
    }
    if coefficients.len() != PIECE_COUNT * COEFFICIENT_COUNT {
        return Err(TableError {
            line_number: 0,
            reason: "wrong number of pieces",
        });
    }
    Ok(EphemerisTable { coefficients })
}

/// The embedded table, parsed on first use; `None` only if the shipped file were broken (the
/// tests parse it, so a build with a broken file does not pass them).
pub(crate) fn table() -> Option<&'static EphemerisTable> {
    static TABLE: OnceLock<Option<EphemerisTable>> = OnceLock::new();
    TABLE.get_or_init(|| parse(TABLE_TEXT).ok()).as_ref()
}

/// The TCB - TCL pieces at the Moon's centre (`data/tcl_ephemeris_de440.txt`, same layout,
/// argument TDB), parsed on first use; `None` only if the shipped file were broken.
pub(crate) fn tcl_table() -> Option<&'static EphemerisTable> {
    static TABLE: OnceLock<Option<EphemerisTable>> = OnceLock::new();
    TABLE.get_or_init(|| parse(TCL_TABLE_TEXT).ok()).as_ref()
}

/// The TCB - TCL table as shipped, written by `tools/make_ephemeris_time.py`.
const TCL_TABLE_TEXT: &str = include_str!("../data/tcl_ephemeris_de440.txt");

/// The parse result of the shipped TCB - TCL text (for the tests).
#[cfg(test)]
pub(crate) fn parse_shipped_tcl() -> Result<EphemerisTable, TableError> {
    parse(TCL_TABLE_TEXT)
}

/// The parse result of the shipped text (for the tests).
#[cfg(test)]
pub(crate) fn parse_shipped() -> Result<EphemerisTable, TableError> {
    parse(TABLE_TEXT)
}
