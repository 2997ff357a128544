#!/usr/bin/env bash
# Launch-to-first-screen benchmark of the text UI: starts the built app in tmux (80x24) N times with a fresh
# workbook and a warm catalogue cache, and reports the time until the bench screen is drawn. Usage:
#   dotnet build GemIndex.sln -c Release && bench/tui-launch.sh [N] [PATH/gemindex.dll]
# For the ahead-of-time compiled (ReadyToRun) build that the README's install step makes:
#   dotnet publish src/GemIndex -c Release -r linux-x64 --self-contained false -p:PublishReadyToRun=true -o /tmp/gi
#   bench/tui-launch.sh 10 /tmp/gi/gemindex.dll
set -euo pipefail
cd "$(dirname "$0")/.."
runs=${1:-10}
dll=${2:-src/GemIndex/bin/Release/net10.0/gemindex.dll}
[[ -f "$dll" ]] || { echo "build first: dotnet build GemIndex.sln -c Release"; exit 1; }
tmp=$(mktemp -d); trap 'tmux kill-session -t gi-launch 2>/dev/null || true; rm -rf "$tmp"' EXIT
env XDG_CACHE_HOME="$tmp/cache" XDG_DATA_HOME="$tmp/data" dotnet "$dll" catalogue check >/dev/null   # warm the catalogue cache
times=()
for i in $(seq "$runs"); do
  rm -f "$tmp/wb.db"
  start=$(date +%s%N)
  tmux new-session -d -s gi-launch -x 80 -y 24 "env XDG_CACHE_HOME='$tmp/cache' XDG_DATA_HOME='$tmp/data' dotnet '$dll' --new --workbook '$tmp/wb.db'"
  until tmux capture-pane -p -t gi-launch 2>/dev/null | grep -qF "[F3 RI]"; do sleep 0.01; done
  end=$(date +%s%N)
  tmux kill-session -t gi-launch
  times+=($(( (end - start) / 1000000 )))
done
sorted=$(printf '%s\n' "${times[@]}" | sort -n)
echo "launch to first screen over $runs runs (ms): $(echo $sorted | tr '\n' ' ')"
echo "median: $(echo "$sorted" | sed -n "$(( (runs + 1) / 2 ))p") ms"
