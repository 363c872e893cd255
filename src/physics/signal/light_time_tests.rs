use super::*;
use crate::physics::constants::{
    EARTH_ROTATION_RAD_S, GM_EARTH_GPS_M3_S2, GRS80_SEMI_MAJOR_AXIS_M, SPEED_OF_LIGHT_SQUARED_M2_S2,
};
use crate::physics::signal::formulas::sagnac_rotating_frame_s;

const NAV_RADIUS_M: f64 = 26_561_750.0;
const GROUND_M: [f64; 3] = [GRS80_SEMI_MAJOR_AXIS_M, 0.0, 0.0];

fn path(frame: Frame, transmitter: Endpoint, receiver: [f64; 3]) -> SignalPath {
    let geometry = PathGeometry {
        frame,
        transmitter,
        transmitter_motion: TransmitterMotion::Uniform,
        receiver: Endpoint {
            position_m: receiver,
            velocity_m_s: None,
        },
    };
    signal_path(&geometry).unwrap()
}

fn at_rest(position_m: [f64; 3]) -> Endpoint {
    Endpoint {
        position_m,
        velocity_m_s: None,
    }
}

fn equatorial_m(radius_m: f64, longitude_deg: f64) -> [f64; 3] {
    let (sin, cos) = longitude_deg.to_radians().sin_cos();
    [radius_m * cos, radius_m * sin, 0.0]
}

#[test]
fn shapiro_delay_navigation_satellite_zenith_and_horizon() {
    // IERS Conventions (2010) ch. 11 eq. 11.17 (from memory): 13 mm at zenith and 19 mm
    // near the horizon for r = 26 561.75 km seen from the ground.
    let zenith = path(Frame::Gcrs, at_rest([NAV_RADIUS_M, 0.0, 0.0]), GROUND_M);
    let zenith_mm = zenith.shapiro_s * SPEED_OF_LIGHT_M_S * 1e3;
    assert!((12.5..13.5).contains(&zenith_mm), "zenith {zenith_mm} mm");
    // Hand value at zenith: (2GM/c^2) ln(r_S / r_R) = 8.8700 mm * ln(4.16451) = 12.654 mm.
    let hand_mm = 2.0 * GM_EARTH_M3_S2 / SPEED_OF_LIGHT_SQUARED_M2_S2
        * (NAV_RADIUS_M / GRS80_SEMI_MAJOR_AXIS_M).ln()
        * 1e3;
    assert!(
        (zenith_mm - hand_mm).abs() < 1e-9,
        "{zenith_mm} vs {hand_mm}"
    );
    let horizon_y = (NAV_RADIUS_M.powi(2) - GRS80_SEMI_MAJOR_AXIS_M.powi(2)).sqrt();
    let horizon = path(
        Frame::Gcrs,
        at_rest([GRS80_SEMI_MAJOR_AXIS_M, horizon_y, 0.0]),
        GROUND_M,
    );
    let horizon_mm = horizon.shapiro_s * SPEED_OF_LIGHT_M_S * 1e3;
    assert!(
        (18.0..19.5).contains(&horizon_mm),
        "horizon {horizon_mm} mm"
    );
    // GCRS input: no Sagnac term, and the parts add up to the light time.
    assert_eq!(zenith.sagnac_s, 0.0);
    assert!(
        (zenith.geometric_range_m / SPEED_OF_LIGHT_M_S + zenith.shapiro_s - zenith.light_time_s)
            .abs()
            < 1e-16
    );
}

#[test]
fn uniformly_receding_transmitter_has_closed_form_light_time() {
    // Light-time equation (IERS Conventions (2010) ch. 11) with x_T(t_T) = x_T - v tau, v along
    // the line of sight away from the receiver: tau = (rho_0/c + S)/(1 - v/c), S the Shapiro delay
    // at the converged geometry (elementary algebra).
    let speed_m_s = 3_900.0;
    let transmitter = Endpoint {
        position_m: [NAV_RADIUS_M, 0.0, 0.0],
        velocity_m_s: Some([-speed_m_s, 0.0, 0.0]),
    };
    let result = path(Frame::Gcrs, transmitter, GROUND_M);
    let rho0_m = NAV_RADIUS_M - GRS80_SEMI_MAJOR_AXIS_M;
    let expected_s =
        (rho0_m / SPEED_OF_LIGHT_M_S + result.shapiro_s) / (1.0 - speed_m_s / SPEED_OF_LIGHT_M_S);
    assert!(
        (result.light_time_s - expected_s).abs() < 2e-15,
        "{} vs {expected_s}",
        result.light_time_s
    );
    // Convergence: each iteration shrinks the error by v/c = 1.3e-5 (common practice): <= 5.
    assert!(result.iterations <= 5, "{} iterations", result.iterations);
}

/// Light time between two points fixed on the Earth in the equatorial plane, solved by
/// bisection of tau = sqrt(r_T^2 + r_R^2 - 2 r_T r_R cos(lambda_T - omega tau))/c + S: the
/// transmitter (at longitude lambda_T, receiver at 0) has turned by omega tau less at emission.
fn equatorial_bisection_s(r_t: f64, lambda_t_rad: f64, r_r: f64) -> f64 {
    let range = |tau: f64| {
        (r_t * r_t + r_r * r_r
            - 2.0 * r_t * r_r * (lambda_t_rad - EARTH_ROTATION_RAD_S * tau).cos())
        .sqrt()
    };
    let residual = |tau: f64| {
        let rho = range(tau);
        tau - rho / SPEED_OF_LIGHT_M_S - shapiro_delay_s(GM_EARTH_M3_S2, r_t, r_r, rho).unwrap()
    };
    let (mut low, mut high) = (0.0_f64, 1.0_f64);
    for _ in 0..200 {
        let middle = 0.5 * (low + high);
        if residual(middle) > 0.0 {
            high = middle;
        } else {
            low = middle;
        }
    }
    0.5 * (low + high)
}

#[test]
fn earth_fixed_transmitter_matches_independent_bisection_and_sagnac_sign() {
    // Independent solution (law of cosines + bisection) of the light-time equation in the
    // non-rotating frame (IS-GPS-200 20.3.3.4.3.3.2 rotation of the emission position).
    for longitude_deg in [-70.0, -30.0, 0.0, 30.0, 70.0] {
        let transmitter_m = equatorial_m(NAV_RADIUS_M, longitude_deg);
        let result = path(Frame::Itrf, at_rest(transmitter_m), GROUND_M);
        let expected_s = equatorial_bisection_s(
            NAV_RADIUS_M,
            longitude_deg.to_radians(),
            GRS80_SEMI_MAJOR_AXIS_M,
        );
        assert!(
            (result.light_time_s - expected_s).abs() < 1e-15,
            "{longitude_deg}: {} vs {expected_s}",
            result.light_time_s
        );
        // Sign convention (IS-GPS-200 20.3.3.4.3.3.2; Ashby 2003 eq. 26): a westward signal
        // (transmitter east of the receiver) arrives early, an eastward one late; the exact term
        // agrees with (omega/c^2)(x_T y_R - y_T x_R) to second order in omega tau (< 1 mm here).
        let first_order_s = sagnac_rotating_frame_s(transmitter_m, GROUND_M);
        let sagnac_m = result.sagnac_s * SPEED_OF_LIGHT_M_S;
        assert!(
            (sagnac_m - first_order_s * SPEED_OF_LIGHT_M_S).abs() < 1e-3,
            "{longitude_deg}: {sagnac_m} vs {}",
            first_order_s * SPEED_OF_LIGHT_M_S
        );
        let sum_s =
            result.geometric_range_m / SPEED_OF_LIGHT_M_S + result.sagnac_s + result.shapiro_s;
        // Rounding only: a few ulp of 0.07 s (1.4e-17 s) and of the ranges (3.7e-9 m).
        assert!(
            (sum_s - result.light_time_s).abs() < 1e-16,
            "{}",
            sum_s - result.light_time_s
        );
        if longitude_deg > 0.0 {
            assert!(sagnac_m < -1.0, "{longitude_deg}: {sagnac_m}");
        } else if longitude_deg < 0.0 {
            assert!(sagnac_m > 1.0, "{longitude_deg}: {sagnac_m}");
        } else {
            // Zenith: the first-order term is 0; the second-order rest is
            // r_T r_R (omega tau)^2 / (2 rho) = 0.10 mm (hand value, law of cosines).
            assert!(sagnac_m.abs() < 2e-4 && sagnac_m > 0.0, "zenith {sagnac_m}");
        }
    }
}

#[test]
fn sagnac_of_a_navigation_satellite_on_the_horizon_is_about_40_m() {
    // Hand value: on the equatorial horizon cos(dl) = r_R/r_S, and
    // (omega/c) r_S r_R sin(dl) = 7.292115e-5/299792458 * 26561750 * 6378137 * 0.97076 = 40.0 m
    // (formula of IS-GPS-200 20.3.3.4.3.3.2; common practice: "up to about 40 m").
    let horizon_deg = (GRS80_SEMI_MAJOR_AXIS_M / NAV_RADIUS_M).acos().to_degrees();
    let result = path(
        Frame::Itrf,
        at_rest(equatorial_m(NAV_RADIUS_M, -horizon_deg)),
        GROUND_M,
    );
    let sagnac_m = result.sagnac_s * SPEED_OF_LIGHT_M_S;
    let hand_m = EARTH_ROTATION_RAD_S / SPEED_OF_LIGHT_M_S
        * NAV_RADIUS_M
        * GRS80_SEMI_MAJOR_AXIS_M
        * horizon_deg.to_radians().sin();
    assert!((39.5..40.5).contains(&hand_m), "{hand_m}");
    assert!((sagnac_m - hand_m).abs() < 1e-3, "{sagnac_m} vs {hand_m}");
}

#[test]
fn moving_navigation_satellite_in_itrf_converges_fast() {
    // Common practice: the GNSS light-time iteration converges in 2-4 steps; MEO light time
    // is 0.067 s (zenith) to 0.086 s (horizon).
    let transmitter = Endpoint {
        position_m: [15_600_000.0, 7_540_000.0, 20_140_000.0],
        velocity_m_s: Some([-2_000.0, 2_800.0, 500.0]),
    };
    let receiver = [4_027_894.0, 307_045.0, 4_919_474.9];
    let result = path(Frame::Itrf, transmitter, receiver);
    assert!(result.iterations <= 5, "{}", result.iterations);
    assert!(
        (0.067..0.086).contains(&result.light_time_s),
        "{}",
        result.light_time_s
    );
}

#[test]
fn clock_term_matches_the_broadcast_relativistic_correction() {
    // IS-GPS-200 20.3.3.3.3.1: dt_r = F e sqrt(A) sin(E_k), F = -4.442807633e-10 s/m^0.5.
    // State at E = 90 deg of an orbit a = 26 561.75 km, e = 0.01 (GM of IS-GPS-200):
    // r = (-a e, a sqrt(1 - e^2), 0), v = (-a n, 0, 0). dt_r = -22.90 ns. The uniform motion back to
    // emission changes r.v by v^2 tau (2.3e-11 s after scaling), hence the 1e-10 s tolerance.
    let (a, e) = (NAV_RADIUS_M, 0.01_f64);
    let n = (GM_EARTH_GPS_M3_S2 / a.powi(3)).sqrt();
    let position_m = [-a * e, a * (1.0 - e * e).sqrt(), 0.0];
    let transmitter = Endpoint {
        position_m,
        velocity_m_s: Some([-a * n, 0.0, 0.0]),
    };
    let unit = 1.0 / norm(position_m);
    let receiver = position_m.map(|c| c * unit * GRS80_SEMI_MAJOR_AXIS_M);
    let result = path(Frame::Gcrs, transmitter, receiver);
    let broadcast_s = -4.442_807_633e-10 * e * a.sqrt();
    let clock_s = result.clock_periodic_s.unwrap();
    assert!(
        (clock_s - broadcast_s).abs() < 1e-10,
        "{clock_s} vs {broadcast_s}"
    );
    assert!((broadcast_s + 22.9e-9).abs() < 0.05e-9);
    // Without a velocity there is no clock term.
    assert!(path(Frame::Gcrs, at_rest(position_m), receiver)
        .clock_periodic_s
        .is_none());
}

fn error_of(frame: Frame, transmitter: Endpoint, receiver: Endpoint) -> SignalError {
    signal_path(&PathGeometry {
        frame,
        transmitter,
        transmitter_motion: TransmitterMotion::Uniform,
        receiver,
    })
    .unwrap_err()
}

#[test]
fn bad_geometries_name_the_field() {
    // Input validation (common practice); bounds documented on `signal_path`.
    let satellite = at_rest([NAV_RADIUS_M, 0.0, 0.0]);
    let ground = at_rest(GROUND_M);
    let cases = [
        (
            Frame::Gcrs,
            satellite,
            at_rest([6.0e6, 0.0, 0.0]),
            "inside_earth",
            "receiver.position_m",
        ),
        (
            Frame::Itrf,
            at_rest([0.0, 0.0, 6.3e6]),
            ground,
            "inside_earth",
            "transmitter.position_m",
        ),
        (
            Frame::Gcrs,
            satellite,
            satellite,
            "coincident_endpoints",
            "receiver.position_m",
        ),
        (
            Frame::Gcrs,
            at_rest([2.0e9, 0.0, 0.0]),
            ground,
            "beyond_range",
            "transmitter.position_m",
        ),
        (
            Frame::Gcrs,
            at_rest([f64::NAN, 0.0, 0.0]),
            ground,
            "not_finite",
            "transmitter.position_m",
        ),
        (
            Frame::Gcrs,
            at_rest([-NAV_RADIUS_M, 0.0, 0.0]),
            ground,
            "path_through_earth",
            "receiver.position_m",
        ),
        (
            Frame::Gcrs,
            Endpoint {
                velocity_m_s: Some([0.0, SPEED_OF_LIGHT_M_S, 0.0]),
                ..satellite
            },
            ground,
            "speed_not_below_c",
            "transmitter.velocity_m_s",
        ),
        (
            Frame::Itrf,
            satellite,
            Endpoint {
                velocity_m_s: Some([0.0, SPEED_OF_LIGHT_M_S - 100.0, 0.0]),
                ..ground
            },
            "speed_not_below_c",
            "receiver.velocity_m_s",
        ),
        (
            Frame::Gcrs,
            Endpoint {
                velocity_m_s: Some([-0.99 * SPEED_OF_LIGHT_M_S, 0.0, 0.0]),
                ..satellite
            },
            ground,
            "no_convergence",
            "transmitter.velocity_m_s",
        ),
    ];
    for (frame, transmitter, receiver, code, field) in cases {
        let error = error_of(frame, transmitter, receiver);
        assert_eq!((error.code, error.field.as_str()), (code, field), "{error}");
    }
}
