#!/usr/bin/env bash
# Regenerates data/fullwave/edge-slot-calibration.csv, the full-wave runs the edge-slot model is calibrated on
# (openEMS, Debian package `openems`; one engine thread per run, niced). Finished runs are cached under
# ${WORK:-.fullwave-calibration}/<family>/runs, so a rerun resumes. Each family is one `slotarray calibrate-edge`;
# the 20 deg runs at 2.9/3.3 mm on three meshes are the mesh-convergence check (README, "Edge-slot model").
# Usage: scripts/fullwave/edge-calibration.sh [JOBS]   (normal mesh: 0.4-0.7 Mcells, about 1 min per run on a free core)
set -euo pipefail
cd "$(dirname "$0")/../.."
JOBS=${1:-1}
WORK=${WORK:-.fullwave-calibration}
dotnet build src/SlotArray.Cli -c Release -v q >/dev/null
TOOL=(dotnet src/SlotArray.Cli/bin/Release/net10.0/slotarray.dll)
run() { local name=$1; shift; nice -n 10 "${TOOL[@]}" calibrate-edge "$@" --jobs "$JOBS" -o "$WORK/$name"; }
run wr90-tube   --guide WR-90 --frequency 9.375GHz --tilts 5,10,25 --depths 2.7,3.0,3.3 --mesh normal
run wr90-tube20 --guide WR-90 --frequency 9.375GHz --tilts 20 --depths 2.9,3.3 --mesh normal
run wr90-flare  --guide WR-90 --frequency 9.375GHz --tilts 5,25 --depths 2.7,3.0,3.3 --mesh normal \
  --surround flare --flare-length 147.2mm --flare-aperture 103.4mm
run wr112-tube  --guide WR-112 --frequency 7.9GHz --tilts 5 --depths 2.8,3.15,3.5 --mesh normal
# mesh convergence (not in the table)
run conv-coarse --guide WR-90 --frequency 9.375GHz --tilts 20 --depths 2.7,2.9,3.1,3.3 --mesh coarse
run conv-fine   --guide WR-90 --frequency 9.375GHz --tilts 20 --depths 2.9,3.3 --mesh fine
/usr/bin/python3 scripts/fullwave/merge_edge_calibration.py data/fullwave/edge-slot-calibration.csv \
  "$WORK"/wr90-tube/edge-calibration.csv "$WORK"/wr90-tube20/edge-calibration.csv \
  "$WORK"/wr90-flare/edge-calibration.csv "$WORK"/wr112-tube/edge-calibration.csv
