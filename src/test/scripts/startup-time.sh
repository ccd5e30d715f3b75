#!/usr/bin/env bash
# Measures start-up to first answered request: starts target/trendwright.jar (build it first with
# `mvn -q -B package -DskipTests`) on a free port with a new data directory, polls GET /health
# every 10 ms, and prints the wall time until the first 200 and the CPU time the JVM had used by
# then. Run 1 is a first start (creates the SQLite file, migrates, loads the demo data); later runs
# reuse that store. Usage: src/test/scripts/startup-time.sh [runs] [port]
set -euo pipefail
runs=${1:-5}
port=${2:-7199}
jar="$(cd "$(dirname "$0")/../../.." && pwd)/target/trendwright.jar"
data=$(mktemp -d)
ticks=$(getconf CLK_TCK)
trap 'rm -rf "$data"' EXIT
for run in $(seq 1 "$runs"); do
  start=$(date +%s%N)
  java -jar "$jar" --port="$port" --data-dir="$data" >"$data/run$run.log" 2>&1 &
  pid=$!
  until curl -sf -o /dev/null "http://127.0.0.1:$port/health"; do
    if ! kill -0 "$pid" 2>/dev/null; then echo "server exited; see $data/run$run.log" >&2; exit 1; fi
    sleep 0.01
  done
  end=$(date +%s%N)
  read -r utime stime < <(awk '{print $14, $15}' "/proc/$pid/stat")
  kill "$pid"
  wait "$pid" || true
  echo "run $run: first answer after $(( (end - start) / 1000000 )) ms wall, $(( (utime + stime) * 1000 / ticks )) ms CPU"
done
echo "load average: $(cut -d' ' -f1-3 /proc/loadavg)"
