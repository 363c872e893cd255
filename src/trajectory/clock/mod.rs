//! Clock values of satellites and receivers: the clock column of SP3-c/d files (read by
//! [`crate::trajectory::sp3::read_sp3_with_clocks`]) and RINEX clock files ([`rinex`]).
//!
//! A clock value is the clock's reading minus the file's system time, in seconds, at an epoch
//! of that system time. Values marked bad or absent (SP3: 999999.999999 us or more, or an empty
//! column) are left out and counted; an SP3 clock column that cannot be read is left out with a
//! warning naming its line.

pub mod pair;
#[cfg(test)]
mod pair_tests;
pub mod rinex;
#[cfg(test)]
mod tests;

pub use super::clock_values::{ClockCollector, ClockData, ClockSeries, ClockValue};
pub use rinex::read_rinex_clock;
