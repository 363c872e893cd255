//! TT of the many epochs of one track given in TDB or TCB.
//!
//! Reading a TDB or TCB epoch into TT inverts TDB - TT, an iteration over the series or the
//! fitted ephemeris model (about 0.3 us an epoch); a day of 1-s states spent most of its
//! validation there. TT - TDB is a smooth function of time (its shortest-period terms of any
//! size last days: Fairhead & Bretagnon 1990; the annual term is 1.66 ms), so a long, dense
//! track reads it exactly at nodes every [`NODE_STEP_S`] of its own scale and interpolates
//! with a cubic (4-point Lagrange) polynomial between them. The interpolation error of a
//! term A sin(w t) is below A (w h)^4 / 24 (common practice for equally spaced Lagrange
//! interpolation): 1e-20 s for the annual term, below 1e-18 s for a 1e-8 s term of a 7-day
//! period; `tt_axis_tests.rs` measures the whole against the exact reading (the rounding noise
//! of the exact reading, below 1e-15 s, is what is left). Only the geocentric series model
//! interpolates: a topocentric observer adds a diurnal term of about 2 us (its cubic error
//! would reach 2e-13 s), and the fitted DE440 model's 32-day pieces meet with steps of up to
//! 1.4e-14 s. Short or sparse tracks, other scales, and tracks whose nodes would leave the
//! model's span read every epoch exactly.

use crate::physics::time::convert::{to_tt_attos, ConversionContext};
use crate::physics::time::error::TimeError;
use crate::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use crate::physics::time::scale::Scale;
use crate::physics::time::tdb_model::TdbModel;

/// The spacing of the exact readings, seconds of the track's scale.
pub const NODE_STEP_S: i128 = 600;

/// Tracks with fewer states read every epoch exactly.
const MIN_STATES: usize = 64;

/// TT of epochs of one scale, exactly or from nodes.
pub struct TtAxis<'a> {
    context: &'a ConversionContext<'a>,
    nodes: Option<Nodes>,
}

/// Exact TT - epoch at equally spaced epochs of one scale.
struct Nodes {
    scale: Scale,
    first_attos: i128,
    /// TT - epoch at the first node, attoseconds (exact).
    base_attos: i128,
    /// TT - epoch at each node less `base_attos` (small enough for f64 to keep attoseconds).
    offsets_attos: Vec<f64>,
}

impl<'a> TtAxis<'a> {
    /// An axis for epochs from `first` to `last` (one scale) of a track of `states` states.
    pub fn new(
        context: &'a ConversionContext<'a>,
        first: &Instant,
        last: &Instant,
        states: usize,
    ) -> Self {
        let scale = first.scale();
        let step = NODE_STEP_S * ATTOS_PER_SECOND;
        let span = last.count_attos() - first.count_attos();
        let worth_it = matches!(scale, Scale::Tdb | Scale::Tcb)
            && context.observer.is_none()
            && context.tdb_model == TdbModel::Series
            && last.scale() == scale
            && states >= MIN_STATES
            && span > 0
            && span / step + 4 <= (states / 4) as i128;
        let nodes = worth_it
            .then(|| {
                let first_attos = first.count_attos() - step;
                let count = span / step + 4;
                let exact = (0..count)
                    .map(|k| {
                        let at = first_attos + k * step;
                        to_tt_attos(&Instant::from_count_attos(scale, at), context)
                            .ok()
                            .map(|tt| tt - at)
                    })
                    .collect::<Option<Vec<i128>>>()?;
                let base_attos = exact[0];
                Some(Nodes {
                    scale,
                    first_attos,
                    base_attos,
                    offsets_attos: exact.iter().map(|o| (o - base_attos) as f64).collect(),
                })
            })
            .flatten();
        Self { context, nodes }
    }

    /// Whether the axis interpolates (false: every epoch is read exactly).
    #[cfg(test)]
    pub fn interpolates(&self) -> bool {
        self.nodes.is_some()
    }

    /// TT of `epoch`, attoseconds.
    pub fn tt_attos(&self, epoch: &Instant) -> Result<i128, TimeError> {
        match &self.nodes {
            Some(nodes) if epoch.scale() == nodes.scale => match nodes.offset_attos(epoch) {
                Some(offset) => Ok(epoch.count_attos() + offset),
                None => to_tt_attos(epoch, self.context),
            },
            _ => to_tt_attos(epoch, self.context),
        }
    }
}

impl Nodes {
    /// TT - epoch by the cubic through the four nodes around it; `None` outside the nodes.
    fn offset_attos(&self, epoch: &Instant) -> Option<i128> {
        let step = NODE_STEP_S * ATTOS_PER_SECOND;
        let since = epoch.count_attos() - self.first_attos;
        let k = since.div_euclid(step);
        let last = self.offsets_attos.len() as i128 - 3;
        if k < 1 || k > last {
            return None;
        }
        let p = (since - k * step) as f64 / step as f64;
        let o = &self.offsets_attos[(k - 1) as usize..(k + 3) as usize];
        let value = -p * (p - 1.0) * (p - 2.0) / 6.0 * o[0]
            + (p + 1.0) * (p - 1.0) * (p - 2.0) / 2.0 * o[1]
            - (p + 1.0) * p * (p - 2.0) / 2.0 * o[2]
            + (p + 1.0) * p * (p - 1.0) / 6.0 * o[3];
        Some(self.base_attos + value.round() as i128)
    }
}

#[cfg(test)]
#[path = "tt_axis_tests.rs"]
mod tests;
