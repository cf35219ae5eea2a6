#!/usr/bin/env bash
# Whole-process measurement of the shipped netsolve command, as a planner runs it, against independent yardsticks in
# the team's perf folder (libyaml's event scan of the same file). Runs alternate between netsolve and the yardstick,
# so a change in the machine's load hits both alike; medians of RUNS runs; peak memory (maximum resident set) from
# /usr/bin/time. Prints a Markdown table with each goal, its measured value and pass or fail.
#
#   nice -n 10 bash tests/NetSolve.Benchmarks/WholeProcess/measure.sh [NETSOLVE] [RUNS]
#
# NETSOLVE: the command to measure, one or more words (default: the native build the ./netsolve launcher makes, artifacts/launcher/netsolve).
# PERF (environment): the folder with gen_network.py and yaml_scan.c (default ../shared/perf beside the repository).
# WORK (environment): where generated networks and the built yardstick go (default /tmp/netsolve-whole-process).
# Also checks that the native build's output equals the just-in-time build's on every bundled example (EXPECT_DLL:
# the JIT build, default artifacts/bin/NetSolve.Cli/release/netsolve.dll or the one the native publish leaves in
# release_linux-x64, built when neither is there).
set -euo pipefail
root="$(cd "$(dirname "$(readlink -f "${BASH_SOURCE[0]}")")/../../.." && pwd)"
netsolve="${1:-$root/artifacts/launcher/netsolve}"
runs="${2:-7}"
perf="${PERF:-$root/../shared/perf}"
work="${WORK:-/tmp/netsolve-whole-process}"
jit="${EXPECT_DLL:-$root/artifacts/bin/NetSolve.Cli/release/netsolve.dll}"
# The native publish leaves the same program, just-in-time compiled, beside it: use that when there is no other.
[ -f "$jit" ] || [ -n "${EXPECT_DLL:-}" ] || jit="$root/artifacts/bin/NetSolve.Cli/release_linux-x64/netsolve.dll"
mkdir -p "$work"

read -r -a program <<< "$netsolve"   # a path, or a command of several words ("dotnet path/netsolve.dll")
if [ "${#program[@]}" = 1 ] && [ ! -x "$netsolve" ]; then
  if [ "$netsolve" = "$root/artifacts/launcher/netsolve" ]; then "$root/netsolve" --version >/dev/null; else
    echo "measure: no program at $netsolve" >&2; exit 2; fi
fi
[ -x "$work/yaml_scan" ] || gcc -O2 -o "$work/yaml_scan" "$perf/yaml_scan.c" -lyaml
for units in 1000 10000 100000; do
  [ -f "$work/net_$units.yaml" ] || /usr/bin/python3 "$perf/gen_network.py" "$units" 1 "$work/net_$units.yaml" >/dev/null
done

# One timed run, the command's output thrown away.
run_once() {
  local start end
  start=$(date +%s%N)
  /usr/bin/time -f "%M %U %S" -o "$work/rss" "$@" >/dev/null 2>"$work/stderr" || { echo "measure: failed: $*" >&2; cat "$work/stderr" >&2; exit 1; }
  end=$(date +%s%N)
  # wall microseconds, peak kilobytes, CPU microseconds (user + system, to 10 ms)
  tail -1 "$work/rss" | awk -v wall=$(( (end - start) / 1000 )) '{ printf "%d %d %d\n", wall, $1, ($2 + $3) * 1e6 }'
}

median() { sort -n | awk '{ v[NR] = $1 } END { print (NR % 2) ? v[(NR + 1) / 2] : (v[NR / 2] + v[NR / 2 + 1]) / 2 }'; }

# measure NAME COMMAND...: RUNS runs, alternating with the libyaml scan of REFERENCE_FILE when that is set.
measure() {
  local name="$1"; shift
  : > "$work/$name.times"; : > "$work/$name.rss"; : > "$work/$name.ref"; : > "$work/$name.cpu"
  for ((i = 0; i < runs; i++)); do
    if [ -n "${REFERENCE_FILE:-}" ]; then run_once "$work/yaml_scan" "$REFERENCE_FILE" 1 >> "$work/$name.ref"; fi
    read -r micros kb cpu < <(run_once "$@")
    echo "$micros" >> "$work/$name.times"; echo "$kb" >> "$work/$name.rss"; echo "$cpu" >> "$work/$name.cpu"
  done
}

ms() { awk -v us="$1" 'BEGIN { printf "%.1f", us / 1000 }'; }
verdict() { awk -v v="$1" -v limit="$2" 'BEGIN { print (v + 0 < limit + 0) ? "pass" : "fail" }'; }

echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg)" >&2

REFERENCE_FILE="$work/net_100000.yaml" measure solve100k "${program[@]}" solve "$work/net_100000.yaml" --format json
measure solve1k "${program[@]}" solve "$work/net_1000.yaml" --format json
measure check3 "${program[@]}" check "$root/networks/millbrook-clinic.yaml"
measure growth10k "${program[@]}" growth "$work/net_10000.yaml" --format json

scan=$(cut -d' ' -f1 "$work/solve100k.ref" | median); solve=$(median < "$work/solve100k.times")
ratio=$(awk -v a="$solve" -v b="$scan" 'BEGIN { printf "%.1f", a / b }')
rss100k=$(( $(sort -n "$work/solve100k.rss" | tail -1) / 1024 ))
solve1k=$(median < "$work/solve1k.times"); check3=$(median < "$work/check3.times"); growth=$(median < "$work/growth10k.times")

cpu() { echo "CPU $(ms "$(median < "$work/$1.cpu")") ms"; }
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)" >&2
echo "| goal | measured (median of $runs) | result |"
echo "|---|---:|---|"
echo "| \`solve\` 100,000 units (--format json) at most 6 × the libyaml scan | $(ms "$solve") ms / $(ms "$scan") ms = $ratio × (CPU $(ms "$(median < "$work/solve100k.cpu")") ms / $(ms "$(cut -d' ' -f3 "$work/solve100k.ref" | median)") ms) | $(verdict "$ratio" 6.0001) |"
echo "| the same, peak memory under 300 MB | $rss100k MB (highest of $runs) | $(verdict "$rss100k" 300) |"
echo "| \`solve\` 1,000 units under 50 ms | $(ms "$solve1k") ms ($(cpu solve1k)) | $(verdict "$solve1k" 50000) |"
echo "| \`check\` of a 3-unit network under 30 ms | $(ms "$check3") ms ($(cpu check3)) | $(verdict "$check3" 30000) |"
echo "| \`growth\` 10,000 units (--format json) under 1 s | $(ms "$growth") ms ($(cpu growth10k)) | $(verdict "$growth" 1000000) |"

# The native build must print what the just-in-time build prints, on every bundled example and format.
[ -f "$jit" ] || dotnet build "$root/src/NetSolve.Cli" -c Release --nologo -v quiet >&2
differ=0
for file in "$root"/networks/*.yaml; do
  for args in "check" "solve --format json" "solve --format csv" "solve" "growth --format json"; do
    # shellcheck disable=SC2086
    a=$("${program[@]}" $args "$file" 2>&1; echo "exit $?")
    # shellcheck disable=SC2086
    b=$(dotnet "$jit" $args "$file" 2>&1; echo "exit $?")
    if [ "$a" != "$b" ]; then echo "measure: the native and JIT builds differ on: $args $file" >&2; differ=1; fi
  done
done
[ "$differ" = 0 ] && echo "native output identical to the JIT build on every bundled example ($(ls "$root"/networks/*.yaml | wc -l) files × 5 commands)" >&2
exit "$differ"
