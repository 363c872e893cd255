//! Numbers written for people: the shortest decimal that reads back to the same binary64,
//! in exponent form when fixed notation would be long.
//!
//! Problem messages quote the value that was refused; `format!("{x}")` writes 5e-324 with
//! 323 zeros. Every message that prints a float goes through [`readable`].

/// The shortest round-trip decimal of `x` (Rust's `Display`/`LowerExp` digits), in fixed
/// notation for 1e-4 <= |x| < 1e15 and for zero, otherwise in exponent form (`5e-324`,
/// `1e300`, `-2.5e-7`); `NaN`, `inf` and `-inf` as Rust writes them.
pub fn readable(x: f64) -> String {
    let magnitude = x.abs();
    if x == 0.0 || !x.is_finite() || (1e-4..1e15).contains(&magnitude) {
        format!("{x}")
    } else {
        format!("{x:e}")
    }
}

/// The components of a vector, each [`readable`], as `[x, y, z]`.
pub fn readable_vector(values: &[f64]) -> String {
    let parts: Vec<String> = values.iter().map(|&v| readable(v)).collect();
    format!("[{}]", parts.join(", "))
}

#[cfg(test)]
mod tests {
    use super::{readable, readable_vector};

    #[test]
    fn extremes_read_short_and_round_trip() {
        assert_eq!(readable(5e-324), "5e-324");
        assert_eq!(readable(1e300), "1e300");
        assert_eq!(readable(-2.5e-7), "-2.5e-7");
        assert_eq!(readable(1e15), "1e15");
        assert_eq!(readable(999_999_999_999_999.0), "999999999999999");
        assert_eq!(readable(60.0), "60");
        assert_eq!(readable(0.1), "0.1");
        assert_eq!(readable(1e-4), "0.0001");
        assert_eq!(readable(0.0), "0");
        assert_eq!(readable(f64::NAN), "NaN");
        assert_eq!(readable(f64::NEG_INFINITY), "-inf");
        assert_eq!(
            readable_vector(&[1.0, 5e-324, f64::MAX]),
            "[1, 5e-324, 1.7976931348623157e308]"
        );
        for x in [
            5e-324,
            1e-300,
            0.1 + 0.2,
            123.456,
            6.02214076e23,
            f64::MAX,
            -1e-5,
        ] {
            assert_eq!(readable(x).parse::<f64>().ok(), Some(x), "{x}");
        }
    }
}
