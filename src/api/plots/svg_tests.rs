//! Tests of the SVG plots against their own CSV twins: well-formed, self-contained XML; every
//! series drawn; axis ranges that hold the data; every drawn point equal to its CSV row.

#[path = "../../../tests/common/svg_read.rs"]
mod svg_read;

use super::figure::{AxisUnit, Figure, Panel, Series, XTicks};
use super::rate_profile::{self, RateProfileQuery};
use super::scale_offsets::{self, ScaleOffsetsQuery};
use super::svg::to_svg;
use crate::physics::earth::eop::EopTable;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::leap_seconds::LeapTable;
use svg_read::{read_csv, read_svg, self_contained};

/// Checks `figure`'s SVG against its CSV twin; answers the number of points compared.
fn check_against_csv(figure: &Figure) -> usize {
    let svg = to_svg(figure);
    self_contained(&svg).unwrap_or_else(|e| panic!("not self-contained: {e}"));
    let document = roxmltree::Document::parse(&svg).unwrap_or_else(|e| panic!("{e}"));
    let title = document
        .descendants()
        .find(|n| n.has_tag_name("title"))
        .and_then(|n| n.text())
        .unwrap_or_default();
    assert_eq!(title, figure.title);
    let drawn = read_svg(&svg).unwrap_or_else(|e| panic!("{e}"));
    assert_eq!(drawn.len(), figure.panels.len());
    let (header, rows) = read_csv(&figure.to_csv());
    let column_of = |name: &str| header.iter().position(|h| h == name);
    let x_column = column_of(&figure.x_column).unwrap_or_else(|| panic!("no x column"));
    let mut compared = 0;
    for (panel, drawn_panel) in figure.panels.iter().zip(&drawn) {
        let (x_tol, y_tol) = drawn_panel.resolution();
        // The x axis spans the data exactly; the y axis holds the data, which fill at least
        // 40 % of it (bounds on the nice step next to the data; common practice).
        let xs: Vec<f64> = rows
            .iter()
            .map(|r| r[x_column].parse().unwrap_or(f64::NAN))
            .collect();
        assert!((drawn_panel.x_min / drawn_panel.x_factor - xs[0]).abs() <= x_tol);
        assert!((drawn_panel.x_max / drawn_panel.x_factor - xs[xs.len() - 1]).abs() <= x_tol);
        let mut low = f64::INFINITY;
        let mut high = f64::NEG_INFINITY;
        assert_eq!(
            drawn_panel.lines.len(),
            panel.series.len(),
            "{}",
            panel.heading
        );
        for series in &panel.series {
            let index = column_of(&series.column)
                .unwrap_or_else(|| panic!("no CSV column {}", series.column));
            let expected: Vec<(f64, f64)> = rows
                .iter()
                .filter(|row| !row[index].is_empty())
                .map(|row| {
                    (
                        row[x_column].parse().unwrap_or(f64::NAN),
                        row[index].parse().unwrap_or(f64::NAN),
                    )
                })
                .collect();
            let points = drawn_panel
                .line(&series.column)
                .unwrap_or_else(|| panic!("series {} not drawn", series.column));
            assert_eq!(points.len(), expected.len(), "{}", series.column);
            for ((x, y), (csv_x, csv_y)) in points.iter().zip(&expected) {
                assert!(
                    (x - csv_x).abs() <= x_tol,
                    "{}: x {x} vs {csv_x}",
                    series.column
                );
                assert!(
                    (y - csv_y).abs() <= y_tol,
                    "{}: y {y} vs {csv_y}",
                    series.column
                );
                low = low.min(*csv_y);
                high = high.max(*csv_y);
                compared += 1;
            }
        }
        let (y_min, y_max) = (
            drawn_panel.y_min / drawn_panel.y_factor,
            drawn_panel.y_max / drawn_panel.y_factor,
        );
        assert!(
            y_min <= low && high <= y_max,
            "{}: [{low}, {high}] in [{y_min}, {y_max}]",
            panel.heading
        );
        if high > low {
            assert!(
                (high - low) >= 0.4 * (y_max - y_min),
                "{}: data fill too little of the axis",
                panel.heading
            );
        }
    }
    compared
}

#[test]
fn rate_profile_plot_equals_its_csv() {
    let request =
        rate_profile::read_query(&RateProfileQuery::default()).unwrap_or_else(|e| panic!("{e:?}"));
    let figure = rate_profile::figure(&request);
    assert_eq!(check_against_csv(&figure), 3 * 300);
    let svg = to_svg(&figure);
    // The zero crossing (Ashby 2003: about 9 545 km) and the MEO and GEO radii (about 26 562 km
    // and 42 164 km, common practice) are marked.
    for label in [
        "total = 0 at r = 9546 km",
        "navigation MEO, r = 26562 km",
        "GEO, r = 42164 km",
    ] {
        assert!(svg.contains(label), "{label}");
    }
}

#[test]
fn scale_offsets_plot_equals_its_csv_and_steps() {
    let table = LeapTable::builtin();
    let eop = EopTable::builtin();
    let context = ConversionContext::geocentric(table).with_ut1(eop);
    let query = ScaleOffsetsQuery {
        from: Some("2011-01-01".to_string()),
        to: Some("2019-01-01".to_string()),
        points: Some(500),
    };
    let samples = scale_offsets::samples(&query, &context).unwrap_or_else(|e| panic!("{e:?}"));
    let figure = scale_offsets::figure(&samples, table);
    // Three steps in the span (IERS Bulletin C: 2012-07-01, 2015-07-01, 2017-01-01), two
    // samples each; eight lines of 506 points (TCL - TT and TL - TT inside the lunar span).
    assert_eq!(samples.len(), 506);
    assert_eq!(check_against_csv(&figure), 8 * 506);
    let drawn = read_svg(&to_svg(&figure)).unwrap_or_else(|e| panic!("{e}"));
    let tai_utc = drawn[0].line("tai_minus_utc_s").unwrap_or_default();
    let steps = tai_utc
        .windows(2)
        .filter(|p| (p[1].1 - p[0].1).abs() > 0.5)
        .count();
    assert_eq!(steps, 3);
}

#[test]
fn scale_offsets_leave_ut1_blank_outside_the_table() {
    // The built-in EOP table starts 1962-01-01 (IERS EOP 20 C04): UT1 - UTC is blank before.
    let table = LeapTable::builtin();
    let eop = EopTable::builtin();
    let context = ConversionContext::geocentric(table).with_ut1(eop);
    let query = ScaleOffsetsQuery {
        from: Some("1961-01-01".to_string()),
        to: Some("1963-01-01".to_string()),
        points: Some(50),
    };
    let samples = scale_offsets::samples(&query, &context).unwrap_or_else(|e| panic!("{e:?}"));
    let figure = scale_offsets::figure(&samples, table);
    let compared = check_against_csv(&figure);
    assert!(samples.iter().any(|s| s.ut1_minus_utc_s.is_none()));
    assert!(samples.iter().any(|s| s.ut1_minus_utc_s.is_some()));
    assert!(compared > 5 * samples.len());
}

#[test]
fn text_is_escaped_and_flat_lines_get_a_range() {
    // XML 1.0 sec. 2.4: markup characters in text are escaped (checked by parsing).
    let figure = Figure {
        title: "a < b & \"c\" > 'd'".to_string(),
        subtitle: "x".repeat(300),
        x_quantity: "t".to_string(),
        x_column: "t_s".to_string(),
        x_unit: AxisUnit::new("s", 1.0),
        x_ticks: XTicks::Numeric,
        labels: vec![(
            "label".to_string(),
            vec!["p,q".to_string(), "r".to_string()],
        )],
        panels: vec![Panel {
            x: vec![0.0, 1.0],
            heading: "<flat>".to_string(),
            y_quantity: "y".to_string(),
            y_unit: AxisUnit::new("s", 1.0),
            series: vec![Series {
                name: "32.184 & more".to_string(),
                column: "flat_s".to_string(),
                values: vec![Some(32.184), Some(32.184)],
            }],
            marks: Vec::new(),
            zero_line: true,
        }],
    };
    check_against_csv(&Figure {
        labels: Vec::new(),
        ..figure.clone()
    });
    assert!(figure
        .to_csv()
        .starts_with("label,t_s,flat_s\n\"p,q\",0,32.184\n"));
}
