#!/usr/bin/env bash
# Two builds of netsolve on every example network, scenario and test file (and optionally more files): `check`,
# `solve --format json` and `solve`, with stdout, stderr and the exit code compared byte for byte. For changes that
# must not change any output or message (a faster reader, for example).
#
#   bash tests/NetSolve.Benchmarks/WholeProcess/compare-outputs.sh BEFORE AFTER [MORE FILES...]
#
# BEFORE, AFTER: the two programs (for example a copy of main's artifacts/launcher/netsolve and this worktree's).
# Prints each output that differs and a count; exit 1 when any differs. Outputs are kept in $OUT (default a new
# temporary folder) for a look with diff.
set -uo pipefail
root="$(cd "$(dirname "$(readlink -f "${BASH_SOURCE[0]}")")/../../.." && pwd)"
before="$1"; after="$2"; shift 2
out="${OUT:-$(mktemp -d)}"
mkdir -p "$out/before" "$out/after"
cd "$root"
compared=0; differ=0
while IFS= read -r file; do
  for command in "check" "solve --format json" "solve"; do
    key=$(echo "$file $command" | tr '/ ' '__')
    # shellcheck disable=SC2086 # the command's words are meant to split
    $before $command "$file" >"$out/before/$key.out" 2>"$out/before/$key.err"; echo $? >"$out/before/$key.rc"
    # shellcheck disable=SC2086
    $after $command "$file" >"$out/after/$key.out" 2>"$out/after/$key.err"; echo $? >"$out/after/$key.rc"
    for part in out err rc; do
      compared=$((compared + 1))
      cmp -s "$out/before/$key.$part" "$out/after/$key.$part" || { differ=$((differ + 1)); echo "differs: $file $command ($part)"; }
    done
  done
done < <(find networks tests/NetSolve.Tests/TestData -type f | sort; printf '%s\n' "$@")
echo "compared $compared outputs, $differ differ (kept in $out)"
[ "$differ" -eq 0 ]
