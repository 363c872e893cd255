//! Response types of the clock-rate endpoints.

use serde::Serialize;
use utoipa::ToSchema;

/// A fractional rate split into its velocity and gravity parts. Sign: positive = the clock runs
/// fast relative to the reference (it gains), negative = it runs slow.
#[derive(Debug, Clone, Copy, Serialize, ToSchema)]
pub struct RateSplit {
    /// Velocity ("special-relativistic") part, -v^2/(2c^2) with v the speed in the
    /// non-rotating geocentric frame; never positive.
    pub sr: f64,
    /// Gravity part: (W0 - U)/c^2 relative to TT, -U/c^2 relative to TCG (U the Newtonian
    /// potential, positive); positive above the geoid relative to TT.
    pub gr: f64,
    /// First-order total, sr + gr.
    pub total: f64,
}

/// What a rate means for an oscillator of nominal frequency f0.
#[derive(Debug, Clone, Copy, Serialize, ToSchema)]
pub struct FrequencyAnswer {
    /// The nominal frequency f0, Hz.
    pub nominal_hz: f64,
    /// f0 * total, Hz: how far an oscillator built to f0 (in its own proper time) appears off
    /// when counted in the reference scale; positive = it appears high.
    pub offset_hz: f64,
    /// f0 / (1 + total), Hz: the proper frequency to set before launch so that the clock reads
    /// f0 in the reference scale once in place (IS-GPS-200 3.3.1.1: 10.23 MHz is set to
    /// 10.22999999543 MHz).
    pub factory_setting_hz: f64,
}

/// The periodic (eccentricity) part of proper time minus reference time.
#[derive(Debug, Clone, Copy, Serialize, ToSchema)]
pub struct PeriodicAnswer {
    /// Amplitude 2 sqrt(GM a) e / c^2, s (IS-GPS-200 20.3.3.3.3.1: |F| e sqrt(A)). For a state,
    /// that of the osculating point-mass orbit; absent when the state is not on a closed orbit
    /// above the Earth.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub amplitude_s: Option<f64>,
    /// Value at the state or at the given anomaly, s: -2 (r . v)/c^2 = -2 sqrt(GM a) e sin(E)/c^2,
    /// the IS-GPS-200 correction dt_r. Positive = the clock reads ahead of a clock running at
    /// the mean rate. Absent for an orbit given without an anomaly.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub value_at_state_s: Option<f64>,
}

/// The J2 terms of an orbit (`gravity_model: j2`); `fractional` and `us_per_day` include the
/// mean change.
#[derive(Debug, Clone, Copy, Serialize, ToSchema)]
pub struct OrbitJ2Answer {
    /// Change of the mean fractional rate from J2, -4<U_J2>/c^2 (dimensionless), split equally
    /// into sr and gr; a is the energy semi-major axis.
    pub mean_rate_change: f64,
    /// The same in microseconds per day.
    pub mean_rate_change_us_per_day: f64,
    /// Amplitude (3/2) J2 (a_E^2/c^2) sqrt(GM/a^3) sin^2(i) of the J2 periodic term, s
    /// (Kouba 2004).
    pub periodic_amplitude_s: f64,
    /// Its period, s (half the orbital period).
    pub periodic_period_s: f64,
    /// Its value -amplitude sin(2u) at the given argument of latitude, s.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub periodic_value_s: Option<f64>,
}

/// The rate of one clock relative to the reference scale.
#[derive(Debug, Clone, Serialize, ToSchema)]
#[schema(example = json!({
    "subject": "orbit", "reference": "TT", "gravity_model": "point_mass",
    "fractional": {"sr": -8.349e-11, "gr": 5.2997e-10, "total": 4.4647e-10},
    "us_per_day": {"sr": -7.214, "gr": 45.790, "total": 38.575},
    "frequency": {"nominal_hz": 10230000.0, "offset_hz": 0.0045674, "factory_setting_hz": 10229999.99543},
    "periodic": {"amplitude_s": 2.2905e-8},
    "model_notes": ["mean rate over one revolution of a point-mass Keplerian orbit"]
}))]
pub struct RateAnswer {
    /// Which subject the item gave: `state`, `orbit`, `ground_site` or `lunar_site`.
    pub subject: String,
    /// The reference scale: `TT` or `TCG`.
    pub reference: String,
    /// The model actually used: `point_mass`, `j2`, `grs80`, `egm2008` (the default for ground
    /// sites with ellipsoidal heights), `j2_sun_moon` (the default for states with an epoch), or
    /// `grs80_normal_gravity` (ground sites with heights above the geoid).
    pub gravity_model: String,
    /// Fractional rate d(tau)/dt - 1 (dimensionless). Positive = the clock runs fast relative
    /// to the reference.
    pub fractional: RateSplit,
    /// The same in microseconds gained per day of the reference scale (fractional * 86 400e6).
    pub us_per_day: RateSplit,
    /// Present when a nominal frequency was given.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub frequency: Option<FrequencyAnswer>,
    /// Present for orbits and states.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub periodic: Option<PeriodicAnswer>,
    /// The J2 terms of an orbit given with `gravity_model: j2`.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub j2: Option<OrbitJ2Answer>,
    /// The orbit's inclination as given, degrees (echoed; it does not change the first-order
    /// rate).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub inclination_deg: Option<f64>,
    /// For a lunar site: the model, `circular_orbit` (no epoch, no span: the Moon on a
    /// circular orbit) or `de440_ephemeris` (with `epoch` and/or `span`).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub lunar_model: Option<String>,
    /// For a lunar site with the `de440_ephemeris` model: the rates against TT, TCG, TCL and TL
    /// at the epoch and over the span.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub lunar: Option<super::lunar_answer::LunarAnswer>,
    /// The approximations behind this answer, in words.
    pub model_notes: Vec<String>,
}

/// Answer of `POST /v1/clock/rate`.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct RateBatchAnswer {
    /// One answer per item, in order.
    pub results: Vec<RateAnswer>,
}

/// How fast clock A runs relative to clock B.
#[derive(Debug, Clone, Copy, Serialize, ToSchema)]
pub struct RateDifferenceAnswer {
    /// total_A - total_B (dimensionless), the difference of the two rates relative to the
    /// common reference: first order; the exact ratio (1 + y_A)/(1 + y_B) - 1 differs by
    /// y_B (y_A - y_B), below 1e-18 near the Earth. Positive = A runs fast relative to B.
    pub fractional: f64,
    /// The same in microseconds that A gains on B per day.
    pub us_per_day: f64,
    /// The same in nanoseconds that A gains on B per day.
    pub ns_per_day: f64,
}

/// Answer of `POST /v1/clock/compare`.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct CompareAnswer {
    /// The rate of clock A relative to the reference.
    pub clock_a: RateAnswer,
    /// The rate of clock B relative to the reference.
    pub clock_b: RateAnswer,
    /// How fast A runs relative to B.
    pub a_minus_b: RateDifferenceAnswer,
}
