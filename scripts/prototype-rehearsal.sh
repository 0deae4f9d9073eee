#!/usr/bin/env bash
# Rehearsal of the prototype loop (issue 16's hidden check) with our own full-wave engine standing in for the bench:
#   1. design a 6-slot uniform WR-90 array (built-in slot model);
#   2. `verify` it full-wave (openEMS): its fullwave.s1p is the "prototype's measured S11";
#   3. `compare` the design with that file: the diagnosed frequency offset is the fitted model's best match;
#   4. `verify` the next plate `compare` designed, full-wave again.
# Prints the full-wave best-match offset of the first plate, the diagnosed offset, and the next plate's full-wave offset
# (targets: diagnosis within ±0.1 % of the full-wave's own offset; next plate within ±0.2 % of f0).
# Usage: scripts/prototype-rehearsal.sh [coarse|normal|fine] [OUTDIR] [COUPLING_SCALE COUPLING_PHASE_DEG]
#   (needs openEMS: apt-get install openems). The optional pair is the exterior coupling calibration that `verify` fitted
#   to another array of the same slots in the same tube (scripts/fullwave-uniform6.sh prints it for its design (b)); it
#   goes into the spec, so compare's model and the next plate use it.
# Engine runs are niced and single-threaded (--jobs 1). Run time on a quiet 2-core machine, coarse mesh: a few minutes
# (two array runs of about 0.35 Mcells); on a loaded machine much longer.
set -euo pipefail
mesh="${1:-coarse}"
out="${2:-out/prototype-rehearsal-$mesh}"
kscale="${3:-}"
kphase="${4:-}"
cd "$(dirname "$0")/.."
mkdir -p "$out"
dotnet build src/SlotArray.Cli -c Release -v q >/dev/null
sa() { dotnet src/SlotArray.Cli/bin/Release/net10.0/slotarray.dll "$@"; }
offset() { /usr/bin/python3 -c 'import json,sys; print("%+.3f" % json.load(open(sys.argv[1]))["full_wave"]["best_match_offset_percent"])' "$1"; }
cat > "$out/uniform6.yaml" <<'YAML'
spec: 1
name: uniform-6-wr90
frequency: 9.375 GHz
band: [9.2 GHz, 9.55 GHz]
guide: {size: WR-90, wall: 1.27 mm, metal: aluminium}
slots: {type: longitudinal, count: 6, width: 1.5875 mm}
feed: {type: standing-wave}
taper: {type: uniform}
YAML
if [ -n "$kscale" ]; then printf 'coupling_scale: %s\ncoupling_phase: %s deg\n' "$kscale" "$kphase" >> "$out/uniform6.yaml"; fi
sa design "$out/uniform6.yaml" -o "$out/design" -q
nice -n 10 dotnet src/SlotArray.Cli/bin/Release/net10.0/slotarray.dll verify "$out/design" --mesh "$mesh" --jobs 1 -q
sa compare "$out/design" "$out/design/verify/fullwave.s1p" -o "$out/compare" -q > "$out/compare.log"
nice -n 10 dotnet src/SlotArray.Cli/bin/Release/net10.0/slotarray.dll verify "$out/compare/next-plate" --mesh "$mesh" --jobs 1 -q
echo "== prototype rehearsal ($mesh mesh) =="
echo "first plate, full-wave best match:      $(offset "$out/design/verify/verify.json") % from f0"
echo "diagnosed by compare (fitted model):    $(grep -o 'fitted model of the plate: best match at [^)]*)' "$out/compare/comparison.md")"
echo "next plate from compare, full-wave:     $(offset "$out/compare/next-plate/verify/verify.json") % from f0"
