#!/usr/bin/env python3
"""Reference values for physics/water, sedimentation, brownian and debye tests.

Run with the system python3 that has scipy (python3-scipy):

    /usr/bin/python3 testdata/reference/basics.py

Every value is computed from a published formula, named beside it, with the
CODATA 2018 constants of scipy.constants (scipy >= 1.4 carries CODATA 2018),
independently of the Go code. The printed values are copied into the Go
tests as [calc] check values.
"""
import math

from scipy import constants as sc

KB = sc.k
E = sc.e
NA = sc.N_A
HBAR = sc.hbar
EPS0 = sc.epsilon_0
G = sc.g


def kell_density(t_c):
    """Kell 1975, J. Chem. Eng. Data 20:97, eq. 16 (t in deg C, kg/m^3)."""
    a = [999.83952, 16.945176, -7.9870401e-3, -46.170461e-6, 105.56302e-9, -280.54253e-12]
    num = sum(c * t_c**i for i, c in enumerate(a))
    return num / (1 + 16.87985e-3 * t_c)


H0 = [1.67752, 2.20462, 0.6366564, -0.241605]
# IAPWS R12-08, Table 2: (i, j, H_ij) for the non-zero coefficients.
H1 = [
    (0, 0, 5.20094e-1), (1, 0, 8.50895e-2), (2, 0, -1.08374), (3, 0, -2.89555e-1),
    (0, 1, 2.22531e-1), (1, 1, 9.99115e-1), (2, 1, 1.88797), (3, 1, 1.26613),
    (5, 1, 1.20573e-1), (0, 2, -2.81378e-1), (1, 2, -9.06851e-1), (2, 2, -7.72479e-1),
    (3, 2, -4.89837e-1), (4, 2, -2.57040e-1), (0, 3, 1.61913e-1), (1, 3, 2.57399e-1),
    (0, 4, -3.25372e-2), (3, 4, 6.98452e-2), (4, 5, 8.72102e-3), (3, 6, -4.35673e-3),
    (5, 6, -5.93264e-4),
]


def iapws_viscosity(temp_k, rho):
    """IAPWS R12-08 eqs. 10-12 with mu2 = 1 (no critical enhancement), Pa s."""
    tb = temp_k / 647.096
    rb = rho / 322.0
    mu0 = 100 * math.sqrt(tb) / sum(h / tb**i for i, h in enumerate(H0))
    s = sum(h * (1 / tb - 1) ** i * (rb - 1) ** j for i, j, h in H1)
    mu1 = math.exp(rb * s)
    return mu0 * mu1 * 1e-6


def permittivity(t_c):
    """Malmberg & Maryott 1956, J. Res. NBS 56:1, eq. 3."""
    return 87.740 - 0.40008 * t_c + 9.398e-4 * t_c**2 - 1.410e-6 * t_c**3


def water_viscosity(t_c):
    return iapws_viscosity(t_c + 273.15, kell_density(t_c))


def debye_length(i_molm3, t_c):
    """Debye & Hueckel 1923: kappa^2 = 2 NA e^2 I / (eps0 epsr kB T)."""
    t = t_c + 273.15
    k2 = 2 * NA * E**2 * i_molm3 / (EPS0 * permittivity(t_c) * KB * t)
    return 1 / math.sqrt(k2)


def main():
    print("# IAPWS R12-08 verification points, uPa s")
    for t, rho in [(298.15, 998), (298.15, 1200), (373.15, 1000), (433.15, 1000)]:
        print(f"({t}, {rho}) {iapws_viscosity(t, rho) * 1e6:.6f}")

    print("# Water at 0.1 MPa: Kell density kg/m^3, IAPWS viscosity mPa s, permittivity")
    for t_c in [0, 10, 20, 25, 30, 37, 40, 50, 60, 80, 100]:
        print(f"{t_c:5.1f} C  rho {kell_density(t_c):.4f}  mu {water_viscosity(t_c) * 1e3:.5f}"
              f"  eps {permittivity(t_c):.4f}")

    t = 298.15
    eta25 = water_viscosity(25)
    print(f"# Stokes 1851: v = 2 a^2 drho g/(9 eta), a=0.5um drho=1000 water 25C: "
          f"{2 * 0.5e-6**2 * 1000 * G / (9 * eta25):.6e} m/s")
    v = 2 * 1e-6**2 * (910 - 1000) * G / (9 * 1e-3)
    print(f"# McClements creaming r=1um 910 vs 1000 1mPas: {v:.6e} m/s = {v * 86400e3:.4f} mm/day")
    a = 50e-9
    print(f"# Perrin gravitational length a=50nm drho=1000 25C: "
          f"{KB * t / (1000 * 4 / 3 * math.pi * a**3 * G):.6e} m")
    for drho in [1000, 100, 1650]:
        d = (6 * KB * t / (math.pi * drho * G)) ** 0.25
        print(f"# suspension diameter drho={drho} 25C: {d:.6e} m")
    for rho in [1000, 2650, 19300]:
        d = (3 * HBAR**2 / (2 * math.pi * rho * KB * t)) ** 0.2
        print(f"# quantum diameter rho={rho} 25C: {d:.6e} m")
    for phi in [0.1, 0.3, 0.5]:
        print(f"# Richardson-Zaki (1-phi)^4.65 phi={phi}: {(1 - phi) ** 4.65:.7f}")
    rho25 = kell_density(25)
    v = 2 * 0.5e-6**2 * 1000 * G / (9 * eta25)
    print(f"# particle Reynolds d=1um at that Stokes velocity: {rho25 * v * 1e-6 / eta25:.6e}")
    print(f"# settling time over 0.1 m at that velocity: {0.1 / v:.6e} s")
    # Re = rho v d / eta = 0.25 with v = d^2 drho g / (18 eta), quartz 2650 kg/m^3.
    d = (0.25 * 18 * eta25**2 / (rho25 * (2650 - rho25) * G)) ** (1 / 3)
    print(f"# quartz diameter at Re = 0.25 in water 25C: {d:.6e} m")
    print(f"# Stokes-Einstein a=100nm water 25C: {KB * t / (6 * math.pi * eta25 * 100e-9):.6e} m^2/s")
    print(f"#   with eta = 0.8900 mPa s: {KB * t / (6 * math.pi * 0.89e-3 * 100e-9):.6e} m^2/s")

    # Einstein 1905, closing example, in his cgs units: R = 8.31e7 erg/K/mol,
    # N = 6e23, water at 17 C with eta = 1.35e-2 P, diameter 0.001 mm.
    d_cgs = 8.31e7 * 290 / (6e23 * 6 * math.pi * 1.35e-2 * 0.5e-4)
    print(f"# Einstein 1905 displacement in 1 s: {math.sqrt(2 * d_cgs) * 1e4:.3f} um (his 0.8 um)")

    print("# Debye length at 25 C, nm")
    for name, i in [("NaCl 1mM", 1), ("NaCl 10mM", 10), ("NaCl 100mM", 100),
                    ("NaCl 150mM", 150), ("CaCl2 1mM", 3), ("CaCl2 10mM", 30),
                    ("MgSO4 1mM", 4), ("MgSO4 10mM", 40), ("pure water", 1e-4)]:
        print(f"{name:12s} {debye_length(i, 25) * 1e9:.5f}")
    print("# 1:1 prefactor, nm at 1 mol/L")
    for t_c in [0, 20, 25, 37]:
        print(f"{t_c:4.1f} C {debye_length(1000, t_c) * 1e9:.5f}")


if __name__ == "__main__":
    main()
