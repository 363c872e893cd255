//! The whole application: the API's routes, the service's own routes (health, readiness,
//! metrics), the fallbacks and the layers, in one place.

use std::time::Duration;

use axum::extract::DefaultBodyLimit;
use axum::http::{HeaderName, HeaderValue, Method};
use axum::Router;
use tower_http::compression::CompressionLayer;
use tower_http::cors::{AllowOrigin, CorsLayer};

use crate::api;

use super::state::ServiceState;
use super::{health, middleware};

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

/// The whole application: every route, the fallbacks and the layers.
pub fn app(state: ServiceState) -> Router {
    let settings = state.settings().clone();
    Router::new()
        .merge(api::router(state.api().clone()))
        .merge(health::router(state.clone()))
        .fallback(api::error::not_found)
        .method_not_allowed_fallback(api::error::method_not_allowed)
        .layer(DefaultBodyLimit::max(settings.body_limit_bytes))
        .layer(axum::middleware::from_fn_with_state(
            state,
            middleware::observe,
        ))
        .layer(CompressionLayer::new())
        .layer(cors_layer(&settings.cors_origins))
}
