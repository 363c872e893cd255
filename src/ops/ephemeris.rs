//! The planetary ephemeris in force: the built-in DE440 excerpt, or an SPK kernel file named
//! by `--ephemeris-file` (read here; its bytes are parsed by the physics library).

use std::sync::Arc;

use crate::physics::solar_system::ephemeris::tdb_text;
use crate::physics::solar_system::Ephemeris;

use super::config::Settings;

/// The ephemeris the settings ask for; a message naming the file and the fault otherwise (a
/// kernel that cannot be read, is malformed or lacks a needed segment stops the start-up).
pub fn initial_ephemeris(settings: &Settings) -> Result<Arc<Ephemeris>, String> {
    let ephemeris = match &settings.ephemeris_file {
        None => Ephemeris::embedded()
            .map_err(|e| format!("the built-in ephemeris cannot be read: {e}"))?,
        Some(path) => {
            let shown = path.display().to_string();
            let bytes = std::fs::read(path)
                .map_err(|e| format!("cannot read the ephemeris file {shown}: {e}"))?;
            Arc::new(
                Ephemeris::from_kernel(format!("SPK kernel {shown}"), bytes)
                    .map_err(|e| format!("the ephemeris file {shown} cannot be used: {e}"))?,
            )
        }
    };
    let span = ephemeris.span();
    tracing::info!(
        ephemeris = ephemeris.name(),
        first_tdb = tdb_text(span.first_tdb_s),
        last_tdb = tdb_text(span.last_tdb_s),
        earth_segment = ephemeris.has_earth_segment(),
        "planetary ephemeris loaded"
    );
    Ok(ephemeris)
}
