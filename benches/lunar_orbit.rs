//! Proper time along a lunar orbit: 86 400 selenocentric states one second apart (TDB, with
//! velocities), the whole trajectory path (epochs to TCL, the Earth and the Sun from DE440,
//! the tides, the Moon's J2), beside the same count of Earth-orbit states through the
//! geocentric path (point-mass rate) as the baseline measured in the same run.

use std::hint::black_box;

use criterion::{criterion_group, criterion_main, Criterion, Throughput};
use eigenzeit::physics::constants::{GM_EARTH_M3_S2, SPEED_OF_LIGHT_SQUARED_M2_S2};
use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::lunar_orbit::LunarReference;
use eigenzeit::physics::moon::gravity::LunarGravityModel;
use eigenzeit::physics::proper_time::kepler::KeplerOrbit;
use eigenzeit::physics::proper_time::{ProperTimeOptions, Trajectory};
use eigenzeit::physics::solar_system::gm::GM_MOON_M3_S2;
use eigenzeit::physics::solar_system::Ephemeris;
use eigenzeit::physics::time::convert::ConversionContext;
use eigenzeit::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;
use eigenzeit::trajectory::lunar::proper_time::{lunar_proper_time_of_track, LunarSettings};
use eigenzeit::trajectory::{
    proper_time_of_track, Frame, InterpolationOptions, ObjectTrack, TrajectoryState,
};

const STATES: usize = 86_400;

fn track(frame: Frame, gm_m3_s2: f64, semi_major_axis_m: f64) -> ObjectTrack {
    let orbit = KeplerOrbit {
        gm_m3_s2,
        semi_major_axis_m,
        eccentricity: 0.002,
        inclination_rad: 0.9,
        ascending_node_rad: 0.2,
        argument_of_perigee_rad: 1.0,
        mean_anomaly_at_zero_rad: 0.0,
    };
    let start = 832_593_600 * ATTOS_PER_SECOND;
    ObjectTrack {
        id: "BENCH".into(),
        frame,
        scale: Scale::Tdb,
        states: (0..STATES)
            .map(|i| {
                let (position_m, velocity_m_s) = orbit.state_at(i as f64);
                TrajectoryState {
                    epoch: Instant::from_count_attos(
                        Scale::Tdb,
                        start + i as i128 * ATTOS_PER_SECOND,
                    ),
                    position_m,
                    velocity_m_s: Some(velocity_m_s),
                }
            })
            .collect(),
    }
}

fn point_mass_rate(position_m: &[f64; 3], velocity_m_s: &[f64; 3]) -> (f64, f64) {
    let v2 = velocity_m_s.iter().map(|x| x * x).sum::<f64>();
    let r = position_m.iter().map(|x| x * x).sum::<f64>().sqrt();
    (
        -0.5 * v2 / SPEED_OF_LIGHT_SQUARED_M2_S2,
        -GM_EARTH_M3_S2 / (r * SPEED_OF_LIGHT_SQUARED_M2_S2),
    )
}

fn benches(c: &mut Criterion) {
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    let ephemeris = Ephemeris::embedded().expect("built-in ephemeris");
    let eop = EopTable::builtin();
    let earth = track(Frame::Inertial, GM_EARTH_M3_S2, 6_828_137.0);
    let moon = track(Frame::LunarInertial, GM_MOON_M3_S2, 1_837_400.0);
    let mut group = c.benchmark_group("proper_time_86400_states");
    group.sample_size(20);
    group.throughput(Throughput::Elements(STATES as u64));
    group.bench_function("earth_orbit_baseline", |b| {
        b.iter(|| {
            proper_time_of_track(
                black_box(&earth),
                &InterpolationOptions::default(),
                &ProperTimeOptions::default(),
                &context,
                eop,
                point_mass_rate,
            )
            .expect("integrates")
        })
    });
    for reference in [LunarReference::Tcl, LunarReference::Tt] {
        let settings = LunarSettings {
            ephemeris: &ephemeris,
            reference,
            gravity_model: LunarGravityModel::GrailDegree2,
        };
        group.bench_function(format!("lunar_orbit_{}", reference.as_str()), |b| {
            b.iter(|| {
                lunar_proper_time_of_track(
                    black_box(&moon),
                    &InterpolationOptions::default(),
                    &ProperTimeOptions::default(),
                    &context,
                    &settings,
                )
                .expect("integrates")
            })
        });
    }
    group.finish();
}

criterion_group!(lunar, benches);
criterion_main!(lunar);
