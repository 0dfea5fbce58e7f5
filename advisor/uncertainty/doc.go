// Package uncertainty gives every numeric input of a triage that matters for
// the diagnosis a provenance (measured, library, estimated, default) and a
// standard uncertainty, stated in the request or taken from one table of
// defaults (defaults.go), and propagates them by Monte Carlo as JCGM
// 101:2008 ("Propagation of distributions using a Monte Carlo method")
// describes: each draw perturbs the resolved SI conditions, normal for an
// absolute uncertainty and lognormal for a factor, truncated to the
// physical range of the input.
//
// It also summarises weighted draws: weighted quantiles, Kish's effective
// sample size, the likelihood of an observation against a predicted
// interval, and the first-order variance-based sensitivity index estimated
// from the draws already made (the given-data estimator of Plischke,
// Borgonovo & Smith 2013).
package uncertainty
