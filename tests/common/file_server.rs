//! A small file server inside a test (for the refresh tasks of the tables in force), and a
//! wait for a condition on the server under test.

use std::sync::{Arc, Mutex};
use std::time::{Duration, Instant};

use axum::routing::get;

/// What the test's file server answers: (status, body), changed by the test between polls.
pub type Served = Arc<Mutex<(u16, String)>>;

/// Starts a file server on 127.0.0.1:0 answering `GET /<name>` with `served`, and counting the
/// requests; returns the file's URL and the request count.
pub async fn file_server(name: &str, served: Served) -> (String, Arc<Mutex<u32>>) {
    let hits = Arc::new(Mutex::new(0_u32));
    let counter = Arc::clone(&hits);
    let app = axum::Router::new().route(
        &format!("/{name}"),
        get(move || {
            let served = Arc::clone(&served);
            let counter = Arc::clone(&counter);
            async move {
                *counter.lock().expect("lock") += 1;
                let (status, body) = served.lock().expect("lock").clone();
                let status = axum::http::StatusCode::from_u16(status).expect("status");
                (status, body)
            }
        }),
    );
    let listener = tokio::net::TcpListener::bind("127.0.0.1:0")
        .await
        .expect("bind");
    let address = listener.local_addr().expect("address");
    tokio::spawn(async move {
        let _ = axum::serve(listener, app).await;
    });
    (format!("http://{address}/{name}"), hits)
}

/// Polls `check` every 50 ms until it holds (at most 10 s).
pub async fn eventually<F, Fut>(what: &str, mut check: F)
where
    F: FnMut() -> Fut,
    Fut: std::future::Future<Output = bool>,
{
    let deadline = Instant::now() + Duration::from_secs(10);
    while !check().await {
        assert!(Instant::now() < deadline, "timed out waiting for: {what}");
        tokio::time::sleep(Duration::from_millis(50)).await;
    }
}
