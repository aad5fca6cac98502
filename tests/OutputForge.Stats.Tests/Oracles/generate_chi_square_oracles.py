#!/usr/bin/env python3
"""Reference values for Yates-corrected and likelihood-ratio chi-square tests.

Run from the repository root:
    python3 tests/OutputForge.Stats.Tests/Oracles/generate_chi_square_oracles.py
It writes tests/OutputForge.Stats.Tests/Oracles/chi_square_oracles.json with
- Yates-corrected 2 x 2 statistics and p-values from scipy.stats.chi2_contingency(correction=True)
  and from R's chisq.test(correct = TRUE) (called through Rscript),
- likelihood-ratio G^2 statistics and p-values from
  scipy.stats.chi2_contingency(correction=False, lambda_="log-likelihood"),
and the library versions. The tables are invented for the tests.
"""
import json
import os
import subprocess

import numpy
import scipy
from scipy.stats import chi2_contingency

HERE = os.path.dirname(os.path.abspath(__file__))

YATES_TABLES = [[12, 5, 3, 14], [25, 75, 40, 60], [3, 1, 1, 3], [10, 10, 11, 10], [1, 30, 9, 20], [120, 80, 90, 110]]
G_TABLES = [
    [[12, 5], [3, 14]],
    [[10, 20, 30], [20, 15, 5]],
    [[5, 8, 12, 9], [7, 3, 6, 10], [4, 9, 2, 11]],
    [[0, 8, 12], [7, 0, 6], [4, 9, 0]],
    [[120, 80], [90, 110], [60, 40]],
]


def r_yates(tables):
    lines = []
    for a, b, c, d in tables:
        lines.append(f"t <- chisq.test(matrix(c({a}, {c}, {b}, {d}), nrow = 2), correct = TRUE)")
        lines.append("cat(sprintf('%.17g %.17g\\n', t$statistic, t$p.value))")
    lines.append("cat(R.version.string, '\\n')")
    out = subprocess.run(["Rscript", "-e", "; ".join(lines)], check=True, capture_output=True, text=True).stdout
    rows = out.strip().splitlines()
    return [tuple(float(v) for v in row.split()) for row in rows[:-1]], rows[-1].strip()


def main():
    r_values, r_version = r_yates(YATES_TABLES)
    yates = []
    for (a, b, c, d), (r_stat, r_p) in zip(YATES_TABLES, r_values):
        stat, p, _, _ = chi2_contingency(numpy.array([[a, b], [c, d]]), correction=True)
        yates.append({"a": a, "b": b, "c": c, "d": d, "scipy_statistic": float(stat), "scipy_p": float(p),
                      "r_statistic": r_stat, "r_p": r_p})
    g = []
    for table in G_TABLES:
        stat, p, df, _ = chi2_contingency(numpy.array(table), correction=False, lambda_="log-likelihood")
        g.append({"table": table, "statistic": float(stat), "p": float(p), "df": int(df)})
    result = {
        "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_chi_square_oracles.py",
        "versions": {"scipy": scipy.__version__, "numpy": numpy.__version__, "R": r_version},
        "yates": yates,
        "likelihood_ratio": g,
    }
    with open(os.path.join(HERE, "chi_square_oracles.json"), "w", encoding="utf-8") as handle:
        json.dump(result, handle, indent=1)
        handle.write("\n")


if __name__ == "__main__":
    main()
