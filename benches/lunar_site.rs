//! A lunar surface clock on the DE440 orbit (`physics::moon`).
//!
//! Run: `cargo bench --bench lunar_site -- --warm-up-time 1 --measurement-time 3`. The baseline
//! is the `j2_sun_moon` rate of an Earth state with the Sun and the Moon read from the ephemeris
//! (the tides bench's), measured in the same run. No speed target is set for lunar sites; the
//! figures size the per-request limit of `api::clock::lunar` (one sample of a span is one
//! instantaneous rate; a 3660-day span takes 87 840 of them).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::moon::site::lunar_site_rates;
use eigenzeit::physics::moon::span::{lunar_site_over_span, ANOMALISTIC_MONTH_DAYS, MAX_STEP_S};
use eigenzeit::physics::rate::{
    state_rate_with_tides, Frame, LunarSite, RateReference, StateVector,
};
use eigenzeit::physics::solar_system::{Ephemeris, TidalBodies};
use eigenzeit::physics::time::instant::ATTOS_PER_SECOND;

fn bench(c: &mut Criterion) {
    let ephemeris = Ephemeris::embedded().unwrap_or_else(|e| panic!("ephemeris: {e}"));
    // The invented Skua lander's clock of the demo scenario.
    let site = LunarSite {
        latitude_deg: -89.5,
        longitude_deg: 36.0,
        height_m: 1200.0,
    };
    let state = StateVector {
        frame: Frame::Gcrs,
        position_m: [30_000_000.0, 29_600_000.0, 100_000.0],
        velocity_m_s: [-2_150.0, 2_180.0, 0.0],
    };
    let epochs_s: Vec<f64> = (0..1024)
        .map(|i| 826_000_000.0 + f64::from(i) * 86_413.0)
        .collect();
    let mut index = 0usize;
    let mut next = || {
        index = (index + 1) % epochs_s.len();
        index
    };
    c.bench_function(
        "baseline: j2_sun_moon rate, Sun and Moon from the ephemeris",
        |b| {
            b.iter(|| {
                let attos = (epochs_s[next()] as i128) * ATTOS_PER_SECOND;
                let bodies = TidalBodies::at(&ephemeris, attos).ok()?;
                state_rate_with_tides(
                    black_box(&state),
                    RateReference::Tt,
                    [0.0, 0.0, 1.0],
                    &bodies,
                )
                .ok()
            })
        },
    );
    c.bench_function("lunar site rates at an epoch (TT, TCG, TCL, TL)", |b| {
        b.iter(|| lunar_site_rates(black_box(&site), epochs_s[next()], &ephemeris).ok())
    });
    let mut group = c.benchmark_group("span");
    group.sample_size(10);
    group.bench_function("one anomalistic month, hourly samples", |b| {
        b.iter(|| {
            let start = epochs_s[next()];
            lunar_site_over_span(
                black_box(&site),
                start,
                start + ANOMALISTIC_MONTH_DAYS * 86_400.0,
                MAX_STEP_S,
                &ephemeris,
            )
            .ok()
        })
    });
    group.finish();
}

criterion_group!(benches, bench);
criterion_main!(benches);
