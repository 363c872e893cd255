use super::*;
use crate::physics::constants::{GRS80_SEMI_MAJOR_AXIS_M, SPEED_OF_LIGHT_M_S};
use crate::physics::gravity::{earth_j2_potential_m2_s2, norm};
use crate::physics::proper_time::kepler::KeplerOrbit;
use crate::physics::proper_time::Trajectory;
use crate::physics::signal::light_time::{signal_path, Endpoint, PathGeometry};

/// An invented navigation-like orbit (not any real satellite): a = 26 560 km, e = 0.02,
/// i = 55 deg.
fn invented_orbit() -> KeplerOrbit {
    KeplerOrbit {
        gm_m3_s2: GM_EARTH_M3_S2,
        semi_major_axis_m: 26_560_000.0,
        eccentricity: 0.02,
        inclination_rad: 55f64.to_radians(),
        ascending_node_rad: 1.1,
        argument_of_perigee_rad: 0.4,
        mean_anomaly_at_zero_rad: 2.3,
    }
}

fn distance(a: [f64; 3], b: [f64; 3]) -> f64 {
    norm([a[0] - b[0], a[1] - b[1], a[2] - b[2]])
}

/// A receiver near the ground about 2000 km from the point under `satellite_m`, so that the
/// flight is oblique.
fn oblique_receiver(satellite_m: [f64; 3]) -> [f64; 3] {
    let scale = GRS80_SEMI_MAJOR_AXIS_M / norm(satellite_m);
    [
        satellite_m[0] * scale + 1.2e6,
        satellite_m[1] * scale - 1.0e6,
        satellite_m[2] * scale + 1.1e6,
    ]
}

#[test]
fn the_acceleration_is_the_gradient_of_the_j2_potential() {
    // IERS Conventions (2010) eq. 6.6 at degree 2 (earth_j2_potential_m2_s2), differentiated
    // numerically (central differences over +-30 m: truncation U''' h^2/6 below 2e-10 m/s^2,
    // rounding of U (ulp 7e-9 m^2/s^2) over 60 m below 3e-10 m/s^2).
    for position in [
        [7.0e6, 0.0, 0.0],
        [3.0e6, -4.0e6, 5.0e6],
        [0.0, 0.0, 2.0e7],
        [1.5e7, 1.2e7, -1.8e7],
    ] {
        let a = j2_acceleration_m_s2(position, J2_EARTH);
        for axis in 0..3 {
            let mut up = position;
            let mut down = position;
            up[axis] += 30.0;
            down[axis] -= 30.0;
            let gradient = (earth_j2_potential_m2_s2(up).unwrap()
                - earth_j2_potential_m2_s2(down).unwrap())
                / 60.0;
            assert!(
                (a[axis] - gradient).abs() < 1e-9,
                "{position:?} axis {axis}: {} vs {gradient}",
                a[axis]
            );
        }
    }
}

#[test]
fn point_mass_free_fall_follows_kepler_over_a_light_time_and_an_orbit_arc() {
    // Kepler's equation (Vallado algorithm 10; proper_time::kepler, its Newton solver to
    // 1e-15 rad, 3e-8 m here) against the Runge-Kutta integration with J2 = 0, over 70 ms
    // (a navigation signal's flight, either way) and over 5 s (five 1 s steps; error about
    // (n h)^5 r / 120 per step).
    let orbit = invented_orbit();
    let (x0, v0) = orbit.state_at(0.0);
    for (duration_s, tolerance_m) in [(-0.07, 1e-7), (0.07, 1e-7), (-5.0, 1e-7)] {
        let (x, _) = free_fall_state(x0, v0, duration_s, 0.0);
        let (expected, _) = orbit.state_at(duration_s);
        let error = distance(x, expected);
        println!("free fall (J2 = 0) vs Kepler over {duration_s} s: {error:.3e} m");
        assert!(error < tolerance_m, "{duration_s} s: {error:e} m");
    }
    // The linear extrapolation the light time used before is off by a tau^2/2, about 1.4 mm
    // here (a = GM/r^2 = 0.58 m/s^2): the comparison can fail.
    let linear = add_scaled(x0, -0.07, v0);
    let (expected, _) = orbit.state_at(-0.07);
    let linear_error_m = distance(linear, expected);
    assert!(
        (1.0e-3..2.0e-3).contains(&linear_error_m),
        "{linear_error_m:e}"
    );
}

#[test]
fn a_free_falling_transmitter_in_a_signal_path_is_where_kepler_puts_it() {
    // The whole light-time solution for the invented orbit seen from a ground point under it
    // (GCRS): the emission position is within 0.01 mm of the Keplerian one at t_R - tau (the
    // J2 acceleration, 5e-5 m/s^2 there, adds ~1e-7 m; Kepler as above), where uniform motion
    // is off by more than 1 mm. Measured change of the light time: printed with --nocapture.
    let orbit = invented_orbit();
    let (x0, v0) = orbit.state_at(0.0);
    let receiver = oblique_receiver(x0);
    let solve = |motion| {
        signal_path(&PathGeometry {
            frame: Frame::Gcrs,
            transmitter: Endpoint {
                position_m: x0,
                velocity_m_s: Some(v0),
            },
            transmitter_motion: motion,
            receiver: Endpoint {
                position_m: receiver,
                velocity_m_s: None,
            },
        })
        .unwrap()
    };
    let free = solve(TransmitterMotion::FreeFall);
    let uniform = solve(TransmitterMotion::Uniform);
    let (kepler, _) = orbit.state_at(-free.light_time_s);
    let free_error_m = distance(free.emission_position_m, kepler);
    assert!(free_error_m < 1e-5, "free fall: {free_error_m:e} m");
    let (kepler_uniform, _) = orbit.state_at(-uniform.light_time_s);
    let uniform_error_m = distance(uniform.emission_position_m, kepler_uniform);
    assert!(uniform_error_m > 1e-3, "uniform: {uniform_error_m:e} m");
    let change_s = free.light_time_s - uniform.light_time_s;
    println!(
        "light time {:.15} s; free fall - uniform = {:.3e} s ({:.3e} m); emission error vs Kepler: free fall {:.3e} m, uniform {:.3e} m",
        free.light_time_s,
        change_s,
        change_s * SPEED_OF_LIGHT_M_S,
        free_error_m,
        uniform_error_m
    );
    // The change is the projection of the displacement a tau^2/2 on the line of sight, below
    // the displacement itself.
    assert!(change_s.abs() * SPEED_OF_LIGHT_M_S <= uniform_error_m + 1e-6);
}

#[test]
fn the_same_satellite_given_in_itrf_has_the_same_light_time_and_its_own_emission_point() {
    // The ITRF axes taken as the inertial axes at reception: x_ITRF = x, v_ITRF = v - omega x x
    // (IERS Conventions (2010) table 1.1 omega_E); the receiver at the same point. The
    // light time is the same in both frames (to 1e-14 s, the iteration's tolerance), and the
    // Earth-fixed emission point is the Keplerian one rotated by +omega_E tau (IS-GPS-200
    // 20.3.3.4.3.3.2).
    let orbit = invented_orbit();
    let (x0, v0) = orbit.state_at(0.0);
    let v_itrf = [
        v0[0] + EARTH_ROTATION_RAD_S * x0[1],
        v0[1] - EARTH_ROTATION_RAD_S * x0[0],
        v0[2],
    ];
    let receiver = oblique_receiver(x0);
    let solve = |frame, velocity| {
        signal_path(&PathGeometry {
            frame,
            transmitter: Endpoint {
                position_m: x0,
                velocity_m_s: Some(velocity),
            },
            transmitter_motion: TransmitterMotion::FreeFall,
            receiver: Endpoint {
                position_m: receiver,
                velocity_m_s: None,
            },
        })
        .unwrap()
    };
    let gcrs = solve(Frame::Gcrs, v0);
    let itrf = solve(Frame::Itrf, v_itrf);
    println!(
        "ITRF - GCRS light time {:.3e} s",
        itrf.light_time_s - gcrs.light_time_s
    );
    assert!((gcrs.light_time_s - itrf.light_time_s).abs() < 1e-14);
    let tau = itrf.light_time_s;
    let (kepler, _) = orbit.state_at(-tau);
    let expected = rotate_about_z_m(kepler, EARTH_ROTATION_RAD_S * tau);
    let error_m = distance(itrf.emission_position_m, expected);
    println!("ITRF emission point vs rotated Kepler: {error_m:.3e} m");
    assert!(error_m < 1e-5, "{error_m:e} m");
}

#[test]
fn an_earth_fixed_transmitter_only_turns_with_the_earth() {
    // A ground station at rest in the ITRF is not in free fall: its emission point is itself
    // (Earth-fixed) and its inertial one the rotation of it by -omega_E tau, whatever the
    // motion setting (IS-GPS-200 20.3.3.4.3.3.2).
    let station = [GRS80_SEMI_MAJOR_AXIS_M, 0.0, 0.0];
    for motion in TransmitterMotion::ALL {
        let at = emission(Frame::Itrf, station, None, motion, 0.07);
        assert_eq!(at.frame_m, station);
        let expected = rotate_about_z_m(station, -EARTH_ROTATION_RAD_S * 0.07);
        assert!(distance(at.inertial_m, expected) < 1e-9);
        assert!(at.inertial_velocity_m_s.is_none());
    }
}
