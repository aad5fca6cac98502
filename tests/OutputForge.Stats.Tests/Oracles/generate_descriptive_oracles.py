#!/usr/bin/env python3
"""Reference values for descriptive statistics.

Run from the repository root:
    python3 tests/OutputForge.Stats.Tests/Oracles/generate_descriptive_oracles.py
It writes tests/OutputForge.Stats.Tests/Oracles/descriptive_oracles.json with, for invented data sets,
numpy mean, std (ddof = 1), median, min, max, quartiles by numpy.quantile with
method "averaged_inverted_cdf" (Hyndman and Fan definition 2) and "linear"
(definition 7, R's default), scipy.stats.gmean (positive data only) and 100 * SD / mean,
and the library versions.
"""
import json
import os

import numpy
import scipy
from scipy.stats import gmean

HERE = os.path.dirname(os.path.abspath(__file__))

DATA = {
    "small_odd": [4.2, 1.5, 3.3, 8.9, 2.0, 5.5, 7.1],
    "small_even": [12.0, 15.5, 11.25, 19.0, 14.75, 13.5],
    "ties": [3, 3, 3, 5, 5, 8, 8, 8, 8, 10],
    "with_negatives": [-2.5, 0.0, 1.25, 3.5, -1.0, 4.75, 2.0, -0.5],
    "skewed": [0.8, 1.1, 1.3, 1.9, 2.4, 3.8, 5.9, 9.7, 15.2, 31.0, 64.5],
    "single": [42.0],
    "large_offset": [1000000.1, 1000000.3, 1000000.2, 1000000.5, 1000000.4],
}


def main():
    out = {}
    for name, values in DATA.items():
        x = numpy.array(values, dtype=float)
        row = {
            "values": values,
            "mean": float(numpy.mean(x)),
            "median": float(numpy.median(x)),
            "min": float(numpy.min(x)),
            "max": float(numpy.max(x)),
            "q1_r2": float(numpy.quantile(x, 0.25, method="averaged_inverted_cdf")),
            "q3_r2": float(numpy.quantile(x, 0.75, method="averaged_inverted_cdf")),
            "q1_r7": float(numpy.quantile(x, 0.25, method="linear")),
            "q3_r7": float(numpy.quantile(x, 0.75, method="linear")),
        }
        if len(values) > 1:
            sd = float(numpy.std(x, ddof=1))
            row["sd"] = sd
            row["cv_percent"] = 100 * sd / float(numpy.mean(x))
        if min(values) > 0:
            row["geometric_mean"] = float(gmean(x))
        out[name] = row
    result = {
        "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_descriptive_oracles.py",
        "versions": {"numpy": numpy.__version__, "scipy": scipy.__version__},
        "data": out,
    }
    with open(os.path.join(HERE, "descriptive_oracles.json"), "w", encoding="utf-8") as handle:
        json.dump(result, handle, indent=1)
        handle.write("\n")


if __name__ == "__main__":
    main()
