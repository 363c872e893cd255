//! The OpenAPI 3.1 document, generated from the handlers and types.

use utoipa::OpenApi;

/// The API description. Every handler and schema is listed here; a test keeps the committed
/// `openapi/openapi.json` equal to what this produces.
#[derive(OpenApi)]
#[openapi(
    info(
        title = "eigenzeit",
        description = "Relativistic clock and time-scale answers: time-scale conversions with picosecond care, clock rate offsets, proper time along ephemerides, signal-path corrections. Not certified for safety-of-life use; the governing interface specifications prevail.",
        license(name = "MIT OR Apache-2.0", identifier = "MIT OR Apache-2.0")
    ),
    paths(
        crate::api::time::convert::convert_get,
        crate::api::time::convert::convert_post,
        crate::api::time::reference::scales,
        crate::api::time::reference::leap_seconds,
        crate::api::time::reference::now,
        crate::api::clock::rate::rate,
        crate::api::clock::compare::compare,
        crate::api::proper_time::proper_time,
        crate::api::signal::path::signal_path,
        crate::api::signal::two_way::two_way,
        crate::ops::health::healthz,
        crate::ops::health::readyz,
        crate::ops::health::metrics,
    ),
    components(schemas(crate::api::error::Problem)),
    tags(
        (name = "time", description = "Time scales: conversions, the scales, the leap-second table"),
        (name = "clock", description = "Clock rates against TT or TCG: state vectors, orbits, ground and lunar sites; comparisons between clocks"),
        (name = "signal", description = "Signal paths: light time with Sagnac, Shapiro and clock terms; two-way time-transfer Sagnac correction"),
        (name = "operations", description = "Liveness, readiness, metrics")
    )
)]
pub struct ApiDoc;

/// The document as pretty-printed JSON (what `/openapi.json` serves and `eigenzeit openapi` prints).
pub fn document_json() -> String {
    ApiDoc::openapi()
        .to_pretty_json()
        .unwrap_or_else(|e| format!("{{\"error\": \"{e}\"}}"))
}
