#!/usr/bin/env bash
# Measures start-up to first answered request: starts the jar (target/trendwright.jar, or $JAR; build
# it first with `mvn -q -B package -DskipTests`) with a plain `java -jar` on a free port with a new
# data directory, polls GET /health every 10 ms, and prints the wall time until the first 200 and the
# CPU time (user + sys) the JVM had used by then. Run 1 is a first start (creates the SQLite file,
# migrates, loads the demo data); later runs are restarts on that store. Ends with the median of
# the restarts and the load average.
#
# The polling uses only bash built-ins (/dev/tcp, read -t): no curl or sleep process per attempt.
# On a 2-core machine a curl plus a sleep every 10 ms took a noticeable share of one core away from
# the JVM being measured (about 45 ms of CPU per attempt on the loaded machine).
#
# Usage: src/test/scripts/startup-time.sh [runs] [port]
set -euo pipefail
runs=${1:-5}
port=${2:-7199}
jar=${JAR:-"$(cd "$(dirname "$0")/../../.." && pwd)/target/trendwright.jar"}
data=$(mktemp -d)
ticks=$(getconf CLK_TCK)
trap 'rm -rf "$data"' EXIT
mkfifo "$data/idle"
exec {idle}<>"$data/idle"

nap() { # 10 ms without starting a process: nothing is ever written to the fifo
  read -r -t 0.01 -u "$idle" _ || true
}

answered() { # true once GET /health answers 200
  local status http
  { exec {http}<>"/dev/tcp/127.0.0.1/$port"; } 2>/dev/null || return 1
  printf 'GET /health HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: close\r\n\r\n' >&"$http"
  read -r -t 60 -u "$http" _ status _ || status=
  exec {http}>&-
  [[ $status == 200 ]]
}

now_us() {
  local t=$EPOCHREALTIME
  echo "${t/./}"
}

walls=()
cpus=()
for run in $(seq 1 "$runs"); do
  start=$(now_us)
  java -jar "$jar" --port="$port" --data-dir="$data" >"$data/run$run.log" 2>&1 &
  pid=$!
  until answered; do
    if ! kill -0 "$pid" 2>/dev/null; then echo "server exited; see $data/run$run.log" >&2; trap - EXIT; exit 1; fi
    nap
  done
  end=$(now_us)
  read -r utime stime < <(awk '{print $14, $15}' "/proc/$pid/stat")
  kill "$pid"
  wait "$pid" || true
  wall=$(( (end - start) / 1000 ))
  cpu=$(( (utime + stime) * 1000 / ticks ))
  kind=$([[ $run == 1 ]] && echo "first start" || echo "restart")
  echo "run $run ($kind): first answer after $wall ms wall, $cpu ms CPU"
  if (( run > 1 )); then walls+=("$wall"); cpus+=("$cpu"); fi
done
median() { printf '%s\n' "$@" | sort -n | awk '{v[NR]=$1} END {print (NR % 2 ? v[(NR+1)/2] : int((v[NR/2]+v[NR/2+1])/2))}'; }
if (( ${#walls[@]} > 0 )); then
  echo "restarts: median $(median "${walls[@]}") ms wall, $(median "${cpus[@]}") ms CPU"
fi
echo "load average: $(cut -d' ' -f1-3 /proc/loadavg)"
