//! `GET` and `POST /v1/earth/orientation` against the real server.
//!
//! Source of the expected values: tests/reference/orientation_endpoint_erfa.csv, written by
//! tests/reference/make_orientation_endpoint_reference.py (seeded) with pyerfa: `era00`,
//! `gmst06`, `gst06a`, `xys06a`, `sp00` and `c2t06a` at UTC instants 1979-2027 with the UT1 -
//! UTC, x_p and y_p that tests/reference/make_eop_reference.py interpolated independently in
//! the IERS tables of astropy-iers-data 0.2026.11.2.0.34.55 (the built-in table's version,
//! src/physics/earth/eop/mod.rs). The tolerance is the task's, 1e-12 rad.

mod common;

use common::{assert_problem, get_json, post_json, TestServer};

const REFERENCE: &str = include_str!("reference/orientation_endpoint_erfa.csv");
/// The task's agreement with ERFA, radians.
const TOLERANCE_RAD: f64 = 1e-12;
/// GRS80 equatorial radius, metres (Moritz 2000): an angle as metres at the Earth's surface.
const EQUATORIAL_RADIUS_M: f64 = 6_378_137.0;

fn rows() -> Vec<Vec<String>> {
    REFERENCE
        .lines()
        .filter(|l| !l.starts_with('#') && !l.starts_with("utc_iso"))
        .map(|l| l.split(',').map(str::to_string).collect())
        .collect()
}

fn num(text: &str) -> f64 {
    text.parse().expect("number")
}

/// The difference of two angles reduced to (-pi, pi].
fn angle_difference(a: f64, b: f64) -> f64 {
    let d = (a - b).rem_euclid(std::f64::consts::TAU);
    if d > std::f64::consts::PI {
        d - std::f64::consts::TAU
    } else {
        d
    }
}

/// Worst difference (rad) of one answer from one reference row, after checking that the
/// answer used the row's EOP values (the interpolation agrees to 1e-13, as the EOP tests
/// require of the library).
fn worst_difference(row: &[String], answer: &serde_json::Value) -> f64 {
    let value = |name: &str| answer[name].as_f64().unwrap_or(f64::NAN);
    assert!(
        (value("ut1_minus_utc_s") - num(&row[3])).abs() < 1e-13,
        "{answer}"
    );
    assert!(
        (value("xp_arcsec") - num(&row[4])).abs() < 1e-13,
        "{answer}"
    );
    assert!(
        (value("yp_arcsec") - num(&row[5])).abs() < 1e-13,
        "{answer}"
    );
    assert_eq!(answer["pole_offsets_applied"], false);
    let mut worst = 0.0f64;
    for (name, column) in [("era_rad", 6), ("gmst_rad", 7), ("gast_rad", 8)] {
        worst = worst.max(angle_difference(value(name), num(&row[column])).abs());
    }
    for (name, column) in [
        ("cip_x_rad", 9),
        ("cip_y_rad", 10),
        ("s_rad", 11),
        ("sprime_rad", 12),
    ] {
        worst = worst.max((value(name) - num(&row[column])).abs());
    }
    for i in 0..3 {
        for j in 0..3 {
            let got = answer["gcrs_to_itrs"][i][j].as_f64().unwrap_or(f64::NAN);
            worst = worst.max((got - num(&row[13 + 3 * i + j])).abs());
        }
    }
    for (rad, deg) in [("era_rad", "era_deg"), ("gast_rad", "gast_deg")] {
        assert!(
            (value(rad).to_degrees() - value(deg)).abs() < 1e-12,
            "{answer}"
        );
    }
    worst
}

/// The answers equal pyerfa's at every reference epoch (GET) and the batch equals the single
/// answers; predicted rows (after 2026-10-22, the last observed day) carry a warning.
#[tokio::test]
async fn agrees_with_erfa_at_the_reference_epochs() {
    let server = TestServer::start().await;
    let rows = rows();
    assert_eq!(rows.len(), 16);
    let mut worst = 0.0f64;
    let mut singles = Vec::new();
    for row in &rows {
        let path = format!("/v1/earth/orientation?at={}&pole_offsets=false", row[0]);
        let (status, _, answer) = get_json(&server, &path).await;
        assert_eq!(status, 200, "{row:?}: {answer}");
        worst = worst.max(worst_difference(row, &answer));
        let predicted = num(&row[1]) > 61_335.0;
        let expected_status = if predicted { "predicted" } else { "observed" };
        assert_eq!(answer["eop"]["status"], expected_status, "{answer}");
        let warned = answer["warnings"].as_array().is_some_and(|w| {
            w.iter().any(|t| {
                t.as_str()
                    .is_some_and(|t| t.contains("x_p") && t.contains("mas"))
            })
        });
        assert_eq!(warned, predicted, "{answer}");
        singles.push(answer);
    }
    println!(
        "worst difference from ERFA: {worst:e} rad = {:e} m at the Earth's surface",
        worst * EQUATORIAL_RADIUS_M
    );
    assert!(worst <= TOLERANCE_RAD, "worst {worst:e} rad");

    let epochs: Vec<&str> = rows.iter().map(|row| row[0].as_str()).collect();
    let body = serde_json::json!({"epochs": epochs, "pole_offsets": false});
    let (status, _, batch) = post_json(&server, "/v1/earth/orientation", &body).await;
    assert_eq!(status, 200, "{batch}");
    let orientations = batch["orientations"]
        .as_array()
        .cloned()
        .unwrap_or_default();
    assert_eq!(orientations, singles);
}

/// The same instant in TT and as an MJD gives the same orientation as in UTC (TT = UTC + 69.184
/// s in 2026, IERS Bulletin C 52 and IAU 1991 Resolution A4); with the table's dX, dY the CIP
/// moves by exactly them (IERS Conventions (2010) sec. 5.5.4) and s, ERA do not.
#[tokio::test]
async fn scale_format_and_pole_offsets() {
    let server = TestServer::start().await;
    let (status, _, utc) = get_json(&server, "/v1/earth/orientation?at=2026-03-14T06:30:00").await;
    assert_eq!(status, 200, "{utc}");
    let (status, _, tt) = get_json(
        &server,
        "/v1/earth/orientation?at=2026-03-14T06:31:09.184&scale=TT",
    )
    .await;
    assert_eq!(status, 200, "{tt}");
    // 2026-03-14 is MJD 61113 (from memory: MJD 61113 = 2026-03-14); 06:30 is 0.2708333... d.
    let (status, _, mjd) = get_json(
        &server,
        "/v1/earth/orientation?at=61113.2708333333333333333333&format=mjd",
    )
    .await;
    assert_eq!(status, 200, "{mjd}");
    for name in ["era_rad", "gast_rad", "cip_x_rad", "ut1_minus_utc_s"] {
        assert_eq!(utc[name], tt[name], "{name}");
        let (a, b) = (
            utc[name].as_f64().unwrap_or(0.0),
            mjd[name].as_f64().unwrap_or(1.0),
        );
        assert!((a - b).abs() < 1e-12, "{name}: {a} {b}");
    }
    assert_eq!(utc["eop"]["status"], "observed");
    assert!(
        utc["warnings"].as_array().is_some_and(|w| w.is_empty()),
        "{utc}"
    );
    assert!(utc["eop"]["source"]
        .as_str()
        .is_some_and(|s| s.contains("astropy-iers-data")));
    assert_eq!(utc["pole_offsets_applied"], true);
    let (_, _, model) = get_json(
        &server,
        "/v1/earth/orientation?at=2026-03-14T06:30:00&pole_offsets=false",
    )
    .await;
    let arcsec = std::f64::consts::PI / 648_000.0;
    for (cip, offset) in [("cip_x_rad", "dx_arcsec"), ("cip_y_rad", "dy_arcsec")] {
        let moved = utc[cip].as_f64().unwrap_or(0.0) - model[cip].as_f64().unwrap_or(0.0);
        let expected = utc[offset].as_f64().unwrap_or(f64::NAN) * arcsec;
        assert!(
            (moved - expected).abs() < 1e-17,
            "{cip}: {moved} vs {expected}"
        );
    }
    assert_eq!(utc["s_rad"], model["s_rad"]);
    assert_eq!(utc["era_rad"], model["era_rad"]);
}

/// Outside the table (it starts 1962-01-01 and its predictions end 2027-10-29,
/// src/physics/earth/data/eop_README.md), bad scales and formats: 422 naming the field.
#[tokio::test]
async fn problems_name_the_field() {
    let server = TestServer::start().await;
    let cases = [
        ("at=1961-06-01T00:00:00", "eop_before_table", "at"),
        ("at=1955-06-01T00:00:00&scale=TT", "eop_before_table", "at"),
        ("at=2030-01-01T00:00:00", "eop_after_table", "at"),
        ("at=2026-03-14T06:30:00&scale=XYZ", "unknown_scale", "scale"),
        (
            "at=2026-03-14T06:30:00&format=fortnights",
            "unknown_format",
            "format",
        ),
        ("at=2026-02-30T00:00:00", "impossible_date", "at"),
    ];
    for (query, code, field) in cases {
        let answer = get_json(&server, &format!("/v1/earth/orientation?{query}")).await;
        let problem = assert_problem(&answer, 422, code);
        assert_eq!(problem["field"], field, "{query}: {problem}");
    }
    let body = serde_json::json!({"epochs": ["2026-03-14T06:30:00", "2031-01-01T00:00:00"]});
    let answer = post_json(&server, "/v1/earth/orientation", &body).await;
    let problem = assert_problem(&answer, 422, "eop_after_table");
    assert_eq!(problem["field"], "epochs[1]");
    let body = serde_json::json!({"epochs": []});
    let answer = post_json(&server, "/v1/earth/orientation", &body).await;
    assert_problem(&answer, 422, "empty_batch");
    let body = serde_json::json!({"epochs": ["2026-03-14T06:30:00"], "scale": "XYZ"});
    let answer = post_json(&server, "/v1/earth/orientation", &body).await;
    assert_eq!(
        assert_problem(&answer, 422, "unknown_scale")["field"],
        "scale"
    );
}

#[tokio::test]
async fn a_ut1_reading_gives_the_orientation_of_the_same_event() {
    // The Earth rotation angle is a function of UT1 (IERS Conventions (2010) eq. 5.15): the same
    // event given as its UT1 reading (from the service's UTC -> UT1 conversion) or in UTC has
    // the same orientation, to the 1e-12 s truncation of the ISO text (7e-17 rad of ERA).
    let server = TestServer::start().await;
    let (status, _, converted) = get_json(
        &server,
        "/v1/time/convert?at=2026-10-01T12:00:00&to=UT1&forms=iso",
    )
    .await;
    assert_eq!(status, 200, "{converted}");
    let ut1_text = converted["results"][0]["iso"]
        .as_str()
        .unwrap_or("")
        .to_string();
    let (status, _, by_ut1) = get_json(
        &server,
        &format!("/v1/earth/orientation?at={ut1_text}&scale=UT1"),
    )
    .await;
    assert_eq!(status, 200, "{by_ut1}");
    let (_, _, by_utc) = get_json(
        &server,
        "/v1/earth/orientation?at=2026-10-01T12:00:00&scale=UTC",
    )
    .await;
    for name in ["era_rad", "gast_rad", "cip_x_rad"] {
        let (a, b) = (
            by_ut1[name].as_f64().unwrap_or(f64::NAN),
            by_utc[name].as_f64().unwrap_or(0.0),
        );
        assert!((a - b).abs() < 1e-15, "{name}: {a} vs {b}");
    }
}
