package rule

import (
	"math"

	"github.com/expr-lang/expr/ast"
	"github.com/expr-lang/expr/vm"
)

// A rule's condition runs in one of two ways. The expression machine of the
// expression library runs any condition, on the facts as a map
// (Facts.env). Conditions within the usual subset of the rule language
// (literals, facts, ! && || comparisons, + - * /, known and abs) are also
// compiled once, from the checked tree, to a closure over the fact slots,
// which runs without the map or boxed numbers: the triage uses it whenever
// there is one. TestConditionsMatchMachine holds the two to the same answers.

// condition is a compiled rule condition.
type condition func(f Facts) bool

type (
	numberTerm func(f Facts) float64
	textTerm   func(f Facts) string
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

// condition returns the closure of a checked condition, or nil when it
// uses anything outside the subset.
func (cp compiler) condition(n ast.Node) condition {
	return cp.boolTerm(n)
}

func (cp compiler) boolTerm(n ast.Node) condition {
	switch n := n.(type) {
	case *ast.BoolNode:
		v := n.Value
		return func(Facts) bool { return v }
	case *ast.ConstantNode:
		if v, ok := n.Value.(bool); ok {
			return func(Facts) bool { return v }
		}
	case *ast.IdentifierNode:
		if f, ok := cp.vocab.index[n.Value]; ok && f.Kind == Flag {
			i := f.slot
			return func(f Facts) bool { return f.flag[i] }
		}
	case *ast.UnaryNode:
		if x := cp.boolTerm(n.Node); x != nil && (n.Operator == "!" || n.Operator == "not") {
			return func(f Facts) bool { return !x(f) }
		}
	case *ast.CallNode:
		if callee, ok := n.Callee.(*ast.IdentifierNode); ok && callee.Value == "known" && len(n.Arguments) == 1 {
			if x := cp.numberTermOf(n.Arguments[0]); x != nil {
				return func(f Facts) bool { return !math.IsNaN(x(f)) }
			}
		}
	case *ast.BinaryNode:
		return cp.binaryCondition(n)
	}
	return nil
}

func (cp compiler) binaryCondition(n *ast.BinaryNode) condition {
	switch n.Operator {
	case "&&", "and", "||", "or":
		a, b := cp.boolTerm(n.Left), cp.boolTerm(n.Right)
		if a == nil || b == nil {
			return nil
		}
		if n.Operator == "&&" || n.Operator == "and" {
			return func(f Facts) bool { return a(f) && b(f) }
		}
		return func(f Facts) bool { return a(f) || b(f) }
	}
	if a, b := cp.numberTermOf(n.Left), cp.numberTermOf(n.Right); a != nil && b != nil {
		switch n.Operator {
		case "<":
			return func(f Facts) bool { return a(f) < b(f) }
		case "<=":
			return func(f Facts) bool { return a(f) <= b(f) }
		case ">":
			return func(f Facts) bool { return a(f) > b(f) }
		case ">=":
			return func(f Facts) bool { return a(f) >= b(f) }
		}
		return equality(n.Operator, a, b)
	}
	if a, b := cp.textTermOf(n.Left), cp.textTermOf(n.Right); a != nil && b != nil {
		return equality(n.Operator, a, b)
	}
	if a, b := cp.boolTerm(n.Left), cp.boolTerm(n.Right); a != nil && b != nil {
		return equality(n.Operator, a, b)
	}
	return nil
}

// equality compiles == and != between two terms of one type; nil for any
// other operator.
func equality[T comparable, Term ~func(Facts) T](op string, a, b Term) condition {
	switch op {
	case "==":
		return func(f Facts) bool { return a(f) == b(f) }
	case "!=":
		return func(f Facts) bool { return a(f) != b(f) }
	}
	return nil
}

func (cp compiler) numberTermOf(n ast.Node) numberTerm {
	switch n := n.(type) {
	case *ast.IntegerNode:
		v := float64(n.Value)
		return func(Facts) float64 { return v }
	case *ast.FloatNode:
		v := n.Value
		return func(Facts) float64 { return v }
	case *ast.ConstantNode:
		switch v := n.Value.(type) {
		case float64:
			return func(Facts) float64 { return v }
		case int:
			x := float64(v)
			return func(Facts) float64 { return x }
		}
	case *ast.IdentifierNode:
		if f, ok := cp.vocab.index[n.Value]; ok && f.Kind == Number {
			i := f.slot
			return func(f Facts) float64 { return f.num[i] }
		}
	case *ast.UnaryNode:
		x := cp.numberTermOf(n.Node)
		switch {
		case x == nil:
		case n.Operator == "-":
			return func(f Facts) float64 { return -x(f) }
		case n.Operator == "+":
			return x
		}
	case *ast.BuiltinNode:
		if n.Name == "abs" && len(n.Arguments) == 1 {
			if x := cp.numberTermOf(n.Arguments[0]); x != nil {
				return func(f Facts) float64 { return math.Abs(x(f)) }
			}
		}
	case *ast.BinaryNode:
		a, b := cp.numberTermOf(n.Left), cp.numberTermOf(n.Right)
		if a == nil || b == nil {
			return nil
		}
		switch n.Operator {
		case "+":
			return func(f Facts) float64 { return a(f) + b(f) }
		case "-":
			return func(f Facts) float64 { return a(f) - b(f) }
		case "*":
			return func(f Facts) float64 { return a(f) * b(f) }
		case "/":
			return func(f Facts) float64 { return a(f) / b(f) }
		}
	}
	return nil
}

func (cp compiler) textTermOf(n ast.Node) textTerm {
	switch n := n.(type) {
	case *ast.StringNode:
		v := n.Value
		return func(Facts) string { return v }
	case *ast.ConstantNode:
		if v, ok := n.Value.(string); ok {
			return func(Facts) string { return v }
		}
	case *ast.IdentifierNode:
		if f, ok := cp.vocab.index[n.Value]; ok && f.Kind == Text {
			i := f.slot
			return func(f Facts) string { return f.text[i] }
		}
	}
	return nil
}
