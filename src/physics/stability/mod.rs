//! Frequency stability of a clock from phase (time error, seconds) or fractional frequency
//! data at a fixed interval tau0: Allan, overlapping Allan, modified Allan, time, Hadamard,
//! overlapping Hadamard and total deviations, with their number of terms and chi-squared
//! confidence intervals from equivalent degrees of freedom (W. J. Riley, *Handbook of
//! Frequency Stability Analysis*, NIST Special Publication 1065, 2008; IEEE Std 1139).
//!
//! Frequency data y are turned into phase x[0] = 0, x[k+1] = x[k] + y[k] tau0 (NIST SP 1065
//! eq. 4), so every deviation is computed from phase. Gaps are not filled: the caller sends a
//! gap-free stretch (see [`StabilityErrorKind::GapInSeries`]).

pub mod chi_squared;
pub mod deviations;
pub mod edf;
pub mod estimate;
#[cfg(test)]
mod reference_tests;
#[cfg(test)]
mod tests;

pub use estimate::{analyse, octave_factors, Estimate, StabilityRequest};

use crate::physics::vocabulary::vocabulary;

vocabulary! {
    /// What the series holds.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum DataKind {
        /// Time error (phase) x, seconds.
        Phase = "phase",
        /// Fractional frequency y (dimensionless), each the average over one interval.
        Frequency = "frequency",
    }
}

vocabulary! {
    /// The deviations offered (NIST SP 1065 section 5.2).
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum Deviation {
        /// Allan deviation, non-overlapping (eq. 7).
        Adev = "adev",
        /// Overlapping Allan deviation (eq. 11).
        Oadev = "oadev",
        /// Modified Allan deviation (eq. 14).
        Mdev = "mdev",
        /// Time deviation, seconds (eq. 15).
        Tdev = "tdev",
        /// Hadamard deviation, non-overlapping (eq. 17).
        Hdev = "hdev",
        /// Overlapping Hadamard deviation (eq. 19).
        Ohdev = "ohdev",
        /// Total deviation (eq. 25).
        Totdev = "totdev",
    }
}

vocabulary! {
    /// How the equivalent degrees of freedom of an estimate were found.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum EdfMethod {
        /// Howe, Allan and Barnes (1981) for the Allan variances, with the identified noise.
        HoweAllanBarnes = "howe_allan_barnes",
        /// b T / tau - c for the total variance (NIST SP 1065 5.2.11), with the identified noise.
        TotalVariance = "total_variance",
        /// The number of non-overlapping terms of the estimator (a conservative count that
        /// assumes no noise type; used for MDEV, TDEV, HDEV, OHDEV).
        NonOverlappingTerms = "non_overlapping_terms",
    }
}

vocabulary! {
    /// What kind of failure a [`StabilityError`] is; its spelling is the stable problem code.
    #[derive(Debug, Clone, Copy, PartialEq, Eq)]
    pub enum StabilityErrorKind {
        /// The series has no values.
        EmptySeries = "empty_series",
        /// A value that is not a finite number.
        NotFiniteSample = "not_finite_sample",
        /// A missing sample (a gap); not filled.
        GapInSeries = "gap_in_series",
        /// An averaging time longer than the series allows for the deviation asked.
        SeriesTooShort = "series_too_short",
        /// An averaging time that is not a positive whole multiple of tau0.
        TauNotMultiple = "tau_not_multiple",
        /// A sampling interval that is not positive and finite, or timestamps that are not
        /// evenly spaced.
        NonUniformSampling = "non_uniform_sampling",
        /// A confidence level outside (0, 1).
        InvalidConfidence = "invalid_confidence",
    }
}

/// Bad input to a stability analysis: the kind, the index of the value at fault (in the series
/// or in the list of averaging factors) and why.
#[derive(Debug, Clone, PartialEq)]
pub struct StabilityError {
    /// What is wrong.
    pub kind: StabilityErrorKind,
    /// Index of the value at fault in its list, where one is.
    pub index: Option<usize>,
    /// Why, for a person to act on.
    pub message: String,
}

impl StabilityError {
    /// A new error.
    pub fn new(kind: StabilityErrorKind, index: Option<usize>, message: impl Into<String>) -> Self {
        Self {
            kind,
            index,
            message: message.into(),
        }
    }
}

impl std::fmt::Display for StabilityError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.write_str(&self.message)
    }
}
