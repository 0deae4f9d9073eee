#!/usr/bin/env bash
# Process-level speed comparison of the tolerance Monte Carlo: `slotarray tolerance` on a 64-slot standing-wave
# WR-90 array (10,000 trials, +-0.025 mm on offset, length and position; scripts/perf/wr90-64-taylor30.yaml) against
# its numpy peer (scripts/perf/tolerance_numpy.py, the same trials vectorised over the trials), run alternately in
# the same session so that both see the same machine load. Prints each run's wall time, the medians and the ratio.
#
#   bash scripts/perf/compare-tolerance.sh [ROUNDS]      (default 3 rounds; needs python3-numpy)
#
# The tool runs from a ReadyToRun publish made here (scripts/perf/tool.sh; TOOL=path/to/slotarray times another build)
# with a warm slot cache of its own (the first, untimed run fills it); `--cold` as the second argument clears that cache
# before every run. Wall and CPU (user + system) times are both printed: on a loaded machine read the CPU ratio.
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
repo="$(cd "$here/../.." && pwd)"
rounds="${1:-3}"
cold="${2:-}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
export XDG_CACHE_HOME="$work/xdg"
source "$here/tool.sh"   # $tool: a ReadyToRun publish, or TOOL=path/to/slotarray
spec="$here/wr90-64-taylor30.yaml"
py="${PYTHON:-/usr/bin/python3}"   # Debian python3-numpy; PYTHON=... to use another interpreter
"$py" -c "import numpy" 2>/dev/null || { echo "$py has no numpy (apt-get install python3-numpy)" >&2; exit 2; }

now() { date +%s%N; }
# /usr/bin/time records each run's CPU (user + system): on a loaded machine the wall time mostly measures the scheduler.
run_tool() { /usr/bin/time -f "%U %S" -o "$work/tool.cpu" "$tool" tolerance "$spec" -o "$work/out" >"$work/tool.txt" 2>&1; }
run_numpy() { /usr/bin/time -f "%U %S" -o "$work/numpy.cpu" "$py" "$here/tolerance_numpy.py" --trials 10000 --slots 64 >"$work/numpy.txt" 2>&1; }
cpu_ms() { awk '{ printf "%d", ($1 + $2) * 1000 }' "$1"; }

echo "load before: $(uptime)"
[[ "$cold" == "--cold" ]] || run_tool   # fills the slot cache (untimed)
tool_ms=(); numpy_ms=(); tool_cpu=(); numpy_cpu=()
for ((r = 1; r <= rounds; r++)); do
  [[ "$cold" == "--cold" ]] && rm -rf "$XDG_CACHE_HOME"
  t0=$(now); run_tool; t1=$(now)
  run_numpy; t2=$(now)
  tool_ms+=($(((t1 - t0) / 1000000))); numpy_ms+=($(((t2 - t1) / 1000000)))
  tool_cpu+=($(cpu_ms "$work/tool.cpu")); numpy_cpu+=($(cpu_ms "$work/numpy.cpu"))
  printf 'round %d: slotarray tolerance %6d ms wall %6d ms CPU   numpy %6d ms wall %6d ms CPU\n' "$r" "${tool_ms[-1]}" \
    "${tool_cpu[-1]}" "${numpy_ms[-1]}" "${numpy_cpu[-1]}"
done
echo "load after:  $(uptime)"
median() { printf '%s\n' "$@" | sort -n | awk '{v[NR]=$1} END {print (NR % 2) ? v[(NR+1)/2] : (v[NR/2]+v[NR/2+1])/2}'; }
mt=$(median "${tool_ms[@]}"); mn=$(median "${numpy_ms[@]}")
echo "tool:  $(head -n 2 "$work/tool.txt" | tail -n 1)"
echo "numpy: $(cat "$work/numpy.txt")"
awk -v t="$mt" -v n="$mn" 'BEGIN { printf "median wall: slotarray %.3f s, numpy %.3f s; numpy/slotarray = %.2f (>1: the tool is faster)\n", t/1000, n/1000, n/t }'
ct=$(median "${tool_cpu[@]}"); cn=$(median "${numpy_cpu[@]}")
awk -v t="$ct" -v n="$cn" 'BEGIN { printf "median CPU:  slotarray %.3f s, numpy %.3f s; numpy/slotarray = %.2f\n", t/1000, n/1000, n/t }'
