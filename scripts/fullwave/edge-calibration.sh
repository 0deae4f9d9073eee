#!/usr/bin/env bash
# Regenerates data/fullwave/edge-slot-calibration.csv, the full-wave runs the edge-slot model is calibrated on
# (openEMS, Debian package `openems`; one engine thread per run, niced). Finished runs are cached under
# ${WORK:-.fullwave-calibration}/<family>/runs, so a rerun resumes. Each family is one `slotarray calibrate-edge`.
# Usage: scripts/fullwave/edge-calibration.sh [JOBS]    (about 1-4 min per run on one core; 59 runs)
set -euo pipefail
cd "$(dirname "$0")/../.."
JOBS=${1:-1}
WORK=${WORK:-.fullwave-calibration}
TOOL=(dotnet run -c Release --project src/SlotArray.Cli --)
run() { local name=$1; shift; nice -n 10 "${TOOL[@]}" calibrate-edge "$@" --jobs "$JOBS" -o "$WORK/$name"; }
run wr90-tube  --guide WR-90 --frequency 9.375GHz --tilts 5,10,15,20,25 --depths 2.7,3.0,3.3 --mesh normal
run wr90-flare --guide WR-90 --frequency 9.375GHz --tilts 5,15,25 --depths 2.7,3.0,3.3 --mesh normal \
  --surround flare --flare-length 147.2mm --flare-aperture 103.4mm
run wr112-tube --guide WR-112 --frequency 7.9GHz --tilts 5,15,25 --depths 2.8,3.15,3.5 --mesh normal
# One table: the first family's header, every family's provenance (#) lines and rows.
out=data/fullwave/edge-slot-calibration.csv
{
  echo "# Full-wave (FDTD) admittance of inclined narrow-wall (edge) slots, y = Y/G0 at the slot centre, e^(jwt); regenerate with scripts/fullwave/edge-calibration.sh"
  echo "# validity: the tilts, depths and band of each family below; other guides are read by similitude and flagged"
  first=1
  for f in wr90-tube wr90-flare wr112-tube; do
    csv="$WORK/$f/edge-calibration.csv"
    [ -f "$csv" ] || continue
    grep '^#' "$csv"
    if [ $first -eq 1 ]; then grep -v '^#' "$csv" | head -1; first=0; fi
    grep -v '^#' "$csv" | tail -n +2
  done
} > "$out.tmp"
mv "$out.tmp" "$out"
echo "wrote $out"
