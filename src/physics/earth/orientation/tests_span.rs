use super::*;
use crate::physics::earth::orientation::{earth_orientation, CelestialPoleOffsets};

const SECOND: i128 = 1_000_000_000_000_000_000;
/// 2026-05-20T00:00:00 TT, seconds since J2000.0.
const START_TT_S: i128 = 832_593_600;

/// Invented but realistic EOP, varying in time (UT1 - TT drifting by a 1.2 ms length of day,
/// a moving pole, offsets of 0.2 mas): linear, so the span's interpolation of the parameters
/// is exact and only the orientation model is compared.
fn eop_at(t_s: f64) -> EopAtEpoch {
    let day = t_s / 86_400.0;
    let mas = 4.848_136_811_095_36e-9;
    EopAtEpoch {
        ut1_minus_tt_s: -69.1 - 1.2e-3 * day,
        xp_rad: (150.0 + 0.8 * day) * mas,
        yp_rad: (420.0 - 0.5 * day) * mas,
        dx_rad: 0.2 * mas,
        dy_rad: -0.15 * mas,
    }
}

fn span(span_s: f64) -> OrientationSpan {
    let start = START_TT_S * SECOND;
    OrientationSpan::new(start, span_s, |tt_attos| {
        Ok::<_, ()>(eop_at(((tt_attos - start) as f64) / 1e18))
    })
    .unwrap()
}

/// The full-series orientation (ERFA's algorithms, checked against pyerfa to 1e-12 rad in
/// tests_reference) at `t_s` seconds after the start.
fn full_at(t_s: f64) -> crate::physics::earth::orientation::EarthOrientation {
    let tt_attos = START_TT_S * SECOND + seconds_f64_to_attos(t_s);
    let eop = eop_at(t_s);
    let tt = JulianDate::from_count_attos_since_j2000(tt_attos);
    let ut1 = JulianDate::from_count_attos_since_j2000(
        tt_attos + seconds_f64_to_attos(eop.ut1_minus_tt_s),
    );
    earth_orientation(
        tt,
        ut1,
        eop.xp_rad,
        eop.yp_rad,
        Some(CelestialPoleOffsets {
            dx_rad: eop.dx_rad,
            dy_rad: eop.dy_rad,
        }),
    )
}

/// Positions: the span against the full IAU 2006/2000A series at the same epoch (IERS
/// Conventions (2010) eq. 5.1; ERFA `eraC2t06a` with dX, dY through `eraC2ixys`), at epochs
/// spread over three days including nodes and mid-intervals: at most 1e-12 rad.
#[test]
fn positions_agree_with_the_full_series() {
    let span = span(3.0 * 86_400.0);
    let r_itrs = [4_510_731.0, 4_510_731.0, 0.0];
    let mut worst_rad: f64 = 0.0;
    for k in 0..=400 {
        let t_s = k as f64 * 648.37;
        let (r, _) = span.itrs_to_gcrs(t_s, &r_itrs, &[0.0; 3]);
        let reference = full_at(t_s).itrs_to_gcrs_position_m(&r_itrs);
        let d = (0..3).map(|i| (r[i] - reference[i]).powi(2)).sum::<f64>();
        worst_rad = worst_rad.max(d.sqrt() / 6_378_137.0);
    }
    println!("span vs full series, positions: worst {worst_rad:.2e} rad");
    assert!(worst_rad <= 1e-12, "{worst_rad:e}");
}

/// Velocities: the span's derivative against a central difference (h = 0.5 s) of the full
/// series' positions of a point moving uniformly in the ITRS, at a navigation-orbit radius.
/// Measured: 1.5e-5 m/s worst; the difference formula's truncation error is h^2 (r w^3 +
/// 3 v w^2) / 6 = 2.7e-6 m/s, and with h = 0.1 s the worst grows to 4.1e-5 m/s, so the rest is
/// the reference's own rounding noise (about 1e-5 m of position noise at 2.7e7 m, 4e-13
/// relative) rather than the span. Bound: 5e-5 m/s (below 1e-18 in the rate of a navigation
/// clock). The one-epoch velocity (`EarthOrientation::itrs_to_gcrs_velocity_m_s`, which has
/// the precession-nutation rate but no length-of-day or polar-motion rate) is off by 2.8e-4
/// m/s here: the point drifts out to 2e8 m, where the 1.2 ms length of day (1.4e-8 of the
/// Earth's rotation) is worth that much; before it had dQ/dt it was off by 1.0e-3 m/s. The
/// span keeps all three rates.
#[test]
fn velocities_are_the_derivative_of_the_full_series() {
    let span = span(86_400.0);
    let r0 = [15_600_000.0, 7_540_000.0, 20_140_000.0];
    let v = [-2_000.0, 2_800.0, 500.0];
    let h = 0.5;
    let (mut worst, mut worst_without_rate): (f64, f64) = (0.0, 0.0);
    for k in 1..40 {
        let t_s = k as f64 * 2_111.7;
        let at = |dt: f64| [0, 1, 2].map(|i| r0[i] + v[i] * (t_s + dt));
        let plus = full_at(t_s + h).itrs_to_gcrs_position_m(&at(h));
        let minus = full_at(t_s - h).itrs_to_gcrs_position_m(&at(-h));
        let numeric = [0, 1, 2].map(|i| (plus[i] - minus[i]) / (2.0 * h));
        let (_, velocity) = span.itrs_to_gcrs(t_s, &at(0.0), &v);
        let without_rate = full_at(t_s).itrs_to_gcrs_velocity_m_s(&at(0.0), &v);
        let distance = |a: [f64; 3]| {
            (0..3)
                .map(|i| (a[i] - numeric[i]).powi(2))
                .sum::<f64>()
                .sqrt()
        };
        worst = worst.max(distance(velocity));
        worst_without_rate = worst_without_rate.max(distance(without_rate));
    }
    println!(
        "span velocity vs numerical derivative: worst {worst:.2e} m/s (one-epoch velocity, no length-of-day rate: {worst_without_rate:.2e} m/s)"
    );
    assert!(worst < 5e-5, "{worst:e}");
    assert!(worst_without_rate > 10.0 * worst, "{worst_without_rate:e}");
}

/// The pole of the span is the CIP of the full series (X, Y with dX, dY; IERS Conventions
/// (2010) sec. 5.4.4): within 1e-12 rad.
#[test]
fn pole_is_the_cip() {
    let span = span(86_400.0);
    for t_s in [0.0, 1_234.5, 86_400.0] {
        let full = full_at(t_s);
        let (x, y) = (full.x_rad, full.y_rad);
        let cip = [x, y, (1.0 - x * x - y * y).sqrt()];
        let pole = span.pole_gcrs(t_s);
        for i in 0..3 {
            assert!((pole[i] - cip[i]).abs() < 1e-12, "{t_s}: {pole:?} {cip:?}");
        }
    }
}

/// Long spans keep at most MAX_INTERVALS intervals, and an error of the EOP source is returned.
#[test]
fn long_spans_and_errors() {
    let year =
        OrientationSpan::new(0, 365.25 * 86_400.0, |_| Ok::<_, ()>(EopAtEpoch::default())).unwrap();
    assert!((year.step_s() - 1_577.88).abs() < 1e-9, "{}", year.step_s());
    let mut calls = 0;
    let failed = OrientationSpan::new(0, 3_600.0, |_| {
        calls += 1;
        if calls == 3 {
            Err("outside")
        } else {
            Ok(EopAtEpoch::default())
        }
    });
    assert_eq!(failed.err(), Some("outside"));
}

/// The incremental sin/cos of the Earth rotation angle against `sin_cos` of the sum (the
/// angle-addition identity, Abramowitz & Stegun 4.3.16-17), the reference's rounding of the
/// sum compensated: within 3e-16 over the whole series range and at every quadrant; beyond it
/// the sum is evaluated directly.
#[test]
fn incremental_sin_cos_of_the_rotation_angle() {
    let mut worst: f64 = 0.0;
    for i in 0..=64 {
        let angle = i as f64 * 0.098_174_77;
        let (sin, cos) = angle.sin_cos();
        for j in -100..=100 {
            let delta = j as f64 * SERIES_STEP_MAX_RAD / 100.0;
            let (s, c) = turn_sin_cos(angle, sin, cos, delta);
            // The rounded sum misses `error` (Fast2Sum, exact for |angle| >= |delta|;
            // Dekker 1971), up to 4.4e-16 rad near 2 pi: put it back to first order.
            let sum = angle + delta;
            let error = if angle.abs() >= delta.abs() {
                (angle - sum) + delta
            } else {
                (delta - sum) + angle
            };
            let (s_sum, c_sum) = sum.sin_cos();
            let (s_ref, c_ref) = (s_sum + c_sum * error, c_sum - s_sum * error);
            worst = worst.max((s - s_ref).abs()).max((c - c_ref).abs());
        }
    }
    println!("incremental sin/cos: worst {worst:.2e}");
    assert!(worst <= 3e-16, "{worst:e}");
    let (s, c) = turn_sin_cos(1.0, 1f64.sin(), 1f64.cos(), 0.5);
    assert_eq!((s, c), 1.5f64.sin_cos());
}
