# Reference values for the generalized Cochran-Mantel-Haenszel statistics from the R package
# vcdExtra (CMHtest: cor = nonzero correlation, rmeans = row mean scores, general = general
# association) and from base R's mantelhaen.test (general association for I x J x K tables).
# Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_generalized_cmh_oracles.R
# It writes tests/OutputForge.Stats.Tests/Oracles/generalized_cmh_oracles.json with the versions.
# "job_satisfaction" is Agresti (2002, Categorical Data Analysis 2nd ed., Table 7.8) as given in R's
# mantelhaen.test documentation; the other sets are invented for the tests. Strata are written as
# lists of rows.
suppressMessages(library(vcdExtra))
sets <- list(
  job_satisfaction = list(strata = list(
    rbind(c(1, 3, 11, 2), c(2, 3, 17, 3), c(0, 1, 8, 5), c(0, 2, 4, 2)),
    rbind(c(1, 1, 2, 1), c(0, 3, 5, 1), c(0, 0, 7, 3), c(0, 1, 9, 6)))),
  invented_three_by_three = list(strata = list(
    rbind(c(10, 6, 4), c(7, 9, 8), c(3, 8, 12)),
    rbind(c(5, 5, 2), c(4, 6, 5), c(2, 4, 9)),
    rbind(c(8, 3, 1), c(6, 6, 3), c(2, 5, 7)))),
  invented_two_by_four = list(strata = list(
    rbind(c(5, 9, 1, 6), c(8, 4, 0, 2)),
    rbind(c(3, 7, 4, 10), c(9, 6, 3, 1)))),
  invented_custom_scores = list(row_scores = c(0, 1, 3), column_scores = c(1, 2, 4), strata = list(
    rbind(c(12, 5, 3), c(6, 8, 6), c(2, 6, 11)),
    rbind(c(7, 4, 1), c(5, 5, 4), c(1, 3, 8))))
)
json_rows <- function(m) paste0("[", paste(apply(m, 1, function(r) paste0("[", paste(r, collapse = ", "), "]")), collapse = ", "), "]")
out <- character(0)
for (name in names(sets)) {
  s <- sets[[name]]
  I <- nrow(s$strata[[1]]); J <- ncol(s$strata[[1]]); K <- length(s$strata)
  x <- array(0, dim = c(I, J, K))
  for (k in seq_len(K)) x[, , k] <- s$strata[[k]]
  dimnames(x) <- list(R = paste0("r", 1:I), C = paste0("c", 1:J), S = paste0("s", 1:K))
  rs <- if (is.null(s$row_scores)) 1:I else s$row_scores
  cs <- if (is.null(s$column_scores)) 1:J else s$column_scores
  t <- CMHtest(as.table(x), strata = "S", overall = TRUE, rscores = rs, cscores = cs)$ALL$table
  v <- function(type, col) as.numeric(t[type, col])
  base <- mantelhaen.test(x)
  out <- c(out, sprintf(paste0('  "%s": {"strata": [%s], "row_scores": [%s], "column_scores": [%s], ',
    '"cor": {"statistic": %.17g, "df": %d, "p": %.17g}, "rmeans": {"statistic": %.17g, "df": %d, "p": %.17g}, ',
    '"general": {"statistic": %.17g, "df": %d, "p": %.17g}, "base_general": {"statistic": %.17g, "p": %.17g}}'),
    name, paste(sapply(s$strata, json_rows), collapse = ", "), paste(rs, collapse = ", "), paste(cs, collapse = ", "),
    v("cor", "Chisq"), as.integer(v("cor", "Df")), v("cor", "Prob"),
    v("rmeans", "Chisq"), as.integer(v("rmeans", "Df")), v("rmeans", "Prob"),
    v("general", "Chisq"), as.integer(v("general", "Df")), v("general", "Prob"),
    as.numeric(base$statistic), base$p.value))
}
writeLines(c("{", sprintf('"versions": {"R": "%s", "vcdExtra": "%s"},', R.version.string, as.character(packageVersion("vcdExtra"))),
             '"generator": "tests/OutputForge.Stats.Tests/Oracles/generate_generalized_cmh_oracles.R",',
             '"sets": {', paste(out, collapse = ",\n"), "}", "}"),
           "tests/OutputForge.Stats.Tests/Oracles/generalized_cmh_oracles.json")
