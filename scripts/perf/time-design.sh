#!/usr/bin/env bash
# Process-level timing of `slotarray design` (issue 12 targets: the README demo <= 1 s warm, <= 1.5 s cold): hyperfine
# runs the tool warm (its slot cache filled by an untimed first run) and cold (--no-cache), then one more run under
# /usr/bin/time for the peak resident memory. Prints the load average before and after: on a shared machine read the
# figures with it.
#
#   bash scripts/perf/time-design.sh [SPEC] [RUNS]     (default arrays/harbour-surveillance-16.yaml, 5 runs; needs hyperfine)
#
# The tool is a ReadyToRun publish made here (scripts/perf/tool.sh); TOOL=path/to/slotarray times another build, e.g.
#   TOOL=src/SlotArray.Cli/bin/Release/net10.0/slotarray bash scripts/perf/time-design.sh      (the plain Release build)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
repo="$(cd "$here/../.." && pwd)"
spec="${1:-$repo/arrays/harbour-surveillance-16.yaml}"
runs="${2:-5}"
command -v hyperfine >/dev/null || { echo "hyperfine is not installed (apt-get install hyperfine)" >&2; exit 2; }
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
source "$here/tool.sh"   # $tool: a ReadyToRun publish, or TOOL=path/to/slotarray
cache="$work/cache"
echo "load before: $(uptime)"
"$tool" design "$spec" -o "$work/out" --cache-dir "$cache" >/dev/null 2>&1   # fills the cache (untimed)
hyperfine --style basic --runs "$runs" \
  -n warm "$tool design $spec -o $work/warm --cache-dir $cache" \
  -n cold "$tool design $spec -o $work/cold --no-cache"
/usr/bin/time -f "peak resident memory (warm run): %M KB, %e s wall, %U s user, %S s sys" \
  "$tool" design "$spec" -o "$work/mem" --cache-dir "$cache" >/dev/null 2>"$work/time.txt" || true
tail -n 1 "$work/time.txt"
echo "load after:  $(uptime)"
