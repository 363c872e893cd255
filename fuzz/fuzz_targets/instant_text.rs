//! Instant text in every format and scale: the first byte chooses them (low nibble format,
//! high nibble scale), the rest is the text. Accepted instants must write and read back.
#![no_main]

use eigenzeit::physics::time::formats::parse_instant;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit_fuzz::{check_written_forms_read_back, format_and_scale, selector_and_text};
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let Some((selector, text)) = selector_and_text(data) else {
        return;
    };
    let (format, scale) = format_and_scale(selector);
    let table = LeapTable::builtin();
    if let Ok(instant) = parse_instant(&text, format, scale, table) {
        assert_eq!(instant.scale(), scale);
        check_written_forms_read_back(&instant, &text, table);
    }
});
