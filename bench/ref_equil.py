#!/usr/bin/python3
"""Plain reference solve for bench_equil: the same speciation equations
(basis-species mass action, mass balances, Davies activity coefficients
with I = 1/2 sum z^2 m, ln a_w = -M_w sum m, saturation of the solids the
C solver found present) handed to SciPy's general root finder
(scipy.optimize.root, MINPACK 'hybr'), warm-started from the previous point.

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

    def unpack(u, ph, pe):
        la_b = np.zeros(nb)
        x = u[nm]
        I = 10.0 ** x
        s = math.sqrt(I)
        g = np.where(aq & (z != 0), -A * z * z * (s / (1 + s) - DAVIES_LINEAR * I), 0.0)
        la_b[W] = u[nm + 1]
        la_b[H] = -ph
        la_b[E] = -pe
        for k, i in enumerate(mass):
            la_b[i] = u[k] + g[i]
        la = logk + nu @ la_b
        la[:nb] = la_b
        lm = np.where(aq, la - g, -999.0)
        m = np.where(aq, 10.0 ** np.minimum(lm, 300.0), 0.0)
        return la, lm, m, I

    def make_f(ph, pe, solids):
        def f(u):
            la, lm, m, I = unpack(u, ph, pe)
            r = []
            for k, i in enumerate(mass):
                s = nu[:, i] @ m + sum(nu[j, i] * u[nm + 2 + q] for q, j in enumerate(solids))
                r.append((s - tot[i]) / tot[i])
            r.append((I - I_FLOOR - 0.5 * (z * z) @ m) / I)
            r.append(u[nm + 1] + MW * m[aq].sum() / LN10)
            for j in solids:
                r.append(la[j])
            return np.array(r)
        return f

    pts = d["points"]
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
        f = make_f(p["ph"], p["pe"], solids)
        t0 = time.process_time()
        sol = root(f, u, method="hybr", options={"xtol": 1e-12})
        elapsed += time.process_time() - t0
        if sol.success and np.max(np.abs(f(sol.x))) < 1e-8:
            ok += 1
            u = sol.x
            la, _, _, _ = unpack(u, p["ph"], p["pe"])
            sel = aq & (lac > -300)
            dev = max(dev, float(np.max(np.abs(la[sel] - lac[sel]))))
        prev_solids = solids
    print("REF %.6g %.6g %d %d" % (len(pts) / elapsed, dev, ok, len(pts)))


if __name__ == "__main__":
    main()
