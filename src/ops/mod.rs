//! Operations: configuration, telemetry (logs, metrics), health, the leap-second source and
//! the server's lifecycle.

pub mod config;
pub mod health;
pub mod leap_source;
pub mod metrics;
pub mod middleware;
pub mod server;
pub mod telemetry;
