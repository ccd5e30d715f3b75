#!/usr/bin/env bash
# Batch-job benchmark against a running server on loopback: uploads SERIES quarterly series of
# QUARTERS quarters (seeded random walks with drift, 1,000 series per upload), creates one job over
# all of them, and reports the seconds until it is finished. With SERVER_PIDS set (the server
# processes' ids, space-separated: every instance working on the job), it also reports the CPU
# seconds those processes used while the job ran, per series, and their resident memory (VmRSS)
# before and after the job. The API needs a read-write token: pass it as TOKEN, or pass the setup
# code a new server prints (SETUP_CODE) and the script creates the first admin and a token.
# ROUNDS (default 1) repeats upload and job with new series on the same server: the first job on a
# new JVM also pays for the JIT compiling the code it runs, the later ones show the steady state.
# Usage:
#   SETUP_CODE=... SERVER_PIDS="$(pgrep -d' ' -f 'trendwright.jar --port=7070')" ROUNDS=2 \
#     src/test/bench/batch-job.sh http://127.0.0.1:7070 10000 80
set -euo pipefail
base=${1:-http://127.0.0.1:7070}
series=${2:-10000}
quarters=${3:-80}
case "$base" in http://127.0.0.1:*) ;; *) echo "loopback only" >&2; exit 1 ;; esac
work=$(mktemp -d)
if [ -z "${TOKEN:-}" ] && [ -n "${SETUP_CODE:-}" ]; then
  jar="$work/cookies"
  csrf=$(curl -sf -c "$jar" -X POST "$base/api/setup" -H 'Content-Type: application/json' \
    -d "{\"setupCode\": \"$SETUP_CODE\", \"username\": \"bench\", \"password\": \"bench-$RANDOM-$RANDOM-pw\"}" \
    | python3 -c 'import json,sys; print(json.load(sys.stdin)["csrfToken"])')
  TOKEN=$(curl -sf -b "$jar" -X POST "$base/api/tokens" -H 'Content-Type: application/json' -H "X-CSRF-Token: $csrf" \
    -d '{"name": "batch bench", "scope": "read-write"}' | python3 -c 'import json,sys; print(json.load(sys.stdin)["token"])')
  echo "token=$TOKEN"
fi
auth=(-H "Authorization: Bearer ${TOKEN:?set TOKEN or SETUP_CODE}")
pids=${SERVER_PIDS:-}
# utime + stime of the process, in seconds (fields 14 and 15 of /proc/<pid>/stat, in clock ticks).
cpu_seconds() { awk -v hz="$(getconf CLK_TCK)" '{ print ($14 + $15) / hz }' "/proc/$1/stat"; }
rss() { awk '/VmRSS/ { print $2 " " $3 }' "/proc/$1/status"; }
for ((round = 1; round <= ${ROUNDS:-1}; round++)); do
  echo "round=$round"
  ids="$work/ids"
  : > "$ids"
  for ((first = 0; first < series; first += 1000)); do
    count=$(( series - first < 1000 ? series - first : 1000 ))
    python3 - "$first" "$count" "$quarters" "$round" > "$work/upload.csv" <<'PY'
import random, sys
first, count, quarters, round_ = map(int, sys.argv[1:])
# Round 1 keeps the original names and seeds; later rounds upload new series.
random.seed(first if round_ == 1 else first + 7919 * round_)
prefix = "s" if round_ == 1 else f"r{round_}s"
print("period," + ",".join(f"{prefix}{first + i}" for i in range(count)))
level = [100.0] * count
for t in range(quarters):
    level = [v + 0.5 + random.gauss(0, 1) for v in level]
    print(f"{2000 + t // 4}-Q{t % 4 + 1}," + ",".join(f"{v:.3f}" for v in level))
PY
    curl -sf "${auth[@]}" -X POST "$base/api/series" -H 'Content-Type: text/csv' --data-binary @"$work/upload.csv" \
      | python3 -c 'import json,sys; print("\n".join(str(s["id"]) for s in json.load(sys.stdin)["series"]))' >> "$ids"
  done
  declare -A cpu_before
  for pid in $pids; do
    cpu_before[$pid]=$(cpu_seconds "$pid")
    echo "pid=$pid rss_before_job=$(rss "$pid")"
  done
  body=$(python3 -c 'import json,sys; print(json.dumps({"seriesIds": [int(l) for l in open(sys.argv[1])]}))' "$ids")
  start=$(date +%s.%N)
  job=$(curl -sf "${auth[@]}" -X POST "$base/api/jobs" -H 'Content-Type: application/json' -d "$body" \
    | python3 -c 'import json,sys; print(json.load(sys.stdin)["id"])')
  while true; do
    progress=$(curl -sf "${auth[@]}" "$base/api/jobs/$job")
    if echo "$progress" | grep -q '"finished":true'; then break; fi
    sleep 0.2
  done
  end=$(date +%s.%N)
  echo "job=$job series=$series quarters=$quarters seconds=$(echo "$end - $start" | bc) load=$(cut -d' ' -f1-3 /proc/loadavg)"
  echo "$progress"
  total_cpu=0
  for pid in $pids; do
    used=$(echo "$(cpu_seconds "$pid") - ${cpu_before[$pid]}" | bc)
    total_cpu=$(echo "$total_cpu + $used" | bc)
    echo "pid=$pid cpu_seconds_during_job=$used rss_after_job=$(rss "$pid")"
  done
  if [ -n "$pids" ]; then
    echo "cpu_seconds=$total_cpu cpu_ms_per_series=$(echo "scale=3; 1000 * $total_cpu / $series" | bc)"
  fi
done
rm -rf "$work"
