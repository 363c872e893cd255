//! Request and response types of the time endpoints.

use serde::{Deserialize, Serialize};
use utoipa::{IntoParams, ToSchema};

use crate::physics::time::formats::InstantText;

/// An instant in every written form.
#[derive(Debug, Clone, Serialize, ToSchema)]
#[schema(example = json!({
    "scale": "TAI", "iso": "2026-03-14T06:30:37.123456789012", "mjd": "61113.271263003...",
    "jd": "2461113.771263003...", "j2000_s": "826741837.123456789012", "gnss_week": null
}))]
pub struct InstantForms {
    /// The scale the instant is read in.
    pub scale: String,
    /// ISO 8601 calendar form, 12 decimals (truncated, never rounded into the next second).
    pub iso: String,
    /// Modified Julian Date, decimal string (24 decimals, trailing zeros trimmed: lossless).
    /// UTC days with a leap second are 86 401 s long (ERFA/SOFA convention).
    pub mjd: String,
    /// Julian Date, decimal string (lossless, as `mjd`).
    pub jd: String,
    /// Seconds since J2000.0 (2000-01-01T12:00:00) of this scale, exact decimal string.
    pub j2000_s: String,
    /// `WEEK:SECONDS_OF_WEEK` for GPST, GST, BDT and QZSST (full week numbers).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub gnss_week: Option<String>,
}

impl From<InstantText> for InstantForms {
    fn from(text: InstantText) -> Self {
        Self {
            scale: text.scale.as_str().to_string(),
            iso: text.iso,
            mjd: text.mjd,
            jd: text.jd,
            j2000_s: text.j2000_s,
            gnss_week: text.gnss_week,
        }
    }
}

/// An instant converted into one target scale.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct ConvertedInstant {
    /// The instant in the target scale.
    #[serde(flatten)]
    pub instant: InstantForms,
    /// Reading in the target scale minus reading in the input scale for the same event, in
    /// seconds (TAI from UTC in 2026: 37.0). The exact value is `difference_exact_s`.
    pub difference_s: f64,
    /// The same difference as an exact decimal string (attosecond resolution).
    pub difference_exact_s: String,
}

/// One instant and its conversions.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct Conversion {
    /// The instant as read.
    pub input: InstantForms,
    /// One entry per target scale, in the order asked.
    pub results: Vec<ConvertedInstant>,
    /// Cautions about this answer (e.g. a UTC instant past the leap-second table's expiry).
    pub warnings: Vec<String>,
}

/// Answer of the batch conversion.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct ConversionBatch {
    /// One conversion per input epoch, in order.
    pub conversions: Vec<Conversion>,
}

/// Query of the single conversion.
#[derive(Debug, Clone, Deserialize, IntoParams)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct ConvertQuery {
    /// The instant, as text in `format` (e.g. `2026-03-14T06:30:00.123456789012`).
    #[param(example = "2026-03-14T06:30:00.123456789012")]
    pub at: String,
    /// Scale of `at` (default UTC): UTC, TAI, TT, TCG, TCB, TDB, GPST, GST, BDT, QZSST.
    #[param(example = "UTC")]
    pub from: Option<String>,
    /// Target scales, comma-separated, or `all` (default `all`).
    #[param(example = "TAI,TT,TDB")]
    pub to: Option<String>,
    /// How `at` is written: iso (default), mjd, jd, j2000_s, unix_s (UTC only), gnss_week (GNSS scales).
    #[param(example = "iso")]
    pub format: Option<String>,
    /// Observer for the topocentric part of TDB - TT: ITRF position in metres, `x,y,z`.
    #[param(example = "4027894.0,307045.0,4919474.9")]
    pub observer_itrf_m: Option<String>,
}

/// Observer on the Earth for the topocentric part of TDB - TT.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
pub struct ObserverInput {
    /// ITRF position in metres; give this or the geodetic triple.
    pub itrf_position_m: Option<[f64; 3]>,
    /// Geodetic latitude on GRS80, degrees.
    pub latitude_deg: Option<f64>,
    /// Longitude, degrees east.
    pub longitude_deg: Option<f64>,
    /// Height above the GRS80 ellipsoid, metres.
    pub height_m: Option<f64>,
}

/// Batch conversion request.
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({
    "from": "UTC", "to": ["TAI", "TT", "TDB", "GPST"], "format": "iso",
    "epochs": ["2026-03-14T06:30:00.123456789012", "2016-12-31T23:59:60.5"]
}))]
pub struct ConvertBatchRequest {
    /// Scale of the epochs.
    pub from: String,
    /// Target scales, or `["all"]`.
    pub to: Vec<String>,
    /// How the epochs are written (default `iso`).
    pub format: Option<String>,
    /// The instants, as text.
    pub epochs: Vec<String>,
    /// Observer for the topocentric part of TDB - TT (geocentric when absent).
    pub observer: Option<ObserverInput>,
}
