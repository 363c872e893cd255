//! Query and answer of `GET /v1/earth/eop`.

use std::borrow::Cow;

use serde::{Deserialize, Serialize};
use utoipa::openapi::schema::{ObjectBuilder, Schema, Type};
use utoipa::openapi::RefOr;
use utoipa::{IntoParams, PartialSchema, ToSchema};

use crate::api::names::{iso_instant_pattern, vocabulary_schema};
use crate::physics::earth::eop::EopStatus;

/// Query of `GET /v1/earth/eop`.
#[derive(Debug, Clone, Deserialize, IntoParams)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct EopQuery {
    /// A UTC instant (ISO 8601, `Z` optional) at which to interpolate the table; without it,
    /// only the table's summary is answered.
    #[param(value_type = Option<UtcIsoInstant>, example = "2026-03-14T06:30:00Z")]
    pub at: Option<String>,
}

/// Schema of a UTC instant in ISO 8601.
pub struct UtcIsoInstant;

impl PartialSchema for UtcIsoInstant {
    fn schema() -> RefOr<Schema> {
        ObjectBuilder::new()
            .schema_type(Type::String)
            .pattern(Some(iso_instant_pattern()))
            .description(Some(
                "A UTC instant in ISO 8601: `2026-03-14T06:30:00.123456789012Z`, `2026-073T06:30:00` or a date alone (0h UTC); `Z` optional. A date that does not exist (2026-02-30), a second 60 outside a leap second of the table or a year outside 1960-9999 is a 422.",
            ))
            .examples(["2026-03-14T06:30:00Z"])
            .into()
    }
}

impl ToSchema for UtcIsoInstant {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("UtcIsoInstant")
    }
}

fn status_schema() -> RefOr<Schema> {
    vocabulary_schema::<EopStatus>(
        "`observed` (IERS flag I, or any C04 day) or `predicted` (IERS Bulletin A flag P)",
    )
}

/// The Earth orientation table in force; with `at`, its values at that instant.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct EopTableAnswer {
    /// Where the table came from (the built-in snapshot, a file, a URL).
    pub source: String,
    /// First tabulated day (UTC, ISO date).
    pub first_day: Option<String>,
    /// MJD of the first day.
    pub first_mjd: Option<i64>,
    /// Last tabulated day (UTC, ISO date): the end of the predictions when there are any.
    pub last_day: Option<String>,
    /// MJD of the last day.
    pub last_mjd: Option<i64>,
    /// Last day with observed polar motion and UT1 (UTC, ISO date).
    pub last_observed: Option<String>,
    /// MJD of the last observed day.
    pub last_observed_mjd: Option<i64>,
    /// Last predicted day (UTC, ISO date); null when the table holds no predictions.
    pub end_of_predictions: Option<String>,
    /// MJD of the last predicted day.
    pub end_of_predictions_mjd: Option<i64>,
    /// Number of tabulated days (one value per day at 0h UTC).
    pub day_count: usize,
    /// The values at the instant `at` of the query (absent without it).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub at: Option<EopValuesAnswer>,
}

/// The table's values at one UTC instant: 4-point Lagrange interpolation of the daily values
/// (IERS Conventions (2010) ch. 5.5.1), UT1 - UTC through UT1 - TAI across leap seconds, without
/// the sub-daily tidal and libration terms.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct EopValuesAnswer {
    /// The instant, as given.
    pub utc: String,
    /// UT1 - UTC, seconds.
    pub ut1_minus_utc_s: f64,
    /// Pole coordinate x_p (IERS Conventions (2010) ch. 5.4.1), arcseconds.
    pub xp_arcsec: f64,
    /// Pole coordinate y_p, arcseconds.
    pub yp_arcsec: f64,
    /// Celestial pole offset dX with respect to IAU 2006/2000A, arcseconds (null when a day
    /// used lacks it).
    pub dx_arcsec: Option<f64>,
    /// Celestial pole offset dY, arcseconds (null when a day used lacks it).
    pub dy_arcsec: Option<f64>,
    /// Excess length of day, seconds (null when a day used lacks it).
    pub lod_s: Option<f64>,
    /// Whether x_p, y_p and UT1 - UTC are observed or predicted (predicted when any of the
    /// days used is).
    #[schema(schema_with = status_schema)]
    pub status: String,
    /// Whether dX, dY are observed or predicted.
    #[schema(schema_with = status_schema)]
    pub nutation_status: String,
    /// Days from the last observed day (0h UTC) to the instant; 0 when not after it.
    pub days_after_observed: f64,
    /// On predicted values: the 1-sigma error the source states for the first tabulated day at
    /// or after the instant (IERS Bulletin A error columns); null when observed or not stated.
    pub likely_error: Option<EopLikelyError>,
}

/// The stated 1-sigma errors of predicted values.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct EopLikelyError {
    /// Error of x_p, arcseconds.
    pub xp_arcsec: f64,
    /// Error of y_p, arcseconds.
    pub yp_arcsec: f64,
    /// Error of UT1 - UTC, seconds.
    pub ut1_minus_utc_s: f64,
}
