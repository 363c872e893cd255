//! The OpenAPI 3.1 document, generated from the handlers and types.

use serde_json::{json, Value};
use utoipa::openapi::extensions::Extensions;
use utoipa::openapi::schema::{AllOfBuilder, Object, Schema};
use utoipa::openapi::RefOr;
use utoipa::{Modify, OpenApi};

/// The API description. Every handler and schema is listed here; a test keeps the committed
/// `openapi/openapi.json` equal to what this produces.
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
        crate::api::signal::path::signal_path,
        crate::api::signal::two_way::two_way,
        crate::ops::health::healthz,
        crate::ops::health::readyz,
        crate::ops::health::metrics,
    ),
    components(schemas(
        crate::api::error::Problem,
        // Schemas that query parameters refer to (bodies register theirs themselves).
        crate::api::names::ScaleName,
        crate::api::names::TargetScaleList,
        crate::api::names::InstantFormatName,
        crate::api::names::InstantString,
        crate::api::names::ThreeNumbersText,
    )),
    modifiers(&CrossFieldRules),
    tags(
        (name = "time", description = "Time scales: conversions, the scales, the leap-second table"),
        (name = "clock", description = "Clock rates against TT or TCG: state vectors, orbits, ground and lunar sites; comparisons between clocks"),
        (name = "signal", description = "Signal paths: light time with Sagnac, Shapiro and clock terms; two-way time-transfer Sagnac correction"),
        (name = "operations", description = "Liveness, readiness, metrics")
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

/// The document as pretty-printed JSON (what `/openapi.json` serves and `eigenzeit openapi` prints).
pub fn document_json() -> String {
    ApiDoc::openapi()
        .to_pretty_json()
        .unwrap_or_else(|e| format!("{{\"error\": \"{e}\"}}"))
}
