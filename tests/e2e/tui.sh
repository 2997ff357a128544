#!/usr/bin/env bash
# End-to-end test of the text UI, keyboard only at 80x24: runs the built app (it builds nothing; CI builds first) in
# tmux with a throw-away HOME and workbook. Three stones, each checked by the species that leads the answer:
#   1. a uniaxial series: quartz, ω 1.544 constant, ε' moving up to 1.553, SG 2.65 (common practice handbook values);
#   2. over the limit with SG 5.80: cubic zirconia (SG 5.6–6.0, index 2.15 above any contact liquid; common practice);
#   3. a biaxial series: peridot, α 1.654, β 1.672, γ 1.690 (common practice handbook values), SG 3.34 from weights
#      in air and water (1.670 ct, 1.170 ct: 1.670 / 0.500 = 3.34);
#   4. blue corundum, ω 1.770, ε 1.762, SG 4.00 (common practice handbook values), then on the loupe page curved striae
#      seen and needles (silk) looked for and not seen: melt growth, so a flame-fusion synthetic leads the candidates.
# Along the way: the focus order of every page, the rotation step set once and remembered, candidate 3 reached from
# the keyboard with its detail, the scales, the examiner set once and named in the export, an SG typed over weights
# (the clash said on the SG page); then a kill -9 while typing and the stone reopened whole.
# Prints PASS or FAIL with the screen, exits non-zero on failure.
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

# wait_match REGEX [SECONDS]: the same for an extended regular expression.
wait_match() {
  local deadline=$((SECONDS + ${2:-20}))
  until screen | grep -qE -- "$1"; do
    (( SECONDS < deadline )) || fail "did not see /$1/"
    sleep 0.2
  done
}

start() {
  tmux new-session -d -s "$session" -x 80 -y 24 \
    "env HOME='$tmp' XDG_DATA_HOME='$tmp/data' XDG_CACHE_HOME='$tmp/cache' dotnet '$dll' --new --workbook '$workbook'; echo \"EXIT=\$?\"; sleep 600"
  # The bench opens on the page last gone to (the refractometer's on a new workbook).
  wait_match '\[(F2 Stone|F3 RI|F4 SG|F5 Tests|\^L Loupe)\]' 60
}

keys() { tmux send-keys -t "$session" "$@"; sleep 0.15; }
# scroll_until TEXT: ↓ one line at a time (the answer scrolls) until TEXT is on the screen; fail after 40 lines.
scroll_until() {
  local lines=0
  until screen | grep -qF -- "$1"; do
    (( lines++ < 40 )) || fail "did not see '$1' scrolling down"
    keys Down
  done
}
text() { tmux send-keys -t "$session" -l "$1"; sleep 0.15; }

# step LOW HIGH: types one rotation step on the RI page's edit line (the cursor is in the low edge) and stores it.
step() { text "$1"; keys Tab; text "$2"; keys Enter; }

start
# ---- stone 1: a uniaxial series (quartz) ----
# RI page focus order: the page opens at the low edge; Tab: high edge, steps, spot, over limit, rotation step.
keys Tab Tab Tab Tab Tab; text "45"
wait_for "Rotation step 45"
keys F3                                   # back at the low edge, not in the rotation step
step 1.544 1.553
wait_for "0°  1.544     1.553"
wait_match "^.45 +"                       # the next rotation offered: the step set above
step 1.544 1.551
step 1.544 1.548
step 1.544 1.551
wait_for "135°  1.544     1.551"
# SG page opens at the SG.
keys F4; text "2.65"
wait_for "SG 2.65 ± 0.01 as typed"
# Tests page opens at the polariscope; Tab: pleochroism.
keys F5; text "d"; keys Tab; text "n"
wait_for "Polariscope   [doubly refractive]"
wait_for "Pleochroism   [none]"
# Stone page opens at the reference; Tab x5: the cut (f: faceted), Tab: colour.
keys F2; text "e2e quartz"; keys Tab Tab Tab Tab Tab; text "f"; keys Tab; text "colourless"
wait_for "Cut           [faceted]"
wait_for "Colour        colourless"
wait_match "│Quartz [<>]?[0-9]+%"
echo "---- 80x24 stone 1 ----"; screen
# The readings used sit below the lead and the candidates at 80x24: reached by scrolling the answer from the keyboard.
keys F10
wait_for "Enter detail │ F10 or Esc back"
for _ in 1 2 3 4 5 6 7 8 9 10 11 12; do screen | grep -qF "Refractive indices: ω 1.544, ε 1.553" && break; keys Down Down Down; sleep 0.3; done
wait_for "Refractive indices: ω 1.544, ε 1.553"
keys PgUp PgUp PgUp
keys Escape
wait_for "Tab next field │"
# Candidate 3 and its detail, from the keyboard: F10 to the answer, two rows down, Enter.
keys F10
wait_for "Enter detail │ F10 or Esc back"
keys Down Down Enter
wait_match "^.3\. [a-z]"
wait_for "NEXT TEST"
# The entry's catalogue values follow the reasons: paged down to from the keyboard.
for _ in 1 2 3 4 5 6; do screen | grep -qF "CATALOGUE ENTRY" && break; keys PgDn; sleep 0.3; done
wait_for "CATALOGUE ENTRY"
echo "---- 80x24 candidate 3 ----"; screen
keys Escape
keys Escape                               # out of the answer, back to the form
wait_for "Tab next field │"
# Scales (Ctrl+R): the readings against the top candidates' ranges.
keys C-r
wait_for "lowest index"
wait_for "birefringence"
screen | grep -qE "^. ?1 (rock crystal|quartz|synthetic co)[^#]*#.* in " || fail "the first candidate's range does not hold the reading on the scales"
keys Escape
# The examiner, typed once at the foot of the stone page (Tab x9 from the reference), kept in the workbook.
keys F2 Tab Tab Tab Tab Tab Tab Tab Tab Tab; text "E2E Examiner"
wait_for "Examiner      E2E Examiner"
# Export (Ctrl+E): the reports beside the workbook, named after the reference, headed by the examiner.
keys C-e
wait_for "Reports written"
wait_for "Examiner: E2E Examiner"
for ext in md html json; do
  ls "$tmp"/reports/e2e_quartz*."$ext" >/dev/null 2>&1 || fail "no $tmp/reports/e2e_quartz*.$ext"
done
grep -qF "**Examiner:** E2E Examiner" "$tmp"/reports/e2e_quartz*.md || fail "the report does not name the examiner"
keys Enter

# ---- stone 2: over the limit (cubic zirconia) ----
keys C-n
wait_for "[F2 Stone]"
text "e2e cz"                             # a new stone opens at its reference
wait_for "Reference     e2e cz"
keys F3; keys Tab Tab Tab Tab; text "y"
wait_for "Over limit    [yes]"
keys F4; text "5.80"
wait_match "│Cubic zirconia [<>]?[0-9]+%"
# The readings used sit below the candidates (grouped by species under their headings): F10 and ↓ reach them.
keys F10
wait_for "Enter detail │ F10 or Esc back"
scroll_until "Over the limit: index above the"
echo "---- 80x24 stone 2 ----"; screen
keys Escape
wait_for "Tab next field │"

# ---- stone 3: a biaxial series (peridot), SG from weights ----
keys C-n; text "e2e peridot"
keys F3
step 1.654 1.690
wait_match "^. +0°  1.654     1.690"
wait_match "^.45 +"                       # the rotation step is remembered for the next stone
step 1.662 1.686
step 1.672 1.682
step 1.664 1.685
# SG page focus order: SG, in air, in water.
keys F4; keys Tab; text "1.670"; keys Tab; text "1.170"
wait_match "SG 3\.3[0-9] ± 0\.[0-9]{2} from the weights"
wait_match "│Forsterite [<>]?[0-9]+%"
# An SG typed over the weights is a clash said on the SG page: both values, neither used; cleared, the weights count again.
keys F4; text "3.60"
wait_for "!! SG typed 3.600, weighed 3.3"
wait_for "disagree. Neither is used; clear the"
echo "---- 80x24 SG clash ----"; screen
keys BSpace BSpace BSpace BSpace
wait_match "SG 3\.3[0-9] ± 0\.[0-9]{2} from the weights"
wait_for "Optic character: biaxial"
echo "---- 80x24 stone 3 ----"; screen

# ---- a kill while typing (a note, and a step not yet stored), then the stone reopened ----
keys F2; keys Tab Tab Tab Tab Tab Tab Tab Tab; text "typed before the kill"
wait_for "Notes         typed before the"
keys F3; text "1.660"; keys Tab; text "1.687"   # a step half done: typed, Enter not pressed
wait_match "^.[0-9]{1,3}(\.[0-9]+)? +1\.660 +1\.687"
sleep 1                                   # the save runs in the background a moment after each key
pane=$(tmux display-message -p -t "$session" '#{pane_pid}')
app=$(pgrep -P "$pane" -f gemindex.dll | head -n 1 || true)
[[ -n "$app" ]] || fail "could not find the running app under the pane"
kill -9 "$app"
wait_for "EXIT=137" 15
tmux kill-session -t "$session"
start
wait_for "[F3 RI]"                         # back on the page the typing was on
wait_for "e2e peridot"
wait_for "0°  1.654     1.690"
wait_for "135°  1.664     1.685"
wait_match "^.[0-9]{1,3}(\.[0-9]+)? +1\.660 +1\.687"   # the half-typed step is back on the edit line
keys F2
wait_for "Notes         typed before the"
keys F4
wait_for "1.170"

# ---- two stones with the same reference: both exported, neither report replaced ----
first_md=$(ls "$tmp"/reports/e2e_quartz*.md | head -n 1)
before=$(sha256sum "$first_md" | cut -d' ' -f1)
keys C-n; text "e2e quartz"                # the first stone's reference again
wait_for "Reference     e2e quartz"
keys F4; text "2.66"
wait_match "│Quartz [<>]?[0-9]+%"
keys C-e
wait_for "Reports written"
keys Enter
for ext in md html json; do
  count=$(ls "$tmp"/reports/e2e_quartz*."$ext" | wc -l)
  (( count == 2 )) || fail "expected two e2e_quartz*.$ext reports after exporting two stones of one reference, found $count"
done
[[ "$(sha256sum "$first_md" | cut -d' ' -f1)" == "$before" ]] || fail "the first stone's report was replaced"
keys C-q
wait_for "EXIT=0" 15
tmux kill-session -t "$session"

# ---- a read-only workbook: it opens, shows its stones, says so, and changes nothing ----
chmod a-w "$workbook"
wb_before=$(sha256sum "$workbook" | cut -d' ' -f1)
start
wait_for "READ-ONLY"                       # said on the key line from the start
wait_for "e2e quartz"                      # the last stone opens, readable
keys F2; text "x"                          # typing changes the form but is never saved
wait_for "READ-ONLY"
echo "---- 80x24 read-only ----"; screen
keys C-q
wait_for "EXIT=0" 15
[[ "$(sha256sum "$workbook" | cut -d' ' -f1)" == "$wb_before" ]] || fail "the read-only workbook changed"
chmod u+w "$workbook"

# ---- stone 4: blue corundum, then the loupe page (Ctrl+L) ----
tmux kill-session -t "$session"
start
keys C-n; text "e2e corundum"; keys Tab Tab Tab Tab Tab Tab; text "blue"
keys F3
step 1.762 1.770                          # the rotation step (45°) is a bench setting, kept from stone 1
step 1.765 1.770
step 1.768 1.770
step 1.765 1.770
keys F4; text "4.00"
wait_match "│Corundum [<>]?[0-9]+%"
keys C-l
wait_for "[^L Loupe]"
wait_for "Type to find a feature"
wait_for "── not looked for ─"                 # the page opens on its first feature, curved striae
wait_for "Look for: fine curved growth lines"
keys +
wait_for " yes curved striae"
text "silk"                               # typing finds; the cursor goes to the first match
wait_for "Find: silk_"
keys -
wait_for " no  needles and silk"
wait_for "── looked for, not seen ─"
keys Escape                               # the filter cleared: every feature listed again, with the counts
wait_for "Type to find        1 seen, 1 not seen"
wait_match "│ ?1 flame-fusion synthetic"   # melt growth: the flame-fusion synthetic leads (rank " 1" when ten are listed)
echo "---- 80x24 loupe ----"; screen
keys C-q
wait_for "EXIT=0" 15
tmux kill-session -t "$session"
# The stored readings hold both marks: the stone's report, read from the workbook by the command line.
json=$(env HOME="$tmp" XDG_DATA_HOME="$tmp/data" XDG_CACHE_HOME="$tmp/cache" \
  dotnet "$dll" report stone --workbook "$workbook" --stone "e2e corundum" --format json | tr -d ' \n')
grep -qF '"present":[{"feature":"curved_striae"' <<<"$json" || fail "the workbook does not hold curved_striae as seen"
grep -qF '"absent":[{"feature":"needles_silk"' <<<"$json" || fail "the workbook does not hold needles_silk as looked for and not seen"
# Restarted, the stone opens with its marks on the loupe page.
start
wait_for "e2e corundum"
keys C-l
wait_for " yes curved striae"
text "silk"                               # below the first screen of features at 80x24: typing finds it
wait_for " no  needles and silk"
keys C-q
wait_for "EXIT=0" 15
echo "PASS tui e2e: four stones identified by species, focus order, candidate 3 and its detail, scales, examiner in the export, SG clash, kill and reopen, colliding references exported without loss, a read-only workbook, magnification marks saved and shown again"
