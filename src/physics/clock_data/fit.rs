//! Straight-line least-squares fit of a clock series: offset, rate and residual RMS.

/// A fitted clock line y = offset + rate (t - t_ref), with the RMS of the residuals.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LineFit {
    /// Value of the line at t = 0 (the series' reference epoch), s.
    pub offset_s: f64,
    /// Slope, s/s (a fractional frequency offset).
    pub rate: f64,
    /// Root mean square of the residuals y - line, s.
    pub residual_rms_s: f64,
    /// Number of points.
    pub count: usize,
}

/// Ordinary least-squares line through (t_i, y_i), centred on the mean t for conditioning
/// (normal equations of a first-degree polynomial; common practice). None with fewer than two
/// points or all t equal. `t_s` and `y_s` have the same length.
pub fn fit_line(t_s: &[f64], y_s: &[f64]) -> Option<LineFit> {
    let count = t_s.len().min(y_s.len());
    if count < 2 {
        return None;
    }
    let n = count as f64;
    let t_mean = t_s[..count].iter().sum::<f64>() / n;
    let y_mean = y_s[..count].iter().sum::<f64>() / n;
    let (mut stt, mut sty) = (0.0, 0.0);
    for (t, y) in t_s[..count].iter().zip(&y_s[..count]) {
        let dt = t - t_mean;
        stt += dt * dt;
        sty += dt * (y - y_mean);
    }
    if stt <= 0.0 {
        return None;
    }
    let rate = sty / stt;
    let mut sum_squares = 0.0;
    for (t, y) in t_s[..count].iter().zip(&y_s[..count]) {
        let residual = y - y_mean - rate * (t - t_mean);
        sum_squares += residual * residual;
    }
    Some(LineFit {
        offset_s: y_mean - rate * t_mean,
        rate,
        residual_rms_s: (sum_squares / n).sqrt(),
        count,
    })
}
