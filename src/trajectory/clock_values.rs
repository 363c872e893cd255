//! Clock values as the readers collect them (SP3 clock column, RINEX clock records); kept
//! apart from [`super::clock`] so that the SP3 reader and the clock module do not import each
//! other.

use std::collections::HashMap;

use crate::physics::time::instant::Instant;

/// One clock value.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct ClockValue {
    /// The epoch, in the file's time system.
    pub epoch: Instant,
    /// Clock reading minus system time, s.
    pub clock_s: f64,
    /// 1-based line of the value in its file.
    pub line: usize,
}

/// The values of one clock, in file order.
#[derive(Debug, Clone, PartialEq)]
pub struct ClockSeries {
    /// Satellite id (`G01`) or receiver (station) name.
    pub id: String,
    /// True for a receiver (RINEX `AR` records).
    pub receiver: bool,
    /// The values.
    pub values: Vec<ClockValue>,
}

/// Every clock of one file, with what was skipped.
#[derive(Debug, Clone, PartialEq, Default)]
pub struct ClockData {
    /// One series per clock, in order of first appearance.
    pub series: Vec<ClockSeries>,
    /// Values marked bad or absent, left out.
    pub absent_values: usize,
    /// What was skipped, each naming its line.
    pub warnings: Vec<String>,
}

/// Collects values into series by clock id.
#[derive(Debug, Default)]
pub struct ClockCollector {
    data: ClockData,
    by_id: HashMap<(String, bool), usize>,
}

impl ClockCollector {
    /// Adds one value of clock `id`.
    pub fn push(&mut self, id: &str, receiver: bool, value: ClockValue) {
        let key = (id.to_string(), receiver);
        let index = match self.by_id.get(&key) {
            Some(index) => *index,
            None => {
                self.data.series.push(ClockSeries {
                    id: id.to_string(),
                    receiver,
                    values: Vec::new(),
                });
                self.by_id.insert(key, self.data.series.len() - 1);
                self.data.series.len() - 1
            }
        };
        if let Some(series) = self.data.series.get_mut(index) {
            series.values.push(value);
        }
    }

    /// Counts a value marked bad or absent.
    pub fn absent(&mut self) {
        self.data.absent_values += 1;
    }

    /// Records a warning.
    pub fn warn(&mut self, warning: String) {
        self.data.warnings.push(warning);
    }

    /// The collected data.
    pub fn finish(self) -> ClockData {
        self.data
    }
}
