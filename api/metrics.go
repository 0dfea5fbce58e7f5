package api

import (
	"strconv"
	"time"

	"github.com/labstack/echo/v4"
	"github.com/prometheus/client_golang/prometheus"
	"github.com/prometheus/client_golang/prometheus/collectors"
	"github.com/prometheus/client_golang/prometheus/promhttp"
)

// triageCausesKey holds the top cause ids of a triage for the metrics; the
// triage handler sets it, the metrics middleware reads it.
const triageCausesKey = "triage_causes"

// noCause labels a triage whose report ranks no cause at all.
const noCause = "none"

// unmatchedRoute labels requests that matched no route, so that arbitrary
// URLs cannot grow the number of time series.
const unmatchedRoute = "unmatched"

// otherMethod labels requests whose method no route has, so that made-up
// methods cannot grow the number of time series either.
const otherMethod = "other"

// latencyBuckets span a single triage (tens of microseconds) to a full
// batch of maxBatchSamples (seconds), in seconds.
var latencyBuckets = []float64{0.0001, 0.00025, 0.0005, 0.001, 0.0025, 0.005, 0.01, 0.025, 0.05,
	0.1, 0.25, 0.5, 1, 2.5, 5, 10, 30}

// metrics is one application's Prometheus registry and its instruments. Each
// newMetrics has its own registry, so that many servers (tests build many)
// never collide on the process-wide default one.
type metrics struct {
	methods  map[string]bool // the methods of the routes, set once by route
	handler  echo.HandlerFunc
	requests *prometheus.CounterVec
	latency  *prometheus.HistogramVec
	outcomes *prometheus.CounterVec
	items    *prometheus.CounterVec
}

func newMetrics() *metrics {
	reg := prometheus.NewRegistry()
	m := &metrics{
		requests: prometheus.NewCounterVec(prometheus.CounterOpts{
			Name: "colloidtriage_http_requests_total",
			Help: "HTTP requests by route, method and status code.",
		}, []string{"route", "method", "code"}),
		latency: prometheus.NewHistogramVec(prometheus.HistogramOpts{
			Name:    "colloidtriage_http_request_duration_seconds",
			Help:    "Time from receiving a request to the handler's return, by route.",
			Buckets: latencyBuckets,
		}, []string{"route"}),
		outcomes: prometheus.NewCounterVec(prometheus.CounterOpts{
			Name: "colloidtriage_triage_outcomes_total",
			Help: `Successful triages (single and batch items) by top-ranked cause id; "none" when no cause ranks.`,
		}, []string{"cause"}),
		items: prometheus.NewCounterVec(prometheus.CounterOpts{
			Name: "colloidtriage_batch_items_total",
			Help: "Batch items by the status of their result.",
		}, []string{"status"}),
	}
	reg.MustRegister(m.requests, m.latency, m.outcomes, m.items,
		collectors.NewGoCollector(),
		collectors.NewProcessCollector(collectors.ProcessCollectorOpts{}))
	m.handler = echo.WrapHandler(promhttp.HandlerFor(reg, promhttp.HandlerOpts{}))
	return m
}

// middleware counts every request by route and status and times it. An
// error returned by the handler is rendered further out (by the access
// log), so its status is read from the same mapping the error handler uses.
func (m *metrics) middleware(next echo.HandlerFunc) echo.HandlerFunc {
	return func(c echo.Context) error {
		start := time.Now()
		err := next(c)
		status := c.Response().Status
		if err != nil {
			status = problemFor(err).Status
		}
		route := c.Path()
		if route == "" {
			route = unmatchedRoute
		}
		m.latency.WithLabelValues(route).Observe(time.Since(start).Seconds())
		m.requests.WithLabelValues(route, m.method(c.Request().Method), strconv.Itoa(status)).Inc()
		if causes, ok := c.Get(triageCausesKey).([]string); ok {
			m.countOutcome(causes)
		}
		return err
	}
}

// route records the methods of the application's routes, the only
// method label values besides otherMethod. New calls it once, after the
// last route and before serving.
func (m *metrics) route(routes []*echo.Route) {
	m.methods = map[string]bool{}
	for _, r := range routes {
		m.methods[r.Method] = true
	}
}

// method is the label value of an HTTP method.
func (m *metrics) method(method string) string {
	if m.methods[method] {
		return method
	}
	return otherMethod
}

// countOutcome counts one successful triage under its top cause (the first
// id of causes, ranked as in the report).
func (m *metrics) countOutcome(causes []string) {
	cause := noCause
	if len(causes) > 0 {
		cause = causes[0]
	}
	m.outcomes.WithLabelValues(cause).Inc()
}

// countItem counts one batch item by the status of its result.
func (m *metrics) countItem(status int) {
	m.items.WithLabelValues(strconv.Itoa(status)).Inc()
}

// metricsText serves the registry in the Prometheus text exposition format
// (or another format the scraper negotiates).
func (h *handlers) metricsText(c echo.Context) error {
	return h.metrics.handler(c)
}
