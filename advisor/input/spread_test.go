package input

import "testing"

// Spread reads a number or {"factor": f} and writes them back alike.
func TestSpreadJSON(t *testing.T) {
	t.Parallel()
	var s Spread
	if err := s.UnmarshalJSON([]byte(`{"factor": 2}`)); err != nil || s.Factor != 2 || s.SD != 0 {
		t.Errorf("factor: %+v %v", s, err)
	}
	if err := s.UnmarshalJSON([]byte(`5`)); err != nil || s.SD != 5 || s.Factor != 0 {
		t.Errorf("sd: %+v %v", s, err)
	}
	if err := s.UnmarshalJSON([]byte(`{"sd": 2}`)); err == nil {
		t.Error("an unknown member is accepted")
	}
	if b, _ := (Spread{Factor: 1.5}).MarshalJSON(); string(b) != `{"factor":1.5}` {
		t.Errorf("marshal factor: %s", b)
	}
}
