//! One body state from the planetary ephemeris (the built-in DE440 excerpt).
//!
//! Run: `cargo bench --bench solar_system`. The baseline is a bare time conversion measured in
//! the same run (UTC -> TDB with the fitted TDB - TT series, as `time_convert`); the issue's
//! target is one body state <= 0.3 us.

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::solar_system::{Body, Ephemeris};
use eigenzeit::physics::time::convert::{convert, ConversionContext};
use eigenzeit::physics::time::formats::{parse_instant, InstantFormat};
use eigenzeit::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;

fn bench(c: &mut Criterion) {
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    // 1024 epochs a little over a day apart from 2026 on (each state reads another record).
    let utc: Vec<Instant> = (0..1024)
        .filter_map(|i| {
            let text = format!("{}", 826_000_000 + i * 86_413);
            parse_instant(&text, InstantFormat::J2000S, Scale::Utc, table).ok()
        })
        .collect();
    let tdb_attos: Vec<i128> = (0..1024_i128)
        .map(|i| (826_000_000 + i * 86_413) * ATTOS_PER_SECOND + 123_456_789)
        .collect();
    let ephemeris = Ephemeris::embedded().unwrap_or_else(|e| panic!("ephemeris: {e}"));
    let mut index = 0usize;
    let mut next = || {
        index = (index + 1) % utc.len();
        index
    };
    c.bench_function("baseline: UTC -> TDB (fitted series)", |b| {
        b.iter(|| convert(black_box(&utc[next()]), Scale::Tdb, &context))
    });
    for (body, center) in [
        (Body::Moon, Body::Earth),
        (Body::Earth, Body::Ssb),
        (Body::Sun, Body::Earth),
        (Body::JupiterBarycenter, Body::Ssb),
    ] {
        c.bench_function(&format!("state of {body} about {center}"), |b| {
            b.iter(|| ephemeris.state_m(black_box(body), black_box(center), tdb_attos[next()]))
        });
    }
}

criterion_group!(benches, bench);
criterion_main!(benches);
