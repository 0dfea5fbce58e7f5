package input

import (
	"math"

	"colloidtriage/physics"
)

// Conditions is a Sample resolved into SI values at the storage
// temperature, every gap filled from the library or a documented default.
// Numbers that stay unknown are NaN and never reach a report.
type Conditions struct {
	Symptom        string
	Product        string
	Constraints    []string            // request inputs the product cannot change (Sample.Constraints)
	Phase          string              // solid, liquid or gas
	Radius         float64             // m, of the median particle
	Classes        []physics.SizeClass // nil for a single size; diameters in m
	VolumeFraction float64

	ParticleDensity float64 // kg/m^3
	Material        string  // library key or ""
	MaterialKind    string

	Liquid       LiquidState
	StorageTempK float64 // K, the warm end of storage: kinetics, viscosity and cloud point are judged here

	// The temperature history: the cold end of storage or transport (K;
	// StorageTempK when no range is stated), whether a range was stated,
	// and the freeze-thaw cycles stated (NaN when not).
	MediumTempK      float64 // K, where the medium and the layer were characterised
	MinStorageTempK  float64
	StorageRange     bool
	FreezeThawCycles float64

	// The co-solvent of a water medium (0 when none) and its mass fraction,
	// and the freezing point of the continuous phase with its ions, K.
	Cosolvent         physics.Cosolvent
	CosolventFraction float64
	FreezingK         float64

	Ions                  []physics.Ion
	IonicStrength         float64 // mol/m^3
	CounterValence        int
	MultivalentSalt       string     // formula of the multivalent salt present, if any
	MultivalentConc       float64    // mol/m^3
	MultivalentIonicShare float64    // ionic strength per mol/m^3 of that salt
	MultivalentAt         int        // index of that salt's cation in Ions, its anion next
	MultivalentUnit       [2]float64 // cations and anions per unit of that salt
	Models                *Models

	PH, IsoelectricPH float64
	Sites             *SurfaceSites // site-binding surface of the material, nil without one
	SurfaceCharge     float64       // C/m^2 of the site model in the product, NaN without it
	DiffusePotential  float64       // V, diffuse-layer potential of the site model in the product, NaN without it
	Zeta              float64       // V used for the double layer
	ZetaSource        string        // measured, mobility, carried (from another liquid), estimated or ""
	Henry             float64       // Henry's function when zeta came from mobility
	Hamaker           float64       // J
	HamakerSource     string        // request, library, estimated (Tabor-Winterton) or default
	// ParticlePermittivity and ParticleIndex are what the Tabor-Winterton
	// estimate used, NaN for any other source.
	ParticlePermittivity, ParticleIndex float64

	Steric      StericLayer
	FreePolymer Depletant
	Adsorbing   Adsorbed
	Droplet     Droplet

	Height, ShelfLife, MaxClear float64 // m, s, m
	Shear                       float64 // 1/s
	ProcessStep                 string  // the named process step that set Shear, or ""
	YieldStress                 float64 // Pa

	Observed Observed
	Criteria Acceptance

	derived *derivation // what the ions and zeta potential were derived from, for Rederive
	drawn   *Drawn      // what Rederive last derived from, nil for the nominal conditions
	anchor  *anchorMemo // set only while Salts.With re-derives
}

// SurfaceSites is the single-site basic Stern surface of the material
// (physics.SiteSurface) and what the report says about it.
type SurfaceSites struct {
	Surface physics.SiteSurface
	Model   string // one_pk or silica
	Basis   string // the model, its parameters and their sources, for the assumptions
}

// SurfaceState is the equilibrium of the material's site-binding surface in
// the product's ions at pH (Sites must be set).
func (c *Conditions) SurfaceState(pH float64) physics.SurfaceState {
	return c.Sites.Surface.State(pH, c.Ions, c.Liquid.Permittivity, liquidWaterK(c.StorageTempK))
}

// EstimatedPotential is the surface-potential estimate at pH used when zeta
// is not measured, in the product's present ions (their H+ and OH- stay
// those of the present pH): for a material with a site model, the anchored
// estimate (see anchoredEstimate) or, where that is undefined, the model's
// slip-plane potential; else physics.SurfacePotentialFromPH about the
// isoelectric point.
func (c *Conditions) EstimatedPotential(pH float64) float64 {
	if c.Sites != nil {
		if zeta, _, _, ok := c.anchoredEstimate(pH); ok {
			return zeta
		}
		return c.SurfaceState(pH).Zeta
	}
	return physics.SurfacePotentialFromPH(pH, c.IsoelectricPH, c.StorageTempK)
}

// ZeroPointPH is the pH at which EstimatedPotential changes sign: the point
// of zero charge of a 1-pK site model, else the isoelectric point (NaN when
// unknown). A silica surface is negative at every pH above about 2, so its
// isoelectric point stands for it.
func (c *Conditions) ZeroPointPH() float64 {
	if c.Sites != nil && c.Sites.Model == "one_pk" {
		return c.Sites.Surface.PK
	}
	return c.IsoelectricPH
}

// LiquidState is the continuous phase at the storage temperature, in SI
// units; FlashPointC is in °C, NaN when the liquid has none.
type LiquidState struct {
	Key                                               string
	Density, Viscosity, Permittivity, RefractiveIndex float64
	Aqueous, Flammable                                bool
	FlashPointC                                       float64
	BoilingK                                          float64 // +Inf when the liquid has none
}

// StericLayer is the adsorbed layer: thickness in m, cloud point in K (NaN
// when not stated), and Factor, its thickness at the storage temperature
// over the stated one (physics.CloudPointLayerFactor from the medium
// temperature; NaN without a cloud point above the medium temperature).
type StericLayer struct {
	Present    bool
	Thickness  float64
	Quality    physics.SolventQuality
	HasQuality bool
	CloudK     float64
	Factor     float64
}

// AtStorage is the layer's thickness at the storage temperature, m: the
// stated thickness scaled by Factor where it is known and positive (at or
// above the cloud point the layer counts as collapsed instead, see
// physics.StericLayerEffective).
func (s StericLayer) AtStorage() float64 {
	if s.Factor > 0 {
		return s.Thickness * s.Factor
	}
	return s.Thickness
}

// Depletant is the free, non-adsorbing polymer: concentration in g/L,
// radius of gyration in m, molar mass in kg/mol (NaN when unknown).
type Depletant struct {
	Present                                    bool
	Concentration, RadiusOfGyration, MolarMass float64
}

// Evaluable reports a free polymer whose depletion can be computed: present,
// with a known radius of gyration and molar mass.
func (d Depletant) Evaluable() bool {
	return d.Present && !math.IsNaN(d.RadiusOfGyration) && !math.IsNaN(d.MolarMass)
}

// Adsorbed is the adsorbing polymer: molar mass in kg/mol, surface
// coverage as a fraction.
type Adsorbed struct {
	Present             bool
	MolarMass, Coverage float64
}

// Droplet holds the properties of a liquid dispersed phase that ripening
// needs: solubility in mol/m^3, molar volume in m^3/mol, interfacial tension
// in N/m, molecular diffusivity in the liquid in m^2/s.
type Droplet struct {
	Solubility, MolarVolume, Tension, Diffusivity float64
}

// Observed is what the complaint reports: age in s, clear layer in m,
// changes in %, NaN when not stated; Redisperses is "yes", "no" or "".
type Observed struct {
	Age, ClearLayer, ViscosityChange, SizeGrowth float64
	Redisperses                                  string
}

// Acceptance holds the acceptance criteria the remedies are solved for.
type Acceptance struct {
	MinBarrierKT, HalfLifeRatio, MaxRelViscosity, MaxStericKT float64
}

// IonicStrengthPerMole is the ionic strength one mole of the dominant salt
// adds: 1 for 1:1, 3 for 2:1 or 1:2, 4 for 2:2, 6 for 3:1.
func (c *Conditions) IonicStrengthPerMole() float64 {
	if c.MultivalentSalt == "" || c.MultivalentConc == 0 {
		return 1
	}
	return c.MultivalentIonicShare
}

// IonsWithMultivalent returns Ions with the multivalent salt at conc
// (mol/m^3) instead of its present concentration, the others unchanged.
func (c *Conditions) IonsWithMultivalent(conc float64) []physics.Ion {
	ions := append([]physics.Ion(nil), c.Ions...)
	for k, unit := range c.MultivalentUnit {
		ions[c.MultivalentAt+k].Concentration = conc * unit
	}
	return ions
}

// LargestRadius is the radius, m, of the largest particles: half the
// largest class diameter of a size distribution, else the median radius.
func (c *Conditions) LargestRadius() float64 {
	if c.Classes == nil {
		return c.Radius
	}
	return physics.LargestDiameter(c.Classes) / 2
}

// Hindrance is the Richardson-Zaki factor by which crowding at the sample's
// volume fraction slows settling (physics.RichardsonZakiFactor, low
// Reynolds number exponent).
func (c *Conditions) Hindrance() float64 {
	return physics.RichardsonZakiFactor(c.VolumeFraction, physics.RichardsonZakiExponentLowRe)
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
)

// AutoionisationMolM3 is the ionic strength of neutral water from its own
// H+ and OH- at 25 °C, mol/m^3: the floor of every aqueous medium.
const AutoionisationMolM3 = 1e-4
