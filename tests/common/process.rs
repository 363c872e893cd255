//! Helpers to run the real `eigenzeit` binary: a serving process whose standard error is
//! collected, temporary files, and a run to completion.

use std::io::{BufRead, BufReader};
use std::path::PathBuf;
use std::process::{Child, Command, ExitStatus, Stdio};
use std::sync::{Arc, Mutex};
use std::time::{Duration, Instant};

use super::{client, metric_value};

pub const BINARY: &str = env!("CARGO_BIN_EXE_eigenzeit");

/// The IERS file committed for the parser tests (see tests/reference/leap_second_files_versions.txt).
pub const IERS_FILE: &str = include_str!("../reference/Leap_Second.dat");

/// A running `eigenzeit serve` whose standard error is collected line by line.
pub struct Service {
    child: Child,
    /// `http://127.0.0.1:PORT`, read from the start-up log line.
    pub base: String,
    /// `127.0.0.1:PORT`.
    pub host_port: String,
    lines: Arc<Mutex<Vec<String>>>,
}

/// Reads the bound address from a start-up log line, pretty (`addr=HOST:PORT`) or JSON
/// (`"addr":"HOST:PORT"`).
fn address_in(line: &str) -> Option<String> {
    let start = line
        .find("\"addr\":\"")
        .map(|i| i + 8)
        .or_else(|| line.find("addr=").map(|i| i + 5))?;
    let address: String = line[start..]
        .chars()
        .take_while(|c| c.is_ascii_digit() || *c == '.' || *c == ':')
        .collect();
    address.contains(':').then_some(address)
}

impl Service {
    /// Starts the binary on 127.0.0.1:0 with `args` and waits (at most 60 s) for its address.
    pub fn start(args: &[&str]) -> Self {
        Self::start_with_env(args, &[])
    }

    /// Starts the binary as [`Service::start`] does, with environment variables `env` set.
    pub fn start_with_env(args: &[&str], env: &[(&str, &str)]) -> Self {
        let mut child = Command::new(BINARY)
            .args(args)
            .args(["--addr", "127.0.0.1:0"])
            .env_remove("EIGENZEIT_LOG_FORMAT")
            .envs(env.iter().copied())
            .stdout(Stdio::null())
            .stderr(Stdio::piped())
            .spawn()
            .expect("start the binary");
        let stderr = child.stderr.take().expect("stderr");
        let lines = Arc::new(Mutex::new(Vec::new()));
        let sink = Arc::clone(&lines);
        std::thread::spawn(move || {
            for line in BufReader::new(stderr).lines().map_while(Result::ok) {
                sink.lock().expect("lock").push(line);
            }
        });
        let deadline = Instant::now() + Duration::from_secs(60);
        loop {
            let found = lines
                .lock()
                .expect("lock")
                .iter()
                .find_map(|l| address_in(l));
            if let Some(host_port) = found {
                return Self {
                    child,
                    base: format!("http://{host_port}"),
                    host_port,
                    lines,
                };
            }
            if let Ok(Some(status)) = child.try_wait() {
                panic!(
                    "the binary exited ({status}): {:?}",
                    lines.lock().expect("lock")
                );
            }
            assert!(
                Instant::now() < deadline,
                "no address logged: {:?}",
                lines.lock().expect("lock")
            );
            std::thread::sleep(Duration::from_millis(20));
        }
    }

    pub fn url(&self, path: &str) -> String {
        format!("{}{path}", self.base)
    }

    /// GETs `path` and returns (status, content type, JSON body).
    pub async fn get_json(&self, path: &str) -> (u16, String, serde_json::Value) {
        let response = client().get(self.url(path)).send().await.expect("get");
        super::split(response).await
    }

    /// Sends SIGTERM and waits (at most 30 s) for the exit.
    pub async fn stop(&mut self) -> ExitStatus {
        self.terminate();
        self.wait_exit(Duration::from_secs(30)).await
    }

    /// Sends SIGTERM with the system's `kill` (POSIX `kill -TERM PID`).
    pub fn terminate(&self) {
        let status = Command::new("kill")
            .args(["-TERM", &self.child.id().to_string()])
            .status()
            .expect("run kill");
        assert!(status.success());
    }

    /// Waits for the process to exit (at most `limit`; killed and failed after that).
    pub async fn wait_exit(&mut self, limit: Duration) -> ExitStatus {
        let deadline = Instant::now() + limit;
        loop {
            if let Some(status) = self.child.try_wait().expect("try_wait") {
                return status;
            }
            if Instant::now() > deadline {
                let _ = self.child.kill();
                panic!("the binary did not exit within {limit:?}: {:?}", self.log());
            }
            tokio::time::sleep(Duration::from_millis(20)).await;
        }
    }

    pub fn log(&self) -> Vec<String> {
        self.lines.lock().expect("lock").clone()
    }

    /// The JSON log lines (with `--log-format json`).
    pub fn json_log(&self) -> Vec<serde_json::Value> {
        self.log()
            .iter()
            .filter_map(|line| serde_json::from_str(line).ok())
            .collect()
    }

    pub async fn in_flight(&self) -> f64 {
        let text = client()
            .get(self.url("/metrics"))
            .send()
            .await
            .expect("metrics")
            .text()
            .await
            .expect("text");
        metric_value(&text, "eigenzeit_http_requests_in_flight").expect("in-flight gauge")
    }
}

impl Drop for Service {
    fn drop(&mut self) {
        if let Ok(None) = self.child.try_wait() {
            let _ = self.child.kill();
            let _ = self.child.wait();
        }
    }
}

/// A file in the temporary directory, unique to this process and `name`, removed on drop.
pub struct TempFile(PathBuf);

impl TempFile {
    pub fn new(name: &str, text: &str) -> Self {
        Self::bytes(name, text.as_bytes())
    }

    pub fn bytes(name: &str, bytes: &[u8]) -> Self {
        let path =
            std::env::temp_dir().join(format!("eigenzeit-ops-{}-{name}", std::process::id()));
        std::fs::write(&path, bytes).expect("write temp file");
        Self(path)
    }

    pub fn path(&self) -> &str {
        self.0.to_str().expect("utf-8 path")
    }
}

impl Drop for TempFile {
    fn drop(&mut self) {
        let _ = std::fs::remove_file(&self.0);
    }
}

/// Runs the binary to completion (killed and failed after 30 s): (exit status, stderr).
pub fn run_to_exit(args: &[&str]) -> (ExitStatus, String) {
    let mut child = Command::new(BINARY)
        .args(args)
        .stdout(Stdio::null())
        .stderr(Stdio::piped())
        .spawn()
        .expect("start the binary");
    let deadline = Instant::now() + Duration::from_secs(30);
    let status = loop {
        if let Some(status) = child.try_wait().expect("try_wait") {
            break status;
        }
        if Instant::now() > deadline {
            let _ = child.kill();
            panic!("the binary kept running with {args:?}");
        }
        std::thread::sleep(Duration::from_millis(20));
    };
    let mut stderr = String::new();
    if let Some(mut pipe) = child.stderr.take() {
        let _ = std::io::Read::read_to_string(&mut pipe, &mut stderr);
    }
    (status, stderr)
}
