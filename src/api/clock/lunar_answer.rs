//! Answer types of a lunar site with the `de440_ephemeris` model.

use serde::Serialize;
use utoipa::ToSchema;

/// The rate of the lunar clock against one scale at the epoch. Positive = the clock runs fast.
#[derive(Debug, Clone, Copy, Serialize, ToSchema)]
pub struct LunarRateAgainst {
    /// Fractional rate d(tau)/dX - 1 at the epoch (first order).
    pub fractional: f64,
    /// The same in microseconds per day.
    pub us_per_day: f64,
    /// The mean rate over the anomalistic month (27.55455 d) centred on the epoch, us/day.
    pub month_mean_us_per_day: f64,
    /// The periodic part at the epoch: `us_per_day - month_mean_us_per_day`.
    pub periodic_us_per_day: f64,
}

/// The rates of the lunar clock at its epoch.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct LunarEpochAnswer {
    /// The epoch in TDB, `YYYY-MM-DDThh:mm:ss TDB` (rounded to the second).
    pub epoch_tdb: String,
    /// Against TT (geocentric frame: as an Earth station compares the clock).
    pub tt: LunarRateAgainst,
    /// Against TCG (geocentric frame).
    pub tcg: LunarRateAgainst,
    /// Against TCL (selenocentric frame).
    pub tcl: LunarRateAgainst,
    /// Against TL (a proposal: TCL scaled by L_L).
    pub tl: LunarRateAgainst,
    /// The clocks' TL against TT at the epoch, us/day (`tt - tl`).
    pub tl_against_tt_clocks_us_per_day: f64,
    /// TL against TT through the scale relations at the two centres (as the conversions
    /// relate them), us/day.
    pub tl_against_tt_scales_us_per_day: f64,
    /// The coordinate-simultaneity term: scales minus clocks, us/day (the derivative of the
    /// v.x/c^2 terms; tens of us/day over a month, zero on average). Not part of the clock.
    pub simultaneity_us_per_day: f64,
}

/// Proper time accumulated against one scale over the span.
#[derive(Debug, Clone, Copy, Serialize, ToSchema)]
pub struct LunarAccumulatedAnswer {
    /// tau - X accumulated from start to end, s.
    pub offset_s: f64,
    /// The secular (mean) fractional rate, `offset_s` over the span's length.
    pub mean_fractional: f64,
    /// The same in microseconds per day.
    pub mean_us_per_day: f64,
    /// The periodic part (tau - X minus the secular line; zero at both ends): its smallest
    /// value, s.
    pub periodic_min_s: f64,
    /// Its largest value, s.
    pub periodic_max_s: f64,
    /// Its peak to peak, s.
    pub periodic_peak_to_peak_s: f64,
}

/// The lunar clock over a span.
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct LunarSpanAnswer {
    /// Start in TDB (rounded to the second).
    pub start_tdb: String,
    /// End in TDB (rounded to the second).
    pub end_tdb: String,
    /// The integration step, s (Simpson's rule, at most 3600 s).
    pub step_s: f64,
    /// Against TT (geocentric frame).
    pub tt: LunarAccumulatedAnswer,
    /// Against TCG (geocentric frame).
    pub tcg: LunarAccumulatedAnswer,
    /// Against TCL (selenocentric frame).
    pub tcl: LunarAccumulatedAnswer,
    /// Against TL (a proposal).
    pub tl: LunarAccumulatedAnswer,
    /// The clocks' TL - TT over the span, s: (tau - TT) - (tau - TL).
    pub tl_minus_tt_clocks_s: f64,
    /// The change of TL - TT over the span through the scale relations at the two centres
    /// (as the conversions give it), s.
    pub tl_minus_tt_scales_s: f64,
    /// The coordinate-simultaneity term over the span, s: scales minus clocks. Not part of the
    /// clock's proper time.
    pub simultaneity_s: f64,
}

/// A lunar clock on the real lunar orbit (`de440_ephemeris`).
#[derive(Debug, Clone, Serialize, ToSchema)]
pub struct LunarAnswer {
    /// The lunar gravity field: `grail_gl0660b_degree2`.
    pub gravity_field: String,
    /// The Moon's orientation: `iau_wgccre_2018`.
    pub orientation: String,
    /// Present when `epoch` was given.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub at_epoch: Option<LunarEpochAnswer>,
    /// Present when `span` was given.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub over_span: Option<LunarSpanAnswer>,
    /// TL is a proposal, not a standard.
    pub tl_warning: String,
}
