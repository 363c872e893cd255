//! The block writers against the digit-at-a-time long division they replace (kept here,
//! unchanged, as the reference), on edge values and many pseudo-random ones.

use super::write::{day_fraction_e24, push_ratio, push_u128};
use super::{format_attos_as_seconds, format_ratio};

/// The previous writer, unchanged: long division one digit at a time in `u128`.
fn reference_format_ratio(numerator: i128, denominator: i128, digits: u32) -> String {
    let negative = numerator < 0;
    let magnitude = numerator.unsigned_abs();
    let denominator = denominator.unsigned_abs().max(1);
    let mut whole = magnitude / denominator;
    let mut remainder = magnitude % denominator;
    let mut fraction: Vec<u8> = Vec::with_capacity(digits as usize);
    for _ in 0..digits {
        remainder *= 10;
        fraction.push((remainder / denominator) as u8);
        remainder %= denominator;
    }
    if remainder * 2 >= denominator {
        let mut carry = true;
        for digit in fraction.iter_mut().rev() {
            if *digit == 9 {
                *digit = 0;
            } else {
                *digit += 1;
                carry = false;
                break;
            }
        }
        if carry {
            whole += 1;
        }
    }
    while fraction.len() > 1 && fraction.last() == Some(&0) {
        fraction.pop();
    }
    let fraction_text: String = fraction.iter().map(|d| char::from(b'0' + d)).collect();
    let sign = if negative && (whole != 0 || fraction.iter().any(|&d| d != 0)) {
        "-"
    } else {
        ""
    };
    if fraction_text.is_empty() {
        format!("{sign}{whole}")
    } else {
        format!("{sign}{whole}.{fraction_text}")
    }
}

/// SplitMix64 (Steele, Lea and Flood, OOPSLA 2014): deterministic test inputs.
pub(crate) struct SplitMix(pub u64);

impl SplitMix {
    pub(crate) fn next(&mut self) -> u64 {
        self.0 = self.0.wrapping_add(0x9E37_79B9_7F4A_7C15);
        let mut z = self.0;
        z = (z ^ (z >> 30)).wrapping_mul(0xBF58_476D_1CE4_E5B9);
        z = (z ^ (z >> 27)).wrapping_mul(0x94D0_49BB_1331_11EB);
        z ^ (z >> 31)
    }
    pub(crate) fn below(&mut self, bound: u128) -> u128 {
        let wide = (u128::from(self.next()) << 64) | u128::from(self.next());
        wide % bound.max(1)
    }
}

const SECOND: i128 = 1_000_000_000_000_000_000;

#[test]
fn ratios_match_the_digit_at_a_time_division() {
    let mut random = SplitMix(20_260_314);
    let mut denominators: Vec<i128> = vec![SECOND, 86_400 * SECOND, 86_401 * SECOND];
    denominators.extend([172_800 * SECOND, 172_802 * SECOND, 86_399 * SECOND, 3, 7, 1]);
    denominators.extend([86_400 * SECOND + 1, 172_801 * SECOND - 3, 999_999 * SECOND]);
    for _ in 0..40 {
        denominators.push(random.below(1 << 76) as i128 + 1);
        denominators.push((random.below(999_999) as i128 + 1) * SECOND);
    }
    for &denominator in &denominators {
        let mut numerators = vec![0, 1, -1, denominator, -denominator, denominator - 1];
        numerators.extend([denominator / 2, denominator / 2 + 1, -(denominator / 2)]);
        numerators.extend([
            3 * denominator - 1,
            2_973_483 * denominator + denominator - 1,
        ]);
        for _ in 0..300 {
            let value = random.below(4_000_000 * denominator.unsigned_abs()) as i128;
            numerators.push(if random.next().is_multiple_of(2) {
                value
            } else {
                -value
            });
        }
        for &numerator in &numerators {
            for digits in [24, 18, 12, 0, 1] {
                let mut out = Vec::new();
                push_ratio(&mut out, numerator, denominator, digits);
                let expected = reference_format_ratio(numerator, denominator, digits);
                assert_eq!(
                    String::from_utf8_lossy(&out),
                    expected,
                    "{numerator} / {denominator}, {digits} digits"
                );
                assert_eq!(format_ratio(numerator, denominator, digits), expected);
            }
        }
    }
}

#[test]
fn seconds_match_the_digit_at_a_time_division() {
    let mut random = SplitMix(7);
    let mut counts = vec![
        0,
        1,
        -1,
        SECOND,
        -SECOND,
        SECOND - 1,
        -(SECOND - 1),
        i128::MAX / 4,
    ];
    counts.extend([
        -(i128::MAX / 4),
        999_999_999_999_999_999_999_999,
        10 * SECOND,
    ]);
    for _ in 0..20_000 {
        let bits = random.next() % 110 + 1;
        let value = random.below(1 << bits) as i128;
        counts.push(if random.next().is_multiple_of(2) {
            value
        } else {
            -value
        });
    }
    for attos in counts {
        assert_eq!(
            format_attos_as_seconds(attos),
            reference_format_ratio(attos, SECOND, 18),
            "{attos}"
        );
    }
}

#[test]
fn day_fraction_blocks_round_like_long_division() {
    // One attosecond before midnight is 1.157e-23 day before it: 24 digits still show it.
    assert_eq!(
        day_fraction_e24(86_399, SECOND as u64 - 1, 86_400),
        ([999_999_999_999, 999_999_999_988], false)
    );
    assert_eq!(day_fraction_e24(0, 0, 86_400), ([0, 0], false));
    assert_eq!(
        day_fraction_e24(43_200, 0, 86_400),
        ([500_000_000_000, 0], false)
    );
    let mut out = Vec::new();
    push_u128(&mut out, u128::MAX);
    assert_eq!(String::from_utf8_lossy(&out), u128::MAX.to_string());
}
