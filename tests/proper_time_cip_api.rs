//! J2 about the true pole: a GCRS track's zonal field is taken about the Celestial Intermediate
//! Pole (IERS Conventions (2010) ch. 5), not about the GCRS z axis, which is 0.15 deg away in
//! 2026. Reference: the rate of IERS Conventions (2010) eq. 10.6 with the J2 potential (eq. 6.6
//! at degree 2) about the CIP, integrated in this test along the same analytic orbit.

mod common;

use common::{client, TestServer};
use eigenzeit::physics::constants::{
    EQUATORIAL_RADIUS_EARTH_M, GM_EARTH_M3_S2, J2_EARTH, L_G, SPEED_OF_LIGHT_SQUARED_M2_S2,
};
use eigenzeit::physics::earth::orientation::fast::celestial_pole_fast;
use eigenzeit::physics::earth::orientation::JulianDate;
use serde_json::{json, Value};

/// TT seconds since J2000.0 of the first epoch (2026-05-20T00:00:00 TT, common practice:
/// 9636 days after J2000.0 minus half a day).
const START_TT_S: f64 = 832_507_200.0;
const SPAN_S: f64 = 86_400.0;
const RADIUS_M: f64 = 6_778_137.0;
const INCLINATION_DEG: f64 = 51.6;

fn cross(a: [f64; 3], b: [f64; 3]) -> [f64; 3] {
    [
        a[1] * b[2] - a[2] * b[1],
        a[2] * b[0] - a[0] * b[2],
        a[0] * b[1] - a[1] * b[0],
    ]
}

fn unit(a: [f64; 3]) -> [f64; 3] {
    let n = (a[0] * a[0] + a[1] * a[1] + a[2] * a[2]).sqrt();
    [a[0] / n, a[1] / n, a[2] / n]
}

fn dot(a: [f64; 3], b: [f64; 3]) -> f64 {
    a[0] * b[0] + a[1] * b[1] + a[2] * b[2]
}

/// A circular orbit inclined by 51.6 deg to the equator of `pole`, ascending node at
/// `node_deg` from an arbitrary direction of that equator: (position, velocity) at `t_s`.
fn orbit(pole: [f64; 3], node_deg: f64, t_s: f64) -> ([f64; 3], [f64; 3]) {
    let e1 = unit(cross([0.0, 0.0, 1.0], pole));
    let e2 = cross(pole, e1);
    let (sn, cn) = node_deg.to_radians().sin_cos();
    let node = [
        cn * e1[0] + sn * e2[0],
        cn * e1[1] + sn * e2[1],
        cn * e1[2] + sn * e2[2],
    ];
    let across = cross(pole, node);
    let (si, ci) = INCLINATION_DEG.to_radians().sin_cos();
    let up = [
        ci * across[0] + si * pole[0],
        ci * across[1] + si * pole[1],
        ci * across[2] + si * pole[2],
    ];
    let omega = (GM_EARTH_M3_S2 / RADIUS_M.powi(3)).sqrt();
    let (su, cu) = (omega * t_s).sin_cos();
    let v = omega * RADIUS_M;
    let mut position = [0.0; 3];
    let mut velocity = [0.0; 3];
    for k in 0..3 {
        position[k] = RADIUS_M * (cu * node[k] + su * up[k]);
        velocity[k] = v * (-su * node[k] + cu * up[k]);
    }
    (position, velocity)
}

/// d(tau)/dt - 1 against TT with J2 about `axis` (IERS Conventions (2010) eqs. 10.6, 6.6).
fn rate(position: [f64; 3], velocity: [f64; 3], axis: [f64; 3]) -> f64 {
    let r = dot(position, position).sqrt();
    let sin_latitude = dot(position, axis) / r;
    let p2 = 0.5 * (3.0 * sin_latitude * sin_latitude - 1.0);
    let ratio = EQUATORIAL_RADIUS_EARTH_M / r;
    let u = GM_EARTH_M3_S2 / r * (1.0 - J2_EARTH * ratio * ratio * p2);
    -(0.5 * dot(velocity, velocity) + u) / SPEED_OF_LIGHT_SQUARED_M2_S2 + L_G
}

/// tau - t over the span, Simpson's rule at 1 s.
fn integrated(pole: [f64; 3], node_deg: f64, axis: [f64; 3]) -> f64 {
    let steps = SPAN_S as usize;
    let at = |k: usize| {
        let (p, v) = orbit(pole, node_deg, k as f64);
        rate(p, v, axis)
    };
    let mut sum = at(0) + at(steps);
    for k in 1..steps {
        sum += if k % 2 == 1 { 4.0 } else { 2.0 } * at(k);
    }
    sum / 3.0
}

async fn accumulated_by_the_service(server: &TestServer, pole: [f64; 3], node_deg: f64) -> f64 {
    let states: Vec<Value> = (0..=(SPAN_S as usize / 30))
        .map(|k| {
            let t_s = 30.0 * k as f64;
            let (p, v) = orbit(pole, node_deg, t_s);
            json!({"epoch": format!("{:.1}", START_TT_S + t_s), "position_m": p, "velocity_m_s": v})
        })
        .collect();
    let body = json!({"frame": "GCRS", "time_scale": "TT", "epoch_format": "j2000_s",
        "objects": [{"id": "WREN-9", "states": states}]});
    let response = client()
        .post(server.url("/v1/clock/proper-time?include_series=false&gravity_model=j2"))
        .json(&body)
        .send()
        .await
        .unwrap_or_else(|e| panic!("request failed: {e}"));
    assert_eq!(response.status().as_u16(), 200);
    let answer: Value = response.json().await.unwrap_or_default();
    let notes = answer["model_notes"].to_string();
    assert!(notes.contains("Celestial Intermediate Pole"), "{notes}");
    answer["objects"][0]["summary"]["accumulated_s"]
        .as_f64()
        .unwrap_or(f64::NAN)
}

#[tokio::test]
async fn j2_of_a_gcrs_track_is_about_the_true_pole_within_a_picosecond_a_day() {
    let server = TestServer::start().await;
    // The CIP at the track's middle epoch, from the orientation library (checked against ERFA's
    // t_erfa_c.c values and pyerfa in its own tests).
    let middle = JulianDate::new(2_451_545.0, (START_TT_S + SPAN_S / 2.0) / 86_400.0);
    let pole = celestial_pole_fast(middle).unit_vector_gcrs();
    let tilt_deg = pole[2].acos().to_degrees();
    assert!((0.1..0.2).contains(&tilt_deg), "{tilt_deg}");
    let mut largest_z_axis_error_s: f64 = 0.0;
    for node_deg in [0.0, 90.0, 180.0, 270.0] {
        let service = accumulated_by_the_service(&server, pole, node_deg).await;
        let about_cip = integrated(pole, node_deg, pole);
        let about_z = integrated(pole, node_deg, [0.0, 0.0, 1.0]);
        println!(
            "node {node_deg:5.1} deg: service - CIP reference {:+.3e} s, z-axis reference - CIP reference {:+.3e} s",
            service - about_cip,
            about_z - about_cip
        );
        assert!(
            (service - about_cip).abs() < 1e-12,
            "{node_deg}: {service} vs {about_cip}"
        );
        largest_z_axis_error_s = largest_z_axis_error_s.max((about_z - about_cip).abs());
    }
    // The check can fail: J2 about the GCRS z axis misses by tens of picoseconds a day.
    assert!(largest_z_axis_error_s > 2e-11, "{largest_z_axis_error_s}");
}
