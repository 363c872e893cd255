//! Time scales: instants with attosecond resolution, the scales and their relations, the
//! leap-second table, the TDB - TT series and the text forms of an instant.

pub mod calendar;
pub mod convert;
pub mod decimal;
pub mod error;
pub mod format_name;
pub mod formats;
pub mod instant;
pub mod leap_seconds;
pub mod lunar;
pub mod offsets;
pub mod scale;
pub mod tdb_ephemeris;
pub mod tdb_model;
pub mod tdb_series;
pub mod ut1;
