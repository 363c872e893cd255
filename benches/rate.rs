//! One state-vector clock-rate evaluation (GCRS, J2, relative to TT).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::rate::{state_rate, Frame, GravityModel, RateReference, StateVector};

fn state_vector_rate(c: &mut Criterion) {
    // An invented medium-orbit state (a ~ 26 560 km, inclined 55 deg).
    let state = StateVector {
        frame: Frame::Gcrs,
        position_m: [15_234_000.0, -12_020_500.0, 17_900_200.0],
        velocity_m_s: [2_310.5, 3_120.25, -1_020.75],
    };
    c.bench_function("state_rate_gcrs_j2_tt", |b| {
        b.iter(|| state_rate(black_box(&state), RateReference::Tt, GravityModel::J2))
    });
}

criterion_group!(benches, state_vector_rate);
criterion_main!(benches);
