//! Ground clocks in the EGM2008 field (`gravity_model: egm2008`) through the real server: the
//! geoid undulation is in the answer, the vertical gradient is g, and the model is refused
//! where it does not apply. Each check names its source.

mod common;

use common::kepler::post_body;
use common::{assert_problem, post_json, TestServer};
use serde_json::{json, Value};

const C2: f64 = 299_792_458.0 * 299_792_458.0;

async fn rates(server: &TestServer, request: Value) -> (Vec<Value>, Value) {
    let (status, _, body) = post_json(server, "/v1/clock/rate", &request).await;
    assert_eq!(status, 200, "{body}");
    (
        body["results"].as_array().cloned().unwrap_or_default(),
        body,
    )
}

fn total(result: &Value) -> f64 {
    result["fractional"]["total"].as_f64().unwrap_or(f64::NAN)
}

fn site(latitude_deg: f64, longitude_deg: f64, height_m: f64, model: &str) -> Value {
    json!({"ground_site": {"latitude_deg": latitude_deg, "longitude_deg": longitude_deg,
        "height_m": height_m}, "gravity_model": model})
}

/// On the ellipsoid south of Sri Lanka, where the EGM2008 geoid lies about 106 m below it
/// (from memory of the published EGM2008 geoid; 107.2 m at degree 120 in the library test), a
/// clock sits about 106 m x 9.78 m/s^2 lower in the potential than the geoid: it runs faster
/// than TT by about 1.16e-14 (GRS80 normal gravity 9.78 m/s^2 near the equator, Moritz 2000),
/// where the normal field alone (grs80, N = 0) says 0. One metre up adds g/c^2 = 1.09e-16
/// (common practice).
#[tokio::test]
async fn the_geoid_undulation_is_in_the_answer() {
    let server = TestServer::start().await;
    let (results, _) = rates(
        &server,
        json!({"items": [site(5.0, 79.0, 0.0, "egm2008"), site(5.0, 79.0, 1.0, "egm2008"),
            site(5.0, 79.0, 0.0, "grs80")]}),
    )
    .await;
    let (low, up, normal) = (total(&results[0]), total(&results[1]), total(&results[2]));
    let undulation_m = -low * C2 / 9.78;
    println!(
        "EGM2008 at 5N 79E on the ellipsoid: {low:e} (N = {undulation_m:.1} m); grs80 {normal:e}"
    );
    assert_eq!(results[0]["gravity_model"], "egm2008");
    assert!((low - 106.0 * 9.78 / C2).abs() < 0.05 * low, "{low:e}");
    assert!(normal.abs() < 1e-22, "{normal:e}");
    assert!(((up - low) - 1.09e-16).abs() < 0.005e-16, "{:e}", up - low);
    let notes = results[0]["model_notes"].to_string();
    assert!(
        notes.contains("EGM2008") && notes.contains("degree"),
        "{notes}"
    );
}

#[tokio::test]
async fn egm2008_is_refused_where_it_does_not_apply() {
    let server = TestServer::start().await;
    // A state vector: the field is evaluated at fixed ITRS positions of ground sites only.
    let state = json!({"items": [{"state": {"frame": "GCRS", "position_m": [7.0e6, 0.0, 0.0],
        "velocity_m_s": [0.0, 7500.0, 0.0]}, "gravity_model": "egm2008"}]});
    let answer = post_json(&server, "/v1/clock/rate", &state).await;
    let body = assert_problem(&answer, 422, "unsupported_gravity_model");
    assert_eq!(body["field"], "items[0].gravity_model");
    // A track.
    let oem = std::fs::read(concat!(
        env!("CARGO_MANIFEST_DIR"),
        "/demo-data/lyra_kestrel.oem"
    ))
    .unwrap_or_default();
    let answer = post_body(
        &server,
        "?gravity_model=egm2008",
        "application/ccsds-oem",
        oem,
    )
    .await;
    let body = assert_problem(&answer, 422, "unsupported_gravity_model");
    assert_eq!(body["field"], "gravity_model");
    // A request-level egm2008 leaves orbits on the point mass, and says so.
    let (results, _) = rates(
        &server,
        json!({"gravity_model": "egm2008", "items": [
            {"orbit": {"semi_major_axis_m": 26_561_750.0, "eccentricity": 0.0}},
            {"ground_site": {"latitude_deg": 5.0, "longitude_deg": 79.0, "height_m": 0.0}}]}),
    )
    .await;
    assert_eq!(results[0]["gravity_model"], "point_mass");
    assert!(results[0]["model_notes"].to_string().contains("egm2008"));
    assert_eq!(results[1]["gravity_model"], "egm2008");
}
