//! eigenzeit: relativistic clock and time-scale answers over HTTP.
//!
//! The crate has two halves. [`physics`] and [`ephemeris`] are a pure library (no HTTP, no
//! async): time scales, clock rates, proper time, signal paths and ephemeris readers. [`api`]
//! and [`ops`] are the thin HTTP service around it; [`app`] builds the whole router.
#![forbid(unsafe_code)]

pub mod api;
pub mod ephemeris;
pub mod ops;
pub mod physics;

pub use api::app;
