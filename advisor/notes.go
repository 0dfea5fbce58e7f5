package advisor

import (
	"fmt"
	"strconv"
)

// notes collects the assumptions of one triage in the order they were made:
// every default, library fill, estimate and model choice.
type notes struct{ list []string }

func (n *notes) add(format string, args ...any) {
	n.list = append(n.list, fmt.Sprintf(format, args...))
}

// text adds a note already written out; the frequent notes are built by
// concatenation with shortest, which spares fmt's formatting.
func (n *notes) text(s string) { n.list = append(n.list, s) }

// shortest prints v as fmt's %g does: the shortest representation that
// reads back as v.
func shortest(v float64) string {
	var buf [32]byte
	return string(strconv.AppendFloat(buf[:0], v, 'g', -1, 64))
}
