#!/usr/bin/env bash
# Issue 17's simulator goal as ../shared/perf/README.md measures it: the events of one replication of `netsolve
# simulate` (one thread, no warm-up, the `events` field of its JSON) per CPU-second of the whole process minus the
# CPU of a `check` of the same file (start-up and reading), over the events per CPU-second of the C event loop
# des_ref (2e7 events) on the same network, run in the same round. Each round runs des_ref, then every build given,
# in an order rotated round by round, so a change in the machine's load hits them alike. One line per round.
#
#   nice -n 10 bash tests/NetSolve.Benchmarks/WholeProcess/simulate-ratio.sh UNITS HOURS ROUNDS NETSOLVE...
#
# UNITS: 10, 1000 or 100000 (net_UNITS.yaml from gen_network.py, seed 1); HOURS: the simulated duration, chosen for
# about 2e7 events (10 units: 87600; 1,000: 4964; 100,000: 62). NETSOLVE: one or more native builds to compare
# (for example artifacts/launcher/netsolve and an older copy of it).
# PERF (environment): the folder with gen_network.py, yaml2txt.py and des_ref.c (default ../shared/perf beside the
# repository). WORK (environment): where the networks and des_ref go (default /tmp/netsolve-whole-process).
set -euo pipefail
[ $# -ge 4 ] || { echo "usage: simulate-ratio.sh UNITS HOURS ROUNDS NETSOLVE..." >&2; exit 2; }
root="$(cd "$(dirname "$(readlink -f "${BASH_SOURCE[0]}")")/../../.." && pwd)"
units=$1 hours=$2 rounds=$3
shift 3
builds=("$@")
perf="${PERF:-$root/../shared/perf}"
work="${WORK:-/tmp/netsolve-whole-process}"
mkdir -p "$work"
[ -x "$work/des_ref" ] || gcc -O2 -o "$work/des_ref" "$perf/des_ref.c" -lm
[ -f "$work/net_$units.yaml" ] || /usr/bin/python3 "$perf/gen_network.py" "$units" 1 "$work/net_$units.yaml" >/dev/null
[ -f "$work/net_$units.txt" ] || /usr/bin/python3 "$perf/yaml2txt.py" "$work/net_$units.yaml" "$work/net_$units.txt" >/dev/null

cpu_of() { tail -1 "$1" | awk '{ print $1 + $2 }'; }

for ((round = 1; round <= rounds; round++)); do
  /usr/bin/time -o "$work/ratio_ref" -f "%U %S" "$work/des_ref" "$work/net_$units.txt" 2e7 >/dev/null
  reference=$(cpu_of "$work/ratio_ref")
  line="round $round  load $(cut -d' ' -f1 /proc/loadavg)  des_ref $reference CPU-s"
  for ((k = 0; k < ${#builds[@]}; k++)); do
    build=${builds[$(((round + k) % ${#builds[@]}))]}
    /usr/bin/time -o "$work/ratio_sim" -f "%U %S %M" "$build" simulate "$work/net_$units.yaml" -r 1 --threads 1 \
      --warmup 0 --duration "${hours}h" --format json >"$work/ratio.json" 2>/dev/null
    /usr/bin/time -o "$work/ratio_check" -f "%U %S" "$build" check "$work/net_$units.yaml" >/dev/null 2>&1
    events=$(grep -m1 '"events"' "$work/ratio.json" | tr -dc 0-9)
    line+=$(awk -v b="$build" -v e="$events" -v s="$(cpu_of "$work/ratio_sim")" -v c="$(cpu_of "$work/ratio_check")" \
      -v r="$reference" -v kb="$(tail -1 "$work/ratio_sim" | awk '{ print $3 }')" \
      'BEGIN { rate = e / (s - c); printf "  |  %s: %.2f - %.2f CPU-s, %.2f M events/CPU-s, ratio %.3f, peak %d KB", b, s, c, rate / 1e6, rate / (2e7 / r), kb }')
  done
  echo "$line"
done
