//! Query, body and answer of `GET` and `POST /v1/earth/orientation`.

use serde::{Deserialize, Serialize};
use utoipa::{IntoParams, ToSchema};

use super::types::EopLikelyError;
use crate::api::names::{InstantFormatName, InstantString, ScaleName};
use crate::api::time::types::InstantForms;

/// Query of `GET /v1/earth/orientation`.
#[derive(Debug, Clone, Deserialize, IntoParams)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct OrientationQuery {
    /// The instant, as text in `format` (e.g. `2026-03-14T06:30:00`).
    #[param(value_type = InstantString, example = "2026-03-14T06:30:00")]
    pub at: String,
    /// Scale of `at` (default UTC), as for `from` of `GET /v1/time/convert`.
    #[param(value_type = Option<ScaleName>, example = "UTC")]
    pub scale: Option<String>,
    /// How `at` is written (default iso), as for `GET /v1/time/convert`.
    #[param(value_type = Option<InstantFormatName>, example = "iso")]
    pub format: Option<String>,
    /// Whether the table's celestial-pole offsets dX, dY are added to the model's CIP X, Y
    /// (default true, IERS Conventions (2010) sec. 5.5.4); false gives the IAU 2006/2000A model
    /// alone, as ERFA's `eraC2t06a`.
    #[param(example = true)]
    pub pole_offsets: Option<bool>,
}

/// Batch request of `POST /v1/earth/orientation`.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "scale": "UTC", "format": "iso",
    "epochs": ["2026-03-14T06:30:00", "2027-03-01T00:00:00"]
}))]
pub struct OrientationBatchRequest {
    /// Scale of the epochs (default UTC).
    #[schema(value_type = Option<ScaleName>)]
    pub scale: Option<String>,
    /// How the epochs are written (default `iso`).
    #[schema(value_type = Option<InstantFormatName>)]
    pub format: Option<String>,
    /// The instants, as text in `format`: at least one and at most the batch limit (100 000 by
    /// default, `--batch-limit`; 422 `batch_too_large` above it).
    #[schema(value_type = Vec<InstantString>, min_items = 1, max_items = 100000)]
    pub epochs: Vec<String>,
    /// Whether dX, dY are applied (default true), as for the query of the single form.
    pub pole_offsets: Option<bool>,
}

/// Where the Earth orientation parameters of an answer come from, and how good they are.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct EopProvenance {
    /// The EOP table in force (the built-in snapshot, a file, a URL), as `GET /v1/earth/eop`.
    pub source: String,
    /// `observed` or `predicted` for x_p, y_p and UT1 - UTC (predicted when any of the four
    /// days interpolated is).
    pub status: String,
    /// `observed` or `predicted` for dX, dY.
    pub nutation_status: String,
    /// Days from the last observed day (0h UTC) to the instant; 0 when not after it.
    pub days_after_observed: f64,
    /// On predicted values, the 1-sigma error the source states (IERS Bulletin A); null when
    /// observed or not stated.
    pub likely_error: Option<EopLikelyError>,
}

/// The Earth's orientation at one instant: IAU 2006/2000A, CIO based (IERS Conventions (2010)
/// ch. 5), with the EOP table's values interpolated at the instant (4-point Lagrange, no
/// sub-daily tidal terms).
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct EarthOrientationAnswer {
    /// The instant as read.
    pub input: InstantForms,
    /// The instant in UTC.
    pub utc: InstantForms,
    /// The instant in TT.
    pub tt: InstantForms,
    /// TT as a two-part Julian date [jd1, jd2] (jd1 + jd2 days), the form ERFA takes.
    pub tt_jd: [f64; 2],
    /// UT1 as a two-part Julian date [jd1, jd2]: UTC + (UT1 - UTC).
    pub ut1_jd: [f64; 2],
    /// Earth rotation angle (IERS Conventions (2010) eq. 5.15), radians in [0, 2 pi).
    pub era_rad: f64,
    /// Earth rotation angle, degrees.
    pub era_deg: f64,
    /// Greenwich mean sidereal time, IAU 2006, radians in [0, 2 pi).
    pub gmst_rad: f64,
    /// GMST, degrees.
    pub gmst_deg: f64,
    /// Greenwich apparent sidereal time, IAU 2006/2000A (ERA - EO), radians in [0, 2 pi).
    pub gast_rad: f64,
    /// GAST, degrees.
    pub gast_deg: f64,
    /// UT1 - UTC, seconds.
    pub ut1_minus_utc_s: f64,
    /// Excess length of day, seconds (null when a day used lacks it).
    pub lod_s: Option<f64>,
    /// Pole coordinate x_p, arcseconds.
    pub xp_arcsec: f64,
    /// Pole coordinate y_p, arcseconds.
    pub yp_arcsec: f64,
    /// x_p, radians.
    pub xp_rad: f64,
    /// y_p, radians.
    pub yp_rad: f64,
    /// Celestial pole offset dX of the table, arcseconds (null when a day used lacks it).
    pub dx_arcsec: Option<f64>,
    /// Celestial pole offset dY of the table, arcseconds (null when a day used lacks it).
    pub dy_arcsec: Option<f64>,
    /// Whether dX, dY were added to X, Y (and so to the matrix).
    pub pole_offsets_applied: bool,
    /// CIP X in the GCRS (IAU 2006/2000A, plus dX when applied), radians.
    pub cip_x_rad: f64,
    /// CIP Y in the GCRS (plus dY when applied), radians.
    pub cip_y_rad: f64,
    /// CIO locator s (IAU 2006), radians.
    pub s_rad: f64,
    /// TIO locator s' (IERS Conventions (2010) eq. 5.13), radians.
    pub sprime_rad: f64,
    /// The rotation from the GCRS to the ITRS, row-major, `r_itrs = M r_gcrs` (ERFA's `rc2t`,
    /// `W^T R3(ERA) Q^T`); its transpose takes ITRS to GCRS (IERS Conventions (2010) eq. 5.1).
    pub gcrs_to_itrs: [[f64; 3]; 3],
    /// Where the EOP values come from and whether they are observed or predicted.
    pub eop: EopProvenance,
    /// Cautions about this answer: predicted EOP (naming the quantity and its likely error),
    /// missing dX, dY, a UTC instant past the leap-second table's expiry.
    pub warnings: Vec<String>,
}

/// Answer of `POST /v1/earth/orientation`.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct OrientationBatch {
    /// One orientation per epoch, in order.
    pub orientations: Vec<EarthOrientationAnswer>,
}
