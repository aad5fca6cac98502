# Reference p-values of Fisher's exact test for r x c tables from R's fisher.test (FEXACT,
# Mehta and Patel's network algorithm). Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_fisher_rxc_oracles.R
# It writes tests/OutputForge.Stats.Tests/Oracles/fisher_rxc_oracles.json with the R version.
# The tables are invented for the tests; the fifth is a 10 x 3 table with n = 250 and evenly spread
# counts (hard: p near 0.37), the ninth a 10 x 3 table with n = 250 concentrated in a few categories,
# as in a clinical table of grades or categories by arm, the tenth a 5 x 5 table with n = 100.
tables <- list(
  matrix(c(3, 1, 4,
           1, 5, 2), nrow = 2, byrow = TRUE),
  matrix(c(2, 0, 5,
           4, 3, 1,
           0, 6, 2), nrow = 3, byrow = TRUE),
  matrix(c(1, 2, 0, 4, 3,
           5, 0, 2, 1, 0), nrow = 2, byrow = TRUE),
  matrix(c(3, 1, 0, 2,
           1, 4, 2, 0,
           0, 2, 5, 1,
           2, 0, 1, 6), nrow = 4, byrow = TRUE),
  matrix(c(14, 15, 11,
           10,  9, 13,
            7, 10,  8,
           13,  8,  5,
            4,  9, 10,
            8,  6, 11,
           10, 12,  7,
            4,  3,  8,
            6, 10,  5,
            2,  4,  8), nrow = 10, byrow = TRUE),
  matrix(c(20, 1, 0, 3, 2, 1, 0, 4, 2, 1,
            5, 6, 3, 1, 0, 2, 4, 1, 0, 3,
            1, 2, 8, 0, 5, 3, 1, 0, 6, 2), nrow = 3, byrow = TRUE),
  matrix(c(0, 0, 7,
           3, 4, 0,
           5, 0, 1), nrow = 3, byrow = TRUE),
  matrix(c(1, 1, 1,
           1, 1, 1), nrow = 2, byrow = TRUE),
  matrix(c(60, 55, 60,
           10, 12,  8,
            5,  3,  6,
            2,  4,  3,
            1,  2,  1,
            3,  1,  2,
            0,  2,  1,
            1,  0,  2,
            2,  1,  0,
            1,  2,  0), nrow = 10, byrow = TRUE),
  matrix(c(5, 3, 4, 6, 2,
           4, 5, 3, 2, 6,
           3, 6, 5, 4, 2,
           6, 2, 4, 5, 3,
           2, 4, 6, 3, 5), nrow = 5, byrow = TRUE)
)
# For the evenly spread 10 x 3 table the exact FEXACT value disagrees with R's own Monte Carlo
# p-value (same statistic, same tie rule), so a Monte Carlo estimate with its standard error is
# recorded beside it for every table.
rows <- character(0)
for (t in tables) {
  p <- fisher.test(t, workspace = 2e8)$p.value
  set.seed(20261201)
  b <- 4e6
  sim <- fisher.test(t, simulate.p.value = TRUE, B = b)$p.value
  cells <- paste(apply(t, 1, function(r) paste0("[", paste(r, collapse = ", "), "]")), collapse = ", ")
  rows <- c(rows, sprintf('  {"table": [%s], "p": %.17g, "simulated_p": %.17g, "simulated_se": %.17g, "replicates": %d}',
                          cells, p, sim, sqrt(sim * (1 - sim) / b), as.integer(b)))
}
out <- c("{", sprintf('"versions": {"R": "%s"},', R.version.string),
         '"generator": "tests/OutputForge.Stats.Tests/Oracles/generate_fisher_rxc_oracles.R",',
         '"fisher_rxc": [', paste(rows, collapse = ",\n"), "]", "}")
writeLines(out, "tests/OutputForge.Stats.Tests/Oracles/fisher_rxc_oracles.json")
