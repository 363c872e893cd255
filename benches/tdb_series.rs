//! Per-call cost of TDB - TT: the full Fairhead & Bretagnon (1990) series against the fitted form.
//!
//! Run: `cargo bench --bench tdb_series`. The fast form is warmed first (its intervals are
//! built on first use), so the numbers are the steady-state cost of one call.

use std::hint::black_box;

use criterion::{criterion_group, criterion_main, Criterion};
use eigenzeit::physics::time::tdb_series::{
    tdb_minus_tt_fast_s, tdb_minus_tt_series_s, TopocentricObserver,
};

/// 64 TT epochs (seconds since J2000.0) spread over 2000-2040, 229 days apart.
fn epochs_s() -> Vec<f64> {
    (0..64)
        .map(|i| 1.0e5 + i as f64 * 229.0 * 86_400.0)
        .collect()
}

fn bench_tdb(c: &mut Criterion) {
    let epochs = epochs_s();
    // The invented Tessaro station of the demo scenario (46.1 N, 11.2 E, 1050 m).
    let site = TopocentricObserver::from_itrf_m([4_346_657.2, 860_661.3, 4_573_718.4]);
    for &t in &epochs {
        black_box(tdb_minus_tt_fast_s(t, 0.3, None));
    }
    let mut group = c.benchmark_group("tdb_minus_tt_per_call");
    for (label, observer) in [("geocentric", None), ("topocentric", Some(&site))] {
        group.bench_function(format!("full_series_{label}"), |b| {
            let mut i = 0;
            b.iter(|| {
                i = (i + 1) % epochs.len();
                tdb_minus_tt_series_s(black_box(epochs[i]), black_box(0.3), observer)
            })
        });
        group.bench_function(format!("fast_{label}"), |b| {
            let mut i = 0;
            b.iter(|| {
                i = (i + 1) % epochs.len();
                tdb_minus_tt_fast_s(black_box(epochs[i]), black_box(0.3), observer)
            })
        });
    }
    group.finish();
}

criterion_group!(benches, bench_tdb);
criterion_main!(benches);
