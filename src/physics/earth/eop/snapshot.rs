//! The Earth orientation snapshot built into the binary, and its reader.
//!
//! The file `src/physics/earth/data/eop_snapshot.txt` is written by
//! `tools/make_eop_snapshot.py` from the IERS files of astropy-iers-data 0.2026.11.2.0.34.55
//! (IERS EOP 20 C04 `eopc04.1962-now` for every C04 day, IERS Bulletin A `finals2000A.all`
//! after it); its header and `src/physics/earth/data/eop_README.md` give the source and terms.
//!
//! Format (line-oriented text): `#` comments; `eop-snapshot 1`; `source <text>`;
//! `c04_last_mjd <mjd>`; `last_observed_mjd <mjd>`; `runs <name> <first mjd> (O|P <count>)+`
//! for `status` and `nutation_status`; `column <name> <first mjd> <count>` followed by lines of
//! integers: the first value, the first difference, then second differences; `end`. Units:
//! x_p, y_p, dX, dY in 1e-6 arcsec; UT1-UTC and LOD in 1e-7 s. Values are decoded as
//! `integer / 10^k`, a correctly rounded division, so they equal the files' printed decimals
//! read as `f64`.

use std::collections::HashMap;
use std::sync::OnceLock;

use super::error::{EopErrorCode, EopFileError};
use super::table::{EopDay, EopSigma, EopStatus, EopTable};

const SNAPSHOT: &str = include_str!("../data/eop_snapshot.txt");

/// A decoded column: first MJD and integer values.
struct Column {
    first_mjd: i64,
    values: Vec<i64>,
}

impl Column {
    fn at(&self, mjd: i64) -> Option<i64> {
        let i = usize::try_from(mjd.checked_sub(self.first_mjd)?).ok()?;
        self.values.get(i).copied()
    }
}

fn bad(line: usize, expected: &str, found: &str) -> EopFileError {
    EopFileError::new(line, EopErrorCode::BadSnapshot, expected, found)
}

/// Reads the snapshot format (see the module documentation).
pub fn parse_snapshot(text: &str) -> Result<EopTable, EopFileError> {
    let mut source = None;
    let mut last_observed = None;
    let mut runs: HashMap<String, (i64, Vec<EopStatus>)> = HashMap::new();
    let mut columns: HashMap<String, Column> = HashMap::new();
    let mut open: Option<(String, i64, usize, Vec<i64>)> = None;
    let mut seen_magic = false;
    let mut count = 0;
    let mut ended = false;
    for (index, line) in text.lines().enumerate() {
        count = index + 1;
        let t = line.trim();
        if t.is_empty() || t.starts_with('#') {
            continue;
        }
        if ended {
            return Err(bad(count, "nothing after `end`", t));
        }
        let first_byte = t.bytes().next().unwrap_or(b' ');
        if first_byte == b'-' || first_byte.is_ascii_digit() {
            let Some((_, _, expected, values)) = open.as_mut() else {
                return Err(bad(count, "a `column` line before the numbers", t));
            };
            for word in t.split_whitespace() {
                let v: i64 = word.parse().map_err(|_| bad(count, "an integer", word))?;
                if values.len() >= *expected {
                    return Err(bad(count, "no more numbers than the column count", word));
                }
                values.push(v);
            }
            continue;
        }
        if let Some((name, first, expected, deltas)) = open.take() {
            if deltas.len() != expected {
                return Err(bad(
                    count,
                    &format!("{expected} numbers in column {name}"),
                    t,
                ));
            }
            let values = undo_differences(&deltas).ok_or_else(|| bad(count, "small numbers", t))?;
            columns.insert(
                name,
                Column {
                    first_mjd: first,
                    values,
                },
            );
        }
        let (key, rest) = t.split_once(' ').unwrap_or((t, ""));
        match key {
            "eop-snapshot" if rest == "1" => seen_magic = true,
            _ if !seen_magic => return Err(bad(count, "`eop-snapshot 1`", t)),
            "source" => source = Some(rest.to_string()),
            "c04_last_mjd" => {}
            "last_observed_mjd" => last_observed = Some(int(rest, count)?),
            "runs" => {
                let words: Vec<&str> = rest.split_whitespace().collect();
                let (Some(name), Some(first)) = (words.first(), words.get(1)) else {
                    return Err(bad(count, "runs <name> <first mjd> ...", t));
                };
                let mut flags = Vec::new();
                for pair in words[2..].chunks(2) {
                    let status = match pair[0] {
                        "O" => EopStatus::Observed,
                        "P" => EopStatus::Predicted,
                        other => return Err(bad(count, "O or P", other)),
                    };
                    let n = pair
                        .get(1)
                        .map_or(Err(bad(count, "a count", t)), |c| int(c, count))?;
                    let n = usize::try_from(n).ok().filter(|n| *n <= 1_000_000);
                    let n = n.ok_or_else(|| bad(count, "a count up to 1e6", t))?;
                    if flags.len() + n > 1_000_000 {
                        return Err(bad(count, "at most 1e6 days", t));
                    }
                    flags.extend(std::iter::repeat_n(status, n));
                }
                runs.insert(name.to_string(), (int(first, count)?, flags));
            }
            "column" => {
                let words: Vec<&str> = rest.split_whitespace().collect();
                let &[name, first, n] = words.as_slice() else {
                    return Err(bad(count, "column <name> <first mjd> <count>", t));
                };
                let n = usize::try_from(int(n, count)?)
                    .ok()
                    .filter(|n| *n <= 1_000_000);
                let n = n.ok_or_else(|| bad(count, "a count up to 1e6", t))?;
                open = Some((
                    name.to_string(),
                    int(first, count)?,
                    n,
                    Vec::with_capacity(n),
                ));
            }
            "end" => ended = true,
            _ => return Err(bad(count, "a known snapshot line", t)),
        }
    }
    if !ended {
        return Err(bad(count, "`end` (the snapshot is truncated)", ""));
    }
    assemble(source, last_observed, &runs, &columns, count)
}

fn int(text: &str, line: usize) -> Result<i64, EopFileError> {
    text.trim()
        .parse::<i64>()
        .map_err(|_| bad(line, "an integer", text))
}

/// First value, first difference, second differences -> values (None on overflow).
fn undo_differences(terms: &[i64]) -> Option<Vec<i64>> {
    let mut out = Vec::with_capacity(terms.len());
    let mut value = *terms.first()?;
    out.push(value);
    let mut step = 0_i64;
    for (i, &t) in terms.iter().enumerate().skip(1) {
        step = if i == 1 { t } else { step.checked_add(t)? };
        value = value.checked_add(step)?;
        if value.abs() > 100_000_000 {
            return None;
        }
        out.push(value);
    }
    Some(out)
}

fn assemble(
    source: Option<String>,
    last_observed: Option<i64>,
    runs: &HashMap<String, (i64, Vec<EopStatus>)>,
    columns: &HashMap<String, Column>,
    count: usize,
) -> Result<EopTable, EopFileError> {
    let need = |name: &str| {
        columns
            .get(name)
            .ok_or_else(|| bad(count, name, "no such column"))
    };
    let (xp, yp, ut1) = (need("xp")?, need("yp")?, need("ut1_utc")?);
    let (dx, dy, lod) = (need("dx")?, need("dy")?, need("lod")?);
    let (sx, sy, st) = (need("sigma_xp")?, need("sigma_yp")?, need("sigma_ut1_utc")?);
    let status = runs
        .get("status")
        .ok_or_else(|| bad(count, "runs status", "none"))?;
    let nutation = runs
        .get("nutation_status")
        .ok_or_else(|| bad(count, "runs nutation_status", "none"))?;
    if status.0 != xp.first_mjd || status.1.len() != xp.values.len() {
        return Err(bad(
            count,
            "status runs as long as column xp",
            "other lengths",
        ));
    }
    let mut days = Vec::with_capacity(xp.values.len());
    for (i, (&x, &flag)) in xp.values.iter().zip(&status.1).enumerate() {
        let mjd = xp.first_mjd + i as i64;
        let (Some(y), Some(u)) = (yp.at(mjd), ut1.at(mjd)) else {
            return Err(bad(
                count,
                "columns yp and ut1_utc as long as xp",
                "shorter",
            ));
        };
        let nut_index = usize::try_from(mjd - nutation.0).ok();
        let sigma = match (sx.at(mjd), sy.at(mjd), st.at(mjd)) {
            (Some(a), Some(b), Some(c)) => Some(EopSigma {
                xp_arcsec: a as f64 / 1e6,
                yp_arcsec: b as f64 / 1e6,
                ut1_minus_utc_s: c as f64 / 1e7,
            }),
            _ => None,
        };
        days.push(EopDay {
            mjd,
            ut1_minus_utc_s: u as f64 / 1e7,
            xp_arcsec: x as f64 / 1e6,
            yp_arcsec: y as f64 / 1e6,
            dx_arcsec: dx.at(mjd).map(|v| v as f64 / 1e6),
            dy_arcsec: dy.at(mjd).map(|v| v as f64 / 1e6),
            lod_s: lod.at(mjd).map(|v| v as f64 / 1e7),
            status: flag,
            nutation_status: nut_index
                .and_then(|k| nutation.1.get(k).copied())
                .unwrap_or(EopStatus::Predicted),
            sigma,
        });
    }
    let lines: Vec<usize> = vec![count; days.len()];
    let table = EopTable::from_days(days, &lines, count, source.unwrap_or_default())?;
    if last_observed.is_some() && table.last_observed_mjd() != last_observed {
        return Err(bad(
            count,
            "last_observed_mjd matching the status runs",
            "another day",
        ));
    }
    Ok(table)
}

/// The built-in table, parsed once. If the embedded text ever failed to parse (a unit test
/// proves it does not), the table is empty and every lookup is outside it, with the reason in
/// its source.
pub(crate) fn builtin() -> &'static EopTable {
    static TABLE: OnceLock<EopTable> = OnceLock::new();
    TABLE.get_or_init(parse_builtin)
}

/// The built-in table parsed anew (as [`builtin`], without keeping it for the process).
pub(crate) fn parse_builtin() -> EopTable {
    parse_snapshot(SNAPSHOT)
        .unwrap_or_else(|e| EopTable::empty(format!("built-in EOP snapshot unreadable: {e}")))
}
