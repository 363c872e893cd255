//! A two-body orbit generated analytically, and helpers to post ephemerides.

use serde_json::{json, Value};

use super::{client, split, TestServer};

/// GM used by the service's point-mass model (IERS Conventions (2010) table 1.1, TCG-compatible).
pub const GM: f64 = 3.986_004_418e14;
pub const C: f64 = 299_792_458.0;
/// L_G (IAU 2000 Resolution B1.9).
pub const L_G: f64 = 6.969_290_134e-10;

/// A two-body orbit in the orbital plane rotated by an inclination about x.
pub struct Kepler {
    /// Semi-major axis, m.
    pub a_m: f64,
    /// Eccentricity.
    pub e: f64,
    /// Inclination, rad.
    pub inclination_rad: f64,
}

impl Kepler {
    pub fn mean_motion(&self) -> f64 {
        (GM / self.a_m.powi(3)).sqrt()
    }

    /// Eccentric anomaly at t (mean anomaly 0 at t = 0), by Newton's method on Kepler's equation.
    pub fn eccentric_anomaly(&self, t_s: f64) -> f64 {
        let mean = self.mean_motion() * t_s;
        let mut e_anomaly = mean;
        for _ in 0..30 {
            e_anomaly -=
                (e_anomaly - self.e * e_anomaly.sin() - mean) / (1.0 - self.e * e_anomaly.cos());
        }
        e_anomaly
    }

    pub fn state(&self, t_s: f64) -> ([f64; 3], [f64; 3]) {
        let big_e = self.eccentric_anomaly(t_s);
        let (sin_e, cos_e) = big_e.sin_cos();
        let b = self.a_m * (1.0 - self.e * self.e).sqrt();
        let x = self.a_m * (cos_e - self.e);
        let y = b * sin_e;
        let e_dot = self.mean_motion() / (1.0 - self.e * cos_e);
        let vx = -self.a_m * sin_e * e_dot;
        let vy = b * cos_e * e_dot;
        let (si, ci) = self.inclination_rad.sin_cos();
        ([x, y * ci, y * si], [vx, vy * ci, vy * si])
    }

    /// tau - TT accumulated from 0 to t: the closed form (Ashby 2003, eq. 40;
    /// IS-GPS-200 20.3.3.3.3.1) plus L_G for TT.
    pub fn tau_minus_tt(&self, t_s: f64) -> f64 {
        let secular = L_G - 1.5 * GM / (self.a_m * C * C);
        let periodic = |t: f64| {
            -2.0 * (GM * self.a_m).sqrt() / (C * C) * self.e * self.eccentric_anomaly(t).sin()
        };
        secular * t_s + periodic(t_s) - periodic(0.0)
    }
}

/// A JSON ephemeris of `count` states every `step_s` seconds of TT.
pub fn json_ephemeris(orbit: &Kepler, step_s: f64, count: usize) -> Value {
    let states: Vec<Value> = (0..count)
        .map(|k| {
            let t = k as f64 * step_s;
            let (r, v) = orbit.state(t);
            json!({"epoch": format!("{t}"), "position_m": r, "velocity_m_s": v})
        })
        .collect();
    json!({"frame": "GCRF", "time_scale": "TT", "epoch_format": "j2000_s",
           "objects": [{"id": "TEST-ORBIT", "states": states}]})
}

/// POSTs a body to the proper-time endpoint.
pub async fn post_body(
    server: &TestServer,
    query: &str,
    content_type: &str,
    body: Vec<u8>,
) -> (u16, String, Value) {
    let response = client()
        .post(server.url(&format!("/v1/clock/proper-time{query}")))
        .header("content-type", content_type)
        .body(body)
        .send()
        .await
        .expect("request");
    split(response).await
}
