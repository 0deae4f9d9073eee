#!/usr/bin/env bash
# The full-wave check of issue 15: a 6-slot uniform WR-90 array designed (a) from the built-in slot model and
# (b) from a full-wave `characterise` table of the same slot, each then checked whole with `verify`.
# Usage: scripts/fullwave-uniform6.sh [coarse|normal|fine] [OUTDIR]   (needs openEMS: apt-get install openems)
# Run time on a quiet 2-core machine: coarse about 15 min, normal about 1-2 h (30 slot runs + 2 array runs).
set -euo pipefail
mesh="${1:-coarse}"
out="${2:-out/fullwave-uniform6-$mesh}"
cd "$(dirname "$0")/.."
mkdir -p "$out"
dotnet build src/SlotArray.Cli -c Release -v q >/dev/null
sa() { dotnet src/SlotArray.Cli/bin/Release/net10.0/slotarray.dll "$@"; }
cat > "$out/builtin.yaml" <<'YAML'
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
    -e 's|^slots: {type: longitudinal, count: 6, width: 1.5875 mm}|slots: {type: longitudinal, count: 6, width: 1.5875 mm, data: characterise/slots.csv}|' \
    "$out/builtin.yaml" > "$out/table.yaml"
sa design "$out/builtin.yaml" -o "$out/design-builtin"
sa characterise "$out/builtin.yaml" -o "$out/characterise" --mesh "$mesh"
sa design "$out/table.yaml" -o "$out/design-table"
echo "== built-in model, verified full-wave ($mesh mesh) =="
sa verify "$out/design-builtin" --mesh "$mesh"
echo "== characterise table, verified full-wave ($mesh mesh) =="
sa verify "$out/design-table" --mesh "$mesh"
