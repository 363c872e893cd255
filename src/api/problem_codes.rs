//! Every stable problem `code` the API can answer, with what it means for the caller.
//!
//! Each error answer carries `"type": "/docs#problem-<code>"`; the documentation page renders
//! one entry per row of [`PROBLEM_CODES`] with the anchor `id="problem-<code>"`, and
//! `GET /docs/problem-codes.json` serves the same table as JSON.
//!
//! Adding a code (when a handler starts answering a new one):
//! 1. append one row `("your_code", "What it means and what the caller can do.")` to
//!    [`PROBLEM_CODES`], in the group of its endpoint (order is the order on the page);
//! 2. the code is lowercase ASCII letters, digits and `_` (it becomes part of a URL fragment);
//! 3. the meaning is one or two plain sentences; `backticks` render as code on the page.
//!
//! The unit tests below check that codes are unique, well formed and explained.

use crate::physics::earth::eop::EopLookupErrorKind;
use crate::physics::proper_time::ProperTimeErrorKind;
use crate::physics::rate::RateErrorKind;
use crate::physics::signal::SignalErrorKind;
use crate::physics::solar_system::EphemerisErrorKind;
use crate::physics::stability::StabilityErrorKind;
use crate::physics::time::error::TimeErrorKind;

/// (code, meaning) for every problem code the API answers; a code the physics library answers
/// is taken from its error kind (the one place it is written), in the order the page lists them.
pub const PROBLEM_CODES: &[(&str, &str)] = &[
    // Any route: routing, request reading, limits.
    (
        "not_found",
        "No resource at this path. The list of paths is on this page and in `/openapi.json`.",
    ),
    (
        "method_not_allowed",
        "The path exists but does not take this HTTP method; each operation on this page shows the method it takes.",
    ),
    (
        "invalid_query",
        "The query string cannot be read (a parameter has the wrong type or shape); `field` names it when known.",
    ),
    (
        "invalid_json",
        "The request body is not valid JSON.",
    ),
    (
        "invalid_body",
        "The body is valid JSON but does not match the request schema (a missing or unknown field, or a value of the wrong type).",
    ),
    (
        "unsupported_media_type",
        "The body must be sent with `Content-Type: application/json`.",
    ),
    (
        "body_too_large",
        "The request body is above the configured limit (`--body-limit-bytes`); split the request.",
    ),
    (
        "request_timeout",
        "The request took longer than the configured limit (`--request-timeout-s`); split it into smaller requests.",
    ),
    (
        "internal",
        "An unexpected fault inside the service. Please report it with the `x-request-id` of the answer.",
    ),
    // Time scales and instants (the time engine).
    (
        TimeErrorKind::UnknownScale.as_str(),
        "The time scale is not one of UTC, TAI, TT, TCG, TCB, TDB, GPST, GST, BDT, QZSST, UT1, TCL, TL.",
    ),
    (
        TimeErrorKind::UnknownFormat.as_str(),
        "The instant format is not one of `iso`, `mjd`, `jd`, `j2000_s`, `unix_s`, `gnss_week`.",
    ),
    (
        TimeErrorKind::Malformed.as_str(),
        "The instant text does not have the shape its format expects; `detail` says what was expected.",
    ),
    (
        TimeErrorKind::ImpossibleDate.as_str(),
        "The text has the right shape but names a date or time that does not exist (for example 30 February).",
    ),
    (
        TimeErrorKind::InvalidLeapSecond.as_str(),
        "A second 60 where the leap-second table has no leap second, or in a scale without leap seconds.",
    ),
    (
        TimeErrorKind::FormatNotForScale.as_str(),
        "The format does not apply to the scale (`unix_s` is for UTC only, `gnss_week` for GNSS scales only).",
    ),
    (
        TimeErrorKind::BeforeUtc.as_str(),
        "A UTC instant before 1960-01-01, where UTC is not defined by the table in use; give the instant in TAI or TT.",
    ),
    (
        TimeErrorKind::OutOfRange.as_str(),
        "The instant or number is outside the range the time engine supports.",
    ),
    // Time conversion requests.
    (
        "unknown_week_counter",
        "`week_counter` is not one of `gps_lnav` (10 bits), `gps_cnav` (13 bits), `galileo` (12 bits), `beidou` (13 bits).",
    ),
    (
        "week_counter_needs_gnss_week",
        "`week_counter` resolves a broadcast week of an instant written as `gnss_week` (give `format=gnss_week`), and `week_near` needs a `week_counter`.",
    ),
    (
        "no_target_scale",
        "No target scale was given; name at least one scale, or `all`.",
    ),
    (
        "no_form",
        "`forms` names no form; name at least one of `iso`, `mjd`, `jd`, `j2000_s`, `unix_s`, `gnss_week`, or leave it out for the default forms.",
    ),
    (
        "empty_batch",
        "The batch has no epochs; send at least one.",
    ),
    (
        "batch_too_large",
        "More epochs than the configured limit (`--batch-limit`) in one request; split the batch.",
    ),
    (
        "invalid_observer",
        "The observer is not usable: give either `itrf_position_m`, or `latitude_deg` and `longitude_deg` (and optionally `height_m`), with valid values.",
    ),
    (
        "observer_not_on_ground",
        "The observer position is not near the Earth's surface; positions are ITRF metres from the geocentre.",
    ),
    (
        RateErrorKind::NotFinite.as_str(),
        "A number is not finite (NaN or infinite).",
    ),
    (
        "clock_unavailable",
        "The server's own clock cannot give the current time; the operators need to check the host clock.",
    ),
    // Earth orientation (the EOP table in force).
    (
        EopLookupErrorKind::BeforeTable.as_str(),
        "The instant is before the first day of the Earth orientation table in force; `detail` names that day.",
    ),
    (
        EopLookupErrorKind::AfterTable.as_str(),
        "The instant is after the last day of the Earth orientation table in force (the end of its predictions); the operators can give a newer file (`--eop-file`, `--eop-url`).",
    ),
    (
        EopLookupErrorKind::NotFinite.as_str(),
        "The second of day of an Earth orientation lookup is not a finite number.",
    ),
    (
        EopLookupErrorKind::BadUtc.as_str(),
        "The UTC reading of an Earth orientation lookup does not exist in the leap-second table (before 1960, or a second outside its day).",
    ),
    (
        TimeErrorKind::Ut1Unavailable.as_str(),
        "A conversion to or from UT1 at an epoch the Earth orientation table in force does not cover (it runs from 1962 to the end of its predictions; `detail` names the edge day); the operators can give a newer file (`--eop-file`, `--eop-url`).",
    ),
    (
        TimeErrorKind::OutsideLunarTimeSpan.as_str(),
        "TCL or TL is needed at an epoch outside the fitted TCB - TCL at the Moon's centre (JPL DE440 integral): it covers 1959-12-30 to 2101-01-02 TDB.",
    ),
    // The solar system (the planetary ephemeris).
    (
        EphemerisErrorKind::UnknownBody.as_str(),
        "The body or centre is not one of `ssb`, `sun`, `mercury_barycenter`, `venus_barycenter`, `emb`, `earth`, `moon`, `mars_barycenter`, `jupiter_barycenter`, `saturn_barycenter`, `uranus_barycenter`, `neptune_barycenter`, `pluto_barycenter`; `field` says which.",
    ),
    (
        EphemerisErrorKind::OutsideSpan.as_str(),
        "The epoch (read in TDB) is outside the span of the planetary ephemeris in force; `detail` names the span (the built-in DE440 excerpt covers 1959-01-01 .. 2102-01-01 TDB; the operators can load a longer kernel with `--ephemeris-file`).",
    ),
    (
        EphemerisErrorKind::NotFinite.as_str(),
        "An ephemeris epoch given as a number of seconds is not finite.",
    ),
    (
        TimeErrorKind::OutsideTdbModelSpan.as_str(),
        "TDB - TT (for TDB or TCB) is needed at an epoch outside the span of the chosen `tdb_model`: `ephemeris` (JPL DE440) covers 1959-12-30 to 2101-01-02 TT; the default `series` covers any epoch.",
    ),
    (
        "unknown_tdb_model",
        "The TDB - TT model (`tdb_model`) is not one of `series`, `ephemeris`.",
    ),
    // Clock rates, comparisons and signal paths.
    (
        "unreadable_body",
        "The request body could not be read to its end (the connection broke or the body was malformed at the transport level). Send it again.",
    ),
    (
        "subject_missing",
        "A rate item names no subject: give exactly one of `state`, `orbit`, `ground_site` or `lunar_site`.",
    ),
    (
        "subject_ambiguous",
        "A rate item names more than one subject: give exactly one of `state`, `orbit`, `ground_site` or `lunar_site`.",
    ),
    (
        "unknown_reference",
        "The rate reference is not `TT` or `TCG`.",
    ),
    (
        "unknown_gravity_model",
        "The gravity model is not `point_mass`, `j2`, `grs80`, `j2_sun_moon` or `egm2008` (the Earth's fields), nor `grail_gl0660b_degree2` (the Moon's, for selenocentric tracks).",
    ),
    (
        RateErrorKind::UnsupportedGravityModel.as_str(),
        "The gravity model does not apply to this subject (e.g. `grs80` for a Keplerian orbit, `egm2008` for anything but a ground site, an Earth model for a track about the Moon); `field` names the option.",
    ),
    (
        RateErrorKind::InputRequired.as_str(),
        "The chosen model needs a value the input lacks (an orbit with `gravity_model: j2` needs `inclination_deg`).",
    ),
    (
        "unknown_frame",
        "The frame is not one the endpoint takes (`GCRS` inertial or `ITRF` Earth-fixed).",
    ),
    (
        "epoch_required",
        "A GCRS state with the `j2` or `grs80` model needs its `epoch`: the field is taken about the Earth's true pole (the CIP), which moves in the GCRS.",
    ),
    (
        "unknown_motion",
        "The transmitter motion is not `free_fall` (a satellite) or `uniform` (anything else given with a velocity).",
    ),
    (
        "unknown_height_reference",
        "The height reference is not `ellipsoid` or `geoid`.",
    ),
    (
        "anomaly_ambiguous",
        "More than one of `true_anomaly_deg`, `mean_anomaly_deg`, `eccentric_anomaly_deg` is given; give one.",
    ),
    (
        RateErrorKind::SpeedNotBelowC.as_str(),
        "A speed is at or above the speed of light: the relativistic formulas have no meaning there.",
    ),
    (
        RateErrorKind::BelowSurface.as_str(),
        "A position is below the Earth's (or the Moon's) surface by more than the 11 km margin; check units (metres) and frame.",
    ),
    (
        RateErrorKind::BeyondModelRange.as_str(),
        "A position or orbit is beyond the range of the geocentric model (outside the Earth's Hill sphere, about 1.5e9 m).",
    ),
    (
        RateErrorKind::InvalidSemiMajorAxis.as_str(),
        "The semi-major axis must be positive and keep the whole orbit above the Earth's surface.",
    ),
    (
        RateErrorKind::InvalidEccentricity.as_str(),
        "The eccentricity must be at least 0 and below 1 (closed orbits only).",
    ),
    (
        RateErrorKind::LatitudeOutOfRange.as_str(),
        "A latitude must lie between -90 and 90 degrees.",
    ),
    (
        RateErrorKind::AngleOutOfRange.as_str(),
        "An angle is not finite or outside the range it is read in.",
    ),
    (
        RateErrorKind::InvalidFrequency.as_str(),
        "The nominal frequency must be a positive, finite number of hertz.",
    ),
    (
        RateErrorKind::RateOutOfRange.as_str(),
        "The computed rate is outside the first-order model's range; the input is not a physical clock near the Earth or Moon.",
    ),
    (
        "reference_mismatch",
        "The two clocks of a comparison name different references; compare them against one reference.",
    ),
    (
        RateErrorKind::InvalidValue.as_str(),
        "A value cannot be used; `detail` says why and `field` names it.",
    ),
    (
        SignalErrorKind::InsideEarth.as_str(),
        "A signal end point is inside the Earth; check units (metres) and frame.",
    ),
    (
        SignalErrorKind::BeyondRange.as_str(),
        "A signal end point is farther than the model's range from the geocentre.",
    ),
    (
        SignalErrorKind::CoincidentEndpoints.as_str(),
        "The transmitter and the receiver are at the same place: there is no path.",
    ),
    (
        SignalErrorKind::PathThroughEarth.as_str(),
        "The straight path between the end points passes through the Earth: the receiver cannot see the transmitter.",
    ),
    (
        SignalErrorKind::NoConvergence.as_str(),
        "The light-time iteration did not converge; check that the states are physical.",
    ),
    (
        "invalid_endpoint",
        "A signal end point must give either a position (with a frame) or a ground site, not both or neither.",
    ),
    (
        SignalErrorKind::NotVisible.as_str(),
        "The satellite is below a station's horizon: no two-way link is possible.",
    ),
    // Proper time along an ephemeris (JSON, CCSDS OEM, SP3).
    (
        ProperTimeErrorKind::SamplingTooCoarse.as_str(),
        "The states of an object are too far apart for its motion (it sweeps hundreds of radians between two samples); sample the trajectory more densely.",
    ),
    (
        "unknown_ephemeris_format",
        "The body's format cannot be told: send `Content-Type: application/json`, `application/ccsds-oem` or `application/sp3`, or say `?format=json|oem|sp3`.",
    ),
    (
        "integration_failed",
        "The proper-time integration gave a non-finite result for the object named; check its states.",
    ),
    (
        "json_invalid",
        "The JSON ephemeris cannot be read; `line` says where.",
    ),
    (
        "bad_epoch",
        "An epoch cannot be read or converted; `detail` says why, and `line` or `object`/`index` where.",
    ),
    (
        "bad_number",
        "A number in the file cannot be read; `line` says where.",
    ),
    (
        ProperTimeErrorKind::BadOption.as_str(),
        "An option is out of range (interpolation points 2 to 16, positive gap limit, output step of at least 1 ms and at most 1 000 000 output epochs per object).",
    ),
    (
        ProperTimeErrorKind::EpochsNotIncreasing.as_str(),
        "Epochs of an object must increase strictly (no duplicates); `object` and `index` name the first offending state.",
    ),
    (
        "gap_too_long",
        "Two consecutive states are farther apart than the gap limit (`max_gap_s`); `object` and `index` say where.",
    ),
    (
        "mixed_velocity",
        "Some states of an object have a velocity and others not: give it for all states or none.",
    ),
    (
        "no_objects",
        "The ephemeris holds no object.",
    ),
    (
        "too_few_states",
        "An object has fewer states than the interpolation window needs; send more states or lower `interpolation_points`.",
    ),
    (
        ProperTimeErrorKind::TooFewEpochs.as_str(),
        "Fewer output epochs than the integration needs.",
    ),
    (
        "unsupported_frame",
        "The ephemeris frame is not one the service reads (GCRS, GCRF, EME2000, ICRF inertial; ITRF Earth-fixed).",
    ),
    (
        "unsupported_time_scale",
        "The ephemeris `time_scale` is UT1, which follows the Earth's rotation and is not taken for trajectories; give the epochs in UTC or a uniform scale.",
    ),
    (
        "oem_unsupported_version",
        "The OEM's CCSDS_OEM_VERS is not one the reader takes (1.0, 2.0, 3.0).",
    ),
    (
        "oem_missing_keyword",
        "A mandatory OEM keyword is missing (CCSDS 502.0-B); `detail` names it and `line` the block.",
    ),
    (
        "oem_unknown_keyword",
        "A keyword the OEM standard does not define in that block; `line` says where.",
    ),
    (
        "oem_bad_metadata_line",
        "A metadata line is not `KEYWORD = value`; `line` says where.",
    ),
    (
        "oem_bad_data_line",
        "A data line does not have an epoch and six (or nine) numbers; `line` says where.",
    ),
    (
        "oem_bad_time_range",
        "START_TIME, STOP_TIME or USEABLE times are inconsistent; `line` says where.",
    ),
    (
        "oem_empty_segment",
        "A metadata block is followed by no data line.",
    ),
    (
        "oem_epoch_outside_segment",
        "A data line's epoch lies outside its segment's START_TIME..STOP_TIME.",
    ),
    (
        "oem_inconsistent_segments",
        "Segments of one object differ in frame family or time system.",
    ),
    (
        "oem_unexpected_line",
        "A line that does not belong where it stands (e.g. data before META_START); `line` says where.",
    ),
    (
        "oem_unsupported_center",
        "CENTER_NAME is neither EARTH (geocentric states) nor MOON (selenocentric states, ICRF axes).",
    ),
    (
        "frame_center_mismatch",
        "The frame does not belong to the centre (a lunar frame for an Earth-centred ephemeris, an Earth frame such as GCRF or ITRF for a Moon-centred one), geocentric and selenocentric objects are mixed, or the `reference` belongs to the other centre (TCL, TL for lunar tracks; TCG for geocentric ones); `line`, `field` or `object` says where.",
    ),
    (
        "unknown_center",
        "The JSON ephemeris `center` is neither `earth` nor `moon` (written exactly so).",
    ),
    (
        "oem_unsupported_frame",
        "REF_FRAME is not one the service reads (EME2000, GCRF, ICRF, ITRF family; with CENTER_NAME = MOON: ICRF or EME2000, lunar body-fixed frames are not read yet).",
    ),
    (
        "oem_unsupported_time_system",
        "TIME_SYSTEM is not one the service reads (UTC, TAI, TT, GPS, TDB, TCG, TCB).",
    ),
    (
        "oem_internal",
        "The OEM reader met a state it cannot continue from; please report the file.",
    ),
    (
        "sp3_unsupported_version",
        "The SP3 version is not c or d.",
    ),
    (
        "sp3_bad_header",
        "An SP3 header line does not have its fixed columns; `line` says where.",
    ),
    (
        "sp3_bad_column",
        "A column of an SP3 record cannot be read; `line` says where.",
    ),
    (
        "sp3_bad_epoch",
        "An SP3 epoch line cannot be read; `line` says where.",
    ),
    (
        "sp3_missing_eof",
        "The SP3 file has no EOF line: it is truncated.",
    ),
    (
        "sp3_no_epochs",
        "The SP3 file holds no epoch.",
    ),
    (
        "sp3_unexpected_line",
        "A line that does not belong where it stands in the SP3 file; `line` says where.",
    ),
    (
        "sp3_unsupported_time_system",
        "The SP3 time system is not one the service reads (GPS, GAL, BDT, QZS, TAI, UTC, GLO).",
    ),
    // Clock stability (NIST SP 1065 deviations).
    (
        "unknown_data_kind",
        "`kind` is not `phase` (time error, seconds) or `frequency` (fractional frequency).",
    ),
    (
        "unknown_deviation",
        "A name in `deviations` is not one of `adev`, `oadev`, `mdev`, `tdev`, `hdev`, `ohdev`, `totdev` (or the list is empty).",
    ),
    (
        StabilityErrorKind::EmptySeries.as_str(),
        "The series has no values; send at least 3 phase or 2 frequency values.",
    ),
    (
        StabilityErrorKind::NotFiniteSample.as_str(),
        "A value of the series (or the phase accumulated from frequency values, or its square) is not a finite number; `field` names it where one value is at fault.",
    ),
    (
        StabilityErrorKind::GapInSeries.as_str(),
        "A sample is missing (`null`, or a step of several tau0 in `times_s`). Gaps are not filled: send each gap-free stretch as its own request.",
    ),
    (
        StabilityErrorKind::SeriesTooShort.as_str(),
        "An averaging time is longer than the series allows for a deviation; `detail` gives the longest one, `field` the averaging time.",
    ),
    (
        StabilityErrorKind::TauNotMultiple.as_str(),
        "An averaging time in `tau_s` is not a whole multiple (at least 1) of the sampling interval tau0.",
    ),
    (
        StabilityErrorKind::NonUniformSampling.as_str(),
        "The samples are not evenly spaced (`times_s` steps differ from tau0 by more than 1e-6 tau0), or no sampling interval is given, or it is not positive.",
    ),
    (
        StabilityErrorKind::InvalidConfidence.as_str(),
        "`confidence` must lie strictly between 0 and 1 (0.683 for 1 sigma, 0.95 ...).",
    ),
    (
        "rinex_clock_bad_header",
        "The RINEX clock text does not start with its `RINEX VERSION / TYPE` line (file type C in column 21, the version in columns 1-9); `line` says where.",
    ),
    (
        "rinex_clock_unsupported_version",
        "The RINEX clock version is not 2.xx or 3.xx (3.04 is the reference).",
    ),
    (
        "rinex_clock_missing_end_of_header",
        "The RINEX clock header has no `END OF HEADER` line (label in columns 61-80).",
    ),
    (
        "rinex_clock_bad_record",
        "An AS or AR record of the RINEX clock text cannot be read (fields, epoch, number of values, clock bias); `line` says where.",
    ),
    (
        "rinex_clock_unsupported_time_system",
        "The RINEX clock `TIME SYSTEM ID` is not one the service reads (GPS, GAL, BDT, QZS, TAI, UTC).",
    ),
    (
        "unknown_convention",
        "The clock convention is not `igs` (the conventional periodic term left out of the values) or `raw` (both periodic terms in them).",
    ),
    (
        "orbit_required",
        "RINEX clock values need the orbit: give the SP3 text in `sp3`.",
    ),
    (
        "input_ambiguous",
        "Both files (`sp3`, `rinex_clock`) and JSON `series` were given: give one of them.",
    ),
    (
        "input_missing",
        "Neither `sp3` nor `series` was given.",
    ),
    (
        "nothing_to_correct",
        "No satellite has two or more clock values with an orbit; the detail lists why for each.",
    ),
];

/// The meaning of `code`, when it is in [`PROBLEM_CODES`].
pub fn meaning(code: &str) -> Option<&'static str> {
    PROBLEM_CODES
        .iter()
        .find(|(known, _)| *known == code)
        .map(|(_, meaning)| *meaning)
}

#[cfg(test)]
#[path = "problem_codes_tests.rs"]
mod tests;
