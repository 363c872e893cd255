//! What one request costs inside the application (routing, middleware, extractors, handler,
//! answer), without the network: each endpoint against `GET /healthz` in the same run.
//!
//! Run: `cargo bench --bench http_router`. The wire's share (sockets, HTTP/1.1 framing) is
//! what `bench/http_ratios.sh` adds on top.

use axum::body::Body;
use axum::http::Request;
use criterion::{black_box, criterion_group, criterion_main, Criterion};
use eigenzeit::ops::config::Settings;
use eigenzeit::ops::ServiceState;
use eigenzeit::physics::earth::eop::EopTable;
use eigenzeit::physics::time::leap_seconds::LeapTable;
use tower::ServiceExt;

const AT: &str = "2026-03-14T06:30:00.123456789012";

fn bench(c: &mut Criterion) {
    let runtime = tokio::runtime::Builder::new_current_thread()
        .enable_all()
        .build()
        .unwrap_or_else(|e| panic!("runtime: {e}"));
    let state = ServiceState::new(
        Settings::default(),
        LeapTable::builtin().clone(),
        EopTable::builtin().clone(),
        eigenzeit::physics::solar_system::Ephemeris::embedded()
            .unwrap_or_else(|e| panic!("ephemeris: {e}")),
        eigenzeit::ops::openapi::document_json(),
    );
    state.set_ready(true);
    let app = eigenzeit::ops::app::app(state);
    let paths = [
        ("baseline: GET /healthz", "/healthz".to_string()),
        (
            "GET /v1/time/convert to=TDB,TCB,GPST",
            format!("/v1/time/convert?at={AT}&from=UTC&to=TDB,TCB,GPST"),
        ),
        (
            "GET /v1/time/convert to=TAI",
            format!("/v1/time/convert?at={AT}&from=UTC&to=TAI"),
        ),
        (
            "GET /v1/time/convert to=TDB forms=j2000_s",
            format!("/v1/time/convert?at={AT}&from=UTC&to=TDB&forms=j2000_s"),
        ),
        ("GET /v1/time/now", "/v1/time/now".to_string()),
    ];
    for (name, path) in paths {
        c.bench_function(name, |b| {
            b.iter(|| {
                runtime.block_on(async {
                    let request = Request::get(path.as_str())
                        .body(Body::empty())
                        .unwrap_or_default();
                    let response = app.clone().oneshot(request).await;
                    let body = match response {
                        Ok(response) => axum::body::to_bytes(response.into_body(), usize::MAX)
                            .await
                            .ok(),
                        Err(never) => match never {},
                    };
                    black_box(body.map(|b| b.len()))
                })
            })
        });
    }
}

criterion_group!(benches, bench);
criterion_main!(benches);
