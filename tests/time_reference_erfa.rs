//! The time engine against ERFA (pyerfa) reference vectors, and conversion round trips.
//!
//! Reference: tests/reference/time_conversions_erfa.csv, made by
//! tests/reference/make_time_conversion_reference.py with pyerfa (ERFA functions dat, tttcg,
//! tcgtt, dtdb, tdbtcb, tcbtdb). Agreement required: 1 ps (the target).

use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::time::convert::{convert, ConversionContext, TdbEvaluation};
use eigenzeit::physics::time::formats::{parse_instant, reading_count_attos, InstantFormat};
use eigenzeit::physics::time::instant::{
    attos_to_seconds_f64, Instant, ATTOS_PER_DAY, ATTOS_PER_SECOND,
};
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;
use eigenzeit::physics::time::tdb_series::TopocentricObserver;

const REFERENCE: &str = include_str!("reference/time_conversions_erfa.csv");
const ONE_PICOSECOND_S: f64 = 1e-12;

struct Row<'a> {
    kind: &'a str,
    from: Scale,
    to: Scale,
    format: InstantFormat,
    input: &'a str,
    expected_s: f64,
    observer: Option<[f64; 3]>,
}

fn rows() -> Vec<Row<'static>> {
    REFERENCE
        .lines()
        .filter(|line| !line.starts_with('#') && !line.starts_with("kind,"))
        .map(|line| {
            let fields: Vec<&str> = line.split(',').collect();
            assert_eq!(fields.len(), 9, "{line}");
            let observer = if fields[6].is_empty() {
                None
            } else {
                let parse = |s: &str| s.parse::<f64>().expect("observer coordinate");
                Some([parse(fields[6]), parse(fields[7]), parse(fields[8])])
            };
            Row {
                kind: fields[0],
                from: fields[1].parse().expect("scale"),
                to: fields[2].parse().expect("scale"),
                format: fields[3].parse().expect("format"),
                input: fields[4],
                expected_s: fields[5].parse().expect("expected"),
                observer,
            }
        })
        .collect()
}

fn difference_s(row: &Row<'_>, evaluation: TdbEvaluation) -> f64 {
    let table = LeapTable::builtin();
    let context = ConversionContext {
        table,
        observer: row.observer.map(TopocentricObserver::from_itrf_m),
        tdb_evaluation: evaluation,
        tdb_model: eigenzeit::physics::time::tdb_model::TdbModel::Series,
        // The reference passes ERFA `dtdb` the UTC fraction of day (the script's `ut`), so
        // the topocentric term here takes it too (no UT1 source).
        ut1: None,
    };
    let input = parse_instant(row.input, row.format, row.from, table)
        .unwrap_or_else(|e| panic!("{}: {e}", row.input));
    let output = convert(&input, row.to, &context).unwrap_or_else(|e| panic!("{}: {e}", row.input));
    let difference = reading_count_attos(&output, table).expect("reading")
        - reading_count_attos(&input, table).expect("reading");
    attos_to_seconds_f64(difference)
}

#[test]
fn agrees_with_erfa_within_one_picosecond() {
    let rows = rows();
    assert!(rows.len() > 2000, "reference file has {} rows", rows.len());
    let mut worst: std::collections::BTreeMap<&str, f64> = Default::default();
    for evaluation in [TdbEvaluation::Fitted, TdbEvaluation::FullSeries] {
        for row in &rows {
            let error = (difference_s(row, evaluation) - row.expected_s).abs();
            let entry = worst.entry(row.kind).or_insert(0.0);
            *entry = entry.max(error);
            assert!(
                error <= ONE_PICOSECOND_S,
                "{} {} -> {} at {}: {} s off ERFA",
                row.kind,
                row.from,
                row.to,
                row.input,
                error
            );
        }
    }
    println!("worst |service - ERFA| per kind (s): {worst:?}");
}

/// Pseudo-random epochs (a small xorshift; fixed seed so failures repeat).
fn epochs_1960_2100(count: usize) -> Vec<i128> {
    let first = (36_934 - 51_544) as i128 * ATTOS_PER_DAY; // 1960-01-01
    let span_s = (73_415 - 36_934) as i128 * 86_400; // to 2100-01-01
    let mut state: u64 = 0x9e37_79b9_7f4a_7c15;
    (0..count)
        .map(|_| {
            state ^= state << 13;
            state ^= state >> 7;
            state ^= state << 17;
            let high = i128::from(state >> 11);
            let whole_s = (high * span_s) / (1_i128 << 53);
            first + whole_s * ATTOS_PER_SECOND + i128::from(state % 999_999_999_999_999_989)
        })
        .collect()
}

#[test]
fn every_chain_round_trips_below_one_picosecond() {
    // Requirement of the issue: any conversion chain round-trips to better than 1 ps
    // for every epoch from 1960 to 2100 (common practice for a picosecond time engine).
    let table = LeapTable::builtin();
    let observer = Some(TopocentricObserver::from_itrf_m([
        4_027_894.0,
        307_045.0,
        4_919_474.9,
    ]));
    // UT1 takes part where the built-in EOP table covers the epoch (1962 .. 2027).
    let context = ConversionContext {
        table,
        observer,
        tdb_evaluation: TdbEvaluation::Fitted,
        tdb_model: eigenzeit::physics::time::tdb_model::TdbModel::Series,
        ut1: Some(EopTable::builtin()),
    };
    let mut worst_attos: i128 = 0;
    for count in epochs_1960_2100(3_000) {
        let start = Instant::from_count_attos(Scale::Tai, count);
        for from in Scale::ALL {
            let Ok(a) = convert(&start, from, &context) else {
                continue;
            };
            for to in Scale::ALL {
                let Ok(b) = convert(&a, to, &context) else {
                    continue;
                };
                let Ok(back) = convert(&b, from, &context) else {
                    continue;
                };
                let error = (back.count_attos() - a.count_attos()).abs();
                worst_attos = worst_attos.max(error);
                assert!(error < 1_000_000, "{from} -> {to} -> {from}: {error} as");
            }
        }
    }
    println!("worst round-trip error: {worst_attos} as");
}
