-- wrk script: POST /api/fit with a 120-point monthly series (seeded trend plus noise) and a
-- log-linear seasonal trend. Usage (loopback only):
--   wrk -t4 -c64 -d60s --latency -s src/test/bench/fit-120.lua http://127.0.0.1:7070
math.randomseed(120)
local points = {}
for t = 0, 119 do
  local year = 2010 + math.floor(t / 12)
  local month = t % 12 + 1
  local value = 100 + 0.8 * t + 10 * math.sin(2 * math.pi * month / 12) + (math.random() - 0.5) * 6
  points[#points + 1] = string.format('{"period": "%d-%02d", "value": %.4f}', year, month, value)
end
wrk.method = "POST"
wrk.path = "/api/fit"
wrk.headers["Content-Type"] = "application/json"
wrk.body = '{"series": {"name": "bench", "observations": [' .. table.concat(points, ", ") ..
  ']}, "model": {"family": "trend", "scale": "log", "seasonal": true}, "horizon": 12}'

done = function(summary, latency, requests)
  io.write(string.format("requests=%d non2xx3xx=%d p50=%.2fms p99=%.2fms rate=%.1f/s\n",
    summary.requests, summary.errors.status, latency:percentile(50) / 1000, latency:percentile(99) / 1000,
    summary.requests / (summary.duration / 1e6)))
end
