package remedy_test

import (
	"reflect"
	"slices"
	"strings"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/remedy"
)

// TestConstrainableInputs: the request accepts as constraints exactly the
// inputs some remedy changes, and every solver's remedy names what it changes.
func TestConstrainableInputs(t *testing.T) {
	f, _ := reflect.TypeFor[input.Sample]().FieldByName("Constraints")
	_, list, _ := strings.Cut(f.Tag.Get("validate"), "oneof=")
	accepted := strings.Fields(list)
	slices.Sort(accepted)
	if got := remedy.ChangedInputs(); !slices.Equal(accepted, got) {
		t.Errorf("constraints accepted %v, changed by remedies %v", accepted, got)
	}
	for _, id := range remedy.SolverIDs() {
		if remedy.Breaks(id, remedy.ChangedInputs()) == nil {
			t.Errorf("remedy %s names no input it changes", id)
		}
	}
}
