//! The operations page in a real browser: Debian's headless Chromium driven through
//! chromedriver (W3C WebDriver) against the real server binary. Checks that the clock values
//! update, that uploading the demo OEM file shows a plot and a summary, and that an expired
//! leap-second table (served from a test file with `--leap-seconds-file`) is flagged.
//! Screenshots go to `target/screenshots/` (and to `docs/screenshots/` with
//! `EIGENZEIT_UPDATE_SCREENSHOTS=1`).
//!
//! Without `chromium` and `chromedriver` on `PATH` the test is skipped with a message, unless
//! `EIGENZEIT_REQUIRE_BROWSER=1` (set by `.ci/run`, which installs both) makes that a failure.

mod common;
#[path = "browser/webdriver.rs"]
mod webdriver;

use std::path::{Path, PathBuf};
use std::time::Duration;

use common::process::Service;
use serde_json::json;
use webdriver::{on_path, Driver};

const WAIT: Duration = Duration::from_secs(30);

fn repository() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
}

fn screenshot_dir() -> PathBuf {
    let target = std::env::var_os("CARGO_TARGET_DIR")
        .map(PathBuf::from)
        .unwrap_or_else(|| repository().join("target"));
    target.join("screenshots")
}

fn fresh_profile(name: &str) -> PathBuf {
    let dir = std::env::temp_dir().join(format!("eigenzeit-browser-{}-{name}", std::process::id()));
    let _ = std::fs::remove_dir_all(&dir);
    let _ = std::fs::create_dir_all(&dir);
    dir
}

/// The browser and its driver, or why the test cannot run here.
fn browser() -> Result<(PathBuf, PathBuf), String> {
    let chromium = std::env::var_os("EIGENZEIT_CHROMIUM")
        .map(PathBuf::from)
        .or_else(|| on_path(&["chromium", "chromium-browser", "google-chrome"]));
    let driver = std::env::var_os("EIGENZEIT_CHROMEDRIVER")
        .map(PathBuf::from)
        .or_else(|| on_path(&["chromedriver"]));
    match (chromium, driver) {
        (Some(chromium), Some(driver)) => Ok((chromium, driver)),
        (chromium, driver) => Err(format!(
            "no {} on PATH (Debian: apt-get install chromium chromium-driver)",
            [
                chromium.is_none().then_some("chromium"),
                driver.is_none().then_some("chromedriver")
            ]
            .into_iter()
            .flatten()
            .collect::<Vec<_>>()
            .join(" and ")
        )),
    }
}

async fn shoot(session: &webdriver::Session<'_>, name: &str) {
    let path = screenshot_dir().join(name);
    session
        .screenshot(&path)
        .await
        .unwrap_or_else(|e| panic!("screenshot {name}: {e}"));
    if std::env::var("EIGENZEIT_UPDATE_SCREENSHOTS").as_deref() == Ok("1") {
        let docs = repository().join("docs/screenshots");
        let _ = std::fs::create_dir_all(&docs);
        std::fs::copy(&path, docs.join(name)).unwrap_or_else(|e| panic!("copy {name}: {e}"));
    }
}

async fn scroll_to(session: &webdriver::Session<'_>, id: &str) {
    session
        .run(
            "document.getElementById(arguments[0]).scrollIntoView(); return true;",
            json!([id]),
        )
        .await
        .unwrap_or_else(|e| panic!("scroll to {id}: {e}"));
}

async fn text(session: &webdriver::Session<'_>, script: &str) -> String {
    session
        .run(script, json!([]))
        .await
        .unwrap_or_else(|e| panic!("{script}: {e}"))
        .as_str()
        .unwrap_or_default()
        .to_string()
}

#[tokio::test(flavor = "multi_thread", worker_threads = 2)]
async fn operations_page_in_a_browser() {
    let (chromium, chromedriver) = match browser() {
        Ok(found) => found,
        Err(why) => {
            if std::env::var("EIGENZEIT_REQUIRE_BROWSER").as_deref() == Ok("1") {
                panic!("EIGENZEIT_REQUIRE_BROWSER=1 but {why}");
            }
            eprintln!("SKIPPED operations_page_in_a_browser: {why}; set EIGENZEIT_REQUIRE_BROWSER=1 to make this a failure");
            return;
        }
    };
    let driver = Driver::start(&chromedriver)
        .await
        .unwrap_or_else(|e| panic!("{e}"));

    // 1. The page of a server with the built-in tables: the clocks tick.
    let service = Service::start(&[]);
    let session = driver
        .session(&chromium, &fresh_profile("live"), 1280, 1000)
        .await
        .unwrap_or_else(|e| panic!("{e}"));
    session
        .goto(&service.url("/"))
        .await
        .unwrap_or_else(|e| panic!("{e}"));
    let count = "return Number(document.getElementById('now-status').dataset.count);";
    session
        .wait_for("return Number(document.getElementById('now-status').dataset.count) >= 1 && document.querySelectorAll('#scales output').length >= 10;", WAIT)
        .await
        .unwrap_or_else(|e| panic!("first reading: {e}"));
    let utc = "return document.querySelector('output[data-scale=\"UTC\"]').textContent;";
    let first_utc = text(&session, utc).await;
    let first_count = session.run(count, json!([])).await.unwrap_or_default();
    // Every scale of /v1/time/now but UT1: UTC and the ten results.
    for scale in [
        "UTC", "TAI", "TT", "TCG", "TCB", "TDB", "GPST", "GST", "BDT", "QZSST",
    ] {
        let value = text(
            &session,
            &format!(
                "return document.querySelector('output[data-scale=\"{scale}\"]').textContent;"
            ),
        )
        .await;
        assert!(
            value.len() >= 19 && value.contains('T'),
            "{scale}: {value:?}"
        );
    }
    session
        .wait_for(
            &format!(
                "return Number(document.getElementById('now-status').dataset.count) >= {} + 2;",
                first_count.as_f64().unwrap_or(1.0)
            ),
            WAIT,
        )
        .await
        .unwrap_or_else(|e| panic!("the clock did not update: {e}"));
    let later_utc = text(&session, utc).await;
    assert_ne!(
        first_utc, later_utc,
        "UTC tile unchanged after two more readings"
    );
    // The tables: the flag matches the service's own countdown (45 days: the page's threshold).
    let leap = common::client()
        .get(service.url("/v1/time/leap-seconds"))
        .send()
        .await
        .expect("leap seconds")
        .json::<serde_json::Value>()
        .await
        .expect("json");
    let days = leap["expires_in_days"].as_f64().unwrap_or(f64::NAN);
    let expected = if days <= 0.0 {
        "expired"
    } else if days < 45.0 {
        "near"
    } else {
        "current"
    };
    session
        .wait_for(&format!("return document.getElementById('leap-card').dataset.state === '{expected}' && document.getElementById('eop-card').dataset.state !== 'unknown';"), WAIT)
        .await
        .unwrap_or_else(|e| panic!("table flags: {e}"));
    shoot(&session, "page_clocks_and_tables.png").await;

    // 2. Upload the demo OEM file through the file input: a summary row per object and a plot.
    let oem = repository().join("demo-data/lyra_kestrel.oem");
    scroll_to(&session, "ephemeris").await;
    session
        .send_keys("#file-input", &oem.display().to_string())
        .await
        .unwrap_or_else(|e| panic!("upload: {e}"));
    session
        .wait_for("const img = document.getElementById('upload-plot'); return !document.getElementById('upload-result').hidden && img.complete && img.naturalWidth > 0;", WAIT)
        .await
        .unwrap_or_else(|e| panic!("no plot after the upload: {e}"));
    let rows = session
        .run("return Array.from(document.querySelectorAll('#upload-summary tbody tr')).map(r => Array.from(r.cells).map(c => c.textContent));", json!([]))
        .await
        .unwrap_or_default();
    let rows = rows.as_array().cloned().unwrap_or_default();
    // demo-data/README: six invented navigation satellites and one low-orbit spacecraft.
    assert_eq!(rows.len(), 7, "{rows:?}");
    assert!(rows.iter().any(|r| r[0] == "KESTREL-1"), "{rows:?}");
    let status = text(
        &session,
        "return document.getElementById('upload-status').textContent;",
    )
    .await;
    assert!(status.contains("7 object(s)"), "{status}");
    shoot(&session, "page_upload.png").await;
    // A file dropped on the zone (a DragEvent carrying a File) that is not an ephemeris: the
    // page shows the service's problem code and where it is.
    session
        .run("const dt = new DataTransfer(); dt.items.add(new File(['not an ephemeris\\n'], 'broken.oem')); document.getElementById('drop-zone').dispatchEvent(new DragEvent('drop', {dataTransfer: dt, bubbles: true, cancelable: true})); return true;", json!([]))
        .await
        .unwrap_or_else(|e| panic!("drop: {e}"));
    session
        .wait_for(
            "return document.getElementById('upload-status').classList.contains('error');",
            WAIT,
        )
        .await
        .unwrap_or_else(|e| panic!("no problem shown after a bad drop: {e}"));
    let problem = text(
        &session,
        "return document.getElementById('upload-status').textContent;",
    )
    .await;
    assert!(
        problem.starts_with("Not computed") && problem.contains("line"),
        "{problem}"
    );
    scroll_to(&session, "profiles").await;
    session
        .wait_for("const img = document.getElementById('rate-profile'); return img.complete && img.naturalWidth > 0;", WAIT)
        .await
        .unwrap_or_else(|e| panic!("rate profile: {e}"));
    shoot(&session, "page_rate_profile.png").await;
    session.close().await.unwrap_or_else(|e| panic!("{e}"));
    drop(service);

    // 3. A server whose leap-second table expired (a test file): the page flags it.
    // Relative to the package directory, where cargo runs the test (and the binary).
    let expired = Service::start(&[
        "--leap-seconds-file",
        "tests/browser/expired_Leap_Second.dat",
    ]);
    let session = driver
        .session(&chromium, &fresh_profile("expired"), 1280, 1000)
        .await
        .unwrap_or_else(|e| panic!("{e}"));
    session
        .goto(&expired.url("/"))
        .await
        .unwrap_or_else(|e| panic!("{e}"));
    session
        .wait_for(
            "return document.getElementById('leap-card').dataset.state === 'expired';",
            WAIT,
        )
        .await
        .unwrap_or_else(|e| panic!("no expiry flag: {e}"));
    let flag = text(
        &session,
        "return document.getElementById('leap-flag').textContent;",
    )
    .await;
    assert!(flag.contains("EXPIRED"), "{flag}");
    let expires = text(
        &session,
        "return document.getElementById('leap-expires').textContent;",
    )
    .await;
    assert_eq!(expires, "2025-06-28");
    scroll_to(&session, "tables").await;
    shoot(&session, "page_expired_table.png").await;
    session.close().await.unwrap_or_else(|e| panic!("{e}"));
    assert!(Path::new(&screenshot_dir().join("page_expired_table.png")).is_file());
}
