//! The tables the service keeps in force and refreshes: the leap-second table and the Earth
//! orientation (EOP) table. Each says here, once, what differs between them (its settings, its
//! reader, what makes a fetched table older, where the state and the metrics keep it); the
//! lifecycle itself (start-up file, URL polled on an interval) is written once, in
//! [`super::refresh`].

use std::path::Path;

use crate::physics::earth::eop::{self, EopTable};
use crate::physics::time::leap_seconds::LeapTable;

use super::config::Settings;
use super::metrics::{Metrics, RefreshCounters};
use super::state::{ServiceState, TableSlot};

/// Where a table comes from, as the settings give it.
#[derive(Debug, Clone, Copy)]
pub struct TableSettings<'a> {
    /// File to read at start-up instead of the built-in table.
    pub file: Option<&'a Path>,
    /// URL to poll for a newer table.
    pub url: Option<&'a str>,
    /// Interval between polls, seconds.
    pub refresh_s: f64,
}

/// A table kept in force by the service.
pub trait ServedTable: Clone + Send + Sync + 'static {
    /// What the table is, in messages ("the {WHAT} file ...").
    const WHAT: &'static str;

    /// Where the table comes from.
    fn settings(settings: &Settings) -> TableSettings<'_>;

    /// The table built into the binary.
    fn builtin() -> Self;

    /// Reads a file in any format the table takes; the error names the line.
    fn parse(text: &str) -> Result<Self, String>;

    /// The table with `source` as its description of where it came from.
    fn with_source(self, source: String) -> Self;

    /// Where the table came from.
    fn source(&self) -> &str;

    /// Why `self`, a fetched table, is older than `in_force` (and must not replace it), or None.
    fn older_than(&self, in_force: &Self) -> Option<String>;

    /// What to log about a table newly in force (its days that matter).
    fn summary(&self) -> String;

    /// Where the service keeps the table.
    fn slot(state: &ServiceState) -> &TableSlot<Self>;

    /// The refresh counters of the table.
    fn counters(metrics: &Metrics) -> &RefreshCounters;
}

impl ServedTable for LeapTable {
    const WHAT: &'static str = "leap-second";

    fn settings(settings: &Settings) -> TableSettings<'_> {
        TableSettings {
            file: settings.leap_seconds_file.as_deref(),
            url: settings.leap_seconds_url.as_deref(),
            refresh_s: settings.leap_seconds_refresh_s,
        }
    }

    fn builtin() -> Self {
        LeapTable::builtin().clone()
    }

    fn parse(text: &str) -> Result<Self, String> {
        LeapTable::parse_any(text).map_err(|e| e.to_string())
    }

    fn with_source(self, source: String) -> Self {
        LeapTable::with_source(self, source)
    }

    fn source(&self) -> &str {
        LeapTable::source(self)
    }

    /// A table that expires before the table in force is older data (a stale mirror, a cached
    /// copy): taking it would drop leap seconds announced since.
    fn older_than(&self, in_force: &Self) -> Option<String> {
        (self.expiry_mjd() < in_force.expiry_mjd()).then(|| {
            format!(
                "expires on MJD {}, before the table in force (MJD {})",
                self.expiry_mjd(),
                in_force.expiry_mjd()
            )
        })
    }

    fn summary(&self) -> String {
        format!("expiry_mjd={}", self.expiry_mjd())
    }

    fn slot(state: &ServiceState) -> &TableSlot<Self> {
        state.leap()
    }

    fn counters(metrics: &Metrics) -> &RefreshCounters {
        metrics.leap_refresh()
    }
}

impl ServedTable for EopTable {
    const WHAT: &'static str = "EOP";

    fn settings(settings: &Settings) -> TableSettings<'_> {
        TableSettings {
            file: settings.eop_file.as_deref(),
            url: settings.eop_url.as_deref(),
            refresh_s: settings.eop_refresh_s,
        }
    }

    fn builtin() -> Self {
        EopTable::builtin_owned()
    }

    fn parse(text: &str) -> Result<Self, String> {
        eop::parse_any(text).map_err(|e| e.to_string())
    }

    fn with_source(self, source: String) -> Self {
        EopTable::with_source(self, source)
    }

    fn source(&self) -> &str {
        EopTable::source(self)
    }

    /// A table whose last observed day is earlier than the one in force is older data: taking
    /// it would turn observed days back into predictions.
    fn older_than(&self, in_force: &Self) -> Option<String> {
        let (fetched, current) = (self.last_observed_mjd(), in_force.last_observed_mjd());
        (fetched < current).then(|| {
            format!(
                "was last observed on MJD {}, before the table in force (MJD {})",
                mjd_text(fetched),
                mjd_text(current)
            )
        })
    }

    fn summary(&self) -> String {
        format!(
            "first_mjd={} last_observed_mjd={} end_of_predictions_mjd={}",
            mjd_text(self.first_mjd()),
            mjd_text(self.last_observed_mjd()),
            mjd_text(self.end_of_predictions_mjd())
        )
    }

    fn slot(state: &ServiceState) -> &TableSlot<Self> {
        state.eop()
    }

    fn counters(metrics: &Metrics) -> &RefreshCounters {
        metrics.eop_refresh()
    }
}

fn mjd_text(mjd: Option<i64>) -> String {
    mjd.map_or_else(|| "none".to_string(), |m| m.to_string())
}
