//! The fast path against the full series, and the vector rotations.

use super::fast::{celestial_pole_fast, FIRST_INTERVAL_START_DAYS, INTERVAL_COUNT, INTERVAL_DAYS};
use super::matrix::apply;
use super::rotation::EARTH_ROTATION_RATE_RAD_S;
use super::{celestial_pole_series, earth_orientation, JulianDate, J2000_JD};

/// A small deterministic generator (SplitMix64, Steele, Lea & Flood 2014) for test epochs.
fn splitmix(state: &mut u64) -> f64 {
    *state = state.wrapping_add(0x9E37_79B9_7F4A_7C15);
    let mut z = *state;
    z = (z ^ (z >> 30)).wrapping_mul(0xBF58_476D_1CE4_E5B9);
    z = (z ^ (z >> 27)).wrapping_mul(0x94D0_49BB_1331_11EB);
    ((z ^ (z >> 31)) >> 11) as f64 / (1u64 << 53) as f64
}

fn worst_pole_difference(days: &[f64]) -> f64 {
    let mut worst = 0.0f64;
    for &d in days {
        let tt = JulianDate::new(J2000_JD, d);
        let full = celestial_pole_series(tt);
        let fast = celestial_pole_fast(tt);
        for (a, b) in [
            (full.x_rad, fast.x_rad),
            (full.y_rad, fast.y_rad),
            (full.s_rad, fast.s_rad),
            (full.eo_rad, fast.eo_rad),
        ] {
            worst = worst.max((a - b).abs());
        }
    }
    worst
}

/// X, Y, s, EO of the fits agree with the full series to 1e-12 rad (the task's target) at 300
/// random TT epochs 1962-2100 (days -13879 .. 36524 from J2000.0).
#[test]
fn fast_pole_matches_full_series_at_random_epochs() {
    let mut state = 2026;
    let days: Vec<f64> = (0..300)
        .map(|_| -13_879.0 + splitmix(&mut state) * 50_403.0)
        .collect();
    let worst = worst_pole_difference(&days);
    eprintln!("fast path: worst X/Y/s/EO difference from the full series {worst:.3e} rad");
    assert!(worst <= 1e-12, "{worst:e}");
}

/// Dense check across two whole intervals and their boundaries (where a fit is at its ends).
#[test]
fn fast_pole_matches_full_series_across_interval_boundaries() {
    let start = FIRST_INTERVAL_START_DAYS + 11_000.0 * INTERVAL_DAYS;
    let mut days: Vec<f64> = (0..=64)
        .map(|k| start + k as f64 * INTERVAL_DAYS / 32.0)
        .collect();
    days.extend([start - 1e-9, start + 1e-9, start + INTERVAL_DAYS - 1e-9]);
    let worst = worst_pole_difference(&days);
    assert!(worst <= 1e-12, "{worst:e}");
}

/// Outside the fitted span the fast path is the full series itself.
#[test]
fn fast_pole_outside_the_span_is_the_full_series() {
    let end = FIRST_INTERVAL_START_DAYS + INTERVAL_COUNT as f64 * INTERVAL_DAYS;
    for d in [FIRST_INTERVAL_START_DAYS - 10.0, end + 0.5] {
        let tt = JulianDate::new(J2000_JD, d);
        assert_eq!(celestial_pole_series(tt), celestial_pole_fast(tt));
    }
}

/// Positions: ITRS -> GCRS -> ITRS returns the vector (the matrix is a rotation), and the GCRS
/// velocity of a point fixed in the ITRS equals the central difference of its GCRS positions
/// 1 s apart within 1e-4 m/s (the definition of the velocity; the neglected precession-nutation
/// and polar-motion rates are below that at the surface).
#[test]
fn rotations_of_positions_and_velocities() {
    let tt = JulianDate::new(2_460_000.5, 0.25);
    let ut1 = JulianDate::new(2_460_000.5, 0.25 - 69.0 / 86_400.0);
    let (xp, yp) = (1.0e-6, 2.0e-6);
    let orientation = earth_orientation(tt, ut1, xp, yp, None);
    // An invented site near 46 N, 11 E on the surface.
    let r_itrs = [4_346_657.2, 860_661.3, 4_573_718.4];
    let r_gcrs = orientation.itrs_to_gcrs_position_m(&r_itrs);
    let back = orientation.gcrs_to_itrs_position_m(&r_gcrs);
    for k in 0..3 {
        assert!((back[k] - r_itrs[k]).abs() < 1e-8, "{k}");
    }
    let at = |ds: f64| {
        let shift = ds / 86_400.0;
        let o = earth_orientation(
            JulianDate::new(tt.jd1, tt.jd2 + shift),
            JulianDate::new(ut1.jd1, ut1.jd2 + shift),
            xp,
            yp,
            None,
        );
        apply(&o.itrs_to_gcrs_matrix(), &r_itrs)
    };
    let (plus, minus) = (at(1.0), at(-1.0));
    let v = orientation.itrs_to_gcrs_velocity_m_s(&r_itrs, &[0.0; 3]);
    for k in 0..3 {
        let difference = (plus[k] - minus[k]) / 2.0;
        assert!(
            (v[k] - difference).abs() < 1e-4,
            "{k}: {} vs {difference}",
            v[k]
        );
    }
    // The speed is omega times the distance from the rotation axis (~465 m/s at the equator).
    let speed = v.iter().map(|c| c * c).sum::<f64>().sqrt();
    let axis_distance = (r_itrs[0].powi(2) + r_itrs[1].powi(2)).sqrt();
    assert!((speed - EARTH_ROTATION_RATE_RAD_S * axis_distance).abs() < 1e-3);
    // And the inverse velocity map returns the ITRS velocity (zero here, plus a test drift).
    let v_itrs = [1.0, -2.0, 0.5];
    let v_gcrs = orientation.itrs_to_gcrs_velocity_m_s(&r_itrs, &v_itrs);
    let v_back = orientation.gcrs_to_itrs_velocity_m_s(&r_gcrs, &v_gcrs);
    for k in 0..3 {
        assert!((v_back[k] - v_itrs[k]).abs() < 1e-9, "{k}");
    }
}

/// ERFA's rate constant: 2 pi 1.00273781191135448 / 86400 = 7.292115146706979e-5 rad/s (the
/// value `OM` of ERFA's eraPvtob, evaluated; IERS Conventions (2010) eq. 5.15's derivative).
#[test]
fn earth_rotation_rate_is_erfa_value() {
    assert!((EARTH_ROTATION_RATE_RAD_S - 7.292_115_146_706_979e-5).abs() < 1e-18);
}
