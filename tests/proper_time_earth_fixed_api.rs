//! Earth-fixed ephemerides through `POST /v1/clock/proper-time`: the full Earth rotation at each
//! epoch (the comparison with an independent reference is in the library tests,
//! `trajectory::earth_fixed_tests`), the note that says so, and the refusal outside the EOP table.

mod common;

use common::kepler::{json_ephemeris, post_body, Kepler};
use common::{assert_problem, TestServer};

/// The demo SP3 (invented Lyra constellation, 2026-05-20, inside the built-in EOP table) is
/// answered with the note on the Earth orientation (IERS Conventions (2010) ch. 5).
#[tokio::test]
async fn demo_sp3_goes_through_the_earth_orientation() {
    let server = TestServer::start().await;
    let sp3 = std::fs::read(concat!(env!("CARGO_MANIFEST_DIR"), "/demo-data/lyra.sp3"))
        .unwrap_or_default();
    let (status, _, answer) =
        post_body(&server, "?include_series=false", "application/sp3", sp3).await;
    assert_eq!(status, 200, "{answer}");
    let notes = answer["model_notes"].to_string();
    assert!(
        notes.contains("IERS Conventions (2010) ch. 5 transformation"),
        "{notes}"
    );
    assert_eq!(answer["objects"].as_array().map(Vec::len), Some(6));
}

/// An ITRF JSON ephemeris whose epochs lie after the EOP table (2150): 422 with the table's
/// code, naming the object and its first state (the first the table does not cover), and the
/// epoch in the text.
#[tokio::test]
async fn earth_fixed_track_after_the_eop_table_is_refused() {
    let server = TestServer::start().await;
    let orbit = Kepler {
        a_m: 26_561_750.0,
        e: 0.01,
        inclination_rad: 0.96,
    };
    let mut document = json_ephemeris(&orbit, 300.0, 20);
    document["frame"] = "ITRF".into();
    document["epoch_format"] = "iso".into();
    if let Some(states) = document["objects"][0]["states"].as_array_mut() {
        for (k, state) in states.iter_mut().enumerate() {
            let minutes = 5 * k;
            state["epoch"] =
                format!("2150-01-01T{:02}:{:02}:00", minutes / 60, minutes % 60).into();
        }
    }
    let body = serde_json::to_vec(&document).unwrap_or_default();
    let answer = post_body(&server, "", "application/json", body).await;
    let problem = assert_problem(&answer, 422, "eop_after_table");
    assert_eq!(problem["object"], "TEST-ORBIT");
    assert_eq!(problem["index"], 0);
    let detail = problem["detail"].to_string();
    assert!(detail.contains("2150-01-01T00:00"), "{detail}");
}
