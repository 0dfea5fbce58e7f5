package web_test

import (
	"bytes"
	"context"
	"encoding/json"
	"fmt"
	"net/http"
	"net/http/httptest"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/chromedp/chromedp"

	"colloidtriage/advisor"
	"colloidtriage/api"
	"colloidtriage/openapi"
	"colloidtriage/rules"
)

// browserEnv turns the browser test on; .ci/run sets it after installing
// chromium. Without it the test skips, so that go test ./... stays fast.
const browserEnv = "COLLOIDTRIAGE_BROWSER_TEST"

// artefactEnv names the directory for the screenshots and the PDF; without
// it they go to a fresh directory under the system's temporary directory.
const artefactEnv = "COLLOIDTRIAGE_ARTEFACTS"

// chromiumPath finds Debian's chromium (apt-get install chromium).
func chromiumPath(t *testing.T) string {
	t.Helper()
	if os.Getenv(browserEnv) == "" {
		t.Skipf("browser test off: set %s=1 (and apt-get install -y chromium) to run it", browserEnv)
	}
	for _, name := range []string{"chromium", "chromium-browser", "google-chrome"} {
		if p, err := exec.LookPath(name); err == nil {
			return p
		}
	}
	if os.Getenv("CI") != "" {
		t.Fatalf("%s is set in CI but no chromium is installed: .ci/run must install it", browserEnv)
	}
	t.Skip("no chromium on this machine: apt-get install -y chromium to run the browser test")
	return ""
}

func artefactDir(t *testing.T) string {
	t.Helper()
	dir := os.Getenv(artefactEnv)
	if dir == "" {
		var err error
		if dir, err = os.MkdirTemp("", "colloidtriage-browser-"); err != nil {
			t.Fatal(err)
		}
	} else if err := os.MkdirAll(dir, 0o755); err != nil {
		t.Fatal(err)
	}
	return dir
}

// demoSample is the demo scenario the test types in, as its file states it.
type demoSample struct {
	SampleID string `json:"sample_id"`
}

// TestWorkbenchInBrowser drives the page in headless chromium against the
// real HTTP application: it types a demo scenario into the form, submits,
// reads the top cause and its first remedy target from the page and holds
// them to the API's own answer for the same request, checks that an
// out-of-range value is reported next to its field, that the link carries
// the form, and saves screenshots at 1280 px and tablet width and a print
// PDF that must be one page.
func TestWorkbenchInBrowser(t *testing.T) {
	exe := chromiumPath(t)
	dir := artefactDir(t)
	t.Logf("artefacts (screenshots, print PDF) in %s", dir)
	fmt.Printf("browser test artefacts: %s\n", dir)

	eng, err := advisor.LoadEngine(rules.FS)
	if err != nil {
		t.Fatal(err)
	}
	srv := httptest.NewServer(api.New(eng, api.Config{OpenAPI: openapi.JSON}))
	defer srv.Close()

	demo, err := os.ReadFile(filepath.Join("..", "..", "testdata", "demo", "electrostatic_screening.json"))
	if err != nil {
		t.Fatal(err)
	}
	want := apiAnswer(t, srv.URL, demo)
	var sample demoSample
	if err := json.Unmarshal(demo, &sample); err != nil {
		t.Fatal(err)
	}

	opts := append(chromedp.DefaultExecAllocatorOptions[:],
		chromedp.ExecPath(exe), chromedp.Headless, chromedp.NoSandbox, chromedp.DisableGPU, chromedp.NoFirstRun,
		chromedp.Flag("disable-quic", true), chromedp.Flag("disable-background-networking", true),
		chromedp.Flag("disable-component-update", true), chromedp.Flag("disable-sync", true),
		chromedp.UserDataDir(t.TempDir()), chromedp.WindowSize(1280, 1000))
	allocCtx, cancelAlloc := chromedp.NewExecAllocator(context.Background(), opts...)
	defer cancelAlloc()
	ctx, cancel := chromedp.NewContext(allocCtx)
	defer cancel()
	if err := chromedp.Do(ctx); err != nil { // starts the browser on a context without a deadline
		t.Fatalf("starting chromium: %v", err)
	}
	ctx, cancelTime := context.WithTimeout(ctx, 60*time.Second)
	defer cancelTime()

	// The demo scenario as a support engineer types it.
	typeIn := []struct{ id, value string }{
		{"#f-sample_id", sample.SampleID},
		{"#f-particles-diameter_nm", "60"},
		{"#f-particles-volume_fraction", "0.02"},
		{"#f-particles-zeta_mV", "45"},
		{"#f-medium-temperature_c", "25"},
		{"#f-medium-ph", "3.8"},
		{"#f-medium-electrolytes-0-formula", "NaNO3"},
		{"#f-medium-electrolytes-0-concentration_mM", "60"},
		{"#f-storage-container_height_mm", "250"},
		{"#f-storage-shelf_life_days", "365"},
		{"#f-observation-age_days", "10"},
		{"#f-observation-clear_layer_mm", "100"},
	}
	choose := []struct{ id, value string }{
		{"#f-product_category", "coating"},
		{"#f-particles-material", "titania_anatase"},
		{"#f-medium-liquid", "water"},
		{"#f-symptom", "settling"},
		{"#f-observation-sediment_redisperses", "true"},
	}
	steps := []chromedp.Action[chromedp.Void]{
		chromedp.EmulateViewport(1280, 1000),
		chromedp.Navigate(srv.URL + "/"),
		chromedp.WaitVisible(chromedp.CSS(`body[data-ready="true"]`)),
	}
	for _, f := range typeIn {
		steps = append(steps, chromedp.SendKeys(chromedp.CSS(f.id), f.value))
	}
	for _, f := range choose {
		steps = append(steps, chromedp.SetValue(chromedp.CSS(f.id), f.value))
	}
	steps = append(steps,
		chromedp.Click(chromedp.CSS("#submit")),
		chromedp.WaitVisible(chromedp.CSS(`#causes li.cause`)),
		chromedp.WaitVisible(chromedp.CSS(`#chart img`)))
	if err := chromedp.Do(ctx, steps...); err != nil {
		failShot(ctx, t, dir)
		t.Fatalf("filling and submitting the form: %v", err)
	}
	topCause := attribute(ctx, t, `#causes li.cause`, "data-cause")
	topTitle := text(ctx, t, `#causes li.cause h3`)
	target := text(ctx, t, `#causes li.cause .target`)
	hash, err := chromedp.Run(ctx, chromedp.Evaluate[string](`location.hash`))
	if err != nil {
		t.Fatal(err)
	}
	if topCause != "electrostatic_screening" || topCause != want.Causes[0].ID {
		t.Errorf("top cause on the page %q, the API's %q, the demo's electrostatic_screening", topCause, want.Causes[0].ID)
	}
	if !strings.Contains(topTitle, want.Causes[0].Title) {
		t.Errorf("top cause title %q, want %q", topTitle, want.Causes[0].Title)
	}
	tg := want.Causes[0].Remedies[0].Target
	if wantTarget := fmt.Sprintf("%s %s %g", tg.Quantity, tg.Op, tg.Value); !strings.HasPrefix(target, wantTarget) {
		t.Errorf("first remedy target on the page %q, the API's %q", target, wantTarget)
	}
	if !strings.HasPrefix(hash, "#request=") {
		t.Errorf("the link does not carry the form: hash %q", hash)
	}

	shoot(ctx, t, filepath.Join(dir, "workbench-1280.png"), 1280, 1000)
	shoot(ctx, t, filepath.Join(dir, "workbench-tablet.png"), 820, 1180)
	printPDF(ctx, t, filepath.Join(dir, "report.pdf"))

	// The shared link alone brings the same answer.
	if err := chromedp.Do(ctx, chromedp.EmulateViewport(1280, 1000), chromedp.Navigate("about:blank"),
		chromedp.Navigate(srv.URL+"/"+hash), chromedp.WaitVisible(chromedp.CSS(`#causes li.cause`))); err != nil {
		t.Fatalf("opening the shared link: %v", err)
	}
	if linked := attribute(ctx, t, `#causes li.cause`, "data-cause"); linked != topCause {
		t.Errorf("the shared link ranks %q first, the form %q", linked, topCause)
	}

	// A value out of range: the API's problem appears beside its field.
	if _, err := chromedp.Run(ctx, chromedp.Evaluate[bool](`document.querySelector("#f-particles-diameter_nm").value = ""; true`)); err != nil {
		t.Fatal(err)
	}
	if err := chromedp.Do(ctx,
		chromedp.SendKeys(chromedp.CSS("#f-particles-diameter_nm"), "0.1"),
		chromedp.Click(chromedp.CSS("#submit")),
		chromedp.WaitVisible(chromedp.CSS(`#f-particles-diameter_nm-err`)),
	); err != nil {
		failShot(ctx, t, dir)
		t.Fatalf("submitting an out-of-range diameter: %v", err)
	}
	problem := text(ctx, t, `#f-particles-diameter_nm-err`)
	invalid := attribute(ctx, t, `#f-particles-diameter_nm`, "aria-invalid")
	if !strings.Contains(problem, "out of range") || !strings.Contains(problem, "0.5") || invalid != "true" {
		t.Errorf("problem beside the diameter %q, aria-invalid %q; want the reason and the valid range", problem, invalid)
	}
	shoot(ctx, t, filepath.Join(dir, "workbench-problem.png"), 1280, 1000)

	compareInBrowser(ctx, t, srv.URL, dir, demo)
}

// compareInBrowser loads the demo into the form as the complaint, pastes
// the same batch made with less salt as the reference, compares, and holds
// the verdict on the page to the API's own for the same two samples.
func compareInBrowser(ctx context.Context, t *testing.T, base, dir string, demo []byte) {
	t.Helper()
	var ref map[string]any
	if err := json.Unmarshal(demo, &ref); err != nil {
		t.Fatal(err)
	}
	delete(ref, "symptom")
	delete(ref, "observation")
	ref["sample_id"] = "REFERENCE-LOT"
	ref["medium"].(map[string]any)["electrolytes"] = []any{map[string]any{"formula": "NaNO3", "concentration_mM": 5}}
	refJSON, err := json.Marshal(ref)
	if err != nil {
		t.Fatal(err)
	}
	want := compareAnswer(t, base, fmt.Sprintf(`{"reference": %s, "complaint": %s}`, refJSON, demo))
	demoLit, _ := json.Marshal(string(demo))
	refLit, _ := json.Marshal(string(refJSON))
	if err := chromedp.Do(ctx, chromedp.EmulateViewport(1280, 1000), chromedp.Navigate("about:blank"),
		chromedp.Navigate(base+"/"), chromedp.WaitVisible(chromedp.CSS(`body[data-ready="true"]`))); err != nil {
		t.Fatalf("opening the page for the compare: %v", err)
	}
	fillIn := fmt.Sprintf(`document.querySelector("#load-text").value = %s;
		document.querySelector("#load-apply").click();
		document.querySelector("#compare-panel").open = true;
		document.querySelector("#reference-text").value = %s; true`, demoLit, refLit)
	if _, err := chromedp.Run(ctx, chromedp.Evaluate[bool](fillIn)); err != nil {
		t.Fatal(err)
	}
	if err := chromedp.Do(ctx, chromedp.Click(chromedp.CSS("#compare-submit")),
		chromedp.WaitVisible(chromedp.CSS("#verdict")), chromedp.WaitVisible(chromedp.CSS(`#causes li.cause`))); err != nil {
		failShot(ctx, t, dir)
		t.Fatalf("comparing: %v", err)
	}
	if verdict := text(ctx, t, "#verdict"); verdict != want.Verdict {
		t.Errorf("verdict on the page %q, the API's %q", verdict, want.Verdict)
	}
	if first := attribute(ctx, t, "#differences tbody tr", "data-path"); first != want.Differences[0].Path || first != "/medium/electrolytes" {
		t.Errorf("first difference on the page %q, the API's %q, want /medium/electrolytes", first, want.Differences[0].Path)
	}
	shoot(ctx, t, filepath.Join(dir, "workbench-compare.png"), 1280, 1000)
}

// compareAnswer is the API's own comparison of two samples.
func compareAnswer(t *testing.T, base, body string) *advisor.Comparison {
	t.Helper()
	res, err := http.Post(base+"/v1/compare", "application/json", strings.NewReader(body))
	if err != nil {
		t.Fatal(err)
	}
	defer res.Body.Close()
	var c advisor.Comparison
	if err := json.NewDecoder(res.Body).Decode(&c); err != nil || res.StatusCode != http.StatusOK || len(c.Differences) == 0 {
		t.Fatalf("the API's comparison: status %d, %v", res.StatusCode, err)
	}
	return &c
}

// failShot saves what the page shows when a step fails, on a fresh
// deadline (the step's own may be spent).
func failShot(ctx context.Context, t *testing.T, dir string) {
	t.Helper()
	ctx, cancel := context.WithTimeout(context.WithoutCancel(ctx), 10*time.Second)
	defer cancel()
	if status, err := chromedp.Run(ctx, chromedp.Evaluate[string](`document.querySelector("#status").textContent`)); err == nil {
		t.Logf("the page's status line at the failure: %q", status)
	}
	if png, err := chromedp.Run(ctx, chromedp.FullScreenshot(100)); err == nil {
		path := filepath.Join(dir, "failure.png")
		if os.WriteFile(path, png, 0o644) == nil {
			t.Logf("the page at the failure: %s", path)
		}
	}
}

// text is the visible text of the first element a CSS selector matches.
func text(ctx context.Context, t *testing.T, sel string) string {
	t.Helper()
	s, err := chromedp.Run(ctx, chromedp.Text(chromedp.CSS(sel)))
	if err != nil {
		t.Fatalf("text of %s: %v", sel, err)
	}
	return s
}

// attribute is an attribute of the first element a CSS selector matches.
func attribute(ctx context.Context, t *testing.T, sel, name string) string {
	t.Helper()
	a, err := chromedp.Run(ctx, chromedp.AttributeValue(chromedp.CSS(sel), name))
	if err != nil {
		t.Fatalf("attribute %s of %s: %v", name, sel, err)
	}
	return a.Value
}

// apiAnswer is the API's own report for a request.
func apiAnswer(t *testing.T, base string, body []byte) *advisor.Report {
	t.Helper()
	res, err := http.Post(base+"/v1/triage", "application/json", bytes.NewReader(body))
	if err != nil {
		t.Fatal(err)
	}
	defer res.Body.Close()
	var rep advisor.Report
	if err := json.NewDecoder(res.Body).Decode(&rep); err != nil || res.StatusCode != http.StatusOK || len(rep.Causes) == 0 ||
		len(rep.Causes[0].Remedies) == 0 || rep.Causes[0].Remedies[0].Target == nil {
		t.Fatalf("the API's answer to the demo: status %d, %v", res.StatusCode, err)
	}
	return &rep
}

// shoot saves a full-page screenshot at a viewport width.
func shoot(ctx context.Context, t *testing.T, path string, width, height int64) {
	t.Helper()
	if err := chromedp.Do(ctx, chromedp.EmulateViewport(width, height), chromedp.Sleep(200*time.Millisecond)); err != nil {
		t.Fatalf("screenshot %s: %v", path, err)
	}
	png, err := chromedp.Run(ctx, chromedp.FullScreenshot(100))
	if err != nil {
		t.Fatalf("screenshot %s: %v", path, err)
	}
	if err := os.WriteFile(path, png, 0o644); err != nil {
		t.Fatal(err)
	}
	t.Logf("screenshot %s (%d px wide)", path, width)
}

// pdfPages counts the pages of a PDF by their page objects.
var pdfPages = regexp.MustCompile(`/Type\s*/Page[^s]`)

// printPDF prints the page on A4 and requires one page.
func printPDF(ctx context.Context, t *testing.T, path string) {
	t.Helper()
	pdf, err := chromedp.Run(ctx, chromedp.PrintToPDF(chromedp.PDFPaper(chromedp.PaperA4), chromedp.PDFPreferCSSPageSize()))
	if err != nil {
		t.Fatalf("printing: %v", err)
	}
	if err := os.WriteFile(path, pdf, 0o644); err != nil {
		t.Fatal(err)
	}
	if n := len(pdfPages.FindAll(pdf, -1)); n != 1 {
		t.Errorf("the print report has %d pages, want 1 (%s)", n, path)
	}
	t.Logf("print report %s", path)
}
