# Shared by the bench scripts (sourced, not run): a free port, the clean-up of the server and
# the work folder, and waiting for readiness. Needs $work; set $server_pid after starting.

free_port() {
    python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1", 0)); print(s.getsockname()[1]); s.close()'
}

cleanup() {
    kill "$server_pid" 2>/dev/null || true
    wait "$server_pid" 2>/dev/null || true
    rm -rf "$work"
}

wait_ready() { # wait_ready BASE_URL: up to 10 s for /readyz
    for _ in $(seq 1 1000); do
        curl -fsS -o /dev/null "$1/readyz" 2>/dev/null && return 0
        sleep 0.01
    done
    return 1
}
