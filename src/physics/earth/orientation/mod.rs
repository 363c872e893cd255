//! Earth orientation: the CIO-based transformation between the ITRS and the GCRS of the IERS
//! Conventions (2010) ch. 5, `[GCRS] = Q(t) R(t) W(t) [ITRS]` (eq. 5.1), with IAU 2006
//! precession, IAU 2000A nutation with the IAU 2006 adjustments, the IAU 2006 CIO locator s, the
//! Earth rotation angle and polar motion. The algorithms and their order of evaluation follow
//! ERFA (the BSD-licensed derivative of IAU SOFA), function by function; the series tables are
//! extracted from ERFA's sources by `tools/extract_iau2006_series.py` (see `data/`).
//!
//! Entry points: [`earth_orientation`] (full series, about 1365 + 66 periodic terms per call)
//! and [`earth_orientation_fast`] (X, Y, s and the equation of the origins from piecewise
//! Chebyshev fits of the full series, built on first use; agreement tested to 1e-12 rad).
//! Times are two-part Julian dates ([`JulianDate`]), TT for the celestial pole and UT1 for the
//! Earth rotation angle, as in ERFA.

pub mod arguments;
pub mod cio;
pub mod epoch;
pub mod fast;
pub mod matrix;
pub mod nutation;
pub mod pole;
pub mod pole_rate;
pub mod precession;
pub mod rotation;
mod series_data;
pub mod span;
mod value;
pub mod xy_series;

#[cfg(test)]
mod tests_erfa;
#[cfg(test)]
mod tests_erfa_matrices;
#[cfg(test)]
mod tests_fast;
#[cfg(test)]
mod tests_reference;

pub use pole::{celestial_pole_series, CelestialPole};
pub use value::{
    earth_orientation, earth_orientation_fast, CelestialPoleOffsets, EarthOrientation,
};

/// One arcsecond in radians, pi / 648000 (ERFA `ERFA_DAS2R`, 4.848136811095359935899141e-6,
/// written to the digits that fix the double).
pub const ARCSEC_TO_RAD: f64 = 4.848_136_811_095_36e-6;
/// Arcseconds in a full turn (ERFA `ERFA_TURNAS`).
pub const TURN_ARCSEC: f64 = 1_296_000.0;
/// 2 pi (ERFA `ERFA_D2PI`).
pub const TWO_PI: f64 = std::f64::consts::TAU;
/// Julian date of J2000.0 (ERFA `ERFA_DJ00`).
pub const J2000_JD: f64 = 2_451_545.0;
/// Days per Julian century (ERFA `ERFA_DJC`).
pub const DAYS_PER_JULIAN_CENTURY: f64 = 36_525.0;

/// A Julian date split in two parts, `jd1 + jd2` days, as ERFA takes its dates: any split works,
/// and precision is best with one part a whole day (e.g. 2451545.0) and the other the rest.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct JulianDate {
    pub jd1: f64,
    pub jd2: f64,
}

impl JulianDate {
    /// The date `jd1 + jd2`.
    pub fn new(jd1: f64, jd2: f64) -> Self {
        Self { jd1, jd2 }
    }

    /// The date from a count of attoseconds since J2000.0 (JD 2451545.0) of its own scale, the
    /// form of [`crate::physics::time::instant::Instant::count_attos`]: `jd1` is J2000.0 plus the
    /// whole days, `jd2` the fraction of a day in [0, 1).
    pub fn from_count_attos_since_j2000(count_attos: i128) -> Self {
        const ATTOS_PER_DAY: i128 = 86_400 * 1_000_000_000_000_000_000;
        let days = count_attos.div_euclid(ATTOS_PER_DAY);
        let rest = count_attos.rem_euclid(ATTOS_PER_DAY);
        Self {
            jd1: J2000_JD + days as f64,
            jd2: rest as f64 / ATTOS_PER_DAY as f64,
        }
    }

    /// Julian centuries since J2000.0, `((jd1 - 2451545) + jd2) / 36525`, the time argument of
    /// every series here (ERFA's expression, in this order).
    pub fn julian_centuries_since_j2000(&self) -> f64 {
        ((self.jd1 - J2000_JD) + self.jd2) / DAYS_PER_JULIAN_CENTURY
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// J2000.0 is JD 2451545.0 (IAU 1976 / IERS Conventions (2010) ch. 5): a count of -1.5 days
    /// is JD 2451543.5, split as 2451543.0 + 0.5; one attosecond after J2000.0 stays on its day.
    #[test]
    fn julian_date_from_attosecond_count() {
        let day = 86_400 * 1_000_000_000_000_000_000i128;
        let jd = JulianDate::from_count_attos_since_j2000(-3 * day / 2);
        assert_eq!((jd.jd1, jd.jd2), (2_451_543.0, 0.5));
        let jd = JulianDate::from_count_attos_since_j2000(1);
        assert_eq!(jd.jd1, J2000_JD);
        assert!(jd.jd2 > 0.0 && jd.jd2 < 1e-22);
        let century = JulianDate::new(J2000_JD, DAYS_PER_JULIAN_CENTURY);
        assert_eq!(century.julian_centuries_since_j2000(), 1.0);
    }
}
