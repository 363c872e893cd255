//! The real `eigenzeit` binary: command line, start-up checks, logs, and graceful shutdown on
//! SIGTERM (sent with `kill -TERM`).

mod common;

use std::io::{BufRead, BufReader};
use std::path::PathBuf;
use std::process::{Child, Command, ExitStatus, Stdio};
use std::sync::{Arc, Mutex};
use std::time::{Duration, Instant};

use clap::CommandFactory;
use common::{client, convert_batch, metric_value, HeldRequest};

const BINARY: &str = env!("CARGO_BIN_EXE_eigenzeit");

/// The IERS file committed for the parser tests (see tests/reference/leap_second_files_versions.txt).
const IERS_FILE: &str = include_str!("reference/Leap_Second.dat");

/// A running `eigenzeit serve` whose standard error is collected line by line.
struct Service {
    child: Child,
    /// `http://127.0.0.1:PORT`, read from the start-up log line.
    base: String,
    /// `127.0.0.1:PORT`.
    host_port: String,
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
    fn start(args: &[&str]) -> Self {
        let mut child = Command::new(BINARY)
            .args(args)
            .args(["--addr", "127.0.0.1:0"])
            .env_remove("EIGENZEIT_LOG_FORMAT")
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

    fn url(&self, path: &str) -> String {
        format!("{}{path}", self.base)
    }

    /// Sends SIGTERM with the system's `kill` (POSIX `kill -TERM PID`).
    fn terminate(&self) {
        let status = Command::new("kill")
            .args(["-TERM", &self.child.id().to_string()])
            .status()
            .expect("run kill");
        assert!(status.success());
    }

    /// Waits for the process to exit (at most `limit`; killed and failed after that).
    async fn wait_exit(&mut self, limit: Duration) -> ExitStatus {
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

    fn log(&self) -> Vec<String> {
        self.lines.lock().expect("lock").clone()
    }

    /// The JSON log lines (with `--log-format json`).
    fn json_log(&self) -> Vec<serde_json::Value> {
        self.log()
            .iter()
            .filter_map(|line| serde_json::from_str(line).ok())
            .collect()
    }

    async fn in_flight(&self) -> f64 {
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
struct TempFile(PathBuf);

impl TempFile {
    fn new(name: &str, text: &str) -> Self {
        let path =
            std::env::temp_dir().join(format!("eigenzeit-ops-{}-{name}", std::process::id()));
        std::fs::write(&path, text).expect("write temp file");
        Self(path)
    }

    fn path(&self) -> &str {
        self.0.to_str().expect("utf-8 path")
    }
}

impl Drop for TempFile {
    fn drop(&mut self) {
        let _ = std::fs::remove_file(&self.0);
    }
}

/// Runs the binary to completion (killed and failed after 30 s): (exit status, stderr).
fn run_to_exit(args: &[&str]) -> (ExitStatus, String) {
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

#[test]
fn help_lists_every_setting_with_its_env_twin() {
    // Common practice (twelve-factor configuration): every flag has an environment twin.
    let cli = eigenzeit::ops::config::Cli::command();
    let healthcheck = cli
        .find_subcommand("healthcheck")
        .expect("healthcheck")
        .clone();
    for (command, args) in [
        (cli.clone(), vec!["--help"]),
        (healthcheck, vec!["healthcheck", "--help"]),
    ] {
        let output = Command::new(BINARY)
            .args(&args)
            .output()
            .expect("run --help");
        assert!(output.status.success());
        let help = String::from_utf8_lossy(&output.stdout).to_string();
        let mut settings = 0;
        for arg in command.get_arguments() {
            let Some(long) = arg.get_long() else { continue };
            if long == "help" || long == "version" {
                continue;
            }
            let env = arg
                .get_env()
                .and_then(|e| e.to_str())
                .unwrap_or_else(|| panic!("--{long} has no env twin"));
            let suffix = long.replace('-', "_").to_ascii_uppercase();
            assert!(
                env.starts_with("EIGENZEIT_") && env.ends_with(&suffix),
                "--{long}: {env}"
            );
            assert!(
                help.contains(&format!("--{long} <")),
                "--{long} missing from {args:?}:\n{help}"
            );
            assert!(
                help.contains(&format!("[env: {env}=]")),
                "{env} missing from {args:?}:\n{help}"
            );
            settings += 1;
        }
        assert!(settings >= 1, "{args:?}");
    }
    // `serve` takes the same settings as the bare command.
    let output = Command::new(BINARY)
        .args(["serve", "--help"])
        .output()
        .expect("run");
    let help = String::from_utf8_lossy(&output.stdout).to_string();
    for arg in cli.get_arguments().filter_map(|a| a.get_long()) {
        if arg != "help" && arg != "version" {
            assert!(
                help.contains(&format!("--{arg} <")),
                "serve --help lacks --{arg}"
            );
        }
    }
}

#[test]
fn start_up_refuses_a_malformed_leap_second_file_and_bad_settings() {
    // IERS Leap_Second.dat layout: `MJD day month year TAI-UTC`; a month 13 is not a date.
    let broken = IERS_FILE.replace(
        "57754.0    1  1 2017       37",
        "57754.0    1 13 2017       37",
    );
    assert_ne!(broken, IERS_FILE);
    let file = TempFile::new("broken.dat", &broken);
    let (status, stderr) =
        run_to_exit(&["--addr", "127.0.0.1:0", "--leap-seconds-file", file.path()]);
    assert_eq!(status.code(), Some(1), "{stderr}");
    let message = format!(
        "eigenzeit: the leap-second file {} is not valid: line ",
        file.path()
    );
    assert!(stderr.contains(&message), "{stderr}");
    assert!(!stderr.contains("eigenzeit serving"), "{stderr}");

    let missing = format!("{}.absent", file.path());
    let (status, stderr) = run_to_exit(&["--addr", "127.0.0.1:0", "--leap-seconds-file", &missing]);
    assert_eq!(status.code(), Some(1), "{stderr}");
    assert!(
        stderr.contains(&format!("cannot read the leap-second file {missing}")),
        "{stderr}"
    );

    let (status, stderr) = run_to_exit(&["--addr", "127.0.0.1:0", "--request-timeout-s", "0"]);
    assert_eq!(status.code(), Some(1), "{stderr}");
    assert!(
        stderr.contains("--request-timeout-s must be a positive number of seconds"),
        "{stderr}"
    );
}

#[tokio::test]
async fn valid_leap_second_file_starts_and_requests_are_logged() {
    let newer = IERS_FILE.replace(
        "File expires on 28 June 2027",
        "File expires on 28 December 2027",
    );
    let file = TempFile::new("newer.dat", &newer);
    let mut service = Service::start(&[
        "serve",
        "--log-format",
        "json",
        "--leap-seconds-file",
        file.path(),
    ]);
    let (status, _, table) = common::split(
        client()
            .get(service.url("/v1/time/leap-seconds"))
            .send()
            .await
            .expect("get"),
    )
    .await;
    assert_eq!(status, 200);
    assert_eq!(table["source"], format!("file {}", file.path()));
    // 28 December 2027 = MJD 61767 (MJD 0 = 1858-11-17, Explanatory Supplement).
    assert_eq!(table["expires_mjd"], 61_767);
    let response = client()
        .get(service.url("/healthz"))
        .header("x-request-id", "process-log-1")
        .send()
        .await
        .expect("get");
    assert_eq!(response.status().as_u16(), 200);
    service.terminate();
    let status = service.wait_exit(Duration::from_secs(30)).await;
    assert_eq!(status.code(), Some(0), "{:?}", service.log());
    // One JSON log line per request with method, route, status, latency and request id.
    let log = service.json_log();
    let line = log
        .iter()
        .find(|l| l["message"] == "request" && l["request_id"] == "process-log-1")
        .unwrap_or_else(|| panic!("no request line: {log:?}"));
    assert_eq!(line["method"], "GET");
    assert_eq!(line["route"], "/healthz");
    assert_eq!(line["status"], 200);
    assert!(
        line["latency_ms"].as_f64().is_some_and(|ms| ms >= 0.0),
        "{line}"
    );
    assert!(
        log.iter().any(|l| l["message"] == "eigenzeit stopped"),
        "{log:?}"
    );
}

#[tokio::test]
async fn pretty_logs_carry_no_terminal_colours_when_captured() {
    let mut service = Service::start(&[]);
    let log = service.log();
    let serving = log
        .iter()
        .find(|l| l.contains("eigenzeit serving"))
        .expect("serving line");
    // ECMA-48: colour sequences start with ESC (0x1b); a captured log must read key=value.
    assert!(!serving.contains('\u{1b}'), "{serving:?}");
    assert!(
        serving.contains(&format!("addr={}", service.host_port)),
        "{serving}"
    );
    service.terminate();
    assert_eq!(
        service.wait_exit(Duration::from_secs(30)).await.code(),
        Some(0)
    );
}

#[tokio::test]
async fn sigterm_turns_unready_drains_in_flight_requests_and_exits_0() {
    let mut service = Service::start(&[
        "--log-format",
        "json",
        "--shutdown-delay-s",
        "1",
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
    while unready.is_none() && signalled.elapsed() < Duration::from_millis(900) {
        if let Ok(response) = client().get(service.url("/readyz")).send().await {
            if response.status().as_u16() == 503 {
                unready = response.json::<serde_json::Value>().await.ok();
            }
        }
        tokio::time::sleep(Duration::from_millis(20)).await;
    }
    let unready = unready.expect("/readyz answered 503 during the shutdown delay");
    assert_eq!(unready["status"], "draining");
    // After the delay the listener is closed: new connections are refused.
    tokio::time::sleep(Duration::from_millis(1_500).saturating_sub(signalled.elapsed())).await;
    assert!(
        tokio::net::TcpStream::connect(&service.host_port)
            .await
            .is_err(),
        "still accepting"
    );
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
