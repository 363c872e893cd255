//! The variances, from phase (time error) data `x` in seconds at spacing `tau0_s`, for an
//! averaging factor `m` (tau = m tau0). Each returns (variance, number of terms), or `None`
//! when the series has no term at this factor. Sums of squared differences are accumulated in
//! `f64`; the differences are formed before squaring, so a large phase offset or a constant
//! frequency offset cancels before it can cost precision.
//!
//! Source of every formula: W. J. Riley, *Handbook of Frequency Stability Analysis*, NIST
//! Special Publication 1065 (2008), section 5.2, equations named below (N phase points).

/// Allan variance, non-overlapping (NIST SP 1065 eq. 7 on the phase decimated by m):
/// sigma^2 = sum (x[i+2m] - 2x[i+m] + x[i])^2 / (2 tau^2 (N_m - 2)), i = 0, m, 2m, ...
pub fn allan_variance(x: &[f64], m: usize, tau0_s: f64) -> Option<(f64, usize)> {
    strided_difference(x, m, m, 2).map(|(sum, n)| (sum / (2.0 * tau_sq(m, tau0_s) * n as f64), n))
}

/// Overlapping Allan variance (NIST SP 1065 eq. 11):
/// sigma^2 = sum_{i=0}^{N-2m-1} (x[i+2m] - 2x[i+m] + x[i])^2 / (2 tau^2 (N - 2m)).
pub fn overlapping_allan_variance(x: &[f64], m: usize, tau0_s: f64) -> Option<(f64, usize)> {
    strided_difference(x, m, 1, 2).map(|(sum, n)| (sum / (2.0 * tau_sq(m, tau0_s) * n as f64), n))
}

/// Hadamard variance, non-overlapping (NIST SP 1065 eq. 17 on the phase decimated by m):
/// sum (x[i+3m] - 3x[i+2m] + 3x[i+m] - x[i])^2 / (6 tau^2 (N_m - 3)), i = 0, m, 2m, ...
pub fn hadamard_variance(x: &[f64], m: usize, tau0_s: f64) -> Option<(f64, usize)> {
    strided_difference(x, m, m, 3).map(|(sum, n)| (sum / (6.0 * tau_sq(m, tau0_s) * n as f64), n))
}

/// Overlapping Hadamard variance (NIST SP 1065 eq. 19):
/// sum_{i=0}^{N-3m-1} (x[i+3m] - 3x[i+2m] + 3x[i+m] - x[i])^2 / (6 tau^2 (N - 3m)).
pub fn overlapping_hadamard_variance(x: &[f64], m: usize, tau0_s: f64) -> Option<(f64, usize)> {
    strided_difference(x, m, 1, 3).map(|(sum, n)| (sum / (6.0 * tau_sq(m, tau0_s) * n as f64), n))
}

/// Modified Allan variance (NIST SP 1065 eq. 14):
/// Mod sigma^2 = sum_{j=0}^{N-3m} [sum_{i=j}^{j+m-1} (x[i+2m] - 2x[i+m] + x[i])]^2
/// / (2 m^2 tau^2 (N - 3m + 1)). The inner sums come from running sums of the second
/// differences (O(N) per factor).
pub fn modified_allan_variance(x: &[f64], m: usize, tau0_s: f64) -> Option<(f64, usize)> {
    let n = x.len();
    if m == 0 || n < 3 * m {
        return None;
    }
    let terms = n - 3 * m + 1;
    let second = |i: usize| x[i + 2 * m] - 2.0 * x[i + m] + x[i];
    // Inner sum of the first window, then slide: S[j+1] = S[j] + d[j+m] - d[j]. The window is
    // summed afresh every max(4096, 4m) steps so that rounding does not accumulate (at a cost
    // of at most a quarter of an operation per step).
    let refresh = (4 * m).max(4096);
    let fresh = |j: usize| (j..j + m).map(second).sum::<f64>();
    let mut inner = fresh(0);
    let mut sum = 0.0;
    for j in 0..terms {
        if j > 0 {
            inner = if j % refresh == 0 {
                fresh(j)
            } else {
                inner + second(j + m - 1) - second(j - 1)
            };
        }
        sum += inner * inner;
    }
    let mf = m as f64;
    Some((
        sum / (2.0 * mf * mf * tau_sq(m, tau0_s) * terms as f64),
        terms,
    ))
}

/// Time variance (NIST SP 1065 eq. 15): sigma_x^2 = (tau^2 / 3) Mod sigma_y^2, in s^2.
pub fn time_variance(x: &[f64], m: usize, tau0_s: f64) -> Option<(f64, usize)> {
    modified_allan_variance(x, m, tau0_s).map(|(v, n)| (tau_sq(m, tau0_s) / 3.0 * v, n))
}

/// Total variance (NIST SP 1065 eq. 25): the phase extended at both ends by reflection,
/// x*[-j] = 2x[0] - x[j] and x*[N-1+j] = 2x[N-1] - x[N-1-j] (j = 1 .. N-2), then
/// Tot var = sum_{i=1}^{N-2} (x*[i-m] - 2x*[i] + x*[i+m])^2 / (2 tau^2 (N - 2)),
/// for 1 <= m <= (N - 1) / 2.
pub fn total_variance(x: &[f64], m: usize, tau0_s: f64) -> Option<(f64, usize)> {
    let n = x.len();
    if m == 0 || n < 3 || 2 * m > n - 1 {
        return None;
    }
    let last = n - 1;
    let extended = |k: isize| -> f64 {
        if k < 0 {
            2.0 * x[0] - x[(-k) as usize]
        } else if k as usize > last {
            let j = k as usize - last;
            2.0 * x[last] - x[last - j]
        } else {
            x[k as usize]
        }
    };
    let mi = m as isize;
    let mut sum = 0.0;
    for i in 1..last {
        let i = i as isize;
        let d = extended(i - mi) - 2.0 * extended(i) + extended(i + mi);
        sum += d * d;
    }
    let terms = n - 2;
    Some((sum / (2.0 * tau_sq(m, tau0_s) * terms as f64), terms))
}

fn tau_sq(m: usize, tau0_s: f64) -> f64 {
    let tau = m as f64 * tau0_s;
    tau * tau
}

/// Sum of squared differences of order `order` (2: x[i+2m] - 2x[i+m] + x[i]; 3: the
/// third difference) at lag m, for i = 0, stride, 2 stride, ...; with the number of terms.
fn strided_difference(x: &[f64], m: usize, stride: usize, order: usize) -> Option<(f64, usize)> {
    let span = order * m;
    if m == 0 || x.len() <= span {
        return None;
    }
    let mut sum = 0.0;
    let mut count = 0;
    let mut i = 0;
    while i + span < x.len() {
        let d = if order == 2 {
            x[i + 2 * m] - 2.0 * x[i + m] + x[i]
        } else {
            x[i + 3 * m] - 3.0 * x[i + 2 * m] + 3.0 * x[i + m] - x[i]
        };
        sum += d * d;
        count += 1;
        i += stride;
    }
    Some((sum, count))
}
