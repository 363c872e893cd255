//! Request and answer types of `POST /v1/clock/corrections`.

use serde::{Deserialize, Serialize};
use utoipa::ToSchema;

/// One clock value with the satellite's state (the JSON form of a clock series).
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
pub struct ClockStateInput {
    /// Epoch in `epoch_scale` (ISO 8601).
    pub epoch: String,
    /// Clock reading minus system time, s.
    pub clock_s: f64,
    /// Geocentric position [x, y, z], m.
    #[schema(min_items = 3, max_items = 3)]
    pub position_m: [f64; 3],
    /// Velocity [vx, vy, vz], m/s (relative to the frame's axes: Earth-fixed for ITRF).
    #[schema(min_items = 3, max_items = 3)]
    pub velocity_m_s: [f64; 3],
}

/// The clock series of one satellite with its states.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
pub struct ClockSeriesInput {
    /// Satellite id (any text).
    pub id: String,
    /// `GCRS` (inertial) or `ITRF` (Earth-fixed; default).
    pub frame: Option<String>,
    /// The values, epochs increasing.
    pub samples: Vec<ClockStateInput>,
}

/// What to correct: an SP3 text (orbit and its clock column), an SP3 orbit with a RINEX clock
/// text, or JSON clock series with states.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"sp3": "#dV2026  5 20  0  0  0.00000000 ...", "rinex_clock": "     3.04           C ...", "convention": "igs", "include_series": false}))]
pub struct CorrectionsRequest {
    /// SP3-c/d text: the orbit, and the clocks when `rinex_clock` is absent.
    pub sp3: Option<String>,
    /// RINEX clock text (3.04; `AS` records are corrected, `AR` are listed in the warnings).
    /// With it, the SP3 clock column is not used.
    pub rinex_clock: Option<String>,
    /// JSON clock series with states (instead of files).
    pub series: Option<Vec<ClockSeriesInput>>,
    /// Scale of the JSON series' epochs (default `GPST`).
    pub epoch_scale: Option<String>,
    /// Which periodic terms the clock values contain: `igs` (default: IGS products leave the
    /// conventional term -2 r.v/c^2 out of the values, the J2 term is in them) or `raw` (both).
    pub convention: Option<String>,
    /// Whether to answer every epoch (default true).
    pub include_series: Option<bool>,
}

/// The corrections at one clock epoch.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct CorrectedEpoch {
    /// Epoch in the clock file's time system.
    pub epoch: String,
    /// Line of the clock value in its file (absent for JSON series).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub line: Option<usize>,
    /// Clock value as given, s.
    pub clock_s: f64,
    /// Conventional periodic term -2 r.v/c^2, s (IS-GPS-200 20.3.3.3.3.1).
    pub conventional_s: f64,
    /// J2 periodic term -(3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i) sin(2u), s (Kouba 2004).
    pub j2_s: f64,
    /// Clock without its relativistic periodic terms, s (`clock - j2` for `igs`,
    /// `clock - conventional - j2` for `raw`).
    pub corrected_s: f64,
    /// Corrected clock minus the fitted line, s.
    pub residual_s: f64,
}

/// One satellite's corrected clock.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct SatelliteCorrections {
    /// Satellite id.
    pub id: String,
    /// Epoch of the fitted offset (the first corrected epoch).
    pub reference_epoch: String,
    /// Number of corrected epochs.
    pub count: usize,
    /// Fitted offset of the corrected clock at the reference epoch, s.
    pub offset_s: f64,
    /// Fitted rate of the corrected clock, s/s.
    pub rate: f64,
    /// The same in microseconds per day.
    pub rate_us_per_day: f64,
    /// Rate minus the rate the IS-GPS-200 factory setting compensates (+4.4647e-10, the
    /// nominal orbit's mean rate against TT): about 0 for a clock built without the factory
    /// offset on a nominal orbit, about -4.4647e-10 for one built with it.
    pub rate_minus_factory_setting: f64,
    /// RMS of the corrected clock about the fitted line, s.
    pub residual_rms_s: f64,
    /// Every epoch (absent with `include_series: false`).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub series: Option<Vec<CorrectedEpoch>>,
}

/// Answer of `POST /v1/clock/corrections`.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct CorrectionsAnswer {
    /// `igs` or `raw`.
    pub convention: String,
    /// Where the clock values came from: `sp3`, `rinex_clock` or `series`.
    pub clock_source: String,
    /// The factory-setting rate used, +4.4647e-10 (IS-GPS-200 3.3.1.1).
    pub factory_setting_rate: f64,
    /// One entry per corrected satellite.
    pub satellites: Vec<SatelliteCorrections>,
    /// What could not be answered: each names the satellite (and the lines of clock epochs).
    pub warnings: Vec<String>,
    /// The models behind the answer, in words.
    pub model_notes: Vec<String>,
}
