#!/usr/bin/env bash
# The README's SLURM array example, run for real on a one-node SLURM cluster made on this machine: installs Debian's
# slurm-wlm and munge when missing, starts munged, slurmctld and slurmd with a configuration of its own (this host,
# CPUs from nproc, no cgroups), generates a folder of cases (variations of the shipped demo cases, in one sub-folder
# per demo), submits the README's array script unchanged over it, merges the shards with the README's merge command,
# runs the same folder unsharded, and compares the merged summary.csv and summary.json with the unsharded ones byte
# for byte. Prints the wall times. Not a test and not part of CI: it needs root (or sudo) and starts daemons.
# Results: docs/performance.md, "A one-node SLURM run".
#
#   bash tests/benchmarks/slurm-one-node.sh [VARIATIONS_PER_DEMO]
#
# VARIATIONS_PER_DEMO (default 8) copies of each demo case, each with its layer thicknesses scaled by its own factor.
# Environment: CPUS_PER_TASK (default 1) is given to sbatch on its command line, where it overrides the script's
#   #SBATCH --cpus-per-task (4 asks for more than a small machine has); LAYERS_DIR=folder holding a `layers`
#   executable skips the Release publish; KEEP=1 keeps the working folder (printed) instead of removing it.
# The daemons use a slurm.conf in the working folder (SLURM_CONF), not /etc/slurm; they are stopped at the end, and so
# is munged when this script started it.
set -euo pipefail
variations=${1:-8}
cpus_per_task=${CPUS_PER_TASK:-1}
root=$(cd "$(dirname "$0")/../.." && pwd)
work=$(mktemp -d /tmp/layers-slurm.XXXXXX)
chmod 755 "$work"
as_root=()
[ "$(id -u)" -eq 0 ] || as_root=(sudo)
started_munged=false

# A process that runs (a daemon that has exited but was not reaped yet, a zombie, does not count).
alive() { [ -r "/proc/$1/stat" ] && ! awk '{ exit $3 != "Z" }' "/proc/$1/stat"; }

stop_daemons() {
  # Whatever is left in the queue is cancelled; KEEP=1 keeps the logs and job records of a failed run to read.
  if [ -s "$work/slurmctld.pid" ] && command -v scancel >/dev/null; then scancel --user "$(id -un)" 2>/dev/null || true; fi
  local pids=()
  for daemon in slurmd slurmctld; do
    if [ -s "$work/$daemon.pid" ]; then pids+=("$(cat "$work/$daemon.pid")"); fi
  done
  if $started_munged && [ -s /run/munge/munged.pid ]; then pids+=("$(cat /run/munge/munged.pid)"); fi
  for pid in "${pids[@]}"; do "${as_root[@]}" kill "$pid" 2>/dev/null || true; done
  for pid in "${pids[@]}"; do
    for ((i = 0; i < 50; i++)); do alive "$pid" || break; sleep 0.2; done
  done
  if [ "${KEEP:-0}" = 1 ]; then echo "kept: $work"; else "${as_root[@]}" rm -rf "$work"; fi
}
trap stop_daemons EXIT

# 1. SLURM and munge from Debian's packages.
if ! command -v slurmctld >/dev/null || ! command -v slurmd >/dev/null || ! command -v sbatch >/dev/null \
  || ! command -v munged >/dev/null; then
  "${as_root[@]}" apt-get update -qq
  DEBIAN_FRONTEND=noninteractive "${as_root[@]}" apt-get install -y -qq slurm-wlm munge >/dev/null
fi

# 2. munged: the daemons and the commands authenticate through it. Debian's package makes the key; it runs as the
#    user munge, as Debian's service does.
if ! munge -n 2>/dev/null | unmunge >/dev/null 2>&1; then
  if [ ! -s /etc/munge/munge.key ]; then "${as_root[@]}" mungekey --create; "${as_root[@]}" chown munge:munge /etc/munge/munge.key; fi
  "${as_root[@]}" mkdir -p /run/munge
  "${as_root[@]}" chown munge:munge /run/munge
  "${as_root[@]}" runuser -u munge -- /usr/sbin/munged
  started_munged=true
  munge -n | unmunge >/dev/null
fi

# 3. A one-node cluster: this host, its cores, no cgroups (linuxproc tracks the processes, no task plugin), so that it
#    also works in a container. The job completion log gives each array task's state, exit code, start and end.
node=$(hostname -s)
if ps -eo stat=,comm= | awk '$1 !~ /^Z/ && ($2 == "slurmctld" || $2 == "slurmd") { found = 1 } END { exit !found }'; then
  echo "a slurmctld or slurmd already runs here; this script makes a cluster of its own and will not touch that one"
  exit 1
fi
mkdir -p "$work/state" "$work/spool" "$work/log"
cat > "$work/slurm.conf" <<EOF
ClusterName=layers-one-node
SlurmctldHost=$node
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
CredType=cred/munge
StateSaveLocation=$work/state
SlurmdSpoolDir=$work/spool
SlurmctldPidFile=$work/slurmctld.pid
SlurmdPidFile=$work/slurmd.pid
SlurmctldLogFile=$work/log/slurmctld.log
SlurmdLogFile=$work/log/slurmd.log
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
JobAcctGatherType=jobacct_gather/none
AccountingStorageType=accounting_storage/none
JobCompType=jobcomp/filetxt
JobCompLoc=$work/log/jobcomp.txt
SelectType=select/cons_tres
SelectTypeParameters=CR_CPU
MpiDefault=none
ReturnToService=2
NodeName=$node CPUs=$(nproc) State=UNKNOWN
PartitionName=one Nodes=$node Default=YES MaxTime=INFINITE State=UP
EOF
export SLURM_CONF=$work/slurm.conf
"${as_root[@]}" env SLURM_CONF="$SLURM_CONF" slurmctld
"${as_root[@]}" env SLURM_CONF="$SLURM_CONF" slurmd
for ((i = 0; i < 60; i++)); do
  [ "$(sinfo -h -n "$node" -o %T 2>/dev/null)" = idle ] && break
  sleep 1
done
[ "$(sinfo -h -n "$node" -o %T)" = idle ] || { echo "the node did not come up:"; tail "$work"/log/*.log; exit 1; }
echo "cluster: $(sinfo --version), partition $(sinfo -h -o '%P %D node(s) %c CPUs %T'); load average $(cut -d' ' -f1-3 /proc/loadavg)"

# 4. The tool, where the array tasks find it: on PATH, which sbatch passes on to the tasks (its default --export=ALL).
if [ -n "${LAYERS_DIR:-}" ]; then
  tool_dir=$(cd "$LAYERS_DIR" && pwd)
else
  tool_dir=$work/tool
  dotnet publish "$root/src/Layers.Cli" -c Release -o "$tool_dir" -v quiet -nologo >/dev/null
fi
export PATH="$tool_dir:$PATH"
echo "tool: $(command -v layers)"

# 5. The cases: VARIATIONS copies of each shipped demo case in my-cases/<demo>/ (so --recursive matters), each with
#    its thicknesses (and a swept thickness, and the named depths) scaled by a factor between 0.5 and 2; a file a
#    case names is copied beside it. The sweep demo's copies make three sub-cases each, which the shards split.
cd "$work"
python3 - "$root/cases" my-cases "$variations" <<'EOF'
import json, pathlib, re, shutil, sys
source, target, count = pathlib.Path(sys.argv[1]), pathlib.Path(sys.argv[2]), int(sys.argv[3])
def scaled(text, factor):
    number, unit = re.fullmatch(r"\s*([0-9.eE+-]+)\s*(\S+)\s*", text).groups()
    return f"{float(number) * factor:.6g} {unit}"
for demo in sorted(source.glob("*.json")):
    case = json.loads(demo.read_text())
    folder = target / demo.stem
    folder.mkdir(parents=True)
    for other in source.glob("*.csv"):
        if other.name in demo.read_text():
            shutil.copy(other, folder / other.name)
    for i in range(count):
        factor = 0.5 * 4 ** (i / max(count - 1, 1))
        copy = json.loads(json.dumps(case))
        copy.pop("$schema", None)
        copy["title"] = f"{case['title']} (thicknesses x {factor:.3g})"
        for layer in copy["layers"]:
            layer["thickness"] = scaled(layer["thickness"], factor)
        if "depths" in copy:
            copy["depths"] = [scaled(depth, factor) for depth in copy["depths"]]
        for parameter in copy.get("sweep", {}).get("parameters", []):
            if parameter["path"].endswith(".thickness") and "values" in parameter:
                parameter["values"] = [scaled(value, factor) for value in parameter["values"]]
        (folder / f"{demo.stem}-v{i + 1:02d}.json").write_text(json.dumps(copy, indent=2) + "\n")
EOF
files=$(find my-cases -name '*.json' | wc -l)

# 6. The README's array script, as written there: the one ```sh block with an `#SBATCH --array` line.
awk '/^```sh$/ { block = ""; inside = 1; next }
     /^```$/ && inside { inside = 0; if (block ~ /#SBATCH --array/) { printf "%s", block; found++ } next }
     inside { block = block $0 "\n" }
     END { if (found != 1) { print "README.md: expected one array script, found " found > "/dev/stderr"; exit 1 } }' \
  "$root/README.md" > array.sh
shards=$(sed -n 's/.*--shard "\$SLURM_ARRAY_TASK_ID\/\([0-9]*\)".*/\1/p' array.sh)
echo "array script (README.md), submitted with --cpus-per-task=$cpus_per_task on the command line:"
sed 's/^/  | /' array.sh

# 7. Submit, and wait until the queue is empty, polled every 0.2 s (in a trial, sbatch --wait returned about 5 s
#    after the last task had ended, which would count in the array's time).
start=$(date +%s.%N)
job=$(sbatch --parsable --cpus-per-task="$cpus_per_task" array.sh)
while [ -n "$(squeue -h -j "$job" 2>/dev/null)" ]; do sleep 0.2; done
end_array=$(date +%s.%N)
# The job completion log has one line per task (JobState=..., ExitCode=..., ArrayJobId=..., ArrayTaskId=...).
tasks() { awk -v job="$job" '{ delete f; for (i = 1; i <= NF; i++) { split($i, kv, "="); f[kv[1]] = kv[2] }
  if (f["ArrayJobId"] == job) printf "  task %s: %s, exit %s, %s to %s\n", f["ArrayTaskId"], f["JobState"], f["ExitCode"], f["StartTime"], f["EndTime"] }' \
  log/jobcomp.txt 2>/dev/null | sort -n -k2; }
for ((i = 0; i < 50; i++)); do [ "$(tasks | wc -l)" -ge "$shards" ] && break; sleep 0.2; done
# Exit 1 only says that some case of the shard exceeded its limit (a result, not a failure); SLURM calls it FAILED.
ran_tasks=$(tasks | grep -cE ': (COMPLETED, exit 0|FAILED, exit 1):0,' || true)
worst_task_exit=$(tasks | sed -E 's/.*exit ([0-9]+):.*/\1/' | sort -n | tail -n 1)
echo "array job $job: $ran_tasks of $shards tasks ran their shard (exit 0, or 1 for a limit exceeded)"
tasks
if [ "$ran_tasks" -ne "$shards" ]; then
  echo "some array task failed; the tasks' output:"; tail -n 20 slurm-*.out; exit 1
fi

# 8. The README's merge command, then the same folder unsharded on the same cores.
# Like a batch, merge exits 1 when some case exceeded its limit, 2 when some case was invalid or failed.
merge_exit=0
layers merge results/shard-* --out results > merge.txt || merge_exit=$?
end_merge=$(date +%s.%N)
unsharded_exit=0
layers run my-cases/ --recursive --no-plots --jobs "$(nproc)" --out unsharded --quiet || unsharded_exit=$?
end_unsharded=$(date +%s.%N)
echo "exit codes: highest of the array tasks $worst_task_exit, merge $merge_exit, unsharded run $unsharded_exit"

rows=$(($(wc -l < results/summary.csv) - 1))
succeeded=$(grep -c ',succeeded,' results/summary.csv || true)
same=true
[ "$worst_task_exit" = "$unsharded_exit" ] && [ "$merge_exit" = "$unsharded_exit" ] || same=false
for file in summary.csv summary.json; do
  if cmp "results/$file" "unsharded/$file"; then echo "$file: merged and unsharded byte-identical"; else same=false; fi
done
$same || diff results/summary.csv unsharded/summary.csv | head -20
awk -v s="$start" -v a="$end_array" -v m="$end_merge" -v u="$end_unsharded" -v files="$files" -v rows="$rows" \
  -v ok="$succeeded" -v shards="$shards" -v cpt="$cpus_per_task" -v cpu="$(nproc)" \
  -v load="$(cut -d' ' -f1 /proc/loadavg)" 'BEGIN {
  printf "%d case files, %d rows (%d succeeded), %d shards at %d CPU(s) each on %d cores (load average %s):\n", files, rows, ok, shards, cpt, cpu, load
  printf "  array job, submit to empty queue %.1f s; merge %.1f s; unsharded run (--jobs %d) %.1f s; array / unsharded %.2f\n",
    a - s, m - a, cpu, u - m, (a - s) / (u - m) }'
$same
