//! Choosing the forms of a conversion answer (`forms`) and CSV answers (`Accept: text/csv`),
//! through the real server. Each check names its source.

mod common;

use common::{assert_problem, client, get_json, post_json, TestServer};
use serde_json::json;

const AT: &str = "2026-03-14T06:30:00.123456789012";

async fn csv_answer(server: &TestServer, body: &serde_json::Value) -> (u16, String, String) {
    let response = client()
        .post(server.url("/v1/time/convert"))
        .header("accept", "text/csv")
        .json(body)
        .send()
        .await
        .unwrap_or_else(|e| panic!("request failed: {e}"));
    let status = response.status().as_u16();
    let content_type = common::header_text(&response, "content-type");
    let text = response.text().await.unwrap_or_default();
    (status, content_type, text)
}

fn rows(text: &str) -> Vec<Vec<String>> {
    // RFC 4180: records end with CRLF; no field of these answers is quoted but the warnings.
    assert!(text.ends_with("\r\n"), "{text:?}");
    text.split("\r\n")
        .filter(|line| !line.is_empty())
        .map(|line| line.split(',').map(str::to_string).collect())
        .collect()
}

#[tokio::test]
async fn only_the_forms_asked_for_in_their_order() {
    let server = TestServer::start().await;
    let path = format!("/v1/time/convert?at={AT}&to=TAI,GPST&forms=j2000_s,gnss_week");
    let (status, _, body) = get_json(&server, &path).await;
    assert_eq!(status, 200, "{body}");
    let tai = &body["results"][0];
    // TAI - UTC = 37 s since 2017-01-01 (IERS Bulletin C 52 and later); J2000.0 is
    // 2000-01-01T12:00:00 of the scale, 826 741 800 s before this UTC reading (common practice).
    assert_eq!(tai["j2000_s"], "826741837.123456789012");
    assert!(tai.get("iso").is_none() && tai.get("mjd").is_none() && tai.get("jd").is_none());
    // gnss_week exists for GPST only (IS-GPS-200: GPST = TAI - 19 s).
    assert!(tai.get("gnss_week").is_none());
    assert_eq!(body["results"][1]["gnss_week"], "2409:541818.123456789012");
    // The differences are always there.
    assert_eq!(tai["difference_exact_s"], "37.0");
    // unix_s is POSIX time (IEEE Std 1003.1, 86 400 s per day since 1970), for UTC only.
    let path = format!("/v1/time/convert?at={AT}&to=TAI&forms=unix_s");
    let (_, _, body) = get_json(&server, &path).await;
    assert_eq!(body["input"]["unix_s"], "1773469800.123456789012");
    assert!(body["results"][0].get("unix_s").is_none());
    // Without `forms` the answer carries every form but unix_s, as before.
    let (_, _, body) = get_json(&server, &format!("/v1/time/convert?at={AT}&to=TAI")).await;
    for form in ["iso", "mjd", "jd", "j2000_s"] {
        assert!(body["input"][form].is_string(), "{form}: {body}");
    }
    assert!(body["input"].get("unix_s").is_none());
}

#[tokio::test]
async fn wrong_forms_are_problems_naming_the_field() {
    let server = TestServer::start().await;
    let path = format!("/v1/time/convert?at={AT}&forms=iso,julian");
    let answer = get_json(&server, &path).await;
    let body = assert_problem(&answer, 422, "unknown_format");
    assert_eq!(body["field"], "forms[1]");
    let path = format!("/v1/time/convert?at={AT}&forms=");
    let answer = get_json(&server, &path).await;
    let body = assert_problem(&answer, 422, "unknown_format");
    assert_eq!(body["field"], "forms[0]");
    let request = json!({"from": "UTC", "to": ["TAI"], "epochs": [AT], "forms": []});
    let answer = post_json(&server, "/v1/time/convert", &request).await;
    let body = assert_problem(&answer, 422, "no_form");
    assert_eq!(body["field"], "forms");
    let request = json!({"from": "UTC", "to": ["TAI"], "epochs": [AT], "forms": ["ISO"]});
    let answer = post_json(&server, "/v1/time/convert", &request).await;
    let body = assert_problem(&answer, 422, "unknown_format");
    assert_eq!(body["field"], "forms[0]");
}

#[tokio::test]
async fn csv_batch_has_one_row_per_epoch_and_one_column_per_form_and_target() {
    let server = TestServer::start().await;
    let request = json!({
        "from": "UTC", "to": ["TAI", "GPST"], "forms": ["iso", "gnss_week"],
        "epochs": [AT, "2016-12-31T23:59:60.5"]
    });
    let (status, content_type, text) = csv_answer(&server, &request).await;
    assert_eq!(status, 200, "{text}");
    assert!(content_type.starts_with("text/csv"), "{content_type}");
    let rows = rows(&text);
    assert_eq!(
        rows[0],
        [
            "epoch",
            "TAI_iso",
            "TAI_gnss_week",
            "GPST_iso",
            "GPST_gnss_week",
            "warnings"
        ]
    );
    assert_eq!(rows.len(), 3);
    // TAI - UTC = 37 s in 2026 and 36 s inside the leap second that ended 2016 (IERS
    // Bulletin C 52); TAI has no GNSS week: an empty cell.
    assert_eq!(
        rows[1],
        [
            AT,
            "2026-03-14T06:30:37.123456789012",
            "",
            "2026-03-14T06:30:18.123456789012",
            "2409:541818.123456789012",
            ""
        ]
    );
    assert_eq!(rows[2][0], "2016-12-31T23:59:60.5");
    assert_eq!(rows[2][1], "2017-01-01T00:00:36.500000000000");
    // GPST = TAI - 19 s (IS-GPS-200).
    assert_eq!(rows[2][3], "2017-01-01T00:00:17.500000000000");
}

#[tokio::test]
async fn csv_and_json_carry_the_same_values() {
    // The same request in both media types: every JSON form equals its CSV cell.
    let server = TestServer::start().await;
    let epochs: Vec<String> = (0..50)
        .map(|k| format!("{}.{k:03}", 61000 + 7 * k))
        .collect();
    let request =
        json!({"from": "UTC", "to": ["TDB", "TCG", "GST"], "format": "mjd", "epochs": epochs});
    let (status, _, body) = post_json(&server, "/v1/time/convert", &request).await;
    assert_eq!(status, 200, "{body}");
    let (status, _, text) = csv_answer(&server, &request).await;
    assert_eq!(status, 200, "{text}");
    let rows = rows(&text);
    let header = &rows[0];
    assert_eq!(rows.len(), epochs.len() + 1);
    for (index, row) in rows[1..].iter().enumerate() {
        let conversion = &body["conversions"][index];
        assert_eq!(row[0], epochs[index]);
        for (column, cell) in header.iter().zip(row).skip(1) {
            if column == "warnings" {
                assert_eq!(cell, "");
                continue;
            }
            // TDB is a target: the model of TDB - TT is named in both forms.
            if column == "tdb_model" {
                assert_eq!(conversion["tdb_model"].as_str(), Some(cell.as_str()));
                assert_eq!(cell, "series");
                continue;
            }
            let (scale, form) = column.split_once('_').unwrap_or_default();
            let result = conversion["results"]
                .as_array()
                .and_then(|r| r.iter().find(|r| r["scale"] == scale))
                .unwrap_or_else(|| panic!("no {scale} in {conversion}"));
            assert_eq!(
                result[form].as_str().unwrap_or(""),
                cell,
                "{column} row {index}"
            );
        }
    }
}

#[tokio::test]
async fn csv_single_conversion_and_warnings_are_quoted() {
    let server = TestServer::start().await;
    // Past the expiry of the built-in leap-second table, a warning (with commas) in the last,
    // quoted, cell (RFC 4180 sec. 2 rule 6).
    let response = client()
        .get(server.url("/v1/time/convert?at=2099-06-01T00:00:00&to=TAI&forms=iso"))
        .header("accept", "text/csv;q=0.9, application/json;q=0.5")
        .send()
        .await
        .unwrap_or_else(|e| panic!("request failed: {e}"));
    assert_eq!(response.status().as_u16(), 200);
    let vary = common::header_text(&response, "vary");
    assert!(
        vary.split(',')
            .any(|v| v.trim().eq_ignore_ascii_case("accept")),
        "{vary}"
    );
    let text = response.text().await.unwrap_or_default();
    let mut lines = text.split("\r\n");
    assert_eq!(lines.next(), Some("epoch,TAI_iso,warnings"));
    let row = lines.next().unwrap_or_default();
    assert!(
        row.starts_with("2099-06-01T00:00:00,2099-06-01T00:00:37.000000000000,\"UTC on or after"),
        "{row}"
    );
    assert!(row.ends_with('"'), "{row}");
    // JSON is still the default, and when JSON is preferred.
    let response = client()
        .get(server.url(&format!("/v1/time/convert?at={AT}&to=TAI")))
        .header("accept", "application/json, text/csv;q=0.5")
        .send()
        .await
        .unwrap_or_else(|e| panic!("request failed: {e}"));
    assert!(common::header_text(&response, "content-type").starts_with("application/json"));
}

#[tokio::test]
async fn csv_errors_are_still_problems() {
    let server = TestServer::start().await;
    let request = json!({"from": "UTC", "to": ["TAI"], "epochs": [AT, "2026-02-30"]});
    let (status, content_type, text) = csv_answer(&server, &request).await;
    let body: serde_json::Value = serde_json::from_str(&text).unwrap_or_default();
    let body = assert_problem(&(status, content_type, body), 422, "impossible_date");
    assert_eq!(body["field"], "epochs[1]");
}

#[tokio::test]
async fn the_documented_csv_example_is_what_the_server_writes() {
    // The OpenAPI example of the CSV answer (a client generator shows it to users) is the
    // server's own answer, not a hand-written one.
    let server = TestServer::start().await;
    let (_, _, document) = get_json(&server, "/openapi.json").await;
    let example = &document["paths"]["/v1/time/convert"]["get"]["responses"]["200"]["content"]
        ["text/csv"]["example"];
    let response = client()
        .get(server.url(&format!(
            "/v1/time/convert?at={AT}&to=TAI,TDB&forms=iso,j2000_s"
        )))
        .header("accept", "text/csv")
        .send()
        .await
        .unwrap_or_else(|e| panic!("request failed: {e}"));
    assert_eq!(
        example.as_str(),
        Some(response.text().await.unwrap_or_default().as_str())
    );
}

#[tokio::test]
async fn csv_names_the_tdb_model_like_json() {
    // A conversion to TCB with the ephemeris model: the CSV carries `tdb_model` before
    // `warnings`, as the JSON answer does; without TDB, TCB, TCL or TL there is no such column
    // (the TAI case above).
    let server = TestServer::start().await;
    let response = client()
        .get(server.url(&format!(
            "/v1/time/convert?at={AT}&to=TCB&forms=j2000_s&tdb_model=ephemeris"
        )))
        .header("accept", "text/csv")
        .send()
        .await
        .unwrap_or_else(|e| panic!("request failed: {e}"));
    assert_eq!(response.status().as_u16(), 200);
    let text = response.text().await.unwrap_or_default();
    let mut lines = text.split("\r\n");
    assert_eq!(lines.next(), Some("epoch,TCB_j2000_s,tdb_model,warnings"));
    let row = lines.next().unwrap_or_default();
    assert!(row.ends_with(",ephemeris,"), "{row}");
    let (status, _, json) = get_json(
        &server,
        &format!("/v1/time/convert?at={AT}&to=TCB&forms=j2000_s&tdb_model=ephemeris"),
    )
    .await;
    assert_eq!(status, 200, "{json}");
    assert_eq!(json["tdb_model"], "ephemeris");
    let cell = row.split(',').nth(1).unwrap_or_default();
    assert_eq!(json["results"][0]["j2000_s"].as_str(), Some(cell));
}
