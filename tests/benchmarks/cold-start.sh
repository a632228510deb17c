#!/usr/bin/env bash
# Cold start: publishes the command-line tool in Release, then runs `layers run CASE --no-plots -q` RUNS times, each
# a fresh process (start-up, JIT, reading, solving and writing included), and prints the median, smallest and largest
# wall time. Not a test: the numbers depend on the machine and its load. Results: docs/performance.md.
#
#   bash tests/benchmarks/cold-start.sh [RUNS] [CASE] [extra publish options]
#
# Publish options compared in docs/performance.md (the line printed first names the ones used):
#   (none)                          framework-dependent, JIT only
#   -r linux-x64                    ReadyToRun (src/Layers.Cli/Layers.Cli.csproj turns it on with a runtime identifier)
#   -r linux-x64 -p:PublishAot=true Native AOT (needs clang or gcc besides the SDK)
# After the timed runs, one more run with --timing prints where the time of a run goes (phases).
set -euo pipefail
runs=${1:-31}
root=$(cd "$(dirname "$0")/../.." && pwd)
case_file=${2:-$root/cases/laminate-fatty-food.json}
shift $(( $# > 2 ? 2 : $# )) || true
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

echo "publish options: -c Release $*"
dotnet publish "$root/src/Layers.Cli" -c Release -o "$work/bin" -v quiet -nologo "$@" >/dev/null
for ((i = 0; i < runs; i++)); do
  start=$(date +%s%N)
  "$work/bin/layers" run "$case_file" --out "$work/out-$i" --no-plots -q >/dev/null
  end=$(date +%s%N)
  echo $(( (end - start) / 1000 ))
done | sort -n | awk -v n="$runs" -v c="$(basename "$case_file")" -v cpu="$(nproc)" -v load="$(cut -d' ' -f1 /proc/loadavg)" '
  { t[NR] = $1 }
  END { printf "%s: %d cold runs on %d cores (load average %s): median %.0f ms, min %.0f ms, max %.0f ms\n",
        c, n, cpu, load, t[int((n + 1) / 2)] / 1000, t[1] / 1000, t[n] / 1000 }'
"$work/bin/layers" run "$case_file" --out "$work/out-timing" --no-plots -q --timing 2>&1 | grep '^timing: phases' || true
