//! A figure: one x column shared by one or more panels of series, with the units each axis is
//! drawn in. The SVG ([`super::svg`]) and the CSV twin ([`Figure::to_csv`]) are both written
//! from it, so the CSV holds exactly the numbers that are drawn.

use std::fmt::Write as _;

use crate::physics::readable::readable;

/// A unit an axis is drawn in: its name and the factor from the column's unit to it (a column
/// in seconds drawn in ns has the factor 1e9).
#[derive(Debug, Clone, PartialEq)]
pub struct AxisUnit {
    /// Shown in the axis label, e.g. `ns`.
    pub name: String,
    /// Drawn value = column value * factor.
    pub factor: f64,
}

impl AxisUnit {
    /// A unit by name and factor.
    pub fn new(name: &str, factor: f64) -> Self {
        Self {
            name: name.to_string(),
            factor,
        }
    }
}

/// A duration unit for a column in seconds whose values reach `largest_abs_s`: s, ms, us, ns
/// or ps, so that the drawn numbers stay between about 0.1 and 1000.
pub fn seconds_unit(largest_abs_s: f64) -> AxisUnit {
    let choices = [
        ("s", 1.0),
        ("ms", 1e3),
        ("\u{b5}s", 1e6),
        ("ns", 1e9),
        ("ps", 1e12),
    ];
    for (name, factor) in choices {
        if largest_abs_s * factor >= 0.5 {
            return AxisUnit::new(name, factor);
        }
    }
    AxisUnit::new("ps", 1e12)
}

/// A unit for an elapsed time in seconds spanning `span_s`: minutes, hours or days.
pub fn elapsed_unit(span_s: f64) -> AxisUnit {
    if span_s <= 3.0 * 3600.0 {
        AxisUnit::new("minutes", 1.0 / 60.0)
    } else if span_s <= 4.0 * 86_400.0 {
        AxisUnit::new("hours", 1.0 / 3600.0)
    } else {
        AxisUnit::new("days", 1.0 / 86_400.0)
    }
}

/// An ISO text without a fraction of zeros (`...T00:00:00.000000` -> `...T00:00:00`).
pub fn short_iso(iso: &str) -> String {
    match iso.split_once('.') {
        Some((whole, fraction)) if fraction.chars().all(|c| c == '0') => whole.to_string(),
        Some((whole, fraction)) => format!("{whole}.{}", fraction.trim_end_matches('0')),
        None => iso.to_string(),
    }
}

/// One line: its legend name, its CSV column name and its values (one per x; `None` where
/// it has none).
#[derive(Debug, Clone, PartialEq)]
pub struct Series {
    /// Legend text.
    pub name: String,
    /// CSV column name (with the column's unit, e.g. `tai_minus_utc_s`).
    pub column: String,
    /// Values in the column's unit.
    pub values: Vec<Option<f64>>,
}

/// A vertical line at an x value with a label (e.g. an orbit radius).
#[derive(Debug, Clone, PartialEq)]
pub struct VerticalMark {
    /// x in the x column's unit.
    pub x: f64,
    /// Label written beside the line.
    pub label: String,
}

/// One panel: a y axis and the series drawn against it.
#[derive(Debug, Clone, PartialEq)]
pub struct Panel {
    /// x values in the figure's x column unit, increasing (the CSV twin takes its rows from
    /// the first panel: figures with a CSV twin share one x among their panels).
    pub x: Vec<f64>,
    /// Panel heading.
    pub heading: String,
    /// What the y axis shows (the unit is added).
    pub y_quantity: String,
    /// The unit the y values are drawn in.
    pub y_unit: AxisUnit,
    /// The lines.
    pub series: Vec<Series>,
    /// Vertical marks.
    pub marks: Vec<VerticalMark>,
    /// Draw a horizontal line at y = 0 when it is inside the range.
    pub zero_line: bool,
}

/// How x ticks are placed and written.
#[derive(Debug, Clone, PartialEq)]
pub enum XTicks {
    /// Nice numbers of the drawn unit.
    Numeric,
    /// Given positions (in the x column's unit) and labels, e.g. 1 January of some years.
    Given(Vec<(f64, String)>),
}

/// A whole figure.
#[derive(Debug, Clone, PartialEq)]
pub struct Figure {
    /// What is shown (the SVG `<title>` and heading).
    pub title: String,
    /// A second line under the title (model, span, sampling).
    pub subtitle: String,
    /// What the x axis shows (the unit is added).
    pub x_quantity: String,
    /// The x column's CSV name (with its unit).
    pub x_column: String,
    /// The unit x is drawn in.
    pub x_unit: AxisUnit,
    /// Tick placement on x.
    pub x_ticks: XTicks,
    /// Text columns written first in the CSV (e.g. the ISO epoch), name and one value per x.
    pub labels: Vec<(String, Vec<String>)>,
    /// The panels, top to bottom.
    pub panels: Vec<Panel>,
}

fn csv_field(text: &str) -> String {
    if text.contains([',', '"', '\n', '\r']) {
        format!("\"{}\"", text.replace('"', "\"\""))
    } else {
        text.to_string()
    }
}

impl Figure {
    /// The CSV twin (RFC 4180): the label columns, the x column and one column per series of
    /// every panel, one row per x; numbers in shortest round-trip form (`readable`), empty where a series
    /// has no value.
    pub fn to_csv(&self) -> String {
        let mut out = String::new();
        let mut header: Vec<String> = self.labels.iter().map(|(name, _)| name.clone()).collect();
        header.push(self.x_column.clone());
        header.extend(
            self.panels
                .iter()
                .flat_map(|panel| panel.series.iter().map(|s| s.column.clone())),
        );
        let header: Vec<String> = header.iter().map(|h| csv_field(h)).collect();
        out.push_str(&header.join(","));
        out.push('\n');
        let x_values = self.panels.first().map_or(&[][..], |panel| &panel.x[..]);
        for (row, x) in x_values.iter().enumerate() {
            let mut fields: Vec<String> = self
                .labels
                .iter()
                .map(|(_, values)| csv_field(values.get(row).map_or("", String::as_str)))
                .collect();
            fields.push(readable(*x));
            for series in self.panels.iter().flat_map(|panel| &panel.series) {
                fields.push(match series.values.get(row).copied().flatten() {
                    Some(value) => readable(value),
                    None => String::new(),
                });
            }
            let _ = writeln!(out, "{}", fields.join(","));
        }
        out
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn units_keep_numbers_readable() {
        // Common practice: SI prefixes so that drawn numbers stay between ~0.5 and 1000.
        assert_eq!(seconds_unit(37.0).name, "s");
        assert_eq!(seconds_unit(1.6e-3).name, "ms");
        assert_eq!(seconds_unit(3.8e-5).name, "\u{b5}s");
        assert_eq!(seconds_unit(2.0e-8).name, "ns");
        assert_eq!(elapsed_unit(7_200.0).name, "minutes");
        assert_eq!(elapsed_unit(86_400.0).name, "hours");
        assert_eq!(elapsed_unit(10.0 * 86_400.0).name, "days");
    }
}
