#!/usr/bin/env bash
# Headless Emacs test of the language server through Eglot: makes a small calc workspace in a
# temp folder, opens mast.plumb in `emacs -Q --batch` with editor-clients/emacs/plumb-mode.el,
# and checks diagnostics (exact regions after non-ASCII names), values as Flymake notes, hover,
# go-to-definition into a used file, edits, completion, formatting, rename, a code action and
# the printable report of the calc with an unsaved edit (see test.el).
#
# Needs: emacs (28 or later) with Eglot (Debian 12: apt-get install -y emacs-nox elpa-eglot),
# java 17, and the server jar (server/target/plumb.jar, built here via ./plumb when it is
# missing). PLUMB_JAR overrides it. Exit status: 0 when every check passed, non-zero otherwise
# (124 when Emacs hit the time limit).
set -euo pipefail

here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
client_dir="$(cd "$here/.." && pwd)"
# shellcheck source=../../lib/test-setup.sh
. "$here/../../lib/test-setup.sh"

if ! command -v emacs >/dev/null 2>&1; then
  echo "eglot lsp test: emacs not found (Debian: apt-get install -y emacs-nox elpa-eglot)" >&2
  exit 2
fi

plumb_test_setup "eglot lsp test"

# An invented calc: wind on the lamp housing of a survey buoy's mast. The last line holds the
# deliberate unit mismatch after non-ASCII names (𝑥 is outside the BMP: two UTF-16 units); the
# subcritical cylinder fit is used above its range on purpose; `input  h_lamp` is misaligned.
cat >"$ws/site.plumb" <<'PLUMB'
# Buoy site data for the editor test (invented).
input V_gust = 24 m/s   "design gust at the mast head"
PLUMB
cat >"$ws/mast.plumb" <<'PLUMB'
title "Buoy mast lamp: wind drag (editor test, invented data)"

use "site.plumb"

input ρ_air = 1.22 kg/m³    "sea air"
input d_lamp = 180 mm       "lamp housing diameter"
input Cd = 0.6              "short cylinder, from the maker's sheet"
input  h_lamp = 0.4 m "housing height"

q = 0.5 * ρ_air * V_gust^2   in Pa
A = d_lamp * h_lamp   as frontal
F = Cd * A * q              in N
Re = reynolds(ρ_air, V_gust, d_lamp, 1.8e-5 Pa*s)
Cd_check = cd_cylinder_subcritical(Re)
𝑥_µ = ρ_air + 3 mm   "gap at 22 °C"
PLUMB

export HOME="$work/home"
mkdir -p "$HOME"
export PLUMB_JAR="$jar" PLUMB_WORKSPACE="$ws" PLUMB_EMACS_DIR="$client_dir"
status=0
(cd "$ws" && timeout 180 emacs -Q --batch -l "$here/test.el" </dev/null) || status=$?
[ "$status" -eq 124 ] && echo "eglot lsp test: emacs did not finish within 180 s" >&2
exit "$status"
