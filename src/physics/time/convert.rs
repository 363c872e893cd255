//! Conversions between time scales, all through TT; UT1 through UTC (see the `ut1` module).
//!
//! Fixed offsets are added exactly in attoseconds; the rate relations (TCG, TCB) and the TDB
//! series are evaluated in `f64` on offsets of at most tens of seconds, so their rounding stays
//! below 1e-14 s.

use super::error::TimeError;
use super::instant::{
    attos_to_seconds_f64, seconds_f64_to_attos, Instant, ATTOS_MIDNIGHT_TO_J2000, ATTOS_PER_DAY,
    ATTOS_PER_SECOND,
};
use super::leap_seconds::LeapTable;
use super::lunar::{tcb_minus_tcl_s, tcl_minus_tl_s, tl_minus_tcl_s, SPAN_TEXT as LUNAR_SPAN_TEXT};
use super::scale::Scale;
use super::tdb_ephemeris::{tdb_minus_tt_ephemeris_s, SPAN_TEXT};
use super::tdb_model::TdbModel;
use super::tdb_series::{
    tdb_minus_tt_fast_s, tdb_minus_tt_series_s, topocentric_part_s, TopocentricObserver,
};
use super::ut1::{tai_from_ut1_attos, ut1_from_tai, ut1_minus_tai_attos, Ut1Source};
use crate::physics::constants;
use crate::physics::constants::{L_B, L_G, T0_TO_J2000_ATTOS, TDB0_S, TT_MINUS_TAI_ATTOS};

/// L_G / (1 - L_G): the TCG - TT rate seen from TT.
const TCG_RATE_FROM_TT: f64 = L_G / (1.0 - L_G);
/// 1 / (1 - L_B).
const TCB_SCALE_FROM_TDB: f64 = 1.0 / (1.0 - L_B);
/// GPST (and GST, QZSST) minus TAI in attoseconds (IS-GPS-200).
const GPST_MINUS_TAI_ATTOS: i128 = constants::GPST_MINUS_TAI_S as i128 * ATTOS_PER_SECOND;
/// BDT minus TAI in attoseconds (BeiDou OS ICD).
const BDT_MINUS_TAI_ATTOS: i128 = constants::BDT_MINUS_TAI_S as i128 * ATTOS_PER_SECOND;

/// Which evaluation of the TDB - TT series to use.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default)]
pub enum TdbEvaluation {
    /// The fitted representation (within 1e-13 s of the full series), fast.
    #[default]
    Fitted,
    /// All 787 terms of Fairhead & Bretagnon (1990), the reference.
    FullSeries,
}

/// What a conversion needs besides the instant.
#[derive(Debug, Clone, Copy)]
pub struct ConversionContext<'a> {
    /// The leap-second table in force.
    pub table: &'a LeapTable,
    /// An observer on the Earth for the topocentric part of TDB - TT (geocentric when `None`).
    pub observer: Option<TopocentricObserver>,
    /// Fitted or full TDB - TT series (for [`TdbModel::Series`]).
    pub tdb_evaluation: TdbEvaluation,
    /// The model of TDB - TT: the series (default) or the DE440 integral.
    pub tdb_model: TdbModel,
    /// The source of UT1 - UTC (the Earth orientation table in force), for UT1 and the
    /// topocentric TDB term; `None`: conversions to or from UT1 fail with
    /// [`TimeError::Ut1Unavailable`].
    pub ut1: Option<&'a dyn Ut1Source>,
}

impl<'a> ConversionContext<'a> {
    /// A geocentric context with the fitted TDB series.
    pub fn geocentric(table: &'a LeapTable) -> Self {
        Self {
            table,
            observer: None,
            tdb_evaluation: TdbEvaluation::Fitted,
            tdb_model: TdbModel::Series,
            ut1: None,
        }
    }

    /// The same context with `model` for TDB - TT.
    pub fn with_tdb_model(self, model: TdbModel) -> Self {
        Self {
            tdb_model: model,
            ..self
        }
    }

    /// The same context with `source` for UT1 - UTC.
    pub fn with_ut1(self, source: &'a dyn Ut1Source) -> Self {
        Self {
            ut1: Some(source),
            ..self
        }
    }
}

/// Elapsed time since T0 (1977-01-01T00:00:32.184, JD 2443144.5003725 of the same scale), in
/// seconds, for the rate relations of IERS Conventions (2010) eq. 10.1 and 10.3.
fn seconds_since_t0(count_attos: i128) -> f64 {
    attos_to_seconds_f64(count_attos + T0_TO_J2000_ATTOS)
}

/// TCG - TT at a TT count: L_G / (1 - L_G) * (JD_TT - T0) * 86400 s
/// (IAU 2000 Resolution B1.9; IERS Conventions (2010) eq. 10.1 solved for TCG).
pub fn tcg_minus_tt_s(tt_attos: i128) -> f64 {
    TCG_RATE_FROM_TT * seconds_since_t0(tt_attos)
}

/// TT - TCG at a TCG count: -L_G * (JD_TCG - T0) * 86400 s (IERS Conventions (2010) eq. 10.1).
pub fn tt_minus_tcg_s(tcg_attos: i128) -> f64 {
    -L_G * seconds_since_t0(tcg_attos)
}

/// TCB - TDB at a TDB count: (L_B * (JD_TDB - T0) * 86400 s - TDB0) / (1 - L_B)
/// (IAU 2006 Resolution B3 solved for TCB; IERS Conventions (2010) eq. 10.3).
pub fn tcb_minus_tdb_s(tdb_attos: i128) -> f64 {
    (L_B * seconds_since_t0(tdb_attos) - TDB0_S) * TCB_SCALE_FROM_TDB
}

/// TDB - TCB at a TCB count: -L_B * (JD_TCB - T0) * 86400 s + TDB0 (IAU 2006 Resolution B3).
pub fn tdb_minus_tcb_s(tcb_attos: i128) -> f64 {
    -L_B * seconds_since_t0(tcb_attos) + TDB0_S
}

/// UT1 fraction of day for the topocentric TDB term (ERFA `eraDtdb` argument `ut`): from the
/// context's UT1 source where it covers the epoch; elsewhere (no source, or outside its table)
/// the UTC fraction of day stands in (|UT1 - UTC| < 0.9 s changes the 2 us diurnal term by
/// less than 0.14 ns), and before UTC (1960) TT - 69.184 s stands in for UTC.
fn ut_day_fraction(tt_attos: i128, context: &ConversionContext<'_>) -> f64 {
    let tai = tt_attos - TT_MINUS_TAI_ATTOS;
    if let Ok(ut1_minus_tai) = ut1_minus_tai_attos(tai, context.table, context.ut1) {
        let sod = (tai + ut1_minus_tai + ATTOS_MIDNIGHT_TO_J2000).rem_euclid(ATTOS_PER_DAY);
        return sod as f64 / ATTOS_PER_DAY as f64;
    }
    let seconds_of_day = match context.table.utc_from_tai(tai) {
        Ok((_, sod)) => sod.min(ATTOS_PER_DAY - 1),
        Err(_) => (tt_attos - 69_184 * ATTOS_PER_SECOND / 1000 + ATTOS_PER_DAY / 2)
            .rem_euclid(ATTOS_PER_DAY),
    };
    seconds_of_day as f64 / ATTOS_PER_DAY as f64
}

/// TDB - TT at a TT count with the context's observer, model and series evaluation (seconds).
///
/// Fails only for [`TdbModel::Ephemeris`] outside its span
/// ([`TimeError::OutsideTdbModelSpan`]).
pub fn tdb_minus_tt_s(tt_attos: i128, context: &ConversionContext<'_>) -> Result<f64, TimeError> {
    let tt_s = attos_to_seconds_f64(tt_attos);
    let (ut, observer) = match &context.observer {
        Some(observer) => (ut_day_fraction(tt_attos, context), Some(observer)),
        None => (0.0, None),
    };
    match context.tdb_model {
        TdbModel::Series => Ok(match context.tdb_evaluation {
            TdbEvaluation::Fitted => tdb_minus_tt_fast_s(tt_s, ut, observer),
            TdbEvaluation::FullSeries => tdb_minus_tt_series_s(tt_s, ut, observer),
        }),
        TdbModel::Ephemeris => {
            let geocentric_s = tdb_minus_tt_ephemeris_s(tt_s).ok_or_else(|| {
                TimeError::OutsideTdbModelSpan(format!(
                    "TDB - TT model `ephemeris` (JPL DE440) covers {SPAN_TEXT}; this instant is outside it (the `series` model covers any epoch)"
                ))
            })?;
            let topocentric_s =
                observer.map_or(0.0, |observer| topocentric_part_s(tt_s, ut, observer));
            Ok(geocentric_s + topocentric_s)
        }
    }
}

/// The TT count of an instant. Fails only for UT1 outside the context's UT1 source.
pub fn to_tt_attos(instant: &Instant, context: &ConversionContext<'_>) -> Result<i128, TimeError> {
    let count = instant.count_attos();
    Ok(match instant.scale() {
        Scale::Tt => count,
        Scale::Utc | Scale::Tai => count + TT_MINUS_TAI_ATTOS,
        Scale::Gpst | Scale::Gst | Scale::Qzsst => {
            count - GPST_MINUS_TAI_ATTOS + TT_MINUS_TAI_ATTOS
        }
        Scale::Bdt => count - BDT_MINUS_TAI_ATTOS + TT_MINUS_TAI_ATTOS,
        Scale::Tcg => count + seconds_f64_to_attos(tt_minus_tcg_s(count)),
        Scale::Tdb => tt_from_tdb_attos(count, context)?,
        Scale::Tcb => {
            let tdb = count + seconds_f64_to_attos(tdb_minus_tcb_s(count));
            tt_from_tdb_attos(tdb, context)?
        }
        Scale::Ut1 => tai_from_ut1_attos(count, context.table, context.ut1)? + TT_MINUS_TAI_ATTOS,
        Scale::Tcl => tt_from_tdb_attos(tdb_from_tcl_attos(count)?, context)?,
        Scale::Tl => {
            let tcl = count + seconds_f64_to_attos(tcl_minus_tl_s(seconds_since_t0(count)));
            tt_from_tdb_attos(tdb_from_tcl_attos(tcl)?, context)?
        }
    })
}

/// TCB - TCL at a TDB count, or the lunar span error.
fn tcb_minus_tcl_at_tdb_s(tdb_attos: i128) -> Result<f64, TimeError> {
    tcb_minus_tcl_s(attos_to_seconds_f64(tdb_attos)).ok_or_else(|| {
        TimeError::OutsideLunarTimeSpan(format!(
            "TCL and TL come from the DE440 integral of TCB - TCL at the Moon's centre, which covers {LUNAR_SPAN_TEXT}; this instant is outside it"
        ))
    })
}

/// The TCL count of the event at TDB count `tdb_attos` (at the Moon's centre).
fn tcl_from_tdb_attos(tdb_attos: i128) -> Result<i128, TimeError> {
    let tcb = tdb_attos + seconds_f64_to_attos(tcb_minus_tdb_s(tdb_attos));
    Ok(tcb - seconds_f64_to_attos(tcb_minus_tcl_at_tdb_s(tdb_attos)?))
}

/// Solves TCL = TCB(TDB) - (TCB - TCL)(TDB) for TDB by fixed-point iteration (both terms
/// change by less than 2e-8 s per second, so each step gains about eight digits).
fn tdb_from_tcl_attos(tcl_attos: i128) -> Result<i128, TimeError> {
    let mut tdb = tcl_attos;
    for _ in 0..3 {
        let tcb = tcl_attos + seconds_f64_to_attos(tcb_minus_tcl_at_tdb_s(tdb)?);
        tdb = tcb + seconds_f64_to_attos(tdb_minus_tcb_s(tcb));
    }
    Ok(tdb)
}

/// Solves TT = TDB - (TDB - TT)(TT) by fixed-point iteration (either model changes by less
/// than 4e-10 s per second, so each step gains nine digits; three steps reach the attosecond).
fn tt_from_tdb_attos(tdb_attos: i128, context: &ConversionContext<'_>) -> Result<i128, TimeError> {
    let mut tt = tdb_attos;
    for _ in 0..3 {
        tt = tdb_attos - seconds_f64_to_attos(tdb_minus_tt_s(tt, context)?);
    }
    Ok(tt)
}

/// The instant in `target` of the event at TT count `tt_attos`.
pub fn from_tt_attos(
    tt_attos: i128,
    target: Scale,
    context: &ConversionContext<'_>,
) -> Result<Instant, TimeError> {
    let tai = tt_attos - TT_MINUS_TAI_ATTOS;
    let count = match target {
        Scale::Tt => tt_attos,
        Scale::Tai => tai,
        Scale::Utc => {
            context
                .table
                .utc_from_tai(tai)
                .map_err(|error| TimeError::BeforeUtc(error.to_string()))?;
            tai
        }
        Scale::Gpst | Scale::Gst | Scale::Qzsst => tai + GPST_MINUS_TAI_ATTOS,
        Scale::Bdt => tai + BDT_MINUS_TAI_ATTOS,
        Scale::Ut1 => return ut1_from_tai(tai, context.table, context.ut1),
        Scale::Tcg => tt_attos + seconds_f64_to_attos(tcg_minus_tt_s(tt_attos)),
        Scale::Tdb => tt_attos + seconds_f64_to_attos(tdb_minus_tt_s(tt_attos, context)?),
        Scale::Tcb => {
            let tdb = tt_attos + seconds_f64_to_attos(tdb_minus_tt_s(tt_attos, context)?);
            tdb + seconds_f64_to_attos(tcb_minus_tdb_s(tdb))
        }
        Scale::Tcl => {
            let tdb = tt_attos + seconds_f64_to_attos(tdb_minus_tt_s(tt_attos, context)?);
            tcl_from_tdb_attos(tdb)?
        }
        Scale::Tl => {
            let tdb = tt_attos + seconds_f64_to_attos(tdb_minus_tt_s(tt_attos, context)?);
            let tcl = tcl_from_tdb_attos(tdb)?;
            tcl + seconds_f64_to_attos(tl_minus_tcl_s(seconds_since_t0(tcl)))
        }
    };
    Ok(Instant::from_count_attos(target, count))
}

/// Converts an instant to another scale (the same event, labelled in `target`).
pub fn convert(
    instant: &Instant,
    target: Scale,
    context: &ConversionContext<'_>,
) -> Result<Instant, TimeError> {
    if instant.scale() == target {
        return Ok(*instant);
    }
    from_tt_attos(to_tt_attos(instant, context)?, target, context)
}
