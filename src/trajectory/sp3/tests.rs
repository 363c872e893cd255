//! SP3 reader tests. Column layout: IGS SP3-c (Hilla 2010) and SP3-d (Hilla 2016)
//! format descriptions.

use super::*;
use crate::physics::time::instant::ATTOS_PER_SECOND;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::trajectory::Frame;

fn position_line(id: &str, km: [f64; 3]) -> String {
    format!(
        "P{id}{:14.6}{:14.6}{:14.6}{:14.6}",
        km[0], km[1], km[2], 12.345678
    )
}

fn velocity_line(id: &str, dm_s: [f64; 3]) -> String {
    format!(
        "V{id}{:14.6}{:14.6}{:14.6}{:14.6}",
        dm_s[0], dm_s[1], dm_s[2], 0.0
    )
}

/// An SP3 text: version `c` or `d`, time system, three satellites, three epochs 15 min apart,
/// with or without V lines; G02 has a bad (0.000000) position at the second epoch.
fn sample(version: char, time_system: &str, velocities: bool) -> String {
    let flag = if velocities { 'V' } else { 'P' };
    let mut lines = vec![
        format!("#{version}{flag}2026  5 20  0  0  0.00000000       3 ORBIT IGS20 FIT  TST"),
        "## 2419 259200.00000000   900.00000000 61180 0.0000000000000".to_string(),
    ];
    let count = "+    3   "; // SP3-c count in columns 5-6, SP3-d in 4-6
    lines.push(format!("{count}G01G02R03{}", "  0".repeat(14)));
    for _ in 0..4 {
        lines.push(format!("+        {}", "  0".repeat(17)));
    }
    for _ in 0..5 {
        lines.push(format!("++       {}", "  0".repeat(17)));
    }
    lines.push(format!(
        "%c M  cc {time_system} ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc"
    ));
    lines.push("%c cc cc ccc ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc".into());
    lines.push("%f  1.2500000  1.025000000  0.00000000000  0.000000000000000".into());
    lines.push("%f  0.0000000  0.000000000  0.00000000000  0.000000000000000".into());
    lines.push("%i    0    0    0    0      0      0      0      0         0".into());
    lines.push("%i    0    0    0    0      0      0      0      0         0".into());
    let comments = if version == 'd' { 6 } else { 4 };
    for _ in 0..comments {
        lines.push("/* invented test orbit".into());
    }
    for epoch in 0..3 {
        let minute = 15 * epoch;
        lines.push(format!("*  2026  5 20  0 {minute:2}  0.00000000"));
        for (k, id) in ["G01", "G02", "R03"].iter().enumerate() {
            let angle = 0.001 * f64::from(epoch * 900) + k as f64;
            let mut km = [
                26_000.0 * angle.cos(),
                26_000.0 * angle.sin(),
                1000.0 * k as f64,
            ];
            if *id == "G02" && epoch == 1 {
                km = [0.0; 3];
            }
            lines.push(position_line(id, km));
            if velocities {
                lines.push(velocity_line(
                    id,
                    [-26_000.0 * angle.sin(), 26_000.0 * angle.cos(), 5.0],
                ));
            }
        }
    }
    lines.push("EOF".into());
    lines.join("\n") + "\n"
}

fn read(text: &str) -> Result<TrajectorySet, TrajectoryError> {
    let table = LeapTable::builtin();
    read_sp3(text, &ConversionContext::geocentric(table))
}

#[test]
fn reads_sp3c_and_sp3d_with_and_without_velocities() {
    for version in ['c', 'd'] {
        for velocities in [false, true] {
            let ephemeris =
                read(&sample(version, "GPS", velocities)).unwrap_or_else(|e| panic!("{e}"));
            let ids: Vec<&str> = ephemeris.objects.iter().map(|t| t.id.as_str()).collect();
            assert_eq!(ids, ["G01", "G02", "R03"]);
            let g01 = &ephemeris.objects[0];
            // SP3 positions are Earth-fixed, in km (Hilla 2010, P record).
            assert_eq!((g01.frame, g01.scale), (Frame::EarthFixed, Scale::Gpst));
            assert_eq!(g01.states.len(), 3);
            assert_eq!(g01.states[0].position_m, [26_000_000.0, 0.0, 0.0]);
            // Velocities in dm/s (Hilla 2010, V record): 26000 dm/s = 2600 m/s.
            assert_eq!(
                g01.states[0].velocity_m_s.map(|v| v[1]),
                velocities.then_some(2600.0)
            );
            // The bad 0.000000 position of G02 at the second epoch is skipped (Hilla 2010).
            assert_eq!(ephemeris.objects[1].states.len(), 2);
            let step = g01.states[1].epoch.count_attos() - g01.states[0].epoch.count_attos();
            assert_eq!(step, 900 * ATTOS_PER_SECOND);
        }
    }
}

#[test]
fn bad_position_999999_is_skipped() {
    // The brief's convention for absent positions (999999.999999), besides SP3-c's 0.000000.
    let text = sample('d', "GPS", false).replacen(
        &position_line(
            "R03",
            [26_000.0 * 2.0f64.cos(), 26_000.0 * 2.0f64.sin(), 2000.0],
        ),
        &position_line("R03", [999_999.999_999, 999_999.999_999, 999_999.999_999]),
        1,
    );
    let ephemeris = read(&text).unwrap_or_else(|e| panic!("{e}"));
    assert_eq!(ephemeris.objects[2].states.len(), 2);
}

#[test]
fn time_systems() {
    // GPST = TAI - 19 s (IS-GPS-200); UTC = TAI - 37 s in 2026 (IERS Bulletin C);
    // GLONASS time = UTC(SU) + 3 h (GLONASS ICD; from memory).
    let first = |system: &str| {
        read(&sample('d', system, false))
            .map(|e| e.objects[0].states[0].epoch)
            .unwrap_or_else(|e| panic!("{e}"))
    };
    let table = LeapTable::builtin();
    let context = ConversionContext::geocentric(table);
    let tt = |system: &str| {
        crate::physics::time::convert::to_tt_attos(&first(system), &context)
            .unwrap_or_else(|e| panic!("{e}"))
    };
    // The same label 00:00:00 is 18 s later as an event in UTC than in GPS time (37 - 19 s).
    assert_eq!(tt("UTC") - tt("GPS"), 18 * ATTOS_PER_SECOND);
    assert_eq!(tt("UTC") - tt("GLO"), 3 * 3600 * ATTOS_PER_SECOND);
    assert_eq!(first("GAL").scale(), Scale::Gst);
    assert_eq!(first("BDT").scale(), Scale::Bdt);
    assert_eq!(first("QZS").scale(), Scale::Qzsst);
    assert_eq!(first("TAI").scale(), Scale::Tai);
    let error = read(&sample('d', "IRN", false))
        .err()
        .map(|e| (e.code, e.line));
    assert_eq!(error, Some(("sp3_unsupported_time_system", Some(13))));
}

fn error_of(text: &str) -> (&'static str, Option<usize>) {
    match read(text) {
        Ok(_) => panic!("accepted: {text}"),
        Err(error) => (error.code, error.line),
    }
}

#[test]
fn each_error_has_its_code_and_line() {
    // Line numbers of `sample` (header 22 lines with SP3-c, then epochs); rules of Hilla 2010.
    let good = sample('c', "GPS", false);
    assert_eq!(
        error_of(&good.replacen("#cP", "#aP", 1)),
        ("sp3_unsupported_version", Some(1))
    );
    assert_eq!(
        error_of(&good.replacen("#cP", "#cX", 1)),
        ("sp3_bad_column", Some(1))
    );
    assert_eq!(
        error_of(&good.replacen("+    3", "+    x", 1)),
        ("sp3_bad_column", Some(3))
    );
    assert_eq!(
        error_of(&good.replacen("*  2026  5 20  0 15", "*  2026 13 20  0 15", 1)),
        ("sp3_bad_epoch", Some(27))
    );
    assert_eq!(
        error_of(&good.replacen("*  2026  5 20  0 15  0.00000000", "*  2026  5 20  0 15", 1)),
        ("sp3_bad_epoch", Some(27))
    );
    let line = position_line("G01", [26_000.0, 0.0, 0.0]);
    assert_eq!(
        error_of(&good.replacen(&line, &line.replacen("26000.000000", "26000.0x0000", 1), 1)),
        ("sp3_bad_column", Some(24))
    );
    assert_eq!(
        error_of(&good.replacen(&line, &line[..30], 1)),
        ("sp3_bad_column", Some(24))
    );
    assert_eq!(
        error_of(&good.replacen(&line, "Q bad line", 1)),
        ("sp3_unexpected_line", Some(24))
    );
    assert_eq!(
        error_of(&good.replacen("%i    0", "Zi    0", 1)),
        ("sp3_unexpected_line", Some(17))
    );
    assert_eq!(
        error_of(&good.replacen("EOF\n", "", 1)),
        ("sp3_missing_eof", Some(34))
    );
    let header_only: String = good.lines().take(22).collect::<Vec<_>>().join("\n");
    assert_eq!(error_of(&header_only), ("sp3_no_epochs", Some(22)));
}

proptest::proptest! {
    #[test]
    fn arbitrary_text_never_panics(text in "\\PC{0,400}") {
        let _ = read(&text);
    }

    #[test]
    fn mutated_files_never_panic(position in 0usize..3_000, replacement in "[ -~\n]{0,6}", velocities: bool) {
        // Damage a valid file at an arbitrary place (common practice for parser robustness).
        let good = sample('d', "GPS", velocities);
        let cut = good.char_indices().map(|(i, _)| i).nth(position % good.len()).unwrap_or(0);
        let text = format!("{}{}{}", &good[..cut], replacement, good[cut..].chars().skip(2).collect::<String>());
        let _ = read(&text);
    }
}
