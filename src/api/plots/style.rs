//! How the lines of a plot are told apart: colour, dash pattern and marker shape, all three at
//! once, so that a line is recognized in colour, in grey-scale print and by readers with a
//! colour-vision deficiency.
//!
//! Colours: the palette of Okabe & Ito (2008), "Color Universal Design", chosen because its
//! eight colours stay distinct for protanopia, deuteranopia and tritanopia; its yellow
//! (#F0E442) is left out because it is too light on white, and the darkest colours come first
//! so the first lines also print well.

/// One line style: stroke colour, SVG `stroke-dasharray` (empty for a solid line) and marker.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct LineStyle {
    /// `#rrggbb`.
    pub colour: &'static str,
    /// `stroke-dasharray` value; `""` for solid.
    pub dash: &'static str,
    /// Marker shape drawn at a few points of the line.
    pub marker: Marker,
}

/// Marker shapes.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Marker {
    /// A filled circle.
    Circle,
    /// A filled square.
    Square,
    /// A filled triangle pointing up.
    Triangle,
    /// An open diamond.
    Diamond,
    /// A cross (x).
    Cross,
    /// An open circle.
    Ring,
    /// A plus.
    Plus,
}

/// The styles in the order series take them.
pub const STYLES: [LineStyle; 7] = [
    LineStyle {
        colour: "#0072B2", // blue
        dash: "",
        marker: Marker::Circle,
    },
    LineStyle {
        colour: "#D55E00", // vermillion
        dash: "9 4",
        marker: Marker::Square,
    },
    LineStyle {
        colour: "#009E73", // bluish green
        dash: "2 3",
        marker: Marker::Triangle,
    },
    LineStyle {
        colour: "#CC79A7", // reddish purple
        dash: "12 3 2 3",
        marker: Marker::Diamond,
    },
    LineStyle {
        colour: "#000000", // black
        dash: "5 5",
        marker: Marker::Cross,
    },
    LineStyle {
        colour: "#E69F00", // orange
        dash: "14 4 2 4 2 4",
        marker: Marker::Ring,
    },
    LineStyle {
        colour: "#56B4E9", // sky blue
        dash: "1 3",
        marker: Marker::Plus,
    },
];

/// The style of the `index`-th series (repeating after seven).
pub fn style(index: usize) -> LineStyle {
    STYLES[index % STYLES.len()]
}

/// SVG markup of `marker` centred at (`x`, `y`) in `colour`.
pub fn marker_svg(marker: Marker, x: f64, y: f64, colour: &str) -> String {
    let r = 3.5;
    match marker {
        Marker::Circle => format!("<circle cx=\"{x:.2}\" cy=\"{y:.2}\" r=\"{r}\" fill=\"{colour}\"/>"),
        Marker::Ring => format!(
            "<circle cx=\"{x:.2}\" cy=\"{y:.2}\" r=\"{r}\" fill=\"white\" stroke=\"{colour}\" stroke-width=\"1.5\"/>"
        ),
        Marker::Square => format!(
            "<rect x=\"{:.2}\" y=\"{:.2}\" width=\"{}\" height=\"{}\" fill=\"{colour}\"/>",
            x - r,
            y - r,
            2.0 * r,
            2.0 * r
        ),
        Marker::Triangle => format!(
            "<polygon points=\"{x:.2},{:.2} {:.2},{:.2} {:.2},{:.2}\" fill=\"{colour}\"/>",
            y - r - 0.5,
            x - r,
            y + r,
            x + r,
            y + r
        ),
        Marker::Diamond => format!(
            "<polygon points=\"{x:.2},{:.2} {:.2},{y:.2} {x:.2},{:.2} {:.2},{y:.2}\" fill=\"white\" stroke=\"{colour}\" stroke-width=\"1.5\"/>",
            y - r - 0.5,
            x + r + 0.5,
            y + r + 0.5,
            x - r - 0.5
        ),
        Marker::Cross => format!(
            "<path d=\"M{:.2} {:.2}L{:.2} {:.2}M{:.2} {:.2}L{:.2} {:.2}\" stroke=\"{colour}\" stroke-width=\"2\"/>",
            x - r, y - r, x + r, y + r, x - r, y + r, x + r, y - r
        ),
        Marker::Plus => format!(
            "<path d=\"M{:.2} {y:.2}L{:.2} {y:.2}M{x:.2} {:.2}L{x:.2} {:.2}\" stroke=\"{colour}\" stroke-width=\"2\"/>",
            x - r - 0.5, x + r + 0.5, y - r - 0.5, y + r + 0.5
        ),
    }
}
