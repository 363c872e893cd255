//! Earth orientation along a time span, for trajectories given in the ITRS: positions and
//! velocities go into the GCRS with the full transformation of IERS Conventions (2010) ch. 5,
//! `[GCRS] = Q(t) R(t) W(t) [ITRS]` (eq. 5.1), at every epoch asked for.
//!
//! Method: at nodes spaced at most [`NODE_STEP_S`] apart (at most [`MAX_INTERVALS`] intervals
//! over the span, so the step grows for spans above 69 days) the span evaluates, with the Earth
//! orientation parameters at that node, `Q` (from X, Y, s of the fast path
//! [`super::fast::celestial_pole_fast`], plus dX, dY), `W` (x_p, y_p, s'), UT1 - TT and the
//! Earth rotation angle. Between nodes `Q`, `W` and UT1 - TT are interpolated linearly and the
//! Earth rotation angle follows exactly from UT1 (eq. 5.15 is linear in UT1; its sine and
//! cosine from the node's by angle addition, [`turn_sin_cos`]). The linear
//! interpolation of `Q` errs by at most A (w h)^2 / 8 for a nutation term of amplitude A and
//! frequency w: for the 13.66-day term (A about 1.1e-6 rad in X, Y) and h = 300 s that is
//! 3.5e-13 rad (2 um at 7000 km); polar motion and precession are smoother still.
//!
//! Velocities are the time derivative of eq. 5.1 with every factor's rate:
//! `v_gcrs = Q R W v_itrs + Q R (dW/dt) r + Q (dR/dt) W r + (dQ/dt) R W r`, where
//! `dR/dt r = dERA/dt (e_z x R r)` with dERA/dt = 2 pi 1.00273781191135448 / 86400 s x
//! (1 + d(UT1 - TT)/dt) (the length-of-day variation from the interpolated UT1), and dQ/dt,
//! dW/dt the slopes of the interpolation. The precession-nutation rate (up to about 1.5e-11
//! rad/s) matters: left out, it biases the clock rate of an orbit by Omega . (r x v) / c^2,
//! about 1e-17 (1 ps a day) for a navigation orbit.

use super::cio::{celestial_to_intermediate_matrix, polar_motion_matrix, tio_locator_sprime_rad};
use super::fast::celestial_pole_fast;
use super::matrix::{apply, transpose, Matrix3};
use super::rotation::{earth_rotation_angle_rad, EARTH_ROTATION_RATE_RAD_S};
use super::JulianDate;
use crate::physics::time::instant::seconds_f64_to_attos;

/// Longest spacing of the nodes, seconds.
pub const NODE_STEP_S: f64 = 300.0;
/// Most intervals of one span (20 000 x 300 s = 69.4 days; longer spans space their nodes
/// more widely: one year, 1 578 s and 1e-11 rad, 0.07 mm at 7000 km). A node holds 37 numbers
/// (296 B), so a span holds at most 5.9 MB.
pub const MAX_INTERVALS: usize = 20_000;

/// The Earth orientation parameters one node needs, at a TT epoch.
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub struct EopAtEpoch {
    /// UT1 - TT, seconds (continuous across leap seconds, unlike UT1 - UTC).
    pub ut1_minus_tt_s: f64,
    /// Pole coordinates x_p, y_p, radians.
    pub xp_rad: f64,
    pub yp_rad: f64,
    /// Celestial pole offsets dX, dY, radians (zero when the table gives none).
    pub dx_rad: f64,
    pub dy_rad: f64,
}

#[derive(Debug, Clone, Copy)]
struct Node {
    /// CIRS -> GCRS, `Q` of eq. 5.1, and its rate to the next node (per second).
    q: Matrix3,
    q_rate: Matrix3,
    /// ITRS -> TIRS, `W` of eq. 5.1, and its rate to the next node.
    w: Matrix3,
    w_rate: Matrix3,
    ut1_minus_tt_s: f64,
    /// d(ERA)/dt to the next node, rad per TT second.
    era_rate: f64,
    era_rad: f64,
    /// sin and cos of `era_rad`, for [`turn_sin_cos`].
    era_sin: f64,
    era_cos: f64,
}

/// The orientation over one span of TT, `t_s` seconds from its start.
#[derive(Debug, Clone)]
pub struct OrientationSpan {
    step_s: f64,
    nodes: Vec<Node>,
}

fn node(tt_attos: i128, eop: &EopAtEpoch) -> Node {
    let tt = JulianDate::from_count_attos_since_j2000(tt_attos);
    let ut1 = JulianDate::from_count_attos_since_j2000(
        tt_attos + seconds_f64_to_attos(eop.ut1_minus_tt_s),
    );
    let pole = celestial_pole_fast(tt);
    let c2i = celestial_to_intermediate_matrix(
        pole.x_rad + eop.dx_rad,
        pole.y_rad + eop.dy_rad,
        pole.s_rad,
    );
    let sprime = tio_locator_sprime_rad(tt.julian_centuries_since_j2000());
    let era_rad = earth_rotation_angle_rad(ut1);
    let (era_sin, era_cos) = era_rad.sin_cos();
    Node {
        q: transpose(&c2i),
        q_rate: [[0.0; 3]; 3],
        w: transpose(&polar_motion_matrix(eop.xp_rad, eop.yp_rad, sprime)),
        w_rate: [[0.0; 3]; 3],
        ut1_minus_tt_s: eop.ut1_minus_tt_s,
        era_rate: EARTH_ROTATION_RATE_RAD_S,
        era_rad,
        era_sin,
        era_cos,
    }
}

/// Largest angle step |delta| for which [`turn_sin_cos`] uses its series (the Earth turns by
/// 0.022 rad in one 300 s node step): the first omitted terms, delta^9/9! and delta^10/10!, are
/// below 1e-20 there.
const SERIES_STEP_MAX_RAD: f64 = 0.025;

/// sin and cos of `angle + delta` from sin and cos of `angle` (the angle-addition formulas) and
/// the Taylor series of sin(delta) to delta^7 and cos(delta) to delta^8 (Abramowitz & Stegun
/// 4.3.16, 4.3.17, 4.3.65, 4.3.66): one libm call less per quadrature node. Beyond
/// [`SERIES_STEP_MAX_RAD`] (spans of more than 69 days, or times outside the span) it calls
/// `sin_cos` of the sum.
fn turn_sin_cos(angle_rad: f64, sin: f64, cos: f64, delta_rad: f64) -> (f64, f64) {
    if delta_rad.abs() > SERIES_STEP_MAX_RAD {
        return (angle_rad + delta_rad).sin_cos();
    }
    let d2 = delta_rad * delta_rad;
    let sin_delta = delta_rad * (1.0 - d2 / 6.0 * (1.0 - d2 / 20.0 * (1.0 - d2 / 42.0)));
    let cos_delta = 1.0 - d2 / 2.0 * (1.0 - d2 / 12.0 * (1.0 - d2 / 30.0 * (1.0 - d2 / 56.0)));
    (
        sin * cos_delta + cos * sin_delta,
        cos * cos_delta - sin * sin_delta,
    )
}

/// `a + t rate`, elementwise (written out: see [`super::matrix::apply`]).
fn advance(a: &Matrix3, rate: &Matrix3, t_s: f64) -> Matrix3 {
    let row = |i: usize| {
        [
            a[i][0] + t_s * rate[i][0],
            a[i][1] + t_s * rate[i][1],
            a[i][2] + t_s * rate[i][2],
        ]
    };
    [row(0), row(1), row(2)]
}

fn slope_matrix(a: &Matrix3, b: &Matrix3, per_s: f64) -> Matrix3 {
    [0, 1, 2].map(|i| [0, 1, 2].map(|j| (b[i][j] - a[i][j]) * per_s))
}

fn add(a: [f64; 3], b: [f64; 3]) -> [f64; 3] {
    [a[0] + b[0], a[1] + b[1], a[2] + b[2]]
}

impl OrientationSpan {
    /// The span from TT `start_tt_attos` (attoseconds since J2000.0 TT) over `span_s` seconds;
    /// `eop(tt_attos)` gives the parameters at a node (its first error is returned).
    pub fn new<E>(
        start_tt_attos: i128,
        span_s: f64,
        mut eop: impl FnMut(i128) -> Result<EopAtEpoch, E>,
    ) -> Result<Self, E> {
        let span_s = if span_s.is_finite() && span_s > 0.0 {
            span_s
        } else {
            NODE_STEP_S
        };
        let intervals = ((span_s / NODE_STEP_S).ceil() as usize).clamp(1, MAX_INTERVALS);
        let step_s = span_s / intervals as f64;
        let mut nodes = (0..=intervals)
            .map(|k| {
                let tt_attos = start_tt_attos + seconds_f64_to_attos(k as f64 * step_s);
                eop(tt_attos).map(|values| node(tt_attos, &values))
            })
            .collect::<Result<Vec<_>, E>>()?;
        let per_s = 1.0 / step_s;
        for k in 0..intervals {
            let next = nodes[k + 1];
            let node = &mut nodes[k];
            node.q_rate = slope_matrix(&node.q, &next.q, per_s);
            node.w_rate = slope_matrix(&node.w, &next.w, per_s);
            node.era_rate = EARTH_ROTATION_RATE_RAD_S
                * (1.0 + (next.ut1_minus_tt_s - node.ut1_minus_tt_s) * per_s);
        }
        Ok(Self { step_s, nodes })
    }

    /// Spacing of the nodes, seconds.
    pub fn step_s(&self) -> f64 {
        self.step_s
    }

    /// ITRS position (m) and velocity (m/s) at `t_s` seconds after the span's start -> GCRS
    /// position and velocity (IERS Conventions (2010) eq. 5.1 and its time derivative, as the
    /// module documentation says). Outside the span the end intervals are extended.
    pub fn itrs_to_gcrs(
        &self,
        t_s: f64,
        r_itrs_m: &[f64; 3],
        v_itrs_m_s: &[f64; 3],
    ) -> ([f64; 3], [f64; 3]) {
        let node = self.node_before(t_s);
        let local_s = t_s - node.0 as f64 * self.step_s;
        let a = node.1;
        let era_rate = a.era_rate;
        let (sin, cos) = turn_sin_cos(a.era_rad, a.era_sin, a.era_cos, era_rate * local_s);
        let (w, w_rate) = (advance(&a.w, &a.w_rate, local_s), &a.w_rate);
        let (q, q_rate) = (advance(&a.q, &a.q_rate, local_s), &a.q_rate);
        // ITRS -> TIRS
        let r_t = apply(&w, r_itrs_m);
        let v_t = add(apply(&w, v_itrs_m_s), apply(w_rate, r_itrs_m));
        // TIRS -> CIRS: R3(-ERA), turning at era_rate about the CIP
        let turn = |v: [f64; 3]| [cos * v[0] - sin * v[1], sin * v[0] + cos * v[1], v[2]];
        let r_c = turn(r_t);
        let v_c = add(turn(v_t), [-era_rate * r_c[1], era_rate * r_c[0], 0.0]);
        // CIRS -> GCRS
        let r_g = apply(&q, &r_c);
        let v_g = add(apply(&q, &v_c), apply(q_rate, &r_c));
        (r_g, v_g)
    }

    /// The CIP as a unit vector of the GCRS at `t_s` (the third column of the interpolated
    /// `Q`, normalized): the figure axis the zonal fields are taken about.
    pub fn pole_gcrs(&self, t_s: f64) -> [f64; 3] {
        let (k, a) = self.node_before(t_s);
        let q = advance(&a.q, &a.q_rate, t_s - k as f64 * self.step_s);
        let axis = [q[0][2], q[1][2], q[2][2]];
        let norm = (axis[0] * axis[0] + axis[1] * axis[1] + axis[2] * axis[2]).sqrt();
        axis.map(|c| c / norm)
    }

    /// The node that starts the interval holding `t_s` (the first or the last interval outside
    /// the span), with its index.
    fn node_before(&self, t_s: f64) -> (usize, &Node) {
        let last = self.nodes.len().saturating_sub(2);
        let position = t_s / self.step_s;
        let k = if position > 0.0 {
            (position as usize).min(last)
        } else {
            0
        };
        (k, &self.nodes[k])
    }
}

#[cfg(test)]
#[path = "tests_span.rs"]
mod tests;
