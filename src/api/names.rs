//! The words and text shapes requests may use, read exactly as the OpenAPI document states
//! them: one spelling per value (case-sensitive), so that every value the schema admits is
//! accepted and every value it refuses is refused.
//!
//! Each list is taken from the physics library's own names (`Scale::ALL`, the instant
//! formats), so the document cannot drift from what the code reads.

use std::borrow::Cow;

use utoipa::openapi::schema::{ArrayBuilder, ObjectBuilder, Schema, Type};
use utoipa::openapi::RefOr;
use utoipa::{PartialSchema, ToSchema};

use crate::api::error::ApiError;
use crate::physics::constants::{MAX_GEOCENTRIC_DISTANCE_M, SPEED_OF_LIGHT_M_S};
use crate::physics::rate::{Frame, GravityModel, HeightReference, RateReference};
use crate::physics::signal::TransmitterMotion;
use crate::physics::time::error::TimeError;
use crate::physics::time::formats::InstantFormat;
use crate::physics::time::scale::Scale;
use crate::physics::time::tdb_model::TdbModel;
use crate::physics::vocabulary::Vocabulary;
use crate::trajectory::{
    Frame as EphemerisFrame, EARTH_FIXED_FRAME_FAMILIES, EARTH_FIXED_FRAME_NAMES,
    INERTIAL_FRAME_NAMES,
};

/// The word a target-scale list uses for every scale.
pub const ALL_SCALES: &str = "all";

/// A decimal number as the time engine reads it: optional sign, digits with at most one point.
const DECIMAL: &str = r"[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)";

/// An ISO 8601 calendar (`YYYY-MM-DD`) or ordinal (`YYYY-DDD`) date with month 01-12, day
/// 01-31 and day of year 001-366.
const ISO_DATE: &str = r"[0-9]{4}-(?:(?:0[1-9]|1[0-2])-(?:0[1-9]|[12][0-9]|3[01])|(?:00[1-9]|0[1-9][0-9]|[12][0-9]{2}|3[0-5][0-9]|36[0-6]))";

/// A time of day `hh:mm[:ss[.fraction]]` (hour 00-23, minute 00-59, second 00-59), or the leap
/// second `23:59:60[.fraction]`.
const ISO_TIME: &str =
    r"(?:(?:[01][0-9]|2[0-3]):[0-5][0-9](?::[0-5][0-9](?:\.[0-9]+)?)?|23:59:60(?:\.[0-9]+)?)";

/// The text of an instant in any format: ISO 8601 date with optional time (`T` or a space) and
/// `Z`; a decimal (`mjd`, `jd`, `j2000_s`, `unix_s`); or `WEEK:SECONDS` (`gnss_week`). Which
/// of them applies depends on `format`; whether the date exists (2026-02-30), whether a second
/// 60 is a leap second in the table, whether the year is in range and whether the format fits
/// the scale are checked by the engine (422).
pub fn instant_pattern() -> String {
    format!(
        r"^(?:{}|{DECIMAL}|[0-9]{{1,7}}:\+?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+))$",
        iso_instant()
    )
}

/// A comma-separated list of `names`, without spaces.
fn name_list_pattern(names: &[&str]) -> String {
    let one = format!("(?:{})", names.join("|"));
    format!("^{one}(?:,{one})*$")
}

/// An ISO 8601 date with optional time (`T` or a space) and `Z`, unanchored.
fn iso_instant() -> String {
    format!(r"{ISO_DATE}(?:[T ]{ISO_TIME})?Z?")
}

/// The text of an ISO 8601 instant alone (the `iso` format of [`instant_pattern`]).
pub fn iso_instant_pattern() -> String {
    format!("^(?:{})$", iso_instant())
}

/// A comma-separated list of scale names or `all`, without spaces.
pub fn scale_list_pattern() -> String {
    let names: Vec<&str> = std::iter::once(ALL_SCALES)
        .chain(Scale::SPELLINGS.iter().copied())
        .collect();
    name_list_pattern(&names)
}

/// A comma-separated list of instant form names, without spaces.
pub fn form_list_pattern() -> String {
    name_list_pattern(InstantFormat::SPELLINGS)
}

/// Three decimal numbers `x,y,z` (exponent allowed), without spaces.
pub fn three_numbers_pattern() -> String {
    let number = format!("{DECIMAL}(?:[eE][+-]?[0-9]+)?");
    format!("^{number},{number},{number}$")
}

/// Reads a name of the vocabulary `V` written exactly (one of `V::SPELLINGS`); otherwise a 422
/// with `code` naming `field`, whose detail reads "unknown `what` `text`; expected A, B or C
/// (written exactly so)".
pub fn parse_named<V: Vocabulary>(
    text: &str,
    code: &'static str,
    what: &str,
    field: impl Into<String>,
) -> Result<V, ApiError> {
    V::named(text).ok_or_else(|| {
        ApiError::unprocessable(
            code,
            format!(
                "unknown {what} `{text}`; expected {} (written exactly so)",
                either_of(V::SPELLINGS)
            ),
        )
        .with_field(field)
    })
}

/// `A`, `A or B`, `A, B or C`...
pub fn either_of(names: &[&str]) -> String {
    match names {
        [] => String::new(),
        [only] => (*only).to_string(),
        [init @ .., last] => format!("{} or {last}", init.join(", ")),
    }
}

/// Reads a scale name written exactly; 422 `unknown_scale` naming `field` otherwise.
pub fn parse_scale(text: &str, field: &str) -> Result<Scale, ApiError> {
    Scale::from_name(text).ok_or_else(|| {
        ApiError::unprocessable(
            "unknown_scale",
            format!(
                "unknown time scale `{text}`; expected one of {} (written exactly so)",
                Scale::NAMES.join(", ")
            ),
        )
        .with_field(field)
    })
}

/// Reads an optional format name written exactly (default `iso`); 422 `unknown_format`
/// naming `field` otherwise.
pub fn parse_format(text: Option<&str>, field: &str) -> Result<InstantFormat, ApiError> {
    match text {
        None => Ok(InstantFormat::Iso),
        Some(text) => InstantFormat::from_name(text)
            .ok_or_else(|| ApiError::from_time(&TimeError::UnknownFormat(text.to_string()), field)),
    }
}

/// The value of `text` in a list of (exact spelling, value) pairs.
pub fn one_of<T: Copy>(text: &str, choices: &[(&str, T)]) -> Option<T> {
    choices
        .iter()
        .find(|(name, _)| *name == text)
        .map(|(_, value)| *value)
}

/// The schema of a name of the vocabulary `V`: a string enum of its spellings.
pub fn vocabulary_schema<V: Vocabulary>(description: &str) -> RefOr<Schema> {
    string_enum(V::SPELLINGS.iter().copied(), description)
}

pub fn string_enum<'a>(
    values: impl IntoIterator<Item = &'a str>,
    description: &str,
) -> RefOr<Schema> {
    ObjectBuilder::new()
        .schema_type(Type::String)
        .enum_values(Some(values))
        .description(Some(description))
        .into()
}

/// Schema of a time-scale name.
pub struct ScaleName;

impl PartialSchema for ScaleName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<Scale>(
            "A time scale, by its abbreviation (exactly as written here; see GET /v1/time/scales).",
        )
    }
}

impl ToSchema for ScaleName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("ScaleName")
    }
}

/// Schema of a target scale: a scale name or `all`.
pub struct TargetScaleName;

impl PartialSchema for TargetScaleName {
    fn schema() -> RefOr<Schema> {
        string_enum(
            std::iter::once(ALL_SCALES).chain(Scale::SPELLINGS.iter().copied()),
            "A target time scale, by its abbreviation, or `all` for every scale but UT1, TCL and TL (UT1 exists only where the Earth orientation table covers the epoch, TCL and TL only from 1959-12-30 to 2101-01-02 TDB: name them).",
        )
    }
}

impl ToSchema for TargetScaleName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("TargetScaleName")
    }
}

/// Schema of an instant format name.
pub struct InstantFormatName;

impl PartialSchema for InstantFormatName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<InstantFormat>(
            "How an instant is written: `iso` (ISO 8601 calendar or ordinal date and time; `Z` only for UTC; `23:59:60` only inside a UTC leap second), `mjd`, `jd`, `j2000_s` (seconds since J2000.0 of the scale), `unix_s` (UTC only), `gnss_week` (`WEEK:SECONDS`; GPST, GST, BDT, QZSST only).",
        )
    }
}

impl ToSchema for InstantFormatName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("InstantFormatName")
    }
}

/// Schema of a reference frame name.
pub struct FrameName;

impl PartialSchema for FrameName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<Frame>(
            "`GCRS` (geocentric, non-rotating) or `ITRF` (Earth-fixed, rotating).",
        )
    }
}

impl ToSchema for FrameName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("FrameName")
    }
}

/// Schema of a rate reference name.
pub struct ReferenceName;

impl PartialSchema for ReferenceName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<RateReference>(
            "Names of the reference time scales (documentation of the `reference` strings).",
        )
    }
}

impl ToSchema for ReferenceName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("ReferenceName")
    }
}

/// Schema of a gravity model name.
pub struct GravityModelName;

impl PartialSchema for GravityModelName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<GravityModel>(
            "Names of the Earth gravity models (documentation of the `gravity_model` strings).",
        )
    }
}

impl ToSchema for GravityModelName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("GravityModelName")
    }
}

/// Schema of a height reference name.
pub struct HeightReferenceName;

impl PartialSchema for HeightReferenceName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<HeightReference>(
            "`ellipsoid` (height above the GRS80 ellipsoid) or `geoid` (orthometric height).",
        )
    }
}

impl ToSchema for HeightReferenceName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("HeightReferenceName")
    }
}

/// Schema of a transmitter motion name.
pub struct TransmitterMotionName;

impl PartialSchema for TransmitterMotionName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<TransmitterMotion>(
            "`free_fall` (in the Earth's point-mass plus J2 field: a satellite) or `uniform` (straight at constant velocity in the endpoint's frame).",
        )
    }
}

impl ToSchema for TransmitterMotionName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("TransmitterMotionName")
    }
}

/// Schema of the text of an instant.
pub struct InstantString;

impl PartialSchema for InstantString {
    fn schema() -> RefOr<Schema> {
        ObjectBuilder::new()
            .schema_type(Type::String)
            .pattern(Some(instant_pattern()))
            .description(Some(
                "An instant as text in the request's `format`: `2026-03-14T06:30:00.123456789012` or `2026-073T06:30:00` (iso), `61113.27` (mjd), `2461113.77` (jd), `826741800.5` (j2000_s, unix_s), `2409:541818` (gnss_week). Digits are read exactly. The pattern admits every format; a text that does not fit `format`, a date that does not exist (2026-02-30), a second 60 outside a UTC leap second or a year outside 0001-9999 is a 422.",
            ))
            .examples(["2026-03-14T06:30:00.123456789012"])
            .into()
    }
}

impl ToSchema for InstantString {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("InstantString")
    }
}

/// Whether a vector's component bound is inclusive (`at most`) or exclusive (`below`).
#[derive(Clone, Copy, PartialEq, Eq)]
enum Bound {
    AtMost,
    Below,
}

fn vector3(bound: f64, kind: Bound, unit: &str, description: &str) -> RefOr<Schema> {
    let component = ObjectBuilder::new().schema_type(Type::Number).format(Some(
        utoipa::openapi::SchemaFormat::KnownFormat(utoipa::openapi::KnownFormat::Double),
    ));
    let component = match kind {
        Bound::AtMost => component
            .minimum(Some(-bound))
            .maximum(Some(bound))
            .description(Some(format!("{unit}, at most {bound:e} in magnitude"))),
        Bound::Below => component
            .exclusive_minimum(Some(-bound))
            .exclusive_maximum(Some(bound))
            .description(Some(format!("{unit}, below {bound:e} in magnitude"))),
    };
    ArrayBuilder::new()
        .items(component)
        .min_items(Some(3))
        .max_items(Some(3))
        .description(Some(description))
        .into()
}

/// Bound on each velocity component, m/s: above c by more than the Earth's rotation can add
/// within the geocentric range (omega_E * 1.5e9 m = 1.1e5 m/s), so every larger component is
/// refused by the speed check; `3e8` is the round value above c + 1.1e5 = 2.999e8.
pub const VELOCITY_COMPONENT_BOUND_M_S: f64 = 3.0e8;

/// Schema of a geocentric position [x, y, z] in metres.
pub struct PositionM;

impl PartialSchema for PositionM {
    fn schema() -> RefOr<Schema> {
        vector3(
            MAX_GEOCENTRIC_DISTANCE_M,
            Bound::AtMost,
            "metres",
            "Geocentric position [x, y, z], metres. Each component within the geocentric range (1.5e9 m); the distance from the geocentre must also be at most 1.5e9 m and the point not inside the Earth (422 otherwise).",
        )
    }
}

impl ToSchema for PositionM {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("PositionM")
    }
}

/// Schema of a velocity [vx, vy, vz] in metres per second.
pub struct VelocityMS;

impl PartialSchema for VelocityMS {
    fn schema() -> RefOr<Schema> {
        vector3(
            VELOCITY_COMPONENT_BOUND_M_S,
            Bound::AtMost,
            "metres per second",
            "Velocity [vx, vy, vz] in the frame, metres per second. The inertial speed (for ITRF, with the Earth's rotation added) must be below c = 299 792 458 m/s (422 speed_not_below_c otherwise).",
        )
    }
}

impl ToSchema for VelocityMS {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("VelocityMS")
    }
}

/// Schema of a comma-separated list of target scales (a query parameter).
pub struct TargetScaleList;

impl PartialSchema for TargetScaleList {
    fn schema() -> RefOr<Schema> {
        ObjectBuilder::new()
            .schema_type(Type::String)
            .pattern(Some(scale_list_pattern()))
            .description(Some(
                "Scale abbreviations or `all` (every scale but UT1, TCL and TL), comma-separated, no spaces (e.g. `TAI,TT,TDB`).",
            ))
            .into()
    }
}

impl ToSchema for TargetScaleList {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("TargetScaleList")
    }
}

/// Schema of a comma-separated list of instant forms (a query parameter).
pub struct FormList;

impl PartialSchema for FormList {
    fn schema() -> RefOr<Schema> {
        ObjectBuilder::new()
            .schema_type(Type::String)
            .pattern(Some(form_list_pattern()))
            .description(Some(
                "Instant form names, comma-separated, no spaces (e.g. `iso,j2000_s`).",
            ))
            .into()
    }
}

impl ToSchema for FormList {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("FormList")
    }
}

/// Schema of three comma-separated numbers (a query parameter).
pub struct ThreeNumbersText;

impl PartialSchema for ThreeNumbersText {
    fn schema() -> RefOr<Schema> {
        ObjectBuilder::new()
            .schema_type(Type::String)
            .pattern(Some(three_numbers_pattern()))
            .description(Some(
                "Three decimal numbers `x,y,z` (exponent allowed), no spaces.",
            ))
            .into()
    }
}

impl ToSchema for ThreeNumbersText {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("ThreeNumbersText")
    }
}

/// Schema of an observer's ITRF position [x, y, z] in metres.
pub struct ObserverPositionM;

impl PartialSchema for ObserverPositionM {
    fn schema() -> RefOr<Schema> {
        vector3(
            crate::physics::time::tdb_series::OBSERVER_RADIUS_RANGE_M.1,
            Bound::AtMost,
            "metres",
            "ITRF position [x, y, z] of an observer near the Earth's surface, metres: its distance from the geocentre must lie in [6 340 000, 6 480 000] m (422 `observer_not_on_ground` otherwise).",
        )
    }
}

impl ToSchema for ObserverPositionM {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("ObserverPositionM")
    }
}

/// Schema of a velocity in an ephemeris (speed checked as given, in the ephemeris' frame).
pub struct EphemerisVelocityMS;

impl PartialSchema for EphemerisVelocityMS {
    fn schema() -> RefOr<Schema> {
        vector3(
            SPEED_OF_LIGHT_M_S,
            Bound::Below,
            "metres per second",
            "Velocity [vx, vy, vz] in the ephemeris' frame, metres per second; its speed must be below c = 299 792 458 m/s (422 speed_not_below_c otherwise).",
        )
    }
}

impl ToSchema for EphemerisVelocityMS {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("EphemerisVelocityMS")
    }
}

/// Whether `text` is a frame name of a JSON ephemeris, written exactly as documented (upper
/// case, no surrounding spaces; the ITRF and IGS families by their prefix).
pub fn ephemeris_frame_named(text: &str) -> bool {
    EphemerisFrame::from_name(text).is_some()
}

/// The pattern of [`ephemeris_frame_named`].
pub fn ephemeris_frame_pattern() -> String {
    let exact: Vec<&str> = INERTIAL_FRAME_NAMES
        .iter()
        .chain(EARTH_FIXED_FRAME_NAMES)
        .copied()
        .collect();
    let families: Vec<String> = EARTH_FIXED_FRAME_FAMILIES
        .iter()
        .map(|prefix| format!(r"{prefix}[\s\S]*"))
        .collect();
    format!("^(?:{}|{})$", exact.join("|"), families.join("|"))
}

/// Schema of a frame name in a JSON ephemeris.
pub struct EphemerisFrameName;

impl PartialSchema for EphemerisFrameName {
    fn schema() -> RefOr<Schema> {
        ObjectBuilder::new()
            .schema_type(Type::String)
            .pattern(Some(ephemeris_frame_pattern()))
            .description(Some(format!(
                "A frame name in upper case: {} (inertial); {}, or any name of the {} families (ITRF2014, IGS20...; Earth-fixed).",
                INERTIAL_FRAME_NAMES.join(", "),
                EARTH_FIXED_FRAME_NAMES.join(", "),
                EARTH_FIXED_FRAME_FAMILIES.join(" or ")
            )))
            .examples(["GCRF"])
            .into()
    }
}

impl ToSchema for EphemerisFrameName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("EphemerisFrameName")
    }
}

/// Schema of a TDB - TT model name.
pub struct TdbModelName;

impl PartialSchema for TdbModelName {
    fn schema() -> RefOr<Schema> {
        vocabulary_schema::<TdbModel>(
            "The model of TDB - TT (and so of TCB): `series` (default: Fairhead & Bretagnon 1990 as ERFA `eraDtdb`, any epoch, about +/- 3 ns over 1950-2050) or `ephemeris` (the time-dilation integral of IERS Conventions (2010) eq. 10.4-10.5 from JPL DE440, fitted; 1959-12-30 to 2101-01-02 TT, 422 `outside_tdb_model_span` elsewhere). The topocentric part is added to either.",
        )
    }
}

impl ToSchema for TdbModelName {
    fn name() -> Cow<'static, str> {
        Cow::Borrowed("TdbModelName")
    }
}

/// Reads an optional TDB - TT model name (default `series`); 422 `unknown_tdb_model` naming
/// `field` otherwise.
pub fn parse_tdb_model(text: Option<&str>, field: &str) -> Result<TdbModel, ApiError> {
    match text {
        None => Ok(TdbModel::default()),
        Some(text) => parse_named(text, UNKNOWN_TDB_MODEL, "TDB - TT model", field),
    }
}

/// The problem code of an unknown TDB - TT model name.
pub const UNKNOWN_TDB_MODEL: &str = "unknown_tdb_model";

#[cfg(test)]
#[path = "names_tests.rs"]
mod tests;
