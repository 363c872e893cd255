//! One day of 30-s clocks for 32 satellites (92 160 values): the conventional and J2 periodic
//! corrections and the fit of each corrected clock, against a baseline measured in the same
//! run (one pass over the same samples summing r.v, the cheapest per-value work).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::clock_data::series::{
    correct_sample, summarize, ClockConvention, ClockSample,
};

/// Invented circular orbits (a = 26 560 km, i = 55 deg, 32 nodes/phases), clock 1e-4 + 1e-12 t.
fn samples() -> Vec<Vec<ClockSample>> {
    let gm = 3.986_004_418e14_f64;
    let a = 26_560_000.0_f64;
    let n = (gm / a.powi(3)).sqrt();
    let (si, ci) = 55f64.to_radians().sin_cos();
    (0..32)
        .map(|k| {
            let node = f64::from(k) * 0.7;
            let (so, co) = node.sin_cos();
            (0..2880)
                .map(|j| {
                    let t = 30.0 * f64::from(j);
                    let u = n * t + f64::from(k);
                    let (su, cu) = u.sin_cos();
                    let p = [
                        a * (co * cu - so * su * ci),
                        a * (so * cu + co * su * ci),
                        a * su * si,
                    ];
                    let d = [-co * su - so * cu * ci, -so * su + co * cu * ci, cu * si];
                    let v = [a * n * d[0], a * n * d[1], a * n * d[2]];
                    ClockSample {
                        t_s: t,
                        clock_s: 1e-4 + 1e-12 * t,
                        position_m: p,
                        inertial_velocity_m_s: v,
                    }
                })
                .collect()
        })
        .collect()
}

fn corrections(c: &mut Criterion) {
    let data = samples();
    let mut group = c.benchmark_group("clock_corrections_92160");
    group.bench_function("baseline_sum_r_dot_v", |b| {
        b.iter(|| {
            let mut sum = 0.0;
            for series in black_box(&data) {
                for s in series {
                    let p = s.position_m;
                    let v = s.inertial_velocity_m_s;
                    sum += p[0] * v[0] + p[1] * v[1] + p[2] * v[2];
                }
            }
            sum
        })
    });
    group.bench_function("correct_and_fit", |b| {
        b.iter(|| {
            let mut rates = 0.0;
            for series in black_box(&data) {
                let corrected: Vec<_> = series
                    .iter()
                    .filter_map(|s| correct_sample(s, ClockConvention::Raw))
                    .collect();
                rates += summarize(&corrected).map_or(0.0, |s| s.fit.rate);
            }
            rates
        })
    });
    group.finish();
}

criterion_group!(benches, corrections);
criterion_main!(benches);
