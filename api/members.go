package api

import (
	"encoding/json"
	"fmt"
	"reflect"
	"slices"
	"strconv"
	"strings"
	"sync"
)

// memberProblem is a member that encoding/json would accept but the
// contract does not: a name that matches a field only when case is ignored
// (zeta_MV is not zeta_mV), or a name given twice in one object (the last
// would silently win; RFC 7493 section 2.3 forbids it).
type memberProblem struct {
	pointer, reason string
}

// checkMembers walks a JSON body that has already decoded into target and
// returns its first member problem, if any. The body is known to be valid
// JSON, so a plain byte scanner suffices; it reads each member name once and
// allocates only for the pointers of objects it descends into.
func checkMembers(body []byte, target reflect.Type) (memberProblem, bool) {
	s := memberScanner{b: body}
	return s.value(target, "")
}

// memberScanner walks valid JSON text from position i.
type memberScanner struct {
	b []byte
	i int
}

func (s *memberScanner) peek() byte {
	for s.i < len(s.b) {
		switch c := s.b[s.i]; c {
		case ' ', '\t', '\r', '\n':
			s.i++
		default:
			return c
		}
	}
	return 0
}

// value scans one value of type t (nil: not checked by name) at pointer at.
func (s *memberScanner) value(t reflect.Type, at string) (memberProblem, bool) {
	for t != nil && t.Kind() == reflect.Pointer {
		t = t.Elem()
	}
	switch s.peek() {
	case '{':
		s.i++
		return s.object(t, at)
	case '[':
		s.i++
		var elem reflect.Type
		if t != nil && t.Kind() == reflect.Slice {
			elem = t.Elem()
		}
		for n := 0; s.peek() != ']' && s.i < len(s.b); n++ {
			if p, bad := s.value(elem, at+"/"+strconv.Itoa(n)); bad {
				return p, true
			}
			if s.peek() == ',' {
				s.i++
			}
		}
		s.i++
	case '"':
		s.str()
	default:
		for s.i < len(s.b) && !strings.ContainsRune(",}] \t\r\n", rune(s.b[s.i])) {
			s.i++
		}
	}
	return memberProblem{}, false
}

// object scans the members of an object after its '{'.
func (s *memberScanner) object(t reflect.Type, at string) (memberProblem, bool) {
	fields := structFields(t)
	var seen []string
	for s.peek() == '"' {
		key := s.str()
		ptr := at + "/" + escapePointer(key)
		if slices.Contains(seen, key) {
			return memberProblem{ptr, "member given twice"}, true
		}
		seen = append(seen, key)
		var ft reflect.Type
		if fields != nil {
			var ok bool
			if ft, ok = fields[key]; !ok {
				return memberProblem{ptr, fmt.Sprintf("unknown field (names are case-sensitive: %s)", closestField(fields, key))}, true
			}
		}
		if s.peek() == ':' {
			s.i++
		}
		if p, bad := s.value(ft, ptr); bad {
			return p, true
		}
		if s.peek() == ',' {
			s.i++
		}
	}
	s.peek()
	s.i++ // '}'
	return memberProblem{}, false
}

// str scans a string at its opening quote and returns its text, unescaped
// by encoding/json when it holds an escape.
func (s *memberScanner) str() string {
	start := s.i
	s.i++
	escaped := false
	for s.i < len(s.b) && s.b[s.i] != '"' {
		if s.b[s.i] == '\\' {
			escaped = true
			s.i++
		}
		s.i++
	}
	s.i++
	raw := s.b[start:min(s.i, len(s.b))]
	if !escaped {
		return string(raw[1 : len(raw)-1])
	}
	var text string
	_ = json.Unmarshal(raw, &text) // valid JSON: the decoder read it first
	return text
}

// structFields maps the exact JSON names of a struct type to their types;
// nil for any other type, whose members are not checked by name. The map
// is built once per type (it depends on the type's declaration only) and
// shared read-only.
func structFields(t reflect.Type) map[string]reflect.Type {
	if t == nil || t.Kind() != reflect.Struct {
		return nil
	}
	if m, ok := fieldsByType.Load(t); ok {
		return m.(map[string]reflect.Type)
	}
	m := make(map[string]reflect.Type, t.NumField())
	for i := 0; i < t.NumField(); i++ {
		name, _, _ := strings.Cut(t.Field(i).Tag.Get("json"), ",")
		m[name] = t.Field(i).Type
	}
	fieldsByType.Store(t, m)
	return m
}

var fieldsByType sync.Map // reflect.Type -> map[string]reflect.Type

func closestField(fields map[string]reflect.Type, key string) string {
	for name := range fields {
		if strings.EqualFold(name, key) {
			return "did you mean " + name + "?"
		}
	}
	return "see /openapi.json"
}
