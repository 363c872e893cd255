//! The Earth as a body: its normal gravity field (GRS80, closed form), the Earth orientation
//! parameters (`eop`) and the ITRS <-> GCRS transformation (`orientation`, IERS Conventions
//! (2010) ch. 5).

pub mod eop;
pub mod geopotential;
pub mod normal_field;
pub mod orientation;
