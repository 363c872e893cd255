//! Prometheus metrics, kept in-process with the `prometheus-client` crate and rendered in the
//! Prometheus text exposition format (0.0.4). Names, types and labels are the service's
//! contract with its dashboards: change none without saying so in the README.

use prometheus_client::encoding::prometheus_text::encode;
use prometheus_client::encoding::EncodeLabelSet;
use prometheus_client::metrics::counter::Counter;
use prometheus_client::metrics::family::Family;
use prometheus_client::metrics::gauge::{ConstGauge, Gauge};
use prometheus_client::metrics::histogram::Histogram;
use prometheus_client::metrics::info::Info;
use prometheus_client::registry::Registry;

/// The media type of [`Metrics::render`]'s text (Prometheus text format 0.0.4).
pub const CONTENT_TYPE: &str = prometheus_client::encoding::prometheus_text::CONTENT_TYPE;

/// Upper bounds of the latency histogram buckets, in seconds.
const LATENCY_BUCKETS_S: [f64; 14] = [
    0.0001, 0.00025, 0.0005, 0.001, 0.0025, 0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 1.0, 5.0, 30.0,
];

/// The labels of the request counter and histogram, in this order.
#[derive(Debug, Clone, Hash, PartialEq, Eq, EncodeLabelSet)]
struct RequestLabels {
    route: String,
    method: String,
    status: u16,
}

fn latency_histogram() -> Histogram {
    Histogram::new(LATENCY_BUCKETS_S)
}

/// Counters and histograms of the service. (`prometheus-client` adds `_total` to counter
/// names and `_info` to info names, and a `.` to each help text.)
#[derive(Debug)]
pub struct Metrics {
    registry: Registry,
    requests: Family<RequestLabels, Counter>,
    durations: Family<RequestLabels, Histogram, fn() -> Histogram>,
    in_flight: Gauge,
    leap_refresh: RefreshCounters,
    eop_refresh: RefreshCounters,
}

/// The counters of one table's refresh: `<prefix>_refresh_failures_total` and
/// `<prefix>_refresh_successes_total`.
#[derive(Debug, Clone, Default)]
pub struct RefreshCounters {
    failures: Counter,
    successes: Counter,
}

impl RefreshCounters {
    /// New counters registered as `<prefix>_refresh_failures` and `_successes` (help texts
    /// naming `table`).
    fn registered(registry: &mut Registry, prefix: &str, table: &str) -> Self {
        let counters = Self::default();
        registry.register(
            format!("{prefix}_refresh_failures"),
            format!("Failed refreshes of {table}"),
            counters.failures.clone(),
        );
        registry.register(
            format!("{prefix}_refresh_successes"),
            format!("Successful refreshes of {table}"),
            counters.successes.clone(),
        );
        counters
    }

    /// Counts a failed refresh.
    pub fn failed(&self) {
        self.failures.inc();
    }

    /// Counts a successful refresh.
    pub fn succeeded(&self) {
        self.successes.inc();
    }
}

/// Values read at render time from elsewhere in the service.
#[derive(Debug, Clone, Default)]
pub struct Gauges {
    /// Where the leap-second table in force came from.
    pub leap_source: String,
    /// Days from now to the table's expiry (negative once expired).
    pub leap_expiry_days: f64,
    /// Where the Earth orientation table in force came from.
    pub eop_source: String,
    /// Last day of the EOP table with observed values (MJD).
    pub eop_last_observed_mjd: Option<i64>,
    /// Last predicted day of the EOP table (MJD).
    pub eop_end_of_predictions_mjd: Option<i64>,
    /// Days from now to the end of the EOP table (negative: past its last day).
    pub eop_table_end_days: Option<f64>,
    /// Whether the service is ready.
    pub ready: bool,
    /// The planetary ephemeris in force: its name and span (first, last epoch; TDB, ISO 8601).
    pub ephemeris: [String; 3],
}

impl Default for Metrics {
    fn default() -> Self {
        Self::new()
    }
}

impl Metrics {
    /// Empty metrics.
    pub fn new() -> Self {
        let requests = Family::<RequestLabels, Counter>::default();
        let durations: Family<RequestLabels, Histogram, fn() -> Histogram> =
            Family::new_with_constructor(latency_histogram);
        let in_flight = Gauge::default();
        let mut registry = Registry::default();
        registry.register(
            "eigenzeit_build",
            "Build information",
            Info::new([("version", env!("CARGO_PKG_VERSION"))]),
        );
        registry.register(
            "eigenzeit_http_requests_in_flight",
            "Requests being served",
            in_flight.clone(),
        );
        registry.register(
            "eigenzeit_http_requests",
            "Requests answered, by route, method and status",
            requests.clone(),
        );
        registry.register(
            "eigenzeit_http_request_duration_seconds",
            "Time to answer, by route, method and status",
            durations.clone(),
        );
        let leap_refresh = RefreshCounters::registered(
            &mut registry,
            "eigenzeit_leap_seconds",
            "the leap-second table",
        );
        let eop_refresh = RefreshCounters::registered(
            &mut registry,
            "eigenzeit_eop",
            "the Earth orientation (EOP) table",
        );
        Self {
            registry,
            requests,
            durations,
            in_flight,
            leap_refresh,
            eop_refresh,
        }
    }

    /// Records one finished request.
    pub fn observe_request(&self, route: &str, method: &str, status: u16, latency_s: f64) {
        let labels = RequestLabels {
            route: route.to_string(),
            method: method.to_string(),
            status,
        };
        self.requests.get_or_create(&labels).inc();
        self.durations.get_or_create(&labels).observe(latency_s);
    }

    /// A request started (+1) or finished (-1).
    pub fn add_in_flight(&self, delta: i64) {
        self.in_flight.inc_by(delta);
    }

    /// Requests being served now.
    pub fn in_flight(&self) -> i64 {
        self.in_flight.get()
    }

    /// The refresh counters of the leap-second table.
    pub fn leap_refresh(&self) -> &RefreshCounters {
        &self.leap_refresh
    }

    /// The refresh counters of the Earth orientation table.
    pub fn eop_refresh(&self) -> &RefreshCounters {
        &self.eop_refresh
    }

    /// Renders every metric in the Prometheus text format (0.0.4), the values of `gauges`
    /// included.
    pub fn render(&self, gauges: &Gauges) -> String {
        let mut out = String::with_capacity(4096);
        // Writing to a String cannot fail.
        let _ = encode(&mut out, &self.registry);
        let mut scrape = Registry::default();
        scrape.register(
            "eigenzeit_ready",
            "1 when the service takes new work, 0 while draining",
            ConstGauge::new(i64::from(gauges.ready)),
        );
        scrape.register(
            "eigenzeit_leap_seconds_table",
            "The leap-second table in force",
            Info::new([("source", gauges.leap_source.clone())]),
        );
        // Three decimals (about 90 s), as before the move to prometheus-client.
        let days = (gauges.leap_expiry_days * 1000.0).round() / 1000.0;
        scrape.register(
            "eigenzeit_leap_seconds_expiry_days",
            "Days until the leap-second table expires (negative: expired)",
            ConstGauge::new(days),
        );
        register_eop(&mut scrape, gauges);
        let [name, first, last] = gauges.ephemeris.clone();
        scrape.register(
            "eigenzeit_ephemeris",
            "The planetary ephemeris in force, with its span (TDB)",
            Info::new([("name", name), ("first_tdb", first), ("last_tdb", last)]),
        );
        let _ = encode(&mut out, &scrape);
        out
    }
}

/// The Earth orientation gauges of one scrape (a day not known, e.g. no predicted day, is left
/// out rather than given a made-up value).
fn register_eop(scrape: &mut Registry, gauges: &Gauges) {
    scrape.register(
        "eigenzeit_eop_table",
        "The Earth orientation (EOP) table in force",
        Info::new([("source", gauges.eop_source.clone())]),
    );
    if let Some(mjd) = gauges.eop_last_observed_mjd {
        scrape.register(
            "eigenzeit_eop_last_observed_mjd",
            "Last day of the EOP table with observed values (MJD, 0h UTC)",
            ConstGauge::new(mjd),
        );
    }
    if let Some(mjd) = gauges.eop_end_of_predictions_mjd {
        scrape.register(
            "eigenzeit_eop_end_of_predictions_mjd",
            "Last predicted day of the EOP table (MJD, 0h UTC)",
            ConstGauge::new(mjd),
        );
    }
    if let Some(days) = gauges.eop_table_end_days {
        // Three decimals (about 90 s), as the leap-second expiry.
        scrape.register(
            "eigenzeit_eop_table_end_days",
            "Days until the last day of the EOP table, the end of its predictions when it has any (negative: past it)",
            ConstGauge::new((days * 1000.0).round() / 1000.0),
        );
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn histogram_is_cumulative() {
        let metrics = Metrics::new();
        metrics.observe_request("/v1/time/now", "GET", 200, 0.0003);
        metrics.observe_request("/v1/time/now", "GET", 200, 0.02);
        let text = metrics.render(&Gauges {
            leap_source: "built-in".into(),
            leap_expiry_days: 10.0,
            ready: true,
            ..Gauges::default()
        });
        // Prometheus exposition format: buckets are cumulative, +Inf equals _count.
        assert!(text.contains(
            "eigenzeit_http_requests_total{route=\"/v1/time/now\",method=\"GET\",status=\"200\"} 2"
        ));
        assert!(text.contains("le=\"0.0005\"} 1"));
        assert!(text.contains("le=\"0.025\"} 2"));
        assert!(text.contains("le=\"+Inf\"} 2"));
    }
}
