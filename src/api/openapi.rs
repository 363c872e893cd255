//! The OpenAPI 3.1 document, generated from the handlers and types.

use serde_json::{json, Value};
use utoipa::openapi::extensions::Extensions;
use utoipa::openapi::schema::{AllOfBuilder, Object, Schema};
use utoipa::openapi::RefOr;
use utoipa::{Modify, OpenApi};

/// The API description. Every handler and schema of this layer is listed here; the service
/// adds its own operations (`crate::ops::openapi`), and a test keeps the committed
/// `openapi/openapi.json` equal to the whole document.
#[derive(OpenApi)]
#[openapi(
    info(
        title = "eigenzeit",
        description = "Relativistic clock and time-scale answers: time-scale conversions with picosecond care, clock rate offsets, proper time along ephemerides, signal-path corrections. Not certified for safety-of-life use; the governing interface specifications prevail.",
        license(name = "MIT OR Apache-2.0", identifier = "MIT OR Apache-2.0")
    ),
    paths(
        crate::api::time::convert::convert_get,
        crate::api::time::convert::convert_post,
        crate::api::time::reference::scales,
        crate::api::time::reference::leap_seconds,
        crate::api::time::reference::now,
        crate::api::clock::rate::rate,
        crate::api::clock::compare::compare,
        crate::api::proper_time::proper_time,
        crate::api::signal::path::signal_path,
        crate::api::signal::two_way::two_way,
        crate::api::earth::eop::eop,
        crate::api::earth::orientation::orientation_get,
        crate::api::earth::orientation::orientation_post,
        crate::api::solar_system::state::body_state,
    ),
    components(schemas(
        crate::api::error::Problem,
        // Schemas that query parameters refer to (bodies register theirs themselves).
        crate::api::names::ScaleName,
        crate::api::names::TargetScaleList,
        crate::api::names::FormList,
        crate::api::names::InstantFormatName,
        crate::api::names::InstantString,
        crate::api::names::ThreeNumbersText,
        crate::api::earth::types::UtcIsoInstant,
        crate::api::solar_system::types::BodyName,
    )),
    modifiers(&CrossFieldRules),
    tags(
        (name = "time", description = "Time scales: conversions, the scales, the leap-second table"),
        (name = "clock", description = "Clock rates against TT or TCG: state vectors, orbits, ground and lunar sites; comparisons between clocks"),
        (name = "signal", description = "Signal paths: light time with Sagnac, Shapiro and clock terms; two-way time-transfer Sagnac correction"),
        (name = "earth", description = "Earth orientation: the IERS EOP table in force (UT1 - UTC, polar motion, celestial pole offsets, length of day) and its values at an instant; the Earth rotation angle, sidereal times, CIP and the GCRS <-> ITRS rotation (IAU 2006/2000A) at an instant"),
        (name = "solar-system", description = "The solar system: positions and velocities of the Sun, the Moon, the Earth and the planets' barycentres (ICRF axes, TDB argument) from the planetary ephemeris in force (built in: JPL DE440, 1959-2101)")
    )
)]
pub struct ApiDoc;

/// Rules between the fields of one object that the derived schemas cannot state: which fields
/// exclude each other. Each is a JSON Schema `oneOf` or `not` added with `allOf` to the derived
/// object schema, so the document admits exactly the combinations the handlers accept (a
/// field given as `null` counts as absent, as in the handlers).
pub fn cross_field_rules() -> Vec<(&'static str, Value)> {
    let present =
        |kind: &str, name: &str| json!({"required": [name], "properties": {name: {"type": kind}}});
    let subjects =
        ["state", "orbit", "ground_site", "lunar_site"].map(|name| present("object", name));
    let anomalies = [
        "true_anomaly_deg",
        "mean_anomaly_deg",
        "eccentric_anomaly_deg",
    ];
    let mut anomaly_pairs = Vec::new();
    for (index, first) in anomalies.iter().enumerate() {
        for second in anomalies.iter().skip(index + 1) {
            anomaly_pairs.push(json!({
                "required": [first, second],
                "properties": {*first: {"type": "number"}, *second: {"type": "number"}}
            }));
        }
    }
    vec![
        // Exactly one subject per clock (422 subject_missing, subject_ambiguous).
        ("RateItem", json!({"oneOf": subjects})),
        // At most one anomaly (422 anomaly_ambiguous).
        ("OrbitInput", json!({"not": {"anyOf": anomaly_pairs}})),
        // A ground site, or a frame and a position (422 invalid_endpoint).
        (
            "PathEndpointInput",
            json!({"oneOf": [
                {"required": ["ground_site"], "properties": {
                    "ground_site": {"type": "object"}, "frame": {"type": "null"},
                    "position_m": {"type": "null"}, "velocity_m_s": {"type": "null"}}},
                {"required": ["frame", "position_m"], "properties": {
                    "frame": {"type": "string"}, "position_m": {"type": "array"},
                    "ground_site": {"type": "null"}}}
            ]}),
        ),
        // An ITRF position, or a latitude and a longitude (422 invalid_observer).
        (
            "ObserverInput",
            json!({"oneOf": [
                {"required": ["itrf_position_m"], "properties": {
                    "itrf_position_m": {"type": "array"}, "latitude_deg": {"type": "null"},
                    "longitude_deg": {"type": "null"}, "height_m": {"type": "null"}}},
                {"required": ["latitude_deg", "longitude_deg"], "properties": {
                    "latitude_deg": {"type": "number"}, "longitude_deg": {"type": "number"},
                    "itrf_position_m": {"type": "null"}}}
            ]}),
        ),
    ]
}

/// Adds [`cross_field_rules`] to the component schemas.
struct CrossFieldRules;

impl Modify for CrossFieldRules {
    fn modify(&self, openapi: &mut utoipa::openapi::OpenApi) {
        let Some(components) = openapi.components.as_mut() else {
            return;
        };
        for (name, rule) in cross_field_rules() {
            let Some(derived) = components.schemas.remove(name) else {
                continue;
            };
            let description = match &derived {
                RefOr::T(Schema::Object(object)) => object.description.clone(),
                _ => None,
            };
            // The rule's keywords (`oneOf`, `not`) written as they are: utoipa's schema types
            // have no field for a `oneOf` beside nothing else.
            let mut rule_schema = Object::new();
            if let Value::Object(keywords) = rule {
                rule_schema.extensions = Some(keywords.into_iter().collect::<Extensions>());
            }
            let combined = AllOfBuilder::new()
                .item(derived)
                .item(Schema::Object(rule_schema))
                .description(description)
                .build();
            components
                .schemas
                .insert(name.to_string(), RefOr::T(Schema::AllOf(combined)));
        }
    }
}

#[cfg(test)]
mod tests {
    use std::collections::BTreeMap;

    use utoipa::openapi::schema::Schema;
    use utoipa::openapi::RefOr;
    use utoipa::ToSchema;

    use super::*;

    fn collect<T: ToSchema>(found: &mut Vec<(String, RefOr<Schema>)>) {
        found.push((T::name().into_owned(), T::schema()));
        T::schemas(found);
    }

    #[test]
    fn component_names_are_unique() {
        // utoipa keeps the last of two schemas with one name: two request types named alike
        // would silently document one shape for both (common practice: one name, one schema).
        let mut found = Vec::new();
        collect::<crate::api::time::types::ConvertBatchRequest>(&mut found);
        collect::<crate::api::time::types::ConversionBatch>(&mut found);
        collect::<crate::api::clock::types::RateRequest>(&mut found);
        collect::<crate::api::clock::types::CompareRequest>(&mut found);
        collect::<crate::api::clock::answer::RateBatchAnswer>(&mut found);
        collect::<crate::api::clock::answer::CompareAnswer>(&mut found);
        collect::<crate::api::signal::types::SignalPathRequest>(&mut found);
        collect::<crate::api::signal::types::SignalPathAnswer>(&mut found);
        collect::<crate::api::signal::types::TwoWayRequest>(&mut found);
        collect::<crate::api::signal::types::TwoWayAnswer>(&mut found);
        collect::<crate::api::proper_time::types::EphemerisInput>(&mut found);
        collect::<crate::api::proper_time::types::ProperTimeAnswer>(&mut found);
        let mut by_name: BTreeMap<String, RefOr<Schema>> = BTreeMap::new();
        for (name, schema) in found {
            if let Some(previous) = by_name.insert(name.clone(), schema.clone()) {
                assert!(previous == schema, "two different schemas are named {name}");
            }
        }
        let document = ApiDoc::openapi();
        let components = document.components.map(|c| c.schemas).unwrap_or_default();
        for name in by_name.keys() {
            assert!(
                components.contains_key(name),
                "{name} is not in the document"
            );
        }
    }

    #[test]
    fn cross_field_rules_are_applied() {
        // Each rule names a component of the document (common practice).
        let document = serde_json::to_value(ApiDoc::openapi()).unwrap_or_default();
        for (name, rule) in cross_field_rules() {
            let parts = &document["components"]["schemas"][name]["allOf"];
            assert_eq!(parts.as_array().map(Vec::len), Some(2), "{name}");
            let keyword = rule.as_object().and_then(|o| o.keys().next().cloned());
            let keyword = keyword.unwrap_or_default();
            assert_eq!(parts[1][&keyword], rule[&keyword], "{name}");
        }
    }

    #[test]
    fn bounds_follow_the_code() {
        // The document's numbers are literals in attributes; they must equal the constants the
        // handlers check (IERS-based geodesy constants in crate::physics, common practice).
        let document = serde_json::to_value(ApiDoc::openapi()).unwrap_or_default();
        let schemas = &document["components"]["schemas"];
        let orbit = &schemas["OrbitInput"]["allOf"][0]["properties"]["semi_major_axis_m"];
        assert_eq!(
            orbit["minimum"].as_f64(),
            Some(crate::physics::rate::state::MIN_GCRS_DISTANCE_M)
        );
        assert_eq!(
            orbit["maximum"].as_f64(),
            Some(crate::physics::constants::MAX_GEOCENTRIC_DISTANCE_M)
        );
        let frequency = &schemas["RateRequest"]["properties"]["nominal_frequency_hz"];
        assert_eq!(
            frequency["maximum"].as_f64(),
            Some(crate::physics::rate::frequency::MAX_NOMINAL_FREQUENCY_HZ)
        );
        let batch_limit = crate::api::state::Limits::default().batch_limit as u64;
        let epochs = &schemas["ConvertBatchRequest"]["properties"]["epochs"];
        assert_eq!(epochs["maxItems"].as_u64(), Some(batch_limit));
        let items = &schemas["RateRequest"]["properties"]["items"];
        assert_eq!(items["maxItems"].as_u64(), Some(batch_limit));
        let states = &schemas["EphemerisObjectInput"]["properties"]["states"];
        assert_eq!(states["maxItems"].as_u64(), Some(batch_limit));
        let step = &schemas["ProperTimeOptions"]["properties"]["step_s"];
        assert_eq!(
            step["maximum"].as_f64(),
            Some(crate::api::proper_time::types::MAX_OPTION_SECONDS)
        );
        let span_days =
            crate::physics::time::formats::LAST_MJD - crate::physics::time::formats::FIRST_MJD + 1;
        assert_eq!(
            crate::api::proper_time::types::MAX_OPTION_SECONDS,
            span_days as f64 * 86_400.0
        );
    }
}
