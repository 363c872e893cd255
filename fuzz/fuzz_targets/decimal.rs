//! Exact decimal text. An accepted number must scale without overflow and write back to the
//! same attosecond count.
#![no_main]

use eigenzeit::physics::time::decimal::{format_attos_as_seconds, ExactDecimal};
use eigenzeit::physics::time::instant::ATTOS_PER_SECOND;
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let text = String::from_utf8_lossy(data);
    if let Ok(value) = ExactDecimal::parse(&text) {
        let attos = value.times_attos(ATTOS_PER_SECOND);
        let _ = value.times_attos(86_401 * ATTOS_PER_SECOND);
        let _ = value.floor_split();
        let written = format_attos_as_seconds(attos);
        let back = ExactDecimal::parse(&written).map(|d| d.times_attos(ATTOS_PER_SECOND));
        assert_eq!(back, Ok(attos), "{text:?} -> {written:?}");
    }
});
