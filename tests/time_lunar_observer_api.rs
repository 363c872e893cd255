//! The selenocentric observer of the conversions: the position-dependent term
//! v_M.(x - x_M)/c^2 of TCB - TCL (IAU 2000 Resolution B1.5 / IERS Conventions (2010) eq. 10.4
//! with the Moon in place of the Earth), and its bounds.

mod common;

use common::{assert_problem, get_json, post_json, TestServer};
use serde_json::{json, Value};

const C2: f64 = 299_792_458.0 * 299_792_458.0;

fn difference_s(answer: &Value, index: usize) -> f64 {
    // The exact difference from the input (tens of seconds: f64 keeps 1e-14 s of it).
    answer["results"][index]["difference_exact_s"]
        .as_str()
        .and_then(|t| t.parse::<f64>().ok())
        .unwrap_or(f64::NAN)
}

/// A UTC instant read at the lunar south pole (0, 0, -1 737 400 m): its TCL is the Moon's-centre
/// TCL minus v_M.x/c^2, with v_M the Moon's barycentric velocity that `GET
/// /v1/solar-system/state` gives at the same TDB (DE440); |term| <= |v_M| r / c^2 (common
/// practice: about 31 km/s x 1737 km / c^2 = 6e-7 s). The result into TDB from TCL at the
/// observer carries +term (scaled by 1 - L_B), so the two round-trip.
#[tokio::test]
async fn the_observer_term_is_v_dot_x_over_c2() {
    let server = TestServer::start().await;
    let at = "2026-03-14T06:30:00";
    let base = format!("/v1/time/convert?at={at}&from=UTC&to=TCL,TDB&forms=iso");
    let centre = get_json(&server, &base).await;
    let pole = get_json(
        &server,
        &format!("{base}&selenocentric_observer_m=0,0,-1737400"),
    )
    .await;
    assert_eq!((centre.0, pole.0), (200, 200), "{}", pole.2);
    let difference = difference_s(&pole.2, 0) - difference_s(&centre.2, 0);
    let tdb = pole.2["results"][1]["iso"]
        .as_str()
        .unwrap_or_default()
        .to_string();
    let moon = get_json(
        &server,
        &format!("/v1/solar-system/state?body=moon&center=ssb&at={tdb}&scale=TDB"),
    )
    .await;
    assert_eq!(moon.0, 200, "{}", moon.2);
    let vz = moon.2["velocity_m_s"][2].as_f64().unwrap_or(f64::NAN);
    let term = vz * -1_737_400.0 / C2;
    println!(
        "TCL at the south pole minus TCL at the centre: {difference:e} s; -v_M.x/c^2 = {:e} s",
        -term
    );
    assert!(
        (difference + term).abs() < 1e-14,
        "{difference:e} vs {:e}",
        -term
    );
    assert!(term.abs() < 3.1e4 * 1_737_400.0 / C2);
    assert!(pole.2["warnings"].as_array().is_some_and(|w| w
        .iter()
        .any(|t| t.as_str().is_some_and(|t| t.contains("v_M.(x - x_M)/c^2")))));
    // Back: TCL at the observer into UTC gives the same UTC.
    let tcl = pole.2["results"][0]["iso"]
        .as_str()
        .unwrap_or_default()
        .to_string();
    let back = get_json(
        &server,
        &format!("/v1/time/convert?at={tcl}&from=TCL&to=UTC&forms=iso&selenocentric_observer_m=0,0,-1737400"),
    )
    .await;
    let utc = back.2["results"][0]["iso"].as_str().unwrap_or_default();
    assert!(
        utc.starts_with("2026-03-14T06:29:59.99999999999")
            || utc.starts_with("2026-03-14T06:30:00.00000000000"),
        "{utc}"
    );
}

#[tokio::test]
async fn observers_out_of_range_or_doubled_are_refused_naming_the_field() {
    let server = TestServer::start().await;
    let base = "/v1/time/convert?at=2026-03-14T06:30:00&from=UTC&to=TCL";
    let below = get_json(
        &server,
        &format!("{base}&selenocentric_observer_m=0,0,-1700000"),
    )
    .await;
    let body = assert_problem(&below, 422, "below_surface");
    assert_eq!(body["field"], "selenocentric_observer_m");
    // 60 000 km: just inside the Moon's Hill sphere (about 61 500 km, common practice).
    let far = get_json(
        &server,
        &format!("{base}&selenocentric_observer_m=6.1e7,0,0"),
    )
    .await;
    let body = assert_problem(&far, 422, "beyond_model_range");
    assert_eq!(body["field"], "selenocentric_observer_m");
    let both = get_json(
        &server,
        &format!("{base}&selenocentric_observer_m=0,0,-1737400&observer_itrf_m=4346657.2,860661.3,4573718.4"),
    )
    .await;
    assert_problem(&both, 422, "invalid_observer");
    // The batch form, by body field.
    let request = json!({"from": "UTC", "to": ["TCL"], "epochs": ["2026-03-14T06:30:00"],
        "selenocentric_observer_m": [0.0, 0.0, -1.0e6]});
    let answer = post_json(&server, "/v1/time/convert", &request).await;
    let body = assert_problem(&answer, 422, "below_surface");
    assert_eq!(body["field"], "selenocentric_observer_m");
    let request = json!({"from": "UTC", "to": ["TCL", "TL"], "epochs": ["2026-03-14T06:30:00"],
        "selenocentric_observer_m": [1.0e7, 0.0, 0.0]});
    let answer = post_json(&server, "/v1/time/convert", &request).await;
    assert_eq!(answer.0, 200, "{}", answer.2);
}

fn result_of<'a>(answer: &'a Value, scale: &str) -> &'a Value {
    answer["results"]
        .as_array()
        .and_then(|results| results.iter().find(|r| r["scale"] == scale))
        .unwrap_or(&Value::Null)
}

/// `GET /v1/time/now` takes the same selenocentric observer: its TCL - UTC equals that of
/// `GET /v1/time/convert` at the UTC instant it answered with the same observer (to the 1 ns
/// of the written UTC times the 1e-8 rate difference), and differs from the Moon's-centre
/// value by at most |v_M| r / c^2 (common practice, as above).
#[tokio::test]
async fn now_takes_the_selenocentric_observer() {
    let server = TestServer::start().await;
    let observer = "selenocentric_observer_m=0,0,-1737400";
    let now = get_json(&server, &format!("/v1/time/now?forms=iso&{observer}")).await;
    assert_eq!(now.0, 200, "{}", now.2);
    let utc = result_of(&now.2, "UTC")["iso"]
        .as_str()
        .unwrap_or_default()
        .to_string();
    let tcl_minus_utc = |answer: &Value| {
        let number = |r: &Value| {
            r["difference_exact_s"]
                .as_str()
                .and_then(|t| t.parse::<f64>().ok())
                .unwrap_or(f64::NAN)
        };
        number(result_of(answer, "TCL")) - number(result_of(answer, "UTC"))
    };
    let base = format!("/v1/time/convert?at={utc}&from=UTC&to=UTC,TCL&forms=iso");
    let at_observer = get_json(&server, &format!("{base}&{observer}")).await;
    let at_centre = get_json(&server, &base).await;
    assert_eq!(
        (at_observer.0, at_centre.0),
        (200, 200),
        "{}",
        at_observer.2
    );
    let (now_s, observer_s, centre_s) = (
        tcl_minus_utc(&now.2),
        tcl_minus_utc(&at_observer.2),
        tcl_minus_utc(&at_centre.2),
    );
    println!(
        "now at the south pole: TCL - UTC {now_s} s; convert: {observer_s} s; centre {centre_s} s"
    );
    assert!(
        (now_s - observer_s).abs() < 1e-12,
        "{now_s} vs {observer_s}"
    );
    let term = observer_s - centre_s;
    assert!(
        term.abs() > 1e-8 && term.abs() < 3.1e4 * 1_737_400.0 / C2,
        "{term:e}"
    );
    let below = get_json(
        &server,
        "/v1/time/now?selenocentric_observer_m=0,0,-1700000",
    )
    .await;
    let body = assert_problem(&below, 422, "below_surface");
    assert_eq!(body["field"], "selenocentric_observer_m");
}
