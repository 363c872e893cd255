//! `/openapi.json` and `/docs`: the API description and a documentation page that needs no
//! network: its markup (`page.html`), style (`page.css`) and scripts (`schema.js`, `try.js`,
//! `page.js`) are embedded in the binary and joined into one self-contained page.
//!
//! The page's "Problem codes" section is filled in here, once, from
//! [`crate::api::problem_codes::PROBLEM_CODES`], so its `#problem-<code>` anchors exist even
//! before (or without) the page's script; `/docs/problem-codes.json` serves the same table.

use std::sync::OnceLock;

use axum::extract::State;
use axum::http::header;
use axum::response::{IntoResponse, Response};
use axum::routing::get;
use axum::Router;
use serde::Serialize;

use super::problem_codes::PROBLEM_CODES;
use super::state::AppState;

const PAGE_TEMPLATE: &str = include_str!("page.html");
const PAGE_CSS: &str = include_str!("page.css");
/// The page's scripts, in the order they run (each uses the ones before it).
const PAGE_SCRIPTS: [&str; 3] = [
    include_str!("schema.js"),
    include_str!("try.js"),
    include_str!("page.js"),
];

/// Where the page template takes its style sheet and its script.
const CSS_MARKER: &str = "/* page.css */";
const SCRIPT_MARKER: &str = "/* page.js */";

/// Where the page template takes the problem-code entries.
const PROBLEM_CODES_MARKER: &str = "<!-- problem-codes -->";

/// What the page may load: nothing from another origin (inline style and script only, data
/// from this origin), so a browser enforces the no-network promise.
const CONTENT_SECURITY_POLICY: &str = "default-src 'none'; script-src 'unsafe-inline'; \
     style-src 'unsafe-inline'; img-src data:; connect-src 'self'; base-uri 'none'; \
     form-action 'none'; frame-ancestors 'none'";

/// `text` escaped for HTML text and attribute values.
fn escape_html(text: &str) -> String {
    let mut out = String::with_capacity(text.len());
    for c in text.chars() {
        match c {
            '&' => out.push_str("&amp;"),
            '<' => out.push_str("&lt;"),
            '>' => out.push_str("&gt;"),
            '"' => out.push_str("&quot;"),
            '\'' => out.push_str("&#39;"),
            _ => out.push(c),
        }
    }
    out
}

/// `text` escaped for HTML, with `backtick spans` as `<code>`.
fn inline_code_html(text: &str) -> String {
    text.split('`')
        .enumerate()
        .map(|(index, part)| {
            if index % 2 == 1 {
                format!("<code>{}</code>", escape_html(part))
            } else {
                escape_html(part)
            }
        })
        .collect()
}

/// One `<div>` per problem code, with the anchor `problem-<code>`.
fn problem_codes_html() -> String {
    PROBLEM_CODES
        .iter()
        .map(|(code, meaning)| {
            let code = escape_html(code);
            format!(
                "<div class=\"problem\" id=\"problem-{code}\" tabindex=\"-1\"><dt><code>{code}</code> \
                 <a class=\"anchor\" href=\"#problem-{code}\" aria-label=\"Link to {code}\">#</a></dt>\
                 <dd>{}</dd></div>\n",
                inline_code_html(meaning)
            )
        })
        .collect()
}

fn page_html() -> &'static str {
    static PAGE: OnceLock<String> = OnceLock::new();
    PAGE.get_or_init(|| {
        PAGE_TEMPLATE
            .replacen(CSS_MARKER, PAGE_CSS, 1)
            .replacen(SCRIPT_MARKER, &PAGE_SCRIPTS.join("\n"), 1)
            .replacen(PROBLEM_CODES_MARKER, &problem_codes_html(), 1)
    })
}

async fn openapi_json(State(state): State<AppState>) -> Response {
    (
        [(header::CONTENT_TYPE, "application/json")],
        state.openapi_json().to_string(),
    )
        .into_response()
}

async fn docs_page() -> Response {
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

/// One row of `/docs/problem-codes.json`.
#[derive(Serialize)]
struct ProblemCodeEntry {
    code: &'static str,
    meaning: &'static str,
    /// The `type` URI reference of problems with this code.
    #[serde(rename = "type")]
    problem_type: String,
}

async fn problem_codes_json() -> Response {
    let entries: Vec<ProblemCodeEntry> = PROBLEM_CODES
        .iter()
        .map(|(code, meaning)| ProblemCodeEntry {
            code,
            meaning,
            problem_type: format!("/docs#problem-{code}"),
        })
        .collect();
    let body = serde_json::to_string(&serde_json::json!({ "problem_codes": entries }))
        .unwrap_or_else(|_| "{\"problem_codes\": []}".to_string());
    ([(header::CONTENT_TYPE, "application/json")], body).into_response()
}

/// Routes `/openapi.json`, `/docs` and `/docs/problem-codes.json`.
pub fn router() -> Router<AppState> {
    Router::new()
        .route("/openapi.json", get(openapi_json))
        .route("/docs", get(docs_page))
        .route("/docs/problem-codes.json", get(problem_codes_json))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn page_lists_every_problem_code_with_its_anchor() {
        // RFC 9457 section 3.1.1: `type` resolves to documentation; each code needs its anchor.
        let page = page_html();
        for marker in [PROBLEM_CODES_MARKER, CSS_MARKER, SCRIPT_MARKER] {
            assert!(!page.contains(marker), "marker {marker} left in the page");
        }
        assert!(page.contains("const EzTry") && page.contains(".operation {"));
        for (code, _) in PROBLEM_CODES {
            assert!(
                page.contains(&format!("id=\"problem-{code}\"")),
                "no anchor for {code}"
            );
        }
    }

    #[test]
    fn escaping_keeps_markup_out() {
        // Common practice (HTML escaping of text and attribute values).
        assert_eq!(
            inline_code_html("a <b> & `x<y>` \"q\""),
            "a &lt;b&gt; &amp; <code>x&lt;y&gt;</code> &quot;q&quot;"
        );
    }
}
