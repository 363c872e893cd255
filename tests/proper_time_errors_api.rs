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

/// A JSON ephemeris of 20 states 300 s apart (MEO), as bytes.
fn meo_ephemeris() -> Value {
    let orbit = Kepler {
        a_m: 26_561_750.0,
        e: 0.01,
        inclination_rad: 0.96,
    };
    json_ephemeris(&orbit, 300.0, 20)
}

#[tokio::test]
async fn an_option_out_of_range_is_refused_even_when_the_other_source_wins() {
    // Found by schemathesis: `?interpolation_points=67853` answered 200 because the body's
    // `options.interpolation_points` overrode it. Each source is checked on its own.
    let server = TestServer::start().await;
    let send = |query: &'static str, options: Value| {
        let server = &server;
        let mut body = meo_ephemeris();
        body["options"] = options;
        async move {
            post_body(
                server,
                query,
                "application/json",
                serde_json::to_vec(&body).unwrap_or_default(),
            )
            .await
        }
    };
    // The query value is out of range, the body's (which would win) is fine.
    let cases: [(&str, Value, &str, &str); 8] = [
        (
            "?interpolation_points=67853",
            json!({"interpolation_points": 4}),
            "bad_option",
            "interpolation_points",
        ),
        (
            "?interpolation_points=1",
            json!({"interpolation_points": 4}),
            "bad_option",
            "interpolation_points",
        ),
        (
            "?step_s=1e12",
            json!({"step_s": 600.0}),
            "bad_option",
            "step_s",
        ),
        (
            "?step_s=0.0001",
            json!({"step_s": 600.0}),
            "bad_option",
            "step_s",
        ),
        (
            "?max_gap_s=0",
            json!({"max_gap_s": 3600.0}),
            "bad_option",
            "max_gap_s",
        ),
        (
            "?initial_offset_s=-1e12",
            json!({"initial_offset_s": 0.0}),
            "bad_option",
            "initial_offset_s",
        ),
        (
            "?reference=TAI",
            json!({"reference": "TT"}),
            "unknown_reference",
            "reference",
        ),
        (
            "?gravity_model=j4",
            json!({"gravity_model": "j2"}),
            "unknown_gravity_model",
            "gravity_model",
        ),
    ];
    for (query, options, code, field) in cases {
        let answer = send(query, options.clone()).await;
        let body = assert_problem(&answer, 422, code);
        assert_eq!(body["field"], field, "{query} with {options}: {body}");
    }
    // The body's value is out of range, the query's is fine: the body's field is named.
    let cases: [(&str, Value, &str, &str); 6] = [
        (
            "?interpolation_points=4",
            json!({"interpolation_points": 67853}),
            "bad_option",
            "options.interpolation_points",
        ),
        (
            "?step_s=600",
            json!({"step_s": 1e12}),
            "bad_option",
            "options.step_s",
        ),
        (
            "?max_gap_s=3600",
            json!({"max_gap_s": -1.0}),
            "bad_option",
            "options.max_gap_s",
        ),
        (
            "?initial_offset_s=0",
            json!({"initial_offset_s": 4e11}),
            "bad_option",
            "options.initial_offset_s",
        ),
        (
            "?reference=TT",
            json!({"reference": "TAI"}),
            "unknown_reference",
            "options.reference",
        ),
        // Model names are exact: the body's misspelt model is named even where the query's
        // is fine.
        (
            "?gravity_model=j2",
            json!({"gravity_model": "J2_sun_moon"}),
            "unknown_gravity_model",
            "options.gravity_model",
        ),
    ];
    for (query, options, code, field) in cases {
        let answer = send(query, options.clone()).await;
        let body = assert_problem(&answer, 422, code);
        assert_eq!(body["field"], field, "{query} with {options}: {body}");
    }
    // In range in both places: the body wins, as documented.
    let answer = send(
        "?interpolation_points=16",
        json!({"interpolation_points": 4}),
    )
    .await;
    assert_eq!(answer.0, 200, "{}", answer.2);
    // Out of range with no body options at all (an OEM file): refused as before.
    let oem = std::fs::read(concat!(
        env!("CARGO_MANIFEST_DIR"),
        "/demo-data/lyra_kestrel.oem"
    ))
    .unwrap_or_default();
    let answer = post_body(
        &server,
        "?interpolation_points=17",
        "application/ccsds-oem",
        oem,
    )
    .await;
    let body = assert_problem(&answer, 422, "bad_option");
    assert_eq!(body["field"], "interpolation_points");
}

#[tokio::test]
async fn problem_texts_write_extreme_numbers_short() {
    // 5e-324 written in fixed notation is 327 characters; 1e300 is 301.
    let server = TestServer::start().await;
    let body = serde_json::to_vec(&meo_ephemeris()).unwrap_or_default();
    for (query, written) in [("?step_s=5e-324", "5e-324"), ("?step_s=1e300", "1e300")] {
        let answer = post_body(&server, query, "application/json", body.clone()).await;
        let problem = assert_problem(&answer, 422, "bad_option");
        let detail = problem["detail"].as_str().unwrap_or_default();
        assert!(detail.contains(&format!("is {written} s")), "{detail}");
        assert!(detail.len() < 120, "{} characters: {detail}", detail.len());
        assert!(!detail.contains("00000000"), "{detail}");
    }
    // A float from the physics layer (the rate model's validation) reads short as well.
    let answer = common::post_json(
        &server,
        "/v1/clock/rate",
        &json!({"items": [{"orbit": {"semi_major_axis_m": 1e300, "eccentricity": 0.0}}]}),
    )
    .await;
    let detail = answer.2["detail"].as_str().unwrap_or_default().to_string();
    assert_eq!(answer.0, 422, "{detail}");
    assert!(detail.contains("got 1e300"), "{detail}");
    assert!(detail.len() < 200, "{} characters: {detail}", detail.len());
}

#[tokio::test]
async fn a_span_between_exact_instants_is_exact() {
    // Seven states 10 s apart: the span is 60 s exactly (it read 60.000000000000014 when the
    // attosecond difference was multiplied by the inexact binary64 1e-18).
    let server = TestServer::start().await;
    let orbit = Kepler {
        a_m: 6_878_137.0,
        e: 0.001,
        inclination_rad: 0.9,
    };
    let mut ephemeris = json_ephemeris(&orbit, 10.0, 7);
    ephemeris["options"] = json!({"interpolation_points": 4});
    for (scale, format, epochs) in [
        (
            "TT",
            "j2000_s",
            [
                "800000000",
                "800000010",
                "800000020",
                "800000030",
                "800000040",
                "800000050",
                "800000060",
            ],
        ),
        (
            "UTC",
            "iso",
            [
                "2026-05-20T00:00:00",
                "2026-05-20T00:00:10",
                "2026-05-20T00:00:20",
                "2026-05-20T00:00:30",
                "2026-05-20T00:00:40",
                "2026-05-20T00:00:50",
                "2026-05-20T00:01:00",
            ],
        ),
    ] {
        ephemeris["time_scale"] = json!(scale);
        ephemeris["epoch_format"] = json!(format);
        for (state, epoch) in epochs.iter().enumerate() {
            ephemeris["objects"][0]["states"][state]["epoch"] = json!(epoch);
        }
        let answer = post_body(
            &server,
            "",
            "application/json",
            serde_json::to_vec(&ephemeris).unwrap_or_default(),
        )
        .await;
        assert_eq!(answer.0, 200, "{}", answer.2);
        let object = &answer.2["objects"][0];
        assert_eq!(
            object["summary"]["span_s"].as_f64(),
            Some(60.0),
            "{scale}: {object}"
        );
        let elapsed: Vec<f64> = object["series"]
            .as_array()
            .map(|samples| {
                samples
                    .iter()
                    .filter_map(|s| s["elapsed_s"].as_f64())
                    .collect()
            })
            .unwrap_or_default();
        assert_eq!(
            elapsed,
            [0.0, 10.0, 20.0, 30.0, 40.0, 50.0, 60.0],
            "{scale}"
        );
    }
}

#[tokio::test]
async fn the_iau_name_gcrs_reads_as_the_inertial_geocentric_frame() {
    // The rate and signal endpoints name the frame GCRS (IAU 2000 Resolution B1.3); the JSON
    // ephemeris takes that name as well as GCRF, with the same answer.
    let server = TestServer::start().await;
    let mut answers = Vec::new();
    for frame in ["GCRF", "GCRS"] {
        let mut ephemeris = meo_ephemeris();
        ephemeris["frame"] = json!(frame);
        let answer = post_body(
            &server,
            "?include_series=false",
            "application/json",
            serde_json::to_vec(&ephemeris).unwrap_or_default(),
        )
        .await;
        assert_eq!(answer.0, 200, "{frame}: {}", answer.2);
        assert_eq!(answer.2["objects"][0]["frame"], "inertial");
        answers.push(answer.2["objects"][0]["summary"].clone());
    }
    assert_eq!(answers[0], answers[1]);
    // CCSDS OEM takes the registry's values (GCRF); GCRS is refused with a hint.
    let oem = String::from_utf8(
        std::fs::read(concat!(
            env!("CARGO_MANIFEST_DIR"),
            "/demo-data/lyra_kestrel.oem"
        ))
        .unwrap_or_default(),
    )
    .unwrap_or_default();
    let renamed = oem.replacen("REF_FRAME = GCRF", "REF_FRAME = GCRS", 1);
    let answer = post_body(&server, "", "application/ccsds-oem", renamed.into_bytes()).await;
    let body = assert_problem(&answer, 422, "oem_unsupported_frame");
    assert!(
        body["detail"].as_str().is_some_and(|d| d.contains("GCRF")),
        "{body}"
    );
}

#[tokio::test]
async fn a_ut1_ephemeris_is_refused_with_its_code() {
    // UT1 is a scale of the engine (GET /v1/time/convert) but follows the Earth's rotation, so
    // the trajectory readers refuse it (src/trajectory/json.rs; this service's rule).
    let server = TestServer::start().await;
    let orbit = Kepler {
        a_m: 6_878_137.0,
        e: 0.001,
        inclination_rad: 0.9,
    };
    let mut ephemeris = json_ephemeris(&orbit, 10.0, 7);
    ephemeris["time_scale"] = json!("UT1");
    let answer = post_body(
        &server,
        "",
        "application/json",
        serde_json::to_vec(&ephemeris).unwrap_or_default(),
    )
    .await;
    assert_problem(&answer, 422, "unsupported_time_scale");
}
