//! One clock item: pick its subject, resolve its settings (item over request over default),
//! call the rate library, shape the answer. Errors name the full JSON path at fault.

use super::answer::{FrequencyAnswer, PeriodicAnswer, RateAnswer, RateSplit};
use super::lunar::lunar_item;
use super::notes;
use super::orbit_item::{orbit_answer, Origins};
use super::tides;
use super::types::{GroundSiteInput, LunarSiteInput, OrbitInput, RateItem, StateInput};
use crate::api::error::ApiError;
use crate::api::names::{parse_named, parse_scale};
use crate::physics::clock_data::orbit_j2::ORBIT_J2_NOTES;
use crate::physics::earth::eop::EopTable;
use crate::physics::earth::orientation::fast::celestial_pole_fast;
use crate::physics::earth::orientation::span::{OrientationSpan, NODE_STEP_S};
use crate::physics::earth::orientation::JulianDate;
use crate::physics::moon::gravity::LUNAR_GRAVITY_MODEL;
use crate::physics::moon::LunarSiteModel;
use crate::physics::rate::state::state_rate_about_axis;
use crate::physics::rate::state::{ITRF_EPOCH_NOTE, ITRF_WITHOUT_EPOCH_NOTE};
use crate::physics::rate::state_rate_with_tides;
use crate::physics::rate::{
    frequency_offset, ground_site_rate, Frame, GravityModel, GroundSite, HeightReference,
    RateParts, RateReference, StateVector,
};
use crate::physics::solar_system::Ephemeris;
use crate::physics::time::convert::{convert, ConversionContext};
use crate::physics::time::formats::{parse_instant, InstantFormat};
use crate::physics::time::instant::Instant;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;
use crate::trajectory::track_proper_time::eop_at_tt;

/// Settings given at the request level, already read.
#[derive(Debug, Clone, Copy, Default)]
pub struct Defaults {
    /// Reference scale for items without their own.
    pub reference: Option<RateReference>,
    /// Gravity model for items without their own.
    pub gravity_model: Option<GravityModel>,
    /// Nominal frequency for items without their own, Hz.
    pub nominal_frequency_hz: Option<f64>,
}

impl Defaults {
    /// Reads the request-level settings; errors name `reference` or `gravity_model`.
    pub fn parse(
        reference: Option<&str>,
        gravity_model: Option<&str>,
        nominal_frequency_hz: Option<f64>,
    ) -> Result<Self, ApiError> {
        if let Some(nominal_hz) = nominal_frequency_hz {
            // Checked here even when every item gives its own frequency: a request-level value
            // that could never be used is still refused.
            frequency_offset(nominal_hz, 0.0).map_err(|error| {
                ApiError::unprocessable(
                    error.code(),
                    format!("nominal_frequency_hz: {}", error.message),
                )
                .with_field("nominal_frequency_hz")
            })?;
        }
        Ok(Self {
            reference: reference
                .map(|text| parse_reference(text, "reference"))
                .transpose()?,
            gravity_model: gravity_model
                .map(|text| parse_gravity_model(text, "gravity_model"))
                .transpose()?,
            nominal_frequency_hz,
        })
    }
}

/// One evaluated item: the answer and the rate it came from.
#[derive(Debug, Clone)]
pub struct Evaluated {
    /// The answer as sent.
    pub answer: RateAnswer,
    /// The first-order rate (for comparisons).
    pub parts: RateParts,
}

/// Reads `TT` or `TCG` (written exactly so); 422 `unknown_reference` naming `field`.
pub fn parse_reference(text: &str, field: &str) -> Result<RateReference, ApiError> {
    parse_named(text, "unknown_reference", "reference", field)
}

/// Reads `point_mass`, `j2` or `grs80` (written exactly so); 422 `unknown_gravity_model` naming `field`.
pub fn parse_gravity_model(text: &str, field: &str) -> Result<GravityModel, ApiError> {
    parse_named(text, "unknown_gravity_model", "gravity model", field)
}

/// The one subject of an item.
enum Subject<'a> {
    State(&'a StateInput),
    Orbit(&'a OrbitInput),
    Ground(&'a GroundSiteInput),
    Lunar(&'a LunarSiteInput),
}

impl Subject<'_> {
    fn key(&self) -> &'static str {
        match self {
            Self::State(_) => "state",
            Self::Orbit(_) => "orbit",
            Self::Ground(_) => "ground_site",
            Self::Lunar(_) => "lunar_site",
        }
    }
}

fn subject_of<'a>(item: &'a RateItem, path: &str) -> Result<Subject<'a>, ApiError> {
    let mut found = Vec::with_capacity(1);
    if let Some(state) = &item.state {
        found.push(Subject::State(state));
    }
    if let Some(orbit) = &item.orbit {
        found.push(Subject::Orbit(orbit));
    }
    if let Some(site) = &item.ground_site {
        found.push(Subject::Ground(site));
    }
    if let Some(site) = &item.lunar_site {
        found.push(Subject::Lunar(site));
    }
    if found.len() > 1 {
        let keys: Vec<&str> = found.iter().map(Subject::key).collect();
        return Err(ApiError::unprocessable(
            "subject_ambiguous",
            format!(
                "{path} gives {}; give exactly one subject per item",
                keys.join(" and ")
            ),
        )
        .with_field(path));
    }
    found.pop().ok_or_else(|| {
        ApiError::unprocessable(
            "subject_missing",
            format!("{path} gives no subject; give exactly one of state, orbit, ground_site, lunar_site"),
        )
        .with_field(path)
    })
}

/// Where the settings of one item came from, to name them in errors.
fn setting_field(path: &str, name: &str, given_on_item: bool) -> String {
    if given_on_item {
        format!("{path}.{name}")
    } else {
        name.to_string()
    }
}

/// Evaluates one item at JSON path `path` (e.g. `items[3]` or `clock_a`).
/// `leaps` and `eop` are the leap-second and Earth orientation tables in force (state epochs,
/// UT1, ITRF states with an epoch), `ephemeris` the planetary ephemeris in force (the Sun and
/// Moon tides of states).
pub fn evaluate_item(
    item: &RateItem,
    defaults: &Defaults,
    path: &str,
    (leaps, eop): (&LeapTable, &EopTable),
    ephemeris: &Ephemeris,
) -> Result<Evaluated, ApiError> {
    let subject = subject_of(item, path)?;
    let reference = match &item.reference {
        Some(text) => parse_reference(text, &format!("{path}.reference"))?,
        None => defaults.reference.unwrap_or(RateReference::Tt),
    };
    let item_model = item
        .gravity_model
        .as_deref()
        .map(|text| parse_gravity_model(text, &format!("{path}.gravity_model")))
        .transpose()?;
    let origins = Origins {
        path,
        subject: subject.key(),
        gravity_field: setting_field(path, "gravity_model", item_model.is_some()),
        nominal_field: setting_field(
            path,
            "nominal_frequency_hz",
            item.nominal_frequency_hz.is_some(),
        ),
    };
    let requested_model = item_model.or(defaults.gravity_model);
    let mut notes: Vec<String> = Vec::new();
    let mut j2_answer = None;
    let (mut lunar_model, mut lunar) = (None, None);
    let (parts, model_label, periodic, inclination_deg) = match subject {
        Subject::State(state) => {
            // The most complete model the inputs allow: with an epoch the Sun and Moon tides.
            let model = requested_model.unwrap_or(if state.epoch.is_some() {
                GravityModel::J2SunMoon
            } else {
                GravityModel::PointMass
            });
            let (parts, periodic, frame_note) = state_answer(
                state,
                reference,
                model,
                path,
                &origins,
                (leaps, eop, ephemeris),
            )?;
            notes.extend(notes::state(model));
            notes.extend(frame_note.map(String::from));
            (parts, model.as_str(), Some(periodic), None)
        }
        Subject::Orbit(orbit) => {
            let model = match (item_model, defaults.gravity_model) {
                (Some(model), _) => model,
                (None, Some(GravityModel::J2)) => {
                    notes.push(notes::ORBIT_REQUEST_J2.to_string());
                    GravityModel::PointMass
                }
                (None, Some(GravityModel::Grs80)) => {
                    notes.push(notes::ORBIT_REQUEST_GRS80.to_string());
                    GravityModel::PointMass
                }
                (None, Some(GravityModel::J2SunMoon)) => {
                    notes.push(notes::ORBIT_REQUEST_TIDES.to_string());
                    GravityModel::PointMass
                }
                (None, Some(GravityModel::Egm2008)) => {
                    notes.push(notes::ORBIT_REQUEST_EGM2008.to_string());
                    GravityModel::PointMass
                }
                _ => GravityModel::PointMass,
            };
            let (parts, periodic, inclination, j2) =
                orbit_answer(orbit, reference, model, path, &origins)?;
            notes.extend(notes::orbit());
            if j2.is_some() {
                notes.extend(ORBIT_J2_NOTES.iter().map(|n| n.to_string()));
            }
            j2_answer = j2;
            (parts, model.as_str(), Some(periodic), inclination)
        }
        Subject::Ground(site) => {
            let (parts, label, ground_notes) =
                ground_answer(site, reference, requested_model, path, &origins)?;
            notes.extend(ground_notes);
            (parts, label, None, None)
        }
        Subject::Lunar(site) => {
            let item = lunar_item(site, reference, requested_model, &origins, (eop, ephemeris))?;
            notes.extend(item.notes);
            lunar_model = Some(item.model.as_str().to_string());
            lunar = item.lunar;
            let label = match item.model {
                LunarSiteModel::CircularOrbit => "point_mass",
                LunarSiteModel::De440Ephemeris => LUNAR_GRAVITY_MODEL,
            };
            (item.parts, label, None, None)
        }
    };
    let nominal = item.nominal_frequency_hz.or(defaults.nominal_frequency_hz);
    let frequency = nominal
        .map(|nominal_hz| frequency_offset(nominal_hz, parts.total()))
        .transpose()
        .map_err(|e| origins.error(e))?
        .map(|f| FrequencyAnswer {
            nominal_hz: f.nominal_hz,
            offset_hz: f.offset_hz,
            factory_setting_hz: f.factory_setting_hz,
        });
    let us = parts.to_microseconds_per_day();
    let answer = RateAnswer {
        subject: subject.key().to_string(),
        reference: reference.as_str().to_string(),
        gravity_model: model_label.to_string(),
        fractional: RateSplit {
            sr: parts.sr,
            gr: parts.gr,
            total: parts.total(),
        },
        us_per_day: RateSplit {
            sr: us.sr,
            gr: us.gr,
            total: us.total,
        },
        frequency,
        periodic,
        j2: j2_answer,
        inclination_deg,
        lunar_model,
        lunar,
        model_notes: notes,
    };
    Ok(Evaluated { answer, parts })
}

/// The state's epoch as TT, when given, read and converted with the leap-second table in force
/// (a UT1 epoch through the EOP table in force).
fn state_epoch_tt(
    state: &StateInput,
    path: &str,
    (table, eop): (&LeapTable, &EopTable),
) -> Result<Option<Instant>, ApiError> {
    let scale = parse_scale(
        state.epoch_scale.as_deref().unwrap_or("UTC"),
        &format!("{path}.state.epoch_scale"),
    )?;
    let field = format!("{path}.state.epoch");
    let Some(text) = &state.epoch else {
        return Ok(None);
    };
    let instant = parse_instant(text, InstantFormat::Iso, scale, table)
        .map_err(|e| ApiError::from_time(&e, &field))?;
    let context = ConversionContext::geocentric(table).with_ut1(eop);
    convert(&instant, Scale::Tt, &context)
        .map(Some)
        .map_err(|e| ApiError::from_time(&e, &field))
}

/// The CIP at TT `tt` as a GCRS unit vector (IAU 2006/2000A, fast path).
fn cip_at(tt: &Instant) -> [f64; 3] {
    celestial_pole_fast(JulianDate::from_count_attos_since_j2000(tt.count_attos()))
        .unit_vector_gcrs()
}

/// An ITRF state at TT `tt` in the GCRS, with the CIP there: the full IERS Conventions (2010)
/// ch. 5 rotation with the EOP table in force (polar motion with s', UT1, precession-nutation
/// with dX, dY; UT1 - UTC read at UTC through the leap-second table in force) and its time
/// derivative (see [`OrientationSpan`]). Outside the table a 422 naming the epoch.
fn itrf_into_gcrs(
    vector: &StateVector,
    tt: &Instant,
    (leaps, eop): (&LeapTable, &EopTable),
    field: &str,
) -> Result<(StateVector, [f64; 3]), ApiError> {
    let span = OrientationSpan::new(tt.count_attos(), NODE_STEP_S, |tt_attos| {
        eop_at_tt(eop, leaps, tt_attos)
    })
    .map_err(|error| {
        ApiError::unprocessable(
            error.code(),
            format!("{error}; an ITRF state with an epoch goes into the GCRS with the Earth orientation at that epoch, which the table in force must cover (without `epoch` the state is answered in its own frame)"),
        )
        .with_field(field.to_string())
    })?;
    let (position_m, velocity_m_s) =
        span.itrs_to_gcrs(0.0, &vector.position_m, &vector.velocity_m_s);
    Ok((
        StateVector {
            frame: Frame::Gcrs,
            position_m,
            velocity_m_s,
        },
        span.pole_gcrs(0.0),
    ))
}

fn state_answer(
    state: &StateInput,
    reference: RateReference,
    model: GravityModel,
    path: &str,
    origins: &Origins<'_>,
    (leaps, eop, ephemeris): (&LeapTable, &EopTable, &Ephemeris),
) -> Result<(RateParts, PeriodicAnswer, Option<&'static str>), ApiError> {
    let frame: Frame = parse_named(
        &state.frame,
        "unknown_frame",
        "frame",
        format!("{path}.state.frame"),
    )?;
    let vector = StateVector {
        frame,
        position_m: state.position_m,
        velocity_m_s: state.velocity_m_s,
    };
    let tt = state_epoch_tt(state, path, (leaps, eop))?;
    let field = format!("{path}.state.epoch");
    // The state is checked in its own frame first, so problems name its own fields.
    let own = state_rate_about_axis(&vector, reference, model, [0.0, 0.0, 1.0])
        .map_err(|e| origins.error(e))?;
    let tides = model == GravityModel::J2SunMoon;
    // The rate of a GCRS state about `axis`, with the tides at `tt` for j2_sun_moon.
    let gcrs_rate = |gcrs: &StateVector, axis: [f64; 3], tt: &Instant| {
        if tides {
            let bodies = tides::bodies_at_tt(tt, ephemeris, &field)?;
            state_rate_with_tides(gcrs, reference, axis, &bodies).map_err(|e| origins.error(e))
        } else {
            state_rate_about_axis(gcrs, reference, model, axis).map_err(|e| origins.error(e))
        }
    };
    let (rate, note) = match (frame, tt) {
        (Frame::Itrf, Some(tt)) => {
            let (inertial, axis) = itrf_into_gcrs(&vector, &tt, (leaps, eop), &field)?;
            (gcrs_rate(&inertial, axis, &tt)?, Some(ITRF_EPOCH_NOTE))
        }
        (_, None) if tides => {
            return Err(ApiError::unprocessable(
                "epoch_required",
                "a state with the j2_sun_moon model needs its epoch: the Sun and the Moon move (their tides change the rate by up to 3e-15 within hours); give `epoch` (ISO 8601, in `epoch_scale`, default UTC) or another gravity_model",
            )
            .with_field(field))
        }
        (Frame::Itrf, None) => (own, Some(ITRF_WITHOUT_EPOCH_NOTE)),
        (Frame::Gcrs, _) if model == GravityModel::PointMass => (own, None),
        (Frame::Gcrs, Some(tt)) => (gcrs_rate(&vector, cip_at(&tt), &tt)?, None),
        (Frame::Gcrs, None) => {
            return Err(ApiError::unprocessable(
                "epoch_required",
                format!(
                    "a GCRS state with the {} model needs its epoch: the field is taken about the Earth's true pole (the CIP), which is 0.15 deg from the GCRS z axis in 2026 and moves; give `epoch` (ISO 8601, in `epoch_scale`, default UTC)",
                    model.as_str()
                ),
            )
            .with_field(field))
        }
    };
    Ok((
        rate.parts,
        PeriodicAnswer {
            amplitude_s: rate.osculating_amplitude_s,
            value_at_state_s: Some(rate.periodic_value_s),
        },
        note,
    ))
}

fn ground_answer(
    site: &GroundSiteInput,
    reference: RateReference,
    requested_model: Option<GravityModel>,
    path: &str,
    origins: &Origins<'_>,
) -> Result<(RateParts, &'static str, Vec<String>), ApiError> {
    let height_reference = match site.height_reference.as_deref() {
        None => HeightReference::Ellipsoid,
        Some(text) => parse_named(
            text,
            "unknown_height_reference",
            "height reference",
            format!("{path}.ground_site.height_reference"),
        )?,
    };
    let model = requested_model.unwrap_or(GravityModel::Egm2008);
    let height = height_reference.height(site.height_m);
    let label = match height_reference {
        HeightReference::Geoid => "grs80_normal_gravity",
        HeightReference::Ellipsoid => model.as_str(),
    };
    let ground = GroundSite {
        latitude_deg: site.latitude_deg,
        longitude_deg: site.longitude_deg,
        height,
    };
    let parts = ground_site_rate(&ground, reference, model).map_err(|e| origins.error(e))?;
    Ok((parts, label, notes::ground(height_reference, model)))
}
