//! Fundamental arguments of nutation theory: the five Delaunay arguments, the mean longitudes of
//! the planets and the general precession in longitude (IERS Conventions (2010) ch. 5, eq. 5.43
//! and the planetary arguments of eq. 5.44; the same expressions as IERS Conventions (2003),
//! ERFA `eraFal03` ... `eraFapa03`).
//!
//! Each takes `t`, TT (TDB in the Conventions; the difference is negligible here) in Julian
//! centuries since J2000.0, and returns an angle in radians. The Delaunay arguments are reduced
//! to (-1296000", +1296000") before conversion, exactly as ERFA does (C `fmod`, which is Rust's
//! `%` on `f64`); the planetary longitudes are reduced to (-2 pi, 2 pi).

use super::{ARCSEC_TO_RAD, TURN_ARCSEC, TWO_PI};

/// l, mean anomaly of the Moon (IERS Conventions (2010) eq. 5.43, first line; ERFA `eraFal03`).
pub fn moon_mean_anomaly_rad(t: f64) -> f64 {
    ((485_868.249_036
        + t * (1_717_915_923.217_8 + t * (31.879_2 + t * (0.051_635 + t * (-0.000_244_70)))))
        % TURN_ARCSEC)
        * ARCSEC_TO_RAD
}

/// l', mean anomaly of the Sun (IERS Conventions (2010) eq. 5.43; ERFA `eraFalp03`).
pub fn sun_mean_anomaly_rad(t: f64) -> f64 {
    ((1_287_104.793_048
        + t * (129_596_581.048_1 + t * (-0.553_2 + t * (0.000_136 + t * (-0.000_011_49)))))
        % TURN_ARCSEC)
        * ARCSEC_TO_RAD
}

/// F = L - Omega, mean longitude of the Moon minus that of its ascending node (IERS Conventions
/// (2010) eq. 5.43; ERFA `eraFaf03`).
pub fn moon_argument_of_latitude_rad(t: f64) -> f64 {
    ((335_779.526_232
        + t * (1_739_527_262.847_8 + t * (-12.751_2 + t * (-0.001_037 + t * 0.000_004_17))))
        % TURN_ARCSEC)
        * ARCSEC_TO_RAD
}

/// D, mean elongation of the Moon from the Sun (IERS Conventions (2010) eq. 5.43; ERFA
/// `eraFad03`).
pub fn moon_mean_elongation_rad(t: f64) -> f64 {
    ((1_072_260.703_692
        + t * (1_602_961_601.209_0 + t * (-6.370_6 + t * (0.006_593 + t * (-0.000_031_69)))))
        % TURN_ARCSEC)
        * ARCSEC_TO_RAD
}

/// Omega, mean longitude of the Moon's ascending node (IERS Conventions (2010) eq. 5.43; ERFA
/// `eraFaom03`).
pub fn moon_node_longitude_rad(t: f64) -> f64 {
    ((450_160.398_036
        + t * (-6_962_890.543_1 + t * (7.472_2 + t * (0.007_702 + t * (-0.000_059_39)))))
        % TURN_ARCSEC)
        * ARCSEC_TO_RAD
}

/// Mean longitude of Mercury (IERS Conventions (2010) eq. 5.44; ERFA `eraFame03`).
pub fn mercury_longitude_rad(t: f64) -> f64 {
    (4.402_608_842 + 2_608.790_314_157_4 * t) % TWO_PI
}

/// Mean longitude of Venus (IERS Conventions (2010) eq. 5.44; ERFA `eraFave03`).
pub fn venus_longitude_rad(t: f64) -> f64 {
    (3.176_146_697 + 1_021.328_554_621_1 * t) % TWO_PI
}

/// Mean longitude of the Earth (IERS Conventions (2010) eq. 5.44; ERFA `eraFae03`).
pub fn earth_longitude_rad(t: f64) -> f64 {
    (1.753_470_314 + 628.307_584_999_1 * t) % TWO_PI
}

/// Mean longitude of Mars (IERS Conventions (2010) eq. 5.44; ERFA `eraFama03`).
pub fn mars_longitude_rad(t: f64) -> f64 {
    (6.203_480_913 + 334.061_242_670_0 * t) % TWO_PI
}

/// Mean longitude of Jupiter (IERS Conventions (2010) eq. 5.44; ERFA `eraFaju03`).
pub fn jupiter_longitude_rad(t: f64) -> f64 {
    (0.599_546_497 + 52.969_096_264_1 * t) % TWO_PI
}

/// Mean longitude of Saturn (IERS Conventions (2010) eq. 5.44; ERFA `eraFasa03`).
pub fn saturn_longitude_rad(t: f64) -> f64 {
    (0.874_016_757 + 21.329_910_496_0 * t) % TWO_PI
}

/// Mean longitude of Uranus (IERS Conventions (2010) eq. 5.44; ERFA `eraFaur03`).
pub fn uranus_longitude_rad(t: f64) -> f64 {
    (5.481_293_872 + 7.478_159_856_7 * t) % TWO_PI
}

/// Mean longitude of Neptune (IERS Conventions (2010) eq. 5.44; ERFA `eraFane03`).
pub fn neptune_longitude_rad(t: f64) -> f64 {
    (5.311_886_287 + 3.813_303_563_8 * t) % TWO_PI
}

/// p_A, general accumulated precession in longitude (IERS Conventions (2010) eq. 5.44, last
/// line; ERFA `eraFapa03`).
pub fn general_precession_rad(t: f64) -> f64 {
    (0.024_381_750 + 0.000_005_386_91 * t) * t
}

#[cfg(test)]
#[allow(clippy::excessive_precision)] // ERFA's test values, copied verbatim.
mod tests {
    use super::*;

    type Argument = (&'static str, fn(f64) -> f64, f64);

    /// ERFA t_erfa_c.c, t_fal03 ... t_fapa03: each argument at t = 0.80, tolerance 1e-12.
    #[test]
    fn arguments_match_erfa_test_values() {
        let cases: [Argument; 14] = [
            ("fal03", moon_mean_anomaly_rad, 5.132369751108684150),
            ("falp03", sun_mean_anomaly_rad, 6.226797973505507345),
            (
                "faf03",
                moon_argument_of_latitude_rad,
                0.2597711366745499518,
            ),
            ("fad03", moon_mean_elongation_rad, 1.946709205396925672),
            ("faom03", moon_node_longitude_rad, -5.973618440951302183),
            ("fame03", mercury_longitude_rad, 5.417338184297289661),
            ("fave03", venus_longitude_rad, 3.424900460533758000),
            ("fae03", earth_longitude_rad, 1.744713738913081846),
            ("fama03", mars_longitude_rad, 3.275506840277781492),
            ("faju03", jupiter_longitude_rad, 5.275711665202481138),
            ("fasa03", saturn_longitude_rad, 5.371574539440827046),
            ("faur03", uranus_longitude_rad, 5.180636450180413523),
            ("fane03", neptune_longitude_rad, 2.079343830860413523),
            ("fapa03", general_precession_rad, 0.1950884762240000000e-1),
        ];
        for (name, function, expected) in cases {
            let value = function(0.80);
            assert!(
                (value - expected).abs() <= 1e-12,
                "{name}: {value} vs {expected}"
            );
        }
    }
}
