//! The observer of the topocentric part of TDB - TT, from a query value or a request body.

use super::types::ObserverInput;
use crate::api::error::ApiError;
use crate::physics::time::tdb_series::{TopocentricObserver, OBSERVER_RADIUS_RANGE_M};

fn observer_from_position(
    position_m: [f64; 3],
    field: &str,
) -> Result<TopocentricObserver, ApiError> {
    if !position_m.iter().all(|v| v.is_finite()) {
        return Err(ApiError::unprocessable(
            "not_finite",
            "the observer position must be three finite numbers in metres",
        )
        .with_field(field));
    }
    let radius_m = (position_m[0].powi(2) + position_m[1].powi(2) + position_m[2].powi(2)).sqrt();
    let (low, high) = OBSERVER_RADIUS_RANGE_M;
    if !(low..=high).contains(&radius_m) {
        return Err(ApiError::unprocessable(
            "observer_not_on_ground",
            format!(
                "the observer is {radius_m:.0} m from the geocentre; expected a place near the Earth's surface ({low:.0} to {high:.0} m)"
            ),
        )
        .with_field(field));
    }
    Ok(TopocentricObserver::from_itrf_m(position_m))
}

pub fn observer_from_input(
    input: &ObserverInput,
    field: &str,
) -> Result<TopocentricObserver, ApiError> {
    match (input.itrf_position_m, input.latitude_deg, input.longitude_deg) {
        (Some(position), None, None) if input.height_m.is_none() => {
            observer_from_position(position, &format!("{field}.itrf_position_m"))
        }
        (None, Some(latitude_deg), Some(longitude_deg)) => {
            let height_m = input.height_m.unwrap_or(0.0);
            let position = crate::physics::geodesy::geodetic_to_ecef_m(latitude_deg, longitude_deg, height_m)
                .map_err(|e| ApiError::unprocessable("invalid_observer", e.to_string()).with_field(field))?;
            observer_from_position(position, field)
        }
        _ => Err(ApiError::unprocessable(
            "invalid_observer",
            "give either itrf_position_m, or latitude_deg and longitude_deg (and optionally height_m)",
        )
        .with_field(field)),
    }
}

pub fn parse_observer_query(text: &str) -> Result<TopocentricObserver, ApiError> {
    let field = "observer_itrf_m";
    let values: Vec<f64> = text
        .split(',')
        .map(str::parse::<f64>)
        .collect::<Result<_, _>>()
        .map_err(|_| {
            ApiError::bad_request("invalid_query", "expected three numbers x,y,z in metres")
                .with_field(field)
        })?;
    match values.as_slice() {
        [x, y, z] => observer_from_position([*x, *y, *z], field),
        _ => Err(
            ApiError::bad_request("invalid_query", "expected three numbers x,y,z in metres")
                .with_field(field),
        ),
    }
}
