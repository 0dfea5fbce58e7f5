package physics

import (
	"errors"
	"fmt"
	"strings"
)

// ErrUnknownCosolvent is wrapped by the error of ParseCosolvent: the name is
// not one of the co-solvents whose water mixtures are tabulated here.
var ErrUnknownCosolvent = errors.New("physics: unknown co-solvent")

// Cosolvent is a water-miscible liquid added to an aqueous continuous phase,
// mostly as a freeze protectant. The zero value is no co-solvent.
type Cosolvent int

// The co-solvents with published freezing-point data for their water
// mixtures. Their names (String) are the keys of the liquids library.
const (
	EthyleneGlycol Cosolvent = iota + 1
	PropyleneGlycol
	Glycerol
	Ethanol
)

// Cosolvents lists every known co-solvent, in the order of the constants.
var Cosolvents = []Cosolvent{EthyleneGlycol, PropyleneGlycol, Glycerol, Ethanol}

var cosolventNames = map[Cosolvent]string{
	EthyleneGlycol:  "ethylene_glycol",
	PropyleneGlycol: "propylene_glycol",
	Glycerol:        "glycerol",
	Ethanol:         "ethanol",
}

// String returns the co-solvent's key ("ethylene_glycol", "propylene_glycol",
// "glycerol", "ethanol"), or "unknown".
func (c Cosolvent) String() string {
	if s, ok := cosolventNames[c]; ok {
		return s
	}
	return "unknown"
}

// ParseCosolvent reads a co-solvent key as String writes it. Any other name
// gives an error wrapping ErrUnknownCosolvent that lists the known keys.
func ParseCosolvent(name string) (Cosolvent, error) {
	for _, c := range Cosolvents {
		if cosolventNames[c] == name {
			return c, nil
		}
	}
	known := make([]string, len(Cosolvents))
	for i, c := range Cosolvents {
		known[i] = cosolventNames[c]
	}
	return 0, fmt.Errorf("%w %q: known are %s", ErrUnknownCosolvent, name, strings.Join(known, ", "))
}
