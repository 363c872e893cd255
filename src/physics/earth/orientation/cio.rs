//! The CIO-based pieces: the CIP coordinates X, Y from the NPB matrix, the CIO locator s, the
//! TIO locator s', the celestial-to-intermediate matrix and the polar-motion matrix (IERS
//! Conventions (2010) ch. 5; ERFA `eraBpn2xy`, `eraS06`, `eraSp00`,
//! `eraC2ixys`, `eraPom00`).

use super::arguments::{
    earth_longitude_rad, general_precession_rad, moon_argument_of_latitude_rad,
    moon_mean_anomaly_rad, moon_mean_elongation_rad, moon_node_longitude_rad, sun_mean_anomaly_rad,
    venus_longitude_rad,
};
use super::matrix::{rotate_x, rotate_y, rotate_z, Matrix3, IDENTITY};
use super::series_data::tables;
use super::ARCSEC_TO_RAD;

/// X, Y of the CIP in the GCRS: the third row of the GCRS-to-true bias-precession-nutation matrix
/// (IERS Conventions (2010) ch. 5: X, Y are the
/// GCRS components of the CIP unit vector; ERFA `eraBpn2xy`).
pub fn cip_xy_from_npb(npb: &Matrix3) -> (f64, f64) {
    (npb[2][0], npb[2][1])
}

/// s, the CIO locator of IAU 2006/2000A, from the series for s + XY/2 (IERS Conventions (2010)
/// ch. 5, table 5.2d; ERFA `eraS06`), `t` in TT Julian centuries since J2000.0 and the CIP
/// coordinates `x`, `y` (radians) at that date. Periodic terms are summed last to first per
/// power of t, as ERFA does.
pub fn cio_locator_s_rad(t: f64, x: f64, y: f64) -> f64 {
    let fa = [
        moon_mean_anomaly_rad(t),
        sun_mean_anomaly_rad(t),
        moon_argument_of_latitude_rad(t),
        moon_mean_elongation_rad(t),
        moon_node_longitude_rad(t),
        venus_longitude_rad(t),
        earth_longitude_rad(t),
        general_precession_rad(t),
    ];
    let series = &tables().cio;
    let mut w = series.polynomial_arcsec;
    for (power, terms) in series.periodic.iter().enumerate() {
        for term in terms.iter().rev() {
            let a = term
                .multipliers
                .iter()
                .zip(&fa)
                .fold(0.0, |sum, (m, f)| sum + m * f);
            w[power] += term.sin_arcsec * a.sin() + term.cos_arcsec * a.cos();
        }
    }
    (w[0] + (w[1] + (w[2] + (w[3] + (w[4] + w[5] * t) * t) * t) * t) * t) * ARCSEC_TO_RAD
        - x * y / 2.0
}

/// s', the TIO locator, approximated by its secular drift -47 uas per century (IERS Conventions
/// (2010) eq. 5.13; ERFA `eraSp00`), `t` in TT Julian centuries since J2000.0.
pub fn tio_locator_sprime_rad(t: f64) -> f64 {
    -47e-6 * t * ARCSEC_TO_RAD
}

/// The celestial-to-intermediate matrix `Q(t)^T = R3(-s) R3(-E) R2(d) R3(E)` from X, Y and s,
/// with E = atan2(Y, X) and d = atan(sqrt((X^2 + Y^2) / (1 - X^2 - Y^2))) (IERS Conventions
/// (2010) eq. 5.10 and 5.6; ERFA `eraC2ixys`). It maps GCRS vectors to the CIRS.
pub fn celestial_to_intermediate_matrix(x: f64, y: f64, s_rad: f64) -> Matrix3 {
    let r2 = x * x + y * y;
    let e = if r2 > 0.0 { y.atan2(x) } else { 0.0 };
    let d = (r2 / (1.0 - r2)).sqrt().atan();
    let mut r = IDENTITY;
    rotate_z(e, &mut r);
    rotate_y(d, &mut r);
    rotate_z(-(e + s_rad), &mut r);
    r
}

/// The polar-motion matrix `W(t)^T = R1(-yp) R2(-xp) R3(s')`: it maps TIRS vectors to the ITRS
/// (the transpose of IERS Conventions (2010) eq. 5.3, `W = R3(-s') R2(xp) R1(yp)`; ERFA
/// `eraPom00`). `xp_rad`, `yp_rad`: pole coordinates; `sprime_rad`: s'.
pub fn polar_motion_matrix(xp_rad: f64, yp_rad: f64, sprime_rad: f64) -> Matrix3 {
    let mut r = IDENTITY;
    rotate_z(sprime_rad, &mut r);
    rotate_y(-xp_rad, &mut r);
    rotate_x(-yp_rad, &mut r);
    r
}
