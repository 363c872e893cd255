//! Configuration: command-line flags, each with an `EIGENZEIT_*` environment twin.

use std::net::SocketAddr;
use std::path::PathBuf;
use std::time::Duration;

use clap::{Args, Parser, Subcommand, ValueEnum};

use crate::api::state::{Limits, DEFAULT_BATCH_LIMIT, DEFAULT_MAX_EPHEMERIS_GAP_S};

/// Relativistic clock and time-scale service.
#[derive(Debug, Parser)]
#[command(
    name = "eigenzeit",
    version,
    about,
    long_about = None,
    args_conflicts_with_subcommands = true
)]
pub struct Cli {
    /// What to do (default: serve).
    #[command(subcommand)]
    pub command: Option<Command>,
    /// Service settings (when no subcommand is given, the service is served with them).
    #[command(flatten)]
    pub settings: Settings,
}

/// The binary's subcommands.
#[derive(Debug, Subcommand)]
pub enum Command {
    /// Serve the HTTP API (the default; takes the same settings).
    Serve(Box<Settings>),
    /// Print the OpenAPI document and exit.
    Openapi,
    /// Ask a running instance for /healthz and exit 0 when it answers 200 (for container health checks).
    Healthcheck {
        /// URL to probe.
        #[arg(
            long,
            env = "EIGENZEIT_HEALTHCHECK_URL",
            default_value = "http://127.0.0.1:8080/healthz"
        )]
        url: String,
    },
}

/// Log line format.
#[derive(Debug, Clone, Copy, PartialEq, Eq, ValueEnum, Default)]
pub enum LogFormat {
    /// Human-readable lines.
    #[default]
    Pretty,
    /// One JSON object per line.
    Json,
}

/// The longest duration a setting accepts, in seconds (about 31.7 years; common practice: a
/// bound that keeps every timer representable).
pub const MAX_DURATION_S: f64 = 1.0e9;

/// A duration setting in seconds as a [`Duration`], without panicking on any input: negative
/// or NaN gives zero, values too large for a `Duration` give [`Duration::MAX`].
pub fn duration_from_s(value_s: f64) -> Duration {
    Duration::try_from_secs_f64(value_s).unwrap_or(if value_s > 0.0 {
        Duration::MAX
    } else {
        Duration::ZERO
    })
}

/// Every setting of the service, with its default.
#[derive(Debug, Clone, Args)]
pub struct Settings {
    /// Address to listen on.
    #[arg(long, env = "EIGENZEIT_ADDR", default_value = "127.0.0.1:8080")]
    pub addr: SocketAddr,
    /// Log format.
    #[arg(long, env = "EIGENZEIT_LOG_FORMAT", value_enum, default_value_t = LogFormat::Pretty)]
    pub log_format: LogFormat,
    /// Log level or filter (e.g. `info`, `eigenzeit=debug`).
    #[arg(long, env = "EIGENZEIT_LOG_LEVEL", default_value = "info")]
    pub log_level: String,
    /// Largest request body accepted, in bytes (413 above it).
    #[arg(long, env = "EIGENZEIT_BODY_LIMIT_BYTES", default_value_t = 64 * 1024 * 1024)]
    pub body_limit_bytes: usize,
    /// Time a request may take before it is answered 503, in seconds.
    #[arg(long, env = "EIGENZEIT_REQUEST_TIMEOUT_S", default_value_t = 30.0)]
    pub request_timeout_s: f64,
    /// Most items (epochs, rate subjects, ephemeris states) in one request.
    #[arg(long, env = "EIGENZEIT_BATCH_LIMIT", default_value_t = DEFAULT_BATCH_LIMIT)]
    pub batch_limit: usize,
    /// On SIGTERM/SIGINT, how long in-flight requests may take to finish, in seconds.
    #[arg(long, env = "EIGENZEIT_DRAIN_TIMEOUT_S", default_value_t = 20.0)]
    pub drain_timeout_s: f64,
    /// On SIGTERM/SIGINT, how long to keep accepting while unready (lets load balancers
    /// notice), in seconds, before draining.
    #[arg(long, env = "EIGENZEIT_SHUTDOWN_DELAY_S", default_value_t = 0.0)]
    pub shutdown_delay_s: f64,
    /// Origins allowed by CORS, comma-separated (none by default; `*` for any).
    #[arg(long, env = "EIGENZEIT_CORS_ORIGINS", value_delimiter = ',')]
    pub cors_origins: Vec<String>,
    /// Leap-second file to use instead of the built-in table (IERS Leap_Second.dat or IETF leap-seconds.list).
    #[arg(long, env = "EIGENZEIT_LEAP_SECONDS_FILE")]
    pub leap_seconds_file: Option<PathBuf>,
    /// URL polled for a newer leap-second file (same formats).
    #[arg(long, env = "EIGENZEIT_LEAP_SECONDS_URL")]
    pub leap_seconds_url: Option<String>,
    /// Interval between polls of the leap-second URL, in seconds.
    #[arg(
        long,
        env = "EIGENZEIT_LEAP_SECONDS_REFRESH_S",
        default_value_t = 86_400.0
    )]
    pub leap_seconds_refresh_s: f64,
    /// Earth orientation (EOP) file to use instead of the built-in table (IERS Bulletin A
    /// `finals2000A` or IERS EOP 14/20 C04, recognized from the text).
    #[arg(long, env = "EIGENZEIT_EOP_FILE")]
    pub eop_file: Option<PathBuf>,
    /// URL polled for a newer EOP file (same formats); a file whose last observed day is older
    /// than the table's in force is refused.
    #[arg(long, env = "EIGENZEIT_EOP_URL")]
    pub eop_url: Option<String>,
    /// Interval between polls of the EOP URL, in seconds.
    #[arg(long, env = "EIGENZEIT_EOP_REFRESH_S", default_value_t = 86_400.0)]
    pub eop_refresh_s: f64,
    /// Planetary ephemeris file to use instead of the built-in DE440 excerpt (1959-2101): a NAIF
    /// SPK kernel such as JPL's de440.bsp or de441.bsp (type 2 and 3 segments), read at start-up.
    #[arg(long, env = "EIGENZEIT_EPHEMERIS_FILE")]
    pub ephemeris_file: Option<PathBuf>,
    /// Longest gap between ephemeris states accepted, in seconds.
    #[arg(long, env = "EIGENZEIT_MAX_EPHEMERIS_GAP_S", default_value_t = DEFAULT_MAX_EPHEMERIS_GAP_S)]
    pub max_ephemeris_gap_s: f64,
}

impl Default for Settings {
    fn default() -> Self {
        Self {
            addr: SocketAddr::from(([127, 0, 0, 1], 8080)),
            log_format: LogFormat::Pretty,
            log_level: "info".to_string(),
            body_limit_bytes: 64 * 1024 * 1024,
            request_timeout_s: 30.0,
            batch_limit: DEFAULT_BATCH_LIMIT,
            drain_timeout_s: 20.0,
            shutdown_delay_s: 0.0,
            cors_origins: Vec::new(),
            leap_seconds_file: None,
            leap_seconds_url: None,
            leap_seconds_refresh_s: 86_400.0,
            eop_file: None,
            eop_url: None,
            eop_refresh_s: 86_400.0,
            ephemeris_file: None,
            max_ephemeris_gap_s: DEFAULT_MAX_EPHEMERIS_GAP_S,
        }
    }
}

impl Settings {
    /// The limits the API's handlers check.
    pub fn limits(&self) -> Limits {
        Limits {
            batch_limit: self.batch_limit,
            max_ephemeris_gap_s: self.max_ephemeris_gap_s,
        }
    }

    /// Checks values that clap cannot (positive, finite durations).
    pub fn validate(&self) -> Result<(), String> {
        for (name, value) in [
            ("--request-timeout-s", self.request_timeout_s),
            ("--drain-timeout-s", self.drain_timeout_s),
            ("--leap-seconds-refresh-s", self.leap_seconds_refresh_s),
            ("--eop-refresh-s", self.eop_refresh_s),
            ("--max-ephemeris-gap-s", self.max_ephemeris_gap_s),
        ] {
            if !(value.is_finite() && value > 0.0 && value <= MAX_DURATION_S) {
                return Err(format!(
                    "{name} must be a positive number of seconds (at most {MAX_DURATION_S}), got {value}"
                ));
            }
        }
        if !(self.shutdown_delay_s.is_finite()
            && self.shutdown_delay_s >= 0.0
            && self.shutdown_delay_s <= MAX_DURATION_S)
        {
            return Err(format!(
                "--shutdown-delay-s must be zero or a positive number of seconds (at most {MAX_DURATION_S})"
            ));
        }
        if self.batch_limit == 0 || self.body_limit_bytes == 0 {
            return Err("--batch-limit and --body-limit-bytes must be at least 1".to_string());
        }
        Ok(())
    }
}
