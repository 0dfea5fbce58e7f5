package api

import (
	"net/http"
	"strconv"
	"strings"
	"testing"

	dto "github.com/prometheus/client_model/go"
	"github.com/prometheus/common/expfmt"
	"github.com/prometheus/common/model"
)

// scrape reads /metrics the way Prometheus does: the text format, parsed.
func scrape(t *testing.T, h http.Handler) map[string]*dto.MetricFamily {
	t.Helper()
	rec := do(t, h, http.MethodGet, "/metrics", "", "")
	if rec.Code != 200 || !strings.HasPrefix(rec.Header().Get("Content-Type"), "text/plain") {
		t.Fatalf("metrics: %d %s", rec.Code, rec.Header().Get("Content-Type"))
	}
	p := expfmt.NewTextParser(model.UTF8Validation)
	fams, err := p.TextToMetricFamilies(rec.Body)
	if err != nil {
		t.Fatalf("metrics text does not parse: %v", err)
	}
	return fams
}

// sample finds the series of family name whose labels include want.
func sample(fams map[string]*dto.MetricFamily, name string, want map[string]string) *dto.Metric {
	f := fams[name]
	if f == nil {
		return nil
	}
	for _, m := range f.GetMetric() {
		match := 0
		for _, l := range m.GetLabel() {
			if v, ok := want[l.GetName()]; ok && v == l.GetValue() {
				match++
			}
		}
		if match == len(want) {
			return m
		}
	}
	return nil
}

func sum(fams map[string]*dto.MetricFamily, name string) float64 {
	total := 0.0
	if f := fams[name]; f != nil {
		for _, m := range f.GetMetric() {
			total += m.GetCounter().GetValue()
		}
	}
	return total
}

// TestMetrics: requests by route and status (errors counted with the status
// the client got), latency by route, triage outcomes by top cause from the
// single and the batch route, batch items by status, and the Go runtime.
func TestMetrics(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	do(t, h, http.MethodPost, "/v1/triage", "application/json", demo(t, "gravity_settling.json"))
	do(t, h, http.MethodPost, "/v1/triage", "application/json", "{")
	do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", limsBatch(len(limsCases)))
	do(t, h, http.MethodGet, "/nowhere", "", "")
	fams := scrape(t, h)

	counts := []struct {
		route, method, code string
		want                float64
	}{
		{"/v1/triage", "POST", "200", 1},
		{"/v1/triage", "POST", "400", 1},
		{"/v1/triage/batch", "POST", "200", 1},
		{"", "GET", "404", 1}, // the route of a 404 is the catch-all that matched, e.g. /*
	}
	for _, c := range counts {
		want := map[string]string{"method": c.method, "code": c.code}
		if c.route != "" {
			want["route"] = c.route
		}
		m := sample(fams, "colloidtriage_http_requests_total", want)
		if m == nil || m.GetCounter().GetValue() != c.want {
			t.Errorf("requests %s %s %s: %v, want %v", c.method, c.route, c.code, m, c.want)
		}
	}
	if m := sample(fams, "colloidtriage_http_request_duration_seconds", map[string]string{"route": "/v1/triage"}); m == nil ||
		m.GetHistogram().GetSampleCount() != 2 || len(m.GetHistogram().GetBucket()) != len(latencyBuckets)+1 { // and +Inf
		t.Errorf("latency of /v1/triage: %v", m)
	}
	// One demo triage plus the three valid samples of limsCases.
	if got := sum(fams, "colloidtriage_triage_outcomes_total"); got != 4 {
		t.Errorf("outcomes total %v, want 4", got)
	}
	if m := sample(fams, "colloidtriage_triage_outcomes_total", map[string]string{"cause": "gravity_settling"}); m == nil {
		t.Error("no outcome counted for gravity_settling")
	}
	for status, want := range map[string]float64{"200": 3, "400": 2, "422": 3} {
		if m := sample(fams, "colloidtriage_batch_items_total", map[string]string{"status": status}); m == nil ||
			m.GetCounter().GetValue() != want {
			t.Errorf("batch items %s: %v, want %v", status, m, want)
		}
	}
	for _, name := range []string{"go_goroutines", "go_memstats_alloc_bytes", "process_start_time_seconds"} {
		if fams[name] == nil {
			t.Errorf("runtime metric %s missing", name)
		}
	}
}

// TestMetricsPerServer: each server has its own registry, so one server's
// traffic never shows in another's metrics (and building many never panics
// on duplicate registration).
func TestMetricsPerServer(t *testing.T) {
	t.Parallel()
	a, b := testServer(t), testServer(t)
	do(t, a, http.MethodPost, "/v1/triage", "application/json", demo(t, "gravity_settling.json"))
	if got := sum(scrape(t, b), "colloidtriage_triage_outcomes_total"); got != 0 {
		t.Errorf("server b counts %v outcomes of server a", got)
	}
}

// TestCountOutcome: a triage that ranks no cause is counted as "none".
func TestCountOutcome(t *testing.T) {
	t.Parallel()
	m := newMetrics()
	count := func(cause string) float64 {
		var d dto.Metric
		if err := m.outcomes.WithLabelValues(cause).Write(&d); err != nil {
			t.Fatal(err)
		}
		return d.GetCounter().GetValue()
	}
	m.countOutcome(nil)
	m.countOutcome([]string{"dense_cake", "gravity_settling"})
	if got := count(noCause); got != 1 {
		t.Errorf("none: %v", got)
	}
	if got := count("dense_cake"); got != 1 {
		t.Errorf("dense_cake: %v", got)
	}
	if got := count("gravity_settling"); got != 0 {
		t.Errorf("only the top cause counts; gravity_settling: %v", got)
	}
}

// TestMetricsLabelsFixed: label values come from fixed sets whatever the
// client sends: methods the service routes, else "other"; route patterns,
// else "unmatched". A thousand made-up methods and paths add no series.
func TestMetricsLabelsFixed(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	for i := range 1000 {
		method := "M" + strings.Repeat("X", 1000) + strconv.Itoa(i)
		do(t, h, method, "/v1/triage", "", "")
		do(t, h, method, "/nowhere/"+strconv.Itoa(i), "", "")
		do(t, h, http.MethodGet, "/v1/x"+strconv.Itoa(i), "", "")
	}
	fams := scrape(t, h)
	methods, routes := map[string]bool{}, map[string]bool{}
	for _, m := range fams["colloidtriage_http_requests_total"].GetMetric() {
		for _, l := range m.GetLabel() {
			switch l.GetName() {
			case "method":
				methods[l.GetValue()] = true
			case "route":
				routes[l.GetValue()] = true
			}
		}
	}
	for m := range methods {
		if m != http.MethodGet && m != http.MethodPost && m != "other" {
			t.Errorf("method label %.40q", m)
		}
	}
	if !methods["other"] {
		t.Errorf("made-up methods are not counted as other: %v", methods)
	}
	if len(routes) > 4 {
		t.Errorf("%d route labels: %v", len(routes), routes)
	}
	if s := sample(fams, "colloidtriage_http_requests_total", map[string]string{"route": "/v1/triage", "method": "other"}); s == nil ||
		s.GetCounter().GetValue() != 1000 {
		t.Errorf("made-up methods on /v1/triage: %v", s)
	}
}
