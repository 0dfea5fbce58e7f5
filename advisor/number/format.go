package number

import (
	"math"
	"strconv"
)

// Shortest prints v as fmt's %g does: the shortest representation that
// reads back as v, without fmt's formatting machinery.
func Shortest(v float64) string {
	var buf [32]byte
	return string(strconv.AppendFloat(buf[:0], v, 'g', -1, 64))
}

// Quantity prints v to three significant digits followed by its unit (none
// for "" or "1"); NaN prints as "unknown" and an infinity as "unbounded".
func Quantity(v float64, unit string) string {
	var buf [48]byte
	return string(AppendQuantity(buf[:0], v, unit))
}

// AppendQuantity is Quantity appending to b.
func AppendQuantity(b []byte, v float64, unit string) []byte {
	switch {
	case math.IsNaN(v):
		return append(b, "unknown"...)
	case math.IsInf(v, 0):
		return append(b, "unbounded"...)
	}
	b = strconv.AppendFloat(b, v, 'g', 3, 64)
	if unit == "" || unit == "1" {
		return b
	}
	return append(append(b, ' '), unit...)
}
