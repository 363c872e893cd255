//! The per-request layer: request id, timeout, in-flight count, metrics and one log line.

use std::time::Instant;

use axum::extract::{MatchedPath, Request, State};
use axum::http::{HeaderValue, Method, StatusCode};
use axum::middleware::Next;
use axum::response::{IntoResponse, Response};

use super::config::duration_from_s;
use super::state::ServiceState;
use crate::api::error::ApiError;

/// Header carrying the request id, taken from the caller or generated.
pub const REQUEST_ID_HEADER: &str = "x-request-id";

/// Status recorded for a request whose client went away before the answer (nginx's 499,
/// common practice; never sent on the wire).
pub const CLIENT_CLOSED_STATUS: u16 = 499;

/// Longest caller-supplied request id kept (longer ones are replaced by a generated id).
const MAX_REQUEST_ID_LEN: usize = 200;

fn request_id(request: &Request) -> HeaderValue {
    request
        .headers()
        .get(REQUEST_ID_HEADER)
        .filter(|value| {
            !value.is_empty() && value.len() <= MAX_REQUEST_ID_LEN && value.to_str().is_ok()
        })
        .cloned()
        .unwrap_or_else(|| {
            HeaderValue::from_str(&uuid::Uuid::new_v4().to_string())
                .unwrap_or_else(|_| HeaderValue::from_static("unknown"))
        })
}

/// One request being served: counted in flight from creation, and recorded (metrics and the
/// log line) exactly once, when it finishes or when its future is dropped because the client
/// went away.
struct InFlight {
    state: ServiceState,
    started: Instant,
    id: HeaderValue,
    method: Method,
    route: String,
    status: Option<u16>,
}

impl InFlight {
    fn begin(state: ServiceState, id: HeaderValue, method: Method, route: String) -> Self {
        state.metrics().add_in_flight(1);
        Self {
            state,
            started: Instant::now(),
            id,
            method,
            route,
            status: None,
        }
    }
}

impl Drop for InFlight {
    fn drop(&mut self) {
        self.state.metrics().add_in_flight(-1);
        let latency_s = self.started.elapsed().as_secs_f64();
        let status = self.status.unwrap_or(CLIENT_CLOSED_STATUS);
        self.state
            .metrics()
            .observe_request(&self.route, self.method.as_str(), status, latency_s);
        let request_id = self.id.to_str().unwrap_or("unknown");
        if self.status.is_some() {
            tracing::info!(
                request_id,
                method = %self.method,
                route = %self.route,
                status,
                latency_ms = latency_s * 1000.0,
                "request"
            );
        } else {
            tracing::info!(
                request_id,
                method = %self.method,
                route = %self.route,
                status,
                latency_ms = latency_s * 1000.0,
                "request abandoned: the client closed the connection before the answer"
            );
        }
    }
}

/// Wraps every request: assigns the request id, bounds the time, counts and logs it.
pub async fn observe(State(state): State<ServiceState>, request: Request, next: Next) -> Response {
    let id = request_id(&request);
    let route = request
        .extensions()
        .get::<MatchedPath>()
        .map(|path| path.as_str().to_string())
        .unwrap_or_else(|| "unmatched".to_string());
    let timeout_s = state.settings().request_timeout_s;
    let mut in_flight = InFlight::begin(state, id.clone(), request.method().clone(), route);
    let timeout = duration_from_s(timeout_s);
    let mut response = match tokio::time::timeout(timeout, next.run(request)).await {
        Ok(response) => response,
        Err(_) => ApiError::new(
            StatusCode::SERVICE_UNAVAILABLE,
            "request_timeout",
            format!(
                "the request took longer than the configured {timeout_s} s (see --request-timeout-s); split it into smaller requests"
            ),
        )
        .into_response(),
    };
    in_flight.status = Some(response.status().as_u16());
    drop(in_flight);
    response.headers_mut().insert(REQUEST_ID_HEADER, id);
    response
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::ops::config::Settings;
    use crate::physics::earth::eop::EopTable;
    use crate::physics::time::leap_seconds::LeapTable;

    fn state() -> ServiceState {
        ServiceState::new(
            Settings::default(),
            LeapTable::builtin().clone(),
            EopTable::builtin().clone(),
            crate::physics::solar_system::Ephemeris::embedded().expect("built-in ephemeris"),
            String::new(),
        )
    }

    #[test]
    fn a_request_dropped_before_its_answer_is_counted_499_and_leaves_the_gauge() {
        let state = state();
        let in_flight = InFlight::begin(
            state.clone(),
            HeaderValue::from_static("gone"),
            Method::POST,
            "/v1/time/convert".to_string(),
        );
        assert_eq!(state.metrics().in_flight(), 1);
        // The future holding the guard is dropped (hyper does so when the client goes away).
        drop(in_flight);
        assert_eq!(state.metrics().in_flight(), 0);
        let text = state.metrics().render(&crate::ops::metrics::Gauges {
            leap_source: "built-in".into(),
            leap_expiry_days: 1.0,
            ready: true,
            ..crate::ops::metrics::Gauges::default()
        });
        // 499: nginx's "client closed request" (common practice).
        assert!(text.contains(
            "eigenzeit_http_requests_total{route=\"/v1/time/convert\",method=\"POST\",status=\"499\"} 1"
        ));
    }

    #[test]
    fn a_finished_request_is_counted_with_its_status() {
        let state = state();
        let mut in_flight = InFlight::begin(
            state.clone(),
            HeaderValue::from_static("done"),
            Method::GET,
            "/healthz".to_string(),
        );
        in_flight.status = Some(200);
        drop(in_flight);
        assert_eq!(state.metrics().in_flight(), 0);
        let text = state.metrics().render(&crate::ops::metrics::Gauges {
            leap_source: "built-in".into(),
            leap_expiry_days: 1.0,
            ready: true,
            ..crate::ops::metrics::Gauges::default()
        });
        // Prometheus exposition format: one sample per label set.
        assert!(text.contains(
            "eigenzeit_http_requests_total{route=\"/healthz\",method=\"GET\",status=\"200\"} 1"
        ));
        assert!(!text.contains("status=\"499\""));
    }
}
