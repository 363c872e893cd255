//! Reading a plot of the service back into numbers: each panel's axis ranges and plot area
//! (its `data-*` attributes) and each line's points mapped from pixels to the column's unit.
//! Used by the SVG unit tests (`src/api/plots/svg_tests.rs`) and the plot integration tests.
#![allow(dead_code)]

/// One panel as drawn.
#[derive(Debug, Clone)]
pub struct DrawnPanel {
    /// Axis ranges in drawn units.
    pub x_min: f64,
    pub x_max: f64,
    pub y_min: f64,
    pub y_max: f64,
    /// Drawn value = column value * factor.
    pub x_factor: f64,
    pub y_factor: f64,
    /// Plot area, pixels.
    pub width: f64,
    pub height: f64,
    /// Per line (CSV column name), its points in the column units, in drawing order.
    pub lines: Vec<(String, Vec<(f64, f64)>)>,
}

impl DrawnPanel {
    /// Half a hundredth of a pixel (points are written with two decimals), in column units of
    /// x and y.
    pub fn resolution(&self) -> (f64, f64) {
        let px = 0.0051;
        (
            px * (self.x_max - self.x_min) / self.width / self.x_factor,
            px * (self.y_max - self.y_min) / self.height / self.y_factor,
        )
    }

    /// The points of the line of `column`.
    pub fn line(&self, column: &str) -> Option<&[(f64, f64)]> {
        self.lines
            .iter()
            .find(|(name, _)| name == column)
            .map(|(_, points)| points.as_slice())
    }
}

fn number(node: roxmltree::Node<'_, '_>, name: &str) -> Result<f64, String> {
    node.attribute(name)
        .ok_or_else(|| format!("panel without {name}"))?
        .parse::<f64>()
        .map_err(|e| format!("{name}: {e}"))
}

/// Parses `text` as XML (failing on anything not well-formed) and reads every panel.
pub fn read_svg(text: &str) -> Result<Vec<DrawnPanel>, String> {
    let document = roxmltree::Document::parse(text).map_err(|e| format!("not well-formed: {e}"))?;
    let root = document.root_element();
    if root.tag_name().name() != "svg"
        || root.tag_name().namespace() != Some("http://www.w3.org/2000/svg")
    {
        return Err("the root is not an SVG element".to_string());
    }
    let mut panels = Vec::new();
    for node in root
        .descendants()
        .filter(|n| n.has_tag_name("g") && n.attribute("class") == Some("panel"))
    {
        let (left, top) = (number(node, "data-left")?, number(node, "data-top")?);
        let mut panel = DrawnPanel {
            x_min: number(node, "data-x-min")?,
            x_max: number(node, "data-x-max")?,
            y_min: number(node, "data-y-min")?,
            y_max: number(node, "data-y-max")?,
            x_factor: number(node, "data-x-factor")?,
            y_factor: number(node, "data-y-factor")?,
            width: number(node, "data-width")?,
            height: number(node, "data-height")?,
            lines: Vec::new(),
        };
        for line in node
            .descendants()
            .filter(|n| n.has_tag_name("polyline") && n.attribute("class") == Some("series"))
        {
            let column = line
                .attribute("data-series")
                .unwrap_or_default()
                .to_string();
            let mut points = Vec::new();
            for pair in line
                .attribute("points")
                .unwrap_or_default()
                .split_whitespace()
            {
                let (px, py) = pair.split_once(',').ok_or("a point without a comma")?;
                let px: f64 = px.parse().map_err(|e| format!("x {px}: {e}"))?;
                let py: f64 = py.parse().map_err(|e| format!("y {py}: {e}"))?;
                let x = panel.x_min + (px - left) / panel.width * (panel.x_max - panel.x_min);
                let y = panel.y_max - (py - top) / panel.height * (panel.y_max - panel.y_min);
                points.push((x / panel.x_factor, y / panel.y_factor));
            }
            match panel.lines.iter_mut().find(|(name, _)| *name == column) {
                Some((_, existing)) => existing.extend(points),
                None => panel.lines.push((column, points)),
            }
        }
        panels.push(panel);
    }
    Ok(panels)
}

/// Nothing that would make a browser load or run anything: no script element, no link
/// attribute, no CSS `url(`, `@import` or `@font-face`, no event handler attribute.
pub fn self_contained(text: &str) -> Result<(), String> {
    let document = roxmltree::Document::parse(text).map_err(|e| format!("not well-formed: {e}"))?;
    for node in document.descendants().filter(|n| n.is_element()) {
        let name = node.tag_name().name();
        if matches!(
            name,
            "script" | "foreignObject" | "image" | "use" | "style" | "a"
        ) {
            return Err(format!("element <{name}>"));
        }
        for attribute in node.attributes() {
            let key = attribute.name();
            if key == "href" || key.starts_with("on") || attribute.value().contains("url(") {
                return Err(format!("attribute {key}=\"{}\"", attribute.value()));
            }
        }
    }
    for needle in ["@import", "@font-face", "http://", "https://"] {
        let outside_namespace = text.replace("http://www.w3.org/2000/svg", "");
        if outside_namespace.contains(needle) {
            return Err(format!("text {needle}"));
        }
    }
    Ok(())
}

/// Reads a CSV answer (quoted fields as RFC 4180 writes them) into a header and rows of fields.
pub fn read_csv(text: &str) -> (Vec<String>, Vec<Vec<String>>) {
    let mut lines = text.lines();
    let header = csv_fields(lines.next().unwrap_or_default());
    let rows = lines.map(csv_fields).collect();
    (header, rows)
}

/// The fields of one CSV line (RFC 4180 sec. 2: a field in double quotes may hold commas, and
/// `""` inside it is one quote).
fn csv_fields(line: &str) -> Vec<String> {
    let mut fields = Vec::new();
    let mut field = String::new();
    let mut quoted = false;
    let mut chars = line.chars().peekable();
    while let Some(c) = chars.next() {
        match (c, quoted) {
            ('"', true) if chars.peek() == Some(&'"') => {
                field.push('"');
                chars.next();
            }
            ('"', _) => quoted = !quoted,
            (',', false) => fields.push(std::mem::take(&mut field)),
            _ => field.push(c),
        }
    }
    fields.push(field);
    fields
}
