#!/usr/bin/env bash
# Draws every demo diagram with the real `pathfinder draw` and renders each SVG to PNG with rsvg-convert.
# For combustion-lab and brine-ions: a route network, the levels of that route, all routes to the target,
# the closure of the worst cycle (and its network) and a species neighbourhood.
# Fails when a draw fails, rsvg-convert rejects an SVG, or a PNG is empty. Prints one line per diagram.
# Usage: tests/render-demo-diagrams.sh [output-folder]   (default: a temporary folder, removed at the end)
# Needs rsvg-convert (apt package librsvg2-bin). Exit code 0 = pass.
set -euo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
if ! command -v rsvg-convert >/dev/null 2>&1; then
  echo "FAIL: rsvg-convert not found (install the apt package librsvg2-bin)"; exit 1
fi

dotnet build "$root/src/PathFinder.Cli" -v q -nologo >/dev/null
exe="$root/src/PathFinder.Cli/bin/Debug/net10.0/pathfinder"

if [[ $# -ge 1 ]]; then
  out=$1
  mkdir -p "$out"
else
  out=$(mktemp -d)
  trap 'rm -rf "$out"' EXIT
fi

failures=0
count=0
# draw NAME NETWORK ARGS...: draws NAME.svg, renders NAME.png and prints one line.
draw() {
  local name=$1 network=$2
  shift 2
  local svg="$out/$name.svg" png="$out/$name.png" log="$out/$name.log"
  count=$((count + 1))
  if ! "$exe" draw "$root/networks-demo/$network" "$@" -o "$svg" >"$log" 2>&1; then
    echo "FAIL  $name: pathfinder draw $* exited $?: $(tr '\n' ' ' <"$log")"; failures=$((failures + 1)); return
  fi
  if ! rsvg-convert -z 1.5 -b white "$svg" -o "$png" 2>>"$log"; then
    echo "FAIL  $name: rsvg-convert rejected $svg: $(tr '\n' ' ' <"$log")"; failures=$((failures + 1)); return
  fi
  local magic size dims
  size=$(stat -c %s "$png")
  magic=$(head -c 8 "$png" | od -An -tx1 | tr -d ' \n')
  if [[ "$size" -eq 0 || "$magic" != "89504e470d0a1a0a" ]]; then
    echo "FAIL  $name: $png is empty or not a PNG ($size bytes)"; failures=$((failures + 1)); return
  fi
  # Width and height sit big-endian at bytes 16..23 of the IHDR chunk.
  dims=$(od -An -tu1 -j16 -N8 "$png" | awk '{ printf "%d×%d", $1*16777216+$2*65536+$3*256+$4, $5*16777216+$6*65536+$7*256+$8 }')
  if [[ "$dims" == 0×* || "$dims" == *×0 ]]; then
    echo "FAIL  $name: $png has no pixels ($dims)"; failures=$((failures + 1)); return
  fi
  printf 'ok    %-34s %-28s svg %7d B  png %s px, %d B\n' "$name" "$(sed -n 's/^wrote .* (\(.*\))$/\1/p' "$log")" "$(stat -c %s "$svg")" "$dims" "$size"
}

draw combustion-route-network     combustion-lab --kind network --target "CO(g)"
draw combustion-route-levels      combustion-lab --kind levels  --target "CO(g)"
draw combustion-route2-levels     combustion-lab --kind levels  --target "CO(g)" --route 2
draw combustion-all-routes        combustion-lab --kind network --target "CO(g)" --route 0
draw combustion-worst-cycle       combustion-lab --kind closure --cycle 1
draw combustion-worst-cycle-net   combustion-lab --kind network --cycle 1
draw combustion-species-co        combustion-lab --kind network --species "CO(g)" --depth 1

draw brine-route-network          brine-ions.csv --kind network --target "Cl-(aq)"
draw brine-route-levels           brine-ions.csv --kind levels  --target "Cl-(aq)"
draw brine-all-routes             brine-ions.csv --kind network --target "Cl-(aq)" --route 0
draw brine-worst-cycle            brine-ions.csv --kind closure --cycle 1
draw brine-worst-cycle-net        brine-ions.csv --kind network --cycle 1
draw brine-species-na             brine-ions.csv --kind network --species "Na+(aq)" --depth 1

if [[ $failures -gt 0 ]]; then
  echo "FAIL: $failures of $count demo diagrams did not render"; exit 1
fi
echo "PASS: $count demo diagrams drawn and rendered"
