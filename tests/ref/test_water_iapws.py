"""test_water_iapws.py - src/water/ against python3-iapws (Debian package).

The external reference is the Debian package python3-iapws (module `iapws`:
IAPWS95 = IAPWS R6-95, _Dielectric = IAPWS R8-97, _Kw = IAPWS R11-07), run by
/usr/bin/python3.  phlox's values come from the small probe executable
tests/tools/water_probe.c (built next to this test's working directory), so
the test does not depend on the phlox program's Lua bindings.

Checks (tolerances are ours, set from the precision of the two codes: both
evaluate the same formulation in double precision; python3-iapws solves
densities to ~1e-13):
  1. coefficient tables in src/water/*.c equal those carried by python3-iapws
     (one documented difference, see KNOWN_DIFF);
  2. IAPWS R6-95 Table 6 values (from memory of the release) and the same
     derivatives from python3-iapws's own phi0/phir;
  3. a (T, P) grid 25-350 C, psat..1000 bar: density to 1e-6 relative (the
     project's requirement; the observed agreement is ~1e-12), h, s, cp,
     eps, pKw, Debye-Hueckel A and B, saturation pressure and densities;
  4. derivatives (drho/dT, drho/dP, deps/dT, deps/dP, d2eps/dT2, Born Q, Y, X,
     dA/dT, dB/dT) against python3-iapws values differenced with Richardson
     extrapolation.
Usage: test_water_iapws.py [path-of-phlox-binary]  (argv[1] is only used to
locate the probe when the working directory does not hold it).
"""
import math
import os
import re
import subprocess
import sys

from iapws import IAPWS95
from iapws import iapws95 as iapws95_mod
from iapws._iapws import _Dielectric, _Kw

from refcheck import close, fail, finish

M = 18.015268e-3  # kg/mol, IAPWS molar mass (R6-95)
# CODATA 2018 (Tiesinga et al. 2021), as in src/core/constants.h
NA, QE, KB, EPS0 = 6.02214076e23, 1.602176634e-19, 1.380649e-23, 8.8541878128e-12

worst = {}


def check(name, ours, ref, rel, abs_tol=0.0):
    """refcheck.close against python3-iapws, keeping the worst difference per quantity."""
    key = name.split("@")[0]
    worst[key] = max(worst.get(key, 0.0), close(name, ours, ref, rel, abs_tol, "python3-iapws"))


def find_probe():
    cands = [os.path.join(os.getcwd(), "water_probe")]
    if len(sys.argv) > 1:
        cands.append(os.path.join(os.path.dirname(os.path.abspath(sys.argv[1])), "tests",
                                  "water_probe"))
    if os.environ.get("PHLOX_WATER_PROBE"):
        cands.insert(0, os.environ["PHLOX_WATER_PROBE"])
    for c in cands:
        if os.access(c, os.X_OK):
            return c
    sys.exit("water_probe not found (looked in: " + ", ".join(cands) + ")")


PROBE = find_probe()


def probe(requests):
    """Send requests (list of strings) to the probe; return list of (rc, [values])."""
    out = subprocess.run([PROBE], input="".join(r + "\n" for r in requests),
                         capture_output=True, text=True, check=True).stdout.splitlines()
    assert len(out) == len(requests), "probe answered %d of %d" % (len(out), len(requests))
    res = []
    for line in out:
        f = line.split()
        res.append((int(f[0]), [float(x) for x in f[1:]]))
    return res


STATE_FIELDS = ["rho", "drho_dT", "drho_dP", "G", "H", "S", "Cp", "V", "eps", "deps_dT",
                "deps_dP", "d2eps_dT2", "Q", "Y", "X", "A", "B", "dA_dT", "dB_dT"]


def state(T, P):
    rc, v = probe([f"state {T!r} {P!r}"])[0]
    if rc != 0:
        fail(f"state {T} {P}: status {rc}")
        return None
    return dict(zip(STATE_FIELDS, v))


# ---- 1. coefficient tables ---------------------------------------------------
def c_array(src, name):
    m = re.search(r"static const (?:double|int) " + name + r"\[[^\]]*\]\s*=\s*\{([^}]*)\}", src)
    assert m, "array %s not found" % name
    return [float(x) for x in m.group(1).replace("\n", " ").split(",") if x.strip()]


def c_scalar(src, name):
    m = re.search(r"static const double " + name + r"\s*=\s*([-+0-9.eE]+)\s*;", src)
    assert m, "constant %s not found" % name
    return float(m.group(1))


# python3-iapws 1.5.3 carries n14 = -0.4009282892587e-1; the release prints
# -0.40092828925807e-1 (from memory of IAPWS R6-95(2018) Table 2): a dropped
# digit in python3-iapws, 1.6e-12 relative on one term, invisible in any
# property (< 1e-13).  phlox keeps the release value.
KNOWN_DIFF = {("R_N2", 6): 2e-12}


def compare_table(label, ours, theirs):
    if len(ours) != len(theirs):
        fail(f"{label}: {len(ours)} vs {len(theirs)} entries")
        return
    for i, (a, b) in enumerate(zip(ours, theirs)):
        tol = KNOWN_DIFF.get((label, i), 1e-15)
        if abs(a - b) > tol * abs(b):
            fail(f"coefficient {label}[{i}]: {a!r} vs python3-iapws {b!r}")


def test_coefficients():
    srcdir = os.environ.get("PHLOX_SOURCE_DIR",
                            os.path.join(os.path.dirname(__file__), "..", ".."))
    src = open(os.path.join(srcdir, "src", "water", "iapws95.c")).read()
    c = IAPWS95._constants
    compare_table("R_N1", c_array(src, "R_N1"), c["nr1"])
    compare_table("R_D1", c_array(src, "R_D1"), c["d1"])
    compare_table("R_T8/8", [t / 8 for t in c_array(src, "R_T8")], c["t1"])
    compare_table("R_N2", c_array(src, "R_N2"), c["nr2"])
    compare_table("R_C2", c_array(src, "R_C2"), c["c2"])
    compare_table("R_D2", c_array(src, "R_D2"), c["d2"])
    compare_table("R_T2", c_array(src, "R_T2"), c["t2"])
    compare_table("R_N3", c_array(src, "R_N3"), c["nr3"])
    compare_table("R_T3", c_array(src, "R_T3"), c["t3"])
    compare_table("R_BETA3", c_array(src, "R_BETA3"), c["beta3"])
    compare_table("R_GAMMA3", c_array(src, "R_GAMMA3"), c["gamma3"])
    compare_table("R_ALPHA3", [c_scalar(src, "R_ALPHA3")] * 3, c["alfa3"])
    compare_table("R_EPS3", [c_scalar(src, "R_EPS3")] * 3, c["epsilon3"])
    compare_table("R_D3", [3.0] * 3, c["d3"])
    for ours, theirs in [("R_N4", "nr4"), ("R_A4", "a4"), ("R_B4", "b4"), ("R_BB4", "B"),
                         ("R_C4", "C"), ("R_DD4", "D"), ("R_AA4", "A"), ("R_BETA4", "beta4")]:
        compare_table(ours, c_array(src, ours), c[theirs])
    f0 = IAPWS95.Fi0
    compare_table("IG_N1,IG_N2", [c_scalar(src, "IG_N1"), c_scalar(src, "IG_N2")], f0["ao_pow"])
    compare_table("IG_N3", [c_scalar(src, "IG_N3")], [f0["ao_log"][1]])
    compare_table("IG_N", c_array(src, "IG_N"), f0["ao_exp"])
    compare_table("IG_GAMMA", c_array(src, "IG_GAMMA"), f0["titao"])
    compare_table("AUX_A", c_array(src, "AUX_A"), IAPWS95._Pv["ao"])
    compare_table("AUX_B", c_array(src, "AUX_B"), IAPWS95._rhoL["ao"])
    compare_table("AUX_C", c_array(src, "AUX_C"), IAPWS95._rhoG["ao"])
    check("R (J/(kg K))", 461.51805, IAPWS95._constants["R"] / 18.015268e-3, 1e-12)
    # R8-97 coefficients: parsed from python3-iapws's source of _Dielectric
    import inspect
    from iapws import _iapws
    dsrc = inspect.getsource(_iapws._Dielectric)
    n_py = [float(x) for x in re.search(r"n = \[([^\]]*)\]", dsrc).group(1)
            .replace("\n", " ").split(",")]
    dielsrc = open(os.path.join(srcdir, "src", "water", "dielectric.c")).read()
    compare_table("DE_N", c_array(dielsrc, "DE_N"), n_py)
    compare_table("DE_I", c_array(dielsrc, "DE_I"),
                  [1, 1, 1, 2, 3, 3, 4, 5, 6, 7, 10])
    i_py = [float(x) for x in re.search(r"I = \[([^\]]*), None\]", dsrc).group(1).split(",")]
    j_py = [float(x) for x in re.search(r"J = \[([^\]]*), None\]", dsrc).group(1).split(",")]
    compare_table("DE_I(py)", c_array(dielsrc, "DE_I"), i_py)
    compare_table("DE_J", c_array(dielsrc, "DE_J"), j_py)


# ---- 2. Helmholtz derivatives (Table 6) --------------------------------------
TABLE6 = {  # IAPWS R6-95(2018) Table 6, T = 500 K, rho = 838.025 kg/m3 (from memory of the release)
    "phi0": "0.204797733e1", "phi0_d": "0.384236747", "phi0_dd": "-0.147637878",
    "phi0_t": "0.904611106e1", "phi0_tt": "-0.193249185e1", "phi0_dt": "0",
    "phir": "-0.342693206e1", "phir_d": "-0.364366650", "phir_dd": "0.856063701",
    "phir_t": "-0.581403435e1", "phir_tt": "-0.223440737e1", "phir_dt": "-0.112176915e1"}


def half_ulp(printed):
    """Half a unit in the last printed digit of a number written as text."""
    mant, _, ex = printed.lower().partition("e")
    decimals = len(mant.split(".")[1]) if "." in mant else 0
    return 0.5 * 10.0 ** (int(ex or 0) - decimals)


HELM = ["phi0", "phi0_d", "phi0_dd", "phi0_t", "phi0_tt", "phi0_dt",
        "phir", "phir_d", "phir_dd", "phir_t", "phir_tt", "phir_dt"]


def test_helmholtz():
    pts = [(500.0, 838.025), (300.0, 996.556), (623.15, 574.7), (647.0, 358.0), (900.0, 0.241)]
    res = probe([f"helm {T!r} {r!r}" for T, r in pts])
    w = IAPWS95()
    for (T, r), (rc, v) in zip(pts, res):
        if rc != 0:
            fail(f"helm {T} {r}: status {rc}")
            continue
        ours = dict(zip(HELM, v))
        tau, delta = 647.096 / T, r / 322.0
        p0, pr = w._phi0(tau, delta), w._phir(tau, delta)
        ref = {"phi0": p0["fio"], "phi0_d": p0["fiod"], "phi0_dd": p0["fiodd"],
               "phi0_t": p0["fiot"], "phi0_tt": p0["fiott"], "phi0_dt": p0["fiodt"],
               "phir": pr["fir"], "phir_d": pr["fird"], "phir_dd": pr["firdd"],
               "phir_t": pr["firt"], "phir_tt": pr["firtt"], "phir_dt": pr["firdt"]}
        for k in HELM:
            check(f"{k}@{T},{r}", ours[k], ref[k], 1e-11, 1e-13)
        if (T, r) == (500.0, 838.025):
            for k in HELM:  # to the printed digits
                t6 = float(TABLE6[k])
                check(f"Table6 {k}", ours[k], t6, 0, half_ulp(TABLE6[k]) * (1 + 1e-9))
                check(f"Table6(python3-iapws) {k}", ref[k], t6, 0,
                      half_ulp(TABLE6[k]) * (1 + 1e-9))


# ---- 3. the (T, P) grid --------------------------------------------------------
def grid():
    pts = []
    sats = probe([f"sat {t + 273.15!r}" for t in range(25, 351, 25)])
    for t, (rc, v) in zip(range(25, 351, 25), sats):
        T = t + 273.15
        if rc != 0:
            fail(f"sat {T}: status {rc}")
            continue
        ps = v[0]
        for P in [ps * (1 + 1e-6), 1.0, 10.0, 50.0, 100.0, 250.0, 500.0, 750.0, 1000.0]:
            if P >= ps:
                pts.append((T, P))
    return pts


def dh(rho, eps, T):
    """Debye-Hueckel A (log10) and B (1/Angstrom), CODATA 2018 constants."""
    b = math.sqrt(2 * NA * QE**2 * rho / (EPS0 * eps * KB * T))
    a = b * QE**2 / (8 * math.pi * EPS0 * eps * KB * T * math.log(10))
    return a, b * 1e-10


def test_saturation():
    Ts = [273.16, 298.15, 373.15, 473.15, 573.15, 623.15, 640.0]
    res = probe([f"sat {T!r}" for T in Ts])
    w = IAPWS95()
    for T, (rc, v) in zip(Ts, res):
        if rc != 0:
            fail(f"sat {T}: status {rc}")
            continue
        rl, rv, ps = w._saturation(T)  # python3-iapws: fsolve on the same conditions
        check(f"psat@{T}", v[0], ps / 100, 1e-9)  # python3-iapws gives kPa here
        check(f"rho_liq_sat@{T}", v[1], rl, 1e-9)
        check(f"rho_vap_sat@{T}", v[2], rv, 1e-8)


def test_grid():
    pts = grid()
    res = probe([f"state {T!r} {P!r}" for T, P in pts])
    n = 0
    for (T, P), (rc, v) in zip(pts, res):
        if rc != 0:
            fail(f"state {T} {P}: status {rc}")
            continue
        s = dict(zip(STATE_FIELDS, v))
        w = IAPWS95(T=T, P=P / 10)
        if w.phase != "Liquid" and w.x != 0:
            fail(f"python3-iapws did not return liquid at {T} K {P} bar ({w.phase})")
            continue
        tag = f"@{T:.2f}K,{P:.6g}bar"
        check("rho (required 1e-6)" + tag, s["rho"], w.rho, 1e-6)
        check("rho" + tag, s["rho"], w.rho, 1e-10)
        check("H" + tag, s["H"] / M / 1e3, w.h, 1e-9, 1e-9)
        check("S" + tag, s["S"] / M / 1e3, w.s, 1e-9, 1e-12)
        check("G" + tag, s["G"] / M / 1e3, w.h - T * w.s, 1e-9, 1e-9)
        check("Cp" + tag, s["Cp"] / M / 1e3, w.cp, 1e-9)
        check("V" + tag, s["V"], M / w.rho * 1e5, 1e-10)
        check("drho_dT" + tag, s["drho_dT"], -w.rho * w.alfav, 1e-8)
        check("drho_dP" + tag, s["drho_dP"], w.rho * w.kappa / 10, 1e-8)
        eps = _Dielectric(w.rho, T)
        check("eps" + tag, s["eps"], eps, 1e-10)
        a, b = dh(w.rho, eps, T)
        check("A" + tag, s["A"], a, 1e-10)
        check("B" + tag, s["B"], b, 1e-10)
        rc2, (pkw,) = probe([f"pkw {T!r} {s['rho']!r}"])[0]
        check("pKw" + tag, pkw, _Kw(w.rho, T), 0, 1e-9)
        n += 1
    return n


# ---- 4. derivatives by differences of python3-iapws ---------------------------
def ref_point(T, P):
    w = IAPWS95(T=T, P=P / 10)
    e = _Dielectric(w.rho, T)
    a, b = dh(w.rho, e, T)
    return w.rho, e, a, b


def rich1(f, x, h):
    """Richardson-extrapolated central first derivative (error O(h^4))."""
    d1 = (f(x + h) - f(x - h)) / (2 * h)
    d2 = (f(x + h / 2) - f(x - h / 2)) / h
    return (4 * d2 - d1) / 3


def rich2(f, x, h):
    """Richardson-extrapolated central second derivative (error O(h^4))."""
    f0 = f(x)
    d1 = (f(x + h) - 2 * f0 + f(x - h)) / h**2
    d2 = (f(x + h / 2) - 2 * f0 + f(x - h / 2)) / (h / 2) ** 2
    return (4 * d2 - d1) / 3


def test_derivatives():
    pts = [(298.15, 1.0), (298.15, 500.0), (373.15, 5.0), (473.15, 100.0), (473.15, 1000.0),
           (573.15, 150.0), (623.15, 200.0), (623.15, 1000.0)]
    hT = 0.2
    for T, P in pts:
        ps = probe([f"sat {T!r}"])[0][1][0]
        hP = min(2.0, 0.25 * (P - ps))  # the stencil stays above psat
        s = state(T, P)
        if s is None:
            continue
        tag = f"@{T}K,{P}bar"
        cache = {}

        def at(t, p):
            k = (t, p)
            if k not in cache:
                cache[k] = ref_point(t, p)
            return cache[k]
        e0 = at(T, P)[1]
        de_dT = rich1(lambda t: at(t, P)[1], T, hT)
        de_dP = rich1(lambda p: at(T, p)[1], P, hP)
        d2e = rich2(lambda t: at(t, P)[1], T, hT)
        check("deps_dT" + tag, s["deps_dT"], de_dT, 1e-7)
        check("deps_dP" + tag, s["deps_dP"], de_dP, 1e-7)
        check("d2eps_dT2" + tag, s["d2eps_dT2"], d2e, 1e-5)
        check("Y" + tag, s["Y"], de_dT / e0**2, 1e-7)
        check("Q" + tag, s["Q"], de_dP / e0**2, 1e-7)
        check("X" + tag, s["X"], (d2e - 2 / e0 * de_dT**2) / e0**2, 1e-5)
        check("dA_dT" + tag, s["dA_dT"], rich1(lambda t: at(t, P)[2], T, hT), 1e-7)
        check("dB_dT" + tag, s["dB_dT"], rich1(lambda t: at(t, P)[3], T, hT), 1e-7)


def main():
    test_coefficients()
    test_helmholtz()
    test_saturation()
    n = test_grid()
    test_derivatives()
    print(f"water vs python3-iapws: {n} grid points (25-350 C, psat..1000 bar)")
    for k in sorted(worst):
        print(f"  worst relative difference {k:28s} {worst[k]:.2e}")
    finish("water vs python3-iapws")


if __name__ == "__main__":
    main()
