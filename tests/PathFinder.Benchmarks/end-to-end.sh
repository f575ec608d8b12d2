#!/usr/bin/env bash
# End-to-end timing of the real command-line tool: process start to exit, as a user runs it.
#
#   tests/PathFinder.Benchmarks/end-to-end.sh [species] [measurements] [runs]            (default 2000 30000 5)
#   tests/PathFinder.Benchmarks/end-to-end.sh --joint [species] [measurements] [runs]    (joint model case)
#
# Publishes a ReadyToRun build of the CLI (the way to install it for large networks, see README), generates the
# synthetic benchmark network (2 % outliers of 8–30 σ, seed 1), then runs `solve --no-adjust` and `check` several
# times and prints wall time (median, min, max) and peak resident memory against the targets of the issue.
# The default case has ΔH data only (targets: solve 1.5 s, check 3 s, < 500 MB). --joint adds S° data for half the
# species (and the element reference states, CO2, H2O) and 5,000 ΔG, ln K and log10 K data at 298.15–1000 K on top
# of the ΔH measurements (targets: solve 3 s, check 6 s, < 800 MB).
# Set PATHFINDER_CLI to an existing pathfinder executable to skip the publish step.
set -euo pipefail
cd "$(dirname "$0")/../.."

[ -x /usr/bin/time ] || { echo "needs GNU time (/usr/bin/time; Debian package 'time')"; exit 2; }

joint=false
if [ "${1:-}" = "--joint" ]; then joint=true; shift; fi
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

if $joint; then
  extra=(--entropies 0.5 --gibbs 5000); solve_target=3.0; check_target=6.0; memory_target=800
else
  extra=(); solve_target=1.5; check_target=3.0; memory_target=500
fi
"$cli" generate --species "$species" --measurements "$measurements" --seed 1 --outliers 0.02 "${extra[@]}" -o "$work/network" >/dev/null
network="$work/network/measurements.csv"
rows=$(( $(grep -c '^m' "$network") ))
if $joint; then
  echo "network: $species species, $measurements ΔH measurements + S° for half the species + 5000 ΔG/ln K/log10 K = $rows rows ($(du -h "$network" | cut -f1)), seed 1, 2 % outliers"
else
  echo "network: $species species, $measurements measurements ($(du -h "$network" | cut -f1)), seed 1, 2 % outliers"
fi
openblas="not found: managed kernels, several times slower (install libopenblas0)"
for dir in ${LD_LIBRARY_PATH//:/ }; do [ -e "$dir/libopenblas.so.0" ] && openblas="found in $dir"; done
ldconfig -p 2>/dev/null | grep -q 'libopenblas.so.0' && openblas="installed"
echo "OpenBLAS (libopenblas.so.0): $openblas"
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
  local memory_verdict; memory_verdict="$(awk -v k="$peak" -v t="$memory_target" 'BEGIN { print (k / 1024 < t) ? "pass" : "FAIL" }')"
  printf '  %-22s wall median %5.2f s (min %s, max %s, %d runs; target %s s: %s); peak memory %s MB (target < %s MB: %s)\n' \
    "$name" "$median" "$(echo "$sorted" | head -1)" "$(echo "$sorted" | tail -1)" "$runs" "$target" "$verdict" "$memory" "$memory_target" "$memory_verdict"
}

measure "solve --no-adjust" "$solve_target" "$cli" solve --no-adjust "$network"
measure "check" "$check_target" "$cli" check "$network"
