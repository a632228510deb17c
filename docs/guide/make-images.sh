#!/usr/bin/env bash
# Regenerates the pictures of docs/guide.md from the demo cases: bash docs/guide/make-images.sh
set -euo pipefail
cd "$(dirname "$0")/../.."
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
for demo in laminate-fatty-food patch-on-skin diffusion-cell-membrane two-liquid-layers membrane-time-lag \
    reusable-container-three-contacts donor-concentration-steps; do
  # Delivery through skin and a time-lag experiment read best on a linear time axis (a schedule's plots are linear anyway).
  case $demo in patch-on-skin|membrane-time-lag) axis=--linear-time ;; *) axis= ;; esac
  dotnet run --project src/Layers.Cli -- run "cases/$demo.json" --out "$out" --quiet --plot-width 1000 --plot-height 640 $axis
  # The third plot is named by what it shows: equilibrium.png, or permeation.png for steady permeation. The schedule
  # demos show one plot each in the guide.
  case $demo in
    reusable-container-three-contacts) plots=transfer ;;
    donor-concentration-steps) plots=permeation ;;
    *) plots="profile transfer equilibrium permeation" ;;
  esac
  for plot in $plots; do
    if [ -f "$out/$demo/$plot.png" ]; then cp "$out/$demo/$plot.png" "docs/guide/$demo-$plot.png"; fi
  done
done
dotnet run --project src/Layers.Cli -- fit cases/membrane-time-lag.json --data cases/membrane-time-lag-measured.csv \
  --estimate '$.layers[0].diffusionCoefficient' --estimate '$.layers[0].partitionCoefficient' --out "$out" --quiet
cp "$out/membrane-time-lag.fit/fit.png" docs/guide/membrane-time-lag-fit.png
