package physics_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"colloidtriage/physics"
)

func TestWaterCryoscopicConstant(t *testing.T) {
	t.Parallel()
	// Kf = R T0^2 M / dHfus with dHfus = 6.01 kJ/mol (CRC) gives 1.8595 K
	// kg/mol [calc] (cosolvent_water.py); CRC lists 1.86 [pub].
	if got := physics.WaterCryoscopicConstant; math.Abs(got-1.8595) > 0.001 {
		t.Errorf("Kf = %g, want 1.8595 within 0.001", got)
	}
}

func TestColligativeFreezingDepressionSalts(t *testing.T) {
	t.Parallel()
	// Measured freezing-point lowering (K) at salt molality m: CRC Handbook
	// of Chemistry and Physics, 86th ed. (2005), "Freezing point lowering by
	// electrolytes in aqueous solution", p. 15-29 (after Smithsonian
	// Physical Tables, 9th ed., 1956) [pub]. The ideal law overestimates by
	// 3-14 % (osmotic coefficients below 1); each case holds that band.
	cases := []struct {
		salt     string
		m, dT    float64
		maxAbove float64 // largest relative excess of the ideal law
	}{
		{"NaCl", 0.05, 0.18, 0.06},
		{"NaCl", 0.10, 0.35, 0.08},
		{"NaCl", 0.25, 0.85, 0.11},
		{"NaCl", 0.50, 1.68, 0.12},
		{"CaCl2", 0.05, 0.25, 0.13},
		{"CaCl2", 0.10, 0.49, 0.15},
		{"CaCl2", 0.25, 1.27, 0.11},
		{"CaCl2", 0.50, 2.66, 0.06},
	}
	for _, c := range cases {
		s, err := physics.ParseSalt(c.salt)
		if err != nil {
			t.Fatal(err)
		}
		// Ions at the salt's molality on 1 kg of water per litre: the
		// molality comes back unchanged from IonMolality.
		ions := s.Ions(c.m * 1000)
		m := physics.IonMolality(ions[:], 1000)
		got := physics.ColligativeFreezingDepression(m)
		rel := got/c.dT - 1
		if rel < 0 || rel > c.maxAbove {
			t.Errorf("%s %g mol/kg: ideal %g K against measured %g K, excess %.3f not in [0, %g]",
				c.salt, c.m, got, c.dT, rel, c.maxAbove)
		}
	}
	// Lange's Handbook, 15th ed. (1999), table 5.13, sodium chloride brines:
	// 1 % w/w (0.1728 mol/kg) freezes at -0.58 °C [pub]; ideal 0.643 K.
	if got := physics.ColligativeFreezingDepression(2 * 0.1728); math.Abs(got/0.58-1) > 0.12 {
		t.Errorf("NaCl 1 %% w/w: %g K, want 0.58 K within 12 %%", got)
	}
}

func TestIonMolality(t *testing.T) {
	t.Parallel()
	// By hand [calc]: 100 mol/m^3 CaCl2 releases 100 + 200 mol/m^3 of ions;
	// in a 30 % w/w co-solvent mixture of density 1040 kg/m^3 the water is
	// 728 kg/m^3, so 300/728 = 0.41209 mol/kg.
	ions := physics.Salt{CationValence: 2, AnionValence: 1, CationsPerUnit: 1, AnionsPerUnit: 2}.Ions(100)
	if got, want := physics.IonMolality(ions[:], 1040*0.7), 300/728.0; math.Abs(got-want) > 1e-12 {
		t.Errorf("IonMolality = %g, want %g", got, want)
	}
}

func TestCosolventFreezingPointPublished(t *testing.T) {
	t.Parallel()
	cases := []struct {
		c       physics.Cosolvent
		w, tC   float64
		tol     float64
		comment string
	}{
		// ASHRAE Handbook - Fundamentals (2009), ch. 31, propylene glycol
		// table, by mass [pub]; the table is Melinder's fit.
		{physics.PropyleneGlycol, 0.20, -7.1, 0.2, "ASHRAE"},
		{physics.PropyleneGlycol, 0.25, -9.6, 0.3, "ASHRAE"},
		{physics.PropyleneGlycol, 0.30, -12.7, 0.2, "ASHRAE"},
		{physics.PropyleneGlycol, 0.35, -16.4, 0.2, "ASHRAE"},
		{physics.PropyleneGlycol, 0.40, -21.1, 0.6, "ASHRAE"},
		// ASHRAE Handbook - Fundamentals, ch. 31, ethylene glycol table, by
		// mass [memory]; ice lines of EG-water differ between sources by
		// 2-3 K above 0.45.
		{physics.EthyleneGlycol, 0.10, -3.2, 0.3, "ASHRAE"},
		{physics.EthyleneGlycol, 0.20, -7.9, 0.3, "ASHRAE"},
		{physics.EthyleneGlycol, 0.30, -14.1, 0.6, "ASHRAE"},
		{physics.EthyleneGlycol, 0.40, -22.3, 1.6, "ASHRAE"},
		{physics.EthyleneGlycol, 0.50, -33.8, 2.5, "ASHRAE"},
		{physics.EthyleneGlycol, 0.60, -48.3, 3.0, "ASHRAE"},
		// Lange's Handbook, 15th ed., table 5.13, glycerol by weight [pub]:
		// the table points come back.
		{physics.Glycerol, 0.30, -9.5, 1e-9, "Lange"},
		{physics.Glycerol, 0.50, -22.0, 1e-9, "Lange"},
		// Lane 1925 as reprinted by the Glycerine Producers' Association,
		// Physical Properties of Glycerine and its Solutions (1963)
		// [memory]: 40 % -15.4, 50 % -23.0, 60 % -34.7 °C.
		{physics.Glycerol, 0.40, -15.4, 0.2, "Lane/GPA"},
		{physics.Glycerol, 0.50, -23.0, 1.1, "Lane/GPA"},
		{physics.Glycerol, 0.60, -34.7, 1.2, "Lane/GPA"},
		// Lange's table 5.13, ethanol by weight [pub]; CRC concentrative
		// properties, ethanol 10 % w/w about -4.4 °C [memory].
		{physics.Ethanol, 0.299, -18.9, 1e-9, "Lange"},
		{physics.Ethanol, 0.10, -4.4, 0.2, "CRC"},
	}
	for _, c := range cases {
		got := physics.CosolventFreezingPoint(c.c, c.w) - physics.CelsiusZero
		if math.Abs(got-c.tC) > c.tol {
			t.Errorf("%s w = %g: %g °C, want %g within %g (%s)", c.c, c.w, got, c.tC, c.tol, c.comment)
		}
	}
}

func TestCosolventFreezingPointDiluteLimit(t *testing.T) {
	t.Parallel()
	// Ideal colligative depression Kf w / (M (1 - w)) [calc]
	// (cosolvent_water.py). Glycerol is checked at 0.20: Lange's 0.10 entry
	// lies above the dilute limit (documented).
	cases := []struct {
		c        physics.Cosolvent
		w, ideal float64
		tol      float64 // relative
	}{
		{physics.EthyleneGlycol, 0.05, 1.577, 0.03},
		{physics.PropyleneGlycol, 0.05, 1.286, 0.08},
		{physics.Ethanol, 0.048, 2.035, 0.03},
		{physics.Glycerol, 0.20, 5.048, 0.06},
	}
	for _, c := range cases {
		got := physics.WaterMeltingK - physics.CosolventFreezingPoint(c.c, c.w)
		if math.Abs(got/c.ideal-1) > c.tol {
			t.Errorf("%s w = %g: depression %g K, ideal %g K, not within %g", c.c, c.w, got, c.ideal, c.tol)
		}
	}
}

func TestCosolventFreezingPointMonotone(t *testing.T) {
	t.Parallel()
	for _, c := range physics.Cosolvents {
		wMax := physics.CosolventMaxMassFraction(c)
		if got := physics.CosolventFreezingPoint(c, 0); got != physics.WaterMeltingK {
			t.Errorf("%s at w = 0: %g K, want the ice point", c, got)
		}
		prev := math.Inf(1)
		for i := 0; i <= 600; i++ {
			w := wMax * float64(i) / 600
			tf := physics.CosolventFreezingPoint(c, w)
			if !(tf < prev) {
				t.Errorf("%s: freezing point %g K at w = %g not below %g", c, tf, w, prev)
			}
			prev = tf
		}
	}
}

func TestProtectantMassFractionRoundTrip(t *testing.T) {
	t.Parallel()
	for _, c := range physics.Cosolvents {
		wMax := physics.CosolventMaxMassFraction(c)
		lowest := physics.CosolventFreezingPoint(c, wMax)
		for _, f := range []float64{0.01, 0.2, 0.37, 0.5, 0.81, 1} {
			tempK := physics.WaterMeltingK + f*(lowest-physics.WaterMeltingK)
			w, ok := physics.ProtectantMassFraction(c, tempK, 0)
			if !ok {
				t.Errorf("%s at %g K: no mass fraction", c, tempK)
				continue
			}
			if back := physics.CosolventFreezingPoint(c, w); math.Abs(back-tempK) > 1e-9 {
				t.Errorf("%s: w = %g freezes at %g K, want %g", c, w, back, tempK)
			}
		}
		if _, ok := physics.ProtectantMassFraction(c, lowest-0.5, 0); ok {
			t.Errorf("%s: a mass fraction for %g K, below the table", c, lowest-0.5)
		}
		if w, ok := physics.ProtectantMassFraction(c, physics.WaterMeltingK+1, 0); !ok || w != 0 {
			t.Errorf("%s above the ice point: %g, %v; want 0, true", c, w, ok)
		}
	}
	// ASHRAE Fundamentals (2009) ch. 31 [pub]: 40 % w/w propylene glycol
	// freezes at -21.1 °C.
	if w, _ := physics.ProtectantMassFraction(physics.PropyleneGlycol, physics.Kelvin(-21.1), 0); math.Abs(w-0.40) > 0.01 {
		t.Errorf("propylene glycol for -21.1 °C: %g, want 0.40 within 0.01", w)
	}
	// Lange table 5.13 [pub]: 50 % w/w glycerol freezes at -22.0 °C.
	if w, _ := physics.ProtectantMassFraction(physics.Glycerol, physics.Kelvin(-22.0), 0); math.Abs(w-0.50) > 1e-9 {
		t.Errorf("glycerol for -22 °C: %g, want 0.50", w)
	}
}

func TestMixtureFreezingPointWithSalt(t *testing.T) {
	t.Parallel()
	// Additive depressions on the water basis (Kleinhans & Mazur 2007):
	// 0.3 mol/kg of ions lowers every co-solvent's ice line by Kf x 0.3 =
	// 0.558 K [calc by hand], and the protectant needed at T with that salt
	// is the one needed at T + 0.558 K without it.
	const m = 0.3
	salt := physics.ColligativeFreezingDepression(m)
	if math.Abs(salt-0.558) > 1e-12 {
		t.Fatalf("salt depression %g, want 0.558", salt)
	}
	if got := physics.MixtureFreezingPoint(0, 0, m); math.Abs(got-(physics.WaterMeltingK-0.558)) > 1e-12 {
		t.Errorf("salt alone: %g K", got)
	}
	for _, c := range physics.Cosolvents {
		tempK := physics.Kelvin(-15)
		w, ok := physics.ProtectantMassFraction(c, tempK, salt)
		w0, _ := physics.ProtectantMassFraction(c, tempK+salt, 0)
		if !ok || math.Abs(w-w0) > 1e-12 {
			t.Errorf("%s: %g with salt, %g at T + dT without", c, w, w0)
		}
		if got := physics.MixtureFreezingPoint(c, w, m); math.Abs(got-tempK) > 1e-9 {
			t.Errorf("%s: w = %g with salt freezes at %g K, want %g", c, w, got, tempK)
		}
	}
	if w, ok := physics.ProtectantMassFraction(physics.Glycerol, physics.Kelvin(-0.5), salt); !ok || w != 0 {
		t.Errorf("salt alone protects to -0.558 °C: got %g, %v", w, ok)
	}
}

func TestParseCosolvent(t *testing.T) {
	t.Parallel()
	for _, c := range physics.Cosolvents {
		got, err := physics.ParseCosolvent(c.String())
		if err != nil || got != c {
			t.Errorf("ParseCosolvent(%q) = %v, %v", c.String(), got, err)
		}
	}
	_, err := physics.ParseCosolvent("methanol")
	if !errors.Is(err, physics.ErrUnknownCosolvent) || !strings.Contains(err.Error(), "propylene_glycol") {
		t.Errorf("ParseCosolvent(methanol) error %v: want ErrUnknownCosolvent listing the known keys", err)
	}
}

func TestFreezingPanics(t *testing.T) {
	t.Parallel()
	cases := map[string]func(){
		"negative osmolality": func() { physics.ColligativeFreezingDepression(-1) },
		"NaN mass fraction":   func() { physics.CosolventFreezingPoint(physics.Glycerol, math.NaN()) },
		"above the table":     func() { physics.CosolventFreezingPoint(physics.Ethanol, 0.6) },
		"unknown co-solvent":  func() { physics.CosolventFreezingPoint(0, 0.1) },
		"no co-solvent, w":    func() { physics.MixtureFreezingPoint(0, 0.1, 0) },
		"zero water":          func() { physics.IonMolality(nil, 0) },
		"NaN temperature":     func() { physics.ProtectantMassFraction(physics.Glycerol, math.NaN(), 0) },
	}
	for name, f := range cases {
		func() {
			defer func() {
				if recover() == nil {
					t.Errorf("%s: no panic", name)
				}
			}()
			f()
		}()
	}
}
