#!/usr/bin/env bash
# Runs every test project from a fresh clone: installs what is missing (scripts/bootstrap.sh), restores, builds with
# warnings as errors, runs the tests, and ends with one line "N passed, N failed[, N skipped]" (scripts/count-results.sh,
# which counts a crashed or aborted run as failed). Exits non-zero on any failure or if no test ran.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 DOTNET_SKIP_FIRST_TIME_EXPERIENCE=1
export CsCheck_Iter="${CsCheck_Iter:-10000}"   # full-size property and fuzz runs (CsCheck's default is 100: the fast loop)

results=test-artifacts/results
rm -rf "$results"
mkdir -p "$results"

bash scripts/bootstrap.sh
dotnet restore LowVisionAid.sln
dotnet build LowVisionAid.sln --no-restore -c Release -warnaserror

for project in tests/*/*.Tests.csproj; do
  name=$(basename "$project" .csproj)
  echo "== $name"
  code=0
  dotnet test "$project" --no-build -c Release \
    --logger "trx;LogFileName=$name.trx" --results-directory "$results" || code=$?
  echo "$code" > "$results/$name.exit"
done

exec bash scripts/count-results.sh "$results"
