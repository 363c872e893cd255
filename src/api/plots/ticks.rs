//! Axis ranges and tick positions: a "nice" step of 1, 2 or 5 times a power of ten (common
//! practice in plotting), a range that holds the data, and labels with as many decimals as the
//! step needs.

/// A step of 1, 2 or 5 x 10^k close to `span / target` (at least `span / target`).
pub fn nice_step(span: f64, target: usize) -> f64 {
    let raw = (span / target.max(1) as f64).abs();
    if !raw.is_finite() || raw == 0.0 {
        return 1.0;
    }
    let power = 10f64.powf(raw.log10().floor());
    let fraction = raw / power;
    let nice = if fraction <= 1.0 {
        1.0
    } else if fraction <= 2.0 {
        2.0
    } else if fraction <= 5.0 {
        5.0
    } else {
        10.0
    };
    nice * power
}

/// An axis range holding [`min`, `max`] with bounds on multiples of a nice step (about five
/// intervals), and that step. A flat range is widened to one step each side.
pub fn nice_range(min: f64, max: f64) -> (f64, f64, f64) {
    let (min, max) = if min.is_finite() && max.is_finite() {
        (min, max)
    } else {
        (0.0, 1.0)
    };
    if max - min <= f64::EPSILON * min.abs().max(max.abs()).max(f64::MIN_POSITIVE) {
        let step = nice_step(min.abs().max(1e-300), 5);
        let step = if min == 0.0 { 1.0 } else { step };
        return (
            (min / step).floor() * step - step,
            (max / step).ceil() * step + step,
            step,
        );
    }
    let step = nice_step(max - min, 5);
    let low = (min / step).floor() * step;
    let high = (max / step).ceil() * step;
    (low, high, step)
}

/// Tick values from `low` to `high` (inclusive, within rounding) every `step`.
pub fn ticks(low: f64, high: f64, step: f64) -> Vec<f64> {
    let usable = step > 0.0 && high >= low;
    if !usable {
        return vec![low];
    }
    let first = (low / step - 1e-9).ceil() as i64;
    let last = (high / step + 1e-9).floor() as i64;
    (first..=last.min(first + 200))
        .map(|k| {
            let value = k as f64 * step;
            if value.abs() < step * 1e-9 {
                0.0
            } else {
                value
            }
        })
        .collect()
}

/// `value` written with the decimals `step` needs (a step of 0.05 gives two).
pub fn tick_label(value: f64, step: f64) -> String {
    let decimals = if step >= 1.0 {
        0
    } else {
        (-step.log10()).ceil().clamp(0.0, 12.0) as usize
    };
    let text = format!("{value:.decimals$}");
    if text
        .trim_start_matches('-')
        .chars()
        .all(|c| c == '0' || c == '.')
    {
        text.trim_start_matches('-').to_string()
    } else {
        text
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn nice_ranges_hold_the_data() {
        // Common practice: steps 1-2-5 x 10^k, bounds on multiples of the step.
        assert_eq!(nice_step(10.0, 5), 2.0);
        assert_eq!(nice_step(0.7, 5), 0.2);
        let (low, high, step) = nice_range(-7.3, 45.9);
        assert_eq!((low, high, step), (-20.0, 60.0, 20.0));
        let (low, high, step) = nice_range(32.184, 32.184);
        assert!(low < 32.184 && high > 32.184 && step > 0.0);
        assert_eq!(ticks(0.0, 1.0, 0.2).len(), 6);
        assert_eq!(tick_label(0.30000000000000004, 0.1), "0.3");
        assert_eq!(tick_label(-0.0, 0.5), "0.0");
        assert_eq!(tick_label(12000.0, 2000.0), "12000");
    }
}
