//! The Moon's orientation: the IAU rotation model of the Moon (mean Earth / polar axis body-fixed
//! frame) from the report of the IAU Working Group on Cartographic Coordinates and Rotational
//! Elements: Archinal et al. 2018, Celest. Mech. Dyn. Astr. 130:22, table of the Moon's
//! alpha0, delta0 and W with the arguments E1 .. E13 (unchanged there from the 2009 and 2015
//! reports).
//!
//! **Source of the coefficients: from memory** of that table (no copy of the report was
//! available to this project). They are checked in the tests against what they must give: the
//! sub-Earth point (Earth from the Moon, DE440) stays within the optical librations of about
//! +-8 deg in longitude and +-7 deg in latitude, averages to the mean sub-Earth point (0, 0)
//! within 1 deg, and the rotation stays synchronous (no drift of the sub-Earth longitude).
//!
//! The DE440 lunar frame (the principal-axis frame of the lunar libration angles) is not
//! reachable here: the embedded excerpt holds the bodies' translations only, not the
//! libration angles (a separate binary PCK file in JPL's distribution). The IAU frame differs
//! from it by the mean-Earth/principal-axis rotation (below 0.03 deg, from memory) and by the
//! model's own accuracy (about 150 m at the surface, from memory of the report).
//!
//! Angles: alpha0, delta0 the ICRF right ascension and declination of the north pole, W the
//! angle along the equator from the pole's ascending node on the ICRF equator to the prime
//! meridian; d = TDB days since J2000.0, T = d / 36525.

use crate::physics::constants::SECONDS_PER_DAY;

/// The arguments E1 .. E13 (degrees): (value at J2000.0, rate per day). Archinal et al. 2018,
/// the Moon's entry (from memory).
const ARGUMENTS_DEG: [(f64, f64); 13] = [
    (125.045, -0.052_992_1),
    (250.089, -0.105_984_2),
    (260.008, 13.012_000_9),
    (176.625, 13.340_715_4),
    (357.529, 0.985_600_3),
    (311.589, 26.405_708_4),
    (134.963, 13.064_993_0),
    (276.617, 0.328_714_6),
    (34.226, 1.748_487_7),
    (15.134, -0.158_976_3),
    (119.743, 0.003_609_6),
    (239.961, 0.164_357_3),
    (25.053, 12.959_008_8),
];

/// Sine amplitudes of alpha0 per argument (degrees).
const POLE_RA_SIN_DEG: [f64; 13] = [
    -3.8787, -0.1204, 0.0700, -0.0172, 0.0, 0.0072, 0.0, 0.0, 0.0, -0.0052, 0.0, 0.0, 0.0043,
];
/// Cosine amplitudes of delta0 per argument (degrees).
const POLE_DEC_COS_DEG: [f64; 13] = [
    1.5419, 0.0239, -0.0278, 0.0068, 0.0, -0.0029, 0.0009, 0.0, 0.0, 0.0008, 0.0, 0.0, -0.0009,
];
/// Sine amplitudes of W per argument (degrees).
const MERIDIAN_SIN_DEG: [f64; 13] = [
    3.5610, 0.1208, -0.0642, 0.0158, 0.0252, -0.0066, -0.0047, -0.0046, 0.0028, 0.0052, 0.0040,
    0.0019, -0.0044,
];

/// The Moon's orientation at one instant (radians).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct MoonOrientation {
    /// Right ascension of the north pole, ICRF, rad.
    pub pole_ra_rad: f64,
    /// Declination of the north pole, ICRF, rad.
    pub pole_dec_rad: f64,
    /// Prime-meridian angle W, rad.
    pub prime_meridian_rad: f64,
}

/// The IAU rotation model of the Moon at `tdb_s` (TDB seconds since J2000.0).
///
/// alpha0 = 269.9949 + 0.0031 T + sum a_i sin E_i, delta0 = 66.5392 + 0.0130 T + sum b_i cos
/// E_i, W = 38.3213 + 13.17635815 d - 1.4e-12 d^2 + sum c_i sin E_i (degrees).
///
/// Reference: Archinal et al. 2018, Celest. Mech. Dyn. Astr. 130:22, the Moon's rotational
/// elements (coefficients from memory, see the module notes).
pub fn moon_orientation(tdb_s: f64) -> MoonOrientation {
    let d = tdb_s / SECONDS_PER_DAY;
    let t = d / 36_525.0;
    let (mut ra_deg, mut dec_deg, mut w_deg) = (
        269.9949 + 0.0031 * t,
        66.5392 + 0.0130 * t,
        // The linear term reduced modulo 360 first keeps the angle's digits over centuries.
        (13.176_358_15 * d).rem_euclid(360.0) + 38.3213 - 1.4e-12 * d * d,
    );
    for (i, &(phase_deg, rate_deg_day)) in ARGUMENTS_DEG.iter().enumerate() {
        let argument_rad = (phase_deg + (rate_deg_day * d).rem_euclid(360.0)).to_radians();
        let (sin, cos) = argument_rad.sin_cos();
        ra_deg += POLE_RA_SIN_DEG[i] * sin;
        dec_deg += POLE_DEC_COS_DEG[i] * cos;
        w_deg += MERIDIAN_SIN_DEG[i] * sin;
    }
    MoonOrientation {
        pole_ra_rad: ra_deg.to_radians(),
        pole_dec_rad: dec_deg.to_radians(),
        prime_meridian_rad: w_deg.rem_euclid(360.0).to_radians(),
    }
}

impl MoonOrientation {
    /// The rotation matrix from ICRF axes to the body-fixed frame,
    /// R_z(W) R_x(90 deg - delta0) R_z(90 deg + alpha0) (Archinal et al. 2018, the definition of
    /// the rotational elements; rotations of the axes, positive anticlockwise).
    pub fn icrf_to_body_fixed(&self) -> [[f64; 3]; 3] {
        let a = rotation_z(std::f64::consts::FRAC_PI_2 + self.pole_ra_rad);
        let b = rotation_x(std::f64::consts::FRAC_PI_2 - self.pole_dec_rad);
        let c = rotation_z(self.prime_meridian_rad);
        multiply(&c, &multiply(&b, &a))
    }

    /// A body-fixed vector in ICRF axes (the transpose of [`Self::icrf_to_body_fixed`]).
    pub fn body_fixed_to_icrf(&self, body_fixed: [f64; 3]) -> [f64; 3] {
        let m = self.icrf_to_body_fixed();
        [0, 1, 2]
            .map(|j| m[0][j] * body_fixed[0] + m[1][j] * body_fixed[1] + m[2][j] * body_fixed[2])
    }

    /// An ICRF vector in body-fixed axes.
    pub fn icrf_to_body_fixed_vector(&self, icrf: [f64; 3]) -> [f64; 3] {
        let m = self.icrf_to_body_fixed();
        [0, 1, 2].map(|i| m[i][0] * icrf[0] + m[i][1] * icrf[1] + m[i][2] * icrf[2])
    }
}

fn rotation_z(angle_rad: f64) -> [[f64; 3]; 3] {
    let (s, c) = angle_rad.sin_cos();
    [[c, s, 0.0], [-s, c, 0.0], [0.0, 0.0, 1.0]]
}

fn rotation_x(angle_rad: f64) -> [[f64; 3]; 3] {
    let (s, c) = angle_rad.sin_cos();
    [[1.0, 0.0, 0.0], [0.0, c, s], [0.0, -s, c]]
}

fn multiply(a: &[[f64; 3]; 3], b: &[[f64; 3]; 3]) -> [[f64; 3]; 3] {
    let mut out = [[0.0; 3]; 3];
    for (i, row) in out.iter_mut().enumerate() {
        for (j, value) in row.iter_mut().enumerate() {
            *value = (0..3).map(|k| a[i][k] * b[k][j]).sum();
        }
    }
    out
}

/// Body-fixed position of a selenographic site, m: latitude and longitude (east) on a sphere
/// of radius `radius_m` (the IAU mean-Earth/polar-axis frame: x towards the mean sub-Earth
/// point, z the north pole).
pub fn selenographic_to_body_fixed_m(
    latitude_deg: f64,
    longitude_deg: f64,
    radius_m: f64,
) -> [f64; 3] {
    let (sin_lat, cos_lat) = latitude_deg.to_radians().sin_cos();
    let (sin_lon, cos_lon) = longitude_deg.to_radians().sin_cos();
    [
        radius_m * cos_lat * cos_lon,
        radius_m * cos_lat * sin_lon,
        radius_m * sin_lat,
    ]
}

#[cfg(test)]
#[path = "orientation_tests.rs"]
mod tests;
