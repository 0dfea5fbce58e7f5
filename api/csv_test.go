package api

import (
	"encoding/csv"
	"encoding/json"
	"math"
	"net/http"
	"net/http/httptest"
	"os"
	"regexp"
	"strings"
	"testing"

	"github.com/labstack/echo/v4"

	"colloidtriage/advisor"
	"colloidtriage/advisor/remedy"
)

const euroCSV = `text/csv; header=present; delimiter=";"; decimal=","`

func exampleCSV(t testing.TB) string {
	t.Helper()
	b, err := os.ReadFile("../testdata/batch/example.csv")
	if err != nil {
		t.Fatal(err)
	}
	return string(b)
}

// TestCSVExample: the documented example file triages row by row, each
// item naming its sample and its line.
func TestCSVExample(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", euroCSV, exampleCSV(t))
	if rec.Code != 200 {
		t.Fatalf("%d %.400s", rec.Code, rec.Body)
	}
	r := decodeBatch(t, rec.Body.Bytes())
	if r.Count != 5 || r.Failed != 0 {
		t.Fatalf("count %d failed %d: %.600s", r.Count, r.Failed, rec.Body)
	}
	for i, it := range r.Items {
		if it.Index != i || it.Line != i+2 || it.SampleID != "DEMO-CSV-00"+string(rune('1'+i)) || it.Report == nil {
			t.Errorf("item %d: %+v", i, it)
		}
	}
}

// TestCSVDialects: the same samples written in three dialects give the same
// reports, so "0,05" with decimal="," is read as 0.05 exactly.
func TestCSVDialects(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	euro := exampleCSV(t) // no cell holds a comma or semicolon besides separators
	point := strings.ReplaceAll(strings.ReplaceAll(euro, ",", "."), ";", ",")
	tab := strings.ReplaceAll(point, ",", "\t")
	reports := func(contentType, body string) []json.RawMessage {
		rec := do(t, h, http.MethodPost, "/v1/triage/batch", contentType, body)
		var out struct {
			Items []struct {
				Report json.RawMessage `json:"report"`
			} `json:"items"`
		}
		if err := json.Unmarshal(rec.Body.Bytes(), &out); err != nil || rec.Code != 200 || len(out.Items) != 5 {
			t.Fatalf("%s: %d %v %.300s", contentType, rec.Code, err, rec.Body)
		}
		rs := make([]json.RawMessage, len(out.Items))
		for i, it := range out.Items {
			rs[i] = it.Report
		}
		return rs
	}
	want := reports(euroCSV, euro)
	for _, c := range []struct{ contentType, body string }{
		{`text/csv; delimiter=","; decimal="."`, point},
		{`text/csv; charset=UTF-8; delimiter=tab; decimal="."`, tab},
		{`text/csv; delimiter=";"; decimal=","`, "\ufeff" + euro},
	} {
		for i, got := range reports(c.contentType, c.body) {
			if string(got) != string(want[i]) {
				t.Errorf("%s: row %d report differs", c.contentType, i)
			}
		}
	}
	var first struct {
		Inputs struct {
			Particles struct {
				VolumeFraction float64 `json:"volume_fraction"`
			} `json:"particles"`
			Observation struct {
				ClearLayerMm float64 `json:"clear_layer_mm"`
			} `json:"observation"`
		} `json:"inputs"`
	}
	if err := json.Unmarshal(want[0], &first); err != nil {
		t.Fatal(err)
	}
	if first.Inputs.Particles.VolumeFraction != 0.05 || first.Inputs.Observation.ClearLayerMm != 4.5 {
		t.Errorf("inputs read as %+v, want 0.05 and 4.5", first.Inputs)
	}
}

// TestCSVMediaTypeRefused: the dialect must be declared, completely and
// consistently; nothing is guessed.
func TestCSVMediaTypeRefused(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	for _, ct := range []string{
		`text/csv`,
		`text/csv; delimiter=";"`,
		`text/csv; decimal=","`,
		`text/csv; delimiter=","; decimal=","`,
		`text/csv; delimiter="|"; decimal="."`,
		`text/csv; delimiter=";"; decimal="'"`,
		`text/csv; header=absent; delimiter=";"; decimal=","`,
		`text/csv; charset=iso-8859-1; delimiter=";"; decimal=","`,
	} {
		rec := do(t, h, http.MethodPost, "/v1/triage/batch", ct, exampleCSV(t))
		var p problemBody
		if rec.Code != 415 || json.Unmarshal(rec.Body.Bytes(), &p) != nil || p.Type != typeInvalidCSV {
			t.Errorf("%s: %d %.200s", ct, rec.Code, rec.Body)
		}
	}
}

// TestCSVHeaderRefused: a bad header fails the whole file, naming every bad
// column.
func TestCSVHeaderRefused(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	cases := []struct {
		name, header string
		pointers     []string
		reason       string
	}{
		{"unknown", "sample_id;symptom;particles.size_nm", []string{"/header/2"}, `unknown column "particles.size_nm"`},
		{"case", "symptom;particles.zeta_mv", []string{"/header/1"}, `did you mean "particles.zeta_mV"?`},
		{"repeated", "symptom;particles.diameter_nm;particles.diameter_nm", []string{"/header/2"}, "appears twice"},
		{"empty name", "symptom;;particles.diameter_nm", []string{"/header/1"}, "empty column name"},
		{"not a leaf", "symptom;particles", []string{"/header/1"}, "unknown column"},
		{"index past the limit", "symptom;medium.electrolytes.20.formula", []string{"/header/1"}, "unknown column"},
		{"several", "symptom;foo;bar", []string{"/header/1", "/header/2"}, "unknown column"},
		{"wrong delimiter", "symptom,particles.diameter_nm", []string{"/header/0"}, "unknown column"},
	}
	for _, c := range cases {
		rec := do(t, h, http.MethodPost, "/v1/triage/batch", euroCSV, c.header+"\nsettling;1\n")
		var p problemBody
		if rec.Code != 400 || json.Unmarshal(rec.Body.Bytes(), &p) != nil || p.Type != typeInvalidCSV ||
			len(p.Errors) != len(c.pointers) {
			t.Errorf("%s: %d %.300s", c.name, rec.Code, rec.Body)
			continue
		}
		for i, f := range p.Errors {
			if f.Pointer != c.pointers[i] || !strings.Contains(f.Reason, c.reason) {
				t.Errorf("%s: error %+v, want %s %q", c.name, f, c.pointers[i], c.reason)
			}
		}
	}
}

// TestCSVBodyRefused: a body that is not CSV fails whole.
func TestCSVBodyRefused(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	for name, body := range map[string]string{
		"empty":      "",
		"bare quote": "sample_id;symptom\nA\"B;settling\n",
		"open quote": "sample_id;symptom\n\"A;settling\n",
	} {
		rec := do(t, h, http.MethodPost, "/v1/triage/batch", euroCSV, body)
		var p problemBody
		if rec.Code != 400 || json.Unmarshal(rec.Body.Bytes(), &p) != nil || p.Type != typeInvalidCSV {
			t.Errorf("%s: %d %.200s", name, rec.Code, rec.Body)
		}
	}
}

const rowsHeader = "sample_id;symptom;particles.material;particles.diameter_nm;particles.density_kg_m3;particles.volume_fraction;" +
	"medium.electrolytes.0.formula;medium.electrolytes.0.cation_valence;medium.electrolytes.0.anion_valence;" +
	"medium.electrolytes.0.concentration_mM;observation.sediment_redisperses"

// rowCases are rows under rowsHeader with the status and cell pointer they
// must get; n in the pointer is the item index.
var rowCases = []struct {
	row     string
	status  int
	pointer string
}{
	{"R0;settling;titania_rutile;2500;;0,05;NaCl;;;1;true", 200, ""},
	{"R1;settling;;1.234,5;2000;0,05;;;;;", 400, "/rows/1/particles.diameter_nm"},
	{"R2;settling;;1500;2000;0,05;;;", 400, "/rows/2"},
	{"R3;settling;;1500;2000;0,9;;;;;", 422, "/rows/3/particles.volume_fraction"},
	{"R4;caking;unobtainium;1500;;;;;;;", 422, "/rows/4/particles.material"},
	{"R5;caking;;1500;2000;;;;;;yes", 400, "/rows/5/observation.sediment_redisperses"},
	{"R6;flocculation;;1500;2000;;;1,0;1;5;", 400, "/rows/6/medium.electrolytes.0.cation_valence"},
	{";;;;;;;;;;", 0, ""}, // all empty: skipped
	{"R7;flocculation;;1500;2000;;;;;5;", 422, "/rows/7/medium.electrolytes.0"},
	{"R8;settling;;1500;2000;0,1;NaCl;;;1e400;", 400, "/rows/8/medium.electrolytes.0.concentration_mM"},
	{`"R;9";creaming;soybean_oil;1500;;0,1;;;;;`, 200, ""},
}

// TestCSVRowProblems: a bad cell or row fails that row only, pointing at
// the cell; the other rows triage.
func TestCSVRowProblems(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	rows := []string{rowsHeader}
	for _, c := range rowCases {
		rows = append(rows, c.row)
	}
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", euroCSV, strings.Join(rows, "\n")+"\n")
	r := decodeBatch(t, rec.Body.Bytes())
	if rec.Code != 200 || r.Count != len(rowCases)-1 {
		t.Fatalf("%d count %d: %.500s", rec.Code, r.Count, rec.Body)
	}
	i := 0
	for line, c := range rowCases {
		if c.status == 0 {
			continue
		}
		it := r.Items[i]
		id, _, _ := strings.Cut(strings.Trim(c.row, `"`), ";")
		if c.row[0] == '"' {
			id = "R;9"
		}
		if it.Status != c.status || it.SampleID != id || it.Line != line+2 {
			t.Errorf("row %q: status %d id %q line %d, want %d %q %d", c.row, it.Status, it.SampleID, it.Line, c.status, id, line+2)
		}
		if c.pointer != "" && (it.Problem == nil || !hasPointer(it.Problem, c.pointer)) {
			t.Errorf("row %q: no error at %s in %+v", c.row, c.pointer, it.Problem)
		}
		i++
	}
}

// TestCSVDecimalPoint: with decimal="." a decimal comma is refused, not
// read as a thousands separator or a point.
func TestCSVDecimalPoint(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	body := "sample_id;symptom;particles.diameter_nm;particles.density_kg_m3\nP0;settling;1,5;2000\nP1;settling;1500.5;2000\n"
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", `text/csv; delimiter=";"; decimal="."`, body)
	r := decodeBatch(t, rec.Body.Bytes())
	if len(r.Items) != 2 || r.Items[0].Status != 400 || !hasPointer(r.Items[0].Problem, "/rows/0/particles.diameter_nm") ||
		r.Items[1].Status != 200 {
		t.Errorf("%.600s", rec.Body)
	}
}

// TestCSVAnswer: Accept: text/csv answers one row per sample in the
// request's dialect, or the one the Accept range declares.
func TestCSVAnswer(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	rows := []string{rowsHeader}
	for _, c := range rowCases {
		rows = append(rows, c.row)
	}
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", euroCSV, strings.Join(rows, "\n"), "Accept", "text/csv")
	if rec.Code != 200 || rec.Header().Get("Content-Type") != `text/csv; charset=utf-8; decimal=","; delimiter=";"; header=present` {
		t.Fatalf("%d %s", rec.Code, rec.Header().Get("Content-Type"))
	}
	cr := csv.NewReader(rec.Body)
	cr.Comma = ';'
	got, err := cr.ReadAll()
	if err != nil || len(got) != len(rowCases) || strings.Join(got[0], ",") != strings.Join(csvAnswerHeader, ",") {
		t.Fatalf("%v %q", err, got)
	}
	if ok := got[1]; ok[0] != "R0" || ok[1] != "200" || ok[2] == "" || !strings.Contains(ok[3], ",") || ok[9] != "" {
		t.Errorf("row R0: %q", ok)
	}
	if bad := got[2]; bad[0] != "R1" || bad[1] != "400" || bad[2] != "" || !strings.Contains(bad[9], "/rows/1/particles.diameter_nm") {
		t.Errorf("row R1: %q", bad)
	}
	if last := got[len(got)-1]; last[0] != "R;9" || last[1] != "200" {
		t.Errorf("last row: %q", last)
	}

	// A JSON batch asking for CSV in its own dialect.
	body := `{"samples":[` + limsCases[0].sample("J0") + `]}`
	rec = do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", body, "Accept", `text/csv; delimiter=tab; decimal=","`)
	if lines := strings.Split(rec.Body.String(), "\r\n"); rec.Code != 200 || len(lines) != 3 ||
		!strings.HasPrefix(lines[1], "J0\t200\tgravity_settling\t0,") {
		t.Errorf("%d %q", rec.Code, rec.Body)
	}
	rec = do(t, h, http.MethodPost, "/v1/triage/batch", "application/json", body, "Accept", `text/csv; delimiter=","; decimal=","`)
	if rec.Code != 406 {
		t.Errorf("inconsistent Accept dialect: %d", rec.Code)
	}
}

// TestParseDecimal: the number grammar of CSV cells.
func TestParseDecimal(t *testing.T) {
	t.Parallel()
	cases := []struct {
		cell    string
		decimal rune
		want    float64
		ok      bool
	}{
		{"1,5", ',', 1.5, true},
		{"-0,25", ',', -0.25, true},
		{"+3", ',', 3, true},
		{",5", ',', 0.5, true},
		{"2,5e3", ',', 2500, true},
		{"1E-3", '.', 0.001, true},
		{"1.5", '.', 1.5, true},
		{"1.5", ',', 0, false},
		{"1,5", '.', 0, false},
		{"1.234,5", ',', 0, false},
		{"1,234.5", '.', 0, false},
		{"1 000", '.', 0, false},
		{"NaN", '.', 0, false},
		{"Inf", '.', 0, false},
		{"0x10", '.', 0, false},
		{"1e", '.', 0, false},
		{".", '.', 0, false},
		{"-", '.', 0, false},
		{"1e400", '.', 0, false},
	}
	for _, c := range cases {
		v, reason := parseDecimal(c.cell, c.decimal)
		if ok := reason == ""; ok != c.ok || (ok && math.Abs(v.(float64)-c.want) > 1e-15*math.Abs(c.want)) {
			t.Errorf("parseDecimal(%q, %q) = %v %q, want %v ok=%t", c.cell, c.decimal, v, reason, c.want, c.ok)
		}
	}
}

// TestCSVColumnsDocumented: testdata/batch/README.md lists every column of
// the sample contract, so the documentation cannot fall behind the type.
func TestCSVColumnsDocumented(t *testing.T) {
	t.Parallel()
	b, err := os.ReadFile("../testdata/batch/README.md")
	if err != nil {
		t.Fatal(err)
	}
	readme := string(b)
	index := regexp.MustCompile(`\.\d+\.`)
	for name := range csvColumns() {
		pattern := index.ReplaceAllString(name, ".<i>.")
		if !strings.Contains(readme, "| `"+pattern+"` |") {
			t.Errorf("column %s is not documented in testdata/batch/README.md", pattern)
		}
	}
}

// TestCSVAnswerNeutralisesFormulas: a text cell of a CSV answer that a
// spreadsheet would run as a formula (it begins with =, +, -, @, tab or
// carriage return) is prefixed with a single quote (OWASP, "CSV
// Injection"), from JSON and CSV input alike.
func TestCSVAnswerNeutralisesFormulas(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	ids := []string{`=HYPERLINK("http://x","y")`, "+1+1", "-2", "@SUM(1)", "\tTAB", "\rCR"}
	check := func(how string, body []byte, want func(id string) string) {
		t.Helper()
		rows, err := csv.NewReader(strings.NewReader(string(body))).ReadAll()
		if err != nil || len(rows) != len(ids)+1 {
			t.Fatalf("%s: %v %q", how, err, body)
		}
		for i, row := range rows[1:] {
			// encoding/csv reads a carriage return inside quotes as nothing.
			// Tab and carriage return make the sample invalid, not the cell live.
			if w := strings.ReplaceAll(want(ids[i]), "\r", ""); row[0] != w {
				t.Errorf("%s: row %q, want sample_id %q", how, row, w)
			}
		}
	}
	var samples []string
	for _, id := range ids {
		s, err := json.Marshal(id)
		if err != nil {
			t.Fatal(err)
		}
		samples = append(samples, strings.Replace(limsCases[0].sample("X"), `"X"`, string(s), 1))
	}
	rec := do(t, h, http.MethodPost, "/v1/triage/batch", "application/json",
		`{"samples":[`+strings.Join(samples, ",")+`]}`, "Accept", "text/csv")
	check("JSON in", rec.Body.Bytes(), func(id string) string { return "'" + id })

	var in strings.Builder
	w := csv.NewWriter(&in)
	_ = w.Write([]string{"sample_id", "symptom", "particles.material", "particles.diameter_nm", "particles.volume_fraction"})
	for _, id := range ids {
		_ = w.Write([]string{id, "settling", "titania_rutile", "2500", "0.05"})
	}
	w.Flush()
	rec = do(t, h, http.MethodPost, "/v1/triage/batch", `text/csv; delimiter=","; decimal="."`, in.String(), "Accept", "text/csv")
	// CSV cells are trimmed, so tab and carriage return are gone.
	check("CSV in", rec.Body.Bytes(), func(id string) string { return inertCell(strings.TrimSpace(id)) })
}

// TestCSVAnswerKeepsNumbers: number cells never get the quote, a negative
// target value (a zeta potential, say) included; text cells always do.
func TestCSVAnswerKeepsNumbers(t *testing.T) {
	t.Parallel()
	e := echo.New()
	rec := httptest.NewRecorder()
	c := e.NewContext(httptest.NewRequest(http.MethodPost, "/", nil), rec)
	item := batchItem{SampleID: "-7", Status: 200, Report: &advisor.Report{Causes: []advisor.Cause{{ID: "low_surface_charge",
		Score: 0.5, Remedies: []advisor.Remedy{{ID: "raise_surface_charge",
			Target: &remedy.Target{Quantity: "particles.zeta_mV", Op: "<=", Value: -30, Unit: "-mV"}}}}}}}
	d := csvDialect{delimiter: ';', decimal: ','}
	if err := writeCSV(c, [][]string{csvRow(item, d)}, d); err != nil {
		t.Fatal(err)
	}
	want := "'-7;200;low_surface_charge;0,5;raise_surface_charge;particles.zeta_mV;<=;-30;'-mV;\r\n"
	if _, row, _ := strings.Cut(rec.Body.String(), "\r\n"); row != want {
		t.Errorf("row %q, want %q", row, want)
	}
}
