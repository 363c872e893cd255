//! PLACEHOLDER for compilation only; replaced by the real table on merge.
use std::fmt;
#[derive(Debug)]
pub struct UtcRangeError;
impl fmt::Display for UtcRangeError {
    fn fmt(&self, f: &mut fmt::Formatter<'_>) -> fmt::Result {
        f.write_str("before 1960")
    }
}
#[derive(Debug, Clone)]
pub struct LeapTable;
const DAY: i128 = 86_400_000_000_000_000_000_000;
impl LeapTable {
    pub fn builtin() -> &'static LeapTable {
        &LeapTable
    }
    pub fn source(&self) -> &str {
        "placeholder"
    }
    pub fn steps(&self) -> &[LeapStep] {
        &[]
    }
    pub fn parse_any(_t: &str) -> Result<LeapTable, String> {
        Err("placeholder".into())
    }
    pub fn with_source(self, _s: String) -> Self {
        self
    }
    pub fn first_utc_mjd(&self) -> i64 {
        36_934
    }
    pub fn expiry_mjd(&self) -> i64 {
        61_584
    }
    pub fn utc_day_length_attos(&self, _mjd: i64) -> i128 {
        DAY
    }
    pub fn tai_from_utc(&self, mjd: i64, sod: i128) -> Result<i128, UtcRangeError> {
        Ok(i128::from(mjd - 51_544) * DAY - DAY / 2 + sod + 37_000_000_000_000_000_000)
    }
    pub fn utc_from_tai(&self, tai: i128) -> Result<(i64, i128), UtcRangeError> {
        let x = tai - 37_000_000_000_000_000_000 + DAY / 2;
        Ok((51_544 + x.div_euclid(DAY) as i64, x.rem_euclid(DAY)))
    }
}
pub struct LeapStep {
    pub utc_mjd: i64,
    pub offset_s: f64,
    pub drift_reference_mjd: f64,
    pub drift_s_per_day: f64,
}
