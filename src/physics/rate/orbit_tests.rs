use super::*;
use crate::physics::constants::{GM_EARTH_GPS_M3_S2, W0_M2_S2};
use crate::physics::rate::state::{state_rate, Frame, StateVector};
use crate::physics::rate::{fractional_to_microseconds_per_day, RateParts};

const GPS_A_M: f64 = 26_561_750.0; // IS-GPS-200: nominal semi-major axis

fn circular(a_m: f64) -> KeplerianOrbit {
    KeplerianOrbit {
        semi_major_axis_m: a_m,
        eccentricity: 0.0,
        anomaly: None,
    }
}

fn tt_total(a_m: f64) -> f64 {
    orbit_rate(&circular(a_m), RateReference::Tt, GravityModel::PointMass)
        .unwrap()
        .mean
        .total()
}

#[test]
fn navigation_orbit_parts_in_microseconds_per_day() {
    let parts = keplerian_mean_rate_parts(GM_EARTH_GPS_M3_S2, GPS_A_M, RateReference::Tt);
    let us = parts.to_microseconds_per_day();
    // IS-GPS-200 / common practice: velocity part about -7.2 us/day.
    assert!((us.sr + 7.2).abs() < 0.05, "sr {}", us.sr);
    // IS-GPS-200 / common practice: gravity part about +45.7 us/day (measured 45.79).
    assert!((us.gr - 45.7).abs() < 0.1, "gr {}", us.gr);
    // IS-GPS-200 / common practice: total about +38.6 us/day.
    assert!((us.total - 38.6).abs() < 0.05, "total {}", us.total);
    // IS-GPS-200 3.3.1.1 (10.23 MHz -> 10.22999999543 MHz): fractional +4.4647e-10.
    assert!(
        (parts.total() - 4.4647e-10).abs() < 0.00005e-10,
        "{}",
        parts.total()
    );
}

#[test]
fn gm_choice_does_not_matter_at_the_quoted_digits() {
    // IERS Conventions (2010) table 1.1 GM vs the IS-GPS-200 mu: 1.5e-7 relative, so the total
    // moves by under 1e-16 (1.5 GM/a * 1.5e-7 / c^2).
    let iers = tt_total(GPS_A_M);
    let gps = keplerian_mean_rate_parts(GM_EARTH_GPS_M3_S2, GPS_A_M, RateReference::Tt).total();
    assert!((iers - gps).abs() < 1e-16, "{}", iers - gps);
}

#[test]
fn relativistic_correction_constant_f() {
    // IS-GPS-200 20.3.3.3.3.1: F = -2 sqrt(mu)/c^2 = -4.442807633e-10 s/m^0.5.
    let f = relativistic_correction_constant_s_per_sqrt_m(GM_EARTH_GPS_M3_S2);
    assert!((f + 4.442_807_633e-10).abs() < 1e-19, "{f:e}");
}

#[test]
fn periodic_amplitude_for_e_001_is_about_23_ns() {
    // IS-GPS-200 formula |F| e sqrt(A); common practice: about 23 ns for e = 0.01.
    let amplitude = periodic_amplitude_s(GM_EARTH_GPS_M3_S2, GPS_A_M, 0.01);
    assert!((amplitude - 23.0e-9).abs() < 0.5e-9, "{amplitude:e}");
    let f = relativistic_correction_constant_s_per_sqrt_m(GM_EARTH_GPS_M3_S2);
    assert!((amplitude + f * 0.01 * GPS_A_M.sqrt()).abs() < 1e-22);
}

#[test]
fn low_orbit_is_slow_and_medium_and_geostationary_orbits_are_fast() {
    // Common practice: a 400 km orbit loses about 25 us/day against TT; navigation and
    // geostationary orbits gain (IS-GPS-200 for MEO; GEO a = 42 164 km, common practice).
    let leo = fractional_to_microseconds_per_day(tt_total(6_778_137.0));
    let meo = fractional_to_microseconds_per_day(tt_total(GPS_A_M));
    let geo = fractional_to_microseconds_per_day(tt_total(42_164_000.0));
    assert!(leo < -20.0 && leo > -30.0, "LEO {leo}");
    assert!(meo > 38.0 && geo > meo, "MEO {meo} GEO {geo}");
}

#[test]
fn break_even_altitude_is_about_3200_km() {
    // From the mean-rate formula: total = 0 when 3GM/(2a) = W0, a = 3GM/(2 W0)
    // (IERS Conventions (2010) table 1.1 values); common practice quotes ~3 200 km altitude.
    let a_m = 1.5 * GM_EARTH_M3_S2 / W0_M2_S2;
    assert!(tt_total(a_m).abs() < 1e-18, "{}", tt_total(a_m));
    assert!(tt_total(a_m - 1000.0) < 0.0 && tt_total(a_m + 1000.0) > 0.0);
    let altitude_km = (a_m - crate::physics::constants::EQUATORIAL_RADIUS_EARTH_M) / 1000.0;
    assert!((altitude_km - 3200.0).abs() < 100.0, "{altitude_km}");
}

/// Keplerian state (perifocal frame, perigee on +x) at eccentric anomaly E.
fn kepler_state(a: f64, e: f64, ecc_anomaly: f64) -> StateVector {
    let (sin_e, cos_e) = ecc_anomaly.sin_cos();
    let b = a * (1.0 - e * e).sqrt();
    let rate = (GM_EARTH_M3_S2 / a.powi(3)).sqrt() / (1.0 - e * cos_e);
    StateVector {
        frame: Frame::Gcrs,
        position_m: [a * (cos_e - e), b * sin_e, 0.0],
        velocity_m_s: [-a * sin_e * rate, b * cos_e * rate, 0.0],
    }
}

#[test]
fn time_average_of_state_rate_equals_mean_split() {
    // Ashby (2003) eq. (38): <v^2>/2 = GM/(2a), <U> = GM/a; checked by averaging the state rate
    // (IERS Conventions (2010) eq. 10.6) over uniform mean anomaly (Kepler's equation).
    let (a, e) = (20_000_000.0, 0.3);
    let samples = 2000;
    let (mut sr, mut gr) = (0.0, 0.0);
    for k in 0..samples {
        let mean_deg = 360.0 * k as f64 / samples as f64;
        let ecc = eccentric_anomaly_rad(Anomaly::MeanDeg(mean_deg), e).unwrap();
        let rate = state_rate(
            &kepler_state(a, e, ecc),
            RateReference::Tt,
            GravityModel::PointMass,
        )
        .unwrap();
        sr += rate.parts.sr / samples as f64;
        gr += rate.parts.gr / samples as f64;
    }
    let mean: RateParts = keplerian_mean_rate_parts(GM_EARTH_M3_S2, a, RateReference::Tt);
    assert!((sr - mean.sr).abs() < 1e-20, "{sr:e} vs {:e}", mean.sr);
    assert!((gr - mean.gr).abs() < 1e-20, "{gr:e} vs {:e}", mean.gr);
}

#[test]
fn periodic_value_agrees_with_state_form_for_every_anomaly_kind() {
    // IS-GPS-200 20.3.3.3.3.1: F e sqrt(A) sin E = -2 r.v/c^2 (Ashby (2003) eq. (40)).
    let (a, e) = (26_561_750.0, 0.02);
    let ecc = 2.0f64;
    let state = kepler_state(a, e, ecc);
    let from_state = state_rate(&state, RateReference::Tcg, GravityModel::PointMass)
        .unwrap()
        .periodic_value_s;
    let nu =
        2.0 * ((1.0 + e).sqrt() * (ecc / 2.0).sin()).atan2((1.0 - e).sqrt() * (ecc / 2.0).cos());
    let mean = ecc - e * ecc.sin();
    for anomaly in [
        Anomaly::EccentricDeg(ecc.to_degrees()),
        Anomaly::TrueDeg(nu.to_degrees()),
        Anomaly::MeanDeg(mean.to_degrees() - 720.0),
    ] {
        let orbit = KeplerianOrbit {
            semi_major_axis_m: a,
            eccentricity: e,
            anomaly: Some(anomaly),
        };
        let rate = orbit_rate(&orbit, RateReference::Tcg, GravityModel::PointMass).unwrap();
        let value = rate.periodic.value_s.unwrap();
        assert!(
            (value - from_state).abs() < 1e-18,
            "{anomaly:?}: {value:e} vs {from_state:e}"
        );
    }
}

#[test]
fn kepler_solver_converges_for_high_eccentricity() {
    // Kepler's equation E - e sin E = M (residual below 1e-13 rad).
    for e in [0.0, 0.5, 0.9, 0.99, 0.999_999] {
        for mean_deg in [0.0, 1.0, 90.0, 179.9, 180.0, 300.0] {
            let ecc = eccentric_anomaly_rad(Anomaly::MeanDeg(mean_deg), e).unwrap();
            let residual = ecc - e * ecc.sin() - mean_deg.to_radians();
            assert!(residual.abs() < 1e-13, "e {e} M {mean_deg}: {residual:e}");
        }
    }
}

#[test]
fn bad_orbits_name_the_field() {
    // Input validation (bounds documented on orbit_rate; common practice).
    let good = KeplerianOrbit {
        semi_major_axis_m: GPS_A_M,
        eccentricity: 0.01,
        anomaly: None,
    };
    let cases = [
        (
            KeplerianOrbit {
                semi_major_axis_m: -1.0,
                ..good
            },
            "semi_major_axis_m",
        ),
        (
            KeplerianOrbit {
                semi_major_axis_m: 0.0,
                ..good
            },
            "semi_major_axis_m",
        ),
        (
            KeplerianOrbit {
                semi_major_axis_m: f64::NAN,
                ..good
            },
            "semi_major_axis_m",
        ),
        (
            KeplerianOrbit {
                semi_major_axis_m: 6.0e6,
                ..good
            },
            "semi_major_axis_m",
        ),
        (
            KeplerianOrbit {
                eccentricity: 1.0,
                ..good
            },
            "eccentricity",
        ),
        (
            KeplerianOrbit {
                eccentricity: -0.1,
                ..good
            },
            "eccentricity",
        ),
        (
            KeplerianOrbit {
                eccentricity: 0.8,
                ..good
            },
            "eccentricity",
        ),
        (
            KeplerianOrbit {
                anomaly: Some(Anomaly::TrueDeg(f64::INFINITY)),
                ..good
            },
            "true_anomaly_deg",
        ),
        (
            KeplerianOrbit {
                anomaly: Some(Anomaly::MeanDeg(f64::NAN)),
                ..good
            },
            "mean_anomaly_deg",
        ),
    ];
    for (orbit, field) in cases {
        let err = orbit_rate(&orbit, RateReference::Tt, GravityModel::PointMass).unwrap_err();
        assert_eq!(err.field, field, "{err}");
    }
    let err = orbit_rate(&good, RateReference::Tt, GravityModel::Grs80).unwrap_err();
    assert_eq!(err.field, "gravity_model");
    assert_eq!(err.code(), "unsupported_gravity_model");
    // Stable codes (the HTTP layer answers them).
    let code = |orbit: KeplerianOrbit| {
        orbit_rate(&orbit, RateReference::Tt, GravityModel::PointMass)
            .unwrap_err()
            .code()
    };
    let with_a = |semi_major_axis_m| KeplerianOrbit {
        semi_major_axis_m,
        ..good
    };
    let with_e = |eccentricity| KeplerianOrbit {
        eccentricity,
        ..good
    };
    assert_eq!(code(with_a(0.0)), "invalid_semi_major_axis");
    assert_eq!(code(with_a(-5.0e6)), "invalid_semi_major_axis");
    assert_eq!(code(with_a(6.0e6)), "below_surface");
    assert_eq!(code(with_a(2.0e9)), "beyond_model_range");
    assert_eq!(code(with_e(1.0)), "invalid_eccentricity");
    assert_eq!(code(with_e(0.8)), "below_surface");
    assert_eq!(code(with_a(f64::NAN)), "not_finite");
}
