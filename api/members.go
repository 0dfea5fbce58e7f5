package api

import (
	"bytes"
	"encoding/json"
	"fmt"
	"reflect"
	"strings"
)

// memberProblem is a member that encoding/json would accept but the
// contract does not: a name that matches a field only when case is ignored
// (zeta_MV is not zeta_mV), or a name given twice in one object (the last
// would silently win; RFC 7493 section 2.3 forbids it).
type memberProblem struct {
	pointer, reason string
}

// checkMembers walks a JSON body that has already decoded into target and
// returns its first member problem, if any.
func checkMembers(body []byte, target reflect.Type) (memberProblem, bool) {
	dec := json.NewDecoder(bytes.NewReader(body))
	p, bad, err := walkMembers(dec, target, "")
	if err != nil {
		return memberProblem{}, false // the decoder already judged the syntax
	}
	return p, bad
}

func walkMembers(dec *json.Decoder, t reflect.Type, at string) (memberProblem, bool, error) {
	for t != nil && t.Kind() == reflect.Pointer {
		t = t.Elem()
	}
	tok, err := dec.Token()
	if err != nil {
		return memberProblem{}, false, err
	}
	switch tok {
	case json.Delim('{'):
		fields := structFields(t)
		seen := map[string]bool{}
		for dec.More() {
			keyTok, err := dec.Token()
			if err != nil {
				return memberProblem{}, false, err
			}
			key := keyTok.(string)
			ptr := at + "/" + escapePointer(key)
			if seen[key] {
				return memberProblem{ptr, "member given twice"}, true, nil
			}
			seen[key] = true
			var ft reflect.Type
			if fields != nil {
				var ok bool
				if ft, ok = fields[key]; !ok {
					return memberProblem{ptr, fmt.Sprintf("unknown field (names are case-sensitive: %s)", closestField(fields, key))}, true, nil
				}
			}
			if p, bad, err := walkMembers(dec, ft, ptr); bad || err != nil {
				return p, bad, err
			}
		}
		_, err = dec.Token()
		return memberProblem{}, false, err
	case json.Delim('['):
		var elem reflect.Type
		if t != nil && t.Kind() == reflect.Slice {
			elem = t.Elem()
		}
		for i := 0; dec.More(); i++ {
			if p, bad, err := walkMembers(dec, elem, fmt.Sprintf("%s/%d", at, i)); bad || err != nil {
				return p, bad, err
			}
		}
		_, err = dec.Token()
		return memberProblem{}, false, err
	}
	return memberProblem{}, false, nil
}

// structFields maps the exact JSON names of a struct type to their types;
// nil for any other type, whose members are not checked by name.
func structFields(t reflect.Type) map[string]reflect.Type {
	if t == nil || t.Kind() != reflect.Struct {
		return nil
	}
	m := make(map[string]reflect.Type, t.NumField())
	for i := 0; i < t.NumField(); i++ {
		name, _, _ := strings.Cut(t.Field(i).Tag.Get("json"), ",")
		m[name] = t.Field(i).Type
	}
	return m
}

func closestField(fields map[string]reflect.Type, key string) string {
	for name := range fields {
		if strings.EqualFold(name, key) {
			return "did you mean " + name + "?"
		}
	}
	return "see /openapi.json"
}
