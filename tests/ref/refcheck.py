"""refcheck.py - the pass/fail bookkeeping shared by the reference tests of
tests/ref/: every failed check is printed and remembered, and finish() exits
non-zero when any failed (one home, instead of a copy per test file)."""
import sys

FAILURES = []


def check(cond, msg):
    if not cond:
        FAILURES.append(msg)
        print("FAIL:", msg)


def finish(name):
    if FAILURES:
        print("%d failures" % len(FAILURES))
        sys.exit(1)
    print("%s: ok" % name)
