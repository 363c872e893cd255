#!/usr/bin/env python3
"""Consistency checks on eigenzeit's deployment files that schema validation cannot see.

Called by deploy/validate.sh as `python3 check_files.py DEPLOY_DIR [RENDERED_YAML]`, where
RENDERED_YAML is the output of `kubectl kustomize DEPLOY_DIR/kubernetes` (optional). Prints one
line per check ("PASS ..." / "FAIL ...") and exits 1 if any check failed.

The settings below are the service's documented command-line flags and environment variables
(deploy/README.md, "Configuration"); a key outside this list in a manifest is a typo.
"""

import os
import re
import sys

import yaml

SETTINGS = {
    # environment variable: command-line flag
    "EIGENZEIT_ADDR": "--addr",
    "EIGENZEIT_LOG_FORMAT": "--log-format",
    "EIGENZEIT_LOG_LEVEL": "--log-level",
    "EIGENZEIT_BODY_LIMIT_BYTES": "--body-limit-bytes",
    "EIGENZEIT_REQUEST_TIMEOUT_S": "--request-timeout-s",
    "EIGENZEIT_BATCH_LIMIT": "--batch-limit",
    "EIGENZEIT_DRAIN_TIMEOUT_S": "--drain-timeout-s",
    "EIGENZEIT_SHUTDOWN_DELAY_S": "--shutdown-delay-s",
    "EIGENZEIT_MAX_EPHEMERIS_GAP_S": "--max-ephemeris-gap-s",
    "EIGENZEIT_CORS_ORIGINS": "--cors-origins",
    "EIGENZEIT_LEAP_SECONDS_FILE": "--leap-seconds-file",
    "EIGENZEIT_EPHEMERIS_FILE": "--ephemeris-file",
    "EIGENZEIT_LEAP_SECONDS_URL": "--leap-seconds-url",
    "EIGENZEIT_LEAP_SECONDS_REFRESH_S": "--leap-seconds-refresh-s",
}
DRAIN_DEFAULT_S = 20  # the service's default for --drain-timeout-s
HEALTHCHECK_CMD = ["/usr/local/bin/eigenzeit", "healthcheck", "--url", "http://127.0.0.1:8080/healthz"]
OCI_LABELS = ["title", "description", "version", "revision", "created", "source", "licenses"]

results = []


def check(name, ok, detail=""):
    results.append(bool(ok))
    print(("PASS " if ok else "FAIL ") + name + ("" if ok or not detail else f": {detail}"))


def duration_s(text):
    """Compose duration ("30s", "1m30s") in seconds; None if unreadable."""
    parts = re.findall(r"(\d+(?:\.\d+)?)(h|ms|m|s|us)", str(text))
    if not parts or "".join(n + u for n, u in parts) != str(text):
        return None
    scale = {"h": 3600, "m": 60, "s": 1, "ms": 1e-3, "us": 1e-6}
    return sum(float(n) * scale[u] for n, u in parts)


def containerfile_instructions(path):
    """(INSTRUCTION, arguments) pairs with continuation lines joined and comments dropped."""
    out, buf = [], ""
    with open(path) as f:
        for raw in f:
            line = raw.rstrip("\n")
            if line.lstrip().startswith("#"):
                continue
            if line.endswith("\\"):
                buf += line[:-1] + " "
                continue
            buf += line
            if buf.strip():
                word, _, rest = buf.strip().partition(" ")
                out.append((word.upper(), rest.strip()))
            buf = ""
    return out


def check_containerfile(deploy):
    ins = containerfile_instructions(os.path.join(deploy, "Containerfile"))
    text = "\n".join(f"{k} {v}" for k, v in ins)
    args = {m.group(1): m.group(2) for m in re.finditer(r"^ARG (\w+)=(\S+)", text, re.M)}
    froms = [re.sub(r"\$\{(\w+)\}", lambda m: args.get(m.group(1), "?"), v) for k, v in ins if k == "FROM"]
    check("Containerfile: builder stage is rust:1-bookworm",
          froms and froms[0].startswith("rust:1-bookworm "), froms)
    check("Containerfile: runtime stage is distroless cc-debian12:nonroot",
          froms and froms[-1].startswith("gcr.io/distroless/cc-debian12:nonroot "), froms)
    builds = [v for k, v in ins if k == "RUN" and "cargo build --release --locked" in v]
    check("Containerfile: dependency layer and application build both use --release --locked",
          len(builds) == 2, f"{len(builds)} cargo builds")
    users = [v for k, v in ins if k == "USER"]
    check("Containerfile: final USER is numeric and not root",
          users and re.fullmatch(r"[1-9]\d*(:[1-9]\d*)?", users[-1]), users)
    env = " ".join(v for k, v in ins if k == "ENV")
    check("Containerfile: ENV EIGENZEIT_ADDR=0.0.0.0:8080", "EIGENZEIT_ADDR=0.0.0.0:8080" in env)
    check("Containerfile: ENV EIGENZEIT_LOG_FORMAT=json", "EIGENZEIT_LOG_FORMAT=json" in env)
    check("Containerfile: EXPOSE 8080", ("EXPOSE", "8080") in ins)
    hc = [v for k, v in ins if k == "HEALTHCHECK"]
    hc_cmd = yaml.safe_load(hc[0].split("CMD", 1)[1]) if hc and "CMD" in hc[0] else None
    check("Containerfile: HEALTHCHECK runs `eigenzeit healthcheck` in exec form",
          hc_cmd == HEALTHCHECK_CMD, hc)
    labels = " ".join(v for k, v in ins if k == "LABEL")
    missing = [x for x in OCI_LABELS if f"org.opencontainers.image.{x}=" not in labels]
    check("Containerfile: OCI labels present", not missing, f"missing {missing}")
    check("Containerfile: ENTRYPOINT is the binary (exec form)",
          ("ENTRYPOINT", '["/usr/local/bin/eigenzeit"]') in ins)


def drain_timeout_s(env):
    return int(env.get("EIGENZEIT_DRAIN_TIMEOUT_S", DRAIN_DEFAULT_S))


def check_compose(deploy):
    path = os.path.join(deploy, "compose.yaml")
    with open(path) as f:
        doc = yaml.safe_load(f)
    check("compose: parses as a YAML mapping with services.eigenzeit",
          isinstance(doc, dict) and "eigenzeit" in (doc.get("services") or {}))
    svc = (doc.get("services") or {}).get("eigenzeit") or {}
    build = svc.get("build") or {}
    dockerfile = os.path.join(deploy, build.get("context", "."), build.get("dockerfile", "?"))
    check("compose: build.dockerfile exists relative to build.context", os.path.isfile(dockerfile), dockerfile)
    check("compose: publishes container port 8080",
          any(str(p).endswith(":8080") for p in svc.get("ports", [])), svc.get("ports"))
    check("compose: read_only: true", svc.get("read_only") is True)
    check("compose: cap_drop ALL", "ALL" in (svc.get("cap_drop") or []))
    check("compose: healthcheck runs `eigenzeit healthcheck`",
          (svc.get("healthcheck") or {}).get("test") == ["CMD"] + HEALTHCHECK_CMD)
    env = svc.get("environment") or {}
    unknown = sorted(set(env) - set(SETTINGS))
    check("compose: environment keys are known settings", isinstance(env, dict) and not unknown, unknown)
    check("compose: EIGENZEIT_ADDR listens on 0.0.0.0:8080", env.get("EIGENZEIT_ADDR") == "0.0.0.0:8080")
    grace = duration_s(svc.get("stop_grace_period", "10s"))
    check("compose: stop_grace_period exceeds the drain timeout",
          grace is not None and grace > drain_timeout_s(env), f"{grace} s vs {drain_timeout_s(env)} s")
    limits = ((svc.get("deploy") or {}).get("resources") or {}).get("limits") or {}
    check("compose: CPU and memory limits set", "cpus" in limits and "memory" in limits, limits)
    mounts = [v for v in svc.get("volumes", []) if isinstance(v, dict)]
    leap = [m for m in mounts if m.get("source") == "./leap-seconds"]
    check("compose: ./leap-seconds bind-mounted read-only",
          len(leap) == 1 and leap[0].get("type") == "bind" and leap[0].get("read_only") is True, mounts)
    leap_file = str(env.get("EIGENZEIT_LEAP_SECONDS_FILE", ""))
    check("compose: EIGENZEIT_LEAP_SECONDS_FILE lies in the mounted directory",
          leap and leap_file.startswith(leap[0].get("target", "?") + "/"), leap_file)
    check("compose: deploy/leap-seconds/README.md exists",
          os.path.isfile(os.path.join(deploy, "leap-seconds", "README.md")))


def load_manifests(paths):
    docs = []
    for p in paths:
        with open(p) as f:
            docs += [d for d in yaml.safe_load_all(f) if d]
    return docs


def check_kubernetes(deploy, rendered):
    kdir = os.path.join(deploy, "kubernetes")
    with open(os.path.join(kdir, "kustomization.yaml")) as f:
        kust = yaml.safe_load(f)
    listed = kust.get("resources", [])
    present = sorted(n for n in os.listdir(kdir) if n.endswith(".yaml") and n != "kustomization.yaml")
    check("kustomization: every listed resource exists",
          all(os.path.exists(os.path.join(kdir, r)) for r in listed), listed)
    check("kustomization: every manifest file is listed", set(present) <= set(listed),
          sorted(set(present) - set(listed)))
    check("kustomization: namespace is timing", kust.get("namespace") == "timing")
    docs = load_manifests([rendered]) if rendered else load_manifests(os.path.join(kdir, r) for r in listed)
    by_kind = {}
    for d in docs:
        by_kind.setdefault(d.get("kind"), []).append(d)
    if rendered:
        check("rendered: every namespaced object is in namespace timing",
              all(d["metadata"].get("namespace") == "timing" for d in docs if d["kind"] != "Namespace"))
    deps = by_kind.get("Deployment", [])
    check("kubernetes: exactly one Deployment", len(deps) == 1)
    if len(deps) != 1:
        return
    dep = deps[0]
    spec, pod = dep["spec"], dep["spec"]["template"]["spec"]
    labels = dep["spec"]["template"]["metadata"].get("labels", {})
    annotations = dep["spec"]["template"]["metadata"].get("annotations", {})

    def selects(selector):
        return bool(selector) and all(labels.get(k) == v for k, v in selector.items())

    check("deployment: replicas >= 2", spec.get("replicas", 1) >= 2)
    check("deployment: selector matches pod labels", selects(spec["selector"].get("matchLabels")))
    c = pod["containers"][0]
    ports = {p.get("name"): p["containerPort"] for p in c.get("ports", [])}
    check("deployment: container port http = 8080", ports.get("http") == 8080, ports)

    def probe(kind, path):
        get = (c.get(kind) or {}).get("httpGet") or {}
        return get.get("path") == path and get.get("port") in ("http", 8080)

    check("deployment: liveness probe GET /healthz", probe("livenessProbe", "/healthz"))
    check("deployment: readiness probe GET /readyz", probe("readinessProbe", "/readyz"))
    check("deployment: startup probe GET /healthz", probe("startupProbe", "/healthz"))
    res = c.get("resources") or {}
    check("deployment: cpu and memory requests and limits set",
          all(k in res.get(x, {}) for x in ("requests", "limits") for k in ("cpu", "memory")), res)
    psc, csc = pod.get("securityContext") or {}, c.get("securityContext") or {}
    check("deployment: runAsNonRoot", psc.get("runAsNonRoot") is True or csc.get("runAsNonRoot") is True)
    check("deployment: readOnlyRootFilesystem", csc.get("readOnlyRootFilesystem") is True)
    check("deployment: allowPrivilegeEscalation false", csc.get("allowPrivilegeEscalation") is False)
    check("deployment: capabilities drop ALL", (csc.get("capabilities") or {}).get("drop") == ["ALL"])
    check("deployment: seccomp RuntimeDefault",
          "RuntimeDefault" in ((psc.get("seccompProfile") or {}).get("type"),
                               (csc.get("seccompProfile") or {}).get("type")))
    check("deployment: Prometheus scrape annotations point at /metrics on 8080",
          annotations.get("prometheus.io/scrape") == "true" and annotations.get("prometheus.io/port") == "8080"
          and annotations.get("prometheus.io/path") == "/metrics", annotations)

    env = {}
    for ref in c.get("envFrom", []):
        name = (ref.get("configMapRef") or {}).get("name")
        cms = [m for m in by_kind.get("ConfigMap", []) if m["metadata"]["name"] == name]
        check(f"deployment: envFrom ConfigMap {name} exists", len(cms) == 1)
        env.update(cms[0].get("data", {}) if cms else {})
    unknown = sorted(set(env) - set(SETTINGS))
    check("configmap: keys are known settings", not unknown, unknown)
    grace = pod.get("terminationGracePeriodSeconds", 30)
    check("deployment: terminationGracePeriodSeconds exceeds the drain timeout",
          grace > drain_timeout_s(env), f"{grace} s vs {drain_timeout_s(env)} s")

    for svc in by_kind.get("Service", []):
        check(f"service {svc['metadata']['name']}: selector matches pod labels",
              selects(svc["spec"].get("selector")))
        check(f"service {svc['metadata']['name']}: targets the http port",
              all(p.get("targetPort") in ("http", 8080) for p in svc["spec"]["ports"]))
    for pdb in by_kind.get("PodDisruptionBudget", []):
        check("pdb: selector matches pod labels", selects(pdb["spec"]["selector"].get("matchLabels")))
        check("pdb: minAvailable 1", pdb["spec"].get("minAvailable") == 1)
    for hpa in by_kind.get("HorizontalPodAutoscaler", []):
        ref = hpa["spec"]["scaleTargetRef"]
        check("hpa: targets the Deployment",
              ref.get("kind") == "Deployment" and ref.get("name") == dep["metadata"]["name"], ref)
        cpu = [m["resource"]["target"] for m in hpa["spec"].get("metrics", [])
               if m.get("type") == "Resource" and m["resource"]["name"] == "cpu"]
        check("hpa: CPU utilization target 70%",
              cpu == [{"type": "Utilization", "averageUtilization": 70}], cpu)
        check("hpa: minReplicas >= 2", hpa["spec"].get("minReplicas", 1) >= 2)
    for kind in ("Service", "PodDisruptionBudget", "HorizontalPodAutoscaler"):
        check(f"kubernetes: one {kind}", len(by_kind.get(kind, [])) == 1)


def check_readme(deploy):
    with open(os.path.join(deploy, "README.md")) as f:
        text = f.read()
    missing = [x for kv in SETTINGS.items() for x in kv if f"`{x}`" not in text]
    check("README: configuration table names every flag and variable", not missing, missing)
    check("README: has the measured Capacity figures table (no placeholder left)",
          "Capacity figures" in text and "bench/load.sh" in text and "TBD" not in text)


def main():
    deploy = sys.argv[1]
    rendered = sys.argv[2] if len(sys.argv) > 2 else None
    for step in (check_containerfile, check_compose, check_readme):
        try:
            step(deploy)
        except (OSError, KeyError, TypeError, AttributeError, yaml.YAMLError) as e:
            check(f"{step.__name__} ran", False, repr(e))
    try:
        check_kubernetes(deploy, rendered)
    except (OSError, KeyError, TypeError, AttributeError, IndexError, yaml.YAMLError) as e:
        check("check_kubernetes ran", False, repr(e))
    failed = results.count(False)
    print(f"consistency checks: {len(results) - failed} passed, {failed} failed")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main())
