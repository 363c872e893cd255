//! What the contract test (tests/contract/) found, kept as regressions: the handlers accept
//! exactly what the OpenAPI document admits, and the document lists every answer.

mod common;

use common::kepler::{json_ephemeris, post_body, Kepler};
use common::{assert_problem, get_json, post_json, TestServer};
use serde_json::{json, Value};

/// A valid rate item: the navigation orbit of IS-GPS-200 (a = 26 561.75 km).
fn nav_orbit() -> Value {
    json!({"orbit": {"semi_major_axis_m": 26_561_750.0, "eccentricity": 0.0}})
}

#[tokio::test]
async fn names_are_read_exactly_as_documented() {
    // The document lists the canonical spellings only (IAU and BIPM abbreviations; common practice
    // for enums): any other spelling is refused, as the schema refuses it.
    let server = TestServer::start().await;
    let answer = get_json(
        &server,
        "/v1/time/convert?at=2026-03-14T06:30:00&from=utc&to=TAI",
    )
    .await;
    let body = assert_problem(&answer, 422, "unknown_scale");
    assert_eq!(body["field"], "from");
    let answer = get_json(
        &server,
        "/v1/time/convert?at=2026-03-14T06:30:00&to=TAI,%20TT",
    )
    .await;
    let body = assert_problem(&answer, 422, "unknown_scale");
    assert_eq!(body["field"], "to[1]");
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [nav_orbit()], "reference": "tt"}),
    )
    .await;
    assert_problem(&answer, 422, "unknown_reference");
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [{"ground_site": {"latitude_deg": 0.0, "longitude_deg": 0.0,
            "height_m": 0.0, "height_reference": "Geoid"}}]}),
    )
    .await;
    assert_problem(&answer, 422, "unknown_height_reference");
    // The canonical spellings still work.
    let answer = get_json(
        &server,
        "/v1/time/convert?at=2026-03-14T06:30:00&from=UTC&to=TAI,TT",
    )
    .await;
    assert_eq!(answer.0, 200, "{}", answer.2);
}

#[tokio::test]
async fn request_level_frequency_is_checked_even_when_unused() {
    // The schema bounds nominal_frequency_hz to (0, 9e15] wherever it appears (common practice:
    // a value the schema refuses is refused, even if no item would use it).
    let server = TestServer::start().await;
    let mut item = nav_orbit();
    item["nominal_frequency_hz"] = json!(10.23e6);
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [item], "nominal_frequency_hz": -1.0}),
    )
    .await;
    let body = assert_problem(&answer, 422, "invalid_frequency");
    assert_eq!(body["field"], "nominal_frequency_hz");
    // Above the bound: f0 / (1 + y) overflowed to infinity (answered as null) for f0 near the
    // largest binary64 (IEEE 754 overflow, common practice).
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [nav_orbit()], "nominal_frequency_hz": 1.0e300}),
    )
    .await;
    assert_problem(&answer, 422, "invalid_frequency");
}

#[tokio::test]
async fn numbers_are_read_correctly_rounded() {
    // 1000000.0000000001 is the binary64 just above 1e6 when correctly rounded (IEEE 754
    // round-to-nearest; Python's float() agrees); the bound |anomaly| <= 1e6 must see it.
    let server = TestServer::start().await;
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [{"orbit": {"semi_major_axis_m": 26_561_750.0, "eccentricity": 0.0,
            "mean_anomaly_deg": 1000000.0000000001}}]}),
    )
    .await;
    let body = assert_problem(&answer, 422, "angle_out_of_range");
    assert_eq!(body["field"], "items[0].orbit.mean_anomaly_deg");
}

#[tokio::test]
async fn proper_time_json_follows_its_schema() {
    // A circular orbit at a = 7000 km (two-body states from the test harness, Kepler 1609 / common practice).
    let server = TestServer::start().await;
    let orbit = Kepler {
        a_m: 7_000_000.0,
        e: 0.0,
        inclination_rad: 0.9,
    };
    let ephemeris = json_ephemeris(&orbit, 60.0, 20);
    let send = |body: &Value| serde_json::to_vec(body).unwrap_or_default();
    // `13.0` is an integer in JSON Schema (2020-12, 6.1.1): read as 13.
    let mut whole = ephemeris.clone();
    whole["options"] = json!({"interpolation_points": 4.0});
    let answer = post_body(&server, "", "application/json", send(&whole)).await;
    assert_eq!(answer.0, 200, "{}", answer.2);
    let mut fraction = ephemeris.clone();
    fraction["options"] = json!({"interpolation_points": 4.5});
    let answer = post_body(&server, "", "application/json", send(&fraction)).await;
    assert_problem(&answer, 400, "invalid_body");
    // Frame names in upper case, as the schema's pattern states.
    let mut lower = ephemeris.clone();
    lower["frame"] = json!("gcrf");
    let answer = post_body(&server, "", "application/json", send(&lower)).await;
    let body = assert_problem(&answer, 422, "unsupported_frame");
    assert_eq!(body["field"], "frame");
    let mut family = ephemeris.clone();
    family["frame"] = json!("ITRF2020");
    let answer = post_body(&server, "", "application/json", send(&family)).await;
    assert_eq!(answer.0, 200, "{}", answer.2);
    // Beyond the geocentric range of the model (1.5e9 m, the rate endpoints' limit).
    let mut far = ephemeris.clone();
    far["objects"][0]["states"][3]["position_m"] = json!([1.6e9, 0.0, 0.0]);
    let answer = post_body(&server, "", "application/json", send(&far)).await;
    let body = assert_problem(&answer, 422, "beyond_model_range");
    assert_eq!(body["index"], 3);
    // Options beyond the supported range of instants.
    let answer = post_body(
        &server,
        "?step_s=1e12",
        "application/json",
        send(&ephemeris),
    )
    .await;
    assert_problem(&answer, 422, "bad_option");
    // Malformed JSON sent as a file type is a bad file (422), as JSON it is a bad body (400).
    let broken = b"{\"frame\": ".to_vec();
    let answer = post_body(&server, "", "text/plain", broken.clone()).await;
    assert_problem(&answer, 422, "json_invalid");
    let answer = post_body(&server, "", "application/json", broken).await;
    assert_problem(&answer, 400, "invalid_json");
}

#[test]
fn every_operation_documents_its_answers() {
    // RFC 9110 15 (each status an operation can give) and RFC 9457 3 (problem+json) applied
    // to the document: every operation with a body documents 400, 413, 415 and 422; every
    // 4xx/5xx is a problem+json answer.
    let document: Value =
        serde_json::from_str(&eigenzeit::ops::openapi::document_json()).unwrap_or_default();
    let paths = document["paths"].as_object().cloned().unwrap_or_default();
    let mut with_body = 0;
    for (path, item) in paths {
        for (method, operation) in item.as_object().cloned().unwrap_or_default() {
            let responses = &operation["responses"];
            if operation.get("requestBody").is_some() {
                with_body += 1;
                for status in ["200", "400", "413", "415", "422", "503"] {
                    assert!(
                        responses.get(status).is_some(),
                        "{method} {path} does not document {status}"
                    );
                }
            }
            for (status, response) in responses.as_object().cloned().unwrap_or_default() {
                if status.starts_with('4') || (status.starts_with('5') && path != "/readyz") {
                    assert!(
                        response["content"]
                            .get("application/problem+json")
                            .is_some(),
                        "{method} {path} {status} is not documented as application/problem+json"
                    );
                }
            }
        }
    }
    // rate, compare, stability, proper-time, clock corrections, signal path, two-way, time
    // convert and earth orientation (the POST batches).
    assert_eq!(with_body, 9, "operations with a request body");
}
