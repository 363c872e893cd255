//! The whole OpenAPI document: the API's ([`crate::api::openapi::ApiDoc`]) and the service's
//! own operations (health, readiness, metrics), merged.

use std::sync::OnceLock;

use utoipa::OpenApi;

use crate::api::openapi::ApiDoc;

/// The service's own operations.
#[derive(OpenApi)]
#[openapi(
    paths(super::health::healthz, super::health::readyz, super::health::metrics),
    tags((name = "operations", description = "Liveness, readiness, metrics"))
)]
struct OpsDoc;

/// The whole document: the API's paths, schemas and tags, then the service's.
pub fn document() -> utoipa::openapi::OpenApi {
    let mut document = ApiDoc::openapi();
    document.merge(OpsDoc::openapi());
    document
}

/// The document as pretty-printed JSON (what `/openapi.json` serves and `eigenzeit openapi`
/// prints), made once.
pub fn document_json() -> String {
    static DOCUMENT: OnceLock<String> = OnceLock::new();
    DOCUMENT
        .get_or_init(|| {
            document()
                .to_pretty_json()
                .unwrap_or_else(|e| format!("{{\"error\": \"{e}\"}}"))
        })
        .clone()
}
