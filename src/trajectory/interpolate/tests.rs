use super::*;
use crate::physics::proper_time::kepler::KeplerOrbit;
use crate::physics::proper_time::tests::{
    closed_form_s, low_orbit, navigation_orbit, point_mass_rate_tcg,
};
use crate::physics::proper_time::{ProperTimeOptions, Trajectory};
use crate::physics::time::instant::{Instant, ATTOS_PER_SECOND};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::trajectory::{proper_time_of_track, Frame, TrajectoryState};

/// 2026-05-20T00:00:00 TT as seconds since J2000.0 (9 636.5 days; calendar arithmetic).
const START_TT_S: i128 = 832_593_600;

fn sampled_track(orbit: &KeplerOrbit, step_s: f64, days: f64, velocities: bool) -> ObjectTrack {
    let count = (days * 86_400.0 / step_s).round() as usize;
    let states = (0..=count)
        .map(|i| {
            let t_s = i as f64 * step_s;
            let (position_m, velocity_m_s) = orbit.state_at(t_s);
            let attos = (START_TT_S + (t_s as i128)) * ATTOS_PER_SECOND;
            TrajectoryState {
                epoch: Instant::from_count_attos(Scale::Tt, attos),
                position_m,
                velocity_m_s: velocities.then_some(velocity_m_s),
            }
        })
        .collect();
    ObjectTrack {
        id: "TEST".into(),
        frame: Frame::Inertial,
        scale: Scale::Tt,
        states,
    }
}

/// Worst |integrated - closed form| over the epochs of a sampled track (the closed form of
/// IS-GPS-200 20.3.3.3.3.1 / Ashby 2003, relative to TCG; the track's TT labels only serve as
/// the coordinate-time axis here).
fn worst_error_s(orbit: &KeplerOrbit, step_s: f64, days: f64, velocities: bool) -> f64 {
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    let track = sampled_track(orbit, step_s, days, velocities);
    let result = proper_time_of_track(
        &track,
        &InterpolationOptions::default(),
        &ProperTimeOptions::default(),
        &context,
        crate::physics::earth::eop::EopTable::builtin(),
        point_mass_rate_tcg,
    )
    .unwrap_or_else(|e| panic!("{e}"));
    result
        .series
        .samples
        .iter()
        .map(|s| (s.tau_minus_t_s - closed_form_s(orbit, s.t_s)).abs())
        .fold(0.0, f64::max)
}

#[test]
fn sampled_orbits_match_the_closed_form() {
    // Tolerances of the task: 1 ps over one day, 10 ps over ten days (closed form of
    // IS-GPS-200 20.3.3.3.3.1 / Ashby 2003); Hermite (with velocities) and Lagrange (without).
    for velocities in [true, false] {
        let meo_1 = worst_error_s(&navigation_orbit(), 300.0, 1.0, velocities);
        let leo_1 = worst_error_s(&low_orbit(), 30.0, 1.0, velocities);
        let meo_10 = worst_error_s(&navigation_orbit(), 300.0, 10.0, velocities);
        let leo_10 = worst_error_s(&low_orbit(), 30.0, 10.0, velocities);
        println!(
            "velocities {velocities}: MEO 1 d {meo_1:.3e} s, 10 d {meo_10:.3e} s; LEO 1 d {leo_1:.3e} s, 10 d {leo_10:.3e} s"
        );
        assert!(meo_1 < 1e-12 && leo_1 < 1e-12, "{meo_1} {leo_1}");
        assert!(meo_10 < 1e-11 && leo_10 < 1e-11, "{meo_10} {leo_10}");
    }
}

#[test]
fn interpolation_reproduces_the_orbit() {
    // Interpolated states against the analytic orbit between samples. Bounds: a degree-7
    // polynomial over 2100 s of a 12 h orbit is good to well below a millimetre
    // (interpolation error term f^(8) h^8 / 8!, e.g. Burden & Faires theorem 3.3).
    let orbit = navigation_orbit();
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    for (velocities, uniform) in [(true, true), (false, true), (true, false), (false, false)] {
        let mut track = sampled_track(&orbit, 300.0, 0.5, velocities);
        if !uniform {
            // A missing state makes the spacing irregular (the general, per-window path).
            track.states.remove(20);
        }
        let interpolator =
            Interpolator::from_track(&track, &InterpolationOptions::default(), &context)
                .unwrap_or_else(|e| panic!("{e}"));
        assert_eq!(interpolator.is_hermite(), velocities);
        let (mut worst_p, mut worst_v) = (0.0_f64, 0.0_f64);
        for k in 0..1000 {
            let t_s = f64::from(k) * 43.1;
            let (p, v) = interpolator.state_at(t_s);
            let (p0, v0) = orbit.state_at(t_s);
            for axis in 0..3 {
                worst_p = worst_p.max((p[axis] - p0[axis]).abs());
                worst_v = worst_v.max((v[axis] - v0[axis]).abs());
            }
        }
        println!(
            "velocities {velocities}, uniform {uniform}: worst position {worst_p:.3e} m, velocity {worst_v:.3e} m/s"
        );
        assert!(worst_p < 1e-3 && worst_v < 1e-6, "{worst_p} {worst_v}");
        // At a node the interpolant returns the sample (interpolation condition).
        let (p, _) = interpolator.state_at(600.0);
        assert!((p[0] - track.states[2].position_m[0]).abs() < 1e-6);
    }
}

fn check(track: &ObjectTrack) -> Option<(&'static str, Option<usize>)> {
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    validate_track(track, &InterpolationOptions::default(), &context)
        .err()
        .map(|e| {
            assert_eq!(e.object.as_deref(), Some("TEST"));
            (e.code, e.index)
        })
}

#[test]
fn validation_names_object_and_index() {
    // Physical bounds: GRS80 polar radius (Moritz 1980), c (SI definition); the others are the
    // reader's own rules (common practice).
    let good = sampled_track(&navigation_orbit(), 300.0, 0.2, true);
    assert_eq!(check(&good), None);
    let mut track = good.clone();
    track.states[5].position_m[1] = f64::NAN;
    assert_eq!(check(&track), Some(("not_finite", Some(5))));
    let mut track = good.clone();
    track.states[7].position_m = [6_356_000.0, 0.0, 0.0];
    assert_eq!(check(&track), Some(("below_surface", Some(7))));
    let mut track = good.clone();
    track.states[3].velocity_m_s = Some([3.0e8, 0.0, 0.0]);
    assert_eq!(check(&track), Some(("speed_not_below_c", Some(3))));
    let mut track = good.clone();
    track.states[9].epoch = track.states[8].epoch;
    assert_eq!(check(&track), Some(("epochs_not_increasing", Some(9))));
    let mut track = good.clone();
    track.states.remove(12);
    track.states.remove(12);
    track.states.remove(12);
    // 300 s steps with three states removed: a 1200 s gap; allowed limit set to 900 s below.
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    let tight = InterpolationOptions {
        max_gap_s: 900.0,
        ..InterpolationOptions::default()
    };
    let error = validate_track(&track, &tight, &context).err();
    assert_eq!(
        error.map(|e| (e.code, e.index)),
        Some(("gap_too_long", Some(12)))
    );
    let mut track = good.clone();
    track.states.truncate(3);
    assert_eq!(check(&track).map(|c| c.0), Some("too_few_states"));
}
