//! Conversions serialized straight from their read-once digits: the same JSON as the
//! documented answer types (`Conversion`, `ConversionBatch`), without building a `String` per
//! form first. The documented types stay the schema; the tests below hold the two to the same
//! bytes.

use axum::http::StatusCode;
use serde::ser::{SerializeMap, SerializeSeq};
use serde::{Serialize, Serializer};

use super::conversion::Converted;
use super::forms::FormSelection;
use crate::api::error::ApiError;
use crate::physics::time::decimal::format_attos_as_seconds;
use crate::physics::time::format_name::InstantFormat;
use crate::physics::time::formats::InstantDigits;
use crate::physics::time::instant::attos_to_seconds_f64;

/// The fields of `InstantForms`, in the order that type declares (and so serializes) them.
const FIELD_ORDER: [InstantFormat; 6] = [
    InstantFormat::Iso,
    InstantFormat::Mjd,
    InstantFormat::Jd,
    InstantFormat::J2000S,
    InstantFormat::UnixS,
    InstantFormat::GnssWeek,
];

/// Writes `scale` and the selected forms of one instant into an open map.
fn forms_entries<M: SerializeMap>(
    map: &mut M,
    digits: &InstantDigits,
    forms: &FormSelection,
) -> Result<(), M::Error> {
    map.serialize_entry("scale", digits.scale().as_str())?;
    let mut buffer = Vec::with_capacity(48);
    for form in FIELD_ORDER {
        if !forms.forms().contains(&form) {
            continue;
        }
        buffer.clear();
        if digits.push_form(form, &mut buffer) {
            // The writers emit ASCII digits, signs, `-`, `:`, `.` and `T` only.
            map.serialize_entry(form.as_str(), std::str::from_utf8(&buffer).unwrap_or(""))?;
        }
    }
    Ok(())
}

struct FormsJson<'a>(&'a InstantDigits, &'a FormSelection);

impl Serialize for FormsJson<'_> {
    fn serialize<S: Serializer>(&self, serializer: S) -> Result<S::Ok, S::Error> {
        let mut map = serializer.serialize_map(None)?;
        forms_entries(&mut map, self.0, self.1)?;
        map.end()
    }
}

struct ResultsJson<'a>(&'a Converted, &'a FormSelection);

impl Serialize for ResultsJson<'_> {
    fn serialize<S: Serializer>(&self, serializer: S) -> Result<S::Ok, S::Error> {
        let mut seq = serializer.serialize_seq(Some(self.0.results.len()))?;
        for result in &self.0.results {
            seq.serialize_element(&TargetJson(result, self.1))?;
        }
        seq.end()
    }
}

struct TargetJson<'a>(&'a super::conversion::ConvertedTarget, &'a FormSelection);

impl Serialize for TargetJson<'_> {
    fn serialize<S: Serializer>(&self, serializer: S) -> Result<S::Ok, S::Error> {
        let mut map = serializer.serialize_map(None)?;
        forms_entries(&mut map, &self.0.digits, self.1)?;
        let difference = self.0.difference_attos;
        map.serialize_entry("difference_s", &attos_to_seconds_f64(difference))?;
        map.serialize_entry("difference_exact_s", &format_attos_as_seconds(difference))?;
        map.end()
    }
}

/// One conversion as JSON (the shape of `Conversion`).
pub struct ConversionJson<'a>(pub &'a Converted, pub &'a FormSelection);

impl Serialize for ConversionJson<'_> {
    fn serialize<S: Serializer>(&self, serializer: S) -> Result<S::Ok, S::Error> {
        let mut map = serializer.serialize_map(None)?;
        map.serialize_entry("input", &FormsJson(&self.0.input, self.1))?;
        map.serialize_entry("results", &ResultsJson(self.0, self.1))?;
        map.serialize_entry("warnings", &self.0.warnings)?;
        if let Some(model) = self.0.tdb_model {
            map.serialize_entry("tdb_model", model.as_str())?;
        }
        map.end()
    }
}

/// A batch of conversions as JSON (the shape of `ConversionBatch`).
pub struct BatchJson<'a>(pub &'a [Converted], pub &'a FormSelection);

impl Serialize for BatchJson<'_> {
    fn serialize<S: Serializer>(&self, serializer: S) -> Result<S::Ok, S::Error> {
        struct Items<'b>(&'b [Converted], &'b FormSelection);
        impl Serialize for Items<'_> {
            fn serialize<S: Serializer>(&self, serializer: S) -> Result<S::Ok, S::Error> {
                let mut seq = serializer.serialize_seq(Some(self.0.len()))?;
                for converted in self.0 {
                    seq.serialize_element(&ConversionJson(converted, self.1))?;
                }
                seq.end()
            }
        }
        let mut map = serializer.serialize_map(Some(1))?;
        map.serialize_entry("conversions", &Items(self.0, self.1))?;
        map.end()
    }
}

/// Writes `value` as JSON into a buffer sized for `bytes_hint` bytes (an answer grown from
/// serde_json's default 128 bytes is copied several times on the way).
pub fn json_bytes<T: serde::Serialize>(value: &T, bytes_hint: usize) -> Result<Vec<u8>, ApiError> {
    let mut out = Vec::with_capacity(bytes_hint);
    serde_json::to_writer(&mut out, value)
        .map_err(|e| ApiError::new(StatusCode::INTERNAL_SERVER_ERROR, "internal", e.to_string()))?;
    Ok(out)
}

/// About the size of one conversion's JSON: 300 bytes per instant with every form.
pub fn conversion_bytes_hint(targets: usize) -> usize {
    300 * (targets + 1) + 64
}

#[cfg(test)]
mod tests {
    use super::super::conversion::{convert_one, FieldName};
    use super::super::types::ConversionBatch;
    use super::*;
    use crate::physics::time::convert::ConversionContext;
    use crate::physics::time::leap_seconds::LeapTable;
    use crate::physics::time::scale::Scale;

    #[test]
    fn the_view_writes_the_bytes_of_the_documented_types() {
        // The documented answer types (serde derive) are the reference: same bytes, for every
        // scale, every single form, the default forms and all of them, in and out of leap
        // seconds, and with the expiry warning.
        let table = LeapTable::builtin();
        let context = ConversionContext::geocentric(table);
        let names: Vec<&str> = InstantFormat::NAMES.to_vec();
        let select = |names: &[&str]| {
            FormSelection::parse(names.iter().copied(), "forms")
                .unwrap_or_else(|e| panic!("{names:?}: {e:?}"))
        };
        let mut selections = vec![FormSelection::default(), select(&names)];
        for name in &names {
            selections.push(select(&[name]));
        }
        let epochs = [
            "2026-03-14T06:30:00.123456789012",
            "2016-12-31T23:59:60.5",
            "1968-02-01T00:00:00.25",
            "1999-08-22T00:00:00",
            "2099-06-01T00:00:00",
        ];
        let mut converted = Vec::new();
        for epoch in epochs {
            let one = convert_one(
                epoch,
                InstantFormat::Iso,
                Scale::Utc,
                // every scale but UT1 (the context has no EOP table; 2099 is outside it), TCL and TL
                &Scale::any_epoch().collect::<Vec<_>>(),
                &context,
                FieldName::Named("at"),
            );
            converted.push(one.unwrap_or_else(|e| panic!("{epoch}: {e:?}")));
        }
        // With the ephemeris TDB model, and without TDB or TCB (no `tdb_model` written).
        let ephemeris =
            context.with_tdb_model(crate::physics::time::tdb_model::TdbModel::Ephemeris);
        for (targets, context) in [(vec![Scale::Tcb], &ephemeris), (vec![Scale::Tai], &context)] {
            let one = convert_one(
                epochs[0],
                InstantFormat::Iso,
                Scale::Utc,
                &targets,
                context,
                FieldName::Named("at"),
            );
            converted.push(one.unwrap_or_else(|e| panic!("{targets:?}: {e:?}")));
        }
        for forms in &selections {
            for one in &converted {
                let view = serde_json::to_string(&ConversionJson(one, forms)).ok();
                let typed = serde_json::to_string(&one.json(forms)).ok();
                assert!(view.is_some());
                assert_eq!(view, typed, "{forms:?}");
            }
            let batch = ConversionBatch {
                conversions: converted.iter().map(|c| c.json(forms)).collect(),
            };
            assert_eq!(
                serde_json::to_string(&BatchJson(&converted, forms)).ok(),
                serde_json::to_string(&batch).ok()
            );
        }
    }
}
