#!/usr/bin/env bash
# Smoke test of `pathfinder explore` in a real terminal (tmux, 100x30): open a copy of the demo network,
# filter to C03, exclude it with a reason, save, look at the curation screen, quit with Ctrl+Q, check the file.
# Needs tmux and the explore command registered in the CLI. Exit code 0 = pass.
set -euo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
dotnet build "$root/src/PathFinder.Cli" -v q -nologo >/dev/null
exe="$root/src/PathFinder.Cli/bin/Debug/net10.0/pathfinder"
if ! "$exe" explore --help >/dev/null 2>&1; then
  echo "FAIL: the CLI has no 'explore' command (register ExploreCommand in CliApp)"; exit 1
fi

work=$(mktemp -d)
cp -r "$root/networks-demo/combustion-lab" "$work/"
session="pf-smoke-$$"
trap 'tmux kill-session -t "$session" 2>/dev/null || true; rm -rf "$work"' EXIT
tmux new-session -d -s "$session" -x 100 -y 30 "'$exe' explore '$work/combustion-lab'; echo EXIT=\$?; sleep 30"

screen() { tmux capture-pane -p -t "$session"; }
wait_for() {
  for _ in $(seq 1 75); do
    if screen | grep -qF -- "$1"; then return 0; fi
    sleep 0.2
  done
  echo "FAIL: '$1' never appeared on screen:"; screen; exit 1
}
keys() { tmux send-keys -t "$session" "$@"; sleep 0.3; }

wait_for "[F2 Measurements]"
wait_for "ready"
keys C-f
keys "C03"
wait_for "1 shown"
keys Enter
keys C-e
wait_for "Exclude C03"
keys "slipped digit in notebook"
keys Enter
wait_for "EXCLUDED: slipped digit in notebook"
wait_for "UNSAVED"
screen | grep -F "│C03" | grep -qF "excluded" || { echo "FAIL: C03 row not marked excluded"; screen; exit 1; }
keys C-s
wait_for "saved 1 decision(s)"
keys F7
wait_for "[F7 Curation]"
wait_for "slipped digit in notebook"
keys F1
wait_for "Ctrl+Q"
keys Escape
keys C-q
wait_for "EXIT=0"
grep -qF "C03,exclude,slipped digit in notebook," "$work/combustion-lab/curation.csv" || { echo "FAIL: decision not saved"; cat "$work/combustion-lab/curation.csv"; exit 1; }
echo "PASS: tui smoke (explore, filter, exclude, save, curation screen, help, quit)"
