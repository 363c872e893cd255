//! Lunar-site clocks on the real lunar orbit (`de440_ephemeris`) through the real server.
//! Each check names its source; the physics checks are in `src/physics/moon/`.

mod common;

use common::{assert_problem, post_json, TestServer};
use serde_json::{json, Value};

fn num(value: &Value) -> f64 {
    value
        .as_f64()
        .unwrap_or_else(|| panic!("not a number: {value}"))
}

/// The invented Selene Gate south-pole clock of the demo scenario (no real landing site).
fn south_pole(extra: Value) -> Value {
    let mut site = json!({"latitude_deg": -89.5, "longitude_deg": 36.0, "height_m": 1200.0});
    if let (Some(site), Some(extra)) = (site.as_object_mut(), extra.as_object()) {
        site.extend(extra.clone());
    }
    json!({"items": [{"lunar_site": site}]})
}

async fn first(server: &TestServer, request: Value) -> Value {
    let (status, _, body) = post_json(server, "/v1/clock/rate", &request).await;
    assert_eq!(status, 200, "{body}");
    body["results"][0].clone()
}

/// What the Skua clock (1200 m up, at the pole) gains on an equator clock on the sphere: its
/// mean rate against TL (+0.00244 us/day) minus the equator clock's (-0.00048), both measured in
/// `physics::moon::tests` (the height's g h/c^2 and the lunar J2 at the pole).
const SITE_SHARE_US_DAY: f64 = 0.0029;

/// Ashby & Patla 2024 (Astron. J. 168:112): an equator clock gains about 56.02 us/day against TT
/// averaged over a lunar orbit (here plus [`SITE_SHARE_US_DAY`]); Turyshev et al. arXiv:2406.16147 v5: a monthly term of 0.470 us amplitude (0.94 us
/// peak to peak alone). One anomalistic month (27.55455 d) from 2026-03-01 UTC: the mean
/// within 0.01 us/day of 56.02 + 0.0029 (the months differ by up to 0.004), the periodic part's peak to peak between 0.7 and 1.25 us
/// (measured ranges in `physics::moon::tests`), the answer naming its model.
#[tokio::test]
async fn south_pole_clock_over_a_month() {
    let server = TestServer::start().await;
    let answer = first(
        &server,
        south_pole(json!({"span": {"start": "2026-03-01T00:00:00", "end": "2026-03-28T13:18:33"}})),
    )
    .await;
    eprintln!(
        "{}",
        serde_json::to_string_pretty(&answer).unwrap_or_default()
    );
    assert_eq!(answer["lunar_model"], "de440_ephemeris");
    assert_eq!(answer["gravity_model"], "grail_gl0660b_degree2");
    let span = &answer["lunar"]["over_span"];
    let mean = num(&span["tt"]["mean_us_per_day"]);
    assert!((mean - 56.02 - SITE_SHARE_US_DAY).abs() < 0.01, "{mean}");
    assert!((num(&answer["us_per_day"]["total"]) - mean).abs() < 1e-9);
    let p2p_us = num(&span["tt"]["periodic_peak_to_peak_s"]) * 1e6;
    assert!(p2p_us > 0.7 && p2p_us < 1.25, "{p2p_us}");
    // tau - TT accumulated: the mean rate times the span (definition).
    let days = 27.0 + (13.0 * 3600.0 + 18.0 * 60.0 + 33.0) / 86_400.0;
    assert!((num(&span["tt"]["offset_s"]) * 1e6 - mean * days).abs() < 1e-6);
    // Against TL (which ticks at the mean rate of the 1737.4 km sphere, Turyshev et al.) the
    // clock 1200 m up gains g h / c^2 = 1.624 m/s^2 * 1200 m / c^2 = 0.00187 us/day
    // (g = GM/R^2 of DE440's GM), within the degree-2 field's 0.0008 us/day; against TCL the
    // same minus L_L = 3.1398e-11 (2.71279 us/day).
    let height_us_day = 1.624 * 1200.0 / 299_792_458.0_f64.powi(2) * 86_400e6;
    let tl = num(&span["tl"]["mean_us_per_day"]);
    assert!((tl - height_us_day).abs() < 0.0008, "{tl}");
    let tcl = num(&span["tcl"]["mean_us_per_day"]);
    assert!((tcl - (height_us_day - 2.712_79)).abs() < 0.0008, "{tcl}");
    assert!(answer["lunar"]["tl_warning"]
        .as_str()
        .is_some_and(|w| w.contains("proposal")));
}

/// At an epoch: the instantaneous rate, its anomalistic-month mean and the periodic part
/// (their difference, by definition), and the simultaneity term kept apart (scales minus
/// clocks, by definition); against TCG the TT rate minus L_G (IAU 2000 Resolution B1.9).
#[tokio::test]
async fn south_pole_clock_at_an_epoch() {
    let server = TestServer::start().await;
    let answer = first(&server, south_pole(json!({"epoch": "2026-03-14T06:30:00"}))).await;
    let at = &answer["lunar"]["at_epoch"];
    assert_eq!(at["epoch_tdb"], "2026-03-14T06:31:09 TDB");
    for scale in ["tt", "tcg", "tcl", "tl"] {
        let a = &at[scale];
        let periodic = num(&a["us_per_day"]) - num(&a["month_mean_us_per_day"]);
        assert!((periodic - num(&a["periodic_us_per_day"])).abs() < 1e-9);
        // The monthly rate swing stays below 0.13 us/day (physics::moon::tests).
        assert!(num(&a["periodic_us_per_day"]).abs() < 0.13, "{scale}: {a}");
    }
    let tt = num(&at["tt"]["fractional"]);
    assert!((tt - num(&at["tcg"]["fractional"]) - 6.969_290_134e-10).abs() < 1e-18);
    let simultaneity =
        num(&at["tl_against_tt_scales_us_per_day"]) - num(&at["tl_against_tt_clocks_us_per_day"]);
    assert!((simultaneity - num(&at["simultaneity_us_per_day"])).abs() < 1e-9);
    // The TT rate at the epoch is the item's rate.
    assert!((num(&answer["fractional"]["total"]) - tt).abs() < 1e-24);
}

/// Without epoch and span: the old circular-orbit model, named so.
#[tokio::test]
async fn without_epoch_the_circular_model_is_named() {
    let server = TestServer::start().await;
    let answer = first(&server, south_pole(json!({}))).await;
    assert_eq!(answer["lunar_model"], "circular_orbit");
    assert!(answer.get("lunar").is_none());
}

/// Bad input: 422 problem+json naming the field.
#[tokio::test]
async fn bad_lunar_input_is_named() {
    let server = TestServer::start().await;
    let cases = [
        (
            json!({"epoch": "1950-01-01T00:00:00", "epoch_scale": "TT"}),
            "outside_ephemeris_span",
            "items[0].lunar_site.epoch",
        ),
        (
            json!({"epoch": "2102-06-01T00:00:00", "epoch_scale": "TT"}),
            "outside_ephemeris_span",
            "items[0].lunar_site.epoch",
        ),
        (
            json!({"epoch": "2101-12-01T00:00:00", "epoch_scale": "TT"}),
            "outside_lunar_time_span",
            "items[0].lunar_site.epoch",
        ),
        (
            json!({"epoch": "1959-06-01T00:00:00", "epoch_scale": "TT"}),
            "outside_lunar_time_span",
            "items[0].lunar_site.epoch",
        ),
        (
            json!({"epoch": "2026-13-01T00:00:00"}),
            "impossible_date",
            "items[0].lunar_site.epoch",
        ),
        (
            json!({"epoch": "2026-03-01T00:00:00", "epoch_scale": "XYZ"}),
            "unknown_scale",
            "items[0].lunar_site.epoch_scale",
        ),
        (
            json!({"span": {"start": "2026-03-02T00:00:00", "end": "2026-03-01T00:00:00"}}),
            "invalid_value",
            "items[0].lunar_site.span",
        ),
        (
            json!({"span": {"start": "2026-03-01T00:00:00", "end": "2040-03-01T00:00:00"}}),
            "beyond_model_range",
            "items[0].lunar_site.span",
        ),
        (
            json!({"span": {"start": "1958-03-01T00:00:00", "end": "1960-03-01T00:00:00"}, "epoch_scale": "TT"}),
            "outside_ephemeris_span",
            "items[0].lunar_site.span.start",
        ),
        (
            json!({"epoch": "2026-03-01T00:00:00", "height_m": -12000.0}),
            "below_surface",
            "items[0].lunar_site.height_m",
        ),
        (
            json!({"epoch": "2026-03-01T00:00:00", "height_m": 100001.0}),
            "beyond_model_range",
            "items[0].lunar_site.height_m",
        ),
        (
            json!({"epoch": "2026-03-01T00:00:00", "latitude_deg": 91.0}),
            "latitude_out_of_range",
            "items[0].lunar_site.latitude_deg",
        ),
        (
            json!({"epoch": "2026-03-01T00:00:00", "longitude_deg": 1e300}),
            "angle_out_of_range",
            "items[0].lunar_site.longitude_deg",
        ),
    ];
    for (extra, code, field) in cases {
        let answer = post_json(&server, "/v1/clock/rate", &south_pole(extra.clone())).await;
        let problem = assert_problem(&answer, 422, code);
        assert_eq!(problem["field"], field, "{extra}: {problem}");
    }
}

/// The demo request of the invented Skua lander (demo-data/requests) answers with the DE440
/// model, the epoch and the span (Ashby & Patla 2024 plus the site's share as above for the
/// month's mean; measured 56.0303).
#[tokio::test]
async fn demo_request_answers() {
    let server = TestServer::start().await;
    let request: Value = serde_json::from_str(include_str!(
        "../demo-data/requests/rate_skua_lunar_clock.json"
    ))
    .unwrap_or_default();
    let answer = first(&server, request).await;
    assert_eq!(answer["lunar_model"], "de440_ephemeris");
    assert!(answer["lunar"]["at_epoch"].is_object());
    let mean = num(&answer["lunar"]["over_span"]["tt"]["mean_us_per_day"]);
    assert!((mean - 56.02 - SITE_SHARE_US_DAY).abs() < 0.01, "{mean}");
}

/// At most 100 lunar sites with an epoch or a span per request (each integrates the DE440
/// orbit): 101 are refused with 422 `batch_too_large` naming `items`.
#[tokio::test]
async fn too_many_lunar_items_are_refused() {
    let server = TestServer::start().await;
    let item = json!({"lunar_site": {"latitude_deg": 0.0, "longitude_deg": 0.0,
        "epoch": "2026-03-01T00:00:00"}});
    let request = json!({"items": vec![item; 101]});
    let answer = post_json(&server, "/v1/clock/rate", &request).await;
    let problem = assert_problem(&answer, 422, "batch_too_large");
    assert_eq!(problem["field"], "items");
}

/// `POST /v1/clock/compare` takes the lunar clock too: against a clock on the geoid (rate 0
/// against TT by the definition of TT, IAU 2000 Resolution B1.9) the difference is the lunar
/// clock's own rate against TT.
#[tokio::test]
async fn lunar_clock_compared_with_a_geoid_clock() {
    let server = TestServer::start().await;
    let lunar = json!({"lunar_site": {"latitude_deg": -89.5, "longitude_deg": 36.0,
        "height_m": 1200.0, "epoch": "2026-03-14T06:30:00"}});
    let request = json!({"clock_a": lunar,
        "clock_b": {"ground_site": {"latitude_deg": 46.1, "longitude_deg": 11.2, "height_m": 0.0,
            "height_reference": "geoid"}}});
    let (status, _, body) = post_json(&server, "/v1/clock/compare", &request).await;
    assert_eq!(status, 200, "{body}");
    let a = num(&body["clock_a"]["fractional"]["total"]);
    let b = num(&body["clock_b"]["fractional"]["total"]);
    assert!(b.abs() < 1e-18, "{b}");
    assert!((num(&body["a_minus_b"]["fractional"]) - a).abs() < 1e-18);
    assert_eq!(body["clock_a"]["lunar_model"], "de440_ephemeris");
}
