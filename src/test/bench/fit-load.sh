#!/usr/bin/env bash
# Load test of the stateless fit endpoint: starts target/trendwright.jar on a fresh data directory
# (SQLite, no demo data), creates the first admin with a known setup code and a read-write API
# token, warms up, then runs wrk with src/test/bench/fit-120.lua and reports the server's CPU time
# per request (process user+system time from /proc over the measured run) beside wrk's figures.
# Usage: src/test/bench/fit-load.sh [port=7300] [seconds=60] [connections=64] [warm-up seconds=15]
# The server runs with -Xmx512m and the JVM options README recommends for a team server
# (JVM_OPTIONS, default "-XX:+UseParallelGC -XX:+UseTransparentHugePages"; JVM_OPTIONS= runs the
# JVM's defaults). Extra JVM options: JAVA_OPTS (e.g. -XX:StartFlightRecording=...). SERVER_LOG=<file> keeps the
# server's log (one line per request with its ms, for the server-side latency). Loopback only.
set -euo pipefail
port=${1:-7300}
seconds=${2:-60}
connections=${3:-64}
warmup=${4:-15}
here=$(cd "$(dirname "$0")" && pwd)
data=$(mktemp -d /tmp/tw-fit-load.XXXXXX)
code="fit-load-setup-$RANDOM$RANDOM"
TRENDWRIGHT_SETUP_CODE=$code java -Xmx512m ${JVM_OPTIONS--XX:+UseParallelGC -XX:+UseTransparentHugePages} ${JAVA_OPTS:-} -jar "$here/../../../target/trendwright.jar" \
    --port="$port" --data-dir="$data" --no-demo-data > "$data/server.log" 2>&1 &
server=$!
trap 'kill $server 2>/dev/null || true; wait $server 2>/dev/null || true; if [ -n "${SERVER_LOG:-}" ]; then cp "$data/server.log" "$SERVER_LOG"; fi; rm -rf "$data"' EXIT
base=http://127.0.0.1:$port
for _ in $(seq 1 300); do
  curl -sf "$base/health" > /dev/null 2>&1 && break
  sleep 0.1
done
setup=$(curl -sf -c "$data/jar" -H 'Content-Type: application/json' -X POST "$base/api/setup" \
  -d "{\"setupCode\": \"$code\", \"username\": \"bench\", \"password\": \"a long bench passphrase 2026\"}")
csrf=$(sed 's/.*"csrfToken":"\([^"]*\)".*/\1/' <<< "$setup")
TOKEN=$(curl -sf -b "$data/jar" -X POST "$base/api/tokens" -H "X-CSRF-Token: $csrf" \
  -H 'Content-Type: application/json' -d '{"name": "bench", "scope": "read-write"}' \
  | sed 's/.*"token":"\([^"]*\)".*/\1/')
export TOKEN
ticks=$(getconf CLK_TCK)
cpu() { awk '{print $14 + $15}' "/proc/$server/stat"; }
echo "warm-up ${warmup}s"
wrk -t2 -c"$connections" -d"${warmup}s" -s "$here/fit-120.lua" "$base" | tail -1
sleep 2
echo "load before: $(cut -d' ' -f1-3 /proc/loadavg)"
before=$(cpu)
out=$(wrk -t2 -c"$connections" -d"${seconds}s" --latency -s "$here/fit-120.lua" "$base")
after=$(cpu)
echo "$out"
echo "load after: $(cut -d' ' -f1-3 /proc/loadavg)"
requests=$(sed -n 's/^requests=\([0-9]*\) .*/\1/p' <<< "$out")
awk -v c=$((after - before)) -v t="$ticks" -v r="$requests" \
  'BEGIN { printf "server CPU %.1f s for %d requests: %.3f ms CPU per request (%.0f requests per CPU-second)\n", c / t, r, 1000 * c / t / r, r / (c / t) }'
echo "server RSS: $(ps -o rss= -p $server) kB"
