package input

import (
	"fmt"
	"slices"
)

// Notes collects the assumptions of one triage in the order they were made:
// every default, library fill, estimate and model choice.
type Notes struct{ list []string }

// NewNotes returns an empty list with room for n notes.
func NewNotes(n int) *Notes { return &Notes{list: make([]string, 0, n)} }

// Add adds a note formatted as by fmt.Sprintf. Add and Text on nil Notes
// do nothing: the lean evaluation of a Monte Carlo draw keeps no notes.
func (n *Notes) Add(format string, args ...any) {
	if n == nil {
		return
	}
	n.Text(fmt.Sprintf(format, args...))
}

// Text adds a note already written out; the frequent notes are built by
// concatenation with number.Shortest, which spares fmt's formatting. A note
// already in the list is not repeated (the same liquid looked up at two
// temperatures states its untabulated properties twice).
func (n *Notes) Text(s string) {
	if n != nil && !slices.Contains(n.list, s) {
		n.list = append(n.list, s)
	}
}

// List returns the notes in the order they were made (the list itself, not
// a copy).
func (n *Notes) List() []string { return n.list }
