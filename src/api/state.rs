//! The state shared by every handler: the limits the handlers check, the leap-second and Earth
//! orientation tables in force and the OpenAPI document. The service (`crate::ops`) builds it from its settings and
//! hands it over as plain values; nothing here reads the service's configuration. Cloning is
//! cheap (one `Arc`).

use std::sync::{Arc, RwLock};

use crate::physics::earth::eop::EopTable;
use crate::physics::solar_system::Ephemeris;
use crate::physics::time::leap_seconds::LeapTable;

/// The default of [`Limits::batch_limit`], and the `maxItems` the OpenAPI document states for
/// every batch.
pub const DEFAULT_BATCH_LIMIT: usize = 100_000;

/// The default of [`Limits::max_ephemeris_gap_s`], seconds.
pub const DEFAULT_MAX_EPHEMERIS_GAP_S: f64 = 3_600.0;

/// What the handlers accept, set by the service.
#[derive(Debug, Clone, PartialEq)]
pub struct Limits {
    /// Most items (epochs, rate subjects, ephemeris states) in one request.
    pub batch_limit: usize,
    /// Longest gap between ephemeris states accepted when the request names none, seconds.
    pub max_ephemeris_gap_s: f64,
}

impl Default for Limits {
    fn default() -> Self {
        Self {
            batch_limit: DEFAULT_BATCH_LIMIT,
            max_ephemeris_gap_s: DEFAULT_MAX_EPHEMERIS_GAP_S,
        }
    }
}

/// A table in force (leap seconds, Earth orientation), shared between the handlers (who read
/// it) and whoever refreshes it. Clones share one table.
#[derive(Debug)]
pub struct TableHandle<T> {
    table: Arc<RwLock<Arc<T>>>,
}

impl<T> Clone for TableHandle<T> {
    fn clone(&self) -> Self {
        Self {
            table: Arc::clone(&self.table),
        }
    }
}

impl<T> TableHandle<T> {
    /// A handle holding `table`.
    pub fn new(table: T) -> Self {
        Self {
            table: Arc::new(RwLock::new(Arc::new(table))),
        }
    }

    /// The table in force (a snapshot: a refresh does not change it under a request).
    pub fn current(&self) -> Arc<T> {
        match self.table.read() {
            Ok(guard) => Arc::clone(&guard),
            Err(poisoned) => Arc::clone(&poisoned.into_inner()),
        }
    }

    /// Replaces the table for every clone of the handle.
    pub fn replace(&self, table: T) {
        let table = Arc::new(table);
        match self.table.write() {
            Ok(mut guard) => *guard = table,
            Err(poisoned) => *poisoned.into_inner() = table,
        }
    }
}

/// The leap-second table in force.
pub type LeapTableHandle = TableHandle<LeapTable>;

/// The Earth orientation (EOP) table in force.
pub type EopTableHandle = TableHandle<EopTable>;

/// The current time as Unix seconds (0 when the system clock reads before 1970).
pub fn unix_now_s() -> f64 {
    std::time::SystemTime::now()
        .duration_since(std::time::UNIX_EPOCH)
        .map(|d| d.as_secs_f64())
        .unwrap_or(0.0)
}

/// Shared state; clone freely.
#[derive(Clone)]
pub struct AppState {
    inner: Arc<Inner>,
}

struct Inner {
    limits: Limits,
    leap_table: LeapTableHandle,
    eop_table: EopTableHandle,
    ephemeris: Arc<Ephemeris>,
    openapi_json: String,
}

impl AppState {
    /// State with the given limits, leap-second and EOP tables, planetary ephemeris and OpenAPI
    /// document (served as `/openapi.json`: the service's whole document, which this layer does
    /// not assemble).
    pub fn new(
        limits: Limits,
        leap_table: LeapTableHandle,
        eop_table: EopTableHandle,
        ephemeris: Arc<Ephemeris>,
        openapi_json: String,
    ) -> Self {
        Self {
            inner: Arc::new(Inner {
                limits,
                leap_table,
                eop_table,
                ephemeris,
                openapi_json,
            }),
        }
    }

    /// The limits the handlers check.
    pub fn limits(&self) -> &Limits {
        &self.inner.limits
    }

    /// The leap-second table in force (a snapshot: a refresh does not change it under a request).
    pub fn leap_table(&self) -> Arc<LeapTable> {
        self.inner.leap_table.current()
    }

    /// The Earth orientation table in force (a snapshot: a refresh does not change it under a
    /// request).
    pub fn eop_table(&self) -> Arc<EopTable> {
        self.inner.eop_table.current()
    }

    /// The planetary ephemeris in force (the built-in DE440 excerpt or a loaded kernel).
    pub fn ephemeris(&self) -> Arc<Ephemeris> {
        Arc::clone(&self.inner.ephemeris)
    }

    /// The OpenAPI document as JSON text.
    pub fn openapi_json(&self) -> &str {
        &self.inner.openapi_json
    }
}
