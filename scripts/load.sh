#!/usr/bin/env bash
# The load and scale harness (docs/performance.md, "At clinic-group scale"). Publishes the app as a clinic installs it
# (Release, for this system, compiled ahead of time: docs/deployment.md, "Installing the app") and builds the harness,
# then: the demo clinic from an empty folder, a copy of it with a synthetic clinic added (100,000 clients,
# 500,000 visits, 200,000 plans, 50,000 trials unless told otherwise), start-up times, and every target at 1, 5 and
# 20 concurrent clients on 127.0.0.1 only. Results: test-artifacts/load/results.md. Bounded: a fixed number of
# requests per cell (--requests, default 200). Any other option is passed on, e.g. --plans 20000; --reuse true measures
# the databases of an earlier run again without making them.
set -euo pipefail
cd "$(dirname "$0")/.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1
rid=$(dotnet --info | awk '/^ *RID:/ { print $2; exit }')
dotnet publish src/LowVisionAid.Web -c Release -r "$rid" --self-contained false -warnaserror -o test-artifacts/load/app
dotnet build benchmarks/LowVisionAid.Load -c Release -warnaserror
exec dotnet benchmarks/LowVisionAid.Load/bin/Release/net10.0/LowVisionAid.Load.dll --app test-artifacts/load/app/LowVisionAid.Web.dll "$@"
