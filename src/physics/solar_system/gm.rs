//! Mass parameters (GM) consistent with DE440.
//!
//! Source: the GM table of DE440, Park et al. 2021 (Astron. J. 161:105, the table of mass
//! parameters of the planets, the Sun and the Moon), as printed in the comment area of the
//! NAIF kernel `de440.bsp` in au^3/day^2 and km^3/s^2. The km^3/s^2 column is taken here
//! (converted to m^3/s^2); the unit tests check it against the au^3/day^2 column with the
//! astronomical unit of IAU 2012 Resolution B2. The values keep every digit the table prints,
//! hence the `excessive_precision` allowance.
#![allow(clippy::excessive_precision)]

use super::body::Body;

/// GM of the Sun, m^3/s^2 (DE440: 132 712 440 041.279419 km^3/s^2).
pub const GM_SUN_M3_S2: f64 = 1.327_124_400_412_794_19e20;
/// GM of the Mercury system, m^3/s^2 (DE440: 22 031.868551 km^3/s^2).
pub const GM_MERCURY_M3_S2: f64 = 2.203_186_855_1e13;
/// GM of the Venus system, m^3/s^2 (DE440: 324 858.592000 km^3/s^2).
pub const GM_VENUS_M3_S2: f64 = 3.248_585_92e14;
/// GM of the Earth, m^3/s^2 (DE440: 398 600.435507 km^3/s^2; TDB-compatible, like
/// every value of the table).
pub const GM_EARTH_DE440_M3_S2: f64 = 3.986_004_355_07e14;
/// GM of the Moon, m^3/s^2 (DE440: 4 902.800118 km^3/s^2).
pub const GM_MOON_M3_S2: f64 = 4.902_800_118e12;
/// GM of the Earth-Moon system, m^3/s^2 (DE440: 403 503.235625 km^3/s^2).
pub const GM_EMB_M3_S2: f64 = 4.035_032_356_25e14;
/// GM of the Mars system, m^3/s^2 (DE440: 42 828.375816 km^3/s^2).
pub const GM_MARS_M3_S2: f64 = 4.282_837_581_6e13;
/// GM of the Jupiter system, m^3/s^2 (DE440: 126 712 764.100000 km^3/s^2).
pub const GM_JUPITER_M3_S2: f64 = 1.267_127_641e17;
/// GM of the Saturn system, m^3/s^2 (DE440: 37 940 584.841800 km^3/s^2).
pub const GM_SATURN_M3_S2: f64 = 3.794_058_484_18e16;
/// GM of the Uranus system, m^3/s^2 (DE440: 5 794 556.400000 km^3/s^2).
pub const GM_URANUS_M3_S2: f64 = 5.794_556_4e15;
/// GM of the Neptune system, m^3/s^2 (DE440: 6 836 527.100580 km^3/s^2).
pub const GM_NEPTUNE_M3_S2: f64 = 6.836_527_100_58e15;
/// GM of the Pluto system, m^3/s^2 (DE440: 975.500000 km^3/s^2).
pub const GM_PLUTO_M3_S2: f64 = 9.755e11;

/// Earth-Moon mass ratio of DE440, GM_Earth / GM_Moon, from the au^3/day^2 column of the
/// same table (8.8876924467071022e-10 / 1.0931894624024351e-11): the factor that makes the
/// Earth's offset from the Earth-Moon barycentre out of the Moon's, r_E = -r_M / EMRAT.
pub const EARTH_MOON_MASS_RATIO: f64 = 8.887_692_446_707_102_2e-10 / 1.093_189_462_402_435_1e-11;

/// GM of a body (of the whole system for a barycentre), m^3/s^2; `None` for the solar-system
/// barycentre.
pub const fn gm_m3_s2(body: Body) -> Option<f64> {
    Some(match body {
        Body::Ssb => return None,
        Body::Sun => GM_SUN_M3_S2,
        Body::MercuryBarycenter => GM_MERCURY_M3_S2,
        Body::VenusBarycenter => GM_VENUS_M3_S2,
        Body::Emb => GM_EMB_M3_S2,
        Body::Earth => GM_EARTH_DE440_M3_S2,
        Body::Moon => GM_MOON_M3_S2,
        Body::MarsBarycenter => GM_MARS_M3_S2,
        Body::JupiterBarycenter => GM_JUPITER_M3_S2,
        Body::SaturnBarycenter => GM_SATURN_M3_S2,
        Body::UranusBarycenter => GM_URANUS_M3_S2,
        Body::NeptuneBarycenter => GM_NEPTUNE_M3_S2,
        Body::PlutoBarycenter => GM_PLUTO_M3_S2,
    })
}
