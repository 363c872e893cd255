//! The Earth and the Sun about the Moon over a span, their tidal potential at a selenocentric
//! clock, and the Moon's barycentric velocity for the coordinate-simultaneity term.

use super::field::LunarAxes;
use crate::physics::constants::SPEED_OF_LIGHT_SQUARED_M2_S2;
use crate::physics::solar_system::gm::{GM_EARTH_DE440_M3_S2, GM_SUN_M3_S2};
use crate::physics::solar_system::{Body, Ephemeris, EphemerisError};
use crate::physics::time::instant::seconds_f64_to_attos;

/// What a lunar-orbit clock's rate needs at one instant (ICRF axes).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LunarSurroundings {
    /// The Earth relative to the Moon's centre, m.
    pub earth_m: [f64; 3],
    /// The Sun relative to the Moon's centre, m.
    pub sun_m: [f64; 3],
    /// The Moon's velocity relative to the solar-system barycentre, m/s.
    pub moon_velocity_m_s: [f64; 3],
    /// The Moon's body-fixed axes.
    pub axes: LunarAxes,
}

/// One node: selenocentric (position, velocity) of the Earth and the Sun, the Moon's
/// barycentric velocity and the body-fixed axes.
#[derive(Debug, Clone, Copy)]
struct Node {
    earth: ([f64; 3], [f64; 3]),
    sun: ([f64; 3], [f64; 3]),
    moon_velocity_m_s: [f64; 3],
    axes: LunarAxes,
}

/// The surroundings over a span, from ephemeris states at nodes [`Self::NODE_STEP_S`] apart:
/// the Earth's and the Sun's positions by cubic Hermite interpolation (position error below
/// h^4/384 max|x''''| = 0.02 m for the Earth with h = 3600 s, as for the geocentric Moon in
/// `solar_system::tides`), the Moon's barycentric velocity and the body-fixed axes linearly
/// (velocity error below h^2/8 max|v''| = 1.1e-2 m/s, i.e. below 1e-11 s in the simultaneity
/// term at the 60 000 km range limit; the axes turn by 9.6e-3 rad between nodes, so a chord
/// shortens them by at most 1.2e-5, a change of the C22 term below 4e-3 m^2/s^2, 4e-20 of rate).
#[derive(Debug, Clone)]
pub struct LunarEnvironment {
    first_tdb_s: f64,
    nodes: Vec<Node>,
}

impl LunarEnvironment {
    /// Spacing of the nodes, s.
    pub const NODE_STEP_S: f64 = 3600.0;

    /// Nodes covering `first_tdb_s ..= last_tdb_s` (TDB seconds since J2000.0); an error
    /// naming the ephemeris span when a node falls outside it.
    pub fn new(
        ephemeris: &Ephemeris,
        first_tdb_s: f64,
        last_tdb_s: f64,
    ) -> Result<Self, EphemerisError> {
        if !first_tdb_s.is_finite() || !last_tdb_s.is_finite() || last_tdb_s < first_tdb_s {
            return Err(EphemerisError::NotFinite);
        }
        let count = ((last_tdb_s - first_tdb_s) / Self::NODE_STEP_S).ceil() as usize + 1;
        let mut nodes = Vec::with_capacity(count);
        for i in 0..count {
            let tdb_s = first_tdb_s + i as f64 * Self::NODE_STEP_S;
            let [earth, sun, moon] = ephemeris.states_m(
                [
                    (Body::Earth, Body::Moon),
                    (Body::Sun, Body::Moon),
                    (Body::Moon, Body::Ssb),
                ],
                seconds_f64_to_attos(tdb_s),
            )?;
            nodes.push(Node {
                earth: (earth.position_m, earth.velocity_m_s),
                sun: (sun.position_m, sun.velocity_m_s),
                moon_velocity_m_s: moon.velocity_m_s,
                axes: LunarAxes::at_tdb_s(tdb_s),
            });
        }
        Ok(Self { first_tdb_s, nodes })
    }

    /// The surroundings at `tdb_s` (TDB seconds since J2000.0); `None` outside the nodes.
    pub fn at(&self, tdb_s: f64) -> Option<LunarSurroundings> {
        let x = (tdb_s - self.first_tdb_s) / Self::NODE_STEP_S;
        let last = self.nodes.len().checked_sub(1)?;
        if x.is_nan() || x < 0.0 || x > last as f64 {
            return None;
        }
        if last == 0 {
            let node = self.nodes.first()?;
            return Some(LunarSurroundings {
                earth_m: node.earth.0,
                sun_m: node.sun.0,
                moon_velocity_m_s: node.moon_velocity_m_s,
                axes: node.axes,
            });
        }
        let i = (x.floor() as usize).min(last - 1);
        let s = x - i as f64;
        let (a, b) = (self.nodes.get(i)?, self.nodes.get(i + 1)?);
        let linear = |p: [f64; 3], q: [f64; 3]| {
            [
                p[0] + s * (q[0] - p[0]),
                p[1] + s * (q[1] - p[1]),
                p[2] + s * (q[2] - p[2]),
            ]
        };
        let basis = HermiteBasis::at(s, Self::NODE_STEP_S);
        Some(LunarSurroundings {
            earth_m: basis.apply(&a.earth, &b.earth),
            sun_m: basis.apply(&a.sun, &b.sun),
            moon_velocity_m_s: linear(a.moon_velocity_m_s, b.moon_velocity_m_s),
            axes: LunarAxes {
                pole: linear(a.axes.pole, b.axes.pole),
                x_axis: linear(a.axes.x_axis, b.axes.x_axis),
                y_axis: linear(a.axes.y_axis, b.axes.y_axis),
            },
        })
    }
}

/// The cubic Hermite basis at the fraction `s` between nodes `h_s` apart, computed once for
/// every body interpolated at that time: h00 = 2s^3 - 3s^2 + 1, h10 = s^3 - 2s^2 + s,
/// h01 = -2s^3 + 3s^2, h11 = s^3 - s^2 (e.g. Burden & Faires, Numerical Analysis, sec. 3.4).
struct HermiteBasis {
    h00: f64,
    h10: f64,
    h01: f64,
    h11: f64,
}

impl HermiteBasis {
    fn at(s: f64, h_s: f64) -> Self {
        let s2 = s * s;
        let s3 = s2 * s;
        Self {
            h00: 2.0 * s3 - 3.0 * s2 + 1.0,
            h10: (s3 - 2.0 * s2 + s) * h_s,
            h01: -2.0 * s3 + 3.0 * s2,
            h11: (s3 - s2) * h_s,
        }
    }

    /// The position between node states `a` and `b` (position, velocity).
    fn apply(&self, a: &([f64; 3], [f64; 3]), b: &([f64; 3], [f64; 3])) -> [f64; 3] {
        let mut out = [0.0; 3];
        for (k, value) in out.iter_mut().enumerate() {
            *value = self.h00 * a.0[k] + self.h10 * a.1[k] + self.h01 * b.0[k] + self.h11 * b.1[k];
        }
        out
    }
}

/// Tidal potential of one body of mass parameter `gm_m3_s2` at selenocentric position
/// `body_m` on a clock at selenocentric `position_m`, m^2/s^2 (positive where it slows the
/// clock): GM [1/|d - x| - 1/|d| - x.d/|d|^3], the external potential without its monopole
/// and dipole terms (IAU 2000 Resolution B1.3, the external potential of the geocentric
/// metric, with the Moon in place of the Earth).
pub fn tidal_potential_m2_s2(gm_m3_s2: f64, body_m: &[f64; 3], position_m: &[f64; 3]) -> f64 {
    let d2 = body_m[0] * body_m[0] + body_m[1] * body_m[1] + body_m[2] * body_m[2];
    let d = d2.sqrt();
    let rel = [
        body_m[0] - position_m[0],
        body_m[1] - position_m[1],
        body_m[2] - position_m[2],
    ];
    let distance = (rel[0] * rel[0] + rel[1] * rel[1] + rel[2] * rel[2]).sqrt();
    let x_dot_d = position_m[0] * body_m[0] + position_m[1] * body_m[1] + position_m[2] * body_m[2];
    // 1/|d - x| - 1/|d| written as (|d| - |d - x|)/(|d| |d - x|) loses the same digits; the
    // tidal part (about 1e-5 of GM/d at lunar orbits) keeps 11 of them.
    gm_m3_s2 * (1.0 / distance - 1.0 / d - x_dot_d / (d2 * d))
}

/// The tidal potential of the Earth and the Sun at selenocentric `position_m`, m^2/s^2, with
/// GM of DE440 (Park et al. 2021).
pub fn earth_sun_tidal_potential_m2_s2(
    surroundings: &LunarSurroundings,
    position_m: &[f64; 3],
) -> f64 {
    tidal_potential_m2_s2(GM_EARTH_DE440_M3_S2, &surroundings.earth_m, position_m)
        + tidal_potential_m2_s2(GM_SUN_M3_S2, &surroundings.sun_m, position_m)
}

/// The coordinate-simultaneity term v_M.(x - x_M)/c^2 of TCB - TCL at selenocentric
/// `position_m`, s: the position-dependent part of IAU 2000 Resolution B1.5 (IERS
/// Conventions (2010) eq. 10.4) with the Moon in place of the Earth.
pub fn simultaneity_term_s(moon_velocity_m_s: &[f64; 3], position_m: &[f64; 3]) -> f64 {
    (moon_velocity_m_s[0] * position_m[0]
        + moon_velocity_m_s[1] * position_m[1]
        + moon_velocity_m_s[2] * position_m[2])
        / SPEED_OF_LIGHT_SQUARED_M2_S2
}
