use super::fit::fit_line;
use super::series::{
    correct_sample, factory_setting_rate, summarize, ClockConvention, ClockSample,
};
use super::terms::*;
use crate::physics::constants::{GM_EARTH_M3_S2, SPEED_OF_LIGHT_SQUARED_M2_S2};
use crate::physics::rate::orbit::solve_kepler_equation_rad;

const NAV_A_M: f64 = 26_561_750.0; // IS-GPS-200 nominal semi-major axis

/// Inertial state of a Keplerian orbit (Vallado, algorithm 10 "COE2RV", from memory).
pub(super) fn kepler_state(
    a_m: f64,
    e: f64,
    i_deg: f64,
    node_deg: f64,
    perigee_deg: f64,
    mean_deg: f64,
) -> ([f64; 3], [f64; 3]) {
    let ecc = solve_kepler_equation_rad(mean_deg.to_radians(), e);
    let (se, ce) = ecc.sin_cos();
    let b = a_m * (1.0 - e * e).sqrt();
    let n = (GM_EARTH_M3_S2 / a_m.powi(3)).sqrt();
    let edot = n / (1.0 - e * ce);
    let p = [a_m * (ce - e), b * se];
    let v = [-a_m * se * edot, b * ce * edot];
    let (so, co) = node_deg.to_radians().sin_cos();
    let (sw, cw) = perigee_deg.to_radians().sin_cos();
    let (si, ci) = i_deg.to_radians().sin_cos();
    let px = [co * cw - so * sw * ci, so * cw + co * sw * ci, sw * si];
    let qx = [-co * sw - so * cw * ci, -so * sw + co * cw * ci, cw * si];
    let comb = |u: [f64; 2]| {
        [
            u[0] * px[0] + u[1] * qx[0],
            u[0] * px[1] + u[1] * qx[1],
            u[0] * px[2] + u[1] * qx[2],
        ]
    };
    (comb(p), comb(v))
}

#[test]
fn j2_periodic_amplitude_of_a_navigation_orbit_is_about_72_ps_every_6_hours() {
    let sin2_i = 55f64.to_radians().sin().powi(2);
    let amplitude_s = j2_periodic_amplitude_s(NAV_A_M, sin2_i);
    // Kouba (2004) GPS Solutions 8:170-180: about 0.07 ns for GPS (the formula evaluated: 71.9 ps).
    assert!((amplitude_s - 71.9e-12).abs() < 0.3e-12, "{amplitude_s:e}");
    let period_s = j2_periodic_period_s(NAV_A_M);
    // Half of the 11 h 58 min orbit (IS-GPS-200 nominal period): 5.98 h.
    assert!((period_s / 3600.0 - 5.98).abs() < 0.01, "{period_s}");
}

#[test]
fn conventional_term_equals_the_is_gps_200_form_on_a_keplerian_orbit() {
    // IS-GPS-200 20.3.3.3.3.1: dt_r = F e sqrt(A) sin E_k = -2 r.v/c^2 on a Keplerian orbit.
    for mean_deg in [10.0, 100.0, 250.0] {
        let e = 0.02;
        let (r, v) = kepler_state(NAV_A_M, e, 55.0, 20.0, 70.0, mean_deg);
        let ecc = solve_kepler_equation_rad(f64::to_radians(mean_deg), e);
        let expected =
            -2.0 * (GM_EARTH_M3_S2 * NAV_A_M).sqrt() * e * ecc.sin() / SPEED_OF_LIGHT_SQUARED_M2_S2;
        let got = conventional_periodic_s(r, v);
        assert!((got - expected).abs() < 1e-18, "{got:e} {expected:e}");
    }
}

#[test]
fn sin2_i_sin_2u_without_angles_matches_the_angles() {
    // Definition of the argument of latitude u = omega + nu (Vallado sec. 2.5, from memory).
    let e = 0.0;
    for (i_deg, u_deg) in [(55.0, 30.0), (20.0, 200.0), (98.0, 310.0)] {
        let (r, v) = kepler_state(NAV_A_M, e, i_deg, 40.0, 0.0, u_deg);
        let got = sin2_inclination_sin_twice_latitude_argument(r, v);
        let expected = f64::to_radians(i_deg).sin().powi(2) * (2.0 * f64::to_radians(u_deg)).sin();
        assert!((got - expected).abs() < 1e-12, "{got} {expected}");
    }
}

#[test]
fn earth_fixed_velocity_keeps_r_dot_v() {
    // omega x r is perpendicular to r (vector identity).
    let (r, v) = kepler_state(NAV_A_M, 0.01, 55.0, 20.0, 70.0, 33.0);
    let w = crate::physics::constants::EARTH_ROTATION_RAD_S;
    let v_ef = [v[0] + w * r[1], v[1] - w * r[0], v[2]];
    let back = inertial_velocity_m_s(r, v_ef);
    for k in 0..3 {
        assert!((back[k] - v[k]).abs() < 1e-9);
    }
    let difference = conventional_periodic_s(r, v_ef) - conventional_periodic_s(r, v);
    assert!(difference.abs() < 1e-20, "{difference:e}");
}

#[test]
fn line_fit_recovers_a_line_exactly() {
    // Least squares of exact data returns the data's line (common practice).
    let t: Vec<f64> = (0..2880).map(|k| 30.0 * k as f64).collect();
    let y: Vec<f64> = t.iter().map(|t| 1.25e-4 + 3.0e-12 * t).collect();
    let fit = fit_line(&t, &y).unwrap();
    assert!((fit.offset_s - 1.25e-4).abs() < 1e-17);
    assert!((fit.rate - 3.0e-12).abs() < 1e-22);
    assert!(fit.residual_rms_s < 1e-17);
    assert!(fit_line(&[1.0], &[2.0]).is_none());
    assert!(fit_line(&[1.0, 1.0], &[2.0, 3.0]).is_none());
}

#[test]
fn factory_setting_rate_is_the_is_gps_200_offset() {
    // IS-GPS-200 3.3.1.1: 10.23 MHz -> 10.22999999543 MHz, i.e. 4.4647e-10.
    assert!((factory_setting_rate() - 4.4647e-10).abs() < 0.0001e-10);
}

#[test]
fn igs_and_raw_conventions_remove_different_terms() {
    // The IGS convention leaves the conventional term out of the values (common practice).
    let (r, v) = kepler_state(NAV_A_M, 0.01, 55.0, 20.0, 70.0, 33.0);
    let sample = ClockSample {
        t_s: 0.0,
        clock_s: 1e-4,
        position_m: r,
        inertial_velocity_m_s: v,
    };
    let igs = correct_sample(&sample, ClockConvention::Igs).unwrap();
    let raw = correct_sample(&sample, ClockConvention::Raw).unwrap();
    assert_eq!(igs.corrected_s, 1e-4 - igs.j2_s);
    assert_eq!(raw.corrected_s, 1e-4 - raw.conventional_s - raw.j2_s);
    assert!(igs.conventional_s.abs() > 1e-9);
    // A hyperbolic state has no osculating a.
    let escape = ClockSample {
        inertial_velocity_m_s: [v[0] * 2.0, v[1] * 2.0, v[2] * 2.0],
        ..sample
    };
    assert!(correct_sample(&escape, ClockConvention::Igs).is_none());
    assert!(summarize(&[igs]).is_none());
}
