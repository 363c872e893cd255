//! Checks of a track before interpolation: finite numbers, above the Earth's surface, slower
//! than light, strictly increasing epochs, enough states, no long gaps.

use super::super::error::TrajectoryError;
use super::super::{Frame, ObjectTrack};
use super::tt_axis::TtAxis;
use super::InterpolationOptions;
use crate::physics::constants::{GRS80_SEMI_MINOR_AXIS_M, SPEED_OF_LIGHT_M_S};
use crate::physics::lunar_orbit::check_orbit_distance;
use crate::physics::readable::readable;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::instant::Instant;
use crate::trajectory::error::epoch_error_code;

/// An exact attosecond difference in seconds, converted once: one rounding of the i128 to f64
/// and one correctly rounded division by 1e18, which is exact in binary64 (2^18 5^18, with
/// 5^18 < 2^53). A whole number of seconds therefore comes out exact (60 s reads 60, not
/// 60.000000000000014 as a product with the inexact 1e-18 did), and no i128 division, which
/// is slow, is needed.
pub(crate) fn attos_difference_s(attos: i128) -> f64 {
    attos as f64 / 1e18
}

fn norm(vector: &[f64; 3]) -> f64 {
    (vector[0] * vector[0] + vector[1] * vector[1] + vector[2] * vector[2]).sqrt()
}

/// Validates a track and returns its epochs as TT seconds since its first epoch.
///
/// Errors (each naming the object and the state index): `not_finite`, `below_surface`
/// (|r| below the GRS80 polar radius, 6 356 752 m), `speed_not_below_c`,
/// `epochs_not_increasing` (duplicates included), `gap_too_long` (index of the state after the
/// gap), `too_few_states` (fewer than the interpolation window needs), `bad_option`.
pub fn validate_track(
    track: &ObjectTrack,
    options: &InterpolationOptions,
    context: &ConversionContext<'_>,
) -> Result<Vec<f64>, TrajectoryError> {
    options.check()?;
    let id = track.id.as_str();
    let needed = options.window(track.has_velocities());
    if track.states.len() < needed {
        return Err(TrajectoryError::new(
            "too_few_states",
            format!(
                "{} states; interpolation with a window of {needed} needs at least {needed}",
                track.states.len()
            ),
        )
        .for_object(id));
    }
    let (Some(first), Some(last)) = (track.states.first(), track.states.last()) else {
        return Ok(Vec::new());
    };
    let axis = TtAxis::new(context, &first.epoch, &last.epoch, track.states.len());
    let tt_of = |index: usize, epoch: &Instant| {
        axis.tt_attos(epoch)
            .map_err(|e| TrajectoryError::at_state(epoch_error_code(&e), id, index, e.to_string()))
    };
    let first_tt = tt_of(0, &first.epoch)?;
    let mut times_s = Vec::with_capacity(track.states.len());
    let mut previous_tt: Option<i128> = None;
    for (index, state) in track.states.iter().enumerate() {
        let velocity = state.velocity_m_s.unwrap_or([0.0; 3]);
        if !state
            .position_m
            .iter()
            .chain(velocity.iter())
            .all(|x| x.is_finite())
        {
            return Err(TrajectoryError::at_state(
                "not_finite",
                id,
                index,
                "the position or velocity is not a finite number",
            ));
        }
        let radius_m = norm(&state.position_m);
        if track.frame == Frame::LunarInertial {
            check_orbit_distance(radius_m)
                .map_err(|(code, message)| TrajectoryError::at_state(code, id, index, message))?;
        } else if radius_m < GRS80_SEMI_MINOR_AXIS_M {
            return Err(TrajectoryError::at_state(
                "below_surface",
                id,
                index,
                format!("the geocentric distance is {radius_m:.1} m, below the Earth's polar radius (6 356 752 m); positions must be geocentric and in metres"),
            ));
        }
        let speed_m_s = norm(&velocity);
        if speed_m_s >= SPEED_OF_LIGHT_M_S {
            return Err(TrajectoryError::at_state(
                "speed_not_below_c",
                id,
                index,
                format!("the speed is {speed_m_s:.6e} m/s, not below c; velocities must be in m/s"),
            ));
        }
        let tt = tt_of(index, &state.epoch)?;
        if let Some(previous) = previous_tt {
            if tt <= previous {
                return Err(TrajectoryError::at_state(
                    "epochs_not_increasing",
                    id,
                    index,
                    "the epoch is not after the previous state's epoch; epochs must be strictly increasing, without duplicates",
                ));
            }
            let gap_s = attos_difference_s(tt - previous);
            if gap_s > options.max_gap_s {
                return Err(TrajectoryError::at_state(
                    "gap_too_long",
                    id,
                    index,
                    format!(
                        "{gap_s} s since the previous state, more than the allowed {} s",
                        readable(options.max_gap_s),
                        gap_s = readable(gap_s)
                    ),
                ));
            }
        }
        previous_tt = Some(tt);
        times_s.push(attos_difference_s(tt - first_tt));
    }
    Ok(times_s)
}
