#!/usr/bin/env bash
# Runs every test project from a fresh clone: installs what is missing, restores, builds with warnings as errors,
# runs the tests, and ends with one line "N passed, N failed[, N skipped]". Exits non-zero on any failure or if no test ran.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1
export CsCheck_Iter="${CsCheck_Iter:-10000}"   # full-size property and fuzz runs (CsCheck's default is 100: the fast loop)

results=test-artifacts/results
rm -rf "$results"
mkdir -p "$results"

need_apt=()
command -v chromium >/dev/null 2>&1 || need_apt+=(chromium)
command -v pdftoppm >/dev/null 2>&1 || need_apt+=(poppler-utils)
if [ ${#need_apt[@]} -gt 0 ]; then
  echo "Installing ${need_apt[*]} (browser and PDF tests need them)"
  if [ "$(id -u)" -eq 0 ]; then
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${need_apt[@]}" >/dev/null
  else
    sudo apt-get update -qq && sudo DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${need_apt[@]}" >/dev/null
  fi
fi

dotnet tool restore >/dev/null
dotnet restore LowVisionAid.sln
dotnet build LowVisionAid.sln --no-restore -c Release -warnaserror

status=0
for project in tests/*/*.Tests.csproj; do
  name=$(basename "$project" .csproj)
  echo "== $name"
  dotnet test "$project" --no-build -c Release \
    --logger "trx;LogFileName=$name.trx" --results-directory "$results" || status=1
done

passed=0; failed=0; skipped=0; files=0
for trx in "$results"/*.trx; do
  [ -f "$trx" ] || continue
  files=$((files + 1))
  counters=$(grep -o '<Counters [^>]*>' "$trx" | head -n 1)
  get() { echo "$counters" | grep -o " $1=\"[0-9]*\"" | grep -o '[0-9]*' || echo 0; }
  p=$(get passed); f=$(get failed); t=$(get total); e=$(get executed)
  passed=$((passed + p)); failed=$((failed + f)); skipped=$((skipped + t - e))
done

if [ "$files" -eq 0 ] || [ $((passed + failed)) -eq 0 ]; then
  echo "No test ran."
  status=1
fi
[ "$failed" -eq 0 ] || status=1

if [ "$skipped" -gt 0 ]; then
  echo "$passed passed, $failed failed, $skipped skipped"
else
  echo "$passed passed, $failed failed"
fi
exit $status
