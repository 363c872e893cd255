//! Noise identification and equivalent degrees of freedom (EDF) for confidence intervals.
//!
//! * Power-law noise type alpha (S_y(f) ~ f^alpha; 2 white PM, 1 flicker PM, 0 white FM,
//!   -1 flicker FM, -2 random-walk FM) from the lag-1 autocorrelation (W. J. Riley and
//!   C. A. Greenhall, "Power law noise identification using the lag 1 autocorrelation",
//!   Proc. 18th EFTF, 2004; NIST SP 1065 section 5.5.6).
//! * EDF of the Allan variances from the approximate formulas of D. A. Howe, D. W. Allan and
//!   J. A. Barnes, "Properties of signal sources and measurement methods", Proc. 35th Annual
//!   Frequency Control Symposium, 1981 (NIST SP 1065 section 5.3.2, table of EDF formulas).
//! * EDF of the total variance: edf = b (T / tau) - c with T the record length (NIST SP 1065
//!   section 5.2.11: b, c = 1.50, 0 white FM; 1.17, 0.22 flicker FM; 0.93, 0.36 RW FM).

/// Fewest points for which the lag-1 autocorrelation identifies a noise type; below it the
/// type found at the next shorter averaging time is kept (NIST SP 1065 5.5.6 asks for at least
/// about 30 points; common practice to carry the type over).
pub const MIN_POINTS_FOR_NOISE_ID: usize = 30;

/// Lag-1 autocorrelation of a series (NIST SP 1065 eq. 70): sum (z_i - mean)(z_{i+1} - mean)
/// / sum (z_i - mean)^2; 0 for a constant series.
pub fn lag1_autocorrelation(z: &[f64]) -> f64 {
    let n = z.len();
    if n < 2 {
        return 0.0;
    }
    let mean = z.iter().sum::<f64>() / n as f64;
    let den: f64 = z.iter().map(|v| (v - mean) * (v - mean)).sum();
    let num: f64 = z.windows(2).map(|w| (w[0] - mean) * (w[1] - mean)).sum();
    if den > 0.0 {
        num / den
    } else {
        0.0
    }
}

/// The noise type alpha (rounded to an integer in -2 ..= 2) of phase data `x` averaged by m
/// (Riley and Greenhall 2004): the phase decimated by m is differenced d times (d <= 2) until
/// delta = r1 / (1 + r1) < 0.25; then p = -2 (delta + d) and alpha = p + 2 for phase data.
/// `None` with fewer than [`MIN_POINTS_FOR_NOISE_ID`] decimated points.
pub fn noise_alpha(x: &[f64], m: usize) -> Option<i32> {
    let mut z: Vec<f64> = x.iter().step_by(m.max(1)).copied().collect();
    if z.len() < MIN_POINTS_FOR_NOISE_ID {
        return None;
    }
    let mut d = 0;
    loop {
        let r1 = lag1_autocorrelation(&z);
        let delta = r1 / (1.0 + r1);
        if delta < 0.25 || d >= 2 {
            let p = -2.0 * (delta + d as f64);
            return Some(((p + 2.0).round() as i32).clamp(-2, 2));
        }
        z = z.windows(2).map(|w| w[1] - w[0]).collect();
        d += 1;
    }
}

/// EDF of the overlapping Allan variance for `n` phase points at factor m and noise alpha
/// (Howe, Allan and Barnes 1981; NIST SP 1065 5.3.2). With m = 1 on the phase decimated by m
/// it is the EDF of the non-overlapping Allan variance.
pub fn allan_edf(n: usize, m: usize, alpha: i32) -> f64 {
    let n = n as f64;
    let mf = m as f64;
    match alpha {
        2 => (n + 1.0) * (n - 2.0 * mf) / (2.0 * (n - mf)),
        1 => {
            let a = ((n - 1.0) / (2.0 * mf)).ln();
            let b = ((2.0 * mf + 1.0) * (n - 1.0) / 4.0).ln();
            (a * b).max(0.0).sqrt().exp()
        }
        0 => {
            (3.0 * (n - 1.0) / (2.0 * mf) - 2.0 * (n - 2.0) / n) * 4.0 * mf * mf
                / (4.0 * mf * mf + 5.0)
        }
        -1 => {
            if m == 1 {
                2.0 * (n - 2.0) * (n - 2.0) / (2.3 * n - 4.9)
            } else {
                5.0 * n * n / (4.0 * mf * (n + 3.0 * mf))
            }
        }
        _ => {
            (n - 2.0) / mf * ((n - 1.0) * (n - 1.0) - 3.0 * mf * (n - 1.0) + 4.0 * mf * mf)
                / ((n - 3.0) * (n - 3.0))
        }
    }
}

/// EDF of the total variance for `n` phase points at factor m (NIST SP 1065 5.2.11), for the
/// frequency noises (alpha <= 0); for phase noises the Allan EDF applies (the table gives none).
pub fn total_edf(n: usize, m: usize, alpha: i32) -> f64 {
    let ratio = (n - 1) as f64 / m as f64; // T / tau
    match alpha {
        0 => 1.50 * ratio,
        -1 => 1.17 * ratio - 0.22,
        a if a < -1 => 0.93 * ratio - 0.36,
        _ => allan_edf(n, m, alpha),
    }
}
