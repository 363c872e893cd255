//! Gauss-Legendre quadrature and compensated summation.

/// Most nodes used on one interval.
pub const MAX_NODES: usize = 8;

/// Most subintervals one interval between output epochs is split into. It bounds the work of
/// one interval to `MAX_PIECES * MAX_NODES` evaluations, whatever the input.
pub const MAX_PIECES: usize = 64;

/// Gauss-Legendre rules with 1..=[`MAX_NODES`] nodes on [-1, 1].
#[derive(Debug, Clone)]
pub struct GaussLegendre {
    /// `rules[m - 1]` holds the (node, weight) pairs of the m-node rule.
    rules: Vec<Vec<(f64, f64)>>,
    /// `error_constants[m - 1]` = (m!)^4 / ((2m + 1) ((2m)!)^3).
    error_constants: Vec<f64>,
}

impl GaussLegendre {
    /// Builds the rules: nodes are the roots of the Legendre polynomial P_m found by Newton's
    /// method from the Chebyshev-like first guess cos(pi (i - 1/4) / (m + 1/2)), weights
    /// 2 / ((1 - x^2) P_m'(x)^2) (Abramowitz & Stegun 25.4.29; Press et al., Numerical Recipes,
    /// 3rd ed., section 4.6).
    pub fn new() -> Self {
        let mut rules = Vec::with_capacity(MAX_NODES);
        let mut error_constants = Vec::with_capacity(MAX_NODES);
        for m in 1..=MAX_NODES {
            let mut rule = Vec::with_capacity(m);
            for i in 1..=m {
                let mut x = (std::f64::consts::PI * (i as f64 - 0.25) / (m as f64 + 0.5)).cos();
                let mut derivative = 1.0;
                for _ in 0..100 {
                    let (p, dp) = legendre(m, x);
                    derivative = dp;
                    let step = p / dp;
                    x -= step;
                    if step.abs() < 1e-17 {
                        break;
                    }
                }
                let (_, dp) = legendre(m, x);
                if dp.is_finite() {
                    derivative = dp;
                }
                rule.push((x, 2.0 / ((1.0 - x * x) * derivative * derivative)));
            }
            rules.push(rule);
            error_constants.push(error_constant(m));
        }
        Self {
            rules,
            error_constants,
        }
    }

    /// The (node, weight) pairs of the m-node rule (empty outside 1..=MAX_NODES).
    pub fn rule(&self, nodes: usize) -> &[(f64, f64)] {
        nodes
            .checked_sub(1)
            .and_then(|i| self.rules.get(i))
            .map_or(&[], Vec::as_slice)
    }

    /// Nodes and subintervals for an interval whose length times the integrand's angular
    /// frequency is `x` (radians): the fewest nodes m >= 2 with
    /// (m!)^4 / ((2m+1)((2m)!)^3) * x^(2m) <= `tolerance` (the error term of an m-node rule,
    /// Abramowitz & Stegun 25.4.30, for an integrand varying like sin(omega t)), splitting the
    /// interval in halves until [`MAX_NODES`] suffice. `None` when more than [`MAX_PIECES`]
    /// halves would be needed: the samples are then too far apart for the motion (more than
    /// about 250 rad of orbit between two samples), and no interpolation of them is meaningful.
    pub fn plan(&self, x: f64, tolerance: f64) -> Option<(usize, usize)> {
        let mut pieces = 1usize;
        while pieces <= MAX_PIECES {
            let piece = x / pieces as f64;
            for m in 2..=MAX_NODES {
                let constant = self.error_constants.get(m - 1).copied().unwrap_or(0.0);
                if constant * piece.powi(2 * m as i32) <= tolerance {
                    return Some((m, pieces));
                }
            }
            pieces *= 2;
        }
        None
    }
}

impl Default for GaussLegendre {
    fn default() -> Self {
        Self::new()
    }
}

/// P_m(x) and P_m'(x) by the three-term recurrence (Abramowitz & Stegun 22.7.10, 22.8.5).
fn legendre(m: usize, x: f64) -> (f64, f64) {
    let (mut p0, mut p1) = (1.0, x);
    if m == 0 {
        return (1.0, 0.0);
    }
    for k in 2..=m {
        let k = k as f64;
        let p2 = ((2.0 * k - 1.0) * x * p1 - (k - 1.0) * p0) / k;
        p0 = p1;
        p1 = p2;
    }
    let derivative = m as f64 * (x * p1 - p0) / (x * x - 1.0);
    (p1, derivative)
}

/// (m!)^4 / ((2m + 1) ((2m)!)^3), the error constant of the m-node rule on an interval of
/// unit length (Abramowitz & Stegun 25.4.30).
fn error_constant(m: usize) -> f64 {
    let factorial = |n: usize| (1..=n).map(|k| k as f64).product::<f64>();
    factorial(m).powi(4) / ((2 * m + 1) as f64 * factorial(2 * m).powi(3))
}

/// Neumaier's compensated sum (Neumaier, ZAMM 54 (1974) 39; the improved Kahan-Babuska sum).
#[derive(Debug, Clone, Copy, Default)]
pub struct CompensatedSum {
    sum: f64,
    compensation: f64,
}

impl CompensatedSum {
    /// Adds one term.
    pub fn add(&mut self, term: f64) {
        let total = self.sum + term;
        if self.sum.abs() >= term.abs() {
            self.compensation += (self.sum - total) + term;
        } else {
            self.compensation += (term - total) + self.sum;
        }
        self.sum = total;
    }

    /// The compensated value.
    pub fn value(&self) -> f64 {
        self.sum + self.compensation
    }
}

#[cfg(test)]
mod tests {

    #[test]
    fn plan_is_bounded() {
        // A fuzzed SP3 file once asked for 2^20 subintervals per interval (minutes of work);
        // the plan now refuses beyond MAX_PIECES (regression: tests/regressions/).
        let rules = GaussLegendre::new();
        assert_eq!(rules.plan(1e-6, 1e-13).map(|(_, pieces)| pieces), Some(1));
        assert!(rules.plan(1e6, 1e-13).is_none());
        assert!(rules.plan(f64::INFINITY, 1e-13).is_none());
        let (nodes, pieces) = rules.plan(100.0, 1e-13).unwrap_or((0, 0));
        assert!(nodes <= MAX_NODES && (1..=MAX_PIECES).contains(&pieces));
    }

    use super::*;

    #[test]
    fn rules_integrate_polynomials_exactly() {
        let rules = GaussLegendre::new();
        for m in 1..=MAX_NODES {
            let rule = rules.rule(m);
            // An m-node Gauss-Legendre rule is exact for degree 2m - 1 (Abramowitz & Stegun
            // 25.4.29): the integral of x^k over [-1, 1] is 2/(k+1) for even k, 0 for odd k.
            for k in 0..2 * m {
                let sum: f64 = rule.iter().map(|(x, w)| w * x.powi(k as i32)).sum();
                let exact = if k % 2 == 0 {
                    2.0 / (k as f64 + 1.0)
                } else {
                    0.0
                };
                assert!((sum - exact).abs() < 1e-14, "m={m} k={k}: {sum} vs {exact}");
            }
        }
        // Two-node nodes are +-1/sqrt(3) (Abramowitz & Stegun table 25.4).
        let two = rules.rule(2);
        assert!((two[0].0.abs() - 3f64.sqrt().recip()).abs() < 1e-15);
    }

    #[test]
    fn compensated_sum_keeps_small_terms() {
        // 1 + 1e-16 repeated: a plain sum loses every small term (common practice example).
        let mut sum = CompensatedSum::default();
        sum.add(1.0);
        for _ in 0..10_000 {
            sum.add(1e-16);
        }
        assert!((sum.value() - (1.0 + 1e-12)).abs() < 1e-16);
    }
}
