//! `POST /v1/clock/proper-time` with a Moon-centred SP3 file: SP3 has no centre field, so the
//! request names it (`center=moon`) and the header's coordinate system gives ICRF axes. The
//! same invented orbit (TERN-7, a circle 100 km above the mean lunar radius) as SP3 and as a
//! JSON ephemeris with `"center": "moon"`, and the bad centres named by line or field.

mod common;

use common::kepler::post_body;
use common::{assert_problem, TestServer};
use serde_json::{json, Value};

const C2: f64 = 299_792_458.0 * 299_792_458.0;
/// GM of the Moon, DE440 (Park et al. 2021), m^3/s^2.
const GM_MOON: f64 = 4.902_800_118e12;
/// Radius of the circle: 1737.4 km (mean lunar radius, IAU WGCCRE) + 100 km.
const A_M: f64 = 1_837_400.0;
/// States every minute for two hours (more than one revolution, about 117.8 min).
const STEP_S: f64 = 60.0;
const COUNT: usize = 121;

/// Position (m) and velocity (m/s) on the circle in the ICRF x-y plane, t seconds after the
/// first epoch, rounded as SP3 writes them (1e-6 km, 1e-6 dm/s) so that both files hold the
/// same numbers.
fn state(t_s: f64) -> ([f64; 3], [f64; 3]) {
    let n = (GM_MOON / A_M.powi(3)).sqrt();
    let (s, c) = (n * t_s).sin_cos();
    let km = |v: f64| (v / 1e3 * 1e6).round() / 1e6;
    let dm_s = |v: f64| (v * 10.0 * 1e6).round() / 1e6;
    let r = [km(A_M * c), km(A_M * s), 0.0];
    let v = [dm_s(-A_M * n * s), dm_s(A_M * n * c), 0.0];
    (
        [r[0] * 1e3, r[1] * 1e3, r[2] * 1e3],
        [v[0] / 10.0, v[1] / 10.0, v[2] / 10.0],
    )
}

/// An SP3-d file with positions and velocities of TERN-7 (id `T07`) in TAI, coordinate system
/// `label` (columns 47-51 of the first line; IGS, SP3-d, Hilla 2016).
fn sp3(label: &str) -> String {
    let mut out = format!(
        "#dV2026  5 20  0  0  0.00000000 {COUNT:>7} ORBIT {label:>5} KEP  TRN\n\
         ## 2419 259200.00000000    60.00000000 61180 0.0000000000000\n\
         +    1   T07  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0\n\
         ++         0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0  0\n\
         %c M  cc TAI ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc\n\
         %c cc cc ccc ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc\n\
         /* Invented demo scenario: TERN-7, a lunar orbiter\n"
    );
    for k in 0..COUNT {
        let t = k as f64 * STEP_S;
        let (r, v) = state(t);
        let (hour, minute) = (k / 60, k % 60);
        out.push_str(&format!(
            "*  2026  5 20 {hour:>2} {minute:>2}  0.00000000\n"
        ));
        out.push_str(&format!(
            "PT07{:14.6}{:14.6}{:14.6}{:14.6}\n",
            r[0] / 1e3,
            r[1] / 1e3,
            r[2] / 1e3,
            999_999.999_999
        ));
        out.push_str(&format!(
            "VT07{:14.6}{:14.6}{:14.6}{:14.6}\n",
            v[0] * 10.0,
            v[1] * 10.0,
            v[2] * 10.0,
            999_999.999_999
        ));
    }
    out.push_str("EOF\n");
    out
}

/// The same states as a JSON ephemeris about the Moon.
fn json_body() -> String {
    let states: Vec<Value> = (0..COUNT)
        .map(|k| {
            let (r, v) = state(k as f64 * STEP_S);
            let (hour, minute) = (k / 60, k % 60);
            json!({"epoch": format!("2026-05-20T{hour:02}:{minute:02}:00"),
                   "position_m": r, "velocity_m_s": v})
        })
        .collect();
    json!({"frame": "ICRF", "center": "moon", "time_scale": "TAI",
           "objects": [{"id": "T07", "states": states}]})
    .to_string()
}

fn number(value: &Value) -> f64 {
    value.as_f64().unwrap_or(f64::NAN)
}

/// SP3 about the Moon equals the JSON track, and its rate against TCL is the closed form
/// -(3 GM_M / (2a)) / c^2 = -4.4534e-11 of a circle (common practice) within the tides' bound
/// GM_E a^2 / (d^3 c^2) = 2.6e-16 at the Moon's perigee distance (as for the demo's TERN-1).
#[tokio::test]
async fn sp3_about_the_moon_equals_the_json_track() {
    let server = TestServer::start().await;
    let query = "?center=moon&gravity_model=point_mass";
    let from_sp3 = post_body(&server, query, "application/sp3", sp3("ICRF").into_bytes()).await;
    assert_eq!(from_sp3.0, 200, "{}", from_sp3.2);
    let from_json = post_body(
        &server,
        "?gravity_model=point_mass",
        "application/json",
        json_body().into_bytes(),
    )
    .await;
    assert_eq!(from_json.0, 200, "{}", from_json.2);
    let (by_sp3, by_json) = (&from_sp3.2["objects"][0], &from_json.2["objects"][0]);
    assert_eq!(by_sp3["frame"], "lunar_inertial");
    assert_eq!(from_sp3.2["reference"], "TCL");
    let last = |object: &Value| {
        let series = object["series"].as_array().cloned().unwrap_or_default();
        series.last().cloned().unwrap_or(Value::Null)
    };
    let (sp3_last, json_last) = (last(by_sp3), last(by_json));
    let difference = number(&sp3_last["tau_minus_t_s"]) - number(&json_last["tau_minus_t_s"]);
    println!(
        "TERN-7 SP3 vs JSON after 2 h: {difference:e} s; mean rate {:e}",
        number(&by_sp3["summary"]["mean_rate"])
    );
    assert!(difference.abs() < 1e-16, "{difference:e}");
    let closed = -1.5 * GM_MOON / A_M / C2;
    let rate = number(&by_sp3["summary"]["mean_rate"]);
    assert!((rate - closed).abs() < 3e-16, "{rate:e} vs {closed:e}");
    // J2000 names the same axes.
    let j2000 = post_body(&server, query, "application/sp3", sp3("J2000").into_bytes()).await;
    assert_eq!(j2000.0, 200, "{}", j2000.2);
}

#[tokio::test]
async fn sp3_centres_are_named_by_line_or_field() {
    let server = TestServer::start().await;
    // A terrestrial label about the Moon, inertial axes about the Earth: line 1.
    for (query, label) in [("?center=moon", "IGS20"), ("", "ICRF")] {
        let answer = post_body(&server, query, "application/sp3", sp3(label).into_bytes()).await;
        let body = assert_problem(&answer, 422, "frame_center_mismatch");
        assert_eq!(body["line"], 1, "{query} {label}: {body}");
    }
    let answer = post_body(
        &server,
        "?center=mars",
        "application/sp3",
        sp3("ICRF").into_bytes(),
    )
    .await;
    let body = assert_problem(&answer, 422, "unknown_center");
    assert_eq!(body["field"], "center");
    // A JSON file names its own centre: a query that disagrees is refused by field.
    let answer = post_body(
        &server,
        "?center=earth",
        "application/json",
        json_body().into_bytes(),
    )
    .await;
    let body = assert_problem(&answer, 422, "frame_center_mismatch");
    assert_eq!(body["field"], "center");
}
