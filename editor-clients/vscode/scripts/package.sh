#!/usr/bin/env bash
# Makes dist/plumb-VERSION.vsix (or PLUMB_VSIX_DIR/plumb-VERSION.vsix), the installable extension:
# compiles the TypeScript, copies the server jar (server/target/plumb.jar, or PLUMB_JAR) and the
# repository's licence in, packages with vsce, which adds the production dependencies (npm ci must
# have run), and removes the copies again. Prints the file's path.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
repo="$(cd "$here/../.." && pwd)"
jar="${PLUMB_JAR:-$repo/server/target/plumb.jar}"
if [ ! -f "$jar" ]; then
  echo "package: no server jar at $jar; build it first (mvn -B verify in $repo)" >&2
  exit 2
fi
out="${PLUMB_VSIX_DIR:-$here/dist}"
cd "$here"
npx tsc -p .
trap 'rm -rf "$here/server" "$here/LICENSE"' EXIT
rm -rf server
mkdir -p server "$out"
cp "$jar" server/plumb.jar
cp "$repo/LICENSE" LICENSE
version="$(node -p "require('./package.json').version")"
npx vsce package --allow-missing-repository --out "$out/plumb-$version.vsix" >&2
echo "$out/plumb-$version.vsix"
