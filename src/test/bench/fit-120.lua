-- wrk script: POST /api/fit with 120-point QUARTERLY series (30 years) and a linear trend with
-- seasonal dummies, 8-quarter forecast. It cycles through SERIES distinct seeded series (trend,
-- seasonal pattern and AR(1) noise drawn per series, start year varying too), so that no answer
-- could be served from a per-body cache; the server keeps none for stateless fits anyway.
-- Usage (loopback only; TOKEN is a read-write API token, see src/docs/benchmarks.md):
--   TOKEN=... wrk -t2 -c64 -d60s --latency -s src/test/bench/fit-120.lua http://127.0.0.1:7300
local SERIES = 100
local token = os.getenv("TOKEN")
if token == nil or token == "" then
  error("set TOKEN to a read-write API token (Authorization: Bearer)")
end

-- Park-Miller minimal standard generator, so the bodies do not depend on Lua's math.random.
local state = 20261202
local function uniform()
  state = (state * 16807) % 2147483647
  return state / 2147483647
end
local function normal()
  return math.sqrt(-2 * math.log(uniform())) * math.cos(2 * math.pi * uniform())
end

local bodies = {}
for s = 1, SERIES do
  local level = 50 + 400 * uniform()
  local slope = 3 * uniform() - 0.5
  local season = {10 * normal(), 10 * normal(), 10 * normal(), 10 * normal()}
  local startYear = 1980 + s % 10
  local u = 0
  local points = {}
  for t = 0, 119 do
    u = 0.5 * u + normal()
    local value = level + slope * t + season[t % 4 + 1] + 4 * u
    points[#points + 1] = string.format('{"period": "%d-Q%d", "value": %.4f}', startYear + math.floor(t / 4),
      t % 4 + 1, value)
  end
  bodies[s] = '{"series": {"name": "bench ' .. s .. '", "observations": [' .. table.concat(points, ", ") ..
    ']}, "model": {"family": "trend", "seasonal": true}, "horizon": 8}'
end

local next = 0
request = function()
  next = next % SERIES + 1
  return wrk.format("POST", "/api/fit", {["Content-Type"] = "application/json",
    ["Authorization"] = "Bearer " .. token}, bodies[next])
end

done = function(summary, latency, requests)
  io.write(string.format("requests=%d non2xx3xx=%d socket_errors=%d p50=%.2fms p90=%.2fms p99=%.2fms rate=%.1f/s\n",
    summary.requests, summary.errors.status,
    summary.errors.connect + summary.errors.read + summary.errors.write + summary.errors.timeout,
    latency:percentile(50) / 1000, latency:percentile(90) / 1000, latency:percentile(99) / 1000,
    summary.requests / (summary.duration / 1e6)))
end
