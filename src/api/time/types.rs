//! Request and response types of the time endpoints.

use serde::{Deserialize, Serialize};
use utoipa::{IntoParams, ToSchema};

use crate::api::names::{
    FormList, InstantFormatName, InstantString, ObserverPositionM, ScaleName, TargetScaleList,
    TargetScaleName, TdbModelName, ThreeNumbersText,
};
use crate::physics::time::format_name::InstantFormat;
use crate::physics::time::formats::InstantText;

/// An instant in its written forms: every form but `unix_s` unless the request names the forms
/// it wants (`forms`); a form that does not exist for the scale is absent.
#[derive(Debug, Clone, Default, Serialize, ToSchema)]
#[schema(example = json!({
    "scale": "TAI", "iso": "2026-03-14T06:30:37.123456789012", "mjd": "61113.271263003...",
    "jd": "2461113.771263003...", "j2000_s": "826741837.123456789012"
}))]
pub struct InstantForms {
    /// The scale the instant is read in.
    pub scale: String,
    /// ISO 8601 calendar form, 12 decimals (truncated, never rounded into the next second).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub iso: Option<String>,
    /// Modified Julian Date, decimal string (24 decimals, trailing zeros trimmed: lossless).
    /// UTC days with a leap second are 86 401 s long (ERFA/SOFA convention).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub mjd: Option<String>,
    /// Julian Date, decimal string (lossless, as `mjd`).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub jd: Option<String>,
    /// Seconds since J2000.0 (2000-01-01T12:00:00) of this scale, exact decimal string.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub j2000_s: Option<String>,
    /// Seconds since 1970-01-01T00:00:00 UTC, 86 400 s per day (POSIX time), exact decimal
    /// string; UTC only, and only when asked for (`forms`).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub unix_s: Option<String>,
    /// `WEEK:SECONDS_OF_WEEK` for GPST, GST, BDT and QZSST (full week numbers).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub gnss_week: Option<String>,
}

impl InstantForms {
    /// No form yet, in the scale named `scale`.
    pub fn named(scale: &str) -> Self {
        Self {
            scale: scale.to_string(),
            ..Self::default()
        }
    }

    /// Sets the text of one form.
    pub fn set(&mut self, form: InstantFormat, text: String) {
        let slot = match form {
            InstantFormat::Iso => &mut self.iso,
            InstantFormat::Mjd => &mut self.mjd,
            InstantFormat::Jd => &mut self.jd,
            InstantFormat::J2000S => &mut self.j2000_s,
            InstantFormat::UnixS => &mut self.unix_s,
            InstantFormat::GnssWeek => &mut self.gnss_week,
        };
        *slot = Some(text);
    }
}

impl From<InstantText> for InstantForms {
    fn from(text: InstantText) -> Self {
        Self {
            scale: text.scale.as_str().to_string(),
            iso: Some(text.iso),
            mjd: Some(text.mjd),
            jd: Some(text.jd),
            j2000_s: Some(text.j2000_s),
            unix_s: None,
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
    /// Cautions about this answer (e.g. a UTC instant past the leap-second table's expiry, or
    /// UT1 - UTC from predicted days of the Earth orientation table, with its likely error).
    pub warnings: Vec<String>,
    /// The TDB - TT model used (`series` or `ephemeris`), present when TDB or TCB is the input
    /// scale or a target.
    #[serde(skip_serializing_if = "Option::is_none")]
    #[schema(value_type = Option<TdbModelName>)]
    pub tdb_model: Option<String>,
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
    #[param(value_type = InstantString, example = "2026-03-14T06:30:00.123456789012")]
    pub at: String,
    /// Scale of `at` (default UTC): UTC, TAI, TT, TCG, TCB, TDB, GPST, GST, BDT, QZSST, UT1,
    /// written exactly so (UT1 only where the Earth orientation table covers the epoch).
    #[param(value_type = Option<ScaleName>, example = "UTC")]
    pub from: Option<String>,
    /// Target scales, comma-separated without spaces, or `all` (default `all`: every scale but
    /// UT1, which exists only where the Earth orientation table covers the epoch; name it).
    #[param(value_type = Option<TargetScaleList>, example = "TAI,TT,TDB,TCL")]
    pub to: Option<String>,
    /// How `at` is written: iso (default), mjd, jd, j2000_s, unix_s (UTC only), gnss_week (GNSS scales).
    #[param(value_type = Option<InstantFormatName>, example = "iso")]
    pub format: Option<String>,
    /// Observer for the topocentric part of TDB - TT: ITRF position in metres, `x,y,z` (no
    /// spaces), within 6 340 km to 6 480 km of the geocentre (422 `observer_not_on_ground`
    /// otherwise).
    #[param(value_type = Option<ThreeNumbersText>, example = "4346657.2,860661.3,4573718.4")]
    pub observer_itrf_m: Option<String>,
    /// Observer near the Moon for the position-dependent term v_M.(x - x_M)/c^2 of TCB - TCL:
    /// position relative to the Moon's centre, ICRF axes, metres, `x,y,z` (no spaces), from
    /// the lunar surface (1 737 400 m less 10 km) to 60 000 km (422 `below_surface`,
    /// `beyond_model_range` otherwise); it changes the results between TCL or TL and the
    /// other scales. Not together with `observer_itrf_m` (422 `invalid_observer`).
    #[param(value_type = Option<ThreeNumbersText>, example = "0,0,-1737400")]
    pub selenocentric_observer_m: Option<String>,
    /// The forms each instant of the answer carries, comma-separated without spaces, in the
    /// order wanted: iso, mjd, jd, j2000_s, unix_s (UTC only), gnss_week (GNSS scales only)
    /// (default: every form but unix_s). In CSV one column per form per target.
    #[param(value_type = Option<FormList>, example = "iso,j2000_s")]
    pub forms: Option<String>,
    /// The TDB - TT model for TDB and TCB: `series` (default) or `ephemeris` (JPL DE440,
    /// 1959-12-30 to 2101-01-02 TT; 422 `outside_tdb_model_span` elsewhere).
    #[param(value_type = Option<TdbModelName>, example = "ephemeris")]
    pub tdb_model: Option<String>,
    /// The broadcast week counter `at` was read from, when `format` is gnss_week and the week
    /// is truncated (as broadcast): gps_lnav (10 bits), gps_cnav (13), galileo (12), beidou
    /// (13). The full week is the one nearest to `week_near`; `warnings` say which rollover was
    /// chosen.
    #[param(value_type = Option<WeekCounterName>, example = "gps_lnav")]
    pub week_counter: Option<String>,
    /// The date (`YYYY-MM-DD`, 1980 or later) near which a broadcast week is resolved (default:
    /// today on the server's clock); only with `week_counter`.
    #[param(example = "2026-01-01")]
    pub week_near: Option<String>,
}

/// Observer on the Earth for the topocentric part of TDB - TT: either `itrf_position_m`, or
/// `latitude_deg` and `longitude_deg` (and optionally `height_m`); within 6 340 km to 6 480 km
/// of the geocentre (422 `invalid_observer`, `observer_not_on_ground` otherwise).
#[derive(Debug, Clone, Deserialize, ToSchema)]
#[serde(deny_unknown_fields)]
#[schema(example = json!({"latitude_deg": 46.1, "longitude_deg": 11.2, "height_m": 1050.0}))]
pub struct ObserverInput {
    /// ITRF position [x, y, z] in metres (each component within 6 480 km); give this or the
    /// geodetic pair.
    #[schema(value_type = Option<ObserverPositionM>)]
    pub itrf_position_m: Option<[f64; 3]>,
    /// Geodetic latitude on GRS80, degrees in [-90, 90].
    #[schema(minimum = -90.0, maximum = 90.0)]
    pub latitude_deg: Option<f64>,
    /// Longitude, degrees east, |value| <= 1e6 (wraps).
    #[schema(minimum = -1.0e6, maximum = 1.0e6)]
    pub longitude_deg: Option<f64>,
    /// Height above the GRS80 ellipsoid, metres, in [-11 000, 1e8] (and the observer within
    /// 6 480 km of the geocentre).
    #[schema(minimum = -11000.0, maximum = 1.0e8)]
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
    #[schema(value_type = ScaleName)]
    pub from: String,
    /// Target scales, or `["all"]` (every scale but UT1); at least one.
    #[schema(value_type = Vec<TargetScaleName>, min_items = 1)]
    pub to: Vec<String>,
    /// How the epochs are written (default `iso`).
    #[schema(value_type = Option<InstantFormatName>)]
    pub format: Option<String>,
    /// The instants, as text in `format`: at least one and at most the batch limit (100 000 by
    /// default, `--batch-limit`; 422 `batch_too_large` above it).
    #[schema(value_type = Vec<InstantString>, min_items = 1, max_items = 100000)]
    pub epochs: Vec<String>,
    /// Observer for the topocentric part of TDB - TT (geocentric when absent).
    pub observer: Option<ObserverInput>,
    /// Observer near the Moon for the position-dependent term v_M.(x - x_M)/c^2 of TCB - TCL:
    /// [x, y, z] relative to the Moon's centre, ICRF axes, metres, from the lunar surface
    /// (1 737 400 m less 10 km) to 60 000 km (422 `below_surface`, `beyond_model_range`); it
    /// changes the results between TCL or TL and the other scales. Not with `observer`.
    #[schema(value_type = Option<Vec<f64>>, min_items = 3, max_items = 3, example = json!([0.0, 0.0, -1737400.0]))]
    pub selenocentric_observer_m: Option<[f64; 3]>,
    /// The forms each instant of the answer carries, in the order wanted, at least one (default:
    /// every form but `unix_s`). In CSV one column per form per target.
    #[schema(value_type = Option<Vec<InstantFormatName>>, min_items = 1)]
    pub forms: Option<Vec<String>>,
    /// The TDB - TT model for TDB and TCB: `series` (default) or `ephemeris` (JPL DE440,
    /// 1959-12-30 to 2101-01-02 TT; 422 `outside_tdb_model_span` elsewhere).
    #[schema(value_type = Option<TdbModelName>)]
    pub tdb_model: Option<String>,
    /// The broadcast week counter the epochs were read from, when `format` is gnss_week and the
    /// weeks are truncated (as broadcast): gps_lnav (10 bits), gps_cnav (13), galileo (12),
    /// beidou (13). Each full week is the one nearest to `week_near`; each conversion's
    /// `warnings` say which rollover was chosen.
    #[schema(value_type = Option<WeekCounterName>, example = "gps_lnav")]
    pub week_counter: Option<String>,
    /// The date (`YYYY-MM-DD`, 1980 or later) near which broadcast weeks are resolved (default:
    /// today on the server's clock); only with `week_counter`.
    #[schema(example = "2026-01-01")]
    pub week_near: Option<String>,
}

/// Query of `GET /v1/time/now`.
#[derive(Debug, Clone, Deserialize, IntoParams)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct NowQuery {
    /// The forms each instant of the answer carries, comma-separated without spaces (as for
    /// `GET /v1/time/convert`; default: every form but unix_s).
    #[param(value_type = Option<FormList>, example = "iso,unix_s")]
    pub forms: Option<String>,
    /// The TDB - TT model for TDB and TCB: `series` (default) or `ephemeris` (JPL DE440).
    #[param(value_type = Option<TdbModelName>, example = "ephemeris")]
    pub tdb_model: Option<String>,
    /// Observer near the Moon, as for `GET /v1/time/convert`: position relative to the Moon's
    /// centre, ICRF axes, metres, `x,y,z` (no spaces), from the lunar surface (1 737 400 m less
    /// 10 km) to 60 000 km (422 `below_surface`, `beyond_model_range` otherwise); TCL and TL
    /// then carry the position-dependent term v_M.(x - x_M)/c^2 of TCB - TCL at the observer.
    #[param(value_type = Option<ThreeNumbersText>, example = "0,0,-1737400")]
    pub selenocentric_observer_m: Option<String>,
}

/// Schema of a week counter name.
pub struct WeekCounterName;

impl utoipa::PartialSchema for WeekCounterName {
    fn schema() -> utoipa::openapi::RefOr<utoipa::openapi::Schema> {
        crate::api::names::vocabulary_schema::<crate::physics::time::formats::WeekCounter>(
            "The broadcast week counter a `gnss_week` instant was read from: `gps_lnav` (GPS/QZSS legacy message, 10 bits, IS-GPS-200), `gps_cnav` (GPS/QZSS CNAV, 13 bits), `galileo` (12 bits, Galileo OS SIS ICD), `beidou` (13 bits, BeiDou OS SIS ICD).",
        )
    }
}

impl utoipa::ToSchema for WeekCounterName {
    fn name() -> std::borrow::Cow<'static, str> {
        std::borrow::Cow::Borrowed("WeekCounterName")
    }
}
