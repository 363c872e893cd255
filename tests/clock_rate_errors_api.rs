//! Bad input to the clock-rate endpoints through the real server: every case answers a 4xx
//! problem+json with a stable code and the JSON path at fault. Each check names its source.

mod common;

use common::{assert_problem, post_json, TestServer};
use eigenzeit::ops::config::Settings;
use serde_json::{json, Value};

/// IS-GPS-200: nominal semi-major axis of the navigation MEO orbit, m.
const NAV_A_M: f64 = 26_561_750.0;

fn circular_orbit(a_m: f64) -> Value {
    json!({"orbit": {"semi_major_axis_m": a_m, "eccentricity": 0.0}})
}

fn geoid_site(latitude_deg: f64, height_m: f64) -> Value {
    json!({"ground_site": {"latitude_deg": latitude_deg, "longitude_deg": 8.5,
        "height_m": height_m, "height_reference": "geoid"}})
}

/// (item, code, field) for one bad item placed at index 1 of a two-item batch.
fn bad_items() -> Vec<(Value, &'static str, &'static str)> {
    let state = |position: [f64; 3], velocity: [f64; 3]| json!({"state": {"frame": "GCRS", "position_m": position, "velocity_m_s": velocity}});
    let orbit = |a: f64, e: f64| json!({"orbit": {"semi_major_axis_m": a, "eccentricity": e}});
    vec![
        // Speed at or above c (SI definition of c; first-order model needs v < c).
        (
            state([7.0e6, 0.0, 0.0], [3.0e8, 0.0, 0.0]),
            "speed_not_below_c",
            "items[1].state.velocity_m_s",
        ),
        (
            state([7.0e6, 0.0, 0.0], [1e300, 0.0, 0.0]),
            "speed_not_below_c",
            "items[1].state.velocity_m_s",
        ),
        // Inside the Earth: more than 11 km below GRS80 (bound of the rate library).
        (
            state([6.0e6, 0.0, 0.0], [0.0; 3]),
            "below_surface",
            "items[1].state.position_m",
        ),
        (
            state([1e300, 1e300, 0.0], [0.0; 3]),
            "beyond_model_range",
            "items[1].state.position_m",
        ),
        (
            json!({"state": {"frame": "ITRF", "position_m": [0.0, 0.0, 6.34e6], "velocity_m_s": [0.0, 0.0, 0.0]}}),
            "below_surface",
            "items[1].state.position_m",
        ),
        (
            json!({"state": {"frame": "ECEF", "position_m": [7.0e6, 0.0, 0.0], "velocity_m_s": [0.0, 0.0, 0.0]}}),
            "unknown_frame",
            "items[1].state.frame",
        ),
        // Semi-major axis a <= 0, e outside [0, 1) (Keplerian ellipse), periapsis inside the Earth.
        (
            orbit(0.0, 0.0),
            "invalid_semi_major_axis",
            "items[1].orbit.semi_major_axis_m",
        ),
        (
            orbit(-7.0e6, 0.0),
            "invalid_semi_major_axis",
            "items[1].orbit.semi_major_axis_m",
        ),
        (
            orbit(1e300, 0.0),
            "beyond_model_range",
            "items[1].orbit.semi_major_axis_m",
        ),
        (
            orbit(NAV_A_M, 1.0),
            "invalid_eccentricity",
            "items[1].orbit.eccentricity",
        ),
        (
            orbit(NAV_A_M, -0.1),
            "invalid_eccentricity",
            "items[1].orbit.eccentricity",
        ),
        (
            orbit(NAV_A_M, 0.8),
            "below_surface",
            "items[1].orbit.eccentricity",
        ),
        (
            json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0, "mean_anomaly_deg": 1.0, "true_anomaly_deg": 1.0}}),
            "anomaly_ambiguous",
            "items[1].orbit",
        ),
        (
            json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0, "inclination_deg": 181.0}}),
            "angle_out_of_range",
            "items[1].orbit.inclination_deg",
        ),
        // Refused with any gravity model, not only where the J2 term reads it.
        (
            json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0, "argument_of_latitude_deg": -1000001.0}}),
            "angle_out_of_range",
            "items[1].orbit.argument_of_latitude_deg",
        ),
        (
            json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0}, "gravity_model": "j2"}),
            "input_required",
            "items[1].orbit.inclination_deg",
        ),
        // Latitude outside [-90, 90] (geodetic and selenographic latitudes).
        (
            geoid_site(90.5, 0.0),
            "latitude_out_of_range",
            "items[1].ground_site.latitude_deg",
        ),
        (
            json!({"lunar_site": {"latitude_deg": -91.0, "longitude_deg": 0.0}}),
            "latitude_out_of_range",
            "items[1].lunar_site.latitude_deg",
        ),
        (
            json!({"ground_site": {"latitude_deg": 0.0, "longitude_deg": 1e300, "height_m": 0.0}}),
            "angle_out_of_range",
            "items[1].ground_site.longitude_deg",
        ),
        (
            geoid_site(0.0, -12_000.0),
            "below_surface",
            "items[1].ground_site.height_m",
        ),
        (
            geoid_site(0.0, 1e300),
            "beyond_model_range",
            "items[1].ground_site.height_m",
        ),
        (
            json!({"ground_site": {"latitude_deg": 0.0, "longitude_deg": 0.0, "height_m": 0.0, "height_reference": "msl"}}),
            "unknown_height_reference",
            "items[1].ground_site.height_reference",
        ),
        // Missing or doubled subject (exactly one per item).
        (json!({}), "subject_missing", "items[1]"),
        (json!({"reference": "TT"}), "subject_missing", "items[1]"),
        (
            json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0}, "ground_site": {"latitude_deg": 0.0, "longitude_deg": 0.0, "height_m": 0.0}}),
            "subject_ambiguous",
            "items[1]",
        ),
        // Unknown reference and gravity model (TT or TCG; point_mass or j2).
        (
            json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0}, "reference": "TAI"}),
            "unknown_reference",
            "items[1].reference",
        ),
        (
            json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0}, "gravity_model": "jgm3"}),
            "unknown_gravity_model",
            "items[1].gravity_model",
        ),
        // Nominal frequency must be positive; a rate beyond 1e-3 has no frequency answer.
        (
            json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0}, "nominal_frequency_hz": 0.0}),
            "invalid_frequency",
            "items[1].nominal_frequency_hz",
        ),
        (
            json!({"state": {"frame": "GCRS", "position_m": [7.0e6, 0.0, 0.0], "velocity_m_s": [1.5e8, 0.0, 0.0]}, "nominal_frequency_hz": 10.0e6}),
            "rate_out_of_range",
            "items[1].state",
        ),
    ]
}

#[tokio::test]
async fn every_bad_item_is_a_422_naming_its_path() {
    let server = TestServer::start().await;
    for (item, code, field) in bad_items() {
        let request = json!({"items": [circular_orbit(NAV_A_M), item]});
        let answer = post_json(&server, "/v1/clock/rate", &request).await;
        let problem = assert_problem(&answer, 422, code);
        assert_eq!(problem["field"], field, "{problem}");
    }
}

#[tokio::test]
async fn bad_requests_name_the_field() {
    let settings = Settings {
        batch_limit: 3,
        ..Settings::default()
    };
    let server = TestServer::start_with(settings).await;
    let item = circular_orbit(NAV_A_M);
    // Batch contract of the OpenAPI document: empty batch and batch over the configured limit.
    let answer = post_json(&server, "/v1/clock/rate", &json!({"items": []})).await;
    assert_eq!(
        assert_problem(&answer, 422, "empty_batch")["field"],
        "items"
    );
    let four = json!({"items": [item.clone(), item.clone(), item.clone(), item.clone()]});
    let answer = post_json(&server, "/v1/clock/rate", &four).await;
    let problem = assert_problem(&answer, 422, "batch_too_large");
    assert_eq!(problem["field"], "items");
    assert!(problem["detail"].as_str().is_some_and(|d| d.contains('3')));
    // Request-level settings are named without a prefix.
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [item.clone()], "reference": "UTC"}),
    )
    .await;
    assert_eq!(
        assert_problem(&answer, 422, "unknown_reference")["field"],
        "reference"
    );
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [item.clone()], "nominal_frequency_hz": -5.0}),
    )
    .await;
    assert_eq!(
        assert_problem(&answer, 422, "invalid_frequency")["field"],
        "nominal_frequency_hz"
    );
    // JSON cannot carry 1e400 into an f64 (RFC 8259 leaves the range to implementations;
    // serde_json refuses it): 400, never a 5xx.
    let response = common::client()
        .post(server.url("/v1/clock/rate"))
        .header("content-type", "application/json")
        .body(r#"{"items": [{"orbit": {"semi_major_axis_m": 1e400, "eccentricity": 0.0}}]}"#)
        .send()
        .await
        .expect("request");
    let answer = common::split(response).await;
    assert_eq!(answer.0, 400, "{}", answer.2);
    assert_eq!(answer.1, "application/problem+json");
    // A missing required field or an unknown one is a 400 (schema mismatch).
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [{"orbit": {"semi_major_axis_m": NAV_A_M}}]}),
    )
    .await;
    assert_problem(&answer, 400, "invalid_body");
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [item.clone()], "epoch": "2026-01-01"}),
    )
    .await;
    assert_problem(&answer, 400, "invalid_body");
}
