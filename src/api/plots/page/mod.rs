//! The operations page at `/`: one self-contained page (markup `page.html`, style `page.css`,
//! script `page.js`, embedded in the binary and joined here) that shows now in every scale,
//! the state of the leap-second and EOP tables, the proper-time plot and summary of a dropped
//! or pasted ephemeris, and the plots of rates and offsets. It loads nothing from another
//! origin; its content security policy says so to the browser.

use std::sync::OnceLock;

use axum::http::header;
use axum::response::{IntoResponse, Response};
use axum::routing::get;
use axum::Router;

use crate::api::state::AppState;

const PAGE_TEMPLATE: &str = include_str!("page.html");
const PAGE_CSS: &str = include_str!("page.css");
const PAGE_JS: &str = include_str!("page.js");
const CSS_MARKER: &str = "/* page.css */";
const SCRIPT_MARKER: &str = "/* page.js */";

/// Inline style and script only; data and images from this origin, plots from `blob:` URLs.
pub const CONTENT_SECURITY_POLICY: &str = "default-src 'none'; script-src 'unsafe-inline'; \
     style-src 'unsafe-inline'; img-src 'self' blob: data:; connect-src 'self'; \
     base-uri 'none'; form-action 'none'; frame-ancestors 'none'";

/// The page with its style and script in place.
pub fn page_html() -> &'static str {
    static PAGE: OnceLock<String> = OnceLock::new();
    PAGE.get_or_init(|| {
        PAGE_TEMPLATE
            .replacen(CSS_MARKER, PAGE_CSS, 1)
            .replacen(SCRIPT_MARKER, PAGE_JS, 1)
    })
}

async fn page() -> Response {
    (
        [
            (header::CONTENT_TYPE, "text/html; charset=utf-8"),
            (header::CONTENT_SECURITY_POLICY, CONTENT_SECURITY_POLICY),
            (header::CACHE_CONTROL, "no-cache"),
        ],
        page_html(),
    )
        .into_response()
}

/// Routes `/`.
pub fn router() -> Router<AppState> {
    Router::new().route("/", get(page))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn page_is_self_contained() {
        // Common practice for an offline page: no markers left, no URL of another origin.
        let page = page_html();
        assert!(!page.contains(CSS_MARKER) && !page.contains(SCRIPT_MARKER));
        assert!(page.contains("setInterval(tick, 1000)") && page.contains(".scales {"));
        for external in ["http://", "https://", "//cdn", "@import"] {
            assert!(!page.contains(external), "page refers to {external}");
        }
    }
}
