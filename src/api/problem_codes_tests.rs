//! Tests of `api::problem_codes`.

use super::*;
use crate::physics::time::error::TimeError;
use std::collections::HashSet;

#[test]
fn codes_are_unique_well_formed_and_explained() {
    // Common practice: a stable code is a unique, non-empty identifier; RFC 9457 section 3.1.1
    // lets `type` be a URI reference, so the code must be valid in a URL fragment and an HTML id.
    let mut seen = HashSet::new();
    for (code, meaning) in PROBLEM_CODES {
        assert!(!code.is_empty(), "empty code (meaning {meaning:?})");
        assert!(
            code.bytes()
                .all(|b| b.is_ascii_lowercase() || b.is_ascii_digit() || b == b'_'),
            "code {code:?} must be lowercase ASCII letters, digits and _"
        );
        assert!(seen.insert(*code), "code {code:?} is listed twice");
        assert!(!meaning.trim().is_empty(), "code {code:?} needs a meaning");
    }
}

#[test]
fn every_time_engine_code_is_listed() {
    // The codes of src/physics/time/error.rs (the time engine's own error type).
    let errors = [
        TimeError::UnknownScale("X".into()),
        TimeError::UnknownFormat("x".into()),
        TimeError::malformed("a number", "x"),
        TimeError::ImpossibleDate("x".into()),
        TimeError::InvalidLeapSecond("x".into()),
        TimeError::FormatNotForScale {
            format: "unix_s",
            scale: "TT",
            allowed: "UTC",
        },
        TimeError::BeforeUtc("x".into()),
        TimeError::OutOfRange("x".into()),
    ];
    for error in errors {
        assert!(
            meaning(error.code()).is_some(),
            "time engine code {:?} is missing from PROBLEM_CODES",
            error.code()
        );
    }
}

#[test]
fn every_physics_code_is_listed() {
    // The codes of the physics error kinds (the one place each is written) all have a row.
    let codes = TimeErrorKind::NAMES
        .iter()
        .chain(&RateErrorKind::NAMES)
        .chain(&SignalErrorKind::NAMES)
        .chain(&ProperTimeErrorKind::NAMES)
        .chain(&EopLookupErrorKind::NAMES)
        .chain(&EphemerisErrorKind::NAMES);
    for code in codes {
        assert!(
            meaning(code).is_some(),
            "{code:?} is missing from PROBLEM_CODES"
        );
    }
}

#[test]
fn unknown_name_meanings_list_the_vocabulary() {
    // The meaning of each "unknown name" code names every spelling the parser reads.
    use crate::physics::rate::{Frame, GravityModel, HeightReference, RateReference};
    use crate::physics::time::formats::InstantFormat;
    use crate::physics::time::scale::Scale;
    use crate::physics::vocabulary::Vocabulary;
    fn check<V: Vocabulary>(code: &str) {
        let text = meaning(code).unwrap_or_default();
        for name in V::SPELLINGS {
            assert!(text.contains(name), "{code}: {name} is not in {text:?}");
        }
    }
    check::<Scale>("unknown_scale");
    check::<InstantFormat>("unknown_format");
    check::<RateReference>("unknown_reference");
    check::<GravityModel>("unknown_gravity_model");
    check::<Frame>("unknown_frame");
    check::<HeightReference>("unknown_height_reference");
    check::<crate::physics::signal::TransmitterMotion>("unknown_motion");
    check::<crate::physics::solar_system::Body>("unknown_body");
    check::<crate::physics::time::tdb_model::TdbModel>("unknown_tdb_model");
    check::<crate::physics::clock_data::series::ClockConvention>("unknown_convention");
}

#[test]
fn documented_422_lists_name_the_physics_codes() {
    // Each operation's 422 description names the codes its physics computation answers, and
    // every `snake_case` word it names that is a code is in PROBLEM_CODES.
    let document: serde_json::Value =
        serde_json::to_value(<crate::api::openapi::ApiDoc as utoipa::OpenApi>::openapi())
            .unwrap_or_default();
    let described = |method: &str, path: &str| {
        document["paths"][path][method]["responses"]["422"]["description"]
            .as_str()
            .unwrap_or_default()
            .to_string()
    };
    let words = |text: &str| -> Vec<String> {
        text.split(|c: char| !(c.is_ascii_alphanumeric() || c == '_'))
            .map(str::to_string)
            .collect()
    };
    let expect = |method: &str, path: &str, codes: &[&str]| {
        let text = described(method, path);
        let named = words(&text);
        for code in codes {
            assert!(
                named.iter().any(|word| word == code),
                "{method} {path}: the 422 description does not name {code}"
            );
        }
    };
    let rate: Vec<&str> = RateErrorKind::ALL
        .iter()
        .filter(|kind| **kind != RateErrorKind::InvalidValue)
        .map(|kind| kind.code())
        .collect();
    expect("post", "/v1/clock/rate", &rate);
    expect("get", "/v1/time/convert", &TimeErrorKind::NAMES);
    let stability: Vec<&str> = StabilityErrorKind::NAMES
        .iter()
        .copied()
        .chain(["unknown_data_kind", "unknown_deviation"])
        .collect();
    expect("post", "/v1/clock/stability", &stability);
    let path: Vec<&str> = SignalErrorKind::ALL
        .iter()
        .filter(|kind| **kind != SignalErrorKind::NotVisible)
        .map(|kind| kind.as_str())
        .collect();
    expect("post", "/v1/signal/path", &path);
    expect(
        "post",
        "/v1/signal/two-way",
        &[
            SignalErrorKind::NotVisible.as_str(),
            SignalErrorKind::InvalidValue.as_str(),
        ],
    );
    // `too_few_epochs` cannot reach the endpoint: the readers require two states.
    // Earth-fixed tracks outside the EOP table: eop_before_table, eop_after_table; the Sun
    // and Moon tides asked for beyond the planetary ephemeris: outside_ephemeris_span.
    let proper_time: Vec<&str> = ProperTimeErrorKind::ALL
        .iter()
        .filter(|kind| **kind != ProperTimeErrorKind::TooFewEpochs)
        .map(|kind| kind.as_str())
        .chain([
            EopLookupErrorKind::BeforeTable.as_str(),
            EopLookupErrorKind::AfterTable.as_str(),
            EphemerisErrorKind::OutsideSpan.as_str(),
            TimeErrorKind::OutsideTdbModelSpan.as_str(),
            crate::api::names::UNKNOWN_TDB_MODEL,
        ])
        .collect();
    expect("post", "/v1/clock/proper-time", &proper_time);
    // `eop_not_finite` and `eop_bad_utc` cannot reach the endpoint: the instant is read and
    // checked against the leap-second table before the lookup.
    expect(
        "get",
        "/v1/earth/eop",
        &[
            EopLookupErrorKind::BeforeTable.as_str(),
            EopLookupErrorKind::AfterTable.as_str(),
        ],
    );
    let orientation = [
        EopLookupErrorKind::BeforeTable.as_str(),
        EopLookupErrorKind::AfterTable.as_str(),
        TimeErrorKind::UnknownScale.as_str(),
        TimeErrorKind::UnknownFormat.as_str(),
    ];
    expect("get", "/v1/earth/orientation", &orientation);
    expect(
        "post",
        "/v1/earth/orientation",
        &["empty_batch", "batch_too_large"],
    );
    let paths = document["paths"].as_object().cloned().unwrap_or_default();
    let mut checked = 0;
    for (path, operations) in paths {
        for (method, operation) in operations.as_object().cloned().unwrap_or_default() {
            let text = operation["responses"]["422"]["description"]
                .as_str()
                .unwrap_or_default()
                .to_string();
            for word in words(&text) {
                let is_code_like = word.contains('_')
                    && word
                        .bytes()
                        .all(|b| b.is_ascii_lowercase() || b == b'_' || b.is_ascii_digit());
                // Field and format names the descriptions mention beside the codes.
                let known_field = [
                    "clock_b",
                    "ground_site",
                    "latitude_deg",
                    "position_m",
                    "unix_s",
                    "gnss_week",
                    "tau_s",
                    "times_s",
                    "tau0_s",
                    "week_counter",
                    "week_near",
                    "rinex_clock",
                    "tdb_model",
                    "observer_itrf_m",
                    "selenocentric_observer_m",
                ];
                if is_code_like && !known_field.contains(&word.as_str()) && meaning(&word).is_none()
                {
                    panic!("{method} {path}: {word} is not a listed problem code");
                }
            }
            checked += usize::from(!text.is_empty());
        }
    }
    assert!(checked >= 7, "only {checked} documented 422 lists found");
}

#[test]
fn meaning_finds_listed_codes_only() {
    // Common practice: lookup returns the row's own text, and nothing for an unlisted code.
    assert!(meaning("not_found").is_some_and(|m| m.contains("path")));
    assert_eq!(meaning("no_such_code_here"), None);
}
