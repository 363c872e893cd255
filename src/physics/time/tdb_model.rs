//! Which model of TDB - TT a conversion uses.

use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// The model of the geocentric part of TDB - TT (the topocentric part of Moyer (1981) /
    /// Murray (1983) is added to either).
    #[derive(Debug, Clone, Copy, PartialEq, Eq, Default)]
    pub enum TdbModel {
        /// The Fairhead & Bretagnon (1990) series as ERFA `eraDtdb` evaluates it (good to about
        /// +/- 3 ns over 1950-2050 against numerical time ephemerides; any epoch). The default.
        #[default]
        Series = "series",
        /// The time-dilation integral of IERS Conventions (2010) eq. 10.4-10.5 from JPL DE440,
        /// fitted (`tdb_ephemeris`): 1959-12-30 to 2101-01-02 TT only.
        Ephemeris = "ephemeris",
    }
}
