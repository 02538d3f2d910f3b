#!/usr/bin/env bash
# Runs every test project from a fresh clone: installs what is missing (scripts/bootstrap.sh), restores, builds with
# warnings as errors, runs the tests on SQLite and the database suites (Web, Reliability) again against a throwaway
# PostgreSQL server on loopback (scripts/test-server.sh; if it cannot start, that counts as a failure), in two lanes
# (the browser suite's beside the others), and
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

# The throwaway PostgreSQL server on loopback for the second run of the database suites (Web, Reliability), started
# before the build, whose two cores are not all busy.
server=$(mktemp -d "${TMPDIR:-/tmp}/lva-test-server.XXXXXX")
trap 'bash scripts/test-server.sh stop "$server"' EXIT
server_connection=
if bash scripts/test-server.sh start "$server"; then
  server_connection=$(cat "$server/connection")
else
  echo "The PostgreSQL test server did not start: the server run counts as failed."
  echo 1 > "$results/PostgreSqlServer.exit"
fi

dotnet restore LowVisionAid.sln
dotnet build LowVisionAid.sln --no-restore -c Release -warnaserror

# One project's tests: its TRX and its exit code (for count-results.sh) in the results folder, under <name>.
run_tests() {
  local project=$1 name=$2 filter=$3 code=0
  echo "== $name"
  dotnet test "$project" --no-build -c Release --filter "$filter" \
    --logger "trx;LogFileName=$name.trx" --results-directory "$results" || code=$?
  echo "$code" > "$results/$name.exit"
}

# On SQLite, without the tests that need the server.
run_on_sqlite() { run_tests "$1" "$(basename "$1" .csproj)" "Category!=ServerOnly"; }

# The same app on the shared PostgreSQL server: a database suite again, without the tests about the SQLite file itself
# and those that never touch the database. The fuzz sizes already ran in full on SQLite; here they are about the
# provider, at a tenth of the size.
run_on_server() {
  [ -n "$server_connection" ] || return 0
  CsCheck_Iter=$(( CsCheck_Iter / 10 > 100 ? CsCheck_Iter / 10 : 100 )) LVA_TEST_POSTGRES=$server_connection \
    run_tests "$1" "$(basename "$1" .csproj).PostgreSql" "Category!=SqliteFile&Category!=NoDatabase"
}

# Two lanes, one a core. The browser suite runs its tests one at a time and keeps the two cores about 70 % busy
# (chromium waits on the app and the app on chromium), so it runs beside the other projects, then the web suite's
# server run; its output is kept apart and printed when it ends. The other lane: every other project on SQLite, then
# the reliability suite's server run.
browser=tests/LowVisionAid.Browser.Tests/LowVisionAid.Browser.Tests.csproj
web=tests/LowVisionAid.Web.Tests/LowVisionAid.Web.Tests.csproj
reliability=tests/LowVisionAid.Reliability.Tests/LowVisionAid.Reliability.Tests.csproj
{ run_on_sqlite "$browser"; run_on_server "$web"; } > "$results/browser-lane.log" 2>&1 &
browser_lane=$!
for project in tests/*/*.Tests.csproj; do
  [ "$project" = "$browser" ] || run_on_sqlite "$project"
done
run_on_server "$reliability"
lane_code=0
wait "$browser_lane" || lane_code=$?
cat "$results/browser-lane.log"
if [ "$lane_code" -ne 0 ]; then
  # Each project writes its own exit code; a lane cut short may not have, so the lane's own failure is counted too.
  echo "The browser lane ended with exit code $lane_code: counted as failed."
  echo "$lane_code" > "$results/BrowserLane.exit"
fi

bash scripts/count-results.sh "$results"
