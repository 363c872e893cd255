//! JSON reader tests (document layout of `json.rs`; epochs through the engine's formats).

use super::json::read_json;
use crate::physics::time::convert::ConversionContext;
use crate::physics::time::leap_seconds::LeapTable;
use crate::physics::time::scale::Scale;

fn read(text: &str) -> Result<super::TrajectorySet, super::TrajectoryError> {
    read_json(text, &ConversionContext::geocentric(LeapTable::builtin()))
}

#[test]
fn reads_a_document_and_refuses_bad_ones() {
    let text = r#"{"frame": "GCRF", "time_scale": "UTC", "objects": [{"id": "A", "states": [
        {"epoch": "2026-05-20T00:00:00Z", "position_m": [7e6, 0, 0], "velocity_m_s": [0, 7500, 0]},
        {"epoch": "2026-05-20T00:01:00Z", "position_m": [6.99e6, 4.5e5, 0], "velocity_m_s": [-500, 7480, 0]}]}]}"#;
    let ephemeris = read(text).unwrap_or_else(|e| panic!("{e}"));
    let track = &ephemeris.objects[0];
    assert_eq!((track.id.as_str(), track.scale), ("A", Scale::Utc));
    assert_eq!(track.states[1].velocity_m_s, Some([-500.0, 7480.0, 0.0]));
    // MJD epochs (engine format `mjd`): 61180 is 2026-05-20 (calendar arithmetic).
    let mjd = text
        .replace(
            "\"time_scale\": \"UTC\"",
            "\"time_scale\": \"TT\", \"epoch_format\": \"mjd\"",
        )
        .replace("2026-05-20T00:00:00Z", "61180")
        .replace("2026-05-20T00:01:00Z", "61180.000694444444444444444444");
    assert!(read(&mjd).is_ok());
    // Refusals (this module's rules; common practice).
    let code = |t: &str| read(t).err().map(|e| e.code);
    assert_eq!(
        code(&text.replace("GCRF", "TEME")),
        Some("unsupported_frame")
    );
    assert_eq!(
        code(&text.replace("\"UTC\"", "\"UT2\"")),
        Some("unknown_scale")
    );
    // UT1 is a scale of the engine, but not a trajectory's (it follows the Earth's rotation).
    assert_eq!(
        code(&text.replace("\"UTC\"", "\"UT1\"")),
        Some("unsupported_time_scale")
    );
    assert_eq!(
        code(&text.replacen(", \"velocity_m_s\": [0, 7500, 0]", "", 1)),
        Some("mixed_velocity")
    );
    assert_eq!(
        code(&text.replace("00:01:00Z", "00:61:00Z")),
        Some("bad_epoch")
    );
    assert_eq!(code("{\"frame\": 1}"), Some("json_invalid"));
}
