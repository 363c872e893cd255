//! Property tests of the ephemeris readers (JSON, CCSDS OEM, SP3): arbitrary and near-valid
//! text gives an ephemeris or an error, never a panic, and an accepted ephemeris integrates
//! (or is refused) without a panic. 256 cases per property (`PROPTEST_CASES` overrides).

mod proptest_support;

use proptest::prelude::*;
use proptest_support::{arbitrary_text, config, near_valid};

use eigenzeit::physics::proper_time::ProperTimeOptions;
use eigenzeit::physics::time::convert::ConversionContext;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::trajectory::{
    proper_time_of_ephemeris, read_json, read_oem, read_sp3, InterpolationOptions, TrajectoryError,
    TrajectorySet,
};

const OEM: &str = include_str!("../demo-data/lyra_kestrel.oem");
const SP3: &str = include_str!("../demo-data/lyra.sp3");

/// The first `lines` lines of a file (keeps the cases small and fast).
fn head(text: &str, lines: usize) -> String {
    text.lines().take(lines).collect::<Vec<_>>().join("\n") + "\n"
}

fn oem_samples() -> Vec<String> {
    vec![head(OEM, 40)]
}

fn sp3_samples() -> Vec<String> {
    vec![head(SP3, 80) + "EOF\n"]
}

fn json_samples() -> Vec<String> {
    let states: Vec<String> = (0..10)
        .map(|k| {
            let angle = f64::from(k) * 0.011;
            format!(
                "{{\"epoch\": \"2026-05-20T00:{:02}:00\", \"position_m\": [{}, {}, 0.0], \"velocity_m_s\": [{}, {}, 0.0]}}",
                k * 5,
                26_561_750.0 * angle.cos(),
                26_561_750.0 * angle.sin(),
                -3873.9 * angle.sin(),
                3873.9 * angle.cos()
            )
        })
        .collect();
    vec![format!(
        "{{\"frame\": \"GCRF\", \"time_scale\": \"UTC\", \"objects\": [{{\"id\": \"P\", \"states\": [{}]}}]}}",
        states.join(", ")
    )]
}

/// Reads, then integrates what was accepted: neither may panic.
fn read_and_integrate(
    read: impl FnOnce(&ConversionContext<'_>) -> Result<TrajectorySet, TrajectoryError>,
) {
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    if let Ok(ephemeris) = read(&context) {
        let rate =
            |_: &[f64; 3], v: &[f64; 3]| (-(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]) / 1.8e17, 0.0);
        let _ = proper_time_of_ephemeris(
            &ephemeris,
            &InterpolationOptions::default(),
            &ProperTimeOptions::default(),
            &context,
            eigenzeit::physics::earth::eop::EopTable::builtin(),
            |_| rate,
        );
    }
}

proptest! {
    #![proptest_config(config(256))]

    #[test]
    fn oem_never_panics(text in prop_oneof![arbitrary_text(), near_valid(oem_samples())]) {
        read_and_integrate(|context| read_oem(&text, context));
    }

    #[test]
    fn sp3_never_panics(text in prop_oneof![arbitrary_text(), near_valid(sp3_samples())]) {
        read_and_integrate(|context| read_sp3(&text, context));
    }

    #[test]
    fn json_never_panics(text in prop_oneof![arbitrary_text(), near_valid(json_samples())]) {
        read_and_integrate(|context| read_json(&text, context));
    }
}

#[test]
fn samples_are_valid() {
    // The near-valid cases start from files the readers accept (else they test little).
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    assert!(read_oem(&oem_samples()[0], &context).is_ok());
    assert!(read_sp3(&sp3_samples()[0], &context).is_ok());
    assert!(read_json(&json_samples()[0], &context).is_ok());
}
