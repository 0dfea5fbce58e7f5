package advisor

import "github.com/expr-lang/expr/vm"

// runRule evaluates a compiled condition on the facts of one sample, on a
// machine reused across the rules of one triage.
func runRule(m *vm.VM, program *vm.Program, f facts) (bool, error) {
	out, err := m.Run(program, map[string]any(f))
	if err != nil {
		return false, err
	}
	return out.(bool), nil
}
