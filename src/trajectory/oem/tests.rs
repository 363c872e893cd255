//! OEM reader tests. Layout of the samples: CCSDS 502.0-B-2 sections 5.2 and 5.3 (KVN).

use super::*;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::trajectory::Frame;

const SAMPLE: &str = "CCSDS_OEM_VERS = 2.0
COMMENT invented test message
CREATION_DATE = 2026-05-19T12:00:00
ORIGINATOR = TEST-OPS

META_START
OBJECT_NAME = ALPHA
OBJECT_ID = 2026-900A
CENTER_NAME = EARTH
REF_FRAME = EME2000
TIME_SYSTEM = UTC
START_TIME = 2026-05-20T00:00:00.000
USEABLE_START_TIME = 2026-05-20T00:00:00.000
USEABLE_STOP_TIME = 2026-05-20T00:10:00.000
STOP_TIME = 2026-05-20T00:10:00.000
INTERPOLATION = HERMITE
INTERPOLATION_DEGREE = 7
META_STOP
COMMENT data follow
2026-05-20T00:00:00.000 7000.0 0.0 0.0 0.0 7.5 0.0
2026-05-20T00:05:00.000 6000.0 3000.0 100.0 -3.0 6.0 0.1
2026-05-20T00:10:00.000 4000.0 5500.0 200.0 -5.0 4.0 0.2 0.001 0.002 0.003
COVARIANCE_START
EPOCH = 2026-05-20T00:00:00.000
COV_REF_FRAME = RTN
1.0
0.1 1.0
COVARIANCE_STOP
META_START
OBJECT_NAME = BETA
OBJECT_ID = 2026-900B
CENTER_NAME = EARTH
REF_FRAME = ITRF2020
TIME_SYSTEM = TT
START_TIME = 2026-140T00:00:00
STOP_TIME = 2026-140T00:01:00
META_STOP
2026-140T00:00:00 -7000.0 0.0 0.0 0.0 -7.5 0.0
2026-140T00:01:00 -6990.0 -450.0 0.0 0.5 -7.4 0.0
META_START
OBJECT_NAME = ALPHA
OBJECT_ID = 2026-900A
CENTER_NAME = EARTH
REF_FRAME = GCRF
TIME_SYSTEM = UTC
START_TIME = 2026-05-20T00:10:00.000
STOP_TIME = 2026-05-20T00:15:00.000
META_STOP
2026-05-20T00:10:00.000 4000.0 5500.0 200.0 -5.0 4.0 0.2
2026-05-20T00:15:00.000 1500.0 6800.0 300.0 -7.0 1.0 0.3
";

fn read(text: &str) -> Result<TrajectorySet, TrajectoryError> {
    let table = LeapTable::builtin();
    read_oem(text, &ConversionContext::geocentric(table))
}

#[test]
fn reads_objects_segments_comments_and_covariance() {
    let ephemeris = read(SAMPLE).unwrap_or_else(|e| panic!("{e}"));
    // Two objects, ALPHA's two segments concatenated with the shared boundary epoch kept once.
    assert_eq!(ephemeris.objects.len(), 2);
    let alpha = &ephemeris.objects[0];
    assert_eq!(alpha.id, "ALPHA");
    assert_eq!(alpha.frame, Frame::Inertial);
    assert_eq!(alpha.scale, Scale::Utc);
    assert_eq!(alpha.states.len(), 4);
    // km -> m and km/s -> m/s (CCSDS 502.0-B-2 table 5-3 units).
    assert_eq!(alpha.states[1].position_m, [6.0e6, 3.0e6, 1.0e5]);
    assert_eq!(alpha.states[1].velocity_m_s, Some([-3000.0, 6000.0, 100.0]));
    let beta = &ephemeris.objects[1];
    assert_eq!((beta.frame, beta.scale), (Frame::EarthFixed, Scale::Tt));
    // 60 s between the two ordinal-date epochs (ISO 8601 ordinal form).
    let step = beta.states[1].epoch.count_attos() - beta.states[0].epoch.count_attos();
    assert_eq!(step, 60 * crate::physics::time::instant::ATTOS_PER_SECOND);
}

#[test]
fn tdb_epochs_become_tt() {
    // TDB is converted to TT through the engine (TT = TDB - (TDB - TT)(TT), IAU 2006 B3).
    let text = SAMPLE.replace("TIME_SYSTEM = TT", "TIME_SYSTEM = TDB");
    let ephemeris = read(&text).unwrap_or_else(|e| panic!("{e}"));
    let beta = &ephemeris.objects[1];
    assert_eq!(beta.scale, Scale::Tt);
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    let tdb = super::super::text::parse_epoch("2026-140T00:00:00", Scale::Tdb, &context)
        .unwrap_or_else(|e| panic!("{e}"));
    let tt = crate::physics::time::convert::to_tt_attos(&tdb, &context)
        .unwrap_or_else(|e| panic!("{e}"));
    assert_eq!(beta.states[0].epoch.count_attos(), tt);
    assert_ne!(tt, tdb.count_attos());
}

/// Replaces the first occurrence of `from` and returns the error code and line.
fn error_of(from: &str, to: &str) -> (&'static str, Option<usize>) {
    let text = SAMPLE.replacen(from, to, 1);
    assert_ne!(text, SAMPLE, "{from} not in sample");
    match read(&text) {
        Ok(_) => panic!("accepted after replacing {from:?} by {to:?}"),
        Err(error) => (error.code, error.line),
    }
}

#[test]
fn each_error_has_its_code_and_line() {
    // Required keywords and values: CCSDS 502.0-B-2 tables 5-2, 5-3; line numbers of SAMPLE.
    assert_eq!(
        error_of("CCSDS_OEM_VERS = 2.0", "CCSDS_OEM_VERS = 9.0"),
        ("oem_unsupported_version", Some(1))
    );
    assert_eq!(
        error_of("CCSDS_OEM_VERS = 2.0\n", ""),
        ("oem_missing_keyword", Some(1))
    );
    assert_eq!(
        error_of("ORIGINATOR = TEST-OPS\n", "\n"),
        ("oem_missing_keyword", Some(6))
    );
    assert_eq!(
        error_of("OBJECT_ID = 2026-900A\n", ""),
        ("oem_missing_keyword", Some(17))
    );
    assert_eq!(
        error_of("CENTER_NAME = EARTH", "CENTER_NAME = MARS"),
        ("oem_unsupported_center", Some(6))
    );
    assert_eq!(
        error_of("REF_FRAME = EME2000", "REF_FRAME = TEME"),
        ("oem_unsupported_frame", Some(10))
    );
    assert_eq!(
        error_of("TIME_SYSTEM = UTC", "TIME_SYSTEM = UT1"),
        ("oem_unsupported_time_system", Some(11))
    );
    assert_eq!(
        error_of("INTERPOLATION = HERMITE", "INTERPOLATOR = HERMITE"),
        ("oem_unknown_keyword", Some(16))
    );
    assert_eq!(
        error_of(
            "\nSTOP_TIME = 2026-05-20T00:10",
            "\nSTOP_TIME = 2026-05-19T00:10"
        ),
        ("oem_bad_time_range", Some(15))
    );
    assert_eq!(
        error_of("\nSTART_TIME = 2026-05-20", "\nSTART_TIME = 2026-05-32"),
        ("bad_epoch", Some(12))
    );
    assert_eq!(
        error_of(
            "6000.0 3000.0 100.0 -3.0 6.0 0.1",
            "6000.0 3000.0 100.0 -3.0 6.0"
        ),
        ("oem_bad_data_line", Some(21))
    );
    assert_eq!(
        error_of("6000.0 3000.0 100.0", "6000.0 3x00.0 100.0"),
        ("bad_number", Some(21))
    );
    assert_eq!(
        error_of("6000.0 3000.0 100.0", "6000.0 NaN 100.0"),
        ("not_finite", Some(21))
    );
    assert_eq!(
        error_of(
            "2026-05-20T00:05:00.000 6000",
            "2026-05-20T00:25:00.000 6000"
        ),
        ("oem_epoch_outside_segment", Some(21))
    );
    assert_eq!(
        error_of(
            "2026-05-20T00:05:00.000 6000",
            "2026-05-20X00:05:00.000 6000"
        ),
        ("bad_epoch", Some(21))
    );
    assert_eq!(
        error_of("COVARIANCE_STOP", "COVARIANCE_END"),
        ("oem_missing_keyword", Some(50))
    );
    assert_eq!(
        error_of("REF_FRAME = GCRF", "REF_FRAME = ITRF2014"),
        ("oem_inconsistent_segments", Some(48))
    );
    assert_eq!(
        error_of("META_STOP\nCOMMENT data follow", "COMMENT data follow"),
        ("oem_bad_metadata_line", Some(19))
    );
}

#[test]
fn empty_and_header_only_texts_are_refused() {
    for text in [
        "",
        "\n\n",
        "CCSDS_OEM_VERS = 2.0\nCREATION_DATE = x\nORIGINATOR = y\n",
    ] {
        let error = read(text).err().map(|e| e.code);
        assert_eq!(error, Some("oem_missing_keyword"), "{text:?}");
    }
}

proptest::proptest! {
    #[test]
    fn arbitrary_text_never_panics(text in "\\PC{0,400}") {
        let _ = read(&text);
    }

    #[test]
    fn mutated_messages_never_panic(position in 0usize..2_000, replacement in "[ -~\n]{0,6}") {
        // Damage the valid sample at an arbitrary place (common practice for parser robustness).
        let cut = SAMPLE.char_indices().map(|(i, _)| i).nth(position % SAMPLE.len()).unwrap_or(0);
        let text = format!("{}{}{}", &SAMPLE[..cut], replacement, &SAMPLE[cut..].chars().skip(3).collect::<String>());
        let _ = read(&text);
    }
}
