#!/usr/bin/env bash
# The full-wave check of issue 15: a 6-slot uniform WR-90 array designed (a) from the built-in slot model,
# (b) from a full-wave `characterise` table of the same slot, (c) from the table with mutual coupling (self terms from
# the table, mutual terms from the infinite-ground-plane model), and (d) as (c) with the exterior coupling calibrated
# by the full-wave run of (b) (`verify` fits the factor κ on the mutual impedances and prints it); each checked whole
# with `verify`.
# Usage: scripts/fullwave-uniform6.sh [coarse|normal|fine] [OUTDIR]   (needs openEMS: apt-get install openems)
# Engine runs are niced, one at a time on one thread (--jobs 1). Run times: see the README (Full-wave ... Measured).
set -euo pipefail
mesh="${1:-coarse}"
out="${2:-out/fullwave-uniform6-$mesh}"
cd "$(dirname "$0")/.."
mkdir -p "$out/specs"
dotnet build src/SlotArray.Cli -c Release -v q >/dev/null
sa() { nice -n 10 dotnet src/SlotArray.Cli/bin/Release/net10.0/slotarray.dll "$@"; }
# design SPEC DIR: a rerun keeps DIR/verify (its engine runs are cached by geometry, so an unchanged design is not run again)
design() {
    if [ -d "$2/verify" ]; then mv "$2/verify" "$2.verify-kept"; fi
    sa design "$1" -o "$2"
    if [ -d "$2.verify-kept" ]; then mv "$2.verify-kept" "$2/verify"; fi
}
# The specs sit in $out/specs and name the table as ../characterise/slots.csv: the same relative path then resolves from
# each design folder's copy of its spec (compare and verify rebuild the design from it).
cat > "$out/specs/builtin.yaml" <<'YAML'
spec: 1
name: uniform-6-wr90
frequency: 9.375 GHz
band: [9.2 GHz, 9.55 GHz]
guide: {size: WR-90, wall: 1.27 mm, metal: aluminium}
slots: {type: longitudinal, count: 6, width: 1.5875 mm}
feed: {type: standing-wave}
taper: {type: uniform}
YAML
sed -e 's/^name: uniform-6-wr90/name: uniform-6-wr90-table/' \
    -e 's|^slots: {type: longitudinal, count: 6, width: 1.5875 mm}|slots: {type: longitudinal, count: 6, width: 1.5875 mm, data: ../characterise/slots.csv}|' \
    "$out/specs/builtin.yaml" > "$out/specs/table.yaml"
# (c) the same table with the mutual coupling designed in (self terms from the table, mutual terms from the model); its
# lengths sit just past the table's longest (L/L_r about 1.005 against 1.003), so extrapolation is allowed and flagged.
sed -e 's/^name: uniform-6-wr90-table/name: uniform-6-wr90-table-mutual/' \
    -e 's|data: ../characterise/slots.csv}|data: ../characterise/slots.csv, extrapolate: true}|' "$out/specs/table.yaml" > "$out/specs/mutual.yaml"
echo "coupling: mutual" >> "$out/specs/mutual.yaml"
design "$out/specs/builtin.yaml" "$out/design-builtin"
sa characterise "$out/specs/builtin.yaml" -o "$out/characterise" --mesh "$mesh" --jobs 1
design "$out/specs/table.yaml" "$out/design-table"
design "$out/specs/mutual.yaml" "$out/design-mutual"
echo "== characterise table, coupling: mutual, verified full-wave ($mesh mesh) =="
sa verify "$out/design-mutual" --mesh "$mesh" --jobs 1
echo "== built-in model, verified full-wave ($mesh mesh) =="
sa verify "$out/design-builtin" --mesh "$mesh" --jobs 1
echo "== characterise table, verified full-wave ($mesh mesh) =="
sa verify "$out/design-table" --mesh "$mesh" --jobs 1
# (d) the coupled design again, with the exterior coupling calibrated by the full-wave run of (b)
read -r kscale kphase < <(/usr/bin/python3 -c 'import json,sys; c=json.load(open(sys.argv[1]))["coupling_calibration"]; print("%.3f %.1f" % (c["coupling_scale"], c["coupling_phase_deg"]))' "$out/design-table/verify/verify.json")
sed -e 's/^name: uniform-6-wr90-table-mutual/name: uniform-6-wr90-table-calibrated/' "$out/specs/mutual.yaml" > "$out/specs/calibrated.yaml"
printf 'coupling_scale: %s\ncoupling_phase: %s deg\n' "$kscale" "$kphase" >> "$out/specs/calibrated.yaml"
design "$out/specs/calibrated.yaml" "$out/design-calibrated"
echo "== characterise table, coupling: mutual calibrated by (b) (coupling_scale $kscale, coupling_phase $kphase deg), verified full-wave ($mesh mesh) =="
sa verify "$out/design-calibrated" --mesh "$mesh" --jobs 1
