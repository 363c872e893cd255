//! The two TDB - TT models side by side, in the same run.
//!
//! Run: `cargo bench --bench tdb_models`. The baseline is one UTC -> TDB conversion with the
//! default model (the fitted Fairhead & Bretagnon series); the same conversion with the DE440
//! ephemeris model, UTC -> TCB with each, and the bare geocentric evaluations are measured
//! against it. Both fitted forms are warmed first (the series fills its 16-day intervals on
//! first use; the ephemeris table is parsed on first use).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::time::convert::{convert, ConversionContext};
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;
use eigenzeit::physics::time::tdb_ephemeris::tdb_minus_tt_ephemeris_s;
use eigenzeit::physics::time::tdb_model::TdbModel;
use eigenzeit::physics::time::tdb_series::tdb_minus_tt_fast_s;

mod support;
use support::utc_epochs;

fn bench(c: &mut Criterion) {
    let table = LeapTable::builtin();
    let epochs = utc_epochs();
    let series = ConversionContext::geocentric(table);
    let ephemeris = series.with_tdb_model(TdbModel::Ephemeris);
    for epoch in &epochs {
        let _ = convert(epoch, Scale::Tdb, &series);
        let _ = convert(epoch, Scale::Tdb, &ephemeris);
    }
    let mut index = 0usize;
    let mut next = || {
        index = (index + 1) % epochs.len();
        epochs[index]
    };
    c.bench_function("baseline: UTC -> TDB (series)", |b| {
        b.iter(|| convert(black_box(&next()), Scale::Tdb, &series))
    });
    c.bench_function("UTC -> TDB (ephemeris)", |b| {
        b.iter(|| convert(black_box(&next()), Scale::Tdb, &ephemeris))
    });
    c.bench_function("UTC -> TCB (series)", |b| {
        b.iter(|| convert(black_box(&next()), Scale::Tcb, &series))
    });
    c.bench_function("UTC -> TCB (ephemeris)", |b| {
        b.iter(|| convert(black_box(&next()), Scale::Tcb, &ephemeris))
    });
    let seconds: Vec<f64> = (0..1024)
        .map(|i| 826_000_000.0 + i as f64 * 86_413.0)
        .collect();
    let mut k = 0usize;
    c.bench_function("geocentric TDB - TT alone (series, fitted)", |b| {
        b.iter(|| {
            k = (k + 1) % seconds.len();
            tdb_minus_tt_fast_s(black_box(seconds[k]), 0.0, None)
        })
    });
    c.bench_function("geocentric TDB - TT alone (ephemeris)", |b| {
        b.iter(|| {
            k = (k + 1) % seconds.len();
            tdb_minus_tt_ephemeris_s(black_box(seconds[k]))
        })
    });
}

criterion_group!(benches, bench);
criterion_main!(benches);
