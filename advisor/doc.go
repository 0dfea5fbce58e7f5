// Package advisor is colloidtriage's engine: it resolves a Sample (the
// public request, units in its field names) into SI conditions, filling gaps
// from the materials and liquids library and documented defaults; computes
// the physical scales through package physics; evaluates the compiled rules
// over those scales as facts; combines the rules' certainty factors into
// ranked causes; and solves each remedy's target by inverting the same
// physics. Reports carry every assumption, model choice and version.
//
// Units: the Sample and Report speak the units named in their JSON fields
// and in each scale's unit; everything handed to physics is SI.
package advisor
