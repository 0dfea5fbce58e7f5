#!/usr/bin/env python3
"""Reference values for the interaction physics tests (physics/zeta, hamaker,
vanderwaals, doublelayer, depletion, interaction, stability, kinetics, ccc).

Run with the system python3 that has scipy (python3-scipy):

    /usr/bin/python3 testdata/reference/interaction.py > testdata/reference/interaction.txt

Each value is computed from the published formula named beside it with the
CODATA 2018 constants of scipy.constants, using scipy's own special functions,
quadrature, optimisers and root finders (and numpy), independently of the Go
code. It takes about a minute; its output is kept in interaction.txt. The printed
values are copied into the Go tests as [calc] check values.
"""
import math

import numpy as np
from scipy import constants as sc
from scipy import integrate, optimize, special

KB = sc.k
E = sc.e
NA = sc.N_A
H = sc.h
EPS0 = sc.epsilon_0
T = 298.15
KT = KB * T
NM = 1e-9


def kappa(i_molm3, eps_r, temp=T):
    """Debye & Hueckel 1923: kappa^2 = 2 NA e^2 I / (eps0 epsr kB T), I in mol/m^3."""
    return math.sqrt(2 * NA * E**2 * i_molm3 / (EPS0 * eps_r * KB * temp))


# --- zeta potential -------------------------------------------------------

def henry_en(x):
    """Henry's function through generalised exponential integrals (Swan & Furst 2012)."""
    return 1.5 - 1.5 * math.exp(x) * (5 * special.expn(7, x) - 2 * special.expn(5, x))


def henry_1931(x):
    """Henry 1931 (Proc. R. Soc. A 133:106) closed form with E1, as usually quoted."""
    return (1 + x**2 / 16 - 5 * x**3 / 48 - x**4 / 96 + x**5 / 96
            + (x**4 / 8 - x**6 / 96) * math.exp(x) * special.exp1(x))


def ohshima(x):
    """Ohshima 1994, J. Colloid Interface Sci. 168:269, eq. 8."""
    d = 2.5 / (1 + 2 * math.exp(-x))
    return 1 + 1 / (2 * (1 + d / x) ** 3)


# --- Hamaker constants ----------------------------------------------------

def tabor_winterton(e1, n1, e3, n3, temp=T, nu=3.0e15):
    """Israelachvili, Intermolecular and Surface Forces 3rd ed. eq. 13.16."""
    zero = 0.75 * KB * temp * ((e1 - e3) / (e1 + e3)) ** 2
    disp = 3 * H * nu / (16 * math.sqrt(2)) * (n1**2 - n3**2) ** 2 / (n1**2 + n3**2) ** 1.5
    return zero + disp


def tabor_winterton_132(e1, n1, e2, n2, e3, n3, temp=T, nu=3.0e15):
    """Israelachvili 3rd ed. eq. 13.15."""
    zero = 0.75 * KB * temp * (e1 - e3) / (e1 + e3) * (e2 - e3) / (e2 + e3)
    s1 = math.sqrt(n1**2 + n3**2)
    s2 = math.sqrt(n2**2 + n3**2)
    disp = (3 * H * nu / (8 * math.sqrt(2)) * (n1**2 - n3**2) * (n2**2 - n3**2)
            / (s1 * s2 * (s1 + s2)))
    return zero + disp


# --- pair energies --------------------------------------------------------

def vdw_exact(a, h, A):
    """Hamaker 1937, Physica 4:1058, equal spheres."""
    return -A / 6 * (2 * a * a / (h * h + 4 * a * h) + 2 * a * a / (h + 2 * a) ** 2
                     + math.log((h * h + 4 * a * h) / (h + 2 * a) ** 2))


def vdw_gregory(a, h, A, lam=100e-9, b=5.32):
    """Gregory 1981, J. Colloid Interface Sci. 83:138, eq. 9."""
    return -A * a / (12 * h) * (1 - b * h / lam * math.log(1 + lam / (b * h)))


def edl_lsa(a, h, psi, kap, eps_r, z=1, temp=T):
    """Linear superposition, equal spheres, Derjaguin limit (Gregory 1975)."""
    kt = KB * temp
    g = math.tanh(z * E * psi / (4 * kt))
    return 32 * math.pi * eps_r * EPS0 * a * (kt / (z * E)) ** 2 * g * g * math.exp(-kap * h)


def edl_hhf(a, h, psi, kap, eps_r):
    """Hogg, Healy & Fuerstenau 1966, constant potential, equal spheres."""
    return 2 * math.pi * eps_r * EPS0 * a * psi * psi * math.log1p(math.exp(-kap * h))


def ao_overlap(a, h, delta):
    """Lens volume of two spheres of radius a+delta at centre distance 2a+h."""
    R = a + delta
    r = 2 * a + h
    if r >= 2 * R:
        return 0.0
    return math.pi / 12 * (4 * R + r) * (2 * R - r) ** 2


# --- barrier and stability ratio -----------------------------------------

def barrier(v, lo, hi):
    grid = [lo * (hi / lo) ** (i / 400) for i in range(401)]
    vals = [v(h) for h in grid]
    i = max(range(len(vals)), key=lambda k: vals[k])
    if i in (0, len(vals) - 1):
        return grid[i], vals[i]
    res = optimize.minimize_scalar(lambda s: -v(math.exp(s)), method="bounded",
                                   bounds=(math.log(grid[i - 1]), math.log(grid[i + 1])),
                                   options={"xatol": 1e-12})
    return math.exp(res.x), -res.fun


def log10_w(v, a, honig, hmin, vmax=0.0, points=400001):
    """Fuchs 1934 W = 2 int beta(u) exp(V/kT)/(u+2)^2 du, u = h/a (Honig 1971).

    Below u = 2 the integral is taken in s = ln h by the trapezoidal rule on a
    very fine uniform grid (sharp barriers defeat adaptive quadrature in u);
    beyond u = 2 the integrand is smooth and scipy's adaptive quad is used.
    """
    s = np.linspace(math.log(hmin), math.log(2 * a), points)
    h = np.exp(s)
    u = h / a
    vv = np.array([v(x) for x in h]) / KT - vmax
    bu = (6 * u * u + 13 * u + 2) / (6 * u + 4) if honig else u
    near = np.trapz(bu / (u + 2) ** 2 * np.exp(vv), s)

    def f(uu):
        beta = (6 * uu * uu + 13 * uu + 2) / (6 * uu * uu + 4 * uu) if honig else 1.0
        return beta * math.exp(v(uu * a) / KT - vmax) / (uu + 2) ** 2
    far, _ = integrate.quad(f, 2.0, math.inf, epsabs=0, epsrel=1e-11, limit=500)
    return (vmax + math.log(2 * (near + far))) / math.log(10)


def main():
    print("# zeta: mu = 2e-8 m^2/(V s), eta = 0.8900 mPa s, epsr 78.5")
    mu, eta, eps = 2e-8, 0.89e-3, 78.5 * EPS0
    print(f"Smoluchowski {eta * mu / eps * 1e3:.5f} mV  Hueckel {1.5 * eta * mu / eps * 1e3:.5f} mV"
          f"  Henry(ka=10) {1.5 * eta * mu / (eps * henry_en(10)) * 1e3:.5f} mV")
    print("# Henry function: ka, Swan-Furst E_n form, Henry 1931 E1 form, Ohshima 1994")
    for x in [0.01, 0.1, 0.5, 1, 2, 5, 10, 20, 50, 100, 500]:
        print(f"{x:8g} {henry_en(x):.10f} {henry_1931(x):.10f} {ohshima(x):.10f}")

    xs = np.logspace(-3, 2.5, 20000)
    dev = [abs(ohshima(x) / henry_en(x) - 1) for x in xs]
    k = int(np.argmax(dev))
    print(f"# Ohshima largest relative deviation {dev[k]:.5f} at kappa a {xs[k]:.3f}")
    kt_e = KT / E
    print(f"# surface potential estimate: Nernst slope ln10 kT/e {math.log(10) * kt_e * 1e3:.5f} mV/pH;"
          f" 4kT/e tanh(ln10 * 2 / 16) = {4 * kt_e * math.tanh(math.log(10) * 2 / 16) * 1e3:.4f} mV")
    print("# reduced surface potential gamma = tanh(z e psi/(4 kT)) (Verwey & Overbeek 1948), 298.15 K")
    for z, psi in [(1, 0.025), (1, -0.05), (2, 0.025), (1, 0.2)]:
        print(f"z {z} psi {psi * 1e3:g} mV: {math.tanh(z * E * psi / (4 * KT)):.9f}")
    print("# Tabor-Winterton (nu_e 3.0e15 Hz, 298.15 K), J")
    print(f"water in vacuum (80, 1.333; 1, 1): {tabor_winterton(80, 1.333, 1, 1):.6e}")
    print(f"water in vacuum (78.4, 1.333; 1, 1): {tabor_winterton(78.4, 1.333, 1, 1):.6e}")
    print(f"polystyrene across water (2.55, 1.59; 80, 1.333): {tabor_winterton(2.55, 1.59, 80, 1.333):.6e}")
    print(f"n-hexadecane across water (2.05, 1.434; 80, 1.333): {tabor_winterton(2.05, 1.434, 80, 1.333):.6e}")
    print(f"132 PS / water / hexadecane: {tabor_winterton_132(2.55, 1.59, 2.05, 1.434, 80, 1.333):.6e}")
    a11, a33 = 65e-21, 37e-21
    print(f"combining PS-water (Walstra vacuum values 65, 37 zJ): A131 {(math.sqrt(a11) - math.sqrt(a33))**2:.6e}")

    a, A = 100 * NM, 1e-20
    print("# van der Waals a = 100 nm, A = 1e-20 J, kT")
    for h in [1, 2, 5, 10, 100, 1000, 10000]:
        print(f"h {h} nm exact {vdw_exact(a, h * NM, A) / KT:.6f}  -Aa/12h {-A * a / (12 * h * NM) / KT:.6f}"
              f"  Gregory {vdw_gregory(a, h * NM, A) / KT:.6f}")
    print(f"far field h=10 um: London -16/9 A a^6/R^6 {-16 / 9 * A * a**6 / (10e-6 + 2 * a)**6 / KT:.6e} kT")

    k1 = kappa(1, 78.4)
    print(f"# double layer, psi -25 mV, 1 mM 1:1, epsr 78.4, kappa {k1:.6e} 1/m, ka {k1 * a:.5f}")
    for h in [0, 1, 5, 10]:
        print(f"h {h} nm LSA {edl_lsa(a, h * NM, -0.025, k1, 78.4) / KT:.6f}"
              f"  HHF {edl_hhf(a, h * NM, -0.025, k1, 78.4) / KT:.6f}")
    print(f"LSA z=2 psi -25 mV h=1nm (same kappa): {edl_lsa(a, NM, -0.025, k1, 78.4, z=2) / KT:.6f}")

    delta = 10 * NM
    n = 0.1 / (4 / 3 * math.pi * delta**3)
    print(f"# AO a=100nm delta=10nm phi_p=0.1: n {n:.6e} m^-3")
    for h in [0, 5, 10, 19.9, 20]:
        print(f"h {h} nm: -n V_overlap = {-n * ao_overlap(a, h * NM, delta):.7g} kT")

    print("# DLVO barrier and Fuchs W, exact Hamaker + LSA, a=100nm, A=1e-20, epsr 78.4, from 0.2 nm")
    hmin = 0.2 * NM
    for psi, i_mm in [(-0.025, 1), (-0.025, 10), (-0.015, 10), (0.0, 10)]:
        kap = kappa(i_mm, 78.4)

        def v(h, psi=psi, kap=kap):
            return vdw_exact(a, h, A) + edl_lsa(a, h, psi, kap, 78.4)
        if psi != 0:
            hs, vm = barrier(v, hmin, max(30 / kap, 50 * NM))
            vmax = vm / KT
        else:
            hs, vm, vmax = None, 0.0, 0.0
        wf = log10_w(v, a, False, hmin, max(vmax, 0))
        wh = log10_w(v, a, True, hmin, max(vmax, 0))
        wf0 = log10_w(v, a, False, 1e-6 * NM, max(vmax, 0))
        wc = log10_w(v, a, True, hmin, max(vmax, 0), points=100001)
        ro = vmax / math.log(10) - math.log10(2 * kap * a)
        hs_nm = hs / NM if hs else float("nan")
        print(f"psi {psi * 1e3:g} mV {i_mm} mM: Vmax {vmax:.6f} kT at {hs_nm:.6f} nm;"
              f" log10W Fuchs {wf:.6f} (from 1e-6 nm {wf0:.6f}), Fuchs+Honig {wh:.6f} (100001 points: {wc:.6f});"
              f" Reerink-Overbeek log10 {ro:.4f}")
    # secondary minimum, -25 mV 10 mM
    kap = kappa(10, 78.4)

    def v10(h):
        return vdw_exact(a, h, A) + edl_lsa(a, h, -0.025, kap, 78.4)
    res = optimize.minimize_scalar(v10, bounds=(3 * NM, 60 * NM), method="bounded",
                                   options={"xatol": 1e-15})
    print(f"secondary minimum -25 mV 10 mM: {res.fun / KT:.6f} kT at {res.x / NM:.6f} nm")
    a2 = 1e-6
    kap = kappa(100, 78.4)

    def v100(h):
        return vdw_exact(a2, h, A) + edl_lsa(a2, h, -0.025, kap, 78.4)
    hs, vm = barrier(v100, hmin, 50 * NM)
    res = optimize.minimize_scalar(v100, bounds=(hs, 50 * NM), method="bounded",
                                   options={"xatol": 1e-15})
    print(f"a=1um -25 mV 100 mM: barrier {vm / KT:.6f} kT at {hs / NM:.6f} nm;"
          f" secondary minimum {res.fun / KT:.6f} kT at {res.x / NM:.6f} nm")

    print("# kinetics, water 25 C eta 0.8900 mPa s")
    print(f"kernel 8kT/3eta {8 * KT / (3 * 0.89e-3):.6e} m^3/s; 4kT/3eta {4 * KT / (3 * 0.89e-3):.6e}")
    print(f"3 eta/(4 kT) {3 * 0.89e-3 / (4 * KT):.6e} s m^-3")
    n0 = 0.1 / (4 / 3 * math.pi * 0.5e-6**3)
    print(f"a=0.5um phi=0.1: N0 {n0:.6e} t1/2 {3 * 0.89e-3 / (4 * KT * n0):.6f} s")
    print(f"ortho/peri d=1um G=100: {100 * 1e-18 * 0.89e-3 / (2 * KT):.6f}")

    print("# CCC, high potential: V = -Aa/12h + 32 pi eps a (kT/ze)^2 g^2 exp(-kh); V = V' = 0")
    epsr = 78.5
    eps = epsr * EPS0
    # closed form from kappa h = 1, kappa = 12 B/(A e), c = kappa^2 eps kT/(2 NA z^2 e^2)
    pref = 144 * 1024 * math.pi**2 * eps**3 * KT**5 / (math.e**2 * 2 * NA * E**6)
    print(f"prefactor {pref:.6e} mol/m^3 * J^2 = {pref / 1000:.6e} mol/dm^3 * J^2")
    for z in [1, 2, 3]:
        # numerical check of the same conditions with fsolve
        def eqs(x, z=z):
            logc, h = x
            c = math.exp(logc)
            k = math.sqrt(2 * NA * c * z * z * E**2 / (eps * KT))
            b = 32 * math.pi * eps * (KT / (z * E)) ** 2
            return [(-1e-19 / (12 * h) + b * math.exp(-k * h)) * 1e19,
                    (1e-19 / (12 * h * h) - b * k * math.exp(-k * h)) * 1e10]
        c0 = pref / 1e-38 / z**6
        h0 = 1 / kappa(z * z * c0, epsr)
        sol = optimize.fsolve(eqs, [math.log(c0 * 1.1), h0 * 0.9], xtol=1e-13)
        print(f"z={z}: closed {pref / 1e-38 / z**6:.6e} mol/m^3, fsolve {math.exp(sol[0]):.6e} mol/m^3,"
              f" h {sol[1] / NM:.6f} nm")

    print("# critical ionic strength: barrier (exact Hamaker + LSA, epsr 78.4) equals a criterion")
    for a_, A_, psi, z, crit in [(100 * NM, 1e-20, -0.025, 1, 0.0), (100 * NM, 1e-20, -0.025, 1, 15.0),
                                 (1e-6, 1e-19, -0.5, 1, 0.0), (1e-6, 1e-19, -0.5, 2, 0.0),
                                 (1e-6, 1e-19, -0.5, 3, 0.0), (1e-6, 1e-20, -0.01, 1, 0.0),
                                 (1e-6, 1e-20, -0.01, 2, 0.0), (1e-6, 1e-20, -0.01, 3, 0.0)]:
        def height(log_i, a_=a_, A_=A_, psi=psi, z=z):
            kap = kappa(10**log_i, 78.4)

            def v(h):
                return vdw_exact(a_, h, A_) + edl_lsa(a_, h, psi, kap, 78.4, z=z)
            return barrier(v, 0.2 * NM, max(30 / kap, 50 * NM))[1] / KT
        li = optimize.brentq(lambda x: height(x) - crit, -3, 3.69, xtol=1e-12)
        print(f"a {a_:g} A {A_:g} psi {psi * 1e3:g} mV z {z} criterion {crit} kT:"
              f" I {10**li:.6e} mol/m^3, z:z salt c = I/z^2 {10**li / z**2:.6e} mol/m^3")

    print("# more pairs: barrier (kT, nm), secondary minimum, log10 W Fuchs / Fuchs+Honig")
    print("# pair energy = vdW (exact or Gregory) + EDL (LSA or HHF) + AO, epsr 78.4, 298.15 K,")
    print("# integral from max(0.2 nm, 2 steric): fine trapezoid in ln h to u = 2, adaptive quad beyond")
    cases = [
        # name, a, A, psi, I mol/m^3, retarded, hhf, delta, phi_p, steric
        ("100nm -25mV 1mM", 100e-9, 1e-20, -0.025, 1, False, False, 0, 0, 0),
        ("100nm -25mV 10mM", 100e-9, 1e-20, -0.025, 10, False, False, 0, 0, 0),
        ("100nm -15mV 10mM", 100e-9, 1e-20, -0.015, 10, False, False, 0, 0, 0),
        ("1um -25mV 100mM", 1e-6, 1e-20, -0.025, 100, False, False, 0, 0, 0),
        ("10um -40mV 10mM", 10e-6, 1e-20, -0.040, 10, False, False, 0, 0, 0),
        ("50nm -30mV 0.1mM", 50e-9, 1e-20, -0.030, 0.1, False, False, 0, 0, 0),
        ("100nm -25mV 10mM retarded", 100e-9, 1e-20, -0.025, 10, True, False, 0, 0, 0),
        ("100nm -20mV 5mM HHF", 100e-9, 1e-20, -0.020, 5, False, True, 0, 0, 0),
        ("100nm -25mV 10mM AO 10nm 0.1", 100e-9, 1e-20, -0.025, 10, False, False, 10e-9, 0.1, 0),
        ("100nm 0mV steric 5nm", 100e-9, 1e-20, 0.0, 10, False, False, 0, 0, 5e-9),
        ("100nm A=0 psi=0", 100e-9, 0.0, 0.0, 10, False, False, 0, 0, 0),
    ]
    for name, a_, A_, psi, i_, ret, hhf, delta_, phi_p, steric in cases:
        kap = kappa(i_, 78.4)
        n_p = phi_p / (4 / 3 * math.pi * delta_**3) if delta_ > 0 else 0.0

        def v(h, a_=a_, A_=A_, psi=psi, kap=kap, ret=ret, hhf=hhf, delta_=delta_, n_p=n_p):
            vd = vdw_gregory(a_, h, A_) if ret else vdw_exact(a_, h, A_)
            ed = edl_hhf(a_, h, psi, kap, 78.4) if hhf else edl_lsa(a_, h, psi, kap, 78.4)
            dep = -n_p * KT * ao_overlap(a_, h, delta_) if delta_ > 0 else 0.0
            return vd + ed + dep
        lo = max(0.2 * NM, 2 * steric)
        hi = max(50 * NM, min(30 / kap, 10 * a_), 3 * delta_, 10 * lo)
        hs, vm = barrier(v, lo, hi)
        found = vm > 0 and hs < hi * 0.999
        vmax = vm / KT if found else 0.0
        smin = ""
        if found:
            grid = [hs * (hi / hs) ** (i / 2000) for i in range(2001)]
            j = min(range(len(grid)), key=lambda k: v(grid[k]))
            if 0 < j < 2000 and v(grid[j]) < 0:
                r = optimize.minimize_scalar(v, bounds=(grid[j - 1], grid[j + 1]), method="bounded",
                                             options={"xatol": 1e-16})
                smin = f" min {r.fun / KT:.8g} kT at {r.x / NM:.6f} nm"
        w0 = log10_w(v, a_, False, lo, vmax)
        w1 = log10_w(v, a_, True, lo, vmax)
        bar = f"barrier {vmax:.6f} kT at {hs / NM:.6f} nm" if found else "no barrier"
        print(f"{name}: {bar}{smin}; log10W {w0:.6f} / {w1:.6f}")


if __name__ == "__main__":
    main()
