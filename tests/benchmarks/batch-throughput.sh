#!/usr/bin/env bash
# Batch throughput: generates COUNT small invented cases (two-layer films into a food simulant compartment, each
# with its own thicknesses and diffusion coefficients), runs them as one batch with a Release build, and prints the
# wall time and cases per second. Not a test: the numbers depend on the machine. Results: docs/performance.md.
#
#   bash tests/benchmarks/batch-throughput.sh [COUNT] [JOBS] [extra run options, e.g. --no-plots]
set -euo pipefail
count=${1:-1000}
jobs=${2:-$(nproc)}
shift $(( $# > 2 ? 2 : $# )) || true
root=$(cd "$(dirname "$0")/../.." && pwd)
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

dotnet build "$root/src/Layers.Cli" -c Release -v quiet -nologo >/dev/null
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
dotnet "$root/src/Layers.Cli/bin/Release/net10.0/layers.dll" run "$work/cases" --out "$work/out" --jobs "$jobs" --quiet "$@" || true
end=$(date +%s.%N)
succeeded=$(grep -c ',succeeded,' "$work/out/summary.csv" || true)
awk -v s="$start" -v e="$end" -v n="$count" -v ok="$succeeded" -v j="$jobs" -v cpu="$(nproc)" 'BEGIN {
  t = e - s; printf "%d cases (%d succeeded), --jobs %d on %d cores: %.1f s wall, %.1f cases/s\n", n, ok, j, cpu, t, n / t }'
