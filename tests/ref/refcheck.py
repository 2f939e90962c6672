"""refcheck.py - the pass/fail bookkeeping shared by the reference tests of
tests/ref/: every failed check is printed and remembered, and finish() exits
non-zero when any failed (one home, instead of a copy per test file).
  check(cond, msg)        record msg as a failure unless cond
  fail(msg)               record msg as a failure
  close(name, ours, ref, rel, abs_tol=0.0, ref_name="reference")
                          |ours - ref| <= abs_tol or <= rel |ref|, both
                          finite (the rule of assert_close, tests/px_test.h);
                          returns the relative difference (the absolute one
                          when ref is 0) for a test that reports the worst
  finish(name)            exit 1 if anything failed, else print that name
                          is ok
  run_lua(phlox, code, work, env=None)
                          run the Lua text code with the phlox program (as
                          work/driver.lua, with env added to the
                          environment) and return the JSON value of its
                          last output line; a failed run ends the test"""
import json
import math
import os
import subprocess
import sys

FAILURES = []


def check(cond, msg):
    if not cond:
        FAILURES.append(msg)
        print("FAIL:", msg)


def fail(msg):
    check(False, msg)


def close(name, ours, ref, rel, abs_tol=0.0, ref_name="reference"):
    d = abs(ours - ref)
    r = d / abs(ref) if ref != 0 else math.inf
    ok = math.isfinite(ours) and math.isfinite(ref) and (d <= abs_tol or d <= rel * abs(ref))
    check(ok, f"{name}: phlox {ours!r} vs {ref_name} {ref!r} (rel {r:.3g})")
    return r if ref != 0 else d


def run_lua(phlox, code, work, env=None):
    path = os.path.join(work, "driver.lua")
    with open(path, "w", encoding="utf-8") as f:
        f.write(code)
    r = subprocess.run([phlox, path], capture_output=True, text=True, env=dict(os.environ, **(env or {})))
    if r.returncode != 0:
        print(r.stdout, r.stderr)
        raise SystemExit("driver failed")
    return json.loads(r.stdout.strip().splitlines()[-1])


def finish(name):
    if FAILURES:
        print("%d failures" % len(FAILURES))
        sys.exit(1)
    print("%s: ok" % name)
