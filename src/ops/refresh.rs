//! The lifecycle of a table in force ([`ServedTable`]: leap seconds, Earth orientation): the
//! built-in table or a file at start-up, and an optional URL polled on an interval.

use std::time::Duration;

use super::config::{duration_from_s, Settings};
use super::state::ServiceState;
use super::tables::ServedTable;

/// The table to start with: the file named in the settings, or the built-in table. A file that
/// cannot be read or parsed is an error naming the file (and the reader's error the line): the
/// service must not start on wrong data.
pub fn initial_table<T: ServedTable>(settings: &Settings) -> Result<T, String> {
    let Some(path) = T::settings(settings).file else {
        return Ok(T::builtin());
    };
    let what = T::WHAT;
    let text = std::fs::read_to_string(path)
        .map_err(|e| format!("cannot read the {what} file {}: {e}", path.display()))?;
    T::parse(&text)
        .map(|table| table.with_source(format!("file {}", path.display())))
        .map_err(|e| format!("the {what} file {} is not valid: {e}", path.display()))
}

fn unix_now_s() -> u64 {
    std::time::SystemTime::now()
        .duration_since(std::time::UNIX_EPOCH)
        .map(|d| d.as_secs())
        .unwrap_or(0)
}

/// Fetches and parses the table at `url` once.
pub async fn fetch_table<T: ServedTable>(client: &reqwest::Client, url: &str) -> Result<T, String> {
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
    T::parse(&text)
        .map(|table| table.with_source(format!("refreshed from {url}")))
        .map_err(|e| format!("the file at {url} is not valid: {e}"))
}

/// Refuses a fetched table that is older than the table in force (a stale mirror, a cached
/// copy; [`ServedTable::older_than`] says what older means).
fn not_older<T: ServedTable>(fetched: T, in_force: &T, url: &str) -> Result<T, String> {
    match fetched.older_than(in_force) {
        Some(why) => Err(format!("the file at {url} {why}; keeping the newer table")),
        None => Ok(fetched),
    }
}

/// One refresh: a valid table, not older than the one in force, replaces it; a failure keeps
/// the table in force and is reported in the log, the metrics and `/readyz`.
pub async fn refresh_once<T: ServedTable>(
    state: &ServiceState,
    client: &reqwest::Client,
    url: &str,
) {
    let slot = T::slot(state);
    let counters = T::counters(state.metrics());
    let mut status = slot.refresh_status();
    let fetched = fetch_table::<T>(client, url)
        .await
        .and_then(|table| not_older(table, &slot.current(), url));
    match fetched {
        Ok(table) => {
            tracing::info!(url, table = %table.summary(), "{} table refreshed", T::WHAT);
            slot.replace(table);
            counters.succeeded();
            status.last_success_unix_s = Some(unix_now_s());
            status.last_error = None;
        }
        Err(message) => {
            tracing::warn!(url, error = %message, "{} refresh failed; keeping the table in force", T::WHAT);
            counters.failed();
            status.last_error = Some(message);
        }
    }
    slot.set_refresh_status(status);
}

/// Shortest interval between polls (a guard against a zero interval; common practice).
const MIN_INTERVAL: Duration = Duration::from_millis(10);

/// Polls `url` forever (first poll at once); a slow answer delays the next poll rather than
/// causing a burst of polls.
pub async fn poll_forever<T: ServedTable>(state: ServiceState, url: String, interval: Duration) {
    let client = match reqwest::Client::builder()
        .timeout(Duration::from_secs(30))
        .build()
    {
        Ok(client) => client,
        Err(e) => {
            tracing::error!(error = %e, "cannot build the HTTP client for the {} refresh", T::WHAT);
            return;
        }
    };
    let mut ticker = tokio::time::interval(interval.max(MIN_INTERVAL));
    ticker.set_missed_tick_behavior(tokio::time::MissedTickBehavior::Delay);
    loop {
        ticker.tick().await;
        refresh_once::<T>(&state, &client, &url).await;
    }
}

/// Starts the poll of `T`'s URL when the settings name one.
pub fn spawn_poller<T: ServedTable>(state: &ServiceState) -> Option<tokio::task::JoinHandle<()>> {
    let settings = T::settings(state.settings());
    let url = settings.url?.to_string();
    let interval = duration_from_s(settings.refresh_s);
    Some(tokio::spawn(poll_forever::<T>(
        state.clone(),
        url,
        interval,
    )))
}
