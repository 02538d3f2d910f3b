#!/usr/bin/env bash
# Runs every test project from a fresh clone: installs what is missing (scripts/bootstrap.sh), restores, builds with
# warnings as errors, runs the tests on SQLite (the browser suite beside the others), then runs the database suites (Web, Reliability) again against a
# throwaway PostgreSQL server on loopback (scripts/test-server.sh; if it cannot start, that counts as a failure), and
# ends with one line "N passed, N failed[, N skipped]" (scripts/count-results.sh, which counts a crashed or aborted run
# as failed). Exits non-zero on any failure or if no test ran.
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

# One project's tests on SQLite: its TRX and its exit code (for count-results.sh) in the results folder.
run_project() {
  local project=$1 name code=0
  name=$(basename "$project" .csproj)
  echo "== $name"
  dotnet test "$project" --no-build -c Release --filter "Category!=ServerOnly" \
    --logger "trx;LogFileName=$name.trx" --results-directory "$results" || code=$?
  echo "$code" > "$results/$name.exit"
}

# The browser suite runs its tests one at a time and keeps the two cores about 70 % busy (chromium waits on the app
# and the app on chromium), so it runs beside the other projects, its output kept apart and printed when it ends.
browser=tests/LowVisionAid.Browser.Tests/LowVisionAid.Browser.Tests.csproj
run_project "$browser" > "$results/browser-lane.log" 2>&1 &
browser_lane=$!
for project in tests/*/*.Tests.csproj; do
  [ "$project" = "$browser" ] || run_project "$project"
done
wait "$browser_lane" || true
cat "$results/browser-lane.log"

# The same app on a shared PostgreSQL server: the database suites again, without the tests about the SQLite file itself.
server=$(mktemp -d "${TMPDIR:-/tmp}/lva-test-server.XXXXXX")
trap 'bash scripts/test-server.sh stop "$server"' EXIT
if bash scripts/test-server.sh start "$server"; then
  for project in tests/LowVisionAid.Web.Tests/*.csproj tests/LowVisionAid.Reliability.Tests/*.csproj; do
    name=$(basename "$project" .csproj).PostgreSql
    echo "== $name"
    code=0
    # The fuzz sizes already ran in full on SQLite; here they are about the provider, at a tenth of the size.
    CsCheck_Iter=$(( CsCheck_Iter / 10 > 100 ? CsCheck_Iter / 10 : 100 )) LVA_TEST_POSTGRES=$(cat "$server/connection") dotnet test "$project" --no-build -c Release --filter "Category!=SqliteFile" \
      --logger "trx;LogFileName=$name.trx" --results-directory "$results" || code=$?
    echo "$code" > "$results/$name.exit"
  done
else
  echo "The PostgreSQL test server did not start: the server run counts as failed."
  echo 1 > "$results/PostgreSqlServer.exit"
fi

bash scripts/count-results.sh "$results"
