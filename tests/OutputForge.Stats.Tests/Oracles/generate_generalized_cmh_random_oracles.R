# Reference values of the generalized Cochran-Mantel-Haenszel statistics over generated I x J x K
# tables (sizes and counts drawn with a fixed seed, including sparse strata, categories empty in some
# strata and non-integer scores) from the R package vcdExtra (CMHtest's overall statistics: cor,
# rmeans, general) and base R mantelhaen.test (general association).
# Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_generalized_cmh_random_oracles.R
# Writes tests/OutputForge.Stats.Tests/Oracles/generalized_cmh_random_oracles.json with the versions.
# vcdExtra also computes a statistic for each stratum with solve(), which stops on a stratum whose own
# covariance matrix is singular; tables where that happens are redrawn, so every set here is one that
# CMHtest itself handles unchanged. A set's strata each hold at least two subjects, and each category
# and arm is present in the pooled table (the overall covariance matrix has full rank).
suppressMessages(library(vcdExtra))
set.seed(20261202)
json_rows <- function(m) paste0("[", paste(apply(m, 1, function(r) paste0("[", paste(r, collapse = ", "), "]")), collapse = ", "), "]")
out <- character(0)
made <- 0
attempt <- 0
while (made < 24) {
  attempt <- attempt + 1
  I <- sample(2:4, 1); J <- sample(2:6, 1); K <- sample(1:5, 1)
  size <- sample(c(4, 8, 15, 40), 1)
  # Row and column probabilities of their own per stratum, so the strata differ and some cells are empty.
  x <- array(0, dim = c(I, J, K))
  for (k in 1:K) {
    p <- outer(prop.table(runif(I) + 0.2), prop.table(runif(J)^2 + 0.05))
    if (made %% 3 == 0) p <- p * outer(seq(1, 2, length.out = I), seq(2, 1, length.out = J))
    x[, , k] <- matrix(rmultinom(1, size + sample(0:10, 1), p / sum(p)), I, J)
  }
  pooled <- apply(x, c(1, 2), sum)
  if (any(rowSums(pooled) == 0) || any(colSums(pooled) == 0) || any(apply(x, 3, sum) < 2)) next
  rs <- if (made %% 4 == 1) round(sort(runif(I, 0, 10)), 3) else 1:I
  cs <- if (made %% 4 == 2) round(sort(runif(J, 0, 10)), 3) else 1:J
  dimnames(x) <- list(R = paste0("r", 1:I), C = paste0("c", 1:J), S = paste0("s", 1:K))
  t <- tryCatch(if (K == 1) CMHtest(as.table(x[, , 1]), rscores = rs, cscores = cs)$table else
                  CMHtest(as.table(x), strata = "S", overall = TRUE, rscores = rs, cscores = cs)$ALL$table,
                error = function(e) NULL)
  if (is.null(t) || any(!is.finite(as.numeric(t[c("cor", "rmeans", "general"), "Chisq"])))) next
  v <- function(type, col) as.numeric(t[type, col])
  base <- if (K == 1) NULL else tryCatch(mantelhaen.test(x, correct = FALSE), error = function(e) NULL)
  made <- made + 1
  strata <- lapply(1:K, function(k) matrix(x[, , k], I, J))
  out <- c(out, sprintf(paste0('  "generated_%02d": {"strata": [%s], "row_scores": [%s], "column_scores": [%s], ',
    '"cor": {"statistic": %.17g, "df": %d, "p": %.17g}, "rmeans": {"statistic": %.17g, "df": %d, "p": %.17g}, ',
    '"general": {"statistic": %.17g, "df": %d, "p": %.17g}, "base_general": %s}'),
    made, paste(sapply(strata, json_rows), collapse = ", "), paste(rs, collapse = ", "), paste(cs, collapse = ", "),
    v("cor", "Chisq"), as.integer(v("cor", "Df")), v("cor", "Prob"),
    v("rmeans", "Chisq"), as.integer(v("rmeans", "Df")), v("rmeans", "Prob"),
    v("general", "Chisq"), as.integer(v("general", "Df")), v("general", "Prob"),
    if (is.null(base)) "null" else sprintf('{"statistic": %.17g, "p": %.17g}', as.numeric(base$statistic), base$p.value)))
}
writeLines(c("{", sprintf('"versions": {"R": "%s", "vcdExtra": "%s"},', R.version.string, as.character(packageVersion("vcdExtra"))),
             '"generator": "tests/OutputForge.Stats.Tests/Oracles/generate_generalized_cmh_random_oracles.R",',
             sprintf('"attempts": %d,', attempt),
             '"sets": {', paste(out, collapse = ",\n"), "}", "}"),
           "tests/OutputForge.Stats.Tests/Oracles/generalized_cmh_random_oracles.json")
