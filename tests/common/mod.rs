//! Shared harness: the real server on 127.0.0.1:0, called with reqwest.
#![allow(dead_code)]

pub mod file_server;
pub mod kepler;

pub mod process;

use eigenzeit::ops::config::Settings;
use eigenzeit::ops::refresh::initial_table;
use eigenzeit::ops::ServiceState;
use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use tokio::net::TcpListener;
use tokio::sync::oneshot;

/// A running server; dropped at the end of the test.
pub struct TestServer {
    /// `http://127.0.0.1:PORT`.
    pub base: String,
    /// The server's state (to inspect readiness, the table in force, ...).
    pub state: ServiceState,
    stop: Option<oneshot::Sender<()>>,
    /// The serve task; resolves after shutdown and drain.
    pub task: Option<tokio::task::JoinHandle<std::io::Result<()>>>,
}

impl TestServer {
    /// Starts a server with default settings.
    pub async fn start() -> Self {
        Self::start_with(Settings::default()).await
    }

    /// Starts a server with the given settings (the address is replaced by 127.0.0.1:0).
    pub async fn start_with(settings: Settings) -> Self {
        let table =
            initial_table::<LeapTable>(&settings).unwrap_or_else(|_| LeapTable::builtin().clone());
        Self::start_with_table(settings, table).await
    }

    /// Starts a server with the given settings and leap-second table (the EOP table from the
    /// settings, or the built-in one).
    pub async fn start_with_table(settings: Settings, table: LeapTable) -> Self {
        let eop =
            initial_table::<EopTable>(&settings).unwrap_or_else(|_| EopTable::builtin().clone());
        let settings_for_ephemeris = settings.clone();
        let listener = TcpListener::bind("127.0.0.1:0")
            .await
            .expect("bind loopback");
        let address = listener.local_addr().expect("local address");
        let state = ServiceState::new(
            settings,
            table,
            eop,
            eigenzeit::ops::ephemeris::initial_ephemeris(&settings_for_ephemeris)
                .expect("ephemeris of the settings"),
            eigenzeit::ops::openapi::document_json(),
        );
        let (stop, stopped) = oneshot::channel::<()>();
        let shutdown = async move {
            let _ = stopped.await;
        };
        let task = tokio::spawn(eigenzeit::ops::server::serve(
            listener,
            state.clone(),
            shutdown,
        ));
        Self {
            base: format!("http://{address}"),
            state,
            stop: Some(stop),
            task: Some(task),
        }
    }

    /// The full URL of `path`.
    pub fn url(&self, path: &str) -> String {
        format!("{}{path}", self.base)
    }

    /// Asks the server to shut down (as SIGTERM would) and returns its serve task.
    pub fn begin_shutdown(&mut self) -> Option<tokio::task::JoinHandle<std::io::Result<()>>> {
        if let Some(stop) = self.stop.take() {
            let _ = stop.send(());
        }
        self.task.take()
    }
}

impl Drop for TestServer {
    fn drop(&mut self) {
        if let Some(stop) = self.stop.take() {
            let _ = stop.send(());
        }
    }
}

/// A reqwest client without proxies.
pub fn client() -> reqwest::Client {
    reqwest::Client::builder()
        .no_proxy()
        .build()
        .expect("reqwest client")
}

/// GETs `path` and returns (status, content type, JSON body).
pub async fn get_json(server: &TestServer, path: &str) -> (u16, String, serde_json::Value) {
    let response = client()
        .get(server.url(path))
        .send()
        .await
        .expect("request");
    split(response).await
}

/// POSTs JSON to `path` and returns (status, content type, JSON body).
pub async fn post_json(
    server: &TestServer,
    path: &str,
    body: &serde_json::Value,
) -> (u16, String, serde_json::Value) {
    let response = client()
        .post(server.url(path))
        .json(body)
        .send()
        .await
        .expect("request");
    split(response).await
}

/// Status, content type and JSON body (Null when the body is not JSON).
pub async fn split(response: reqwest::Response) -> (u16, String, serde_json::Value) {
    let status = response.status().as_u16();
    let content_type = response
        .headers()
        .get("content-type")
        .and_then(|v| v.to_str().ok())
        .unwrap_or("")
        .to_string();
    let text = response.text().await.unwrap_or_default();
    let body = serde_json::from_str(&text).unwrap_or(serde_json::Value::Null);
    (status, content_type, body)
}

/// Asserts that an answer is a problem+json with the given status and code, and returns it.
pub fn assert_problem(
    answer: &(u16, String, serde_json::Value),
    status: u16,
    code: &str,
) -> serde_json::Value {
    let (got_status, content_type, body) = answer;
    assert_eq!(*got_status, status, "status; body: {body}");
    assert_eq!(
        content_type, "application/problem+json",
        "content type; body: {body}"
    );
    assert_eq!(body["code"], code, "code; body: {body}");
    assert!(
        eigenzeit::api::problem_codes::meaning(code).is_some(),
        "problem code {code} is not listed in src/api/problem_codes.rs"
    );
    assert_eq!(body["status"], status);
    assert!(body["title"].is_string() && body["type"].is_string());
    assert!(
        body["detail"].as_str().is_some_and(|d| !d.is_empty()),
        "detail must say what is wrong: {body}"
    );
    body.clone()
}

/// GETs `path` with extra headers and returns the raw response.
pub async fn get_with(
    server: &TestServer,
    path: &str,
    headers: &[(&str, &str)],
) -> reqwest::Response {
    let mut request = client().get(server.url(path));
    for (name, value) in headers {
        request = request.header(*name, *value);
    }
    request.send().await.expect("request")
}

/// A response header as text ("" when absent).
pub fn header_text(response: &reqwest::Response, name: &str) -> String {
    // Several field lines of one name are one comma-separated list (RFC 9110 sec. 5.3).
    response
        .headers()
        .get_all(name)
        .iter()
        .filter_map(|v| v.to_str().ok())
        .collect::<Vec<_>>()
        .join(", ")
}

/// The text of `/metrics`.
pub async fn metrics_text(server: &TestServer) -> String {
    let response = client()
        .get(server.url("/metrics"))
        .send()
        .await
        .expect("request");
    assert_eq!(response.status().as_u16(), 200);
    response.text().await.expect("metrics text")
}

/// The value of one sample in a Prometheus text exposition: `series` is the metric name with
/// its labels exactly as rendered (e.g. `name{route="/x",status="200"}`), or the bare name.
pub fn metric_value(text: &str, series: &str) -> Option<f64> {
    text.lines()
        .filter(|line| !line.starts_with('#'))
        .find_map(|line| {
            let rest = line.strip_prefix(series)?;
            rest.strip_prefix(' ')?.trim().parse::<f64>().ok()
        })
}

/// A `POST /v1/time/convert` body of `count` UTC epochs (one minute apart from 2026-03-14)
/// converted to `to`.
pub fn convert_batch(count: usize, to: &[&str]) -> serde_json::Value {
    let epochs: Vec<String> = (0..count)
        .map(|i| {
            let minute = i % (24 * 60);
            format!(
                "2026-03-14T{:02}:{:02}:00.123456789",
                minute / 60,
                minute % 60
            )
        })
        .collect();
    serde_json::json!({"from": "UTC", "to": to, "epochs": epochs})
}

/// An HTTP/1.1 request written by hand on its own TCP connection, with part of its body held
/// back: the server counts it in flight until [`HeldRequest::finish`] sends the rest (or the
/// connection is dropped).
pub struct HeldRequest {
    stream: tokio::net::TcpStream,
    rest: Vec<u8>,
}

impl HeldRequest {
    /// Sends the head and the first `sent` bytes of `body` to `POST path` at `host_port`.
    pub async fn open(
        host_port: &str,
        path: &str,
        body: &[u8],
        sent: usize,
        request_id: &str,
    ) -> Self {
        use tokio::io::AsyncWriteExt;
        let mut stream = tokio::net::TcpStream::connect(host_port)
            .await
            .expect("connect");
        let head = format!(
            "POST {path} HTTP/1.1\r\nHost: {host_port}\r\nContent-Type: application/json\r\n\
             Content-Length: {}\r\nx-request-id: {request_id}\r\nConnection: close\r\n\r\n",
            body.len()
        );
        stream.write_all(head.as_bytes()).await.expect("write head");
        stream
            .write_all(&body[..sent])
            .await
            .expect("write body start");
        stream.flush().await.expect("flush");
        Self {
            stream,
            rest: body[sent..].to_vec(),
        }
    }

    /// Sends the rest of the body and reads the whole answer: (status, raw answer text).
    pub async fn finish(mut self) -> (u16, String) {
        use tokio::io::{AsyncReadExt, AsyncWriteExt};
        self.stream
            .write_all(&self.rest)
            .await
            .expect("write body rest");
        let mut answer = Vec::new();
        self.stream
            .read_to_end(&mut answer)
            .await
            .expect("read answer");
        let text = String::from_utf8_lossy(&answer).to_string();
        let status = text
            .split_whitespace()
            .nth(1)
            .and_then(|code| code.parse::<u16>().ok())
            .unwrap_or(0);
        (status, text)
    }
}

/// `host:port` of a base URL `http://host:port`.
pub fn host_port(base: &str) -> &str {
    base.trim_start_matches("http://")
}
