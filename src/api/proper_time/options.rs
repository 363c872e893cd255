//! The proper-time options, checked against their documented ranges wherever they appear.
//!
//! The same option may come as a query parameter and as `options.*` in a JSON body (the body
//! wins). A value that breaks the contract is refused even when the other one would win, so each
//! source is checked on its own before the two are merged.

use super::types::{ProperTimeOptionsInput, MAX_OPTION_SECONDS};
use crate::api::clock::evaluate::{parse_gravity_model, parse_reference};
use crate::api::error::ApiError;
use crate::api::names::parse_tdb_model;
use crate::physics::lunar_orbit::LunarReference;
use crate::physics::moon::gravity::LunarGravityModel;
use crate::physics::readable::readable;
use crate::trajectory::MAX_POINTS;

/// Shortest output step, seconds (the documented minimum of `step_s`).
const MIN_STEP_S: f64 = 1e-3;

/// Checks every option given in one source; `prefix` is `""` for the query string and
/// `"options."` for a JSON body, so that the problem's `field` says where the value was.
pub fn check_options(options: &ProperTimeOptionsInput, prefix: &str) -> Result<(), ApiError> {
    let field = |name: &str| format!("{prefix}{name}");
    if let Some(text) = options.reference.as_deref() {
        if LunarReference::from_name(text).is_none() {
            parse_reference(text, &field("reference")).map_err(|_| {
                ApiError::unprocessable(
                    "unknown_reference",
                    format!("reference `{text}` is not known; expected TT or TCG (geocentric tracks), or TCL, TL or TT (selenocentric tracks), written exactly so"),
                )
                .with_field(field("reference"))
            })?;
        }
    }
    if let Some(text) = options.gravity_model.as_deref() {
        // A name of the Moon's field is checked against the track's centre later.
        if LunarGravityModel::from_name(text).is_none() {
            parse_gravity_model(text, &field("gravity_model"))?;
        }
    }
    if let Some(text) = options.tdb_model.as_deref() {
        parse_tdb_model(Some(text), &field("tdb_model"))?;
    }
    if let Some(points) = options.interpolation_points {
        if !(2..=MAX_POINTS).contains(&points) {
            return Err(bad_option(
                &field("interpolation_points"),
                format!("is {points}; expected 2 to {MAX_POINTS} states"),
            ));
        }
    }
    if let Some(step_s) = finite_option(options.step_s, &field("step_s"))? {
        if !(MIN_STEP_S..=MAX_OPTION_SECONDS).contains(&step_s) {
            return Err(bad_option(
                &field("step_s"),
                format!(
                    "is {} s; expected {} s to {} s (the supported range of instants)",
                    readable(step_s),
                    readable(MIN_STEP_S),
                    readable(MAX_OPTION_SECONDS)
                ),
            ));
        }
    }
    if let Some(gap_s) = finite_option(options.max_gap_s, &field("max_gap_s"))? {
        if !(gap_s > 0.0 && gap_s <= MAX_OPTION_SECONDS) {
            return Err(bad_option(
                &field("max_gap_s"),
                format!(
                    "is {} s; expected above 0 s and at most {} s",
                    readable(gap_s),
                    readable(MAX_OPTION_SECONDS)
                ),
            ));
        }
    }
    if let Some(offset_s) = finite_option(options.initial_offset_s, &field("initial_offset_s"))? {
        if offset_s.abs() > MAX_OPTION_SECONDS {
            return Err(bad_option(
                &field("initial_offset_s"),
                format!(
                    "is {} s; at most {} s (the supported range of instants) in magnitude",
                    readable(offset_s),
                    readable(MAX_OPTION_SECONDS)
                ),
            ));
        }
    }
    Ok(())
}

fn bad_option(field: &str, what: String) -> ApiError {
    ApiError::unprocessable("bad_option", format!("{field} {what}")).with_field(field)
}

/// An option that must be a finite number when given.
pub fn finite_option(value: Option<f64>, field: &str) -> Result<Option<f64>, ApiError> {
    match value {
        Some(v) if !v.is_finite() => Err(ApiError::unprocessable(
            "not_finite",
            format!("{field} must be a finite number"),
        )
        .with_field(field)),
        other => Ok(other),
    }
}
