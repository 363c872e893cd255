//! A small client of the W3C WebDriver protocol (https://www.w3.org/TR/webdriver2/: JSON over
//! HTTP) for the browser test: a chromedriver process, one headless Chromium session, and the
//! few commands the test needs (navigate, find, send keys to a file input, run a script, take a
//! screenshot). Written on reqwest, which the tests already use, instead of a WebDriver crate
//! (see DEVELOPERS.md).
#![allow(dead_code)]

use std::path::{Path, PathBuf};
use std::process::{Child, Command, Stdio};
use std::time::{Duration, Instant};

use serde_json::{json, Value};

/// The W3C name of an element reference in JSON.
const ELEMENT_KEY: &str = "element-6066-11e4-a52e-4f735466cecf";

/// The first of `names` found as an executable file on `PATH`.
pub fn on_path(names: &[&str]) -> Option<PathBuf> {
    let path = std::env::var_os("PATH")?;
    std::env::split_paths(&path)
        .flat_map(|dir| names.iter().map(move |name| dir.join(name)))
        .find(|candidate| candidate.is_file())
}

/// A running chromedriver, stopped when dropped.
pub struct Driver {
    child: Child,
    base: String,
    http: reqwest::Client,
}

impl Drop for Driver {
    fn drop(&mut self) {
        let _ = self.child.kill();
        let _ = self.child.wait();
    }
}

fn free_port() -> u16 {
    std::net::TcpListener::bind("127.0.0.1:0")
        .and_then(|l| l.local_addr())
        .map(|a| a.port())
        .unwrap_or(9515)
}

impl Driver {
    /// Starts `chromedriver` on a free loopback port and waits (at most 20 s) until it is ready.
    pub async fn start(chromedriver: &Path) -> Result<Self, String> {
        let port = free_port();
        let child = Command::new(chromedriver)
            .arg(format!("--port={port}"))
            .stdout(Stdio::null())
            .stderr(Stdio::null())
            .spawn()
            .map_err(|e| format!("cannot start {}: {e}", chromedriver.display()))?;
        let http = reqwest::Client::builder()
            .no_proxy()
            .timeout(Duration::from_secs(60))
            .build()
            .map_err(|e| e.to_string())?;
        let driver = Self {
            child,
            base: format!("http://127.0.0.1:{port}"),
            http,
        };
        let deadline = Instant::now() + Duration::from_secs(20);
        while Instant::now() < deadline {
            if let Ok(response) = driver
                .http
                .get(format!("{}/status", driver.base))
                .send()
                .await
            {
                if let Ok(body) = response.json::<Value>().await {
                    if body["value"]["ready"] == true {
                        return Ok(driver);
                    }
                }
            }
            tokio::time::sleep(Duration::from_millis(100)).await;
        }
        Err("chromedriver was not ready after 20 s".to_string())
    }

    async fn command(
        &self,
        method: reqwest::Method,
        path: &str,
        body: Option<Value>,
    ) -> Result<Value, String> {
        let mut request = self.http.request(method, format!("{}{path}", self.base));
        if let Some(body) = body {
            request = request.json(&body);
        }
        let response = request.send().await.map_err(|e| format!("{path}: {e}"))?;
        let status = response.status();
        let body: Value = response.json().await.map_err(|e| format!("{path}: {e}"))?;
        if !status.is_success() {
            return Err(format!("{path}: {status}: {}", body["value"]));
        }
        Ok(body["value"].clone())
    }

    /// A new headless Chromium session with a fresh profile directory.
    pub async fn session(
        &self,
        chromium: &Path,
        profile: &Path,
        width: u32,
        height: u32,
    ) -> Result<Session<'_>, String> {
        let args = vec![
            "--headless".to_string(),
            "--no-sandbox".to_string(),
            "--disable-gpu".to_string(),
            "--disable-background-networking".to_string(),
            "--disable-component-update".to_string(),
            "--disable-sync".to_string(),
            "--no-first-run".to_string(),
            "--disable-dev-shm-usage".to_string(),
            "--hide-scrollbars".to_string(),
            format!("--user-data-dir={}", profile.display()),
            format!("--window-size={width},{height}"),
        ];
        let capabilities = json!({"capabilities": {"alwaysMatch": {
            "browserName": "chrome",
            "goog:chromeOptions": {"binary": chromium.display().to_string(), "args": args}
        }}});
        let value = self
            .command(reqwest::Method::POST, "/session", Some(capabilities))
            .await?;
        let id = value["sessionId"]
            .as_str()
            .ok_or("no sessionId")?
            .to_string();
        Ok(Session { driver: self, id })
    }
}

/// One browser session; close it with [`Session::close`].
pub struct Session<'a> {
    driver: &'a Driver,
    id: String,
}

impl Session<'_> {
    async fn call(
        &self,
        method: reqwest::Method,
        path: &str,
        body: Option<Value>,
    ) -> Result<Value, String> {
        self.driver
            .command(method, &format!("/session/{}{path}", self.id), body)
            .await
    }

    /// Navigates to `url` and waits for the page to load.
    pub async fn goto(&self, url: &str) -> Result<(), String> {
        self.call(reqwest::Method::POST, "/url", Some(json!({ "url": url })))
            .await
            .map(|_| ())
    }

    /// Runs `script` (a function body; `arguments` holds `args`) and answers its result.
    pub async fn run(&self, script: &str, args: Value) -> Result<Value, String> {
        self.call(
            reqwest::Method::POST,
            "/execute/sync",
            Some(json!({ "script": script, "args": args })),
        )
        .await
    }

    /// Polls `script` until it answers `true` (at most `limit`); answers the last result.
    pub async fn wait_for(&self, script: &str, limit: Duration) -> Result<(), String> {
        let deadline = Instant::now() + limit;
        let mut last = Value::Null;
        while Instant::now() < deadline {
            last = self.run(script, json!([])).await?;
            if last == true {
                return Ok(());
            }
            tokio::time::sleep(Duration::from_millis(150)).await;
        }
        Err(format!(
            "not true within {limit:?}: {script} (last: {last})"
        ))
    }

    /// Sends `text` as key strokes to the element `css` (for a file input: the file's path).
    pub async fn send_keys(&self, css: &str, text: &str) -> Result<(), String> {
        let found = self
            .call(
                reqwest::Method::POST,
                "/element",
                Some(json!({"using": "css selector", "value": css})),
            )
            .await?;
        let element = found[ELEMENT_KEY]
            .as_str()
            .ok_or("no element reference")?
            .to_string();
        self.call(
            reqwest::Method::POST,
            &format!("/element/{element}/value"),
            Some(json!({ "text": text })),
        )
        .await
        .map(|_| ())
    }

    /// A PNG screenshot of the viewport, written to `path`.
    pub async fn screenshot(&self, path: &Path) -> Result<(), String> {
        let value = self.call(reqwest::Method::GET, "/screenshot", None).await?;
        let bytes = decode_base64(value.as_str().ok_or("no screenshot data")?)?;
        if let Some(parent) = path.parent() {
            std::fs::create_dir_all(parent).map_err(|e| e.to_string())?;
        }
        std::fs::write(path, bytes).map_err(|e| format!("{}: {e}", path.display()))
    }

    /// Ends the session (the browser quits).
    pub async fn close(self) -> Result<(), String> {
        self.driver
            .command(
                reqwest::Method::DELETE,
                &format!("/session/{}", self.id),
                None,
            )
            .await
            .map(|_| ())
    }
}

/// Decodes standard base64 (RFC 4648 sec. 4, padding optional).
pub fn decode_base64(text: &str) -> Result<Vec<u8>, String> {
    let value = |c: u8| -> Result<u32, String> {
        match c {
            b'A'..=b'Z' => Ok(u32::from(c - b'A')),
            b'a'..=b'z' => Ok(u32::from(c - b'a') + 26),
            b'0'..=b'9' => Ok(u32::from(c - b'0') + 52),
            b'+' => Ok(62),
            b'/' => Ok(63),
            other => Err(format!("not base64: {}", other as char)),
        }
    };
    let clean: Vec<u8> = text
        .bytes()
        .filter(|c| !c.is_ascii_whitespace() && *c != b'=')
        .collect();
    let mut out = Vec::with_capacity(clean.len() * 3 / 4);
    for chunk in clean.chunks(4) {
        let mut bits = 0u32;
        for (i, c) in chunk.iter().enumerate() {
            bits |= value(*c)? << (18 - 6 * i);
        }
        let bytes = bits.to_be_bytes();
        out.extend_from_slice(&bytes[1..chunk.len()]);
    }
    Ok(out)
}

#[test]
fn base64_decodes_rfc4648_vectors() {
    // RFC 4648 sec. 10 test vectors.
    for (encoded, plain) in [
        ("", ""),
        ("Zg==", "f"),
        ("Zm8=", "fo"),
        ("Zm9v", "foo"),
        ("Zm9vYg==", "foob"),
        ("Zm9vYmE=", "fooba"),
        ("Zm9vYmFy", "foobar"),
    ] {
        assert_eq!(decode_base64(encoded).unwrap_or_default(), plain.as_bytes());
    }
}
