//! Earth orientation parameters (EOP): UT1 - UTC, polar motion x_p, y_p, the celestial pole
//! offsets dX, dY and the excess length of day, from the IERS daily series.
//!
//! - Readers (pure functions of the text, never panicking): IERS Bulletin A `finals2000A`
//!   ([`parse_finals2000a`]), IERS EOP 20 C04 and 14 C04 ([`parse_c04`]), either one recognized
//!   from its text ([`parse_any`]), and the built-in snapshot format ([`parse_snapshot`]).
//!   Errors name the 1-based line and carry a stable code ([`EopErrorCode`]).
//! - The table ([`EopTable`]): one [`EopDay`] per day, its source, last observed day and end of
//!   predictions; [`EopTable::builtin`] is the snapshot built into the binary (astropy-iers-data
//!   0.2026.11.2.0.34.55: IERS EOP 20 C04 1962-01-01 .. 2026-09-29, then IERS Bulletin A
//!   observed to 2026-10-22 and predicted to 2027-10-29).
//! - Lookup ([`EopTable::at_utc`]): 4-point Lagrange interpolation as the IERS recommends,
//!   UT1 through UT1 - TAI so that leap seconds do not disturb it; no sub-daily tidal terms
//!   (see the `interp` module for their size). Outside the table the lookup fails with
//!   [`EopLookupError::BeforeTable`] / [`EopLookupError::AfterTable`]; on predicted days the
//!   answer says so ([`EopStatus::Predicted`]) with the likely error the source states
//!   (Bulletin A's error columns, which grow with the days ahead: 2026-10-23, one day after the
//!   last observation, 0.6 mas in x_p and 0.03 ms in UT1; 2027-10-29, one year ahead, 17.5 mas
//!   and 25 ms, in the shipped file).
//! - The time engine's UT1: the table implements `time::ut1::Ut1Source` (UT1 - UTC with its
//!   status and likely error), so a `ConversionContext` with the table converts to and from UT1.

mod c04;
mod error;
mod fields;
mod finals;
mod interp;
mod snapshot;
mod table;
mod ut1;

#[cfg(test)]
mod tests_interp;
#[cfg(test)]
mod tests_readers;
#[cfg(test)]
mod tests_reference;
#[cfg(test)]
mod tests_ut1;

pub use c04::parse_c04;
pub use error::{EopErrorCode, EopFileError, EopLookupError, EopLookupErrorKind};
pub use finals::parse_finals2000a;
pub use interp::{lagrange_weights, EopValues};
pub use snapshot::parse_snapshot;
pub use table::{EopDay, EopSigma, EopStatus, EopTable};

impl EopTable {
    /// The table built into the binary (see the `snapshot` module for its source).
    pub fn builtin() -> &'static EopTable {
        snapshot::builtin()
    }

    /// The built-in table as an owned value, parsed anew and not kept for the process (for an
    /// owner that may replace it, such as the service: no second copy stays behind).
    pub fn builtin_owned() -> EopTable {
        snapshot::parse_builtin()
    }
}

/// Reads any supported format, recognized from the text: the snapshot (`eop-snapshot` line),
/// C04 (`#` header lines or a first data line starting with a four-digit year, or a free-text
/// header), otherwise `finals2000A` (a first line with a two-digit year and the MJD in columns
/// 8-15).
pub fn parse_any(text: &str) -> Result<EopTable, EopFileError> {
    let first = text
        .lines()
        .map(str::trim_end)
        .find(|l| !l.trim().is_empty() && !l.trim_start().starts_with('#'));
    match first {
        Some(l) if l.trim_start().starts_with("eop-snapshot") => parse_snapshot(text),
        Some(l) if looks_like_finals(l) => parse_finals2000a(text),
        Some(_) => parse_c04(text),
        None => Err(EopFileError::new(
            text.lines().count(),
            EopErrorCode::NoData,
            "IERS EOP data lines",
            "none",
        )),
    }
}

/// A `finals2000A` line: a decimal point in column 13 (MJD F8.2 in columns 8-15) and a blank
/// column 7.
fn looks_like_finals(line: &str) -> bool {
    let b = line.as_bytes();
    b.len() >= 15 && b[6] == b' ' && b[12] == b'.'
}
