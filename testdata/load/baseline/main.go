// Command baseline is the yardstick of .ci/loadtest: an echo v4 server that
// does for POST /v1/triage only what any JSON API must (read the body and
// decode it into a generic value) and answers with a canned body, normally
// a real triage report, so that the load test can tell the cost of the
// triage from the cost of HTTP and JSON. It lives under testdata so that
// `go test ./...` and `go vet ./...` leave it alone; build it with
//
//	go build -o baseline ./testdata/load/baseline
//
// and run it with -addr HOST:PORT -response FILE. It serves GET /readyz for
// the load test's start-up wait and stops on SIGINT or SIGTERM.
package main

import (
	"context"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"net/http"
	"os"
	"os/signal"
	"syscall"
	"time"

	"github.com/labstack/echo/v4"
)

// bodyLimit matches the real service's limit on POST /v1/triage (256K,
// which echo reads as 256,000 bytes).
const bodyLimit = 256_000

func main() {
	addr := flag.String("addr", "127.0.0.1:8081", "listen address")
	respFile := flag.String("response", "", "file whose bytes answer every POST /v1/triage")
	flag.Parse()
	canned, err := os.ReadFile(*respFile)
	if err != nil || len(canned) == 0 {
		fmt.Fprintln(os.Stderr, "baseline: need -response FILE with the canned answer:", err)
		os.Exit(2)
	}

	e := echo.New()
	e.HideBanner, e.HidePort = true, true
	e.GET("/readyz", func(c echo.Context) error {
		return c.JSON(http.StatusOK, map[string]string{"status": "ready"})
	})
	e.POST("/v1/triage", func(c echo.Context) error {
		body, err := io.ReadAll(io.LimitReader(c.Request().Body, bodyLimit+1))
		if err != nil || len(body) > bodyLimit {
			return echo.NewHTTPError(http.StatusRequestEntityTooLarge)
		}
		var v any
		if err := json.Unmarshal(body, &v); err != nil {
			return echo.NewHTTPError(http.StatusBadRequest, "invalid JSON")
		}
		return c.Blob(http.StatusOK, echo.MIMEApplicationJSON, canned)
	})

	// The same timeouts as the real service, so that neither side has an
	// advantage in connection handling.
	srv := &http.Server{Addr: *addr, Handler: e, ReadHeaderTimeout: 5 * time.Second, ReadTimeout: 30 * time.Second,
		WriteTimeout: 120 * time.Second, IdleTimeout: 120 * time.Second, MaxHeaderBytes: 64 << 10}
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt, syscall.SIGTERM)
	defer stop()
	go func() {
		<-ctx.Done()
		shutCtx, cancel := context.WithTimeout(context.Background(), 10*time.Second)
		defer cancel()
		_ = srv.Shutdown(shutCtx)
	}()
	if err := srv.ListenAndServe(); err != nil && !errors.Is(err, http.ErrServerClosed) {
		fmt.Fprintln(os.Stderr, "baseline:", err)
		os.Exit(1)
	}
}
