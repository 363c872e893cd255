//! One analysis: the series checked and turned into phase, the deviations at each averaging
//! factor with their terms, noise type, EDF and confidence interval.

use super::chi_squared::chi_squared_quantile;
use super::deviations::{
    allan_variance, hadamard_variance, modified_allan_variance, overlapping_allan_variance,
    overlapping_hadamard_variance, time_variance, total_variance,
};
use super::edf::{allan_edf, noise_alpha, total_edf};
use super::{DataKind, Deviation, EdfMethod, StabilityError, StabilityErrorKind};
use crate::physics::readable::readable;

/// What to analyse.
#[derive(Debug, Clone, Copy)]
pub struct StabilityRequest<'a> {
    /// What `values` hold.
    pub kind: DataKind,
    /// The samples: phase in seconds, or fractional frequency.
    pub values: &'a [f64],
    /// Sampling interval, seconds (> 0).
    pub tau0_s: f64,
    /// The deviations wanted, in the order answered.
    pub deviations: &'a [Deviation],
    /// Averaging factors m (tau = m tau0); `None`: octaves 1, 2, 4, ... as far as each
    /// deviation has a term.
    pub factors: Option<&'a [usize]>,
    /// Two-sided confidence level of the intervals, in (0, 1) (0.683 for "1 sigma").
    pub confidence: f64,
}

/// One deviation at one averaging time.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Estimate {
    /// Which deviation.
    pub deviation: Deviation,
    /// Averaging factor m.
    pub factor: usize,
    /// Averaging time tau = m tau0, seconds.
    pub tau_s: f64,
    /// The deviation (dimensionless; TDEV in seconds).
    pub value: f64,
    /// Number of terms (analysis points) summed.
    pub terms: usize,
    /// Power-law noise type alpha used for the EDF (S_y ~ f^alpha).
    pub noise_alpha: i32,
    /// Whether `noise_alpha` was identified at this factor (false: carried over from a shorter
    /// averaging time, or white FM assumed when no factor had enough points).
    pub noise_identified: bool,
    /// Equivalent degrees of freedom (at least 1).
    pub edf: f64,
    /// How `edf` was found.
    pub edf_method: EdfMethod,
    /// Lower and upper ends of the confidence interval of `value`.
    pub low: f64,
    /// Upper end.
    pub high: f64,
}

/// The largest factor at which a deviation has a term, for `n` phase points.
pub fn max_factor(deviation: Deviation, n: usize) -> usize {
    match deviation {
        Deviation::Adev | Deviation::Oadev => n.saturating_sub(1) / 2,
        Deviation::Mdev | Deviation::Tdev => n / 3,
        Deviation::Hdev | Deviation::Ohdev => n.saturating_sub(1) / 3,
        Deviation::Totdev => n.saturating_sub(1) / 2,
    }
}

/// Octave factors 1, 2, 4, ... up to `max` (empty when `max` is 0).
pub fn octave_factors(max: usize) -> Vec<usize> {
    std::iter::successors(Some(1usize), |m| m.checked_mul(2))
        .take_while(|&m| m <= max)
        .collect()
}

fn to_phase(request: &StabilityRequest) -> Result<Vec<f64>, StabilityError> {
    if request.values.is_empty() {
        return Err(StabilityError::new(
            StabilityErrorKind::EmptySeries,
            None,
            "the series has no values; send at least 3 phase or 2 frequency values",
        ));
    }
    if !(request.tau0_s.is_finite() && request.tau0_s > 0.0) {
        return Err(StabilityError::new(
            StabilityErrorKind::NonUniformSampling,
            None,
            format!(
                "the sampling interval tau0 must be a positive number of seconds, not {}",
                readable(request.tau0_s)
            ),
        ));
    }
    if let Some(index) = request.values.iter().position(|v| !v.is_finite()) {
        return Err(StabilityError::new(
            StabilityErrorKind::NotFiniteSample,
            Some(index),
            format!("value {index} is not a finite number"),
        ));
    }
    Ok(match request.kind {
        DataKind::Phase => request.values.to_vec(),
        DataKind::Frequency => {
            let mut x = Vec::with_capacity(request.values.len() + 1);
            let mut phase = 0.0;
            x.push(phase);
            for y in request.values {
                phase += y * request.tau0_s;
                x.push(phase);
            }
            x
        }
    })
    .and_then(|x| {
        if x.last().is_some_and(|v| v.is_finite()) {
            Ok(x)
        } else {
            Err(StabilityError::new(
                StabilityErrorKind::NotFiniteSample,
                None,
                "the phase accumulated from the frequency values overflows; scale the values",
            ))
        }
    })
}

/// The noise type at each factor (ascending), carried over where too few points identify it;
/// white FM (alpha 0) until a factor identifies one.
fn noise_types(x: &[f64], factors: &[usize]) -> Vec<(usize, i32, bool)> {
    let mut sorted = factors.to_vec();
    sorted.sort_unstable();
    sorted.dedup();
    let mut last = 0;
    sorted
        .into_iter()
        .map(|m| match noise_alpha(x, m) {
            Some(alpha) => {
                last = alpha;
                (m, alpha, true)
            }
            None => (m, last, false),
        })
        .collect()
}

/// Runs the analysis; the estimates are ordered by deviation (as asked), then by factor.
pub fn analyse(request: &StabilityRequest) -> Result<Vec<Estimate>, StabilityError> {
    let x = to_phase(request)?;
    let n = x.len();
    if !(request.confidence > 0.0 && request.confidence < 1.0) {
        return Err(StabilityError::new(
            StabilityErrorKind::InvalidConfidence,
            None,
            format!(
                "the confidence level must lie strictly between 0 and 1, not {}",
                readable(request.confidence)
            ),
        ));
    }
    let mut plan: Vec<(Deviation, Vec<usize>)> = Vec::new();
    for &deviation in request.deviations {
        let max = max_factor(deviation, n);
        let factors = match request.factors {
            None => octave_factors(max),
            Some(list) => {
                for (index, &m) in list.iter().enumerate() {
                    if m == 0 {
                        return Err(StabilityError::new(
                            StabilityErrorKind::TauNotMultiple,
                            Some(index),
                            "an averaging time must be at least tau0",
                        ));
                    }
                    if m > max {
                        return Err(too_short(deviation, index, m, max, n, request.tau0_s));
                    }
                }
                list.to_vec()
            }
        };
        if factors.is_empty() {
            return Err(too_short(deviation, 0, 1, max, n, request.tau0_s));
        }
        plan.push((deviation, factors));
    }
    let all: Vec<usize> = plan.iter().flat_map(|(_, f)| f.iter().copied()).collect();
    let noise = noise_types(&x, &all);
    let alpha_at = |m: usize| {
        noise
            .iter()
            .find(|(f, _, _)| *f == m)
            .map_or((0, false), |&(_, a, known)| (a, known))
    };
    let low_p = 0.5 * (1.0 - request.confidence);
    let mut out = Vec::new();
    for (deviation, factors) in plan {
        for m in factors {
            let (variance, terms) =
                variance(deviation, &x, m, request.tau0_s).ok_or_else(|| {
                    too_short(deviation, 0, m, max_factor(deviation, n), n, request.tau0_s)
                })?;
            let (alpha, identified) = alpha_at(m);
            let (edf, edf_method) = degrees_of_freedom(deviation, n, m, alpha);
            // The approximate formulas can leave their range for a handful of terms (the
            // random-walk one divides by (N - 3)^2): the count of terms then stands in.
            let edf = if edf.is_finite() {
                edf.max(1.0)
            } else {
                terms as f64
            };
            let value = variance.max(0.0).sqrt();
            if !value.is_finite() {
                return Err(StabilityError::new(
                    StabilityErrorKind::NotFiniteSample,
                    None,
                    format!(
                        "{deviation} at factor {m} overflows: the values are too large to square"
                    ),
                ));
            }
            out.push(Estimate {
                deviation,
                factor: m,
                tau_s: m as f64 * request.tau0_s,
                value,
                terms,
                noise_alpha: alpha,
                noise_identified: identified,
                edf,
                edf_method,
                low: value * (edf / chi_squared_quantile(1.0 - low_p, edf)).sqrt(),
                high: value * (edf / chi_squared_quantile(low_p, edf)).sqrt(),
            });
        }
    }
    Ok(out)
}

fn variance(deviation: Deviation, x: &[f64], m: usize, tau0_s: f64) -> Option<(f64, usize)> {
    match deviation {
        Deviation::Adev => allan_variance(x, m, tau0_s),
        Deviation::Oadev => overlapping_allan_variance(x, m, tau0_s),
        Deviation::Mdev => modified_allan_variance(x, m, tau0_s),
        Deviation::Tdev => time_variance(x, m, tau0_s),
        Deviation::Hdev => hadamard_variance(x, m, tau0_s),
        Deviation::Ohdev => overlapping_hadamard_variance(x, m, tau0_s),
        Deviation::Totdev => total_variance(x, m, tau0_s),
    }
}

fn degrees_of_freedom(deviation: Deviation, n: usize, m: usize, alpha: i32) -> (f64, EdfMethod) {
    match deviation {
        Deviation::Adev => (
            allan_edf((n - 1) / m + 1, 1, alpha),
            EdfMethod::HoweAllanBarnes,
        ),
        Deviation::Oadev => (allan_edf(n, m, alpha), EdfMethod::HoweAllanBarnes),
        Deviation::Totdev => (total_edf(n, m, alpha), EdfMethod::TotalVariance),
        Deviation::Mdev | Deviation::Tdev => (
            (((n - 3 * m) / m) + 1) as f64,
            EdfMethod::NonOverlappingTerms,
        ),
        Deviation::Hdev | Deviation::Ohdev => (
            (((n - 1 - 3 * m) / m) + 1) as f64,
            EdfMethod::NonOverlappingTerms,
        ),
    }
}

fn too_short(
    deviation: Deviation,
    index: usize,
    m: usize,
    max: usize,
    n: usize,
    tau0_s: f64,
) -> StabilityError {
    let longest = if max == 0 {
        format!("the series ({n} phase points) is too short for any averaging time")
    } else {
        format!(
            "the longest averaging time for {deviation} with {n} phase points is {} s (factor {max})",
            readable(max as f64 * tau0_s)
        )
    };
    StabilityError::new(
        StabilityErrorKind::SeriesTooShort,
        Some(index),
        format!(
            "{deviation} at tau = {} s (factor {m}) needs more data: {longest}",
            readable(m as f64 * tau0_s)
        ),
    )
}
