#!/usr/bin/env bash
# Batch-job benchmark against a running server on loopback: uploads SERIES quarterly series of
# QUARTERS quarters (seeded random walks with drift, 1,000 series per upload), creates one job over
# all of them, and reports the seconds until it is finished. Usage:
#   src/test/bench/batch-job.sh http://127.0.0.1:7070 10000 80
set -euo pipefail
base=${1:-http://127.0.0.1:7070}
series=${2:-10000}
quarters=${3:-80}
case "$base" in http://127.0.0.1:*) ;; *) echo "loopback only" >&2; exit 1 ;; esac
work=$(mktemp -d)
ids="$work/ids"
: > "$ids"
for ((first = 0; first < series; first += 1000)); do
  count=$(( series - first < 1000 ? series - first : 1000 ))
  python3 - "$first" "$count" "$quarters" > "$work/upload.csv" <<'PY'
import random, sys
first, count, quarters = map(int, sys.argv[1:])
random.seed(first)
print("period," + ",".join(f"s{first + i}" for i in range(count)))
level = [100.0] * count
for t in range(quarters):
    level = [v + 0.5 + random.gauss(0, 1) for v in level]
    print(f"{2000 + t // 4}-Q{t % 4 + 1}," + ",".join(f"{v:.3f}" for v in level))
PY
  curl -sf -X POST "$base/api/series" -H 'Content-Type: text/csv' --data-binary @"$work/upload.csv" \
    | python3 -c 'import json,sys; print("\n".join(str(s["id"]) for s in json.load(sys.stdin)["series"]))' >> "$ids"
done
body=$(python3 -c 'import json,sys; print(json.dumps({"seriesIds": [int(l) for l in open(sys.argv[1])]}))' "$ids")
start=$(date +%s.%N)
job=$(curl -sf -X POST "$base/api/jobs" -H 'Content-Type: application/json' -d "$body" \
  | python3 -c 'import json,sys; print(json.load(sys.stdin)["id"])')
while true; do
  progress=$(curl -sf "$base/api/jobs/$job")
  if echo "$progress" | grep -q '"finished":true'; then break; fi
  sleep 1
done
end=$(date +%s.%N)
echo "job=$job series=$series quarters=$quarters seconds=$(echo "$end - $start" | bc) load=$(cut -d' ' -f1-3 /proc/loadavg)"
echo "$progress"
rm -rf "$work"
