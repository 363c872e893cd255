//! `/openapi.json` and `/docs`: the API description and a documentation page that needs no
//! network (its script and style are embedded in the binary).

use std::sync::OnceLock;

use axum::http::header;
use axum::response::{Html, IntoResponse, Response};
use axum::routing::get;
use axum::Router;

use super::openapi::document_json;
use super::state::AppState;

const PAGE_HTML: &str = include_str!("page.html");

fn cached_document() -> &'static str {
    static DOCUMENT: OnceLock<String> = OnceLock::new();
    DOCUMENT.get_or_init(document_json)
}

async fn openapi_json() -> Response {
    (
        [(header::CONTENT_TYPE, "application/json")],
        cached_document(),
    )
        .into_response()
}

async fn docs_page() -> Html<&'static str> {
    Html(PAGE_HTML)
}

/// Routes `/openapi.json` and `/docs`.
pub fn router() -> Router<AppState> {
    Router::new()
        .route("/openapi.json", get(openapi_json))
        .route("/docs", get(docs_page))
}
