#!/usr/bin/env bash
# Two builds of netsolve drawing the same map or report, alternated run by run so a change in the machine's load hits
# both alike: medians of wall and CPU time (user + system), highest peak memory, output size, load average.
#
#   nice -n 10 bash tests/NetSolve.Benchmarks/WholeProcess/compare-map.sh BEFORE AFTER [RUNS] [FILE] [OUTPUT]
#
# BEFORE, AFTER: the two programs (for example a copy of main's artifacts/launcher/netsolve and this worktree's).
# FILE: the network (default $WORK/net_1000.yaml). OUTPUT: what to write, by extension: map.png (default), map.svg,
# map.dot or report.html (report). WORK as in measure.sh.
set -euo pipefail
before="$1"; after="$2"; runs="${3:-5}"
work="${WORK:-/tmp/netsolve-whole-process}"
file="${4:-$work/net_1000.yaml}"
output="${5:-map.png}"
command=map; [ "${output##*.}" = html ] && command=report
[ -f "$file" ] || { echo "compare-map: no file $file (measure.sh generates the networks)" >&2; exit 2; }

run_once() {
  local name="$1" program="$2" start end
  start=$(date +%s%N)
  /usr/bin/time -f "%M %U %S" -o "$work/compare-map.rss" "$program" "$command" "$file" -o "$work/$name-$output" >/dev/null 2>&1 \
    || { echo "compare-map: failed: $program $command $file" >&2; exit 1; }
  end=$(date +%s%N)
  echo "$name $(( (end - start) / 1000000 )) $(tail -1 "$work/compare-map.rss") $(stat -c %s "$work/$name-$output")"
}

echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
for ((i = 0; i < runs; i++)); do
  run_once before "$before"
  run_once after "$after"
done > "$work/compare-map.txt"
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)" >&2

median() { sort -n | awk '{ v[NR] = $1 } END { print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2 }'; }
echo "| \`$command $(basename "$file") -o $output\` | wall (median of $runs) | CPU user+sys (median) | peak (highest) | output |"
echo "|---|---:|---:|---:|---:|"
for name in before after; do
  rows=$(grep "^$name " "$work/compare-map.txt")
  wall=$(awk '{ print $2 }' <<< "$rows" | median)
  cpu=$(awk '{ printf "%d\n", ($4 + $5) * 1000 }' <<< "$rows" | median)
  peak=$(awk '{ print $3 }' <<< "$rows" | sort -n | tail -1)
  size=$(awk '{ print $6 }' <<< "$rows" | tail -1)
  echo "| $name | $wall ms | $cpu ms | $((peak / 1024)) MB | $((size / 1024)) KB |"
done
