//! One instant's Earth orientation: the instant read through the time engine, the EOP table's
//! values at it, the IAU 2006/2000A orientation, and the answer with its warnings.

use super::orientation_types::{EarthOrientationAnswer, EopProvenance};
use super::types::EopLikelyError;
use crate::api::error::ApiError;
use crate::api::time::conversion::{convert_one, Converted, FieldName};
use crate::api::time::forms::FormSelection;
use crate::physics::constants::TT_MINUS_TAI_ATTOS;
use crate::physics::earth::eop::{EopLookupError, EopStatus, EopTable, EopValues};
use crate::physics::earth::orientation::epoch::{tt_julian_date, ut1_julian_date};
use crate::physics::earth::orientation::rotation::EARTH_ROTATION_RATE_RAD_S;
use crate::physics::earth::orientation::{
    earth_orientation_fast, CelestialPoleOffsets, EarthOrientation, JulianDate, ARCSEC_TO_RAD,
};
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::error::{TimeError, TimeErrorKind};
use crate::physics::time::format_name::InstantFormat;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;

const ATTOS_PER_S: f64 = 1e18;
/// GRS80 equatorial radius, metres (Moritz 2000, Geodetic Reference System 1980): the lever arm
/// that turns an angle into metres at the Earth's surface in the warnings.
const EQUATORIAL_RADIUS_M: f64 = 6_378_137.0;

/// What one request asks of every instant it names.
#[derive(Debug, Clone, Copy)]
pub struct OrientationRequest<'a> {
    pub format: InstantFormat,
    pub scale: Scale,
    pub pole_offsets: bool,
    pub leaps: &'a LeapTable,
    pub eop: &'a EopTable,
}

fn lookup_problem(error: &EopLookupError, field: FieldName<'_>) -> ApiError {
    ApiError::unprocessable(error.code(), error.to_string()).with_field(field.text())
}

/// The warnings of predicted or missing EOP, each naming the quantity and its likely error.
fn eop_warnings(values: &EopValues, offsets_applied: bool, wanted: bool) -> Vec<String> {
    let mut warnings = Vec::new();
    if values.status == EopStatus::Predicted {
        let days = values.days_after_observed;
        warnings.push(match values.likely_error {
            Some(sigma) => {
                let pole_m = sigma.xp_arcsec.hypot(sigma.yp_arcsec) * ARCSEC_TO_RAD * EQUATORIAL_RADIUS_M;
                let spin_m = sigma.ut1_minus_utc_s.abs() * EARTH_ROTATION_RATE_RAD_S * EQUATORIAL_RADIUS_M;
                format!(
                    "predicted Earth orientation, {days:.2} days after the last observed day: likely error (1 sigma, as the source states) x_p {:.3} mas, y_p {:.3} mas, UT1 - UTC {:.3} ms; about {pole_m:.3} m (polar motion) and {spin_m:.3} m (UT1, at the equator) at the Earth's surface",
                    sigma.xp_arcsec * 1e3,
                    sigma.yp_arcsec * 1e3,
                    sigma.ut1_minus_utc_s * 1e3,
                )
            }
            None => format!(
                "predicted Earth orientation (x_p, y_p, UT1 - UTC), {days:.2} days after the last observed day: the source states no likely error"
            ),
        });
    }
    if offsets_applied && values.nutation_status == EopStatus::Predicted {
        warnings.push(
            "predicted celestial pole offsets dX, dY: the source states no likely error (their size is some 0.1 mas, 3 m at the Earth's surface; `pole_offsets=false` leaves them out)".to_string(),
        );
    }
    if wanted && !offsets_applied {
        warnings.push(
            "the table gives no celestial pole offsets dX, dY at this instant: CIP X, Y and the matrix are the IAU 2006/2000A model's alone".to_string(),
        );
    }
    warnings
}

fn jd_pair(jd: JulianDate) -> [f64; 2] {
    [jd.jd1, jd.jd2]
}

/// One instant evaluated: the conversions, the table's values and the orientation.
struct Evaluated {
    converted: Converted,
    values: EopValues,
    offsets: Option<CelestialPoleOffsets>,
    tt: JulianDate,
    ut1: JulianDate,
    orientation: EarthOrientation,
}

/// The Earth orientation at the instant written `text` (the physics value, for the frame
/// changes of other endpoints); problems name `field`.
pub fn orientation_at(
    text: &str,
    request: &OrientationRequest<'_>,
    field: FieldName<'_>,
) -> Result<EarthOrientation, ApiError> {
    evaluate(text, request, field).map(|evaluated| evaluated.orientation)
}

/// Reads the instant, looks the table up and evaluates the orientation.
fn evaluate(
    text: &str,
    request: &OrientationRequest<'_>,
    field: FieldName<'_>,
) -> Result<Evaluated, ApiError> {
    let leaps = request.leaps;
    // UT1 readings convert through the EOP table in force (`scale=UT1`).
    let context = ConversionContext::geocentric(leaps).with_ut1(request.eop);
    let targets = [Scale::Utc, Scale::Tt];
    let converted = convert_one(
        text,
        request.format,
        request.scale,
        &targets,
        &context,
        field,
    )
    .map_err(|error| {
        // Before 1960 UTC does not exist, and the table (from 1962) has no values either.
        if request.scale != Scale::Utc && error.problem().code == TimeErrorKind::BeforeUtc.as_str()
        {
            let first_mjd = request.eop.first_mjd().unwrap_or(0);
            lookup_problem(&EopLookupError::BeforeTable { first_mjd }, field)
        } else {
            error
        }
    })?;
    let tt_attos = converted.results[1].digits.reading_count_attos();
    let tai_attos = tt_attos - TT_MINUS_TAI_ATTOS;
    let (utc_mjd, sod_attos) = leaps
        .utc_from_tai(tai_attos)
        .map_err(|e| ApiError::from_time(&TimeError::BeforeUtc(e.to_string()), field.text()))?;
    let tai_minus_utc_attos = leaps.tai_minus_utc_attos(utc_mjd, sod_attos).unwrap_or(0);
    let values = request
        .eop
        .at_utc(leaps, utc_mjd, sod_attos as f64 / ATTOS_PER_S)
        .map_err(|e| lookup_problem(&e, field))?;
    let offsets = match (request.pole_offsets, values.dx_arcsec, values.dy_arcsec) {
        (true, Some(dx), Some(dy)) => Some(CelestialPoleOffsets {
            dx_rad: dx * ARCSEC_TO_RAD,
            dy_rad: dy * ARCSEC_TO_RAD,
        }),
        _ => None,
    };
    let tt = tt_julian_date(tt_attos);
    let ut1 = ut1_julian_date(tt_attos, tai_minus_utc_attos, values.ut1_minus_utc_s);
    let (xp_rad, yp_rad) = (
        values.xp_arcsec * ARCSEC_TO_RAD,
        values.yp_arcsec * ARCSEC_TO_RAD,
    );
    Ok(Evaluated {
        converted,
        values,
        offsets,
        tt,
        ut1,
        orientation: earth_orientation_fast(tt, ut1, xp_rad, yp_rad, offsets),
    })
}

/// The Earth orientation at the instant written `text`; problems name `field`.
pub fn orientation_one(
    text: &str,
    request: &OrientationRequest<'_>,
    field: FieldName<'_>,
) -> Result<EarthOrientationAnswer, ApiError> {
    let Evaluated {
        converted,
        values,
        offsets,
        tt,
        ut1,
        orientation,
    } = evaluate(text, request, field)?;
    let mut warnings = converted.warnings.clone();
    warnings.extend(eop_warnings(
        &values,
        offsets.is_some(),
        request.pole_offsets,
    ));
    let (xp_rad, yp_rad) = (
        values.xp_arcsec * ARCSEC_TO_RAD,
        values.yp_arcsec * ARCSEC_TO_RAD,
    );
    let forms = FormSelection::default();
    Ok(EarthOrientationAnswer {
        input: forms.json(&converted.input),
        utc: forms.json(&converted.results[0].digits),
        tt: forms.json(&converted.results[1].digits),
        tt_jd: jd_pair(tt),
        ut1_jd: jd_pair(ut1),
        era_rad: orientation.era_rad,
        era_deg: orientation.era_rad.to_degrees(),
        gmst_rad: orientation.gmst_rad,
        gmst_deg: orientation.gmst_rad.to_degrees(),
        gast_rad: orientation.gast_rad,
        gast_deg: orientation.gast_rad.to_degrees(),
        ut1_minus_utc_s: values.ut1_minus_utc_s,
        lod_s: values.lod_s,
        xp_arcsec: values.xp_arcsec,
        yp_arcsec: values.yp_arcsec,
        xp_rad,
        yp_rad,
        dx_arcsec: values.dx_arcsec,
        dy_arcsec: values.dy_arcsec,
        pole_offsets_applied: offsets.is_some(),
        cip_x_rad: orientation.x_rad,
        cip_y_rad: orientation.y_rad,
        s_rad: orientation.s_rad,
        sprime_rad: orientation.sprime_rad,
        gcrs_to_itrs: orientation.matrix,
        eop: EopProvenance {
            source: request.eop.source().to_string(),
            status: values.status.as_str().to_string(),
            nutation_status: values.nutation_status.as_str().to_string(),
            days_after_observed: values.days_after_observed,
            likely_error: values.likely_error.map(|sigma| EopLikelyError {
                xp_arcsec: sigma.xp_arcsec,
                yp_arcsec: sigma.yp_arcsec,
                ut1_minus_utc_s: sigma.ut1_minus_utc_s,
            }),
        },
        warnings,
    })
}
