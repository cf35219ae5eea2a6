#!/usr/bin/env bash
# Two builds of netsolve on the same command, alternated with libyaml's event scan of the same file, so a change in
# the machine's load hits all three alike: medians of wall and CPU time (user + system), highest peak memory.
#
#   nice -n 10 bash tests/NetSolve.Benchmarks/WholeProcess/compare.sh BEFORE AFTER [RUNS] [FILE]
#
# BEFORE, AFTER: the two programs (for example a copy of main's artifacts/launcher/netsolve and this worktree's).
# FILE: the network (default $WORK/net_100000.yaml). WORK and PERF as in measure.sh.
# FORMAT (environment): the output format, json (default), csv or table (what `solve FILE` prints without --format).
set -euo pipefail
root="$(cd "$(dirname "$(readlink -f "${BASH_SOURCE[0]}")")/../../.." && pwd)"
before="$1"; after="$2"; runs="${3:-7}"
perf="${PERF:-$root/../shared/perf}"
work="${WORK:-/tmp/netsolve-whole-process}"
file="${4:-$work/net_100000.yaml}"
format="${FORMAT:-json}"
mkdir -p "$work"
[ -x "$work/yaml_scan" ] || gcc -O2 -o "$work/yaml_scan" "$perf/yaml_scan.c" -lyaml
[ -f "$file" ] || { echo "compare: no file $file (measure.sh generates the networks)" >&2; exit 2; }

# One timed run: NAME wall-ms peak-KB user-s system-s, the command's output thrown away.
run_once() {
  local name="$1" start end; shift
  start=$(date +%s%N)
  /usr/bin/time -f "%M %U %S" -o "$work/compare.rss" "$@" >/dev/null 2>&1 || { echo "compare: failed: $*" >&2; exit 1; }
  end=$(date +%s%N)
  echo "$name $(( (end - start) / 1000000 )) $(tail -1 "$work/compare.rss")"
}

echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
for ((i = 0; i < runs; i++)); do
  run_once before "$before" solve "$file" --format "$format"
  run_once after "$after" solve "$file" --format "$format"
  run_once scan "$work/yaml_scan" "$file" 1
done > "$work/compare.txt"
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)" >&2

median() { sort -n | awk '{ v[NR] = $1 } END { print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2 }'; }
echo "| \`solve $(basename "$file") --format $format\` | wall (median of $runs) | CPU user+sys (median) | peak (highest) |"
echo "|---|---:|---:|---:|"
for name in before after scan; do
  rows=$(grep "^$name " "$work/compare.txt")
  wall=$(awk '{ print $2 }' <<< "$rows" | median)
  cpu=$(awk '{ print ($4 + $5) * 1000 }' <<< "$rows" | median)
  peak=$(awk '{ print int($3 / 1024) }' <<< "$rows" | sort -n | tail -1)
  echo "| $name | $wall ms | $cpu ms | $peak MB |"
done
scan=$(grep "^scan " "$work/compare.txt" | awk '{ print $2 }' | median)
for name in before after; do
  wall=$(grep "^$name " "$work/compare.txt" | awk '{ print $2 }' | median)
  echo "$name: $(awk -v a="$wall" -v b="$scan" 'BEGIN { printf "%.1f", a / b }') × the scan (wall)"
done
