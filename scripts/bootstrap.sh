#!/usr/bin/env bash
# Installs what the tests need beyond the .NET SDK: Debian's chromium-headless-shell (browser tests: Debian's chromium
# built as the headless shell, which the tests drive faster than the full browser), poppler-utils (pdftoppm,
# PDF page images) and postgresql (the database suites' second run, on a throwaway server: scripts/test-server.sh),
# when missing, and the repository's local dotnet tools. Safe to run again; scripts/test.sh calls it.
set -euo pipefail
cd "$(dirname "$0")/.."

need_apt=()
command -v chromium-headless-shell >/dev/null 2>&1 || need_apt+=(chromium-headless-shell)
command -v pdftoppm >/dev/null 2>&1 || need_apt+=(poppler-utils)
ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1 || need_apt+=(postgresql)
if [ ${#need_apt[@]} -gt 0 ]; then
  echo "Installing ${need_apt[*]} (browser, PDF and server tests need them)"
  sudo_cmd=()
  [ "$(id -u)" -eq 0 ] || sudo_cmd=(sudo)
  "${sudo_cmd[@]}" apt-get update -qq
  "${sudo_cmd[@]}" env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${need_apt[@]}" >/dev/null
fi

dotnet tool restore >/dev/null
