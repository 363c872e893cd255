//! The names of the instant formats (a leaf: the error kinds and the writers both use it).

use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// How an instant is written in a request.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum InstantFormat {
        /// ISO 8601 calendar or ordinal date and time.
        Iso = "iso",
        /// Modified Julian Date.
        Mjd = "mjd",
        /// Julian Date.
        Jd = "jd",
        /// Seconds since J2000.0 in the instant's scale.
        J2000S = "j2000_s",
        /// Seconds since 1970-01-01T00:00:00 UTC, 86 400 s per day (UTC only).
        UnixS = "unix_s",
        /// GNSS week and seconds of week, `WEEK:SECONDS`.
        GnssWeek = "gnss_week",
    }
}
