// Package input is the request as received and its resolution: Sample and
// its parts are the public request (JSON names carry units, `validate` tags
// hold the valid ranges, `unit` tags the units that problem details
// report), and Resolve turns a validated Sample into Conditions, filling
// every gap from the materials and liquids library or a documented default
// and recording each fill in Notes. A sample that is well-formed but
// physically inconsistent is an *Error naming each field by its JSON
// pointer.
//
// Units: Sample speaks the units in its field names (nm, mPa s, mM, °C,
// days, ...); Conditions are SI (m, kg/m^3, Pa s, mol/m^3, K, s, V, J)
// except where a field's comment says otherwise.
package input
