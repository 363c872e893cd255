//! The assembled Earth orientation at one epoch and the vector rotations built on it.

use super::cio::{celestial_to_intermediate_matrix, polar_motion_matrix, tio_locator_sprime_rad};
use super::fast::celestial_pole_fast;
use super::matrix::{apply, apply_transpose, Matrix3};
use super::pole::{celestial_pole_series, CelestialPole};
use super::pole_rate::intermediate_to_celestial_rate_per_s;
use super::rotation::{
    celestial_to_terrestrial_matrix, earth_rotation_angle_rad,
    greenwich_apparent_sidereal_time_rad, greenwich_mean_sidereal_time_rad,
    EARTH_ROTATION_RATE_RAD_S,
};
use super::JulianDate;

/// Observed celestial-pole offsets dX, dY (IERS EOP series), radians: added to the modelled X, Y
/// before the celestial-to-intermediate matrix is formed (IERS Conventions (2010) sec. 5.5.4).
/// s, the equation of the origins and so GAST keep the model's X, Y (ERFA's usage; the effect
/// on s of a 1 mas offset is below 1e-17 rad).
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub struct CelestialPoleOffsets {
    pub dx_rad: f64,
    pub dy_rad: f64,
}

/// Earth orientation at one epoch.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct EarthOrientation {
    /// Earth rotation angle, [0, 2 pi).
    pub era_rad: f64,
    /// Greenwich mean sidereal time (IAU 2006), [0, 2 pi).
    pub gmst_rad: f64,
    /// Greenwich apparent sidereal time, ERA - EO, [0, 2 pi).
    pub gast_rad: f64,
    /// CIP X in the GCRS, including dX when given.
    pub x_rad: f64,
    /// CIP Y in the GCRS, including dY when given.
    pub y_rad: f64,
    /// CIO locator s.
    pub s_rad: f64,
    /// TIO locator s'.
    pub sprime_rad: f64,
    /// The GCRS -> ITRS rotation `W^T R3(ERA) Q^T` (ERFA's `rc2t`): `r_itrs = matrix r_gcrs`.
    /// Its transpose is `Q R W` of IERS Conventions (2010) eq. 5.1.
    pub matrix: Matrix3,
    /// The TIRS -> ITRS polar-motion matrix `W^T` (ERFA's `rpom`), kept for velocities.
    pub polar_motion: Matrix3,
    /// The TT epoch and the celestial-pole offsets used, kept for the precession-nutation
    /// rate of the velocities ([`Self::intermediate_to_celestial_rate_per_s`]).
    pub tt: JulianDate,
    pub pole_offsets: CelestialPoleOffsets,
}

fn assemble(
    pole: CelestialPole,
    tt: JulianDate,
    ut1: JulianDate,
    xp_rad: f64,
    yp_rad: f64,
    offsets: Option<CelestialPoleOffsets>,
) -> EarthOrientation {
    let offsets = offsets.unwrap_or_default();
    let x = pole.x_rad + offsets.dx_rad;
    let y = pole.y_rad + offsets.dy_rad;
    let era = earth_rotation_angle_rad(ut1);
    let sprime = tio_locator_sprime_rad(tt.julian_centuries_since_j2000());
    let c2i = celestial_to_intermediate_matrix(x, y, pole.s_rad);
    let polar_motion = polar_motion_matrix(xp_rad, yp_rad, sprime);
    EarthOrientation {
        era_rad: era,
        gmst_rad: greenwich_mean_sidereal_time_rad(ut1, tt),
        gast_rad: greenwich_apparent_sidereal_time_rad(era, pole.eo_rad),
        x_rad: x,
        y_rad: y,
        s_rad: pole.s_rad,
        sprime_rad: sprime,
        matrix: celestial_to_terrestrial_matrix(&c2i, era, &polar_motion),
        polar_motion,
        tt,
        pole_offsets: offsets,
    }
}

/// Earth orientation from the full IAU 2006/2000A series (ERFA `eraC2t06a` for the matrix, with
/// optional celestial-pole offsets; `eraEra00`, `eraGmst06`, `eraGst06a`, `eraS06`, `eraSp00`):
/// TT and UT1 as two-part Julian dates, `xp_rad`, `yp_rad` the pole coordinates.
pub fn earth_orientation(
    tt: JulianDate,
    ut1: JulianDate,
    xp_rad: f64,
    yp_rad: f64,
    offsets: Option<CelestialPoleOffsets>,
) -> EarthOrientation {
    assemble(celestial_pole_series(tt), tt, ut1, xp_rad, yp_rad, offsets)
}

/// As [`earth_orientation`], with X, Y, s and EO from the piecewise Chebyshev fits of
/// [`super::fast`] (the full series outside their span, 1900-2200 TT).
pub fn earth_orientation_fast(
    tt: JulianDate,
    ut1: JulianDate,
    xp_rad: f64,
    yp_rad: f64,
    offsets: Option<CelestialPoleOffsets>,
) -> EarthOrientation {
    assemble(celestial_pole_fast(tt), tt, ut1, xp_rad, yp_rad, offsets)
}

impl EarthOrientation {
    /// The GCRS -> ITRS matrix's transpose, `Q R W` of IERS Conventions (2010) eq. 5.1.
    pub fn itrs_to_gcrs_matrix(&self) -> Matrix3 {
        super::matrix::transpose(&self.matrix)
    }

    /// ITRS position -> GCRS position, metres (IERS Conventions (2010) eq. 5.1).
    pub fn itrs_to_gcrs_position_m(&self, r_itrs_m: &[f64; 3]) -> [f64; 3] {
        apply_transpose(&self.matrix, r_itrs_m)
    }

    /// GCRS position -> ITRS position, metres (IERS Conventions (2010) eq. 5.1 inverted).
    pub fn gcrs_to_itrs_position_m(&self, r_gcrs_m: &[f64; 3]) -> [f64; 3] {
        apply(&self.matrix, r_gcrs_m)
    }

    /// dQ/dt at this epoch, per TT second (Q the CIRS -> GCRS matrix; a centred difference,
    /// [`intermediate_to_celestial_rate_per_s`]). Computed on each call (two evaluations of
    /// the pole), so the matrix alone stays cheap.
    pub fn intermediate_to_celestial_rate_per_s(&self) -> Matrix3 {
        let offsets = self.pole_offsets;
        intermediate_to_celestial_rate_per_s(self.tt, [offsets.dx_rad, offsets.dy_rad])
    }

    /// `(dQ/dt) R W r_itrs`, m/s: the precession-nutation part of the GCRS velocity of the
    /// ITRS point `r_itrs_m` (R W r = Q^T r_gcrs is the point in the CIRS).
    fn precession_nutation_velocity_m_s(&self, r_itrs_m: &[f64; 3]) -> [f64; 3] {
        let r_tirs = apply_transpose(&self.polar_motion, r_itrs_m);
        let (sin, cos) = self.era_rad.sin_cos();
        let r_cirs = [
            cos * r_tirs[0] - sin * r_tirs[1],
            sin * r_tirs[0] + cos * r_tirs[1],
            r_tirs[2],
        ];
        apply(&self.intermediate_to_celestial_rate_per_s(), &r_cirs)
    }

    /// ITRS position and velocity -> GCRS velocity, m/s: the time derivative of eq. 5.1 of the
    /// IERS Conventions (2010), `v_gcrs = Q R W (v_itrs + W^T (omega z x W r)) + (dQ/dt) R W r`,
    /// with R(t) = R3(-ERA) turning at d(ERA)/dt (the derivative of eq. 5.15,
    /// [`EARTH_ROTATION_RATE_RAD_S`]; omega x r taken in the TIRS) and the precession-nutation
    /// rate dQ/dt ([`Self::intermediate_to_celestial_rate_per_s`]: up to 4.4e-5 m/s at the
    /// surface and 2.2e-4 m/s at 26 560 km over 1962-2100, measured in `tests_pole_rate.rs`,
    /// where the result agrees with differentiated ERFA `c2t06a` to 1.3e-8 and 5.4e-8 m/s).
    /// Left out: the polar-motion rate dW/dt (a pole moving 3 mas/day, about 1e-6 m/s at the
    /// surface) and the length-of-day variation of d(ERA)/dt (a few 1e-8 of omega, about
    /// 1e-5 m/s at the equator): one epoch's parameters do not give them ([`super::span`]
    /// has both).
    pub fn itrs_to_gcrs_velocity_m_s(
        &self,
        r_itrs_m: &[f64; 3],
        v_itrs_m_s: &[f64; 3],
    ) -> [f64; 3] {
        let r_tirs = apply_transpose(&self.polar_motion, r_itrs_m);
        let omega_cross_r = [
            -EARTH_ROTATION_RATE_RAD_S * r_tirs[1],
            EARTH_ROTATION_RATE_RAD_S * r_tirs[0],
            0.0,
        ];
        let rotation_term = apply(&self.polar_motion, &omega_cross_r);
        let total = [0, 1, 2].map(|i| v_itrs_m_s[i] + rotation_term[i]);
        let turned = apply_transpose(&self.matrix, &total);
        let precession_nutation = self.precession_nutation_velocity_m_s(r_itrs_m);
        [0, 1, 2].map(|i| turned[i] + precession_nutation[i])
    }

    /// GCRS position and velocity -> ITRS velocity, m/s, the inverse of
    /// [`Self::itrs_to_gcrs_velocity_m_s`] (same model).
    pub fn gcrs_to_itrs_velocity_m_s(
        &self,
        r_gcrs_m: &[f64; 3],
        v_gcrs_m_s: &[f64; 3],
    ) -> [f64; 3] {
        let r_itrs = apply(&self.matrix, r_gcrs_m);
        let precession_nutation = self.precession_nutation_velocity_m_s(&r_itrs);
        let v_turning = [0, 1, 2].map(|i| v_gcrs_m_s[i] - precession_nutation[i]);
        let v_rotated = apply(&self.matrix, &v_turning);
        let r_tirs = apply_transpose(&self.polar_motion, &r_itrs);
        let omega_cross_r = [
            -EARTH_ROTATION_RATE_RAD_S * r_tirs[1],
            EARTH_ROTATION_RATE_RAD_S * r_tirs[0],
            0.0,
        ];
        let rotation_term = apply(&self.polar_motion, &omega_cross_r);
        [0, 1, 2].map(|i| v_rotated[i] - rotation_term[i])
    }
}
