# Reference values for Rubin's rules: R 4.2.2 with mice (version recorded in the JSON), pool() on linear models
# fitted to completed data sets that this script imputes and writes out, so that the tests pool the very same
# imputations. Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_rubin_oracles.R
# It writes tests/OutputForge.Stats.Tests/Oracles/rubin_completed_data.csv (every completed data set, long form)
# and tests/OutputForge.Stats.Tests/Oracles/rubin_oracles.json. The study is invented here (set.seed).
suppressPackageStartupMessages(library(mice))
fmt <- function(x) if (length(x) == 1) sprintf("%.17g", x) else paste0("[", paste(sprintf("%.17g", x), collapse = ", "), "]")
set.seed(20261204)
n <- 80
trt <- rep(0:1, each = n / 2)
x <- round(rnorm(n, 50, 10), 1)
y <- round(10 + 3 * trt + 0.5 * x + rnorm(n, 0, 4), 2)
# Missing outcomes more likely at high baseline (missing at random given x); a few baselines missing too.
y[runif(n) < plogis(-1.5 + 0.08 * (x - 50))] <- NA
x[sample(which(!is.na(y)), 6)] <- NA
study <- data.frame(trt = trt, x = x, y = y)
imp <- mice(study, m = 5, method = "norm", seed = 20261204, printFlag = FALSE)
long <- complete(imp, "long")
write.csv(data.frame(imputation = long$.imp, id = long$.id, trt = long$trt, x = long$x, y = long$y),
  "tests/OutputForge.Stats.Tests/Oracles/rubin_completed_data.csv", row.names = FALSE, quote = FALSE)
fit <- with(imp, lm(y ~ trt + x))
term_json <- function(pooled, summ, term) {
  p <- pooled$pooled[pooled$pooled$term == term, ]
  s <- summ[summ$term == term, ]
  sprintf('{"term": "%s", "estimate": %s, "ubar": %s, "b": %s, "t": %s, "dfcom": %s, "df": %s, "riv": %s, "lambda": %s, "fmi": %s, "std_error": %s, "statistic": %s, "p_value": %s, "lower": %s, "upper": %s}',
    term, fmt(p$estimate), fmt(p$ubar), fmt(p$b), fmt(p$t), fmt(p$dfcom), fmt(p$df), fmt(p$riv), fmt(p$lambda), fmt(p$fmi),
    fmt(s$std.error), fmt(s$statistic), fmt(s$p.value), fmt(s[["2.5 %"]]), fmt(s[["97.5 %"]]))
}
pooled <- pool(fit)
summ <- summary(pooled, conf.int = TRUE, conf.level = 0.95)
terms <- c("(Intercept)", "trt", "x")
# A scalar case without data: pool.scalar on given estimates and variances, large-sample (n = Inf gives Rubin's df).
q <- c(1.12, 1.31, 0.98, 1.25, 1.07, 1.19)
u <- c(0.041, 0.038, 0.044, 0.040, 0.039, 0.042)
scalar <- pool.scalar(q, u, n = Inf, k = 1)
scalar_br <- pool.scalar(q, u, n = 40, k = 3)
out <- paste0('{\n  "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_rubin_oracles.R",\n',
  '  "r_version": "', R.version.string, '",\n  "mice_version": "', as.character(packageVersion("mice")), '",\n',
  '  "model": "lm(y ~ trt + x) on each completed data set of rubin_completed_data.csv; mice(m = 5, method = \\"norm\\", seed = 20261204); pool() with dfcom = n - 3",\n',
  '  "observations": ', n, ',\n',
  '  "terms": [\n    ', paste(sapply(terms, function(t) term_json(pooled, summ, t)), collapse = ",\n    "), '\n  ],\n',
  '  "scalar": {"q": ', fmt(q), ', "u": ', fmt(u), ', "qbar": ', fmt(scalar$qbar), ', "ubar": ', fmt(scalar$ubar), ', "b": ', fmt(scalar$b),
  ', "t": ', fmt(scalar$t), ', "df": ', fmt(scalar$df), ', "r": ', fmt(scalar$r), ', "fmi": ', fmt(scalar$fmi), '},\n',
  '  "scalar_small_sample": {"n": 40, "k": 3, "df": ', fmt(scalar_br$df), ', "r": ', fmt(scalar_br$r), ', "fmi": ', fmt(scalar_br$fmi), '}\n}\n')
writeLines(out, "tests/OutputForge.Stats.Tests/Oracles/rubin_oracles.json", sep = "")
