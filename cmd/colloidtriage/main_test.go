package main

import (
	"bufio"
	"bytes"
	"context"
	"encoding/json"
	"io"
	"net/http"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
	"time"
)

func run(t *testing.T, stdin string, args ...string) (int, string, string) {
	t.Helper()
	var out, errOut bytes.Buffer
	code := Main(context.Background(), args, strings.NewReader(stdin), &out, &errOut, func(string) string { return "" })
	return code, out.String(), errOut.String()
}

func TestMainCommands(t *testing.T) {
	if code, out, _ := run(t, "", "version"); code != 0 || !strings.Contains(out, "rules sha256:") {
		t.Errorf("version: %d %q", code, out)
	}
	if code, _, _ := run(t, ""); code != exitUsage {
		t.Errorf("no command: %d", code)
	}
	demo, err := os.ReadFile("../../testdata/demo/gravity_settling.json")
	if err != nil {
		t.Fatal(err)
	}
	code, out, _ := run(t, string(demo), "triage", "-")
	if code != 0 || !strings.Contains(out, `"gravity_settling"`) {
		t.Errorf("triage -: %d %.200s", code, out)
	}
	code, _, errOut := run(t, `{"symptom":"settling","particles":{"diameter_nm":-1}}`, "triage", "-")
	if code != exitBadInput || !strings.Contains(errOut, "/particles/diameter_nm") {
		t.Errorf("bad sample: %d %s", code, errOut)
	}
}

func TestRulesCheck(t *testing.T) {
	good := t.TempDir()
	if err := os.WriteFile(filepath.Join(good, "site.rules.yaml"), []byte(
		"rules:\n  - id: site.tall_drums\n    cause: gravity_settling\n    symptoms: [settling]\n    when: container_height_mm > 500 && stokes_velocity > 1\n    certainty: 0.2\n    explain: Tall drum.\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	if code, out, errOut := run(t, "", "rules", "check", good); code != 0 || !strings.HasPrefix(out, "ok:") {
		t.Errorf("good pack: %d %q %q", code, out, errOut)
	}
	bad := t.TempDir()
	if err := os.WriteFile(filepath.Join(bad, "site.rules.yaml"), []byte(
		"rules:\n  - id: site.typo\n    cause: gravity_settling\n    symptoms: [settling]\n    when: stokes_velocty > 1\n    certainty: 0.2\n    explain: x\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	code, _, errOut := run(t, "", "rules", "check", bad)
	if code == 0 || !strings.Contains(errOut, "site.rules.yaml:5:11: rule site.typo") {
		t.Errorf("bad pack: %d %q", code, errOut)
	}
}

// TestBinaryEndToEnd builds the real binary, serves on a free loopback port,
// posts a demo scenario with a real HTTP client, and stops the server with
// SIGTERM while a request is in flight.
func TestBinaryEndToEnd(t *testing.T) {
	if testing.Short() {
		t.Skip("builds the binary")
	}
	cmd, base := startServer(t)
	demo, err := os.Open("../../testdata/demo/gravity_settling.json")
	if err != nil {
		t.Fatal(err)
	}
	defer demo.Close()
	resp, err := http.Post(base+"/v1/triage", "application/json", demo)
	if err != nil {
		t.Fatal(err)
	}
	var rep struct {
		Causes []struct{ ID string } `json:"causes"`
	}
	if err := json.NewDecoder(resp.Body).Decode(&rep); err != nil || resp.StatusCode != 200 || len(rep.Causes) == 0 ||
		rep.Causes[0].ID != "gravity_settling" {
		t.Fatalf("triage: %d %v %+v", resp.StatusCode, err, rep)
	}
	resp.Body.Close()
	for _, path := range []string{"/healthz", "/readyz", "/openapi.json"} {
		r, err := http.Get(base + path)
		if err != nil || r.StatusCode != 200 {
			t.Errorf("%s: %v %v", path, err, r)
		}
		if r != nil {
			r.Body.Close()
		}
	}

	// Graceful shutdown: a request sent before SIGTERM still gets its answer.
	pr, pw := io.Pipe()
	done := make(chan int, 1)
	go func() {
		req, _ := http.NewRequest(http.MethodPost, base+"/v1/triage", pr)
		req.Header.Set("Content-Type", "application/json")
		r, err := http.DefaultClient.Do(req)
		if err != nil {
			done <- -1
			return
		}
		r.Body.Close()
		done <- r.StatusCode
	}()
	body, _ := os.ReadFile("../../testdata/demo/gravity_settling.json")
	pw.Write(body[:10])
	time.Sleep(200 * time.Millisecond)
	if err := cmd.Process.Signal(syscall.SIGTERM); err != nil {
		t.Fatal(err)
	}
	time.Sleep(200 * time.Millisecond)
	pw.Write(body[10:])
	pw.Close()
	if code := <-done; code != 200 {
		t.Errorf("in-flight request during shutdown: status %d", code)
	}
	if err := cmd.Wait(); err != nil {
		t.Errorf("server exit: %v", err)
	}
}

// startServer builds the binary and serves on a free loopback port with
// args added to serve's; it returns the running command and the base URL.
func startServer(t *testing.T, args ...string) (*exec.Cmd, string) {
	t.Helper()
	bin := filepath.Join(t.TempDir(), "colloidtriage")
	build := exec.Command("go", "build", "-o", bin, ".")
	if out, err := build.CombinedOutput(); err != nil {
		t.Fatalf("build: %v\n%s", err, out)
	}
	cmd := exec.Command(bin, append([]string{"serve", "--addr", "127.0.0.1:0"}, args...)...)
	stdout, err := cmd.StdoutPipe()
	if err != nil {
		t.Fatal(err)
	}
	cmd.Stderr = os.Stderr
	if err := cmd.Start(); err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { cmd.Process.Kill() })
	listening := make(chan string, 1)
	go func() {
		lines := bufio.NewScanner(stdout)
		for lines.Scan() {
			var entry struct {
				Message string `json:"message"`
				Addr    string `json:"addr"`
			}
			if json.Unmarshal(lines.Bytes(), &entry) == nil && entry.Message == "listening" {
				listening <- entry.Addr
				break
			}
		}
		io.Copy(io.Discard, stdout)
	}()
	select {
	case addr := <-listening:
		return cmd, "http://" + addr
	case <-time.After(30 * time.Second):
		t.Fatal("server did not say it was listening within 30 s")
	}
	return nil, ""
}

// TestDrain: on SIGTERM /readyz turns 503 at once; requests during the
// drain delay are answered with Connection: close; a stream in flight runs
// to its end line; the process exits 0.
func TestDrain(t *testing.T) {
	if testing.Short() {
		t.Skip("builds the binary")
	}
	cmd, base := startServer(t, "--drain-delay", "1s")
	demo, err := os.ReadFile("../../testdata/demo/gravity_settling.json")
	if err != nil {
		t.Fatal(err)
	}
	var line bytes.Buffer
	if err := json.Compact(&line, demo); err != nil {
		t.Fatal(err)
	}
	const n = 300
	stream, err := http.Post(base+"/v1/triage/batch", "application/x-ndjson",
		strings.NewReader(strings.Repeat(line.String()+"\n", n)))
	if err != nil || stream.StatusCode != 200 {
		t.Fatalf("stream: %v %v", err, stream)
	}
	defer stream.Body.Close()
	lines := bufio.NewScanner(stream.Body)
	lines.Buffer(nil, 1<<20)
	if !lines.Scan() {
		t.Fatal("no first line")
	}
	if err := cmd.Process.Signal(syscall.SIGTERM); err != nil {
		t.Fatal(err)
	}
	deadline := time.Now().Add(500 * time.Millisecond)
	for {
		r, err := http.Get(base + "/readyz")
		if err == nil {
			r.Body.Close()
			if r.StatusCode == http.StatusServiceUnavailable {
				break
			}
		}
		if time.Now().After(deadline) {
			t.Fatalf("/readyz still %v %v 500 ms after SIGTERM", r.StatusCode, err)
		}
		time.Sleep(20 * time.Millisecond)
	}
	r, err := http.Post(base+"/v1/triage", "application/json", bytes.NewReader(demo))
	if err != nil || r.StatusCode != 200 || !r.Close {
		t.Errorf("a request while draining: %v %+v", err, r)
	}
	if r != nil {
		r.Body.Close()
	}
	count := 1
	var last string
	for lines.Scan() {
		count++
		last = lines.Text()
	}
	if count != n+1 || last != `{"end":true,"count":300,"failed":0}` {
		t.Errorf("%d lines, the last %.100q", count, last)
	}
	if err := cmd.Wait(); err != nil {
		t.Errorf("server exit: %v", err)
	}
}

// BenchmarkNewEngine is the start-up work: rules compiled, library loaded
// (issue target: under 100 ms).
func BenchmarkNewEngine(b *testing.B) {
	for b.Loop() {
		if _, err := newEngine(); err != nil {
			b.Fatal(err)
		}
	}
}
