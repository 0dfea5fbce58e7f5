// Package physics holds the pure computations of colloid stability: liquid
// properties, sedimentation and Brownian motion, electrolyte screening,
// interaction energies, aggregation kinetics, ripening and rheology.
//
// Every quantity is in SI units (m, kg, s, K, J, Pa, mol/m^3, V); conversion
// from the units of the public interface happens once, in package advisor.
// Functions take plain float64 values and return plain float64 values; a
// function whose result can leave float64's range (a stability ratio, the
// half-life of a very stable sol) returns its base-10 logarithm instead.
// Functions may return +Inf where the physics is unbounded (a gravitational
// length at exact density match, a Debye length without ions); callers turn
// such values into statements, never into numbers of a report.
//
// A formula solved for another of its variables (StokesRadius for
// StokesVelocity, PerrinRadius for GravitationalLength) lives beside the
// formula, with its own source and test, so that no caller solves one by
// hand.
//
// The package imports only the standard library and gonum.
package physics
