//! Extractors that answer their rejections as problem+json.

use axum::extract::rejection::QueryRejection;
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
        let is_json = request
            .headers()
            .get(axum::http::header::CONTENT_TYPE)
            .and_then(|value| value.to_str().ok())
            .and_then(|value| value.split(';').next())
            .is_some_and(|media| {
                let media = media.trim().to_ascii_lowercase();
                media == "application/json" || media.ends_with("+json")
            });
        if !is_json {
            return Err(ApiError::new(
                StatusCode::UNSUPPORTED_MEDIA_TYPE,
                "unsupported_media_type",
                "expected a JSON body with Content-Type: application/json",
            ));
        }
        let bytes = axum::body::Bytes::from_request(request, state)
            .await
            .map_err(|rejection| match rejection.status() {
                StatusCode::PAYLOAD_TOO_LARGE => body_too_large(),
                _ => ApiError::bad_request(
                    "unreadable_body",
                    format!("the request body cannot be read: {}", rejection.body_text()),
                ),
            })?;
        parse_json(&bytes).map(Self)
    }
}

/// Reads JSON into `T`; a failure is a 400 problem naming the JSON path at fault.
///
/// A body that reads is parsed once, by serde_json alone; only a failing body is read again
/// with `serde_path_to_error` to name the path (tracking the path of every element costs more
/// than the parse itself: half the time of a 100 000-epoch batch).
pub fn parse_json<T: DeserializeOwned>(bytes: &[u8]) -> Result<T, ApiError> {
    match serde_json::from_slice(bytes) {
        Ok(value) => Ok(value),
        Err(_) => Err(json_problem::<T>(bytes)),
    }
}

/// The problem for a body that does not read as `T`, with the JSON path at fault.
fn json_problem<T: DeserializeOwned>(bytes: &[u8]) -> ApiError {
    let mut deserializer = serde_json::Deserializer::from_slice(bytes);
    let parsed: Result<T, _> = serde_path_to_error::deserialize(&mut deserializer);
    let error = match parsed {
        Err(error) => error,
        Ok(_) => {
            return match deserializer.end() {
                Err(error) => ApiError::bad_request(
                    "invalid_json",
                    format!("the body is not valid JSON: {error}"),
                ),
                Ok(()) => ApiError::bad_request("invalid_json", "the body is not valid JSON"),
            }
        }
    };
    let path = error.path().to_string();
    let inner = error.into_inner();
    let (code, what) = if inner.is_data() {
        ("invalid_body", "the JSON body does not match the schema")
    } else {
        ("invalid_json", "the body is not valid JSON")
    };
    let problem = ApiError::bad_request(code, format!("{what}: {inner}"));
    if path == "." || path.is_empty() {
        problem
    } else {
        problem.with_field(path)
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

/// Checks the size of a batch: 422 `empty_batch` when empty, 422 `batch_too_large` (naming the
/// configured limit) above `limit`. `field` is the list's JSON path, `noun` what it holds.
pub fn check_batch_size(
    count: usize,
    limit: usize,
    field: &str,
    noun: &str,
) -> Result<(), ApiError> {
    if count == 0 {
        return Err(ApiError::unprocessable(
            "empty_batch",
            format!("expected at least one {noun}"),
        )
        .with_field(field));
    }
    if count > limit {
        return Err(ApiError::unprocessable(
            "batch_too_large",
            format!(
                "{count} {noun}s in one request; the configured limit is {limit} (see --batch-limit)"
            ),
        )
        .with_field(field));
    }
    Ok(())
}

/// Reads an optional whole number of a JSON body given as an integer or as a number with no
/// fractional part (`13.0` is an integer in JSON Schema); anything else (a fraction, a negative
/// number, a string) is an error of the body (400).
pub fn whole_number<'de, D>(deserializer: D) -> Result<Option<usize>, D::Error>
where
    D: serde::Deserializer<'de>,
{
    struct Whole;

    impl serde::de::Visitor<'_> for Whole {
        type Value = Option<usize>;

        fn expecting(&self, formatter: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
            formatter.write_str("a whole number from 0")
        }

        fn visit_unit<E: serde::de::Error>(self) -> Result<Self::Value, E> {
            Ok(None)
        }

        fn visit_u64<E: serde::de::Error>(self, value: u64) -> Result<Self::Value, E> {
            usize::try_from(value)
                .map(Some)
                .map_err(|_| E::custom(format!("{value} is too large")))
        }

        fn visit_i64<E: serde::de::Error>(self, value: i64) -> Result<Self::Value, E> {
            u64::try_from(value)
                .map_err(|_| E::custom(format!("{value} is below 0")))
                .and_then(|value| self.visit_u64(value))
        }

        fn visit_f64<E: serde::de::Error>(self, value: f64) -> Result<Self::Value, E> {
            // Whole numbers up to 2^53 are exact in binary64; above, the text was not exact.
            if value.fract() == 0.0 && (0.0..=9_007_199_254_740_992.0).contains(&value) {
                Ok(Some(value as usize))
            } else {
                Err(E::custom(format!(
                    "{} is not a whole number from 0",
                    crate::physics::readable::readable(value)
                )))
            }
        }
    }

    deserializer.deserialize_any(Whole)
}

/// Batches up to this many items are computed on the request's own task; larger ones move to
/// the blocking pool so that they do not hold up the async workers.
pub const INLINE_BATCH_ITEMS: usize = 64;

/// Runs CPU-bound request work: inline for small batches (a thread hand-off would cost more
/// than the work), on the blocking pool for large ones.
pub async fn compute<T, F>(items: usize, work: F) -> Result<T, ApiError>
where
    T: Send + 'static,
    F: FnOnce() -> Result<T, ApiError> + Send + 'static,
{
    if items <= INLINE_BATCH_ITEMS {
        return work();
    }
    tokio::task::spawn_blocking(work)
        .await
        .map_err(|e| ApiError::new(StatusCode::INTERNAL_SERVER_ERROR, "internal", e.to_string()))?
}
