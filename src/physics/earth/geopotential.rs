//! The Earth's gravitational potential from a spherical-harmonic model: EGM2008 (Pavlis, Holmes,
//! Kenyon & Factor 2012, J. Geophys. Res. 117, B04406) to degree and order 120, built in from
//! `data/egm2008_degree120.gfc` (ICGEM format; made by `tools/make_egm2008_excerpt.py`, source
//! and terms in `data/egm2008_README.md`).
//!
//! V(r, phi, lambda) = GM/r sum_{n=0}^{N} (a/r)^n sum_{m=0}^{n} Pnm(sin phi) (Cnm cos m lambda +
//! Snm sin m lambda), with fully normalized coefficients and functions (Heiskanen & Moritz
//! 1967 eq. 1-89 with the geodetic normalization of eq. 1-73; no Condon-Shortley phase), phi
//! the geocentric latitude and lambda the longitude in the ITRS. The functions come from the
//! standard forward-column recursion (Holmes & Featherstone 2002, J. Geodesy 76:279, eqs.
//! 11-13), exact to rounding at degree 120 at every latitude (their underflow starts near
//! degree 1900).
//!
//! The model is tide-free (the permanent tide is not in C20): a zero-tide field differs by
//! about 0.3 m^2/s^2 at most (3e-18 of rate). GM and a are the model's own
//! (3.986004415e14 m^3/s^2, 6 378 136.3 m).

use std::sync::OnceLock;

/// The built-in model, as shipped.
const EGM2008_TEXT: &str = include_str!("data/egm2008_degree120.gfc");

/// A spherical-harmonic model of the Earth's gravitational potential.
#[derive(Debug, Clone, PartialEq)]
pub struct Geopotential {
    /// The model's name (`modelname`).
    pub name: String,
    /// GM, m^3/s^2.
    pub gm_m3_s2: f64,
    /// Reference radius a, m.
    pub radius_m: f64,
    /// Highest degree held.
    pub max_degree: usize,
    /// Fully normalized Cnm at index n (n + 1) / 2 + m.
    c: Vec<f64>,
    /// Fully normalized Snm at the same index.
    s: Vec<f64>,
    /// The recursion's factors a_nm and b_nm (Holmes & Featherstone 2002 eq. 12) at the same
    /// index, computed once.
    recursion: Vec<(f64, f64)>,
}

/// Why a model text was refused: the line (1-based) and what is wrong.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct GeopotentialError {
    /// Line number in the text.
    pub line: usize,
    /// What is wrong.
    pub message: String,
}

impl std::fmt::Display for GeopotentialError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        write!(f, "line {}: {}", self.line, self.message)
    }
}

fn index(n: usize, m: usize) -> usize {
    n * (n + 1) / 2 + m
}

fn number(text: &str, line: usize) -> Result<f64, GeopotentialError> {
    text.replace(['d', 'D'], "e")
        .parse::<f64>()
        .ok()
        .filter(|v| v.is_finite())
        .ok_or_else(|| GeopotentialError {
            line,
            message: format!("{text:?} is not a finite number"),
        })
}

impl Geopotential {
    /// Reads the reduced ICGEM text of `tools/make_egm2008_excerpt.py`: `key value` header lines
    /// up to `end_of_head` (modelname, earth_gravity_constant, radius, max_degree, norm
    /// fully_normalized), then `n m C S` lines.
    pub fn parse(text: &str) -> Result<Self, GeopotentialError> {
        let mut name = String::new();
        let (mut gm, mut radius, mut max_degree) = (None, None, None);
        let mut lines = text.lines().enumerate().map(|(i, l)| (i + 1, l));
        for (line, text) in lines.by_ref() {
            let fields: Vec<&str> = text.split_whitespace().collect();
            match fields.as_slice() {
                ["end_of_head"] => break,
                ["modelname", value] => name = (*value).to_string(),
                ["earth_gravity_constant", value] => gm = Some(number(value, line)?),
                ["radius", value] => radius = Some(number(value, line)?),
                ["max_degree", value] => max_degree = value.parse::<usize>().ok(),
                ["norm", value] if *value != "fully_normalized" => {
                    return Err(GeopotentialError {
                        line,
                        message: format!("norm {value} is not supported (fully_normalized)"),
                    })
                }
                _ => {}
            }
        }
        let missing = |what: &str| GeopotentialError {
            line: 0,
            message: format!("the header lacks {what}"),
        };
        let max_degree = max_degree.ok_or_else(|| missing("max_degree"))?;
        let size = index(max_degree, max_degree) + 1;
        let (mut c, mut s) = (vec![0.0; size], vec![0.0; size]);
        for (line, text) in lines {
            let fields: Vec<&str> = text.split_whitespace().collect();
            let [n, m, cnm, snm] = fields.as_slice() else {
                return Err(GeopotentialError {
                    line,
                    message: "expected `n m C S`".to_string(),
                });
            };
            let (n, m) = match (n.parse::<usize>(), m.parse::<usize>()) {
                (Ok(n), Ok(m)) if m <= n && n <= max_degree => (n, m),
                _ => {
                    return Err(GeopotentialError {
                        line,
                        message: format!(
                            "degree {n} and order {m} outside 0 <= m <= n <= {max_degree}"
                        ),
                    })
                }
            };
            c[index(n, m)] = number(cnm, line)?;
            s[index(n, m)] = number(snm, line)?;
        }
        let mut recursion = vec![(0.0, 0.0); size];
        for n in 1..=max_degree {
            for m in 0..n {
                recursion[index(n, m)] = recursion_factors(n, m);
            }
        }
        Ok(Self {
            name,
            gm_m3_s2: gm.ok_or_else(|| missing("earth_gravity_constant"))?,
            radius_m: radius.ok_or_else(|| missing("radius"))?,
            max_degree,
            c,
            s,
            recursion,
        })
    }

    /// The gravitational potential (positive, m^2/s^2, no centrifugal part) at the ITRS
    /// position `itrs_m` to degree `max_degree` (at most the model's): the series of the module
    /// notes. NaN at the geocentre or for a non-finite position.
    pub fn potential_m2_s2(&self, itrs_m: [f64; 3], max_degree: usize) -> f64 {
        let degree = max_degree.min(self.max_degree);
        let [x, y, z] = itrs_m;
        let rho = x.hypot(y);
        let r = rho.hypot(z);
        if r.is_nan() || r <= 0.0 || r.is_infinite() {
            return f64::NAN;
        }
        let (sin_phi, cos_phi) = (z / r, rho / r);
        let (cos_lambda, sin_lambda) = if rho > 0.0 {
            (x / rho, y / rho)
        } else {
            (1.0, 0.0)
        };
        let ratio = self.radius_m / r;
        // Per order m: cos(m lambda), sin(m lambda) by the angle-sum recursion.
        let (mut cos_m, mut sin_m) = (1.0, 0.0);
        // P_mm by the sectoral recursion (Holmes & Featherstone 2002 eq. 13).
        let mut p_mm = 1.0;
        let mut total = 0.0;
        for m in 0..=degree {
            if m > 0 {
                let factor = if m == 1 {
                    3f64.sqrt()
                } else {
                    ((2 * m + 1) as f64 / (2 * m) as f64).sqrt()
                };
                p_mm *= factor * cos_phi;
                let next_cos = cos_m * cos_lambda - sin_m * sin_lambda;
                sin_m = sin_m * cos_lambda + cos_m * sin_lambda;
                cos_m = next_cos;
            }
            // Column m: P_nm for n = m.. by eqs. 11-12, summed with (a/r)^n.
            let mut sum_c = 0.0;
            let mut sum_s = 0.0;
            let mut p_prev = 0.0;
            let mut p_n = p_mm;
            let mut scale = ratio.powi(m as i32);
            for n in m..=degree {
                let k = index(n, m);
                if n > m {
                    let (a, b) = self.recursion[k];
                    let p_next = a * sin_phi * p_n - b * p_prev;
                    p_prev = p_n;
                    p_n = p_next;
                    scale *= ratio;
                }
                sum_c += scale * p_n * self.c[k];
                sum_s += scale * p_n * self.s[k];
            }
            total += sum_c * cos_m + sum_s * sin_m;
        }
        self.gm_m3_s2 / r * total
    }
}

/// The factors of P_nm = a_nm sin(phi) P_(n-1)m - b_nm P_(n-2)m for n > m (Holmes &
/// Featherstone 2002 eq. 12): a_nm = sqrt((2n - 1)(2n + 1) / ((n - m)(n + m))), b_nm =
/// sqrt((2n + 1)(n + m - 1)(n - m - 1) / ((n - m)(n + m)(2n - 3))), b = 0 for n = m + 1.
fn recursion_factors(n: usize, m: usize) -> (f64, f64) {
    let (nf, mf) = (n as f64, m as f64);
    let a = ((2.0 * nf - 1.0) * (2.0 * nf + 1.0) / ((nf - mf) * (nf + mf))).sqrt();
    let b = if n == m + 1 {
        0.0
    } else {
        ((2.0 * nf + 1.0) * (nf + mf - 1.0) * (nf - mf - 1.0)
            / ((nf - mf) * (nf + mf) * (2.0 * nf - 3.0)))
            .sqrt()
    };
    (a, b)
}

/// The built-in EGM2008 model (degree 120), read once.
pub fn egm2008() -> Result<&'static Geopotential, GeopotentialError> {
    static MODEL: OnceLock<Result<Geopotential, GeopotentialError>> = OnceLock::new();
    MODEL
        .get_or_init(|| Geopotential::parse(EGM2008_TEXT))
        .as_ref()
        .map_err(Clone::clone)
}

#[cfg(test)]
#[path = "geopotential_tests.rs"]
mod tests;
