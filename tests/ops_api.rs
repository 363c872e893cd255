//! Operations over HTTP: metrics, request ids, CORS, caching headers, request timeout, body
//! limit and compression, against the real server on 127.0.0.1:0.

mod common;

use std::time::{Duration, Instant};

use common::{
    assert_problem, client, convert_batch, get_json, get_with, header_text, host_port,
    metric_value, metrics_text, split, HeldRequest, TestServer,
};
use eigenzeit::ops::config::Settings;

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

fn preflight(server: &TestServer, origin: &str) -> reqwest::RequestBuilder {
    client()
        .request(reqwest::Method::OPTIONS, server.url("/v1/time/convert"))
        .header("origin", origin)
        .header("access-control-request-method", "POST")
        .header(
            "access-control-request-headers",
            "content-type,x-request-id",
        )
}

#[tokio::test]
async fn cors_allows_configured_origins_only() {
    let settings = Settings {
        cors_origins: vec!["https://ops.example".to_string()],
        ..Settings::default()
    };
    let server = TestServer::start_with(settings).await;
    // Fetch standard, CORS protocol: a preflight from an allowed origin gets that origin back
    // in Access-Control-Allow-Origin, with the method and headers allowed.
    let allowed = preflight(&server, "https://ops.example")
        .send()
        .await
        .expect("preflight");
    assert!(allowed.status().is_success(), "{}", allowed.status());
    assert_eq!(
        header_text(&allowed, "access-control-allow-origin"),
        "https://ops.example"
    );
    assert!(header_text(&allowed, "access-control-allow-methods").contains("POST"));
    let allowed_headers =
        header_text(&allowed, "access-control-allow-headers").to_ascii_lowercase();
    assert!(allowed_headers.contains("content-type") && allowed_headers.contains("x-request-id"));
    // An actual request from that origin: allowed, with the request id and ETag exposed.
    let simple = get_with(
        &server,
        "/v1/time/scales",
        &[("origin", "https://ops.example")],
    )
    .await;
    assert_eq!(
        header_text(&simple, "access-control-allow-origin"),
        "https://ops.example"
    );
    let exposed = header_text(&simple, "access-control-expose-headers").to_ascii_lowercase();
    assert!(
        exposed.contains("x-request-id") && exposed.contains("etag"),
        "{exposed}"
    );
    // Fetch standard: another origin gets no Access-Control-Allow-Origin (the browser refuses).
    let refused = preflight(&server, "https://elsewhere.example")
        .send()
        .await
        .expect("preflight");
    assert!(refused
        .headers()
        .get("access-control-allow-origin")
        .is_none());
    let simple = get_with(
        &server,
        "/v1/time/scales",
        &[("origin", "https://elsewhere.example")],
    )
    .await;
    assert!(simple
        .headers()
        .get("access-control-allow-origin")
        .is_none());

    // Default settings allow no origin at all.
    let closed = TestServer::start().await;
    let refused = preflight(&closed, "https://ops.example")
        .send()
        .await
        .expect("preflight");
    assert!(refused
        .headers()
        .get("access-control-allow-origin")
        .is_none());
}

/// RFC 9110 section 13.1.2: a GET with If-None-Match naming the current ETag answers 304
/// with no body; another tag answers 200.
async fn check_etag(server: &TestServer, path: &str) {
    let first = get_with(server, path, &[]).await;
    assert_eq!(first.status().as_u16(), 200);
    let etag = header_text(&first, "etag");
    assert!(
        etag.starts_with('"') && etag.ends_with('"') && etag.len() > 2,
        "{path}: {etag}"
    );
    let cached = get_with(server, path, &[("if-none-match", &etag)]).await;
    assert_eq!(cached.status().as_u16(), 304, "{path}");
    assert_eq!(header_text(&cached, "etag"), etag);
    assert!(cached.bytes().await.expect("body").is_empty());
    // RFC 9110 section 13.1.2: a list of tags matches when one of them does.
    let listed = format!("\"stale\", {etag}");
    let cached = get_with(server, path, &[("if-none-match", &listed)]).await;
    assert_eq!(cached.status().as_u16(), 304, "{path}");
    let other = get_with(server, path, &[("if-none-match", "\"not-the-tag\"")]).await;
    assert_eq!(other.status().as_u16(), 200, "{path}");
    // The tag is stable between requests (same document).
    assert_eq!(header_text(&other, "etag"), etag);
}

#[tokio::test]
async fn reference_documents_are_cacheable_and_now_is_not() {
    let server = TestServer::start().await;
    check_etag(&server, "/v1/time/scales").await;
    check_etag(&server, "/v1/time/leap-seconds").await;
    // RFC 9111 section 5.2.2.5: no-store forbids any cache to keep the answer.
    let now = get_with(&server, "/v1/time/now", &[]).await;
    assert_eq!(now.status().as_u16(), 200);
    assert_eq!(header_text(&now, "cache-control"), "no-store");
    assert!(now.headers().get("etag").is_none());
}

#[tokio::test]
async fn slow_request_is_answered_503_request_timeout() {
    let settings = Settings {
        request_timeout_s: 0.001,
        ..Settings::default()
    };
    let server = TestServer::start_with(settings).await;
    let response = client()
        .post(server.url("/v1/time/convert"))
        .header("x-request-id", "too-slow")
        .json(&convert_batch(20_000, &["TDB"]))
        .send()
        .await
        .expect("request");
    assert_eq!(header_text(&response, "x-request-id"), "too-slow");
    // RFC 9110 section 15.6.4 (503) with an RFC 9457 problem body.
    let body = assert_problem(&split(response).await, 503, "request_timeout");
    assert!(body["detail"]
        .as_str()
        .is_some_and(|d| d.contains("--request-timeout-s")));
    let text = metrics_text(&server).await;
    let series =
        r#"eigenzeit_http_requests_total{route="/v1/time/convert",method="POST",status="503"}"#;
    assert_eq!(metric_value(&text, series), Some(1.0));
}

#[tokio::test]
async fn body_above_the_limit_is_413_problem() {
    let settings = Settings {
        body_limit_bytes: 1_000,
        ..Settings::default()
    };
    let server = TestServer::start_with(settings).await;
    let big = convert_batch(200, &["TAI"]);
    assert!(serde_json::to_vec(&big).expect("json").len() > 1_000);
    // RFC 9110 section 15.5.14 (413) with an RFC 9457 problem body; Content-Length known.
    let answer = common::post_json(&server, "/v1/time/convert", &big).await;
    assert_problem(&answer, 413, "body_too_large");
    // The same with a chunked body (no Content-Length: the limit is hit while reading).
    let text = serde_json::to_string(&big).expect("json");
    let chunked = chunked_post(host_port(&server.base), "/v1/time/convert", &text).await;
    assert!(chunked.starts_with("HTTP/1.1 413"), "{chunked}");
    assert!(
        chunked
            .to_ascii_lowercase()
            .contains("content-type: application/problem+json"),
        "{chunked}"
    );
    assert!(chunked.contains("\"code\":\"body_too_large\""), "{chunked}");
    // A body within the limit still works.
    let small = convert_batch(2, &["TAI"]);
    assert_eq!(
        common::post_json(&server, "/v1/time/convert", &small)
            .await
            .0,
        200
    );
}

/// POSTs `body` with `Transfer-Encoding: chunked` (RFC 9112 section 7.1) in 256-byte chunks
/// and returns the raw answer.
async fn chunked_post(host_port: &str, path: &str, body: &str) -> String {
    use tokio::io::{AsyncReadExt, AsyncWriteExt};
    let mut stream = tokio::net::TcpStream::connect(host_port)
        .await
        .expect("connect");
    let mut request = format!(
        "POST {path} HTTP/1.1\r\nHost: {host_port}\r\nContent-Type: application/json\r\n\
         Transfer-Encoding: chunked\r\nConnection: close\r\n\r\n"
    )
    .into_bytes();
    for chunk in body.as_bytes().chunks(256) {
        request.extend_from_slice(format!("{:x}\r\n", chunk.len()).as_bytes());
        request.extend_from_slice(chunk);
        request.extend_from_slice(b"\r\n");
    }
    request.extend_from_slice(b"0\r\n\r\n");
    // The server may answer and close before reading everything: a failed write is fine.
    let _ = stream.write_all(&request).await;
    let mut answer = Vec::new();
    let _ = stream.read_to_end(&mut answer).await;
    String::from_utf8_lossy(&answer).to_string()
}

#[tokio::test]
async fn large_answers_are_compressed_on_request() {
    let server = TestServer::start().await;
    let batch = convert_batch(2_000, &["TAI", "TT", "TDB"]);
    let plain = client()
        .post(server.url("/v1/time/convert"))
        .json(&batch)
        .send()
        .await
        .expect("request");
    assert!(plain.headers().get("content-encoding").is_none());
    let plain_len = plain.bytes().await.expect("body").len();
    let gzipped = client()
        .post(server.url("/v1/time/convert"))
        .header("accept-encoding", "gzip")
        .json(&batch)
        .send()
        .await
        .expect("request");
    assert_eq!(gzipped.status().as_u16(), 200);
    // RFC 9110 section 8.4.1: content-coding gzip; RFC 9110 section 12.5.5: Vary names the
    // request header the choice depended on.
    assert_eq!(header_text(&gzipped, "content-encoding"), "gzip");
    assert!(header_text(&gzipped, "vary")
        .to_ascii_lowercase()
        .contains("accept-encoding"));
    let bytes = gzipped.bytes().await.expect("body");
    // RFC 1952 section 2.3.1: a gzip member starts with ID1 = 0x1f, ID2 = 0x8b.
    assert_eq!(&bytes[..2], &[0x1f, 0x8b]);
    // Repetitive JSON compresses well (measured here: see the report); at least 5 times.
    assert!(
        bytes.len() * 5 < plain_len,
        "{} vs {plain_len}",
        bytes.len()
    );
}
