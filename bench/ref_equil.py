#!/usr/bin/python3
"""Fair reference solve for bench_equil: the same speciation equations
(basis-species mass action, mass balances, Davies activity coefficients
with I = 1/2 sum z^2 m, ln a_w = -M_w sum m, saturation of the solids the
C solver found present) handed to SciPy's general root finder
(scipy.optimize.root, MINPACK 'hybr') with the residual vectorised in NumPy
and the analytic Jacobian (no finite differences), warm-started from the
previous point, on the same points the C solver's same-row timing uses.
With argv[2] == "check", compares the analytic Jacobian with central
differences at the first point and exits.

argv[1]: JSON written by bench/bench_equil.c.  Prints one line
  REF <solves per CPU-second> <max |d log a| vs the C solver> <converged> <points>
"""
import json
import math
import sys
import time

import numpy as np
from scipy.optimize import root

LN10 = math.log(10.0)
MW = 0.01801528  # kg/mol, molar mass of water (IUPAC standard atomic weights)
I_FLOOR = 1e-20  # as PX_EQUIL_I_FLOOR in src/equil/equil_internal.h
DAVIES_LINEAR = 0.3  # Davies 1962


def main():
    d = json.load(open(sys.argv[1]))
    nb = d["nb"]
    A = d["A"]
    sp = d["species"]
    nu = np.array([s["nu"] for s in sp], dtype=float)
    logk = np.array([s["logk"] for s in sp])
    z = np.array([s["z"] for s in sp])
    phase = np.array([s["phase"] for s in sp])  # 0 aq, 1 solid, 2 gas, 3 water, 4 electron
    tot = np.array(d["totals"])
    aq = phase == 0
    W = int(np.where(phase[:nb] == 3)[0][0])
    E = int(np.where(phase[:nb] == 4)[0][0])
    H = 1
    mass = [i for i in range(nb) if i not in (W, E, H)]
    nm = len(mass)

    # nu with the basis rows as identity (as the C solver reads it), so
    # log a = logk + N @ log a(basis) holds for every species
    N = nu.copy()
    N[:nb] = np.eye(nb)
    L = logk.copy()
    L[:nb] = 0.0
    mass = np.array(mass)
    Nm = N[:, mass]          # d log a / d u (mass basis), every species
    NW = N[:, W]             # d log a / d log a_w
    numT = nu[:, mass].T     # mass-balance rows
    tm = tot[mass]
    z2 = z * z
    charged = aq & (z != 0)

    def unpack(u, ph, pe):
        """log a, log m, m, I and d(log m)/d(log I) of every species (vectorised)."""
        x = u[nm]
        I = 10.0 ** x
        s = math.sqrt(I)
        g = np.where(charged, -A * z2 * (s / (1 + s) - DAVIES_LINEAR * I), 0.0)
        # Davies 1962: d/dI [s/(1+s) - 0.3 I] = 1/(2 s (1+s)^2) - 0.3; d I / d x = I ln 10
        gp = np.where(charged, -A * z2 * (0.5 / (s * (1 + s) ** 2) - DAVIES_LINEAR) * I * LN10, 0.0)
        la_b = np.zeros(nb)
        la_b[W] = u[nm + 1]
        la_b[H] = -ph
        la_b[E] = -pe
        la_b[mass] = u[:nm] + g[mass]
        la = L + N @ la_b
        lm = np.where(aq, la - g, -999.0)
        m = np.where(aq, 10.0 ** np.minimum(lm, 300.0), 0.0)
        dlm_dx = Nm @ gp[mass] - gp
        return la, lm, m, I, dlm_dx, gp

    def make_f(ph, pe, solids):
        solids = np.array(solids, dtype=int)
        nsol = len(solids)
        nus = nu[solids][:, mass].T if nsol else np.zeros((nm, 0))
        n = nm + 2 + nsol

        def f(u):
            la, lm, m, I, _, _ = unpack(u, ph, pe)
            r = np.empty(n)
            r[:nm] = (numT @ m + nus @ u[nm + 2:] - tm) / tm
            r[nm] = (I - I_FLOOR - 0.5 * (z2 @ m)) / I
            r[nm + 1] = u[nm + 1] + MW * m.sum() / LN10
            r[nm + 2:] = la[solids]
            return r

        def jac(u):
            la, lm, m, I, dlm_dx, gp = unpack(u, ph, pe)
            dm = m * LN10                      # d m / d log m
            dmu = dm[:, None] * Nm             # d m / d u (mass basis)
            dmx = dm * dlm_dx                  # d m / d log I
            dmw = dm * NW                      # d m / d log a_w
            J = np.zeros((n, n))
            J[:nm, :nm] = (numT @ dmu) / tm[:, None]
            J[:nm, nm] = (numT @ dmx) / tm
            J[:nm, nm + 1] = (numT @ dmw) / tm
            J[:nm, nm + 2:] = nus / tm[:, None]
            J[nm, :nm] = -0.5 * (z2 @ dmu) / I
            J[nm, nm] = (I_FLOOR + 0.5 * (z2 @ m)) / I * LN10 - 0.5 * (z2 @ dmx) / I
            J[nm, nm + 1] = -0.5 * (z2 @ dmw) / I
            J[nm + 1, :nm] = MW / LN10 * (dm @ Nm)
            J[nm + 1, nm] = MW / LN10 * (dm @ dlm_dx)
            J[nm + 1, nm + 1] = 1.0 + MW / LN10 * (dm @ NW)
            if nsol:
                J[nm + 2:, :nm] = Nm[solids]
                J[nm + 2:, nm] = Nm[solids] @ gp[mass]
                J[nm + 2:, nm + 1] = NW[solids]
            return J

        return f, jac

    pts = d["points"]
    if len(sys.argv) > 2 and sys.argv[2] == "check":
        p = pts[0]
        f, jac = make_f(p["ph"], p["pe"], p["solids"])
        lmc = np.array(p["lm"])
        u0 = np.concatenate([lmc[mass], [math.log10(max(p["I"], 1e-20)), p["la"][W]], np.full(len(p["solids"]), 1e-4)])
        J = jac(u0)
        h = 1e-6
        Jn = np.column_stack([(f(u0 + h * e) - f(u0 - h * e)) / (2 * h) for e in np.eye(len(u0))])
        print("JACOBIAN max |analytic - central difference| = %.3g (scale %.3g)" % (np.max(np.abs(J - Jn)), np.max(np.abs(Jn))))
        return
    u = None
    prev_solids = None
    ok = 0
    dev = 0.0
    elapsed = 0.0
    for p in pts:
        solids = p["solids"]
        lac = np.array(p["la"])
        if u is None or solids != prev_solids:
            # start (or restart when the set of solids changes) from the C answer,
            # with solid amounts from its mass balance left to the root finder
            u = np.zeros(nm + 2 + len(solids))
            lmc = np.array(p["lm"])
            for k, i in enumerate(mass):
                u[k] = lmc[i]
            u[nm] = math.log10(max(p["I"], 1e-20))
            u[nm + 1] = lac[W]
        f, jac = make_f(p["ph"], p["pe"], solids)
        t0 = time.process_time()
        sol = root(f, u, jac=jac, method="hybr", options={"xtol": 1e-12})
        elapsed += time.process_time() - t0
        if sol.success and np.max(np.abs(f(sol.x))) < 1e-8:
            ok += 1
            u = sol.x
            la = unpack(u, p["ph"], p["pe"])[0]
            sel = aq & (lac > -300)
            dev = max(dev, float(np.max(np.abs(la[sel] - lac[sel]))))
        prev_solids = solids
    print("REF %.6g %.6g %d %d" % (len(pts) / elapsed, dev, ok, len(pts)))


if __name__ == "__main__":
    main()
