#!/usr/bin/env bash
# Stiff peers: the same cases solved three ways in one run, each at the cheapest setting that meets a target accuracy
# on the amount received: our finite volumes (TR-BDF2), our exact method in the Laplace domain, and general-purpose
# stiff integrators (scipy's LSODA and BDF) on the same finite-volume equations. Prints one table of best wall times
# and ratios to the fastest. Not a test: the numbers depend on the machine. Results and how to read them:
# docs/performance.md, "Against general-purpose stiff integrators"; what is compared: stiff-peers/README.md.
#
#   bash tests/benchmarks/stiff-peers.sh [OUT_FOLDER]
#
# Needs Debian's python3-scipy (`apt-get install -y python3-scipy`); PYTHON=path picks another interpreter that has
# numpy and scipy. Run by hand only: CI does not need it.
set -euo pipefail
root=$(cd "$(dirname "$0")/../.." && pwd)
out=${1:-$(mktemp -d)}
python=${PYTHON:-/usr/bin/python3}
if ! "$python" -c 'import scipy' 2>/dev/null; then
  echo "stiff-peers: $python has no scipy; install it with: apt-get install -y python3-scipy (or set PYTHON)" >&2
  exit 2
fi

dotnet build "$root/tests/Layers.Benchmarks" -c Release -v quiet -nologo >/dev/null
echo "machine: $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ //'), load average $(cut -d' ' -f1-3 /proc/loadavg)"
echo "dotnet $(dotnet --version), $("$python" -c 'import sys, numpy, scipy; print(f"Python {sys.version.split()[0]}, numpy {numpy.__version__}, scipy {scipy.__version__}")')"
echo "systems, our sweeps and timings (export-system) into $out:"
dotnet "$root/tests/Layers.Benchmarks/bin/Release/net10.0/Layers.Benchmarks.dll" export-system --out "$out"
echo "general-purpose integrators on the same equations (sweep details on stderr):"
"$python" "$root/tests/benchmarks/stiff-peers/peers.py" "$out"
echo "load average at the end: $(cut -d' ' -f1-3 /proc/loadavg)"
