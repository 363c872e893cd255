//! The caution an answer carries when its UT1 rests on predicted Earth orientation.

use crate::physics::readable::readable;
use crate::physics::time::convert::{convert, ConversionContext};
use crate::physics::time::instant::Instant;
use crate::physics::time::scale::Scale;
use crate::physics::time::ut1::ut1_offset_at_tai;

/// When `input` or one of `targets` is UT1 and UT1 - UTC at the event comes from predicted days
/// of the table (IERS Bulletin A predictions), a warning naming UT1 - UTC and the likely error
/// the table states for that day. None otherwise (also when UT1 cannot be had: the conversion
/// itself then answers the error).
pub fn ut1_warning(
    input: &Instant,
    targets: &[Scale],
    context: &ConversionContext<'_>,
) -> Option<String> {
    if input.scale() != Scale::Ut1 && !targets.contains(&Scale::Ut1) {
        return None;
    }
    let tai = convert(input, Scale::Tai, context).ok()?;
    let offset = ut1_offset_at_tai(tai.count_attos(), context.table, context.ut1).ok()?;
    if !offset.predicted {
        return None;
    }
    let likely = match offset.likely_error_s {
        Some(sigma_s) => format!(
            "likely error {} s (IERS Bulletin A's stated error for that day)",
            readable(sigma_s)
        ),
        None => "the table states no error for it".to_string(),
    };
    Some(format!(
        "UT1 - UTC = {} s is predicted, not observed (IERS Bulletin A predictions in the Earth orientation table in force): {likely}",
        readable(offset.ut1_minus_utc_s)
    ))
}
