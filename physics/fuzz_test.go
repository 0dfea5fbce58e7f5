package physics_test

import (
	"math"
	"testing"

	"colloidtriage/physics"
)

// Fuzz targets of the physics entry points the advisor calls with user
// input. Each folds the fuzzed numbers into the function's documented
// domain (bounded by what a valid request can produce) and checks that it
// does not panic and returns finite numbers, or +Inf where its doc comment
// says so. Run one longer with, e.g.,
//
//	go test -run '^$' -fuzz '^FuzzPair$' -fuzztime 10m ./physics

// fuzzWithin maps any float64 into [lo, hi]: a value inside is kept exactly,
// so that the fuzzer can reach the ends; one outside (or NaN, Inf) is
// folded by its fractional part.
func fuzzWithin(x, lo, hi float64) float64 {
	if x >= lo && x <= hi {
		return x
	}
	return lo + fuzzFrac(x)*(hi-lo)
}

// fuzzLogWithin is fuzzWithin on a logarithmic scale, for 0 < lo < hi.
func fuzzLogWithin(x, lo, hi float64) float64 {
	if x >= lo && x <= hi {
		return x
	}
	return math.Min(hi, lo*math.Pow(hi/lo, fuzzFrac(x)))
}

func fuzzFrac(x float64) float64 {
	if math.IsNaN(x) || math.IsInf(x, 0) {
		return 0
	}
	a := math.Abs(x)
	return a - math.Floor(a)
}

func fuzzFinite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// FuzzPair drives the interaction of two spheres: Energy and Parts at a
// fuzzed separation and at contact, Barrier, SecondaryMinimum and Extrema,
// Log10StabilityRatioWith with and without the Honig factor, and
// CriticalIonicStrength. The domain is what a valid sample can produce:
// radius 0.25 nm to 5 mm, A from 0 to 1000 zJ, |psi| up to 300 mV, a Debye
// length from 0.03 nm up (or no electrolyte), relative permittivity 1 to
// 200, -60 to 300 degC, valence 0 to 4, depletion layers up to 2 um and
// polymer number densities up to 1e27 per m^3, steric layers up to 1 um.
// Pair accepts a negative A, but A131 of two equal spheres is never
// negative (it goes as (sqrt A11 - sqrt A33)^2: Israelachvili, Intermolecular
// and Surface Forces, 3rd ed., 2011, §13.6) and a valid sample cannot give
// one, so the fuzzer leaves it out.
func FuzzPair(f *testing.F) {
	// Seeds: a charged 100 nm latex in 10 mM salt (barrier and secondary
	// minimum), a bare 1 um particle without salt, a coated one with
	// depletant, and the corners of the domain.
	f.Add(50e-9, 1e-20, -0.05, 3.3e8, 78.4, 298.15, 1, false, false, 0.0, 0.0, 0.0, 5e-9, 15.0)
	f.Add(500e-9, 1e-19, 0.0, 0.0, 78.4, 298.15, 0, true, false, 0.0, 0.0, 0.0, 1e-9, 0.0)
	f.Add(1e-6, 5e-20, -0.02, 1e9, 78.4, 298.15, 2, false, true, 20e-9, 1e23, 5e-9, 30e-9, 5.0)
	f.Add(0.25e-9, 1e-18, 0.3, 3e10, 1.0, 213.15, 4, true, true, 2e-6, 1e27, 1e-6, 0.0, 50.0)
	f.Add(5e-3, 0.0, -0.3, 1e4, 200.0, 573.15, 3, false, false, 0.0, 0.0, 0.0, 1e-3, 0.0)
	f.Fuzz(func(t *testing.T, radius, hamaker, psi, kappa, epsR, tempK float64, valence int, retarded, constPot bool,
		depRange, depDensity, steric, h, criterionKT float64) {
		p := physics.Pair{
			Radius:            fuzzLogWithin(radius, 0.25e-9, 5e-3),
			Hamaker:           fuzzWithin(hamaker, 0, 1e-18),
			Potential:         fuzzWithin(psi, -0.3, 0.3),
			EpsR:              fuzzWithin(epsR, 1, 200),
			TempK:             fuzzWithin(tempK, 213.15, 573.15),
			Valence:           int(fuzzWithin(float64(valence), 0, 4)),
			Retarded:          retarded,
			ConstantPotential: constPot,
			DepletionRange:    fuzzWithin(depRange, 0, 2e-6),
			DepletionDensity:  fuzzWithin(depDensity, 0, 1e27),
			StericThickness:   fuzzWithin(steric, 0, 1e-6),
		}
		if kappa != 0 {
			p.Kappa = fuzzLogWithin(kappa, 1e4, 3e10)
		}
		h = fuzzWithin(h, 0, 1e-3)
		criterion := fuzzWithin(criterionKT, 0, 200) * physics.Boltzmann * p.TempK

		// Energy: finite everywhere but contact, where the sign of the
		// van der Waals term decides.
		if e := p.Energy(h); math.IsNaN(e) || (h > 0 && !fuzzFinite(e)) {
			t.Fatalf("Energy(%g) = %g for %+v", h, e, p)
		}
		vdw, edl, dep := p.Parts(h)
		if math.IsNaN(vdw) || !fuzzFinite(edl) || !fuzzFinite(dep) || (h > 0 && !fuzzFinite(vdw)) {
			t.Fatalf("Parts(%g) = %g, %g, %g for %+v", h, vdw, edl, dep, p)
		}
		if e0 := p.Energy(0); math.IsNaN(e0) || (p.Hamaker > 0 && !math.IsInf(e0, -1)) {
			t.Fatalf("Energy(0) = %g for %+v", e0, p)
		}

		closest := math.Max(physics.MinimumSeparation, 2*p.StericThickness)
		barrier, minimum := p.Extrema()
		for _, x := range []physics.Extremum{barrier, minimum, p.Barrier(), p.SecondaryMinimum()} {
			if !fuzzFinite(x.Energy) || !fuzzFinite(x.Separation) {
				t.Fatalf("extremum %+v for %+v", x, p)
			}
			if !x.Found && (x.Energy != 0 || x.Separation != 0) {
				t.Fatalf("extremum not found but %+v for %+v", x, p)
			}
			if x.Found && x.Separation < closest*(1-1e-12) {
				t.Fatalf("extremum %+v inside the closest approach %g for %+v", x, closest, p)
			}
		}
		if barrier.Found && !(barrier.Energy > 0) || minimum.Found && !(minimum.Energy < 0) || minimum.Found && !barrier.Found {
			t.Fatalf("barrier %+v, secondary minimum %+v for %+v", barrier, minimum, p)
		}
		if p.Barrier() != barrier {
			t.Fatalf("Barrier %+v differs from Extrema's %+v for %+v", p.Barrier(), barrier, p)
		}
		// The barrier is the maximum: no point of the plotting grid, which
		// spans the same range, lies above it by more than 1 kT or 1e-4 of
		// the barrier (a barrier at the kink of the depletion well is found
		// to a relative width of 1e-5 in h, which can cost that much).
		kT := physics.Boltzmann * p.TempK
		if barrier.Found {
			for _, x := range physics.SeparationGrid(p, 400) {
				if tol := math.Max(kT, 1e-4*barrier.Energy); p.Energy(x) > barrier.Energy+tol {
					e := p.Energy(x)
					t.Fatalf("Energy(%g) = %g kT above the barrier %+v (%g kT) for %+v", x, e/kT, barrier, barrier.Energy/kT, p)
				}
			}
		}

		for _, honig := range []bool{false, true} {
			if w := physics.Log10StabilityRatioWith(p, p.Barrier(), honig); !fuzzFinite(w) {
				t.Fatalf("Log10StabilityRatioWith(honig=%v) = %g for %+v", honig, w, p)
			}
			// The peak estimate: NaN without a barrier (or where it does
			// not apply), never infinite.
			if w := physics.Log10StabilityRatioPeak(p, barrier, honig); math.IsInf(w, 0) || !barrier.Found && !math.IsNaN(w) {
				t.Fatalf("Log10StabilityRatioPeak(honig=%v) = %g with barrier %+v for %+v", honig, w, barrier, p)
			}
		}

		// Documented: ok with I in [1e-6, 5000] mol/m^3, else 0 or +Inf.
		is, ok := physics.CriticalIonicStrength(p, criterion, 0)
		if ok && !(is >= 1e-6 && is <= 5000) || !ok && is != 0 && !math.IsInf(is, 1) {
			t.Fatalf("CriticalIonicStrength(%g J) = %g, %v for %+v", criterion, is, ok, p)
		}
	})
}

// TestFuzzFindings holds the inputs on which the fuzz targets found bugs, now fixed.
func TestFuzzFindings(t *testing.T) {
	t.Parallel()
	// FuzzPair: a 10 mm sphere at 300 mV, constant potential, Debye length
	// 0.4 nm. The energy peaks at 0.2029 nm, 17,018 kT above its value at
	// the closest approach (0.2 nm), where Barrier reports it.
	p := physics.Pair{Radius: 0.004998235131051925, Hamaker: 2.7619047619047722e-19, Potential: -0.3,
		Kappa: 2.498049532966901e+09, EpsR: 117.60000000000001, TempK: 429.14999999996724, Retarded: true,
		ConstantPotential: true, DepletionDensity: 108}
	// The same at 25 degC in water: 0.1 mm, -300 mV, kappa 5e9 1/m
	// (about 2.3 M of 1:1 salt), A = 276 zJ.
	q := physics.Pair{Radius: 1e-4, Hamaker: 2.76e-19, Potential: -0.3, Kappa: 5e9, EpsR: 78.4, TempK: 298.15,
		ConstantPotential: true}
	for name, pair := range map[string]physics.Pair{"10 mm at 429 K": p, "0.1 mm in water": q} {
		t.Run(name, func(t *testing.T) {
			if w := physics.Log10StabilityRatioWith(pair, pair.Barrier(), true); !fuzzFinite(w) {
				t.Errorf("Log10StabilityRatioWith = %g for %+v", w, pair)
			}
			b := pair.Barrier()
			if e := pair.Energy(b.Separation * 1.0146); e > b.Energy {
				t.Errorf("Barrier %+v, but Energy(%g) = %g", b, b.Separation*1.0146, e)
			}
		})
	}
	// FuzzPair: an 8.3 nm sphere at -300 mV, Debye length 100 um, retarded
	// van der Waals. The energy still rises at 10 radii (83 nm, the end of
	// the search range), where it is 735 kT: no barrier is found, and the
	// integrand exp(V/kT) overflows.
	r := physics.Pair{Radius: 8.298273063100851e-09, Hamaker: 7.777777777777786e-19, Potential: -0.3, Kappa: 1e4,
		EpsR: 78.4, TempK: 222.15, Retarded: true, ConstantPotential: true}
	t.Run("8.3 nm, Debye length 100 um", func(t *testing.T) {
		if w := physics.Log10StabilityRatioWith(r, r.Barrier(), true); !fuzzFinite(w) {
			t.Errorf("Log10StabilityRatioWith = %g for %+v", w, r)
		}
	})
	// FuzzPair: a 10 mm sphere in a relative permittivity of 1 with a
	// 400 nm depletant at 1e27 m^-3. The energy peaks at the edge of the
	// depletion well (800 nm, a kink) at 984,189 kT; the Newton polish
	// ended left of the kink, so the grid point at 957 nm (983,554 kT) was
	// reported. The polish now keeps its best point.
	k := physics.Pair{Radius: 0.0049999999579723375, Hamaker: 1e-18, Potential: 0.13875, Kappa: 1e4, EpsR: 1,
		TempK: 271.15, Retarded: true, ConstantPotential: true, DepletionRange: 4.0000019999999377e-07,
		DepletionDensity: 1e27, StericThickness: 8e-11}
	t.Run("barrier at the kink of a depletion well", func(t *testing.T) {
		b := k.Barrier()
		kT := physics.Boltzmann * k.TempK
		if math.Abs(b.Separation-2*k.DepletionRange) > 1e-12 || b.Energy/kT < 984189 {
			t.Errorf("Barrier %g kT at %g nm, want 984,189 kT at the kink, 800 nm", b.Energy/kT, b.Separation*1e9)
		}
	})
}

// FuzzStokesVelocity: a finite settling (or creaming) speed of the sign of
// the density difference, for radii up to 5 mm, density differences up to
// 25,000 kg/m^3 either way and viscosities from 0.1 mPa s to 10 kPa s.
func FuzzStokesVelocity(f *testing.F) {
	f.Add(1.25e-6, 3200.0, 0.89e-3)
	f.Add(0.0, 0.0, 1e-4)
	f.Add(5e-3, -25000.0, 1e-4)
	f.Add(0.25e-9, 1e-9, 1e4)
	f.Fuzz(func(t *testing.T, radius, deltaRho, viscosity float64) {
		radius = fuzzWithin(radius, 0, 5e-3)
		deltaRho = fuzzWithin(deltaRho, -25000, 25000)
		viscosity = fuzzLogWithin(viscosity, 1e-4, 1e4)
		v := physics.StokesVelocity(radius, deltaRho, viscosity)
		if !fuzzFinite(v) || (deltaRho > 0 && radius > 0 && v < 0) || (deltaRho < 0 && v > 0) || (deltaRho == 0 && v != 0) {
			t.Fatalf("StokesVelocity(%g, %g, %g) = %g", radius, deltaRho, viscosity, v)
		}
	})
}

// FuzzLogNormalFromSpan: any median from 0.5 nm to 1 cm, span 0 to 10 and
// 1 to 200 classes give sorted, positive, finite classes whose fractions
// sum to 1, and a finite maximum packing fraction in (0, 1].
func FuzzLogNormalFromSpan(f *testing.F) {
	f.Add(2.5e-6, 1.5, physics.DefaultLogNormalClasses)
	f.Add(5e-10, 0.0, 1)
	f.Add(1e-2, 10.0, 200)
	f.Add(1e-7, 5.0, 2)
	f.Fuzz(func(t *testing.T, d50, span float64, n int) {
		d50 = fuzzLogWithin(d50, 5e-10, 1e-2)
		span = fuzzWithin(span, 0, 10)
		n = int(fuzzWithin(float64(n), 1, 200))
		classes, err := physics.LogNormalFromSpan(d50, span, n)
		if err != nil {
			t.Fatalf("LogNormalFromSpan(%g, %g, %d): %v", d50, span, n, err)
		}
		sum := 0.0
		for i, c := range classes {
			if !(c.Diameter > 0) || !fuzzFinite(c.Diameter) || !(c.VolumeFraction >= 0) || !fuzzFinite(c.VolumeFraction) ||
				i > 0 && !(c.Diameter >= classes[i-1].Diameter) {
				t.Fatalf("class %d = %+v of LogNormalFromSpan(%g, %g, %d)", i, c, d50, span, n)
			}
			sum += c.VolumeFraction
		}
		if math.Abs(sum-1) > 1e-12*float64(n) {
			t.Fatalf("fractions of LogNormalFromSpan(%g, %g, %d) sum to %.17g", d50, span, n, sum)
		}
		if phi := physics.MaxPackingPolydisperse(classes); !(phi > 0 && phi <= 1) {
			t.Fatalf("MaxPackingPolydisperse = %g for LogNormalFromSpan(%g, %g, %d)", phi, d50, span, n)
		}
	})
}

// FuzzKriegerDougherty: the relative viscosity is at least 1 and never NaN;
// it is +Inf exactly when the suspension is jammed (phi >= phiMax, as
// documented) or when the power leaves float64's range, for phi in [0, 1],
// phiMax in (0, 1] and an intrinsic viscosity in (0, 10].
func FuzzKriegerDougherty(f *testing.F) {
	f.Add(0.3, 0.64, 2.5)
	f.Add(0.0, 1.0, 2.5)
	f.Add(0.64, 0.64, 2.5)
	f.Add(0.6399999999999999, 0.64, 10.0)
	f.Fuzz(func(t *testing.T, phi, phiMax, intrinsic float64) {
		phi = fuzzWithin(phi, 0, 1)
		phiMax = math.Max(fuzzWithin(phiMax, 0, 1), math.SmallestNonzeroFloat64)
		intrinsic = math.Max(fuzzWithin(intrinsic, 0, 10), math.SmallestNonzeroFloat64)
		eta := physics.KriegerDougherty(phi, phiMax, intrinsic)
		jammed := phi >= phiMax
		overflow := !jammed && -intrinsic*phiMax*math.Log1p(-phi/phiMax) > math.Log(math.MaxFloat64)
		switch {
		case math.IsNaN(eta), eta < 1:
			t.Fatalf("KriegerDougherty(%g, %g, %g) = %g", phi, phiMax, intrinsic, eta)
		case math.IsInf(eta, 1) != (jammed || overflow):
			t.Fatalf("KriegerDougherty(%g, %g, %g) = %g (jammed %v)", phi, phiMax, intrinsic, eta, jammed)
		}
	})
}

// FuzzMinimumStericThickness: with the non-retarded or retarded van der
// Waals energy of spheres of 0.25 nm to 5 mm and A up to 1000 zJ, the
// answer is 0, +Inf or a thickness in [0.01 nm, 1 mm] that meets the
// criterion while 1 % less would not (the energy is monotone in h).
func FuzzMinimumStericThickness(f *testing.F) {
	f.Add(50e-9, 1e-20, 298.15, 5.0, false)
	f.Add(5e-3, 1e-18, 213.15, 1e-3, true)
	f.Add(0.25e-9, 1e-22, 573.15, 100.0, false)
	f.Add(1e-6, 0.0, 298.15, 1.0, true)
	f.Fuzz(func(t *testing.T, radius, hamaker, tempK, allowedKT float64, retarded bool) {
		radius = fuzzLogWithin(radius, 0.25e-9, 5e-3)
		hamaker = fuzzWithin(hamaker, 0, 1e-18)
		tempK = fuzzWithin(tempK, 213.15, 573.15)
		allowedKT = fuzzLogWithin(allowedKT, 1e-3, 100)
		vdw := physics.Pair{Radius: radius, Hamaker: hamaker, EpsR: 78.4, TempK: tempK, Retarded: retarded}.EnergyCurve()
		delta := physics.MinimumStericThickness(vdw, tempK, allowedKT)
		limit := allowedKT * physics.Boltzmann * tempK
		switch {
		case delta == 0 || math.IsInf(delta, 1):
		case !(delta >= 1e-11 && delta <= 1e-3):
			t.Fatalf("MinimumStericThickness = %g outside [1e-11, 1e-3] (a %g, A %g, T %g, %g kT)", delta, radius, hamaker, tempK, allowedKT)
		case math.Abs(vdw(2*delta)) > limit*(1+1e-9):
			t.Fatalf("at %g the energy %g exceeds %g (a %g, A %g)", delta, vdw(2*delta), limit, radius, hamaker)
		case delta*0.99 > 1e-11 && math.Abs(vdw(2*delta*0.99)) <= limit:
			t.Fatalf("%g is not the smallest thickness: 1%% less has %g <= %g (a %g, A %g)", delta, vdw(2*delta*0.99), limit, radius, hamaker)
		}
	})
}
