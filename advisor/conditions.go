package advisor

import "colloidtriage/physics"

// conditions is a Sample resolved into SI values at the storage temperature,
// every gap filled from the library or a documented default. Numbers that
// stay unknown are NaN and never reach a report.
type conditions struct {
	symptom string
	product string
	phase   string // solid, liquid or gas
	radius  float64
	classes []physics.SizeClass // nil for a single size; diameters in m
	phi     float64

	particleDensity float64
	material        string // library key or ""
	materialKind    string

	liquid       liquidState
	storageTempK float64

	ions                  []physics.Ion
	ionicStrength         float64 // mol/m^3
	counterValence        int
	multivalentSalt       string // formula of the multivalent salt present, if any
	multivalentConc       float64
	multivalentIonicShare float64 // ionic strength per mol/m^3 of that salt
	models                *Models

	ph, iep    float64
	zeta       float64 // V used for the double layer
	zetaSource string  // measured, mobility, estimated or ""
	henry      float64 // Henry's function when zeta came from mobility
	hamaker    float64 // J

	steric      stericLayer
	freePolymer freePolymer
	adsorbing   adsorbingPolymer
	droplet     dropletProps

	height, shelfLife, maxClear, shear, yieldStress float64

	observed observed
	criteria criteria
}

type liquidState struct {
	key                                 string
	density, viscosity, epsR, refrIndex float64
	aqueous, flammable                  bool
	flashPointC                         float64
}

type stericLayer struct {
	present    bool
	thickness  float64
	quality    physics.SolventQuality
	hasQuality bool
	cloudK     float64
}

type freePolymer struct {
	present                      bool
	concentration, rg, molarMass float64
}

type adsorbingPolymer struct {
	present             bool
	molarMass, coverage float64
}

type dropletProps struct {
	solubility, molarVolume, tension float64
}

type observed struct {
	age, clearLayer, viscosityChange, sizeGrowth float64
	redisperses                                  string
}

type criteria struct {
	minBarrierKT, halfLifeRatio, maxRelViscosity, maxStericKT float64
}

// Documented defaults of the acceptance criteria and the storage.
const (
	defaultTemperatureC    = 25.0
	defaultLiquid          = "water"
	defaultVolumeFraction  = 0.05
	defaultContainerMm     = 100.0
	defaultShelfLifeDays   = 365.0
	defaultClearLayerShare = 0.02 // of the container height
	defaultMinBarrierKT    = 15.0
	defaultHalfLifeRatio   = 10.0
	defaultMaxRelViscosity = 10.0
	defaultMaxStericKT     = 1.0
	defaultHamakerJ        = 1e-20
	autoionisationMolM3    = 1e-4 // H+ and OH- of neutral water at 25 C, mol/m^3
)
