//! CCSDS OEM (KVN) text: the reader gives an ephemeris or an error, never a panic; an accepted
//! ephemeris goes on through validation, interpolation and proper-time integration.
#![no_main]

use eigenzeit::trajectory::read_oem;
use eigenzeit_fuzz::integrate_all;
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let text = String::from_utf8_lossy(data);
    integrate_all(|context| read_oem(&text, context));
});
