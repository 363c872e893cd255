//! Helpers shared by the fuzz targets: each target is one file in `fuzz_targets/` that hands
//! the fuzzer's bytes to one parser and checks what the parser accepted.
#![forbid(unsafe_code)]

use eigenzeit::physics::time::formats::{parse_instant, write_instant, InstantFormat};
use eigenzeit::physics::time::instant::Instant;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use eigenzeit::physics::time::scale::Scale;

/// Every instant format, in the fixed order of the engine's vocabulary (the fuzzer picks one
/// by index).
pub const FORMATS: [InstantFormat; InstantFormat::ALL.len()] = InstantFormat::ALL;

/// Splits fuzzer bytes into a selector byte and the rest read as (lossy) UTF-8 text.
pub fn selector_and_text(data: &[u8]) -> Option<(u8, String)> {
    let (&selector, rest) = data.split_first()?;
    Some((selector, String::from_utf8_lossy(rest).into_owned()))
}

/// Format and scale chosen from one byte: low nibble the format, high nibble the scale.
pub fn format_and_scale(selector: u8) -> (InstantFormat, Scale) {
    let format = FORMATS[usize::from(selector & 0x0f) % FORMATS.len()];
    let scale = Scale::ALL[usize::from(selector >> 4) % Scale::ALL.len()];
    (format, scale)
}

/// An accepted instant must be writable, and its lossless forms must read back to it.
/// Panics (a fuzzer finding) otherwise.
pub fn check_written_forms_read_back(instant: &Instant, text: &str, table: &LeapTable) {
    let written = match write_instant(instant, table) {
        Ok(written) => written,
        Err(error) => panic!("accepted {text:?} as {instant:?} but cannot write it: {error}"),
    };
    for (form, format) in [
        (&written.mjd, InstantFormat::Mjd),
        (&written.jd, InstantFormat::Jd),
    ] {
        let back = parse_instant(form, format, instant.scale(), table);
        assert_eq!(back, Ok(*instant), "{text:?} -> {format} {form:?}");
    }
    if let Some(week) = &written.gnss_week {
        let back = parse_instant(week, InstantFormat::GnssWeek, instant.scale(), table);
        assert_eq!(back, Ok(*instant), "{text:?} -> gnss_week {week:?}");
    }
}

/// Reads an ephemeris with `read` and, when it is accepted, integrates the proper time of
/// every object (J2 rate against TT): the whole path of the proper-time endpoint.
pub fn integrate_all<F>(read: F)
where
    F: FnOnce(
        &eigenzeit::physics::time::convert::ConversionContext<'_>,
    ) -> Result<eigenzeit::trajectory::TrajectorySet, eigenzeit::trajectory::TrajectoryError>,
{
    use eigenzeit::trajectory::{proper_time_of_ephemeris, InterpolationOptions};
    use eigenzeit::physics::gravity::GravityModel;
    use eigenzeit::physics::proper_time::ProperTimeOptions;
    use eigenzeit::physics::rate::{inertial_rate_function, RateReference};
    let table = LeapTable::builtin();
    let context = eigenzeit::physics::time::convert::ConversionContext::geocentric(table);
    let Ok(ephemeris) = read(&context) else {
        return;
    };
    let rate = inertial_rate_function(RateReference::Tt, GravityModel::J2);
    let _ = proper_time_of_ephemeris(
        &ephemeris,
        &InterpolationOptions::default(),
        &ProperTimeOptions::default(),
        &context,
        eigenzeit::physics::earth::eop::EopTable::builtin(),
        |_| rate,
    );
}
