//! Ephemeris readers (JSON, CCSDS OEM, SP3) and interpolation.
