#!/usr/bin/env bash
# Installs code-server (a real VS Code served to a browser) for the end-to-end tests, outside the
# project's own dependencies, into a cache folder that later runs reuse. Prints the folder that holds
# node_modules/.bin/code-server. Safe to run again: it does nothing when the install is complete.
set -euo pipefail

# 4.100.3 (VS Code 1.100.3) is the last release that runs on Node 20.
CODE_SERVER_VERSION=4.100.3
# The ripgrep wrapper that this VS Code pins, and the prebuilt archive its postinstall would download.
RIPGREP_WRAPPER_VERSION=1.15.11
RIPGREP_ASSET=ripgrep-v13.0.0-10-x86_64-unknown-linux-musl.tar.gz

CACHE_ROOT="${LONEPAIR_E2E_CACHE:-$HOME/.cache/lonepair-e2e}"
INSTALL_DIR="$CACHE_ROOT/code-server-$CODE_SERVER_VERSION"
DONE_MARKER="$INSTALL_DIR/.install-complete"

if [[ -f "$DONE_MARKER" && -x "$INSTALL_DIR/node_modules/.bin/code-server" ]]; then
  echo "$INSTALL_DIR"
  exit 0
fi

# Everything below logs to stderr so that stdout carries only the folder.
exec 3>&1 1>&2

# Debian packages: Chromium drives the editor; ripgrep stands in for the binary that cannot be
# downloaded here; Kerberos headers build the editor's native kerberos module.
command -v chromium >/dev/null || (apt-get update && apt-get install -y chromium)
command -v rg >/dev/null || (apt-get update && apt-get install -y ripgrep)
dpkg -s libkrb5-dev >/dev/null 2>&1 || (apt-get update && apt-get install -y libkrb5-dev)
# Native modules build against the running Node's own headers, which its package puts in
# /usr/include/node (npm is pointed at /usr below). Debian's libnode-dev is an older Node, whose
# headers would build modules this Node cannot load, so a missing header is reported, not patched.
if [[ ! -f /usr/include/node/node.h ]]; then
  echo "Node's headers are missing from /usr/include/node (they come with the nodejs package of $(node --version))" >&2
  exit 1
fi

# The ripgrep postinstall looks in this cache before downloading; a .tar.gz holding `rg` is enough.
ripgrep_cache="${TMPDIR:-/tmp}/vscode-ripgrep-cache-$RIPGREP_WRAPPER_VERSION"
if [[ ! -s "$ripgrep_cache/$RIPGREP_ASSET" ]]; then
  mkdir -p "$ripgrep_cache"
  staging_rg="$(mktemp -d)"
  cp "$(command -v rg)" "$staging_rg/rg"
  tar -czf "$ripgrep_cache/$RIPGREP_ASSET" -C "$staging_rg" rg
  rm -rf "$staging_rg"
fi

# Install beside the final folder and move it into place only when complete, so that an interrupted
# run never leaves a half-installed editor that the check above would take for a finished one.
mkdir -p "$CACHE_ROOT"
staging="$(mktemp -d "$CACHE_ROOT/install.XXXXXX")"
trap 'rm -rf "$staging"' EXIT
echo "Installing code-server $CODE_SERVER_VERSION into $INSTALL_DIR (about 1.5 minutes, 300 MB)"
(
  cd "$staging"
  echo '{ "name": "lonepair-e2e-editor", "private": true }' >package.json
  npm_config_unsafe_perm=true npm_config_nodedir=/usr npm_config_yes=true \
    npm install --no-audit --no-fund --no-save "code-server@$CODE_SERVER_VERSION"
)
touch "$staging/.install-complete"
rm -rf "$INSTALL_DIR"
mv "$staging" "$INSTALL_DIR"
trap - EXIT
echo "$INSTALL_DIR" >&3
