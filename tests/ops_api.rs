//! Operations over HTTP: metrics and request ids, against the real server on 127.0.0.1:0.
//! (CORS, caching, timeout, body limit and compression: ops_http.rs.)

mod common;

use std::time::{Duration, Instant};

use common::{
    client, convert_batch, get_json, get_with, header_text, host_port, metric_value, metrics_text,
    HeldRequest, TestServer,
};

/// Latency bucket bounds the service exposes, as rendered in `le` labels.
const BUCKETS: [&str; 15] = [
    "0.0001", "0.00025", "0.0005", "0.001", "0.0025", "0.005", "0.01", "0.025", "0.05", "0.1",
    "0.25", "1", "5", "30", "+Inf",
];

/// Polls `/metrics` until `series` reads `want` (at most 10 s); returns the last text.
async fn wait_for_metric(server: &TestServer, series: &str, want: f64) -> String {
    let deadline = Instant::now() + Duration::from_secs(10);
    loop {
        let text = metrics_text(server).await;
        if metric_value(&text, series) == Some(want) || Instant::now() > deadline {
            return text;
        }
        tokio::time::sleep(Duration::from_millis(20)).await;
    }
}

#[tokio::test]
async fn metrics_count_requests_per_route_and_status() {
    let server = TestServer::start().await;
    for _ in 0..3 {
        assert_eq!(get_json(&server, "/v1/time/scales").await.0, 200);
    }
    assert_eq!(
        get_json(&server, "/v1/time/convert?at=2026-02-30T00:00:00")
            .await
            .0,
        422
    );
    assert_eq!(get_json(&server, "/no/such/path").await.0, 404);
    let (_, _, leap) = get_json(&server, "/v1/time/leap-seconds").await;

    let response = client()
        .get(server.url("/metrics"))
        .send()
        .await
        .expect("metrics");
    // Prometheus text exposition format 0.0.4: media type text/plain; version=0.0.4.
    assert!(header_text(&response, "content-type").starts_with("text/plain; version=0.0.4"));
    let text = response.text().await.expect("text");

    // Counts per route, method and status (the route is the template, never the raw path;
    // unmatched paths share one label: common practice against label explosion).
    let count =
        |labels: &str| metric_value(&text, &format!("eigenzeit_http_requests_total{{{labels}}}"));
    assert_eq!(
        count(r#"route="/v1/time/scales",method="GET",status="200""#),
        Some(3.0)
    );
    assert_eq!(
        count(r#"route="/v1/time/convert",method="GET",status="422""#),
        Some(1.0)
    );
    assert_eq!(
        count(r#"route="unmatched",method="GET",status="404""#),
        Some(1.0)
    );
    assert_eq!(
        count(r#"route="/v1/time/leap-seconds",method="GET",status="200""#),
        Some(1.0)
    );
    assert!(
        !text.contains("/no/such/path"),
        "raw paths must not become labels"
    );

    // Histogram (Prometheus exposition format): one bucket per bound plus +Inf, cumulative,
    // +Inf equal to _count, _sum positive.
    let labels = r#"route="/v1/time/scales",method="GET",status="200""#;
    let buckets: Vec<f64> = BUCKETS
        .iter()
        .map(|le| {
            let series =
                format!("eigenzeit_http_request_duration_seconds_bucket{{{labels},le=\"{le}\"}}");
            metric_value(&text, &series).unwrap_or_else(|| panic!("missing {series}\n{text}"))
        })
        .collect();
    assert!(
        buckets.windows(2).all(|w| w[0] <= w[1]),
        "buckets are cumulative: {buckets:?}"
    );
    assert_eq!(buckets.last(), Some(&3.0));
    let histogram_count = metric_value(
        &text,
        &format!("eigenzeit_http_request_duration_seconds_count{{{labels}}}"),
    );
    assert_eq!(histogram_count, Some(3.0));
    let sum_s = metric_value(
        &text,
        &format!("eigenzeit_http_request_duration_seconds_sum{{{labels}}}"),
    );
    assert!(sum_s.is_some_and(|s| s > 0.0 && s < 30.0), "sum {sum_s:?}");
    // Common practice: every family has its TYPE line.
    for (family, kind) in [
        ("eigenzeit_http_requests_total", "counter"),
        ("eigenzeit_http_request_duration_seconds", "histogram"),
        ("eigenzeit_http_requests_in_flight", "gauge"),
        ("eigenzeit_build_info", "gauge"),
        ("eigenzeit_leap_seconds_table_info", "gauge"),
        ("eigenzeit_leap_seconds_expiry_days", "gauge"),
        ("eigenzeit_leap_seconds_refresh_failures_total", "counter"),
    ] {
        assert!(
            text.contains(&format!("# TYPE {family} {kind}\n")),
            "{family} {kind}"
        );
    }

    // Build information: the crate version (Cargo.toml), value 1 (the info-metric pattern,
    // common practice).
    let build = format!(
        "eigenzeit_build_info{{version=\"{}\"}}",
        env!("CARGO_PKG_VERSION")
    );
    assert_eq!(metric_value(&text, &build), Some(1.0));
    // In flight while idle: only the scrape itself.
    assert_eq!(
        metric_value(&text, "eigenzeit_http_requests_in_flight"),
        Some(1.0)
    );
    // The leap-second table: its source as a label, the days to expiry counted from now with
    // MJD = 40587 + Unix seconds / 86400 (MJD of 1970-01-01: Explanatory Supplement, common
    // practice), and no refresh failure without a URL.
    let source = leap["source"].as_str().expect("source");
    let info = format!("eigenzeit_leap_seconds_table_info{{source=\"{source}\"}}");
    assert_eq!(metric_value(&text, &info), Some(1.0), "{text}");
    let unix_s = std::time::SystemTime::now()
        .duration_since(std::time::UNIX_EPOCH)
        .expect("clock")
        .as_secs_f64();
    let expected_days =
        leap["expires_mjd"].as_f64().expect("expires_mjd") - (40_587.0 + unix_s / 86_400.0);
    let days = metric_value(&text, "eigenzeit_leap_seconds_expiry_days").expect("expiry days");
    assert!(
        (days - expected_days).abs() < 0.01,
        "{days} vs {expected_days}"
    );
    assert_eq!(
        metric_value(&text, "eigenzeit_leap_seconds_refresh_failures_total"),
        Some(0.0)
    );
}

#[tokio::test]
async fn in_flight_counts_a_held_request_and_an_abandoned_one_leaves() {
    let server = TestServer::start().await;
    let body = serde_json::to_vec(&convert_batch(10, &["TAI"])).expect("json");
    // A request whose body is half sent is in flight (the scrape itself is the other one).
    let held = HeldRequest::open(
        host_port(&server.base),
        "/v1/time/convert",
        &body,
        body.len() / 2,
        "held-1",
    )
    .await;
    let text = wait_for_metric(&server, "eigenzeit_http_requests_in_flight", 2.0).await;
    assert_eq!(
        metric_value(&text, "eigenzeit_http_requests_in_flight"),
        Some(2.0)
    );
    let (status, answer) = held.finish().await;
    assert_eq!(status, 200, "{answer}");
    // RFC 9110 is silent on ids; x-request-id echoed back is common practice.
    assert!(answer.to_ascii_lowercase().contains("x-request-id: held-1"));

    // A client that goes away mid-body: the gauge comes back down and the request is counted
    // once (the body could not be read: 400; a client gone while the answer is computed is
    // counted 499, see the unit test in src/ops/middleware.rs).
    let abandoned = HeldRequest::open(
        host_port(&server.base),
        "/v1/time/convert",
        &body,
        10,
        "gone",
    )
    .await;
    wait_for_metric(&server, "eigenzeit_http_requests_in_flight", 2.0).await;
    drop(abandoned);
    let text = wait_for_metric(&server, "eigenzeit_http_requests_in_flight", 1.0).await;
    assert_eq!(
        metric_value(&text, "eigenzeit_http_requests_in_flight"),
        Some(1.0),
        "{text}"
    );
    let answered: f64 = text
        .lines()
        .filter(|line| {
            line.starts_with(
                r#"eigenzeit_http_requests_total{route="/v1/time/convert",method="POST""#,
            )
        })
        .filter_map(|line| line.rsplit(' ').next()?.parse::<f64>().ok())
        .sum();
    assert_eq!(
        answered, 2.0,
        "the held request and the abandoned one: {text}"
    );
}

#[tokio::test]
async fn request_id_is_returned_or_generated() {
    let server = TestServer::start().await;
    // Common practice (x-request-id): the caller's id comes back unchanged...
    let response = get_with(&server, "/healthz", &[("x-request-id", "ops-test-0001")]).await;
    assert_eq!(header_text(&response, "x-request-id"), "ops-test-0001");
    // ... also on problem answers.
    let response = get_with(&server, "/nowhere", &[("x-request-id", "ops-test-0002")]).await;
    assert_eq!(response.status().as_u16(), 404);
    assert_eq!(header_text(&response, "x-request-id"), "ops-test-0002");
    // Without one, each answer carries a fresh UUID (RFC 9562 text form: 36 characters).
    let first = header_text(&get_with(&server, "/healthz", &[]).await, "x-request-id");
    let second = header_text(&get_with(&server, "/healthz", &[]).await, "x-request-id");
    assert_eq!(first.len(), 36, "{first}");
    assert_eq!(first.matches('-').count(), 4, "{first}");
    assert_ne!(first, second);
    // An id longer than 200 characters is replaced (common practice: bounded log fields).
    let long = "x".repeat(201);
    let replaced = header_text(
        &get_with(&server, "/healthz", &[("x-request-id", &long)]).await,
        "x-request-id",
    );
    assert_eq!(replaced.len(), 36);
}
