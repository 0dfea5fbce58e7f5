#!/usr/bin/env python3
"""Reference values for physics.FarFieldPotential (testdata/reference/pb_far_field.py).

Run with the system python3 that has scipy (python3-scipy):

    /usr/bin/python3 testdata/reference/pb_far_field.py

The far field of a flat plate in an ion mixture, computed independently of
the Go code, which integrates the first integral of the Poisson-Boltzmann
equation by quadrature. Here the full second-order equation, in reduced
units y = e psi/kT and X = kappa x,

    y'' = -sum_i c_i z_i exp(-z_i y) / sum_i c_i z_i^2        (Gouy 1910, Chapman 1913)

is integrated with scipy's DOP853 from the linear far field inwards: start
at X = 0 with y = sign*eps, y' = -y (the decaying solution, exact to O(eps)),
integrate towards negative X until y reaches the surface value y0 at X = -L.
The plate at X' = X + L then has y(0) = y0 and y -> sign*eps*exp(L)*exp(-X'),
so y_eff = sign*eps*exp(L).

Checks printed beside the table: the Gouy-Chapman closed form 4 tanh(y0/4)
for 1:1 and (4/z) tanh(z y0/4) for z:z, and the closed form for a 2:1
electrolyte (Ohshima, Theory of Colloid and Interfacial Electric Phenomena,
2006, ch. 1), y_eff = 6 (u - 1)/(u + 1), u = sqrt((2 exp(y0) + 1)/3),
and its mirror image for 1:2.

The printed table is copied into physics/farfield_test.go as [calc] values.
"""
import math

import numpy as np
from scipy.integrate import solve_ivp

# Mixtures: name -> list of (valence, concentration in mol/m^3).
MIXTURES = {
    "NaCl 10 mM": [(1, 10.0), (-1, 10.0)],
    "MgSO4 1 mM": [(2, 1.0), (-2, 1.0)],
    "CaCl2 1 mM": [(2, 1.0), (-1, 2.0)],
    "Na2SO4 1 mM": [(1, 2.0), (-2, 1.0)],
    "AlCl3 1 mM": [(3, 1.0), (-1, 3.0)],
    "Na3PO4 1 mM": [(1, 3.0), (-3, 1.0)],
    "NaCl 10 mM + CaCl2 1 mM": [(1, 10.0), (2, 1.0), (-1, 12.0)],
    "NaCl 5 + CaCl2 2 + MgSO4 1 mM": [(1, 5.0), (2, 2.0), (2, 1.0), (-1, 9.0), (-2, 1.0)],
}

CASES = [
    ("NaCl 10 mM", [-10, -4, -1, 0.5, 1, 4, 10]),
    ("MgSO4 1 mM", [-4, 4]),
    ("CaCl2 1 mM", [-10, -4, -1, 1, 4, 10]),
    ("Na2SO4 1 mM", [-4, 4]),
    ("AlCl3 1 mM", [-10, -4, -1, 1, 4, 10]),
    ("Na3PO4 1 mM", [-4, 4]),
    ("NaCl 10 mM + CaCl2 1 mM", [-4, 4]),
    ("NaCl 5 + CaCl2 2 + MgSO4 1 mM", [-6, -2, 2, 6]),
]


def y_eff(ions, y0):
    z = np.array([v for v, _ in ions], dtype=float)
    c = np.array([cc for _, cc in ions], dtype=float)
    s = float(np.sum(c * z * z))
    sign = 1.0 if y0 > 0 else -1.0
    eps = 1e-9

    def rhs(_x, u):
        y, dy = u
        # sum c z = 0, so sum c z exp(-z y) = sum c z expm1(-z y).
        return [dy, -float(np.sum(c * z * np.expm1(-z * y))) / s]

    def hit(_x, u):
        return u[0] - y0

    hit.terminal = True
    sol = solve_ivp(rhs, (0.0, -80.0), [sign * eps, -sign * eps], method="DOP853",
                    rtol=1e-13, atol=1e-24, events=hit)
    big_l = -sol.t_events[0][0]
    return sign * eps * math.exp(big_l)


def closed_form(name, y0):
    if name == "NaCl 10 mM":
        return 4 * math.tanh(y0 / 4)
    if name == "MgSO4 1 mM":
        return 2 * math.tanh(2 * y0 / 4)
    if name == "CaCl2 1 mM":
        u = math.sqrt((2 * math.exp(y0) + 1) / 3)
        return 6 * (u - 1) / (u + 1)
    if name == "Na2SO4 1 mM":
        u = math.sqrt((2 * math.exp(-y0) + 1) / 3)
        return -6 * (u - 1) / (u + 1)
    return None


def main():
    print("// mixture, y0 = e psi0/kT, y_eff = e psi_eff/kT  [calc] testdata/reference/pb_far_field.py")
    for name, y0s in CASES:
        for y0 in y0s:
            ye = y_eff(MIXTURES[name], y0)
            cf = closed_form(name, y0)
            note = "" if cf is None else f"  // closed form {cf:.10f}, rel diff {abs(ye / cf - 1):.1e}"
            print(f'{{"{name}", {y0}, {ye:.10f}}},{note}')


if __name__ == "__main__":
    main()
