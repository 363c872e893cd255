//! `POST /v1/clock/corrections` through the real server: the generated SP3 + RINEX clock pair
//! (tools/make_clock_pair.py, invented satellites), CSV, partial data and bad input.

mod common;

use common::{assert_problem, client, post_json, TestServer};
use serde_json::{json, Value};

fn file(name: &str) -> String {
    std::fs::read_to_string(format!(
        "{}/tests/reference/clock_pair/{name}",
        env!("CARGO_MANIFEST_DIR")
    ))
    .unwrap()
}

fn truth_rate(id: &str) -> f64 {
    let text = file("truth.csv");
    let line = text.lines().find(|l| l.starts_with(id)).unwrap();
    line.split(',').nth(2).unwrap().parse().unwrap()
}

#[tokio::test]
async fn rinex_clock_with_sp3_orbit() {
    let server = TestServer::start().await;
    let body = json!({"sp3": file("lyra_clock_pair.sp3"), "rinex_clock": file("lyra_clock_pair.clk"), "include_series": false});
    let (status, _, answer) = post_json(&server, "/v1/clock/corrections", &body).await;
    assert_eq!(status, 200, "{answer}");
    assert_eq!(answer["clock_source"], "rinex_clock");
    let satellites = answer["satellites"].as_array().unwrap();
    assert_eq!(satellites.len(), 4);
    for satellite in satellites {
        let id = satellite["id"].as_str().unwrap();
        let rate = satellite["rate"].as_f64().unwrap();
        // The generator's known rate (tools/make_clock_pair.py), to 1e-16 (issue 13 target).
        assert!((rate - truth_rate(id)).abs() <= 1e-16, "{id}: {rate:e}");
        assert_eq!(satellite["count"], 2880);
        assert!(satellite["residual_rms_s"].as_f64().unwrap() < 1e-12);
        assert!(satellite.get("series").is_none());
    }
    // IS-GPS-200 3.3.1.1 factory setting: 4.4647e-10.
    assert!((answer["factory_setting_rate"].as_f64().unwrap() - 4.4647e-10).abs() < 1e-14);
    // The invented station's receiver clock is named in the warnings (partial data).
    let warnings = answer["warnings"].to_string();
    assert!(warnings.contains("TESSARO00"), "{warnings}");
}

#[tokio::test]
async fn csv_rows_and_partial_data() {
    let server = TestServer::start().await;
    // Only the first hour of clocks and one satellite the orbit does not have.
    let clk = file("lyra_clock_pair.clk");
    let mut lines: Vec<&str> = clk
        .lines()
        .filter(|l| !l.starts_with('A') || l.contains(" 2026 05 20 00 "))
        .collect();
    lines.push("AS L09       2026 05 20 00 00  0.000000  1    1.000000000000E-04");
    let body = json!({"sp3": file("lyra_clock_pair.sp3"), "rinex_clock": lines.join("\n")});
    let response = client()
        .post(server.url("/v1/clock/corrections"))
        .header("accept", "text/csv")
        .json(&body)
        .send()
        .await
        .unwrap();
    assert_eq!(response.status().as_u16(), 200);
    assert!(response.headers()["content-type"]
        .to_str()
        .unwrap()
        .starts_with("text/csv"));
    let text = response.text().await.unwrap();
    let mut rows = text.lines();
    assert_eq!(
        rows.next(),
        Some("satellite,epoch,line,clock_s,conventional_s,j2_s,corrected_s,residual_s")
    );
    let first: Vec<&str> = rows.next().unwrap().split(',').collect();
    assert_eq!(first[0], "L01");
    assert!(first[1].starts_with("2026-05-20T00:00:00"), "{first:?}");
    let (status, _, answer) = post_json(&server, "/v1/clock/corrections", &body).await;
    assert_eq!(status, 200);
    assert!(
        answer["warnings"].to_string().contains("satellite L09"),
        "{}",
        answer["warnings"]
    );
}

#[tokio::test]
async fn json_series_with_states() {
    let server = TestServer::start().await;
    // A circular orbit (a = 26 561.75 km, IS-GPS-200 nominal) in the GCRS: conventional term 0.
    let (a, n) = (
        26_561_750.0f64,
        (3.986_004_418e14f64 / 26_561_750.0f64.powi(3)).sqrt(),
    );
    let samples: Vec<Value> = (0..10)
        .map(|k| {
            let t = 600.0 * f64::from(k);
            let u = n * t;
            json!({"epoch": format!("2026-05-20T{:02}:{:02}:00", k / 6, (k % 6) * 10),
                "clock_s": 1e-4 + 1e-12 * t,
                "position_m": [a * u.cos(), a * u.sin(), 0.0],
                "velocity_m_s": [-a * n * u.sin(), a * n * u.cos(), 0.0]})
        })
        .collect();
    let body = json!({"series": [{"id": "LYR-01", "frame": "GCRS", "samples": samples}], "convention": "raw"});
    let (status, _, answer) = post_json(&server, "/v1/clock/corrections", &body).await;
    assert_eq!(status, 200, "{answer}");
    let satellite = &answer["satellites"][0];
    // Equatorial circular orbit: both periodic terms vanish (IS-GPS-200; Kouba 2004 sin^2 i = 0).
    assert!((satellite["rate"].as_f64().unwrap() - 1e-12).abs() < 1e-20);
    assert!(satellite["series"][3]["j2_s"].as_f64().unwrap().abs() < 1e-20);
}

#[tokio::test]
async fn bad_input_names_field_and_line() {
    let server = TestServer::start().await;
    let sp3 = file("lyra_clock_pair.sp3");
    let cases = [
        (json!({}), "input_missing", Some("sp3"), None),
        (
            json!({"rinex_clock": "x"}),
            "orbit_required",
            Some("sp3"),
            None,
        ),
        (
            json!({"sp3": sp3, "convention": "IGS"}),
            "unknown_convention",
            Some("convention"),
            None,
        ),
        (
            json!({"sp3": sp3, "rinex_clock": "junk\n"}),
            "rinex_clock_bad_header",
            Some("rinex_clock"),
            Some(1),
        ),
        (
            json!({"sp3": "junk\n"}),
            "sp3_bad_header",
            Some("sp3"),
            Some(1),
        ),
        (
            json!({"sp3": sp3, "series": []}),
            "input_ambiguous",
            Some("series"),
            None,
        ),
        (
            json!({"series": [{"id": "X", "samples": [{"epoch": "2026-05-20T00:00:00", "clock_s": 0.0, "position_m": [2.6e7, 0.0, 0.0], "velocity_m_s": [0.0, 3.9e3, 0.0]},
            {"epoch": "2026-05-20T00:00:00", "clock_s": 0.0, "position_m": [2.6e7, 0.0, 0.0], "velocity_m_s": [0.0, 3.9e3, 0.0]}]}]}),
            "epochs_not_increasing",
            Some("series[0].samples[1].epoch"),
            None,
        ),
    ];
    for (body, code, field, line) in cases {
        let answer = post_json(&server, "/v1/clock/corrections", &body).await;
        let problem = assert_problem(&answer, 422, code);
        if let Some(field) = field {
            assert_eq!(problem["field"], field, "{problem}");
        }
        if let Some(line) = line {
            assert_eq!(problem["line"], line, "{problem}");
        }
    }
    // A RINEX record that cannot be read names its line.
    let clk = file("lyra_clock_pair.clk").replacen(
        "AS L02       2026 05 20 00 00  0.000000  1",
        "AS L02       2026 05 20 00 00  0.000000  x",
        1,
    );
    let answer = post_json(
        &server,
        "/v1/clock/corrections",
        &json!({"sp3": sp3, "rinex_clock": clk}),
    )
    .await;
    let problem = assert_problem(&answer, 422, "rinex_clock_bad_record");
    assert_eq!(problem["line"], 10, "{problem}");
}
