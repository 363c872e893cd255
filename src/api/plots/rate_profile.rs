//! `GET /v1/plots/rate-profile`: the fractional rate of a clock on circular orbits against
//! altitude (velocity part, gravity part, total), with the zero crossing and the navigation
//! MEO and geostationary radii marked; SVG, or CSV when preferred.

use axum::extract::State;
use axum::http::HeaderMap;
use axum::response::Response;
use serde::Deserialize;
use utoipa::IntoParams;

use super::figure::{AxisUnit, Figure, Panel, Series, VerticalMark, XTicks};
use super::{answer_plot, check_points};
use crate::api::error::ApiError;
use crate::api::extract::QueryParams;
use crate::api::names::parse_named;
use crate::api::state::AppState;
use crate::physics::constants::EQUATORIAL_RADIUS_EARTH_M;
use crate::physics::rate::profile::{
    circular_rate_profile, sidereal_resonant_radius_m, zero_rate_radius_m,
};
use crate::physics::rate::RateReference;
use crate::physics::readable::readable;

/// Highest altitude accepted, km (orbit radii up to 1.5e9 m, the rate endpoints' limit).
pub const MAX_ALTITUDE_KM: f64 = 1_000_000.0;

/// Query of `GET /v1/plots/rate-profile`.
#[derive(Debug, Clone, Default, Deserialize, IntoParams)]
#[into_params(parameter_in = Query)]
#[serde(deny_unknown_fields)]
pub struct RateProfileQuery {
    /// Lowest altitude above the IERS equatorial radius (6 378 136.6 m), km; default 200.
    #[param(minimum = 0.0, maximum = 1000000.0, example = 200.0)]
    pub min_altitude_km: Option<f64>,
    /// Highest altitude, km, above `min_altitude_km`; default 50 000 (beyond GEO).
    #[param(minimum = 0.0, maximum = 1000000.0, example = 50000.0)]
    pub max_altitude_km: Option<f64>,
    /// Number of altitudes, evenly spaced, both ends included: 2 to 5 000, default 300.
    #[param(value_type = Option<u32>, minimum = 2, maximum = 5000, example = 300)]
    pub points: Option<usize>,
    /// Coordinate time the clock is compared with: `TT` (default) or `TCG`.
    #[param(value_type = Option<crate::api::names::ReferenceName>, example = "TT")]
    pub reference: Option<String>,
}

/// The validated query: altitudes in metres.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct RateProfileRequest {
    /// Lowest altitude, m.
    pub min_altitude_m: f64,
    /// Highest altitude, m.
    pub max_altitude_m: f64,
    /// Number of altitudes.
    pub points: usize,
    /// Reference scale.
    pub reference: RateReference,
}

fn altitude_km(value: Option<f64>, default: f64, field: &str) -> Result<f64, ApiError> {
    let km = value.unwrap_or(default);
    if !km.is_finite() || !(0.0..=MAX_ALTITUDE_KM).contains(&km) {
        return Err(ApiError::unprocessable(
            "bad_option",
            format!(
                "{field} is {} km; it must be from 0 to {} km",
                readable(km),
                readable(MAX_ALTITUDE_KM)
            ),
        )
        .with_field(field));
    }
    Ok(km)
}

/// Reads and checks the query.
pub fn read_query(query: &RateProfileQuery) -> Result<RateProfileRequest, ApiError> {
    let min_km = altitude_km(query.min_altitude_km, 200.0, "min_altitude_km")?;
    let max_km = altitude_km(query.max_altitude_km, 50_000.0, "max_altitude_km")?;
    if max_km <= min_km {
        return Err(ApiError::unprocessable(
            "bad_option",
            format!(
                "max_altitude_km ({} km) must be above min_altitude_km ({} km)",
                readable(max_km),
                readable(min_km)
            ),
        )
        .with_field("max_altitude_km"));
    }
    let reference = match &query.reference {
        None => RateReference::Tt,
        Some(text) => parse_named(text, "unknown_reference", "reference", "reference")?,
    };
    Ok(RateProfileRequest {
        min_altitude_m: min_km * 1e3,
        max_altitude_m: max_km * 1e3,
        points: check_points(query.points, 300)?,
        reference,
    })
}

/// The figure of a rate profile.
pub fn figure(request: &RateProfileRequest) -> Figure {
    let profile = circular_rate_profile(
        request.min_altitude_m,
        request.max_altitude_m,
        request.points,
        request.reference,
    );
    let x: Vec<f64> = profile.iter().map(|p| p.altitude_m / 1e3).collect();
    let column = |part: fn(&crate::physics::rate::RateParts) -> f64| -> Vec<Option<f64>> {
        profile.iter().map(|p| Some(part(&p.rate))).collect()
    };
    let altitude_km_of = |radius_m: f64| (radius_m - EQUATORIAL_RADIUS_EARTH_M) / 1e3;
    let meo_km = altitude_km_of(sidereal_resonant_radius_m(2.0));
    let geo_km = altitude_km_of(sidereal_resonant_radius_m(1.0));
    let mut marks = vec![
        VerticalMark {
            x: meo_km,
            label: format!(
                "navigation MEO, r = {:.0} km",
                meo_km + EQUATORIAL_RADIUS_EARTH_M / 1e3
            ),
        },
        VerticalMark {
            x: geo_km,
            label: format!(
                "GEO, r = {:.0} km",
                geo_km + EQUATORIAL_RADIUS_EARTH_M / 1e3
            ),
        },
    ];
    if request.reference == RateReference::Tt {
        let zero_km = altitude_km_of(zero_rate_radius_m());
        marks.insert(
            0,
            VerticalMark {
                x: zero_km,
                label: format!(
                    "total = 0 at r = {:.0} km",
                    zero_km + EQUATORIAL_RADIUS_EARTH_M / 1e3
                ),
            },
        );
    }
    let reference = request.reference.as_str();
    Figure {
        title: format!("Rate of a clock on a circular orbit against {reference}, by altitude"),
        subtitle: "d(tau)/dt - 1 = -(v^2/2 + U)/c^2 (+ L_G against TT), IERS Conventions (2010) eq. 10.6; point-mass Earth, GM of IERS Conventions (2010); altitude above a_E = 6378.1366 km".to_string(),
        x_quantity: "altitude above the equatorial radius".to_string(),
        x_column: "altitude_km".to_string(),
        x_unit: AxisUnit::new("km", 1.0),
        x_ticks: XTicks::Numeric,
        labels: Vec::new(),
        panels: vec![Panel {
            x,
            heading: format!("Fractional rate against {reference} (1e-10 = 8.64 \u{b5}s/day)"),
            y_quantity: "fractional rate".to_string(),
            y_unit: AxisUnit::new("1e-10", 1e10),
            series: vec![
                Series {
                    name: "total".to_string(),
                    column: "total".to_string(),
                    values: column(|r| r.total()),
                },
                Series {
                    name: "velocity part -v^2/2c^2".to_string(),
                    column: "velocity_part".to_string(),
                    values: column(|r| r.sr),
                },
                Series {
                    name: "gravity part".to_string(),
                    column: "gravity_part".to_string(),
                    values: column(|r| r.gr),
                },
            ],
            marks,
            zero_line: true,
        }],
    }
}

/// The rate of a clock on circular orbits from LEO to beyond GEO, as a plot.
#[utoipa::path(get, path = "/v1/plots/rate-profile", tag = "plots",
    params(RateProfileQuery),
    responses(
        (status = 200, description = "The plot (SVG 1.1, self-contained), or when `Accept` prefers `text/csv` its numbers: altitude_km, total, velocity_part, gravity_part (fractional rates, one row per altitude)",
            content(
                (String = "image/svg+xml", example = "<svg xmlns=\"http://www.w3.org/2000/svg\" ...>...</svg>"),
                (String = "text/csv", example = "altitude_km,total,velocity_part,gravity_part\n200,-3.1438201025318873e-10,-3.371036745510629e-10,2.272166429787418e-11\n")),
            headers(("Vary" = String, description = "`accept`"))),
        (status = 400, description = "The query string cannot be read (`invalid_query`: an unknown parameter, a value of the wrong type)", body = crate::api::error::Problem, content_type = "application/problem+json"),
        (status = 422, description = "An altitude outside 0 to 1 000 000 km or max not above min, points outside 2 to 5 000 (`bad_option`), an unknown `reference` (`unknown_reference`); `field` names it", body = crate::api::error::Problem, content_type = "application/problem+json"),
        crate::api::error::TimeoutProblem))]
pub async fn rate_profile(
    State(_state): State<AppState>,
    QueryParams(query): QueryParams<RateProfileQuery>,
    headers: HeaderMap,
) -> Result<Response, ApiError> {
    let request = read_query(&query)?;
    Ok(answer_plot(&headers, &figure(&request)))
}
