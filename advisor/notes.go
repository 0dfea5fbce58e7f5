package advisor

import "fmt"

// notes collects the assumptions of one triage in the order they were made:
// every default, library fill, estimate and model choice.
type notes struct{ list []string }

func (n *notes) add(format string, args ...any) {
	n.list = append(n.list, fmt.Sprintf(format, args...))
}
