//! The clock-rate endpoints through the real server. Each check names its source.

mod common;

use common::{assert_problem, post_json, TestServer};
use serde_json::{json, Value};

/// IS-GPS-200: nominal semi-major axis of the navigation MEO orbit, m.
const NAV_A_M: f64 = 26_561_750.0;
/// IERS Conventions (2010) table 1.1: GM of the Earth (TCG-compatible), the service's GM.
const GM_M3_S2: f64 = 3.986_004_418e14;

async fn rate_of(server: &TestServer, request: Value) -> Vec<Value> {
    let (status, _, body) = post_json(server, "/v1/clock/rate", &request).await;
    assert_eq!(status, 200, "{body}");
    body["results"].as_array().cloned().unwrap_or_default()
}

async fn one(server: &TestServer, item: Value) -> Value {
    let results = rate_of(server, json!({ "items": [item] })).await;
    assert_eq!(results.len(), 1);
    results[0].clone()
}

fn num(value: &Value) -> f64 {
    value
        .as_f64()
        .unwrap_or_else(|| panic!("not a number: {value}"))
}

fn circular_orbit(a_m: f64) -> Value {
    json!({"orbit": {"semi_major_axis_m": a_m, "eccentricity": 0.0}})
}

fn geoid_site(latitude_deg: f64, height_m: f64) -> Value {
    // At the longitude of the invented Tessaro station of the demo scenario.
    json!({"ground_site": {"latitude_deg": latitude_deg, "longitude_deg": 11.2,
        "height_m": height_m, "height_reference": "geoid"}})
}

#[tokio::test]
async fn navigation_orbit_rate_and_factory_setting() {
    let server = TestServer::start().await;
    let mut item = circular_orbit(NAV_A_M);
    item["nominal_frequency_hz"] = json!(10.23e6);
    let result = one(&server, item).await;
    assert_eq!(result["subject"], "orbit");
    assert_eq!(result["reference"], "TT");
    assert_eq!(result["gravity_model"], "point_mass");
    let us = &result["us_per_day"];
    // IS-GPS-200 / common practice: velocity part about -7.2 us/day.
    assert!((num(&us["sr"]) + 7.2).abs() < 0.05, "{us}");
    // IS-GPS-200 / common practice: gravity part about +45.7 us/day relative to the geoid.
    assert!((num(&us["gr"]) - 45.7).abs() < 0.1, "{us}");
    // IS-GPS-200 / common practice: total about +38.6 us/day, fractional +4.4647e-10.
    assert!((num(&us["total"]) - 38.6).abs() < 0.05, "{us}");
    let total = num(&result["fractional"]["total"]);
    assert!((total - 4.4647e-10).abs() < 0.00005e-10, "{total:e}");
    // IS-GPS-200 3.3.1.1: 10.23 MHz is set to 10.22999999543 MHz, within the digits given
    // (+-0.5e-5 Hz). IS-GPS-200 uses mu = 3.986005e14; the service uses the IERS Conventions
    // (2010) GM, 1.5e-7 lower, which moves the factory setting by 4e-10 Hz (3.7e-17 * f0):
    // far inside the tolerance, which is set by the published digits, not by the GM.
    let setting = num(&result["frequency"]["factory_setting_hz"]);
    assert!((setting - 10_229_999.995_43).abs() < 0.5e-5, "{setting}");
    // IS-GPS-200 3.3.1.1: the offset is 4.5674e-3 Hz (from memory).
    let offset = num(&result["frequency"]["offset_hz"]);
    assert!((offset - 4.5674e-3).abs() < 0.0001e-3, "{offset}");
    assert!(
        result["periodic"]["amplitude_s"] == 0.0,
        "circular orbit: e = 0"
    );
}

#[tokio::test]
async fn eccentric_orbit_periodic_term() {
    let server = TestServer::start().await;
    let orbit = |anomaly: Value| {
        let mut orbit = json!({"semi_major_axis_m": NAV_A_M, "eccentricity": 0.01});
        if let (Some(object), Some(extra)) = (orbit.as_object_mut(), anomaly.as_object()) {
            object.extend(extra.clone());
        }
        json!({ "orbit": orbit })
    };
    let plain = one(&server, orbit(json!({}))).await;
    let amplitude = num(&plain["periodic"]["amplitude_s"]);
    // IS-GPS-200 formula |F| e sqrt(A); common practice: about 23 ns for e = 0.01.
    assert!((amplitude - 23.0e-9).abs() < 0.5e-9, "{amplitude:e}");
    // IS-GPS-200 20.3.3.3.3.1: F = -4.442807633e-10 s/m^0.5 with mu = 3.986005e14; the
    // service's IERS GM gives an amplitude lower by 7.3e-8 of itself (sqrt of the GM ratio).
    let from_f = 4.442_807_633e-10 * 0.01 * NAV_A_M.sqrt();
    assert!(
        (amplitude / from_f - 1.0).abs() < 1e-7,
        "{amplitude:e} vs {from_f:e}"
    );
    assert!(plain["periodic"].get("value_at_state_s").is_none());
    // IS-GPS-200 20.3.3.3.3.1: dt_r = F e sqrt(A) sin E: -amplitude at E = 90 deg, 0 at E = 0.
    let at_90 = one(&server, orbit(json!({"eccentric_anomaly_deg": 90.0}))).await;
    let value = num(&at_90["periodic"]["value_at_state_s"]);
    assert!((value + amplitude).abs() < 1e-20, "{value:e}");
    let at_perigee = one(&server, orbit(json!({"mean_anomaly_deg": 0.0}))).await;
    assert!(num(&at_perigee["periodic"]["value_at_state_s"]).abs() < 1e-24);
    // The eccentricity does not change the mean rate (Ashby (2003) eq. (38): <v^2>/2 = GM/(2a),
    // <GM/r> = GM/a for any e).
    let circular = one(&server, circular_orbit(NAV_A_M)).await;
    assert_eq!(plain["fractional"], circular["fractional"]);
    // Echoed inclination; it does not change the first-order rate (point-mass orbit).
    let inclined = one(
        &server,
        json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.01, "inclination_deg": 55.0}}),
    )
    .await;
    assert_eq!(inclined["inclination_deg"], 55.0);
    assert_eq!(inclined["fractional"], plain["fractional"]);
}

#[tokio::test]
async fn ground_clocks_higher_run_faster() {
    let server = TestServer::start().await;
    let results = rate_of(
        &server,
        json!({"items": [geoid_site(45.0, 0.0), geoid_site(45.0, 1.0), geoid_site(45.0, 1000.0),
            {"ground_site": {"latitude_deg": 45.0, "longitude_deg": 8.5, "height_m": 0.0}, "gravity_model": "grs80"},
            {"ground_site": {"latitude_deg": 45.0, "longitude_deg": 8.5, "height_m": 1.0}, "gravity_model": "grs80"},
            {"ground_site": {"latitude_deg": 45.0, "longitude_deg": 8.5, "height_m": 0.0}}]}),
    )
    .await;
    let total = |i: usize| num(&results[i]["fractional"]["total"]);
    // Definition of TT (IAU 2000 Resolution B1.9, L_G = W0/c^2): a clock on the geoid has rate 0.
    assert!(total(0).abs() < 1e-18, "{:e}", total(0));
    assert_eq!(results[0]["gravity_model"], "grs80_normal_gravity");
    // Common practice: one metre higher runs faster by g/c^2 = 1.09e-16.
    let per_metre = total(1) - total(0);
    assert!((per_metre - 1.09e-16).abs() < 0.005e-16, "{per_metre:e}");
    // Common practice: 1 km higher gains about 1.09e-13 (9.4 ns/day).
    assert!(total(2) > total(1) && (total(2) - total(0) - 1.09e-13).abs() < 0.005e-13);
    // The GRS80 normal field for ellipsoidal heights: its vertical gradient is g as well
    // (common practice, 1.09e-16 per metre), and on the ellipsoid it equals the geoid answer
    // at the same height (N = 0; Heiskanen & Moritz 1967 h = H + N).
    assert_eq!(results[3]["gravity_model"], "grs80");
    assert!((total(3) - total(0)).abs() < 1e-23, "{:e}", total(3));
    let per_metre_j2 = total(4) - total(3);
    assert!(
        (per_metre_j2 - 1.09e-16).abs() < 0.005e-16,
        "{per_metre_j2:e}"
    );
    // The default for ellipsoidal heights is the EGM2008 field: the ellipsoid point lies N
    // below the geoid there, N about +47 m in northern Italy (from memory of the EGM2008 geoid
    // of Europe: 45 to 50 m), so the clock runs slow by about N g / c^2 = 5e-15.
    assert_eq!(results[5]["gravity_model"], "egm2008");
    let undulation_m = -(total(5) - total(3)) * 299_792_458f64.powi(2) / 9.806;
    println!("EGM2008 geoid at 45 N 8.5 E: {undulation_m:.1} m");
    assert!((40.0..55.0).contains(&undulation_m), "{undulation_m}");
}

#[tokio::test]
async fn low_orbits_are_slow_geostationary_fast() {
    let server = TestServer::start().await;
    let results = rate_of(
        &server,
        json!({"items": [circular_orbit(6_778_137.0), circular_orbit(NAV_A_M),
            circular_orbit(42_164_000.0)]}),
    )
    .await;
    let us = |i: usize| num(&results[i]["us_per_day"]["total"]);
    // Common practice: a 400 km orbit loses about 25 us/day against TT; MEO (IS-GPS-200) and
    // GEO (a = 42 164 km, common practice) gain, GEO more.
    assert!(us(0) < -20.0 && us(0) > -30.0, "LEO {}", us(0));
    assert!(us(1) > 38.0 && us(2) > us(1), "MEO {} GEO {}", us(1), us(2));
}

#[tokio::test]
async fn a_state_on_the_orbit_gives_the_orbit_rate() {
    let server = TestServer::start().await;
    // Circular orbit: speed sqrt(GM/a) (vis-viva) in an inclined direction, GM of IERS
    // Conventions (2010): the instantaneous rate equals the mean rate (Ashby (2003) eq. (38)).
    let speed = (GM_M3_S2 / NAV_A_M).sqrt();
    let state = json!({"state": {"frame": "GCRS", "position_m": [0.0, NAV_A_M, 0.0],
        "velocity_m_s": [-speed * 0.6, 0.0, speed * 0.8]}});
    let results = rate_of(&server, json!({"items": [state, circular_orbit(NAV_A_M)]})).await;
    for part in ["sr", "gr", "total"] {
        let (s, o) = (
            num(&results[0]["fractional"][part]),
            num(&results[1]["fractional"][part]),
        );
        assert!((s - o).abs() < 1e-22, "{part}: {s:e} vs {o:e}");
    }
    assert_eq!(results[0]["subject"], "state");
    assert!(num(&results[0]["periodic"]["value_at_state_s"]).abs() < 1e-20);
    // An eccentric orbit at E = 90 deg (two-body relations, Vallado algorithm 5 from memory):
    // the state's periodic value and osculating amplitude equal the orbit's.
    let (a, e) = (NAV_A_M, 0.01f64);
    let b = a * (1.0 - e * e).sqrt();
    let e_dot = (GM_M3_S2 / a.powi(3)).sqrt(); // at E = 90 deg, 1 - e cos E = 1
    let state = json!({"state": {"frame": "GCRS", "position_m": [-a * e, b, 0.0],
        "velocity_m_s": [-a * e_dot, 0.0, 0.0]}});
    let orbit = json!({"orbit": {"semi_major_axis_m": a, "eccentricity": e, "eccentric_anomaly_deg": 90.0}});
    let results = rate_of(&server, json!({"items": [state, orbit]})).await;
    let (sp, op) = (&results[0]["periodic"], &results[1]["periodic"]);
    let value = num(&sp["value_at_state_s"]);
    assert!(
        (value - num(&op["value_at_state_s"])).abs() < 1e-9 * value.abs(),
        "{sp} {op}"
    );
    let amplitude = num(&sp["amplitude_s"]);
    assert!(
        (amplitude - num(&op["amplitude_s"])).abs() < 1e-9 * amplitude,
        "{sp} {op}"
    );
}

#[tokio::test]
async fn lunar_site_and_references() {
    let server = TestServer::start().await;
    let lunar = one(
        &server,
        json!({"lunar_site": {"latitude_deg": -89.5, "longitude_deg": 0.0}}),
    )
    .await;
    // Ashby & Patla (2024), Astron. J. 168, 112: about +56 us/day against TT (from memory).
    let us = num(&lunar["us_per_day"]["total"]);
    assert!(us > 56.0 && us < 57.0, "{us}");
    assert!(lunar["model_notes"]
        .as_array()
        .is_some_and(|n| n.len() >= 3));
    assert!(lunar.get("periodic").is_none());
    // IERS Conventions (2010) eq. 10.1: relative to TCG the gravity part loses L_G = 6.969290134e-10.
    let results = rate_of(
        &server,
        json!({"items": [circular_orbit(NAV_A_M), {"orbit": {"semi_major_axis_m": NAV_A_M,
            "eccentricity": 0.0}, "reference": "TCG"}], "reference": "TT"}),
    )
    .await;
    assert_eq!(results[1]["reference"], "TCG");
    let l_g = num(&results[0]["fractional"]["gr"]) - num(&results[1]["fractional"]["gr"]);
    assert!((l_g - 6.969_290_134e-10).abs() < 1e-22, "{l_g:e}");
}

#[tokio::test]
async fn compare_navigation_clock_with_ground_clock() {
    let server = TestServer::start().await;
    let request = json!({"clock_a": circular_orbit(NAV_A_M), "clock_b": geoid_site(46.1, 0.0)});
    let (status, _, body) = post_json(&server, "/v1/clock/compare", &request).await;
    assert_eq!(status, 200, "{body}");
    let difference = &body["a_minus_b"];
    // IS-GPS-200 / common practice: a navigation clock gains about 38.6 us/day on a clock on the
    // geoid (rate 0 against TT by definition).
    assert!(
        (num(&difference["us_per_day"]) - 38.6).abs() < 0.05,
        "{difference}"
    );
    assert!((num(&difference["ns_per_day"]) - 1e3 * num(&difference["us_per_day"])).abs() < 1e-6);
    let expected =
        num(&body["clock_a"]["fractional"]["total"]) - num(&body["clock_b"]["fractional"]["total"]);
    // (serde_json's default float reading may be 1 ulp off, hence the 1e-24.)
    assert!(
        (num(&difference["fractional"]) - expected).abs() < 1e-24,
        "{difference}"
    );
    // Swapped: B gains on A by the opposite amount.
    let swapped = json!({"clock_a": geoid_site(46.1, 0.0), "clock_b": circular_orbit(NAV_A_M)});
    let (_, _, back) = post_json(&server, "/v1/clock/compare", &swapped).await;
    let back_fractional = num(&back["a_minus_b"]["fractional"]);
    assert!(
        (back_fractional + num(&difference["fractional"])).abs() < 1e-24,
        "{back}"
    );
    // Mixed references are refused: the difference would carry L_G.
    let mut mixed = request.clone();
    mixed["clock_b"]["reference"] = json!("TCG");
    let answer = post_json(&server, "/v1/clock/compare", &mixed).await;
    assert_eq!(
        assert_problem(&answer, 422, "reference_mismatch")["field"],
        "clock_b.reference"
    );
    // A bad value in B is named with its full path.
    let mut bad = request.clone();
    bad["clock_b"]["ground_site"]["latitude_deg"] = json!(91.0);
    let answer = post_json(&server, "/v1/clock/compare", &bad).await;
    let problem = assert_problem(&answer, 422, "latitude_out_of_range");
    assert_eq!(problem["field"], "clock_b.ground_site.latitude_deg");
}

#[tokio::test]
async fn ten_thousand_items_in_one_request() {
    let server = TestServer::start().await;
    // Common practice (batch contract of the OpenAPI document): 10 000 mixed items, answered in order.
    let items: Vec<Value> = (0..10_000)
        .map(|i| match i % 4 {
            0 => circular_orbit(7.0e6 + 1000.0 * f64::from(i)),
            1 => geoid_site(f64::from(i % 180) - 89.5, f64::from(i % 3000)),
            2 => json!({"state": {"frame": "ITRF", "position_m": [6_378_137.0 + f64::from(i), 0.0, 0.0],
                "velocity_m_s": [0.0, 0.0, 0.0]}}),
            _ => json!({"lunar_site": {"latitude_deg": f64::from(i % 90), "longitude_deg": 10.0}}),
        })
        .collect();
    let results = rate_of(
        &server,
        json!({"items": items, "nominal_frequency_hz": 10.0e6}),
    )
    .await;
    assert_eq!(results.len(), 10_000);
    let subjects = ["orbit", "ground_site", "state", "lunar_site"];
    for (i, result) in results.iter().enumerate() {
        assert_eq!(result["subject"], subjects[i % 4], "item {i}");
        assert!(result["frequency"]["factory_setting_hz"].is_number());
    }
    // Item 4001 alone gives the same answer as inside the batch.
    let alone = one(&server, items_4001()).await;
    assert_eq!(alone["fractional"], results[4001]["fractional"]);
}

fn items_4001() -> Value {
    geoid_site(f64::from(4001 % 180) - 89.5, f64::from(4001 % 3000))
}

#[tokio::test]
async fn settings_resolve_item_over_request_over_default() {
    let server = TestServer::start().await;
    let results = rate_of(
        &server,
        json!({"items": [
            circular_orbit(NAV_A_M),
            {"state": {"frame": "ITRF", "position_m": [7.0e6, 0.0, 0.0], "velocity_m_s": [0.0, 7546.05, 0.0]}},
            {"state": {"frame": "ITRF", "position_m": [7.0e6, 0.0, 0.0], "velocity_m_s": [0.0, 7546.05, 0.0]}, "gravity_model": "point_mass"},
            {"lunar_site": {"latitude_deg": 0.0, "longitude_deg": 0.0}}
        ], "gravity_model": "j2"}),
    )
    .await;
    // Orbits offer only the point-mass mean rate; a request-level j2 is noted, not applied.
    assert_eq!(results[0]["gravity_model"], "point_mass");
    let notes = results[0]["model_notes"].to_string();
    assert!(notes.contains("request-level gravity_model j2"), "{notes}");
    // A state takes the request's j2 unless the item says otherwise (ITRF: the z axis is the pole); at the equator of a 7000 km
    // orbit J2 raises U by GM J2 (a_E/r)^2 / (2r) (IERS Conventions (2010) table 1.1), so the
    // clock runs slower by that over c^2, about 2.8e-13 (computed from the formula).
    assert_eq!(results[1]["gravity_model"], "j2");
    assert_eq!(results[2]["gravity_model"], "point_mass");
    let j2_term = GM_M3_S2 * 1.082_635_9e-3 * (6_378_136.6f64 / 7.0e6).powi(2)
        / (2.0 * 7.0e6)
        / 299_792_458.0f64.powi(2);
    let shift = num(&results[2]["fractional"]["gr"]) - num(&results[1]["fractional"]["gr"]);
    assert!((shift - j2_term).abs() < 1e-20, "{shift:e} vs {j2_term:e}");
    assert_eq!(results[3]["gravity_model"], "point_mass");
}

#[tokio::test]
async fn a_site_at_the_geostationary_radius_ticks_as_a_geostationary_orbit() {
    // A point co-rotating with the Earth above the equator at the geostationary radius
    // (42 164 172 m, where omega_E^2 r^3 = GM: common practice) moves exactly as a circular
    // geostationary orbit, so both answers agree up to the Earth's flattening terms that the
    // point-mass orbit leaves out (J2 at r: about 1.3e-15, 1.2e-4 us/day; IERS Conventions
    // (2010) table 1.1). The free-air height series used before answered over 9 000 us/day.
    let server = TestServer::start().await;
    let site = json!({"ground_site": {"latitude_deg": 0.0, "longitude_deg": -61.0,
        "height_m": 42_164_172.0 - 6_378_137.0, "height_reference": "geoid"}});
    let results = rate_of(
        &server,
        json!({"items": [site, circular_orbit(42_164_172.0)]}),
    )
    .await;
    let us = |i: usize| num(&results[i]["us_per_day"]["total"]);
    eprintln!("site {} orbit {}", us(0), us(1));
    assert!(
        (us(0) - us(1)).abs() < 2e-4,
        "site {} orbit {}",
        us(0),
        us(1)
    );
}

#[tokio::test]
async fn a_gcrs_state_with_j2_is_taken_about_the_cip_at_its_epoch() {
    let server = TestServer::start().await;
    // Without its epoch a GCRS state with a zonal model is refused, naming the field.
    let request = json!({"items": [{"state": {"frame": "GCRS", "position_m": [7.0e6, 0.0, 0.0],
        "velocity_m_s": [0.0, 7546.05, 0.0]}, "gravity_model": "j2"}]});
    let answer = common::post_json(&server, "/v1/clock/rate", &request).await;
    let body = common::assert_problem(&answer, 422, "epoch_required");
    assert_eq!(body["field"], "items[0].state.epoch");
    // A position on the true equator (perpendicular to the CIP at the epoch, from the
    // orientation library, itself checked against ERFA) has the equatorial J2 potential, as the
    // same radius on the ITRF equator (IERS Conventions (2010) eq. 6.6 at degree 2).
    use eigenzeit::physics::earth::orientation::{fast::celestial_pole_fast, JulianDate};
    // 2026-05-20T00:01:09.184 TT = 2026-05-20T00:00:00 UTC (TT - UTC = 69.184 s, IERS Bulletin C).
    let tt = JulianDate::new(2_461_180.5, 69.184 / 86_400.0);
    let k = celestial_pole_fast(tt).unit_vector_gcrs();
    let across = {
        let v = [k[1], -k[0], 0.0];
        let n = (v[0] * v[0] + v[1] * v[1]).sqrt();
        [v[0] / n * 7.0e6, v[1] / n * 7.0e6, 0.0]
    };
    let results = rate_of(
        &server,
        json!({"items": [
            {"state": {"frame": "GCRS", "position_m": across, "velocity_m_s": [0.0, 0.0, 0.0],
                "epoch": "2026-05-20T00:00:00", "epoch_scale": "UTC"}, "gravity_model": "j2"},
            {"state": {"frame": "ITRF", "position_m": [7.0e6, 0.0, 0.0], "velocity_m_s": [0.0, 0.0, 0.0]},
                "gravity_model": "j2"},
            {"state": {"frame": "GCRS", "position_m": [7.0e6, 0.0, 0.0], "velocity_m_s": [0.0, 0.0, 0.0],
                "epoch": "2026-05-20T00:00:00"}, "gravity_model": "j2"}
        ]}),
    )
    .await;
    let gr = |i: usize| num(&results[i]["fractional"]["gr"]);
    assert!((gr(0) - gr(1)).abs() < 1e-22, "{:e} vs {:e}", gr(0), gr(1));
    // [7e6, 0, 0] of the GCRS is off the true equator by X: its J2 term is smaller by
    // (3/2) X^2 of the equatorial one, which the check must see.
    let j2_term = GM_M3_S2 * 1.082_635_9e-3 * (6_378_136.6f64 / 7.0e6).powi(2)
        / (2.0 * 7.0e6)
        / 299_792_458.0f64.powi(2);
    let expected = 3.0 * j2_term * k[0] * k[0];
    assert!(
        ((gr(2) - gr(1)) - expected).abs() < 0.01 * expected,
        "{:e} vs {expected:e}",
        gr(2) - gr(1)
    );
    assert!(expected > 1e-19, "{expected:e}");
}

#[tokio::test]
async fn orbit_with_j2_answers_its_j2_terms() {
    let server = TestServer::start().await;
    let point_mass = one(
        &server,
        json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0, "inclination_deg": 20.0}}),
    )
    .await;
    let with_j2 = one(
        &server,
        json!({"orbit": {"semi_major_axis_m": NAV_A_M, "eccentricity": 0.0, "inclination_deg": 20.0,
            "argument_of_latitude_deg": 45.0}, "gravity_model": "j2"}),
    )
    .await;
    assert_eq!(with_j2["gravity_model"], "j2");
    let j2 = &with_j2["j2"];
    // Kouba (2004) GPS Solutions 8:170-180: (3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i),
    // 107.2 ps times sin^2(20 deg) = 12.5 ps; period half the orbit, 5.98 h.
    let amplitude_s = j2["periodic_amplitude_s"].as_f64().unwrap();
    assert!(
        (amplitude_s - 12.54e-12).abs() < 0.05e-12,
        "{amplitude_s:e}"
    );
    assert!((j2["periodic_period_s"].as_f64().unwrap() / 3600.0 - 5.98).abs() < 0.01);
    assert_eq!(j2["periodic_value_s"].as_f64().unwrap(), -amplitude_s);
    // The mean change -4<U_J2>/c^2 (derivation in physics::clock_data) is the difference of
    // the two totals; about -1.7e-14 at i = 20 deg.
    let change = j2["mean_rate_change"].as_f64().unwrap();
    let difference = with_j2["fractional"]["total"].as_f64().unwrap()
        - point_mass["fractional"]["total"].as_f64().unwrap();
    assert!(
        (difference - change).abs() < 1e-20,
        "{difference:e} {change:e}"
    );
    assert!((change + 1.72e-14).abs() < 0.02e-14, "{change:e}");
}
