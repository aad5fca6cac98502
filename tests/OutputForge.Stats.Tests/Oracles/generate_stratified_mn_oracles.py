#!/usr/bin/env python3
"""Reference values for the stratified Miettinen-Nurminen score interval of a common risk difference.

Run from the repository root:
    /usr/bin/python3 tests/OutputForge.Stats.Tests/Oracles/generate_stratified_mn_oracles.py
It writes tests/OutputForge.Stats.Tests/Oracles/stratified_mn_oracles.json.

This is the project's own second implementation, written from Miettinen and Nurminen (1985), Stat Med
4:213-226 (stratified score statistic with weights w_k = n1k n2k / (n1k + n2k) and the variance factor
N_k / (N_k - 1)); it is NOT an external reference. It shares no code with the C# implementation and
differs from it on purpose in each numerical step:
- the restricted maximum likelihood estimates come from the score equation written as a cubic in p2
  (not the closed-form trigonometric root in p1 used in C#): with p1 = p2 + delta,
  (y1 - n1 p1) p2 (1 - p2) + (y2 - n2 p2) p1 (1 - p1) = 0, solved by numpy.roots; the admissible
  real roots and the two ends of the admissible range are compared by the log-likelihood and the
  largest is kept;
- the limits are found with scipy.optimize.brentq (not bisection) on Z(delta) -/+ z.
No R package implementing the stratified Miettinen-Nurminen interval is available as a Debian package
here (apt-cache policy finds none), so there is no external oracle for K > 1; K = 1 is checked in the
C# tests against the unstratified interval, which is itself checked against Newcombe (1998) Table II.

The tables are drawn with a fixed seed: 300 random 2 x 2 x K tables (K from 1 to 6, stratum sizes from
0 to 40 per group, so that empty groups, zero and full cells occur), followed by hand-written edge cases.
"""
import json
import math
import os
import random

import numpy
import scipy
import scipy.optimize
from scipy.stats import norm

HERE = os.path.dirname(os.path.abspath(__file__))
Z95 = norm.ppf(0.975)


def loglik(p1, p2, y1, n1, y2, n2):
    def term(count, p):
        if count == 0:
            return 0.0
        if p <= 0:
            return -math.inf
        return count * math.log(p)
    return term(y1, p1) + term(n1 - y1, 1 - p1) + term(y2, p2) + term(n2 - y2, 1 - p2)


def restricted(delta, y1, n1, y2, n2):
    """p2 maximising the binomial likelihood subject to p1 = p2 + delta; returns (p1, p2)."""
    lo, hi = max(0.0, -delta), min(1.0, 1.0 - delta)
    P = numpy.polynomial.Polynomial
    p2 = P([0, 1])
    p1 = p2 + delta
    poly = (y1 - n1 * p1) * p2 * (1 - p2) + (y2 - n2 * p2) * p1 * (1 - p1)
    candidates = [lo, hi]
    coefficients = poly.coef
    if numpy.any(numpy.abs(coefficients) > 0):
        for root in numpy.roots(coefficients[::-1]):
            if abs(root.imag) < 1e-9 and lo - 1e-12 <= root.real <= hi + 1e-12:
                candidates.append(min(hi, max(lo, root.real)))
    best = max(candidates, key=lambda q: loglik(q + delta, q, y1, n1, y2, n2))
    return best + delta, best


def statistic(delta, strata):
    num = 0.0
    var = 0.0
    for y1, n1, y2, n2 in strata:
        w = n1 * n2 / (n1 + n2)
        num += w * (y1 / n1 - y2 / n2 - delta)
        r1, r2 = restricted(delta, y1, n1, y2, n2)
        n = n1 + n2
        var += w * w * (r1 * (1 - r1) / n1 + r2 * (1 - r2) / n2) * n / (n - 1)
    if num == 0:
        return 0.0
    if var <= 0:
        return math.inf if num > 0 else -math.inf
    return num / math.sqrt(var)


def interval(strata, z=Z95):
    used = [s for s in strata if s[1] > 0 and s[3] > 0]
    skipped = [i + 1 for i, s in enumerate(strata) if not (s[1] > 0 and s[3] > 0)]
    if not used:
        return {"estimable": False, "skipped": skipped}
    wsum = sum(n1 * n2 / (n1 + n2) for _, n1, _, n2 in used)
    est = sum(n1 * n2 / (n1 + n2) * (y1 / n1 - y2 / n2) for y1, n1, y2, n2 in used) / wsum

    def finite(v):
        return max(-1e12, min(1e12, v))

    def limit(target, a, b, outer):
        f = lambda d: finite(statistic(d, used)) - target
        if (target > 0 and f(outer) <= 0) or (target < 0 and f(outer) >= 0):
            return outer
        return scipy.optimize.brentq(f, a, b, xtol=1e-14, rtol=1e-15, maxiter=500)

    lower = limit(z, -1.0, est, -1.0)
    upper = limit(-z, est, 1.0, 1.0)
    return {"estimable": True, "estimate": est, "lower": lower, "upper": upper, "skipped": skipped}


def random_tables(rng, count):
    tables = []
    for _ in range(count):
        k = rng.randint(1, 6)
        strata = []
        for _ in range(k):
            n1 = rng.choice([0, 1, 2, 3, 5, 8, 12, 20, 30, 40]) if rng.random() < 0.15 else rng.randint(1, 40)
            n2 = rng.choice([0, 1, 2]) if rng.random() < 0.08 else rng.randint(1, 40)
            p1 = rng.choice([0.0, 1.0, rng.random()]) if rng.random() < 0.2 else rng.random()
            p2 = rng.choice([0.0, 1.0, rng.random()]) if rng.random() < 0.2 else rng.random()
            y1 = sum(1 for _ in range(n1) if rng.random() < p1)
            y2 = sum(1 for _ in range(n2) if rng.random() < p2)
            strata.append([y1, n1, y2, n2])
        tables.append(strata)
    return tables


EDGE_CASES = [
    [[0, 10, 0, 20]],                                  # Miettinen-Nurminen example 5, one stratum
    [[56, 70, 48, 80]],                                # Newcombe (1998) Table II (a), one stratum
    [[0, 10, 0, 10], [0, 15, 0, 12]],                  # no events anywhere
    [[10, 10, 12, 12], [8, 8, 5, 5]],                  # every subject an event
    [[10, 10, 0, 10], [7, 7, 0, 9]],                   # complete separation: estimate 1
    [[0, 10, 6, 6], [0, 5, 4, 4]],                     # complete separation: estimate -1
    [[3, 5, 1, 6], [0, 0, 2, 4], [1, 3, 0, 0]],    # empty groups in two strata
    [[1, 1, 0, 1], [0, 1, 1, 1], [1, 1, 1, 1]],        # strata of two subjects
    [[20, 50, 10, 50], [5, 50, 15, 50], [12, 40, 12, 40], [30, 60, 10, 60]],
]


def main():
    rng = random.Random(20261202)
    cases = []
    for strata in random_tables(rng, 300) + EDGE_CASES + [[[0, 0, 1, 3], [2, 4, 0, 0]]]:
        result = interval(strata)
        cases.append({"strata": strata, **result})
    with open(os.path.join(HERE, "stratified_mn_oracles.json"), "w") as f:
        json.dump({
            "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_stratified_mn_oracles.py",
            "kind": "own independent reimplementation from Miettinen and Nurminen (1985); not an external reference",
            "level": 0.95,
            "versions": {"numpy": numpy.__version__, "scipy": scipy.__version__},
            "cases": cases,
        }, f, indent=1)
        f.write("\n")


if __name__ == "__main__":
    main()
