//! Small text helpers shared by the line-oriented readers: numbers, epochs, time systems.

use super::error::TrajectoryError;
use crate::physics::time::convert::{to_tt_attos, ConversionContext};
use crate::physics::time::error::TimeError;
use crate::physics::time::formats::{instant_from_day_reading, parse_iso};
use crate::physics::time::instant::Instant;
use crate::physics::time::scale::Scale;

/// Reads one decimal number field (`str::parse::<f64>`), refusing NaN and infinities.
///
/// `what` names the field for the message; `line` is 1-based.
pub fn parse_number(field: &str, what: &str, line: usize) -> Result<f64, TrajectoryError> {
    match field.parse::<f64>() {
        Ok(value) if value.is_finite() => Ok(value),
        Ok(_) => Err(TrajectoryError::at_line(
            "not_finite",
            line,
            format!("{what} is {field:?}; expected a finite number"),
        )),
        Err(_) => Err(TrajectoryError::at_line(
            "bad_number",
            line,
            format!("expected a decimal number for {what}, found {field:?}"),
        )),
    }
}

/// Reads an ISO 8601 epoch (calendar or ordinal form) in `scale`. A trailing `Z` is accepted
/// as a plain designator (the file's time system, not the `Z`, decides the scale).
pub fn parse_epoch(
    text: &str,
    scale: Scale,
    context: &ConversionContext<'_>,
) -> Result<Instant, TimeError> {
    let reading = parse_iso(text)?;
    instant_from_day_reading(
        scale,
        reading.date.to_mjd(),
        reading.seconds_of_day_attos,
        context.table,
    )
}

/// The scale epochs are kept in: TDB, TCG and TCB epochs are converted to TT on reading (the
/// proper-time integration runs in TT); the other scales are kept as read.
pub fn storage_scale(scale: Scale) -> Scale {
    match scale {
        Scale::Tdb | Scale::Tcg | Scale::Tcb => Scale::Tt,
        other => other,
    }
}

/// Converts an instant to its storage scale (see [`storage_scale`]) through the engine.
pub fn to_storage(instant: Instant, context: &ConversionContext<'_>) -> Result<Instant, TimeError> {
    if storage_scale(instant.scale()) == instant.scale() {
        Ok(instant)
    } else {
        to_tt_attos(&instant, context).map(|tt| Instant::from_count_attos(Scale::Tt, tt))
    }
}

/// An engine time error at a line, with the code `bad_epoch`.
pub fn epoch_error(error: &TimeError, line: usize, found: &str) -> TrajectoryError {
    TrajectoryError::at_line(
        "bad_epoch",
        line,
        format!("cannot read the epoch {found:?}: {error}"),
    )
}
