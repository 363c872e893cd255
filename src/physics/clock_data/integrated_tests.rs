//! The corrections against a numerically integrated J2 orbit and its clock (our own fixed-step
//! fourth-order Runge-Kutta integrator; the classical RK4 of Butcher's table, common practice).

use super::fit::fit_line;
use super::terms::*;
use super::tests::kepler_state;
use crate::physics::constants::{
    EQUATORIAL_RADIUS_EARTH_M, GM_EARTH_M3_S2, J2_EARTH, SPEED_OF_LIGHT_SQUARED_M2_S2,
};
use crate::physics::rate::RateReference;

type State = [f64; 7]; // position m, velocity m/s, tau - t s

/// Derivative: J2 acceleration (gradient of U = GM/r (1 - J2 (a_E/r)^2 P2(z/r)); Vallado
/// eq. 8-30, from memory) and d(tau - t)/dt = -(v^2/2 + U)/c^2 (IERS Conventions (2010)
/// eq. 10.6, TCG).
fn derivative(y: &State) -> State {
    let (x, yy, z) = (y[0], y[1], y[2]);
    let r2 = x * x + yy * yy + z * z;
    let r = r2.sqrt();
    let k = 1.5 * J2_EARTH * EQUATORIAL_RADIUS_EARTH_M * EQUATORIAL_RADIUS_EARTH_M / r2;
    let zz = z * z / r2;
    let g = GM_EARTH_M3_S2 / (r2 * r);
    let ax = -g * x * (1.0 + k * (1.0 - 5.0 * zz));
    let ay = -g * yy * (1.0 + k * (1.0 - 5.0 * zz));
    let az = -g * z * (1.0 + k * (3.0 - 5.0 * zz));
    let p2 = 0.5 * (3.0 * zz - 1.0);
    let u = GM_EARTH_M3_S2 / r
        * (1.0 - J2_EARTH * EQUATORIAL_RADIUS_EARTH_M * EQUATORIAL_RADIUS_EARTH_M / r2 * p2);
    let v2 = y[3] * y[3] + y[4] * y[4] + y[5] * y[5];
    [
        y[3],
        y[4],
        y[5],
        ax,
        ay,
        az,
        -(0.5 * v2 + u) / SPEED_OF_LIGHT_SQUARED_M2_S2,
    ]
}

fn rk4_step(y: &State, h: f64) -> State {
    let add = |a: &State, b: &State, s: f64| -> State { std::array::from_fn(|i| a[i] + s * b[i]) };
    let k1 = derivative(y);
    let k2 = derivative(&add(y, &k1, h / 2.0));
    let k3 = derivative(&add(y, &k2, h / 2.0));
    let k4 = derivative(&add(y, &k3, h));
    std::array::from_fn(|i| y[i] + h / 6.0 * (k1[i] + 2.0 * k2[i] + 2.0 * k3[i] + k4[i]))
}

struct Run {
    t_s: Vec<f64>,
    states: Vec<State>,
    energy_a_m: f64,
}

/// Integrates `days` with 5-s steps and keeps every 30 s.
fn integrate(a_m: f64, e: f64, i_deg: f64, days: f64) -> Run {
    let (r, v) = kepler_state(a_m, e, i_deg, 30.0, 40.0, 0.0);
    let mut y: State = [r[0], r[1], r[2], v[0], v[1], v[2], 0.0];
    let r0 = (r[0] * r[0] + r[1] * r[1] + r[2] * r[2]).sqrt();
    let u_j2 = -GM_EARTH_M3_S2 * J2_EARTH * EQUATORIAL_RADIUS_EARTH_M * EQUATORIAL_RADIUS_EARTH_M
        / r0.powi(3)
        * 0.5
        * (3.0 * (r[2] / r0).powi(2) - 1.0);
    let energy = 0.5 * (v[0] * v[0] + v[1] * v[1] + v[2] * v[2]) - GM_EARTH_M3_S2 / r0 - u_j2;
    let steps = (days * 86_400.0 / 30.0) as usize;
    let mut run = Run {
        t_s: vec![],
        states: vec![],
        energy_a_m: -GM_EARTH_M3_S2 / (2.0 * energy),
    };
    for k in 0..=steps {
        run.t_s.push(30.0 * k as f64);
        run.states.push(y);
        for _ in 0..6 {
            y = rk4_step(&y, 5.0);
        }
    }
    run
}

/// Residual of tau - t after removing the given periodic terms, and its line fit.
fn residual(run: &Run, with_j2: bool) -> (Vec<f64>, f64, f64) {
    let corrected: Vec<f64> = run
        .states
        .iter()
        .map(|y| {
            let (r, v) = ([y[0], y[1], y[2]], [y[3], y[4], y[5]]);
            let j2 = if with_j2 {
                j2_periodic_at_state_s(r, v).unwrap()
            } else {
                0.0
            };
            y[6] - conventional_periodic_s(r, v) - j2
        })
        .collect();
    let fit = fit_line(&run.t_s, &corrected).unwrap();
    let rest: Vec<f64> = run
        .t_s
        .iter()
        .zip(&corrected)
        .map(|(t, c)| c - fit.offset_s - fit.rate * t)
        .collect();
    let peak = rest.iter().fold(0.0f64, |m, r| m.max(r.abs()));
    (rest, peak, fit.rate)
}

#[test]
fn conventional_and_j2_terms_leave_a_few_ps_on_an_integrated_navigation_orbit() {
    let run = integrate(26_561_750.0, 0.01, 55.0, 2.0);
    let (_, peak_conventional_only_s, _) = residual(&run, false);
    let (_, peak_s, _) = residual(&run, true);
    eprintln!("navigation orbit e=0.01 i=55: peak residual conventional only {peak_conventional_only_s:e} s, with J2 {peak_s:e} s");
    // Kouba (2004) GPS Solutions 8:170-180: the J2 term reaches about 0.07 ns and his formula
    // agrees to 0.015 ns; so the conventional term alone leaves more than 50 ps and the two
    // together less than 15 ps. Measured here: 73.5 ps and 0.98 ps (e = 0.01), so the bound
    // is held at 2 ps.
    assert!(
        peak_conventional_only_s > 50e-12,
        "{peak_conventional_only_s:e}"
    );
    assert!(peak_s < 2e-12, "{peak_s:e}");
}

#[test]
fn j2_mean_rate_matches_an_integrated_orbit() {
    // The derivation in the module notes: mean rate -(3GM/(2a) + 4 <U_J2>)/c^2 with a the
    // energy semi-major axis; checked where the J2 change is large (i = 20 deg) and near the
    // critical inclination (i = 55 deg). Measured: differences 2.7e-18, 2.5e-19, 9.2e-18 for
    // J2 changes of -1.7e-14, 1.4e-16, 4.0e-15.
    for (i_deg, e) in [(20.0, 0.01), (55.0, 0.01), (63.0, 0.1)] {
        let run = integrate(26_561_750.0, e, i_deg, 3.0);
        let (_, _, fitted_rate) = residual(&run, true);
        let sin2_i = f64::to_radians(i_deg).sin().powi(2);
        let predicted = j2_mean_rate_parts(run.energy_a_m, e, sin2_i, RateReference::Tcg).total();
        let change = j2_mean_rate_change(run.energy_a_m, e, sin2_i);
        eprintln!("i={i_deg} e={e}: fitted {fitted_rate:e} predicted {predicted:e} diff {:e}, J2 change {change:e}", fitted_rate - predicted);
        assert!(
            (fitted_rate - predicted).abs() < 2e-17,
            "i={i_deg}: {fitted_rate:e} {predicted:e}"
        );
    }
}
