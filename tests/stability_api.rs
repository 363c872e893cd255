//! `POST /v1/clock/stability` and broadcast GNSS weeks in `/v1/time/convert` through the real
//! server. Each numeric check names its source.

mod common;

use common::{assert_problem, client, get_json, post_json, TestServer};
use serde_json::json;

/// NBS14 10-point frequency set (NIST SP 1065).
const NBS14_FREQUENCY: [f64; 9] = [
    892.0, 809.0, 823.0, 798.0, 671.0, 644.0, 883.0, 903.0, 677.0,
];

#[tokio::test]
async fn nbs14_through_the_service() {
    let server = TestServer::start().await;
    let body = json!({"kind": "frequency", "tau0_s": 1.0, "values": NBS14_FREQUENCY,
        "deviations": ["adev", "mdev", "tdev"], "tau_s": [1, 2]});
    let (status, content_type, answer) = post_json(&server, "/v1/clock/stability", &body).await;
    assert_eq!(status, 200, "{answer}");
    assert_eq!(content_type, "application/json");
    assert_eq!(answer["phase_points"], 10);
    let results = answer["results"].as_array().cloned().unwrap_or_default();
    assert_eq!(results.len(), 6);
    // NIST SP 1065 NBS14 values (issue 13): ADEV(1) 91.22945, MDEV(2) 74.78849, TDEV(1) 52.67135.
    let value = |i: usize| results[i]["value"].as_f64().unwrap_or(0.0);
    assert!((value(0) - 91.22945).abs() < 1e-4, "{}", value(0));
    assert!((value(3) - 74.78849).abs() < 1e-4, "{}", value(3));
    assert!((value(4) - 52.67135).abs() < 1e-4, "{}", value(4));
    assert_eq!(results[0]["terms"], 8);
    assert_eq!(results[0]["edf_method"], "howe_allan_barnes");
    let (low, high) = (results[0]["low"].as_f64(), results[0]["high"].as_f64());
    assert!(low
        .zip(high)
        .is_some_and(|(l, h)| l < value(0) && value(0) < h));

    // The same answer as CSV (RFC 4180, one row per deviation and tau).
    let response = client()
        .post(server.url("/v1/clock/stability"))
        .header("accept", "text/csv")
        .json(&body)
        .send()
        .await
        .expect("request");
    assert_eq!(response.status().as_u16(), 200);
    let text = response.text().await.unwrap_or_default();
    let lines: Vec<&str> = text.split("\r\n").filter(|l| !l.is_empty()).collect();
    assert_eq!(lines.len(), 7);
    assert!(lines[0].starts_with("deviation,tau_s,factor,value,terms"));
    assert!(
        lines[1].starts_with("adev,1.0,1,91.2294497"),
        "{}",
        lines[1]
    );

    // Octave taus by default: for 9 frequency values (10 phase points) ADEV at m = 1, 2, 4.
    let octave = json!({"kind": "frequency", "tau0_s": 2.0, "values": NBS14_FREQUENCY,
        "deviations": ["oadev"]});
    let (status, _, answer) = post_json(&server, "/v1/clock/stability", &octave).await;
    assert_eq!(status, 200, "{answer}");
    let taus: Vec<f64> = answer["results"]
        .as_array()
        .map(|r| r.iter().filter_map(|p| p["tau_s"].as_f64()).collect())
        .unwrap_or_default();
    assert_eq!(taus, [2.0, 4.0, 8.0]);
}

#[tokio::test]
async fn bad_series_name_the_field() {
    let server = TestServer::start().await;
    let path = "/v1/clock/stability";
    let base = |extra: serde_json::Value| {
        let mut body =
            json!({"kind": "phase", "tau0_s": 1.0, "values": [0.0, 1e-9, 3e-9, 2e-9, 5e-9]});
        if let (Some(b), Some(e)) = (body.as_object_mut(), extra.as_object()) {
            for (k, v) in e {
                b.insert(k.clone(), v.clone());
            }
        }
        body
    };
    let cases = [
        (json!({"values": []}), "empty_series", "values"),
        (
            json!({"values": [0.0, 1.0, null, 2.0]}),
            "gap_in_series",
            "values[2]",
        ),
        (json!({"kind": "time"}), "unknown_data_kind", "kind"),
        (
            json!({"deviations": ["adev", "allan"]}),
            "unknown_deviation",
            "deviations[1]",
        ),
        (json!({"deviations": []}), "unknown_deviation", "deviations"),
        // 5 phase points: ADEV up to m = 2 (NIST SP 1065 eq. 7 needs x[i+2m]).
        (json!({"tau_s": [1, 3]}), "series_too_short", "tau_s[1]"),
        (json!({"tau_s": [1.5]}), "tau_not_multiple", "tau_s[0]"),
        (json!({"tau_s": [0]}), "tau_not_multiple", "tau_s[0]"),
        (json!({"tau0_s": null}), "non_uniform_sampling", "tau0_s"),
        (json!({"tau0_s": -1.0}), "non_uniform_sampling", "tau0_s"),
        (
            json!({"times_s": [0, 1, 2, 3.5, 4]}),
            "non_uniform_sampling",
            "times_s[3]",
        ),
        (
            json!({"times_s": [0, 1, 2, 4, 5]}),
            "gap_in_series",
            "times_s[3]",
        ),
        (
            json!({"times_s": [0, 1, 2]}),
            "non_uniform_sampling",
            "times_s",
        ),
        (
            json!({"confidence": 1.0}),
            "invalid_confidence",
            "confidence",
        ),
        (
            json!({"values": [1e300, -1e300, 1e300], "deviations": ["adev"]}),
            "not_finite_sample",
            "values",
        ),
        (json!({"values": [0.0, 1.0]}), "series_too_short", "values"),
    ];
    for (extra, code, field) in cases {
        let body = base(extra.clone());
        let answer = post_json(&server, path, &body).await;
        let problem = assert_problem(&answer, 422, code);
        assert_eq!(problem["field"], field, "{extra}: {problem}");
    }
    // Even time tags give the same answer as tau0_s.
    let tagged = base(json!({"tau0_s": null, "times_s": [10, 11, 12, 13, 14]}));
    let (status, _, answer) = post_json(&server, path, &tagged).await;
    assert_eq!(status, 200, "{answer}");
    assert_eq!(answer["tau0_s"], 1.0);
}

#[tokio::test]
async fn broadcast_weeks_resolve_near_a_date() {
    let server = TestServer::start().await;
    // Issue 13: GPS 10-bit week 337 near 2026 is full week 2385 (2 rollovers of 1024 weeks,
    // IS-GPS-200); week 2385 begins 2025-09-21 (44244 + 2385 x 7 = MJD 60939).
    let (status, _, answer) = get_json(
        &server,
        "/v1/time/convert?at=337:0&from=GPST&format=gnss_week&to=GPST&forms=iso,gnss_week&week_counter=gps_lnav&week_near=2026-01-01",
    )
    .await;
    assert_eq!(status, 200, "{answer}");
    assert_eq!(answer["input"]["gnss_week"], "2385:0.0");
    assert_eq!(answer["input"]["iso"], "2025-09-21T00:00:00.000000000000");
    let warning = answer["warnings"][0].as_str().unwrap_or_default();
    assert!(
        warning.contains("full week 2385") && warning.contains("2 rollovers"),
        "{warning}"
    );
    // Without a counter the week is full, as before: 337 is 1986-06-22 (IS-GPS-200 week count).
    let (_, _, plain) = get_json(
        &server,
        "/v1/time/convert?at=337:0&from=GPST&format=gnss_week&to=GPST&forms=iso",
    )
    .await;
    assert_eq!(plain["input"]["iso"], "1986-06-22T00:00:00.000000000000");
    // Batch: Galileo 12 bits near 2026, no rollover yet (Galileo OS SIS ICD).
    let batch = json!({"from": "GST", "to": ["GST"], "format": "gnss_week", "forms": ["gnss_week"],
        "epochs": ["1380:0"], "week_counter": "galileo", "week_near": "2026-06-01"});
    let (status, _, answer) = post_json(&server, "/v1/time/convert", &batch).await;
    assert_eq!(status, 200, "{answer}");
    assert_eq!(answer["conversions"][0]["input"]["gnss_week"], "1380:0.0");
    // Bad input.
    let bad = [
        (
            "at=1024:0&from=GPST&format=gnss_week&week_counter=gps_lnav&week_near=2026-01-01",
            "instant_out_of_range",
            "at",
        ),
        (
            "at=337:0&from=GPST&format=gnss_week&week_counter=gps_l1",
            "unknown_week_counter",
            "week_counter",
        ),
        (
            "at=337:0&from=GST&format=gnss_week&week_counter=gps_lnav",
            "format_not_for_scale",
            "week_counter",
        ),
        (
            "at=2026-01-01T00:00:00&from=GPST&week_counter=gps_lnav",
            "week_counter_needs_gnss_week",
            "week_counter",
        ),
        (
            "at=337:0&from=GPST&format=gnss_week&week_near=2026-01-01",
            "week_counter_needs_gnss_week",
            "week_counter",
        ),
        (
            "at=337:0&from=GPST&format=gnss_week&week_counter=gps_lnav&week_near=2026-13-01",
            "malformed_instant",
            "week_near",
        ),
    ];
    for (query, code, field) in bad {
        let answer = get_json(&server, &format!("/v1/time/convert?{query}")).await;
        let problem = assert_problem(&answer, 422, code);
        assert_eq!(problem["field"], field, "{query}: {problem}");
    }
}
