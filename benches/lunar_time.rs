//! Conversions into the lunar scales TCL and TL, against a baseline in the same run.
//!
//! Run: `cargo bench --bench lunar_time`. The baseline is one UTC -> TCB conversion with the
//! default TDB model (the fitted series); UTC -> TCL and UTC -> TL (each one conversion through
//! TCB and the fitted DE440 TCB - TCL), TL -> UTC (the inverse iteration) and the bare TCB - TCL
//! evaluation are measured against it. Tables are warmed first (parsed on first use).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::time::convert::{convert, ConversionContext};
use eigenzeit::physics::time::instant::Instant;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::lunar::tcb_minus_tcl_s;
use eigenzeit::physics::time::scale::Scale;

mod support;
use support::utc_epochs;

fn bench(c: &mut Criterion) {
    let table = LeapTable::builtin();
    let epochs = utc_epochs();
    let context = ConversionContext::geocentric(table);
    let tl_epochs: Vec<Instant> = epochs
        .iter()
        .filter_map(|epoch| convert(epoch, Scale::Tl, &context).ok())
        .collect();
    for epoch in &epochs {
        let _ = convert(epoch, Scale::Tcb, &context);
        let _ = convert(epoch, Scale::Tcl, &context);
    }
    let mut index = 0usize;
    let mut next = || {
        index = (index + 1) % epochs.len();
        index
    };
    c.bench_function("baseline: UTC -> TCB (series)", |b| {
        b.iter(|| convert(black_box(&epochs[next()]), Scale::Tcb, &context))
    });
    c.bench_function("UTC -> TCL", |b| {
        b.iter(|| convert(black_box(&epochs[next()]), Scale::Tcl, &context))
    });
    c.bench_function("UTC -> TL", |b| {
        b.iter(|| convert(black_box(&epochs[next()]), Scale::Tl, &context))
    });
    c.bench_function("TL -> UTC", |b| {
        b.iter(|| convert(black_box(&tl_epochs[next()]), Scale::Utc, &context))
    });
    let seconds: Vec<f64> = (0..1024)
        .map(|i| 826_000_000.0 + i as f64 * 86_413.0)
        .collect();
    c.bench_function("TCB - TCL alone (fitted DE440 integral)", |b| {
        b.iter(|| tcb_minus_tcl_s(black_box(seconds[next()])))
    });
}

criterion_group!(benches, bench);
criterion_main!(benches);
