package advisor

import "github.com/expr-lang/expr/vm"

// runRule evaluates a compiled condition on the facts of one sample.
func runRule(r rule, f facts) (bool, error) {
	out, err := vm.Run(r.program, map[string]any(f))
	if err != nil {
		return false, err
	}
	return out.(bool), nil
}
