//! Accuracy of the integrator on analytic Keplerian orbits (no interpolation here; the
//! ephemeris tests repeat the check through sampled tracks).

use super::kepler::KeplerOrbit;
use super::*;
use crate::physics::constants::{GM_EARTH_M3_S2, SPEED_OF_LIGHT_SQUARED_M2_S2};

/// Point-mass rate relative to TCG: (-v^2/(2c^2), -GM/(r c^2)) (IERS Conventions (2010)
/// eq. 10.6 at first order, U = GM/r; GM = 3.986004418e14, IERS Conventions (2010) table 1.1).
pub(crate) fn point_mass_rate_tcg(position_m: &[f64; 3], velocity_m_s: &[f64; 3]) -> (f64, f64) {
    let v2 = velocity_m_s.iter().map(|x| x * x).sum::<f64>();
    let r = position_m.iter().map(|x| x * x).sum::<f64>().sqrt();
    (
        -0.5 * v2 / SPEED_OF_LIGHT_SQUARED_M2_S2,
        -GM_EARTH_M3_S2 / (r * SPEED_OF_LIGHT_SQUARED_M2_S2),
    )
}

/// tau - t of a Keplerian orbit relative to TCG, zero at t = 0:
/// -(3GM/(2ac^2)) t - (2 sqrt(GM a)/c^2) e (sin E(t) - sin E(0))
/// (IS-GPS-200 section 20.3.3.3.3.1; Ashby, Living Rev. Relativity 6 (2003) 1, eq. 52;
/// IERS Conventions (2010) eq. 10.6).
pub(crate) fn closed_form_s(orbit: &KeplerOrbit, t_s: f64) -> f64 {
    let a = orbit.semi_major_axis_m;
    let gm = orbit.gm_m3_s2;
    let periodic = 2.0 * (gm * a).sqrt() / SPEED_OF_LIGHT_SQUARED_M2_S2 * orbit.eccentricity;
    -1.5 * gm / (a * SPEED_OF_LIGHT_SQUARED_M2_S2) * t_s
        - periodic
            * (orbit.eccentric_anomaly_rad(t_s).sin() - orbit.eccentric_anomaly_rad(0.0).sin())
}

/// The navigation MEO orbit: a = 26 561.75 km (IS-GPS-200 nominal), e = 0.015.
pub(crate) fn navigation_orbit() -> KeplerOrbit {
    KeplerOrbit {
        gm_m3_s2: GM_EARTH_M3_S2,
        semi_major_axis_m: 26_561_750.0,
        eccentricity: 0.015,
        inclination_rad: 55f64.to_radians(),
        ascending_node_rad: 0.7,
        argument_of_perigee_rad: 1.1,
        mean_anomaly_at_zero_rad: 0.3,
    }
}

/// A 400 km low orbit, slightly eccentric (invented test orbit).
pub(crate) fn low_orbit() -> KeplerOrbit {
    KeplerOrbit {
        gm_m3_s2: GM_EARTH_M3_S2,
        semi_major_axis_m: 6_778_137.0,
        eccentricity: 0.001,
        inclination_rad: 51.6f64.to_radians(),
        ascending_node_rad: 2.0,
        argument_of_perigee_rad: 0.4,
        mean_anomaly_at_zero_rad: 5.0,
    }
}

fn worst_error_s(orbit: &KeplerOrbit, step_s: f64, days: f64) -> f64 {
    let count = (days * 86_400.0 / step_s).round() as usize;
    let epochs: Vec<f64> = (0..=count).map(|i| i as f64 * step_s).collect();
    let series = integrate_proper_time(
        orbit,
        &epochs,
        point_mass_rate_tcg,
        &ProperTimeOptions::default(),
    )
    .unwrap_or_else(|e| panic!("{e}"));
    series
        .samples
        .iter()
        .map(|s| (s.tau_minus_t_s - closed_form_s(orbit, s.t_s)).abs())
        .fold(0.0, f64::max)
}

#[test]
fn navigation_orbit_one_and_ten_days() {
    // Closed form: IS-GPS-200 20.3.3.3.3.1 / Ashby 2003; tolerance 1 ps (1 day), 10 ps (10 days).
    let one_day = worst_error_s(&navigation_orbit(), 300.0, 1.0);
    let ten_days = worst_error_s(&navigation_orbit(), 300.0, 10.0);
    println!("MEO analytic: worst |error| 1 day {one_day:.3e} s, 10 days {ten_days:.3e} s");
    assert!(one_day < 1e-12, "{one_day}");
    assert!(ten_days < 1e-11, "{ten_days}");
}

#[test]
fn low_orbit_one_and_ten_days() {
    // Closed form: IS-GPS-200 20.3.3.3.3.1 / Ashby 2003; tolerance 1 ps (1 day), 10 ps (10 days).
    let one_day = worst_error_s(&low_orbit(), 30.0, 1.0);
    let ten_days = worst_error_s(&low_orbit(), 30.0, 10.0);
    println!("LEO analytic: worst |error| 1 day {one_day:.3e} s, 10 days {ten_days:.3e} s");
    assert!(one_day < 1e-12, "{one_day}");
    assert!(ten_days < 1e-11, "{ten_days}");
}

#[test]
fn summary_of_a_keplerian_orbit() {
    let orbit = navigation_orbit();
    let epochs: Vec<f64> = (0..=288).map(|i| f64::from(i) * 300.0).collect();
    let series = integrate_proper_time(
        &orbit,
        &epochs,
        point_mass_rate_tcg,
        &ProperTimeOptions::default(),
    )
    .unwrap_or_else(|e| panic!("{e}"));
    let summary = series.summary;
    // Periodic amplitude 2 sqrt(GM a) e / c^2: about 23 ns per 0.01 of eccentricity
    // (IS-GPS-200 20.3.3.3.3.1 formula), so about 34.5 ns at e = 0.015. The sampled
    // extremes lie within 1 % of the amplitude at 300 s sampling (common practice).
    let expected = 2.0 * (GM_EARTH_M3_S2 * orbit.semi_major_axis_m).sqrt() * orbit.eccentricity
        / SPEED_OF_LIGHT_SQUARED_M2_S2;
    assert!((summary.periodic_amplitude_s / expected - 1.0).abs() < 0.01);
    assert!((expected - 34.5e-9).abs() < 0.5e-9);
    // A Keplerian orbit leaves no residual beyond the integration error (Ashby 2003 eq. 40 closed form).
    assert!(
        summary.kepler_residual_rms_s < 1e-13,
        "{}",
        summary.kepler_residual_rms_s
    );
    // Mean rate relative to TCG: -3GM/(2ac^2) plus the periodic term's net change over the
    // span (IS-GPS-200 closed form).
    let net_periodic = closed_form_s(&orbit, 86_400.0)
        + 1.5 * GM_EARTH_M3_S2 / (orbit.semi_major_axis_m * SPEED_OF_LIGHT_SQUARED_M2_S2)
            * 86_400.0;
    let secular = -1.5 * GM_EARTH_M3_S2 / (orbit.semi_major_axis_m * SPEED_OF_LIGHT_SQUARED_M2_S2);
    assert!((summary.mean_rate - (secular + net_periodic / 86_400.0)).abs() < 1e-16);
    assert!((summary.span_s - 86_400.0).abs() == 0.0);
}

#[test]
fn earth_fixed_point_turns_with_the_earth() {
    // A point at rest in the ITRS, 7000 km from the axis, with the pole at the ITRS z axis
    // (x_p = y_p = 0): its GCRS speed is d(ERA)/dt x 7000 km (IERS Conventions (2010)
    // eq. 5.15), to the precession-nutation rate (below 1e-10 m/s per m, 2e-7 relative).
    use crate::physics::earth::orientation::rotation::EARTH_ROTATION_RATE_RAD_S;
    use crate::physics::earth::orientation::span::{EopAtEpoch, OrientationSpan};
    let span = OrientationSpan::new(832_593_600 * 1_000_000_000_000_000_000, 600.0, |_| {
        Ok::<_, ()>(EopAtEpoch::default())
    })
    .unwrap();
    let fixed = EarthFixed {
        track: |_: f64| ([7.0e6, 0.0, 1.0e6], [0.0; 3]),
        orientation: &span,
    };
    let (position_m, velocity_m_s) = fixed.state_at(100.0);
    let speed = norm(&velocity_m_s);
    assert!(
        (speed / (EARTH_ROTATION_RATE_RAD_S * 7.0e6) - 1.0).abs() < 1e-6,
        "{speed}"
    );
    assert!((norm(&position_m) - (5.0e13f64).sqrt()).abs() < 1e-6);
}

#[test]
fn refuses_bad_epochs_and_non_finite_rates() {
    let orbit = navigation_orbit();
    let options = ProperTimeOptions::default();
    let code = |epochs: &[f64]| {
        integrate_proper_time(&orbit, epochs, point_mass_rate_tcg, &options)
            .err()
            .map(|e| e.code)
    };
    // Input checks of this module (common practice: no silent acceptance of unusable input).
    assert_eq!(code(&[0.0]), Some("too_few_epochs"));
    assert_eq!(code(&[0.0, 10.0, 10.0]), Some("epochs_not_increasing"));
    assert_eq!(code(&[0.0, f64::NAN]), Some("not_finite"));
    let nan_rate = integrate_proper_time(
        &orbit,
        &[0.0, 60.0],
        |_: &[f64; 3], _: &[f64; 3]| (f64::NAN, 0.0),
        &options,
    );
    assert_eq!(nan_rate.err().map(|e| e.code), Some("not_finite"));
}
