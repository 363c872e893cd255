//! Checks of the lunar-orbit proper time: a circular orbit's mean rate against the closed
//! form, and the whole integral against an independent evaluation written apart from the
//! service's code (Simpson's rule on a 10 s grid, the Earth and the Sun read from the
//! ephemeris at every point, the potentials written out again here).

use super::*;
use crate::physics::constants::SPEED_OF_LIGHT_SQUARED_M2_S2;
use crate::physics::moon::gravity::{
    LunarGravityModel, GL0660B_C22, GL0660B_J2, GL0660B_REFERENCE_RADIUS_M,
};
use crate::physics::moon::orientation::moon_orientation;
use crate::physics::proper_time::ProperTimeOptions;
use crate::physics::solar_system::gm::{GM_EARTH_DE440_M3_S2, GM_MOON_M3_S2, GM_SUN_M3_S2};
use crate::physics::solar_system::{Body, Ephemeris};
use crate::physics::time::instant::seconds_f64_to_attos;

/// A circular orbit of radius `a_m` about the Moon's point mass, inclined `inclination_rad` to
/// the ICRF equator: (position, velocity) at `t_s`.
fn circular(a_m: f64, inclination_rad: f64) -> impl Fn(f64) -> ([f64; 3], [f64; 3]) {
    let n = (GM_MOON_M3_S2 / (a_m * a_m * a_m)).sqrt();
    let (si, ci) = inclination_rad.sin_cos();
    move |t_s: f64| {
        let (s, c) = (n * t_s).sin_cos();
        (
            [a_m * c, a_m * s * ci, a_m * s * si],
            [-a_m * n * s, a_m * n * c * ci, a_m * n * c * si],
        )
    }
}

fn environment(first_tdb_s: f64, span_s: f64) -> (std::sync::Arc<Ephemeris>, LunarEnvironment) {
    let ephemeris = Ephemeris::embedded().unwrap();
    let env = LunarEnvironment::new(&ephemeris, first_tdb_s, first_tdb_s + span_s).unwrap();
    (ephemeris, env)
}

/// A low circular orbit (100 km above the 1737.4 km mean radius) with the point-mass Moon:
/// mean rate minus the tidal part equals the closed form -(3 GM_M / (2a))/c^2 (common
/// practice: v^2/2 = GM/(2a) plus U = GM/a on a circle), 4.453e-11, within 1e-18 (the
/// quadrature); the tides of the Earth and the Sun add a mean rate below their bound
/// GM_E a^2/(d^3 c^2) = 2.6e-16 (the Earth's quadrupole at the mean distance, common practice)
/// and are reported apart (measured here and printed).
#[test]
fn low_circular_orbit_mean_rate_matches_closed_form() {
    let a_m = 1_837_400.0;
    let span_s = 86_400.0;
    let first_tdb_s = 8_000.0 * 86_400.0;
    let (_, env) = environment(first_tdb_s, span_s);
    let epochs: Vec<f64> = (0..=1440).map(|k| f64::from(k) * 60.0).collect();
    let series = integrate_lunar_proper_time(
        &circular(a_m, 0.5),
        &epochs,
        |t_s| env.at(first_tdb_s + t_s),
        LunarGravityModel::PointMass,
        &ProperTimeOptions::default(),
    )
    .unwrap();
    let closed = -1.5 * GM_MOON_M3_S2 / a_m / SPEED_OF_LIGHT_SQUARED_M2_S2;
    let s = series.summary;
    let without_tides = s.mean_rate - s.tidal_mean_rate;
    println!(
        "mean rate {:e}, closed form {closed:e}, tides {:e}",
        s.mean_rate, s.tidal_mean_rate
    );
    assert!((closed + 4.453e-11).abs() < 1e-14, "{closed:e}");
    assert!((without_tides - closed).abs() < 1e-18, "{without_tides:e}");
    let bound =
        GM_EARTH_DE440_M3_S2 * a_m * a_m / 3.63e8_f64.powi(3) / SPEED_OF_LIGHT_SQUARED_M2_S2;
    assert!(
        s.tidal_mean_rate.abs() < bound,
        "{:e} vs {bound:e}",
        s.tidal_mean_rate
    );
    assert!(s.tidal_mean_rate != 0.0);
    // On a circle the Keplerian periodic term vanishes: what remains periodic is tidal, below
    // bound x span (common practice).
    assert!(series
        .samples
        .iter()
        .all(|x| x.kepler_periodic_s.abs() < 1e-20));
    assert!(s.periodic_amplitude_s < bound * span_s);
    // The simultaneity term v_M.x/c^2: |v_M| about 30 km/s, |x| = a: at most 6.3e-7 s
    // (common practice), and kept out of tau - t.
    assert!(s.simultaneity_amplitude_s > 4e-7 && s.simultaneity_amplitude_s < 6.3e-7);
}

/// The degree-2 potential written apart in Cartesian form (Kaula 1966 eq. 1.31 with
/// P2 = (3 z^2 - r^2) / (2 r^2) and P22 cos 2 lambda = 3 (x^2 - y^2) / r^2):
/// GM/r - GM J2 R^2 (3 z^2 - r^2) / (2 r^5) + 3 GM C22 R^2 (x^2 - y^2) / r^5, with the
/// body-fixed coordinates taken from the IAU rotation matrix here.
fn moon_potential_apart(x: &[f64; 3], tdb_s: f64) -> f64 {
    let m = moon_orientation(tdb_s).icrf_to_body_fixed();
    let [xb, yb, zb] = m.map(|row| row[0] * x[0] + row[1] * x[1] + row[2] * x[2]);
    let r2: f64 = x.iter().map(|c| c * c).sum();
    let r = r2.sqrt();
    let gm_r2 = GM_MOON_M3_S2 * GL0660B_REFERENCE_RADIUS_M.powi(2);
    GM_MOON_M3_S2 / r - gm_r2 * GL0660B_J2 * (3.0 * zb * zb - r2) / (2.0 * r2 * r2 * r)
        + 3.0 * gm_r2 * GL0660B_C22 * (xb * xb - yb * yb) / (r2 * r2 * r)
}

/// GM [1/|d - x| - 1/|d| - x.d/|d|^3] written apart.
fn tide_apart(gm: f64, d: &[f64; 3], x: &[f64; 3]) -> f64 {
    let dn = d.iter().map(|c| c * c).sum::<f64>().sqrt();
    let rel = [d[0] - x[0], d[1] - x[1], d[2] - x[2]];
    let rn = rel.iter().map(|c| c * c).sum::<f64>().sqrt();
    let xd: f64 = x.iter().zip(d).map(|(a, b)| a * b).sum();
    gm * (1.0 / rn - 1.0 / dn - xd / dn.powi(3))
}

/// The whole tau - TCL over a day of an inclined circular orbit (500 km high) with the
/// degree-2 field (J2 and C22), at
/// seeded epochs: the service's integral against Simpson's rule on a 10 s grid with the Earth
/// and the Sun read from DE440 at every point (own evaluation, written apart): within
/// 5e-15 s (measured 9.4e-16 s; Simpson's error on this grid is below 1e-16 s; the Hermite nodes of the
/// environment move the tides by below 1e-22 of rate).
#[test]
fn whole_integral_matches_an_independent_evaluation() {
    let a_m = 2_237_400.0;
    let span_s = 86_400.0;
    let ephemeris = Ephemeris::embedded().unwrap();
    // Seeded epochs (a linear congruential generator, seed 12): days after J2000.0.
    let mut seed: u64 = 12;
    for _ in 0..2 {
        seed = seed.wrapping_mul(6_364_136_223_846_793_005).wrapping_add(1);
        let day = (seed >> 33) % 36_000;
        let first_tdb_s = (day as f64 - 18_000.0) * 86_400.0;
        let env = LunarEnvironment::new(&ephemeris, first_tdb_s, first_tdb_s + span_s).unwrap();
        let orbit = circular(a_m, 1.2);
        let epochs: Vec<f64> = (0..=288).map(|k| f64::from(k) * 300.0).collect();
        let series = integrate_lunar_proper_time(
            &orbit,
            &epochs,
            |t_s| env.at(first_tdb_s + t_s),
            LunarGravityModel::GrailDegree2,
            &ProperTimeOptions::default(),
        )
        .unwrap();
        let h = 10.0;
        let steps = (span_s / h) as usize;
        let integrand = |t_s: f64| {
            let (x, v) = orbit(t_s);
            let attos = seconds_f64_to_attos(first_tdb_s + t_s);
            let earth = ephemeris.state_m(Body::Earth, Body::Moon, attos).unwrap();
            let sun = ephemeris.state_m(Body::Sun, Body::Moon, attos).unwrap();
            let v2: f64 = v.iter().map(|c| c * c).sum();
            -(0.5 * v2
                + moon_potential_apart(&x, first_tdb_s + t_s)
                + tide_apart(GM_EARTH_DE440_M3_S2, &earth.position_m, &x)
                + tide_apart(GM_SUN_M3_S2, &sun.position_m, &x))
                / SPEED_OF_LIGHT_SQUARED_M2_S2
        };
        let mut sum = integrand(0.0) + integrand(span_s);
        for k in 1..steps {
            sum += if k % 2 == 1 { 4.0 } else { 2.0 } * integrand(k as f64 * h);
        }
        let simpson = sum * h / 3.0;
        let ours = series.summary.accumulated_s;
        println!("day {day}: ours {ours:e} s, independent {simpson:e} s");
        assert!((ours - simpson).abs() < 5e-15, "{ours:e} vs {simpson:e}");
    }
}

/// Re-expressing against another scale moves the difference into `reference_part_s` and
/// keeps tau - ref = parts + reference part (definition; a clock that keeps TCL, measured
/// against a scale running slow by L, gains L per second).
#[test]
fn relative_to_moves_the_scale_difference_into_its_own_part() {
    let first_tdb_s = 0.0;
    let (_, env) = environment(first_tdb_s, 7200.0);
    let epochs: Vec<f64> = (0..=120).map(|k| f64::from(k) * 60.0).collect();
    let series = integrate_lunar_proper_time(
        &circular(1_837_400.0, 0.3),
        &epochs,
        |t_s| env.at(first_tdb_s + t_s),
        LunarGravityModel::J2,
        &ProperTimeOptions::default(),
    )
    .unwrap();
    let slow = 3.1e-11;
    let reference: Vec<f64> = epochs.iter().map(|t| t * slow).collect();
    let moved = series.relative_to(&reference).unwrap();
    let last = moved.samples.last().unwrap();
    assert_eq!(last.reference_part_s, slow * 7200.0);
    assert_eq!(
        last.tau_minus_t_s,
        series.summary.accumulated_s + slow * 7200.0
    );
    let expected = (series.summary.accumulated_s + slow * 7200.0) / (7200.0 * (1.0 - slow));
    assert!((moved.summary.mean_rate - expected).abs() < 1e-24);
    assert!(series.relative_to(&reference[1..]).is_none());
}

#[test]
fn pole_points_near_the_ecliptic_pole() {
    // The lunar pole lies about 1.5 degrees from the ecliptic pole (Cassini's laws, common
    // practice): ecliptic pole (0, -sin 23.44 deg, cos 23.44 deg) in ICRF axes.
    let pole = LunarAxes::at_tdb_s(0.0).pole;
    let eps = 23.439_f64.to_radians();
    let cos_angle = -pole[1] * eps.sin() + pole[2] * eps.cos();
    let angle_deg = cos_angle.acos().to_degrees();
    assert!((1.3..1.8).contains(&angle_deg), "{angle_deg}");
}

/// C22 on a 100 km polar orbit whose plane holds the pole and the prime meridian: the
/// sectoral term 3 GM C22 R^2 (x^2 - y^2) / r^5 averages over one revolution to
/// 1.5 GM C22 R^2 / a^3 (Kaula 1966 eq. 1.31; the orbit average, common practice), so the
/// degree-2 field's mean rate lies -1.5 GM C22 R^2 / (a^3 c^2) = -8.9e-16 below the zonal J2
/// field's, within 1 % (the Moon turns by 0.019 rad during the revolution).
#[test]
fn c22_moves_a_polar_orbit_by_its_orbit_average() {
    let a_m = 1_837_400.0;
    let first_tdb_s = 9_000.0 * 86_400.0;
    let n = (GM_MOON_M3_S2 / (a_m * a_m * a_m)).sqrt();
    let period_s = std::f64::consts::TAU / n;
    let axes = LunarAxes::at_tdb_s(first_tdb_s);
    let (x_hat, pole) = (axes.x_axis, axes.pole);
    let orbit = move |t_s: f64| {
        let (s, c) = (n * t_s).sin_cos();
        (
            [0, 1, 2].map(|i| a_m * (c * x_hat[i] + s * pole[i])),
            [0, 1, 2].map(|i| a_m * n * (-s * x_hat[i] + c * pole[i])),
        )
    };
    let (_, env) = environment(first_tdb_s, period_s);
    let epochs: Vec<f64> = (0..=100).map(|k| f64::from(k) * period_s / 100.0).collect();
    let rate = |model| {
        integrate_lunar_proper_time(
            &orbit,
            &epochs,
            |t_s| env.at(first_tdb_s + t_s),
            model,
            &ProperTimeOptions::default(),
        )
        .unwrap()
        .summary
        .mean_rate
    };
    let difference = rate(LunarGravityModel::GrailDegree2) - rate(LunarGravityModel::J2);
    let expected = -1.5 * GM_MOON_M3_S2 * GL0660B_C22 * GL0660B_REFERENCE_RADIUS_M.powi(2)
        / a_m.powi(3)
        / SPEED_OF_LIGHT_SQUARED_M2_S2;
    println!("C22 on a polar orbit: {difference:e} (orbit average {expected:e})");
    assert!((expected + 8.9e-16).abs() < 1e-17, "{expected:e}");
    assert!(
        (difference - expected).abs() < 0.01 * expected.abs(),
        "{difference:e} vs {expected:e}"
    );
}
