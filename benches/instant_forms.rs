//! Cost of writing the forms of one instant, against the conversion itself.
//!
//! Run: `cargo bench --bench instant_forms`. The baseline, measured in the same run, is one
//! UTC -> TDB conversion (fitted series). Target: every form of one instant in <= 0.5 us.
//! "previous" rows time the digit-at-a-time long division that the block writers replaced
//! (still the general path, e.g. for the drift-era UTC days), for the same instant.

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::time::convert::{convert, ConversionContext};
use eigenzeit::physics::time::decimal::write::push_ratio_by_digits;
use eigenzeit::physics::time::formats::{
    day_reading, parse_instant, write_instant, InstantDigits, InstantFormat, ISO_DECIMALS,
};
use eigenzeit::physics::time::instant::Instant;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;

fn utc_epochs() -> Vec<Instant> {
    let table = LeapTable::builtin();
    (0..1024)
        .filter_map(|i| {
            let text = format!("{}.123456789012345678", 826_000_000 + i * 86_413);
            parse_instant(&text, InstantFormat::J2000S, Scale::Utc, table).ok()
        })
        .collect()
}

fn bench(c: &mut Criterion) {
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    let utc = utc_epochs();
    let tdb: Vec<Instant> = utc
        .iter()
        .filter_map(|i| convert(i, Scale::Tdb, &context).ok())
        .collect();
    let gpst: Vec<Instant> = utc
        .iter()
        .filter_map(|i| convert(i, Scale::Gpst, &context).ok())
        .collect();
    let mut index = 0usize;
    let mut next = || {
        index = (index + 1) % utc.len();
        index
    };
    c.bench_function("baseline: UTC -> TDB (fitted series)", |b| {
        b.iter(|| convert(black_box(&utc[next()]), Scale::Tdb, &context))
    });
    c.bench_function("every form of a TDB instant (write_instant)", |b| {
        b.iter(|| write_instant(black_box(&tdb[next()]), table))
    });
    c.bench_function("every form of a UTC instant (write_instant)", |b| {
        b.iter(|| write_instant(black_box(&utc[next()]), table))
    });
    c.bench_function("every form of a GPST instant, with gnss_week", |b| {
        b.iter(|| write_instant(black_box(&gpst[next()]), table))
    });
    let mut out = Vec::with_capacity(256);
    c.bench_function("every form of a TDB instant into one buffer", |b| {
        b.iter(|| {
            out.clear();
            if let Ok(digits) = InstantDigits::new(black_box(&tdb[next()]), table) {
                digits.push_iso(&mut out, ISO_DECIMALS);
                digits.push_mjd(&mut out);
                digits.push_jd(&mut out);
                digits.push_j2000_s(&mut out);
                digits.push_gnss_week(&mut out);
            }
            out.len()
        })
    });
    c.bench_function("one form (j2000_s) of a TDB instant into one buffer", |b| {
        b.iter(|| {
            out.clear();
            if let Ok(digits) = InstantDigits::new(black_box(&tdb[next()]), table) {
                digits.push_j2000_s(&mut out);
            }
            out.len()
        })
    });
    c.bench_function("previous: mjd form by digit-at-a-time division", |b| {
        b.iter(|| {
            out.clear();
            if let Ok(reading) = day_reading(black_box(&tdb[next()]), table) {
                let day = reading.day_length_attos;
                let numerator = i128::from(reading.mjd) * day + reading.seconds_of_day_attos;
                push_ratio_by_digits(&mut out, numerator, day, 24);
            }
            out.len()
        })
    });
}

criterion_group! {
    name = benches;
    config = Criterion::default()
        .measurement_time(std::time::Duration::from_secs(3))
        .warm_up_time(std::time::Duration::from_secs(1));
    targets = bench
}
criterion_main!(benches);
