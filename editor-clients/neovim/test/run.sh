#!/usr/bin/env bash
# Headless Neovim test of the language server: makes a small calc workspace in a temp folder,
# opens it in `nvim --headless --clean` with editor-clients/neovim/plumb.lua, and checks
# diagnostics, hover, go-to-definition, code lenses, edits and rename on pod.plumb, then
# completion, signature help, symbols, references, highlights, code actions, formatting, folding,
# semantic tokens and workspace symbols on probe.plumb, then :PlumbReport on pod.plumb with an
# unsaved edit (see test.lua).
#
# Needs: nvim (0.7.2 or later; Debian: apt-get install -y neovim), java 17, and the server jar
# (server/target/plumb.jar, built here via ./plumb when it is missing). PLUMB_JAR overrides it.
# Exit status: 0 when every check passed, non-zero otherwise (124 when nvim hit the time limit,
# 3 when test.lua did not load, e.g. a syntax error: test.lua itself always ends Neovim).
set -euo pipefail

here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
client_dir="$(cd "$here/.." && pwd)"
# shellcheck source=../../lib/test-setup.sh
. "$here/../../lib/test-setup.sh"

if ! command -v nvim >/dev/null 2>&1; then
  echo "neovim lsp test: nvim not found (Debian: apt-get install -y neovim)" >&2
  exit 2
fi

plumb_test_setup "neovim lsp test"

# An invented calc: drag on a camera pod in a rig's air stream. The last line holds the
# deliberate unit mismatch, after non-ASCII names (𝑥 is outside the BMP: two UTF-16 units).
cat >"$ws/site.plumb" <<'EOF'
# Rig data for the editor test (invented).
input V_rig = 18 m/s   "fan speed at the pod station"
EOF
cat >"$ws/pod.plumb" <<'EOF'
title "Camera pod in a rig air stream: drag (editor test, invented data)"

use "site.plumb"

input ρ_air = 1.18 kg/m³   "air in the rig hall"
input T_hall = 22 °C       "hall temperature"
T_abs = T_hall              in K
input d_pod = 150 mm       "pod diameter"
input Cd = 0.47            "smooth sphere, subcritical"
q = 0.5 * ρ_air * V_rig^2   in Pa
A = pi / 4 * d_pod^2        in m^2
F = Cd * A * q              in N
𝑥_Δ = ρ_air + 40 µm   "gap at 22 °C"
EOF

# A second invented calc for the remaining features: three sections, a library correlation
# within its range, a deliberate unit typo (`3 mtr`, no note after it, so the quick fix leaves
# its block aligned) and a misaligned block of two definitions (the "Air" section), the only
# lines the formatter should touch. µ is U+00B5 and ρ U+03C1: one UTF-16 unit, two bytes each.
cat >"$ws/probe.plumb" <<'EOF'
title "Probe bead in the rig air stream (editor test, invented data)"

use "site.plumb"

section "Air"
input ρ_air = 1.18 kg/m³   "air in the rig hall"
input µ_air    = 18.2 µPa*s "dynamic viscosity at 22 °C"
section "Bead"
input d_bead  = 0.5 mm  "bead diameter"
input h_mount = 3 mtr
check h_mount < 4 m
section "Drag"
Re_bead = ρ_air * V_rig * d_bead / µ_air
Cd_s    = cd_sphere_sn(Re_bead)
A_bead  = pi / 4 * d_bead^2       in mm^2
q_bead  = 0.5 * ρ_air * V_rig^2   in kPa
F_bead  = Cd_s * A_bead * q_bead  in mN
EOF

# Keep Neovim's state and the LSP log (with the server's stderr) inside the temp folder.
export XDG_CONFIG_HOME="$work/config" XDG_DATA_HOME="$work/data" XDG_STATE_HOME="$work/state" \
  XDG_CACHE_HOME="$work/cache"
export PLUMB_JAR="$jar" PLUMB_WORKSPACE="$ws" PLUMB_NVIM_DIR="$client_dir"

status=0
(cd "$ws" && timeout 120 nvim --headless --clean -u NONE -i NONE -n \
  -c "luafile $here/test.lua" -c "cquit 3" </dev/null) || status=$?

if [ "$status" -ne 0 ]; then
  [ "$status" -eq 124 ] && echo "neovim lsp test: nvim did not finish within 120 s" >&2
  [ "$status" -eq 3 ] && echo "neovim lsp test: test.lua did not load" >&2
  for log in "$work"/cache/nvim/lsp.log "$work"/state/nvim/lsp.log; do
    if [ -s "$log" ]; then
      echo "---- $log (last 60 lines) ----" >&2
      tail -n 60 "$log" >&2
    fi
  done
fi
exit "$status"
