"""test_refcheck.py - the shared bookkeeping of the reference tests
(refcheck.py) on cases with known answers, so a helper that stops failing
cannot hide a test's failure: close passes inside the tolerance (absolute or
relative), fails outside it and on NaN or infinity, returns the difference
it measured; finish exits 1 after a failure; run_lua returns the JSON of a
driver's last line and ends the test when the driver fails.  argv[1] is the
phlox binary."""
import subprocess
import sys
import tempfile

import refcheck
from refcheck import check, close, finish, run_lua

SELF = """
import refcheck
refcheck.close("x", 1.0, 2.0, 0.1)
refcheck.finish("inner")
"""


def main():
    close("relative pass", 1.05, 1.0, 0.1)
    close("absolute pass", 1e-13, 0.0, 0.0, 1e-12)
    n = len(refcheck.FAILURES)
    for args in ((1.2, 1.0, 0.1), (float("nan"), 1.0, 1.0), (float("inf"), 1.0, 1.0),
                 (1.0, float("nan"), 1.0, 1.0)):
        close("must fail", *args)
    failed = len(refcheck.FAILURES) - n
    del refcheck.FAILURES[n:]  # the deliberate failures above are not this test's
    check(failed == 4, f"close fails outside the tolerance and on NaN/inf ({failed} of 4)")
    check(close("ret", 1.1, 1.0, 0.2) == abs(1.1 - 1.0) / 1.0, "close returns the relative difference")
    check(close("ret0", 1e-14, 0.0, 0.0, 1e-12) == 1e-14, "and the absolute one when ref is 0")
    # finish exits 1 after a failure (a child python, this folder on its path)
    here = __file__.rsplit("/", 1)[0] if "/" in __file__ else "."
    r = subprocess.run([sys.executable, "-c", SELF], cwd=here, capture_output=True, text=True)
    check(r.returncode == 1 and "x: phlox 1.0 vs reference 2.0" in r.stdout,
          f"finish exits 1 naming the failure: {r.returncode} {r.stdout!r}")
    # run_lua: the last line's JSON, the environment passed on; a failing driver ends the test
    with tempfile.TemporaryDirectory(prefix="phlox-refcheck-") as work:
        got = run_lua(sys.argv[1], 'print("noise")\nprint(\'{"a": [1, 2.5], "e": "\' .. os.getenv("RC_X") .. \'"}\')\n',
                      work, {"RC_X": "x y"})
        check(got == {"a": [1, 2.5], "e": "x y"}, f"run_lua: {got!r}")
        try:
            run_lua(sys.argv[1], 'error("deliberate")\n', work)
            ended = False
        except SystemExit:
            ended = True
        check(ended, "run_lua ends the test when the driver fails")
    finish("test_refcheck")


if __name__ == "__main__":
    main()
