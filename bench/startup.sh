#!/usr/bin/env bash
# Start-up of the installed tool against a bare hello-world built the same way (framework-dependent, ReadyToRun,
# this machine's platform): the median of N runs of `gemindex --version` and of the hello-world, and the time from
# launch to the text UI's first usable screen (tmux, 80x24, warm catalogue cache). Usage:
#   bench/startup.sh [N]            packs and installs the tool into a temp folder first (a minute or two)
#   bench/startup.sh [N] TOOLDIR    uses a tool already installed in TOOLDIR (dotnet tool install --tool-path TOOLDIR)
set -euo pipefail
cd "$(dirname "$0")/.."
runs=${1:-10}
tmp=$(mktemp -d); trap 'tmux kill-session -t gi-startup 2>/dev/null || true; rm -rf "$tmp"' EXIT
rid=$(dotnet --info | awk '/^ *RID:/ { print $2; exit }')

if [[ $# -ge 2 ]]; then tools=$2; else
  dotnet pack src/GemIndex -c Release -v q -p:RuntimeIdentifiers="$rid" -p:PackageOutputPath="$tmp/nupkg" >/dev/null
  dotnet tool install --tool-path "$tmp/tools" --add-source "$tmp/nupkg" gemindex >/dev/null
  tools=$tmp/tools
fi

mkdir -p "$tmp/hello"
cat > "$tmp/hello/hello.csproj" <<'XML'
<Project Sdk="Microsoft.NET.Sdk">
  <PropertyGroup>
    <OutputType>Exe</OutputType><TargetFramework>net10.0</TargetFramework>
    <InvariantGlobalization>true</InvariantGlobalization><ImplicitUsings>enable</ImplicitUsings>
  </PropertyGroup>
</Project>
XML
echo 'Console.WriteLine("0.0.0");' > "$tmp/hello/Program.cs"
dotnet publish "$tmp/hello" -c Release -r "$rid" --self-contained false -p:PublishReadyToRun=true -o "$tmp/hello/out" -v q >/dev/null

# median_ms CMD...: the median wall time of $runs runs (after two warm-up runs), in ms.
median_ms() {
  python3 - "$runs" "$@" <<'PY'
import statistics, subprocess, sys, time
runs, cmd = int(sys.argv[1]), sys.argv[2:]
times = []
for i in range(runs + 2):
    start = time.perf_counter()
    subprocess.run(cmd, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL, check=True)
    times.append(time.perf_counter() - start)
print(f"{statistics.median(times[2:]) * 1000:.0f}")
PY
}
hello=$(median_ms "$tmp/hello/out/hello")
version=$(median_ms "$tools/gemindex" --version)
echo "hello-world: $hello ms; gemindex --version: $version ms; ratio $(python3 -c "print(f'{$version / $hello:.2f}')") (median of $runs)"

# The text UI: from launch to the bench screen with its first field ready (warm catalogue cache, new workbook).
export XDG_CACHE_HOME="$tmp/cache" XDG_DATA_HOME="$tmp/data"
"$tools/gemindex" catalogue check >/dev/null
marker=${GEMINDEX_FIRST_SCREEN_MARKER:-"[F3 RI]"}
times=()
for i in $(seq "$runs"); do
  rm -f "$tmp/wb.db"
  start=$(date +%s%N)
  tmux new-session -d -s gi-startup -x 80 -y 24 "'$tools/gemindex' --workbook '$tmp/wb.db' --new"
  until tmux capture-pane -p -t gi-startup 2>/dev/null | grep -qF -- "$marker"; do sleep 0.005; done
  end=$(date +%s%N)
  tmux kill-session -t gi-startup
  times+=($(( (end - start) / 1000000 )))
done
sorted=$(printf '%s\n' "${times[@]}" | sort -n)
echo "text UI first screen (ms): $(echo $sorted | tr '\n' ' '); median $(echo "$sorted" | sed -n "$(( (runs + 1) / 2 ))p") ms"
