//! The per-epoch series and the summary of a proper-time integration.

use crate::physics::constants::{L_G, SECONDS_PER_DAY, SPEED_OF_LIGHT_SQUARED_M2_S2};

/// One output epoch.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ProperTimeSample {
    /// Coordinate time since the first epoch, s.
    pub t_s: f64,
    /// Accumulated tau - t since the first epoch, s.
    pub tau_minus_t_s: f64,
    /// The part accumulated from the velocity term of the rate, s.
    pub velocity_part_s: f64,
    /// The part accumulated from the gravity term of the rate (the Earth's potential, and L_G
    /// against TT), s.
    pub gravity_part_s: f64,
    /// The part accumulated from the tidal potentials of external bodies (the Sun and the
    /// Moon), s; zero for a rate without them. tau - t = velocity + gravity + tidal parts.
    pub tidal_part_s: f64,
    /// The Keplerian periodic term -2 r.v / c^2 at this epoch, s.
    pub periodic_s: f64,
    /// tau - t minus the periodic term and the least-squares line, s.
    pub residual_s: f64,
}

/// Summary of one integration.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ProperTimeSummary {
    /// First epoch, coordinate s (as given).
    pub start_s: f64,
    /// Last epoch, coordinate s.
    pub end_s: f64,
    /// end - start, s.
    pub span_s: f64,
    /// tau - t accumulated over the span, s.
    pub accumulated_s: f64,
    /// accumulated / span: the mean fractional rate offset.
    pub mean_rate: f64,
    /// The mean rate in microseconds per day of 86 400 s.
    pub mean_rate_us_per_day: f64,
    /// Half the peak-to-peak of the periodic term over the output epochs, s.
    pub periodic_amplitude_s: f64,
    /// RMS of the residuals, s.
    pub kepler_residual_rms_s: f64,
}

/// The result of an integration.
#[derive(Debug, Clone, PartialEq)]
pub struct ProperTimeSeries {
    /// One sample per output epoch.
    pub samples: Vec<ProperTimeSample>,
    /// The summary.
    pub summary: ProperTimeSummary,
}

/// The model note of [`kepler_periodic_term_s`] and of the residual of a series.
pub const PERIODIC_NOTE: &str = "the periodic term is -2 r.v / c^2 (IS-GPS-200 20.3.3.3.3.1); the residual is tau - t minus that term and the least-squares line";

/// The Keplerian periodic clock term `-2 r.v / c^2`, s.
///
/// Inputs: position_m (m) and velocity_m_s (m/s), geocentric, inertial (or, equivalently, r.v
/// in the Earth-fixed frame, which the rotation leaves unchanged). For a Keplerian orbit it
/// equals F e sqrt(a) sin E with F = -2 sqrt(GM)/c^2 (IS-GPS-200 section 20.3.3.3.3.1; Ashby,
/// Living Rev. Relativity 6 (2003) 1, eq. 52 and the relation r.v = sqrt(GM a) e sin E).
pub fn kepler_periodic_term_s(position_m: &[f64; 3], velocity_m_s: &[f64; 3]) -> f64 {
    let r_dot_v = position_m[0] * velocity_m_s[0]
        + position_m[1] * velocity_m_s[1]
        + position_m[2] * velocity_m_s[2];
    -2.0 * r_dot_v / SPEED_OF_LIGHT_SQUARED_M2_S2
}

/// Least-squares line y = a + b (t - mean t) (ordinary least squares, e.g. Press et al.,
/// Numerical Recipes, 3rd ed., section 15.2), returned as (a, b, mean t).
fn fit_line(times_s: &[f64], values: &[f64]) -> (f64, f64, f64) {
    let count = times_s.len().max(1) as f64;
    let mean_t = times_s.iter().sum::<f64>() / count;
    let mean_y = values.iter().sum::<f64>() / count;
    let (mut sty, mut stt) = (0.0, 0.0);
    for (t, y) in times_s.iter().zip(values) {
        sty += (t - mean_t) * (y - mean_y);
        stt += (t - mean_t) * (t - mean_t);
    }
    let slope = if stt > 0.0 { sty / stt } else { 0.0 };
    (mean_y, slope, mean_t)
}

/// Assembles the series from epochs, periodic terms and accumulated (velocity, gravity, tidal)
/// parts.
pub(super) fn build(epochs_s: &[f64], periodic: Vec<f64>, parts: &[[f64; 3]]) -> ProperTimeSeries {
    let total: Vec<f64> = parts.iter().map(|[v, g, w]| v + g + w).collect();
    let detrended: Vec<f64> = total.iter().zip(&periodic).map(|(y, p)| y - p).collect();
    let (intercept, slope, mean_t) = fit_line(epochs_s, &detrended);
    let mut samples = Vec::with_capacity(epochs_s.len());
    let mut square_sum = 0.0;
    for (((t_s, tau), [velocity, gravity, tidal]), (periodic_s, y)) in epochs_s
        .iter()
        .zip(&total)
        .zip(parts)
        .zip(periodic.iter().zip(&detrended))
    {
        let residual_s = y - intercept - slope * (t_s - mean_t);
        square_sum += residual_s * residual_s;
        samples.push(ProperTimeSample {
            t_s: *t_s,
            tau_minus_t_s: *tau,
            velocity_part_s: *velocity,
            gravity_part_s: *gravity,
            tidal_part_s: *tidal,
            periodic_s: *periodic_s,
            residual_s,
        });
    }
    let start_s = epochs_s.first().copied().unwrap_or(0.0);
    let end_s = epochs_s.last().copied().unwrap_or(0.0);
    let span_s = end_s - start_s;
    let accumulated_s = total.last().copied().unwrap_or(0.0);
    let mean_rate = if span_s > 0.0 {
        accumulated_s / span_s
    } else {
        0.0
    };
    let (low, high) = periodic
        .iter()
        .fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), p| {
            (lo.min(*p), hi.max(*p))
        });
    ProperTimeSeries {
        summary: ProperTimeSummary {
            start_s,
            end_s,
            span_s,
            accumulated_s,
            mean_rate,
            mean_rate_us_per_day: mean_rate * SECONDS_PER_DAY * 1e6,
            periodic_amplitude_s: if high >= low { 0.5 * (high - low) } else { 0.0 },
            kepler_residual_rms_s: (square_sum / samples.len().max(1) as f64).sqrt(),
        },
        samples,
    }
}

/// Re-expresses a series computed against TT as a series against TCG.
///
/// tau - TCG = (tau - TT) - (TCG - TT), and since the first epoch TCG - TT grows by
/// L_G / (1 - L_G) per second of TT (IAU 2000 Resolution B1.9; IERS Conventions (2010)
/// eq. 10.1). The gravity part carries the change (it is the part that depends on the
/// reference; the tidal part does not); elapsed times become TCG seconds.
pub fn relative_to_tcg(series: &ProperTimeSeries) -> ProperTimeSeries {
    let rate = L_G / (1.0 - L_G);
    let epochs_s: Vec<f64> = series
        .samples
        .iter()
        .map(|sample| sample.t_s * (1.0 + rate))
        .collect();
    let periodic = series
        .samples
        .iter()
        .map(|sample| sample.periodic_s)
        .collect();
    let parts: Vec<[f64; 3]> = series
        .samples
        .iter()
        .map(|sample| {
            [
                sample.velocity_part_s,
                sample.gravity_part_s - rate * sample.t_s,
                sample.tidal_part_s,
            ]
        })
        .collect();
    build(&epochs_s, periodic, &parts)
}

#[cfg(test)]
mod tcg_tests {
    use super::*;

    #[test]
    fn tcg_series_runs_slower_by_l_g() {
        // A clock that keeps TT exactly (zero rate against TT) runs slow against TCG by
        // L_G / (1 - L_G) (IAU 2000 Resolution B1.9).
        let epochs_s: Vec<f64> = (0..=10).map(|k| f64::from(k) * 8_640.0).collect();
        let parts = vec![[0.0; 3]; epochs_s.len()];
        let series = build(&epochs_s, vec![0.0; epochs_s.len()], &parts);
        let tcg = relative_to_tcg(&series);
        let expected = -L_G / (1.0 - L_G) / (1.0 + L_G / (1.0 - L_G));
        assert!(
            (tcg.summary.mean_rate - expected).abs() < 1e-22,
            "{}",
            tcg.summary.mean_rate
        );
        assert!((tcg.summary.accumulated_s + L_G / (1.0 - L_G) * 86_400.0).abs() < 1e-18);
        assert!(tcg.summary.kepler_residual_rms_s < 1e-20);
    }
}
