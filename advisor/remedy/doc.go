// Package remedy computes remedy targets: for each catalogue remedy with a
// computable target, a Solver inverts the same physics that diagnosed the
// cause (hindered Stokes settling, the DLVO barrier and the Fuchs stability
// ratio, steric and depletion energies, LSW ripening, Krieger-Dougherty
// viscosity) to find the value a quantity must reach for the acceptance
// criterion to hold. The advisor builds one Case per triage from its
// evaluation and renders each Target into the catalogue's action text.
//
// Units: a Case is SI (its Conditions, its physics.Pair) apart from the
// facts and reported scales, which are in their declared units; a Target is
// in the request's units (nm, mPa s, mM, mV, °C, ...), named in its Unit.
package remedy
