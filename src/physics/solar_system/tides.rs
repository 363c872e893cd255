//! Tidal potentials of the Sun and the Moon at an Earth clock, in the GCRS.
//!
//! In the geocentric metric (IAU 2000 Resolution B1.3; IERS Conventions (2010) eq. 10.6) the
//! external bodies enter through their potential minus its value and gradient at the
//! geocentre: w_tidal(x) = sum_A GM_A [1/|x_A - x| - 1/|x_A| - x . x_A/|x_A|^3], x and x_A
//! geocentric. The positions of the Sun and the Moon relative to the Earth come from the
//! ephemeris at the TDB epoch; GM from the DE440 table ([`super::gm`]).
//!
//! Left out (sizes for a navigation MEO clock and GEO): the planets' tides (Venus at its
//! closest, GM r^2/d^3 / c^2 with d = 3.8e10 m: about 1.2e-19 at GEO; Jupiter about 1e-20), the
//! Earth's harmonics beyond J2 (C22/S22, GM/r (a_E/r)^2 2.4e-6 / c^2: about 2.5e-17 at
//! navigation MEO, 6e-18 at GEO; J3 about 6e-18 at MEO), and the 1/c^4 terms of the metric
//! (about (GM/(r c^2))^2: 3e-20 at navigation MEO). Magnitudes from the formulas given, with
//! the coefficients of IERS Conventions (2010) ch. 6 (EGM2008) from memory.

use super::gm::{GM_MOON_M3_S2, GM_SUN_M3_S2};
use super::{Body, Ephemeris, EphemerisError};
use crate::physics::gravity::tidal_potential_m2_s2;
use crate::physics::rate_error::RateError;
use crate::physics::time::instant::{seconds_f64_to_attos, ATTOS_PER_SECOND};

/// Geocentric positions of the Sun and the Moon at one instant, m, ICRF (GCRS) axes.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TidalBodies {
    /// The Sun relative to the Earth's centre, m.
    pub sun_m: [f64; 3],
    /// The Moon relative to the Earth's centre, m.
    pub moon_m: [f64; 3],
}

impl TidalBodies {
    /// The Sun and the Moon relative to the Earth at the TDB instant `tdb_attos` (attoseconds
    /// since J2000.0 TDB); an error naming the ephemeris span outside it.
    pub fn at(ephemeris: &Ephemeris, tdb_attos: i128) -> Result<Self, EphemerisError> {
        // One pass: the Moon's segment serves both the Moon and the Earth.
        let [sun, moon] = ephemeris.states_m(
            [(Body::Sun, Body::Earth), (Body::Moon, Body::Earth)],
            tdb_attos,
        )?;
        Ok(Self {
            sun_m: sun.position_m,
            moon_m: moon.position_m,
        })
    }
}

/// Tidal potential of the Sun and the Moon at the geocentric position `position_m` (GCRS, m),
/// m^2/s^2 (positive where it slows a clock, as U in the IERS sign convention).
///
/// w_tidal = sum_{A = Sun, Moon} GM_A [1/|x_A - x| - 1/|x_A| - x . x_A/|x_A|^3].
///
/// Reference: IAU 2000 Resolution B1.3 (the external potential of the geocentric metric,
/// expanded about the geocentre without its monopole and dipole terms); IERS Conventions
/// (2010) ch. 10, eq. 10.6 context. GM of the Sun and the Moon from DE440 (Park et al. 2021).
pub fn sun_moon_tidal_potential_m2_s2(
    bodies: &TidalBodies,
    position_m: [f64; 3],
) -> Result<f64, RateError> {
    Ok(
        tidal_potential_m2_s2(GM_SUN_M3_S2, bodies.sun_m, position_m)?
            + tidal_potential_m2_s2(GM_MOON_M3_S2, bodies.moon_m, position_m)?,
    )
}

/// One interpolation node: positions (m) and velocities (m/s) of the Sun and the Moon.
#[derive(Debug, Clone, Copy)]
struct Node {
    sun: ([f64; 3], [f64; 3]),
    moon: ([f64; 3], [f64; 3]),
}

/// The Sun and the Moon over a time span, from ephemeris states at nodes [`Self::NODE_STEP_S`]
/// apart (wider for spans above [`Self::MAX_INTERVALS`] hours, see below), interpolated by
/// cubic Hermite polynomials on position and velocity.
///
/// The time argument of the nodes is TDB seconds since J2000.0 ([`Self::new`]) or any other
/// time in seconds whose TDB the caller gives at each node ([`Self::over_argument`], e.g. TT
/// seconds since a track's first epoch); [`Self::bodies_at`] takes that same argument.
///
/// Interpolation error: for a cubic Hermite the position error is at most h^4/384 max|x''''|;
/// for the Moon x'''' is about n^4 |x| with the angular rate n near perigee (2.66e-6 /s mean,
/// up to 1.12 times that): (3.3e-6 /s)^4 3.6e8 m = 4e-14 m/s^4, so with h = 3600 s below
/// 0.02 m (measured: 0.014 m over two days); for the Sun 1e-4 m. A 0.02 m error in the Moon's
/// position changes the tidal potential at GEO by below 3 GM_Moon r/d^3 * 0.02 m = 2e-7
/// m^2/s^2, 2e-24 of rate (measured: 5e-24 at most, the unit tests check below 1e-23). With a
/// TT argument the node velocities (per second of TDB) stand for rates per second of TT: they
/// differ by d(TDB - TT)/dTT, below 3.5e-10 (the 1.66 ms annual term), which moves the
/// interpolated Moon by below 1 km/s * 3.5e-10 * 3600 s = 1.3e-3 m.
///
/// Memory: a node holds 12 numbers (96 B); at most [`Self::MAX_INTERVALS`] + 2 nodes (9.6 MB),
/// so spans above 100 000 h (11.4 years) space their nodes more widely. The error grows as
/// h^4: at the longest span the embedded ephemeris allows (143 years, h = 12.5 h) the Moon errs
/// by about (12.5)^4 * 0.014 m = 340 m, which moves the tide at GEO by 3 GM_Moon r/d^3 * 340 m
/// = 4.5e-3 m^2/s^2, 5e-20 of rate (from the formulas; the unit tests measure a 20-year span).
#[derive(Debug, Clone)]
pub struct TidalTrack {
    first_s: f64,
    step_s: f64,
    nodes: Vec<Node>,
}

impl TidalTrack {
    /// Spacing of the nodes, s (up to [`Self::MAX_INTERVALS`] intervals).
    pub const NODE_STEP_S: f64 = 3600.0;
    /// Most intervals between nodes; longer spans widen the spacing to span / MAX_INTERVALS.
    pub const MAX_INTERVALS: usize = 100_000;

    /// Nodes covering `first_tdb_s ..= last_tdb_s` (TDB seconds since J2000.0); an error naming
    /// the ephemeris span when a node falls outside it.
    pub fn new(
        ephemeris: &Ephemeris,
        first_tdb_s: f64,
        last_tdb_s: f64,
    ) -> Result<Self, EphemerisError> {
        Self::over_argument(ephemeris, first_tdb_s, last_tdb_s, |tdb_s| {
            Ok(seconds_f64_to_attos(tdb_s))
        })
    }

    /// Nodes at the time arguments `first_s + k h` covering `first_s ..= last_s`, h =
    /// [`Self::NODE_STEP_S`] (or span / [`Self::MAX_INTERVALS`] if that is wider),
    /// node k read from the ephemeris at the TDB instant `tdb_attos_at(argument)` (attoseconds
    /// since J2000.0 TDB); the first error of `tdb_attos_at` or of the ephemeris (naming its
    /// span) is returned.
    pub fn over_argument<E, F>(
        ephemeris: &Ephemeris,
        first_s: f64,
        last_s: f64,
        mut tdb_attos_at: F,
    ) -> Result<Self, E>
    where
        E: From<EphemerisError>,
        F: FnMut(f64) -> Result<i128, E>,
    {
        if !first_s.is_finite() || !last_s.is_finite() || last_s < first_s {
            return Err(EphemerisError::NotFinite.into());
        }
        let span_s = last_s - first_s;
        let step_s = Self::NODE_STEP_S.max(span_s / Self::MAX_INTERVALS as f64);
        // ceil may give MAX_INTERVALS + 1 where span / step rounds up: one node more, never a
        // last epoch left uncovered.
        let count = (span_s / step_s).ceil() as usize + 1;
        let mut nodes = Vec::with_capacity(count);
        for i in 0..count {
            let attos = tdb_attos_at(first_s + i as f64 * step_s)?;
            let [sun, moon] =
                ephemeris.states_m([(Body::Sun, Body::Earth), (Body::Moon, Body::Earth)], attos)?;
            nodes.push(Node {
                sun: (sun.position_m, sun.velocity_m_s),
                moon: (moon.position_m, moon.velocity_m_s),
            });
        }
        Ok(Self {
            first_s,
            step_s,
            nodes,
        })
    }

    /// The Sun and the Moon at the time argument `tdb_s` (TDB seconds since J2000.0 for
    /// [`Self::new`], the caller's argument for [`Self::over_argument`]); `None` outside the
    /// nodes.
    pub fn bodies_at(&self, tdb_s: f64) -> Option<TidalBodies> {
        let x = (tdb_s - self.first_s) / self.step_s;
        if x.is_nan() || x < 0.0 || x > (self.nodes.len() - 1) as f64 {
            return None;
        }
        let i = (x.floor() as usize).min(self.nodes.len().saturating_sub(2));
        if self.nodes.len() < 2 {
            let node = self.nodes.first()?;
            return Some(TidalBodies {
                sun_m: node.sun.0,
                moon_m: node.moon.0,
            });
        }
        let s = x - i as f64;
        let (a, b) = (&self.nodes[i], &self.nodes[i + 1]);
        Some(TidalBodies {
            sun_m: hermite(a.sun, b.sun, s, self.step_s),
            moon_m: hermite(a.moon, b.moon, s, self.step_s),
        })
    }

    /// [`Self::bodies_at`] at a TDB instant in attoseconds since J2000.0.
    pub fn bodies_at_attos(&self, tdb_attos: i128) -> Option<TidalBodies> {
        self.bodies_at(tdb_attos as f64 / ATTOS_PER_SECOND as f64)
    }
}

/// Cubic Hermite interpolation of a position between two nodes `h_s` apart at the fraction
/// `s` in [0, 1], from positions and velocities (the standard Hermite basis h00, h10, h01, h11).
fn hermite(a: ([f64; 3], [f64; 3]), b: ([f64; 3], [f64; 3]), s: f64, h_s: f64) -> [f64; 3] {
    let s2 = s * s;
    let s3 = s2 * s;
    let h00 = 2.0 * s3 - 3.0 * s2 + 1.0;
    let h10 = (s3 - 2.0 * s2 + s) * h_s;
    let h01 = -2.0 * s3 + 3.0 * s2;
    let h11 = (s3 - s2) * h_s;
    let mut out = [0.0; 3];
    for (k, value) in out.iter_mut().enumerate() {
        *value = h00 * a.0[k] + h10 * a.1[k] + h01 * b.0[k] + h11 * b.1[k];
    }
    out
}

#[cfg(test)]
#[path = "tides_tests.rs"]
mod tests;
