# Reference p-values of Fisher's exact test for r x c tables from R's fisher.test (FEXACT,
# Mehta and Patel's network algorithm). Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_fisher_rxc_oracles.R
# It writes tests/OutputForge.Stats.Tests/Oracles/fisher_rxc_oracles.json with the R version.
# The tables are invented for the tests; the fifth is the 10 x 3 table with n = 250.
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
           1, 1, 1), nrow = 2, byrow = TRUE)
)
rows <- character(0)
for (t in tables) {
  p <- fisher.test(t, workspace = 2e8)$p.value
  cells <- paste(apply(t, 1, function(r) paste0("[", paste(r, collapse = ", "), "]")), collapse = ", ")
  rows <- c(rows, sprintf('  {"table": [%s], "p": %.17g}', cells, p))
}
out <- c("{", sprintf('"versions": {"R": "%s"},', R.version.string),
         '"generator": "tests/OutputForge.Stats.Tests/Oracles/generate_fisher_rxc_oracles.R",',
         '"fisher_rxc": [', paste(rows, collapse = ",\n"), "]", "}")
writeLines(out, "tests/OutputForge.Stats.Tests/Oracles/fisher_rxc_oracles.json")
