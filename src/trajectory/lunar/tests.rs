//! Selenocentric ephemerides: the readers' centre and frame checks, the lunar distance limits
//! and the proper time against TCL, TL and TT.

use super::proper_time::{lunar_proper_time_of_track, LunarSettings};
use crate::physics::constants::SPEED_OF_LIGHT_SQUARED_M2_S2;
use crate::physics::lunar_orbit::LunarReference;
use crate::physics::proper_time::ProperTimeOptions;
use crate::physics::solar_system::gm::GM_MOON_M3_S2;
use crate::physics::solar_system::Ephemeris;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::lunar::L_L;
use crate::trajectory::{read_json, read_oem, Frame, InterpolationOptions, TrajectoryError};

fn context() -> ConversionContext<'static> {
    ConversionContext::geocentric(LeapTable::builtin())
}

/// An OEM of a circular orbit of radius `a_km` about the Moon, states every 60 s for `hours`.
fn oem(center: &str, frame: &str, a_km: f64, hours: usize) -> String {
    let n = (GM_MOON_M3_S2 / (a_km * 1e3).powi(3)).sqrt();
    let mut text = format!("CCSDS_OEM_VERS = 2.0\nCREATION_DATE = 2026-01-01T00:00:00\nORIGINATOR = TEST\nMETA_START\nOBJECT_NAME = SEL-1\nOBJECT_ID = 2026-901A\nCENTER_NAME = {center}\nREF_FRAME = {frame}\nTIME_SYSTEM = TDB\nSTART_TIME = 2026-03-01T00:00:00\nSTOP_TIME = 2026-03-01T{hours:02}:00:00\nMETA_STOP\n");
    for k in 0..=hours * 60 {
        let t = k as f64 * 60.0;
        let (s, c) = (n * t).sin_cos();
        let (h, m) = (k / 60, k % 60);
        text.push_str(&format!(
            "2026-03-01T{h:02}:{m:02}:00 {:.9} {:.9} {:.9} {:.12} {:.12} {:.12}\n",
            a_km * c,
            a_km * s * 0.6,
            a_km * s * 0.8,
            -a_km * n * s,
            a_km * n * c * 0.6,
            a_km * n * c * 0.8
        ));
    }
    text
}

fn code_line(
    result: Result<crate::trajectory::TrajectorySet, TrajectoryError>,
) -> (&'static str, Option<usize>) {
    let error = result.expect_err("refused");
    (error.code, error.line)
}

#[test]
fn oem_reads_moon_centred_icrf_and_refuses_mixed_frames_and_centres() {
    let set = read_oem(&oem("MOON", "ICRF", 1837.4, 1), &context()).unwrap();
    assert_eq!(set.objects[0].frame, Frame::LunarInertial);
    let set = read_oem(&oem("MOON", "EME2000", 1837.4, 1), &context()).unwrap();
    assert_eq!(set.objects[0].frame, Frame::LunarInertial);
    // REF_FRAME is line 8 of these files.
    let refused =
        |center: &str, frame: &str| code_line(read_oem(&oem(center, frame, 1837.4, 1), &context()));
    assert_eq!(
        refused("MOON", "ITRF2020"),
        ("frame_center_mismatch", Some(8))
    );
    assert_eq!(refused("MOON", "GCRF"), ("frame_center_mismatch", Some(8)));
    assert_eq!(
        refused("EARTH", "MOON_PA"),
        ("frame_center_mismatch", Some(8))
    );
    assert_eq!(
        refused("MOON", "MOON_ME"),
        ("oem_unsupported_frame", Some(8))
    );
    assert_eq!(refused("MOON", "J2000"), ("oem_unsupported_frame", Some(8)));
    assert_eq!(refused("MARS", "ICRF").0, "oem_unsupported_center");
}

#[test]
fn json_takes_a_center_and_names_the_field_at_fault() {
    let doc = |center: &str, frame: &str| {
        format!(
            r#"{{"frame": "{frame}", {center} "time_scale": "TDB", "objects": [{{"id": "S", "states": [{{"epoch": "2026-03-01T00:00:00", "position_m": [1.9e6, 0, 0]}}]}}]}}"#
        )
    };
    let set = read_json(&doc(r#""center": "moon","#, "ICRF"), &context()).unwrap();
    assert_eq!(set.objects[0].frame, Frame::LunarInertial);
    let set = read_json(&doc("", "GCRF"), &context()).unwrap();
    assert_eq!(set.objects[0].frame, Frame::Inertial);
    let field = |text: String| {
        let e = read_json(&text, &context()).expect_err("refused");
        (e.code, e.field)
    };
    assert_eq!(
        field(doc(r#""center": "moon","#, "GCRS")),
        ("frame_center_mismatch", Some("frame"))
    );
    assert_eq!(
        field(doc(r#""center": "moon","#, "ITRF")),
        ("frame_center_mismatch", Some("frame"))
    );
    assert_eq!(
        field(doc(r#""center": "earth","#, "MOON_PA")),
        ("frame_center_mismatch", Some("frame"))
    );
    assert_eq!(
        field(doc(r#""center": "moon","#, "MOON_ME")),
        ("unsupported_frame", Some("frame"))
    );
    assert_eq!(
        field(doc(r#""center": "Moon","#, "ICRF")),
        ("unknown_center", Some("center"))
    );
}

fn settings(ephemeris: &Ephemeris, reference: LunarReference) -> LunarSettings<'_> {
    LunarSettings {
        ephemeris,
        reference,
        gravity_model: crate::physics::moon::gravity::LunarGravityModel::PointMass,
    }
}

#[test]
fn below_the_lunar_surface_and_beyond_the_hill_sphere_are_refused() {
    let ephemeris = Ephemeris::embedded().unwrap();
    let run = |a_km: f64| {
        let set = read_oem(&oem("MOON", "ICRF", a_km, 1), &context()).unwrap();
        lunar_proper_time_of_track(
            &set.objects[0],
            &InterpolationOptions::default(),
            &ProperTimeOptions::default(),
            &context(),
            &settings(&ephemeris, LunarReference::Tcl),
        )
        .map(|_| ())
        .map_err(|e| (e.code, e.index))
    };
    // Mean radius 1737.4 km (IAU WGCCRE, Archinal et al. 2018); 60 000 km (Hill sphere).
    assert_eq!(run(1737.0), Err(("below_surface", Some(0))));
    assert_eq!(run(61_000.0), Err(("beyond_model_range", Some(0))));
    assert!(run(1737.5).is_ok());
}

/// Six hours of a 100 km circular orbit given in TDB: against TCL the mean rate is the closed
/// form -(3 GM_M/(2a))/c^2 = -4.4534e-11 (common practice) within the tides' bound 3e-16
/// and the Hermite interpolation of the 60 s states; against TL it is that plus
/// L_L/(1 - L_L) (TL = (1 - L_L) TCL, Turyshev et al. arXiv:2406.16147); against TT the TCL
/// rate dTCL/dTT = 1 + 6.798e-10 on average (Lu, Yang & Xie 2025, A&A 704 A76, with TT = TDB
/// in rate) moves it, within the periodic rate terms of TCL - TDB and TDB - TT over six hours
/// (annual 1651 us and monthly 126 us amplitudes: at most 3.7e-10, common practice).
#[test]
fn circular_orbit_against_tcl_tl_and_tt() {
    let ephemeris = Ephemeris::embedded().unwrap();
    let set = read_oem(&oem("MOON", "ICRF", 1837.4, 6), &context()).unwrap();
    let rate = |reference| {
        lunar_proper_time_of_track(
            &set.objects[0],
            &InterpolationOptions::default(),
            &ProperTimeOptions::default(),
            &context(),
            &settings(&ephemeris, reference),
        )
        .unwrap()
        .series
        .summary
        .mean_rate
    };
    let closed = -1.5 * GM_MOON_M3_S2 / 1_837_400.0 / SPEED_OF_LIGHT_SQUARED_M2_S2;
    let tcl = rate(LunarReference::Tcl);
    assert!((tcl - closed).abs() < 3e-16, "{tcl:e} vs {closed:e}");
    let tl = rate(LunarReference::Tl);
    let expected_tl = (1.0 + tcl) / (1.0 - L_L) - 1.0;
    assert!(
        (tl - expected_tl).abs() < 1e-18,
        "{tl:e} vs {expected_tl:e}"
    );
    let tt = rate(LunarReference::Tt);
    println!("against TCL {tcl:e}, TL {tl:e}, TT {tt:e}");
    assert!((tt - tcl - 6.798e-10).abs() < 3.7e-10, "{:e}", tt - tcl);
}

/// TCL - TT from hourly nodes against one engine conversion per epoch (the definition) over
/// two days every 97 s: within 2e-14 s (measured 1.3e-14 s: the engine's own rounding, see
/// `tcl_axis`; common practice for an interpolation check).
#[test]
fn tcl_axis_matches_the_engine_at_every_epoch() {
    use super::tcl_axis::TclAxis;
    use crate::physics::time::convert::convert;
    use crate::physics::time::instant::{seconds_f64_to_attos, Instant};
    use crate::physics::time::scale::Scale;
    let first_tt = 830_000_000i128 * 1_000_000_000_000_000_000;
    let span_s = 2.0 * 86_400.0 + 17.0;
    let axis = TclAxis::new(first_tt, span_s, &context(), "X").unwrap();
    let tcl_of = |tt: i128| {
        convert(
            &Instant::from_count_attos(Scale::Tt, tt),
            Scale::Tcl,
            &context(),
        )
        .unwrap()
        .count_attos()
    };
    let first_tcl = tcl_of(first_tt);
    let mut worst: f64 = 0.0;
    let mut t = 0.0;
    while t <= span_s {
        let tt = first_tt + seconds_f64_to_attos(t);
        let exact = ((tcl_of(tt) - first_tcl) - (tt - first_tt)) as f64 / 1e18;
        worst = worst.max((axis.offset_s(t) - exact).abs());
        assert!((axis.tt_s(axis.tcl_s(t)) - t).abs() < 1e-9);
        t += 97.0;
    }
    println!("TCL - TT from nodes: worst {worst:e} s");
    assert!(worst < 2e-14, "{worst:e}");
}
