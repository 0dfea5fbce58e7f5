package api

import (
	"bytes"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"mime"
	"net"
	"net/http"
	"os"
	"reflect"
	"strings"

	"colloidtriage/advisor/input"

	"github.com/labstack/echo/v4"
)

// decodeJSON reads one JSON value from the request body into v, strictly:
// the content type must be JSON, unknown fields are rejected, and trailing
// data is an error. Each failure is a 4xx problem naming what is wrong.
func decodeJSON(c echo.Context, v any) error {
	if err := requireContentType(c, echo.MIMEApplicationJSON); err != nil {
		return err
	}
	body, err := readBody(c, bodyUnreadable)
	if err != nil {
		return err
	}
	return unmarshalStrict(body, v)
}

// readBody reads the whole request body, a leading byte-order mark
// dropped. A body that stops arriving (the server's read timeout) is a 408. A body over the route's limit is a
// 413 whether the limit was met by a declared Content-Length or inside a
// chunked body (echo's limit reader then fails with its own 413 error).
// With a declared Content-Length (already checked against the limit) the
// buffer is allocated once at that size rather than grown by doubling.
// A body already read (by the idempotency middleware) is not read again.
func readBody(c echo.Context, unreadable kind) ([]byte, error) {
	if body, ok := c.Get(bodyKey).([]byte); ok {
		return body, nil
	}
	var buf bytes.Buffer
	if n := c.Request().ContentLength; n > 0 {
		buf.Grow(int(n) + bytes.MinRead)
	}
	_, err := buf.ReadFrom(c.Request().Body)
	if err == nil {
		return bytes.TrimPrefix(buf.Bytes(), utf8BOM), nil
	}
	var tooLarge *http.MaxBytesError
	var he *echo.HTTPError
	var ne net.Error
	switch {
	case errors.As(err, &tooLarge) || (errors.As(err, &he) && he.Code == http.StatusRequestEntityTooLarge):
		return nil, echo.NewHTTPError(http.StatusRequestEntityTooLarge)
	case errors.Is(err, os.ErrDeadlineExceeded) || (errors.As(err, &ne) && ne.Timeout()):
		return nil, fail(bodyTimeout, "the body did not arrive within the read timeout; send it in one go")
	}
	return nil, fail(unreadable, "")
}

// utf8BOM is dropped from the start of every body: spreadsheet programs
// and some editors write it.
var utf8BOM = []byte("\xef\xbb\xbf")

// requireUTF8 refuses a media type whose charset parameter names another
// encoding than UTF-8, the only one read.
func requireUTF8(params map[string]string) error {
	if cs, ok := params["charset"]; ok && !strings.EqualFold(cs, "utf-8") {
		return fail(mediaUnsupported, "charset "+clip(cs, 32)+" is not supported: send UTF-8")
	}
	return nil
}

func unmarshalStrict(body []byte, v any) error {
	dec := json.NewDecoder(bytes.NewReader(body))
	dec.DisallowUnknownFields()
	if err := dec.Decode(v); err != nil {
		return jsonProblem(err, body, contractOf(reflect.TypeOf(v)))
	}
	if rest := bytes.TrimSpace(body[dec.InputOffset():]); len(rest) > 0 {
		return fail(jsonInvalid, "unexpected data after the JSON value")
	}
	if p, bad := checkMembers(body, contractOf(reflect.TypeOf(v))); bad {
		return fail(memberOffContract, p.reason,
			input.FieldProblem{Pointer: p.pointer, Reason: p.reason})
	}
	return nil
}

// jsonProblem explains a decoding error with the field as a JSON pointer,
// found by walking the body against target when encoding/json does not say.
func jsonProblem(err error, body []byte, target *node) error {
	var syn *json.SyntaxError
	var typ *json.UnmarshalTypeError
	switch {
	case errors.As(err, &syn):
		return fail(jsonInvalid,
			fmt.Sprintf("syntax error at byte %d: %s", syn.Offset, syn.Error()))
	case errors.As(err, &typ):
		ptr, kind := "/"+strings.ReplaceAll(typ.Field, ".", "/"), jsonKind(typ.Type.String())
		if p, k, ok := locateIn(body, target); ok && k != "" {
			ptr, kind = p, k
		}
		return fail(fieldWrongType,
			fmt.Sprintf("expected %s, got JSON %s", kind, typ.Value),
			input.FieldProblem{Pointer: ptr, Reason: "wrong type: expected " + kind})
	case errors.Is(err, io.EOF) || len(bytes.TrimSpace(body)) == 0:
		return fail(bodyEmpty, "send a JSON object")
	case errors.Is(err, io.ErrUnexpectedEOF):
		return fail(jsonInvalid, "the JSON value is truncated")
	case strings.HasPrefix(err.Error(), "json: unknown field "):
		name := strings.Trim(strings.TrimPrefix(err.Error(), "json: unknown field "), `"`)
		if p, k, ok := locateIn(body, target); ok && k == "" {
			name = p
		}
		return fail(fieldUnknown,
			"the field "+name+" is not part of the contract (see /openapi.json); check its spelling and unit suffix",
			input.FieldProblem{Pointer: name, Reason: "unknown field"})
	}
	return fail(jsonInvalid, "")
}

// locateIn decodes body generically and locates its first misfit for target.
func locateIn(body []byte, target *node) (pointer, expected string, ok bool) {
	dec := json.NewDecoder(bytes.NewReader(body))
	dec.UseNumber()
	var v any
	if dec.Decode(&v) != nil {
		return "", "", false
	}
	return locate(v, target, "")
}

func jsonKind(goType string) string {
	switch strings.TrimLeft(goType, "*[]") {
	case "float64", "int":
		return "number"
	case "string":
		return "string"
	case "bool":
		return "boolean"
	}
	if strings.HasPrefix(goType, "[]") {
		return "array"
	}
	return "object"
}

func requireContentType(c echo.Context, want string) error {
	mt, params, err := mime.ParseMediaType(c.Request().Header.Get(echo.HeaderContentType))
	if err != nil || mt != want {
		return fail(mediaUnsupported, "send the body as "+want)
	}
	return requireUTF8(params)
}
