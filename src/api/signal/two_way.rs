//! `POST /v1/signal/two-way`.

use axum::Json;

use super::types::{GroundSiteInput, TwoWayAnswer, TwoWayRequest};
use crate::api::error::{ApiError, JsonBodyProblems, Problem, TimeoutProblem};
use crate::api::extract::JsonBody;
use crate::physics::constants::GEOSTATIONARY_RADIUS_M;
use crate::physics::signal::{two_way_sagnac, Station, TwoWayLink};

/// The sign convention of the two-way answer.
pub const TWO_WAY_SIGN_CONVENTION: &str = "Each leg is 2 omega_E A / c^2 (ITU-R TF.1153) for the uplink station -> satellite, A the signed equatorial-plane area of the triangle geocentre - station - satellite (positive eastward). With TI(X) = reading of clock X when the remote signal arrives minus its reading when X sent its own: clock A - clock B = (TI(A) - TI(B))/2 + two_way_s, two_way_s = leg_a_s - leg_b_s.";

fn station(input: GroundSiteInput) -> Station {
    Station {
        latitude_deg: input.latitude_deg,
        longitude_deg: input.longitude_deg,
        height_m: input.height_m,
    }
}

/// Sagnac correction of a two-way satellite time transfer between two ground stations.
#[utoipa::path(post, path = "/v1/signal/two-way", tag = "signal",
    request_body = TwoWayRequest,
    responses(
        (status = 200, description = "The Sagnac terms of both legs and the two-way correction", body = TwoWayAnswer),
        JsonBodyProblems,
        (status = 422, description = "A value cannot be used; `field` names it and `code` says why: not_visible (the satellite is below a station's horizon), invalid_value (a latitude, longitude or height out of range, or a satellite radius that puts it inside the Earth)", body = Problem, content_type = "application/problem+json"),
        TimeoutProblem))]
pub async fn two_way(
    JsonBody(request): JsonBody<TwoWayRequest>,
) -> Result<Json<TwoWayAnswer>, ApiError> {
    let link = TwoWayLink {
        station_a: station(request.station_a),
        station_b: station(request.station_b),
        satellite_longitude_deg: request.satellite_longitude_deg,
        satellite_radius_m: request.satellite_radius_m.unwrap_or(GEOSTATIONARY_RADIUS_M),
    };
    let sagnac = two_way_sagnac(&link)?;
    Ok(Json(TwoWayAnswer {
        leg_a_s: sagnac.leg_a_s,
        leg_b_s: sagnac.leg_b_s,
        two_way_s: sagnac.two_way_s,
        elevation_a_deg: sagnac.elevation_a_deg,
        elevation_b_deg: sagnac.elevation_b_deg,
        satellite_radius_m: link.satellite_radius_m,
        sign_convention: TWO_WAY_SIGN_CONVENTION.to_string(),
    }))
}
