//! `GET /v1/earth/eop` against the real server: the built-in table's summary, its values at
//! tabulated days equal to the IERS files' printed values, and the problems of `at`.
//!
//! Source of the expected values: the IERS files of astropy-iers-data 0.2026.11.2.0.34.55
//! (the version the built-in snapshot is made from, src/physics/earth/eop/mod.rs), as committed
//! in tests/reference/ by tests/reference/make_eop_reference.py (seed in
//! tests/reference/eop_reference_versions.txt): `tab` rows of eop_interp_reference.csv (IERS
//! EOP 20 C04 eopc04.1962-now, then IERS Bulletin A finals2000A.all) and the excerpt
//! eop_finals2000A_2026_2027.all.

mod common;

use common::{assert_problem, get_json, metric_value, metrics_text, TestServer};
use eigenzeit::physics::time::calendar::CalendarDate;

const REFERENCE: &str = include_str!("reference/eop_interp_reference.csv");
const FINALS: &str = include_str!("reference/eop_finals2000A_2026_2027.all");

/// A decimal text scaled by 10^-`shift` and read as the nearest f64: the digits as an integer
/// divided by a power of ten, one correctly rounded division (IEEE 754), as the snapshot decodes
/// its integers, so that it equals the printed value in the table's units.
fn decimal(text: &str, shift: i32) -> f64 {
    let text = text.trim();
    let (sign, digits) = match text.strip_prefix('-') {
        Some(rest) => (-1.0, rest),
        None => (1.0, text),
    };
    let (whole, fraction) = digits.split_once('.').unwrap_or((digits, ""));
    let integer: i64 = format!("{whole}{fraction}").parse().expect("digits");
    let scale = 10_f64.powi(fraction.len() as i32 + shift);
    sign * (integer as f64 / scale)
}

fn iso_midnight(mjd: i64) -> String {
    format!("{}T00:00:00Z", CalendarDate::from_mjd(mjd))
}

async fn at(server: &TestServer, instant: &str) -> (u16, String, serde_json::Value) {
    get_json(server, &format!("/v1/earth/eop?at={instant}")).await
}

#[tokio::test]
async fn summary_of_the_built_in_table() {
    let server = TestServer::start().await;
    let (status, content_type, body) = get_json(&server, "/v1/earth/eop").await;
    assert_eq!(status, 200, "{body}");
    assert!(content_type.starts_with("application/json"));
    // src/physics/earth/data/eop_README.md: C04 from 1962-01-01 (MJD 37665), Bulletin A observed
    // to 2026-10-22 (MJD 61335), predicted to 2027-10-29 (MJD 61707); 24 043 days.
    assert!(
        body["source"]
            .as_str()
            .is_some_and(|s| s.contains("astropy-iers-data 0.2026.11.2.0.34.55")),
        "{body}"
    );
    assert_eq!(body["first_day"], "1962-01-01");
    assert_eq!(body["first_mjd"], 37_665);
    assert_eq!(body["last_observed"], "2026-10-22");
    assert_eq!(body["last_observed_mjd"], 61_335);
    assert_eq!(body["end_of_predictions"], "2027-10-29");
    assert_eq!(body["end_of_predictions_mjd"], 61_707);
    assert_eq!(body["last_day"], "2027-10-29");
    assert_eq!(body["last_mjd"], 61_707);
    assert_eq!(body["day_count"], 24_043);
    assert!(body.get("at").is_none(), "{body}");

    // /readyz and /metrics state the same days.
    let (status, _, ready) = get_json(&server, "/readyz").await;
    assert_eq!(status, 200);
    assert_eq!(ready["eop"]["source"], body["source"]);
    assert_eq!(ready["eop"]["last_observed"], "2026-10-22");
    assert_eq!(ready["eop"]["last_observed_mjd"], 61_335);
    assert_eq!(ready["eop"]["end_of_predictions"], "2027-10-29");
    assert_eq!(ready["eop"]["end_of_predictions_mjd"], 61_707);
    assert!(ready["eop"].get("last_refresh_error").is_none(), "{ready}");
    let text = metrics_text(&server).await;
    let series = [
        ("eigenzeit_eop_last_observed_mjd", 61_335.0),
        ("eigenzeit_eop_end_of_predictions_mjd", 61_707.0),
        ("eigenzeit_eop_refresh_failures_total", 0.0),
        ("eigenzeit_eop_refresh_successes_total", 0.0),
    ];
    for (name, value) in series {
        assert_eq!(metric_value(&text, name), Some(value), "{name}: {text}");
    }
    let info = format!(
        "eigenzeit_eop_table_info{{source=\"{}\"}}",
        body["source"].as_str().unwrap_or("")
    );
    assert_eq!(metric_value(&text, &info), Some(1.0), "{text}");
    // Days to 2027-10-29 from the test's clock: MJD 61707 - (40587 + unix days) (Unix epoch
    // = MJD 40587, common practice), within the 90 s the gauge is rounded to.
    let now_mjd = 40_587.0 + eigenzeit::api::state::unix_now_s() / 86_400.0;
    let days = metric_value(&text, "eigenzeit_eop_table_end_days").expect("days");
    assert!((days - (61_707.0 - now_mjd)).abs() < 0.002, "{days}");
}

#[tokio::test]
async fn values_at_tabulated_days_equal_the_iers_files() {
    let server = TestServer::start().await;
    let mut checked = 0;
    for row in REFERENCE.lines().filter(|l| l.starts_with("tab,")) {
        let f: Vec<&str> = row.split(',').collect();
        let mjd: i64 = f[1].parse().expect("mjd");
        let (status, _, body) = at(&server, &iso_midnight(mjd)).await;
        assert_eq!(status, 200, "{row}: {body}");
        let values = &body["at"];
        // At a tabulated day the 4-point Lagrange weights are exactly 0 and 1, so x_p and y_p
        // are the printed values; UT1 - UTC goes through UT1 - TAI (IERS Conventions (2010)
        // 5.5.1), whose one-second step across a leap second costs at most a rounding of 1 s
        // (2.2e-16 s) each way.
        assert_eq!(
            values["xp_arcsec"].as_f64(),
            Some(decimal(f[4], 0)),
            "{row}"
        );
        assert_eq!(
            values["yp_arcsec"].as_f64(),
            Some(decimal(f[5], 0)),
            "{row}"
        );
        let ut1 = values["ut1_minus_utc_s"].as_f64().expect("ut1");
        assert!((ut1 - decimal(f[3], 0)).abs() <= 4.5e-16, "{row}: {ut1}");
        checked += 1;
    }
    // The committed reference has 302 tabulated rows.
    assert_eq!(checked, 302);
}

/// Asserts that each field of `object` equals the finals2000A column `range` of `line`, scaled
/// by 10^-`shift` (3: mas to arcsec, ms to s).
fn assert_columns(object: &serde_json::Value, line: &str, columns: &[(&str, usize, usize, i32)]) {
    for &(field, start, end, shift) in columns {
        let expected = decimal(&line[start..end], shift);
        assert_eq!(object[field].as_f64(), Some(expected), "{field}: {object}");
    }
}

#[tokio::test]
async fn bulletin_a_days_carry_lod_pole_offsets_status_and_likely_error() {
    let server = TestServer::start().await;
    // readme.finals2000A (IERS Rapid Service/Prediction Center): columns 17 and 58 the I/P
    // flags, 19-27 x_p, 28-36 its error, 38-46 y_p, 47-55 its error (arcsec), 59-68 UT1-UTC,
    // 69-78 its error (s), 80-86 LOD (ms), 98-106 dX, 117-125 dY (mas); Bulletin A columns.
    let line = |mjd: &str| {
        FINALS
            .lines()
            .find(|l| l.get(7..15) == Some(mjd))
            .expect("line")
    };
    let pole_and_ut1 = [
        ("xp_arcsec", 18, 27, 0),
        ("yp_arcsec", 37, 46, 0),
        ("ut1_minus_utc_s", 58, 68, 0),
    ];
    // 2026-10-01 (MJD 61314): observed, with LOD and dX, dY.
    let observed = line("61314.00");
    let (status, _, body) = at(&server, "2026-10-01T00:00:00Z").await;
    assert_eq!(status, 200, "{body}");
    let values = &body["at"];
    assert_eq!(values["utc"], "2026-10-01T00:00:00Z");
    assert_eq!(values["status"], "observed");
    assert_eq!(values["nutation_status"], "observed");
    assert_columns(values, observed, &pole_and_ut1);
    assert_columns(
        values,
        observed,
        &[
            ("lod_s", 79, 86, 3),
            ("dx_arcsec", 97, 106, 3),
            ("dy_arcsec", 116, 125, 3),
        ],
    );
    assert_eq!(values["days_after_observed"], 0.0);
    assert!(values["likely_error"].is_null(), "{body}");

    // 2027-03-15 (MJD 61479): predicted, 144 days after the last observed day (MJD 61335),
    // with the errors Bulletin A states for that day; no LOD, dX, dY in the file.
    let predicted = line("61479.00");
    assert_eq!(&predicted[16..17], "P");
    let (status, _, body) = at(&server, "2027-03-15T00:00:00Z").await;
    assert_eq!(status, 200, "{body}");
    let values = &body["at"];
    assert_eq!(values["status"], "predicted");
    assert_columns(values, predicted, &pole_and_ut1);
    assert_eq!(values["days_after_observed"], 144.0);
    assert_columns(
        &values["likely_error"],
        predicted,
        &[
            ("xp_arcsec", 27, 36, 0),
            ("yp_arcsec", 46, 55, 0),
            ("ut1_minus_utc_s", 68, 78, 0),
        ],
    );
    assert!(values["lod_s"].is_null(), "{body}");
}

#[tokio::test]
async fn between_days_the_values_lie_between_the_neighbours() {
    let server = TestServer::start().await;
    // Noon of 2026-10-01: 4-point Lagrange interpolation (IERS Conventions (2010) 5.5.1) of a
    // smooth series lies near the mean of the two neighbouring days; x_p moves about 1 mas a
    // day there (finals2000A.all), so within 0.5 mas of the mean (from memory: the cubic term
    // is far smaller than the daily step).
    let (_, _, noon) = at(&server, "2026-10-01T12:00:00Z").await;
    let (_, _, day) = at(&server, "2026-10-01").await;
    let (_, _, next) = at(&server, "2026-10-02T00:00:00").await;
    let x = |b: &serde_json::Value| b["at"]["xp_arcsec"].as_f64().expect("x_p");
    let mean = (x(&day) + x(&next)) / 2.0;
    assert!((x(&noon) - mean).abs() < 5e-4, "{noon}");
    assert!(x(&noon) != x(&day) && x(&noon) != x(&next));
}

#[tokio::test]
async fn instants_outside_the_table_or_unreadable_are_problems_naming_at() {
    let server = TestServer::start().await;
    // After the end of the predictions (2027-10-29) and before the first day (1962-01-01).
    for (instant, code) in [
        ("2027-10-29T00:00:01Z", "eop_after_table"),
        ("2030-01-01T00:00:00Z", "eop_after_table"),
        ("1961-12-31T23:59:59Z", "eop_before_table"),
        ("2026-02-30T00:00:00Z", "impossible_date"),
        ("61314.5", "malformed_instant"),
        ("1959-06-01T00:00:00Z", "utc_before_1960"),
        // IERS Bulletin C: no leap second at the end of 2026-06-30.
        ("2026-06-30T23:59:60Z", "invalid_leap_second"),
    ] {
        let answer = at(&server, instant).await;
        let problem = assert_problem(&answer, 422, code);
        assert_eq!(problem["field"], "at", "{instant}: {problem}");
    }
    let (status, _, body) = at(&server, "2027-10-29T00:00:00Z").await;
    assert_eq!(status, 200, "the last day itself is in the table: {body}");
    let answer = get_json(&server, "/v1/earth/eop?when=2026-10-01").await;
    assert_problem(&answer, 400, "invalid_query");
}
