//! Leap-second files (IERS Leap_Second.dat or IETF leap-seconds.list, detected by content).
//! An accepted table must start in 1960, increase, and expire after its last step.
#![no_main]

use eigenzeit::physics::time::leap_seconds::LeapTable;
use libfuzzer_sys::fuzz_target;

fuzz_target!(|data: &[u8]| {
    let text = String::from_utf8_lossy(data);
    if let Ok(table) = LeapTable::parse_any(&text) {
        assert_eq!(table.first_utc_mjd(), 36_934);
        let steps = table.steps();
        assert!(steps.windows(2).all(|w| w[0].utc_mjd < w[1].utc_mjd));
        assert!(steps.last().is_some_and(|s| s.utc_mjd < table.expiry_mjd()));
        // Converting through the new table must not panic either.
        for step in steps {
            let _ = table.utc_day_length_attos(step.utc_mjd - 1);
            let _ = table
                .tai_from_utc(step.utc_mjd, 0)
                .map(|tai| table.utc_from_tai(tai));
        }
    }
});
