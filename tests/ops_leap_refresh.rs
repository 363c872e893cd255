//! The leap-second URL polled by the real refresh task: a valid newer table is taken, a broken
//! one or an older one is refused and the table in force kept, with the failure visible in
//! `/readyz` and `/metrics`. The file is served by a small axum server inside the test.

mod common;

use std::sync::{Arc, Mutex};

use common::file_server::{eventually, file_server, Served};
use common::{get_json, get_with, header_text, metric_value, metrics_text, TestServer};
use eigenzeit::ops::config::Settings;

/// The IERS file committed for the parser tests (see tests/reference/leap_second_files_versions.txt).
const IERS_FILE: &str = include_str!("reference/Leap_Second.dat");

async fn failures(server: &TestServer) -> Option<f64> {
    metric_value(
        &metrics_text(server).await,
        "eigenzeit_leap_seconds_refresh_failures_total",
    )
}

#[tokio::test]
async fn refresh_takes_a_newer_table_and_keeps_it_against_bad_ones() {
    // The committed file expires on 28 June 2027 (MJD 61584); edited to 28 December 2027
    // (MJD 61767: MJD 0 = 1858-11-17, Explanatory Supplement, common practice), it is newer
    // than the built-in table.
    assert!(IERS_FILE.contains("File expires on 28 June 2027"));
    let newer = IERS_FILE.replace(
        "File expires on 28 June 2027",
        "File expires on 28 December 2027",
    );
    let served: Served = Arc::new(Mutex::new((200, newer.clone())));
    let (url, hits) = file_server("Leap_Second.dat", Arc::clone(&served)).await;
    let settings = Settings {
        leap_seconds_url: Some(url.clone()),
        leap_seconds_refresh_s: 0.2,
        ..Settings::default()
    };
    let server = TestServer::start_with(settings).await;

    // 1. The valid newer table is taken: source and expiry in /v1/time/leap-seconds.
    eventually("the refreshed table", || async {
        get_json(&server, "/v1/time/leap-seconds").await.2["expires"] == "2027-12-28"
    })
    .await;
    let (_, _, table) = get_json(&server, "/v1/time/leap-seconds").await;
    assert_eq!(table["expires_mjd"], 61_767);
    assert_eq!(table["source"], format!("refreshed from {url}"));
    // IERS Bulletin C: TAI - UTC = 37 s since 2017-01-01 (MJD 57754).
    let last = table["entries"]
        .as_array()
        .and_then(|e| e.last())
        .cloned()
        .expect("entries");
    assert_eq!(last["mjd"], 57_754);
    assert_eq!(last["tai_minus_utc_s"], 37.0);
    let (status, _, ready) = get_json(&server, "/readyz").await;
    assert_eq!(status, 200);
    assert_eq!(ready["leap_seconds"]["expires"], "2027-12-28");
    assert!(
        ready["leap_seconds"]["last_refresh_unix_s"].is_u64(),
        "{ready}"
    );
    assert!(
        ready["leap_seconds"].get("last_refresh_error").is_none(),
        "{ready}"
    );
    let text = metrics_text(&server).await;
    let info = format!("eigenzeit_leap_seconds_table_info{{source=\"refreshed from {url}\"}}");
    assert_eq!(metric_value(&text, &info), Some(1.0), "{text}");
    assert_eq!(
        metric_value(&text, "eigenzeit_leap_seconds_refresh_failures_total"),
        Some(0.0)
    );
    assert!(
        metric_value(&text, "eigenzeit_leap_seconds_refresh_successes_total")
            .is_some_and(|n| n >= 1.0)
    );
    let etag_before = header_text(
        &get_with(&server, "/v1/time/leap-seconds", &[]).await,
        "etag",
    );

    // 2. A broken file is refused and the table kept; the failure shows in /readyz and
    //    /metrics. (A data line with a month 13: not a date, IERS Leap_Second.dat layout.)
    let broken = newer.replace(
        "57754.0    1  1 2017       37",
        "57754.0    1 13 2017       37",
    );
    assert_ne!(broken, newer);
    *served.lock().expect("lock") = (200, broken);
    eventually("a counted failure", || async {
        failures(&server).await.is_some_and(|n| n >= 1.0)
    })
    .await;
    let (status, _, ready) = get_json(&server, "/readyz").await;
    assert_eq!(status, 200, "the table in force is still valid: {ready}");
    let error = ready["leap_seconds"]["last_refresh_error"]
        .as_str()
        .unwrap_or("")
        .to_string();
    assert!(
        error.contains("not valid") && error.contains(&url),
        "{ready}"
    );
    let (_, _, table) = get_json(&server, "/v1/time/leap-seconds").await;
    assert_eq!(table["expires"], "2027-12-28");
    assert_eq!(table["source"], format!("refreshed from {url}"));
    // RFC 9110 section 13.1.2: the table did not change, so the ETag did not either.
    assert_eq!(
        header_text(
            &get_with(&server, "/v1/time/leap-seconds", &[]).await,
            "etag"
        ),
        etag_before
    );

    // 3. An answer that is not 200 is a failure too.
    let before = failures(&server).await.unwrap_or(0.0);
    *served.lock().expect("lock") = (503, "maintenance".to_string());
    eventually("a failure on 503", || async {
        failures(&server).await.is_some_and(|n| n > before)
    })
    .await;
    let (_, _, ready) = get_json(&server, "/readyz").await;
    assert!(
        ready["leap_seconds"]["last_refresh_error"]
            .as_str()
            .is_some_and(|e| e.contains("503")),
        "{ready}"
    );

    // 4. A valid but older table (the committed file, expiring 2027-06-28) is refused: it
    //    would drop what the newer one announces.
    let before = failures(&server).await.unwrap_or(0.0);
    *served.lock().expect("lock") = (200, IERS_FILE.to_string());
    eventually("a failure on an older file", || async {
        failures(&server).await.is_some_and(|n| n > before)
    })
    .await;
    let (_, _, ready) = get_json(&server, "/readyz").await;
    assert!(
        ready["leap_seconds"]["last_refresh_error"]
            .as_str()
            .is_some_and(|e| e.contains("before the table in force")),
        "{ready}"
    );
    assert_eq!(
        get_json(&server, "/v1/time/leap-seconds").await.2["expires"],
        "2027-12-28"
    );

    // 5. Back to a good file: the error is cleared.
    *served.lock().expect("lock") = (200, newer);
    eventually("the error cleared", || async {
        get_json(&server, "/readyz").await.2["leap_seconds"]
            .get("last_refresh_error")
            .is_none()
    })
    .await;
    // The task polls on its interval (0.2 s), not once: several requests reached the file server.
    assert!(*hits.lock().expect("lock") >= 5);
}

#[tokio::test]
async fn refresh_changes_the_etag_of_the_table() {
    let newer = IERS_FILE.replace(
        "File expires on 28 June 2027",
        "File expires on 28 December 2027",
    );
    let served: Served = Arc::new(Mutex::new((404, "not yet".to_string())));
    let (url, _) = file_server("Leap_Second.dat", Arc::clone(&served)).await;
    let settings = Settings {
        leap_seconds_url: Some(url),
        leap_seconds_refresh_s: 0.2,
        ..Settings::default()
    };
    let server = TestServer::start_with(settings).await;
    eventually("a first failure", || async {
        failures(&server).await.is_some_and(|n| n >= 1.0)
    })
    .await;
    let built_in = get_with(&server, "/v1/time/leap-seconds", &[]).await;
    let old_tag = header_text(&built_in, "etag");
    *served.lock().expect("lock") = (200, newer);
    eventually("the refreshed table", || async {
        get_json(&server, "/v1/time/leap-seconds").await.2["expires"] == "2027-12-28"
    })
    .await;
    // RFC 9110 section 13.1.2: a client holding the old tag gets the new table (200), not 304.
    let after = get_with(
        &server,
        "/v1/time/leap-seconds",
        &[("if-none-match", &old_tag)],
    )
    .await;
    assert_eq!(after.status().as_u16(), 200);
    assert_ne!(header_text(&after, "etag"), old_tag);
}
