//! The JSON ephemeris has one type (`trajectory::json::JsonEphemeris`, which reads every body)
//! and a schema-only twin in the API (`EphemerisInput`, which documents it). This holds the two
//! to the same members: each documented object's properties and required members are exactly
//! the fields serde reads (taken from serde itself, not restated here).

use eigenzeit::api::proper_time::types::ProperTimeBodyOptions;
use eigenzeit::trajectory::json::{JsonEphemeris, JsonObject, JsonState};
use serde::de::{self, Deserialize, Deserializer, Visitor};

/// A deserializer that only records the field names a struct asks for.
struct FieldNames(Vec<&'static str>);

#[derive(Debug)]
struct Stop;

impl std::fmt::Display for Stop {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.write_str("field names recorded")
    }
}

impl std::error::Error for Stop {}

impl de::Error for Stop {
    fn custom<T: std::fmt::Display>(_: T) -> Self {
        Stop
    }
}

impl<'de> Deserializer<'de> for &mut FieldNames {
    type Error = Stop;

    fn deserialize_any<V: Visitor<'de>>(self, _: V) -> Result<V::Value, Stop> {
        Err(Stop)
    }

    fn deserialize_struct<V: Visitor<'de>>(
        self,
        _: &'static str,
        fields: &'static [&'static str],
        _: V,
    ) -> Result<V::Value, Stop> {
        self.0.extend_from_slice(fields);
        Err(Stop)
    }

    serde::forward_to_deserialize_any! {
        bool i8 i16 i32 i64 i128 u8 u16 u32 u64 u128 f32 f64 char str string bytes byte_buf
        option unit unit_struct newtype_struct seq tuple tuple_struct map enum identifier
        ignored_any
    }
}

fn fields_of<T: for<'de> Deserialize<'de>>() -> Vec<String> {
    let mut names = FieldNames(Vec::new());
    let _ = T::deserialize(&mut names);
    let mut names: Vec<String> = names.0.iter().map(|n| n.to_string()).collect();
    names.sort();
    names
}

fn documented(schema: &str) -> (Vec<String>, Vec<String>) {
    let document: serde_json::Value =
        serde_json::from_str(&eigenzeit::ops::openapi::document_json()).unwrap_or_default();
    let object = &document["components"]["schemas"][schema];
    let mut properties: Vec<String> = object["properties"]
        .as_object()
        .map(|p| p.keys().cloned().collect())
        .unwrap_or_default();
    properties.sort();
    let mut required: Vec<String> = object["required"]
        .as_array()
        .map(|r| {
            r.iter()
                .filter_map(|v| v.as_str().map(str::to_string))
                .collect()
        })
        .unwrap_or_default();
    required.sort();
    assert_eq!(
        object["additionalProperties"], false,
        "{schema}: unknown members are refused"
    );
    (properties, required)
}

#[test]
fn the_documented_json_ephemeris_is_the_type_that_reads_it() {
    for (schema, fields, optional) in [
        (
            "EphemerisInput",
            fields_of::<JsonEphemeris<ProperTimeBodyOptions>>(),
            &["center", "epoch_format", "options"][..],
        ),
        ("EphemerisObjectInput", fields_of::<JsonObject>(), &[][..]),
        (
            "EphemerisStateInput",
            fields_of::<JsonState>(),
            &["velocity_m_s"][..],
        ),
    ] {
        assert!(!fields.is_empty(), "{schema}");
        let (properties, required) = documented(schema);
        assert_eq!(
            properties, fields,
            "{schema}: documented members vs the fields read"
        );
        let expected_required: Vec<String> = fields
            .iter()
            .filter(|f| !optional.contains(&f.as_str()))
            .cloned()
            .collect();
        assert_eq!(required, expected_required, "{schema}: required members");
    }
}

#[test]
fn the_documented_example_reads() {
    // The example the document shows (and client generators copy) is a body the type accepts.
    let document: serde_json::Value =
        serde_json::from_str(&eigenzeit::ops::openapi::document_json()).unwrap_or_default();
    let example = document["components"]["schemas"]["EphemerisInput"]["example"].clone();
    let read: Result<JsonEphemeris<ProperTimeBodyOptions>, _> = serde_json::from_value(example);
    assert!(read.is_ok(), "{read:?}");
}
