//! eigenzeit: relativistic clock and time-scale answers over HTTP.
//!
//! The crate has two halves. [`physics`] and [`trajectory`] are a pure library (no HTTP, no
//! async): time scales, clock rates, proper time and signal paths; readers of uploaded
//! trajectories (JSON, CCSDS OEM, SP3). [`api`] and [`ops`] are the thin HTTP service around
//! it; [`app`] builds the whole router. Imports go one way only, main -> ops -> api ->
//! trajectory -> physics: the rule and its check are in tests/layers.rs.
#![forbid(unsafe_code)]

pub mod api;
pub mod ops;
pub mod physics;
pub mod trajectory;

pub use ops::app;
