//! The state shared by every handler: settings, the leap-second table in force, readiness and
//! metrics. Cloning is cheap (one `Arc`).

use std::sync::atomic::{AtomicBool, Ordering};
use std::sync::{Arc, Mutex, RwLock};

use crate::ops::config::Settings;
use crate::ops::metrics::Metrics;
use crate::physics::time::leap_seconds::LeapTable;

/// How the last refresh of the leap-second table went.
#[derive(Debug, Clone, Default)]
pub struct LeapRefreshStatus {
    /// Unix time of the last successful refresh, if any.
    pub last_success_unix_s: Option<u64>,
    /// The last failure's message, cleared by a success.
    pub last_error: Option<String>,
}

/// Shared state; clone freely.
#[derive(Clone)]
pub struct AppState {
    inner: Arc<Inner>,
}

struct Inner {
    settings: Settings,
    leap_table: RwLock<Arc<LeapTable>>,
    leap_refresh: Mutex<LeapRefreshStatus>,
    ready: AtomicBool,
    metrics: Metrics,
}

impl AppState {
    /// New state with the given settings and leap-second table, ready to serve.
    pub fn new(settings: Settings, leap_table: LeapTable) -> Self {
        Self {
            inner: Arc::new(Inner {
                settings,
                leap_table: RwLock::new(Arc::new(leap_table)),
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

    /// The leap-second table in force (a snapshot: a refresh does not change it under a request).
    pub fn leap_table(&self) -> Arc<LeapTable> {
        match self.inner.leap_table.read() {
            Ok(guard) => Arc::clone(&guard),
            Err(poisoned) => Arc::clone(&poisoned.into_inner()),
        }
    }

    /// Replaces the leap-second table.
    pub fn set_leap_table(&self, table: LeapTable) {
        let table = Arc::new(table);
        match self.inner.leap_table.write() {
            Ok(mut guard) => *guard = table,
            Err(poisoned) => *poisoned.into_inner() = table,
        }
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
