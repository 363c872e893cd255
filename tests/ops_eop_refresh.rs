//! The EOP URL polled by the real refresh task: a table with a later last observed day is
//! taken, a broken one, an unanswered one and one with an earlier last observed day are refused
//! and the table in force kept, with the outcome visible in `/v1/earth/eop`, `/readyz` and
//! `/metrics`. The file is served by a small axum server inside the test.

mod common;

use std::sync::{Arc, Mutex};

use common::file_server::{eventually, file_server, Served};
use common::process::TempFile;
use common::{get_json, metric_value, metrics_text, TestServer};
use eigenzeit::ops::config::Settings;

/// An excerpt of IERS Bulletin A `finals2000A.all` (astropy-iers-data 0.2026.11.2.0.34.55, see
/// tests/reference/eop_reference_versions.txt): observed to 2026-10-22 (MJD 61335).
const FINALS: &str = include_str!("reference/eop_finals2000A_2026_2027.all");

/// The excerpt with the day MJD 61335 turned from observed to predicted (the I/P flags of
/// polar motion and UT1 in columns 17 and 58, readme.finals2000A): its last observed day is
/// MJD 61334, a day older.
fn one_day_older() -> String {
    FINALS
        .lines()
        .map(|line| {
            if line.get(7..15) == Some("61335.00") {
                let mut bytes = line.as_bytes().to_vec();
                assert_eq!((bytes[16], bytes[57]), (b'I', b'I'), "{line}");
                bytes[16] = b'P';
                bytes[57] = b'P';
                String::from_utf8(bytes).expect("ASCII")
            } else {
                line.to_string()
            }
        })
        .collect::<Vec<_>>()
        .join("\n")
}

async fn failures(server: &TestServer) -> f64 {
    metric_value(
        &metrics_text(server).await,
        "eigenzeit_eop_refresh_failures_total",
    )
    .unwrap_or(-1.0)
}

async fn last_error(server: &TestServer) -> String {
    get_json(server, "/readyz").await.2["eop"]["last_refresh_error"]
        .as_str()
        .unwrap_or("")
        .to_string()
}

#[tokio::test]
async fn refresh_takes_a_newer_table_and_keeps_it_against_bad_ones() {
    let older = TempFile::new("eop-older.all", &one_day_older());
    let served: Served = Arc::new(Mutex::new((200, FINALS.to_string())));
    let (url, hits) = file_server("finals2000A.all", Arc::clone(&served)).await;
    let settings = Settings {
        eop_file: Some(older.path().into()),
        eop_url: Some(url.clone()),
        eop_refresh_s: 0.2,
        ..Settings::default()
    };
    let server = TestServer::start_with(settings).await;

    // 1. The valid newer table (last observed MJD 61335 = 2026-10-22, a day later than the
    //    file's) is taken.
    eventually("the refreshed table", || async {
        get_json(&server, "/v1/earth/eop").await.2["last_observed_mjd"] == 61_335
    })
    .await;
    let (_, _, table) = get_json(&server, "/v1/earth/eop").await;
    assert_eq!(table["source"], format!("refreshed from {url}"));
    assert_eq!(table["last_observed"], "2026-10-22");
    // The excerpt starts on 2026-08-01 (MJD 61253); its values end on 2027-12-16 (MJD 61755).
    assert_eq!(table["first_mjd"], 61_253);
    let (status, _, ready) = get_json(&server, "/readyz").await;
    assert_eq!(status, 200);
    assert_eq!(ready["eop"]["source"], format!("refreshed from {url}"));
    assert_eq!(ready["eop"]["last_observed"], "2026-10-22");
    assert_eq!(ready["eop"]["last_observed_mjd"], 61_335);
    assert_eq!(
        ready["eop"]["end_of_predictions_mjd"], table["end_of_predictions_mjd"],
        "{ready}"
    );
    assert!(ready["eop"]["last_refresh_unix_s"].is_u64(), "{ready}");
    assert!(ready["eop"].get("last_refresh_error").is_none(), "{ready}");
    let text = metrics_text(&server).await;
    let info = format!("eigenzeit_eop_table_info{{source=\"refreshed from {url}\"}}");
    assert_eq!(metric_value(&text, &info), Some(1.0), "{text}");
    assert_eq!(
        metric_value(&text, "eigenzeit_eop_last_observed_mjd"),
        Some(61_335.0)
    );
    assert_eq!(
        metric_value(&text, "eigenzeit_eop_refresh_failures_total"),
        Some(0.0)
    );
    assert!(metric_value(&text, "eigenzeit_eop_refresh_successes_total").is_some_and(|n| n >= 1.0));
    // The leap-second refresh is not configured: its counters stay at zero.
    assert_eq!(
        metric_value(&text, "eigenzeit_leap_seconds_refresh_successes_total"),
        Some(0.0)
    );

    // 2. A broken file (a letter in x_p of 2026-10-01, line 62) is refused and the table kept.
    let broken = FINALS.replacen(" 0.174596 ", " 0.17x596 ", 1);
    assert_ne!(broken, FINALS);
    *served.lock().expect("lock") = (200, broken);
    eventually("a counted failure", || async {
        failures(&server).await >= 1.0
    })
    .await;
    let error = last_error(&server).await;
    assert!(
        error.contains("not valid") && error.contains(&url) && error.contains("line 62"),
        "{error}"
    );
    let (_, _, table) = get_json(&server, "/v1/earth/eop").await;
    assert_eq!(table["source"], format!("refreshed from {url}"));
    assert_eq!(table["last_observed_mjd"], 61_335);

    // 3. An answer that is not 200 is a failure too.
    let before = failures(&server).await;
    *served.lock().expect("lock") = (503, "maintenance".to_string());
    eventually("a failure on 503", || async {
        failures(&server).await > before
    })
    .await;
    assert!(last_error(&server).await.contains("503"));

    // 4. A valid table observed to an earlier day is refused: it would turn an observed day
    //    back into a prediction.
    let before = failures(&server).await;
    *served.lock().expect("lock") = (200, one_day_older());
    eventually("a failure on an older file", || async {
        failures(&server).await > before
    })
    .await;
    let error = last_error(&server).await;
    assert!(
        error.contains("MJD 61334, before the table in force (MJD 61335)"),
        "{error}"
    );
    assert_eq!(
        get_json(&server, "/v1/earth/eop").await.2["last_observed_mjd"],
        61_335
    );

    // 5. Back to a good file: the error is cleared.
    *served.lock().expect("lock") = (200, FINALS.to_string());
    eventually("the error cleared", || async {
        get_json(&server, "/readyz").await.2["eop"]
            .get("last_refresh_error")
            .is_none()
    })
    .await;
    assert!(*hits.lock().expect("lock") >= 5);
}
