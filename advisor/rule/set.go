package rule

import (
	"crypto/sha256"
	"encoding/hex"
	"errors"
	"fmt"
	"io/fs"
	"math"
	"path"
	"regexp"
	"sort"
	"strings"

	"github.com/expr-lang/expr"
	"github.com/expr-lang/expr/file"
	"github.com/expr-lang/expr/vm"
)

// ruleFileSuffix marks rule files in the built-in set and in site packs.
const ruleFileSuffix = ".rules.yaml"

// Set is the compiled knowledge base: every rule parsed, checked against
// the catalogue and the declared facts, and compiled once.
type Set struct {
	Catalog *Catalog
	Hash    string
	Files   []string
	rules   []Rule
	vocab   *vocabulary
}

// Rule is one compiled rule.
type Rule struct {
	spec
	program *vm.Program
	cond    condition  // the program as a closure over the facts; nil outside the subset
	text    []textPart // explain, split at its placeholders once at load
}

// textPart is literal text, or a fact whose value is formatted in its place.
type textPart struct {
	literal string
	fact    *declared // nil for literal text
}

var placeholder = regexp.MustCompile(`\{([A-Za-z0-9_]+)\}`)

// Load reads the catalogue (catalog.yaml) and every *.rules.yaml file of
// builtin, then the rule files of each site pack, and compiles them against
// the facts declared in vocabulary (TopCauseScore is added). Any error names
// the file, the rule id, the line and the column.
func Load(vocabulary []Fact, builtin fs.FS, packs ...fs.FS) (*Set, error) {
	vocab, err := newVocabulary(vocabulary)
	if err != nil {
		return nil, err
	}
	catalog, catalogData, err := loadCatalog(builtin, "catalog.yaml")
	if err != nil {
		return nil, err
	}
	h := sha256.New()
	h.Write(catalogData)
	rs := &Set{Catalog: catalog, vocab: vocab}
	c := compiler{vocab: vocab, env: vocab.defaults.env(false), afterCausesEnv: vocab.defaults.env(true)}
	seen := map[string]string{}
	for i, fsys := range append([]fs.FS{builtin}, packs...) {
		names, err := fs.Glob(fsys, "*"+ruleFileSuffix)
		if err != nil {
			return nil, err
		}
		sort.Strings(names)
		for _, name := range names {
			data, err := fs.ReadFile(fsys, name)
			if err != nil {
				return nil, err
			}
			label := name
			if i > 0 {
				label = path.Join(fmt.Sprintf("pack%d", i), name)
			}
			fmt.Fprintf(h, "\x00%s\x00", label)
			h.Write(data)
			specs, err := parseRuleFile(label, data)
			if err != nil {
				return nil, err
			}
			for _, s := range specs {
				if prev, dup := seen[s.ID]; dup {
					return nil, s.errorAt("id", fmt.Sprintf("duplicate rule id, first defined in %s", prev))
				}
				seen[s.ID] = s.file
				r, err := c.rule(s, catalog)
				if err != nil {
					return nil, err
				}
				rs.rules = append(rs.rules, r)
			}
			rs.Files = append(rs.Files, label)
		}
	}
	if len(rs.rules) == 0 {
		return nil, errors.New("rule set is empty")
	}
	rs.Hash = "sha256:" + hex.EncodeToString(h.Sum(nil))[:16]
	return rs, nil
}

func (s spec) errorAt(key, msg string) *Error {
	line, col := s.line, s.column
	if n, ok := s.at[key]; ok {
		line, col = n.Line, n.Column
	}
	return &Error{File: s.file, RuleID: s.ID, Line: line, Column: col, Message: msg}
}

// compiler compiles the rules of one set against its vocabulary.
type compiler struct {
	vocab *vocabulary
	// env and afterCausesEnv declare the facts' types to the expression
	// compiler (the values are the defaults); read only.
	env, afterCausesEnv map[string]any
}

// fact looks up a fact the rule may name: top_cause_score only after the
// causes.
func (cp compiler) fact(s spec, name string) (declared, bool) {
	f, ok := cp.vocab.index[name]
	return f, ok && (name != TopCauseScore || s.AfterCauses)
}

func (cp compiler) rule(s spec, c *Catalog) (Rule, error) {
	if s.ID == "" {
		return Rule{}, s.errorAt("id", "empty rule id")
	}
	if _, ok := find(c.Causes, s.Cause); !ok {
		return Rule{}, s.errorAt("cause", fmt.Sprintf("unknown cause %q", s.Cause))
	}
	if len(s.Symptoms) == 0 {
		return Rule{}, s.errorAt("symptoms", "a rule names at least one symptom (or \"any\")")
	}
	for _, sym := range s.Symptoms {
		if _, ok := find(c.Symptoms, sym); !ok && sym != "any" {
			return Rule{}, s.errorAt("symptoms", fmt.Sprintf("unknown symptom %q", sym))
		}
	}
	if !(s.Certainty >= -1 && s.Certainty <= 1) || s.Certainty == 0 {
		return Rule{}, s.errorAt("certainty", "certainty must be in [-1, 1] and not 0")
	}
	for _, id := range s.Remedies {
		if _, ok := find(c.Remedies, id); !ok {
			return Rule{}, s.errorAt("remedies", fmt.Sprintf("unknown remedy %q", id))
		}
	}
	for _, name := range s.Evidence {
		if f, ok := cp.fact(s, name); !ok || f.Kind != Number {
			return Rule{}, s.errorAt("evidence", fmt.Sprintf("evidence %q is not a numeric fact", name))
		}
	}
	var text []textPart
	last := 0
	for _, m := range placeholder.FindAllStringSubmatchIndex(s.Explain, -1) {
		name := s.Explain[m[2]:m[3]]
		f, ok := cp.fact(s, name)
		if !ok {
			return Rule{}, s.errorAt("explain", fmt.Sprintf("placeholder {%s} is not a fact", name))
		}
		text = append(text, textPart{literal: s.Explain[last:m[0]]}, textPart{fact: &f})
		last = m[1]
	}
	text = append(text, textPart{literal: s.Explain[last:]})
	program, err := expr.Compile(s.When, cp.options(s.AfterCauses)...)
	if err != nil {
		re := s.errorAt("when", err.Error())
		var fe *file.Error
		if errors.As(err, &fe) {
			p := s.whenPos.offset(fe.Line, fe.Column)
			re.Line, re.Column, re.Message, re.Snippet = p.line, p.column, fe.Message, fe.Snippet
		}
		return Rule{}, re
	}
	return Rule{spec: s, program: program, cond: cp.condition(program.Node()), text: text}, nil
}

// options declares the rule language: the facts with their types, a
// boolean result, and known(x), which is false for a number the advisor
// could not compute for this sample (such numbers make every comparison false).
func (cp compiler) options(afterCauses bool) []expr.Option {
	env := cp.env
	if afterCauses {
		env = cp.afterCausesEnv
	}
	return []expr.Option{
		expr.Env(env),
		expr.AsBool(),
		expr.Function("known", func(params ...any) (any, error) {
			x := params[0].(float64)
			return !math.IsNaN(x), nil
		}, new(func(float64) bool)),
	}
}

// Rules lists the loaded rules for the catalogue endpoint.
func (rs *Set) Rules() []Info {
	out := make([]Info, len(rs.rules))
	for i, r := range rs.rules {
		remedies := r.Remedies
		if remedies == nil {
			remedies = []string{}
		}
		out[i] = Info{ID: r.ID, File: r.file, Line: r.line, Cause: r.Cause, Symptoms: r.Symptoms,
			When: r.When, Certainty: r.Certainty, Remedies: remedies, AfterCauses: r.AfterCauses}
	}
	return out
}

// Info describes one loaded rule.
type Info struct {
	ID          string   `json:"id"`
	File        string   `json:"file"`
	Line        int      `json:"line"`
	Cause       string   `json:"cause"`
	Symptoms    []string `json:"symptoms"`
	When        string   `json:"when"`
	Certainty   float64  `json:"certainty"`
	Remedies    []string `json:"remedies"`
	AfterCauses bool     `json:"after_causes"`
}

func sortedKeys(m map[string]bool) []string {
	out := make([]string, 0, len(m))
	for k := range m {
		out = append(out, k)
	}
	sort.Strings(out)
	return out
}

func (s *spec) appliesTo(symptom string) bool {
	for _, sym := range s.Symptoms {
		if sym == symptom || sym == "any" {
			return true
		}
	}
	return false
}

// WriteExplanation writes the rule's text with its placeholders filled by
// the facts' values.
func (r *Rule) WriteExplanation(b *strings.Builder, f Facts) {
	var value [64]byte
	for _, part := range r.text {
		if part.fact != nil {
			b.Write(f.appendFormat(value[:0], *part.fact))
		} else {
			b.WriteString(part.literal)
		}
	}
}

// For returns the rules of symptom (its own and those of "any"), in load
// order, after_causes rules included.
func (rs *Set) For(symptom string) []*Rule {
	var out []*Rule
	for i := range rs.rules {
		if rs.rules[i].appliesTo(symptom) {
			out = append(out, &rs.rules[i])
		}
	}
	return out
}

// Holds evaluates the rule's condition on f (top_cause_score as f holds
// it); a condition the machine cannot run does not hold.
func (r *Rule) Holds(f Facts) bool {
	if r.cond != nil {
		return r.cond(f)
	}
	var machine vm.VM
	out, err := runRule(&machine, r.program, f.env(r.AfterCauses))
	return err == nil && out
}
