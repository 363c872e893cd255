//! Prometheus metrics, kept in-process and rendered in the text exposition format (0.0.4).

use std::collections::BTreeMap;
use std::fmt::Write as _;
use std::sync::atomic::{AtomicI64, AtomicU64, Ordering};
use std::sync::Mutex;

/// Upper bounds of the latency histogram buckets, in seconds.
const LATENCY_BUCKETS_S: [f64; 14] = [
    0.0001, 0.00025, 0.0005, 0.001, 0.0025, 0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 1.0, 5.0, 30.0,
];

#[derive(Debug, Default, Clone)]
struct RouteStats {
    count: u64,
    sum_s: f64,
    buckets: [u64; LATENCY_BUCKETS_S.len()],
}

/// Counters and histograms of the service.
#[derive(Debug, Default)]
pub struct Metrics {
    requests: Mutex<BTreeMap<(String, String, u16), RouteStats>>,
    in_flight: AtomicI64,
    leap_refresh_failures: AtomicU64,
    leap_refresh_successes: AtomicU64,
}

/// Values read at render time from elsewhere in the service.
#[derive(Debug, Clone)]
pub struct Gauges {
    /// Where the leap-second table in force came from.
    pub leap_source: String,
    /// Days from now to the table's expiry (negative once expired).
    pub leap_expiry_days: f64,
    /// Whether the service is ready.
    pub ready: bool,
}

fn escape_label(value: &str) -> String {
    value
        .replace('\\', "\\\\")
        .replace('"', "\\\"")
        .replace('\n', "\\n")
}

impl Metrics {
    /// Empty metrics.
    pub fn new() -> Self {
        Self::default()
    }

    /// Records one finished request.
    pub fn observe_request(&self, route: &str, method: &str, status: u16, latency_s: f64) {
        let mut requests = match self.requests.lock() {
            Ok(guard) => guard,
            Err(poisoned) => poisoned.into_inner(),
        };
        let stats = requests
            .entry((route.to_string(), method.to_string(), status))
            .or_default();
        stats.count += 1;
        stats.sum_s += latency_s;
        for (bucket, bound) in stats.buckets.iter_mut().zip(LATENCY_BUCKETS_S) {
            if latency_s <= bound {
                *bucket += 1;
            }
        }
    }

    /// A request started (+1) or finished (-1).
    pub fn add_in_flight(&self, delta: i64) {
        self.in_flight.fetch_add(delta, Ordering::SeqCst);
    }

    /// Requests being served now.
    pub fn in_flight(&self) -> i64 {
        self.in_flight.load(Ordering::SeqCst)
    }

    /// Counts a failed leap-second refresh.
    pub fn leap_refresh_failed(&self) {
        self.leap_refresh_failures.fetch_add(1, Ordering::SeqCst);
    }

    /// Counts a successful leap-second refresh.
    pub fn leap_refresh_succeeded(&self) {
        self.leap_refresh_successes.fetch_add(1, Ordering::SeqCst);
    }

    /// Renders every metric in the Prometheus text format.
    pub fn render(&self, gauges: &Gauges) -> String {
        let mut out = String::with_capacity(4096);
        let _ = writeln!(out, "# HELP eigenzeit_build_info Build information.");
        let _ = writeln!(out, "# TYPE eigenzeit_build_info gauge");
        let _ = writeln!(
            out,
            "eigenzeit_build_info{{version=\"{}\"}} 1",
            env!("CARGO_PKG_VERSION")
        );
        let _ = writeln!(
            out,
            "# HELP eigenzeit_http_requests_in_flight Requests being served."
        );
        let _ = writeln!(out, "# TYPE eigenzeit_http_requests_in_flight gauge");
        let _ = writeln!(
            out,
            "eigenzeit_http_requests_in_flight {}",
            self.in_flight()
        );
        let _ = writeln!(
            out,
            "# HELP eigenzeit_ready 1 when the service takes new work, 0 while draining."
        );
        let _ = writeln!(out, "# TYPE eigenzeit_ready gauge");
        let _ = writeln!(out, "eigenzeit_ready {}", u8::from(gauges.ready));
        let _ = writeln!(
            out,
            "# HELP eigenzeit_leap_seconds_table_info The leap-second table in force."
        );
        let _ = writeln!(out, "# TYPE eigenzeit_leap_seconds_table_info gauge");
        let _ = writeln!(
            out,
            "eigenzeit_leap_seconds_table_info{{source=\"{}\"}} 1",
            escape_label(&gauges.leap_source)
        );
        let _ = writeln!(out, "# HELP eigenzeit_leap_seconds_expiry_days Days until the leap-second table expires (negative: expired).");
        let _ = writeln!(out, "# TYPE eigenzeit_leap_seconds_expiry_days gauge");
        let _ = writeln!(
            out,
            "eigenzeit_leap_seconds_expiry_days {:.3}",
            gauges.leap_expiry_days
        );
        let _ = writeln!(out, "# HELP eigenzeit_leap_seconds_refresh_failures_total Failed refreshes of the leap-second table.");
        let _ = writeln!(
            out,
            "# TYPE eigenzeit_leap_seconds_refresh_failures_total counter"
        );
        let _ = writeln!(
            out,
            "eigenzeit_leap_seconds_refresh_failures_total {}",
            self.leap_refresh_failures.load(Ordering::SeqCst)
        );
        let _ = writeln!(out, "# HELP eigenzeit_leap_seconds_refresh_successes_total Successful refreshes of the leap-second table.");
        let _ = writeln!(
            out,
            "# TYPE eigenzeit_leap_seconds_refresh_successes_total counter"
        );
        let _ = writeln!(
            out,
            "eigenzeit_leap_seconds_refresh_successes_total {}",
            self.leap_refresh_successes.load(Ordering::SeqCst)
        );
        self.render_requests(&mut out);
        out
    }

    fn render_requests(&self, out: &mut String) {
        let requests = match self.requests.lock() {
            Ok(guard) => guard.clone(),
            Err(poisoned) => poisoned.into_inner().clone(),
        };
        let _ = writeln!(
            out,
            "# HELP eigenzeit_http_requests_total Requests answered, by route, method and status."
        );
        let _ = writeln!(out, "# TYPE eigenzeit_http_requests_total counter");
        for ((route, method, status), stats) in &requests {
            let _ = writeln!(
                out,
                "eigenzeit_http_requests_total{{route=\"{}\",method=\"{method}\",status=\"{status}\"}} {}",
                escape_label(route),
                stats.count
            );
        }
        let _ = writeln!(out, "# HELP eigenzeit_http_request_duration_seconds Time to answer, by route, method and status.");
        let _ = writeln!(
            out,
            "# TYPE eigenzeit_http_request_duration_seconds histogram"
        );
        for ((route, method, status), stats) in &requests {
            let labels = format!(
                "route=\"{}\",method=\"{method}\",status=\"{status}\"",
                escape_label(route)
            );
            for (bound, count) in LATENCY_BUCKETS_S.iter().zip(stats.buckets) {
                let _ = writeln!(
                    out,
                    "eigenzeit_http_request_duration_seconds_bucket{{{labels},le=\"{bound}\"}} {count}"
                );
            }
            let _ = writeln!(
                out,
                "eigenzeit_http_request_duration_seconds_bucket{{{labels},le=\"+Inf\"}} {}",
                stats.count
            );
            let _ = writeln!(
                out,
                "eigenzeit_http_request_duration_seconds_sum{{{labels}}} {}",
                stats.sum_s
            );
            let _ = writeln!(
                out,
                "eigenzeit_http_request_duration_seconds_count{{{labels}}} {}",
                stats.count
            );
        }
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
