//! The proper-time answer as a figure: per object, tau - t with its velocity and gravity parts
//! on one panel, the periodic part on its own panel and, with the tides (`j2_sun_moon`), the
//! tidal part on a third, against the time elapsed since the object's first epoch.

use super::types::{ObjectOutput, ProperTimeAnswer, SampleOutput};
use crate::api::plots::figure::{
    elapsed_unit, seconds_unit, short_iso, Figure, Panel, Series, XTicks,
};
use crate::physics::gravity::GravityModel;

/// Most samples drawn per line; a longer series is drawn every k-th sample (the first and the
/// last always), and the subtitle says so. The CSV answer keeps every sample.
pub const MAX_DRAWN_SAMPLES: usize = 2_000;

/// The indices of `count` samples drawn: all of them up to [`MAX_DRAWN_SAMPLES`], otherwise
/// every k-th (k the smallest stride that fits) and the last.
pub fn drawn_indices(count: usize) -> Vec<usize> {
    if count <= MAX_DRAWN_SAMPLES {
        return (0..count).collect();
    }
    let stride = count.div_ceil(MAX_DRAWN_SAMPLES - 1);
    let mut indices: Vec<usize> = (0..count).step_by(stride).collect();
    if indices.last() != Some(&(count - 1)) {
        indices.push(count - 1);
    }
    indices
}

fn largest_abs(samples: &[&SampleOutput], part: impl Fn(&SampleOutput) -> f64) -> f64 {
    samples
        .iter()
        .map(|s| part(s).abs())
        .filter(|v| v.is_finite())
        .fold(0.0, f64::max)
}

fn object_panels(object: &ObjectOutput, reference: &str, tides: bool) -> Vec<Panel> {
    let all = object.series.as_deref().unwrap_or(&[]);
    let samples: Vec<&SampleOutput> = drawn_indices(all.len())
        .into_iter()
        .map(|i| &all[i])
        .collect();
    let x: Vec<f64> = samples.iter().map(|s| s.elapsed_s).collect();
    let column = |part: fn(&SampleOutput) -> f64| -> Vec<Option<f64>> {
        samples.iter().map(|s| Some(part(s))).collect()
    };
    let main_scale = largest_abs(&samples, |s| s.tau_minus_t_s)
        .max(largest_abs(&samples, |s| s.velocity_part_s))
        .max(largest_abs(&samples, |s| s.gravity_part_s));
    let periodic_scale = largest_abs(&samples, |s| s.periodic_s);
    let tidal_scale = largest_abs(&samples, |s| s.tidal_part_s);
    let start = short_iso(object.summary.start.iso.as_deref().unwrap_or_default());
    let tidal = tides.then(|| Panel {
        x: x.clone(),
        heading: format!("{}: tidal part (the Sun and the Moon)", object.id),
        y_quantity: "tidal part".to_string(),
        y_unit: seconds_unit(tidal_scale),
        series: vec![Series {
            name: "tidal part".to_string(),
            column: "tidal_part_s".to_string(),
            values: column(|s| s.tidal_part_s),
        }],
        marks: Vec::new(),
        zero_line: true,
    });
    let mut panels = vec![
        Panel {
            x: x.clone(),
            heading: format!(
                "{}: tau - t against {reference}, from {start} ({})",
                object.id, object.time_scale
            ),
            y_quantity: "tau - t".to_string(),
            y_unit: seconds_unit(main_scale),
            series: vec![
                Series {
                    name: "tau - t (total)".to_string(),
                    column: "tau_minus_t_s".to_string(),
                    values: column(|s| s.tau_minus_t_s),
                },
                Series {
                    name: "velocity part".to_string(),
                    column: "velocity_part_s".to_string(),
                    values: column(|s| s.velocity_part_s),
                },
                Series {
                    name: "gravity part".to_string(),
                    column: "gravity_part_s".to_string(),
                    values: column(|s| s.gravity_part_s),
                },
            ],
            marks: Vec::new(),
            zero_line: true,
        },
        Panel {
            x,
            heading: format!("{}: periodic part (eccentricity term)", object.id),
            y_quantity: "periodic part".to_string(),
            y_unit: seconds_unit(periodic_scale),
            series: vec![Series {
                name: "periodic part".to_string(),
                column: "periodic_s".to_string(),
                values: column(|s| s.periodic_s),
            }],
            marks: Vec::new(),
            zero_line: true,
        },
    ];
    panels.extend(tidal);
    panels
}

/// The figure of a proper-time answer (its series must be present).
pub fn figure(answer: &ProperTimeAnswer) -> Figure {
    let span_s = answer
        .objects
        .iter()
        .map(|o| o.summary.span_s)
        .fold(0.0, f64::max);
    let longest = answer
        .objects
        .iter()
        .map(|o| o.series.as_ref().map_or(0, Vec::len))
        .max()
        .unwrap_or(0);
    let sampling = if longest > MAX_DRAWN_SAMPLES {
        format!(
            "; one sample in {} drawn, of up to {longest} (the CSV answer has all)",
            longest.div_ceil(MAX_DRAWN_SAMPLES - 1)
        )
    } else {
        String::new()
    };
    let ids: Vec<&str> = answer.objects.iter().map(|o| o.id.as_str()).collect();
    let tides = answer.gravity_model == GravityModel::J2SunMoon.as_str();
    Figure {
        title: format!("Proper time along the ephemeris: {}", ids.join(", ")),
        subtitle: format!(
            "tau - t of each object's clock against {}, gravity model {}; velocity part -v^2/2c^2, gravity part from the Earth's potential{} (IERS Conventions (2010) eq. 10.6){sampling}",
            answer.reference,
            answer.gravity_model,
            if tides {
                ", tidal part from the Sun's and the Moon's (on its own panel)"
            } else {
                ""
            }
        ),
        x_quantity: "time since the object's first epoch".to_string(),
        x_column: "elapsed_s".to_string(),
        x_unit: elapsed_unit(span_s),
        x_ticks: XTicks::Numeric,
        labels: Vec::new(),
        panels: answer
            .objects
            .iter()
            .flat_map(|object| object_panels(object, &answer.reference, tides))
            .collect(),
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn long_series_are_thinned_with_both_ends() {
        // Common practice: a fixed stride keeps the shape; first and last sample kept.
        assert_eq!(drawn_indices(5), vec![0, 1, 2, 3, 4]);
        let thinned = drawn_indices(86_401);
        assert!(thinned.len() <= MAX_DRAWN_SAMPLES);
        assert_eq!(thinned[0], 0);
        assert_eq!(*thinned.last().unwrap_or(&0), 86_400);
    }
}
