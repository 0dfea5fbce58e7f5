package api

import (
	"encoding/json"
	"maps"
	"reflect"
	"slices"
	"strconv"
	"strings"
)

// locate walks a decoded JSON value against the contract of the Go type
// it was meant for and returns the JSON pointer of the first member that
// the type does not declare (unknown) or whose JSON kind does not fit (wrong type), with the
// expected JSON kind. encoding/json names neither with array indices, and
// names unknown fields without their path.
func locate(v any, n *node, at string) (pointer, expected string, found bool) {
	switch n.kind {
	case reflect.Struct:
		obj, ok := v.(map[string]any)
		if !ok {
			return at, "object", v != nil
		}
		for _, key := range sortedMapKeys(obj) {
			ft, ok := n.members[key]
			if !ok {
				return at + "/" + escapePointer(key), "", true
			}
			if p, e, bad := locate(obj[key], ft, at+"/"+escapePointer(key)); bad {
				return p, e, true
			}
		}
	case reflect.Slice:
		arr, ok := v.([]any)
		if !ok {
			return at, "array", v != nil
		}
		for i, item := range arr {
			if p, e, bad := locate(item, n.elem, at+"/"+strconv.Itoa(i)); bad {
				return p, e, true
			}
		}
	case reflect.String:
		if _, ok := v.(string); !ok && v != nil {
			return at, "string", true
		}
	case reflect.Bool:
		if _, ok := v.(bool); !ok && v != nil {
			return at, "boolean", true
		}
	case reflect.Float64, reflect.Int:
		num, ok := v.(json.Number)
		if !ok && v != nil {
			return at, "number", true
		}
		if ok && n.kind == reflect.Int {
			if _, err := num.Int64(); err != nil {
				return at, "integer", true
			}
		}
	}
	return "", "", false
}

func sortedMapKeys(m map[string]any) []string {
	return slices.Sorted(maps.Keys(m))
}

// escapePointer escapes a key for a JSON pointer (RFC 6901).
func escapePointer(key string) string {
	return strings.ReplaceAll(strings.ReplaceAll(key, "~", "~0"), "/", "~1")
}
