//! Shared harness: the real server on 127.0.0.1:0, called with reqwest.
#![allow(dead_code)]

use eigenzeit::api::state::AppState;
use eigenzeit::ops::config::Settings;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use tokio::net::TcpListener;
use tokio::sync::oneshot;

/// A running server; dropped at the end of the test.
pub struct TestServer {
    /// `http://127.0.0.1:PORT`.
    pub base: String,
    /// The server's state (to inspect readiness, the table in force, ...).
    pub state: AppState,
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
        let table = eigenzeit::ops::leap_source::initial_table(&settings)
            .unwrap_or_else(|_| LeapTable::builtin().clone());
        Self::start_with_table(settings, table).await
    }

    /// Starts a server with the given settings and leap-second table.
    pub async fn start_with_table(settings: Settings, table: LeapTable) -> Self {
        let listener = TcpListener::bind("127.0.0.1:0")
            .await
            .expect("bind loopback");
        let address = listener.local_addr().expect("local address");
        let state = AppState::new(settings, table);
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
