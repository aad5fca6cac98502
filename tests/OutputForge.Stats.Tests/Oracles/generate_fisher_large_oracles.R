# Reference p-values of Fisher's exact test for large invented tables (n in the thousands), from
# R's fisher.test (FEXACT) with a large workspace. Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_fisher_large_oracles.R
# It writes tests/OutputForge.Stats.Tests/Oracles/fisher_large_oracles.json with the R version.
# When FEXACT cannot compute a table its error message is recorded instead of a p-value.
tables <- list(
  # completion status by arm, 20,000 subjects
  matrix(c(5679, 5864, 5638,
            986,  803, 1030), nrow = 2, byrow = TRUE),
  matrix(c(6050, 5980, 6120,
            617,  687,  546), nrow = 2, byrow = TRUE),
  # a rare event by arm, 20,000 subjects
  matrix(c(   2,    5,    9,
           6665, 6662, 6657), nrow = 2, byrow = TRUE),
  # five categories by two arms, 5,000 subjects, no association to speak of
  matrix(c(480, 510, 495, 530, 470,
           520, 490, 505, 470, 530), nrow = 2, byrow = TRUE),
  # four categories by two arms (r x 2), 2,000 subjects
  matrix(c(300, 320,
           250, 240,
           200, 230,
           260, 200), nrow = 4, byrow = TRUE),
  # reason for discontinuation (5 levels) by arm, 2,819 subjects
  matrix(c(114, 198, 444,
           318, 171,  99,
           313, 298, 266,
           137,  89, 132,
           104,  47,  89), nrow = 5, byrow = TRUE)
)
rows <- character(0)
for (t in tables) {
  cells <- paste(apply(t, 1, function(r) paste0("[", paste(r, collapse = ", "), "]")), collapse = ", ")
  p <- tryCatch(fisher.test(t, workspace = 2e8)$p.value, error = function(e) conditionMessage(e))
  if (is.numeric(p)) {
    rows <- c(rows, sprintf('  {"table": [%s], "p": %.17g}', cells, p))
  } else {
    rows <- c(rows, sprintf('  {"table": [%s], "r_error": "%s"}', cells, gsub("\n", " ", gsub('"', "'", p))))
  }
}
out <- c("{", sprintf('"versions": {"R": "%s"},', R.version.string),
         '"generator": "tests/OutputForge.Stats.Tests/Oracles/generate_fisher_large_oracles.R",',
         '"fisher_large": [', paste(rows, collapse = ",\n"), "]", "}")
writeLines(out, "tests/OutputForge.Stats.Tests/Oracles/fisher_large_oracles.json")
