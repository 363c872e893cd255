//! Cost of one full GCRS <-> ITRS matrix (IAU 2006/2000A, CIO based): the full series against the
//! fast path (Chebyshev fits of X, Y, s, EO), with a bare UTC -> TDB conversion measured in the
//! same run as the baseline.
//!
//! Also: one matrix with the EOP interpolation first (the figure), and one ITRS state
//! through the orientation span of Earth-fixed tracks.
//!
//! Run: `cargo bench --bench earth_orientation`. The fast path is warmed first (its intervals
//! are built on first use, about 14 full-series evaluations each), so its number is the
//! steady-state cost of one call.

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::earth::orientation::span::OrientationSpan;
use eigenzeit::physics::earth::orientation::{
    earth_orientation, earth_orientation_fast, CelestialPoleOffsets, JulianDate,
};
use eigenzeit::physics::time::convert::{convert, ConversionContext};
use eigenzeit::physics::time::formats::{parse_instant, InstantFormat};
use eigenzeit::physics::time::instant::seconds_f64_to_attos;
use eigenzeit::physics::time::instant::Instant;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;
use eigenzeit::trajectory::track_proper_time::eop_at_tt;

/// 64 TT epochs over 2026-2027, 5.7 days apart (UT1 = TT - 69.2 s, a typical value then).
fn epochs() -> Vec<(JulianDate, JulianDate)> {
    (0..64)
        .map(|i| {
            let day = 9_497.0 + i as f64 * 5.7;
            let tt = JulianDate::new(2_451_545.0, day);
            let ut1 = JulianDate::new(2_451_545.0, day - 69.2 / 86_400.0);
            (tt, ut1)
        })
        .collect()
}

fn utc_epochs() -> Vec<Instant> {
    let table = LeapTable::builtin();
    (0..64)
        .filter_map(|i| {
            let text = format!("{}", 826_000_000 + i * 492_480);
            parse_instant(&text, InstantFormat::J2000S, Scale::Utc, table).ok()
        })
        .collect()
}

fn bench(c: &mut Criterion) {
    let epochs = epochs();
    let utc = utc_epochs();
    let context = ConversionContext::geocentric(LeapTable::builtin());
    let offsets = Some(CelestialPoleOffsets {
        dx_rad: 1.0e-9,
        dy_rad: -1.0e-9,
    });
    let (xp, yp) = (0.8e-6, 1.9e-6);
    for (tt, ut1) in &epochs {
        black_box(earth_orientation_fast(*tt, *ut1, xp, yp, offsets));
    }
    for epoch in &utc {
        let _ = convert(epoch, Scale::Tdb, &context);
    }
    let mut group = c.benchmark_group("earth_orientation_per_call");
    group.bench_function("baseline: UTC -> TDB (fitted series)", |b| {
        let mut i = 0;
        b.iter(|| {
            i = (i + 1) % utc.len();
            convert(black_box(&utc[i]), Scale::Tdb, &context)
        })
    });
    group.bench_function("GCRS<->ITRS matrix, full series", |b| {
        let mut i = 0;
        b.iter(|| {
            i = (i + 1) % epochs.len();
            let (tt, ut1) = epochs[i];
            earth_orientation(black_box(tt), black_box(ut1), xp, yp, offsets)
        })
    });
    group.bench_function("GCRS<->ITRS matrix, fast path", |b| {
        let mut i = 0;
        b.iter(|| {
            i = (i + 1) % epochs.len();
            let (tt, ut1) = epochs[i];
            earth_orientation_fast(black_box(tt), black_box(ut1), xp, yp, offsets)
        })
    });
    // One matrix with the EOP interpolation the service does first (the table in force, here the
    // built-in one: 4-point Lagrange in UT1 - UTC, x_p, y_p, dX, dY at a TT epoch, through the
    // leap-second table), as the "one GCRS<->ITRS matrix with EOP interpolation".
    let eop = EopTable::builtin();
    let leaps = LeapTable::builtin();
    let tt_attos: Vec<i128> = epochs
        .iter()
        .map(|(tt, _)| {
            let seconds = ((tt.jd1 - 2_451_545.0) + tt.jd2) * 86_400.0;
            (seconds * 1e6).round() as i128 * 1_000_000_000_000
        })
        .collect();
    group.bench_function(
        "GCRS<->ITRS matrix with EOP interpolation, fast path",
        |b| {
            let mut i = 0;
            b.iter(|| {
                i = (i + 1) % tt_attos.len();
                let attos = black_box(tt_attos[i]);
                let values = eop_at_tt(eop, leaps, attos).ok()?;
                let tt = JulianDate::from_count_attos_since_j2000(attos);
                let ut1 = JulianDate::from_count_attos_since_j2000(
                    attos + seconds_f64_to_attos(values.ut1_minus_tt_s),
                );
                let offsets = CelestialPoleOffsets {
                    dx_rad: values.dx_rad,
                    dy_rad: values.dy_rad,
                };
                Some(earth_orientation_fast(
                    tt,
                    ut1,
                    values.xp_rad,
                    values.yp_rad,
                    Some(offsets),
                ))
            })
        },
    );
    // The span of Earth-fixed tracks: one ITRS state (position and velocity) into the GCRS at
    // a time inside one day's span, as each quadrature node of an Earth-fixed proper time does.
    let start = tt_attos[0];
    let span = OrientationSpan::new(start, 86_400.0, |t| eop_at_tt(eop, leaps, t))
        .unwrap_or_else(|e| panic!("span: {e}"));
    group.bench_function("span: one ITRS state into the GCRS", |b| {
        let mut t_s = 0.0;
        b.iter(|| {
            t_s = if t_s > 86_000.0 { 0.0 } else { t_s + 0.7 };
            span.itrs_to_gcrs(
                black_box(t_s),
                &[-4_383_000.0, 2_868_000.0, 5_564_000.0],
                &[-2000.0, 2800.0, 500.0],
            )
        })
    });
    group.finish();
}

criterion_group! {
    name = benches;
    config = Criterion::default().measurement_time(std::time::Duration::from_secs(3)).warm_up_time(std::time::Duration::from_secs(1));
    targets = bench
}
criterion_main!(benches);
