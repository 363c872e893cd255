//! SP3-c / SP3-d header lines (IGS, "The Extended Standard Product 3 Orbit Format (SP3-c)",
//! Hilla 2010, and "(SP3-d)", Hilla 2016): `#c`/`#d` first line, `##`, `+` satellite lists,
//! `++` accuracies, `%c` time system, `%f`, `%i`, `/*` comments.

use super::super::error::TrajectoryError;
use crate::physics::time::scale::Scale;

/// The time system of an SP3 file, from the first `%c` line (columns 10-12).
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Sp3TimeSystem {
    /// A scale read as written (GPS, GAL, BDT, QZS, TAI, UTC).
    Scale(Scale),
    /// GLONASS system time: UTC(SU) + 3 h; read as UTC after subtracting three hours.
    Glonass,
}

/// What the header says.
#[derive(Debug, Clone)]
pub struct Sp3Header {
    /// `c` or `d`.
    pub version: char,
    /// True when the first line announces velocities (`V` in column 3).
    pub has_velocities: bool,
    /// Satellite ids from the `+` lines, in order.
    pub satellites: Vec<String>,
    /// Number of satellites announced in the first `+` line.
    pub announced: usize,
    /// Time system (GPS when `%c` gives `ccc`, as SP3-c says for older files).
    pub time_system: Sp3TimeSystem,
    /// Whether a `%c` line was seen.
    pub time_system_seen: bool,
    /// The coordinate system label of the first line (columns 47-51, trimmed): IGS20,
    /// ITRF... for Earth-fixed positions; ICRF or J2000 for the ICRF axes of a Moon-centred
    /// file.
    pub coordinate_system: String,
}

impl Sp3Header {
    /// Reads the first line `#cP2026  5 20  0  0  0.00000000      96 ORBIT IGS20 FIT  XYZ`.
    pub fn from_first_line(line: &str, number: usize) -> Result<Self, TrajectoryError> {
        let bytes = line.as_bytes();
        if bytes.first() != Some(&b'#') || bytes.get(1) == Some(&b'#') {
            return Err(TrajectoryError::at_line(
                "sp3_bad_header",
                number,
                "expected the SP3 first line `#cP...` or `#dP...` (columns 1-3: #, version, P or V)",
            ));
        }
        let version = match bytes.get(1) {
            Some(b'c') => 'c',
            Some(b'd') => 'd',
            _ => {
                return Err(TrajectoryError::at_line(
                    "sp3_unsupported_version",
                    number,
                    "column 2 of the first line must be the version c or d (SP3-c, SP3-d)",
                ))
            }
        };
        let has_velocities = match bytes.get(2) {
            Some(b'P') => false,
            Some(b'V') => true,
            _ => return Err(TrajectoryError::at_line(
                "sp3_bad_column",
                number,
                "column 3 of the first line must be P (positions) or V (positions and velocities)",
            )),
        };
        Ok(Self {
            version,
            has_velocities,
            satellites: Vec::new(),
            announced: 0,
            time_system: Sp3TimeSystem::Scale(Scale::Gpst),
            time_system_seen: false,
            coordinate_system: line.get(46..51).unwrap_or("").trim().to_string(),
        })
    }

    /// Reads a `+` line: number of satellites in columns 4-6 (first line only), then 17 ids of
    /// three characters from column 10. `  0` and blank ids are padding.
    pub fn take_satellite_line(
        &mut self,
        line: &str,
        number: usize,
    ) -> Result<(), TrajectoryError> {
        if self.satellites.is_empty() && self.announced == 0 {
            let count_text = line.get(3..6).unwrap_or("").trim();
            self.announced = count_text.parse::<usize>().map_err(|_| {
                TrajectoryError::at_line(
                    "sp3_bad_column",
                    number,
                    format!("expected the number of satellites in columns 4-6 of the first + line, found {count_text:?}"),
                )
            })?;
        }
        let ids = line.get(9..).unwrap_or("");
        let mut start = 0;
        while let Some(field) = ids.get(start..(start + 3).min(ids.len())) {
            if field.is_empty() {
                break;
            }
            let id = normalize_id(field);
            if !id.is_empty() && id != "0" && id != "00" && self.satellites.len() < self.announced {
                self.satellites.push(id);
            }
            start += 3;
        }
        Ok(())
    }

    /// Reads the time system of the first `%c` line (columns 10-12).
    pub fn take_time_system_line(
        &mut self,
        line: &str,
        number: usize,
    ) -> Result<(), TrajectoryError> {
        if self.time_system_seen {
            return Ok(());
        }
        self.time_system_seen = true;
        let name = line.get(9..12).unwrap_or("").trim();
        self.time_system = match name {
            "GPS" | "ccc" => Sp3TimeSystem::Scale(Scale::Gpst),
            "GAL" => Sp3TimeSystem::Scale(Scale::Gst),
            "BDT" => Sp3TimeSystem::Scale(Scale::Bdt),
            "QZS" => Sp3TimeSystem::Scale(Scale::Qzsst),
            "TAI" => Sp3TimeSystem::Scale(Scale::Tai),
            "UTC" => Sp3TimeSystem::Scale(Scale::Utc),
            "GLO" => Sp3TimeSystem::Glonass,
            _ => {
                return Err(TrajectoryError::at_line(
                    "sp3_unsupported_time_system",
                    number,
                    format!("time system {name:?} in columns 10-12 of the first %c line is not supported; expected GPS, GAL, BDT, QZS, TAI, UTC or GLO"),
                ))
            }
        };
        Ok(())
    }

    /// The scale epochs are labelled in after reading.
    pub fn scale(&self) -> Scale {
        match self.time_system {
            Sp3TimeSystem::Scale(scale) => scale,
            Sp3TimeSystem::Glonass => Scale::Utc,
        }
    }
}

/// A satellite id as written (`G01`), with the old SP3-a form ` 1` read as GPS (`G01`).
pub fn normalize_id(field: &str) -> String {
    let trimmed = field.trim();
    if !trimmed.is_empty() && trimmed.bytes().all(|b| b.is_ascii_digit()) {
        match trimmed.parse::<u32>() {
            Ok(0) => String::new(),
            Ok(prn) => format!("G{prn:02}"),
            Err(_) => String::new(),
        }
    } else if field.starts_with(' ') {
        trimmed.to_string()
    } else {
        field.replace(' ', "0")
    }
}
