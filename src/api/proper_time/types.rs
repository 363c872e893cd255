//! Request and response types of `POST /v1/clock/proper-time`.

use serde::{Deserialize, Serialize};
use utoipa::{IntoParams, ToSchema};

pub use super::types_lunar::{
    LunarSampleOutput, LunarSummaryOutput, ProperTimeGravityModelName, ProperTimeReferenceName,
    TrajectoryCenterName,
};
use crate::api::names::{
    EphemerisFrameName, EphemerisVelocityMS, InstantFormatName, InstantString, PositionM,
    ScaleName, TdbModelName,
};
use crate::api::time::types::InstantForms;

/// Longest time accepted for an option in seconds (`step_s`, `max_gap_s`, the magnitude of
/// `initial_offset_s`): the whole supported range of instants, 0001-01-01 to 9999-12-31
/// (3 652 059 days of 86 400 s). Below 2^53, so every whole number up to it is exact in binary64.
pub const MAX_OPTION_SECONDS: f64 = 315_537_897_600.0;

/// Names of the ephemeris formats (documentation of the `format` option).
#[derive(Debug, Clone, Copy, ToSchema)]
#[serde(rename_all = "snake_case")]
#[allow(dead_code)]
pub enum EphemerisFormatName {
    /// The JSON ephemeris of this API (`EphemerisInput`).
    Json,
    /// CCSDS Orbit Ephemeris Message, KVN form (CCSDS 502.0-B).
    Oem,
    /// SP3-c or SP3-d (IGS).
    Sp3,
}

/// Options, as query parameters (any body format) or as `options` in a JSON body (which wins).
#[derive(Debug, Clone, Default, Deserialize, IntoParams)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct ProperTimeOptionsInput {
    /// Body format when the Content-Type does not say: `json`, `oem` (CCSDS OEM, KVN) or `sp3`;
    /// it wins over the Content-Type.
    #[param(value_type = Option<EphemerisFormatName>, example = "oem")]
    pub format: Option<String>,
    /// Coordinate time the clock is compared with: `TT` (default) or `TCG` for geocentric
    /// tracks; `TCL` (default), `TL` (a proposal, not a standard) or `TT` for selenocentric
    /// tracks (422 `frame_center_mismatch` otherwise).
    #[param(value_type = Option<ProperTimeReferenceName>, example = "TT")]
    pub reference: Option<String>,
    /// Potential model: `j2_sun_moon` (default: J2 about the CIP with the IERS Conventions
    /// (2010) GM, J2, a_E, plus the Sun's and the Moon's tidal potentials from the planetary
    /// ephemeris at each epoch; J2 alone, with a note, when a track lies outside the
    /// ephemeris), `j2`, `grs80` (the GRS80 normal field in closed form) or `point_mass` for
    /// geocentric tracks; for selenocentric tracks the Moon's field, always with the Earth's
    /// and the Sun's tides: `grail_gl0660b_degree2` (default: J2 and C22 of GL0660B in the
    /// Moon's body-fixed axes, the field of the lunar surface clocks), `j2` (its zonal J2) or
    /// `point_mass` (422 `unsupported_gravity_model` for a model of the other centre).
    #[param(value_type = Option<ProperTimeGravityModelName>, example = "j2_sun_moon")]
    pub gravity_model: Option<String>,
    /// Answer every `step_s` seconds (of TT; of TCL for selenocentric tracks) from the first
    /// epoch instead of at the input epochs; from 0.001 s to 315 537 897 600 s (the supported range of instants).
    #[param(minimum = 0.001, maximum = 315537897600.0, example = 600.0)]
    pub step_s: Option<f64>,
    /// tau - t at the first epoch, seconds (default 0): added to every `tau_minus_t_s`; at most
    /// 315 537 897 600 s in magnitude.
    #[param(minimum = -315537897600.0, maximum = 315537897600.0, example = 0.0)]
    pub initial_offset_s: Option<f64>,
    /// Interpolation window in states (2 to 16, default 8): Lagrange of degree n-1 on positions,
    /// or Hermite on n/2 states when velocities are given.
    #[param(value_type = Option<u32>, minimum = 2, maximum = 16, example = 8)]
    pub interpolation_points: Option<usize>,
    /// Longest accepted gap between consecutive states, seconds, above 0 and at most
    /// 315 537 897 600 (default: the server's `--max-ephemeris-gap-s`).
    #[param(exclusive_minimum = 0.0, maximum = 315537897600.0, example = 3600.0)]
    pub max_gap_s: Option<f64>,
    /// Include the series (default true); `false` answers the summaries only.
    #[param(example = true)]
    pub include_series: Option<bool>,
    /// The model of TDB - TT for epochs given in TDB or TCB and for the TDB at which the Sun
    /// and the Moon are read: `series` (default) or `ephemeris` (1959-12-30 to 2101-01-02 TT;
    /// 422 `outside_tdb_model_span` elsewhere).
    #[param(value_type = Option<TdbModelName>, example = "series")]
    pub tdb_model: Option<String>,
    /// Centre of an SP3 file's positions, which SP3 cannot say: `earth` (default; Earth-fixed,
    /// as IGS writes them) or `moon` (ICRF axes: the header's coordinate system, columns 47-51
    /// of the first line, `ICRF` or `J2000`; 422 `frame_center_mismatch` at line 1 otherwise).
    /// OEM and JSON name their centre themselves (`CENTER_NAME`, `center`); given with them it
    /// must agree (422 `frame_center_mismatch`). Query only.
    #[param(value_type = Option<TrajectoryCenterName>, example = "moon")]
    pub center: Option<String>,
}

/// The options of a JSON body: the query parameters of the same names, which they override.
#[derive(Debug, Clone, Default, Deserialize, Serialize, ToSchema)]
#[schema(as = ProperTimeOptions)]
#[serde(deny_unknown_fields)]
pub struct ProperTimeBodyOptions {
    /// Ignored in a JSON body (the body is JSON); checked like the query parameter.
    #[schema(value_type = Option<EphemerisFormatName>)]
    pub format: Option<String>,
    /// Coordinate time the clock is compared with: `TT` (default) or `TCG` for geocentric
    /// tracks; `TCL` (default), `TL` (a proposal) or `TT` for selenocentric tracks.
    #[schema(value_type = Option<ProperTimeReferenceName>)]
    pub reference: Option<String>,
    /// Potential model: `j2_sun_moon` (default; J2 alone, with a note, when a track lies
    /// outside the planetary ephemeris), `j2`, `grs80` or `point_mass`; for selenocentric
    /// tracks `grail_gl0660b_degree2` (default), `j2` or `point_mass`.
    #[schema(value_type = Option<ProperTimeGravityModelName>)]
    pub gravity_model: Option<String>,
    /// Output step, seconds of TT (of TCL for selenocentric tracks), from 0.001 to
    /// 315 537 897 600.
    #[schema(minimum = 0.001, maximum = 315537897600.0)]
    pub step_s: Option<f64>,
    /// tau - t at the first epoch, seconds, at most 315 537 897 600 in magnitude.
    #[schema(minimum = -315537897600.0, maximum = 315537897600.0)]
    pub initial_offset_s: Option<f64>,
    /// Interpolation window in states, 2 to 16 (`13.0` is read as 13).
    #[schema(value_type = Option<u32>, minimum = 2, maximum = 16)]
    #[serde(default, deserialize_with = "crate::api::extract::whole_number")]
    pub interpolation_points: Option<usize>,
    /// Longest accepted gap between consecutive states, seconds, above 0 and at most
    /// 315 537 897 600.
    #[schema(exclusive_minimum = 0.0, maximum = 315537897600.0)]
    pub max_gap_s: Option<f64>,
    /// Include the series (default true).
    pub include_series: Option<bool>,
    /// The model of TDB - TT: `series` (default) or `ephemeris`.
    #[schema(value_type = Option<TdbModelName>)]
    pub tdb_model: Option<String>,
}

impl From<ProperTimeBodyOptions> for ProperTimeOptionsInput {
    fn from(options: ProperTimeBodyOptions) -> Self {
        Self {
            format: options.format,
            reference: options.reference,
            gravity_model: options.gravity_model,
            step_s: options.step_s,
            initial_offset_s: options.initial_offset_s,
            interpolation_points: options.interpolation_points,
            max_gap_s: options.max_gap_s,
            include_series: options.include_series,
            tdb_model: options.tdb_model,
            center: None,
        }
    }
}

/// One state of a JSON ephemeris.
// The schema of the body only: bodies are read into `trajectory::json::JsonEphemeris` (the
// one type and rule set of the JSON ephemeris); `tests/json_ephemeris_schema.rs` holds the two
// to the same members. `Serialize` only lets utoipa read the `serde` attributes.
#[derive(Debug, Clone, Serialize, ToSchema)]
#[schema(as = EphemerisStateInput)]
#[serde(deny_unknown_fields)]
pub struct StateInput {
    /// Epoch, as text in the document's `epoch_format` and `time_scale`.
    #[schema(value_type = InstantString)]
    pub epoch: String,
    /// Geocentric position, metres, in the document's frame: at least the Earth's polar radius
    /// (6 356 752 m) and at most 1.5e9 m from the geocentre (422 `below_surface`,
    /// `beyond_model_range` otherwise).
    #[schema(value_type = PositionM)]
    pub position_m: [f64; 3],
    /// Velocity, metres per second, in the document's frame, speed below c (optional; give it
    /// for every state of an object or none).
    #[schema(value_type = Option<EphemerisVelocityMS>)]
    pub velocity_m_s: Option<[f64; 3]>,
}

/// One object of a JSON ephemeris.
// The schema of the body only: bodies are read into `trajectory::json::JsonEphemeris` (the
// one type and rule set of the JSON ephemeris); `tests/json_ephemeris_schema.rs` holds the two
// to the same members. `Serialize` only lets utoipa read the `serde` attributes.
#[derive(Debug, Clone, Serialize, ToSchema)]
#[schema(as = EphemerisObjectInput)]
#[serde(deny_unknown_fields)]
pub struct ObjectInput {
    /// Identifier of the object.
    pub id: String,
    /// States with strictly increasing epochs, no gap above `max_gap_s`; at least 2 (and at
    /// least the interpolation window: `interpolation_points`, or half of it with velocities);
    /// at most the batch limit (100 000 by default) over all objects.
    #[schema(min_items = 2, max_items = 100000)]
    pub states: Vec<StateInput>,
}

/// A JSON ephemeris: one or many objects in one frame and time scale.
// The schema of the body only: bodies are read into `trajectory::json::JsonEphemeris` (the
// one type and rule set of the JSON ephemeris); `tests/json_ephemeris_schema.rs` holds the two
// to the same members. `Serialize` only lets utoipa read the `serde` attributes.
#[derive(Debug, Clone, Serialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "frame": "GCRF", "time_scale": "UTC",
    "objects": [{"id": "KESTREL-1", "states": [
        {"epoch": "2026-05-20T00:00:00", "position_m": [6828137.0, 0.0, 0.0], "velocity_m_s": [0.0, 4747.3, 5887.4]},
        {"epoch": "2026-05-20T00:01:00", "position_m": [6816514.4, 284532.4, 352852.0], "velocity_m_s": [-387.4, 4739.2, 5877.4]}
    ]}],
    "options": {"reference": "TT", "gravity_model": "j2_sun_moon", "interpolation_points": 2}
}))]
pub struct EphemerisInput {
    /// Frame: `GCRS`, `GCRF`, `EME2000`, `J2000`, `ICRF` (inertial) or `ITRF`, `ITRF2014`..., `IGS20`...,
    /// `ECEF`, `WGS84` (Earth-fixed; velocities made inertial with the Earth's rotation).
    #[schema(value_type = EphemerisFrameName)]
    pub frame: String,
    /// The origin of the positions: `earth` (default) or `moon` (selenocentric states with
    /// ICRF axes: `frame` ICRF, EME2000 or J2000; positions between the Moon's mean radius,
    /// 1 737 400 m, and 60 000 km, else 422 `below_surface`, `beyond_model_range`). A lunar
    /// frame with the Earth, or an Earth frame with the Moon: 422 `frame_center_mismatch`.
    #[schema(value_type = Option<TrajectoryCenterName>, example = "moon")]
    pub center: Option<String>,
    /// Time scale of the epochs: UTC, TAI, TT, TCG, TCB, TDB, GPST, GST, BDT, QZSST.
    #[schema(value_type = ScaleName)]
    pub time_scale: String,
    /// Format of the epoch texts (default `iso`).
    #[schema(value_type = Option<InstantFormatName>)]
    pub epoch_format: Option<String>,
    /// The objects: at least one; at most 50 000 (each has at least 2 states, and the batch
    /// limit counts states).
    #[schema(min_items = 1, max_items = 50000)]
    pub objects: Vec<ObjectInput>,
    /// Options (override the query parameters).
    pub options: Option<ProperTimeBodyOptions>,
}

/// One sample of the series.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct SampleOutput {
    /// Epoch in the ephemeris' time scale, ISO 8601 with 12 decimals.
    pub epoch: String,
    /// Coordinate time (TT or TCG; TCL, TL or TT for selenocentric tracks: the `reference`)
    /// since the first epoch, seconds.
    pub elapsed_s: f64,
    /// Proper time minus coordinate time, seconds: `initial_offset_s` + the accumulated
    /// integral of d(tau)/dt - 1. Positive and growing: the clock runs fast.
    pub tau_minus_t_s: f64,
    /// The part of the accumulated offset due to the velocity term -v^2/(2c^2), seconds.
    pub velocity_part_s: f64,
    /// The part due to the Earth's gravity term (W0 - U)/c^2 against TT, -U/c^2 against TCG,
    /// seconds (selenocentric objects: the Moon's -U_Moon/c^2 plus the reference's part, see
    /// `lunar`).
    pub gravity_part_s: f64,
    /// The part due to the tidal potentials of the Sun and the Moon, -w_tidal/c^2 (IERS
    /// Conventions (2010) eq. 10.6), seconds (selenocentric objects: of the Earth and the Sun);
    /// zero for models without them. tau - t =
    /// initial_offset_s + velocity_part_s + gravity_part_s + tidal_part_s.
    pub tidal_part_s: f64,
    /// The Keplerian periodic term -2 r.v / c^2 at this epoch, seconds (IS-GPS-200 20.3.3.3.3.1).
    pub periodic_s: f64,
    /// tau - t minus the periodic term and the least-squares line, seconds: what the broadcast
    /// two-term model misses (e.g. J2 effects, manoeuvres). For selenocentric objects: the
    /// clock-rate periodic part minus the periodic term.
    pub residual_s: f64,
    /// Selenocentric objects only: the lunar parts, the clock-rate periodic part and the
    /// coordinate-simultaneity term, kept apart.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub lunar: Option<LunarSampleOutput>,
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
    /// The part of `accumulated_s` due to the tidal potentials of the Sun and the Moon
    /// (selenocentric objects: the Earth and the Sun), seconds (zero for models without them).
    pub tidal_part_s: f64,
    /// accumulated / span: the mean fractional rate offset (positive: runs fast).
    pub mean_rate: f64,
    /// The mean rate in microseconds per day.
    pub mean_rate_us_per_day: f64,
    /// Half the peak-to-peak of the periodic term over the output epochs, seconds.
    pub periodic_amplitude_s: f64,
    /// RMS of the residual against line + periodic term, seconds.
    pub kepler_residual_rms_s: f64,
    /// Selenocentric objects only: the centre, the tides' rate, the clock-rate periodic and
    /// simultaneity amplitudes.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub lunar: Option<LunarSummaryOutput>,
}

/// The answer for one object.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct ObjectOutput {
    /// The object's id (OEM OBJECT_NAME, SP3 satellite id, JSON id).
    pub id: String,
    /// `inertial`, `earth_fixed` or `lunar_inertial` (selenocentric, ICRF axes).
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
    /// `TT` or `TCG`; for a selenocentric ephemeris `TCL`, `TL` or `TT`.
    pub reference: String,
    /// The model used: `j2_sun_moon`, `j2`, `grs80` or `point_mass` (the default `j2_sun_moon`
    /// becomes `j2` when a track lies outside the planetary ephemeris; a note says so); for a
    /// selenocentric ephemeris `grail_gl0660b_degree2` (default), `j2` or `point_mass` (the
    /// Moon's field, with the Earth's and the Sun's tides).
    pub gravity_model: String,
    /// The model of TDB - TT used (`series` or `ephemeris`): for epochs given in TDB or TCB
    /// and for the TDB at which the Sun and the Moon of the tides are read.
    #[schema(value_type = TdbModelName)]
    pub tdb_model: String,
    /// The objects, in the order of the ephemeris.
    pub objects: Vec<ObjectOutput>,
    /// The model and its approximations.
    pub model_notes: Vec<String>,
    /// Warnings (e.g. that TL is a proposal, not a standard); absent when none.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub warnings: Option<Vec<String>>,
}
