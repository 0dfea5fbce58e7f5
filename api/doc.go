// Package api is colloidtriage's HTTP transport: echo v4 routes, request
// decoding and validation, RFC 9457 problem details, and middleware for
// request ids, access logs, body limits and panic recovery. It speaks the
// units of the public contract (unit suffixes in JSON names) and hands
// validated samples to package advisor.
package api
