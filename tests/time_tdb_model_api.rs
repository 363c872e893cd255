//! The `tdb_model` option of `GET`/`POST /v1/time/convert` and `GET /v1/time/now` against the
//! real server.
//!
//! Source of the expected TDB - TT: tests/reference/tdb_ephemeris_reference.csv, made by
//! tools/make_ephemeris_time.py (the DE440 time-dilation integral, IERS Conventions (2010)
//! eq. 10.4-10.5, before its fit; and ERFA `dtdb` via pyerfa 2.0.1.5).

mod common;

use common::{assert_problem, get_json, post_json, TestServer};

const REFERENCE: &str = include_str!("reference/tdb_ephemeris_reference.csv");

/// (TT seconds since J2000.0, integrated TDB - TT, ERFA dtdb) of the reference rows.
fn reference_rows() -> Vec<(f64, f64, f64)> {
    REFERENCE
        .lines()
        .filter(|line| !line.starts_with('#') && !line.starts_with("tt_since"))
        .map(|line| {
            let f: Vec<f64> = line
                .split(',')
                .map(|s| s.parse().expect("number"))
                .collect();
            (f[0], f[1], f[2])
        })
        .collect()
}

fn difference_s(result: &serde_json::Value) -> f64 {
    result["difference_exact_s"]
        .as_str()
        .and_then(|t| t.parse().ok())
        .unwrap_or(f64::NAN)
}

#[tokio::test]
async fn the_ephemeris_model_answers_the_integrated_tdb_minus_tt() {
    let server = TestServer::start().await;
    let rows: Vec<(f64, f64, f64)> = reference_rows().into_iter().step_by(40).collect();
    // TT seconds since J2000.0 written as exact decimals of the reference's doubles.
    let epochs: Vec<String> = rows.iter().map(|row| format!("{:.6}", row.0)).collect();
    for (model, column) in [("ephemeris", 1), ("series", 2)] {
        let body = serde_json::json!({"from": "TT", "to": ["TDB"], "format": "j2000_s",
            "epochs": epochs, "forms": ["j2000_s"], "tdb_model": model});
        let (status, _, answer) = post_json(&server, "/v1/time/convert", &body).await;
        assert_eq!(status, 200, "{answer}");
        for (row, conversion) in rows.iter().zip(answer["conversions"].as_array().unwrap()) {
            assert_eq!(conversion["tdb_model"], model);
            let expected_s = if column == 1 { row.1 } else { row.2 };
            // The epoch was rounded to the microsecond: TDB - TT changes by < 4e-16 s in it.
            // Tolerance: the fit's 1e-13 s (src/physics/time/tdb_ephemeris/tests.rs) and, for
            // the series, the 1 ps of the conversions against ERFA (time_reference_erfa.rs).
            let got_s = difference_s(&conversion["results"][0]);
            assert!(
                (got_s - expected_s).abs() <= 1e-12,
                "{model} at {}: {got_s} vs {expected_s}",
                row.0
            );
        }
    }
}

#[tokio::test]
async fn the_answer_names_the_model_when_tdb_or_tcb_is_involved() {
    let server = TestServer::start().await;
    let path = "/v1/time/convert?at=2026-03-14T06:30:00&from=UTC&to=TT,TDB";
    let (_, _, default) = get_json(&server, path).await;
    assert_eq!(default["tdb_model"], "series");
    let (_, _, ephemeris) = get_json(&server, &format!("{path}&tdb_model=ephemeris")).await;
    assert_eq!(ephemeris["tdb_model"], "ephemeris");
    // The two models differ by nanoseconds in 2026 (reference figures: within 30 ns, the
    // drift and periodic difference reported in src/physics/time/data/tdb_ephemeris_README.md).
    let gap_s =
        (difference_s(&ephemeris["results"][1]) - difference_s(&default["results"][1])).abs();
    assert!(gap_s > 0.0 && gap_s < 30e-9, "{gap_s:e}");
    // TCB in, and no TDB or TCB at all: the field is there only when it matters.
    let (_, _, tcb) = get_json(
        &server,
        "/v1/time/convert?at=2026-03-14T06:30:00&from=TCB&to=TAI&tdb_model=ephemeris",
    )
    .await;
    assert_eq!(tcb["tdb_model"], "ephemeris");
    let (_, _, plain) = get_json(&server, "/v1/time/convert?at=2026-03-14T06:30:00&to=TAI").await;
    assert!(plain.get("tdb_model").is_none(), "{plain}");
    let (status, _, now) = get_json(&server, "/v1/time/now?tdb_model=ephemeris").await;
    assert_eq!(status, 200);
    assert_eq!(now["tdb_model"], "ephemeris");
}

#[tokio::test]
async fn round_trips_through_tdb_and_tcb_with_the_ephemeris_model() {
    let server = TestServer::start().await;
    let (_, _, forward) = get_json(
        &server,
        "/v1/time/convert?at=2031-07-01T00:00:00&from=TT&to=TCB&tdb_model=ephemeris&forms=iso",
    )
    .await;
    let tcb = forward["results"][0]["iso"].as_str().unwrap().to_string();
    let (_, _, back) = get_json(
        &server,
        &format!("/v1/time/convert?at={tcb}&from=TCB&to=TT&tdb_model=ephemeris&forms=iso"),
    )
    .await;
    // Back within the 1e-12 s of the written 12 decimals (common practice).
    let iso = back["results"][0]["iso"].as_str().unwrap();
    assert!(
        iso == "2031-07-01T00:00:00.000000000000" || iso == "2031-06-30T23:59:59.999999999999",
        "{iso}"
    );
}

#[tokio::test]
async fn bad_models_and_epochs_outside_the_span_are_named() {
    let server = TestServer::start().await;
    let answer = get_json(
        &server,
        "/v1/time/convert?at=2026-03-14T06:30:00&to=TDB&tdb_model=de999",
    )
    .await;
    let problem = assert_problem(&answer, 422, "unknown_tdb_model");
    assert_eq!(problem["field"], "tdb_model");
    assert!(problem["detail"].as_str().unwrap().contains("ephemeris"));

    let answer = get_json(
        &server,
        "/v1/time/convert?at=2150-01-01T00:00:00&from=TT&to=TDB&tdb_model=ephemeris",
    )
    .await;
    let problem = assert_problem(&answer, 422, "outside_tdb_model_span");
    assert_eq!(problem["field"], "at");
    assert!(problem["detail"].as_str().unwrap().contains("2101-01-02"));
    // The series covers it.
    let (status, _, _) = get_json(
        &server,
        "/v1/time/convert?at=2150-01-01T00:00:00&from=TT&to=TDB",
    )
    .await;
    assert_eq!(status, 200);
    // Before the span, in a batch: the index is named.
    let body = serde_json::json!({"from": "TT", "to": ["TCB"], "tdb_model": "ephemeris",
        "epochs": ["2000-01-01T00:00:00", "1959-01-01T00:00:00"]});
    let answer = post_json(&server, "/v1/time/convert", &body).await;
    let problem = assert_problem(&answer, 422, "outside_tdb_model_span");
    assert_eq!(problem["field"], "epochs[1]");
    let body = serde_json::json!({"from": "TT", "to": ["TDB"], "tdb_model": 3,
        "epochs": ["2000-01-01T00:00:00"]});
    let answer = post_json(&server, "/v1/time/convert", &body).await;
    let problem = assert_problem(&answer, 400, "invalid_body");
    assert_eq!(problem["field"], "tdb_model");
}
