//! Which written forms of an instant an answer carries (`forms=`), and writing them: as the
//! optional fields of [`InstantForms`] (JSON) or as cells of a CSV row.
//!
//! A form is one of the instant formats of the time engine (`InstantFormat`, the one place
//! their names are written): the forms a request may be written in are the forms an answer
//! may carry.

use crate::api::error::ApiError;
use crate::api::names::parse_format;
use crate::physics::time::format_name::InstantFormat;
use crate::physics::time::formats::InstantDigits;

use super::types::InstantForms;

/// The forms of an answer when the request names none: every form but `unix_s` (the answers
/// of the service's first versions, unchanged).
pub const DEFAULT_FORMS: [InstantFormat; 5] = [
    InstantFormat::Iso,
    InstantFormat::Mjd,
    InstantFormat::Jd,
    InstantFormat::J2000S,
    InstantFormat::GnssWeek,
];

/// The forms an answer carries, in the order asked, each once; never empty.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct FormSelection {
    forms: Vec<InstantFormat>,
}

impl Default for FormSelection {
    fn default() -> Self {
        Self {
            forms: DEFAULT_FORMS.to_vec(),
        }
    }
}

impl FormSelection {
    /// Reads form names (`field[i]` names a wrong one: 422 `unknown_format`); an empty list is
    /// a 422 `no_form` naming `field`.
    pub fn parse<'a>(
        names: impl IntoIterator<Item = &'a str>,
        field: &str,
    ) -> Result<Self, ApiError> {
        let mut forms = Vec::new();
        for (index, name) in names.into_iter().enumerate() {
            let form = parse_format(Some(name), &format!("{field}[{index}]"))?;
            if !forms.contains(&form) {
                forms.push(form);
            }
        }
        if forms.is_empty() {
            return Err(ApiError::unprocessable(
                "no_form",
                "expected at least one form: iso, mjd, jd, j2000_s, unix_s or gnss_week",
            )
            .with_field(field));
        }
        Ok(Self { forms })
    }

    /// Reads the optional comma-separated query value (`iso,j2000_s`); absent means the default.
    pub fn from_query(text: Option<&str>, field: &str) -> Result<Self, ApiError> {
        match text {
            None => Ok(Self::default()),
            Some(text) => Self::parse(text.split(','), field),
        }
    }

    /// The forms, in order.
    pub fn forms(&self) -> &[InstantFormat] {
        &self.forms
    }

    /// The selected forms of one instant, as the fields of its JSON object.
    pub fn json(&self, digits: &InstantDigits) -> InstantForms {
        let mut written = InstantForms::named(digits.scale().as_str());
        let mut buffer = Vec::with_capacity(48);
        for &form in &self.forms {
            buffer.clear();
            if digits.push_form(form, &mut buffer) {
                let text = String::from_utf8_lossy(&buffer).into_owned();
                written.set(form, text);
            }
        }
        written
    }

    /// The selected forms of one instant as CSV cells, each preceded by a comma (a form that
    /// does not exist for the scale is an empty cell).
    pub fn push_csv_cells(&self, digits: &InstantDigits, out: &mut Vec<u8>) {
        for &form in &self.forms {
            out.push(b',');
            digits.push_form(form, out);
        }
    }

    /// The header cells for one scale: `,TDB_iso,TDB_j2000_s`...
    pub fn push_csv_header(&self, scale_name: &str, out: &mut Vec<u8>) {
        for form in &self.forms {
            out.push(b',');
            out.extend_from_slice(scale_name.as_bytes());
            out.push(b'_');
            out.extend_from_slice(form.as_str().as_bytes());
        }
    }
}
