package api

import (
	"bytes"
	"encoding/json"
	"fmt"
	"net/http"

	gojson "github.com/goccy/go-json"
	"github.com/labstack/echo/v4"
)

// plainJSON is echo's JSON serializer without HTML escaping, so that rule
// tests such as "x < 3 && y > 1" read as written in reports. Responses are
// encoded by goccy/go-json, a drop-in for encoding/json that writes the same
// bytes (sorted map keys, the same number format; TestEncoderMatchesStdlib)
// in about a third of the time; requests are still decoded by encoding/json.
type plainJSON struct{}

func (plainJSON) Serialize(c echo.Context, i any, indent string) error {
	enc := gojson.NewEncoder(c.Response())
	enc.SetEscapeHTML(false)
	if indent != "" {
		enc.SetIndent("", indent)
	}
	return enc.Encode(i)
}

func (plainJSON) Deserialize(c echo.Context, i any) error {
	err := json.NewDecoder(c.Request().Body).Decode(i)
	if err != nil {
		return echo.NewHTTPError(http.StatusBadRequest, fmt.Sprintf("invalid JSON: %v", err)).SetInternal(err)
	}
	return nil
}

// marshalPlain encodes v without HTML escaping and without the trailing newline.
func marshalPlain(v any) ([]byte, error) {
	var buf bytes.Buffer
	enc := gojson.NewEncoder(&buf)
	enc.SetEscapeHTML(false)
	if err := enc.Encode(v); err != nil {
		return nil, err
	}
	return bytes.TrimSuffix(buf.Bytes(), []byte("\n")), nil
}
