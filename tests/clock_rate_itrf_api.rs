//! ITRF states of `POST /v1/clock/rate` with and without their epoch, through the real server.
//! Each check names its source.

mod common;

use common::{assert_problem, get_json, post_json, TestServer};
use serde_json::{json, Value};

fn num(value: &Value) -> f64 {
    value
        .as_f64()
        .unwrap_or_else(|| panic!("not a number: {value}"))
}

async fn matrix_at(server: &TestServer, at: &str) -> Vec<Vec<f64>> {
    let (status, _, answer) =
        get_json(server, &format!("/v1/earth/orientation?at={at}&scale=UTC")).await;
    assert_eq!(status, 200, "{answer}");
    serde_json::from_value(answer["gcrs_to_itrs"].clone()).unwrap_or_default()
}

fn times(m: &[Vec<f64>], x: [f64; 3]) -> [f64; 3] {
    [0, 1, 2].map(|i| (0..3).map(|j| m[i][j] * x[j]).sum::<f64>())
}

/// An ISS-like GCRS state (invented) at 2026-05-20T00:00:00 UTC, and the same state in the
/// ITRS made with the service's own GCRS -> ITRS matrix (GET /v1/earth/orientation, checked
/// against ERFA's c2t06a): r_ITRS = M r and v_ITRS = M v + (dM/dt) r, dM/dt by central
/// differences of the matrix over +-0.5 s (IERS Conventions (2010) eq. 5.1 and its time
/// derivative; truncation h^2 |d3M/dt3| r / 6 = 1e-7 m/s, rounding noise about 1e-5 m/s as
/// measured in the library's span tests: 1e-18 in rate). With its epoch the ITRF state must
/// give the GCRS state's rate to 2e-18 (J2 about the CIP for both); without it, the neglected
/// terms stay within the 1.6e-16 the note states.
#[tokio::test]
async fn an_itrf_state_with_its_epoch_equals_the_gcrs_state() {
    let server = TestServer::start().await;
    let r = [4_500_000.0, -3_900_000.0, 3_600_000.0];
    let v = [2_900.0, 5_600.0, 3_100.0];
    let h = 0.5;
    let m0 = matrix_at(&server, "2026-05-20T00:00:00").await;
    let minus = matrix_at(&server, "2026-05-19T23:59:59.5").await;
    let plus = matrix_at(&server, "2026-05-20T00:00:00.5").await;
    let r_itrs = times(&m0, r);
    let (a, b, turned) = (times(&plus, r), times(&minus, r), times(&m0, v));
    let v_itrs = [0, 1, 2].map(|i| turned[i] + (a[i] - b[i]) / (2.0 * h));
    let state = |frame: &str, p: [f64; 3], w: [f64; 3], epoch: bool| {
        let mut state = json!({"frame": frame, "position_m": p, "velocity_m_s": w});
        if epoch {
            state["epoch"] = json!("2026-05-20T00:00:00");
        }
        json!({"state": state, "gravity_model": "j2"})
    };
    let request = json!({"items": [
        state("GCRS", r, v, true),
        state("ITRF", r_itrs, v_itrs, true),
        state("ITRF", r_itrs, v_itrs, false),
    ]});
    let (status, _, body) = post_json(&server, "/v1/clock/rate", &request).await;
    assert_eq!(status, 200, "{body}");
    let results = body["results"].as_array().cloned().unwrap_or_default();
    let total = |i: usize| num(&results[i]["fractional"]["total"]);
    let with_epoch = (total(1) - total(0)).abs();
    let without_epoch = (total(2) - total(0)).abs();
    println!("ITRF with epoch - GCRS: {with_epoch:.2e}; ITRF without epoch - GCRS: {without_epoch:.2e} (fractional rate)");
    assert!(with_epoch <= 2e-18, "{with_epoch:e}");
    assert!(without_epoch <= 1.6e-16, "{without_epoch:e}");
    // The neglected terms are visible without the epoch (else this check could not fail).
    assert!(without_epoch > 10.0 * with_epoch, "{without_epoch:e}");
    let notes = |i: usize| results[i]["model_notes"].to_string();
    assert!(
        notes(1).contains("ITRF state with its epoch"),
        "{}",
        notes(1)
    );
    assert!(
        notes(2).contains("ITRF state without an epoch"),
        "{}",
        notes(2)
    );
    assert!(notes(2).contains("1.6e-16"), "{}", notes(2));
}

/// An ITRF state whose epoch the EOP table does not cover: 422 naming the epoch field (the
/// table's codes, as GET /v1/earth/orientation answers them).
#[tokio::test]
async fn an_itrf_state_outside_the_eop_table_is_refused() {
    let server = TestServer::start().await;
    let request = json!({"items": [{"state": {"frame": "ITRF",
        "position_m": [6_378_137.0, 0.0, 0.0], "velocity_m_s": [0.0, 0.0, 0.0],
        "epoch": "2150-01-01T00:00:00"}}]});
    let answer = post_json(&server, "/v1/clock/rate", &request).await;
    let body = assert_problem(&answer, 422, "eop_after_table");
    assert_eq!(body["field"], "items[0].state.epoch");
}

/// State epochs are read with the leap-second table in force, not the built-in one. The
/// server's table here is the IERS file (tests/reference/Leap_Second.dat, astropy-iers-data)
/// with one invented leap second added at the end of 2026 (TAI - UTC 38 s from MJD 61406,
/// 2027-01-01): the second 2026-12-31T23:59:60 exists only in that table. A state at that
/// second is answered (an ITRF state through the Earth orientation there, a GCRS state about
/// the CIP there), where the built-in table would refuse the reading; and the same state half
/// a second later, at 2027-01-01T00:00:00.5, is answered too (invented table: common practice
/// for testing a table override, not a real announcement).
#[tokio::test]
async fn state_epochs_are_read_with_the_leap_second_table_in_force() {
    let text = include_str!("reference/Leap_Second.dat").replace(
        "File expires on 28 June 2027",
        "File expires on 28 June 2028",
    ) + "    61406.0    1  1 2027       38\n";
    let table =
        eigenzeit::physics::time::leap_seconds::LeapTable::parse_iers_leap_second_dat(&text)
            .unwrap_or_else(|e| panic!("table with the invented leap second: {e}"));
    let settings = eigenzeit::ops::config::Settings::default();
    let server = TestServer::start_with_table(settings, table).await;
    let builtin = TestServer::start().await;
    let item = |frame: &str, epoch: &str| {
        json!({"state": {"frame": frame, "position_m": [4_500_000.0, -3_900_000.0, 3_600_000.0],
                         "velocity_m_s": [2_900.0, 5_600.0, 3_100.0], "epoch": epoch},
               "gravity_model": "j2"})
    };
    let request = json!({"items": [
        item("ITRF", "2026-12-31T23:59:60.5"),
        item("GCRS", "2026-12-31T23:59:60.5"),
        item("ITRF", "2027-01-01T00:00:00.5"),
    ]});
    let (status, _, body) = post_json(&server, "/v1/clock/rate", &request).await;
    assert_eq!(status, 200, "{body}");
    let results = body["results"].as_array().cloned().unwrap_or_default();
    assert_eq!(results.len(), 3, "{body}");
    // One second of the Earth's rotation between the two ITRF epochs turns the state about
    // the CIP, which leaves a J2 rate about the CIP unchanged to far below 1e-18.
    let total = |k: usize| num(&results[k]["fractional"]["total"]);
    assert!(
        (total(0) - total(2)).abs() < 1e-18,
        "{} vs {}",
        total(0),
        total(2)
    );
    // The server on the built-in table refuses the same reading, naming the field.
    let (status, _, body) = post_json(&builtin, "/v1/clock/rate", &request).await;
    assert_eq!(status, 422, "{body}");
    assert_eq!(body["field"], "items[0].state.epoch", "{body}");
}
