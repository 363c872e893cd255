//! The topocentric part of TDB - TT, for an observer on (or near) the Earth's surface.

use super::TopocentricObserver;

/// Degrees to radians, as ERFA's `ERFA_DD2R`.
const DEGREES_TO_RADIANS: f64 = std::f64::consts::PI / 180.0;

/// Mean longitude of the Sun, radians (Simon et al. 1994, as used by ERFA `eraDtdb`).
///
/// Given: `w`, Julian millennia since J2000.0 divided by 3600 (so that arcsecond rates per
/// millennium become degrees). Returns the angle reduced to (-2 pi, 2 pi) with `fmod`.
fn sun_mean_longitude_rad(w: f64) -> f64 {
    ((280.466_456_83 + 1_296_027_711.034_29 * w) % 360.0) * DEGREES_TO_RADIANS
}

/// Mean anomaly of the Sun, radians (Simon et al. 1994, as used by ERFA `eraDtdb`).
/// Argument as for [`sun_mean_longitude_rad`].
fn sun_mean_anomaly_rad(w: f64) -> f64 {
    ((357.529_109_18 + 1_295_965_810.481 * w) % 360.0) * DEGREES_TO_RADIANS
}

/// Mean elongation of the Moon from the Sun, radians (Simon et al. 1994, as used by ERFA
/// `eraDtdb`). Argument as for [`sun_mean_longitude_rad`].
fn moon_mean_elongation_rad(w: f64) -> f64 {
    ((297.850_195_47 + 16_029_616_012.090 * w) % 360.0) * DEGREES_TO_RADIANS
}

/// Mean longitude of Jupiter, radians (Simon et al. 1994, as used by ERFA `eraDtdb`).
/// Argument as for [`sun_mean_longitude_rad`].
fn jupiter_mean_longitude_rad(w: f64) -> f64 {
    ((34.351_518_74 + 109_306_899.894_53 * w) % 360.0) * DEGREES_TO_RADIANS
}

/// Mean longitude of Saturn, radians (Simon et al. 1994, as used by ERFA `eraDtdb`).
/// Argument as for [`sun_mean_longitude_rad`].
fn saturn_mean_longitude_rad(w: f64) -> f64 {
    ((50.077_444_30 + 44_046_398.470_38 * w) % 360.0) * DEGREES_TO_RADIANS
}

/// Topocentric part of TDB - TT: an approximation to `(v_E / c) . (r / c)`, with `v_E` the
/// barycentric velocity of the Earth and `r` the geocentric position of the observer.
///
/// Given:
/// - `t_millennia`: TDB (or TT) in Julian millennia since J2000.0;
/// - `ut1_day_fraction`: UT1 as a fraction of a day (only its part modulo 1 is used);
/// - `observer`: east longitude (rad), distance from the spin axis (km), distance north of the
///   equatorial plane (km).
///
/// Returns: the topocentric part in seconds (about 2 microseconds at most on the surface).
///
/// The terms and their order are those of ERFA `eraDtdb`, operation by operation (local solar
/// time = 2 pi frac(UT1) + longitude; `fmod` reductions of the fundamental arguments).
///
/// References: Moyer, T.D., Cel. Mech. 23, 33 (1981); Murray, C.A., Vectorial Astrometry,
/// Adam Hilger (1983); fundamental arguments from Simon, J.L. et al., Astron. Astrophys. 282,
/// 663-683 (1994); ERFA `eraDtdb` (dtdb.c).
pub(crate) fn topocentric_s(
    t_millennia: f64,
    ut1_day_fraction: f64,
    observer: &TopocentricObserver,
) -> f64 {
    let u = observer.spin_axis_distance_km;
    let v = observer.equatorial_plane_distance_km;
    let local_solar_time_rad =
        (ut1_day_fraction % 1.0) * std::f64::consts::TAU + observer.east_longitude_rad;
    let w = t_millennia / 3600.0;
    let elsun = sun_mean_longitude_rad(w);
    let emsun = sun_mean_anomaly_rad(w);
    let d = moon_mean_elongation_rad(w);
    let elj = jupiter_mean_longitude_rad(w);
    let els = saturn_mean_longitude_rad(w);
    let tsol = local_solar_time_rad;
    0.00029e-10 * u * (tsol + elsun - els).sin()
        + 0.00100e-10 * u * (tsol - 2.0 * emsun).sin()
        + 0.00133e-10 * u * (tsol - d).sin()
        + 0.00133e-10 * u * (tsol + elsun - elj).sin()
        - 0.00229e-10 * u * (tsol + 2.0 * elsun + emsun).sin()
        - 0.02200e-10 * v * (elsun + emsun).cos()
        + 0.05312e-10 * u * (tsol - emsun).sin()
        - 0.13677e-10 * u * (tsol + 2.0 * elsun).sin()
        - 1.31840e-10 * v * elsun.cos()
        + 3.17679e-10 * u * tsol.sin()
}
