//! TCL seconds along a track from its TT seconds: TCL - TT (at the Moon's centre) computed by
//! the engine at nodes at most an hour apart and interpolated between them, instead of one
//! full conversion per state.
//!
//! TCL - TT has a drift of 6.8e-10 and periodic terms of 1.65 ms (annual) and 126 us (monthly)
//! (Lu, Yang & Xie 2025), smaller ones down to periods of days; a 4-point Lagrange cubic on
//! nodes h = 900 s apart errs by about A (omega h)^4 / 50 (common practice bound of the cubic
//! remainder) on those terms: below 1e-19 s. Measured against one engine conversion per epoch
//! (`tests::tcl_axis_matches_the_engine_at_every_epoch`): 1.3e-14 s at worst with 900 s
//! nodes, 5.0e-14 s with 3600 s nodes, 1.1e-14 s with 600 s: the floor is the engine's own
//! rounding of one conversion (f64 steps on offsets of tens of seconds), and what 3600 s nodes
//! add is short-scale structure of the fitted representations the engine evaluates.

use super::super::error::TrajectoryError;
use crate::physics::time::convert::{convert, ConversionContext};
use crate::physics::time::instant::{seconds_f64_to_attos, Instant};
use crate::physics::time::scale::Scale;

/// Longest node spacing, s (see the module notes for the measured choice).
pub const NODE_STEP_S: f64 = 900.0;

/// TCL - TT relative to its value at the first epoch, as a function of TT seconds since it.
#[derive(Debug, Clone)]
pub struct TclAxis {
    step_s: f64,
    /// (TCL - TT)(node) - (TCL - TT)(first), s.
    offsets_s: Vec<f64>,
}

impl TclAxis {
    /// Nodes over TT seconds 0..=`span_s` from the TT count `first_tt_attos`; `object` names
    /// the track in errors (an epoch outside the lunar time span).
    pub fn new(
        first_tt_attos: i128,
        span_s: f64,
        context: &ConversionContext<'_>,
        object: &str,
    ) -> Result<Self, TrajectoryError> {
        let intervals = (span_s / NODE_STEP_S).ceil().max(1.0) as usize;
        let step_s = span_s / intervals as f64;
        let offset_attos = |t_s: f64| {
            let tt = first_tt_attos + seconds_f64_to_attos(t_s);
            convert(
                &Instant::from_count_attos(Scale::Tt, tt),
                Scale::Tcl,
                context,
            )
            .map(|tcl| tcl.count_attos() - tt)
            .map_err(|e| TrajectoryError::new("bad_epoch", e.to_string()).for_object(object))
        };
        let first = offset_attos(0.0)?;
        let offsets_s = (0..=intervals)
            .map(|j| offset_attos(j as f64 * step_s).map(|d| (d - first) as f64 / 1e18))
            .collect::<Result<Vec<_>, _>>()?;
        Ok(Self { step_s, offsets_s })
    }

    /// (TCL - TT) at TT second `t_s` minus its value at 0, s (4-point Lagrange on the nodes).
    pub fn offset_s(&self, t_s: f64) -> f64 {
        let n = self.offsets_s.len();
        if n < 2 || self.step_s <= 0.0 {
            return 0.0;
        }
        let x = t_s / self.step_s;
        if n < 4 {
            let i = (x.floor().max(0.0) as usize).min(n - 2);
            let s = x - i as f64;
            return self.offsets_s[i] + s * (self.offsets_s[i + 1] - self.offsets_s[i]);
        }
        let start = (x.floor() as isize - 1).clamp(0, n as isize - 4) as usize;
        let s = x - start as f64;
        let y = &self.offsets_s[start..start + 4];
        // Lagrange basis on the nodes 0, 1, 2, 3.
        let (a, b, c, d) = (s, s - 1.0, s - 2.0, s - 3.0);
        -y[0] * b * c * d / 6.0 + y[1] * a * c * d / 2.0 - y[2] * a * b * d / 2.0
            + y[3] * a * b * c / 6.0
    }

    /// TCL seconds since the first epoch at TT second `t_s`.
    pub fn tcl_s(&self, t_s: f64) -> f64 {
        t_s + self.offset_s(t_s)
    }

    /// TT seconds at TCL second `tcl_s` (fixed point: the offset changes by below 2e-9 per
    /// second, so three steps reach the rounding).
    pub fn tt_s(&self, tcl_s: f64) -> f64 {
        let mut t = tcl_s;
        for _ in 0..3 {
            t = tcl_s - self.offset_s(t);
        }
        t
    }
}
