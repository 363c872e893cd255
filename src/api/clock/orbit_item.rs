//! An orbit item of the rate endpoints: point mass, or J2 with the inclination.

use super::answer::{OrbitJ2Answer, PeriodicAnswer};
use super::types::OrbitInput;
use crate::api::error::ApiError;
use crate::physics::clock_data::orbit_j2::orbit_rate_j2;
use crate::physics::constants::MICROSECONDS_PER_DAY;
use crate::physics::rate::{
    orbit_rate, Anomaly, GravityModel, KeplerianOrbit, RateError, RateParts, RateReference,
};
use crate::physics::readable::readable;

/// Where an item's fields are: the JSON path, the subject key and the setting fields.
pub(super) struct Origins<'a> {
    pub(super) path: &'a str,
    pub(super) subject: &'static str,
    pub(super) gravity_field: String,
    pub(super) nominal_field: String,
}

impl Origins<'_> {
    pub(super) fn error(&self, error: RateError) -> ApiError {
        let field = match error.field {
            "gravity_model" => self.gravity_field.clone(),
            "nominal_hz" => self.nominal_field.clone(),
            "fractional_rate" => format!("{}.{}", self.path, self.subject),
            other => format!("{}.{}.{other}", self.path, self.subject),
        };
        ApiError::unprocessable(error.code(), format!("{field}: {}", error.message))
            .with_field(field)
    }
}

/// Evaluates an orbit (the J2 terms with `GravityModel::J2`).
pub(super) fn orbit_answer(
    orbit: &OrbitInput,
    reference: RateReference,
    model: GravityModel,
    path: &str,
    origins: &Origins<'_>,
) -> Result<
    (
        RateParts,
        PeriodicAnswer,
        Option<f64>,
        Option<OrbitJ2Answer>,
    ),
    ApiError,
> {
    let anomalies = [
        orbit.true_anomaly_deg.map(Anomaly::TrueDeg),
        orbit.mean_anomaly_deg.map(Anomaly::MeanDeg),
        orbit.eccentric_anomaly_deg.map(Anomaly::EccentricDeg),
    ];
    let mut given = anomalies.into_iter().flatten();
    let anomaly = given.next();
    if given.next().is_some() {
        return Err(ApiError::unprocessable(
            "anomaly_ambiguous",
            "give at most one of true_anomaly_deg, mean_anomaly_deg, eccentric_anomaly_deg",
        )
        .with_field(format!("{path}.orbit")));
    }
    if let Some(inclination) = orbit.inclination_deg {
        if !(0.0..=180.0).contains(&inclination) {
            return Err(ApiError::unprocessable(
                "angle_out_of_range",
                format!(
                    "inclination must lie in [0, 180] degrees, got {inclination}",
                    inclination = readable(inclination)
                ),
            )
            .with_field(format!("{path}.orbit.inclination_deg")));
        }
    }
    // Read whatever the model: a value outside the documented range is refused wherever it
    // appears, not only where the J2 term uses it.
    if let Some(u) = orbit.argument_of_latitude_deg {
        if !(-1.0e6..=1.0e6).contains(&u) {
            return Err(ApiError::unprocessable(
                "angle_out_of_range",
                format!(
                    "the argument of latitude must lie in [-1e6, 1e6] degrees, got {u}",
                    u = readable(u)
                ),
            )
            .with_field(format!("{path}.orbit.argument_of_latitude_deg")));
        }
    }
    let keplerian = KeplerianOrbit {
        semi_major_axis_m: orbit.semi_major_axis_m,
        eccentricity: orbit.eccentricity,
        anomaly,
    };
    let (rate, j2) = if model == GravityModel::J2 {
        let (rate, terms) = orbit_rate_j2(
            &keplerian,
            orbit.inclination_deg,
            orbit.argument_of_latitude_deg,
            reference,
        )
        .map_err(|e| origins.error(e))?;
        let j2 = OrbitJ2Answer {
            mean_rate_change: terms.mean_rate_change,
            mean_rate_change_us_per_day: terms.mean_rate_change * MICROSECONDS_PER_DAY,
            periodic_amplitude_s: terms.periodic_amplitude_s,
            periodic_period_s: terms.periodic_period_s,
            periodic_value_s: terms.periodic_value_s,
        };
        (rate, Some(j2))
    } else {
        let rate = orbit_rate(&keplerian, reference, model).map_err(|e| origins.error(e))?;
        (rate, None)
    };
    Ok((
        rate.mean,
        PeriodicAnswer {
            amplitude_s: Some(rate.periodic.amplitude_s),
            value_at_state_s: rate.periodic.value_s,
        },
        orbit.inclination_deg,
        j2,
    ))
}
