//! Conversions written as CSV (RFC 4180): a header row, then one row per epoch with the epoch
//! as sent, one column per form per target scale (`TDB_j2000_s`) and the warnings.

use super::conversion::Converted;
use super::forms::FormSelection;
use crate::physics::time::scale::Scale;

/// The media type of the CSV answers (RFC 4180 sec. 3, with RFC 7111's `header` parameter).
pub const CSV_CONTENT_TYPE: &str = "text/csv; charset=utf-8; header=present";

/// RFC 4180's line break.
const LINE_END: &[u8] = b"\r\n";

/// Appends one field, quoted (RFC 4180 sec. 2, rules 6-7) when it holds a comma, a quote or a
/// line break.
fn push_field(text: &str, out: &mut Vec<u8>) {
    if text.contains([',', '"', '\r', '\n']) {
        out.push(b'"');
        out.extend_from_slice(text.replace('"', "\"\"").as_bytes());
        out.push(b'"');
    } else {
        out.extend_from_slice(text.as_bytes());
    }
}

/// The header row: `epoch,TDB_iso,...,warnings`, with a `tdb_model` column before `warnings`
/// when `names_tdb_model` (the conversion involves TDB, TCB, TCL or TL, whose JSON answers
/// name the model of TDB - TT as `tdb_model` too).
pub fn push_header(
    targets: &[Scale],
    forms: &FormSelection,
    names_tdb_model: bool,
    out: &mut Vec<u8>,
) {
    out.extend_from_slice(b"epoch");
    for target in targets {
        forms.push_csv_header(target.as_str(), out);
    }
    if names_tdb_model {
        out.extend_from_slice(b",tdb_model");
    }
    out.extend_from_slice(b",warnings");
    out.extend_from_slice(LINE_END);
}

/// One row: the epoch as sent, the selected forms of each result, the model of TDB - TT when
/// the header names it (`names_tdb_model`), and the warnings joined by `; ` (an empty cell
/// when there are none).
pub fn push_row(
    epoch: &str,
    converted: &Converted,
    forms: &FormSelection,
    names_tdb_model: bool,
    out: &mut Vec<u8>,
) {
    push_field(epoch, out);
    for result in &converted.results {
        forms.push_csv_cells(&result.digits, out);
    }
    if names_tdb_model {
        out.push(b',');
        if let Some(model) = converted.tdb_model {
            out.extend_from_slice(model.as_str().as_bytes());
        }
    }
    out.push(b',');
    if !converted.warnings.is_empty() {
        push_field(&converted.warnings.join("; "), out);
    }
    out.extend_from_slice(LINE_END);
}
