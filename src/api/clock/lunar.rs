//! A lunar-site item: the `circular_orbit` model without epoch and span, the
//! `de440_ephemeris` model with either (rates at the epoch with their anomalistic-month mean,
//! the proper time over the span), against TT, TCG, TCL and TL.

use super::lunar_answer::{
    LunarAccumulatedAnswer, LunarAnswer, LunarEpochAnswer, LunarRateAgainst, LunarSpanAnswer,
};
use super::notes;
use super::orbit_item::Origins;
use super::types::LunarSiteInput;
use crate::api::error::ApiError;
use crate::api::names::parse_scale;
use crate::physics::earth::eop::EopTable;
use crate::physics::gravity::GravityModel;
use crate::physics::moon::gravity::LUNAR_GRAVITY_MODEL;
use crate::physics::moon::site::{
    lunar_site_rates, site_body_fixed_m, tl_minus_tt_at_centres_s, tl_rate_against_tt_at_centres,
    LunarClockError, LUNAR_EPHEMERIS_NOTES,
};
use crate::physics::moon::span::{
    lunar_site_over_span, mean_over_anomalistic_month, Accumulated, MAX_STEP_S,
};
use crate::physics::moon::{LunarSiteModel, ORIENTATION_MODEL};
use crate::physics::rate::{lunar_site_rate, LunarSite, RateParts, RateReference};
use crate::physics::solar_system::ephemeris::tdb_text;
use crate::physics::solar_system::{Body, Ephemeris};
use crate::physics::time::convert::{convert, ConversionContext};
use crate::physics::time::formats::{parse_instant, InstantFormat};
use crate::physics::time::instant::{seconds_f64_to_attos, ATTOS_PER_SECOND};
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::lunar::TL_WARNING;
use crate::physics::time::scale::Scale;

/// The most items with the `de440_ephemeris` lunar model in one request: each integrates up to
/// 87 840 hourly samples (a 3660-day span; 2.9 us a sample in the `lunar_site` bench, so about
/// 0.25 s), and this bounds the work a single request can start to about 25 s.
pub const MAX_LUNAR_EPHEMERIS_ITEMS: usize = 100;

/// Whether `item` asks for the `de440_ephemeris` lunar model (an epoch or a span).
pub fn uses_lunar_ephemeris(item: &super::types::RateItem) -> bool {
    item.lunar_site
        .as_ref()
        .is_some_and(|site| site.epoch.is_some() || site.span.is_some())
}

/// How many lunar items with the DE440 model `items` hold; 422 `batch_too_large` naming
/// `field` above [`MAX_LUNAR_EPHEMERIS_ITEMS`].
pub fn check_lunar_items<'a>(
    items: impl IntoIterator<Item = &'a super::types::RateItem>,
    field: &str,
) -> Result<usize, ApiError> {
    let count = items
        .into_iter()
        .filter(|i| uses_lunar_ephemeris(i))
        .count();
    if count > MAX_LUNAR_EPHEMERIS_ITEMS {
        return Err(ApiError::unprocessable(
            "batch_too_large",
            format!("{count} lunar sites with an epoch or a span in one request; at most {MAX_LUNAR_EPHEMERIS_ITEMS} (each integrates the DE440 lunar orbit): split the request"),
        )
        .with_field(field));
    }
    Ok(count)
}

/// What a lunar item answers.
pub(super) struct LunarItem {
    pub(super) parts: RateParts,
    pub(super) model: LunarSiteModel,
    pub(super) notes: Vec<String>,
    pub(super) lunar: Option<LunarAnswer>,
}

fn us_day(fractional: f64) -> f64 {
    fractional * 86_400e6
}

/// Reads `text` (ISO 8601 in `scale`) as TDB seconds since J2000.0; 422 naming `field`.
fn tdb_seconds(text: &str, scale: Scale, field: &str, eop: &EopTable) -> Result<f64, ApiError> {
    let table = LeapTable::builtin();
    let instant = parse_instant(text, InstantFormat::Iso, scale, table)
        .map_err(|e| ApiError::from_time(&e, field))?;
    let context = ConversionContext::geocentric(table).with_ut1(eop);
    let tdb =
        convert(&instant, Scale::Tdb, &context).map_err(|e| ApiError::from_time(&e, field))?;
    Ok(tdb.count_attos() as f64 / ATTOS_PER_SECOND as f64)
}

/// A lunar-clock error as a 422: site and span values through `origins`, epochs at `field`
/// with `context` added.
fn problem(error: LunarClockError, origins: &Origins<'_>, field: &str, context: &str) -> ApiError {
    match error {
        LunarClockError::Input(e) => origins.error(e),
        LunarClockError::Ephemeris(e) => {
            ApiError::unprocessable(e.code(), format!("{field}: {e}{context}")).with_field(field)
        }
        LunarClockError::Time(e) => {
            ApiError::unprocessable(e.code(), format!("{field}: {e}{context}")).with_field(field)
        }
    }
}

/// Checks that an epoch lies inside the ephemeris and the TCL representation; 422 at `field`.
fn check_epoch(tdb_s: f64, ephemeris: &Ephemeris, field: &str) -> Result<(), ApiError> {
    ephemeris
        .state_m(Body::Moon, Body::Earth, seconds_f64_to_attos(tdb_s))
        .map_err(|e| {
            ApiError::unprocessable(e.code(), format!("{field}: {e}")).with_field(field)
        })?;
    tl_minus_tt_at_centres_s(tdb_s).map_err(|e| ApiError::from_time(&e, field))?;
    Ok(())
}

fn against(at: f64, mean: f64) -> LunarRateAgainst {
    LunarRateAgainst {
        fractional: at,
        us_per_day: us_day(at),
        month_mean_us_per_day: us_day(mean),
        periodic_us_per_day: us_day(at - mean),
    }
}

fn accumulated(a: &Accumulated) -> LunarAccumulatedAnswer {
    LunarAccumulatedAnswer {
        offset_s: a.offset_s,
        mean_fractional: a.mean_rate,
        mean_us_per_day: us_day(a.mean_rate),
        periodic_min_s: a.periodic_min_s,
        periodic_max_s: a.periodic_max_s,
        periodic_peak_to_peak_s: a.periodic_peak_to_peak_s(),
    }
}

/// Evaluates a lunar site item (its JSON path is `origins.path`).
pub(super) fn lunar_item(
    input: &LunarSiteInput,
    reference: RateReference,
    requested_model: Option<GravityModel>,
    origins: &Origins<'_>,
    (eop, ephemeris): (&EopTable, &Ephemeris),
) -> Result<LunarItem, ApiError> {
    let site = LunarSite {
        latitude_deg: input.latitude_deg,
        longitude_deg: input.longitude_deg,
        height_m: input.height_m.unwrap_or(0.0),
    };
    let base = format!("{}.lunar_site", origins.path);
    // The site first, so that its problems are named before any epoch's.
    site_body_fixed_m(&site).map_err(|e| origins.error(e))?;
    let scale = parse_scale(
        input.epoch_scale.as_deref().unwrap_or("UTC"),
        &format!("{base}.epoch_scale"),
    )?;
    let pick = |rates: (f64, f64)| match reference {
        RateReference::Tt => rates.0,
        RateReference::Tcg => rates.1,
    };
    let mut parts: Option<RateParts> = None;
    let at_epoch = match &input.epoch {
        None => None,
        Some(text) => {
            let field = format!("{base}.epoch");
            let tdb_s = tdb_seconds(text, scale, &field, eop)?;
            check_epoch(tdb_s, ephemeris, &field)?;
            let at = lunar_site_rates(&site, tdb_s, ephemeris)
                .map_err(|e| problem(e, origins, &field, ""))?;
            let month = mean_over_anomalistic_month(&site, tdb_s, ephemeris).map_err(|e| {
                problem(e, origins, &field, "; the rate at an epoch comes with its mean over the anomalistic month centred on it, which must lie inside that span too")
            })?;
            let scales = tl_rate_against_tt_at_centres(tdb_s)
                .map_err(|e| problem(e.into(), origins, &field, ""))?;
            let clocks = at.tt.total() - at.tl.total();
            parts = Some(match reference {
                RateReference::Tt => at.tt,
                RateReference::Tcg => at.tcg,
            });
            Some(LunarEpochAnswer {
                epoch_tdb: format!("{} TDB", tdb_text(tdb_s)),
                tt: against(at.tt.total(), month.tt.mean_rate),
                tcg: against(at.tcg.total(), month.tcg.mean_rate),
                tcl: against(at.tcl.total(), month.tcl.mean_rate),
                tl: against(at.tl.total(), month.tl.mean_rate),
                tl_against_tt_clocks_us_per_day: us_day(clocks),
                tl_against_tt_scales_us_per_day: us_day(scales),
                simultaneity_us_per_day: us_day(scales - clocks),
            })
        }
    };
    let over_span = match &input.span {
        None => None,
        Some(span) => {
            let start_field = format!("{base}.span.start");
            let end_field = format!("{base}.span.end");
            let start = tdb_seconds(&span.start, scale, &start_field, eop)?;
            let end = tdb_seconds(&span.end, scale, &end_field, eop)?;
            check_epoch(start, ephemeris, &start_field)?;
            check_epoch(end, ephemeris, &end_field)?;
            let over = lunar_site_over_span(&site, start, end, MAX_STEP_S, ephemeris)
                .map_err(|e| problem(e, origins, &format!("{base}.span"), ""))?;
            if parts.is_none() {
                let sr = over.geocentric_sr_mean;
                let total = pick((over.tt.mean_rate, over.tcg.mean_rate));
                parts = Some(RateParts {
                    reference,
                    sr,
                    gr: total - sr,
                });
            }
            Some(LunarSpanAnswer {
                start_tdb: format!("{} TDB", tdb_text(start)),
                end_tdb: format!("{} TDB", tdb_text(end)),
                step_s: over.step_s,
                tt: accumulated(&over.tt),
                tcg: accumulated(&over.tcg),
                tcl: accumulated(&over.tcl),
                tl: accumulated(&over.tl),
                tl_minus_tt_clocks_s: over.tt.offset_s - over.tl.offset_s,
                tl_minus_tt_scales_s: over.tl_minus_tt_scales_s,
                simultaneity_s: over.simultaneity_s,
            })
        }
    };
    let Some(parts) = parts else {
        // Neither an epoch nor a span: the circular-orbit model.
        let parts = lunar_site_rate(&site, reference).map_err(|e| origins.error(e))?;
        return Ok(LunarItem {
            parts,
            model: LunarSiteModel::CircularOrbit,
            notes: notes::lunar(requested_model.is_some_and(|m| m != GravityModel::PointMass)),
            lunar: None,
        });
    };
    Ok(LunarItem {
        parts,
        model: LunarSiteModel::De440Ephemeris,
        notes: notes::lunar_ephemeris(&LUNAR_EPHEMERIS_NOTES),
        lunar: Some(LunarAnswer {
            gravity_field: LUNAR_GRAVITY_MODEL.to_string(),
            orientation: ORIENTATION_MODEL.to_string(),
            at_epoch,
            over_span,
            tl_warning: TL_WARNING.to_string(),
        }),
    })
}
