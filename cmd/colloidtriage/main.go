// Command colloidtriage runs the colloid stability triage service or triages
// sample files from the command line.
//
//	colloidtriage serve [--addr 127.0.0.1:8080] [--rules DIR] [--api-keys-file FILE] [--drain-delay 5s]
//	colloidtriage triage FILE|-
//	colloidtriage rules check DIR
//	colloidtriage version
package main

import (
	"context"
	"os"
	"os/signal"
	"syscall"
)

func main() {
	ctx, stop := signal.NotifyContext(context.Background(), os.Interrupt, syscall.SIGTERM)
	defer stop()
	os.Exit(Main(ctx, os.Args[1:], os.Stdin, os.Stdout, os.Stderr, os.Getenv))
}
