//! Log set-up: tracing to standard error, human-readable or one JSON object per line. Colours
//! only on a terminal, so that captured logs (containers, files) read `key=value` plainly.

use std::io::IsTerminal;

use tracing_subscriber::EnvFilter;

use super::config::{LogFormat, Settings};

/// Installs the global log subscriber (once; later calls are ignored).
pub fn init_logging(settings: &Settings) {
    let filter = EnvFilter::try_new(&settings.log_level).unwrap_or_else(|_| EnvFilter::new("info"));
    let builder = tracing_subscriber::fmt()
        .with_env_filter(filter)
        .with_writer(std::io::stderr)
        .with_ansi(std::io::stderr().is_terminal());
    let _ = match settings.log_format {
        LogFormat::Json => builder.json().flatten_event(true).try_init(),
        LogFormat::Pretty => builder.try_init(),
    };
}
