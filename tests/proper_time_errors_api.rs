//! `POST /v1/clock/proper-time` with bad ephemerides: each answer names the line, object or
//! index at fault.

mod common;

use common::kepler::{json_ephemeris, post_body, Kepler};
use common::{assert_problem, TestServer};
use serde_json::{json, Value};

#[tokio::test]
async fn bad_ephemerides_name_line_object_and_index() {
    let server = TestServer::start().await;
    let oem = String::from_utf8(
        std::fs::read(concat!(
            env!("CARGO_MANIFEST_DIR"),
            "/demo-data/lyra_kestrel.oem"
        ))
        .unwrap_or_default(),
    )
    .unwrap_or_default();
    // A mandatory keyword missing (CCSDS 502.0-B: REF_FRAME is mandatory in the metadata).
    let missing = oem.replacen("REF_FRAME = GCRF\n", "", 1);
    let answer = post_body(&server, "", "application/ccsds-oem", missing.into_bytes()).await;
    let body = assert_problem(&answer, 422, answer.2["code"].as_str().unwrap_or("?"));
    assert!(body["line"].as_u64().is_some(), "{body}");
    assert!(
        body["detail"]
            .as_str()
            .is_some_and(|d| d.contains("REF_FRAME")),
        "{body}"
    );
    // An unparsable number on a data line.
    let bad_number = oem.replacen("20011.874873", "20011.87x873", 1);
    let answer = post_body(
        &server,
        "",
        "application/ccsds-oem",
        bad_number.into_bytes(),
    )
    .await;
    let body = assert_problem(&answer, 422, answer.2["code"].as_str().unwrap_or("?"));
    assert_eq!(body["line"], 18, "{body}"); // the first data line of the file
                                            // A truncated file: cut in the middle of a data line.
    let cut = &oem[..oem.len() / 2];
    let cut = &cut[..cut.rfind(' ').unwrap_or(0)];
    let answer = post_body(
        &server,
        "",
        "application/ccsds-oem",
        cut.as_bytes().to_vec(),
    )
    .await;
    assert_eq!(answer.0, 422, "{}", answer.2);
    assert!(answer.2["line"].as_u64().is_some());
    // SP3 without its EOF line (truncated).
    let sp3 = String::from_utf8(
        std::fs::read(concat!(env!("CARGO_MANIFEST_DIR"), "/demo-data/lyra.sp3"))
            .unwrap_or_default(),
    )
    .unwrap_or_default();
    let truncated = sp3.replace("EOF", "");
    let answer = post_body(&server, "", "application/sp3", truncated.into_bytes()).await;
    assert_eq!(answer.0, 422, "{}", answer.2);

    let orbit = Kepler {
        a_m: 26_561_750.0,
        e: 0.01,
        inclination_rad: 0.96,
    };
    let good = json_ephemeris(&orbit, 300.0, 20);
    let send = |body: Value| {
        let server = &server;
        async move {
            post_body(
                server,
                "",
                "application/json",
                serde_json::to_vec(&body).unwrap_or_default(),
            )
            .await
        }
    };
    // Epochs not increasing: the object and the index are named.
    let mut doubled = good.clone();
    doubled["objects"][0]["states"][5]["epoch"] =
        doubled["objects"][0]["states"][4]["epoch"].clone();
    let answer = send(doubled).await;
    let body = assert_problem(&answer, 422, answer.2["code"].as_str().unwrap_or("?"));
    assert_eq!(body["object"], "TEST-ORBIT");
    assert_eq!(body["index"], 5);
    // A position inside the Earth.
    let mut inside = good.clone();
    inside["objects"][0]["states"][3]["position_m"] = json!([1000.0, 0.0, 0.0]);
    let answer = send(inside).await;
    let body = assert_problem(&answer, 422, answer.2["code"].as_str().unwrap_or("?"));
    assert_eq!(body["index"], 3);
    // A speed at or above c.
    let mut fast = good.clone();
    fast["objects"][0]["states"][2]["velocity_m_s"] = json!([3.0e8, 0.0, 0.0]);
    let answer = send(fast).await;
    let body = assert_problem(&answer, 422, answer.2["code"].as_str().unwrap_or("?"));
    assert_eq!(body["index"], 2);
    // Fewer states than the interpolation needs.
    let mut few = good.clone();
    few["objects"][0]["states"] = json!([good["objects"][0]["states"][0]]);
    let answer = send(few).await;
    assert_eq!(answer.0, 422, "{}", answer.2);
    // A gap longer than the limit.
    let answer = post_body(
        &server,
        "?max_gap_s=100",
        "application/json",
        serde_json::to_vec(&good).unwrap_or_default(),
    )
    .await;
    assert_eq!(answer.0, 422, "{}", answer.2);
    // Unknown content type, unknown format, unreadable JSON.
    assert_problem(
        &post_body(&server, "", "image/png", vec![1, 2, 3]).await,
        415,
        "unsupported_media_type",
    );
    assert_problem(
        &post_body(&server, "?format=xml", "text/plain", b"x".to_vec()).await,
        400,
        "invalid_query",
    );
    assert_problem(
        &post_body(&server, "", "application/json", b"{\"frame\":".to_vec()).await,
        400,
        "invalid_json",
    );
    assert_problem(
        &post_body(&server, "", "text/plain", b"hello".to_vec()).await,
        422,
        "unknown_ephemeris_format",
    );
}

#[tokio::test]
async fn oversized_body_is_413() {
    let settings = eigenzeit::ops::config::Settings {
        body_limit_bytes: 1024,
        ..Default::default()
    };
    let server = TestServer::start_with(settings).await;
    let oem = std::fs::read(concat!(
        env!("CARGO_MANIFEST_DIR"),
        "/demo-data/lyra_kestrel.oem"
    ))
    .unwrap_or_default();
    assert_problem(
        &post_body(&server, "", "application/ccsds-oem", oem).await,
        413,
        "body_too_large",
    );
}

#[tokio::test]
async fn near_duplicate_sp3_epochs_are_refused_at_once() {
    // Found by the ephemeris_sp3 fuzz target: two epochs 40 ns apart made the interpolated
    // velocity explode and the integration ask for millions of subintervals (the request ran
    // past its timeout). It must be a prompt 422 naming the object.
    let server = TestServer::start().await;
    let file = std::fs::read(concat!(
        env!("CARGO_MANIFEST_DIR"),
        "/tests/regressions/sp3_near_duplicate_epochs.sp3"
    ))
    .unwrap_or_default();
    let started = std::time::Instant::now();
    let answer = post_body(&server, "?include_series=false", "application/sp3", file).await;
    let body = assert_problem(&answer, 422, "speed_not_below_c");
    assert_eq!(body["object"], "L01");
    assert!(started.elapsed().as_secs_f64() < 10.0);
}
