package input

import "strings"

// Error is a sample that is well-formed but physically invalid or
// inconsistent. Each problem names the field as a JSON pointer.
type Error struct {
	Problems []FieldProblem
}

// FieldProblem is one offending field: where, why, in which unit, and the
// valid range or values.
type FieldProblem struct {
	Pointer string `json:"pointer"`
	Reason  string `json:"reason"`
	Unit    string `json:"unit,omitempty"`
	Valid   string `json:"valid,omitempty"`
}

func (e *Error) Error() string {
	parts := make([]string, len(e.Problems))
	for i, p := range e.Problems {
		parts[i] = p.Pointer + ": " + p.Reason
	}
	return "invalid sample: " + strings.Join(parts, "; ")
}

func (e *Error) add(pointer, reason, unit, valid string) {
	e.Problems = append(e.Problems, FieldProblem{pointer, reason, unit, valid})
}

func (e *Error) orNil() error {
	if e == nil || len(e.Problems) == 0 {
		return nil
	}
	return e
}
