#!/usr/bin/env python3
"""Glycerol and glycerol-water property values for rules/library/liquids.yaml
and the [calc] check values of advisor/liquid_test.go.

Run with any python3 (standard library only):

    python3 testdata/reference/glycerol_water.py

Formulas (both written down from memory of the papers; their outputs are
compared with handbook values below so that a slip would show):

- Viscosity: N.-S. Cheng, "Formula for the viscosity of a glycerol-water
  mixture", Ind. Eng. Chem. Res. 47, 3285-3288 (2008), eqs. 5-11 with the
  pure-component fits of its eqs. 9 and 10 (T in deg C, mPa s).
- Density: A. Volk and C. J. Kaehler, "Density model for aqueous glycerol
  solutions", Exp. Fluids 59, 75 (2018): pure glycerol 1273 - 0.612 T,
  water 1000 (1 - |(T - 3.98)/615|^1.71), and the contraction factor
  kappa = 1 + A sin(Cv^1.331 pi), A = 1.78e-6 T^2 - 1.82e-4 T + 1.41e-2,
  Cv the glycerol volume fraction of the unmixed components (kg/m^3).

Sanity checks against handbooks (values recalled, see the YAML sources):
pure glycerol 1412 mPa s at 20 C (Segur & Oberstar 1951), 1261.3 kg/m^3 at
20 C (CRC Handbook); 50 % w/w glycerol 6.00 mPa s at 20 C (Segur 1953),
1126.3 kg/m^3 at 20 C (CRC Handbook, concentrative properties).
"""
import math


def mu_water(t):
    """Cheng 2008 eq. 10, mPa s."""
    return 1.790 * math.exp((-1230 - t) * t / (36100 + 360 * t))


def mu_glycerol(t):
    """Cheng 2008 eq. 9, mPa s."""
    return 12100 * math.exp((-1233 + t) * t / (9900 + 70 * t))


def mu_mixture(cm, t):
    """Cheng 2008 eqs. 5-8: mu = mu_w^alpha mu_g^(1-alpha), cm glycerol mass fraction."""
    a = 0.705 - 0.0017 * t
    b = (4.9 + 0.036 * t) * a**2.5
    alpha = 1 - cm + a * b * cm * (1 - cm) / (a * cm + b * (1 - cm))
    return mu_water(t) ** alpha * mu_glycerol(t) ** (1 - alpha)


def rho_glycerol(t):
    return 1273 - 0.612 * t


def rho_water(t):
    return 1000 * (1 - abs((t - 3.98) / 615) ** 1.71)


def rho_mixture(cm, t):
    rg, rw = rho_glycerol(t), rho_water(t)
    cv = (cm / rg) / (cm / rg + (1 - cm) / rw)
    a = 1.78e-6 * t**2 - 1.82e-4 * t + 1.41e-2
    kappa = 1 + a * math.sin(cv**1.331 * math.pi)
    return kappa * (rg * cv + rw * (1 - cv))


def main():
    print("# sanity checks")
    print(f"glycerol 20 C: {mu_glycerol(20):.1f} mPa s (Segur 1412), {rho_glycerol(20):.1f} kg/m^3 (CRC 1261.3)")
    print(f"50 % w/w 20 C: {mu_mixture(0.5, 20):.3f} mPa s (Segur 6.00), {rho_mixture(0.5, 20):.1f} kg/m^3 (CRC 1126.3)")
    print(f"water 20 C: {mu_water(20):.4f} mPa s (IAPWS 1.0016), {rho_water(20):.2f} kg/m^3 (Kell 998.20)")

    print("# liquids.yaml: pure glycerol density, kg/m^3")
    for t in range(0, 101, 20):
        print(f"  - {{temperature_c: {t}, value_kg_m3: {rho_glycerol(t):.1f}}}")
    print("# liquids.yaml: glycerol-water 50 % w/w density, kg/m^3")
    for t in range(0, 101, 20):
        print(f"  - {{temperature_c: {t}, value_kg_m3: {rho_mixture(0.5, t):.1f}}}")
    print("# liquids.yaml: glycerol-water 50 % w/w viscosity, mPa s")
    for t in range(0, 101, 10):
        print(f"  - {{temperature_c: {t}, value_mPa_s: {mu_mixture(0.5, t):.4g}}}")

    print("# liquid_test.go [calc] check values, off the table grid")
    for t in (25, 35, 45, 65):
        print(f"glycerol {t} C: {mu_glycerol(t):.4g} mPa s")
    for t in (25, 37, 55):
        print(f"50 % w/w {t} C: {mu_mixture(0.5, t):.4g} mPa s")


if __name__ == "__main__":
    main()
