//! SPK type 2 and type 3 segments: Chebyshev polynomials over fixed-length intervals.
//!
//! NAIF "SPK Required Reading", sections "Type 2: Chebyshev (position only)" and "Type 3:
//! Chebyshev (position and velocity)": the segment's data are N records of RSIZE doubles,
//! followed by INIT (start of the first interval, TDB seconds since J2000), INTLEN (interval
//! length, s), RSIZE and N. A record holds MID and RADIUS of its interval and the coefficients
//! of X, Y, Z (type 2; km) or of X, Y, Z, VX, VY, VZ (type 3; km and km/s), each in Chebyshev
//! polynomials of the first kind of the argument (t - MID) / RADIUS. Type 2 velocities are the
//! derivative of the position polynomials.

use super::daf::{ByteOrder, KernelError, SpkSummary};

/// Most coefficients per component read (DE440 uses at most 14; common practice bound that
/// keeps the evaluation on the stack).
pub const MAX_COEFFICIENTS: usize = 32;
const ATTOS_PER_S_F64: f64 = 1e18;
const ATTOS_PER_S: i128 = 1_000_000_000_000_000_000;

/// A Chebyshev segment's layout inside the kernel's bytes.
#[derive(Debug, Clone, PartialEq)]
pub struct ChebyshevSegment {
    /// NAIF id of the body.
    pub target: i32,
    /// NAIF id of the centre.
    pub center: i32,
    /// First epoch covered, TDB seconds since J2000.
    pub start_s: f64,
    /// Last epoch covered, TDB seconds since J2000.
    pub end_s: f64,
    /// Byte offset of the first record.
    data_offset: usize,
    init_s: f64,
    interval_s: f64,
    record_words: usize,
    records: usize,
    /// Coefficients per component.
    coefficients: usize,
    /// 2 (position polynomials) or 3 (position and velocity polynomials).
    data_type: i32,
    order: ByteOrder,
}

/// A position (km) and velocity (km/s) from one segment.
pub type StateKm = ([f64; 3], [f64; 3]);

impl ChebyshevSegment {
    /// Reads the directory words of a type 2 or 3 segment and checks them against the file.
    pub fn new(bytes: &[u8], order: ByteOrder, summary: &SpkSummary) -> Result<Self, KernelError> {
        let where_ = format!(
            "segment `{}` (body {} about {}, type {})",
            summary.name, summary.target, summary.center, summary.data_type
        );
        let components = match summary.data_type {
            2 => 3,
            3 => 6,
            other => {
                return Err(KernelError(format!(
                    "{where_}: SPK type {other} is not read (types 2 and 3 are)"
                )))
            }
        };
        let words = summary.end_word + 1 - summary.start_word;
        if words < 4 {
            return Err(KernelError(format!("{where_}: fewer than 4 data words")));
        }
        let word = |w: usize| order.f64_at(bytes, (w - 1) * 8).unwrap_or(f64::NAN);
        let end = summary.end_word;
        let (init_s, interval_s, rsize, n) =
            (word(end - 3), word(end - 2), word(end - 1), word(end));
        let whole = |x: f64| x.is_finite() && x >= 1.0 && x.fract() == 0.0 && x < 1e9;
        if !(whole(rsize) && whole(n) && init_s.is_finite() && interval_s > 0.0) {
            return Err(KernelError(format!(
                "{where_}: bad directory INIT = {init_s}, INTLEN = {interval_s}, RSIZE = {rsize}, N = {n}"
            )));
        }
        let (record_words, records) = (rsize as usize, n as usize);
        let coefficients = (record_words.saturating_sub(2)) / components;
        if record_words != 2 + components * coefficients
            || coefficients == 0
            || coefficients > MAX_COEFFICIENTS
            || record_words * records + 4 != words
        {
            return Err(KernelError(format!(
                "{where_}: RSIZE = {record_words} and N = {records} do not fit its {words} data words with {components} components of at most {MAX_COEFFICIENTS} coefficients"
            )));
        }
        if summary.start_s < init_s - 1e-3
            || summary.end_s > init_s + interval_s * records as f64 + 1e-3
        {
            return Err(KernelError(format!(
                "{where_}: the records cover {init_s} .. {} s, less than the summary's {} .. {} s",
                init_s + interval_s * records as f64,
                summary.start_s,
                summary.end_s
            )));
        }
        Ok(Self {
            target: summary.target,
            center: summary.center,
            start_s: summary.start_s,
            end_s: summary.end_s,
            data_offset: (summary.start_word - 1) * 8,
            init_s,
            interval_s,
            record_words,
            records,
            coefficients,
            data_type: summary.data_type,
            order,
        })
    }

    /// Whether the segment covers `tdb_s` (TDB seconds since J2000).
    pub fn covers(&self, tdb_s: f64) -> bool {
        tdb_s >= self.start_s && tdb_s <= self.end_s
    }

    /// Position (km) and velocity (km/s) at the TDB instant `tdb_attos` (attoseconds since
    /// J2000), from the record whose interval holds it (the last record at the segment's end);
    /// `None` when the bytes do not hold the record (prevented by [`Self::new`]'s checks).
    ///
    /// Only the coefficients summed are decoded, straight from the record's bytes (no copy of
    /// the kernel), with the byte order chosen once per sum.
    pub fn state_km(&self, bytes: &[u8], tdb_attos: i128) -> Option<StateKm> {
        let tdb_s = tdb_attos as f64 / ATTOS_PER_S_F64;
        let index = ((tdb_s - self.init_s) / self.interval_s).floor();
        let index = (index.max(0.0) as usize).min(self.records - 1);
        let start = self.data_offset + index * self.record_words * 8;
        let record = bytes.get(start..start + self.record_words * 8)?;
        let (words, _) = record.as_chunks::<8>();
        let mut head = [0.0_f64; 2];
        self.order.decode(words.get(..2)?, &mut head);
        let [mid_s, radius_s] = head;
        // t - MID without losing the attoseconds: MID's whole seconds are subtracted as
        // integers, its fraction (exact in f64) afterwards.
        let mid_whole = mid_s.floor();
        let offset_attos = tdb_attos - (mid_whole as i128) * ATTOS_PER_S;
        let dt_s = offset_attos as f64 / ATTOS_PER_S_F64 - (mid_s - mid_whole);
        let x = dt_s / radius_s;
        let n = self.coefficients;
        let mut t = [0.0_f64; MAX_COEFFICIENTS];
        let mut dt = [0.0_f64; MAX_COEFFICIENTS];
        chebyshev_values(x, &mut t[..n], &mut dt[..n]);
        let coefficients = words.get(2..2 + self.components() * n)?;
        let series = |component: usize, basis: &[f64]| {
            self.order
                .dot(&coefficients[component * n..(component + 1) * n], basis)
        };
        let mut position = [0.0; 3];
        let mut velocity = [0.0; 3];
        for axis in 0..3 {
            position[axis] = series(axis, &t[..n]);
            velocity[axis] = if self.data_type == 3 {
                series(axis + 3, &t[..n])
            } else {
                series(axis, &dt[..n]) / radius_s
            };
        }
        Some((position, velocity))
    }
}

impl ChebyshevSegment {
    /// Components per record: 3 (type 2) or 6 (type 3).
    fn components(&self) -> usize {
        if self.data_type == 3 {
            6
        } else {
            3
        }
    }
}

impl ByteOrder {
    /// Decodes the 8-byte IEEE doubles `words` into `out` (as many as both hold).
    #[inline]
    fn decode(self, words: &[[u8; 8]], out: &mut [f64]) {
        let pairs = out.iter_mut().zip(words);
        match self {
            Self::Little => pairs.for_each(|(o, w)| *o = f64::from_le_bytes(*w)),
            Self::Big => pairs.for_each(|(o, w)| *o = f64::from_be_bytes(*w)),
        }
    }

    /// sum_k c_k basis_k with the coefficients c_k decoded from the 8-byte IEEE doubles
    /// `words` as they are summed (as many terms as both hold).
    #[inline]
    fn dot(self, words: &[[u8; 8]], basis: &[f64]) -> f64 {
        let pairs = words.iter().zip(basis);
        match self {
            Self::Little => pairs.map(|(w, b)| f64::from_le_bytes(*w) * b).sum(),
            Self::Big => pairs.map(|(w, b)| f64::from_be_bytes(*w) * b).sum(),
        }
    }
}

/// Chebyshev polynomials of the first kind T_k(x) and their derivatives T_k'(x), k = 0..n-1,
/// by the three-term recurrences T_{k+1} = 2x T_k - T_{k-1} and
/// T'_{k+1} = 2 T_k + 2x T'_k - T'_{k-1} (Press et al., Numerical Recipes, 3rd ed. (2007),
/// sec. 5.8; the recurrence NAIF's SPK Required Reading describes for types 2 and 3).
pub fn chebyshev_values(x: f64, values: &mut [f64], derivatives: &mut [f64]) {
    let n = values.len().min(derivatives.len());
    if n == 0 {
        return;
    }
    values[0] = 1.0;
    derivatives[0] = 0.0;
    if n == 1 {
        return;
    }
    values[1] = x;
    derivatives[1] = 1.0;
    for k in 2..n {
        values[k] = 2.0 * x * values[k - 1] - values[k - 2];
        derivatives[k] = 2.0 * values[k - 1] + 2.0 * x * derivatives[k - 1] - derivatives[k - 2];
    }
}
