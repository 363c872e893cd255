//! Stability of 10^6 phase points: every deviation at octave taus, against a baseline of one
//! pass summing the data (measured in the same run). Target (issue 13): under 1 s.

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::stability::{analyse, DataKind, Deviation, StabilityRequest};

/// 10^6 phase points: white FM (a random walk of phase) plus white PM, from the minimal
/// standard generator (Park and Miller 1988, as in NIST SP 1065's NBS14 set), in seconds.
fn phase_series(n: usize) -> Vec<f64> {
    let mut state: u64 = 1_234_567_890;
    let mut next = move || {
        state = (16_807 * state) % 2_147_483_647;
        state as f64 / 2_147_483_647.0 - 0.5
    };
    let mut walk = 0.0;
    (0..n)
        .map(|_| {
            walk += 1e-12 * next();
            walk + 1e-11 * next()
        })
        .collect()
}

fn stability(c: &mut Criterion) {
    let x = phase_series(1_000_000);
    let mut group = c.benchmark_group("stability_1e6_phase");
    group.sample_size(10);
    group.bench_function("baseline_sum_one_pass", |b| {
        b.iter(|| black_box(&x).iter().sum::<f64>())
    });
    group.bench_function("all_deviations_octave", |b| {
        b.iter(|| {
            analyse(&StabilityRequest {
                kind: DataKind::Phase,
                values: black_box(&x),
                tau0_s: 1.0,
                deviations: &Deviation::ALL,
                factors: None,
                confidence: 0.683,
            })
        })
    });
    group.finish();
}

criterion_group!(benches, stability);
criterion_main!(benches);
