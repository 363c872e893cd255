//! The plots over HTTP: the proper-time plot (`Accept: image/svg+xml`) equal to the CSV answer
//! of the same request, the rate-profile and scale-offset plots with their CSV twins, content
//! negotiation with `Vary: accept`, the operations page, and the bad inputs.

mod common;

use common::svg_read::{read_csv, read_svg, self_contained};
use common::{assert_problem, client, header_text, split, TestServer};

const OEM: &str = include_str!("../demo-data/lyra_kestrel.oem");

async fn post_oem(server: &TestServer, accept: &str) -> reqwest::Response {
    client()
        .post(server.url("/v1/clock/proper-time"))
        .header("content-type", "application/ccsds-oem")
        .header("accept", accept)
        .body(OEM)
        .send()
        .await
        .expect("request")
}

async fn get_accepting(server: &TestServer, path: &str, accept: &str) -> reqwest::Response {
    client()
        .get(server.url(path))
        .header("accept", accept)
        .send()
        .await
        .expect("request")
}

#[tokio::test]
async fn proper_time_plot_draws_the_csv_numbers() {
    let server = TestServer::start().await;
    let drawn = post_oem(&server, "image/svg+xml").await;
    assert_eq!(drawn.status(), 200);
    assert_eq!(header_text(&drawn, "content-type"), "image/svg+xml");
    assert!(header_text(&drawn, "vary")
        .split(", ")
        .any(|v| v == "accept"));
    let svg = drawn.text().await.expect("body");
    self_contained(&svg).unwrap_or_else(|e| panic!("{e}"));
    let panels = read_svg(&svg).unwrap_or_else(|e| panic!("{e}"));
    let csv = post_oem(&server, "text/csv")
        .await
        .text()
        .await
        .expect("csv");
    let (header, rows) = read_csv(&csv);
    let column = |name: &str| header.iter().position(|h| h == name).unwrap_or(usize::MAX);
    let ids: Vec<String> = {
        let mut ids: Vec<String> = rows.iter().map(|r| r[0].clone()).collect();
        ids.dedup();
        ids
    };
    // The demo file (demo-data/README) holds seven invented objects: three panels each with
    // the default model j2_sun_moon (the tidal part on the third).
    assert_eq!(ids.len(), 7);
    assert_eq!(panels.len(), 3 * ids.len());
    for (object, pair) in ids.iter().zip(panels.chunks(3)) {
        assert!(
            svg.contains(&format!("{object}: tau - t against TT")),
            "{object}"
        );
        let object_rows: Vec<&Vec<String>> = rows.iter().filter(|r| &r[0] == object).collect();
        for (panel, columns) in pair.iter().zip([
            &["tau_minus_t_s", "velocity_part_s", "gravity_part_s"][..],
            &["periodic_s"][..],
            &["tidal_part_s"][..],
        ]) {
            let (x_tol, y_tol) = panel.resolution();
            for name in columns {
                let points = panel
                    .line(name)
                    .unwrap_or_else(|| panic!("{object}: {name} not drawn"));
                // Up to 2 000 samples every sample is drawn (the demo has fewer).
                assert_eq!(points.len(), object_rows.len(), "{object} {name}");
                for ((x, y), row) in points.iter().zip(&object_rows) {
                    let csv_x: f64 = row[column("elapsed_s")].parse().expect("elapsed_s");
                    let csv_y: f64 = row[column(name)].parse().expect("value");
                    assert!(
                        (x - csv_x).abs() <= x_tol && (y - csv_y).abs() <= y_tol,
                        "{object} {name}: ({x}, {y}) vs ({csv_x}, {csv_y})"
                    );
                    assert!(
                        panel.y_min / panel.y_factor <= csv_y
                            && csv_y <= panel.y_max / panel.y_factor
                    );
                }
            }
        }
    }
    // JSON stays the default; `include_series=false` still draws the series in a plot.
    let json = post_oem(&server, "*/*").await;
    assert_eq!(header_text(&json, "content-type"), "application/json");
    let summaries_only = client()
        .post(server.url("/v1/clock/proper-time?include_series=false"))
        .header("content-type", "application/ccsds-oem")
        .header("accept", "image/svg+xml")
        .body(OEM)
        .send()
        .await
        .expect("request");
    let svg = summaries_only.text().await.expect("svg");
    assert_eq!(read_svg(&svg).map(|p| p.len()).unwrap_or(0), 21);
    // Without the tides (a model asked for), two panels per object.
    let without_tides = client()
        .post(server.url("/v1/clock/proper-time?gravity_model=j2"))
        .header("content-type", "application/ccsds-oem")
        .header("accept", "image/svg+xml")
        .body(OEM)
        .send()
        .await
        .expect("request");
    let svg = without_tides.text().await.expect("svg");
    assert_eq!(read_svg(&svg).map(|p| p.len()).unwrap_or(0), 14);
    assert!(!svg.contains("tidal part"));
}

#[tokio::test]
async fn plot_endpoints_negotiate_svg_and_csv() {
    let server = TestServer::start().await;
    for path in ["/v1/plots/rate-profile", "/v1/plots/scale-offsets"] {
        let svg = get_accepting(&server, path, "*/*").await;
        assert_eq!(svg.status(), 200, "{path}");
        assert_eq!(header_text(&svg, "content-type"), "image/svg+xml");
        assert!(header_text(&svg, "vary").split(", ").any(|v| v == "accept"));
        self_contained(&svg.text().await.expect("svg")).unwrap_or_else(|e| panic!("{path}: {e}"));
        let csv = get_accepting(&server, path, "text/csv").await;
        assert_eq!(header_text(&csv, "content-type"), "text/csv; charset=utf-8");
        assert!(
            csv.text().await.expect("csv").lines().count() > 300,
            "{path}"
        );
    }
    // IS-GPS-200 3.3.1.1: 4.4647e-10 at a = 26 561.75 km (a_E = 6 378 136.6 m, IERS (2010)).
    let altitude_km = (26_561_750.0 - 6_378_136.6) / 1e3;
    let path = format!(
        "/v1/plots/rate-profile?points=2&min_altitude_km={altitude_km}&max_altitude_km=40000"
    );
    let text = get_accepting(&server, &path, "text/csv")
        .await
        .text()
        .await
        .expect("csv");
    let (header, rows) = read_csv(&text);
    assert_eq!(
        header,
        ["altitude_km", "total", "velocity_part", "gravity_part"]
    );
    let total: f64 = rows[0][1].parse().expect("total");
    assert!((total - 4.4647e-10).abs() < 1e-14, "{total}");
}

#[tokio::test]
async fn scale_offsets_say_that_tl_is_a_proposal() {
    let server = TestServer::start().await;
    let path = "/v1/plots/scale-offsets?from=2020-01-01&to=2021-01-01&points=3";
    let svg = get_accepting(&server, path, "image/svg+xml").await;
    let svg = svg.text().await.expect("svg");
    assert!(svg.contains("TL is a proposal, not a standard"));
    let csv = get_accepting(&server, path, "text/csv").await;
    let (header, rows) = read_csv(&csv.text().await.expect("csv"));
    let column = |name: &str| {
        header
            .iter()
            .position(|h| h == name)
            .unwrap_or_else(|| panic!("no column {name}"))
    };
    assert_eq!(rows.len(), 3);
    for row in &rows {
        assert!(row[column("warnings")].contains("TL (lunar surface time) is a proposal"));
        // TCL and TT read alike at 1977-01-01T00:00:32.184 TT (MJD 43144, the origin TCG and
        // TCB share), and TCL gains 6.79835524e-10 on TDB (Lu, Yang & Xie 2025), TDB keeping
        // TT's mean rate: about 0.92 s by 2020, within the annual term (1.65 ms) and TDB0.
        let utc_mjd: f64 = row[column("utc_mjd")].parse().expect("mjd");
        let expected = (utc_mjd - 43_144.0) * 86_400.0 * 6.79835524e-10;
        let tcl: f64 = row[column("tcl_minus_tt_s")].parse().expect("tcl");
        let tl: f64 = row[column("tl_minus_tt_s")].parse().expect("tl");
        assert!((tcl - expected).abs() < 2e-3, "{tcl} vs {expected}");
        assert!(tl < tcl, "{tcl} {tl}");
    }
}

#[tokio::test]
async fn plot_queries_name_the_bad_field() {
    let server = TestServer::start().await;
    let cases = [
        (
            "/v1/plots/rate-profile?points=1",
            422,
            "bad_option",
            "points",
        ),
        (
            "/v1/plots/rate-profile?min_altitude_km=-5",
            422,
            "bad_option",
            "min_altitude_km",
        ),
        (
            "/v1/plots/rate-profile?min_altitude_km=900&max_altitude_km=800",
            422,
            "bad_option",
            "max_altitude_km",
        ),
        (
            "/v1/plots/rate-profile?max_altitude_km=NaN",
            422,
            "bad_option",
            "max_altitude_km",
        ),
        (
            "/v1/plots/rate-profile?reference=TCB",
            422,
            "unknown_reference",
            "reference",
        ),
        (
            "/v1/plots/scale-offsets?from=2017-02-30",
            422,
            "impossible_date",
            "from",
        ),
        (
            "/v1/plots/scale-offsets?from=1950-01-01",
            422,
            "utc_before_1960",
            "from",
        ),
        (
            "/v1/plots/scale-offsets?to=2016-12-31T23:59:61",
            422,
            "impossible_date",
            "to",
        ),
        (
            "/v1/plots/scale-offsets?from=2020-01-01&to=2019-01-01",
            422,
            "bad_option",
            "to",
        ),
        (
            "/v1/plots/scale-offsets?points=6000",
            422,
            "bad_option",
            "points",
        ),
    ];
    for (path, status, code, field) in cases {
        let response = get_accepting(&server, path, "image/svg+xml").await;
        let answer = split(response).await;
        let body = assert_problem(&answer, status, code);
        assert_eq!(body["field"], field, "{path}: {body}");
    }
    for path in [
        "/v1/plots/rate-profile?points=two",
        "/v1/plots/scale-offsets?colour=red",
    ] {
        let (got, _, body) = split(get_accepting(&server, path, "*/*").await).await;
        assert_eq!(got, 400, "{path}: {body}");
    }
}

#[tokio::test]
async fn operations_page_is_served_with_its_policy() {
    let server = TestServer::start().await;
    let page = get_accepting(&server, "/", "text/html").await;
    assert_eq!(page.status(), 200);
    assert!(header_text(&page, "content-type").starts_with("text/html"));
    assert!(header_text(&page, "content-security-policy").contains("default-src 'none'"));
    let html = page.text().await.expect("html");
    for id in [
        "id=\"scales\"",
        "id=\"leap-card\"",
        "id=\"eop-card\"",
        "id=\"drop-zone\"",
        "/v1/plots/rate-profile",
        "href=\"/docs\"",
        "href=\"/openapi.json\"",
    ] {
        assert!(html.contains(id), "{id}");
    }
}
