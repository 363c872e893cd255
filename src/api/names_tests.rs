//! Tests of `api::names`.

use super::*;
use crate::physics::constants::EARTH_ROTATION_RAD_S;

#[test]
fn names_are_exact() {
    // The canonical spellings of the DESIGN contract (common practice: one spelling per value).
    assert_eq!(Scale::from_name("UTC"), Some(Scale::Utc));
    assert_eq!(Scale::from_name("utc"), None);
    assert_eq!(Scale::from_name(" UTC"), None);
    assert_eq!(
        InstantFormat::from_name("gnss_week"),
        Some(InstantFormat::GnssWeek)
    );
    assert_eq!(InstantFormat::from_name("ISO"), None);
    assert_eq!(one_of("geoid", &[("geoid", 1), ("ellipsoid", 2)]), Some(1));
    assert_eq!(one_of("Geoid", &[("geoid", 1), ("ellipsoid", 2)]), None);
}

#[test]
fn velocity_bound_is_above_what_the_rotation_can_add() {
    // IERS Conventions (2010) table 1.1 (omega_E) and the geocentric range of the rate model:
    // a component above the bound is above c in the inertial frame, hence refused.
    let most_added_m_s = EARTH_ROTATION_RAD_S * MAX_GEOCENTRIC_DISTANCE_M;
    assert!(VELOCITY_COMPONENT_BOUND_M_S > SPEED_OF_LIGHT_M_S + most_added_m_s);
}

#[test]
fn patterns_match_what_the_engine_reads() {
    // The instant grammar of the OpenAPI document (`InstantString`), common practice.
    let instant = whole_match(&instant_pattern());
    for text in [
        "2026-03-14T06:30:00.123456789012",
        "2026-073T06:30:00",
        "2026-03-14 06:30",
        "2026-03-14Z",
        "61113.5",
        "-.5",
        "5.",
        "2409:541818",
        "2409:+0.5",
        "2016-12-31T23:59:60.5",
        "2024-366T23:59:59",
    ] {
        assert!(instant(text), "{text} should match");
    }
    for text in [
        "",
        "2026-3-14",
        "2026-03-14T",
        "2026-13-01",
        "2026-03-32",
        "2026-000",
        "2026-367",
        "2026-03-14T24:00:00",
        "2026-03-14T12:59:60",
        "1e5",
        "1:-5",
        "2409:1:2",
        ".",
        "+",
    ] {
        assert!(!instant(text), "{text} should not match");
    }
    let list = whole_match(&scale_list_pattern());
    assert!(list("TAI,TT,all"));
    assert!(!list("TAI, TT") && !list("tai") && !list("TAI,"));
    let numbers = whole_match(&three_numbers_pattern());
    assert!(numbers("4027894.0,307045.0,4.9e6"));
    assert!(!numbers("1,2") && !numbers("1, 2, 3"));
    let frame = whole_match(&ephemeris_frame_pattern());
    for text in ["GCRF", "EME2000", "ITRF", "ITRF2020", "IGS20", "WGS-84"] {
        assert!(frame(text) && ephemeris_frame_named(text), "{text}");
    }
    for text in ["gcrf", " GCRF", "TEME", "itrf2014", ""] {
        assert!(!frame(text) && !ephemeris_frame_named(text), "{text}");
    }
}

/// A matcher for `pattern` (its anchors make it a whole-text match).
fn whole_match(pattern: &str) -> impl Fn(&str) -> bool {
    let regex = regex::Regex::new(pattern).unwrap_or_else(|e| panic!("{pattern}: {e}"));
    move |text| regex.is_match(text)
}
