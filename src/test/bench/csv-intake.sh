#!/usr/bin/env bash
# CSV intake benchmark: generates a long-format CSV (series,period,value) of SERIES series x PERIODS
# monthly periods (seeded random walks; 1,000 x 1,000 = 1,000,000 rows, about 24 MB), starts the
# packed jar with -Xmx256m, a GC log and the JVM options README recommends (JVM_OPTIONS, as in
# fit-load.sh), raises the body limit with its documented setting
# (--max-body-bytes, default 10 MB, still enforced while the body streams), creates the first admin
# and a token, and RUNS times: starts a fresh server and store, posts the file twice (the first
# upload on a new JVM, then a second once the JIT has compiled the intake code) and reports the wall
# time of each upload, the server's CPU seconds for it, the peak heap in use before any collection
# over the server's life (from the GC log) and the load average. Usage (after mvn -B -q package -DskipTests):
#   [TRENDWRIGHT_JAR=path] src/test/bench/csv-intake.sh [port 7400] [series 1000] [periods 1000] [runs 3] [database-url]
set -euo pipefail
port=${1:-7400}
series=${2:-1000}
periods=${3:-1000}
runs=${4:-3}
database_url=${5:-}
jar=${TRENDWRIGHT_JAR:-target/trendwright.jar}
work=$(mktemp -d)
trap 'kill "$pid" 2>/dev/null || true; wait "$pid" 2>/dev/null || true; rm -rf "$work"' EXIT
python3 - "$series" "$periods" > "$work/upload.csv" <<'PY'
import random, sys
series, periods = map(int, sys.argv[1:])
random.seed(7)
out = sys.stdout
out.write("series,period,value\n")
for s in range(series):
    level = 100.0
    name = f"s{s:04d}"
    rows = []
    for t in range(periods):
        level += 0.5 + random.gauss(0, 1)
        rows.append(f"{name},{1900 + t // 12}-{t % 12 + 1:02d},{level:.3f}\n")
    out.write("".join(rows))
PY
bytes=$(stat -c %s "$work/upload.csv")
cpu_seconds() { awk '{print ($14 + $15) / 100}' "/proc/$1/stat"; }
start_server() {
  local data="$work/data-$1"
  local store=()
  if [ -n "$database_url" ]; then
    store=(--database-url="$database_url" --database-schema="bench_$1_$$") # Flyway creates the schema
  fi
  TRENDWRIGHT_SETUP_CODE=bench-setup-code-$$ java -Xmx256m ${JVM_OPTIONS--XX:+UseParallelGC -XX:+UseTransparentHugePages} -Xlog:gc:file="$work/gc-$1.log" -jar "$jar" --port="$port" --data-dir="$data" \
    --demo-data=false --job-workers=0 --max-body-bytes=$((64 * 1024 * 1024)) "${store[@]}" > "$work/server-$1.log" 2>&1 &
  pid=$!
  for _ in $(seq 1 120); do
    curl -sf "http://127.0.0.1:$port/health" >/dev/null 2>&1 && break
    sleep 0.5
  done
  local code=bench-setup-code-$$
  local setup
  setup=$(curl -sf -c "$work/jar" -X POST "http://127.0.0.1:$port/api/setup" -H 'Content-Type: application/json' \
    -d "{\"setupCode\": \"$code\", \"username\": \"bench\", \"password\": \"bench-password-1234\"}")
  local csrf
  csrf=$(echo "$setup" | python3 -c 'import json,sys; print(json.load(sys.stdin)["csrfToken"])')
  token=$(curl -sf -b "$work/jar" -X POST "http://127.0.0.1:$port/api/tokens" -H "X-CSRF-Token: $csrf" \
    -H 'Content-Type: application/json' -d '{"name": "bench", "scope": "read-write"}' \
    | python3 -c 'import json,sys; print(json.load(sys.stdin)["token"])')
}
upload() {
  curl -s -o "$work/answer.json" -w '%{http_code} %{time_total}' -X POST "http://127.0.0.1:$port/api/series" \
    -H "Authorization: Bearer $token" -H 'Content-Type: text/csv' --data-binary @"$work/upload.csv"
}
stop_server() {
  kill "$pid"
  wait "$pid" 2>/dev/null || true
}
peak_heap() {
  # Largest heap in use before a collection, and largest left after one (the live data plus what the
  # collector chose not to free), from lines like "Pause Young (Normal) (G1 Evacuation Pause) 120M->30M(256M)".
  local before after
  before=$(grep -o '[0-9]*M->[0-9]*M([0-9]*M)' "$1" | sed 's/M->.*//' | sort -n | tail -1)
  after=$(grep -o '[0-9]*M->[0-9]*M([0-9]*M)' "$1" | sed 's/.*->//; s/M(.*//' | sort -n | tail -1)
  echo "${before}_before_gc,${after}_after_gc"
}
echo "rows=$((series * periods)) bytes=$bytes store=${database_url:-sqlite}"
for run in $(seq 1 "$runs"); do
  start_server "$run"
  line="run $run:"
  for which in first second; do
    before=$(cpu_seconds "$pid")
    result=$(upload)
    after=$(cpu_seconds "$pid")
    line="$line $which upload status,s=${result/ /,} server_cpu_s=$(echo "$after - $before" | bc);"
  done
  heap=$(jcmd "$pid" GC.heap_info 2>/dev/null | sed -n 2p | tr -s ' ' || true)
  stop_server
  echo "$line peak_heap_mb=$(peak_heap "$work/gc-$run.log") load=$(cut -d' ' -f1-3 /proc/loadavg)"
  echo "  heap after (jcmd GC.heap_info):$heap"
done
head -c 200 "$work/answer.json"; echo
