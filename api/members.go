package api

import (
	"encoding/json"
	"fmt"
	"reflect"
	"slices"
	"strconv"
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
// returns its first member problem, if any. The body is known to be valid
// JSON, so a plain byte scanner suffices; it reads each member name once and
// allocates only for the pointers of objects it descends into.
func checkMembers(body []byte, target *node) (memberProblem, bool) {
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

// value scans one value of contract n (nil: not checked by name) at
// pointer at.
func (s *memberScanner) value(n *node, at string) (memberProblem, bool) {
	switch s.peek() {
	case '{':
		s.i++
		return s.object(n, at)
	case '[':
		s.i++
		var elem *node
		if n != nil && n.kind == reflect.Slice {
			elem = n.elem
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

// object scans the members of an object after its '{'. Only the members
// of a struct are checked by name.
func (s *memberScanner) object(n *node, at string) (memberProblem, bool) {
	var fields map[string]*node
	if n != nil && n.kind == reflect.Struct {
		fields = n.members
	}
	var seen []string
	for s.peek() == '"' {
		key := s.str()
		ptr := at + "/" + escapePointer(key)
		if slices.Contains(seen, key) {
			return memberProblem{ptr, "member given twice"}, true
		}
		seen = append(seen, key)
		var ft *node
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

func closestField(fields map[string]*node, key string) string {
	for name := range fields {
		if strings.EqualFold(name, key) {
			return "did you mean " + name + "?"
		}
	}
	return "see /openapi.json"
}
