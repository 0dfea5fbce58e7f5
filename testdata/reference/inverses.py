#!/usr/bin/env python3
"""Reference values for the inverted formulas of physics: Stokes' law solved
for radius, density difference and viscosity; Perrin's gravitational length
solved for radius; the hydrodynamic shear work and Smoluchowski's
orthokinetic-to-perikinetic ratio solved for the shear rate; the
Lifshitz-Slyozov-Wagner doubling time solved for the rate
(physics/sedimentation.go, shear.go, kinetics.go, ripening.go).

Run with any python3 (standard library only):

    python3 testdata/reference/inverses.py

Every value is computed from the published formula named beside it, solved
by hand for the unknown, with the exact SI 2019 constants (k, e, NA; CODATA
2018) and standard gravity, independently of the Go code. The printed values
are copied into the Go tests as [calc] check values.
"""
import math

KB = 1.380649e-23  # J/K, exact (SI 2019)
G = 9.80665  # m/s^2, standard gravity (CGPM 1901)
T = 298.15  # K


def main():
    # Stokes (1851), v = 2 a^2 drho g / (9 eta), solved for a, drho, eta.
    v, drho, eta = 1e-6, 1000.0, 1e-3
    print(f"# Stokes radius v=1um/s drho=1000 eta=1mPas: {math.sqrt(9 * eta * v / (2 * drho * G)):.6e} m")
    a = 0.5e-6
    print(f"# Stokes density difference v=1um/s a=0.5um eta=1mPas: {9 * eta * v / (2 * a**2 * G):.6e} kg/m^3")
    print(f"# Stokes viscosity v=1um/s a=0.5um drho=1000: {2 * a**2 * drho * G / (9 * v):.6e} Pa s")
    # Perrin (1909), l = kT / (drho (4/3) pi a^3 g), solved for a.
    for height, drho in [(0.1, 1000.0), (1e-3, 100.0)]:
        a = (3 * KB * T / (4 * math.pi * drho * G * height)) ** (1 / 3)
        print(f"# Perrin radius H={height} m drho={drho} 25C: {a:.6e} m")
    # van de Ven & Mason (1977) order of magnitude, W = 6 pi eta a^2 G w,
    # solved for G: 10 kT over w = 10 nm at a = 100 nm, eta = 1 mPa s.
    a, w = 100e-9, 10e-9
    print(f"# shear rate for 10 kT, a=100nm w=10nm eta=1mPas 25C: "
          f"{10 * KB * T / (6 * math.pi * eta * a**2 * w):.6e} 1/s")
    # Smoluchowski (1917), ratio = G d^3 eta / (2 kT), solved for G.
    d = 1e-6
    print(f"# orthokinetic = perikinetic, d=1um eta=1mPas 25C: {2 * KB * T / (eta * d**3):.6e} 1/s")
    # Lifshitz-Slyozov-Wagner: r^3 grows linearly at rate w, so (2r)^3 - r^3
    # = w t, solved for w: the rate that doubles r = 1 um in one year.
    r, year = 1e-6, 365.25 * 86400
    print(f"# LSW rate doubling r=1um in 365.25 d: {7 * r**3 / year:.6e} m^3/s")


if __name__ == "__main__":
    main()
