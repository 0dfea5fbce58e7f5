package api

import (
	"bytes"
	"encoding/json"
	"os"
	"path/filepath"
	"testing"

	gojson "github.com/goccy/go-json"

	"colloidtriage/advisor"
	"colloidtriage/advisor/input"
)

// TestEncoderMatchesStdlib: the response encoder writes the bytes
// encoding/json writes (without HTML escaping, compact and indented) for
// every demo report, the catalogue and the library listing.
func TestEncoderMatchesStdlib(t *testing.T) {
	t.Parallel()
	eng := testEngine(t)
	values := map[string]any{
		"catalog": catalogResponse{Catalog: eng.RuleSet().Catalog, Scales: advisor.Scales()},
		"library": eng.Library().Listing(),
		"rules":   eng.RuleSet().Rules(),
		"numbers": []float64{0, -1, 1e-7, 1e-6, 9.99e-7, 1e20, 1e21, 123456789.125, 0.1 + 0.2, 5e-324, 1.7976931348623157e308, -2.5e-9},
		"text":    map[string]string{"b": "x < 3 && y > 1", "a": "µm², °C, \"quoted\"\n\t", "c": "\u2028\u2029 <tag>"},
	}
	files, err := filepath.Glob("../testdata/demo/*.json")
	if err != nil || len(files) == 0 {
		t.Fatalf("demo files: %v", err)
	}
	for _, f := range files {
		data, err := os.ReadFile(f)
		if err != nil {
			t.Fatal(err)
		}
		var s input.Sample
		if err := json.Unmarshal(data, &s); err != nil {
			t.Fatal(err)
		}
		r, err := eng.Triage(&s)
		if err != nil {
			t.Fatal(err)
		}
		values[filepath.Base(f)] = r
	}
	for name, v := range values {
		for _, indent := range []string{"", "  "} {
			var want, got bytes.Buffer
			std := json.NewEncoder(&want)
			std.SetEscapeHTML(false)
			std.SetIndent("", indent)
			fast := gojson.NewEncoder(&got)
			fast.SetEscapeHTML(false)
			fast.SetIndent("", indent)
			if err := std.Encode(v); err != nil {
				t.Fatal(err)
			}
			if err := fast.Encode(v); err != nil {
				t.Fatal(err)
			}
			if !bytes.Equal(got.Bytes(), want.Bytes()) {
				t.Errorf("%s (indent %q): encoders differ\nstdlib: %.300s\nfast:   %.300s", name, indent, want.String(), got.String())
			}
		}
	}
}
