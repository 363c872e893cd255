//! Request types of the clock-rate endpoints.

use serde::Deserialize;
use utoipa::ToSchema;

use crate::api::names::{
    FrameName, HeightReferenceName, InstantString, PositionM, ScaleName, VelocityMS,
};
pub use crate::api::names::{GravityModelName, ReferenceName};

/// A geocentric state vector.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"frame": "GCRS", "position_m": [26561750.0, 0.0, 0.0],
    "velocity_m_s": [0.0, 2324.298, 3099.064]}))]
pub struct StateInput {
    /// `GCRS` (non-rotating, geocentric) or `ITRF` (Earth-fixed, rotating; the velocity is then
    /// relative to the rotating Earth and the rotation omega_E x r is added).
    #[schema(value_type = FrameName)]
    pub frame: String,
    /// Geocentric position [x, y, z], metres (not more than 11 km inside the Earth, at most
    /// 1.5e9 m from the geocentre).
    #[schema(value_type = PositionM)]
    pub position_m: [f64; 3],
    /// Velocity [vx, vy, vz] in `frame`, metres per second (inertial speed below c).
    #[schema(value_type = VelocityMS)]
    pub velocity_m_s: [f64; 3],
    /// The state's epoch, ISO 8601 in `epoch_scale`. Required for a GCRS state with the `j2` or
    /// `grs80` model (their field is taken about the Celestial Intermediate Pole, which moves in
    /// the GCRS: 422 `epoch_required` without it). Optional for an ITRF state: with it the state
    /// goes into the GCRS with the full Earth rotation at that epoch (polar motion, UT1,
    /// precession-nutation, from the EOP table in force; 422 `eop_before_table` /
    /// `eop_after_table` outside it) and the field is taken about the CIP; without it the ITRF z
    /// axis and omega_E x r are used (a note states the neglect, up to 1.6e-16 in rate).
    #[schema(value_type = Option<InstantString>, example = "2026-05-20T00:00:00")]
    pub epoch: Option<String>,
    /// Scale of `epoch` (default UTC).
    #[schema(value_type = Option<ScaleName>)]
    pub epoch_scale: Option<String>,
}

/// A Keplerian orbit around the Earth (point mass). Give at most one anomaly; with one, the
/// answer carries the periodic term's value at that point.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"semi_major_axis_m": 26561750.0, "eccentricity": 0.01,
    "inclination_deg": 55.0, "mean_anomaly_deg": 30.0}))]
pub struct OrbitInput {
    /// Semi-major axis a, metres, in [6 345 752.314 (the polar radius less 11 km), 1.5e9 (the
    /// Earth's Hill sphere)]; the periapsis a(1 - e) must also be above that depth and the
    /// apoapsis a(1 + e) within 1.5e9 m (422 `invalid_semi_major_axis`, `below_surface`,
    /// `beyond_model_range` otherwise).
    #[schema(minimum = 6345752.314140356, maximum = 1.5e9)]
    pub semi_major_axis_m: f64,
    /// Eccentricity e, in [0, 1).
    #[schema(minimum = 0.0, exclusive_maximum = 1.0)]
    pub eccentricity: f64,
    /// Inclination to the Earth's equator, degrees in [0, 180]. Echoed; it does not change the
    /// first-order rate of a point-mass orbit; required with `gravity_model: j2` (422
    /// `input_required`).
    #[schema(minimum = 0.0, maximum = 180.0)]
    pub inclination_deg: Option<f64>,
    /// Argument of latitude u (argument of perigee + true anomaly), degrees (|value| <= 1e6):
    /// with `gravity_model: j2`, the J2 periodic term's value there.
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub argument_of_latitude_deg: Option<f64>,
    /// True anomaly nu, degrees (|value| <= 1e6).
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub true_anomaly_deg: Option<f64>,
    /// Mean anomaly M, degrees (|value| <= 1e6).
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub mean_anomaly_deg: Option<f64>,
    /// Eccentric anomaly E, degrees (|value| <= 1e6).
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub eccentric_anomaly_deg: Option<f64>,
}

/// A clock at rest on the rotating Earth.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"latitude_deg": 46.1, "longitude_deg": 11.2, "height_m": 1050.0,
    "height_reference": "geoid"}))]
pub struct GroundSiteInput {
    /// Geodetic latitude on GRS80, degrees in [-90, 90].
    #[schema(minimum = -90.0, maximum = 90.0)]
    pub latitude_deg: f64,
    /// Longitude, degrees east (|value| <= 1e6).
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub longitude_deg: f64,
    /// Height above `height_reference`, metres, in [-11 000, 1e8]. Higher clocks run faster
    /// (about +1.09e-16 per metre near the ground).
    #[schema(minimum = -11000.0, maximum = 1.0e8)]
    pub height_m: f64,
    /// `ellipsoid` (default: height above the GRS80 ellipsoid, the rate comes from the gravity
    /// model) or `geoid` (orthometric height: W0 - W from GRS80 normal gravity, so a clock on
    /// the geoid has rate 0 against TT; the gravity model is not used).
    #[schema(value_type = Option<HeightReferenceName>)]
    pub height_reference: Option<String>,
}

/// A span of time for a lunar clock: the mean rate over it and the proper time accumulated.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"start": "2026-03-01T00:00:00", "end": "2026-03-28T13:18:33"}))]
pub struct LunarSpanInput {
    /// Start, ISO 8601 in the site's `epoch_scale`.
    #[schema(value_type = InstantString, example = "2026-03-01T00:00:00")]
    pub start: String,
    /// End, ISO 8601 in the site's `epoch_scale`; after `start`, at most 3660 days later
    /// (422 `invalid_value`, `beyond_model_range` naming `span`).
    #[schema(value_type = InstantString, example = "2026-03-28T13:18:33")]
    pub end: String,
}

/// A clock fixed on the Moon's surface. Without `epoch` and `span`, the mean rate against TT or
/// TCG of the `circular_orbit` model (the Moon on a circular orbit, no lunar ephemeris); with
/// either, the `de440_ephemeris` model (the real lunar orbit of DE440, the IAU rotation of the
/// Moon, the GRAIL GL0660B degree-2 field, the Earth's and the Sun's tides) and a `lunar`
/// answer against TT, TCG, TCL and TL.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"latitude_deg": -89.5, "longitude_deg": 0.0, "height_m": 0.0,
    "epoch": "2026-03-14T06:30:00",
    "span": {"start": "2026-03-01T00:00:00", "end": "2026-03-28T13:18:33"}}))]
pub struct LunarSiteInput {
    /// Selenographic latitude, degrees in [-90, 90] (IAU mean-Earth/polar-axis system).
    #[schema(minimum = -90.0, maximum = 90.0)]
    pub latitude_deg: f64,
    /// Selenographic longitude, degrees east (|value| <= 1e6); 0 is the mean sub-Earth point.
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub longitude_deg: f64,
    /// Height above the mean lunar sphere of radius 1737.4 km, metres, in [-11 000, 100 000]
    /// (default 0; below: 422 `below_surface`, above: `beyond_model_range`).
    #[schema(minimum = -11000.0, maximum = 100000.0)]
    pub height_m: Option<f64>,
    /// An epoch, ISO 8601 in `epoch_scale`: the instantaneous rate there, and its mean over
    /// the anomalistic month (27.55455 d) centred on it, so the month must lie inside
    /// 1959-12-30 .. 2101-01-02 TDB (422 `outside_ephemeris_span`, `outside_lunar_time_span`
    /// naming `epoch`).
    #[schema(value_type = Option<InstantString>, example = "2026-03-14T06:30:00")]
    pub epoch: Option<String>,
    /// A span: the mean rate over it and the proper time accumulated against TT, TCG, TCL
    /// and TL, with the periodic part apart from the secular rate.
    pub span: Option<LunarSpanInput>,
    /// Scale of `epoch` and of the span's ends (default UTC; any scale of the service,
    /// TCL and TL included).
    #[schema(value_type = Option<ScaleName>)]
    pub epoch_scale: Option<String>,
}

/// One clock: exactly one subject (`state`, `orbit`, `ground_site`, `lunar_site`), and
/// optional settings that override those of the request.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"orbit": {"semi_major_axis_m": 26561750.0, "eccentricity": 0.0},
    "nominal_frequency_hz": 10.23e6}))]
pub struct RateItem {
    /// A geocentric state vector (instantaneous rate).
    pub state: Option<StateInput>,
    /// A Keplerian orbit (rate averaged over one revolution, and the periodic term).
    pub orbit: Option<OrbitInput>,
    /// A site fixed on the rotating Earth.
    pub ground_site: Option<GroundSiteInput>,
    /// A site fixed on the Moon.
    pub lunar_site: Option<LunarSiteInput>,
    /// Reference scale for this clock (`TT` or `TCG`); overrides the request's.
    #[schema(value_type = Option<ReferenceName>)]
    pub reference: Option<String>,
    /// Gravity model for this clock (`point_mass`, `j2`, `grs80`, `j2_sun_moon`: J2 with the
    /// Sun and Moon tides, states with an epoch only, or `egm2008`: the EGM2008 geopotential to
    /// degree 120, ground sites with an ellipsoidal height only); overrides the request's. Orbits offer
    /// `point_mass` and `j2` (with `inclination_deg`; a the energy semi-major axis).
    #[schema(value_type = Option<GravityModelName>)]
    pub gravity_model: Option<String>,
    /// Nominal oscillator frequency for this clock, Hz, in (0, 9e15]; overrides the request's.
    #[schema(exclusive_minimum = 0.0, maximum = 9.0e15)]
    pub nominal_frequency_hz: Option<f64>,
}

/// Rates of many clocks.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "items": [
        {"orbit": {"semi_major_axis_m": 26561750.0, "eccentricity": 0.01, "mean_anomaly_deg": 30.0}},
        {"ground_site": {"latitude_deg": 46.1, "longitude_deg": 11.2, "height_m": 1050.0}},
        {"state": {"frame": "GCRS", "position_m": [7000000.0, 0.0, 0.0], "velocity_m_s": [0.0, 7546.05, 0.0]}},
        {"lunar_site": {"latitude_deg": -89.5, "longitude_deg": 36.0, "height_m": 1200.0,
            "epoch": "2026-03-14T06:30:00"}}
    ],
    "reference": "TT",
    "nominal_frequency_hz": 10.23e6
}))]
pub struct RateRequest {
    /// The clocks, at least one and at most the configured batch limit (100 000 by default,
    /// `--batch-limit`; 422 `batch_too_large` above it).
    #[schema(min_items = 1, max_items = 100000)]
    pub items: Vec<RateItem>,
    /// Reference scale for every item without its own: `TT` (default) or `TCG`.
    #[schema(value_type = Option<ReferenceName>)]
    pub reference: Option<String>,
    /// Gravity model for every item without its own: `point_mass`, `j2`, `grs80` (the GRS80
    /// normal field in closed form) or `j2_sun_moon` (J2 about the CIP with the tidal
    /// potentials of the Sun and the Moon from the planetary ephemeris; states with an epoch
    /// only) or `egm2008` (the EGM2008 geopotential to degree and order 120 with the real geoid
    /// undulation, for ground sites given by ellipsoidal height; states answer 422
    /// `unsupported_gravity_model`). Without any, ground sites (ellipsoidal height) use `egm2008` (`grs80` takes the ellipsoid
    /// for the geoid, off by the undulation N of up to about +-1.1e-14; `j2` is off by up to
    /// 1.8e-15 more and a point-mass Earth by up to about 7e-13 on the ground), states with an epoch
    /// `j2_sun_moon`, and the other subjects `point_mass`. Orbits always use `point_mass` (a
    /// request-level `j2`, `grs80`, `j2_sun_moon` or `egm2008` does not apply to them; their answer says
    /// so); the Earth's flattening is below 1e-17 of rate at the Moon.
    #[schema(value_type = Option<GravityModelName>)]
    pub gravity_model: Option<String>,
    /// Nominal oscillator frequency for every item without its own, Hz, in (0, 9e15]: adds
    /// the `frequency` answer.
    #[schema(exclusive_minimum = 0.0, maximum = 9.0e15)]
    pub nominal_frequency_hz: Option<f64>,
}

/// Two clocks to compare.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "clock_a": {"orbit": {"semi_major_axis_m": 26561750.0, "eccentricity": 0.0}},
    "clock_b": {"ground_site": {"latitude_deg": 46.1, "longitude_deg": 11.2, "height_m": 1050.0,
        "height_reference": "geoid"}},
    "reference": "TT"
}))]
pub struct CompareRequest {
    /// Clock A (the clock whose gain is reported).
    pub clock_a: RateItem,
    /// Clock B (the clock A is compared with).
    pub clock_b: RateItem,
    /// Reference scale for both clocks (default `TT`); both must end up with the same one.
    #[schema(value_type = Option<ReferenceName>)]
    pub reference: Option<String>,
    /// Gravity model for a clock without its own (see `POST /v1/clock/rate`).
    #[schema(value_type = Option<GravityModelName>)]
    pub gravity_model: Option<String>,
    /// Nominal oscillator frequency for a clock without its own, Hz, in (0, 9e15].
    #[schema(exclusive_minimum = 0.0, maximum = 9.0e15)]
    pub nominal_frequency_hz: Option<f64>,
}
