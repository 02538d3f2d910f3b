#!/usr/bin/env bash
# Sums the test results in a folder and prints the closing line "N passed, N failed[, N skipped]".
# Reads <folder>/<project>.trx (VSTest's TRX) and <folder>/<project>.exit (the exit code of that project's
# `dotnet test`). A run that did not finish cleanly counts as failed, so a crashed test host never reads "0 failed":
#   - a project whose dotnet test exited non-zero with no TRX counts 1 failed;
#   - the TRX counters error, timeout, aborted and notExecuted count as failed;
#   - a TRX whose run outcome is not Completed (Failed, Aborted, Error, Timeout...) or whose dotnet test exited
#     non-zero, yet shows no failed test, counts 1 failed (the host crashed or the run was cut short);
#   - xunit's skipped tests (counted in total but not in executed, and not as notExecuted) are reported as skipped.
# Exits 0 only when something passed and nothing failed.
set -euo pipefail
results=${1:?usage: count-results.sh <results folder>}

passed=0; failed=0; skipped=0; projects=0
counter() { echo "$2" | grep -o " $1=\"[0-9]*\"" | grep -o '[0-9]*' || echo 0; }

for exit_file in "$results"/*.exit; do
  [ -f "$exit_file" ] || continue
  projects=$((projects + 1))
  name=$(basename "$exit_file" .exit)
  code=$(tr -dc '0-9' < "$exit_file"); code=${code:-1}
  trx="$results/$name.trx"
  if [ ! -f "$trx" ]; then
    if [ "$code" -ne 0 ]; then
      echo "$name: dotnet test exited $code and wrote no results (build or test host failure): counted as 1 failed"
      failed=$((failed + 1))
    else
      echo "$name: dotnet test wrote no results"
    fi
    continue
  fi

  counters=$(grep -o '<Counters [^>]*>' "$trx" | head -n 1 || true)
  outcome=$(grep -o '<ResultSummary outcome="[A-Za-z]*"' "$trx" | head -n 1 | sed 's/.*outcome="\([A-Za-z]*\)"/\1/' || true)
  p=$(counter passed "$counters"); f=$(counter failed "$counters")
  e=$(counter error "$counters"); t=$(counter timeout "$counters"); a=$(counter aborted "$counters")
  n=$(counter notExecuted "$counters"); total=$(counter total "$counters"); executed=$(counter executed "$counters")
  bad=$((f + e + t + a + n))
  if [ "$bad" -eq 0 ] && { [ "$code" -ne 0 ] || { [ -n "$outcome" ] && [ "$outcome" != "Completed" ]; }; }; then
    echo "$name: the run did not complete (outcome ${outcome:-none}, dotnet test exit $code) with no failed test recorded: counted as 1 failed"
    bad=1
  elif [ $((e + t + a + n)) -gt 0 ]; then
    echo "$name: $e errored, $t timed out, $a aborted, $n not executed: counted as failed"
  fi
  s=$((total - executed - n)); [ "$s" -ge 0 ] || s=0
  passed=$((passed + p)); failed=$((failed + bad)); skipped=$((skipped + s))
done

status=0
if [ "$projects" -eq 0 ] || [ $((passed + failed)) -eq 0 ]; then
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
