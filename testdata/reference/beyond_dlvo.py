#!/usr/bin/env python3
"""Reference values for the "beyond DLVO" physics tests: steric layers,
bridging, Ostwald ripening, rheology, size distributions, shear and yield
stress (physics/steric.go, bridging.go, ripening.go, rheology.go,
distribution.go, packing.go, shear.go, yieldstress.go).

Run with the system python3 that has scipy (python3-scipy):

    /usr/bin/python3 testdata/reference/beyond_dlvo.py

Every value is computed from the published formula named beside it, with
the CODATA 2018 constants of scipy.constants, independently of the Go code
(root finding with scipy.optimize.brentq, normal quantiles and integrals
with scipy.stats.norm, the Ouchiyama-Tanaka packing model written out
afresh from the paper's formula). The printed values are copied into the Go tests as
[calc] check values.
"""
import math

from scipy import constants as sc
from scipy.optimize import brentq
from scipy.stats import norm

KB = sc.k
NA = sc.N_A
R = sc.R
G = sc.g
T = 298.15
KT = KB * T


def hamaker_sphere_sphere(a_hamaker, a, h):
    """Hamaker 1937 (Physica 4:1058), two equal spheres of radius a at
    surface separation h, exact non-retarded expression, J."""
    s = 2 * a + h
    return -a_hamaker / 6 * (2 * a * a / (h * (4 * a + h)) + 2 * a * a / (s * s)
                             + math.log(h * (4 * a + h) / (s * s)))


def krieger_dougherty(phi, phim, intrinsic=2.5):
    """Krieger & Dougherty 1959, Trans. Soc. Rheol. 3:137."""
    return (1 - phi / phim) ** (-intrinsic * phim)


def peo_rg_nm(m_g_mol):
    """Devanand & Selser 1991, Macromolecules 24:5943: PEO in water,
    Rg = 0.0215 M^0.583 nm with M in g/mol."""
    return 0.0215 * m_g_mol ** 0.583


def lsw_rate(gamma, c_inf, vm, d, temp=T):
    """Lifshitz & Slyozov 1961; Wagner 1961; Kabalnov 2001:
    d r^3/dt = 8 gamma c_inf Vm^2 D / (9 R T), m^3/s."""
    return 8 * gamma * c_inf * vm * vm * d / (9 * R * temp)


def lognormal_classes(d50, span, n):
    """Volume-weighted log-normal, n equal bins in ln d over +-3 sigma,
    the tails beyond +-3 sigma folded into the end bins."""
    z90 = norm.ppf(0.9)
    sigma = math.asinh(span / 2) / z90
    edges = [-3 + 6 * i / n for i in range(n + 1)]
    out = []
    for i in range(n):
        lo = -math.inf if i == 0 else edges[i]
        hi = math.inf if i == n - 1 else edges[i + 1]
        x = 0.5 * (edges[i] + edges[i + 1])
        out.append((d50 * math.exp(sigma * x), norm.cdf(hi) - norm.cdf(lo)))
    return sigma, out


def ouchiyama_tanaka(classes, phi0=0.64):
    """Ouchiyama & Tanaka 1981, Ind. Eng. Chem. Fundam. 20:66: random
    packing fraction of spheres with number fractions f (from volume
    fractions / D^3), number-mean diameter Db."""
    n = [v / d ** 3 for d, v in classes]
    total = sum(n)
    f = [x / total for x in n]
    ds = [d for d, _ in classes]
    db = sum(d * x for d, x in zip(ds, f))

    def over(d):
        return (d - db) ** 3 if d > db else 0.0

    beta = 1 + 4 / 13 * (8 * phi0 - 1) * db * sum(
        x * (d + db) ** 2 * (1 - 3 / 8 * db / (d + db)) for d, x in zip(ds, f)) / sum(
        x * (d ** 3 - over(d)) for d, x in zip(ds, f))
    num = sum(x * d ** 3 for d, x in zip(ds, f))
    den = sum(x * over(d) for d, x in zip(ds, f)) + sum(
        x * ((d + db) ** 3 - over(d)) for d, x in zip(ds, f)) / beta
    return num / den


def main():
    print("# Krieger-Dougherty, Einstein, Batchelor at phi = 0.3")
    print(f"Einstein {1 + 2.5 * 0.3:.6f}  Batchelor {1 + 2.5 * 0.3 + 6.2 * 0.09:.6f}")
    for phim in (0.64, 0.71):
        print(f"KD phim={phim} {krieger_dougherty(0.3, phim):.6f}")
    for phim, eta in ((0.64, 10.0), (0.64, 2.0)):
        phi = brentq(lambda p: krieger_dougherty(p, phim) - eta, 0, phim * (1 - 1e-12))
        print(f"KD inverse phim={phim} eta_r={eta}: phi {phi:.8f}")

    a, ah = 100e-9, 1e-20
    print("# Hamaker exact sphere-sphere, a=100nm, A=1e-20 J, kT units")
    for h in (1e-9, 2e-9, 5e-9, 10e-9):
        print(f"h={h * 1e9:.0f} nm  {hamaker_sphere_sphere(ah, a, h) / KT:.4f}")
    for allowed in (1.0, 0.5):
        delta = brentq(lambda d: abs(hamaker_sphere_sphere(ah, a, 2 * d)) - allowed * KT,
                       1e-11, 1e-5, xtol=1e-20, rtol=1e-14)
        print(f"min steric thickness exact Hamaker allowed={allowed} kT: {delta:.6e} m")
        print(f"  closed form A a/(24 h kT allowed): {ah * a / (24 * KT * allowed):.6e} m")
    for a_um, ah2 in ((1.0, 1e-20), (0.1, 5e-21), (1.0, 2e-20)):
        aa = a_um * 1e-6
        delta = brentq(lambda d: abs(hamaker_sphere_sphere(ah2, aa, 2 * d)) - KT,
                       1e-11, 1e-5, xtol=1e-20, rtol=1e-14)
        print(f"  a={a_um} um A={ah2}: exact {delta:.6e} m")

    print("# PEO radius of gyration (Devanand & Selser 1991), nm")
    for m in (1e4, 1e5, 1e6, 5e6):
        print(f"M={m:.0e} g/mol  Rg {peo_rg_nm(m):.5f} nm")
    m_kg = 1000.0
    rg = peo_rg_nm(m_kg * 1e3) * 1e-9
    cstar = 3 * m_kg / (4 * math.pi * NA * rg ** 3)
    print(f"# de Gennes overlap c* = 3M/(4 pi NA Rg^3), M=1000 kg/mol PEO: {cstar:.6e} kg/m^3")
    print(f"# number density of 1 kg/m^3 at 100 kg/mol: {1.0 / 100.0 * NA:.6e} 1/m^3")

    print("# LSW rate, decane in water 25 C")
    vm = 0.14228 / 730.0           # m^3/mol: M 142.28 g/mol, density 730 kg/m^3
    c_inf = 0.052e-3 / 0.14228     # mol/m^3 from 0.052 mg/L
    for d in (6.2e-10, 1e-9):
        w = lsw_rate(0.0523, c_inf, vm, d)
        print(f"Vm {vm:.6e} c_inf {c_inf:.6e} D {d:.1e}: {w:.6e} m^3/s")
    w = lsw_rate(0.05, 1.0, 1e-4, 1e-9)
    print(f"LSW hand values gamma .05 c 1 Vm 1e-4 D 1e-9: {w:.6e} m^3/s")
    r0 = 100e-9
    print(f"  time to double r=100nm: {7 * r0 ** 3 / w:.6e} s")
    print(f"  growth after 1 day: {((r0 ** 3 + w * 86400) ** (1 / 3)) / r0 - 1:.6e}")

    print("# log-normal classes, d50 = 1 um")
    z90 = norm.ppf(0.9)
    print(f"z90 {z90:.10f}")
    for span in (0.5, 1.0, 1.5, 2.0):
        sigma = math.asinh(span / 2) / z90
        d10, d90 = math.exp(-z90 * sigma), math.exp(z90 * sigma)
        print(f"span {span}: sigma {sigma:.8f}  exact span back {(d90 - d10):.8f}")
    sigma, cls = lognormal_classes(1e-6, 1.0, 5)
    print(f"n=5 span=1 sigma={sigma:.8f}")
    for d, f in cls:
        print(f"  d {d:.8e} f {f:.8f}")

    print("# Ouchiyama & Tanaka 1981 maximum packing, phi0 = 0.64 (uncapped)")
    for span in (0.5, 1.0, 1.5, 2.0):
        _, cls = lognormal_classes(1e-6, span, 25)
        print(f"log-normal span {span} n=25: {ouchiyama_tanaka(cls):.8f}")
    for ratio, small in ((2, 0.3), (5, 0.3), (1000, 0.2)):
        print(f"binary ratio {ratio} small-volume {small}: "
              f"{ouchiyama_tanaka([(1.0, 1 - small), (1.0 / ratio, small)]):.8f}")
    print(f"Furnas cap 1-(1-0.64)^2 = {1 - 0.36 ** 2:.6f}")

    eta = 0.89e-3
    for a_um in (0.5, 1.0):
        aa = a_um * 1e-6
        pe = 6 * math.pi * eta * aa ** 3 * 100 / KT
        ortho = 100 * (2 * aa) ** 3 * eta / (2 * KT)
        print(f"# shear Peclet a={a_um} um G=100 eta=0.89 mPa s: {pe:.6f}; "
              f"Smoluchowski orthokinetic ratio G d^3 eta/(2kT) {ortho:.6f}")

    print("# Beris yield stress with Y = 3 tau/(2 drho g R) = 0.143")
    for r_um, drho in ((50, 1000), (5, 1650), (1000, 100)):
        tau = 0.143 * 2 * drho * G * r_um * 1e-6 / 3
        print(f"R={r_um} um drho={drho}: tau {tau:.6e} Pa; 2 R g drho/21 "
              f"{2 * r_um * 1e-6 * G * drho / 21:.6e} Pa")


if __name__ == "__main__":
    main()
