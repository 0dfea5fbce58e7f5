package advisor

import (
	"math"

	"github.com/expr-lang/expr/ast"
	"github.com/expr-lang/expr/vm"
)

// A rule's condition runs in one of two ways. The expression machine of the
// expression library runs any condition, on the facts as a map
// (facts.env). Conditions within the usual subset of the rule language
// (literals, facts, ! && || comparisons, + - * /, known and abs) are also
// compiled once, from the checked tree, to a closure over the fact slots,
// which runs without the map or boxed numbers: the triage uses it whenever
// there is one. TestConditionsMatchMachine holds the two to the same answers.

// condition is a compiled rule condition.
type condition func(f facts) bool

type (
	numberTerm func(f facts) float64
	textTerm   func(f facts) string
)

// runRule evaluates a condition on the expression machine, reused across
// the rules of one triage.
func runRule(m *vm.VM, program *vm.Program, env map[string]any) (bool, error) {
	out, err := m.Run(program, env)
	if err != nil {
		return false, err
	}
	return out.(bool), nil
}

// compileCondition returns the closure of a checked condition, or nil when
// it uses anything outside the subset.
func compileCondition(n ast.Node) condition {
	return boolTerm(n)
}

func boolTerm(n ast.Node) condition {
	switch n := n.(type) {
	case *ast.BoolNode:
		v := n.Value
		return func(facts) bool { return v }
	case *ast.ConstantNode:
		if v, ok := n.Value.(bool); ok {
			return func(facts) bool { return v }
		}
	case *ast.IdentifierNode:
		if f, ok := factIndex[n.Value]; ok && f.Kind == flagFact {
			i := f.slot
			return func(f facts) bool { return f.flag[i] }
		}
	case *ast.UnaryNode:
		if x := boolTerm(n.Node); x != nil && (n.Operator == "!" || n.Operator == "not") {
			return func(f facts) bool { return !x(f) }
		}
	case *ast.CallNode:
		if callee, ok := n.Callee.(*ast.IdentifierNode); ok && callee.Value == "known" && len(n.Arguments) == 1 {
			if x := numberTermOf(n.Arguments[0]); x != nil {
				return func(f facts) bool { return !math.IsNaN(x(f)) }
			}
		}
	case *ast.BinaryNode:
		return binaryCondition(n)
	}
	return nil
}

func binaryCondition(n *ast.BinaryNode) condition {
	switch n.Operator {
	case "&&", "and", "||", "or":
		a, b := boolTerm(n.Left), boolTerm(n.Right)
		if a == nil || b == nil {
			return nil
		}
		if n.Operator == "&&" || n.Operator == "and" {
			return func(f facts) bool { return a(f) && b(f) }
		}
		return func(f facts) bool { return a(f) || b(f) }
	}
	if a, b := numberTermOf(n.Left), numberTermOf(n.Right); a != nil && b != nil {
		switch n.Operator {
		case "<":
			return func(f facts) bool { return a(f) < b(f) }
		case "<=":
			return func(f facts) bool { return a(f) <= b(f) }
		case ">":
			return func(f facts) bool { return a(f) > b(f) }
		case ">=":
			return func(f facts) bool { return a(f) >= b(f) }
		}
		return equality(n.Operator, a, b)
	}
	if a, b := textTermOf(n.Left), textTermOf(n.Right); a != nil && b != nil {
		return equality(n.Operator, a, b)
	}
	if a, b := boolTerm(n.Left), boolTerm(n.Right); a != nil && b != nil {
		return equality(n.Operator, a, b)
	}
	return nil
}

// equality compiles == and != between two terms of one type; nil for any
// other operator.
func equality[T comparable, Term ~func(facts) T](op string, a, b Term) condition {
	switch op {
	case "==":
		return func(f facts) bool { return a(f) == b(f) }
	case "!=":
		return func(f facts) bool { return a(f) != b(f) }
	}
	return nil
}

func numberTermOf(n ast.Node) numberTerm {
	switch n := n.(type) {
	case *ast.IntegerNode:
		v := float64(n.Value)
		return func(facts) float64 { return v }
	case *ast.FloatNode:
		v := n.Value
		return func(facts) float64 { return v }
	case *ast.ConstantNode:
		switch v := n.Value.(type) {
		case float64:
			return func(facts) float64 { return v }
		case int:
			x := float64(v)
			return func(facts) float64 { return x }
		}
	case *ast.IdentifierNode:
		if f, ok := factIndex[n.Value]; ok && f.Kind == numberFact {
			i := f.slot
			return func(f facts) float64 { return f.num[i] }
		}
	case *ast.UnaryNode:
		x := numberTermOf(n.Node)
		switch {
		case x == nil:
		case n.Operator == "-":
			return func(f facts) float64 { return -x(f) }
		case n.Operator == "+":
			return x
		}
	case *ast.BuiltinNode:
		if n.Name == "abs" && len(n.Arguments) == 1 {
			if x := numberTermOf(n.Arguments[0]); x != nil {
				return func(f facts) float64 { return math.Abs(x(f)) }
			}
		}
	case *ast.BinaryNode:
		a, b := numberTermOf(n.Left), numberTermOf(n.Right)
		if a == nil || b == nil {
			return nil
		}
		switch n.Operator {
		case "+":
			return func(f facts) float64 { return a(f) + b(f) }
		case "-":
			return func(f facts) float64 { return a(f) - b(f) }
		case "*":
			return func(f facts) float64 { return a(f) * b(f) }
		case "/":
			return func(f facts) float64 { return a(f) / b(f) }
		}
	}
	return nil
}

func textTermOf(n ast.Node) textTerm {
	switch n := n.(type) {
	case *ast.StringNode:
		v := n.Value
		return func(facts) string { return v }
	case *ast.ConstantNode:
		if v, ok := n.Value.(string); ok {
			return func(facts) string { return v }
		}
	case *ast.IdentifierNode:
		if f, ok := factIndex[n.Value]; ok && f.Kind == textFact {
			i := f.slot
			return func(f facts) string { return f.text[i] }
		}
	}
	return nil
}
