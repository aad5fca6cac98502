#!/usr/bin/env python3
"""Reference values for the categorical statistics tests.

Run from the repository root:
    python3 tests/OutputForge.Stats.Tests/Oracles/generate_proportion_table_oracles.py
It writes tests/OutputForge.Stats.Tests/Oracles/proportion_table_oracles.json with
- Fisher's exact test two-sided p-values for 2 x 2 tables from scipy.stats.fisher_exact and from
  R's fisher.test (called through Rscript),
- single-proportion intervals from statsmodels.stats.proportion.proportion_confint
  (agresti_coull, jeffreys, beta = Clopper-Pearson, wilson, normal = Wald),
- difference intervals from statsmodels.stats.proportion.confint_proportions_2indep
  (wald, agresti-caffo, newcomb; its "score" method is not used, see the tests),
- Pearson chi-square statistics and p-values from scipy.stats.chi2_contingency(correction=False),
and the versions of every library used.
"""
import json
import os
import subprocess

import numpy
import scipy
import statsmodels
from scipy.stats import chi2_contingency, fisher_exact
from statsmodels.stats.proportion import confint_proportions_2indep, proportion_confint

HERE = os.path.dirname(os.path.abspath(__file__))

FISHER_TABLES = [
    [3, 1, 1, 3],      # Fisher's tea-tasting layout
    [1, 9, 11, 3],
    [0, 10, 10, 0],
    [0, 5, 0, 7],
    [2, 7, 8, 2],
    [10, 10, 10, 10],
    [12, 5, 3, 14],
    [0, 20, 5, 15],
    [1, 0, 0, 1],
    [25, 75, 40, 60],
    [7, 27, 1, 33],
    [120, 80, 90, 110],
    [5, 0, 1, 4],
    [50, 2, 40, 9],
]

PROPORTIONS = [(81, 263), (15, 148), (0, 20), (1, 29), (29, 29), (5, 25), (1, 1), (37, 43), (250, 533), (3, 10)]
LEVELS = [0.95, 0.90, 0.99]

DIFFERENCES = [(56, 70, 48, 80), (9, 10, 3, 10), (6, 7, 2, 7), (5, 56, 0, 29), (0, 10, 0, 20),
               (0, 10, 0, 10), (10, 10, 0, 20), (10, 10, 0, 10), (84, 101, 89, 105), (3, 29, 6, 36)]

CHI_TABLES = [
    [[12, 5], [3, 14]],
    [[25, 75], [40, 60]],
    [[10, 20, 30], [20, 15, 5]],
    [[5, 8, 12, 9], [7, 3, 6, 10], [4, 9, 2, 11]],
    [[120, 80], [90, 110], [60, 40]],
    [[1, 200], [30, 40]],
]


def r_fisher(tables):
    lines = ["options(digits = 17)"]
    for a, b, c, d in tables:
        lines.append(
            f"cat(sprintf('%.17g\\n', fisher.test(matrix(c({a}, {c}, {b}, {d}), nrow = 2))$p.value))"
        )
    lines.append("cat(R.version.string, '\\n')")
    out = subprocess.run(["Rscript", "-e", "; ".join(lines)], check=True, capture_output=True, text=True).stdout
    rows = out.strip().splitlines()
    return [float(v) for v in rows[:-1]], rows[-1].strip()


def main():
    r_p, r_version = r_fisher(FISHER_TABLES)
    fisher = []
    for (a, b, c, d), rp in zip(FISHER_TABLES, r_p):
        _, sp = fisher_exact([[a, b], [c, d]], alternative="two-sided")
        fisher.append({"a": a, "b": b, "c": c, "d": d, "scipy_p": float(sp), "r_p": rp})

    methods = {"AgrestiCoull": "agresti_coull", "Jeffreys": "jeffreys", "ClopperPearson": "beta",
               "Wilson": "wilson", "Wald": "normal"}
    proportions = []
    for x, n in PROPORTIONS:
        for level in LEVELS:
            for ours, theirs in methods.items():
                lo, hi = proportion_confint(x, n, alpha=1 - level, method=theirs)
                proportions.append({"events": x, "n": n, "level": level, "method": ours,
                                    "lower": float(lo), "upper": float(hi)})

    differences = []
    for x1, n1, x2, n2 in DIFFERENCES:
        for ours, theirs in {"Wald": "wald", "AgrestiCaffo": "agresti-caffo", "Newcombe": "newcomb"}.items():
            lo, hi = confint_proportions_2indep(x1, n1, x2, n2, method=theirs, compare="diff", alpha=0.05)
            differences.append({"events1": x1, "n1": n1, "events2": x2, "n2": n2, "method": ours,
                                "lower": float(lo), "upper": float(hi)})

    chi = []
    for table in CHI_TABLES:
        stat, p, df, _ = chi2_contingency(numpy.array(table), correction=False)
        chi.append({"table": table, "statistic": float(stat), "p": float(p), "df": int(df)})

    result = {
        "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_proportion_table_oracles.py",
        "versions": {"scipy": scipy.__version__, "statsmodels": statsmodels.__version__,
                     "numpy": numpy.__version__, "R": r_version},
        "fisher_2x2": fisher,
        "proportion_confint": proportions,
        "difference_confint": differences,
        "chi_square": chi,
    }
    with open(os.path.join(HERE, "proportion_table_oracles.json"), "w", encoding="utf-8") as handle:
        json.dump(result, handle, indent=1)
        handle.write("\n")


if __name__ == "__main__":
    main()
