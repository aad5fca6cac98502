# Reference adjusted p-values from R's p.adjust (stats package of R 4.2.2; methods "bonferroni", "holm",
# "hochberg", "hommel") on invented p-value vectors, ties, zeros and p = 1 among them.
# Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_multiplicity_oracles.R
# It writes tests/OutputForge.Stats.Tests/Oracles/multiplicity_oracles.json with the R version.
# No Debian package offers the graphical approach of Bretz et al. (2009) (multcomp 1.4-22 has none; gMCP and
# graphicalMCP are not packaged), so the graphical procedure is checked against the paper's examples instead.
fmt <- function(x) paste0("[", paste(sprintf("%.17g", x), collapse = ", "), "]")
vectors <- list(
  distinct = c(0.01, 0.04, 0.03, 0.005),
  ties = c(0.02, 0.02, 0.04, 0.01, 0.04),
  with_zero_and_one = c(0, 1, 0.2, 0.011, 0.03, 1),
  single = c(0.03),
  all_large = c(0.5, 0.8, 0.3, 0.9),
  hommel_gains = c(0.012, 0.019, 0.021, 0.04, 0.2),
  ten = c(0.0001, 0.004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.3240)
)
set.seed(20261204)
vectors$random_twelve <- round(sort(runif(12)^3), 5)[sample(12)]
cases <- character(0)
for (name in names(vectors)) {
  p <- vectors[[name]]
  cases <- c(cases, sprintf('    {"name": "%s", "p": %s, "bonferroni": %s, "holm": %s, "hochberg": %s, "hommel": %s}',
    name, fmt(p), fmt(p.adjust(p, "bonferroni")), fmt(p.adjust(p, "holm")), fmt(p.adjust(p, "hochberg")), fmt(p.adjust(p, "hommel"))))
}
out <- paste0('{\n  "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_multiplicity_oracles.R",\n',
  '  "r_version": "', R.version.string, '",\n  "cases": [\n', paste(cases, collapse = ",\n"), '\n  ]\n}\n')
writeLines(out, "tests/OutputForge.Stats.Tests/Oracles/multiplicity_oracles.json", sep = "")
