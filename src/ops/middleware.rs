//! The per-request layer: request id, timeout, in-flight count, metrics and one log line.

use std::time::{Duration, Instant};

use axum::extract::{MatchedPath, Request, State};
use axum::http::{HeaderValue, StatusCode};
use axum::middleware::Next;
use axum::response::{IntoResponse, Response};

use crate::api::error::ApiError;
use crate::api::state::AppState;

/// Header carrying the request id, taken from the caller or generated.
pub const REQUEST_ID_HEADER: &str = "x-request-id";

fn request_id(request: &Request) -> HeaderValue {
    request
        .headers()
        .get(REQUEST_ID_HEADER)
        .filter(|value| !value.is_empty() && value.len() <= 200 && value.to_str().is_ok())
        .cloned()
        .unwrap_or_else(|| {
            HeaderValue::from_str(&uuid::Uuid::new_v4().to_string())
                .unwrap_or_else(|_| HeaderValue::from_static("unknown"))
        })
}

/// Wraps every request: assigns the request id, bounds the time, counts and logs it.
pub async fn observe(State(state): State<AppState>, request: Request, next: Next) -> Response {
    let started = Instant::now();
    let id = request_id(&request);
    let method = request.method().clone();
    let route = request
        .extensions()
        .get::<MatchedPath>()
        .map(|path| path.as_str().to_string())
        .unwrap_or_else(|| "unmatched".to_string());
    let timeout = Duration::from_secs_f64(state.settings().request_timeout_s);
    state.metrics().add_in_flight(1);
    let mut response = match tokio::time::timeout(timeout, next.run(request)).await {
        Ok(response) => response,
        Err(_) => ApiError::new(
            StatusCode::SERVICE_UNAVAILABLE,
            "request_timeout",
            format!(
                "the request took longer than the configured {} s (see --request-timeout-s); split it into smaller requests",
                state.settings().request_timeout_s
            ),
        )
        .into_response(),
    };
    state.metrics().add_in_flight(-1);
    let latency_s = started.elapsed().as_secs_f64();
    let status = response.status().as_u16();
    state
        .metrics()
        .observe_request(&route, method.as_str(), status, latency_s);
    tracing::info!(
        request_id = id.to_str().unwrap_or("unknown"),
        method = %method,
        route = %route,
        status,
        latency_ms = latency_s * 1000.0,
        "request"
    );
    response.headers_mut().insert(REQUEST_ID_HEADER, id);
    response
}
