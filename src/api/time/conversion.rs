//! Converting one instant into each target scale, and the result read once for writing in
//! any media type (JSON with the selected forms, or CSV cells).

use super::forms::FormSelection;
use super::lunar_observer::{is_lunar, shift_s, LunarObserver};
use super::types::{Conversion, ConvertedInstant};
use crate::api::error::ApiError;
use crate::physics::time::calendar::CalendarDate;
use crate::physics::time::convert::{convert, ConversionContext};
use crate::physics::time::decimal::format_attos_as_seconds;
use crate::physics::time::error::TimeError;
use crate::physics::time::formats::{parse_instant, InstantDigits, InstantFormat};
use crate::physics::time::instant::{attos_to_seconds_f64, seconds_f64_to_attos, Instant};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::physics::time::tdb_model::TdbModel;

/// Whether a conversion from `from` into `targets` goes through TDB - TT.
pub(crate) fn uses_tdb(from: Scale, targets: &[Scale]) -> bool {
    let barycentric =
        |scale: Scale| matches!(scale, Scale::Tdb | Scale::Tcb | Scale::Tcl | Scale::Tl);
    barycentric(from) || targets.iter().any(|&target| barycentric(target))
}

/// Where an instant sits in the request, for the `field` of a problem; written out only when
/// a problem is answered (a batch names 100 000 of them).
#[derive(Debug, Clone, Copy)]
pub enum FieldName<'a> {
    /// A field of its own (`at`, `now`).
    Named(&'a str),
    /// One item of a list (`epochs[3]`).
    Item(&'a str, usize),
}

impl FieldName<'_> {
    /// The field as a problem names it (`at`, `epochs[3]`).
    pub fn text(self) -> String {
        match self {
            FieldName::Named(name) => name.to_string(),
            FieldName::Item(list, index) => format!("{list}[{index}]"),
        }
    }

    fn problem(self, error: &TimeError) -> ApiError {
        ApiError::from_time(error, self.text())
    }
}

/// Warnings for a UTC reading past the table's expiry.
fn expiry_warning(digits: &InstantDigits, table: &LeapTable) -> Option<String> {
    if digits.scale() != Scale::Utc || digits.mjd() < table.expiry_mjd() {
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
    /// The TDB - TT model used, when TDB or TCB is the input or a target.
    pub tdb_model: Option<TdbModel>,
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
            tdb_model: self.tdb_model.map(|model| model.as_str().to_string()),
        }
    }
}

/// Converts one instant, written as text, into each target scale.
pub fn convert_one(
    text: &str,
    format: InstantFormat,
    from: Scale,
    targets: &[Scale],
    context: &ConversionContext<'_>,
    field: FieldName<'_>,
) -> Result<Converted, ApiError> {
    convert_one_observed(text, format, from, targets, context, field, None)
}

/// [`convert_one`] for an event at a selenocentric observer (`lunar`): results between a
/// lunar scale and another carry the position-dependent term of TCB - TCL (see
/// [`super::lunar_observer::shift_s`]), and a warning states its value.
pub fn convert_one_observed(
    text: &str,
    format: InstantFormat,
    from: Scale,
    targets: &[Scale],
    context: &ConversionContext<'_>,
    field: FieldName<'_>,
    lunar: Option<&LunarObserver>,
) -> Result<Converted, ApiError> {
    let table = context.table;
    let digits =
        |instant: &Instant| InstantDigits::new(instant, table).map_err(|e| field.problem(&e));
    let input_instant = parse_instant(text, format, from, table).map_err(|e| field.problem(&e))?;
    let input = digits(&input_instant)?;
    let input_reading = input.reading_count_attos();
    let mut warnings: Vec<String> = expiry_warning(&input, table).into_iter().collect();
    let mut results = Vec::with_capacity(targets.len());
    let lunar_term_s = match lunar {
        Some(observer) if targets.iter().any(|&t| is_lunar(t) != is_lunar(from)) => {
            let term_s = observer.term_s(&input_instant, context)?;
            warnings.push(format!("selenocentric observer: the position-dependent term v_M.(x - x_M)/c^2 of TCB - TCL is {term_s:.6e} s at this epoch and is included in the results between the lunar scales and the others (IAU 2000 Resolution B1.5 form with the Moon in place of the Earth)"));
            term_s
        }
        Some(_) => {
            warnings.push("selenocentric observer: no conversion here goes between a lunar scale (TCL, TL) and another, so the observer changes nothing".to_string());
            0.0
        }
        None => 0.0,
    };
    for &target in targets {
        let mut instant =
            convert(&input_instant, target, context).map_err(|e| field.problem(&e))?;
        let shift_s = shift_s(from, target, lunar_term_s);
        if shift_s != 0.0 {
            instant = Instant::from_count_attos(
                target,
                instant.count_attos() + seconds_f64_to_attos(shift_s),
            );
        }
        let output = digits(&instant)?;
        if let Some(warning) = expiry_warning(&output, table) {
            if !warnings.contains(&warning) {
                warnings.push(warning);
            }
        }
        results.push(ConvertedTarget {
            difference_attos: output.reading_count_attos() - input_reading,
            digits: output,
        });
    }
    warnings.extend(super::ut1_warning::ut1_warning(
        &input_instant,
        targets,
        context,
    ));
    if from == Scale::Tl || targets.contains(&Scale::Tl) {
        warnings.push(crate::physics::time::lunar::TL_WARNING.to_string());
    }
    Ok(Converted {
        input,
        results,
        warnings,
        tdb_model: uses_tdb(from, targets).then_some(context.tdb_model),
    })
}
