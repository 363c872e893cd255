//! Conversion throughput of the time engine.
//!
//! Run: `cargo bench --bench time_convert`. The baseline is UTC -> TAI (a table look-up and an
//! integer add), measured in the same run; UTC -> TDB adds the fitted TDB - TT series; UTC <-> UT1
//! adds the EOP table's interpolation (and, for UT1 -> UTC, its fixed-point iteration).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::time::convert::{convert, ConversionContext, TdbEvaluation};
use eigenzeit::physics::time::formats::{parse_instant, write_instant, InstantFormat};
use eigenzeit::physics::time::instant::Instant;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;

mod support;
use support::utc_epochs;

fn bench(c: &mut Criterion) {
    let table = LeapTable::builtin();
    let epochs = utc_epochs();
    let fitted = ConversionContext::geocentric(table);
    let full = ConversionContext {
        tdb_evaluation: TdbEvaluation::FullSeries,
        ..fitted
    };
    // Warm the fitted series' intervals.
    for epoch in &epochs {
        let _ = convert(epoch, Scale::Tdb, &fitted);
    }
    let mut index = 0usize;
    let mut next = || {
        index = (index + 1) % epochs.len();
        epochs[index]
    };
    c.bench_function("baseline: UTC -> TAI", |b| {
        b.iter(|| convert(black_box(&next()), Scale::Tai, &fitted))
    });
    c.bench_function("UTC -> TDB (fitted series)", |b| {
        b.iter(|| convert(black_box(&next()), Scale::Tdb, &fitted))
    });
    c.bench_function("UTC -> TCB (fitted series)", |b| {
        b.iter(|| convert(black_box(&next()), Scale::Tcb, &fitted))
    });
    c.bench_function("UTC -> TDB (full 787-term series)", |b| {
        b.iter(|| convert(black_box(&next()), Scale::Tdb, &full))
    });
    // Epochs inside the built-in EOP table (2026-03 .. 2027-06: every 40 000 s).
    let with_ut1 = fitted.with_ut1(EopTable::builtin());
    let inside: Vec<Instant> = (0..1024)
        .filter_map(|i| {
            let text = format!("{}", 826_000_000 + i * 40_000);
            parse_instant(&text, InstantFormat::J2000S, Scale::Utc, table).ok()
        })
        .collect();
    let ut1_epochs: Vec<Instant> = inside
        .iter()
        .filter_map(|e| convert(e, Scale::Ut1, &with_ut1).ok())
        .collect();
    let mut k = 0usize;
    c.bench_function("UTC -> UT1 (EOP table)", |b| {
        b.iter(|| {
            k = (k + 1) % inside.len();
            convert(black_box(&inside[k]), Scale::Ut1, &with_ut1)
        })
    });
    c.bench_function("UT1 -> UTC (EOP table, iteration)", |b| {
        b.iter(|| {
            k = (k + 1) % ut1_epochs.len();
            convert(black_box(&ut1_epochs[k]), Scale::Utc, &with_ut1)
        })
    });
    c.bench_function("parse ISO + UTC -> TDB + write every form", |b| {
        b.iter(|| {
            let input = parse_instant(
                black_box("2026-03-14T06:30:00.123456789012"),
                InstantFormat::Iso,
                Scale::Utc,
                table,
            );
            input
                .and_then(|i| convert(&i, Scale::Tdb, &fitted))
                .and_then(|o| write_instant(&o, table))
        })
    });
}

criterion_group! {
    name = benches;
    config = Criterion::default().measurement_time(std::time::Duration::from_secs(3)).warm_up_time(std::time::Duration::from_secs(1));
    targets = bench
}
criterion_main!(benches);
