//! The real `eigenzeit` binary on SIGTERM (sent with `kill -TERM`): unready, in-flight
//! requests drained, exit 0; and the drain timeout bounding the exit.

mod common;

use std::time::{Duration, Instant};

use common::process::Service;
use common::{client, convert_batch, HeldRequest};

#[tokio::test]
async fn sigterm_turns_unready_drains_in_flight_requests_and_exits_0() {
    let mut service = Service::start(&[
        "--log-format",
        "json",
        "--shutdown-delay-s",
        "3",
        "--drain-timeout-s",
        "120",
    ]);
    // Three large conversions to TDB (about 1 s each in a debug build, measured) ...
    let batch = convert_batch(20_000, &["TDB"]);
    let mut slow = Vec::new();
    for i in 0..3 {
        let request = client()
            .post(service.url("/v1/time/convert"))
            .header("x-request-id", format!("drain-{i}"))
            .json(&batch);
        slow.push(tokio::spawn(async move { request.send().await }));
    }
    // ... and one whose body is only half sent: it stays in flight until the test finishes it.
    let body = serde_json::to_vec(&convert_batch(100, &["TT"])).expect("json");
    let held = HeldRequest::open(
        &service.host_port,
        "/v1/time/convert",
        &body,
        body.len() / 2,
        "drain-held",
    )
    .await;
    let wanted = if cfg!(debug_assertions) { 5.0 } else { 2.0 };
    let deadline = Instant::now() + Duration::from_secs(30);
    let mut in_flight = service.in_flight().await;
    while in_flight < wanted {
        assert!(Instant::now() < deadline, "in flight: {in_flight}");
        tokio::time::sleep(Duration::from_millis(10)).await;
        in_flight = service.in_flight().await;
    }

    service.terminate();
    let signalled = Instant::now();
    // During the shutdown delay the service still answers, and /readyz says 503 draining.
    let mut unready = None;
    while unready.is_none() && signalled.elapsed() < Duration::from_millis(2_500) {
        if let Ok(response) = client().get(service.url("/readyz")).send().await {
            if response.status().as_u16() == 503 {
                unready = response.json::<serde_json::Value>().await.ok();
            }
        }
        tokio::time::sleep(Duration::from_millis(20)).await;
    }
    let unready = unready.expect("/readyz answered 503 during the shutdown delay");
    assert_eq!(unready["status"], "draining");
    // After the delay the listener is closed: new connections are refused. (Polled rather than
    // timed: on a loaded machine the accept loop may take a moment longer to stop.)
    let refused_by = signalled + Duration::from_secs(10);
    let mut refused = false;
    while !refused && Instant::now() < refused_by {
        refused = tokio::net::TcpStream::connect(&service.host_port)
            .await
            .is_err();
        if !refused {
            tokio::time::sleep(Duration::from_millis(50)).await;
        }
    }
    assert!(refused, "still accepting 10 s after SIGTERM");
    // The held request, finished during the drain, is answered.
    let (status, answer) = held.finish().await;
    assert_eq!(status, 200, "{answer}");
    for (i, request) in slow.into_iter().enumerate() {
        let response = request.await.expect("join").expect("answer during drain");
        assert_eq!(response.status().as_u16(), 200, "drain-{i}");
        let body: serde_json::Value = response.json().await.expect("json");
        assert_eq!(body["conversions"].as_array().map(Vec::len), Some(20_000));
    }
    let status = service.wait_exit(Duration::from_secs(120)).await;
    assert_eq!(status.code(), Some(0), "{:?}", service.log());
    let log = service.json_log();
    for id in ["drain-0", "drain-1", "drain-2", "drain-held"] {
        assert!(
            log.iter()
                .any(|l| l["request_id"] == id && l["status"] == 200),
            "{id} not logged as 200: {log:?}"
        );
    }
    assert!(log.iter().any(|l| l["message"] == "eigenzeit stopped"));
    assert!(!log.iter().any(|l| l["level"] == "WARN"), "{log:?}");
}

#[tokio::test]
async fn drain_timeout_bounds_the_exit() {
    let mut service = Service::start(&["--log-format", "json", "--drain-timeout-s", "0.5"]);
    // A request that never finishes sending its body, and two conversions that compute for
    // about 9 s each in a debug build (measured: 100 000 epochs to TDB and TCB).
    let body = serde_json::to_vec(&convert_batch(100, &["TT"])).expect("json");
    let _held = HeldRequest::open(
        &service.host_port,
        "/v1/time/convert",
        &body,
        10,
        "never-done",
    )
    .await;
    let big = convert_batch(100_000, &["TDB", "TCB"]);
    let mut computing = Vec::new();
    for _ in 0..2 {
        let request = client().post(service.url("/v1/time/convert")).json(&big);
        computing.push(tokio::spawn(async move { request.send().await }));
    }
    let wanted = if cfg!(debug_assertions) { 4.0 } else { 2.0 };
    let deadline = Instant::now() + Duration::from_secs(30);
    while service.in_flight().await < wanted {
        assert!(Instant::now() < deadline);
        tokio::time::sleep(Duration::from_millis(10)).await;
    }
    // Let the conversions reach their blocking computation (reading and parsing a 3.4 MB body
    // takes about 1.5 s in a debug build, measured).
    tokio::time::sleep(Duration::from_millis(2_500)).await;
    service.terminate();
    let signalled = Instant::now();
    let status = service.wait_exit(Duration::from_secs(30)).await;
    let took = signalled.elapsed();
    assert_eq!(status.code(), Some(0), "{:?}", service.log());
    // Drain timeout 0.5 s, then at most 0.5 s for blocking work (src/main.rs), plus scheduling
    // slack; far below what the remaining computation would take in a debug build.
    eprintln!("exit {took:?} after SIGTERM");
    assert!(took < Duration::from_millis(2_500), "exit took {took:?}");
    let log = service.json_log();
    assert!(
        log.iter().any(|l| l["message"]
            .as_str()
            .is_some_and(|m| m.starts_with("drain timeout reached"))),
        "{log:?}"
    );
}
