//! UT1 through `GET` and `POST /v1/time/convert` against the real server.
//!
//! Source of the expected UT1 - UTC: tests/reference/eop_interp_reference.csv, made by
//! tests/reference/make_eop_reference.py from the IERS files of astropy-iers-data
//! 0.2026.11.2.0.34.55 (`tab` rows: the values printed in IERS EOP 20 C04 and IERS Bulletin A
//! at tabulated days; `interp` rows: an independent 4-point Lagrange interpolation through
//! UT1 - TAI at seeded random instants and around leap seconds). The built-in table is made
//! from the same files (src/physics/earth/eop/mod.rs).

mod common;

use common::{assert_problem, get_json, post_json, TestServer};
use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::readable::readable;
use eigenzeit::physics::time::calendar::CalendarDate;

const REFERENCE: &str = include_str!("reference/eop_interp_reference.csv");

/// The ISO text of UTC day `mjd` at the second of day written `sod` (decimal text, kept exact).
fn iso(mjd: i64, sod: &str) -> String {
    let (whole, fraction) = sod.split_once('.').unwrap_or((sod, ""));
    let whole: i64 = whole.parse().expect("second of day");
    // A second of day at or above 86 400 is inside the leap second (23:59:60).
    let (h, m, s) = if whole >= 86_400 {
        (23, 59, whole - 86_340)
    } else {
        (whole / 3600, whole / 60 % 60, whole % 60)
    };
    let fraction = if fraction.is_empty() {
        String::new()
    } else {
        format!(".{}", &fraction[..fraction.len().min(18)])
    };
    format!(
        "{}T{h:02}:{m:02}:{s:02}{fraction}",
        CalendarDate::from_mjd(mjd)
    )
}

fn difference_s(conversion: &serde_json::Value) -> f64 {
    conversion["results"][0]["difference_exact_s"]
        .as_str()
        .and_then(|t| t.parse().ok())
        .unwrap_or(f64::NAN)
}

#[tokio::test]
async fn ut1_minus_utc_matches_the_reference_at_and_between_tabulated_days() {
    let server = TestServer::start().await;
    let rows: Vec<Vec<&str>> = REFERENCE
        .lines()
        .skip(1)
        .map(|line| line.split(',').collect())
        .collect();
    let epochs: Vec<String> = rows
        .iter()
        .map(|f| iso(f[1].parse().expect("mjd"), f[2]))
        .collect();
    let body =
        serde_json::json!({"from": "UTC", "to": ["UT1"], "epochs": epochs, "forms": ["iso"]});
    let (status, _, answer) = post_json(&server, "/v1/time/convert", &body).await;
    assert_eq!(status, 200, "{answer}");
    let conversions = answer["conversions"]
        .as_array()
        .cloned()
        .unwrap_or_default();
    assert_eq!(conversions.len(), rows.len());
    let (mut worst_tab, mut worst_interp) = (0.0_f64, 0.0_f64);
    for (row, conversion) in rows.iter().zip(&conversions) {
        let expected: f64 = row[3].parse().expect("ut1_utc_s");
        let error = (difference_s(conversion) - expected).abs();
        if row[0] == "tab" {
            worst_tab = worst_tab.max(error);
        } else {
            worst_interp = worst_interp.max(error);
        }
    }
    // Tabulated days: the printed value (the 1e-15 s level: f64 of the printed decimal,
    // rounded to the attosecond). Between them: the same bound as the physics library's test
    // against the script (src/physics/earth/eop/tests_reference.rs, 1e-13 s).
    assert!(worst_tab < 1e-15, "tabulated days: worst {worst_tab:e} s");
    assert!(
        worst_interp < 1e-13,
        "interpolated: worst {worst_interp:e} s"
    );
    println!(
        "UT1-UTC over HTTP: worst {worst_tab:e} s at tabulated days, {worst_interp:e} s between"
    );
}

#[tokio::test]
async fn utc_to_ut1_and_back_is_exact() {
    // Requirement of the brief: the round trip UTC -> UT1 -> UTC exact at the 1e-15 s level
    // (here: to the attosecond, the engine's resolution; ut1.rs states the convergence).
    let server = TestServer::start().await;
    for utc in [
        "2026-03-14T06:30:00.123456789012345678",
        "1975-06-01T12:00:00.5",
        "2016-12-31T23:59:60.25",
        "2027-10-28T23:59:59.999999999999",
    ] {
        let path = format!("/v1/time/convert?at={utc}&to=UT1&forms=j2000_s");
        let (status, _, there) = get_json(&server, &path).await;
        assert_eq!(status, 200, "{there}");
        let ut1 = there["results"][0]["j2000_s"].as_str().unwrap_or_default();
        let path =
            format!("/v1/time/convert?at={ut1}&from=UT1&format=j2000_s&to=UTC&forms=iso,mjd");
        let (status, _, back) = get_json(&server, &path).await;
        assert_eq!(status, 200, "{back}");
        let (status, _, start) = get_json(
            &server,
            &format!("/v1/time/convert?at={utc}&to=UTC&forms=iso,mjd"),
        )
        .await;
        assert_eq!(status, 200);
        // mjd is lossless (24 decimals of a day), so equal text is the same attosecond.
        assert_eq!(
            back["results"][0]["mjd"], start["input"]["mjd"],
            "{utc} -> {ut1}"
        );
        assert_eq!(
            back["results"][0]["difference_exact_s"]
                .as_str()
                .map(|t| t.trim_start_matches('-').to_string()),
            there["results"][0]["difference_exact_s"]
                .as_str()
                .map(|t| t.trim_start_matches('-').to_string()),
        );
    }
}

#[tokio::test]
async fn ut1_to_tai_tt_and_gpst() {
    // At 2017-01-25 0h UTC, TAI - UTC = 37 s (IERS Bulletin C 52), TT = TAI + 32.184 s
    // (IAU 1991 A4), GPST = TAI - 19 s (IS-GPS-200), and UT1 - UTC is the C04 value of MJD
    // 57778 (the `tab` row of the reference).
    let server = TestServer::start().await;
    let dut1: f64 = REFERENCE
        .lines()
        .find(|l| l.starts_with("tab,57778,"))
        .and_then(|l| l.split(',').nth(3))
        .and_then(|t| t.parse().ok())
        .expect("reference row for MJD 57778");
    let (status, _, there) = get_json(
        &server,
        "/v1/time/convert?at=2017-01-25T00:00:00&to=UT1&forms=j2000_s",
    )
    .await;
    assert_eq!(status, 200, "{there}");
    let ut1 = there["results"][0]["j2000_s"]
        .as_str()
        .unwrap_or_default()
        .to_string();
    let path =
        format!("/v1/time/convert?at={ut1}&from=UT1&format=j2000_s&to=TAI,TT,GPST,UTC&forms=iso");
    let (status, _, answer) = get_json(&server, &path).await;
    assert_eq!(status, 200, "{answer}");
    let results = answer["results"].as_array().cloned().unwrap_or_default();
    let difference = |i: usize| -> f64 {
        results[i]["difference_exact_s"]
            .as_str()
            .and_then(|t| t.parse().ok())
            .unwrap_or(f64::NAN)
    };
    for (index, offset_s) in [(0, 37.0), (1, 69.184), (2, 18.0), (3, 0.0)] {
        let expected = offset_s - dut1;
        assert!(
            (difference(index) - expected).abs() < 1e-12,
            "{index}: {} vs {expected}",
            difference(index)
        );
    }
    assert_eq!(results[0]["iso"], "2017-01-25T00:00:37.000000000000");
    assert_eq!(results[3]["iso"], "2017-01-25T00:00:00.000000000000");
    assert!(
        answer["warnings"].as_array().is_some_and(|w| w.is_empty()),
        "observed: no warning"
    );
}

#[tokio::test]
async fn outside_the_table_is_a_422_naming_the_field() {
    // The built-in table's predictions end on 2027-10-29 and its first day is 1962-01-01
    // (src/physics/earth/data/eop_README.md).
    let server = TestServer::start().await;
    let answer = get_json(
        &server,
        "/v1/time/convert?at=2028-01-01T00:00:00&to=TAI,UT1",
    )
    .await;
    let problem = assert_problem(&answer, 422, "ut1_outside_eop_table");
    assert_eq!(problem["field"], "at");
    assert!(
        problem["detail"]
            .as_str()
            .is_some_and(|d| d.contains("2027-10-29")),
        "{problem}"
    );
    let answer = get_json(
        &server,
        "/v1/time/convert?at=1961-06-01T00:00:00&from=UT1&to=TT",
    )
    .await;
    assert_problem(&answer, 422, "ut1_outside_eop_table");
    let body = serde_json::json!({"from": "UTC", "to": ["UT1"],
        "epochs": ["2026-03-14T00:00:00", "2030-03-14T00:00:00"]});
    let answer = post_json(&server, "/v1/time/convert", &body).await;
    let problem = assert_problem(&answer, 422, "ut1_outside_eop_table");
    assert_eq!(problem["field"], "epochs[1]");
    // `all` leaves UT1 out, so an epoch after the table still converts (this service's rule).
    let (status, _, all) = get_json(&server, "/v1/time/convert?at=2030-01-01T00:00:00").await;
    assert_eq!(status, 200, "{all}");
    let scales: Vec<String> = all["results"]
        .as_array()
        .into_iter()
        .flatten()
        .filter_map(|r| r["scale"].as_str().map(str::to_string))
        .collect();
    assert!(
        !scales.iter().any(|s| s == "UT1") && scales.len() == 10,
        "{scales:?}"
    );
}

#[tokio::test]
async fn predicted_days_carry_a_warning_with_the_likely_error() {
    // 2027-06-01 (MJD 61557) is a predicted day of the built-in table (Bulletin A predictions
    // from 2026-10-23 on); the warning states that day's Bulletin A error of UT1 - UTC.
    let server = TestServer::start().await;
    let sigma_s = EopTable::builtin()
        .day(61_557)
        .and_then(|d| d.sigma)
        .map(|s| s.ut1_minus_utc_s)
        .expect("Bulletin A states an error for MJD 61557");
    let (status, _, answer) =
        get_json(&server, "/v1/time/convert?at=2027-06-01T00:00:00&to=UT1").await;
    assert_eq!(status, 200, "{answer}");
    let warnings: Vec<String> = answer["warnings"]
        .as_array()
        .into_iter()
        .flatten()
        .filter_map(|w| w.as_str().map(str::to_string))
        .collect();
    assert_eq!(warnings.len(), 1, "{warnings:?}");
    assert!(warnings[0].contains("UT1 - UTC"), "{}", warnings[0]);
    assert!(warnings[0].contains("predicted"), "{}", warnings[0]);
    assert!(
        warnings[0].contains(&format!("likely error {} s", readable(sigma_s))),
        "{}",
        warnings[0]
    );
    // From UT1 too; and an observed day has none.
    let (_, _, from_ut1) = get_json(
        &server,
        "/v1/time/convert?at=2027-06-01T00:00:00&from=UT1&to=TAI",
    )
    .await;
    assert_eq!(
        from_ut1["warnings"].as_array().map(Vec::len),
        Some(1),
        "{from_ut1}"
    );
    let (_, _, observed) =
        get_json(&server, "/v1/time/convert?at=2026-06-01T00:00:00&to=UT1").await;
    assert_eq!(
        observed["warnings"].as_array().map(Vec::len),
        Some(0),
        "{observed}"
    );
}

#[tokio::test]
async fn the_scale_list_describes_ut1() {
    // This service's contract: GET /v1/time/scales lists every scale of the vocabulary.
    let server = TestServer::start().await;
    let (status, _, body) = get_json(&server, "/v1/time/scales").await;
    assert_eq!(status, 200);
    let ut1 = body["scales"]
        .as_array()
        .into_iter()
        .flatten()
        .find(|s| s["name"] == "UT1")
        .cloned()
        .unwrap_or_default();
    assert_eq!(ut1["needs_earth_orientation"], true, "{ut1}");
    assert_eq!(ut1["has_leap_seconds"], false);
    assert!(ut1["relation"]
        .as_str()
        .is_some_and(|r| r.contains("UT1 - UTC")));
    let utc = body["scales"]
        .as_array()
        .into_iter()
        .flatten()
        .find(|s| s["name"] == "UTC")
        .cloned()
        .unwrap_or_default();
    assert_eq!(utc["needs_earth_orientation"], false);
}
