//! The solar system: where the Sun, the Moon, the Earth and the planets' barycentres are (JPL
//! DE440, Park et al. 2021, Astron. J. 161:105), with the mass parameters consistent with it.
//!
//! The built-in ephemeris ([`Ephemeris::embedded`]) is an excerpt of DE440's own Chebyshev
//! records for 1959-01-01 .. 2102-01-01 TDB (`data/`, made by
//! `tools/make_solar_system_product.py`; source and terms in `data/README.md`), so inside its
//! span it is DE440 itself. An operator may load a full DE440/DE441 SPK kernel instead
//! ([`Ephemeris::from_kernel`]; the file is read by the service, the bytes are parsed here).
//!
//! Positions in metres and velocities in m/s, ICRF axes, TDB argument; see
//! [`Ephemeris::state_m`].

pub mod body;
pub mod daf;
pub mod ephemeris;
pub mod error;
pub mod gm;
pub mod segment;
pub mod tides;

#[cfg(test)]
mod tests;

pub use body::Body;
pub use daf::KernelError;
pub use ephemeris::{BodyState, Ephemeris, EphemerisSpan};
pub use error::{EphemerisError, EphemerisErrorKind};
pub use tides::{sun_moon_tidal_potential_m2_s2, TidalBodies, TidalTrack};
