"""Exact p-values of Fisher's exact test in rational arithmetic (Python fractions), for invented tables.

Every table with the observed margins is listed; P(table) is proportional to the integer
prod_i R_i! / prod_ij n_ij! (the multiple hypergeometric numerator up to a constant), and the
p-value is the exact fraction sum{P : P <= P_obs (1 + 1e-7)} / sum{P}, with the 1e-7 relative tie
tolerance of R's fisher.test taken as the exact fraction 1/10^7. Only the final division is rounded
(to the nearest double). Run from the repository root:
    python3 tests/OutputForge.Stats.Tests/Oracles/generate_fisher_rational_oracles.py
It writes tests/OutputForge.Stats.Tests/Oracles/fisher_rational_oracles.json.
"""
import json
import platform
from fractions import Fraction
from math import factorial

TABLES = [
    [[128, 136, 128], [21, 14, 23]],        # completion status by arm, 450 subjects
    [[3, 1, 4], [1, 5, 2]],
    [[40, 52, 47, 38], [12, 5, 9, 17]],     # four categories by two arms, 220 subjects
    [[6, 2], [1, 7], [4, 4], [0, 6]],       # r x 2
    [[5, 1, 3], [2, 6, 1], [1, 2, 7]],      # 3 x 3, 28 subjects
]


def tables_with_margins(rows, columns):
    """Every table with these margins, row by row (each row a composition bounded by the columns left)."""
    if len(rows) == 1:
        yield [list(columns)]
        return
    def compositions(total, caps):
        if len(caps) == 1:
            if total <= caps[0]:
                yield [total]
            return
        for value in range(0, min(total, caps[0]) + 1):
            for rest in compositions(total - value, caps[1:]):
                yield [value] + rest
    for first in compositions(rows[0], columns):
        left = [c - v for c, v in zip(columns, first)]
        for rest in tables_with_margins(rows[1:], left):
            yield [first] + rest


def weight(table):
    denominator = 1
    for row in table:
        for cell in row:
            denominator *= factorial(cell)
    return Fraction(1, denominator)


def p_value(table):
    rows = [sum(r) for r in table]
    columns = [sum(c) for c in zip(*table)]
    observed = weight(table) * (1 + Fraction(1, 10**7))
    total = Fraction(0)
    tail = Fraction(0)
    for candidate in tables_with_margins(rows, columns):
        w = weight(candidate)
        total += w
        if w <= observed:
            tail += w
    return float(tail / total)


out = {
    "versions": {"python": platform.python_version()},
    "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_fisher_rational_oracles.py",
    "fisher_rational": [{"table": t, "p": p_value(t)} for t in TABLES],
}
with open("tests/OutputForge.Stats.Tests/Oracles/fisher_rational_oracles.json", "w") as f:
    json.dump(out, f, indent=1)
    f.write("\n")
