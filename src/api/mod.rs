//! The HTTP layer.
