//! Operations: configuration, telemetry (logs, metrics), health, the leap-second source, the
//! whole application ([`app`]: the API's routes plus the service's) and the server's
//! lifecycle. This layer builds the API's state from its settings (tests/layers.rs keeps the
//! API from importing anything here).

pub mod app;
pub mod config;
pub mod health;
pub mod leap_source;
pub mod metrics;
pub mod middleware;
pub mod openapi;
pub mod server;
pub mod state;
pub mod telemetry;

pub use app::app;
pub use state::ServiceState;
