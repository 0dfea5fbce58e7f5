package rule

import (
	"fmt"
	"strings"

	"go.yaml.in/yaml/v3"
)

// spec is one rule as written in a rule file, with the position of every
// part that can be wrong, so that load-time errors point at it.
type spec struct {
	ID          string
	Cause       string
	Symptoms    []string
	When        string
	Certainty   float64
	Evidence    []string
	Explain     string
	Remedies    []string
	AfterCauses bool

	file    string
	line    int
	column  int
	at      map[string]yaml.Node // key -> value node, for positions
	whenPos position
}

type position struct{ line, column int }

var ruleKeys = map[string]bool{
	"id": true, "cause": true, "symptoms": true, "when": true, "certainty": true,
	"evidence": true, "explain": true, "remedies": true, "after_causes": true,
}

// parseRuleFile reads a rule file: a mapping with the single key "rules"
// holding a sequence of rule mappings.
func parseRuleFile(file string, data []byte) ([]spec, error) {
	var doc yaml.Node
	if err := yaml.Unmarshal(data, &doc); err != nil {
		return nil, &Error{File: file, Message: err.Error()}
	}
	if len(doc.Content) == 0 {
		return nil, &Error{File: file, Line: 1, Column: 1, Message: "empty rule file"}
	}
	root := doc.Content[0]
	if root.Kind != yaml.MappingNode || len(root.Content) != 2 || root.Content[0].Value != "rules" ||
		root.Content[1].Kind != yaml.SequenceNode {
		return nil, &Error{File: file, Line: root.Line, Column: root.Column,
			Message: `a rule file is a mapping with one key "rules" holding a list of rules`}
	}
	var specs []spec
	for _, n := range root.Content[1].Content {
		s, err := parseRule(file, n)
		if err != nil {
			return nil, err
		}
		specs = append(specs, s)
	}
	return specs, nil
}

func parseRule(file string, n *yaml.Node) (spec, error) {
	s := spec{file: file, line: n.Line, column: n.Column, at: map[string]yaml.Node{}}
	if n.Kind != yaml.MappingNode {
		return s, &Error{File: file, Line: n.Line, Column: n.Column, Message: "a rule is a mapping"}
	}
	for i := 0; i+1 < len(n.Content); i += 2 {
		key, val := n.Content[i], n.Content[i+1]
		if !ruleKeys[key.Value] {
			return s, &Error{File: file, RuleID: s.ID, Line: key.Line, Column: key.Column,
				Message: fmt.Sprintf("unknown key %q (known: %s)", key.Value, strings.Join(sortedKeys(ruleKeys), ", "))}
		}
		s.at[key.Value] = *val
		var err error
		switch key.Value {
		case "id":
			err = val.Decode(&s.ID)
		case "cause":
			err = val.Decode(&s.Cause)
		case "symptoms":
			err = val.Decode(&s.Symptoms)
		case "when":
			err = val.Decode(&s.When)
			s.whenPos = scalarStart(val)
		case "certainty":
			err = val.Decode(&s.Certainty)
		case "evidence":
			err = val.Decode(&s.Evidence)
		case "explain":
			err = val.Decode(&s.Explain)
		case "remedies":
			err = val.Decode(&s.Remedies)
		case "after_causes":
			err = val.Decode(&s.AfterCauses)
		}
		if err != nil {
			return s, &Error{File: file, RuleID: s.ID, Line: val.Line, Column: val.Column,
				Message: fmt.Sprintf("%s: %v", key.Value, err)}
		}
	}
	for _, k := range []string{"id", "cause", "symptoms", "when", "certainty", "explain"} {
		if _, ok := s.at[k]; !ok {
			return s, &Error{File: file, RuleID: s.ID, Line: n.Line, Column: n.Column,
				Message: fmt.Sprintf("missing key %q", k)}
		}
	}
	return s, nil
}

// scalarStart is where the text of a scalar begins: after the opening quote
// of a quoted scalar, on the next line for a block scalar.
func scalarStart(n *yaml.Node) position {
	switch n.Style {
	case yaml.DoubleQuotedStyle, yaml.SingleQuotedStyle:
		return position{n.Line, n.Column + 1}
	case yaml.LiteralStyle, yaml.FoldedStyle:
		return position{n.Line + 1, n.Column + 2}
	}
	return position{n.Line, n.Column}
}

// offset maps a 1-based line and 0-based column inside the expression text
// to a position in the rule file.
func (p position) offset(line, column int) position {
	if line <= 1 {
		return position{p.line, p.column + column}
	}
	return position{p.line + line - 1, column + 1}
}

// Error is a rule set that cannot be loaded, with the place to fix.
type Error struct {
	File    string
	RuleID  string
	Line    int
	Column  int
	Message string
	Snippet string
}

func (e *Error) Error() string {
	var b strings.Builder
	b.WriteString(e.File)
	if e.Line > 0 {
		fmt.Fprintf(&b, ":%d:%d", e.Line, e.Column)
	}
	if e.RuleID != "" {
		fmt.Fprintf(&b, ": rule %s", e.RuleID)
	}
	b.WriteString(": ")
	b.WriteString(e.Message)
	if e.Snippet != "" {
		b.WriteString(e.Snippet)
	}
	return b.String()
}
