package advisor

import (
	"fmt"
)

// notes collects the assumptions of one triage in the order they were made:
// every default, library fill, estimate and model choice.
type notes struct{ list []string }

func (n *notes) add(format string, args ...any) {
	n.list = append(n.list, fmt.Sprintf(format, args...))
}

// text adds a note already written out; the frequent notes are built by
// concatenation with number.Shortest, which spares fmt's formatting.
func (n *notes) text(s string) { n.list = append(n.list, s) }
