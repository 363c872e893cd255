//! The real `eigenzeit` binary at start-up: the command line and its environment twins,
//! refusal of a malformed leap-second file or bad settings, a valid file, and its logs.

mod common;

use std::process::Command;
use std::time::Duration;

use clap::CommandFactory;
use common::client;
use common::process::{run_to_exit, Service, TempFile, BINARY, IERS_FILE};

#[test]
fn help_lists_every_setting_with_its_env_twin() {
    // Common practice (twelve-factor configuration): every flag has an environment twin.
    let cli = eigenzeit::ops::config::Cli::command();
    let healthcheck = cli
        .find_subcommand("healthcheck")
        .expect("healthcheck")
        .clone();
    for (command, args) in [
        (cli.clone(), vec!["--help"]),
        (healthcheck, vec!["healthcheck", "--help"]),
    ] {
        let output = Command::new(BINARY)
            .args(&args)
            .output()
            .expect("run --help");
        assert!(output.status.success());
        let help = String::from_utf8_lossy(&output.stdout).to_string();
        let mut settings = 0;
        for arg in command.get_arguments() {
            let Some(long) = arg.get_long() else { continue };
            if long == "help" || long == "version" {
                continue;
            }
            let env = arg
                .get_env()
                .and_then(|e| e.to_str())
                .unwrap_or_else(|| panic!("--{long} has no env twin"));
            let suffix = long.replace('-', "_").to_ascii_uppercase();
            assert!(
                env.starts_with("EIGENZEIT_") && env.ends_with(&suffix),
                "--{long}: {env}"
            );
            assert!(
                help.contains(&format!("--{long} <")),
                "--{long} missing from {args:?}:\n{help}"
            );
            assert!(
                help.contains(&format!("[env: {env}=]")),
                "{env} missing from {args:?}:\n{help}"
            );
            settings += 1;
        }
        assert!(settings >= 1, "{args:?}");
    }
    // `serve` takes the same settings as the bare command.
    let output = Command::new(BINARY)
        .args(["serve", "--help"])
        .output()
        .expect("run");
    let help = String::from_utf8_lossy(&output.stdout).to_string();
    for arg in cli.get_arguments().filter_map(|a| a.get_long()) {
        if arg != "help" && arg != "version" {
            assert!(
                help.contains(&format!("--{arg} <")),
                "serve --help lacks --{arg}"
            );
        }
    }
}

#[test]
fn start_up_refuses_a_malformed_leap_second_file_and_bad_settings() {
    // IERS Leap_Second.dat layout: `MJD day month year TAI-UTC`; a month 13 is not a date.
    let broken = IERS_FILE.replace(
        "57754.0    1  1 2017       37",
        "57754.0    1 13 2017       37",
    );
    assert_ne!(broken, IERS_FILE);
    let file = TempFile::new("broken.dat", &broken);
    let (status, stderr) =
        run_to_exit(&["--addr", "127.0.0.1:0", "--leap-seconds-file", file.path()]);
    assert_eq!(status.code(), Some(1), "{stderr}");
    let message = format!(
        "eigenzeit: the leap-second file {} is not valid: line ",
        file.path()
    );
    assert!(stderr.contains(&message), "{stderr}");
    assert!(!stderr.contains("eigenzeit serving"), "{stderr}");

    let missing = format!("{}.absent", file.path());
    let (status, stderr) = run_to_exit(&["--addr", "127.0.0.1:0", "--leap-seconds-file", &missing]);
    assert_eq!(status.code(), Some(1), "{stderr}");
    assert!(
        stderr.contains(&format!("cannot read the leap-second file {missing}")),
        "{stderr}"
    );

    let (status, stderr) = run_to_exit(&["--addr", "127.0.0.1:0", "--request-timeout-s", "0"]);
    assert_eq!(status.code(), Some(1), "{stderr}");
    assert!(
        stderr.contains("--request-timeout-s must be a positive number of seconds"),
        "{stderr}"
    );
}

#[tokio::test]
async fn valid_leap_second_file_starts_and_requests_are_logged() {
    let newer = IERS_FILE.replace(
        "File expires on 28 June 2027",
        "File expires on 28 December 2027",
    );
    let file = TempFile::new("newer.dat", &newer);
    let mut service = Service::start(&[
        "serve",
        "--log-format",
        "json",
        "--leap-seconds-file",
        file.path(),
    ]);
    let (status, _, table) = service.get_json("/v1/time/leap-seconds").await;
    assert_eq!(status, 200);
    assert_eq!(table["source"], format!("file {}", file.path()));
    // 28 December 2027 = MJD 61767 (MJD 0 = 1858-11-17, Explanatory Supplement).
    assert_eq!(table["expires_mjd"], 61_767);
    let response = client()
        .get(service.url("/healthz"))
        .header("x-request-id", "process-log-1")
        .send()
        .await
        .expect("get");
    assert_eq!(response.status().as_u16(), 200);
    service.terminate();
    let status = service.wait_exit(Duration::from_secs(30)).await;
    assert_eq!(status.code(), Some(0), "{:?}", service.log());
    // One JSON log line per request with method, route, status, latency and request id.
    let log = service.json_log();
    let line = log
        .iter()
        .find(|l| l["message"] == "request" && l["request_id"] == "process-log-1")
        .unwrap_or_else(|| panic!("no request line: {log:?}"));
    assert_eq!(line["method"], "GET");
    assert_eq!(line["route"], "/healthz");
    assert_eq!(line["status"], 200);
    assert!(
        line["latency_ms"].as_f64().is_some_and(|ms| ms >= 0.0),
        "{line}"
    );
    assert!(
        log.iter().any(|l| l["message"] == "eigenzeit stopped"),
        "{log:?}"
    );
}

#[tokio::test]
async fn pretty_logs_carry_no_terminal_colours_when_captured() {
    let mut service = Service::start(&[]);
    let log = service.log();
    let serving = log
        .iter()
        .find(|l| l.contains("eigenzeit serving"))
        .expect("serving line");
    // ECMA-48: colour sequences start with ESC (0x1b); a captured log must read key=value.
    assert!(!serving.contains('\u{1b}'), "{serving:?}");
    assert!(
        serving.contains(&format!("addr={}", service.host_port)),
        "{serving}"
    );
    assert_eq!(service.stop().await.code(), Some(0));
}

/// An excerpt of IERS Bulletin A `finals2000A.all` (astropy-iers-data 0.2026.11.2.0.34.55, see
/// tests/reference/eop_reference_versions.txt).
const FINALS: &str = include_str!("reference/eop_finals2000A_2026_2027.all");

#[test]
fn start_up_refuses_a_malformed_or_truncated_eop_file_naming_the_line() {
    // readme.finals2000A: x_p in columns 19-27; a letter there is not a number (line 62,
    // 2026-10-01).
    let broken = FINALS.replacen(" 0.174596 ", " 0.17x596 ", 1);
    assert_ne!(broken, FINALS);
    // The file cut in the middle of line 62, before y_p (columns 38-46).
    let cut = FINALS
        .lines()
        .position(|l| l.get(7..15) == Some("61314.00"))
        .expect("2026-10-01");
    let lines: Vec<&str> = FINALS.lines().collect();
    let truncated = format!("{}\n{}", lines[..cut].join("\n"), &lines[cut][..30]);
    for (name, text) in [("broken.all", broken), ("truncated.all", truncated)] {
        let file = TempFile::new(name, &text);
        let (status, stderr) = run_to_exit(&["--addr", "127.0.0.1:0", "--eop-file", file.path()]);
        assert_eq!(status.code(), Some(1), "{stderr}");
        let message = format!(
            "eigenzeit: the EOP file {} is not valid: line 62: ",
            file.path()
        );
        assert!(stderr.contains(&message), "{name}: {stderr}");
        assert!(!stderr.contains("eigenzeit serving"), "{stderr}");
    }
    let (status, stderr) = run_to_exit(&["--addr", "127.0.0.1:0", "--eop-refresh-s", "0"]);
    assert_eq!(status.code(), Some(1), "{stderr}");
    assert!(
        stderr.contains("--eop-refresh-s must be a positive number of seconds"),
        "{stderr}"
    );
}

#[tokio::test]
async fn valid_eop_file_from_the_environment_is_the_table_in_force() {
    let file = TempFile::new("finals.all", FINALS);
    let mut service = Service::start_with_env(&[], &[("EIGENZEIT_EOP_FILE", file.path())]);
    let (status, _, table) = service.get_json("/v1/earth/eop").await;
    assert_eq!(status, 200);
    assert_eq!(table["source"], format!("file {}", file.path()));
    // The excerpt: 2026-08-01 (MJD 61253) on, observed to 2026-10-22 (MJD 61335).
    assert_eq!(table["first_mjd"], 61_253);
    assert_eq!(table["last_observed_mjd"], 61_335);
    assert_eq!(service.stop().await.code(), Some(0));
}
