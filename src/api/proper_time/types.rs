//! Request and response types of `POST /v1/clock/proper-time`.

use serde::{Deserialize, Serialize};
use utoipa::{IntoParams, ToSchema};

use crate::api::time::types::InstantForms;

/// Options, as query parameters (any body format) or as `options` in a JSON body (which wins).
#[derive(Debug, Clone, Default, Deserialize, IntoParams, ToSchema)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct ProperTimeOptionsInput {
    /// Body format when the Content-Type does not say: `json`, `oem` (CCSDS OEM, KVN) or `sp3`.
    #[param(example = "oem")]
    pub format: Option<String>,
    /// Coordinate time the clock is compared with: `TT` (default) or `TCG`.
    #[param(example = "TT")]
    pub reference: Option<String>,
    /// Earth potential: `point_mass` (default) or `j2` (IERS Conventions (2010) GM, J2, a_E).
    #[param(example = "point_mass")]
    pub gravity_model: Option<String>,
    /// Answer every `step_s` seconds (of TT) from the first epoch instead of at the input epochs.
    #[param(example = 600.0)]
    pub step_s: Option<f64>,
    /// tau - t at the first epoch, seconds (default 0): added to every `tau_minus_t_s`.
    #[param(example = 0.0)]
    pub initial_offset_s: Option<f64>,
    /// Interpolation window in states (2 to 16, default 8): Lagrange of degree n-1 on positions,
    /// or Hermite on n/2 states when velocities are given.
    #[param(example = 8)]
    pub interpolation_points: Option<usize>,
    /// Longest accepted gap between consecutive states, seconds (default: the server's
    /// `--max-ephemeris-gap-s`).
    #[param(example = 3600.0)]
    pub max_gap_s: Option<f64>,
    /// Include the series (default true); `false` answers the summaries only.
    #[param(example = true)]
    pub include_series: Option<bool>,
}

/// One state of a JSON ephemeris.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
pub struct StateInput {
    /// Epoch, as text in the document's `epoch_format` and `time_scale`.
    pub epoch: String,
    /// Geocentric position, metres, in the document's frame.
    pub position_m: [f64; 3],
    /// Velocity, metres per second (optional; give it for every state of an object or none).
    pub velocity_m_s: Option<[f64; 3]>,
}

/// One object of a JSON ephemeris.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
pub struct ObjectInput {
    /// Identifier of the object.
    pub id: String,
    /// States with strictly increasing epochs.
    pub states: Vec<StateInput>,
}

/// A JSON ephemeris: one or many objects in one frame and time scale.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "frame": "GCRF", "time_scale": "UTC",
    "objects": [{"id": "KESTREL-1", "states": [
        {"epoch": "2026-05-20T00:00:00", "position_m": [6828137.0, 0.0, 0.0], "velocity_m_s": [0.0, 4747.3, 5887.4]},
        {"epoch": "2026-05-20T00:01:00", "position_m": [6816514.4, 284532.4, 352852.0], "velocity_m_s": [-387.4, 4739.2, 5877.4]}
    ]}],
    "options": {"reference": "TT", "interpolation_points": 2}
}))]
pub struct EphemerisInput {
    /// Frame: `GCRF`, `EME2000`, `ICRF` (inertial) or `ITRF` (Earth-fixed; velocities made
    /// inertial with the Earth's rotation).
    pub frame: String,
    /// Time scale of the epochs: UTC, TAI, TT, TCG, TCB, TDB, GPST, GST, BDT, QZSST.
    pub time_scale: String,
    /// Format of the epoch texts (default `iso`).
    pub epoch_format: Option<String>,
    /// The objects.
    pub objects: Vec<ObjectInput>,
    /// Options (override the query parameters).
    pub options: Option<ProperTimeOptionsInput>,
}

/// One sample of the series.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct SampleOutput {
    /// Epoch in the ephemeris' time scale, ISO 8601 with 12 decimals.
    pub epoch: String,
    /// Coordinate time (TT, or TCG) since the first epoch, seconds.
    pub elapsed_s: f64,
    /// Proper time minus coordinate time, seconds: `initial_offset_s` + the accumulated
    /// integral of d(tau)/dt - 1. Positive and growing: the clock runs fast.
    pub tau_minus_t_s: f64,
    /// The part of the accumulated offset due to the velocity term -v^2/(2c^2), seconds.
    pub velocity_part_s: f64,
    /// The part due to the gravity term (W0 - U)/c^2 against TT, -U/c^2 against TCG, seconds.
    pub gravity_part_s: f64,
    /// The Keplerian periodic term -2 r.v / c^2 at this epoch, seconds (IS-GPS-200 20.3.3.3.3.1).
    pub periodic_s: f64,
    /// tau - t minus the periodic term and the least-squares line, seconds: what the broadcast
    /// two-term model misses (e.g. J2 effects, manoeuvres).
    pub residual_s: f64,
}

/// Summary of one object.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct SummaryOutput {
    /// First epoch.
    pub start: InstantForms,
    /// Last epoch.
    pub end: InstantForms,
    /// Coordinate time spanned, seconds.
    pub span_s: f64,
    /// tau - t accumulated from the first to the last epoch, seconds (without the initial offset).
    pub accumulated_s: f64,
    /// accumulated / span: the mean fractional rate offset (positive: runs fast).
    pub mean_rate: f64,
    /// The mean rate in microseconds per day.
    pub mean_rate_us_per_day: f64,
    /// Half the peak-to-peak of the periodic term over the output epochs, seconds.
    pub periodic_amplitude_s: f64,
    /// RMS of the residual against line + periodic term, seconds.
    pub kepler_residual_rms_s: f64,
}

/// The answer for one object.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct ObjectOutput {
    /// The object's id (OEM OBJECT_NAME, SP3 satellite id, JSON id).
    pub id: String,
    /// `inertial` or `earth_fixed`.
    pub frame: String,
    /// The time scale of the epochs.
    pub time_scale: String,
    /// States read for the object.
    pub state_count: usize,
    /// The summary.
    pub summary: SummaryOutput,
    /// One sample per output epoch (absent when `include_series` is false).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub series: Option<Vec<SampleOutput>>,
}

/// The answer: one entry per object in the ephemeris.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct ProperTimeAnswer {
    /// `TT` or `TCG`.
    pub reference: String,
    /// `point_mass` or `j2`.
    pub gravity_model: String,
    /// The objects, in the order of the ephemeris.
    pub objects: Vec<ObjectOutput>,
    /// The model and its approximations.
    pub model_notes: Vec<String>,
}
