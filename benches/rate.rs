//! One state-vector clock-rate evaluation (GCRS, J2, relative to TT), and one ground-site rate
//! with the GRS80 normal field (closed form) against the EGM2008 geopotential (degree 120).

use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::physics::rate::{
    ground_site_rate, state_rate, Frame, GravityModel, GroundHeight, GroundSite, RateReference,
    StateVector,
};

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

fn ground_rate(c: &mut Criterion) {
    // An invented station at 46.2 N, 7.4 E, 720 m above the ellipsoid.
    let site = GroundSite {
        latitude_deg: 46.2,
        longitude_deg: 7.4,
        height: GroundHeight::EllipsoidalM(720.0),
    };
    for model in [GravityModel::Grs80, GravityModel::Egm2008] {
        c.bench_function(&format!("ground_site_rate_{}", model.as_str()), |b| {
            b.iter(|| ground_site_rate(black_box(&site), RateReference::Tt, model))
        });
    }
}

criterion_group!(benches, state_vector_rate, ground_rate);
criterion_main!(benches);
