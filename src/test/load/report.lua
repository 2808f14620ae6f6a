-- wrk script for the load runs: POSTs a JSON body read from the file given after "--", or GETs the
-- URL when no file is given; counts every answer other than 200 as an error (wrk alone counts only
-- socket errors and statuses above 399, so a redirect to the sign-in page would pass unseen), and
-- prints one RESULT line that run.sh collects.
local threads = {}

function setup(thread)
  table.insert(threads, thread)
end

function init(args)
  not_ok = 0
  local file = args[1]
  if file ~= nil and file ~= "" then
    local f = assert(io.open(file, "rb"))
    wrk.method = "POST"
    wrk.body = f:read("*a")
    f:close()
    wrk.headers["Content-Type"] = "application/json"
  end
  local cookie = args[2]
  if cookie ~= nil and cookie ~= "" then
    wrk.headers["Cookie"] = cookie
  end
end

function response(status, headers, body)
  if status ~= 200 then
    not_ok = not_ok + 1
  end
end

function done(summary, latency, requests)
  local not_ok_total = 0
  for _, t in ipairs(threads) do
    not_ok_total = not_ok_total + t:get("not_ok")
  end
  local e = summary.errors
  local socket = e.connect + e.read + e.write + e.timeout
  io.write(string.format("RESULT requests=%d seconds=%.1f rps=%.1f p50_ms=%.2f p99_ms=%.2f max_ms=%.1f not_200=%d socket_errors=%d\n",
    summary.requests, summary.duration / 1e6, summary.requests / (summary.duration / 1e6),
    latency:percentile(50) / 1000, latency:percentile(99) / 1000, latency.max / 1000, not_ok_total, socket))
end
