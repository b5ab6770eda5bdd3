#!/usr/bin/env bash
# A panel of simulated assessors rating at once against a fresh instance of the service (Release build, Production
# settings, demo seeded for its administrator account), on SQLite or on PostgreSQL, then the check that every
# acknowledged save was stored exactly once. Figures go to docs/performance.md.
#
#   bench/load.sh sqlite   [decide-load options]     e.g. --assessors 100 --rounds 2 --think-ms 1000
#   bench/load.sh postgres [decide-load options]     (a throwaway cluster with fsync on, as in production)
#
# Exit code: the load tool's (0 nothing failed or lost, 1 otherwise, 2 the run could not be prepared).
set -euo pipefail
cd "$(dirname "$0")/.."
provider="${1:-sqlite}"
[ $# -gt 0 ] && shift

dotnet build -c Release src/Decide.Web/Decide.Web.csproj -v q -nologo >/dev/null
dotnet build -c Release bench/Decide.Load/Decide.Load.csproj -v q -nologo >/dev/null

work=$(mktemp -d /tmp/decide-load.XXXXXX)
port=$(python3 -c 'import socket; s=socket.socket(); s.bind(("127.0.0.1",0)); print(s.getsockname()[1]); s.close()')
server=""
cleanup() {
  [ -n "$server" ] && kill "$server" 2>/dev/null && wait "$server" 2>/dev/null || true
  [ "$provider" = postgres ] && stop_test_postgres
  rm -rf "$work"
}
trap cleanup EXIT

export ASPNETCORE_ENVIRONMENT=Production
export ASPNETCORE_URLS="http://127.0.0.1:$port"
export Database__DataFolder="$work"
export Security__RequireHttps=false
# Every simulated assessor signs in from this one address; people sign in from many.
export Security__SignIn__PerAddressPermits=5000
export Logging__LogLevel__Default="${DECIDE_LOAD_LOG_LEVEL:-Warning}"
if [ "$provider" = postgres ]; then
  # shellcheck source=../scripts/postgres.sh
  source scripts/postgres.sh
  DECIDE_PG_FSYNC=on start_test_postgres
  export Database__Provider=Postgres
  export ConnectionStrings__Decide="$DECIDE_TEST_POSTGRES;Database=decide_load;Maximum Pool Size=100"
fi

(cd src/Decide.Web/bin/Release/net10.0 && exec dotnet Decide.Web.dll >"$work/server.log" 2>&1) &
server=$!
for _ in $(seq 1 120); do
  curl -fs "http://127.0.0.1:$port/health/ready" >/dev/null 2>&1 && break
  kill -0 "$server" 2>/dev/null || { echo "The service stopped:"; cat "$work/server.log"; exit 2; }
  sleep 0.5
done
echo "Service ready on port $port ($provider)."
ready_lines=$(wc -l <"$work/server.log")

status=0
dotnet bench/Decide.Load/bin/Release/net10.0/Decide.Load.dll --url "http://127.0.0.1:$port" "$@" || status=$?
[ -n "${DECIDE_LOAD_KEEP_LOG:-}" ] && cp "$work/server.log" "$DECIDE_LOAD_KEEP_LOG"
# Errors the service logged during the run (not while it started: creating the PostgreSQL database logs one).
if tail -n +"$((ready_lines + 1))" "$work/server.log" | grep -q 'fail:'; then
  echo "The service logged errors during the run:"; tail -n +"$((ready_lines + 1))" "$work/server.log" | grep -A3 'fail:' | head -40
  [ "$status" -eq 0 ] && status=1
fi
exit $status
