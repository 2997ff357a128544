#!/usr/bin/env bash
# End-to-end test of the text UI: runs the built app (it builds nothing; CI builds first) in tmux at 80x24 with a
# throw-away HOME and workbook, types a quartz-like stone, checks the identification, quits, reopens and checks the
# stone is intact. Prints PASS or FAIL with the screen, exits non-zero on failure.
set -euo pipefail
cd "$(dirname "$0")/../.."

dll=$(ls -t src/GemIndex/bin/*/net10.0/gemindex.dll 2>/dev/null | head -n 1 || true)
[[ -n "$dll" ]] || { echo "FAIL tui e2e: no built gemindex.dll (run dotnet build GemIndex.sln first)"; exit 1; }
command -v tmux >/dev/null || { echo "FAIL tui e2e: tmux is not installed"; exit 1; }

tmp=$(mktemp -d)
session="gemindex-e2e-$$"
workbook="$tmp/bench.db"
cleanup() { tmux kill-session -t "$session" 2>/dev/null || true; rm -rf "$tmp"; }
trap cleanup EXIT

screen() { tmux capture-pane -p -t "$session"; }
fail() { echo "FAIL tui e2e: $1"; echo "---- screen ----"; screen || true; echo "----------------"; exit 1; }

# wait_for TEXT [SECONDS]: polls the pane until TEXT (a fixed string) shows.
wait_for() {
  local deadline=$((SECONDS + ${2:-20}))
  until screen | grep -qF -- "$1"; do
    (( SECONDS < deadline )) || fail "did not see '$1'"
    sleep 0.2
  done
}

start() {
  tmux new-session -d -s "$session" -x 80 -y 24 \
    "env HOME='$tmp' XDG_DATA_HOME='$tmp/data' XDG_CACHE_HOME='$tmp/cache' dotnet '$dll' --new --workbook '$workbook'; echo \"EXIT=\$?\"; sleep 600"
  wait_for "[F3 RI]" 60
}

keys() { tmux send-keys -t "$session" "$@"; sleep 0.15; }
text() { tmux send-keys -t "$session" -l "$1"; sleep 0.15; }

start
# Refractometer page: two rotation steps (rotation is offered; type low, Tab, high, Enter).
text "1.544"; keys Tab; text "1.553"; keys Enter
wait_for "0°  1.544    1.553"
text "1.544"; keys Tab; text "1.548"; keys Enter
wait_for "15°  1.544    1.548"
# SG page: typed directly.
keys F4; text "2.65"
wait_for "SG 2.650 ± 0.010"
# Stone page: reference and colour.
keys F2; tmux send-keys -t "$session" C-a; text "e2e ring"; keys Tab Tab Tab Tab Tab; text "colourless"
wait_for "e2e ring"
wait_for "Best:"
# The ranking follows the typing in the background: wait for it to take the colour in.
deadline=$((SECONDS + 20))
# (Before the colour counts, rock crystal and amethyst tie: wait until amethyst has dropped from second place.)
until screen | grep -qE "^.*│1 (rock crystal|quartz|synthetic colo)" && ! screen | grep -qE "^.*│2 amethyst"; do
  (( SECONDS < deadline )) || fail "quartz is not the first candidate"
  sleep 0.2
done
screen | grep -qF "n 1.544 – 1.553" || fail "the derived indices are not shown"
echo "---- 80x24 after entering the stone ----"; screen
# Scales (Ctrl+R): the readings against the top candidates' ranges.
keys C-r
wait_for "lowest index"
wait_for "birefringence"
screen | grep -qE "^.1 (rock crystal|quartz|synthetic co).*=#=.* in " || fail "the first candidate's range does not hold the reading on the scales"
echo "---- 80x24 scales ----"; screen
keys Escape
# Export (Ctrl+E): three reports beside the workbook, named after the reference and the stone's number.
keys C-e
wait_for "Reports written"
for ext in md html json; do
  report=$(ls "$tmp"/reports/e2e_ring-s*."$ext" 2>/dev/null | head -n 1 || true)
  [[ -s "$report" ]] || fail "no $tmp/reports/e2e_ring-s*.$ext"
  grep -qF "e2e ring" "$report" || fail "$report does not name the stone"
done
keys Enter
keys C-q
wait_for "EXIT=0" 15

tmux kill-session -t "$session"
start
wait_for "e2e ring"
wait_for "0°  1.544    1.553"
wait_for "15°  1.544    1.548"
keys F4
wait_for "SG direct    2.65"
keys F2
wait_for "colourless"
keys C-q
wait_for "EXIT=0" 15
echo "PASS tui e2e: stone entered, identified, scaled, exported, saved and reopened intact"
