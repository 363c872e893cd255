//! Operations: configuration, telemetry (logs, metrics), health, the tables in force (leap
//! seconds, Earth orientation) and their refresh, the whole application ([`app`]: the API's
//! routes plus the service's) and the server's lifecycle. This layer builds the API's state from its settings (tests/layers.rs keeps the
//! API from importing anything here).

pub mod app;
pub mod config;
pub mod ephemeris;
pub mod health;
pub mod metrics;
pub mod middleware;
pub mod openapi;
pub mod refresh;
pub mod server;
pub mod state;
pub mod tables;
pub mod telemetry;

pub use app::app;
pub use state::ServiceState;
