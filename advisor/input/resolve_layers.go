package input

import (
	"fmt"
	"math"

	"colloidtriage/advisor/number"
	"colloidtriage/physics"
)

func resolveStabilizer(st *Stabilizer, fp *FreePolymer, c *Conditions, n *Notes) {
	c.Steric.CloudK, c.Steric.Factor = math.NaN(), math.NaN()
	if st != nil {
		if st.LayerThicknessNm != nil && *st.LayerThicknessNm > 0 {
			c.Steric.Present, c.Steric.Thickness = true, *st.LayerThicknessNm*1e-9
		}
		switch {
		case st.FloryHugginsChi != nil:
			c.Steric.Quality, c.Steric.HasQuality = physics.SolventQualityFromChi(*st.FloryHugginsChi), true
			if st.SolventQuality != "" {
				n.Add("both flory_huggins_chi and solvent_quality given: chi is used")
			}
		case st.SolventQuality != "":
			q, err := physics.ParseSolventQuality(st.SolventQuality)
			c.Steric.Quality, c.Steric.HasQuality = q, err == nil
		}
		if st.CloudPointC != nil {
			c.Steric.CloudK = physics.Kelvin(*st.CloudPointC)
		}
		if ap := st.AdsorbingPolymer; ap != nil {
			c.Adsorbing = Adsorbed{Present: true, MolarMass: *ap.MolarMassKgMol, Coverage: *ap.SurfaceCoverage}
		}
		if c.Steric.Present && c.Steric.CloudK > c.MediumTempK {
			c.Steric.Factor = physics.CloudPointLayerFactor(c.StorageTempK, c.Steric.CloudK, c.MediumTempK)
			if c.StorageTempK != c.MediumTempK && c.StorageTempK < c.Steric.CloudK {
				n.Add("steric layer stated at the medium temperature %g degC: %s thick at storage, %g degC, by its approach to the cloud point (Flory chi, layer ~ (1 - 2 chi)^(1/3))",
					c.MediumTempK-physics.CelsiusZero, number.Quantity(c.Steric.AtStorage()*1e9, "nm"), c.StorageTempK-physics.CelsiusZero)
			}
		}
		if c.Steric.Present && !c.Steric.HasQuality {
			n.Add("stabilizer solvent quality not given: good solvent assumed for the steric layer")
		}
	}
	if fp != nil && *fp.ConcentrationGL > 0 {
		c.FreePolymer = Depletant{Present: true, Concentration: *fp.ConcentrationGL, RadiusOfGyration: math.NaN(), MolarMass: math.NaN()}
		if fp.MolarMassKgMol != nil {
			c.FreePolymer.MolarMass = *fp.MolarMassKgMol
		}
		switch {
		case fp.RadiusGyrationNm != nil:
			c.FreePolymer.RadiusOfGyration = *fp.RadiusGyrationNm * 1e-9
		case fp.MolarMassKgMol != nil:
			c.FreePolymer.RadiusOfGyration = physics.PolymerCoilSize(c.FreePolymer.MolarMass)
			n.Add("free polymer radius of gyration %s estimated from its molar mass (flexible coil in good solvent)",
				number.Quantity(c.FreePolymer.RadiusOfGyration*1e9, "nm"))
		default:
			n.Add("free polymer without radius_of_gyration_nm or molar_mass_kg_mol: depletion not evaluated")
		}
	}
}

// Droplet defaults are those of a typical alkane-in-water emulsion.
const (
	defaultSolubilityMolM3 = 1e-3 // mol/m^3, of the order of a long alkane in water
	defaultMolarVolumeM3   = 3e-4 // m^3/mol, about that of a C16-C18 oil
	defaultTensionNm       = 5e-3 // N/m, an emulsifier-covered oil-water interface
)

func resolveDroplet(p *Particles, c *Conditions, n *Notes) {
	if c.Phase != "liquid" {
		return
	}
	c.Droplet.Solubility = valueOr(p.SolubilityMolM3, solubilityDefault, n)
	c.Droplet.MolarVolume = valueOr(p.MolarVolumeCm3Mol, molarVolumeDefault, n) * 1e-6
	c.Droplet.Tension = valueOr(p.TensionMNm, tensionDefault, n) * 1e-3
	c.Droplet.Diffusivity = physics.TypicalMolecularDiffusivity
	n.Add("molecular diffusivity of the dispersed phase in the liquid: %g m^2/s (common practice for small molecules in water)", physics.TypicalMolecularDiffusivity)
}

func pointerf(format string, args ...any) string { return fmt.Sprintf(format, args...) }

func formatValences(zc, za int) string { return fmt.Sprintf("%d:%d electrolyte", zc, za) }
