//! What several benches share: the same UTC epochs, so their baselines are comparable.

use eigenzeit::physics::time::formats::{parse_instant, InstantFormat};
use eigenzeit::physics::time::instant::Instant;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;

/// 1024 UTC epochs about a day apart from 2026-03 on (seconds since J2000.0, read exactly).
pub fn utc_epochs() -> Vec<Instant> {
    let table = LeapTable::builtin();
    (0..1024)
        .filter_map(|i| {
            let text = format!("{}", 826_000_000 + i * 86_413);
            parse_instant(&text, InstantFormat::J2000S, Scale::Utc, table).ok()
        })
        .collect()
}
