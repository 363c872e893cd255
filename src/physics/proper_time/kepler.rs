//! A two-body (Keplerian) orbit as an analytic trajectory, for checks and benchmarks.

use super::Trajectory;
use crate::physics::rate::orbit::solve_kepler_equation_rad;

/// Classical elements of a geocentric Keplerian orbit.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct KeplerOrbit {
    /// Gravitational parameter GM, m^3/s^2.
    pub gm_m3_s2: f64,
    /// Semi-major axis a, m.
    pub semi_major_axis_m: f64,
    /// Eccentricity e (0 <= e < 1).
    pub eccentricity: f64,
    /// Inclination, rad.
    pub inclination_rad: f64,
    /// Right ascension of the ascending node, rad.
    pub ascending_node_rad: f64,
    /// Argument of perigee, rad.
    pub argument_of_perigee_rad: f64,
    /// Mean anomaly at t = 0, rad.
    pub mean_anomaly_at_zero_rad: f64,
}

impl KeplerOrbit {
    /// Mean motion n = sqrt(GM / a^3), rad/s (Kepler's third law).
    pub fn mean_motion_rad_s(&self) -> f64 {
        (self.gm_m3_s2 / self.semi_major_axis_m.powi(3)).sqrt()
    }

    /// Eccentric anomaly E at `t_s`, in [0, 2 pi): Kepler's equation E - e sin E = M by
    /// [`solve_kepler_equation_rad`] (Newton's method to a step below 1e-15 rad).
    pub fn eccentric_anomaly_rad(&self, t_s: f64) -> f64 {
        let mean = self.mean_anomaly_at_zero_rad + self.mean_motion_rad_s() * t_s;
        solve_kepler_equation_rad(mean, self.eccentricity)
    }
}

impl Trajectory for KeplerOrbit {
    /// Position and velocity from the eccentric anomaly: in the perifocal frame
    /// r = a (cos E - e, sqrt(1-e^2) sin E), v = (n a / (1 - e cos E)) (-sin E,
    /// sqrt(1-e^2) cos E), rotated by R3(-Omega) R1(-i) R3(-omega) (Vallado, algorithm 10).
    fn state_at(&self, t_s: f64) -> ([f64; 3], [f64; 3]) {
        let a = self.semi_major_axis_m;
        let e = self.eccentricity;
        let anomaly = self.eccentric_anomaly_rad(t_s);
        let (sin_e, cos_e) = anomaly.sin_cos();
        let root = (1.0 - e * e).sqrt();
        let speed_factor = self.mean_motion_rad_s() * a / (1.0 - e * cos_e);
        let perifocal_r = [a * (cos_e - e), a * root * sin_e];
        let perifocal_v = [-speed_factor * sin_e, speed_factor * root * cos_e];
        let (so, co) = self.ascending_node_rad.sin_cos();
        let (si, ci) = self.inclination_rad.sin_cos();
        let (sw, cw) = self.argument_of_perigee_rad.sin_cos();
        let p = [co * cw - so * sw * ci, so * cw + co * sw * ci, sw * si];
        let q = [-co * sw - so * cw * ci, -so * sw + co * cw * ci, cw * si];
        let rotate = |x: [f64; 2]| {
            [
                p[0] * x[0] + q[0] * x[1],
                p[1] * x[0] + q[1] * x[1],
                p[2] * x[0] + q[2] * x[1],
            ]
        };
        (rotate(perifocal_r), rotate(perifocal_v))
    }
}
