//! Lagrange and Hermite interpolation on a window of nodes, with the first derivative.
//!
//! Lagrange basis (e.g. Press et al., Numerical Recipes, 3rd ed., section 3.2; Berrut &
//! Trefethen, SIAM Review 46 (2004) 501, eq. 3.2 for the weights):
//!     L_j(t) = w_j * prod_{m != j} (t - t_m),   w_j = 1 / prod_{m != j} (t_j - t_m).
//! Products with one factor left out are formed from prefix and suffix products, and their
//! derivatives by forward differentiation of the same products, so no division by (t - t_j)
//! occurs and evaluation exactly at a node is safe.
//!
//! Hermite (osculating) interpolation with values and first derivatives (e.g. Burden & Faires,
//! Numerical Analysis, section 3.4, theorem 3.9):
//!     H(t) = sum_j [1 - 2 c_j (t - t_j)] L_j(t)^2 y_j + (t - t_j) L_j(t)^2 y'_j,
//!     c_j = L_j'(t_j) = sum_{m != j} 1 / (t_j - t_m).

/// Largest window handled (nodes).
pub const MAX_POINTS: usize = 16;

/// Barycentric weights w_j of one window of nodes, and the Hermite coefficients c_j when
/// `hermite` is given.
pub fn window_weights(nodes: &[f64], weights: &mut [f64], mut hermite: Option<&mut [f64]>) {
    for (j, w) in weights.iter_mut().enumerate() {
        let t_j = nodes.get(j).copied().unwrap_or(0.0);
        let mut product = 1.0;
        let mut sum = 0.0;
        for (m, t_m) in nodes.iter().enumerate() {
            if m != j {
                product *= t_j - t_m;
                if hermite.is_some() {
                    sum += 1.0 / (t_j - t_m);
                }
            }
        }
        *w = 1.0 / product;
        if let Some(c) = hermite.as_deref_mut().and_then(|c| c.get_mut(j)) {
            *c = sum;
        }
    }
}

/// L_j(t) and L_j'(t) for every node of a window (at most [`MAX_POINTS`]).
pub fn lagrange_basis(
    nodes: &[f64],
    weights: &[f64],
    t: f64,
    values: &mut [f64; MAX_POINTS],
    derivatives: &mut [f64; MAX_POINTS],
) {
    let count = nodes.len().min(MAX_POINTS);
    // prefix[j] = prod_{m < j} (t - t_m) and its derivative, built left to right.
    let mut prefix = [0.0; MAX_POINTS];
    let mut prefix_d = [0.0; MAX_POINTS];
    let (mut p, mut pd) = (1.0, 0.0);
    for j in 0..count {
        prefix[j] = p;
        prefix_d[j] = pd;
        let factor = t - nodes[j];
        pd = pd * factor + p;
        p *= factor;
    }
    let (mut s, mut sd) = (1.0, 0.0);
    for j in (0..count).rev() {
        values[j] = weights[j] * prefix[j] * s;
        derivatives[j] = weights[j] * (prefix_d[j] * s + prefix[j] * sd);
        let factor = t - nodes[j];
        sd = sd * factor + s;
        s *= factor;
    }
}

/// Lagrange interpolation of 3-vectors: value and derivative at `t`.
pub fn lagrange(
    nodes: &[f64],
    weights: &[f64],
    samples: &[[f64; 3]],
    t: f64,
) -> ([f64; 3], [f64; 3]) {
    let mut values = [0.0; MAX_POINTS];
    let mut derivatives = [0.0; MAX_POINTS];
    lagrange_basis(nodes, weights, t, &mut values, &mut derivatives);
    let mut value = [0.0; 3];
    let mut rate = [0.0; 3];
    for ((sample, l), dl) in samples.iter().zip(values).zip(derivatives) {
        for axis in 0..3 {
            value[axis] += l * sample[axis];
            rate[axis] += dl * sample[axis];
        }
    }
    (value, rate)
}

/// Hermite interpolation of 3-vectors from values and derivatives: value and derivative at `t`.
pub fn hermite(
    nodes: &[f64],
    weights: &[f64],
    coefficients: &[f64],
    samples: &[[f64; 3]],
    sample_rates: &[[f64; 3]],
    t: f64,
) -> ([f64; 3], [f64; 3]) {
    let mut values = [0.0; MAX_POINTS];
    let mut derivatives = [0.0; MAX_POINTS];
    lagrange_basis(nodes, weights, t, &mut values, &mut derivatives);
    let mut value = [0.0; 3];
    let mut rate = [0.0; 3];
    let terms = nodes
        .iter()
        .zip(coefficients)
        .zip(values.iter().zip(derivatives.iter()))
        .zip(samples.iter().zip(sample_rates));
    for (((t_j, c_j), (l, dl)), (y, dy)) in terms {
        let offset = t - t_j;
        let l2 = l * l;
        let dl2 = 2.0 * l * dl;
        let a = 1.0 - 2.0 * c_j * offset;
        let h_value = a * l2;
        let h_rate = -2.0 * c_j * l2 + a * dl2;
        let k_value = offset * l2;
        let k_rate = l2 + offset * dl2;
        for axis in 0..3 {
            value[axis] += h_value * y[axis] + k_value * dy[axis];
            rate[axis] += h_rate * y[axis] + k_rate * dy[axis];
        }
    }
    (value, rate)
}
