//! The HTTP layer: one module per endpoint group, each with its own `router()`; request and
//! response types with their OpenAPI schemas; one error type answered as problem+json.
//!
//! Handlers parse and validate, call the physics library, and shape the answer. Nothing here
//! computes physics, and nothing here knows the service around it: limits, the leap-second
//! and Earth orientation tables and the OpenAPI document come in as values ([`AppState`]); see tests/layers.rs.

pub mod clock;
pub mod docs;
pub mod earth;
pub mod error;
pub mod extract;
pub mod names;
pub mod negotiate;
pub mod openapi;
pub mod problem_codes;
pub mod proper_time;
pub mod signal;
pub mod solar_system;
pub mod state;
pub mod time;

use axum::Router;

pub use state::{AppState, EopTableHandle, LeapTableHandle, Limits, TableHandle};

/// The API's routes with their state: every endpoint group, `/openapi.json` and `/docs`.
/// The service (`crate::ops::app`) adds its own routes (health, readiness, metrics), the
/// fallbacks and the layers.
pub fn router(state: AppState) -> Router {
    Router::new()
        .merge(time::router())
        .merge(clock::router())
        .merge(earth::router())
        .merge(proper_time::router())
        .merge(signal::router())
        .merge(solar_system::router())
        .merge(docs::router())
        .with_state(state)
}
