//! The time scales the engine knows and what realizes each.

use std::fmt;
use std::str::FromStr;

use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// A time scale, by its standard abbreviation.
    #[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, PartialOrd, Ord)]
    pub enum Scale {
        /// Coordinated Universal Time (ITU-R TF.460-6): TAI minus the leap-second table.
        Utc = "UTC",
        /// International Atomic Time (BIPM).
        Tai = "TAI",
        /// Terrestrial Time (IAU 1991 A4, IAU 2000 B1.9): TAI + 32.184 s.
        Tt = "TT",
        /// Geocentric Coordinate Time (IAU 1991 A4, IAU 2000 B1.9).
        Tcg = "TCG",
        /// Barycentric Coordinate Time (IAU 1991 A4, IAU 2006 B3).
        Tcb = "TCB",
        /// Barycentric Dynamical Time (IAU 2006 B3).
        Tdb = "TDB",
        /// GPS Time (IS-GPS-200): TAI - 19 s.
        Gpst = "GPST",
        /// Galileo System Time (Galileo OS SIS ICD): TAI - 19 s.
        Gst = "GST",
        /// BeiDou Time (BeiDou OS ICD): TAI - 33 s.
        Bdt = "BDT",
        /// QZSS Time (IS-QZSS): TAI - 19 s.
        Qzsst = "QZSST",
        /// Universal Time UT1 (IERS Conventions (2010) ch. 5.4.2): the Earth's rotation angle
        /// as a time; UTC + (UT1 - UTC) from the Earth orientation table.
        Ut1 = "UT1",
        /// Lunar Coordinate Time (IAU 2024 Resolution II): the coordinate time of the LCRS.
        Tcl = "TCL",
        /// Lunar surface time TL (Turyshev et al., arXiv:2406.16147): a proposal, TCL scaled
        /// by L_L.
        Tl = "TL",
    }
}

impl Scale {
    /// True for the GNSS system times (they have a week numbering).
    pub fn is_gnss(self) -> bool {
        matches!(self, Scale::Gpst | Scale::Gst | Scale::Bdt | Scale::Qzsst)
    }

    /// True for UT1, the one scale that needs the Earth orientation table (UT1 - UTC is
    /// measured, not defined): it exists only where the table covers the epoch.
    pub fn needs_earth_orientation(self) -> bool {
        matches!(self, Scale::Ut1)
    }

    /// The scales that need no Earth orientation table (every scale but UT1), in vocabulary
    /// order: what `all` targets mean, so that an answer for any epoch needs no lookup.
    pub fn without_earth_orientation() -> impl Iterator<Item = Scale> {
        Scale::ALL
            .into_iter()
            .filter(|scale| !scale.needs_earth_orientation())
    }

    /// True for the lunar scales TCL and TL: they exist only inside the span of the fitted
    /// TCB - TCL (1959-12-30 to 2101-01-02 TDB).
    pub fn is_lunar(self) -> bool {
        matches!(self, Scale::Tcl | Scale::Tl)
    }

    /// The scales that exist at any epoch without a table (every scale but UT1, TCL and TL),
    /// in vocabulary order: what the `all` target means.
    pub fn any_epoch() -> impl Iterator<Item = Scale> {
        Scale::without_earth_orientation().filter(|scale| !scale.is_lunar())
    }

    /// The full name.
    pub fn full_name(self) -> &'static str {
        match self {
            Scale::Utc => "Coordinated Universal Time",
            Scale::Tai => "International Atomic Time",
            Scale::Tt => "Terrestrial Time",
            Scale::Tcg => "Geocentric Coordinate Time",
            Scale::Tcb => "Barycentric Coordinate Time",
            Scale::Tdb => "Barycentric Dynamical Time",
            Scale::Gpst => "GPS Time",
            Scale::Gst => "Galileo System Time",
            Scale::Bdt => "BeiDou Time",
            Scale::Qzsst => "QZSS Time",
            Scale::Ut1 => "Universal Time UT1",
            Scale::Tcl => "Lunar Coordinate Time",
            Scale::Tl => "Lunar surface time TL (a proposal, not a standard)",
        }
    }

    /// What realizes the scale in practice.
    pub fn realized_by(self) -> &'static str {
        match self {
            Scale::Utc => "TAI steered by leap seconds announced in IERS Bulletin C; local realizations UTC(k) by national laboratories",
            Scale::Tai => "BIPM, from the weighted clock ensemble of the timing laboratories (published monthly in Circular T)",
            Scale::Tt => "TAI + 32.184 s; TT(BIPM) is a post-processed realization",
            Scale::Tcg => "computed from TT by the defining rate L_G",
            Scale::Tcb => "computed from TDB by the defining rate L_B and offset TDB0",
            Scale::Tdb => "computed from TT by a time ephemeris (here the Fairhead & Bretagnon 1990 series)",
            Scale::Gpst => "the GPS control segment's composite clock, steered to UTC(USNO) modulo leap seconds",
            Scale::Gst => "the Galileo ground segment's precise timing facility, steered to TAI modulo 19 s",
            Scale::Bdt => "the BeiDou ground segment's master clock, steered to UTC(NTSC) modulo leap seconds",
            Scale::Qzsst => "the QZSS ground segment, steered to GPS Time",
            Scale::Tcl => "computed from TCB by the time-dilation integral at the Moon's centre, here from JPL DE440 (fitted 1959-12-30 to 2101-01-02 TDB)",
            Scale::Tl => "computed from TCL by the constant L_L; a proposal (Turyshev, Williams, Boggs & Park, arXiv:2406.16147), not a standard: no agency realizes it yet",
            Scale::Ut1 => "the Earth's rotation, measured by VLBI and published by the IERS as UT1 - UTC (EOP 20 C04, Bulletin A observations and predictions): the EOP table in force",
        }
    }

    /// How the scale relates to its neighbour in the chain.
    pub fn relation(self) -> &'static str {
        match self {
            Scale::Utc => "UTC = TAI - (TAI - UTC), from the leap-second table; drift formulas 1961-1971; defined here from 1960-01-01",
            Scale::Tai => "TAI = TT - 32.184 s",
            Scale::Tt => "TT = TAI + 32.184 s (IAU 1991 A4)",
            Scale::Tcg => "TCG - TT = L_G / (1 - L_G) * (JD_TT - T0) * 86400 s, L_G = 6.969290134e-10 (IAU 2000 B1.9)",
            Scale::Tcb => "TCB - TDB = (L_B * (JD_TDB - T0) * 86400 s - TDB0) / (1 - L_B), L_B = 1.550519768e-8, TDB0 = -6.55e-5 s (IAU 2006 B3)",
            Scale::Tdb => "TDB - TT = periodic series of about 1.66 ms amplitude (Fairhead & Bretagnon 1990), plus a topocentric part when an observer is given",
            Scale::Gpst => "GPST = TAI - 19 s; weeks from 1980-01-06T00:00:00 GPST (IS-GPS-200)",
            Scale::Gst => "GST = TAI - 19 s; weeks from 1999-08-22T00:00:00 GST (Galileo OS SIS ICD)",
            Scale::Bdt => "BDT = TAI - 33 s; weeks from 2006-01-01T00:00:00 BDT (BeiDou OS ICD)",
            Scale::Qzsst => "QZSST = TAI - 19 s; GPS week numbering (IS-QZSS)",
            Scale::Tcl => "TCB - TCL = c^-2 [integral (v_M^2/2 + w_ext(x_M)) dTCB] + c^-4 terms at the Moon's centre (IAU 2000 B1.5 / IERS Conventions (2010) eq. 10.4-10.5 with the Moon for the Earth; IAU 2024 Resolution II), TCL = TCB at 1977-01-01T00:00:32.184 TCB; mean dTCL/dTCB = 1 - 1.4825e-8",
            Scale::Tl => "TL - TCL = -L_L * (TCL - T0), T0 = 1977-01-01T00:00:32.184 TCL, L_L = 3.1398e-11 = GM_M / (c^2 R_M) + (omega_M R_M)^2 / (2 c^2) with GM_M of DE440, R_M = 1737.4 km (definition of Turyshev et al., arXiv:2406.16147 v5; a proposal)",
            Scale::Ut1 => "UT1 = UTC + (UT1 - UTC), UT1 - UTC interpolated from the EOP table at the UTC epoch (4-point Lagrange through UT1 - TAI); readings count 86 400 s per day from J2000.0 of UT1; only inside the table (1962 to the end of its predictions)",
        }
    }
}

/// An unknown scale name.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct UnknownScale(pub String);

impl fmt::Display for UnknownScale {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        write!(
            f,
            "unknown time scale {:?}; expected one of {}",
            self.0,
            Scale::NAMES.join(", ")
        )
    }
}

impl std::error::Error for UnknownScale {}

impl FromStr for Scale {
    type Err = UnknownScale;

    /// Reads a scale name, ignoring ASCII case.
    fn from_str(text: &str) -> Result<Self, Self::Err> {
        Scale::ALL
            .into_iter()
            .find(|scale| scale.as_str().eq_ignore_ascii_case(text))
            .ok_or_else(|| UnknownScale(text.to_string()))
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn names_round_trip() {
        for scale in Scale::ALL {
            assert_eq!(scale.as_str().parse::<Scale>(), Ok(scale));
            assert_eq!(scale.as_str().to_lowercase().parse::<Scale>(), Ok(scale));
        }
        assert!("GMT".parse::<Scale>().is_err());
        assert!("".parse::<Scale>().is_err());
    }
}
