//! Physical and defining constants, each with its source.
//!
//! Values marked "defining" are exact by resolution; the others are the conventional values of
//! the named publication. Units are in the names.

/// Speed of light in vacuum (SI definition, exact).
pub const SPEED_OF_LIGHT_M_S: f64 = 299_792_458.0;

/// c^2 in m^2/s^2.
pub const SPEED_OF_LIGHT_SQUARED_M2_S2: f64 = SPEED_OF_LIGHT_M_S * SPEED_OF_LIGHT_M_S;

/// L_G = 1 - d(TT)/d(TCG), defining (IAU 2000 Resolution B1.9; IERS Conventions (2010) ch. 10).
pub const L_G: f64 = 6.969_290_134e-10;

/// L_B = 1 - d(TDB)/d(TCB), defining (IAU 2006 Resolution B3; IERS Conventions (2010) ch. 10).
pub const L_B: f64 = 1.550_519_768e-8;

/// TDB0, the offset of TDB at T0 (IAU 2006 Resolution B3), seconds.
pub const TDB0_S: f64 = -6.55e-5;

/// T0 = 1977-01-01T00:00:32.184 TAI-aligned, as a Julian date (IERS Conventions (2010) ch. 10,
/// eq. 10.1 and 10.3): JD 2443144.5003725.
pub const T0_JD: f64 = 2_443_144.500_372_5;

/// Seconds from T0 to J2000.0 (JD 2451545.0), exact: 8400.4996275 days * 86400 s.
/// Stored as attoseconds so that the elapsed time since T0 is formed without rounding.
pub const T0_TO_J2000_ATTOS: i128 = 725_803_167_816_000_000_000_000_000;

/// TT - TAI in seconds (IAU 1991 Resolution A4; IERS Conventions (2010) ch. 10), exact.
pub const TT_MINUS_TAI_S: f64 = 32.184;

/// TT - TAI in attoseconds, exact.
pub const TT_MINUS_TAI_ATTOS: i128 = 32_184_000_000_000_000_000;

/// GPST - TAI in seconds (IS-GPS-200: GPS time was UTC at 1980-01-06, when TAI - UTC = 19 s).
/// Galileo System Time and QZSS time are steered to the same offset (Galileo OS SIS ICD; IS-QZSS).
pub const GPST_MINUS_TAI_S: i64 = -19;

/// BDT - TAI in seconds (BeiDou open-service ICD: BDT was UTC at 2006-01-01, TAI - UTC = 33 s).
pub const BDT_MINUS_TAI_S: i64 = -33;

/// Geocentric gravitational constant, TCG-compatible (IERS Conventions (2010) table 1.1), m^3/s^2.
pub const GM_EARTH_M3_S2: f64 = 3.986_004_418e14;

/// Geocentric gravitational constant, TT-compatible (IERS Conventions (2010) table 1.1), m^3/s^2.
pub const GM_EARTH_TT_M3_S2: f64 = 3.986_004_415e14;

/// Earth gravitational constant used by GPS (IS-GPS-200, WGS 84 value), m^3/s^2.
pub const GM_EARTH_GPS_M3_S2: f64 = 3.986_005e14;

/// Potential of the geoid W0 (IERS Conventions (2010) table 1.1), m^2/s^2. L_G = W0 / c^2.
pub const W0_M2_S2: f64 = 62_636_856.0;

/// Dynamical form factor J2 of the Earth (IERS Conventions (2010) table 1.1), dimensionless.
pub const J2_EARTH: f64 = 1.082_635_9e-3;

/// Equatorial radius of the Earth a_E (IERS Conventions (2010) table 1.1), m.
pub const EQUATORIAL_RADIUS_EARTH_M: f64 = 6_378_136.6;

/// Nominal mean angular velocity of the Earth (IERS Conventions (2010) table 1.1; GRS80), rad/s.
pub const EARTH_ROTATION_RAD_S: f64 = 7.292_115e-5;

/// GRS80 ellipsoid semi-major axis (Moritz, Geodetic Reference System 1980), m.
pub const GRS80_SEMI_MAJOR_AXIS_M: f64 = 6_378_137.0;

/// GRS80 ellipsoid flattening 1/f = 298.257222101 (Moritz, Geodetic Reference System 1980).
pub const GRS80_FLATTENING: f64 = 1.0 / 298.257_222_101;

/// Seconds per day (SI days of 86 400 s).
pub const SECONDS_PER_DAY: f64 = 86_400.0;

/// Attoseconds per second.
pub const ATTOS_PER_SECOND: i128 = 1_000_000_000_000_000_000;

/// Julian date of the MJD origin (MJD = JD - 2400000.5).
pub const MJD_ZERO_JD: f64 = 2_400_000.5;

/// MJD of J2000.0 (2000-01-01T12:00:00): 51544.5.
pub const J2000_MJD: f64 = 51_544.5;

/// Days per Julian millennium: 1000 Julian years of 365.25 days (IAU 1976 System of
/// Astronomical Constants, Julian year); the time unit of the Fairhead & Bretagnon (1990) series.
pub const DAYS_PER_JULIAN_MILLENNIUM: f64 = 365_250.0;

/// GRS80 geocentric gravitational constant GM (Moritz, Geodetic Reference System 1980), m^3/s^2.
/// Used only for GRS80 normal gravity; potentials use [`GM_EARTH_M3_S2`].
pub const GRS80_GM_M3_S2: f64 = 3.986_005e14;

/// GRS80 normal gravity at the equator gamma_e (Moritz, Geodetic Reference System 1980), m/s^2.
pub const GRS80_NORMAL_GRAVITY_EQUATOR_M_S2: f64 = 9.780_326_771_5;

/// GRS80 normal gravity at the poles gamma_p (Moritz, Geodetic Reference System 1980), m/s^2.
pub const GRS80_NORMAL_GRAVITY_POLE_M_S2: f64 = 9.832_186_368_5;

/// Lunar gravitational constant GM_Moon (JPL DE430: Folkner et al. 2014, IPN Progress Report
/// 42-196, 4902.800066 km^3/s^2; from memory, consistent with the 4.9028e12 usually quoted), m^3/s^2.
pub const GM_MOON_M3_S2: f64 = 4.902_800_066e12;

/// Mean Earth-Moon distance (semi-major axis of the lunar orbit), 384 400 km (NASA NSSDC Moon
/// fact sheet; common practice, from memory), m.
pub const EARTH_MOON_MEAN_DISTANCE_M: f64 = 384_400_000.0;

/// Mean radius of the Moon, 1737.4 km (IAU Working Group on Cartographic Coordinates and
/// Rotational Elements: Archinal et al. 2011, Celest. Mech. Dyn. Astr. 109, 101), m.
pub const MOON_MEAN_RADIUS_M: f64 = 1_737_400.0;

/// Rotation rate of the Moon, the linear term of its prime-meridian angle W = 38.3213 deg +
/// 13.17635815 deg/day * d (IAU WGCCRE, Archinal et al. 2011, table 2), in rad/s.
pub const MOON_ROTATION_RAD_S: f64 = 13.176_358_15 * (core::f64::consts::PI / 180.0) / 86_400.0;

/// Depth margin below the reference surface that a real clock never passes: 11 km, a little more
/// than the deepest ocean point (Challenger Deep, about 10.9 km; common practice, from memory), m.
pub const MAX_DEPTH_BELOW_SURFACE_M: f64 = 11_000.0;

/// Upper bound of a geocentric position for the first-order geocentric rate model: the radius of
/// the Earth's Hill sphere, about 1.5e9 m (common practice, from memory). Beyond it the Sun's
/// tidal potential, neglected here, dominates the Earth's.
pub const MAX_GEOCENTRIC_DISTANCE_M: f64 = 1.5e9;

/// Microseconds per day for a fractional rate of 1 (86 400 s * 1e6 us/s).
pub const MICROSECONDS_PER_DAY: f64 = 86_400.0e6;

/// Radius of the geostationary orbit, 42 164 172 m: a = (GM / omega_E^2)^(1/3) with GM and the
/// nominal omega_E of IERS Conventions (2010) table 1.1 (Kepler's third law for a period of one
/// sidereal day), rounded to the metre; the commonly quoted value is 42 164 km (common practice).
pub const GEOSTATIONARY_RADIUS_M: f64 = 42_164_172.0;

/// GRS80 ellipsoid semi-minor (polar) axis b (Moritz, Geodetic Reference System 1980), m.
/// Used as the lowest geocentric distance an orbiting or ground state may have.
pub const GRS80_SEMI_MINOR_AXIS_M: f64 = 6_356_752.314_1;
