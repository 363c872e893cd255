//! The selenocentric observer of the conversions: the position-dependent term
//! v_M.(x - x_M)/c^2 of TCB - TCL for an event near the Moon (the lunar analogue of the
//! topocentric TDB term).

use std::sync::Arc;

use crate::api::error::ApiError;
use crate::physics::constants::L_B;
use crate::physics::lunar_orbit::SelenocentricObserver;
use crate::physics::solar_system::{Body, Ephemeris};
use crate::physics::time::convert::{convert, ConversionContext};
use crate::physics::time::instant::Instant;
use crate::physics::time::scale::Scale;

/// A selenocentric observer with the ephemeris that gives the Moon's barycentric velocity.
#[derive(Clone)]
pub struct LunarObserver {
    /// The observer.
    pub observer: SelenocentricObserver,
    /// The planetary ephemeris in force.
    pub ephemeris: Arc<Ephemeris>,
    /// The request field that gave it (for problems).
    pub field: &'static str,
}

impl std::fmt::Debug for LunarObserver {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.debug_struct("LunarObserver")
            .field("observer", &self.observer)
            .finish()
    }
}

/// Reads a selenocentric position (m, ICRF axes about the Moon's centre) into an observer;
/// a 422 naming `field` below the lunar surface or beyond the LCRS range.
pub fn lunar_observer(
    position_m: [f64; 3],
    ephemeris: Arc<Ephemeris>,
    field: &'static str,
) -> Result<LunarObserver, ApiError> {
    let observer = SelenocentricObserver::new(position_m)
        .map_err(|(code, message)| ApiError::unprocessable(code, message).with_field(field))?;
    Ok(LunarObserver {
        observer,
        ephemeris,
        field,
    })
}

/// Reads `x,y,z` (metres) from a query value.
pub fn parse_lunar_observer_query(
    text: &str,
    ephemeris: Arc<Ephemeris>,
    field: &'static str,
) -> Result<LunarObserver, ApiError> {
    let values: Result<Vec<f64>, _> = text.split(',').map(str::parse::<f64>).collect();
    match values.as_deref() {
        Ok([x, y, z]) => lunar_observer([*x, *y, *z], ephemeris, field),
        _ => Err(ApiError::bad_request(
            "invalid_query",
            "expected three numbers x,y,z in metres (selenocentric, ICRF axes)",
        )
        .with_field(field)),
    }
}

/// True for the lunar scales.
pub fn is_lunar(scale: Scale) -> bool {
    matches!(scale, Scale::Tcl | Scale::Tl)
}

impl LunarObserver {
    /// The term v_M.(x - x_M)/c^2 (s) at the event `input` (the Moon's velocity read at its
    /// TDB through the context).
    pub fn term_s(
        &self,
        input: &Instant,
        context: &ConversionContext<'_>,
    ) -> Result<f64, ApiError> {
        let tdb =
            convert(input, Scale::Tdb, context).map_err(|e| ApiError::from_time(&e, self.field))?;
        let moon = self
            .ephemeris
            .state_m(Body::Moon, Body::Ssb, tdb.count_attos())
            .map_err(|e| ApiError::unprocessable(e.code(), e.to_string()).with_field(self.field))?;
        Ok(self.observer.tcb_minus_tcl_term_s(&moon.velocity_m_s))
    }
}

/// The shift of a conversion result for an event at the observer, seconds, given the term
/// `term_s`: from a lunar scale into another, TCB of the event is the centre's TCB + term (in
/// the target's units: the TCB seconds scaled by 1 - L_B for every target but TCB and TCG,
/// a difference below 4e-13 s); from another scale into a lunar one, TCL of the event is the
/// centre's TCL - term (TL: the same, its 3e-11 scale is below 1e-15 s). Zero when both or
/// neither are lunar.
pub fn shift_s(from: Scale, target: Scale, term_s: f64) -> f64 {
    match (is_lunar(from), is_lunar(target)) {
        (true, false) if matches!(target, Scale::Tcb | Scale::Tcg) => term_s,
        (true, false) => term_s * (1.0 - L_B),
        (false, true) => -term_s,
        _ => 0.0,
    }
}
