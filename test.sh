#!/usr/bin/env bash
# Runs every Decide test. On a fresh Debian machine that has only the .NET 10 SDK it first installs what the
# tests need, then builds in Release and runs all test projects. The last line is always "N passed, N failed".
set -uo pipefail
cd "$(dirname "$0")"

results=artifacts/test-results
rm -rf "$results"
mkdir -p "$results"

summary() {
  local passed=0 failed=0 p f
  for trx in "$results"/*.trx; do
    [ -e "$trx" ] || continue
    p=$(grep -o '<Counters [^>]*' "$trx" | grep -o ' passed="[0-9]*"' | grep -o '[0-9]*' | head -1)
    f=$(grep -o '<Counters [^>]*' "$trx" | grep -o ' failed="[0-9]*"' | grep -o '[0-9]*' | head -1)
    passed=$((passed + ${p:-0}))
    failed=$((failed + ${f:-0}))
  done
  echo "$passed passed, $failed failed"
}

# shellcheck source=scripts/prerequisites.sh
source scripts/prerequisites.sh
ensure_test_prerequisites || { echo "Could not install the test prerequisites (see above)."; echo "0 passed, 1 failed"; exit 1; }

if ! dotnet build Decide.sln -c Release -nologo -v quiet; then
  echo "The build failed; no test ran."
  echo "0 passed, 1 failed"
  exit 1
fi

status=0
dotnet test Decide.sln -c Release --no-build -nologo \
  --logger "trx" --logger "console;verbosity=minimal" --results-directory "$results" || status=$?

# The data and service tests again, against PostgreSQL (a throwaway local cluster unless DECIDE_TEST_POSTGRES is set).
# shellcheck source=scripts/postgres.sh
source scripts/postgres.sh
if start_test_postgres; then
  trap stop_test_postgres EXIT
  dotnet test tests/Decide.Web.Tests -c Release --no-build -nologo \
    --logger "trx;LogFilePrefix=postgres" --logger "console;verbosity=minimal" --results-directory "$results" || status=$?
  stop_test_postgres
  trap - EXIT
else
  echo "PostgreSQL could not be started: the PostgreSQL run of the service tests counts as failed."
  echo '<Counters total="1" executed="1" passed="0" failed="1" />' > "$results/postgres-not-started.trx"
  status=1
fi

summary
exit $status
