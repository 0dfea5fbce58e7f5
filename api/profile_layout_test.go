package api

import (
	"encoding/xml"
	"errors"
	"io"
	"net/http"
	"strconv"
	"strings"
	"testing"
	"unicode"
)

// svgText is one text of a chart with its box in the SVG's user units,
// measured from the bottom left (the chart's own y axis points up).
type svgText struct {
	s                      string
	left, right, low, high float64
}

// advanceEm estimates the advance width of a character in em of a
// sans-serif face: generous for capitals and wide letters, so that a
// substitute font a little wider than the one the layout measured still
// passes. (Helvetica-class widths from memory: capitals 0.61-0.94 em,
// lower case 0.22-0.83, digits 0.556, space 0.278.)
func advanceEm(r rune) float64 {
	switch {
	case strings.ContainsRune(" .,:;'|!ijlIft()[]", r):
		return 0.33
	case r == 'm' || r == 'w' || r == 'M' || r == 'W':
		return 0.9
	case unicode.IsUpper(r):
		return 0.72
	}
	return 0.58
}

// chartLayout reads a chart's size, its unrotated texts with estimated
// boxes, and every coordinate of its paths.
func chartLayout(t *testing.T, body string) (width, height float64, texts []svgText, points [][2]float64) {
	t.Helper()
	dec := xml.NewDecoder(strings.NewReader(body))
	rotated := 0 // depth inside a rotated group
	var groups []bool
	for {
		tok, err := dec.Token()
		if errors.Is(err, io.EOF) {
			return width, height, texts, points
		}
		if err != nil {
			t.Fatalf("SVG is not well-formed XML: %v", err)
		}
		switch tk := tok.(type) {
		case xml.StartElement:
			attr := map[string]string{}
			for _, a := range tk.Attr {
				attr[a.Name.Local] = a.Value
			}
			switch tk.Name.Local {
			case "svg":
				box := strings.Fields(attr["viewBox"])
				width, _ = strconv.ParseFloat(box[2], 64)
				height, _ = strconv.ParseFloat(box[3], 64)
			case "g":
				r := strings.Contains(attr["transform"], "rotate")
				groups = append(groups, r)
				if r {
					rotated++
				}
			case "text":
				if rotated > 0 {
					continue
				}
				var s string
				if err := dec.DecodeElement(&s, &tk); err != nil {
					t.Fatal(err)
				}
				x, _ := strconv.ParseFloat(attr["x"], 64)
				y, _ := strconv.ParseFloat(attr["y"], 64)
				i := strings.Index(attr["style"], "font-size:")
				size, _ := strconv.ParseFloat(strings.TrimSuffix(attr["style"][i+len("font-size:"):], "px"), 64)
				var em float64
				for _, r := range s {
					em += advanceEm(r)
				}
				// The text is drawn flipped: its baseline lies at -y from the bottom.
				texts = append(texts, svgText{s: s, left: x, right: x + em*size, low: -y - 0.25*size, high: -y + 0.8*size})
			case "path":
				for _, f := range strings.FieldsFunc(attr["d"], func(r rune) bool { return unicode.IsLetter(r) }) {
					xy := strings.Split(f, ",")
					if len(xy) != 2 {
						continue
					}
					x, _ := strconv.ParseFloat(xy[0], 64)
					y, _ := strconv.ParseFloat(xy[1], 64)
					points = append(points, [2]float64{x, y})
				}
			}
		case xml.EndElement:
			if tk.Name.Local == "g" {
				if groups[len(groups)-1] {
					rotated--
				}
				groups = groups[:len(groups)-1]
			}
		}
	}
}

// TestProfileChartLayout: nothing of the chart is clipped or drawn over
// another text. Every text's box, estimated from its font size with
// generous character widths, lies inside the view box; no two boxes
// overlap (so the legend sits beside the plot, clear of the tick labels);
// every path point lies inside the view box (the legend's line samples
// whole); the legend lies right of every tick label; no tick reads −0.
func TestProfileChartLayout(t *testing.T) {
	t.Parallel()
	h := testServer(t)
	steric := `{"sample_id": "S-1", "particles": {"diameter_nm": 200, "density_kg_m3": 1050, "hamaker_zJ": 10, "zeta_mV": -40},
 "medium": {"electrolytes": [{"formula": "NaCl", "concentration_mM": 10}]}, "stabilizer": {"layer_thickness_nm": 3}}`
	deplete := strings.Replace(profileSample, `"electrolytes"`,
		`"free_polymer": {"concentration_g_L": 3.96, "radius_of_gyration_nm": 10, "molar_mass_kg_mol": 100}, "electrolytes"`, 1)
	long := strings.Replace(profileSample, `"ref-dlvo"`, strconv.Quote(strings.Repeat("WM", 64)), 1)
	cases := []struct{ name, body, want string }{
		{"reference", profileSample, "Interaction energy of two median particles: ref-dlvo"},
		{"depletion", deplete, "depletion"},
		{"steric wall", steric, "steric wall at 6 nm"},
		{"longest sample id", long, "…"},
	}
	for _, tc := range cases {
		rec := do(t, h, http.MethodPost, "/v1/interaction-profile", "application/json", tc.body, "Accept", svgContentType)
		if rec.Code != http.StatusOK {
			t.Fatalf("%s: status %d: %.300s", tc.name, rec.Code, rec.Body)
		}
		width, height, texts, points := chartLayout(t, rec.Body.String())
		found := false
		for i, a := range texts {
			found = found || strings.Contains(a.s, tc.want)
			if a.left < 0 || a.right > width || a.low < 0 || a.high > height {
				t.Errorf("%s: %q spans x %.1f-%.1f, y %.1f-%.1f outside the view box %.1f x %.1f",
					tc.name, a.s, a.left, a.right, a.low, a.high, width, height)
			}
			if a.s == "−0" {
				t.Errorf("%s: a tick reads −0", tc.name)
			}
			for _, b := range texts[i+1:] {
				if a.left < b.right && b.left < a.right && a.low < b.high && b.low < a.high {
					t.Errorf("%s: %q overlaps %q", tc.name, a.s, b.s)
				}
			}
		}
		// The legend sits beside the plot: right of every tick label.
		legendLeft, ticksRight := width, 0.0
		for _, a := range texts {
			switch {
			case a.s == "total":
				legendLeft = a.left
			case strings.Trim(a.s, "0123456789.−") == "":
				ticksRight = max(ticksRight, a.right)
			}
		}
		if legendLeft <= ticksRight {
			t.Errorf("%s: legend starts at x %.1f, left of a tick label ending at %.1f", tc.name, legendLeft, ticksRight)
		}
		if !found {
			t.Errorf("%s: no text holds %q", tc.name, tc.want)
		}
		for _, p := range points {
			if p[0] < 0 || p[0] > width || p[1] < 0 || p[1] > height {
				t.Errorf("%s: path point %v outside the view box", tc.name, p)
				break
			}
		}
	}
}
