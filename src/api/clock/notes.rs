//! The model notes sent with each answer: the approximations behind it, in words. Each note is
//! written beside the formula it describes (in `src/physics/rate/`); this module only picks
//! them for an answer.

use crate::physics::gravity::GravityModel;
use crate::physics::rate::ground::{ground_height_note, GROUND_NOTE};
use crate::physics::rate::lunar::{LUNAR_EARTH_J2_NOTE, LUNAR_NOTES};
use crate::physics::rate::orbit::ORBIT_NOTES;
use crate::physics::rate::state::{STATE_GRS80_NOTE, STATE_J2_NOTE, STATE_NOTES};
use crate::physics::rate::state_tides::{STATE_NO_TIDES_NOTE, STATE_TIDES_NOTE};
use crate::physics::rate::{HeightReference, FIRST_ORDER_NOTE};

pub use crate::physics::rate::orbit::ORBIT_EGM2008_NOT_APPLIED_NOTE as ORBIT_REQUEST_EGM2008;
pub use crate::physics::rate::orbit::ORBIT_GRS80_NOT_APPLIED_NOTE as ORBIT_REQUEST_GRS80;
pub use crate::physics::rate::orbit::ORBIT_J2_NOT_APPLIED_NOTE as ORBIT_REQUEST_J2;

/// The note of an orbit under a request-level `j2_sun_moon`.
pub const ORBIT_REQUEST_TIDES: &str = "the request-level gravity_model j2_sun_moon does not apply to orbit mean rates (an orbit has no epoch for the Sun and the Moon); point_mass used: give a state vector with its epoch for the tides";

fn owned<'a>(notes: impl IntoIterator<Item = &'a str>) -> Vec<String> {
    notes.into_iter().map(String::from).collect()
}

/// Notes for a state vector.
pub fn state(model: GravityModel) -> Vec<String> {
    let j2 = match model {
        GravityModel::PointMass => None,
        GravityModel::J2 => Some(STATE_J2_NOTE),
        GravityModel::Grs80 => Some(STATE_GRS80_NOTE),
        GravityModel::J2SunMoon => Some(STATE_J2_NOTE),
        GravityModel::Egm2008 => None,
    };
    let tides = if model == GravityModel::J2SunMoon {
        STATE_TIDES_NOTE
    } else {
        STATE_NO_TIDES_NOTE
    };
    owned(
        std::iter::once(FIRST_ORDER_NOTE)
            .chain(STATE_NOTES)
            .chain(j2)
            .chain([tides]),
    )
}

/// Notes for a Keplerian orbit.
pub fn orbit() -> Vec<String> {
    owned(std::iter::once(FIRST_ORDER_NOTE).chain(ORBIT_NOTES))
}

/// Notes for a ground site with its height reference and the gravity model used.
pub fn ground(height_reference: HeightReference, model: GravityModel) -> Vec<String> {
    owned([
        FIRST_ORDER_NOTE,
        GROUND_NOTE,
        ground_height_note(height_reference, model),
    ])
}

/// Notes for a lunar site; `j2_requested` when the item or request asked for J2.
pub fn lunar(j2_requested: bool) -> Vec<String> {
    let j2 = j2_requested.then_some(LUNAR_EARTH_J2_NOTE);
    owned(
        std::iter::once(FIRST_ORDER_NOTE)
            .chain(LUNAR_NOTES)
            .chain(j2),
    )
}

/// Notes for a lunar site with the `de440_ephemeris` model.
pub fn lunar_ephemeris(model_notes: &[&str]) -> Vec<String> {
    owned(std::iter::once(FIRST_ORDER_NOTE).chain(model_notes.iter().copied()))
}
