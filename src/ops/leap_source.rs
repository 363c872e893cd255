//! Where the leap-second table comes from: the built-in table, a file at start-up, and an
//! optional URL polled on an interval.

use std::time::Duration;

use crate::physics::time::leap_seconds::LeapTable;

use super::config::Settings;
use super::state::ServiceState;

/// The table to start with: the file named in the settings, or the built-in table. A file that
/// cannot be read or parsed is an error: the service must not start on wrong data.
pub fn initial_table(settings: &Settings) -> Result<LeapTable, String> {
    let Some(path) = &settings.leap_seconds_file else {
        return Ok(LeapTable::builtin().clone());
    };
    let text = std::fs::read_to_string(path)
        .map_err(|e| format!("cannot read the leap-second file {}: {e}", path.display()))?;
    LeapTable::parse_any(&text)
        .map(|table| table.with_source(format!("file {}", path.display())))
        .map_err(|e| format!("the leap-second file {} is not valid: {e}", path.display()))
}

fn unix_now_s() -> u64 {
    std::time::SystemTime::now()
        .duration_since(std::time::UNIX_EPOCH)
        .map(|d| d.as_secs())
        .unwrap_or(0)
}

/// Fetches and parses the table at `url` once.
pub async fn fetch_table(client: &reqwest::Client, url: &str) -> Result<LeapTable, String> {
    let response = client
        .get(url)
        .send()
        .await
        .map_err(|e| format!("cannot fetch {url}: {e}"))?;
    if !response.status().is_success() {
        return Err(format!("{url} answered {}", response.status()));
    }
    let text = response
        .text()
        .await
        .map_err(|e| format!("cannot read the answer of {url}: {e}"))?;
    LeapTable::parse_any(&text)
        .map(|table| table.with_source(format!("refreshed from {url}")))
        .map_err(|e| format!("the file at {url} is not valid: {e}"))
}

/// Refuses a fetched table that expires before the table in force: it is older data (a stale
/// mirror, a cached copy), and taking it would drop leap seconds announced since.
fn not_older(fetched: LeapTable, in_force: &LeapTable, url: &str) -> Result<LeapTable, String> {
    if fetched.expiry_mjd() < in_force.expiry_mjd() {
        return Err(format!(
            "the file at {url} expires on MJD {}, before the table in force (MJD {}); keeping the newer table",
            fetched.expiry_mjd(),
            in_force.expiry_mjd()
        ));
    }
    Ok(fetched)
}

/// One refresh: a valid table, not older than the one in force, replaces it; a failure keeps
/// the table in force and is reported in the log, the metrics and `/readyz`.
pub async fn refresh_once(state: &ServiceState, client: &reqwest::Client, url: &str) {
    let mut status = state.leap_refresh_status();
    let fetched = fetch_table(client, url)
        .await
        .and_then(|table| not_older(table, &state.leap_table(), url));
    match fetched {
        Ok(table) => {
            tracing::info!(
                url,
                expiry_mjd = table.expiry_mjd(),
                "leap-second table refreshed"
            );
            state.set_leap_table(table);
            state.metrics().leap_refresh_succeeded();
            status.last_success_unix_s = Some(unix_now_s());
            status.last_error = None;
        }
        Err(message) => {
            tracing::warn!(url, error = %message, "leap-second refresh failed; keeping the table in force");
            state.metrics().leap_refresh_failed();
            status.last_error = Some(message);
        }
    }
    state.set_leap_refresh_status(status);
}

/// Shortest interval between polls (a guard against a zero interval; common practice).
const MIN_INTERVAL: Duration = Duration::from_millis(10);

/// Polls the configured URL forever (first poll at once); a slow answer delays the next poll
/// rather than causing a burst of polls.
pub async fn poll_forever(state: ServiceState, url: String, interval: Duration) {
    let client = match reqwest::Client::builder()
        .timeout(Duration::from_secs(30))
        .build()
    {
        Ok(client) => client,
        Err(e) => {
            tracing::error!(error = %e, "cannot build the HTTP client for the leap-second refresh");
            return;
        }
    };
    let mut ticker = tokio::time::interval(interval.max(MIN_INTERVAL));
    ticker.set_missed_tick_behavior(tokio::time::MissedTickBehavior::Delay);
    loop {
        ticker.tick().await;
        refresh_once(&state, &client, &url).await;
    }
}
