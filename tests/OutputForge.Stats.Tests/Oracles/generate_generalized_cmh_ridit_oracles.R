# Reference values of the generalized Cochran-Mantel-Haenszel statistics with modified ridit column
# scores computed within each stratum: the R package vcdExtra's CMHtest with cscores = "midrank", whose
# overall statistics combine strata each scored on its own column totals (CMHtest2 is applied per
# stratum, then CMHtest3 sums). Tables are generated with a fixed seed; a table on which vcdExtra's
# per-stratum solve() stops (a stratum whose own covariance matrix is singular) is redrawn.
# Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_generalized_cmh_ridit_oracles.R
# Writes tests/OutputForge.Stats.Tests/Oracles/generalized_cmh_ridit_oracles.json with the versions,
# and each stratum's scores as vcdExtra's midrank function gives them.
suppressMessages(library(vcdExtra))
set.seed(20261203)
json_rows <- function(m) paste0("[", paste(apply(m, 1, function(r) paste0("[", paste(r, collapse = ", "), "]")), collapse = ", "), "]")
json_vec <- function(v) paste0("[", paste(sprintf("%.17g", v), collapse = ", "), "]")
out <- character(0)
made <- 0
while (made < 12) {
  I <- sample(2:3, 1); J <- sample(3:6, 1); K <- sample(2:4, 1)
  x <- array(0, dim = c(I, J, K))
  for (k in 1:K) {
    p <- outer(prop.table(runif(I) + 0.3), prop.table(runif(J) + 0.1)) * outer(seq(1, 1.8, length.out = I), seq(1.8, 1, length.out = J))
    x[, , k] <- matrix(rmultinom(1, sample(15:60, 1), p / sum(p)), I, J)
  }
  dimnames(x) <- list(R = paste0("r", 1:I), C = paste0("c", 1:J), S = paste0("s", 1:K))
  res <- tryCatch(CMHtest(as.table(x), strata = "S", overall = TRUE, rscores = 1:I, cscores = "midrank"), error = function(e) NULL)
  if (is.null(res)) next
  t <- res$ALL$table
  if (any(!is.finite(as.numeric(t[c("cor", "rmeans", "general"), "Chisq"])))) next
  made <- made + 1
  v <- function(type, col) as.numeric(t[type, col])
  scores <- lapply(1:K, function(k) res[[k]]$cscores)
  out <- c(out, sprintf(paste0('  "ridit_%02d": {"strata": [%s], "column_scores": [%s], ',
    '"cor": {"statistic": %.17g, "df": %d, "p": %.17g}, "rmeans": {"statistic": %.17g, "df": %d, "p": %.17g}, ',
    '"general": {"statistic": %.17g, "df": %d, "p": %.17g}}'),
    made, paste(sapply(1:K, function(k) json_rows(matrix(x[, , k], I, J))), collapse = ", "), paste(sapply(scores, json_vec), collapse = ", "),
    v("cor", "Chisq"), as.integer(v("cor", "Df")), v("cor", "Prob"),
    v("rmeans", "Chisq"), as.integer(v("rmeans", "Df")), v("rmeans", "Prob"),
    v("general", "Chisq"), as.integer(v("general", "Df")), v("general", "Prob")))
}
writeLines(c("{", sprintf('"versions": {"R": "%s", "vcdExtra": "%s"},', R.version.string, as.character(packageVersion("vcdExtra"))),
             '"generator": "tests/OutputForge.Stats.Tests/Oracles/generate_generalized_cmh_ridit_oracles.R",',
             '"sets": {', paste(out, collapse = ",\n"), "}", "}"),
           "tests/OutputForge.Stats.Tests/Oracles/generalized_cmh_ridit_oracles.json")
