#!/usr/bin/env bash
# Makes dist/plumb-VERSION.vsix, the installable extension: compiles the TypeScript, copies the
# server jar (server/target/plumb.jar, or PLUMB_JAR) and the repository's licence in, and packages
# with vsce, which adds the production dependencies (npm ci must have run). Prints the file's path.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
repo="$(cd "$here/../.." && pwd)"
jar="${PLUMB_JAR:-$repo/server/target/plumb.jar}"
if [ ! -f "$jar" ]; then
  echo "package: no server jar at $jar; build it first (mvn -B verify in $repo)" >&2
  exit 2
fi
cd "$here"
npx tsc -p .
rm -rf server dist
mkdir -p server dist
cp "$jar" server/plumb.jar
cp "$repo/LICENSE" LICENSE
version="$(node -p "require('./package.json').version")"
npx vsce package --allow-missing-repository --out "dist/plumb-$version.vsix" >&2
echo "$here/dist/plumb-$version.vsix"
