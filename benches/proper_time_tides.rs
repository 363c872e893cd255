//! Proper time with the Sun and Moon tides along one day of states one second apart (86 400
//! states, a navigation MEO clock in the GCRS, with velocities: Hermite interpolation).
//!
//! Run: `cargo bench --bench proper_time_tides -- --warm-up-time 1 --measurement-time 3`.
//! The baseline is the same track integrated with J2 alone (`j2`), in the same run; `tides`
//! is the default model `j2_sun_moon` (J2 + the tidal integrand, its hourly Sun and Moon nodes
//! read from the embedded ephemeris inside the measured loop). The target: 86 400
//! states of proper time with tides < 40 ms.

use std::hint::black_box;

use criterion::{criterion_group, criterion_main, Criterion};
use eigenzeit::physics::constants::GM_EARTH_M3_S2;
use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::gravity::GravityModel;
use eigenzeit::physics::proper_time::kepler::KeplerOrbit;
use eigenzeit::physics::proper_time::tides::TidalIntegrand;
use eigenzeit::physics::proper_time::{ProperTimeOptions, Trajectory};
use eigenzeit::physics::rate::{inertial_rate_function_about_axis, RateReference};
use eigenzeit::physics::solar_system::Ephemeris;
use eigenzeit::physics::time::convert::ConversionContext;
use eigenzeit::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;
use eigenzeit::trajectory::{
    proper_time_of_track_at, Frame, InterpolationOptions, ObjectTrack, TrajectoryState,
};

const STATES: usize = 86_400;
/// 2026-05-20T00:00:00 TT, attoseconds since J2000.0 TT.
const START_ATTOS: i128 = 832_593_600 * ATTOS_PER_SECOND;

fn track() -> ObjectTrack {
    let orbit = KeplerOrbit {
        gm_m3_s2: GM_EARTH_M3_S2,
        semi_major_axis_m: 29_600_000.0,
        eccentricity: 0.02,
        inclination_rad: 0.98,
        ascending_node_rad: 1.2,
        argument_of_perigee_rad: 0.5,
        mean_anomaly_at_zero_rad: 2.0,
    };
    ObjectTrack {
        id: "LYR-T1".into(),
        frame: Frame::Inertial,
        scale: Scale::Tt,
        states: (0..STATES)
            .map(|i| {
                let (position_m, velocity_m_s) = orbit.state_at(i as f64);
                TrajectoryState {
                    epoch: Instant::from_count_attos(
                        Scale::Tt,
                        START_ATTOS + i as i128 * ATTOS_PER_SECOND,
                    ),
                    position_m,
                    velocity_m_s: Some(velocity_m_s),
                }
            })
            .collect(),
    }
}

fn benches(c: &mut Criterion) {
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    let ephemeris = Ephemeris::embedded().unwrap_or_else(|e| panic!("ephemeris: {e}"));
    let track = track();
    let axis = [0.0, 0.0, 1.0];
    let earth = inertial_rate_function_about_axis(RateReference::Tt, GravityModel::J2, axis);
    let mut group = c.benchmark_group("proper_time_tides_one_day_1s");
    group.sample_size(20);
    group.bench_function("baseline_j2", |b| {
        b.iter(|| {
            proper_time_of_track_at(
                black_box(&track),
                &InterpolationOptions::default(),
                &ProperTimeOptions::default(),
                &context,
                EopTable::builtin(),
                |_t_s: f64, p: &[f64; 3], v: &[f64; 3]| {
                    let (velocity, gravity) = earth(p, v);
                    [velocity, gravity, 0.0]
                },
            )
            .map(|answer| answer.series.summary.accumulated_s)
        })
    });
    group.bench_function("tides", |b| {
        b.iter(|| {
            let tides =
                TidalIntegrand::over_tt(&ephemeris, START_ATTOS, (STATES - 1) as f64, &context)
                    .unwrap_or_else(|e| panic!("tides: {e}"));
            proper_time_of_track_at(
                black_box(&track),
                &InterpolationOptions::default(),
                &ProperTimeOptions::default(),
                &context,
                EopTable::builtin(),
                |t_s: f64, p: &[f64; 3], v: &[f64; 3]| {
                    let (velocity, gravity) = earth(p, v);
                    [velocity, gravity, tides.rate_part(t_s, p)]
                },
            )
            .map(|answer| answer.series.summary.accumulated_s)
        })
    });
    group.finish();
}

criterion_group!(group, benches);
criterion_main!(group);
