//! One error type for the whole API, answered as RFC 9457 `application/problem+json`.

use std::collections::BTreeMap;

use axum::http::{header, HeaderValue, StatusCode};
use axum::response::{IntoResponse, Response};
use serde::Serialize;
use utoipa::openapi::{ContentBuilder, Ref, RefOr, ResponseBuilder};
use utoipa::{IntoResponses, ToSchema};

use crate::physics::time::error::TimeError;

/// Media type of problem answers (RFC 9457).
pub const PROBLEM_JSON: &str = "application/problem+json";

/// A problem answer (RFC 9457) with a stable `code` and, where it helps, where the fault is.
#[derive(Debug, Clone, Serialize, ToSchema)]
#[schema(example = json!({
    "type": "/docs#problem-impossible_date",
    "title": "Unprocessable input",
    "status": 422,
    "detail": "the date 2026-02-30 does not exist",
    "code": "impossible_date",
    "field": "epochs[3]"
}))]
pub struct Problem {
    /// URI reference naming the problem type; resolves to its entry on the documentation page.
    #[serde(rename = "type")]
    pub problem_type: String,
    /// Short summary of the problem type.
    pub title: String,
    /// HTTP status code.
    pub status: u16,
    /// What is wrong, for a person to act on.
    pub detail: String,
    /// Stable machine-readable code.
    pub code: String,
    /// The request field at fault (JSON path or query parameter), when there is one.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub field: Option<String>,
    /// The line of an uploaded file at fault (1-based), when there is one.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub line: Option<usize>,
    /// The object (ephemeris id) at fault, when there is one.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub object: Option<String>,
    /// The index of the item at fault within its list, when there is one.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub index: Option<usize>,
}

/// An error of the HTTP layer: status, stable code and details.
#[derive(Debug, Clone)]
pub struct ApiError {
    status: StatusCode,
    problem: Box<Problem>,
}

impl ApiError {
    /// A problem with the given status, code and detail.
    pub fn new(status: StatusCode, code: &str, detail: impl Into<String>) -> Self {
        let title = match status {
            StatusCode::BAD_REQUEST => "Bad request",
            StatusCode::NOT_FOUND => "Not found",
            StatusCode::METHOD_NOT_ALLOWED => "Method not allowed",
            StatusCode::NOT_ACCEPTABLE => "Not acceptable",
            StatusCode::PAYLOAD_TOO_LARGE => "Request body too large",
            StatusCode::UNSUPPORTED_MEDIA_TYPE => "Unsupported media type",
            StatusCode::UNPROCESSABLE_ENTITY => "Unprocessable input",
            StatusCode::SERVICE_UNAVAILABLE => "Service unavailable",
            _ => "Error",
        };
        Self {
            status,
            problem: Box::new(Problem {
                problem_type: format!("/docs#problem-{code}"),
                title: title.to_string(),
                status: status.as_u16(),
                detail: detail.into(),
                code: code.to_string(),
                field: None,
                line: None,
                object: None,
                index: None,
            }),
        }
    }

    /// 400: the request could not be read (bad JSON, bad query string).
    pub fn bad_request(code: &str, detail: impl Into<String>) -> Self {
        Self::new(StatusCode::BAD_REQUEST, code, detail)
    }

    /// 422: the request was read but a value cannot be used.
    pub fn unprocessable(code: &str, detail: impl Into<String>) -> Self {
        Self::new(StatusCode::UNPROCESSABLE_ENTITY, code, detail)
    }

    /// Names the field at fault.
    pub fn with_field(mut self, field: impl Into<String>) -> Self {
        self.problem.field = Some(field.into());
        self
    }

    /// Names the line of an uploaded file at fault.
    pub fn with_line(mut self, line: Option<usize>) -> Self {
        self.problem.line = line;
        self
    }

    /// Names the object and index at fault.
    pub fn with_object(mut self, object: Option<String>, index: Option<usize>) -> Self {
        self.problem.object = object;
        self.problem.index = index;
        self
    }

    /// A time-engine error about `field`, answered 422.
    pub fn from_time(error: &TimeError, field: impl Into<String>) -> Self {
        Self::unprocessable(error.code(), error.to_string()).with_field(field)
    }

    /// The HTTP status.
    pub fn status(&self) -> StatusCode {
        self.status
    }

    /// The problem body.
    pub fn problem(&self) -> &Problem {
        &self.problem
    }
}

impl IntoResponse for ApiError {
    fn into_response(self) -> Response {
        let body = serde_json::to_vec(&*self.problem).unwrap_or_default();
        let mut response = (self.status, body).into_response();
        response
            .headers_mut()
            .insert(header::CONTENT_TYPE, HeaderValue::from_static(PROBLEM_JSON));
        response
    }
}

/// 404 for every path the API does not have.
pub async fn not_found(uri: axum::http::Uri) -> ApiError {
    ApiError::new(
        StatusCode::NOT_FOUND,
        "not_found",
        format!("no resource at {}; see /docs for the API", uri.path()),
    )
}

/// 405 for a known path with a method it does not take.
pub async fn method_not_allowed(method: axum::http::Method, uri: axum::http::Uri) -> ApiError {
    ApiError::new(
        StatusCode::METHOD_NOT_ALLOWED,
        "method_not_allowed",
        format!(
            "{} does not take {method}; see /docs for the methods it takes",
            uri.path()
        ),
    )
}

/// One documented problem answer: `description`, body `Problem` as `application/problem+json`.
pub fn problem_response(description: &str) -> RefOr<utoipa::openapi::Response> {
    ResponseBuilder::new()
        .description(description)
        .content(
            PROBLEM_JSON,
            ContentBuilder::new()
                .schema(Some(Ref::from_schema_name("Problem")))
                .build(),
        )
        .build()
        .into()
}

/// The answers every `POST` with a JSON body can give before its own validation: 400 (the body
/// is not JSON or does not match the schema), 413 (above the body limit), 415 (not sent as
/// JSON). List it in a handler's `responses(...)` beside its own 200 and 422.
pub struct JsonBodyProblems;

impl IntoResponses for JsonBodyProblems {
    fn responses() -> BTreeMap<String, RefOr<utoipa::openapi::Response>> {
        BTreeMap::from([
            (
                "400".to_string(),
                problem_response(
                    "The body is not valid JSON or does not match the schema (`invalid_json`, `invalid_body`, `unreadable_body`; e.g. a missing or unknown field, a wrong type, a number beyond the f64 range such as 1e400); `field` names the JSON path",
                ),
            ),
            (
                "413".to_string(),
                problem_response("The body is above the configured limit (`body_too_large`; see --body-limit-bytes)"),
            ),
            (
                "415".to_string(),
                problem_response(
                    "The body was not sent as JSON (`unsupported_media_type`): send `Content-Type: application/json`",
                ),
            ),
        ])
    }
}

/// The answer of a query string that cannot be read (400 `invalid_query`).
pub struct QueryProblems;

impl IntoResponses for QueryProblems {
    fn responses() -> BTreeMap<String, RefOr<utoipa::openapi::Response>> {
        BTreeMap::from([(
            "400".to_string(),
            problem_response(
                "The query string cannot be read (`invalid_query`): a missing `at`, an unknown parameter, a parameter given twice, a malformed `observer_itrf_m`",
            ),
        )])
    }
}

/// The answer of any operation that does not finish within the configured request timeout
/// (503 `request_timeout`).
pub struct TimeoutProblem;

impl IntoResponses for TimeoutProblem {
    fn responses() -> BTreeMap<String, RefOr<utoipa::openapi::Response>> {
        BTreeMap::from([(
            "503".to_string(),
            problem_response(
                "The request took longer than the configured timeout (`request_timeout`; see --request-timeout-s): split it into smaller requests",
            ),
        )])
    }
}
