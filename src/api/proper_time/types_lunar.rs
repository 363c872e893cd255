//! The lunar members of the proper-time answer (selenocentric objects only).

use std::borrow::Cow;

use serde::Serialize;
use utoipa::openapi::schema::Schema;
use utoipa::openapi::RefOr;
use utoipa::{PartialSchema, ToSchema};

use crate::physics::rate::RateReference;

/// The lunar quantities of one sample, kept apart (selenocentric objects only).
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct LunarSampleOutput {
    /// The part from the Moon's own potential -U_Moon/c^2 (the field named by
    /// `gravity_model`), seconds.
    pub moon_gravity_part_s: f64,
    /// The part from the tidal potential of the Earth and the Sun -w_tidal/c^2, seconds.
    pub tidal_part_s: f64,
    /// TCL minus the reference since the first epoch, seconds (0 against TCL; L_L t against
    /// TL; through the service's TCL - TT relation at the Moon's centre against TT).
    /// The sample's `gravity_part_s` = moon_gravity_part_s + reference_part_s; its
    /// `tidal_part_s` is the tidal part here.
    pub reference_part_s: f64,
    /// The clock-rate periodic part: tau - t minus its least-squares line, seconds.
    pub clock_periodic_s: f64,
    /// The coordinate-simultaneity term v_M.(x - x_M)/c^2 at this epoch, seconds: the
    /// position-dependent part of TCB - TCL at the clock (IAU 2000 Resolution B1.5 form with
    /// the Moon for the Earth). Not a clock rate and never part of `tau_minus_t_s`: add it to
    /// the TCB (about, scaled by 1 - L_B, the TDB) that the service gives for a TCL instant
    /// at the Moon's centre to have the TCB of this event at the clock.
    pub simultaneity_s: f64,
}

/// The lunar summary of one object.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct LunarSummaryOutput {
    /// `moon`: the positions are selenocentric (ICRF axes).
    pub center: String,
    /// The mean rate of the tidal part (Earth and Sun) over the span.
    pub tidal_mean_rate: f64,
    /// Half the peak-to-peak of `clock_periodic_s`, seconds.
    pub clock_periodic_amplitude_s: f64,
    /// Half the peak-to-peak of `simultaneity_s`, seconds.
    pub simultaneity_amplitude_s: f64,
}

/// Schema of the `reference` of proper time: the rate references (geocentric tracks) and the
/// lunar references (selenocentric tracks).
pub struct ProperTimeReferenceName;

impl PartialSchema for ProperTimeReferenceName {
    fn schema() -> RefOr<Schema> {
        let mut names: Vec<&str> = RateReference::ACCEPTED.to_vec();
        names.extend(
            crate::physics::lunar_orbit::LunarReference::ACCEPTED
                .iter()
                .filter(|name| !RateReference::ACCEPTED.contains(name)),
        );
        crate::api::names::string_enum(
            names,
            "The scale proper time is compared with: TT or TCG (geocentric tracks); TCL, TL (a proposal, not a standard) or TT (selenocentric tracks).",
        )
    }
}

impl ToSchema for ProperTimeReferenceName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("ProperTimeReferenceName")
    }
}

/// Schema of a proper-time gravity model name: the Earth's models and the Moon's fields.
pub struct ProperTimeGravityModelName;

impl PartialSchema for ProperTimeGravityModelName {
    fn schema() -> RefOr<Schema> {
        use crate::physics::gravity::GravityModel;
        let earth = GravityModel::ACCEPTED;
        // egm2008 is a field at fixed ITRS positions: ground sites only, not tracks.
        let mut names: Vec<&str> = earth
            .iter()
            .copied()
            .filter(|name| *name != GravityModel::Egm2008.as_str())
            .collect();
        names.extend(
            crate::physics::moon::gravity::LunarGravityModel::ACCEPTED
                .iter()
                .filter(|name| !earth.contains(name)),
        );
        crate::api::names::string_enum(
            names,
            "The potential model: j2_sun_moon, j2, grs80 or point_mass for geocentric tracks; grail_gl0660b_degree2 (the Moon's J2 and C22), j2 or point_mass for selenocentric tracks.",
        )
    }
}

impl ToSchema for ProperTimeGravityModelName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("ProperTimeGravityModelName")
    }
}

/// Schema of the centre of an uploaded ephemeris.
pub struct TrajectoryCenterName;

impl PartialSchema for TrajectoryCenterName {
    fn schema() -> RefOr<Schema> {
        crate::api::names::vocabulary_schema::<crate::physics::lunar_orbit::TrajectoryCenter>(
            "The origin of the positions: earth (geocentric) or moon (selenocentric, ICRF axes).",
        )
    }
}

impl ToSchema for TrajectoryCenterName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("TrajectoryCenterName")
    }
}
