//! The Sun and Moon tides in `POST /v1/clock/rate` (gravity model `j2_sun_moon`), through the
//! real server. Each check names its source.

mod common;

use common::{assert_problem, get_json, post_json, TestServer};
use serde_json::{json, Value};

const GM_SUN_M3_S2: f64 = 1.327_124_400_412_794_2e20; // DE440 table (Park et al. 2021)
const GM_MOON_M3_S2: f64 = 4.902_800_118e12; // DE440 table (Park et al. 2021)
const C2: f64 = 299_792_458.0 * 299_792_458.0;

fn num(value: &Value) -> f64 {
    value
        .as_f64()
        .unwrap_or_else(|| panic!("not a number: {value}"))
}

fn vector(value: &Value) -> [f64; 3] {
    [0, 1, 2].map(|i| num(&value[i]))
}

/// The tide of one body by its Legendre series to degree 8 (generating function of the
/// Legendre polynomials), independent of the service's closed form.
fn legendre_tide_m2_s2(gm: f64, body: [f64; 3], x: [f64; 3]) -> f64 {
    let norm = |a: [f64; 3]| (a[0] * a[0] + a[1] * a[1] + a[2] * a[2]).sqrt();
    let (d, r) = (norm(body), norm(x));
    let mu = (body[0] * x[0] + body[1] * x[1] + body[2] * x[2]) / (d * r);
    let (mut p_prev, mut p, mut sum) = (1.0, mu, 0.0);
    for l in 1..8 {
        let next = ((2 * l + 1) as f64 * mu * p - l as f64 * p_prev) / (l + 1) as f64;
        p_prev = p;
        p = next;
        sum += (r / d).powi(l + 1) * p;
    }
    gm / d * sum
}

/// A GEO and a navigation-MEO clock (invented states) at an epoch given in TT: the rate with
/// j2_sun_moon less the rate with j2 (same state, same pole) must be -w/c^2 with w evaluated
/// here from GET /v1/solar-system/state at the same TT instant (IAU 2000 Resolution B1.3;
/// IERS Conventions (2010) eq. 10.6), to 1e-18 (issue 11). The default for a state with an
/// epoch is j2_sun_moon and the answer names it.
#[tokio::test]
async fn geo_and_meo_tides_match_an_independent_evaluation() {
    let server = TestServer::start().await;
    let epoch = "2026-03-20T06:30:00";
    let body_at = |body: &'static str| {
        let server = &server;
        async move {
            let (status, _, answer) = get_json(
                server,
                &format!("/v1/solar-system/state?body={body}&center=earth&at={epoch}&scale=TT"),
            )
            .await;
            assert_eq!(status, 200, "{answer}");
            vector(&answer["position_m"])
        }
    };
    let (sun, moon) = (body_at("sun").await, body_at("moon").await);
    let geo = [30_000_000.0, 29_600_000.0, 0.0];
    // The MEO clock on the line to the Moon (the tide's largest there).
    let d = (moon[0] * moon[0] + moon[1] * moon[1] + moon[2] * moon[2]).sqrt();
    let meo = moon.map(|c| c * 26_561_750.0 / d);
    let state = |p: [f64; 3], model: Option<&str>| {
        let mut item = json!({"state": {"frame": "GCRS", "position_m": p,
            "velocity_m_s": [-2_150.0, 2_180.0, 0.0], "epoch": epoch, "epoch_scale": "TT"}});
        if let Some(model) = model {
            item["gravity_model"] = json!(model);
        }
        item
    };
    let request = json!({"items": [
        state(geo, None), state(geo, Some("j2")),
        state(meo, Some("j2_sun_moon")), state(meo, Some("j2")),
    ]});
    let (status, _, body) = post_json(&server, "/v1/clock/rate", &request).await;
    assert_eq!(status, 200, "{body}");
    let results = body["results"].as_array().cloned().unwrap_or_default();
    let total = |i: usize| num(&results[i]["fractional"]["total"]);
    assert_eq!(results[0]["gravity_model"], "j2_sun_moon", "{}", results[0]);
    assert!(results[0]["model_notes"]
        .to_string()
        .contains("Resolution B1.3"));
    for (i, x) in [(0, geo), (2, meo)] {
        let w =
            legendre_tide_m2_s2(GM_SUN_M3_S2, sun, x) + legendre_tide_m2_s2(GM_MOON_M3_S2, moon, x);
        let service = total(i) - total(i + 1);
        println!("tide {i}: service {service:e}, independent {:e}", -w / C2);
        assert!(
            (service + w / C2).abs() < 1e-18,
            "{service:e} vs {:e}",
            -w / C2
        );
        // Not a vanishing term (else the check could not fail): above 1e-16 at these states.
        assert!(w.abs() / C2 > 1e-16, "{:e}", w / C2);
    }
}

/// Bad input (common practice, RFC 9457): j2_sun_moon without an epoch, at an epoch beyond
/// the ephemeris, or for a ground site (which has no epoch): 422 naming the field.
#[tokio::test]
async fn tides_without_a_usable_epoch_are_refused() {
    let server = TestServer::start().await;
    let item = |epoch: Option<&str>| {
        let mut state = json!({"frame": "GCRS", "position_m": [42_164_000.0, 0.0, 0.0],
            "velocity_m_s": [0.0, 3_074.0, 0.0]});
        if let Some(epoch) = epoch {
            state["epoch"] = json!(epoch);
            state["epoch_scale"] = json!("TT");
        }
        json!({"items": [{"state": state, "gravity_model": "j2_sun_moon"}]})
    };
    let answer = post_json(&server, "/v1/clock/rate", &item(None)).await;
    let problem = assert_problem(&answer, 422, "epoch_required");
    assert_eq!(problem["field"], "items[0].state.epoch");
    let answer = post_json(
        &server,
        "/v1/clock/rate",
        &item(Some("2150-01-01T00:00:00")),
    )
    .await;
    let problem = assert_problem(&answer, 422, "outside_ephemeris_span");
    assert_eq!(problem["field"], "items[0].state.epoch");
    assert!(problem["detail"].to_string().contains("2102"), "{problem}");
    let ground = json!({"items": [{"ground_site": {"latitude_deg": 46.1, "longitude_deg": 11.2,
        "height_m": 1050.0}, "gravity_model": "j2_sun_moon"}]});
    let answer = post_json(&server, "/v1/clock/rate", &ground).await;
    let problem = assert_problem(&answer, 422, "beyond_model_range");
    assert_eq!(problem["field"], "items[0].gravity_model");
}

/// A request-level j2_sun_moon does not reach an orbit (no epoch): point_mass, and the answer
/// says so (the request-level rule of the other zonal models; common practice).
#[tokio::test]
async fn a_request_level_tide_model_is_named_as_not_applied_to_orbits() {
    let server = TestServer::start().await;
    let request = json!({"gravity_model": "j2_sun_moon",
        "items": [{"orbit": {"semi_major_axis_m": 26_561_750.0, "eccentricity": 0.01}}]});
    let (status, _, body) = post_json(&server, "/v1/clock/rate", &request).await;
    assert_eq!(status, 200, "{body}");
    let result = &body["results"][0];
    assert_eq!(result["gravity_model"], "point_mass", "{result}");
    assert!(
        result["model_notes"]
            .to_string()
            .contains("j2_sun_moon does not apply"),
        "{result}"
    );
}
