//! The Sun and the Moon for a state's tides (gravity model `j2_sun_moon`): their geocentric
//! positions from the planetary ephemeris in force at the state's epoch.

use crate::api::error::ApiError;
use crate::physics::solar_system::{Ephemeris, TidalBodies};
use crate::physics::time::instant::{seconds_f64_to_attos, Instant, ATTOS_PER_SECOND};
use crate::physics::time::tdb_series::tdb_minus_tt_fast_s;

/// The Sun and the Moon relative to the Earth at TT `tt` (read in TDB with the geocentric
/// Fairhead & Bretagnon series: the topocentric part, about 2 us, moves the Moon by 2 mm);
/// a 422 naming the ephemeris span at `field` outside it.
pub fn bodies_at_tt(
    tt: &Instant,
    ephemeris: &Ephemeris,
    field: &str,
) -> Result<TidalBodies, ApiError> {
    let tt_attos = tt.count_attos();
    let tt_s = tt_attos as f64 / ATTOS_PER_SECOND as f64;
    let tdb_attos = tt_attos + seconds_f64_to_attos(tdb_minus_tt_fast_s(tt_s, 0.0, None));
    TidalBodies::at(ephemeris, tdb_attos).map_err(|e| {
        ApiError::unprocessable(e.code(), format!("{e} (the Sun and Moon tides need the bodies at the state's epoch; give another gravity_model to go without them)"))
            .with_field(field.to_string())
    })
}
