//! Request and response types of the signal endpoints.

use serde::{Deserialize, Serialize};
use utoipa::ToSchema;

use crate::api::names::{
    FrameName, InstantFormatName, InstantString, PositionM, ScaleName, TransmitterMotionName,
    VelocityMS,
};
use crate::api::time::types::InstantForms;

/// A place on the Earth: GRS80 geodetic coordinates (fixed in the ITRF).
#[derive(Debug, Clone, Copy, Deserialize, ToSchema)]
#[schema(as = GeodeticSiteInput)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"latitude_deg": 46.1, "longitude_deg": 11.2, "height_m": 1050.0}))]
pub struct GroundSiteInput {
    /// Geodetic latitude on the GRS80 ellipsoid, degrees in [-90, 90] (north positive).
    #[schema(minimum = -90.0, maximum = 90.0)]
    pub latitude_deg: f64,
    /// Longitude, degrees east, |value| <= 1e6 (wraps).
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub longitude_deg: f64,
    /// Height above the GRS80 ellipsoid, metres, in [-11 000, 1e8].
    #[schema(minimum = -11000.0, maximum = 1.0e8)]
    pub height_m: f64,
}

/// One end of a signal path: either `frame` + `position_m` (+ `velocity_m_s`), or `ground_site`
/// (422 `invalid_endpoint` otherwise).
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"frame": "ITRF", "position_m": [15600000.0, 7540000.0, 20140000.0],
    "velocity_m_s": [-2000.0, 2800.0, 500.0]}))]
pub struct PathEndpointInput {
    /// `GCRS` (geocentric, non-rotating) or `ITRF` (Earth-fixed); a `ground_site` counts as
    /// ITRF. With the ends in different frames the ITRF end goes into the GCRS at the reception
    /// epoch (IERS Conventions (2010) eq. 5.1 with the EOP table in force; its velocity with
    /// the Earth rotation about the CIP and the precession-nutation rate) and the path is
    /// solved in the GCRS.
    #[schema(value_type = Option<FrameName>)]
    pub frame: Option<String>,
    /// Geocentric position at the reception epoch, metres.
    #[schema(value_type = Option<PositionM>)]
    pub position_m: Option<[f64; 3]>,
    /// Velocity in `frame` at the reception epoch, m/s (ITRF: relative to the rotating Earth).
    /// Absent: at rest in `frame`. The transmitter is moved back along it to the emission time;
    /// the receiver's is only checked (its position at reception is all the light time needs).
    #[schema(value_type = Option<VelocityMS>)]
    pub velocity_m_s: Option<[f64; 3]>,
    /// A point fixed on the Earth, instead of `frame` and `position_m`.
    pub ground_site: Option<GroundSiteInput>,
    /// How the transmitter moves over the flight when it has a `velocity_m_s`: `free_fall`
    /// (default: a satellite, integrated in the Earth's point-mass plus J2 field, within 1e-8 m
    /// of its path over a navigation satellite's 0.07 s) or `uniform` (straight at constant
    /// velocity in `frame`, for a vehicle; 1 to 2 mm off for a satellite). Without a velocity
    /// the transmitter is at rest in `frame` (a ground site turns with the Earth). Only with a
    /// velocity, and only for the transmitter (422 `invalid_endpoint` otherwise).
    #[schema(value_type = Option<TransmitterMotionName>)]
    pub motion: Option<String>,
}

/// Signal-path request.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "transmitter": {"frame": "ITRF", "position_m": [15600000.0, 7540000.0, 20140000.0],
                    "velocity_m_s": [-2000.0, 2800.0, 500.0]},
    "receiver": {"ground_site": {"latitude_deg": 46.1, "longitude_deg": 11.2, "height_m": 1050.0}},
    "epoch": "2026-03-14T06:30:00", "scale": "GPST"
}))]
pub struct SignalPathRequest {
    /// The transmitter's state at the reception epoch.
    pub transmitter: PathEndpointInput,
    /// The receiver at the reception epoch.
    pub receiver: PathEndpointInput,
    /// The reception instant, as text in `format` and `scale`; echoed in the answer.
    #[schema(value_type = InstantString)]
    pub epoch: String,
    /// Scale of `epoch`: UTC, TAI, TT, TCG, TCB, TDB, GPST, GST, BDT, QZSST.
    #[schema(value_type = ScaleName)]
    pub scale: String,
    /// How `epoch` is written (default `iso`): iso, mjd, jd, j2000_s, unix_s, gnss_week.
    #[schema(value_type = Option<InstantFormatName>)]
    pub format: Option<String>,
}

/// A correction in time and in length (`m = s * c`).
#[derive(Debug, Clone, Copy, Serialize, ToSchema)]
pub struct Correction {
    /// Seconds.
    pub s: f64,
    /// Metres, `s` times c = 299 792 458 m/s.
    pub m: f64,
}

/// The corrections of a signal path.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct SignalTerms {
    /// Sagnac term: added to `geometric_range_m / c` (with `shapiro`) to give `light_time_s`.
    /// ITRF input: the exact (inertial range - Earth-fixed range)/c, to first order
    /// (omega_E/c^2)(x_T y_R - y_T x_R) (IS-GPS-200 20.3.3.4.3.3.2); positive for an eastward
    /// signal. GCRS input: 0 (the rotation is in the inertial positions).
    pub sagnac: Correction,
    /// Shapiro delay of the Earth, (2GM/c^3) ln((r_T + r_R + rho)/(r_T + r_R - rho)) (IERS
    /// Conventions (2010) eq. 11.17); always positive, added like `sagnac`.
    pub shapiro: Correction,
    /// Periodic relativistic term of the transmitter clock, -2 r.v/c^2 at emission
    /// (IS-GPS-200 20.3.3.3.3.1): its reading minus coordinate time. A clock term, not part of
    /// `light_time_s` or `total`; a receiver reading the transmitter's time stamps sees
    /// `light_time_s - clock_periodic.s`. Absent when the transmitter has no velocity.
    pub clock_periodic: Option<Correction>,
}

/// Signal-path answer.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct SignalPathAnswer {
    /// The reception epoch as read.
    pub epoch: InstantForms,
    /// Frame of the computation: GCRS or ITRF.
    pub frame: String,
    /// Coordinate time from emission to reception, s:
    /// `geometric_range_m / c + terms.sagnac.s + terms.shapiro.s`.
    pub light_time_s: f64,
    /// Range between the transmitter at emission and the receiver at reception in the input
    /// frame, m (ITRF: both in Earth-fixed coordinates; GCRS: inertial).
    pub geometric_range_m: f64,
    /// The same range in the non-rotating frame, m (equals `geometric_range_m` for GCRS).
    pub inertial_range_m: f64,
    /// Iterations of the light-time equation (converged to 1e-15 s).
    pub iterations: u32,
    /// The corrections.
    pub terms: SignalTerms,
    /// Sum of the path terms (`sagnac` + `shapiro`) = `light_time_s - geometric_range_m / c`.
    pub total: Correction,
    /// The transmitter's position at emission in the input frame, m.
    pub emission_position_m: [f64; 3],
    /// The sign convention, in words.
    pub sign_convention: String,
}

/// Two-way time-transfer request.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "station_a": {"latitude_deg": 46.1, "longitude_deg": 11.2, "height_m": 1050.0},
    "station_b": {"latitude_deg": 52.6, "longitude_deg": -1.9, "height_m": 120.0},
    "satellite_longitude_deg": 5.0
}))]
pub struct TwoWayRequest {
    /// Station A.
    pub station_a: GroundSiteInput,
    /// Station B.
    pub station_b: GroundSiteInput,
    /// Longitude of the sub-satellite point of the satellite (fixed above the equator), degrees
    /// east, |value| <= 1e6 (wraps). The satellite must be above both stations' horizons (422
    /// `not_visible` otherwise).
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub satellite_longitude_deg: f64,
    /// Geocentric distance of the satellite, m, at most 1.5e9 and above the Earth's surface
    /// (default: geostationary, 42 164 172 m = (GM/omega_E^2)^(1/3) with IERS Conventions
    /// (2010) table 1.1 values).
    #[schema(exclusive_minimum = 0.0, maximum = 1.5e9)]
    pub satellite_radius_m: Option<f64>,
}

/// Two-way time-transfer Sagnac answer.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct TwoWayAnswer {
    /// Sagnac term of the uplink A -> satellite, 2 omega_E A_A / c^2 (ITU-R TF.1153), s; A_A the
    /// signed equatorial-plane area of the triangle geocentre - station A - satellite, positive
    /// when A -> satellite runs eastward. The downlink satellite -> A has the opposite sign.
    pub leg_a_s: f64,
    /// The same for station B, s.
    pub leg_b_s: f64,
    /// `leg_a_s - leg_b_s`, s: the Sagnac term of the signal A -> satellite -> B (minus that
    /// of B -> satellite -> A), and the amount to add to (TI(A) - TI(B))/2 to get clock A -
    /// clock B. See `sign_convention`.
    pub two_way_s: f64,
    /// Elevation of the satellite seen from station A, degrees.
    pub elevation_a_deg: f64,
    /// Elevation of the satellite seen from station B, degrees.
    pub elevation_b_deg: f64,
    /// The satellite radius used, m.
    pub satellite_radius_m: f64,
    /// The sign convention, in words.
    pub sign_convention: String,
}
