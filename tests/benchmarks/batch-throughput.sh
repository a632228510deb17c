#!/usr/bin/env bash
# Batch throughput: generates COUNT small invented cases (two-layer films into a food simulant compartment, each
# with its own thicknesses and diffusion coefficients), runs them as one batch with a Release build, and prints the
# wall time and cases per second. Not a test: the numbers depend on the machine. Results: docs/performance.md.
#
#   bash tests/benchmarks/batch-throughput.sh [COUNT] [JOBS] [extra run options, e.g. --no-plots]
#
# By default the tool is the Release build, run with `dotnet layers.dll`. LAYERS=path/to/layers runs a published
# tool instead (e.g. the Native AOT executable of `dotnet publish src/Layers.Cli -c Release -r linux-x64
# -p:PublishAot=true -o out`); the line printed first says which.
set -euo pipefail
count=${1:-1000}
jobs=${2:-$(nproc)}
shift $(( $# > 2 ? 2 : $# )) || true
root=$(cd "$(dirname "$0")/../.." && pwd)
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

if [ -n "${LAYERS:-}" ]; then
  tool=("$LAYERS")
else
  dotnet build "$root/src/Layers.Cli" -c Release -v quiet -nologo >/dev/null
  tool=(dotnet "$root/src/Layers.Cli/bin/Release/net10.0/layers.dll")
fi
echo "tool: ${tool[*]}"
mkdir -p "$work/cases"
for ((i = 0; i < count; i++)); do
  outer=$(( 10 + i % 40 ))            # um
  inner=$(( 20 + (i / 40) % 25 * 2 ))  # um
  exponent=$(( 9 + i % 3 ))            # D of the inner layer 1e-9 .. 1e-11 cm2/s
  printf '{
  "title": "Invented benchmark film %d",
  "layers": [
    { "name": "outer", "thickness": "%d um", "diffusionCoefficient": "1e-12 cm2/s", "partitionCoefficient": 1 },
    { "name": "inner", "thickness": "%d um", "diffusionCoefficient": "1e-%d cm2/s", "partitionCoefficient": 1,
      "initialConcentration": "500 mg/L" }
  ],
  "left": { "kind": "closed" },
  "right": { "kind": "compartment", "name": "simulant", "volume": "100 mL", "area": "1 dm2", "partitionCoefficient": 0.1 },
  "duration": "10 d"
}\n' "$i" "$outer" "$inner" "$exponent" > "$work/cases/film-$(printf '%04d' "$i").json"
done

start=$(date +%s.%N)
"${tool[@]}" run "$work/cases" --out "$work/out" --jobs "$jobs" --quiet "$@" || true
end=$(date +%s.%N)
succeeded=$(grep -c ',succeeded,' "$work/out/summary.csv" || true)
# The solve times of timing.csv, summed: what is left of jobs x wall is start-up, reading, writing and waiting.
solve=$(awk -F, 'NR > 1 { s += $2 } END { printf "%.2f", s }' "$work/out/timing.csv" 2>/dev/null || echo 0)
awk -v s="$start" -v e="$end" -v n="$count" -v ok="$succeeded" -v j="$jobs" -v cpu="$(nproc)" -v solve="$solve" \
  -v load="$(cut -d' ' -f1 /proc/loadavg)" 'BEGIN {
  t = e - s; printf "%d cases (%d succeeded), --jobs %d on %d cores (load average %s): %.1f s wall, %.1f cases/s; solves %.1f s summed over the cases (%.0f %% of jobs x wall)\n",
    n, ok, j, cpu, load, t, n / t, solve, 100 * solve / (j * t) }'
