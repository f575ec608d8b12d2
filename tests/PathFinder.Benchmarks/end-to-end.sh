#!/usr/bin/env bash
# End-to-end timing of the real command-line tool: process start to exit, as a user runs it.
#
#   tests/PathFinder.Benchmarks/end-to-end.sh [species] [measurements] [runs]     (default 2000 30000 5)
#
# Publishes a ReadyToRun build of the CLI (the way to install it for large networks, see README), generates the
# synthetic benchmark network (2 % outliers of 8–30 σ, seed 1), then runs `solve --no-adjust` and `check` several
# times and prints wall time (median, min, max) and peak resident memory against the targets of the issue.
# Set PATHFINDER_CLI to an existing pathfinder executable to skip the publish step.
set -euo pipefail
cd "$(dirname "$0")/../.."

[ -x /usr/bin/time ] || { echo "needs GNU time (/usr/bin/time; Debian package 'time')"; exit 2; }

species="${1:-2000}"
measurements="${2:-30000}"
runs="${3:-5}"
work="$(mktemp -d "${TMPDIR:-/tmp}/pathfinder-e2e-XXXXXX")"
trap 'rm -rf "$work"' EXIT

cli="${PATHFINDER_CLI:-}"
if [ -z "$cli" ]; then
  echo "publishing a ReadyToRun build of the CLI (about 30 s)..."
  dotnet publish src/PathFinder.Cli -c Release -r linux-x64 --self-contained false -p:PublishReadyToRun=true \
    -o "$work/cli" -v quiet -nologo >/dev/null
  cli="$work/cli/pathfinder"
fi

"$cli" generate --species "$species" --measurements "$measurements" --seed 1 --outliers 0.02 -o "$work/network" >/dev/null
network="$work/network/measurements.csv"
echo "network: $species species, $measurements measurements ($(du -h "$network" | cut -f1)), seed 1, 2 % outliers"
echo "machine: $(nproc) logical cores, load average $(cut -d' ' -f1-3 /proc/loadavg), $(uname -sr)"

measure() { # name, target seconds, command...
  local name="$1" target="$2"; shift 2
  local walls=() peak=0 line wall kb
  for _ in $(seq "$runs"); do
    # The command's output and exit status are not needed here (check exits 1: the network is inconsistent).
    /usr/bin/time -o "$work/time" -f '%e %M' "$@" >/dev/null 2>&1 || true
    line="$(tail -1 "$work/time")"
    wall="${line%% *}"; kb="${line##* }"
    walls+=("$wall")
    [ "$kb" -gt "$peak" ] && peak="$kb"
  done
  local sorted; sorted="$(printf '%s\n' "${walls[@]}" | sort -n)"
  local median; median="$(echo "$sorted" | sed -n "$(( (runs + 1) / 2 ))p")"
  local verdict; verdict="$(awk -v m="$median" -v t="$target" 'BEGIN { print (m <= t) ? "pass" : "FAIL" }')"
  local memory; memory="$(awk -v k="$peak" 'BEGIN { printf "%.0f", k / 1024 }')"
  local memory_verdict; memory_verdict="$(awk -v k="$peak" 'BEGIN { print (k / 1024 < 500) ? "pass" : "FAIL" }')"
  printf '  %-22s wall median %5.2f s (min %s, max %s, %d runs; target %s s: %s); peak memory %s MB (target < 500 MB: %s)\n' \
    "$name" "$median" "$(echo "$sorted" | head -1)" "$(echo "$sorted" | tail -1)" "$runs" "$target" "$verdict" "$memory" "$memory_verdict"
}

measure "solve --no-adjust" 1.5 "$cli" solve --no-adjust "$network"
measure "check" 3.0 "$cli" check "$network"
