# Oracle p-values of Fisher's exact test for r x c tables from R's fisher.test (stats package).
# Run: Rscript fisher_rxc_oracles.R > fisher_rxc_oracles.txt
# Output: one line per table, "rows|cells by row, comma separated|p-value (17 significant digits)".
tables <- list(
  job = matrix(c(1, 2, 1, 0, 3, 3, 6, 1, 10, 10, 14, 9, 6, 7, 12, 11), 4, 4),  # R's help-page example (Agresti 2002, Table 2.8)
  disposition = matrix(c(5, 3, 8, 2, 4, 6, 1, 0, 3, 2, 2, 1, 4, 1, 0), 5, 3, byrow = TRUE),
  twobythree = matrix(c(70, 60, 55, 16, 27, 31), 2, 3, byrow = TRUE),
  sparse = matrix(c(0, 1, 4, 2, 0, 0, 1, 3, 5, 0, 2, 1), 3, 4, byrow = TRUE),
  race = matrix(c(78, 78, 74, 8, 6, 9, 0, 0, 1), 3, 3, byrow = TRUE)
)
cat(sprintf("# %s\n", R.version.string))
for (name in names(tables)) {
  x <- tables[[name]]
  p <- fisher.test(x, workspace = 2e8)$p.value
  cat(sprintf("%s|%d|%s|%.17g\n", name, nrow(x), paste(as.vector(t(x)), collapse = ","), p))
}
