//! The documentation page at `/docs` and its problem-code table, through the real server.

mod common;

use std::collections::HashSet;

/// Every `src="..."`, `href="..."` and `url(...)` target in `html` (quotes optional for url()).
fn references(html: &str) -> Vec<String> {
    let mut found = Vec::new();
    for opener in ["src=\"", "src='", "href=\"", "href='", "url(", "@import"] {
        let mut rest = html;
        while let Some(start) = rest.find(opener) {
            let after = &rest[start + opener.len()..];
            let end = after
                .find(['"', '\'', ')', ' ', '>', ';'])
                .unwrap_or(after.len());
            let target = after[..end].trim_start_matches(['"', '\'', ' ']);
            let target = if target.is_empty() {
                // `url("...")`: skip the quote and read to the closing one.
                let quoted = after.trim_start_matches(['"', '\'', ' ']);
                let close = quoted.find(['"', '\'', ')']).unwrap_or(quoted.len());
                &quoted[..close]
            } else {
                target
            };
            found.push(target.to_string());
            rest = &after[end.min(after.len())..];
        }
    }
    found
}

#[test]
fn reference_finder_sees_each_form() {
    // Common practice: the three ways an HTML page pulls a resource (attributes and CSS url()).
    let sample = "<img src=\"https://a.example/x.png\"><link href='/y.css'> \
                  <style>b{background:url(//c.example/z)} i{background:url(\"data:,\")}</style>";
    let found = references(sample);
    assert!(
        found.contains(&"https://a.example/x.png".to_string()),
        "{found:?}"
    );
    assert!(found.contains(&"/y.css".to_string()), "{found:?}");
    assert!(found.contains(&"//c.example/z".to_string()), "{found:?}");
    assert!(found.contains(&"data:,".to_string()), "{found:?}");
}

#[tokio::test]
async fn page_is_html_and_loads_nothing_from_another_host() {
    let server = common::TestServer::start().await;
    let response = common::client()
        .get(server.url("/docs"))
        .send()
        .await
        .expect("request");
    assert_eq!(response.status().as_u16(), 200);
    let content_type = response
        .headers()
        .get("content-type")
        .and_then(|v| v.to_str().ok())
        .unwrap_or("")
        .to_string();
    // RFC 2854 / HTML Living Standard: an HTML page is served as text/html.
    assert!(
        content_type.starts_with("text/html"),
        "content type {content_type}"
    );
    let policy = response
        .headers()
        .get("content-security-policy")
        .and_then(|v| v.to_str().ok())
        .unwrap_or("")
        .to_string();
    // W3C CSP Level 3: connect-src 'self' and default-src 'none' keep the page on its own origin.
    assert!(
        policy.contains("default-src 'none'") && policy.contains("connect-src 'self'"),
        "{policy}"
    );
    let html = response.text().await.unwrap_or_default();

    // Common practice for an offline page: every src/href/url() is same-origin or data:.
    let targets = references(&html);
    assert!(
        targets.iter().any(|t| t == "/openapi.json"),
        "links the document: {targets:?}"
    );
    for target in &targets {
        let lower = target.to_ascii_lowercase();
        assert!(
            !(lower.starts_with("http:") || lower.starts_with("https:") || lower.starts_with("//")),
            "the docs page references another host: {target}"
        );
    }
    let lower = html.to_ascii_lowercase();
    assert!(
        !lower.contains("http://") && !lower.contains("https://"),
        "absolute URL in the page"
    );
    // Common practice: style and script are inline, so nothing else is fetched to render.
    assert!(lower.contains("<style>") && lower.contains("<script>"));
    assert!(!lower.contains("<script src") && !lower.contains("<link rel=\"stylesheet\""));
    // The page reads the same-origin description and names the cautions.
    assert!(html.contains("fetch('/openapi.json'"));
    assert!(html.contains("not certified for safety-of-life use"));
}

#[tokio::test]
async fn problem_codes_are_listed_once_each_with_their_anchor() {
    let server = common::TestServer::start().await;
    let (status, content_type, body) = common::get_json(&server, "/docs/problem-codes.json").await;
    assert_eq!(status, 200);
    assert!(content_type.starts_with("application/json"));
    let entries = body["problem_codes"]
        .as_array()
        .cloned()
        .unwrap_or_default();
    assert!(!entries.is_empty(), "{body}");
    let mut codes = HashSet::new();
    for entry in &entries {
        let code = entry["code"].as_str().unwrap_or("");
        // Common practice: a stable code is a unique, non-empty identifier with an explanation.
        assert!(!code.is_empty(), "{entry}");
        assert!(codes.insert(code.to_string()), "code {code} listed twice");
        assert!(
            entry["meaning"].as_str().is_some_and(|m| !m.is_empty()),
            "{entry}"
        );
        // RFC 9457 section 3.1.1: `type` is a URI reference; here it points at the entry.
        assert_eq!(entry["type"], format!("/docs#problem-{code}"));
    }
    for required in ["not_found", "method_not_allowed", "impossible_date"] {
        assert!(
            codes.contains(required),
            "{required} missing from {codes:?}"
        );
    }

    let html = common::client()
        .get(server.url("/docs"))
        .send()
        .await
        .expect("request")
        .text()
        .await
        .unwrap_or_default();
    for code in &codes {
        assert_eq!(
            html.matches(&format!("id=\"problem-{code}\"")).count(),
            1,
            "one anchor for {code} on the page"
        );
    }
}

#[tokio::test]
async fn problems_the_server_answers_resolve_to_listed_codes() {
    let server = common::TestServer::start().await;
    let (_, _, listed) = common::get_json(&server, "/docs/problem-codes.json").await;
    let codes: HashSet<String> = listed["problem_codes"]
        .as_array()
        .map(|entries| {
            entries
                .iter()
                .filter_map(|e| e["code"].as_str().map(str::to_string))
                .collect()
        })
        .unwrap_or_default();
    let client = common::client();
    // A path the API does not have (404), a method a path does not take (405) and a date that
    // does not exist (proleptic Gregorian calendar, ISO 8601: February 2026 has 28 days).
    let not_found = common::split(
        client
            .get(server.url("/v1/no-such-resource"))
            .send()
            .await
            .expect("request"),
    )
    .await;
    let wrong_method = common::split(
        client
            .delete(server.url("/v1/time/scales"))
            .send()
            .await
            .expect("request"),
    )
    .await;
    let bad_date = common::get_json(
        &server,
        "/v1/time/convert?at=2026-02-30T00:00:00&from=UTC&to=TAI",
    )
    .await;
    for (answer, status, code) in [
        (&not_found, 404, "not_found"),
        (&wrong_method, 405, "method_not_allowed"),
        (&bad_date, 422, "impossible_date"),
    ] {
        let problem = common::assert_problem(answer, status, code);
        assert!(codes.contains(code), "{code} is answered but not listed");
        // RFC 9457 section 3.1.1: the problem's `type` resolves to the entry on /docs.
        assert_eq!(problem["type"], format!("/docs#problem-{code}"));
    }
}
