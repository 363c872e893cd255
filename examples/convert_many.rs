//! Converts many UTC epochs to TDB with the library and times the conversion alone, for the
//! comparison with ERFA in `bench/against_erfa.py` (which writes the input and reads the
//! output; run that script rather than this program).
//!
//! Input: little-endian `i64` pairs (UTC MJD day, nanoseconds of day). Output: little-endian
//! `i64` pairs (whole seconds, attoseconds 0..10^18) of TDB - UTC for each epoch, where
//! TDB - UTC is the TDB reading minus the UTC reading (seconds since J2000.0, 86 400 s a day).
//! Timed, per epoch: UTC reading -> instant (UTC -> TAI through the leap-second table), then
//! TAI -> TT -> TDB (geocentric TDB - TT series). Prints one JSON line with the timings.
//!
//! Usage: `convert_many INPUT OUTPUT [fitted|full] [REPEATS]`
#![forbid(unsafe_code)]

use std::process::ExitCode;
use std::time::Instant as Clock;

use eigenzeit::physics::time::convert::{convert, ConversionContext, TdbEvaluation};
use eigenzeit::physics::time::formats::instant_from_day_reading;
use eigenzeit::physics::time::instant::{uniform_count_attos, ATTOS_PER_SECOND};
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;

const ATTOS_PER_NANOSECOND: i128 = 1_000_000_000;

fn read_epochs(path: &str) -> Result<Vec<(i64, i128)>, String> {
    let bytes = std::fs::read(path).map_err(|e| format!("{path}: {e}"))?;
    if bytes.len() % 16 != 0 {
        return Err(format!("{path}: length is not a multiple of 16 bytes"));
    }
    let word = |chunk: &[u8]| {
        let mut array = [0u8; 8];
        array.copy_from_slice(chunk);
        i64::from_le_bytes(array)
    };
    Ok(bytes
        .chunks_exact(16)
        .map(|pair| {
            let (mjd, nanos) = pair.split_at(8);
            (word(mjd), i128::from(word(nanos)) * ATTOS_PER_NANOSECOND)
        })
        .collect())
}

/// One pass over all epochs: TDB - UTC in attoseconds, or the first error.
fn convert_all(
    epochs: &[(i64, i128)],
    context: &ConversionContext<'_>,
    offsets: &mut Vec<i128>,
) -> Result<(), String> {
    offsets.clear();
    for &(mjd, sod_attos) in epochs {
        let utc = instant_from_day_reading(Scale::Utc, mjd, sod_attos, context.table)
            .map_err(|e| format!("MJD {mjd}: {e}"))?;
        let tdb = convert(&utc, Scale::Tdb, context).map_err(|e| format!("MJD {mjd}: {e}"))?;
        offsets.push(tdb.count_attos() - uniform_count_attos(mjd, sod_attos));
    }
    Ok(())
}

fn run(args: &[String]) -> Result<(), String> {
    let [input, output, rest @ ..] = args else {
        return Err("usage: convert_many INPUT OUTPUT [fitted|full] [REPEATS]".to_string());
    };
    let evaluation = match rest.first().map(String::as_str) {
        None | Some("fitted") => TdbEvaluation::Fitted,
        Some("full") => TdbEvaluation::FullSeries,
        Some(other) => return Err(format!("unknown series {other:?}; fitted or full")),
    };
    let repeats: usize = match rest.get(1) {
        Some(text) => text.parse().map_err(|_| format!("bad REPEATS {text:?}"))?,
        None => 3,
    };
    let epochs = read_epochs(input)?;
    let table = LeapTable::builtin();
    let context = ConversionContext {
        tdb_evaluation: evaluation,
        tdb_model: eigenzeit::physics::time::tdb_model::TdbModel::Series,
        ..ConversionContext::geocentric(table)
    };
    let mut offsets = Vec::with_capacity(epochs.len());
    let mut times_s = Vec::new();
    for _ in 0..repeats.max(1) {
        let start = Clock::now();
        convert_all(&epochs, &context, &mut offsets)?;
        times_s.push(start.elapsed().as_secs_f64());
        std::hint::black_box(&offsets);
    }
    let mut bytes = Vec::with_capacity(offsets.len() * 16);
    for offset in &offsets {
        let whole = offset.div_euclid(ATTOS_PER_SECOND) as i64;
        let attos = offset.rem_euclid(ATTOS_PER_SECOND) as i64;
        bytes.extend_from_slice(&whole.to_le_bytes());
        bytes.extend_from_slice(&attos.to_le_bytes());
    }
    std::fs::write(output, bytes).map_err(|e| format!("{output}: {e}"))?;
    let best = times_s.iter().copied().fold(f64::INFINITY, f64::min);
    let all: Vec<String> = times_s.iter().map(|t| format!("{t:.6}")).collect();
    println!(
        "{{\"epochs\": {}, \"series\": \"{}\", \"best_s\": {best:.6}, \"runs_s\": [{}]}}",
        epochs.len(),
        if evaluation == TdbEvaluation::Fitted {
            "fitted"
        } else {
            "full"
        },
        all.join(", ")
    );
    Ok(())
}

fn main() -> ExitCode {
    let args: Vec<String> = std::env::args().skip(1).collect();
    match run(&args) {
        Ok(()) => ExitCode::SUCCESS,
        Err(message) => {
            eprintln!("convert_many: {message}");
            ExitCode::FAILURE
        }
    }
}
