//! HTTP behaviour of the operations layer: CORS, caching headers, request timeout, body limit
//! and compression, against the real server on 127.0.0.1:0.

mod common;

use common::{
    assert_problem, client, convert_batch, get_with, header_text, host_port, metric_value,
    metrics_text, split, TestServer,
};
use eigenzeit::ops::config::Settings;

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
    // A weak validator (RFC 9110 8.8.1), since the answer may be sent compressed or not.
    assert!(
        etag.starts_with("W/\"") && etag.ends_with('"') && etag.len() > 4,
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
    // Weak comparison (RFC 9110 13.1.2): the opaque tag without W/ matches too.
    let strong_form = etag.trim_start_matches("W/").to_string();
    let cached = get_with(server, path, &[("if-none-match", &strong_form)]).await;
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
