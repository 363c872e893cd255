//! Which media type an answer is written in, from the request's `Accept` header (RFC 9110
//! sec. 12.5.1): the first type an operation offers unless `Accept` prefers another (JSON
//! unless CSV is preferred, for the answers with a JSON and a CSV form; the plots add SVG).

use axum::http::{header, HeaderMap};

/// The media types an answer with a CSV form can be written in.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum AnswerType {
    /// `application/json` (the default).
    Json,
    /// `text/csv` (RFC 4180), one row per epoch.
    Csv,
    /// `image/svg+xml` (SVG 1.1), a plot.
    Svg,
}

impl AnswerType {
    /// The media type's type and subtype.
    fn media(self) -> (&'static str, &'static str) {
        match self {
            AnswerType::Json => ("application", "json"),
            AnswerType::Csv => ("text", "csv"),
            AnswerType::Svg => ("image", "svg+xml"),
        }
    }

    /// The `Content-Type` of an answer of this type.
    pub fn content_type(self) -> &'static str {
        match self {
            AnswerType::Json => "application/json",
            AnswerType::Csv => "text/csv; charset=utf-8",
            AnswerType::Svg => "image/svg+xml",
        }
    }
}

/// How well one media range of `Accept` matches a type: (specificity, q), where specificity
/// is 2 for `type/subtype`, 1 for `type/*`, 0 for `*/*`.
fn range_match(range: &str, kind: &str, subtype: &str) -> Option<(u8, f32)> {
    let mut parts = range.split(';');
    let media = parts.next()?.trim().to_ascii_lowercase();
    let (range_kind, range_subtype) = media.split_once('/')?;
    let specificity = match (range_kind, range_subtype) {
        ("*", "*") => 0,
        (k, "*") if k == kind => 1,
        (k, s) if k == kind && s == subtype => 2,
        _ => return None,
    };
    let q = parts
        .filter_map(|p| p.trim().split_once('='))
        .find(|(name, _)| name.trim().eq_ignore_ascii_case("q"))
        .and_then(|(_, value)| value.trim().parse::<f32>().ok())
        .filter(|q| (0.0..=1.0).contains(q))
        .unwrap_or(1.0);
    Some((specificity, q))
}

/// The q of a type under `Accept` (the most specific matching range decides), with the
/// specificity of that range; `None` when no range matches.
fn preference(accept: &str, kind: &str, subtype: &str) -> Option<(u8, f32)> {
    accept
        .split(',')
        .filter_map(|range| range_match(range, kind, subtype))
        .max_by(|a, b| a.0.cmp(&b.0))
}

/// CSV when `Accept` prefers `text/csv` to `application/json` (a higher q, or the same q by a
/// more specific range); JSON otherwise, including when `Accept` is absent or names neither
/// (the service answers JSON rather than 406, as RFC 9110 allows).
pub fn answer_type(headers: &HeaderMap) -> AnswerType {
    answer_type_among(headers, &[AnswerType::Json, AnswerType::Csv])
}

/// The type among `offered` (the first is the default) that `Accept` prefers: the highest q,
/// then the most specific matching range, then the earlier offer. A type whose q is 0 is never
/// chosen unless nothing else is acceptable; when `Accept` is absent or accepts none of the
/// offers, the default (the service answers it rather than 406, as RFC 9110 allows).
pub fn answer_type_among(headers: &HeaderMap, offered: &[AnswerType]) -> AnswerType {
    let default = offered.first().copied().unwrap_or(AnswerType::Json);
    let Some(accept) = headers
        .get(header::ACCEPT)
        .and_then(|value| value.to_str().ok())
    else {
        return default;
    };
    let mut best: Option<(AnswerType, u8, f32)> = None;
    for &kind in offered {
        let (main, sub) = kind.media();
        let Some((specificity, q)) = preference(accept, main, sub).filter(|(_, q)| *q > 0.0) else {
            continue;
        };
        let better = match best {
            None => true,
            Some((_, best_specificity, best_q)) => {
                q > best_q || (q == best_q && specificity > best_specificity)
            }
        };
        if better {
            best = Some((kind, specificity, q));
        }
    }
    best.map_or(default, |(kind, _, _)| kind)
}

#[cfg(test)]
mod tests {
    use super::*;
    use axum::http::HeaderValue;

    fn with_accept(value: &str) -> AnswerType {
        let mut headers = HeaderMap::new();
        headers.insert(
            header::ACCEPT,
            HeaderValue::from_str(value).unwrap_or_else(|_| HeaderValue::from_static("")),
        );
        answer_type(&headers)
    }

    #[test]
    fn accept_header_chooses_csv_only_when_preferred() {
        // Media-range precedence and q values as RFC 9110 sec. 12.5.1 describes them.
        assert_eq!(answer_type(&HeaderMap::new()), AnswerType::Json);
        assert_eq!(with_accept("text/csv"), AnswerType::Csv);
        assert_eq!(with_accept("TEXT/CSV; charset=utf-8"), AnswerType::Csv);
        assert_eq!(with_accept("text/*"), AnswerType::Csv);
        assert_eq!(with_accept("*/*"), AnswerType::Json);
        assert_eq!(with_accept("application/json"), AnswerType::Json);
        assert_eq!(with_accept("application/json, text/csv"), AnswerType::Json);
        assert_eq!(with_accept("text/csv, */*;q=0.1"), AnswerType::Csv);
        assert_eq!(with_accept("text/csv, */*"), AnswerType::Csv);
        assert_eq!(
            with_accept("application/json;q=0.5, text/csv"),
            AnswerType::Csv
        );
        assert_eq!(
            with_accept("text/csv;q=0.4, application/json;q=0.5"),
            AnswerType::Json
        );
        assert_eq!(with_accept("text/csv;q=0"), AnswerType::Json);
        assert_eq!(with_accept("image/png"), AnswerType::Json);
        assert_eq!(with_accept("garbage"), AnswerType::Json);
    }

    fn among(value: &str, offered: &[AnswerType]) -> AnswerType {
        let mut headers = HeaderMap::new();
        headers.insert(
            header::ACCEPT,
            HeaderValue::from_str(value).unwrap_or_else(|_| HeaderValue::from_static("")),
        );
        answer_type_among(&headers, offered)
    }

    #[test]
    fn svg_is_chosen_when_preferred() {
        // RFC 9110 sec. 12.5.1 precedence; the browser's image Accept header (common practice).
        use AnswerType::{Csv, Json, Svg};
        let three = [Json, Csv, Svg];
        assert_eq!(among("image/svg+xml", &three), Svg);
        assert_eq!(among("image/*", &three), Svg);
        assert_eq!(among("*/*", &three), Json);
        assert_eq!(among("text/csv", &three), Csv);
        assert_eq!(
            among(
                "image/avif,image/webp,image/apng,image/svg+xml,image/*,*/*;q=0.8",
                &three
            ),
            Svg
        );
        assert_eq!(among("image/svg+xml;q=0.5, application/json", &three), Json);
        let plots = [Svg, Csv];
        assert_eq!(answer_type_among(&HeaderMap::new(), &plots), Svg);
        assert_eq!(among("application/json", &plots), Svg);
        assert_eq!(among("text/csv", &plots), Csv);
        assert_eq!(among("text/csv;q=0.9, image/svg+xml", &plots), Svg);
        assert_eq!(among("text/*", &plots), Csv);
    }
}
