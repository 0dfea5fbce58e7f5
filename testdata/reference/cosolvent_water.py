#!/usr/bin/env python3
"""Freezing points, densities and viscosities of water-co-solvent mixtures:
the tables physics/freezing.go holds, the [calc] check values of
physics/freezing_test.go, and Melinder's property values that
physics/cosolventliquid_test.go compares with handbook tables.

Run with any python3 (standard library only):

    python3 testdata/reference/cosolvent_water.py

Formulas:

- Melinder's polynomials for monoethylene glycol (MEG) and monopropylene
  glycol (MPG) in water: A. Melinder, Properties of Secondary Working
  Fluids for Indirect Systems, 2nd ed., IIR (2010). Each property is
  f(x, t) = sum c_ij (x - xm)^i (t - tm)^j, x in mass %, t in deg C, over the
  18 (i, j) pairs i + j <= 5, j <= 3; ln(mu / mPa s) for viscosity; the
  freezing point takes t = tm. Coefficients as published in the book's
  tables (transcribed for the NREL/IBPSA building-simulation libraries).
- Ideal colligative depression dT = Kf m, Kf = R T0^2 M / dHfus
  (P. W. Atkins, Physical Chemistry, 8th ed., eq. 5.36), with
  dHfus(ice) = 6.01 kJ/mol (CRC Handbook).
"""
import math

PAIRS = ((0, 0), (0, 1), (0, 2), (0, 3), (1, 0), (1, 1), (1, 2), (1, 3),
         (2, 0), (2, 1), (2, 2), (2, 3), (3, 0), (3, 1), (3, 2), (4, 0), (4, 1), (5, 0))

MEG = {
    "xm": 30.8462, "tm": 31.728,
    "freeze": ((-1.5250e+01, -1.5660e-06, -2.2780e-07, 2.1690e-09),
               (-8.0800e-01, -1.3390e-06, 2.0470e-08, -2.7170e-11),
               (-1.3340e-02, 6.3220e-08, 2.3730e-10, -2.1830e-12),
               (-7.2930e-05, 1.7640e-09, -2.4420e-11),
               (1.0060e-06, -7.6620e-11),
               (1.1400e-09,)),
    "lnmu": ((4.7050e-01, -2.5500e-02, 1.7820e-04, -7.6690e-07),
             (2.4710e-02, -1.1710e-04, 1.0520e-06, -1.6340e-08),
             (3.3280e-06, 1.0860e-06, 1.0510e-08, -6.4750e-10),
             (1.6590e-06, 3.1570e-09, 4.0630e-10),
             (3.0890e-08, 1.8310e-10),
             (-1.8650e-09,)),
    "rho": ((1.0340e03, -4.7810e-01, -2.6920e-03, 4.7250e-06),
            (1.3110e00, -6.8760e-03, 4.8050e-05, 1.6900e-08),
            (7.4900e-05, 7.8550e-05, -3.9950e-07, 4.9820e-09),
            (-1.0620e-04, 1.2290e-06, -1.1530e-08),
            (-9.6230e-07, -7.2110e-08),
            (4.8910e-08,)),
}

MPG = {
    "xm": 30.7031, "tm": 32.7083,
    "freeze": ((-1.3250e+01, -3.8200e-05, 7.8650e-07, -1.7330e-09),
               (-6.6310e-01, 6.7740e-06, -6.2420e-08, -7.8190e-10),
               (-1.0940e-02, 5.3320e-08, -4.1690e-09, 3.2880e-11),
               (-2.2830e-04, -1.1310e-08, 1.9180e-10),
               (-3.4090e-06, 8.0350e-11),
               (1.4650e-08,)),
    "lnmu": ((6.8370e-01, -3.0450e-02, 2.5250e-04, -1.3990e-06),
             (3.3280e-02, -3.9840e-04, 4.3320e-06, -1.8600e-08),
             (5.4530e-05, -8.6000e-08, -1.5930e-08, -4.4650e-11),
             (-3.9000e-06, 1.0540e-07, -1.5890e-09),
             (-1.5870e-08, 4.4750e-10),
             (3.5640e-09,)),
    "rho": ((1.0180e03, -5.4060e-01, -2.6660e-03, 1.3470e-05),
            (7.6040e-01, -9.4500e-03, 5.5410e-05, -1.3430e-07),
            (-2.4980e-03, 2.7000e-05, -4.0180e-07, 3.3760e-09),
            (-1.5500e-04, 2.8290e-06, -7.1750e-09),
            (-1.1310e-06, -2.2210e-08),
            (2.3420e-08,)),
}


def melinder(fluid, prop, x_pct, t):
    c = fluid[prop]
    return sum(c[i][j] * (x_pct - fluid["xm"]) ** i * (t - fluid["tm"]) ** j for i, j in PAIRS)


def freeze(fluid, x_pct):
    return melinder(fluid, "freeze", x_pct, fluid["tm"])


R = 8.314462618
KF = R * 273.15**2 * 0.01801528 / 6010.0


def ideal(w, molar_mass):
    """Ideal depression (K) at co-solvent mass fraction w."""
    return KF * w / molar_mass / (1 - w)


def main():
    print(f"# Kf = R T0^2 M / dHfus = {KF:.4f} K kg/mol (CRC 1.86)")
    for name, fl in (("ethylene glycol", MEG), ("propylene glycol", MPG)):
        print(f"# freezing.go table, {name} (Melinder 2010), deg C; the table puts 0 at x = 0 (pure ice point)")
        print("  " + ", ".join(f"{freeze(fl, x):.2f}" for x in range(0, 61, 5)))
    print("# dilute limit, ideal depression in K")
    for name, w, mm in (("EG", 0.05, 0.06207), ("PG", 0.05, 0.07609),
                        ("ethanol", 0.048, 0.04607), ("glycerol", 0.20, 0.09209)):
        print(f"  {name} w = {w}: {ideal(w, mm):.3f}")
    print("# salts, ideal depression Kf i m (K)")
    for m in (0.05, 0.10, 0.25, 0.50):
        print(f"  m = {m}: NaCl {KF * 2 * m:.3f}, CaCl2 {KF * 3 * m:.3f}")
    print(f"  NaCl 1 % w/w: m = {10 / 58.443 / 0.99:.4f} mol/kg")
    print("# Melinder density (kg/m^3) and viscosity (mPa s) at 20 C, to set beside the tables")
    for name, fl in (("EG", MEG), ("PG", MPG)):
        for x in (0, 20, 40):
            rho = melinder(fl, "rho", x, 20)
            mu = math.exp(melinder(fl, "lnmu", x, 20))
            print(f"  {name} {x} %: {rho:.1f}, {mu:.3f}")


if __name__ == "__main__":
    main()
