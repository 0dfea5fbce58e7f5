package advisor

import (
	"encoding/json"
	"math"
	"os"
	"testing"

	"colloidtriage/advisor/input"
	"colloidtriage/advisor/remedy"
	"colloidtriage/physics"
)

// These tests put the targets of the temperature and shear remedies back
// into the forward physics, and hold the protectant fraction to a point of
// the published ice line.

func demoSample(t *testing.T, name string) *input.Sample {
	t.Helper()
	data, err := os.ReadFile("../testdata/demo/" + name + ".json")
	if err != nil {
		t.Fatal(err)
	}
	var s input.Sample
	if err := json.Unmarshal(data, &s); err != nil {
		t.Fatal(err)
	}
	return &s
}

func solved(t *testing.T, cs *remedy.Case, id string) remedy.Target {
	t.Helper()
	target, crit, ok := remedy.For(id)(cs)
	if !ok {
		t.Fatalf("%s: no target (%s)", id, crit)
	}
	return target
}

// TestFreezeProtectantFraction: Melinder's (2010) propylene glycol ice line
// passes through -20.57 degC at 40 % by mass (testdata/reference/
// cosolvent_water.py) [calc]; salt-free water stored down to -17.57 degC
// with a 3 K margin needs exactly that fraction. With salt the target is
// put back into MixtureFreezingPoint, the ion molality rising as the
// co-solvent replaces water.
func TestFreezeProtectantFraction(t *testing.T) {
	t.Parallel()
	e := benchEngine(t)
	var s input.Sample
	if err := json.Unmarshal([]byte(`{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":1050,"zeta_mV":-40},
		"medium":{"temperature_c":20},"storage":{"min_temperature_c":-17.57}}`), &s); err != nil {
		t.Fatal(err)
	}
	if w := solved(t, evaluated(t, e, &s), "add_freeze_protectant"); math.Abs(w.Value-0.40) > 1e-4 || w.Quantity != "medium.cosolvents.mass_fraction" {
		t.Errorf("target %+v, want medium.cosolvents.mass_fraction >= 0.40", w)
	}

	cs := evaluated(t, e, demoSample(t, "freeze_thaw"))
	w := solved(t, cs, "add_freeze_protectant").Value
	c := cs.Cond
	perKg := physics.IonMolality(c.Ions, c.Liquid.Density)
	got := physics.MixtureFreezingPoint(physics.PropyleneGlycol, w, perKg/(1-w))
	if want := c.MinStorageTempK - 3; math.Abs(got-want) > 1e-3 {
		t.Errorf("freezing point at the target %g K, want %g K", got, want)
	}
	if c.MinStorageTempK >= c.FreezingK {
		t.Fatalf("the demo does not freeze: %g K >= %g K", c.MinStorageTempK, c.FreezingK)
	}
	if st := solved(t, cs, "control_storage_temperature"); st.Quantity != "storage.min_temperature_c" ||
		math.Abs(physics.Kelvin(st.Value)-c.FreezingK-3) > 1e-9 {
		t.Errorf("storage target %+v, want storage.min_temperature_c >= the freezing point + 3 K", st)
	}
}

// TestStorageTargetKeepsTheLayer: at the highest storage temperature the
// solver allows, the layer thinned by CloudPointLayerFactor is exactly the
// thinnest layer that meets the van der Waals criterion.
func TestStorageTargetKeepsTheLayer(t *testing.T) {
	t.Parallel()
	cs := evaluated(t, benchEngine(t), demoSample(t, "thermal_excursion_2"))
	c := cs.Cond
	st := solved(t, cs, "control_storage_temperature")
	if st.Quantity != "storage.max_temperature_c" || st.Op != "<=" {
		t.Fatalf("target %+v, want storage.max_temperature_c <=", st)
	}
	kept := c.Steric.Thickness * physics.CloudPointLayerFactor(physics.Kelvin(st.Value), c.Steric.CloudK, c.MediumTempK)
	need := physics.MinimumStericThickness(cs.VanDerWaalsOnly.EnergyCurve(), c.StorageTempK, c.Criteria.MaxStericKT)
	if math.Abs(kept/need-1) > 1e-9 {
		t.Errorf("layer at the target %g m, needed %g m", kept, need)
	}
}

// TestProcessShearTargetUsesTheSuspension: at the target shear rate the
// work of shear with the suspension's viscosity across one Debye length
// equals the barrier.
func TestProcessShearTargetUsesTheSuspension(t *testing.T) {
	t.Parallel()
	cs := evaluated(t, benchEngine(t), demoSample(t, "shear_aggregation_2"))
	c := cs.Cond
	g := solved(t, cs, "reduce_process_shear").Value
	eta := c.Liquid.Viscosity * cs.Facts.Number("relative_viscosity")
	if !(eta > 5*c.Liquid.Viscosity) {
		t.Fatalf("suspension viscosity %g Pa s, want well above the liquid's %g", eta, c.Liquid.Viscosity)
	}
	kT := physics.Boltzmann * c.StorageTempK
	barrier, _ := cs.Reported("energy_barrier")
	w := physics.HydrodynamicShearForceEnergy(eta, g, c.Radius, physics.DoubleLayerRange(cs.Pair.Kappa, c.Radius)) / kT
	if math.Abs(w/barrier-1) > 1e-6 {
		t.Errorf("shear work at the target %g kT, barrier %g kT", w, barrier)
	}
}

// TestStorageOutsideTheLiquidIsAFinding: water (ice point 0 °C, boiling
// point 99.97 °C at 1 atm, ITS-90) stored at -5 °C or 105 °C is triaged,
// not refused: the cold store ranks freeze_thaw first, the hot one
// thermal_excursion.
func TestStorageOutsideTheLiquidIsAFinding(t *testing.T) {
	t.Parallel()
	e := benchEngine(t)
	for storage, want := range map[string]string{"-5": "freeze_thaw", "105": "thermal_excursion"} {
		var s input.Sample
		if err := json.Unmarshal([]byte(`{"symptom":"flocculation","particles":{"diameter_nm":200,"density_kg_m3":1050,"zeta_mV":-40},
			"medium":{"temperature_c":20},"storage":{"temperature_c":`+storage+`}}`), &s); err != nil {
			t.Fatal(err)
		}
		r, err := e.Triage(&s)
		if err != nil {
			t.Fatalf("storage at %s degC: %v", storage, err)
		}
		if len(r.Causes) == 0 || r.Causes[0].ID != want {
			t.Errorf("storage at %s degC: top cause %+v, want %s", storage, r.Causes, want)
		}
	}
}
