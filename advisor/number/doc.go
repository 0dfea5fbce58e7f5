// Package number rounds and prints the numbers of reports and listings:
// significant-digit rounding (to the nearest, or towards a side), the
// shortest text that reads back as the same float64, and a quantity with its
// unit.
//
// Units: none of its own; a quantity is printed in the unit it is given.
package number
