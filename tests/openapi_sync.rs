//! The committed `openapi/openapi.json` is the document the code generates, and the server
//! serves the same document. Regenerate with `cargo run -- openapi > openapi/openapi.json`.

mod common;

#[test]
fn committed_document_matches_the_code() {
    let generated = eigenzeit::ops::openapi::document_json();
    let committed =
        std::fs::read_to_string(concat!(env!("CARGO_MANIFEST_DIR"), "/openapi/openapi.json"))
            .unwrap_or_default();
    assert!(
        committed.trim_end() == generated.trim_end(),
        "openapi/openapi.json is out of date: run `cargo run -- openapi > openapi/openapi.json`"
    );
    let document: serde_json::Value = serde_json::from_str(&generated).unwrap_or_default();
    assert_eq!(document["openapi"], "3.1.0");
}

#[tokio::test]
async fn served_document_and_docs_page() {
    let server = common::TestServer::start().await;
    let (status, content_type, served) = common::get_json(&server, "/openapi.json").await;
    assert_eq!(status, 200);
    assert!(content_type.starts_with("application/json"));
    let generated: serde_json::Value =
        serde_json::from_str(&eigenzeit::ops::openapi::document_json()).unwrap_or_default();
    assert_eq!(served, generated);
    let page = common::client()
        .get(server.url("/docs"))
        .send()
        .await
        .expect("request");
    assert_eq!(page.status().as_u16(), 200);
    let html = page.text().await.unwrap_or_default();
    // The page must work offline: no script, style or font from another host.
    for needle in [
        "src=\"http",
        "href=\"http",
        "src='http",
        "href='http",
        "@import url(http",
        "cdn",
    ] {
        assert!(
            !html.to_lowercase().contains(needle),
            "the docs page loads {needle} from the network"
        );
    }
}
