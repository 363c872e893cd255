//! Operations: configuration, telemetry, health, shutdown.
