//! Writing exact decimals fast: the same text as long division one digit at a time, computed
//! in blocks of digits with 64-bit integer arithmetic and written two digits per step from a
//! table (the technique of common integer printers such as `itoa`).
//!
//! An attosecond count is split once into whole seconds and attoseconds (`u64` each); a ratio
//! over a day whose length is a whole number of seconds (every day but the UTC days of
//! 1961-1971, whose lengths include a drift) is then found by two 12-digit long-division steps
//! in `u64`. Everything else falls back to the digit-at-a-time division of `i128`.

/// "00" "01" ... "99": two ASCII digits per value below 100.
const DIGIT_PAIRS: &[u8; 200] = b"\
0001020304050607080910111213141516171819\
2021222324252627282930313233343536373839\
4041424344454647484950515253545556575859\
6061626364656667686970717273747576777879\
8081828384858687888990919293949596979899";

/// 10^18, attoseconds per second.
pub const ATTOS_PER_SECOND_U64: u64 = 1_000_000_000_000_000_000;
/// 10^12: one long-division step of a day fraction.
const TEN_POW_12: u64 = 1_000_000_000_000;
/// 10^6.
const TEN_POW_6: u64 = 1_000_000;

/// Fills `slot` (its whole length) with the last `slot.len()` decimal digits of `value`,
/// zero-padded on the left.
fn fill_fixed(slot: &mut [u8], mut value: u64) {
    let mut end = slot.len();
    while end >= 2 {
        let pair = (value % 100) as usize * 2;
        value /= 100;
        slot[end - 2] = DIGIT_PAIRS[pair];
        slot[end - 1] = DIGIT_PAIRS[pair + 1];
        end -= 2;
    }
    if end == 1 {
        slot[0] = b'0' + (value % 10) as u8;
    }
}

/// Appends `value` as exactly `width` digits (zero-padded; `value < 10^width`, `width <= 20`).
pub fn push_fixed(out: &mut Vec<u8>, value: u64, width: usize) {
    let mut digits = [0u8; 20];
    let slot = &mut digits[..width.min(20)];
    fill_fixed(slot, value);
    out.extend_from_slice(slot);
}

/// Number of decimal digits of `value` (1 for 0).
fn digit_count(value: u64) -> usize {
    let mut count = 1;
    let mut limit = 10u64;
    while count < 20 && value >= limit {
        count += 1;
        limit = limit.wrapping_mul(10);
    }
    count
}

/// Appends `value` in decimal, without padding.
pub fn push_u64(out: &mut Vec<u8>, value: u64) {
    push_fixed(out, value, digit_count(value));
}

/// Appends `value` in decimal, without padding.
pub fn push_u128(out: &mut Vec<u8>, value: u128) {
    const TEN_POW_19: u128 = 10_000_000_000_000_000_000;
    match u64::try_from(value) {
        Ok(small) => push_u64(out, small),
        Err(_) => {
            push_u128(out, value / TEN_POW_19);
            push_fixed(out, (value % TEN_POW_19) as u64, 19);
        }
    }
}

/// Appends `digits` (ASCII) without its trailing zeros, keeping at least the first digit.
fn push_trimmed(out: &mut Vec<u8>, digits: &[u8]) {
    let mut end = digits.len();
    while end > 1 && digits[end - 1] == b'0' {
        end -= 1;
    }
    out.extend_from_slice(&digits[..end]);
}

/// Appends attoseconds of a second (`attos < 10^18`) as `.` and 18 decimals with trailing zeros
/// trimmed (at least one kept): `.5`, `.000000000000000001`, `.0`.
pub fn push_attos_fraction(out: &mut Vec<u8>, attos: u64) {
    let mut digits = [0u8; 18];
    fill_fixed(&mut digits, attos);
    out.push(b'.');
    push_trimmed(out, &digits);
}

/// Splits a signed attosecond count into its sign, whole seconds and attoseconds of the
/// magnitude.
pub fn split_seconds(attos: i128) -> (bool, u128, u64) {
    let magnitude = attos.unsigned_abs();
    let second = ATTOS_PER_SECOND_U64 as u128;
    (attos < 0, magnitude / second, (magnitude % second) as u64)
}

/// Appends an attosecond count as exact seconds; the same text as
/// `format_ratio(attos, 10^18, 18)`.
pub fn push_attos_as_seconds(out: &mut Vec<u8>, attos: i128) {
    let (negative, whole, fraction) = split_seconds(attos);
    if negative && (whole != 0 || fraction != 0) {
        out.push(b'-');
    }
    push_u128(out, whole);
    push_attos_fraction(out, fraction);
}

/// The 24-decimal fraction of `(seconds * 10^18 + attos) / (day_s * 10^18)`, rounded half up,
/// as two 12-digit blocks, and whether rounding carried into the whole part (the blocks are
/// then zero). Needs `seconds * 10^18 + attos < day_s * 10^18`, `attos < 10^18` and
/// `0 < day_s < 10^6`.
///
/// Long division in blocks of 10^12: with `N` the numerator in attoseconds and
/// `D = day_s * 10^18`, the first block is `floor(N / (day_s * 10^6))`, which equals
/// `floor(floor(N / 10^6) / day_s)`; its remainder scaled back, `r * 10^6 + N mod 10^6`, is
/// below `day_s * 10^6`, so the second block and the rounding remainder stay inside `u64`.
pub fn day_fraction_e24(seconds: u64, attos: u64, day_s: u64) -> ([u64; 2], bool) {
    let head = seconds * TEN_POW_12 + attos / TEN_POW_6;
    let first = head / day_s;
    let rest = (head % day_s) * TEN_POW_6 + attos % TEN_POW_6;
    let scaled = rest * TEN_POW_6;
    let mut second = scaled / day_s;
    let remainder = scaled % day_s;
    let mut first = first;
    if 2 * remainder >= day_s {
        second += 1;
        if second == TEN_POW_12 {
            second = 0;
            first += 1;
        }
    }
    if first == TEN_POW_12 {
        ([0, 0], true)
    } else {
        ([first, second], false)
    }
}

/// Appends `.` and the 24 decimals of two 12-digit blocks, trailing zeros trimmed.
pub fn push_fraction_e24(out: &mut Vec<u8>, blocks: [u64; 2]) {
    let mut digits = [0u8; 24];
    fill_fixed(&mut digits[..12], blocks[0]);
    fill_fixed(&mut digits[12..], blocks[1]);
    out.push(b'.');
    push_trimmed(out, &digits);
}

/// `numerator / denominator` with `digits` decimals by long division one digit at a time,
/// rounded half away from zero, trailing zeros trimmed (at least one decimal kept). The general
/// path, for any denominator and number of digits.
pub fn push_ratio_by_digits(out: &mut Vec<u8>, numerator: i128, denominator: i128, digits: u32) {
    let negative = numerator < 0;
    let magnitude = numerator.unsigned_abs();
    let denominator = denominator.unsigned_abs().max(1);
    let mut whole = magnitude / denominator;
    let mut remainder = magnitude % denominator;
    let mut fraction: Vec<u8> = Vec::with_capacity(digits as usize);
    for _ in 0..digits {
        remainder *= 10;
        fraction.push(b'0' + (remainder / denominator) as u8);
        remainder %= denominator;
    }
    if remainder * 2 >= denominator {
        let mut carry = true;
        for digit in fraction.iter_mut().rev() {
            if *digit == b'9' {
                *digit = b'0';
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
    while fraction.len() > 1 && fraction.last() == Some(&b'0') {
        fraction.pop();
    }
    if negative && (whole != 0 || fraction.iter().any(|&d| d != b'0')) {
        out.push(b'-');
    }
    push_u128(out, whole);
    if !fraction.is_empty() {
        out.push(b'.');
        out.extend_from_slice(&fraction);
    }
}

/// `numerator / denominator` as [`push_ratio_by_digits`] writes it, through the block paths
/// where they apply (seconds: `10^18` and 18 digits; day fractions: a whole number of seconds
/// and 24 digits).
pub fn push_ratio(out: &mut Vec<u8>, numerator: i128, denominator: i128, digits: u32) {
    let second = i128::from(ATTOS_PER_SECOND_U64);
    if denominator == second && digits == 18 {
        return push_attos_as_seconds(out, numerator);
    }
    let day_s = (denominator % second == 0)
        .then(|| denominator / second)
        .and_then(|s| u64::try_from(s).ok())
        .filter(|s| (1..1_000_000).contains(s));
    match day_s {
        Some(day_s) if digits == 24 => {
            let negative = numerator < 0;
            let magnitude = numerator.unsigned_abs();
            let denominator = denominator.unsigned_abs();
            let mut whole = magnitude / denominator;
            // The remainder is below `day_s * 10^18`, so its whole seconds fit in `u64`.
            let (_, seconds, attos) = split_seconds((magnitude % denominator) as i128);
            let seconds = seconds as u64;
            let (blocks, carry) = day_fraction_e24(seconds, attos, day_s);
            whole += u128::from(carry);
            if negative && (whole != 0 || blocks != [0, 0]) {
                out.push(b'-');
            }
            push_u128(out, whole);
            push_fraction_e24(out, blocks);
        }
        _ => push_ratio_by_digits(out, numerator, denominator, digits),
    }
}

/// ASCII bytes as a `String` (every writer here writes ASCII only).
pub fn ascii_string(bytes: Vec<u8>) -> String {
    String::from_utf8(bytes).unwrap_or_default()
}
