#!/usr/bin/env bash
# Container health check without curl: asks the instance's liveness endpoint over plain HTTP on loopback.
# Exit 0 when it answers 200. Port from ASPNETCORE_HTTP_PORTS (first one), 8080 by default.
set -eu
port="${ASPNETCORE_HTTP_PORTS:-8080}"
port="${port%%[,;]*}"
exec 3<>"/dev/tcp/127.0.0.1/${port}"
printf 'GET /health/live HTTP/1.0\r\nHost: localhost\r\nConnection: close\r\n\r\n' >&3
read -r status_line <&3
case "$status_line" in
  HTTP/*" 200"*) exit 0 ;;
  *) echo "unhealthy: ${status_line}" >&2; exit 1 ;;
esac
