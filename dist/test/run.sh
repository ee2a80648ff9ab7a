#!/usr/bin/env bash
# The release bundles' test (CI runs it from .ci/run): builds them with `mvn -Prelease package`,
# checks the portable bundle's contents, then unpacks each bundle into an empty folder and runs it
# there as a user would, with Maven gone from the PATH and the repository's server/target moved
# out of reach:
#   - the portable bundle with the machine's Java 17 (and, with no Java at all or a Java 11,
#     the message saying which Java it needs);
#   - the self-contained image with JAVA_HOME unset and no java on the PATH;
#   - the .deb (when it was built), unpacked with dpkg-deb, likewise, with the class-data-sharing
#     archive its postinst makes.
# Each runs `bin/plumb check` on the samples, `plumb eval` on each sample against the golden
# output the Java tests keep, `plumb report`, `plumb diff`, `plumb lsp` through initialize/shutdown, and the
# launcher's rules (UTF-8 file names under LANG=C, NO_COLOR, exit codes). Prints one line per
# check and "N passed, M failed"; exits 1 when any check fails.
#
#   bash dist/test/run.sh            build, then test
#   bash dist/test/run.sh --no-build test what dist/target holds
set -euo pipefail
repo=$(cd "$(dirname "$0")/../.." && pwd)
cd "$repo"

began=$(date +%s)
passed=0
failed=0
ok() { passed=$((passed + 1)); echo "bundles: ok $1"; }
bad() { failed=$((failed + 1)); echo "bundles: FAIL $1"; }

if [ "${1:-}" != --no-build ]; then
  start=$(date +%s)
  mvn -B -q -Prelease package -DskipTests
  echo "bundles: release build took $(($(date +%s) - start)) s"
fi
version=$(sed -n 's/^version=//p' server/target/classes/dev/plumb/app/build-info.properties)
commit=$(git rev-parse --short=12 HEAD 2>/dev/null || echo unknown)
target=$repo/dist/target
zip=$target/plumb-$version.zip
tgz=$target/plumb-$version.tar.gz
image_tgz=$(ls "$target"/plumb-"$version"-linux-*.tar.gz)
deb=$(ls "$target"/plumb_*.deb 2>/dev/null || true)

if bash dist/test/bundle-contents.sh "$zip" "$tgz"; then ok "bundle contents"; else bad "bundle contents"; fi

# An empty folder to unpack into, and a PATH without Maven (and, for the image, without java).
work=$(mktemp -d)
moved=
restore() {
  if [ -n "$moved" ]; then mv "$repo/server/target.away" "$repo/server/target"; fi
  rm -rf "$work"
}
trap restore EXIT
mkdir -p "$work/path-no-mvn" "$work/path-no-java"
for dir in /usr/local/bin /usr/bin /bin; do
  for tool in "$dir"/*; do
    name=${tool##*/}
    if [ ! -f "$tool" ] || [ ! -x "$tool" ]; then continue; fi
    case $name in mvn | mvnDebug | mvnyjp) continue ;; esac
    [ -e "$work/path-no-mvn/$name" ] || ln -s "$tool" "$work/path-no-mvn/$name"
    [ "$name" = java ] || [ -e "$work/path-no-java/$name" ] || ln -s "$tool" "$work/path-no-java/$name"
  done
done
mv "$repo/server/target" "$repo/server/target.away"
moved=yes

# Runs `bin/plumb ARGS` of the installation at $1 in the folder $2; prints its exit code, output
# in $work/out.txt and $work/err.txt. $PLUMB_PATH is the PATH, $PLUMB_UNSET_JAVA_HOME unsets it.
run_in() {
  local plumb=$1 dir=$2
  shift 2
  (cd "$dir" && if [ -n "${PLUMB_UNSET_JAVA_HOME:-}" ]; then unset JAVA_HOME; fi &&
    PATH=$PLUMB_PATH "$plumb" "$@" > "$work/out.txt" 2> "$work/err.txt") && echo 0 || echo $?
}

# The checks an installation must pass; $1 names it, $2 is its bin/plumb, $3 its root, and $4
# "short" leaves out what depends only on the files the image shares with the .deb.
check_installation() {
  local label=$1 plumb=$2 home=$3 depth=${4:-full} code
  # The samples in a folder of their own, beside an empty server/: the Java tests run in the
  # repository's server/, so the golden outputs name the samples ../samples/….
  local place=$work/$label calcs=$work/$label/samples
  mkdir -p "$place/server"
  cp -r "$home/samples" "$calcs"

  code=$(run_in "$plumb" "$calcs" --version)
  if [ "$code" = 0 ] && [ "$(sed -n 1p "$work/out.txt")" = "plumb $version" ] &&
     [ "$(sed -n 2p "$work/out.txt" | cut -d' ' -f1-2)" = "commit $commit" ]; then
    ok "$label: --version says plumb $version, commit $commit ($(sed -n 3p "$work/out.txt"))"
  else
    bad "$label: --version exit $code: $(tr '\n' ' ' < "$work/out.txt") $(tr '\n' ' ' < "$work/err.txt")"
  fi

  # The main job on the samples: the mistakes sample fails (exit 1), no other sample has an error.
  code=$(run_in "$plumb" "$place" check samples/)
  if [ "$code" = 1 ] && grep -q '^samples/with-mistakes/.*: error ' "$work/out.txt" &&
     ! grep -v '^samples/with-mistakes/' "$work/out.txt" | grep -q ': error '; then
    ok "$label: check samples/ exits 1 with errors only in with-mistakes/ ($(tail -n 2 "$work/out.txt" | head -n 1))"
  else
    bad "$label: check samples/ exit $code: $(head -c 600 "$work/out.txt") $(head -c 600 "$work/err.txt")"
  fi

  if [ "$depth" = full ]; then
    # Every sample's eval against the golden output the Java tests keep.
    local sample rel differ=0 count=0
    while IFS= read -r sample; do
      rel=${sample#"$calcs"/}
      count=$((count + 1))
      code=$(run_in "$plumb" "$place/server" eval --no-color "../samples/$rel")
      { echo "exit $code"; cat "$work/out.txt"; } > "$work/eval.txt"
      if ! cmp -s "$work/eval.txt" "$work/golden/$rel.txt"; then
        differ=$((differ + 1))
        echo "  $rel differs from its golden output:"
        diff "$work/golden/$rel.txt" "$work/eval.txt" | head -10 | sed 's/^/    /'
      fi
    done < <(find "$calcs" -name '*.plumb' | sort)
    if [ "$differ" = 0 ]; then ok "$label: eval of all $count samples equals the golden output"; else bad "$label: eval of $differ of $count samples differs from the golden output"; fi

    # The printable reports: a page per calc and a contents page.
    code=$(run_in "$plumb" "$place" report samples/ -o reports)
    pages=$(find "$place/reports" -name '*.html' 2>/dev/null | wc -l)
    if [ "$code" = 1 ] && [ -s "$place/reports/index.html" ] && [ "$pages" -eq $((count + 1)) ]; then
      ok "$label: report samples/ writes $pages pages (exit 1 for the mistakes sample)"
    else
      bad "$label: report samples/ exit $code, $pages pages: $(head -c 400 "$work/err.txt")"
    fi

    # The value diff reads git revisions with JGit inside the runtime: a changed input is found.
    mkdir -p "$place/diffed"
    printf 'input L = 2 m\nA = L * L\n' > "$place/diffed/plate.plumb"
    (cd "$place" && git init -q && git add diffed &&
      git -c user.name=bundle-test -c user.email=bundle-test@localhost commit -qm plate) > /dev/null
    printf 'input L = 3 m\nA = L * L\n' > "$place/diffed/plate.plumb"
    code=$(run_in "$plumb" "$place" diff HEAD -- diffed/)
    if [ "$code" = 1 ] && grep -q '9' "$work/out.txt"; then
      ok "$label: diff HEAD finds the changed value (exit 1)"
    else
      bad "$label: diff HEAD exit $code: $(head -c 400 "$work/out.txt") $(head -c 400 "$work/err.txt")"
    fi

    # Exit codes passed through: clean, findings, usage.
    printf 'input L = 2 m\nA = L * L\ncheck A <= 5 m^2\n' > "$calcs/clean.plumb"
    local clean usage
    clean=$(run_in "$plumb" "$calcs" check clean.plumb)
    usage=$(run_in "$plumb" "$calcs" check no-such-file.plumb)
    if [ "$clean" = 0 ] && [ "$usage" = 2 ]; then ok "$label: exit codes 0 (clean) and 2 (no such file) come through"; else bad "$label: exit codes: clean $clean, no such file $usage"; fi

    # A file name that is not ASCII, under a locale that is not UTF-8.
    printf 'use "ρ-air.plumb"\nq = 0.5 * rho * (10 m/s)^2\n' > "$calcs/ρ-panel.plumb"
    printf 'input rho = 1.2 kg/m^3 as fluid\n' > "$calcs/ρ-air.plumb"
    code=$(LANG=C LC_ALL=C LC_CTYPE='' run_in "$plumb" "$calcs" eval --no-color ρ-panel.plumb)
    if [ "$code" = 0 ] && grep -q '60' "$work/out.txt"; then ok "$label: under LANG=C a calc named ρ-panel.plumb uses ρ-air.plumb"; else bad "$label: under LANG=C: exit $code: $(head -c 400 "$work/out.txt") $(head -c 400 "$work/err.txt")"; fi

    # Colours on a terminal, none with NO_COLOR (script(1) gives the run a terminal).
    if command -v script >/dev/null 2>&1; then
      (cd "$calcs" && PATH=$PLUMB_PATH script -qec "'$plumb' check with-mistakes/" /dev/null > "$work/tty.txt" 2>&1) || true
      (cd "$calcs" && PATH=$PLUMB_PATH NO_COLOR=1 script -qec "'$plumb' check with-mistakes/" /dev/null > "$work/tty-no-color.txt" 2>&1) || true
      if grep -q $'\e\[' "$work/tty.txt" && ! grep -q $'\e\[' "$work/tty-no-color.txt" && grep -q 'check.failed' "$work/tty-no-color.txt"; then
        ok "$label: colours on a terminal, none with NO_COLOR"
      else
        bad "$label: NO_COLOR: $(head -c 300 "$work/tty-no-color.txt" | cat -v)"
      fi
    fi
  fi

  # The language server through one session.
  local lsp
  if lsp=$(cd "$calcs" && PATH=$PLUMB_PATH python3 "$repo/dist/test/lsp-exchange.py" "$plumb"); then
    ok "$label: $lsp"
  else
    bad "$label: $lsp"
  fi
}

cp -r "$repo/server/src/test/resources/golden" "$work/golden"

# The portable bundle, with the machine's Java and no Maven. Its launcher keeps an archive of
# Plumb's classes in the user's cache folder, made by the first check: here a folder of the test's
# own, so every run after the first (their output compared below, as all runs are) maps it.
export XDG_CACHE_HOME=$work/cache
mkdir "$work/bundle" && tar -xzf "$tgz" -C "$work/bundle"
bundle=$work/bundle/plumb-$version
PLUMB_PATH=$work/path-no-mvn PLUMB_UNSET_JAVA_HOME='' check_installation bundle "$bundle/bin/plumb" "$bundle"
if ls "$work"/cache/plumb/cds-java*.jsa > /dev/null 2>&1; then
  ok "bundle: an archive of its classes in the user's cache: $(basename "$(ls "$work"/cache/plumb/cds-java*.jsa)")"
else
  bad "bundle: no class-data archive was made in $work/cache/plumb"
fi
# Through a link on the PATH, as a user installs it.
mkdir "$work/links" && ln -s "$bundle/bin/plumb" "$work/links/plumb"
code=$(PLUMB_PATH=$work/links:$work/path-no-mvn run_in plumb "$work" --version)
if [ "$code" = 0 ]; then ok "bundle: runs through a link on the PATH"; else bad "bundle: through a link: exit $code $(cat "$work/err.txt")"; fi
# No Java at all, and a Java too old: a clear message and exit 2.
code=$(PLUMB_PATH=$work/path-no-java PLUMB_UNSET_JAVA_HOME=yes run_in "$bundle/bin/plumb" "$work" --version)
if [ "$code" = 2 ] && grep -q 'needs Java 17 or newer' "$work/err.txt"; then ok "bundle: without Java: $(cat "$work/err.txt")"; else bad "bundle: without Java: exit $code $(cat "$work/err.txt")"; fi
mkdir -p "$work/java11/bin"
printf '#!/bin/sh\necho "java 11 must not be started" >&2\nexit 99\n' > "$work/java11/bin/java"
chmod +x "$work/java11/bin/java"
echo 'JAVA_VERSION="11.0.21"' > "$work/java11/release"
code=$(JAVA_HOME=$work/java11 PLUMB_PATH=$work/path-no-mvn run_in "$bundle/bin/plumb" "$work" --version)
if [ "$code" = 2 ] && grep -q 'is Java 11' "$work/err.txt"; then ok "bundle: with Java 11: $(cat "$work/err.txt")"; else bad "bundle: with Java 11: exit $code $(cat "$work/err.txt")"; fi

# The self-contained image: no JAVA_HOME, no java on the PATH.
mkdir "$work/image" && tar -xzf "$image_tgz" -C "$work/image"
image=$(ls -d "$work"/image/plumb-*)
PLUMB_PATH=$work/path-no-java PLUMB_UNSET_JAVA_HOME=yes check_installation image "$image/bin/plumb" "$image"

# The .deb's files, unpacked where dpkg would put them but under an empty folder; the archive its
# postinst makes, made the same way here, must load (-Xshare:on fails the JVM otherwise).
if [ -n "$deb" ]; then
  mkdir "$work/deb" && dpkg-deb -x "$deb" "$work/deb"
  opt=$work/deb/opt/plumb
  if [ "$(readlink "$work/deb/usr/bin/plumb")" = /opt/plumb/bin/plumb ]; then ok "deb: /usr/bin/plumb links to /opt/plumb/bin/plumb"; else bad "deb: /usr/bin/plumb is $(readlink "$work/deb/usr/bin/plumb")"; fi
  (cd "$opt" && unset JAVA_HOME && PATH=$work/path-no-java JAVA_OPTS="-XX:ArchiveClassesAtExit=$opt/lib/plumb.jsa" \
    bin/plumb check --no-color samples/ > /dev/null 2>&1) || true
  code=$(JAVA_OPTS=-Xshare:on PLUMB_PATH=$work/path-no-java PLUMB_UNSET_JAVA_HOME=yes run_in "$opt/bin/plumb" "$work" --version)
  if [ -f "$opt/lib/plumb.jsa" ] && [ "$code" = 0 ]; then ok "deb: the class-data-sharing archive is made and loads"; else bad "deb: class-data sharing: exit $code $(head -c 400 "$work/err.txt")"; fi
  PLUMB_PATH=$work/path-no-java PLUMB_UNSET_JAVA_HOME=yes check_installation deb "$opt/bin/plumb" "$opt" short
else
  echo "bundles: no .deb was built (fakeroot, dpkg-deb or dpkg-shlibdeps missing)"
fi

echo "bundles: took $(($(date +%s) - began)) s in all"
echo "bundles: $passed passed, $failed failed"
[ "$failed" -eq 0 ]
