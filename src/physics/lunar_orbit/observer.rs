//! The selenocentric observer of TCB - TCL: an event at x relative to the Moon's centre x_M.

use super::environment::simultaneity_term_s;
use super::field::MAX_SELENOCENTRIC_DISTANCE_M;
use crate::physics::constants::MOON_MEAN_RADIUS_M;

/// Why a selenocentric observer was refused: (code, message).
pub type ObserverRefusal = (&'static str, String);

/// A place near the Moon, ICRF axes relative to the Moon's centre, m: on or above the mean
/// radius (1 737 400 m, IAU WGCCRE, Archinal et al. 2018) and within
/// [`MAX_SELENOCENTRIC_DISTANCE_M`] (60 000 km, inside the Hill sphere: the range of the LCRS
/// taken here).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SelenocentricObserver {
    position_m: [f64; 3],
}

impl SelenocentricObserver {
    /// The observer at `position_m`, or the refusal: `not_finite`, `below_surface` (below the
    /// Moon's mean radius less 10 km, which leaves the deepest basins in), `beyond_model_range`.
    pub fn new(position_m: [f64; 3]) -> Result<Self, ObserverRefusal> {
        if !position_m.iter().all(|c| c.is_finite()) {
            return Err((
                "not_finite",
                "the position must be three finite numbers in metres".into(),
            ));
        }
        let r = (position_m[0].powi(2) + position_m[1].powi(2) + position_m[2].powi(2)).sqrt();
        if r < MOON_MEAN_RADIUS_M - MAX_DEPTH_M {
            return Err((
                "below_surface",
                format!("the observer is {r:.0} m from the Moon's centre, below the lunar surface (mean radius 1 737 400 m, less 10 km for the deepest basins)"),
            ));
        }
        if r > MAX_SELENOCENTRIC_DISTANCE_M {
            return Err((
                "beyond_model_range",
                format!("the observer is {r:.4e} m from the Moon's centre, beyond 6e7 m (60 000 km, inside the Moon's Hill sphere of about 61 500 km): the range of the LCRS taken here"),
            ));
        }
        Ok(Self { position_m })
    }

    /// The position, m.
    pub fn position_m(&self) -> [f64; 3] {
        self.position_m
    }

    /// The position-dependent term v_M.(x - x_M)/c^2 of TCB - TCL, s, with `moon_velocity_m_s`
    /// the Moon's barycentric velocity (IAU 2000 Resolution B1.5 / IERS Conventions (2010)
    /// eq. 10.4 with the Moon in place of the Earth).
    pub fn tcb_minus_tcl_term_s(&self, moon_velocity_m_s: &[f64; 3]) -> f64 {
        simultaneity_term_s(moon_velocity_m_s, &self.position_m)
    }
}

/// How far below the mean radius an observer may be, m (the lunar surface spans about
/// -9 km to +11 km about the mean radius, from memory of the LRO altimetry).
pub const MAX_DEPTH_M: f64 = 10_000.0;
