//! Extractors that answer their rejections as problem+json.

use axum::extract::rejection::{JsonRejection, QueryRejection};
use axum::extract::{FromRequest, FromRequestParts, Request};
use axum::http::request::Parts;
use axum::http::StatusCode;
use serde::de::DeserializeOwned;

use super::error::ApiError;

/// A JSON body; a body that cannot be read is a 400 (or 413, 415) problem.
pub struct JsonBody<T>(pub T);

impl<S, T> FromRequest<S> for JsonBody<T>
where
    T: DeserializeOwned,
    S: Send + Sync,
{
    type Rejection = ApiError;

    async fn from_request(request: Request, state: &S) -> Result<Self, Self::Rejection> {
        match axum::Json::<T>::from_request(request, state).await {
            Ok(axum::Json(value)) => Ok(Self(value)),
            Err(rejection) => Err(json_rejection(rejection)),
        }
    }
}

fn json_rejection(rejection: JsonRejection) -> ApiError {
    let status = rejection.status();
    let detail = rejection.body_text();
    match status {
        StatusCode::PAYLOAD_TOO_LARGE => body_too_large(),
        StatusCode::UNSUPPORTED_MEDIA_TYPE => ApiError::new(
            status,
            "unsupported_media_type",
            "expected a JSON body with Content-Type: application/json",
        ),
        StatusCode::UNPROCESSABLE_ENTITY => ApiError::bad_request(
            "invalid_body",
            format!("the JSON body does not match the schema: {detail}"),
        ),
        _ => ApiError::bad_request(
            "invalid_json",
            format!("the body is not valid JSON: {detail}"),
        ),
    }
}

/// The problem answered when a body is above the configured limit.
pub fn body_too_large() -> ApiError {
    ApiError::new(
        StatusCode::PAYLOAD_TOO_LARGE,
        "body_too_large",
        "the request body is larger than the configured limit (see --body-limit-bytes)",
    )
}

/// Query parameters; a query string that cannot be read is a 400 problem.
pub struct QueryParams<T>(pub T);

impl<S, T> FromRequestParts<S> for QueryParams<T>
where
    T: DeserializeOwned,
    S: Send + Sync,
{
    type Rejection = ApiError;

    async fn from_request_parts(parts: &mut Parts, state: &S) -> Result<Self, Self::Rejection> {
        match axum::extract::Query::<T>::from_request_parts(parts, state).await {
            Ok(axum::extract::Query(value)) => Ok(Self(value)),
            Err(rejection) => Err(query_rejection(rejection)),
        }
    }
}

fn query_rejection(rejection: QueryRejection) -> ApiError {
    ApiError::bad_request(
        "invalid_query",
        format!("the query string cannot be read: {}", rejection.body_text()),
    )
}
