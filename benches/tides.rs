//! The rate of a clock with the Sun and Moon tides (gravity model `j2_sun_moon`).
//!
//! Run: `cargo bench --bench tides`. The baseline is the J2 rate of the same state measured in
//! the same run (`state_rate_about_axis`); the targets are a tidal-model rate <= 1 us
//! and 86 400 states with tides < 40 ms (here the tidal rates of 86 400 states one second
//! apart, the interpolated Sun and Moon included; proper time with the tides has its own bench,
//! `proper_time_tides`).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::gravity::GravityModel;
use eigenzeit::physics::rate::state::state_rate_about_axis;
use eigenzeit::physics::rate::{state_rate_with_tides, Frame, RateReference, StateVector};
use eigenzeit::physics::solar_system::{Ephemeris, TidalBodies, TidalTrack};
use eigenzeit::physics::time::instant::ATTOS_PER_SECOND;

fn bench(c: &mut Criterion) {
    let ephemeris = Ephemeris::embedded().unwrap_or_else(|e| panic!("ephemeris: {e}"));
    let state = StateVector {
        frame: Frame::Gcrs,
        position_m: [30_000_000.0, 29_600_000.0, 100_000.0],
        velocity_m_s: [-2_150.0, 2_180.0, 0.0],
    };
    let axis = [0.0, 0.0, 1.0];
    let first_s = 826_000_000.0;
    let tdb_attos: Vec<i128> = (0..1024_i128)
        .map(|i| (826_000_000 + i * 86_413) * ATTOS_PER_SECOND + 123_456_789)
        .collect();
    let mut index = 0usize;
    let mut next = || {
        index = (index + 1) % tdb_attos.len();
        index
    };
    c.bench_function("baseline: J2 state rate", |b| {
        b.iter(|| {
            state_rate_about_axis(black_box(&state), RateReference::Tt, GravityModel::J2, axis)
        })
    });
    c.bench_function("j2_sun_moon rate, Sun and Moon from the ephemeris", |b| {
        b.iter(|| {
            let bodies = TidalBodies::at(&ephemeris, tdb_attos[next()]).ok()?;
            state_rate_with_tides(black_box(&state), RateReference::Tt, axis, &bodies).ok()
        })
    });
    let track = TidalTrack::new(&ephemeris, first_s, first_s + 86_400.0)
        .unwrap_or_else(|e| panic!("track: {e}"));
    let mut second = 0.0;
    c.bench_function("j2_sun_moon rate, Sun and Moon interpolated", |b| {
        b.iter(|| {
            second = (second + 1.0) % 86_400.0;
            let bodies = track.bodies_at(first_s + second)?;
            state_rate_with_tides(black_box(&state), RateReference::Tt, axis, &bodies).ok()
        })
    });
    let mut group = c.benchmark_group("day");
    group.sample_size(10);
    group.bench_function("86 400 j2_sun_moon rates with their track", |b| {
        b.iter(|| {
            let track = TidalTrack::new(&ephemeris, first_s, first_s + 86_400.0).ok()?;
            let mut sum = 0.0;
            for i in 0..86_400 {
                let bodies = track.bodies_at(first_s + f64::from(i))?;
                sum += state_rate_with_tides(&state, RateReference::Tt, axis, &bodies)
                    .ok()?
                    .parts
                    .total();
            }
            Some(sum)
        })
    });
    group.finish();
}

criterion_group!(benches, bench);
criterion_main!(benches);
