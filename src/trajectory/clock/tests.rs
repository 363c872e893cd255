//! Clock reader tests. Layouts: RINEX clock 3.04 (IGS/RTCM, 2017) and SP3-c/d (Hilla 2010,
//! 2016) clock column.

use super::*;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::trajectory::sp3::read_sp3_with_clocks;

fn header_line(content: &str, label: &str) -> String {
    format!("{content:<60}{label}")
}

fn rinex(records: &[&str]) -> String {
    let mut lines = vec![
        header_line(
            "     3.04           C                   GPS",
            "RINEX VERSION / TYPE",
        ),
        header_line("invented test file", "COMMENT"),
        header_line("   GPS", "TIME SYSTEM ID"),
        header_line("", "END OF HEADER"),
    ];
    lines.extend(records.iter().map(|r| r.to_string()));
    lines.join("\n") + "\n"
}

fn read(text: &str) -> Result<ClockData, crate::trajectory::TrajectoryError> {
    read_rinex_clock(text, &ConversionContext::geocentric(LeapTable::builtin()))
}

#[test]
fn reads_satellite_and_receiver_records_with_continuations() {
    let text = rinex(&[
        "AS G01       2026 05 20 00 00  0.000000  2    1.234567890123E-04  1.000000000000E-11",
        "AR TESSARO00ITA 2026 05 20 00 00  0.000000  1   -2.500000000000E-09",
        "AS G01       2026 05 20 00 00 30.000000  4    1.234567890456E-04  1.0E-11",
        "   2.0E-12  3.0E-12",
        "CR G01       2026 05 20 00 00  0.000000  1    1.0E-09",
        "XX G01       2026 05 20 00 01  0.000000  1    1.0E-09",
    ]);
    let data = read(&text).unwrap_or_else(|e| panic!("{e}"));
    assert_eq!(data.series.len(), 2);
    let g01 = &data.series[0];
    assert_eq!(
        (g01.id.as_str(), g01.receiver, g01.values.len()),
        ("G01", false, 2)
    );
    // RINEX clock 3.04: the first value is the clock bias in seconds.
    assert_eq!(g01.values[0].clock_s, 1.234567890123e-4);
    assert_eq!(g01.values[1].line, 7);
    assert_eq!(g01.values[0].epoch.scale(), Scale::Gpst);
    let seconds = (g01.values[1].epoch.count_attos() - g01.values[0].epoch.count_attos())
        / crate::physics::time::instant::ATTOS_PER_SECOND;
    assert_eq!(seconds, 30);
    assert!(data.series[1].receiver);
    // The unknown record type is skipped with a warning naming its line.
    assert_eq!(data.warnings.len(), 1);
    assert!(data.warnings[0].contains("line 10"), "{:?}", data.warnings);
}

#[test]
fn bad_files_name_the_line() {
    let err = read("not a rinex file\n").unwrap_err();
    assert_eq!((err.code, err.line), ("rinex_clock_bad_header", Some(1)));
    let no_end = rinex(&[]).replace("END OF HEADER", "COMMENT");
    let err = read(&no_end).unwrap_err();
    assert_eq!(err.code, "rinex_clock_missing_end_of_header");
    let err = read(&rinex(&["AS G01 2026 05 20 00 00 0.0 1 abc"])).unwrap_err();
    assert_eq!((err.code, err.line), ("rinex_clock_bad_record", Some(5)));
    let err = read(&rinex(&["AS G01 2026 02 30 00 00 0.0 1 1.0E-9"])).unwrap_err();
    assert_eq!((err.code, err.line), ("rinex_clock_bad_record", Some(5)));
    assert!(err.message.contains("date"), "{}", err.message);
    let err = read(&rinex(&["AS G01 2026 05 20 00 00 0.0 9 1.0E-9"])).unwrap_err();
    assert_eq!(err.code, "rinex_clock_bad_record");
    let glonass = rinex(&[]).replace(
        &header_line("   GPS", "TIME SYSTEM ID"),
        &header_line("   GLO", "TIME SYSTEM ID"),
    );
    let err = read(&glonass).unwrap_err();
    assert_eq!(
        (err.code, err.line),
        ("rinex_clock_unsupported_time_system", Some(3))
    );
}

fn sp3_with_clocks() -> String {
    let mut lines = vec![
        "#dP2026  5 20  0  0  0.00000000       2 ORBIT IGS20 FIT  TST".to_string(),
        "## 2419 259200.00000000   900.00000000 61180 0.0000000000000".to_string(),
        format!("+    2   G01G02{}", "  0".repeat(15)),
        "%c M  cc GPS ccc cccc cccc cccc cccc ccccc ccccc ccccc ccccc".to_string(),
    ];
    for (epoch, minute) in [0, 15].iter().enumerate() {
        lines.push(format!("*  2026  5 20  0 {minute:2}  0.00000000"));
        lines.push(format!(
            "PG01{:14.6}{:14.6}{:14.6}{:14.6}",
            26000.0,
            0.0,
            0.0,
            12.5 + epoch as f64
        ));
        let clock = if epoch == 0 { 999999.999999 } else { -3.25 };
        lines.push(format!(
            "PG02{:14.6}{:14.6}{:14.6}{:14.6}",
            0.0, 0.0, 0.0, clock
        ));
    }
    lines.push("EOF".into());
    lines.join("\n") + "\n"
}

#[test]
fn sp3_clock_column_with_bad_markers() {
    let table = LeapTable::builtin();
    let (orbits, clocks) =
        read_sp3_with_clocks(&sp3_with_clocks(), &ConversionContext::geocentric(table))
            .unwrap_or_else(|e| panic!("{e}"));
    // SP3-c/d: clock in microseconds, 999999.999999 = bad or absent.
    let g01 = &clocks.series[0];
    let read: Vec<f64> = g01.values.iter().map(|v| v.clock_s).collect();
    assert!(
        (read[0] - 12.5e-6).abs() < 1e-20 && (read[1] - 13.5e-6).abs() < 1e-20,
        "{read:?}"
    );
    let g02 = &clocks.series[1];
    assert_eq!((g02.id.as_str(), g02.values.len()), ("G02", 1));
    assert!((g02.values[0].clock_s + 3.25e-6).abs() < 1e-20);
    assert_eq!(clocks.absent_values, 1);
    // G02's positions are all absent: the clock is kept, the orbit is not.
    assert_eq!(orbits.objects.len(), 1);
    // An unreadable clock column is left out with a warning naming its line; the orbit stays.
    let text = sp3_with_clocks().replacen("    13.500000", "    13.5x0000", 1);
    let (orbits, clocks) =
        read_sp3_with_clocks(&text, &ConversionContext::geocentric(LeapTable::builtin()))
            .unwrap_or_else(|e| panic!("{e}"));
    assert_eq!(orbits.objects[0].states.len(), 2);
    assert_eq!(clocks.series[0].values.len(), 1);
    assert!(
        clocks.warnings[0].starts_with("line 9:"),
        "{:?}",
        clocks.warnings
    );
}
