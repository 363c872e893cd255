//! Reading a NAIF DAF file holding SPK segments from its bytes (no file I/O here).
//!
//! The layout follows NAIF's "DAF Required Reading" and "SPK Required Reading" (public
//! documents of the NAIF toolkit): 1024-byte records; record 1 is the file record (`DAF/SPK `,
//! ND, NI, the internal name, FWARD, BWARD, FREE, the binary format `LTL-IEEE` or `BIG-IEEE`,
//! the FTP test string); summary records form a doubly linked list starting at record FWARD,
//! each holding NEXT, PREV, NSUM and NSUM summaries of ND doubles and NI 32-bit integers; an SPK
//! summary has ND = 2 (start and end, TDB seconds since J2000) and NI = 6 (target, centre,
//! frame, data type, first and last word address, 1-based, 8-byte words).

use std::fmt;

/// Bytes in one DAF record.
pub const RECORD_BYTES: usize = 1024;
const FTP_TEST: &[u8] = b"FTPSTR:\r:\n:\r\n:\r\x00:\x81:\x10\xce:ENDFTP";
/// Most summary records followed before a kernel is called malformed (a loop guard).
const MAX_SUMMARY_RECORDS: usize = 100_000;

/// Why a kernel cannot be read; the text names the place in the file.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct KernelError(pub String);

impl fmt::Display for KernelError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str(&self.0)
    }
}

impl std::error::Error for KernelError {}

fn malformed(text: impl Into<String>) -> KernelError {
    KernelError(text.into())
}

/// Byte order of the numbers in a DAF file.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum ByteOrder {
    /// `LTL-IEEE`.
    Little,
    /// `BIG-IEEE`.
    Big,
}

impl ByteOrder {
    /// The 8-byte IEEE double at `bytes[offset..offset + 8]`, or `None` past the end.
    #[inline]
    pub fn f64_at(self, bytes: &[u8], offset: usize) -> Option<f64> {
        let raw: [u8; 8] = bytes.get(offset..offset.checked_add(8)?)?.try_into().ok()?;
        Some(match self {
            Self::Little => f64::from_le_bytes(raw),
            Self::Big => f64::from_be_bytes(raw),
        })
    }

    fn i32_at(self, bytes: &[u8], offset: usize) -> Option<i32> {
        let raw: [u8; 4] = bytes.get(offset..offset.checked_add(4)?)?.try_into().ok()?;
        Some(match self {
            Self::Little => i32::from_le_bytes(raw),
            Self::Big => i32::from_be_bytes(raw),
        })
    }
}

/// One SPK segment's summary.
#[derive(Debug, Clone, PartialEq)]
pub struct SpkSummary {
    /// Segment name (trailing blanks removed).
    pub name: String,
    /// First epoch covered, TDB seconds since J2000.
    pub start_s: f64,
    /// Last epoch covered, TDB seconds since J2000.
    pub end_s: f64,
    /// NAIF id of the body.
    pub target: i32,
    /// NAIF id of the centre.
    pub center: i32,
    /// NAIF frame id (1: J2000, the ICRF axes for the JPL ephemerides).
    pub frame: i32,
    /// SPK data type.
    pub data_type: i32,
    /// First word of the segment's data, 1-based.
    pub start_word: usize,
    /// Last word of the segment's data, 1-based.
    pub end_word: usize,
}

/// A DAF/SPK file's byte order and segment summaries.
#[derive(Debug, Clone, PartialEq)]
pub struct SpkDirectory {
    /// Byte order of the numbers.
    pub order: ByteOrder,
    /// The file's internal name (trailing blanks removed).
    pub internal_name: String,
    /// Every segment summary, in file order.
    pub summaries: Vec<SpkSummary>,
}

fn text(bytes: &[u8]) -> String {
    String::from_utf8_lossy(bytes)
        .trim_end_matches([' ', '\0'])
        .to_string()
}

/// Reads the file record and every SPK summary of a DAF file.
pub fn read_directory(bytes: &[u8]) -> Result<SpkDirectory, KernelError> {
    if bytes.len() < RECORD_BYTES {
        return Err(malformed(format!(
            "not a DAF file: {} bytes, shorter than one 1024-byte record",
            bytes.len()
        )));
    }
    if &bytes[0..8] != b"DAF/SPK " && &bytes[0..8] != b"NAIF/DAF" {
        return Err(malformed(format!(
            "not an SPK file: the file record starts with {:?}, not `DAF/SPK `",
            text(&bytes[0..8])
        )));
    }
    let order = match &bytes[88..96] {
        b"LTL-IEEE" => ByteOrder::Little,
        b"BIG-IEEE" => ByteOrder::Big,
        other => {
            return Err(malformed(format!(
                "unsupported binary format {:?} at byte 88 of the file record (LTL-IEEE or BIG-IEEE are read)",
                text(other)
            )))
        }
    };
    let ftp = &bytes[699..699 + FTP_TEST.len()];
    if ftp != FTP_TEST && ftp.iter().any(|&b| b != 0) {
        return Err(malformed(
            "the FTP test string of the file record is damaged (the file was transferred in text mode)",
        ));
    }
    let int = |offset| order.i32_at(bytes, offset).unwrap_or(0);
    let (nd, ni) = (int(8), int(12));
    if nd != 2 || ni != 6 {
        return Err(malformed(format!(
            "ND = {nd}, NI = {ni} in the file record; an SPK file has ND = 2, NI = 6"
        )));
    }
    let internal_name = text(&bytes[16..76]);
    let mut record = int(76);
    let mut summaries = Vec::new();
    let mut visited = 0;
    while record > 0 {
        visited += 1;
        if visited > MAX_SUMMARY_RECORDS {
            return Err(malformed("the summary records form a loop"));
        }
        let start = (record as usize - 1) * RECORD_BYTES;
        let Some(summary_record) = bytes.get(start..start + RECORD_BYTES) else {
            return Err(malformed(format!(
                "summary record {record} lies past the end of the file ({} bytes)",
                bytes.len()
            )));
        };
        let names = bytes.get(start + RECORD_BYTES..start + 2 * RECORD_BYTES);
        let word = |i: usize| order.f64_at(summary_record, i * 8).unwrap_or(f64::NAN);
        let (next, count) = (word(0), word(2));
        if !(0.0..=25.0).contains(&count) || count.fract() != 0.0 {
            return Err(malformed(format!(
                "summary record {record} claims {count} summaries (at most 25 fit)"
            )));
        }
        for i in 0..count as usize {
            let base = 24 + i * 40;
            let ints = |k: usize| order.i32_at(summary_record, base + 16 + 4 * k).unwrap_or(0);
            let (start_word, end_word) = (ints(4), ints(5));
            let summary = SpkSummary {
                name: names
                    .map(|n| text(&n[i * 40..i * 40 + 40]))
                    .unwrap_or_default(),
                start_s: order.f64_at(summary_record, base).unwrap_or(f64::NAN),
                end_s: order.f64_at(summary_record, base + 8).unwrap_or(f64::NAN),
                target: ints(0),
                center: ints(1),
                frame: ints(2),
                data_type: ints(3),
                start_word: start_word.max(0) as usize,
                end_word: end_word.max(0) as usize,
            };
            if summary.start_word == 0
                || summary.end_word < summary.start_word
                || summary.end_word * 8 > bytes.len()
            {
                return Err(malformed(format!(
                    "segment {} of summary record {record} (body {} about {}) has data words {}..{} outside the file ({} words)",
                    i + 1,
                    summary.target,
                    summary.center,
                    start_word,
                    end_word,
                    bytes.len() / 8
                )));
            }
            if !(summary.start_s.is_finite() && summary.end_s.is_finite())
                || summary.end_s < summary.start_s
            {
                return Err(malformed(format!(
                    "segment {} of summary record {record} (body {} about {}) has the span {} .. {} s",
                    i + 1,
                    summary.target,
                    summary.center,
                    summary.start_s,
                    summary.end_s
                )));
            }
            summaries.push(summary);
        }
        if next.fract() != 0.0 || !(0.0..=(bytes.len() / RECORD_BYTES) as f64).contains(&next) {
            return Err(malformed(format!(
                "summary record {record} points to record {next}, outside the file"
            )));
        }
        record = next as i32;
    }
    Ok(SpkDirectory {
        order,
        internal_name,
        summaries,
    })
}
