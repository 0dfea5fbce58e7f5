package main

import (
	"bytes"
	"context"
	"errors"
	"flag"
	"fmt"
	"io"
	"net"
	"net/http"
	"net/http/httptest"
	"os"
	"runtime/debug"
	"strconv"
	"strings"
	"sync/atomic"
	"time"

	"github.com/mattn/go-isatty"
	"github.com/rs/zerolog"

	"colloidtriage/advisor"
	"colloidtriage/api"
	"colloidtriage/openapi"
	"colloidtriage/rules"
)

// Exit codes of Main.
const (
	exitOK       = 0
	exitFailure  = 1
	exitUsage    = 2
	exitBadInput = 3
)

// defaultMemoryLimitMiB is the Go runtime's soft memory limit by default:
// the collector works harder as the heap nears it, so that batches at once
// do not grow the process past what a small container has.
const defaultMemoryLimitMiB = 256

// writeTimeout bounds the time from the end of a request's headers to the
// end of its answer; shutdownLimit, longer, is how long a shutdown waits
// for the requests in flight, so that every answer the write timeout
// allows is finished rather than cut.
const (
	writeTimeout  = 120 * time.Second
	shutdownLimit = writeTimeout + 10*time.Second
)

const usage = `usage:
  colloidtriage serve [--addr HOST:PORT] [--rules DIR] [--api-keys-file FILE] [--drain-delay 5s]
                      [--memory-limit-mib 256]           run the HTTP service (default 127.0.0.1:8080, or $COLLOIDTRIAGE_ADDR);
                                                         API keys, one per line in FILE or comma-separated in
                                                         $COLLOIDTRIAGE_API_KEYS, guard all but /healthz, /readyz, /metrics;
                                                         on SIGTERM /readyz turns 503, serving goes on for the drain delay,
                                                         then in-flight requests finish (at most 130 s) and it exits 0
  colloidtriage triage [--format text|json] FILE|-      triage one sample (JSON file, or - for standard input); text, a
                                                         summary for a ticket, is the default on a terminal, JSON otherwise
  colloidtriage rules check DIR                          compile a site rule pack with the built-in rules
  colloidtriage version                                  print the engine version and rule-set hash
`

// Main runs one command and returns the process exit code. It is the whole
// program but for the signal context and the process's streams.
func Main(ctx context.Context, args []string, stdin io.Reader, stdout, stderr io.Writer, getenv func(string) string) int {
	if len(args) == 0 {
		fmt.Fprint(stderr, usage)
		return exitUsage
	}
	switch args[0] {
	case "serve":
		return serve(ctx, args[1:], stdout, stderr, getenv)
	case "triage":
		return triage(args[1:], stdin, stdout, stderr)
	case "rules":
		return rulesCheck(args[1:], stdout, stderr)
	case "version":
		if len(args) > 1 {
			if isHelp(args[1]) {
				fmt.Fprint(stdout, versionUsage)
				return exitOK
			}
			fmt.Fprint(stderr, versionUsage)
			return exitUsage
		}
		eng, err := newEngine()
		if err != nil {
			fmt.Fprintln(stderr, err)
			return exitFailure
		}
		fmt.Fprintf(stdout, "colloidtriage engine %s, rules %s\n", advisor.EngineVersion, eng.RuleSet().Hash)
		return exitOK
	case "-h", "--help", "help":
		fmt.Fprint(stdout, usage)
		return exitOK
	}
	fmt.Fprintf(stderr, "unknown command %q\n%s", args[0], usage)
	return exitUsage
}

// newEngine compiles the built-in rules plus any site packs and loads the library.
func newEngine(packDirs ...string) (*advisor.Engine, error) {
	packs := make([]fsDir, 0, len(packDirs))
	for _, d := range packDirs {
		if st, err := os.Stat(d); err != nil || !st.IsDir() {
			return nil, fmt.Errorf("rule pack %s: not a directory", d)
		}
		packs = append(packs, fsDir(d))
	}
	return advisor.LoadEngine(rules.FS, toFS(packs)...)
}

func serve(ctx context.Context, args []string, stdout, stderr io.Writer, getenv func(string) string) int {
	fs := flag.NewFlagSet("serve", flag.ContinueOnError)
	fs.SetOutput(stderr)
	defAddr := "127.0.0.1:8080"
	if a := getenv("COLLOIDTRIAGE_ADDR"); a != "" {
		defAddr = a
	}
	addr := fs.String("addr", defAddr, "listen address (env COLLOIDTRIAGE_ADDR)")
	rulesDir := fs.String("rules", "", "directory of site rule files (*.rules.yaml) added to the built-in set")
	keysFile := fs.String("api-keys-file", "", "file of API keys, one per line (# comments); adds to env COLLOIDTRIAGE_API_KEYS (comma-separated)")
	defMem := defaultMemoryLimitMiB
	if v, err := strconv.Atoi(getenv("COLLOIDTRIAGE_MEMORY_LIMIT_MIB")); err == nil {
		defMem = v
	}
	memLimit := fs.Int("memory-limit-mib", defMem,
		"soft memory limit of the Go runtime in MiB (env COLLOIDTRIAGE_MEMORY_LIMIT_MIB); 0 leaves the runtime's own (GOMEMLIMIT)")
	drainDelay := fs.Duration("drain-delay", 5*time.Second,
		"on SIGTERM, how long to keep serving (with /readyz 503 and connections closed after each answer) before shutting down")
	if len(args) > 0 && isHelp(args[0]) {
		fs.SetOutput(stdout)
		fs.Usage()
		return exitOK
	}
	if err := fs.Parse(args); err != nil {
		return exitUsage
	}
	keys, err := apiKeys(*keysFile, getenv("COLLOIDTRIAGE_API_KEYS"))
	if err != nil {
		fmt.Fprintln(stderr, err)
		return exitUsage
	}
	log := zerolog.New(stdout).With().Timestamp().Logger()
	if *memLimit > 0 {
		debug.SetMemoryLimit(int64(*memLimit) << 20)
	}
	start := time.Now()
	var dirs []string
	if *rulesDir != "" {
		dirs = append(dirs, *rulesDir)
	}
	eng, err := newEngine(dirs...)
	if err != nil {
		fmt.Fprintln(stderr, err)
		return exitFailure
	}
	var draining atomic.Bool
	e := api.New(eng, api.Config{Logger: log, OpenAPI: openapi.JSON, APIKeys: keys, Draining: draining.Load})
	srv := &http.Server{
		Handler:           e,
		ReadHeaderTimeout: 5 * time.Second,
		ReadTimeout:       30 * time.Second,
		WriteTimeout:      writeTimeout,
		IdleTimeout:       120 * time.Second,
		MaxHeaderBytes:    64 << 10,
	}
	ln, err := net.Listen("tcp", *addr)
	if err != nil {
		fmt.Fprintln(stderr, err)
		return exitFailure
	}
	log.Info().Str("addr", ln.Addr().String()).Str("rules", eng.RuleSet().Hash).
		Dur("startup", time.Since(start)).Msg("listening")
	done := make(chan error, 1)
	go func() { done <- srv.Serve(ln) }()
	select {
	case err := <-done:
		fmt.Fprintln(stderr, err)
		return exitFailure
	case <-ctx.Done():
	}
	draining.Store(true)
	srv.SetKeepAlivesEnabled(false)
	log.Info().Dur("drain_delay", *drainDelay).Msg("draining: /readyz 503, connections closed after each answer")
	time.Sleep(*drainDelay)
	log.Info().Msg("shutting down: finishing in-flight requests")
	shutCtx, cancel := context.WithTimeout(context.Background(), shutdownLimit)
	defer cancel()
	if err := srv.Shutdown(shutCtx); err != nil {
		fmt.Fprintln(stderr, err)
		return exitFailure
	}
	if err := <-done; err != nil && !errors.Is(err, http.ErrServerClosed) {
		fmt.Fprintln(stderr, err)
		return exitFailure
	}
	return exitOK
}

// apiKeys gathers the service's API keys from a key file (one per line,
// blank lines and # comments skipped) and a comma-separated list. A file or
// list that is given but holds no key is an error: it would otherwise turn
// authentication off without a word.
func apiKeys(file, list string) ([]string, error) {
	var keys []string
	if file != "" {
		data, err := os.ReadFile(file)
		if err != nil {
			return nil, fmt.Errorf("api keys: %w", err)
		}
		for _, line := range strings.Split(string(data), "\n") {
			if k := strings.TrimSpace(line); k != "" && !strings.HasPrefix(k, "#") {
				keys = append(keys, k)
			}
		}
		if len(keys) == 0 {
			return nil, fmt.Errorf("api keys: %s holds no key", file)
		}
	}
	if list != "" {
		n := len(keys)
		for _, k := range strings.Split(list, ",") {
			if k = strings.TrimSpace(k); k != "" {
				keys = append(keys, k)
			}
		}
		if len(keys) == n {
			return nil, errors.New("api keys: COLLOIDTRIAGE_API_KEYS is set but holds no key")
		}
	}
	return keys, nil
}

// Usage of the subcommands, printed by --help and on a usage error.
const (
	triageUsage = `usage: colloidtriage triage [--format text|json] FILE|-
  Triage one sample: a JSON request as POST /v1/triage takes it, from FILE or
  from standard input (-). --format text prints a summary for a ticket (top
  causes with score and probability, key evidence, remedies with targets,
  cautions); --format json prints the report as the service answers. The
  default is text when standard output is a terminal, JSON otherwise.
  Exit status: 0 on a report, 3 when the sample is refused (the problem on
  standard error), 2 on a usage error, 1 on any other failure.
`
	rulesUsage = `usage: colloidtriage rules check DIR
  Compile the site rule files (*.rules.yaml) in DIR together with the
  built-in rules, and report the rule count and the rule-set hash.
`
	versionUsage = `usage: colloidtriage version
  Print the engine version and the hash of the built-in rule set.
`
)

func isHelp(arg string) bool { return arg == "-h" || arg == "--help" || arg == "-help" }

// isTerminal reports whether w is a terminal, where people read the text.
func isTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	return ok && (isatty.IsTerminal(f.Fd()) || isatty.IsCygwinTerminal(f.Fd()))
}

// triage runs one sample through the same HTTP application in memory, so
// that the CLI's reports and problem details are those of the service.
func triage(args []string, stdin io.Reader, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("triage", flag.ContinueOnError)
	fs.SetOutput(io.Discard)
	format := fs.String("format", "", "text or json")
	if err := fs.Parse(args); err != nil {
		if errors.Is(err, flag.ErrHelp) {
			fmt.Fprint(stdout, triageUsage)
			return exitOK
		}
		fmt.Fprintf(stderr, "triage: %v\n%s", err, triageUsage)
		return exitUsage
	}
	if *format == "" {
		*format = "json"
		if isTerminal(stdout) {
			*format = "text"
		}
	}
	if (*format != "text" && *format != "json") || fs.NArg() != 1 {
		fmt.Fprint(stderr, triageUsage)
		return exitUsage
	}
	var body []byte
	var err error
	if name := fs.Arg(0); name == "-" {
		body, err = io.ReadAll(stdin)
	} else {
		body, err = os.ReadFile(name)
	}
	if err != nil {
		fmt.Fprintln(stderr, err)
		return exitFailure
	}
	eng, err := newEngine()
	if err != nil {
		fmt.Fprintln(stderr, err)
		return exitFailure
	}
	e := api.New(eng, api.Config{Logger: zerolog.Nop(), OpenAPI: openapi.JSON})
	req := httptest.NewRequest(http.MethodPost, "/v1/triage", bytes.NewReader(body))
	req.Header.Set("Content-Type", "application/json")
	rec := httptest.NewRecorder()
	e.ServeHTTP(rec, req)
	if rec.Code != http.StatusOK {
		if *format == "text" {
			writeProblem(stderr, rec.Body.Bytes())
		} else {
			stderr.Write(rec.Body.Bytes())
			fmt.Fprintln(stderr)
		}
		return exitBadInput
	}
	var out bytes.Buffer
	if *format == "text" {
		err = writeSummary(&out, rec.Body.Bytes())
	} else {
		err = indentJSON(&out, rec.Body.Bytes())
	}
	if err != nil {
		fmt.Fprintln(stderr, err)
		return exitFailure
	}
	stdout.Write(out.Bytes())
	return exitOK
}

func rulesCheck(args []string, stdout, stderr io.Writer) int {
	if len(args) > 0 && isHelp(args[len(args)-1]) {
		fmt.Fprint(stdout, rulesUsage)
		return exitOK
	}
	if len(args) != 2 || args[0] != "check" {
		fmt.Fprint(stderr, rulesUsage)
		return exitUsage
	}
	eng, err := newEngine(args[1])
	if err != nil {
		fmt.Fprintln(stderr, err)
		return exitFailure
	}
	rs := eng.RuleSet()
	fmt.Fprintf(stdout, "ok: %d rules in %d files, rule set %s\n", len(rs.Rules()), len(rs.Files), rs.Hash)
	return exitOK
}
