package advisor

import (
	"fmt"
	"math"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

func resolveStabilizer(st *Stabilizer, fp *FreePolymer, c *conditions, n *notes) {
	c.steric.cloudK = math.NaN()
	if st != nil {
		if st.LayerThicknessNm != nil && *st.LayerThicknessNm > 0 {
			c.steric.present, c.steric.thickness = true, *st.LayerThicknessNm*1e-9
		}
		switch {
		case st.FloryHugginsChi != nil:
			c.steric.quality, c.steric.hasQuality = physics.SolventQualityFromChi(*st.FloryHugginsChi), true
			if st.SolventQuality != "" {
				n.add("both flory_huggins_chi and solvent_quality given: chi is used")
			}
		case st.SolventQuality != "":
			q, err := physics.ParseSolventQuality(st.SolventQuality)
			c.steric.quality, c.steric.hasQuality = q, err == nil
		}
		if st.CloudPointC != nil {
			c.steric.cloudK = physics.Kelvin(*st.CloudPointC)
		}
		if ap := st.AdsorbingPolymer; ap != nil {
			c.adsorbing = adsorbingPolymer{present: true, molarMass: *ap.MolarMassKgMol, coverage: *ap.SurfaceCoverage}
		}
		if c.steric.present && !c.steric.hasQuality {
			n.add("stabilizer solvent quality not given: good solvent assumed for the steric layer")
		}
	}
	if fp != nil && *fp.ConcentrationGL > 0 {
		c.freePolymer = freePolymer{present: true, concentration: *fp.ConcentrationGL, rg: math.NaN(), molarMass: math.NaN()}
		if fp.MolarMassKgMol != nil {
			c.freePolymer.molarMass = *fp.MolarMassKgMol
		}
		switch {
		case fp.RadiusGyrationNm != nil:
			c.freePolymer.rg = *fp.RadiusGyrationNm * 1e-9
		case fp.MolarMassKgMol != nil:
			c.freePolymer.rg = physics.PolymerCoilSize(c.freePolymer.molarMass)
			n.add("free polymer radius of gyration %s estimated from its molar mass (flexible coil in good solvent)",
				number.Quantity(c.freePolymer.rg*1e9, "nm"))
		default:
			n.add("free polymer without radius_of_gyration_nm or molar_mass_kg_mol: depletion not evaluated")
		}
	}
}

// Droplet defaults are those of a typical alkane-in-water emulsion.
const (
	defaultSolubilityMolM3  = 1e-3 // mol/m^3, of the order of a long alkane in water
	defaultMolarVolumeM3    = 3e-4 // m^3/mol, about that of a C16-C18 oil
	defaultTensionNm        = 5e-3 // N/m, an emulsifier-covered oil-water interface
	molecularDiffusivityM2S = 1e-9 // m^2/s, small molecules in water (common practice)
)

func resolveDroplet(p *Particles, c *conditions, n *notes) {
	if c.phase != "liquid" {
		return
	}
	c.droplet.solubility = valueOr(p.SolubilityMolM3, solubilityDefault, n)
	c.droplet.molarVolume = valueOr(p.MolarVolumeCm3Mol, molarVolumeDefault, n) * 1e-6
	c.droplet.tension = valueOr(p.TensionMNm, tensionDefault, n) * 1e-3
	n.add("molecular diffusivity of the dispersed phase in the liquid: %g m^2/s (common practice for small molecules in water)", molecularDiffusivityM2S)
}

func pointerf(format string, args ...any) string { return fmt.Sprintf(format, args...) }

func formatValences(zc, za int) string { return fmt.Sprintf("%d:%d electrolyte", zc, za) }
