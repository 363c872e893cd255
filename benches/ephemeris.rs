//! One-day ephemerides sampled every second (86 400 states): proper-time integration and OEM
//! parsing, each beside a baseline measured in the same run.

use std::fmt::Write as _;
use std::hint::black_box;

use criterion::{criterion_group, criterion_main, Criterion, Throughput};
use eigenzeit::physics::constants::{
    EARTH_ROTATION_RAD_S, GM_EARTH_M3_S2, SPEED_OF_LIGHT_SQUARED_M2_S2,
};
use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::proper_time::kepler::KeplerOrbit;
use eigenzeit::physics::proper_time::{integrate_proper_time, ProperTimeOptions, Trajectory};
use eigenzeit::physics::time::convert::ConversionContext;
use eigenzeit::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;
use eigenzeit::trajectory::{
    proper_time_of_track, read_oem, Frame, InterpolationOptions, Interpolator, ObjectTrack,
    TrajectoryState,
};

const STATES: usize = 86_400;

fn orbit() -> KeplerOrbit {
    KeplerOrbit {
        gm_m3_s2: GM_EARTH_M3_S2,
        semi_major_axis_m: 6_828_137.0,
        eccentricity: 0.002,
        inclination_rad: 0.9,
        ascending_node_rad: 0.2,
        argument_of_perigee_rad: 1.0,
        mean_anomaly_at_zero_rad: 0.0,
    }
}

fn track(velocities: bool) -> ObjectTrack {
    track_in(Frame::Inertial, velocities)
}

/// The orbit in `frame`: Earth-fixed states are the inertial ones turned by omega_E t about z
/// (a plausible ITRS track for timing; the benchmark measures cost, not physics).
fn track_in(frame: Frame, velocities: bool) -> ObjectTrack {
    let orbit = orbit();
    let start = 832_593_600 * ATTOS_PER_SECOND;
    let turn = |t: f64, (r, v): ([f64; 3], [f64; 3])| {
        if frame == Frame::Inertial {
            return (r, v);
        }
        let (s, c) = (EARTH_ROTATION_RAD_S * t).sin_cos();
        let r = [c * r[0] + s * r[1], -s * r[0] + c * r[1], r[2]];
        let v = [c * v[0] + s * v[1], -s * v[0] + c * v[1], v[2]];
        let w = EARTH_ROTATION_RAD_S;
        (r, [v[0] + w * r[1], v[1] - w * r[0], v[2]])
    };
    ObjectTrack {
        id: "BENCH".into(),
        frame,
        scale: Scale::Tt,
        states: (0..STATES)
            .map(|i| {
                let (position_m, velocity_m_s) = turn(i as f64, orbit.state_at(i as f64));
                TrajectoryState {
                    epoch: Instant::from_count_attos(
                        Scale::Tt,
                        start + i as i128 * ATTOS_PER_SECOND,
                    ),
                    position_m,
                    velocity_m_s: velocities.then_some(velocity_m_s),
                }
            })
            .collect(),
    }
}

fn rate(position_m: &[f64; 3], velocity_m_s: &[f64; 3]) -> (f64, f64) {
    let v2 = velocity_m_s.iter().map(|x| x * x).sum::<f64>();
    let r = position_m.iter().map(|x| x * x).sum::<f64>().sqrt();
    (
        -0.5 * v2 / SPEED_OF_LIGHT_SQUARED_M2_S2,
        -GM_EARTH_M3_S2 / (r * SPEED_OF_LIGHT_SQUARED_M2_S2),
    )
}

fn oem_text() -> String {
    let orbit = orbit();
    let mut text = String::from(
        "CCSDS_OEM_VERS = 2.0\nCREATION_DATE = 2026-05-19T00:00:00\nORIGINATOR = BENCH\n\nMETA_START\nOBJECT_NAME = BENCH\nOBJECT_ID = 2026-999A\nCENTER_NAME = EARTH\nREF_FRAME = GCRF\nTIME_SYSTEM = UTC\nSTART_TIME = 2026-05-20T00:00:00.000\nSTOP_TIME = 2026-05-20T23:59:59.000\nMETA_STOP\n",
    );
    for i in 0..STATES {
        let (p, v) = orbit.state_at(i as f64);
        let (h, m, s) = (i / 3600, (i / 60) % 60, i % 60);
        let _ = writeln!(
            text,
            "2026-05-20T{h:02}:{m:02}:{s:02}.000 {:.6} {:.6} {:.6} {:.9} {:.9} {:.9}",
            p[0] / 1e3,
            p[1] / 1e3,
            p[2] / 1e3,
            v[0] / 1e3,
            v[1] / 1e3,
            v[2] / 1e3
        );
    }
    text
}

fn benches(c: &mut Criterion) {
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    let mut group = c.benchmark_group("proper_time_one_day_1s");
    group.sample_size(20);
    for velocities in [true, false] {
        let track = track(velocities);
        let name = if velocities { "hermite" } else { "lagrange" };
        group.bench_function(name, |b| {
            b.iter(|| {
                proper_time_of_track(
                    black_box(&track),
                    &InterpolationOptions::default(),
                    &ProperTimeOptions::default(),
                    &context,
                    EopTable::builtin(),
                    rate,
                )
            })
        });
    }
    // Earth-fixed (SP3-like) tracks: every state goes into the GCRS with the full IERS 2010
    // rotation; `former_*` is the treatment before it (v + omega_E x r about the ITRS z axis),
    // measured in the same run for the before/after ratio.
    for velocities in [true, false] {
        let track = track_in(Frame::EarthFixed, velocities);
        let name = if velocities { "hermite" } else { "lagrange" };
        group.bench_function(format!("earth_fixed_{name}"), |b| {
            b.iter(|| {
                proper_time_of_track(
                    black_box(&track),
                    &InterpolationOptions::default(),
                    &ProperTimeOptions::default(),
                    &context,
                    EopTable::builtin(),
                    rate,
                )
            })
        });
        group.bench_function(format!("former_earth_fixed_{name}"), |b| {
            b.iter(|| {
                let interpolator = Interpolator::from_track(
                    black_box(&track),
                    &InterpolationOptions::default(),
                    &context,
                )
                .unwrap();
                let turning = |t_s: f64| {
                    let (r, v) = interpolator.state_at(t_s);
                    let w = EARTH_ROTATION_RAD_S;
                    (r, [v[0] - w * r[1], v[1] + w * r[0], v[2]])
                };
                integrate_proper_time(
                    &turning,
                    interpolator.times_s(),
                    rate,
                    &ProperTimeOptions::default(),
                )
            })
        });
    }
    let hermite_track = track(true);
    group.bench_function("interpolator_setup_only", |b| {
        b.iter(|| {
            Interpolator::from_track(
                black_box(&hermite_track),
                &InterpolationOptions::default(),
                &context,
            )
        })
    });
    // Baseline: evaluate the rate once at each state (no interpolation, no quadrature).
    let plain = track(true);
    group.bench_function("baseline_rate_at_states", |b| {
        b.iter(|| {
            black_box(&plain)
                .states
                .iter()
                .map(|s| {
                    let (sr, gr) = rate(&s.position_m, &s.velocity_m_s.unwrap_or_default());
                    sr + gr
                })
                .sum::<f64>()
        })
    });
    group.finish();

    let text = oem_text();
    let mut group = c.benchmark_group("oem_parse_one_day_1s");
    group.sample_size(20);
    group.throughput(Throughput::Bytes(text.len() as u64));
    group.bench_function("read_oem", |b| {
        b.iter(|| read_oem(black_box(&text), &context))
    });
    // Baseline: a plain pass over the bytes (count line ends).
    group.bench_function("baseline_count_lines", |b| {
        b.iter(|| black_box(&text).bytes().filter(|b| *b == b'\n').count())
    });
    // Baseline: split every line into fields and parse the six numbers only (no epochs).
    group.bench_function("baseline_parse_numbers", |b| {
        b.iter(|| {
            black_box(&text)
                .lines()
                .filter_map(|l| {
                    let mut f = l.split_ascii_whitespace().skip(1);
                    let mut sum = 0.0;
                    for _ in 0..6 {
                        sum += f.next()?.parse::<f64>().ok()?;
                    }
                    Some(sum)
                })
                .sum::<f64>()
        })
    });
    group.finish();
}

criterion_group!(ephemeris, benches);
criterion_main!(ephemeris);
