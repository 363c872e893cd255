//! Input strategies shared by the parser property tests: arbitrary text and near-valid text
//! made by mutating a valid document.
//!
//! A new text parser (e.g. an ephemeris reader) gets its robustness property from
//! [`arbitrary_text`] and [`near_valid`] over a few valid samples; see `parsers_proptest.rs`.
#![allow(dead_code)]

use proptest::prelude::*;

/// One edit of a text, applied at a position given as a fraction of its length.
#[derive(Debug, Clone)]
pub enum Edit {
    /// Remove the character at the position.
    Delete(usize),
    /// Insert a character before the position.
    Insert(usize, char),
    /// Replace the character at the position.
    Replace(usize, char),
    /// Repeat the slice of `len` characters starting at the position.
    Duplicate(usize, usize),
    /// Cut the text at the position.
    Truncate(usize),
    /// Remove the whole line that holds the position.
    DeleteLine(usize),
    /// Swap the line that holds the position with the next one.
    SwapLines(usize),
    /// Replace the run of digits around the position by another number.
    ReplaceNumber(usize, String),
}

/// Characters that matter to the parsers under test: digits, signs, separators, letters of
/// the formats, whitespace, and a few multi-byte characters to test UTF-8 boundaries.
pub fn interesting_char() -> impl Strategy<Value = char> {
    prop_oneof![
        6 => proptest::char::range('0', '9'),
        4 => prop::sample::select(vec![
            '-', '+', '.', ':', 'T', 'Z', ' ', '\t', '\n', '\r', '#', '@', '$', 'h', 'e', 'E',
            ',', '/', '\0', 'é', 'ß', '\u{2212}', '\u{FEFF}', '٣', '𝟘',
        ]),
        1 => any::<char>(),
    ]
}

/// Numbers as text, chosen to sit on the edges of the parsers' ranges.
pub fn interesting_number() -> impl Strategy<Value = String> {
    prop_oneof![
        any::<u8>().prop_map(|n| n.to_string()),
        any::<i64>().prop_map(|n| n.to_string()),
        any::<u128>().prop_map(|n| n.to_string()),
        prop::sample::select(vec![
            "0",
            "-0",
            "00",
            "60",
            "61",
            "99",
            "366",
            "9999",
            "10000",
            "1000000000000000",
            "1000000000000001",
            "99999999999999999999999999999999999999999",
            "170141183460469231731687303715884105727",
            "-170141183460469231731687303715884105728",
            "4294967296",
            "604800",
            "0.5",
            "1e5",
            "",
            "-",
            ".",
        ])
        .prop_map(str::to_string),
    ]
}

fn edit() -> impl Strategy<Value = Edit> {
    let position = any::<usize>();
    prop_oneof![
        position.prop_map(Edit::Delete),
        (position, interesting_char()).prop_map(|(p, c)| Edit::Insert(p, c)),
        (position, interesting_char()).prop_map(|(p, c)| Edit::Replace(p, c)),
        (position, 1usize..40).prop_map(|(p, n)| Edit::Duplicate(p, n)),
        position.prop_map(Edit::Truncate),
        position.prop_map(Edit::DeleteLine),
        position.prop_map(Edit::SwapLines),
        (position, interesting_number()).prop_map(|(p, n)| Edit::ReplaceNumber(p, n)),
    ]
}

/// Applies one edit; positions wrap around the text's length, so every edit applies.
pub fn apply(text: &str, edit: &Edit) -> String {
    let mut chars: Vec<char> = text.chars().collect();
    let at = |p: usize, len: usize| if len == 0 { 0 } else { p % len };
    match edit {
        Edit::Delete(p) => {
            if !chars.is_empty() {
                let i = at(*p, chars.len());
                chars.remove(i);
            }
        }
        Edit::Insert(p, c) => {
            let i = at(*p, chars.len() + 1);
            chars.insert(i, *c);
        }
        Edit::Replace(p, c) => {
            if !chars.is_empty() {
                let i = at(*p, chars.len());
                chars[i] = *c;
            }
        }
        Edit::Duplicate(p, n) => {
            if !chars.is_empty() {
                let i = at(*p, chars.len());
                let end = (i + n).min(chars.len());
                let piece: Vec<char> = chars[i..end].to_vec();
                chars.splice(end..end, piece);
            }
        }
        Edit::Truncate(p) => {
            let i = at(*p, chars.len() + 1);
            chars.truncate(i);
        }
        Edit::DeleteLine(p) | Edit::SwapLines(p) => {
            let mut lines: Vec<&str> = text.split('\n').collect();
            let i = at(*p, lines.len());
            if matches!(edit, Edit::DeleteLine(_)) {
                lines.remove(i);
            } else if i + 1 < lines.len() {
                lines.swap(i, i + 1);
            }
            return lines.join("\n");
        }
        Edit::ReplaceNumber(p, number) => {
            if !chars.is_empty() {
                let i = at(*p, chars.len());
                let mut start = i;
                while start > 0 && chars[start - 1].is_ascii_digit() {
                    start -= 1;
                }
                let mut end = i;
                while end < chars.len() && chars[end].is_ascii_digit() {
                    end += 1;
                }
                chars.splice(start..end, number.chars());
            }
        }
    }
    chars.into_iter().collect()
}

/// Any text: arbitrary Unicode, text over the parsers' own alphabet, or arbitrary bytes read
/// lossily as UTF-8.
pub fn arbitrary_text() -> impl Strategy<Value = String> {
    prop_oneof![
        any::<String>(),
        prop::collection::vec(interesting_char(), 0..64).prop_map(|v| v.into_iter().collect()),
        prop::collection::vec(any::<u8>(), 0..128)
            .prop_map(|bytes| String::from_utf8_lossy(&bytes).into_owned()),
    ]
}

/// A valid sample with one to eight edits applied.
pub fn near_valid(samples: Vec<String>) -> impl Strategy<Value = String> {
    (
        prop::sample::select(samples),
        prop::collection::vec(edit(), 1..8),
    )
        .prop_map(|(sample, edits)| edits.iter().fold(sample, |text, e| apply(&text, e)))
}

/// A proptest configuration with `cases` cases, overridable by `PROPTEST_CASES`.
pub fn config(cases: u32) -> ProptestConfig {
    let cases = std::env::var("PROPTEST_CASES")
        .ok()
        .and_then(|v| v.parse().ok())
        .unwrap_or(cases);
    ProptestConfig {
        cases,
        failure_persistence: None,
        ..ProptestConfig::default()
    }
}
