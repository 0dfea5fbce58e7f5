package api

import (
	"crypto/sha256"
	"crypto/subtle"
	"net/http"
	"strings"

	"github.com/labstack/echo/v4"
)

// apiKeyHeader is the alternative to "Authorization: Bearer <key>" for
// clients that cannot set the Authorization header.
const apiKeyHeader = "X-API-Key"

// bearerChallenge is the WWW-Authenticate challenge of a 401 (RFC 6750 §3).
const bearerChallenge = `Bearer realm="colloidtriage"`

// keyAuthConfig configures API-key authentication.
type keyAuthConfig struct {
	// Keys are the admitted API keys. Blank keys are ignored, so an empty
	// line in a key file never admits an empty credential; with no key the
	// middleware admits every request.
	Keys []string
}

// keyAuthWithConfig admits a request that presents one of cfg.Keys, as
// "Authorization: Bearer <key>" or "X-API-Key: <key>", and answers any
// other with a 401 problem and a Bearer challenge.
//
// Keys are compared as SHA-256 digests with crypto/subtle, against every
// configured key without stopping at a match: the time taken tells neither
// how much of a key was right, nor its length, nor which key matched.
// echo's KeyAuth stops at the first match and reads every Authorization
// header, so it does not do this job.
func keyAuthWithConfig(cfg keyAuthConfig) echo.MiddlewareFunc {
	digests := keyDigests(cfg.Keys)
	if len(digests) == 0 {
		return func(next echo.HandlerFunc) echo.HandlerFunc { return next }
	}
	return func(next echo.HandlerFunc) echo.HandlerFunc {
		return func(c echo.Context) error {
			presented := presentedKeys(c.Request().Header)
			if len(presented) == 0 {
				return unauthorized(c, "send an API key as \"Authorization: Bearer <key>\" or \"X-API-Key: <key>\"", "")
			}
			if !anyKeyMatches(presented, digests) {
				return unauthorized(c, "the API key is not valid for this service", `, error="invalid_token"`)
			}
			return next(c)
		}
	}
}

// presentedKeys collects the credentials a request offers; a request may
// carry both headers, and either may hold the valid key.
func presentedKeys(h http.Header) []string {
	var out []string
	if scheme, token, ok := strings.Cut(h.Get(echo.HeaderAuthorization), " "); ok &&
		strings.EqualFold(scheme, "Bearer") {
		if token = strings.TrimSpace(token); token != "" {
			out = append(out, token)
		}
	}
	if k := strings.TrimSpace(h.Get(apiKeyHeader)); k != "" {
		out = append(out, k)
	}
	return out
}

// keyDigests hashes the non-blank keys once, at start-up.
func keyDigests(keys []string) [][sha256.Size]byte {
	var digests [][sha256.Size]byte
	for _, k := range keys {
		if k = strings.TrimSpace(k); k != "" {
			digests = append(digests, sha256.Sum256([]byte(k)))
		}
	}
	return digests
}

func anyKeyMatches(presented []string, digests [][sha256.Size]byte) bool {
	match := 0
	for _, p := range presented {
		d := sha256.Sum256([]byte(p))
		for i := range digests {
			match |= subtle.ConstantTimeCompare(d[:], digests[i][:])
		}
	}
	return match == 1
}

// unauthorized is the 401 problem with its challenge; errorParam is the
// RFC 6750 error attribute for a key that was sent but is wrong.
func unauthorized(c echo.Context, detail, errorParam string) error {
	c.Response().Header().Set(echo.HeaderWWWAuthenticate, bearerChallenge+errorParam)
	return fail(keyRejected, detail)
}
