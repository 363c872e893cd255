//! Query and answer of `GET /v1/solar-system/state`.

use std::borrow::Cow;

use serde::{Deserialize, Serialize};
use utoipa::openapi::{RefOr, Schema};
use utoipa::{IntoParams, PartialSchema, ToSchema};

use crate::api::names::{vocabulary_schema, InstantFormatName, InstantString, ScaleName};
use crate::api::time::types::InstantForms;
use crate::physics::solar_system::Body;

/// Schema of a body name.
pub struct BodyName;

impl PartialSchema for BodyName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<Body>(
            "A body of the solar system or a barycentre: `ssb` (solar-system barycentre), `sun`, `emb` (Earth-Moon barycentre), `earth`, `moon`, or a planet's system barycentre (`mercury_barycenter` .. `pluto_barycenter`).",
        )
    }
}

impl ToSchema for BodyName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("BodyName")
    }
}

/// Query of `GET /v1/solar-system/state`.
#[derive(Debug, Clone, Deserialize, IntoParams)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct BodyStateQuery {
    /// The body whose state is asked for.
    #[param(value_type = BodyName, example = "moon")]
    pub body: String,
    /// The origin of the state (default `ssb`); any body, typically `ssb`, `sun`, `earth`,
    /// `moon` or `emb`.
    #[param(value_type = Option<BodyName>, example = "earth")]
    pub center: Option<String>,
    /// The instant, as text in `format` (e.g. `2026-03-14T06:30:00`); it is converted to TDB,
    /// the ephemeris's argument (geocentric TDB - TT, Fairhead & Bretagnon series).
    #[param(value_type = InstantString, example = "2026-03-14T06:30:00")]
    pub at: String,
    /// Scale of `at` (default TDB); UTC, TT, TCB and the others are converted.
    #[param(value_type = Option<ScaleName>, example = "UTC")]
    pub scale: Option<String>,
    /// How `at` is written (default iso), as for `GET /v1/time/convert`.
    #[param(value_type = Option<InstantFormatName>, example = "iso")]
    pub format: Option<String>,
}

/// The planetary ephemeris in force.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct EphemerisInfo {
    /// Its name: the built-in excerpt of JPL DE440, or the kernel file loaded with
    /// `--ephemeris-file`.
    pub name: String,
    /// First epoch covered (TDB, ISO 8601).
    pub first_tdb: String,
    /// Last epoch covered (TDB, ISO 8601).
    pub last_tdb: String,
}

/// A body's position and velocity relative to a centre.
#[derive(Debug, Clone, Serialize, ToSchema)]
#[schema(example = json!({
    "body": "moon", "center": "earth", "frame": "ICRF",
    "input": {"scale": "UTC", "iso": "2026-03-14T06:30:00.000000000000", "j2000_s": "826741800.0"},
    "tdb": {"scale": "TDB", "iso": "2026-03-14T06:31:09.185525981709", "j2000_s": "826741869.185525981709948877"},
    "position_m": [167704961.19604397, -318261424.7813792, -165269547.40628052],
    "velocity_m_s": [874.846828343024, 394.5354407225341, 246.1950780735993],
    "distance_m": 395890530.08820117,
    "ephemeris": {"name": "DE440 (built-in excerpt 1959-01-01 .. 2102-01-01 TDB)",
                  "first_tdb": "1959-01-01T00:00:00", "last_tdb": "2102-01-01T00:00:00"},
    "warnings": []
}))]
pub struct BodyStateAnswer {
    /// The body.
    #[schema(value_type = BodyName)]
    pub body: String,
    /// The centre the state is relative to.
    #[schema(value_type = BodyName)]
    pub center: String,
    /// The axes: always `ICRF` (the ephemeris's axes; no aberration or light time applied:
    /// geometric states).
    pub frame: String,
    /// The instant as read.
    pub input: InstantForms,
    /// The instant in TDB, the argument the ephemeris was read at.
    pub tdb: InstantForms,
    /// Position of the body minus position of the centre, metres, ICRF axes.
    pub position_m: [f64; 3],
    /// Velocity of the body minus velocity of the centre, m/s, ICRF axes.
    pub velocity_m_s: [f64; 3],
    /// Length of `position_m`, metres.
    pub distance_m: f64,
    /// The ephemeris that answered, with its span.
    pub ephemeris: EphemerisInfo,
    /// Cautions about this answer (a UTC instant past the leap-second table's expiry).
    pub warnings: Vec<String>,
}
