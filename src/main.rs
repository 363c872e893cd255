//! The `eigenzeit` binary: serve (default), print the OpenAPI document, or probe health.
#![forbid(unsafe_code)]

use std::process::ExitCode;

use clap::Parser;
use eigenzeit::ops::config::{Cli, Command};

fn runtime() -> Result<tokio::runtime::Runtime, String> {
    tokio::runtime::Builder::new_multi_thread()
        .enable_all()
        .build()
        .map_err(|e| format!("cannot start the async runtime: {e}"))
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
    let outcome = match cli.command.unwrap_or(Command::Serve) {
        Command::Serve => {
            runtime().and_then(|rt| rt.block_on(eigenzeit::ops::server::run(cli.settings)))
        }
        Command::Openapi => {
            println!("{}", eigenzeit::api::openapi::document_json());
            Ok(())
        }
        Command::Healthcheck { url } => healthcheck(&url),
    };
    match outcome {
        Ok(()) => ExitCode::SUCCESS,
        Err(message) => {
            eprintln!("eigenzeit: {message}");
            ExitCode::FAILURE
        }
    }
}
