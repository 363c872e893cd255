//! An independent evaluation of the lunar clock rates: plain barycentric arithmetic from the
//! ephemeris (every body's potential summed at the clock, the clock's barycentric speed, and
//! the simultaneity terms d/dt (v_A . (x - x_A))/c^2 by numerical differences), written apart
//! from the service's selenocentric and geocentric formulas and from its fitted TCL and TDB
//! tables, at seeded random epochs 1961-2099.
//!
//! Relations (first post-Newtonian order; IERS Conventions (2010) eq. 10.2 and 10.4, IAU 2000
//! Resolution B1.3/B1.5, with the Moon for the Earth for TCL):
//! d(tau)/dTCB = 1 - (V^2/2 + sum_A GM_A/|x_A - x|)/c^2 at the clock;
//! dTCG/dTCB = 1 - (v_E^2/2 + sum_{A != E} GM_A/|x_A - x_E|)/c^2 at the geocentre, and TCG at
//! the clock differs by v_E . (x - x_E)/c^2, so d(tau)/dTCG = (d(tau)/dTCB + D_E/c^2) /
//! (dTCG/dTCB) with D_E = d/dt (v_E . (x - x_E)); the same with the Moon for TCL.

use super::gravity::{GL0660B_C22, GL0660B_J2, GL0660B_REFERENCE_RADIUS_M};
use super::site::{rates_at, site_body_fixed_m, site_state, tl_rate_against_tt_at_centres};
use crate::physics::constants::{L_G, SPEED_OF_LIGHT_SQUARED_M2_S2};
use crate::physics::rate::lunar::LunarSite;
use crate::physics::solar_system::gm::gm_m3_s2;
use crate::physics::solar_system::{Body, Ephemeris};
use crate::physics::time::instant::seconds_f64_to_attos;

const BODIES: [Body; 11] = [
    Body::Sun,
    Body::MercuryBarycenter,
    Body::VenusBarycenter,
    Body::Earth,
    Body::Moon,
    Body::MarsBarycenter,
    Body::JupiterBarycenter,
    Body::SaturnBarycenter,
    Body::UranusBarycenter,
    Body::NeptuneBarycenter,
    Body::PlutoBarycenter,
];

/// Barycentric position and velocity of `body` at `t` (TDB s).
fn bary(e: &Ephemeris, body: Body, t: f64) -> ([f64; 3], [f64; 3]) {
    let s = e.state_m(body, Body::Ssb, seconds_f64_to_attos(t)).unwrap();
    (s.position_m, s.velocity_m_s)
}

fn sub(a: [f64; 3], b: [f64; 3]) -> [f64; 3] {
    [a[0] - b[0], a[1] - b[1], a[2] - b[2]]
}
fn dot(a: [f64; 3], b: [f64; 3]) -> f64 {
    a[0] * b[0] + a[1] * b[1] + a[2] * b[2]
}

/// The Moon's own potential written from latitude and longitude (Kaula 1966 eq. 1.31 with
/// GL0660B's J2 and C22), not from the service's Cartesian form.
fn moon_own(body_fixed: [f64; 3]) -> f64 {
    let r = dot(body_fixed, body_fixed).sqrt();
    let lat = (body_fixed[2] / r).asin();
    let lon = body_fixed[1].atan2(body_fixed[0]);
    let q = (GL0660B_REFERENCE_RADIUS_M / r).powi(2);
    let p2 = (3.0 * lat.sin().powi(2) - 1.0) / 2.0;
    let gm = gm_m3_s2(Body::Moon).unwrap();
    gm / r
        * (1.0 + q * (-GL0660B_J2 * p2 + 3.0 * GL0660B_C22 * lat.cos().powi(2) * (2.0 * lon).cos()))
}

/// The sum of every body's point-mass potential but `skip`'s at `x`.
fn potential(e: &Ephemeris, t: f64, x: [f64; 3], skip: Body) -> f64 {
    BODIES
        .iter()
        .filter(|&&b| b != skip)
        .map(|&b| {
            let d = sub(bary(e, b, t).0, x);
            gm_m3_s2(b).unwrap() / dot(d, d).sqrt()
        })
        .sum()
}

/// The clock's barycentric position and velocity at `t`.
fn clock(e: &Ephemeris, body_fixed: [f64; 3], t: f64) -> ([f64; 3], [f64; 3]) {
    let (xm, vm) = bary(e, Body::Moon, t);
    let s = site_state(body_fixed, t);
    (
        [0, 1, 2].map(|k| xm[k] + s.position_m[k]),
        [0, 1, 2].map(|k| vm[k] + s.velocity_m_s[k]),
    )
}

/// d/dt (v_A . (x_clock - x_A)) by a central difference over +-30 s.
fn simultaneity_rate(e: &Ephemeris, body_fixed: [f64; 3], centre: Body, t: f64) -> f64 {
    let f = |t: f64| {
        let (xa, va) = bary(e, centre, t);
        dot(va, sub(clock(e, body_fixed, t).0, xa))
    };
    (f(t + 30.0) - f(t - 30.0)) / 60.0
}

struct Independent {
    tcg: f64,
    tcl: f64,
    tt_through_scales: f64,
}

fn independent(e: &Ephemeris, body_fixed: [f64; 3], t: f64) -> Independent {
    let c2 = SPEED_OF_LIGHT_SQUARED_M2_S2;
    let (x, v) = clock(e, body_fixed, t);
    // Every body but the Moon as a point mass, the Moon with its field at the clock.
    let u = potential(e, t, x, Body::Moon) + moon_own(body_fixed);
    let y_tcb = -(dot(v, v) / 2.0 + u) / c2;
    let centre = |body: Body| {
        let (xb, vb) = bary(e, body, t);
        -(dot(vb, vb) / 2.0 + potential(e, t, xb, body)) / c2
    };
    let (tcg_per_tcb, tcl_per_tcb) = (centre(Body::Earth), centre(Body::Moon));
    let d_e = simultaneity_rate(e, body_fixed, Body::Earth, t) / c2;
    let d_m = simultaneity_rate(e, body_fixed, Body::Moon, t) / c2;
    // (1 + a)/(1 + b) - 1 written as (a - b)/(1 + b): 1 + 1e-8 in a float would lose 1e-16.
    let tcg = (y_tcb + d_e - tcg_per_tcb) / (1.0 + tcg_per_tcb);
    let tcl = (y_tcb + d_m - tcl_per_tcb) / (1.0 + tcl_per_tcb);
    // Against TT through the scales at the centres: TCL at the Moon's centre, TT at the Earth's
    // ((1 + a)/((1 + b)(1 - L_G)) - 1, written without forming 1 + a).
    let tt_through_scales = (y_tcb + d_m - tcg_per_tcb + L_G * (1.0 + tcg_per_tcb))
        / ((1.0 + tcg_per_tcb) * (1.0 - L_G));
    Independent {
        tcg,
        tcl,
        tt_through_scales,
    }
}

/// Seeded epochs (a 64-bit linear congruential generator, Knuth's MMIX constants), TDB s
/// since J2000 in 1961-2099.
fn seeded_epochs(count: usize) -> Vec<f64> {
    let mut state: u64 = 0x5eed_1a4a_2026;
    (0..count)
        .map(|_| {
            state = state
                .wrapping_mul(6_364_136_223_846_793_005)
                .wrapping_add(1_442_695_040_888_963_407);
            let unit = (state >> 11) as f64 / (1u64 << 53) as f64;
            (-38.0 + 137.0 * unit) * 365.25 * 86_400.0
        })
        .collect()
}

/// The service's rates against TCG and TCL, and against TT through the scale relations
/// (the fitted TCB - TCL and TDB - TT of DE440), agree with the barycentric arithmetic at 24
/// seeded epochs and four sites. Tolerances: 2e-17 for TCG and TCL (the planets' tides the
/// service leaves out, about 1e-17; measured 3.9e-18 and 5.0e-19); 2e-16 for the scales (the
/// 1/c^4 terms in the fitted integrals, about 1e-16, which the arithmetic here leaves out;
/// measured 1.3e-16). Measured differences are printed.
#[test]
fn rates_agree_with_barycentric_arithmetic_at_seeded_epochs() {
    let e = Ephemeris::embedded().unwrap();
    let sites = [
        (0.0, 0.0, 0.0),
        (-89.5, 30.0, 1500.0),
        (12.0, 170.0, -2000.0),
        (45.0, -75.0, 0.0),
    ];
    let (mut worst_tcg, mut worst_tcl, mut worst_scales) = (0.0_f64, 0.0_f64, 0.0_f64);
    for (i, t) in seeded_epochs(24).into_iter().enumerate() {
        let (lat, lon, h) = sites[i % sites.len()];
        let site = LunarSite {
            latitude_deg: lat,
            longitude_deg: lon,
            height_m: h,
        };
        let body_fixed = site_body_fixed_m(&site).unwrap();
        let service = rates_at(body_fixed, t, &e).unwrap();
        let reference = independent(&e, body_fixed, t);
        let scales = service.tl.total() + tl_rate_against_tt_at_centres(t).unwrap();
        worst_tcg = worst_tcg.max((service.tcg.total() - reference.tcg).abs());
        worst_tcl = worst_tcl.max((service.tcl.total() - reference.tcl).abs());
        worst_scales = worst_scales.max((scales - reference.tt_through_scales).abs());
    }
    eprintln!("worst differences: TCG {worst_tcg:e}, TCL {worst_tcl:e}, TT through the scales {worst_scales:e}");
    assert!(worst_tcg < 2e-17, "{worst_tcg:e}");
    assert!(worst_tcl < 2e-17, "{worst_tcl:e}");
    assert!(worst_scales < 2e-16, "{worst_scales:e}");
}
