#!/usr/bin/env python3
"""Reference values for relative risk, odds ratio and the 2 x 2 x K (Mantel-Haenszel) methods.

Run from the repository root:
    python3 tests/OutputForge.Stats.Tests/Oracles/generate_ratio_strata_oracles.py
It writes tests/OutputForge.Stats.Tests/Oracles/ratio_strata_oracles.json with
- relative risk (log / Katz) and odds ratio (Woolf) intervals from statsmodels Table2x2
  (riskratio_confint, oddsratio_confint, method "normal"),
- for each stratified data set: R's mantelhaen.test with and without continuity correction
  (statistic, p-value, Mantel-Haenszel odds ratio and its Robins-Breslow-Greenland interval),
  statsmodels StratifiedTable (test_null_odds, oddsratio_pooled_confint, riskratio_pooled,
  test_equal_odds with and without Tarone's adjustment, on the strata that have both events and
  non-events),
- the R package epiR's epi.2by2 (Mantel-Haenszel relative risk with the Greenland-Robins interval,
  RR.mh.wald, and Mantel-Haenszel risk difference with Sato's variance, ARisk.mh.sato),
and the library versions. Strata are written as (events1, total1, events2, total2). The "rabbits"
set is the penicillin example of Agresti (1990, Categorical Data Analysis, pp. 231-237) used in R's
mantelhaen.test documentation; the others are invented for the tests.
"""
import json
import os
import subprocess

import numpy
import scipy
import statsmodels
from statsmodels.stats.contingency_tables import StratifiedTable, Table2x2

HERE = os.path.dirname(os.path.abspath(__file__))

TWO_GROUPS = [(12, 40, 5, 38), (56, 70, 48, 80), (3, 29, 6, 36), (30, 30, 20, 25), (84, 101, 89, 105), (1, 50, 9, 50)]

STRATA = {
    "invented_three": [(12, 40, 5, 38), (20, 55, 11, 60), (7, 25, 4, 27)],
    "invented_sparse": [(0, 10, 3, 12), (5, 20, 2, 18), (4, 4, 2, 6), (1, 9, 0, 7)],
    "rabbits": [(0, 6, 0, 5), (3, 6, 0, 6), (6, 6, 2, 6), (5, 6, 6, 6), (2, 2, 5, 5)],
    "invented_heterogeneous": [(20, 50, 10, 50), (5, 50, 15, 50), (12, 40, 12, 40), (30, 60, 10, 60)],
}


def table(s):
    e1, n1, e2, n2 = s
    return numpy.array([[e1, n1 - e1], [e2, n2 - e2]], dtype=float)


def r_mantelhaen(strata):
    cells = []
    for e1, n1, e2, n2 in strata:
        cells += [e1, e2, n1 - e1, n2 - e2]
    arr = f"array(c({', '.join(str(c) for c in cells)}), dim = c(2, 2, {len(strata)}))"
    script = (
        f"x <- {arr}; "
        "for (cc in c(FALSE, TRUE)) { t <- mantelhaen.test(x, correct = cc); "
        "cat(sprintf('%.17g %.17g %.17g %.17g %.17g\\n', t$statistic, t$p.value, t$estimate, t$conf.int[1], t$conf.int[2])) }; "
        "cat(R.version.string, '\\n')"
    )
    out = subprocess.run(["Rscript", "-e", script], check=True, capture_output=True, text=True).stdout.strip().splitlines()
    plain, corrected = ([float(v) for v in line.split()] for line in out[:2])
    return plain, corrected, out[2].strip()


def r_epir(strata):
    cells = []
    for e1, n1, e2, n2 in strata:
        cells += [e1, e2, n1 - e1, n2 - e2]
    arr = f"array(c({', '.join(str(c) for c in cells)}), dim = c(2, 2, {len(strata)}))"
    script = (
        "suppressMessages(library(epiR)); "
        f"r <- epi.2by2(as.table({arr}), method = 'cohort.count', units = 1)$massoc.detail; "
        "cat(sprintf('%.17g ', c(unlist(r$RR.mh.wald), unlist(r$ARisk.mh.sato))), '\n'); "
        "cat(as.character(packageVersion('epiR')), '\n')"
    )
    out = subprocess.run(["Rscript", "-e", script], check=True, capture_output=True, text=True).stdout.strip().splitlines()
    values = [float(v) for v in out[0].split()]
    return values, out[1].strip()


def main():
    two = []
    for e1, n1, e2, n2 in TWO_GROUPS:
        t = Table2x2(table((e1, n1, e2, n2)))
        rr_lo, rr_hi = t.riskratio_confint(alpha=0.05, method="normal")
        or_lo, or_hi = t.oddsratio_confint(alpha=0.05, method="normal")
        two.append({"events1": e1, "n1": n1, "events2": e2, "n2": n2,
                    "rr": float(t.riskratio), "rr_lower": float(rr_lo), "rr_upper": float(rr_hi),
                    "or": float(t.oddsratio), "or_lower": float(or_lo), "or_upper": float(or_hi)})
    strata = {}
    r_version = ""
    for name, rows in STRATA.items():
        r_rows = [s for s in rows if s[1] + s[3] >= 2]
        plain, corrected, r_version = r_mantelhaen(r_rows)
        epir, epir_version = r_epir(r_rows)
        st = StratifiedTable([table(s) for s in rows])
        null_plain = st.test_null_odds(correction=False)
        null_corr = st.test_null_odds(correction=True)
        lo, hi = st.oddsratio_pooled_confint(alpha=0.05)
        # The Breslow-Day test is computed on the strata with events and non-events only: a stratum
        # with a zero margin has a degenerate conditional distribution (statsmodels returns NaN).
        informative = StratifiedTable([table(s) for s in rows if 0 < s[0] + s[2] < s[1] + s[3]])
        bd = informative.test_equal_odds(adjust=False)
        tarone = informative.test_equal_odds(adjust=True)
        strata[name] = {
            "strata": [list(s) for s in rows],
            "r_cmh": {"statistic": plain[0], "p": plain[1], "or": plain[2], "or_lower": plain[3], "or_upper": plain[4]},
            "r_cmh_corrected": {"statistic": corrected[0], "p": corrected[1]},
            "epir": {"rr": epir[0], "rr_lower": epir[1], "rr_upper": epir[2],
                     "rd": epir[3], "rd_lower": epir[4], "rd_upper": epir[5]},
            "statsmodels": {
                "cmh_statistic": float(null_plain.statistic), "cmh_p": float(null_plain.pvalue),
                "cmh_corrected_statistic": float(null_corr.statistic), "cmh_corrected_p": float(null_corr.pvalue),
                "or": float(st.oddsratio_pooled), "or_lower": float(lo), "or_upper": float(hi),
                "rr": float(st.riskratio_pooled),
                "breslow_day_statistic": float(bd.statistic), "breslow_day_p": float(bd.pvalue),
                "tarone_statistic": float(tarone.statistic), "tarone_p": float(tarone.pvalue),
            },
        }
    result = {
        "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_ratio_strata_oracles.py",
        "versions": {"scipy": scipy.__version__, "statsmodels": statsmodels.__version__,
                     "numpy": numpy.__version__, "R": r_version, "epiR": epir_version},
        "two_groups": two,
        "strata": strata,
    }
    with open(os.path.join(HERE, "ratio_strata_oracles.json"), "w", encoding="utf-8") as handle:
        json.dump(result, handle, indent=1)
        handle.write("\n")


if __name__ == "__main__":
    main()
