#!/usr/bin/env bash
# Checks the contents list of the portable bundle: what must be in it, what must never be (test
# classes, build leftovers, repository and editor files), and a licence for every bundled library.
#
#   bundle-contents.sh ZIP TAR_GZ
#
# Prints one line per check and "N passed, M failed"; exits 1 when any check fails.
set -euo pipefail

zip=$1
tgz=$2
passed=0
failed=0
ok() { passed=$((passed + 1)); echo "contents: ok $1"; }
bad() { failed=$((failed + 1)); echo "contents: FAIL $1"; }

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

# Files only: the zip lists folders of their own, the tar.gz only those with a mode to keep.
unzip -Z1 "$zip" | grep -v '/$' | sort > "$work/zip.txt"
tar -tzf "$tgz" | grep -v '/$' | sort > "$work/tar.txt"
if diff -q "$work/zip.txt" "$work/tar.txt" >/dev/null; then
  ok "the zip and the tar.gz hold the same $(wc -l < "$work/zip.txt") files"
else
  bad "the zip and the tar.gz differ: $(diff "$work/zip.txt" "$work/tar.txt" | head -5 | tr '\n' ' ')"
fi
top=$(cut -d/ -f1 "$work/zip.txt" | sort -u)
if [ "$(printf '%s\n' "$top" | wc -l)" -eq 1 ] && [ "${top#plumb-}" != "$top" ]; then
  ok "one top folder, $top"
else
  bad "not one plumb-VERSION top folder: $(printf '%s\n' "$top" | tr '\n' ' ')"
fi
sed "s|^$top/\{0,1\}||" "$work/zip.txt" | sed '/^$/d' > "$work/files.txt"

for required in bin/plumb bin/plumb.cmd lib/plumb.jar LICENSE README.md THIRD-PARTY.txt \
    docs/language.md docs/diagnostics.md editor-clients/README.md editor-clients/neovim/plumb.lua \
    editor-clients/emacs/plumb-mode.el samples/sign-panel/sign-panel.plumb; do
  if grep -qx "$required" "$work/files.txt"; then ok "has $required"; else bad "no $required"; fi
done
for jar in plumb-server plumb-grammar; do
  if grep -qE "^lib/$jar-[^/]+\.jar$" "$work/files.txt"; then ok "has lib/$jar-VERSION.jar"; else bad "no lib/$jar-VERSION.jar"; fi
done
if tar -tvzf "$tgz" | grep -E " $top/bin/plumb$" | grep -q '^-rwxr-xr-x'; then
  ok "bin/plumb is executable in the tar.gz"
else
  bad "bin/plumb is not executable in the tar.gz"
fi
if unzip -Z "$zip" "$top/bin/plumb" | grep -q '^-rwxr-xr-x'; then
  ok "bin/plumb is executable in the zip"
else
  bad "bin/plumb is not executable in the zip"
fi
if unzip -p "$zip" "$top/bin/plumb.cmd" | head -1 | grep -q $'\r$'; then
  ok "bin/plumb.cmd has Windows line ends"
else
  bad "bin/plumb.cmd has no Windows line ends"
fi
if unzip -p "$zip" "$top/bin/plumb" | grep -q $'\r'; then
  bad "bin/plumb has carriage returns"
else
  ok "bin/plumb has Unix line ends"
fi

# Nothing of the build, the tests or the repository's tooling.
leftovers=$(grep -E '(^|/)(target|test|tests|golden|\.git|\.idea|\.vscode|\.cifuzz-corpus|surefire-reports|archive-tmp)(/|$)|\.(class|iml|orig|rej|bak|swp|log)$|~$|(^|/)\.DS_Store$|\.sh$' \
  "$work/files.txt" || true)
if [ -z "$leftovers" ]; then ok "no build leftovers, tests or repository files"; else bad "leftovers: $(echo "$leftovers" | head -5 | tr '\n' ' ')"; fi
test_jars=$(grep -E '^lib/(junit|jazzer|jqwik|opentest4j|apiguardian|hamcrest|mockito|assertj)' "$work/files.txt" || true)
if [ -z "$test_jars" ]; then ok "no test libraries in lib/"; else bad "test libraries in lib/: $(echo "$test_jars" | tr '\n' ' ')"; fi

unzip -q "$zip" -d "$work/unpacked"
lib=$work/unpacked/$top/lib
for jar in "$lib"/plumb-*.jar; do
  inside=$(unzip -Z1 "$jar" | grep -E 'Test[A-Za-z0-9_$]*\.class$|(^|/)(bench|golden|diagnostics/.*\.plumb$)|EngineFuzzTest|Fixture' || true)
  if [ -z "$inside" ]; then ok "no test classes or fixtures in $(basename "$jar")"; else bad "$(basename "$jar") holds $(echo "$inside" | head -3 | tr '\n' ' ')"; fi
done

# lib/plumb.jar's class path names exactly the jars beside it.
unzip -p "$lib/plumb.jar" META-INF/MANIFEST.MF | tr -d '\r' | sed -n '/^Class-Path:/,/^[A-Z]/p' \
  | sed -e 's/^Class-Path: //' -e 's/^ //' -e '/^[A-Z][A-Za-z-]*:/d' | tr -d '\n' | tr ' ' '\n' | sed '/^$/d' | sort > "$work/classpath.txt"
find "$lib" -maxdepth 1 -name '*.jar' ! -name plumb.jar -printf '%f\n' | sort > "$work/libjars.txt"
if diff -q "$work/classpath.txt" "$work/libjars.txt" >/dev/null; then
  ok "lib/plumb.jar's Class-Path names exactly the $(wc -l < "$work/libjars.txt") jars in lib/"
else
  bad "lib/plumb.jar's Class-Path and lib/ differ: $(diff "$work/classpath.txt" "$work/libjars.txt" | tr '\n' ' ')"
fi

# Every library: a line in THIRD-PARTY.txt with its licence (group:artifact:version, which names
# the jar artifact-version.jar), and its licence text in licenses/ARTIFACT/.
third_party=$work/unpacked/$top/THIRD-PARTY.txt
sed -nE 's/^ +\(.+\) .* \(([^: ]+):([^: ]+):([^ ]+) - .*$/\2 \3/p' "$third_party" > "$work/listed.txt"
while read -r jar; do
  artifact=
  while read -r a v; do
    if [ "$jar" = "$a-$v.jar" ]; then artifact=$a; version=$v; fi
  done < "$work/listed.txt"
  if [ -z "$artifact" ]; then
    bad "$jar: not listed in THIRD-PARTY.txt"
    continue
  fi
  case $artifact in plumb-server | plumb-grammar) continue ;; esac
  texts=$( (find "$work/unpacked/$top/licenses/$artifact" -type f \( -iname 'LICENSE*' -o -iname 'about.html' \) \
    -size +200c 2>/dev/null || true) | wc -l)
  if [ "$texts" -gt 0 ]; then
    ok "$artifact $version: listed with its licence in THIRD-PARTY.txt, text in licenses/$artifact/"
  else
    bad "$artifact $version: listed in THIRD-PARTY.txt, but no licence text in licenses/$artifact/"
  fi
done < "$work/libjars.txt"
stray=$(cd "$work/unpacked/$top/licenses" && for d in *; do
  grep -q "^$d " "$work/listed.txt" || echo "$d"
done)
if [ -z "$stray" ]; then ok "every folder in licenses/ belongs to a bundled jar"; else bad "licence folders without a jar: $stray"; fi

echo "bundle contents: $passed passed, $failed failed"
[ "$failed" -eq 0 ]
