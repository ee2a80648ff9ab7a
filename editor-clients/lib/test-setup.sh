# Shared by the headless editor tests (source it, then call plumb_test_setup NAME):
# finds the server jar (PLUMB_JAR, else server/target/plumb.jar, built once via ./plumb when
# missing) and makes a temp folder that is removed on exit, with a workspace in it marked by .git.
# Sets: repo, jar, work, ws.

plumb_test_setup() {
  local name="$1"
  repo="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
  jar="${PLUMB_JAR:-$repo/server/target/plumb.jar}"
  if [ ! -f "$jar" ]; then
    echo "$name: $jar missing, building it once via ./plumb --help" >&2
    (cd "$repo" && ./plumb --help >/dev/null)
  fi
  if [ ! -f "$jar" ]; then
    echo "$name: no server jar at $jar" >&2
    exit 2
  fi
  work="$(mktemp -d "${TMPDIR:-/tmp}/plumb-editor-test.XXXXXX")"
  trap 'rm -rf "$work"' EXIT
  ws="$work/workspace"
  mkdir -p "$ws/.git"
}
