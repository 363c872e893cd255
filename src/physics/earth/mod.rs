//! The Earth as a body: its normal gravity field (GRS80, closed form). Earth orientation and
//! Earth orientation parameters (IERS Conventions (2010) ch. 5) come here too.

pub mod eop;
pub mod normal_field;
