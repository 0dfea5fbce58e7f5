-- wrk script of .ci/loadtest: every request posts the JSON file named by
-- the environment variable BODY_FILE to the URL given to wrk, and done()
-- prints one RESULT line that .ci/loadtest reads (latencies in ms).

local f = assert(io.open(assert(os.getenv("BODY_FILE"), "set BODY_FILE"), "rb"))
wrk.method = "POST"
wrk.body = f:read("*a")
f:close()
wrk.headers["Content-Type"] = "application/json"

done = function(summary, latency, requests)
  local seconds = summary.duration / 1e6
  local e = summary.errors
  io.write(string.format(
    "RESULT requests=%d seconds=%.2f rps=%.0f p50_ms=%.3f p90_ms=%.3f p99_ms=%.3f max_ms=%.3f " ..
    "non2xx=%d connect_errors=%d read_errors=%d write_errors=%d timeouts=%d bytes=%d\n",
    summary.requests, seconds, summary.requests / seconds,
    latency:percentile(50) / 1000, latency:percentile(90) / 1000, latency:percentile(99) / 1000,
    latency.max / 1000, e.status, e.connect, e.read, e.write, e.timeout, summary.bytes))
end
