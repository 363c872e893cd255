//! The service's state: its settings, the API's state built from them, readiness, the
//! leap-second refresh status and the metrics. Cloning is cheap (one `Arc`).

use std::sync::atomic::{AtomicBool, Ordering};
use std::sync::{Arc, Mutex};

use crate::api::{AppState, LeapTableHandle};
use crate::physics::time::leap_seconds::LeapTable;

use super::config::Settings;
use super::metrics::Metrics;

/// How the last refresh of the leap-second table went.
#[derive(Debug, Clone, Default)]
pub struct LeapRefreshStatus {
    /// Unix time of the last successful refresh, if any.
    pub last_success_unix_s: Option<u64>,
    /// The last failure's message, cleared by a success.
    pub last_error: Option<String>,
}

/// Shared state of the service; clone freely.
#[derive(Clone)]
pub struct ServiceState {
    inner: Arc<Inner>,
}

struct Inner {
    settings: Settings,
    api: AppState,
    leap_table: LeapTableHandle,
    leap_refresh: Mutex<LeapRefreshStatus>,
    ready: AtomicBool,
    metrics: Metrics,
}

impl ServiceState {
    /// New state with the given settings, leap-second table and OpenAPI document (the whole
    /// one: [`super::openapi::document_json`]), ready to serve. The API's state gets the
    /// limits from the settings, a handle on the same table and the document.
    pub fn new(settings: Settings, leap_table: LeapTable, openapi_json: String) -> Self {
        let leap_table = LeapTableHandle::new(leap_table);
        let api = AppState::new(settings.limits(), leap_table.clone(), openapi_json);
        Self {
            inner: Arc::new(Inner {
                settings,
                api,
                leap_table,
                leap_refresh: Mutex::new(LeapRefreshStatus::default()),
                ready: AtomicBool::new(true),
                metrics: Metrics::new(),
            }),
        }
    }

    /// The settings the service runs with.
    pub fn settings(&self) -> &Settings {
        &self.inner.settings
    }

    /// The API's state (what the API routes are built with).
    pub fn api(&self) -> &AppState {
        &self.inner.api
    }

    /// The leap-second table in force (a snapshot: a refresh does not change it under a request).
    pub fn leap_table(&self) -> Arc<LeapTable> {
        self.inner.leap_table.current()
    }

    /// Replaces the leap-second table (for the API too).
    pub fn set_leap_table(&self, table: LeapTable) {
        self.inner.leap_table.replace(table);
    }

    /// The status of the leap-second refresh.
    pub fn leap_refresh_status(&self) -> LeapRefreshStatus {
        match self.inner.leap_refresh.lock() {
            Ok(guard) => guard.clone(),
            Err(poisoned) => poisoned.into_inner().clone(),
        }
    }

    /// Records the outcome of a leap-second refresh.
    pub fn set_leap_refresh_status(&self, status: LeapRefreshStatus) {
        match self.inner.leap_refresh.lock() {
            Ok(mut guard) => *guard = status,
            Err(poisoned) => *poisoned.into_inner() = status,
        }
    }

    /// Whether the service takes new work (false while draining).
    pub fn is_ready(&self) -> bool {
        self.inner.ready.load(Ordering::SeqCst)
    }

    /// Marks the service ready or draining.
    pub fn set_ready(&self, ready: bool) {
        self.inner.ready.store(ready, Ordering::SeqCst);
    }

    /// The service's metrics.
    pub fn metrics(&self) -> &Metrics {
        &self.inner.metrics
    }
}
