# Reference values for logistic regression (R 4.2.2 glm, family = binomial, default glm.control)
# and the likelihood-ratio test of nested models (anova(reduced, full, test = "LRT")).
# Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_logistic_oracles.R
# It writes tests/OutputForge.Stats.Tests/Oracles/logistic_oracles.json with the R version.
# All data are invented here (set.seed) and written into the JSON beside the values, so that the
# tests fit exactly the same observations. Designs use treatment contrasts (first level = reference)
# and columns in R's model.matrix order.
fmt <- function(x) paste0("[", paste(sprintf("%.17g", x), collapse = ", "), "]")
ints <- function(x) paste0("[", paste(as.integer(x), collapse = ", "), "]")
matrix_json <- function(m) paste0("[", paste(apply(m, 1, fmt), collapse = ", "), "]")
case <- function(name, y, reduced_x, full_x, note) {
  fr <- suppressWarnings(glm.fit(reduced_x, y, family = binomial()))
  ff <- suppressWarnings(glm.fit(full_x, y, family = binomial()))
  w <- character(0)
  withCallingHandlers(glm.fit(full_x, y, family = binomial()), warning = function(e) { w <<- c(w, conditionMessage(e)); invokeRestart("muffleWarning") })
  full_se <- sqrt(diag(chol2inv(ff$qr$qr[seq_len(ff$rank), seq_len(ff$rank), drop = FALSE])))
  d <- data.frame(y = y)
  stat <- fr$deviance - ff$deviance
  df <- ncol(full_x) - ncol(reduced_x)
  # anova.glm's LRT p-value is pchisq(stat, df, lower.tail = FALSE), computed here from the same deviances.
  p <- pchisq(stat, df, lower.tail = FALSE)
  sprintf(paste0('    "%s": {"note": "%s", "y": %s,\n      "reduced_columns": [%s], "reduced_x": %s,\n      "full_columns": [%s], "full_x": %s,\n',
    '      "reduced": {"deviance": %.17g, "iterations": %d, "converged": %s, "coefficients": %s},\n',
    '      "full": {"deviance": %.17g, "iterations": %d, "converged": %s, "coefficients": %s, "standard_errors": %s, "min_fitted": %.17g, "max_fitted": %.17g, "warnings": [%s]},\n',
    '      "lrt": {"statistic": %.17g, "df": %d, "p": %.17g}}'),
    name, note, ints(y),
    paste0('"', colnames(reduced_x), '"', collapse = ", "), matrix_json(reduced_x),
    paste0('"', colnames(full_x), '"', collapse = ", "), matrix_json(full_x),
    fr$deviance, fr$iter, tolower(fr$converged), fmt(fr$coefficients),
    ff$deviance, ff$iter, tolower(ff$converged), fmt(ff$coefficients), fmt(full_se), min(ff$fitted.values), max(ff$fitted.values),
    if (length(w) > 0) paste0('"', w, '"', collapse = ", ") else "",
    stat, df, p)
}
interaction_case <- function(name, arm, sub, y, note) {
  full_x <- model.matrix(~ arm * sub)
  reduced_x <- model.matrix(~ arm + sub)
  # anova() on the formula fits gives the same test: checked here so that a mismatch stops the script.
  a <- anova(glm(y ~ arm + sub, family = binomial), glm(y ~ arm * sub, family = binomial), test = "LRT")
  out <- case(name, y, reduced_x, full_x, note)
  stopifnot(isTRUE(all.equal(a$Deviance[2], glm.fit(reduced_x, y, family = binomial())$deviance - glm.fit(full_x, y, family = binomial())$deviance)))
  out
}
set.seed(20261202)
cases <- character(0)
arm <- factor(rep(c("Placebo", "Active"), each = 60), levels = c("Placebo", "Active"))
sub <- factor(sample(c("young", "middle", "old"), 120, replace = TRUE), levels = c("young", "middle", "old"))
p <- plogis(-0.4 + 0.9 * (arm == "Active") + 0.3 * (sub == "old") - 0.8 * (arm == "Active") * (sub == "middle"))
y <- rbinom(120, 1, p)
cases <- c(cases, interaction_case("two_arms_three_levels", arm, sub, y, "invented: 2 arms x 3 subgroup levels, 120 subjects"))

arm3 <- factor(sample(c("Placebo", "Low", "High"), 150, replace = TRUE), levels = c("Placebo", "Low", "High"))
sex <- factor(sample(c("F", "M"), 150, replace = TRUE), levels = c("F", "M"))
y3 <- rbinom(150, 1, plogis(-0.2 + 0.5 * (arm3 == "Low") + 1.0 * (arm3 == "High") - 0.3 * (sex == "M")))
cases <- c(cases, interaction_case("three_arms_two_levels", arm3, sex, y3, "invented: 3 arms x 2 subgroup levels, 150 subjects"))

x1 <- round(rnorm(90, 50, 10), 1)
x2 <- rbinom(90, 1, 0.5)
yc <- rbinom(90, 1, plogis(-3 + 0.06 * x1 - 0.5 * x2))
cases <- c(cases, case("continuous_covariate", yc, cbind("(Intercept)" = 1, x1 = x1), cbind("(Intercept)" = 1, x1 = x1, x2 = x2),
  "invented: a numeric covariate, then a 0/1 covariate added"))

arms <- factor(rep(c("Placebo", "Active"), each = 40), levels = c("Placebo", "Active"))
subs <- factor(rep(rep(c("a", "b"), each = 20), 2), levels = c("a", "b"))
ys <- rbinom(80, 1, 0.4)
ys[arms == "Active" & subs == "b"] <- 1
cases <- c(cases, interaction_case("quasi_separated", arms, subs, ys,
  "invented: every Active subject of level b responds (quasi-complete separation); R reports convergence"))

xc <- c(1, 2, 3, 4, 5, 6, 7, 8, 9, 10)
ycs <- c(0, 0, 0, 0, 0, 1, 1, 1, 1, 1)
cases <- c(cases, case("complete_separation", ycs, cbind("(Intercept)" = rep(1, 10)), cbind("(Intercept)" = 1, x = xc),
  "invented: x > 5 exactly when y = 1 (complete separation)"))

json <- paste0('{\n  "generator": "tests/OutputForge.Stats.Tests/Oracles/generate_logistic_oracles.R",\n  "r_version": "',
  R.version$version.string, '",\n  "cases": {\n', paste(cases, collapse = ",\n"), '\n  }\n}\n')
writeLines(json, "tests/OutputForge.Stats.Tests/Oracles/logistic_oracles.json")
