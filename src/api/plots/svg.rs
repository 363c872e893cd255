//! The SVG writer: a [`Figure`] as one self-contained SVG 1.1 document (no script, no external
//! font, image or style sheet; the generic `sans-serif` family), written by hand because the
//! plots need lines, markers, ticks and text only (see DEVELOPERS.md).
//!
//! Each panel's group carries its axis ranges in drawn units and its plot area in pixels as
//! `data-*` attributes, and each line its CSV column name as `data-series`, so a reader (and
//! the tests) can map the drawn points back to the numbers.

use std::fmt::Write as _;

use super::figure::{Figure, Panel, XTicks};
use super::style::{marker_svg, style};
use super::ticks::{nice_range, nice_step, tick_label, ticks};

const WIDTH: f64 = 960.0;
const LEFT: f64 = 96.0;
const RIGHT: f64 = 28.0;
const TITLE_HEIGHT: f64 = 46.0;
const SUBTITLE_LINE: f64 = 16.0;
const SUBTITLE_CHARS: usize = 128;
const HEADING_HEIGHT: f64 = 26.0;
const LEGEND_ROW: f64 = 20.0;
const PLOT_HEIGHT: f64 = 250.0;
const BELOW_PLOT: f64 = 54.0;
const MARKERS_PER_LINE: usize = 8;

/// `text` escaped for XML character data and attribute values.
pub fn escape_xml(text: &str) -> String {
    let mut out = String::with_capacity(text.len());
    for c in text.chars() {
        match c {
            '&' => out.push_str("&amp;"),
            '<' => out.push_str("&lt;"),
            '>' => out.push_str("&gt;"),
            '"' => out.push_str("&quot;"),
            '\'' => out.push_str("&apos;"),
            c if (c as u32) < 0x20 && c != '\n' && c != '\t' => out.push(' '),
            _ => out.push(c),
        }
    }
    out
}

/// A rough text width in pixels at 12 px sans-serif (for laying out the legend).
fn text_width_px(text: &str) -> f64 {
    text.chars().count() as f64 * 6.8
}

/// Legend rows of a panel: series indices per row.
fn legend_rows(panel: &Panel) -> Vec<Vec<usize>> {
    let mut rows: Vec<Vec<usize>> = vec![Vec::new()];
    let mut used = 0.0;
    for (index, series) in panel.series.iter().enumerate() {
        let width = 46.0 + text_width_px(&series.name) + 18.0;
        if used + width > WIDTH - LEFT - RIGHT && !rows.last().is_some_and(Vec::is_empty) {
            rows.push(Vec::new());
            used = 0.0;
        }
        used += width;
        if let Some(row) = rows.last_mut() {
            row.push(index);
        }
    }
    rows
}

fn panel_height(panel: &Panel) -> f64 {
    HEADING_HEIGHT + legend_rows(panel).len() as f64 * LEGEND_ROW + 8.0 + PLOT_HEIGHT + BELOW_PLOT
}

/// The drawn y range of a panel (data min and max in drawn units).
fn y_extent(panel: &Panel) -> (f64, f64) {
    let values = panel
        .series
        .iter()
        .flat_map(|s| s.values.iter().flatten())
        .map(|v| v * panel.y_unit.factor)
        .filter(|v| v.is_finite());
    values.fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), v| {
        (lo.min(v), hi.max(v))
    })
}

struct Frame {
    left: f64,
    top: f64,
    width: f64,
    height: f64,
    x_min: f64,
    x_max: f64,
    y_min: f64,
    y_max: f64,
}

impl Frame {
    fn px(&self, x: f64) -> f64 {
        self.left + (x - self.x_min) / (self.x_max - self.x_min) * self.width
    }
    fn py(&self, y: f64) -> f64 {
        self.top + (self.y_max - y) / (self.y_max - self.y_min) * self.height
    }
}

fn write_legend(out: &mut String, panel: &Panel, top: f64) {
    out.push_str("<g class=\"legend\" font-size=\"12\">");
    for (row_index, row) in legend_rows(panel).iter().enumerate() {
        let y = top + row_index as f64 * LEGEND_ROW + 10.0;
        let mut x = LEFT;
        for &index in row {
            let series = &panel.series[index];
            let line = style(index);
            let _ = write!(
                out,
                "<g data-series=\"{}\"><line x1=\"{x:.1}\" y1=\"{y:.1}\" x2=\"{:.1}\" y2=\"{y:.1}\" stroke=\"{}\" stroke-width=\"2.5\" stroke-dasharray=\"{}\"/>{}<text x=\"{:.1}\" y=\"{:.1}\">{}</text></g>",
                escape_xml(&series.column),
                x + 40.0,
                line.colour,
                line.dash,
                marker_svg(line.marker, x + 20.0, y, line.colour),
                x + 46.0,
                y + 4.0,
                escape_xml(&series.name)
            );
            x += 46.0 + text_width_px(&series.name) + 18.0;
        }
    }
    out.push_str("</g>");
}

fn write_axes(out: &mut String, figure: &Figure, panel: &Panel, frame: &Frame, y_step: f64) {
    let bottom = frame.top + frame.height;
    out.push_str("<g class=\"axes\" font-size=\"12\" fill=\"#222\">");
    for y in ticks(frame.y_min, frame.y_max, y_step) {
        let py = frame.py(y);
        let _ = write!(
            out,
            "<line x1=\"{:.1}\" y1=\"{py:.2}\" x2=\"{:.1}\" y2=\"{py:.2}\" stroke=\"#dddddd\"/><text x=\"{:.1}\" y=\"{:.2}\" text-anchor=\"end\">{}</text>",
            frame.left,
            frame.left + frame.width,
            frame.left - 6.0,
            py + 4.0,
            escape_xml(&tick_label(y, y_step))
        );
    }
    let x_ticks: Vec<(f64, String)> = match &figure.x_ticks {
        XTicks::Numeric => {
            let step = nice_step(frame.x_max - frame.x_min, 8);
            ticks(frame.x_min, frame.x_max, step)
                .into_iter()
                .map(|x| (x, tick_label(x, step)))
                .collect()
        }
        XTicks::Given(given) => given
            .iter()
            .map(|(x, label)| (x * figure.x_unit.factor, label.clone()))
            .filter(|(x, _)| *x >= frame.x_min && *x <= frame.x_max)
            .collect(),
    };
    for (x, label) in x_ticks {
        let px = frame.px(x);
        let _ = write!(
            out,
            "<line x1=\"{px:.2}\" y1=\"{:.1}\" x2=\"{px:.2}\" y2=\"{bottom:.1}\" stroke=\"#dddddd\"/><text x=\"{px:.2}\" y=\"{:.1}\" text-anchor=\"middle\">{}</text>",
            frame.top,
            bottom + 16.0,
            escape_xml(&label)
        );
    }
    if panel.zero_line && frame.y_min < 0.0 && frame.y_max > 0.0 {
        let py = frame.py(0.0);
        let _ = write!(
            out,
            "<line x1=\"{:.1}\" y1=\"{py:.2}\" x2=\"{:.1}\" y2=\"{py:.2}\" stroke=\"#555555\" stroke-width=\"1\"/>",
            frame.left,
            frame.left + frame.width
        );
    }
    let _ = write!(
        out,
        "<rect x=\"{:.1}\" y=\"{:.1}\" width=\"{:.1}\" height=\"{:.1}\" fill=\"none\" stroke=\"#222\"/>",
        frame.left, frame.top, frame.width, frame.height
    );
    let y_mid = frame.top + frame.height / 2.0;
    let _ = write!(
        out,
        "<text x=\"{:.1}\" y=\"{y_mid:.1}\" text-anchor=\"middle\" transform=\"rotate(-90 {:.1} {y_mid:.1})\">{} ({})</text>",
        24.0,
        24.0,
        escape_xml(&panel.y_quantity),
        escape_xml(&panel.y_unit.name)
    );
    let _ = write!(
        out,
        "<text x=\"{:.1}\" y=\"{:.1}\" text-anchor=\"middle\">{} ({})</text>",
        frame.left + frame.width / 2.0,
        bottom + 36.0,
        escape_xml(&figure.x_quantity),
        escape_xml(&figure.x_unit.name)
    );
    out.push_str("</g>");
}

fn write_series(out: &mut String, figure: &Figure, panel: &Panel, frame: &Frame) {
    let count = panel.series.len().max(1);
    for (index, series) in panel.series.iter().enumerate() {
        let line = style(index);
        let column = escape_xml(&series.column);
        let mut runs: Vec<Vec<(f64, f64)>> = vec![Vec::new()];
        for (x, value) in panel.x.iter().zip(&series.values) {
            match value
                .map(|v| v * panel.y_unit.factor)
                .filter(|v| v.is_finite())
            {
                Some(y) => {
                    if let Some(run) = runs.last_mut() {
                        run.push((frame.px(x * figure.x_unit.factor), frame.py(y)));
                    }
                }
                None => runs.push(Vec::new()),
            }
        }
        let points: Vec<(f64, f64)> = runs.iter().flatten().copied().collect();
        for run in runs.iter().filter(|run| !run.is_empty()) {
            let text: Vec<String> = run.iter().map(|(x, y)| format!("{x:.2},{y:.2}")).collect();
            let _ = write!(
                out,
                "<polyline class=\"series\" data-series=\"{column}\" fill=\"none\" stroke=\"{}\" stroke-width=\"2\" stroke-linejoin=\"round\" stroke-dasharray=\"{}\" points=\"{}\"/>",
                line.colour,
                line.dash,
                text.join(" ")
            );
        }
        if points.is_empty() {
            continue;
        }
        let _ = write!(out, "<g class=\"markers\" data-series=\"{column}\">");
        let n = points.len();
        let markers = MARKERS_PER_LINE.min(n);
        for k in 0..markers {
            // Staggered by series so that markers of lines lying on each other stay visible.
            let position = (k as f64 + (index as f64 + 0.5) / count as f64) / markers as f64;
            let at = ((position * n as f64) as usize).min(n - 1);
            let (x, y) = points[at];
            out.push_str(&marker_svg(line.marker, x, y, line.colour));
        }
        out.push_str("</g>");
    }
}

fn write_marks(out: &mut String, figure: &Figure, panel: &Panel, frame: &Frame) {
    for mark in &panel.marks {
        let x = mark.x * figure.x_unit.factor;
        if x < frame.x_min || x > frame.x_max {
            continue;
        }
        let px = frame.px(x);
        let _ = write!(
            out,
            "<g class=\"mark\"><line x1=\"{px:.2}\" y1=\"{:.1}\" x2=\"{px:.2}\" y2=\"{:.1}\" stroke=\"#444444\" stroke-width=\"1.2\" stroke-dasharray=\"3 3\"/><text x=\"{:.2}\" y=\"{:.1}\" font-size=\"11\" fill=\"#222\">{}</text></g>",
            frame.top,
            frame.top + frame.height,
            px + 4.0,
            frame.top + 14.0,
            escape_xml(&mark.label)
        );
    }
}

fn write_panel(out: &mut String, figure: &Figure, panel: &Panel, top: f64) {
    let legend_top = top + HEADING_HEIGHT;
    let plot_top = legend_top + legend_rows(panel).len() as f64 * LEGEND_ROW + 8.0;
    let (y_lo, y_hi) = y_extent(panel);
    let (y_min, y_max, y_step) = nice_range(y_lo, y_hi);
    let x_first = panel.x.first().copied().unwrap_or(0.0) * figure.x_unit.factor;
    let x_last = panel.x.last().copied().unwrap_or(1.0) * figure.x_unit.factor;
    let (x_min, x_max) = if x_last > x_first {
        (x_first, x_last)
    } else {
        (x_first - 1.0, x_first + 1.0)
    };
    let frame = Frame {
        left: LEFT,
        top: plot_top,
        width: WIDTH - LEFT - RIGHT,
        height: PLOT_HEIGHT,
        x_min,
        x_max,
        y_min,
        y_max,
    };
    let _ = write!(
        out,
        "<g class=\"panel\" data-x-min=\"{x_min:e}\" data-x-max=\"{x_max:e}\" data-y-min=\"{y_min:e}\" data-y-max=\"{y_max:e}\" data-x-factor=\"{:e}\" data-y-factor=\"{:e}\" data-left=\"{}\" data-top=\"{}\" data-width=\"{}\" data-height=\"{}\">",
        figure.x_unit.factor,
        panel.y_unit.factor,
        frame.left,
        frame.top,
        frame.width,
        frame.height
    );
    let _ = write!(
        out,
        "<text x=\"{LEFT:.1}\" y=\"{:.1}\" font-size=\"14\" font-weight=\"bold\" fill=\"#111\">{}</text>",
        top + 17.0,
        escape_xml(&panel.heading)
    );
    write_legend(out, panel, legend_top);
    write_axes(out, figure, panel, &frame, y_step);
    write_marks(out, figure, panel, &frame);
    write_series(out, figure, panel, &frame);
    out.push_str("</g>");
}

/// `text` broken at spaces into lines of at most about `width` characters.
fn wrap(text: &str, width: usize) -> Vec<String> {
    let mut lines: Vec<String> = Vec::new();
    let mut line = String::new();
    for word in text.split(' ') {
        if !line.is_empty() && line.chars().count() + 1 + word.chars().count() > width {
            lines.push(std::mem::take(&mut line));
        }
        if !line.is_empty() {
            line.push(' ');
        }
        line.push_str(word);
    }
    lines.push(line);
    lines
}

/// The figure as an SVG document.
pub fn to_svg(figure: &Figure) -> String {
    let subtitle = wrap(&figure.subtitle, SUBTITLE_CHARS);
    let head = TITLE_HEIGHT + subtitle.len() as f64 * SUBTITLE_LINE;
    let height = head + figure.panels.iter().map(panel_height).sum::<f64>() + 8.0;
    let mut out =
        String::with_capacity(16_384 + figure.panels.iter().map(|p| p.x.len()).sum::<usize>() * 40);
    let _ = write!(
        out,
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"{WIDTH}\" height=\"{height}\" viewBox=\"0 0 {WIDTH} {height}\" font-family=\"sans-serif\" role=\"img\" aria-labelledby=\"figure-title figure-desc\"><title id=\"figure-title\">{}</title><desc id=\"figure-desc\">{}</desc><rect width=\"100%\" height=\"100%\" fill=\"#ffffff\"/>",
        escape_xml(&figure.title),
        escape_xml(&figure.subtitle)
    );
    let _ = write!(
        out,
        "<text x=\"{:.1}\" y=\"28\" font-size=\"18\" font-weight=\"bold\" fill=\"#111\">{}</text><text class=\"subtitle\" font-size=\"12\" fill=\"#444\">",
        LEFT - 70.0,
        escape_xml(&figure.title)
    );
    for (index, line) in subtitle.iter().enumerate() {
        let _ = write!(
            out,
            "<tspan x=\"{:.1}\" y=\"{:.1}\">{}</tspan>",
            LEFT - 70.0,
            TITLE_HEIGHT + 2.0 + index as f64 * SUBTITLE_LINE,
            escape_xml(line)
        );
    }
    out.push_str("</text>");
    let mut top = head;
    for panel in &figure.panels {
        write_panel(&mut out, figure, panel, top);
        top += panel_height(panel);
    }
    out.push_str("</svg>\n");
    out
}
