//! The HTTP layer: one module per endpoint group, each with its own `router()`; request and
//! response types with their OpenAPI schemas; one error type answered as problem+json.
//!
//! Handlers parse and validate, call the physics library, and shape the answer. Nothing here
//! computes physics.

pub mod clock;
pub mod docs;
pub mod error;
pub mod extract;
pub mod names;
pub mod openapi;
pub mod problem_codes;
pub mod proper_time;
pub mod signal;
pub mod state;
pub mod time;

use std::time::Duration;

use axum::extract::DefaultBodyLimit;
use axum::http::{HeaderName, HeaderValue, Method};
use axum::routing::get;
use axum::Router;
use tower_http::compression::CompressionLayer;
use tower_http::cors::{AllowOrigin, CorsLayer};

use crate::ops::{health, middleware};
use state::AppState;

fn cors_layer(origins: &[String]) -> CorsLayer {
    let base = CorsLayer::new()
        .allow_methods([Method::GET, Method::POST, Method::OPTIONS])
        .allow_headers([
            axum::http::header::CONTENT_TYPE,
            axum::http::header::ACCEPT,
            axum::http::header::IF_NONE_MATCH,
            HeaderName::from_static(middleware::REQUEST_ID_HEADER),
        ])
        .expose_headers([
            HeaderName::from_static(middleware::REQUEST_ID_HEADER),
            axum::http::header::ETAG,
        ])
        .max_age(Duration::from_secs(600));
    if origins.iter().any(|origin| origin == "*") {
        return base.allow_origin(AllowOrigin::any());
    }
    let allowed: Vec<HeaderValue> = origins
        .iter()
        .filter(|origin| !origin.is_empty())
        .filter_map(|origin| HeaderValue::from_str(origin.trim()).ok())
        .collect();
    base.allow_origin(AllowOrigin::list(allowed))
}

/// The whole application: every route, the fallbacks and the layers, in one place.
pub fn app(state: AppState) -> Router {
    let settings = state.settings().clone();
    Router::new()
        .merge(time::router())
        .merge(clock::router())
        .merge(proper_time::router())
        .merge(signal::router())
        .merge(docs::router())
        .route("/healthz", get(health::healthz))
        .route("/readyz", get(health::readyz))
        .route("/metrics", get(health::metrics))
        .fallback(error::not_found)
        .method_not_allowed_fallback(error::method_not_allowed)
        .layer(DefaultBodyLimit::max(settings.body_limit_bytes))
        .layer(axum::middleware::from_fn_with_state(
            state.clone(),
            middleware::observe,
        ))
        .layer(CompressionLayer::new())
        .layer(cors_layer(&settings.cors_origins))
        .with_state(state)
}
