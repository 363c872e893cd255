//! The `eigenzeit` binary: serve (default), print the OpenAPI document, or probe health.
#![forbid(unsafe_code)]

use std::process::ExitCode;
use std::time::Duration;

use clap::Parser;
use eigenzeit::ops::config::{Cli, Command, Settings};

fn runtime() -> Result<tokio::runtime::Runtime, String> {
    tokio::runtime::Builder::new_multi_thread()
        .enable_all()
        .build()
        .map_err(|e| format!("cannot start the async runtime: {e}"))
}

/// Longest wait, after the server has stopped, for blocking work still running (a request
/// abandoned at the drain timeout); without a bound, dropping the runtime waits for it.
const BLOCKING_WORK_GRACE: Duration = Duration::from_millis(500);

fn serve(settings: Settings) -> Result<(), String> {
    let runtime = runtime()?;
    let outcome = runtime.block_on(eigenzeit::ops::server::run(settings));
    runtime.shutdown_timeout(BLOCKING_WORK_GRACE);
    outcome
}

fn healthcheck(url: &str) -> Result<(), String> {
    runtime()?.block_on(async {
        let client = reqwest::Client::builder()
            .timeout(std::time::Duration::from_secs(3))
            .build()
            .map_err(|e| e.to_string())?;
        let response = client
            .get(url)
            .send()
            .await
            .map_err(|e| format!("{url}: {e}"))?;
        if response.status().is_success() {
            Ok(())
        } else {
            Err(format!("{url} answered {}", response.status()))
        }
    })
}

fn main() -> ExitCode {
    let cli = Cli::parse();
    let outcome = match cli.command {
        None => serve(cli.settings),
        Some(Command::Serve(settings)) => serve(*settings),
        Some(Command::Openapi) => {
            println!("{}", eigenzeit::ops::openapi::document_json());
            Ok(())
        }
        Some(Command::Healthcheck { url }) => healthcheck(&url),
    };
    match outcome {
        Ok(()) => ExitCode::SUCCESS,
        Err(message) => {
            eprintln!("eigenzeit: {message}");
            ExitCode::FAILURE
        }
    }
}
