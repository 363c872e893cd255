//! Converting one instant into each target scale, and the result read once for writing in
//! any media type (JSON with the selected forms, or CSV cells).

use super::forms::FormSelection;
use super::types::{Conversion, ConvertedInstant};
use crate::api::error::ApiError;
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::convert::{convert, ConversionContext};
use crate::physics::time::decimal::format_attos_as_seconds;
use crate::physics::time::formats::{
    day_reading, parse_instant, reading_count_attos, InstantDigits, InstantFormat,
};
use crate::physics::time::instant::{attos_to_seconds_f64, Instant};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;

/// Warnings for a UTC reading past the table's expiry.
fn expiry_warning(instant: &Instant, table: &LeapTable) -> Option<String> {
    if instant.scale() != Scale::Utc {
        return None;
    }
    let reading = day_reading(instant, table).ok()?;
    if reading.mjd < table.expiry_mjd() {
        return None;
    }
    let expiry = CalendarDate::from_mjd(table.expiry_mjd());
    Some(format!(
        "UTC on or after {expiry}, the expiry of the leap-second table in use: TAI - UTC is held at its last value, and a leap second announced later would change this answer"
    ))
}

/// One converted target: the instant, read once for writing, and its difference from the input.
#[derive(Debug, Clone)]
pub struct ConvertedTarget {
    /// The instant in the target scale.
    pub digits: InstantDigits,
    /// Reading in the target minus reading in the input scale, attoseconds.
    pub difference_attos: i128,
}

/// One instant and its conversions, ready to be written as JSON or CSV.
#[derive(Debug, Clone)]
pub struct Converted {
    /// The instant as read.
    pub input: InstantDigits,
    /// One per target scale, in the order asked.
    pub results: Vec<ConvertedTarget>,
    /// Cautions about this answer.
    pub warnings: Vec<String>,
}

impl Converted {
    /// The JSON answer with the selected forms.
    pub fn json(&self, forms: &FormSelection) -> Conversion {
        Conversion {
            input: forms.json(&self.input),
            results: self
                .results
                .iter()
                .map(|result| ConvertedInstant {
                    instant: forms.json(&result.digits),
                    difference_s: attos_to_seconds_f64(result.difference_attos),
                    difference_exact_s: format_attos_as_seconds(result.difference_attos),
                })
                .collect(),
            warnings: self.warnings.clone(),
        }
    }
}

fn digits(instant: &Instant, table: &LeapTable, field: &str) -> Result<InstantDigits, ApiError> {
    InstantDigits::new(instant, table).map_err(|e| ApiError::from_time(&e, field))
}

/// Converts one instant, written as text, into each target scale.
pub fn convert_one(
    text: &str,
    format: InstantFormat,
    from: Scale,
    targets: &[Scale],
    context: &ConversionContext<'_>,
    field: &str,
) -> Result<Converted, ApiError> {
    let table = context.table;
    let input =
        parse_instant(text, format, from, table).map_err(|e| ApiError::from_time(&e, field))?;
    let input_reading =
        reading_count_attos(&input, table).map_err(|e| ApiError::from_time(&e, field))?;
    let mut warnings: Vec<String> = expiry_warning(&input, table).into_iter().collect();
    let mut results = Vec::with_capacity(targets.len());
    for &target in targets {
        let output =
            convert(&input, target, context).map_err(|e| ApiError::from_time(&e, field))?;
        let difference_attos = reading_count_attos(&output, table)
            .map_err(|e| ApiError::from_time(&e, field))?
            - input_reading;
        if let Some(warning) = expiry_warning(&output, table) {
            if !warnings.contains(&warning) {
                warnings.push(warning);
            }
        }
        results.push(ConvertedTarget {
            digits: digits(&output, table, field)?,
            difference_attos,
        });
    }
    warnings.extend(super::ut1_warning::ut1_warning(&input, targets, context));
    Ok(Converted {
        input: digits(&input, table, field)?,
        results,
        warnings,
    })
}
