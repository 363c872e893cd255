use super::*;
use crate::physics::constants::{
    EARTH_ROTATION_RAD_S, GM_EARTH_M3_S2, GRS80_SEMI_MAJOR_AXIS_M, SPEED_OF_LIGHT_SQUARED_M2_S2,
};

fn station(latitude_deg: f64, longitude_deg: f64, height_m: f64) -> Station {
    Station {
        latitude_deg,
        longitude_deg,
        height_m,
    }
}

#[test]
fn geostationary_radius_follows_from_gm_and_omega() {
    // Kepler's third law with IERS Conventions (2010) table 1.1 GM and omega_E; 42 164 km is the
    // commonly quoted value (common practice).
    let radius_m = (GM_EARTH_M3_S2 / EARTH_ROTATION_RAD_S.powi(2)).cbrt();
    assert!(
        (radius_m - GEOSTATIONARY_RADIUS_M).abs() < 1.0,
        "{radius_m}"
    );
}

#[test]
fn stations_on_the_sub_satellite_meridian_need_no_correction() {
    // ITU-R TF.1153 area rule: the quadrilateral geocentre - A - S - B has zero projected area
    // when A, B and S lie in one meridian plane.
    let link =
        TwoWayLink::geostationary(station(40.0, 15.0, 300.0), station(-30.0, 15.0, 0.0), 15.0);
    let sagnac = two_way_sagnac(&link).unwrap();
    assert!(sagnac.two_way_s.abs() < 1e-20, "{}", sagnac.two_way_s);
    assert!(sagnac.leg_a_s.abs() < 1e-20 && sagnac.leg_b_s.abs() < 1e-20);
}

#[test]
fn stations_symmetric_about_the_sub_satellite_point() {
    // Hand value from 2 omega A / c^2 (ITU-R TF.1153), A = r_A r_S sin(30 deg)/2:
    // leg = omega a r_S sin(30 deg) / c^2 = 109.1 ns for station A 30 deg west of the satellite.
    // The two legs are opposite, so the two-way correction is 2 leg (not 0: the A -> S -> B
    // signal runs eastward all the way, with the rotation).
    let link = TwoWayLink::geostationary(station(0.0, -10.0, 0.0), station(0.0, 50.0, 0.0), 20.0);
    let sagnac = two_way_sagnac(&link).unwrap();
    let hand_s = EARTH_ROTATION_RAD_S * GRS80_SEMI_MAJOR_AXIS_M * GEOSTATIONARY_RADIUS_M * 0.5
        / SPEED_OF_LIGHT_SQUARED_M2_S2;
    assert!(
        (sagnac.leg_a_s - hand_s).abs() < 1e-15,
        "{} vs {hand_s}",
        sagnac.leg_a_s
    );
    assert!((sagnac.leg_b_s + hand_s).abs() < 1e-15);
    assert!((sagnac.two_way_s - 2.0 * hand_s).abs() < 1e-15);
    assert!((109.0e-9..109.2e-9).contains(&hand_s), "{hand_s}");
    // Swapping the stations flips the sign (antisymmetry of the area; definition).
    let swapped = TwoWayLink::geostationary(link.station_b, link.station_a, 20.0);
    assert_eq!(
        two_way_sagnac(&swapped).unwrap().two_way_s,
        -sagnac.two_way_s
    );
}

#[test]
fn area_rule_gives_207_ns_around_the_equator() {
    // Sagnac delay of a signal taken once around the equator eastward: 2 omega pi a^2 / c^2 =
    // 207.4 ns (common practice, from memory: "207 ns"). A 3600-sided polygon has
    // an area smaller than the circle's by 5e-7 relative.
    let sides = 3600;
    let point = |k: usize| {
        let angle = (k as f64) * std::f64::consts::TAU / (sides as f64);
        [
            GRS80_SEMI_MAJOR_AXIS_M * angle.cos(),
            GRS80_SEMI_MAJOR_AXIS_M * angle.sin(),
            0.0,
        ]
    };
    let total_s: f64 = (0..sides)
        .map(|k| sagnac_rotating_frame_s(point(k), point(k + 1)))
        .sum();
    assert!((total_s - 207.4e-9).abs() < 0.1e-9, "{total_s}");
}

#[test]
fn transatlantic_link_is_a_couple_hundred_ns() {
    // Loose sanity check only (from memory): intercontinental two-way links need Sagnac
    // corrections of tens to about two hundred ns. The invented stations Ashgrove (46.3 N,
    // 69.6 W, in open woodland) and Tessaro (46.1 N, 11.2 E) of the demo scenario, relay at 30 W.
    let link = TwoWayLink::geostationary(
        station(46.3, -69.6, 300.0),
        station(46.1, 11.2, 1050.0),
        -30.0,
    );
    let sagnac = two_way_sagnac(&link).unwrap();
    assert!(
        (50e-9..300e-9).contains(&sagnac.two_way_s.abs()),
        "{}",
        sagnac.two_way_s
    );
    assert!(sagnac.elevation_a_deg > 0.0 && sagnac.elevation_b_deg > 0.0);
}

#[test]
fn bad_links_name_the_field() {
    // Input validation (common practice): a satellite below the horizon (geostationary: beyond
    // about 81 deg of central angle), a radius inside the Earth, a bad latitude.
    let near = station(0.0, 0.0, 0.0);
    let far = station(0.0, 100.0, 0.0);
    let cases = [
        (
            TwoWayLink::geostationary(near, far, 0.0),
            "not_visible",
            "station_b",
        ),
        (
            TwoWayLink::geostationary(far, near, 0.0),
            "not_visible",
            "station_a",
        ),
        (
            TwoWayLink {
                satellite_radius_m: 6.0e6,
                ..TwoWayLink::geostationary(near, near, 0.0)
            },
            "invalid_value",
            "satellite_radius_m",
        ),
        (
            TwoWayLink {
                satellite_radius_m: f64::NAN,
                ..TwoWayLink::geostationary(near, near, 0.0)
            },
            "invalid_value",
            "satellite_radius_m",
        ),
        (
            TwoWayLink::geostationary(station(91.0, 0.0, 0.0), near, 0.0),
            "invalid_value",
            "station_a.latitude_deg",
        ),
        (
            TwoWayLink::geostationary(near, station(0.0, 0.0, -20_000.0), 0.0),
            "invalid_value",
            "station_b.height_m",
        ),
        (
            TwoWayLink::geostationary(near, near, f64::INFINITY),
            "invalid_value",
            "satellite_longitude_deg",
        ),
    ];
    for (link, code, field) in cases {
        let error = two_way_sagnac(&link).unwrap_err();
        assert_eq!((error.code, error.field.as_str()), (code, field), "{error}");
    }
}
