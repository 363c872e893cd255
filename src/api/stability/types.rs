//! Request and answer types of `POST /v1/clock/stability`.

use std::borrow::Cow;

use serde::{Deserialize, Serialize};
use utoipa::openapi::{RefOr, Schema};
use utoipa::{PartialSchema, ToSchema};

use crate::api::names::vocabulary_schema;
use crate::physics::stability::{DataKind, Deviation, EdfMethod};

/// Schema of a data kind name.
pub struct DataKindName;

impl PartialSchema for DataKindName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<DataKind>(
            "What the values are: `phase` (time error x, seconds) or `frequency` (fractional frequency y, each the average over one interval tau0).",
        )
    }
}

impl ToSchema for DataKindName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("DataKindName")
    }
}

/// Schema of a deviation name.
pub struct DeviationName;

impl PartialSchema for DeviationName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<Deviation>(
            "A deviation of NIST SP 1065 section 5.2: `adev` (Allan), `oadev` (overlapping Allan), `mdev` (modified Allan), `tdev` (time deviation, seconds), `hdev` (Hadamard), `ohdev` (overlapping Hadamard), `totdev` (total).",
        )
    }
}

impl ToSchema for DeviationName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("DeviationName")
    }
}

/// Schema of an EDF method name.
pub struct EdfMethodName;

impl PartialSchema for EdfMethodName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<EdfMethod>(
            "How the equivalent degrees of freedom were found: `howe_allan_barnes` (ADEV, OADEV: Howe, Allan and Barnes 1981 with the identified noise), `total_variance` (TOTDEV: b T/tau - c, NIST SP 1065 5.2.11), `non_overlapping_terms` (MDEV, TDEV, HDEV, OHDEV: the count of non-overlapping terms, a conservative choice that assumes no noise type).",
        )
    }
}

impl ToSchema for EdfMethodName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("EdfMethodName")
    }
}

/// A clock series at a fixed interval and what to compute from it.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "kind": "frequency", "tau0_s": 1.0,
    "values": [892, 809, 823, 798, 671, 644, 883, 903, 677],
    "deviations": ["adev", "mdev", "tdev"], "tau_s": [1, 2]
}))]
pub struct StabilityBody {
    /// What `values` are.
    #[schema(value_type = DataKindName)]
    pub kind: String,
    /// Sampling interval tau0, seconds (> 0). May be left out when `times_s` is given (then
    /// the first step of `times_s`).
    #[schema(exclusive_minimum = 0.0)]
    pub tau0_s: Option<f64>,
    /// The samples, oldest first: phase in seconds, or fractional frequency. At least 3 phase
    /// or 2 frequency values. A `null` is a missing sample (a gap): gaps are not filled, the
    /// answer is 422 `gap_in_series` naming the first; send each gap-free stretch as its own
    /// request.
    #[schema(value_type = Vec<Option<f64>>, min_items = 1)]
    pub values: Vec<Option<f64>>,
    /// Optional time tags of the samples, seconds on any one time line (same length as
    /// `values`): the service checks that they are evenly spaced by tau0 (to 1e-6 tau0; 422
    /// `non_uniform_sampling` or `gap_in_series` naming the index otherwise).
    pub times_s: Option<Vec<f64>>,
    /// The deviations wanted, in the order answered (default: all of them).
    #[schema(value_type = Option<Vec<DeviationName>>, min_items = 1)]
    pub deviations: Option<Vec<String>>,
    /// Averaging times, seconds, each a whole multiple of tau0 (default: octaves tau0, 2 tau0,
    /// 4 tau0 ... as far as each deviation has a term). 422 `series_too_short` names one
    /// beyond what the series allows.
    #[schema(min_items = 1)]
    pub tau_s: Option<Vec<f64>>,
    /// Two-sided confidence level of the intervals, in (0, 1) (default 0.683, "1 sigma").
    #[schema(exclusive_minimum = 0.0, exclusive_maximum = 1.0)]
    pub confidence: Option<f64>,
}

/// One deviation at one averaging time.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct StabilityPoint {
    /// Which deviation.
    #[schema(value_type = DeviationName)]
    pub deviation: &'static str,
    /// Averaging time tau, seconds.
    pub tau_s: f64,
    /// Averaging factor m = tau / tau0.
    pub factor: usize,
    /// The deviation: dimensionless (fractional frequency), TDEV in seconds.
    pub value: f64,
    /// Number of terms (analysis points) summed.
    pub terms: usize,
    /// Power-law noise type alpha used for the EDF (S_y(f) ~ f^alpha: 2 white PM, 1 flicker
    /// PM, 0 white FM, -1 flicker FM, -2 random-walk FM), from the lag-1 autocorrelation.
    pub noise_alpha: i32,
    /// Whether `noise_alpha` was identified at this tau (false: fewer than 30 points at this
    /// tau; the type of the next shorter tau is kept, white FM if none).
    pub noise_identified: bool,
    /// Equivalent degrees of freedom (at least 1).
    pub edf: f64,
    /// How `edf` was found.
    #[schema(value_type = EdfMethodName)]
    pub edf_method: &'static str,
    /// Lower end of the confidence interval of `value`.
    pub low: f64,
    /// Upper end of the confidence interval of `value`.
    pub high: f64,
}

/// The stability of the series.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct StabilityAnswer {
    /// What the values were.
    #[schema(value_type = DataKindName)]
    pub kind: &'static str,
    /// Sampling interval, seconds.
    pub tau0_s: f64,
    /// Number of values sent.
    pub values: usize,
    /// Number of phase points analysed (values + 1 for frequency data).
    pub phase_points: usize,
    /// Confidence level of `low` and `high`.
    pub confidence: f64,
    /// One entry per deviation and averaging time: by deviation (in the order asked), then by
    /// tau.
    pub results: Vec<StabilityPoint>,
}
