//! The time endpoints through the real server. Each check names its source.

mod common;

use common::{assert_problem, get_json, post_json, TestServer};
use serde_json::json;

fn result_for<'a>(body: &'a serde_json::Value, scale: &str) -> &'a serde_json::Value {
    body["results"]
        .as_array()
        .and_then(|results| results.iter().find(|r| r["scale"] == scale))
        .unwrap_or_else(|| panic!("no {scale} result in {body}"))
}

#[tokio::test]
async fn utc_to_tai_gpst_tt_in_2026() {
    let server = TestServer::start().await;
    let (status, _, body) = get_json(
        &server,
        "/v1/time/convert?at=2026-03-14T06:30:00.123456789012&from=UTC&to=TAI,GPST,TT",
    )
    .await;
    assert_eq!(status, 200, "{body}");
    // TAI - UTC = 37 s since 2017-01-01 (IERS Bulletin C 52 and later).
    let tai = result_for(&body, "TAI");
    assert_eq!(tai["difference_exact_s"], "37.0");
    assert_eq!(tai["iso"], "2026-03-14T06:30:37.123456789012");
    // GPST = TAI - 19 s (IS-GPS-200), so GPST - UTC = 18 s in 2026.
    let gpst = result_for(&body, "GPST");
    assert_eq!(gpst["difference_s"], 18.0);
    // GPS week 2400 began 2026-01-04 (from memory; MJD 61044 - 44244 = 16800 days = 2400 weeks),
    // so 2026-03-14 (a Saturday) is week 2409, day 6: 6*86400 + 23400 + 18 s.
    assert_eq!(gpst["gnss_week"], "2409:541818.123456789012");
    // TT = TAI + 32.184 s (IAU 1991 Resolution A4).
    assert_eq!(result_for(&body, "TT")["difference_exact_s"], "69.184");
    assert_eq!(body["input"]["scale"], "UTC");
    assert!(body["warnings"].as_array().is_some_and(|w| w.is_empty()));
}

#[tokio::test]
async fn leap_second_reads_and_writes() {
    let server = TestServer::start().await;
    // 2016-12-31T23:59:60 is the leap second of IERS Bulletin C 52; TAI - UTC was 36 s in it.
    let (status, _, body) = get_json(
        &server,
        "/v1/time/convert?at=2016-12-31T23:59:60.5&from=UTC&to=TAI",
    )
    .await;
    assert_eq!(status, 200, "{body}");
    assert_eq!(body["input"]["iso"], "2016-12-31T23:59:60.500000000000");
    assert_eq!(
        result_for(&body, "TAI")["iso"],
        "2017-01-01T00:00:36.500000000000"
    );
    // And back: TAI 2017-01-01T00:00:36.5 is UTC 23:59:60.5.
    let (_, _, back) = get_json(
        &server,
        "/v1/time/convert?at=2017-01-01T00:00:36.5&from=TAI&to=UTC",
    )
    .await;
    assert_eq!(
        result_for(&back, "UTC")["iso"],
        "2016-12-31T23:59:60.500000000000"
    );
}

#[tokio::test]
async fn coordinate_scales_at_j2000() {
    let server = TestServer::start().await;
    // TCG - TT at J2000.0 TT is about 0.505833 s (IERS Conventions (2010) ch. 10).
    let (status, _, body) = get_json(
        &server,
        "/v1/time/convert?at=2451545.0&format=jd&from=TT&to=TCG",
    )
    .await;
    assert_eq!(status, 200, "{body}");
    let tcg_minus_tt = result_for(&body, "TCG")["difference_s"]
        .as_f64()
        .unwrap_or(0.0);
    assert!((tcg_minus_tt - 0.505_833).abs() < 1e-6, "{tcg_minus_tt}");
    // TCB - TDB at J2000.0 is about 11.2538 s (IERS Conventions (2010) ch. 10).
    let (_, _, body) = get_json(
        &server,
        "/v1/time/convert?at=2451545.0&format=jd&from=TDB&to=TCB",
    )
    .await;
    let tcb_minus_tdb = result_for(&body, "TCB")["difference_s"]
        .as_f64()
        .unwrap_or(0.0);
    assert!((tcb_minus_tdb - 11.2538).abs() < 1e-4, "{tcb_minus_tdb}");
}

#[tokio::test]
async fn every_format_reads_the_same_event() {
    let server = TestServer::start().await;
    // One event written six ways (common practice: JD = MJD + 2400000.5; Unix time counts
    // 86400 s per day from 1970-01-01; J2000.0 = 2000-01-01T12:00:00).
    let forms = [
        ("iso", "2026-03-14T06:30:00"),
        ("iso", "2026-073T06:30:00"),
        ("mjd", "61113.270833333333333333333333"),
        ("jd", "2461113.770833333333333333333333"),
        ("unix_s", "1773469800"),
        ("j2000_s", "826741800"),
    ];
    for (format, text) in forms {
        let (status, _, body) = get_json(
            &server,
            &format!("/v1/time/convert?at={text}&format={format}&from=UTC&to=TAI"),
        )
        .await;
        assert_eq!(status, 200, "{format} {text}: {body}");
        assert_eq!(
            body["input"]["iso"], "2026-03-14T06:30:00.000000000000",
            "{format} {text}"
        );
    }
    let (status, _, body) = get_json(
        &server,
        "/v1/time/convert?at=2409:541818&format=gnss_week&from=GPST&to=UTC",
    )
    .await;
    assert_eq!(status, 200, "{body}");
    assert_eq!(
        result_for(&body, "UTC")["iso"],
        "2026-03-14T06:30:00.000000000000"
    );
}

#[tokio::test]
async fn batch_of_ten_thousand_epochs() {
    let server = TestServer::start().await;
    let epochs: Vec<String> = (0..10_000)
        .map(|i| format!("{}", 61_000.0 + f64::from(i) * 0.01))
        .collect();
    let (status, _, body) = post_json(
        &server,
        "/v1/time/convert",
        &json!({"from": "UTC", "to": ["TAI", "TDB"], "format": "mjd", "epochs": epochs}),
    )
    .await;
    assert_eq!(status, 200);
    let conversions = body["conversions"].as_array().map(Vec::len);
    assert_eq!(conversions, Some(10_000));
}

#[tokio::test]
async fn bad_inputs_are_problems_naming_the_field() {
    let server = TestServer::start().await;
    let cases = [
        (
            "/v1/time/convert?at=2026-03-14T00:00:00&from=XYZ",
            422,
            "unknown_scale",
            "from",
        ),
        (
            "/v1/time/convert?at=2026-02-30T00:00:00",
            422,
            "impossible_date",
            "at",
        ),
        (
            "/v1/time/convert?at=2026-03-14T24:00:01",
            422,
            "impossible_date",
            "at",
        ),
        (
            "/v1/time/convert?at=2026-03-14T23:59:60",
            422,
            "invalid_leap_second",
            "at",
        ),
        (
            "/v1/time/convert?at=2016-12-31T23:59:60&from=TAI",
            422,
            "invalid_leap_second",
            "at",
        ),
        (
            "/v1/time/convert?at=2409:0&format=gnss_week&from=TT",
            422,
            "format_not_for_scale",
            "at",
        ),
        (
            "/v1/time/convert?at=0&format=unix_s&from=TAI",
            422,
            "format_not_for_scale",
            "at",
        ),
        (
            "/v1/time/convert?at=1959-12-31T23:59:59",
            422,
            "utc_before_1960",
            "at",
        ),
        ("/v1/time/convert?at=abc", 422, "malformed_instant", "at"),
        (
            "/v1/time/convert?at=1e5&format=mjd",
            422,
            "malformed_instant",
            "at",
        ),
        (
            "/v1/time/convert?at=60000&format=fortnight",
            422,
            "unknown_format",
            "format",
        ),
        (
            "/v1/time/convert?at=60000&format=mjd&to=TAI,NOPE",
            422,
            "unknown_scale",
            "to[1]",
        ),
    ];
    for (path, status, code, field) in cases {
        let answer = get_json(&server, path).await;
        let body = assert_problem(&answer, status, code);
        assert_eq!(body["field"], field, "{path}: {body}");
    }
    let answer = get_json(&server, "/v1/time/convert").await;
    assert_problem(&answer, 400, "invalid_query");
}

#[tokio::test]
async fn bad_batches_are_problems() {
    let settings = eigenzeit::ops::config::Settings {
        batch_limit: 5,
        ..Default::default()
    };
    let server = TestServer::start_with(settings).await;
    let too_many = json!({"from": "UTC", "to": ["TAI"], "epochs": vec!["2026-01-01"; 6]});
    let body = assert_problem(
        &post_json(&server, "/v1/time/convert", &too_many).await,
        422,
        "batch_too_large",
    );
    assert!(
        body["detail"].as_str().is_some_and(|d| d.contains('5')),
        "the limit is named: {body}"
    );
    let empty = json!({"from": "UTC", "to": ["TAI"], "epochs": []});
    assert_problem(
        &post_json(&server, "/v1/time/convert", &empty).await,
        422,
        "empty_batch",
    );
    let one_bad = json!({"from": "UTC", "to": ["TAI"], "epochs": ["2026-01-01", "2026-02-30"]});
    let body = assert_problem(
        &post_json(&server, "/v1/time/convert", &one_bad).await,
        422,
        "impossible_date",
    );
    assert_eq!(body["field"], "epochs[1]");
    let unknown_field =
        json!({"from": "UTC", "to": ["TAI"], "epochs": ["2026-01-01"], "colour": 1});
    assert_problem(
        &post_json(&server, "/v1/time/convert", &unknown_field).await,
        400,
        "invalid_body",
    );
    // A body that does not match the schema names the JSON path at fault.
    let wrong_type = json!({"from": "UTC", "to": ["TAI"], "epochs": ["2026-01-01", 7]});
    let body = assert_problem(
        &post_json(&server, "/v1/time/convert", &wrong_type).await,
        400,
        "invalid_body",
    );
    assert_eq!(body["field"], "epochs[1]");
    let response = common::client()
        .post(server.url("/v1/time/convert"))
        .header("content-type", "text/plain")
        .body("{}")
        .send()
        .await
        .expect("request");
    assert_problem(
        &common::split(response).await,
        415,
        "unsupported_media_type",
    );
    let response = common::client()
        .post(server.url("/v1/time/convert"))
        .header("content-type", "application/json")
        .body("{\"from\": ")
        .send()
        .await
        .expect("request");
    assert_problem(&common::split(response).await, 400, "invalid_json");
}

#[tokio::test]
async fn unknown_routes_and_methods_are_problems() {
    let server = TestServer::start().await;
    assert_problem(
        &get_json(&server, "/v1/nothing-here").await,
        404,
        "not_found",
    );
    let response = common::client()
        .delete(server.url("/v1/time/convert"))
        .send()
        .await
        .expect("request");
    assert_problem(&common::split(response).await, 405, "method_not_allowed");
}

#[tokio::test]
async fn reference_documents() {
    let server = TestServer::start().await;
    let (status, _, scales) = get_json(&server, "/v1/time/scales").await;
    assert_eq!(status, 200);
    // The ten scales of the first release, UT1, TCL and TL (src/physics/time/scale.rs).
    assert_eq!(scales["scales"].as_array().map(Vec::len), Some(13));
    let (status, _, table) = get_json(&server, "/v1/time/leap-seconds").await;
    assert_eq!(status, 200);
    // The last step of the table: 2017-01-01, TAI - UTC = 37 s (IERS Bulletin C 52).
    let last = table["entries"]
        .as_array()
        .and_then(|e| e.last())
        .cloned()
        .unwrap_or_default();
    assert_eq!(last["utc_date"], "2017-01-01");
    assert_eq!(last["tai_minus_utc_s"], 37.0);
    // Bulletin C 72 (July 2026): the table expires on 2027-06-28.
    assert_eq!(table["expires"], "2027-06-28");
    let (status, _, now) = get_json(&server, "/v1/time/now").await;
    assert_eq!(status, 200);
    // Every scale but UT1 (TCL and TL included, inside their span until 2101).
    assert_eq!(now["results"].as_array().map(Vec::len), Some(12));
}

#[tokio::test]
async fn utc_past_expiry_carries_a_warning() {
    let server = TestServer::start().await;
    let (status, _, body) =
        get_json(&server, "/v1/time/convert?at=2030-01-01T00:00:00&to=TAI").await;
    assert_eq!(status, 200);
    let warnings = body["warnings"].as_array().cloned().unwrap_or_default();
    assert_eq!(warnings.len(), 1, "{body}");
    assert!(warnings[0]
        .as_str()
        .is_some_and(|w| w.contains("2027-06-28")));
}
