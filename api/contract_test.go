package api

import (
	"bytes"
	"context"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"maps"
	"net/http"
	"net/http/httptest"
	"os"
	"path/filepath"
	"reflect"
	"regexp"
	"slices"
	"strconv"
	"strings"
	"sync"
	"testing"

	"github.com/getkin/kin-openapi/openapi3"
	"github.com/getkin/kin-openapi/openapi3filter"
	"github.com/getkin/kin-openapi/routers"
	"github.com/getkin/kin-openapi/routers/gorillamux"
	"github.com/labstack/echo/v4"
	gommonbytes "github.com/labstack/gommon/bytes"
	"go.yaml.in/yaml/v3"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
	"colloidtriage/advisor/rule"
	"colloidtriage/openapi"
)

// The contract tests hold the handlers to openapi/openapi.yaml: real
// requests go through the real application and both sides of each exchange
// are validated against the document with kin-openapi; the document's
// identifiers, units, ranges and defaults are checked against the code that
// fixes them, so that neither can drift from the other.

// contract is the loaded document with its router, shared by the tests.
type contract struct {
	doc    *openapi3.T
	router routers.Router
}

var loadContract = sync.OnceValues(func() (*contract, error) {
	loader := openapi3.NewLoader()
	loader.IsExternalRefsAllowed = false
	doc, err := loader.LoadFromData(openapi.JSON)
	if err != nil {
		return nil, fmt.Errorf("load: %w", err)
	}
	if err := doc.Validate(context.Background()); err != nil {
		return nil, fmt.Errorf("the document is not valid OpenAPI: %w", err)
	}
	router, err := gorillamux.NewRouter(doc)
	if err != nil {
		return nil, fmt.Errorf("router: %w", err)
	}
	return &contract{doc: doc, router: router}, nil
})

func contractDoc(t testing.TB) *contract {
	t.Helper()
	c, err := loadContract()
	if err != nil {
		t.Fatal(err)
	}
	return c
}

// schema returns the named component schema.
func (c *contract) schema(t testing.TB, name string) *openapi3.Schema {
	t.Helper()
	ref, ok := c.doc.Components.Schemas[name]
	if !ok || ref.Value == nil {
		t.Fatalf("no component schema %s", name)
	}
	return ref.Value
}

// filterOptions: every response status must be documented; defaults are
// not written into the request, which the handler then reads unchanged.
var filterOptions = &openapi3filter.Options{
	IncludeResponseStatus: true,
	SkipSettingDefaults:   true,
	AuthenticationFunc:    presentedCredential,
}

// presentedCredential admits a request that carries the credential a
// security scheme names. Whether the key is right is the server's business;
// the document only fixes where it is sent.
func presentedCredential(_ context.Context, in *openapi3filter.AuthenticationInput) error {
	h := in.RequestValidationInput.Request.Header
	switch in.SecuritySchemeName {
	case "bearerAuth":
		if scheme, token, _ := strings.Cut(h.Get("Authorization"), " "); strings.EqualFold(scheme, "Bearer") && token != "" {
			return nil
		}
	case "apiKeyHeader":
		if h.Get(apiKeyHeader) != "" {
			return nil
		}
	default:
		return fmt.Errorf("unknown security scheme %q", in.SecuritySchemeName)
	}
	return fmt.Errorf("no credential for %s", in.SecuritySchemeName)
}

func init() {
	openapi3filter.RegisterBodyDecoder(mimeNDJSON, ndjsonBodyDecoder)
	// kin-openapi's own text/csv decoder splits at commas only; the
	// dialect here is declared by media-type parameters, and the document
	// describes a CSV body as text.
	openapi3filter.RegisterBodyDecoder(mimeCSV, openapi3filter.PlainBodyDecoder)
}

// ndjsonBodyDecoder reads an NDJSON body, whose media type's schema is that
// of one line (OpenAPI 3.0 cannot say "a sequence of"): every line is
// validated against it here, and the first line is returned for the
// filter's own check.
func ndjsonBodyDecoder(body io.Reader, _ http.Header, schema *openapi3.SchemaRef, _ openapi3filter.EncodingFn) (any, error) {
	lines, err := ndjsonValues(body)
	if err != nil {
		return nil, err
	}
	if len(lines) == 0 {
		return nil, errors.New("NDJSON body without a line")
	}
	for i, v := range lines {
		if err := schema.Value.VisitJSON(v); err != nil {
			return nil, fmt.Errorf("NDJSON value %d: %w", i, err)
		}
	}
	return lines[0], nil
}

func ndjsonValues(r io.Reader) ([]any, error) {
	data, err := io.ReadAll(r)
	if err != nil {
		return nil, err
	}
	var out []any
	for n, line := range bytes.Split(data, []byte("\n")) {
		if line = bytes.TrimSpace(line); len(line) == 0 {
			continue
		}
		var v any
		if err := json.Unmarshal(line, &v); err != nil {
			return nil, fmt.Errorf("NDJSON line %d: %w", n+1, err)
		}
		out = append(out, v)
	}
	return out, nil
}

// verdict is what the document says about a request.
type verdict int

const (
	conforms  verdict = iota // the document accepts the request
	violates                 // the document rejects it, as the handler does
	unchecked                // it breaks a rule a validator cannot read (media-type parameters, sample count)
)

// exchange is one request through the real application and the answer the
// contract expects.
type exchange struct {
	name         string
	method, path string
	contentType  string
	body         string
	header       []string // name, value pairs
	keys         []string // API keys the server runs with
	status       int
	request      verdict
}

func (x exchange) newRequest() *http.Request {
	req := httptest.NewRequest(x.method, x.path, strings.NewReader(x.body))
	if x.contentType != "" {
		req.Header.Set(echo.HeaderContentType, x.contentType)
	}
	for i := 0; i+1 < len(x.header); i += 2 {
		req.Header.Set(x.header[i], x.header[i+1])
	}
	return req
}

// check sends x through h and validates the request, the status and the
// answer against the document, including that the answer has no member the
// document does not declare. It returns what breaks the contract.
func (c *contract) check(t *testing.T, h http.Handler, x exchange) []string {
	t.Helper()
	var broken []string
	req := x.newRequest()
	route, params, err := c.router.FindRoute(req)
	if err != nil {
		t.Fatalf("%s %s is not in the document: %v", x.method, x.path, err)
	}
	in := &openapi3filter.RequestValidationInput{Request: req, PathParams: params, Route: route, Options: filterOptions}
	reqErr := openapi3filter.ValidateRequest(context.Background(), in)
	switch {
	case x.request == conforms && reqErr != nil:
		broken = append(broken, fmt.Sprintf("the document rejects the request: %v", reqErr))
	case x.request == violates && reqErr == nil:
		broken = append(broken, "the document accepts a request the handler must refuse")
	}

	rec := httptest.NewRecorder()
	h.ServeHTTP(rec, x.newRequest())
	body := rec.Body.Bytes()
	if rec.Code != x.status {
		return append(broken, fmt.Sprintf("status %d, want %d: %.400s", rec.Code, x.status, body))
	}
	out := &openapi3filter.ResponseValidationInput{RequestValidationInput: in, Status: rec.Code, Header: rec.Header(),
		Body: io.NopCloser(bytes.NewReader(body)), Options: filterOptions}
	if err := openapi3filter.ValidateResponse(context.Background(), out); err != nil {
		broken = append(broken, fmt.Sprintf("the answer breaks the contract: %v\n%.600s", err, body))
	}
	if resp := route.Operation.Responses.Status(rec.Code); resp != nil && resp.Value != nil {
		if mt := resp.Value.Content.Get(rec.Header().Get(echo.HeaderContentType)); mt != nil && mt.Schema != nil {
			for _, m := range undocumentedIn(t, mt.Schema.Value, rec.Header().Get(echo.HeaderContentType), body) {
				broken = append(broken, "the answer has a member the document does not declare: "+m)
			}
		}
	}
	return broken
}

// report fails t for each breach of the contract.
func (x exchange) report(t *testing.T, broken []string) {
	t.Helper()
	for _, b := range broken {
		t.Error(b)
	}
}

// undocumentedIn lists the undocumented members of a JSON or NDJSON body.
func undocumentedIn(t *testing.T, s *openapi3.Schema, contentType string, body []byte) []string {
	t.Helper()
	var values []any
	switch mt, _, _ := strings.Cut(contentType, ";"); strings.TrimSpace(mt) {
	case echo.MIMEApplicationJSON, problemContentType:
		var v any
		if err := json.Unmarshal(body, &v); err != nil {
			t.Fatalf("the answer is not JSON: %v", err)
		}
		values = []any{v}
	case mimeNDJSON:
		var err error
		if values, err = ndjsonValues(bytes.NewReader(body)); err != nil {
			t.Fatal(err)
		}
	}
	var out []string
	for i, v := range values {
		at := ""
		if len(values) > 1 {
			at = "line " + strconv.Itoa(i+1) + " "
		}
		for _, m := range undocumented(s, v, "") {
			out = append(out, at+m)
		}
	}
	return out
}

// undocumented lists, as JSON pointers, the members of v that s does not
// declare. A schema that declares no member at all is a free-form object.
func undocumented(s *openapi3.Schema, v any, at string) []string {
	if s == nil {
		return nil
	}
	var out []string
	switch v := v.(type) {
	case map[string]any:
		props, extra, free := members(s)
		for k, val := range v {
			p, ok := props[k]
			switch {
			case ok:
			case extra != nil:
				p = extra
			case free:
				continue
			default:
				out = append(out, at+"/"+k)
				continue
			}
			out = append(out, undocumented(p, val, at+"/"+k)...)
		}
	case []any:
		items := itemsOf(s)
		for i, val := range v {
			out = append(out, undocumented(items, val, at+"/"+strconv.Itoa(i))...)
		}
	}
	slices.Sort(out)
	return out
}

// members gathers the declared properties of s and of its allOf, anyOf and
// oneOf parts, the schema of additional members when s gives one, and
// whether s is free-form (declares no member and does not forbid others).
func members(s *openapi3.Schema) (props map[string]*openapi3.Schema, extra *openapi3.Schema, free bool) {
	props = map[string]*openapi3.Schema{}
	closed := false
	var walk func(*openapi3.Schema)
	walk = func(s *openapi3.Schema) {
		for name, p := range s.Properties {
			if _, seen := props[name]; !seen && p.Value != nil {
				props[name] = p.Value
			}
		}
		switch ap := s.AdditionalProperties; {
		case ap.Schema != nil && ap.Schema.Value != nil:
			extra = ap.Schema.Value
		case ap.Has != nil && *ap.Has:
			extra = &openapi3.Schema{}
		case ap.Has != nil:
			closed = true
		}
		for _, parts := range []openapi3.SchemaRefs{s.AllOf, s.AnyOf, s.OneOf} {
			for _, p := range parts {
				if p.Value != nil {
					walk(p.Value)
				}
			}
		}
	}
	walk(s)
	return props, extra, len(props) == 0 && extra == nil && !closed
}

func itemsOf(s *openapi3.Schema) *openapi3.Schema {
	if s.Items != nil {
		return s.Items.Value
	}
	for _, p := range s.AllOf {
		if p.Value != nil && p.Value.Items != nil {
			return p.Value.Items.Value
		}
	}
	return nil
}

// demoSamples reads every demo scenario, by file name.
func demoSamples(t testing.TB) map[string]string {
	t.Helper()
	files, err := filepath.Glob("../testdata/demo/*.json")
	if err != nil || len(files) == 0 {
		t.Fatalf("no demo samples: %v", err)
	}
	out := map[string]string{}
	for _, f := range files {
		b, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		out[filepath.Base(f)] = string(b)
	}
	return out
}

// compactJSON puts a JSON document on one line, for NDJSON bodies.
func compactJSON(t testing.TB, doc string) string {
	t.Helper()
	var buf bytes.Buffer
	if err := json.Compact(&buf, []byte(doc)); err != nil {
		t.Fatal(err)
	}
	return buf.String()
}

const (
	// compareBody is a lot made with a new, hard water supply beside the lot
	// before it.
	compareBody = `{"reference":{"sample_id":"LOT-41","particles":{"material":"zirconia","diameter_nm":400,"volume_fraction":0.35,"zeta_mV":-42},` +
		`"medium":{"ph":9.2,"electrolytes":[{"formula":"NaCl","concentration_mM":2}]},"analysis":{"draws":50}},` +
		`"complaint":{"sample_id":"LOT-42","symptom":"flocculation","particles":{"material":"zirconia","diameter_nm":410,"volume_fraction":0.35,"zeta_mV":-41},` +
		`"medium":{"ph":9.2,"electrolytes":[{"formula":"NaCl","concentration_mM":2}],"hardness":{"value":200,"unit":"mg_L_CaCO3"}},"analysis":{"draws":50}}}`
	jsonType = echo.MIMEApplicationJSON
	profile  = "/v1/interaction-profile"
	// zetaSample has all a profile needs.
	zetaSample = `{"sample_id":"C-1","particles":{"diameter_nm":200,"density_kg_m3":2500,"zeta_mV":-40},` +
		`"medium":{"electrolytes":[{"formula":"NaCl","concentration_mM":10}]}}`
)

// TestContractDocument: the embedded document is valid OpenAPI 3.0.3, its
// JSON form is its YAML form, and /openapi.json serves it unchanged.
func TestContractDocument(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	if c.doc.OpenAPI != "3.0.3" {
		t.Errorf("openapi %q, want 3.0.3", c.doc.OpenAPI)
	}
	var fromYAML, fromJSON any
	if err := yaml.Unmarshal(openapi.YAML, &fromYAML); err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(openapi.JSON, &fromJSON); err != nil {
		t.Fatal(err)
	}
	reencoded, _ := json.Marshal(fromYAML)
	var again any
	_ = json.Unmarshal(reencoded, &again)
	if !reflect.DeepEqual(again, fromJSON) {
		t.Error("openapi.JSON differs from openapi.yaml")
	}
	rec := do(t, testServer(t), http.MethodGet, "/openapi.json", "", "")
	if rec.Code != http.StatusOK || !bytes.Equal(rec.Body.Bytes(), openapi.JSON) {
		t.Errorf("/openapi.json: %d, %d bytes, want the embedded %d bytes", rec.Code, rec.Body.Len(), len(openapi.JSON))
	}
}

// TestContractRoutes: every route the application registers is in the
// document, and every operation of the document is registered.
func TestContractRoutes(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	e := New(testEngine(t), Config{OpenAPI: openapi.JSON})
	registered := map[string]bool{}
	for _, r := range e.Routes() {
		if r.Method == echo.RouteNotFound {
			continue // the catch-alls that let group middleware see unknown paths
		}
		if r.Path == "/" || strings.HasPrefix(r.Path, pagePrefix+"/") {
			continue // the workbench page and its assets: HTML, not the JSON API
		}
		registered[r.Method+" "+r.Path] = true
		item := c.doc.Paths.Find(r.Path)
		if item == nil || item.GetOperation(r.Method) == nil {
			t.Errorf("route %s %s is not in the document", r.Method, r.Path)
		}
	}
	for path, item := range c.doc.Paths.Map() {
		for method := range item.Operations() {
			if !registered[method+" "+path] {
				t.Errorf("the document describes %s %s, which the application does not serve", method, path)
			}
		}
	}
}

// TestContractExchanges: success and error exchanges of every route,
// through the real handler, both sides validated against the document.
func TestContractExchanges(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	demos := demoSamples(t)
	names := slices.Sorted(maps.Keys(demos))
	var all, ndjson []string
	for _, n := range names {
		all = append(all, demos[n])
		ndjson = append(ndjson, compactJSON(t, demos[n]))
	}
	jsonBatch := `{"samples":[` + strings.Join(all, ",") + `]}`
	ndjsonBatch := strings.Join(ndjson, "\n") + "\n"
	csvBatch := exampleCSV(t)
	gs := demos["gravity_settling.json"]

	xs := []exchange{
		{name: "healthz", method: "GET", path: "/healthz", status: 200},
		{name: "readyz", method: "GET", path: "/readyz", status: 200},
		{name: "metrics", method: "GET", path: "/metrics", status: 200},
		{name: "openapi", method: "GET", path: "/openapi.json", status: 200},
		{name: "catalog", method: "GET", path: "/v1/catalog", status: 200},
		{name: "rules", method: "GET", path: "/v1/rules", status: 200},
		{name: "materials", method: "GET", path: "/v1/materials", status: 200},

		{name: "triage with ids", method: "POST", path: "/v1/triage", contentType: jsonType, body: gs, status: 200,
			header: []string{"Idempotency-Key", "lims-7", "X-Request-Id", "client-req-1"}},
		{name: "triage not JSON", method: "POST", path: "/v1/triage", contentType: jsonType, body: "{", status: 400, request: violates},
		{name: "triage empty body", method: "POST", path: "/v1/triage", contentType: jsonType, body: "", status: 400, request: violates},
		{name: "triage wrong type", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: `{"symptom":"settling","particles":{"diameter_nm":"big"}}`, status: 400, request: violates},
		{name: "triage unknown member", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000,"diameter_um":1}}`, status: 400, request: violates},
		{name: "triage trailing data", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: gs + ` {}`, status: 400, request: unchecked},
		{name: "triage wrong media type", method: "POST", path: "/v1/triage", contentType: "text/plain", body: gs, status: 415, request: violates},
		{name: "triage out of range", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000,"volume_fraction":0.8}}`, status: 422, request: violates},
		{name: "triage missing symptom", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: `{"particles":{"diameter_nm":100,"density_kg_m3":2000}}`, status: 422, request: violates},
		{name: "triage missing diameter", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: `{"symptom":"caking","particles":{"density_kg_m3":2000}}`, status: 422, request: violates},
		{name: "triage bad enum", method: "POST", path: "/v1/triage", contentType: jsonType,
			body:   `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000},"stabilizer":{"solvent_quality":"fair"}}`,
			status: 422, request: violates},
		{name: "triage unknown salt", method: "POST", path: "/v1/triage", contentType: jsonType,
			body:   `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000},"medium":{"electrolytes":[{"formula":"XyZ","concentration_mM":1}]}}`,
			status: 422},
		{name: "triage too hot for water", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: `{"symptom":"settling","particles":{"diameter_nm":100,"density_kg_m3":2000},"storage":{"temperature_c":150}}`, status: 422},
		{name: "triage body too large", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: `{"symptom":"settling","sample_id":"` + strings.Repeat("x", 300<<10) + `"}`, status: 413, request: violates},

		{name: "scales", method: "POST", path: "/v1/scales", contentType: jsonType, body: gs, status: 200},
		{name: "scales without symptom", method: "POST", path: "/v1/scales", contentType: jsonType, body: zetaSample, status: 200},
		{name: "scales out of range", method: "POST", path: "/v1/scales", contentType: jsonType,
			body: `{"particles":{"diameter_nm":0.1,"density_kg_m3":2000}}`, status: 422, request: violates},
		{name: "scales wrong media type", method: "POST", path: "/v1/scales", contentType: "application/xml", body: "<a/>", status: 415, request: violates},

		{name: "compare", method: "POST", path: "/v1/compare", contentType: jsonType, body: compareBody, status: 200,
			header: []string{"Idempotency-Key", "lot-41-42"}},
		{name: "compare identical", method: "POST", path: "/v1/compare", contentType: jsonType,
			body: `{"reference":` + gs + `,"complaint":` + gs + `}`, status: 200},
		{name: "compare out of range", method: "POST", path: "/v1/compare", contentType: jsonType,
			body:   `{"reference":{"particles":{"diameter_nm":0.1,"density_kg_m3":2000}},"complaint":{"symptom":"settling","particles":{"diameter_nm":100,"volume_fraction":0.9}}}`,
			status: 422, request: violates},
		{name: "compare without complaint", method: "POST", path: "/v1/compare", contentType: jsonType,
			body: `{"reference":` + gs + `}`, status: 422, request: violates},
		{name: "compare unknown salt", method: "POST", path: "/v1/compare", contentType: jsonType,
			body:   `{"reference":{"particles":{"diameter_nm":100,"density_kg_m3":2000},"medium":{"electrolytes":[{"formula":"XyZ","concentration_mM":1}]}},"complaint":` + gs + `}`,
			status: 422},
		{name: "compare unknown member", method: "POST", path: "/v1/compare", contentType: jsonType,
			body: `{"reference":` + gs + `,"complaint":` + gs + `,"third":{}}`, status: 400, request: violates},

		{name: "triage with observations", method: "POST", path: "/v1/triage", contentType: jsonType,
			body: `{"symptom":"settling","particles":{"diameter_nm":2000,"density_kg_m3":2200},"analysis":{"draws":0},"observations":[` +
				`{"age_days":7,"clear_layer_mm":2.1,"median_diameter_nm":2000},{"age_days":14,"clear_layer_mm":4.0,"median_diameter_nm":2050},` +
				`{"age_days":28,"clear_layer_mm":8.3,"median_diameter_nm":1980,"viscosity_mPa_s":1.1},{"age_days":42,"clear_layer_mm":11.9,"sediment_redisperses":false}]}`,
			status: 200},
		{name: "triage observation without age", method: "POST", path: "/v1/triage", contentType: jsonType,
			body:   `{"symptom":"settling","particles":{"diameter_nm":2000,"density_kg_m3":2200},"observations":[{"clear_layer_mm":2}]}`,
			status: 422, request: violates},

		{name: "profile JSON", method: "POST", path: profile, contentType: jsonType, body: zetaSample, status: 200},
		{name: "profile points", method: "POST", path: profile + "?points=50", contentType: jsonType, body: zetaSample, status: 200,
			header: []string{"Accept", "application/json"}},
		{name: "profile SVG", method: "POST", path: profile, contentType: jsonType, body: zetaSample, status: 200,
			header: []string{"Accept", "image/svg+xml"}},
		{name: "profile SVG preferred", method: "POST", path: profile, contentType: jsonType, body: zetaSample, status: 200,
			header: []string{"Accept", "application/json;q=0.5, image/svg+xml"}},
		{name: "profile points out of range", method: "POST", path: profile + "?points=5", contentType: jsonType, body: zetaSample,
			status: 400, request: violates},
		{name: "profile points not a number", method: "POST", path: profile + "?points=many", contentType: jsonType, body: zetaSample,
			status: 400, request: violates},
		{name: "profile not acceptable", method: "POST", path: profile, contentType: jsonType, body: zetaSample, status: 406,
			header: []string{"Accept", "text/html"}},
		{name: "profile without surface potential", method: "POST", path: profile, contentType: jsonType,
			body: `{"particles":{"diameter_nm":200,"density_kg_m3":2500}}`, status: 422},
		{name: "profile wrong media type", method: "POST", path: profile, contentType: "text/plain", body: zetaSample, status: 415, request: violates},
		{name: "profile not JSON", method: "POST", path: profile, contentType: jsonType, body: "[1,", status: 400, request: violates},

		{name: "batch JSON", method: "POST", path: "/v1/triage/batch", contentType: jsonType, body: jsonBatch, status: 200,
			header: []string{"Idempotency-Key", "lims-batch-3"}},
		{name: "batch JSON with failing items", method: "POST", path: "/v1/triage/batch", contentType: jsonType,
			body:   `{"samples":[` + gs + `,{"symptom":"settling","particles":{"diameter_nm":-1}},{"symptom":"settling","typo":1},7]}`,
			status: 200, request: violates},
		{name: "batch JSON answered as CSV", method: "POST", path: "/v1/triage/batch", contentType: jsonType, body: jsonBatch, status: 200,
			header: []string{"Accept", "text/csv"}},
		{name: "batch JSON answered as NDJSON", method: "POST", path: "/v1/triage/batch", contentType: jsonType, body: jsonBatch, status: 200,
			header: []string{"Accept", "application/x-ndjson"}},
		{name: "batch NDJSON", method: "POST", path: "/v1/triage/batch", contentType: mimeNDJSON, body: ndjsonBatch, status: 200},
		{name: "batch NDJSON answered as JSON", method: "POST", path: "/v1/triage/batch", contentType: mimeNDJSON, body: ndjsonBatch,
			status: 200, header: []string{"Accept", "application/json"}},
		{name: "batch CSV", method: "POST", path: "/v1/triage/batch", contentType: euroCSV, body: csvBatch, status: 200},
		{name: "batch CSV answered as CSV", method: "POST", path: "/v1/triage/batch", contentType: euroCSV, body: csvBatch, status: 200,
			header: []string{"Accept", `text/csv; delimiter=","; decimal="."`}},
		{name: "batch CSV answered as NDJSON", method: "POST", path: "/v1/triage/batch", contentType: euroCSV, body: csvBatch, status: 200,
			header: []string{"Accept", mimeNDJSON}},
		{name: "batch CSV bad cell", method: "POST", path: "/v1/triage/batch", contentType: euroCSV,
			body: "sample_id;symptom;particles.diameter_nm;particles.density_kg_m3\nR-1;settling;1.234,5;2000\n", status: 200},
		{name: "batch without samples", method: "POST", path: "/v1/triage/batch", contentType: jsonType, body: `{}`, status: 400, request: violates},
		{name: "batch not JSON", method: "POST", path: "/v1/triage/batch", contentType: jsonType, body: `{"samples":[`, status: 400, request: violates},
		{name: "batch CSV unknown column", method: "POST", path: "/v1/triage/batch", contentType: euroCSV,
			body: "sample_id;particles.diameter_um\nR-1;3\n", status: 400},
		{name: "batch CSV without dialect", method: "POST", path: "/v1/triage/batch", contentType: "text/csv", body: csvBatch,
			status: 415, request: unchecked},
		{name: "batch wrong media type", method: "POST", path: "/v1/triage/batch", contentType: "application/xml", body: "<a/>",
			status: 415, request: violates},
		{name: "batch not acceptable", method: "POST", path: "/v1/triage/batch", contentType: jsonType, body: jsonBatch, status: 406,
			header: []string{"Accept", "text/html"}},
		{name: "batch too many samples", method: "POST", path: "/v1/triage/batch", contentType: mimeNDJSON,
			body: strings.Repeat(`{"symptom":"settling","particles":{"diameter_nm":100}}`+"\n", maxBatchSamples+1), status: 413,
			request: unchecked},

		{name: "keys: health needs none", method: "GET", path: "/healthz", keys: []string{"k-1"}, status: 200},
		{name: "keys: metrics needs none", method: "GET", path: "/metrics", keys: []string{"k-1"}, status: 200},
		{name: "keys: catalog without key", method: "GET", path: "/v1/catalog", keys: []string{"k-1"}, status: 401},
		{name: "keys: document without key", method: "GET", path: "/openapi.json", keys: []string{"k-1"}, status: 401},
		{name: "keys: wrong key", method: "GET", path: "/v1/rules", keys: []string{"k-1"}, status: 401,
			header: []string{"Authorization", "Bearer k-2"}},
		{name: "keys: triage without key", method: "POST", path: "/v1/triage", contentType: jsonType, body: gs, keys: []string{"k-1"}, status: 401},
		{name: "keys: bearer", method: "GET", path: "/v1/materials", keys: []string{"k-1"}, status: 200,
			header: []string{"Authorization", "Bearer k-1"}},
		{name: "keys: X-API-Key", method: "POST", path: "/v1/triage", contentType: jsonType, body: gs, keys: []string{"k-1"}, status: 200,
			header: []string{"X-API-Key", "k-1"}},
	}
	for name, sample := range demos {
		xs = append(xs, exchange{name: "triage demo " + name, method: "POST", path: "/v1/triage", contentType: jsonType, body: sample, status: 200})
	}

	open := testServer(t)
	keyed := map[string]http.Handler{}
	for _, x := range xs {
		h := open
		if len(x.keys) > 0 {
			k := strings.Join(x.keys, ",")
			if keyed[k] == nil {
				keyed[k] = New(testEngine(t), Config{OpenAPI: openapi.JSON, APIKeys: x.keys})
			}
			h = keyed[k]
		}
		t.Run(x.name, func(t *testing.T) {
			t.Parallel()
			x.report(t, c.check(t, h, x))
		})
	}
}

// TestContractUnknownRoutes: an unknown path is a 404 and a method a path
// does not have a 405 with Allow, each a problem detail of the documented
// shape, as the document's description says.
func TestContractUnknownRoutes(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	problem := c.schema(t, "Problem")
	h := testServer(t)
	for _, r := range []struct {
		method, path string
		status       int
	}{{"GET", "/nowhere", 404}, {"GET", "/v1/triage", 405}, {"DELETE", "/v1/catalog", 405}} {
		rec := do(t, h, r.method, r.path, "", "")
		if rec.Code != r.status || (r.status == 405) != (rec.Header().Get(echo.HeaderAllow) != "") {
			t.Errorf("%s %s: status %d, Allow %q; want %d", r.method, r.path, rec.Code, rec.Header().Get(echo.HeaderAllow), r.status)
		}
		var v any
		if err := json.Unmarshal(rec.Body.Bytes(), &v); err != nil || rec.Header().Get(echo.HeaderContentType) != problemContentType {
			t.Errorf("%s %s: %s %.200s", r.method, r.path, rec.Header().Get(echo.HeaderContentType), rec.Body)
			continue
		}
		if err := problem.VisitJSON(v); err != nil {
			t.Errorf("%s %s: %v", r.method, r.path, err)
		}
		if rec.Header().Get(echo.HeaderXRequestID) == "" {
			t.Errorf("%s %s: no X-Request-Id", r.method, r.path)
		}
	}
}

func enumStrings(t testing.TB, s *openapi3.Schema) []string {
	t.Helper()
	out := make([]string, len(s.Enum))
	for i, v := range s.Enum {
		str, ok := v.(string)
		if !ok {
			t.Fatalf("enum value %v is not a string", v)
		}
		out[i] = str
	}
	return out
}

func entryIDs(entries []rule.Entry) []string {
	out := make([]string, len(entries))
	for i, e := range entries {
		out[i] = e.ID
	}
	return out
}

// sameSet reports the identifiers only one of got (the document) and want
// (the code) holds.
func sameSet(t *testing.T, what string, got, want []string) {
	t.Helper()
	g, w := slices.Sorted(slices.Values(got)), slices.Sorted(slices.Values(want))
	for _, id := range g {
		if _, found := slices.BinarySearch(w, id); !found {
			t.Errorf("%s: the document lists %q, the code does not", what, id)
		}
	}
	for _, id := range w {
		if _, found := slices.BinarySearch(g, id); !found {
			t.Errorf("%s: the code has %q, the document does not list it", what, id)
		}
	}
	if len(g) != len(slices.Compact(slices.Clone(g))) {
		t.Errorf("%s: the document lists an identifier twice", what)
	}
}

// TestContractIdentifiers: the document's enums of stable identifiers are
// the loaded catalogue and the advisor's scales, and each scale's unit in
// the document is the one the advisor reports.
func TestContractIdentifiers(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	cat := testEngine(t).RuleSet().Catalog
	sameSet(t, "Symptom", enumStrings(t, c.schema(t, "Symptom")), entryIDs(cat.Symptoms))
	sameSet(t, "CauseId", enumStrings(t, c.schema(t, "CauseId")), entryIDs(cat.Causes))
	sameSet(t, "RemedyId", enumStrings(t, c.schema(t, "RemedyId")), entryIDs(cat.Remedies))
	sameSet(t, "Rule.symptoms", enumStrings(t, c.schema(t, "Rule").Properties["symptoms"].Value.Items.Value),
		append(entryIDs(cat.Symptoms), "any"))

	specs := advisor.Scales()
	var names []string
	for _, s := range specs {
		names = append(names, s.Name)
	}
	sameSet(t, "ScaleName", enumStrings(t, c.schema(t, "ScaleName")), names)
	scales := c.schema(t, "Scales")
	sameSet(t, "Scales properties", slices.Collect(maps.Keys(scales.Properties)), names)
	for _, spec := range specs {
		p := scales.Properties[spec.Name]
		if p == nil {
			continue
		}
		if units := enumStrings(t, unitEnum(p.Value)); !slices.Equal(units, []string{spec.Unit}) {
			t.Errorf("scale %s: the document does not fix its unit to %q", spec.Name, spec.Unit)
		}
		if got := p.Value.Extensions["x-unit"]; got != spec.Unit || !strings.Contains(p.Value.Description, "Unit: "+spec.Unit) {
			t.Errorf("scale %s: x-unit %v, description %q; want unit %q", spec.Name, got, p.Value.Description, spec.Unit)
		}
	}
}

// unitEnum finds the schema of a scale's unit that carries its enum.
func unitEnum(s *openapi3.Schema) *openapi3.Schema {
	for _, part := range s.AllOf {
		if u := part.Value.Properties["unit"]; u != nil && len(u.Value.Enum) > 0 {
			return u.Value
		}
	}
	return &openapi3.Schema{}
}

// objectParts returns s and, recursively, its allOf parts: together they
// make up one object.
func objectParts(s *openapi3.Schema) []*openapi3.Schema {
	out := []*openapi3.Schema{s}
	for _, p := range s.AllOf {
		out = append(out, objectParts(p.Value)...)
	}
	return out
}

// TestContractSampleFields: every member of the sample's contract (read
// from input.Sample's tags) is in the document with its type, unit,
// range, enum, length, item limits and requiredness, no other member is,
// and every request object refuses unknown members as the decoder does.
func TestContractSampleFields(t *testing.T) {
	t.Parallel()
	checkObject(t, contractOf(reflect.TypeOf(input.Sample{})), contractDoc(t).schema(t, "Sample"), "")
}

// fixed is what the contract fixes about one member, written alike for
// the code and for the document so that the two compare as values.
type fixed struct {
	Type, Min, Max, Enum, Unit, MaxLength, MinItems, MaxItems, Alternative string
	Required                                                               bool
}

func checkObject(t *testing.T, n *node, s *openapi3.Schema, at string) {
	t.Helper()
	props := map[string]*openapi3.Schema{}
	required := map[string]bool{}
	docAlt, codeAlt := map[string]string{}, map[string]string{}
	for _, part := range objectParts(s) {
		if len(part.Properties) > 0 && (part.AdditionalProperties.Has == nil || *part.AdditionalProperties.Has) {
			t.Errorf("%s/: additionalProperties must be false, the decoder refuses unknown members", at)
		}
		for name, p := range part.Properties {
			props[name] = p.Value
		}
		for _, r := range part.Required {
			required[r] = true
		}
		for _, a := range part.AnyOf {
			for _, b := range part.AnyOf {
				if a != b && len(a.Value.Required) == 1 && len(b.Value.Required) == 1 {
					docAlt[a.Value.Required[0]] = b.Value.Required[0]
				}
			}
		}
	}
	for _, name := range n.names {
		if alt := n.members[name].alternative; alt != "" {
			codeAlt[name], codeAlt[alt] = alt, name
		}
	}
	for _, name := range n.names {
		m, p, where := n.members[name], props[name], at+"/"+name
		if p == nil {
			t.Errorf("%s: not in the document", where)
			continue
		}
		if doc, code := documented(t, p, required[name], docAlt[name]), coded(m, codeAlt[name]); doc != code {
			t.Errorf("%s:\n document %+v\n code     %+v", where, doc, code)
		}
		if (m.kind == reflect.Float64 || m.kind == reflect.Int) && m.unit == "" {
			t.Errorf("%s: a number without a unit tag", where)
		}
		if m.unit != "" && !strings.Contains(p.Description, "Unit: "+m.unit) {
			t.Errorf("%s: the description %q does not state the unit %s", where, p.Description, m.unit)
		}
		switch {
		case m.kind == reflect.Struct:
			checkObject(t, m, p, where)
		case m.kind == reflect.Slice && m.elem.kind == reflect.Struct && p.Items != nil:
			checkObject(t, m.elem, p.Items.Value, where+"/*")
		}
	}
	for name := range props {
		if n.members[name] == nil {
			t.Errorf("%s/%s: in the document, not in the code", at, name)
		}
	}
}

// coded is what the tags behind n fix.
func coded(n *node, alternative string) fixed {
	f := fixed{Unit: n.unit, Required: n.required, Alternative: alternative,
		Type: map[reflect.Kind]string{reflect.Float64: "number", reflect.Int: "integer", reflect.String: "string",
			reflect.Bool: "boolean", reflect.Slice: "array", reflect.Struct: "object", reflect.Map: "object"}[n.kind]}
	number := func(v string) string {
		x, _ := strconv.ParseFloat(v, 64)
		return strconv.FormatFloat(x, 'g', -1, 64)
	}
	for _, op := range []struct {
		rule, sign string
		to         *string
	}{{"gt", ">", &f.Min}, {"gte", ">=", &f.Min}, {"lt", "<", &f.Max}, {"lte", "<=", &f.Max}} {
		if v, ok := n.rules[op.rule]; ok {
			*op.to = op.sign + number(v)
		}
	}
	switch n.kind {
	case reflect.String:
		f.MaxLength, f.Enum = n.rules["max"], n.rules["oneof"]
	case reflect.Slice:
		f.MinItems, f.MaxItems = n.rules["min"], n.rules["max"]
	}
	return f
}

// documented is what the document says of the same member.
func documented(t testing.TB, p *openapi3.Schema, required bool, alternative string) fixed {
	f := fixed{Required: required, Alternative: alternative, Enum: strings.Join(enumStrings(t, p), " ")}
	f.Unit, _ = p.Extensions["x-unit"].(string)
	switch {
	case p.Type != nil && len(*p.Type) > 0:
		f.Type = (*p.Type)[0]
	case len(p.AllOf) > 0:
		f.Type = "object"
	}
	bound := func(v *float64, exclusive *bool, strict, loose string) string {
		if v == nil {
			return ""
		}
		if exclusive != nil && *exclusive {
			return strict + strconv.FormatFloat(*v, 'g', -1, 64)
		}
		return loose + strconv.FormatFloat(*v, 'g', -1, 64)
	}
	f.Min, f.Max = bound(p.Min, p.ExclusiveMin.Bool, ">", ">="), bound(p.Max, p.ExclusiveMax.Bool, "<", "<=")
	count := func(v *uint64) string {
		if v == nil {
			return ""
		}
		return strconv.FormatUint(*v, 10)
	}
	f.MaxLength, f.MaxItems = count(p.MaxLength), count(p.MaxItems)
	if p.MinItems != 0 {
		f.MinItems = strconv.FormatUint(p.MinItems, 10)
	}
	return f
}

// defaultNote is an assumption that names a request field and the default
// the engine used for it.
var defaultNote = regexp.MustCompile(`^([a-z_]+(?:\.[a-zA-Z0-9_]+)+) not given: (?:default ([^ ]+)(?: (.+))?|(\w+) assumed)$`)

// TestContractDefaults: each default the document declares is the value the
// engine fills in, as the report's inputs (the sample as understood) and
// its assumptions show, in the field's unit; and each declared default is
// seen in use.
func TestContractDefaults(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	spec := c.schema(t, "Sample")
	declared := map[string]any{}
	var collect func(s *openapi3.Schema, at string)
	collect = func(s *openapi3.Schema, at string) {
		for _, part := range objectParts(s) {
			for n, p := range part.Properties {
				field := strings.TrimPrefix(at+"."+n, ".")
				if p.Value.Default != nil {
					declared[field] = p.Value.Default
				}
				if p.Value.Type.Is("object") {
					collect(p.Value, field)
				}
			}
		}
	}
	collect(spec, "")
	fieldSchema := func(field string) *openapi3.Schema {
		s := spec
		for _, n := range strings.Split(field, ".") {
			props, _, _ := members(s)
			if s = props[n]; s == nil {
				return nil
			}
		}
		return s
	}

	h := testServer(t)
	used := map[string]bool{}
	// Samples that state nothing a default fills: a solid, and droplets
	// (whose ripening properties have defaults of their own).
	for _, body := range []string{
		`{"symptom":"settling","particles":{"diameter_nm":500,"density_kg_m3":2500}}`,
		`{"symptom":"creaming","particles":{"phase":"liquid","diameter_nm":500,"density_kg_m3":900,"zeta_mV":-30}}`,
	} {
		rec := do(t, h, http.MethodPost, "/v1/triage", jsonType, body)
		var out struct {
			Assumptions []string       `json:"assumptions"`
			Inputs      map[string]any `json:"inputs"`
		}
		if err := json.Unmarshal(rec.Body.Bytes(), &out); err != nil || rec.Code != 200 {
			t.Fatalf("%d %.300s", rec.Code, rec.Body)
		}
		for field, want := range declared {
			var v any = out.Inputs
			for _, n := range strings.Split(field, ".") {
				m, _ := v.(map[string]any)
				v = m[n]
			}
			if v == nil {
				continue
			}
			used[field] = true
			if fmt.Sprint(v) != fmt.Sprint(want) {
				t.Errorf("%s: the document's default is %v, the inputs as understood hold %v", field, want, v)
			}
		}
		for _, note := range out.Assumptions {
			m := defaultNote.FindStringSubmatch(note)
			if m == nil {
				continue
			}
			field, s := m[1], fieldSchema(m[1])
			if s == nil {
				t.Errorf("assumption %q names a field the document does not have", note)
				continue
			}
			want, ok := declared[field]
			if !ok {
				continue // a default that depends on the sample, described in prose
			}
			got := m[4]
			if m[2] != "" {
				got = m[2]
			}
			if fmt.Sprint(want) != got {
				t.Errorf("%s: the document's default is %v, the engine used %s", field, want, got)
			}
			if unit, _ := s.Extensions["x-unit"].(string); m[2] != "" && m[3] != unit && !(unit == "1" && m[3] == "") {
				t.Errorf("%s: default stated in %q, the field's unit is %q", field, m[3], unit)
			}
		}
	}
	for field := range declared {
		if !used[field] {
			t.Errorf("%s: the document declares a default the engine was not seen to use", field)
		}
	}
}

// TestContractCSVDialects: every delimiter and decimal separator the
// document declares for a CSV batch is read, a pair of equal ones is
// refused with 415 as documented, and the documented columns of a CSV
// answer are the ones written.
func TestContractCSVDialects(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	op := c.doc.Paths.Find("/v1/triage/batch").Post
	params, _ := op.RequestBody.Value.Content.Get(mimeCSV).Extensions["x-media-type-parameters"].(map[string]any)
	declared := func(name string) []string {
		p, _ := params[name].(map[string]any)
		values, _ := p["enum"].([]any)
		out := make([]string, len(values))
		for i, v := range values {
			out[i], _ = v.(string)
		}
		if len(out) == 0 {
			t.Fatalf("the document declares no values of the CSV parameter %s", name)
		}
		return out
	}
	h := testServer(t)
	for _, delim := range declared("delimiter") {
		for _, dec := range declared("decimal") {
			sep := map[string]string{"tab": "\t"}[delim]
			if sep == "" {
				sep = delim
			}
			body := strings.Join([]string{"sample_id", "symptom", "particles.diameter_nm", "particles.density_kg_m3"}, sep) + "\n" +
				strings.Join([]string{"R-1", "settling", "2" + dec + "5e3", "2000"}, sep) + "\n"
			ct := fmt.Sprintf(`text/csv; header=present; charset=utf-8; delimiter="%s"; decimal="%s"`, delim, dec)
			rec := do(t, h, http.MethodPost, "/v1/triage/batch", ct, body)
			want := http.StatusOK
			if sep == dec {
				want = http.StatusUnsupportedMediaType
			}
			if rec.Code != want {
				t.Errorf("%s: status %d, want %d: %.300s", ct, rec.Code, want, rec.Body)
				continue
			}
			if want == http.StatusOK && !strings.Contains(rec.Body.String(), `"status":200`) {
				t.Errorf("%s: the row did not triage: %.300s", ct, rec.Body)
			}
		}
	}
	answer := op.Responses.Status(http.StatusOK).Value.Content.Get(mimeCSV).Schema.Value.Description
	if !strings.Contains(strings.Join(strings.Fields(answer), " "), strings.Join(csvAnswerHeader, ", ")) {
		t.Errorf("the documented CSV answer %q does not list the columns %q", answer, csvAnswerHeader)
	}
}

// TestContractProblemTypes: the document's enum of problem types is every
// type of the problem table and about:blank, and every kind has its entry.
func TestContractProblemTypes(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	used := []string{typeBlank}
	for k := kind(1); k < kindCount; k++ {
		pc := problemKinds[k]
		if pc.typ == "" || pc.title == "" || pc.status == 0 {
			t.Errorf("kind %d has no entry in problemKinds", k)
		}
		if !slices.Contains(used, pc.typ) {
			used = append(used, pc.typ)
		}
	}
	sameSet(t, "Problem.type", enumStrings(t, c.schema(t, "Problem").Properties["type"].Value), used)
}

// TestContractBodyLimits: each route's documented body limit is the byte
// count the code sets, written out in full.
func TestContractBodyLimits(t *testing.T) {
	t.Parallel()
	c := contractDoc(t)
	written := func(limit string) string {
		n, err := gommonbytes.Parse(limit)
		if err != nil {
			t.Fatal(err)
		}
		s := strconv.FormatInt(n, 10)
		for i := len(s) - 3; i > 0; i -= 3 {
			s = s[:i] + "," + s[i:]
		}
		return s + " bytes"
	}
	single, batch := written(DefaultConfig.BodyLimit), written(batchBodyLimit)
	for path, want := range map[string]string{"/v1/triage": single, "/v1/scales": single,
		"/v1/interaction-profile": single, "/v1/compare": single, "/v1/triage/batch": batch} {
		if d := c.doc.Paths.Find(path).Post.Description; !strings.Contains(d, "Body limit "+want+".") {
			t.Errorf("%s: the description does not state the body limit %s", path, want)
		}
	}
	tooLarge := strings.Join(strings.Fields(*c.doc.Components.Responses["PayloadTooLarge"].Value.Description), " ")
	if !strings.Contains(tooLarge, single) || !strings.Contains(tooLarge, batch) {
		t.Errorf("PayloadTooLarge does not state the limits %s and %s: %q", single, batch, tooLarge)
	}
}
