//! The service's state: its settings, the API's state built from them, readiness, the tables
//! in force (leap seconds, Earth orientation) with the status of their refresh, and the
//! metrics. Cloning is cheap (one `Arc`).

use std::sync::atomic::{AtomicBool, Ordering};
use std::sync::{Arc, Mutex};

use crate::api::{AppState, TableHandle};
use crate::physics::earth::eop::EopTable;
use crate::physics::solar_system::Ephemeris;
use crate::physics::time::leap_seconds::LeapTable;

use super::config::Settings;
use super::metrics::Metrics;

/// How the last refresh of a table went.
#[derive(Debug, Clone, Default)]
pub struct RefreshStatus {
    /// Unix time of the last successful refresh, if any.
    pub last_success_unix_s: Option<u64>,
    /// The last failure's message, cleared by a success.
    pub last_error: Option<String>,
}

/// One table in force (shared with the API through its handle) and how its last refresh went.
pub struct TableSlot<T> {
    handle: TableHandle<T>,
    refresh: Mutex<RefreshStatus>,
}

impl<T> TableSlot<T> {
    fn new(table: T) -> Self {
        Self {
            handle: TableHandle::new(table),
            refresh: Mutex::new(RefreshStatus::default()),
        }
    }

    /// The table in force (a snapshot: a refresh does not change it under a request).
    pub fn current(&self) -> Arc<T> {
        self.handle.current()
    }

    /// Replaces the table (for the API too).
    pub fn replace(&self, table: T) {
        self.handle.replace(table);
    }

    /// The status of the refresh.
    pub fn refresh_status(&self) -> RefreshStatus {
        match self.refresh.lock() {
            Ok(guard) => guard.clone(),
            Err(poisoned) => poisoned.into_inner().clone(),
        }
    }

    /// Records the outcome of a refresh.
    pub fn set_refresh_status(&self, status: RefreshStatus) {
        match self.refresh.lock() {
            Ok(mut guard) => *guard = status,
            Err(poisoned) => *poisoned.into_inner() = status,
        }
    }
}

/// Shared state of the service; clone freely.
#[derive(Clone)]
pub struct ServiceState {
    inner: Arc<Inner>,
}

struct Inner {
    settings: Settings,
    api: AppState,
    leap: TableSlot<LeapTable>,
    eop: TableSlot<EopTable>,
    ready: AtomicBool,
    metrics: Metrics,
}

impl ServiceState {
    /// New state with the given settings, leap-second table, Earth orientation table and
    /// OpenAPI document (the whole one: [`super::openapi::document_json`]), ready to serve.
    /// The API's state gets the limits from the settings, handles on the same tables and the
    /// document.
    pub fn new(
        settings: Settings,
        leap_table: LeapTable,
        eop_table: EopTable,
        ephemeris: Arc<Ephemeris>,
        openapi_json: String,
    ) -> Self {
        let leap = TableSlot::new(leap_table);
        let eop = TableSlot::new(eop_table);
        let api = AppState::new(
            settings.limits(),
            leap.handle.clone(),
            eop.handle.clone(),
            ephemeris,
            openapi_json,
        );
        Self {
            inner: Arc::new(Inner {
                settings,
                api,
                leap,
                eop,
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

    /// The leap-second table in force and its refresh.
    pub fn leap(&self) -> &TableSlot<LeapTable> {
        &self.inner.leap
    }

    /// The Earth orientation table in force and its refresh.
    pub fn eop(&self) -> &TableSlot<EopTable> {
        &self.inner.eop
    }

    /// The leap-second table in force (a snapshot: a refresh does not change it under a request).
    pub fn leap_table(&self) -> Arc<LeapTable> {
        self.inner.leap.current()
    }

    /// The Earth orientation table in force (a snapshot, as [`Self::leap_table`]).
    pub fn eop_table(&self) -> Arc<EopTable> {
        self.inner.eop.current()
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
