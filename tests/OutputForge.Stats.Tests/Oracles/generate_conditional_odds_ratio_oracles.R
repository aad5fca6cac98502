# Reference values of the conditional maximum-likelihood odds ratio and its exact conditional
# (Cornfield) confidence interval, as reported by R's fisher.test for a 2 x 2 table. Run from the
# repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_conditional_odds_ratio_oracles.R
# It writes tests/OutputForge.Stats.Tests/Oracles/conditional_odds_ratio_oracles.json.
#
# fisher.test solves its equations with uniroot's default tolerance (about 1.2e-4 on its search
# scale), so its values are recorded as given ("r_*") and, beside them, the same equations solved
# here to full precision on the log scale ("precise_*"): the estimate solves E(a; theta) = a, the
# lower limit P(A >= a; theta) = alpha/2, the upper limit P(A <= a; theta) = alpha/2, with A
# noncentral hypergeometric given both margins (Cornfield 1956). The tables are invented: random
# group sizes and event counts, plus hand-picked edges (zero cells, full groups, large groups).
set.seed(20261202)
cases <- list()
add <- function(e1, n1, e2, n2, level) cases[[length(cases) + 1]] <<- c(e1, n1, e2, n2, level)
for (i in 1:240) {
  n1 <- sample(1:60, 1); n2 <- sample(1:60, 1)
  add(sample(0:n1, 1), n1, sample(0:n2, 1), n2, sample(c(0.95, 0.95, 0.9, 0.99), 1))
}
for (i in 1:30) {
  n1 <- sample(100:800, 1); n2 <- sample(100:800, 1)
  p <- runif(1, 0.02, 0.6)
  add(rbinom(1, n1, p), n1, rbinom(1, n2, p * runif(1, 0.5, 2) %% 1), n2, 0.95)
}
edges <- list(c(0, 10, 5, 10), c(10, 10, 5, 10), c(5, 10, 0, 10), c(5, 10, 10, 10), c(0, 10, 10, 10),
              c(10, 10, 0, 10), c(0, 1, 1, 1), c(1, 1, 0, 1), c(1, 1, 1, 2), c(0, 3, 0, 4), c(3, 3, 4, 4),
              c(0, 0, 2, 5), c(2, 5, 0, 0), c(1, 200, 0, 200), c(3, 1000, 12, 1000), c(12, 17, 3, 17),
              c(3, 4, 1, 4), c(7, 7, 0, 9), c(0, 50, 1, 50), c(50, 50, 49, 50))
for (e in edges) add(e[1], e[2], e[3], e[4], 0.95)

precise <- function(e1, n1, e2, n2, level) {
  m <- e1 + e2
  lo <- max(0, m - n2); hi <- min(n1, m)
  u <- lo:hi
  logw <- lchoose(n1, u) + lchoose(n2, m - u)
  probs <- function(b) { l <- logw + b * u; w <- exp(l - max(l)); w / sum(w) }
  root <- function(f) uniroot(f, c(-60, 60), tol = 1e-13, maxiter = 10000, extendInt = "upX")$root
  alpha <- (1 - level) / 2
  est <- if (e1 == lo) 0 else if (e1 == hi) Inf else exp(root(function(b) sum(u * probs(b)) - e1))
  lower <- if (e1 == lo) 0 else exp(root(function(b) sum(probs(b)[u >= e1]) - alpha))
  upper <- if (e1 == hi) Inf else exp(root(function(b) alpha - sum(probs(b)[u <= e1])))
  c(est, lower, upper)
}
num <- function(v) if (is.infinite(v)) '"Infinity"' else sprintf("%.17g", v)
rows <- character(0)
for (k in cases) {
  e1 <- k[1]; n1 <- k[2]; e2 <- k[3]; n2 <- k[4]; level <- k[5]
  margins_ok <- n1 > 0 && n2 > 0 && (e1 + e2) > 0 && (e1 + e2) < (n1 + n2)
  if (margins_ok) {
    ft <- fisher.test(matrix(c(e1, e2, n1 - e1, n2 - e2), 2), conf.level = level)
    pr <- precise(e1, n1, e2, n2, level)
    rows <- c(rows, sprintf('  {"events1": %d, "n1": %d, "events2": %d, "n2": %d, "level": %s, "estimable": true, "r_estimate": %s, "r_lower": %s, "r_upper": %s, "precise_estimate": %s, "precise_lower": %s, "precise_upper": %s}',
                            e1, n1, e2, n2, num(level), num(unname(ft$estimate)), num(ft$conf.int[1]), num(ft$conf.int[2]), num(pr[1]), num(pr[2]), num(pr[3])))
  } else {
    rows <- c(rows, sprintf('  {"events1": %d, "n1": %d, "events2": %d, "n2": %d, "level": %s, "estimable": false}', e1, n1, e2, n2, num(level)))
  }
}
out <- c("{", sprintf('"versions": {"R": "%s"},', R.version.string),
         '"generator": "tests/OutputForge.Stats.Tests/Oracles/generate_conditional_odds_ratio_oracles.R",',
         '"cases": [', paste(rows, collapse = ",\n"), "]", "}")
writeLines(out, "tests/OutputForge.Stats.Tests/Oracles/conditional_odds_ratio_oracles.json")
