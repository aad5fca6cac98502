# Reference values for the covariate-adjusted logistic regression (OutputForge.Stats.Models.AdjustedLogisticRegression)
# and the comparisons against a margin (OutputForge.Stats.Proportions.FarringtonManningTest).
# Run from the repository root, with the demo study's data written first:
#   dotnet run --project src/OutputForge.Cli -- demo --no-tables --out <folder>
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_adjusted_logistic_oracles.R <folder>/data
# Needs the Debian packages r-base-core, r-cran-brglm2 and r-cran-numderiv. Writes adjusted_logistic_oracles.json
# next to this script (R and package versions inside). The demo study is invented, so its analysed records (response,
# arm, strata, baseline) are written into the JSON; the CDISC pilot ADSL is read from
# ../shared/data/cdiscpilot01/csv/adsl.csv and only fitted values go into the JSON, never the data.
#
# Sources of each value:
#  - maximum likelihood: R's glm(family = binomial) with its default control (coefficients, standard errors from
#    summary.glm, deviance, iterations), anova(test = "LRT") for the treatment term.
#  - profile-likelihood limits and one-coefficient likelihood-ratio tests: written here, by glm.fit with the coefficient
#    held through an offset (control epsilon 1e-15) and uniroot (tol 1e-13) on the deviance difference minus
#    qchisq(level, 1).
#  - Firth's penalized likelihood: written here from Firth (1993, Biometrika 80:27-38) and Heinze and Schemper (2002,
#    Stat Med 21:2409-2419, section 2): Newton-Raphson on the modified score U* = X'(y - pi + h (1/2 - pi)) with step
#    halving on l* = l + 1/2 log det(X'WX), the profile penalized likelihood (penalty of the full design kept) by
#    uniroot; the estimates are checked here against brglm2's brglmFit(type = "AS_mean") (the same estimator for the
#    logit link; Kosmidis and Firth 2009) and the script stops if they differ by more than 1e-8.
#    The published example of Heinze and Schemper (2002, the endometrial cancer data) is not reproduced: that data set
#    is not available on this machine.
#  - marginal risk difference: the standardized risks written here, their gradient by numDeriv::grad (Richardson
#    extrapolation), not by the analytic formula the product uses, and the delta-method variance g' V g.
#  - Farrington-Manning: written here from Farrington and Manning (1990, Stat Med 9:1447-1454): the restricted maximum
#    likelihood estimates found by optimize() on the binomial log-likelihood under p1 - p2 = delta0 (not by the closed
#    form the product uses), Z and the one-sided p-value; the Miettinen-Nurminen (1985) limits by uniroot on the score
#    statistic with the N/(N - 1) factor at the two-sided level 1 - 2 alpha. The worked example tables of Farrington
#    and Manning (1990) were not available on this machine, so the cases are invented.
suppressPackageStartupMessages({ library(brglm2); library(numDeriv) })
out <- "tests/OutputForge.Stats.Tests/Oracles"
args <- commandArgs(trailingOnly = TRUE)
if (length(args) < 1) stop("usage: Rscript generate_adjusted_logistic_oracles.R <demo data folder>")
demo_folder <- args[1]

js <- function(x) {
  if (is.null(x)) return("null")
  if (is.list(x)) {
    if (!is.null(names(x))) return(paste0("{", paste(sprintf("\"%s\": %s", names(x), sapply(x, js)), collapse = ", "), "}"))
    return(paste0("[", paste(sapply(x, js), collapse = ", "), "]"))
  }
  if (is.character(x)) { v <- sprintf("\"%s\"", x); return(if (length(x) == 1 && is.null(attr(x, "array"))) v else paste0("[", paste(v, collapse = ", "), "]")) }
  if (is.logical(x)) { v <- ifelse(x, "true", "false"); return(if (length(x) == 1 && is.null(attr(x, "array"))) v else paste0("[", paste(v, collapse = ", "), "]")) }
  v <- ifelse(is.na(x) | !is.finite(x), "null", sprintf("%.17g", as.numeric(x)))
  if (length(x) == 1 && is.null(attr(x, "array"))) v else paste0("[", paste(v, collapse = ", "), "]")
}
arr <- function(x) { attr(x, "array") <- TRUE; x }
level <- 0.95
q <- qchisq(level, 1)
z <- qnorm(1 - (1 - level) / 2)

# ---- Firth's penalized likelihood, from the paper ----
penalized_loglik <- function(x, y, b) {
  eta <- drop(x %*% b); p <- plogis(eta)
  sum(y * eta - log1p(exp(-abs(eta))) - pmax(eta, 0)) + 0.5 * determinant(crossprod(x, x * (p * (1 - p))), logarithm = TRUE)$modulus[1]
}
firth_fit <- function(x, y, fixed = rep(NA_real_, ncol(x)), start = rep(0, ncol(x))) {
  b <- start; b[!is.na(fixed)] <- fixed[!is.na(fixed)]; free <- is.na(fixed)
  for (it in 1:500) {
    p <- plogis(drop(x %*% b)); w <- p * (1 - p)
    info <- crossprod(x, x * w)
    h <- w * rowSums((x %*% solve(info)) * x)
    u <- crossprod(x, y - p + h * (0.5 - p))
    step <- rep(0, ncol(x))
    if (any(free)) step[free] <- solve(info[free, free, drop = FALSE], u[free])
    if (max(abs(step)) > 5) step <- step * 5 / max(abs(step))
    l0 <- penalized_loglik(x, y, b)
    for (k in 1:30) { if (penalized_loglik(x, y, b + step) >= l0 - 1e-12 * abs(l0)) break; step <- step / 2 }
    b <- b + step
    if (max(abs(step)) < 1e-13 && (!any(free) || max(abs(u[free])) < 1e-10)) break
  }
  p <- plogis(drop(x %*% b))
  list(beta = b, loglik = penalized_loglik(x, y, b), cov = solve(crossprod(x, x * (p * (1 - p)))),
       plain = sum(y * log(p) + (1 - y) * log(1 - p)), iterations = it)
}

# ---- maximum likelihood: the profile by constrained glm.fit ----
ml_constrained_deviance <- function(x, y, j, b) {
  if (ncol(x) == 1) return(-2 * sum(dbinom(y, 1, plogis(x[, 1] * b), log = TRUE)))
  glm.fit(x[, -j, drop = FALSE], y, offset = x[, j] * b, family = binomial(), control = glm.control(epsilon = 1e-15, maxit = 200))$deviance
}
profile_limits <- function(excess, estimate, se) {
  side <- function(direction) {
    reach <- sqrt(q) * se
    while (excess(estimate + direction * reach) < 0) { reach <- reach * 2; if (reach > 1e4 * max(se, 1e-3)) return(NA) }
    uniroot(excess, sort(c(estimate, estimate + direction * reach)), tol = 1e-13)$root
  }
  c(side(-1), side(1))
}

# ---- marginal risk difference, gradient by numDeriv ----
marginal <- function(x, b, V, trt_cols, arm_col) {
  risk <- function(beta, col) { xx <- x; xx[, trt_cols] <- 0; if (!is.na(col)) xx[, col] <- 1; mean(plogis(drop(xx %*% beta))) }
  rd <- function(beta) risk(beta, arm_col) - risk(beta, NA)
  g <- grad(rd, b)
  est <- rd(b); se <- sqrt(drop(t(g) %*% V %*% g))
  list(estimate = est, lower = est - z * se, upper = est + z * se, riskArm = risk(b, arm_col), riskControl = risk(b, NA))
}

analyse <- function(name, data, formula, treatment, firth) {
  x <- model.matrix(formula, data); y <- data$Y
  trt_cols <- which(startsWith(colnames(x), treatment))
  if (!firth) {
    fit <- glm(formula, family = binomial(), data = data)
    s <- summary(fit)$coefficients
    b <- coef(fit); V <- vcov(fit)
    reduced <- update(fit, as.formula(paste(". ~ . -", treatment)))
    term_lr <- anova(reduced, fit, test = "LRT")
    term <- list(statistic = term_lr$Deviance[2], df = term_lr$Df[2], p = term_lr[["Pr(>Chi)"]][2])
    full_dev <- -2 * sum(dbinom(y, 1, plogis(drop(x %*% b)), log = TRUE))
    # The profile's reference deviance: glm refitted with a tight epsilon (the default stops at a relative change of 1e-8).
    tight <- glm.fit(x, y, family = binomial(), control = glm.control(epsilon = 1e-15, maxit = 200))
    excess_of <- function(j) function(v) ml_constrained_deviance(x, y, j, v) - tight$deviance - q
    lr_of <- function(j) ml_constrained_deviance(x, y, j, 0) - tight$deviance
    fitted <- list(deviance = fit$deviance, iterations = fit$iter, converged = fit$converged)
  } else {
    f <- firth_fit(x, y)
    bg <- glm(formula, family = binomial(), data = data, method = "brglmFit", type = "AS_mean", epsilon = 1e-10, maxit = 500)
    if (max(abs(coef(bg) - f$beta)) > 1e-8) stop(paste(name, ": brglm2 and the Firth code written here differ"))
    b <- f$beta; names(b) <- colnames(x); V <- f$cov
    s <- cbind(b, sqrt(diag(V)), b / sqrt(diag(V)), 2 * pnorm(-abs(b / sqrt(diag(V)))))
    con <- function(fixed) firth_fit(x, y, fixed, start = f$beta)$loglik
    fix <- function(cols, v) { r <- rep(NA_real_, ncol(x)); r[cols] <- v; r }
    excess_of <- function(j) function(v) 2 * (f$loglik - con(fix(j, v))) - q
    lr_of <- function(j) 2 * (f$loglik - con(fix(j, 0)))
    st <- 2 * (f$loglik - con(fix(trt_cols, 0)))
    term <- list(statistic = st, df = length(trt_cols), p = pchisq(st, length(trt_cols), lower.tail = FALSE))
    fitted <- list(deviance = -2 * f$plain, penalizedLogLikelihood = f$loglik, brglm2Coefficients = arr(unname(coef(bg))))
  }
  bt <- b[trt_cols]; Vt <- V[trt_cols, trt_cols, drop = FALSE]
  wald_term <- drop(t(bt) %*% solve(Vt) %*% bt)
  comparisons <- lapply(trt_cols, function(j) {
    lim <- profile_limits(excess_of(j), b[j], sqrt(V[j, j]))
    lr <- lr_of(j)
    m <- marginal(x, b, V, trt_cols, j)
    list(column = colnames(x)[j], oddsRatio = exp(b[[j]]), waldLower = exp(b[[j]] - z * sqrt(V[j, j])), waldUpper = exp(b[[j]] + z * sqrt(V[j, j])),
         profileLower = exp(lim[1]), profileUpper = exp(lim[2]), waldP = 2 * pnorm(-abs(b[[j]] / sqrt(V[j, j]))),
         lrStatistic = lr, lrP = pchisq(lr, 1, lower.tail = FALSE), marginal = m)
  })
  c(list(columns = arr(colnames(x)), coefficients = arr(unname(s[, 1])), standardErrors = arr(unname(s[, 2])), waldP = arr(unname(s[, 4])),
         treatmentLr = term, treatmentWald = list(statistic = wald_term, df = length(trt_cols), p = pchisq(wald_term, length(trt_cols), lower.tail = FALSE)),
         comparisons = comparisons), fitted)
}

# ---- the demo study: Week 12 itch responders, non-responder imputation, ITT ----
adsl <- read.csv(file.path(demo_folder, "adsl.csv"), stringsAsFactors = FALSE)
adeff <- read.csv(file.path(demo_folder, "adeff.csv"), stringsAsFactors = FALSE)
itt <- adsl[adsl$ITTFL == "Y", ]
resp <- adeff[adeff$PARAMCD == "ITCHR50" & adeff$AVISIT == "Week 12" & adeff$ANL01FL == "Y" & adeff$AVALC == "Y", "USUBJID"]
arms <- unique(itt[order(itt$TRT01PN), "TRT01P"])
demo <- data.frame(Y = as.integer(itt$USUBJID %in% resp), ITCHBL = itt$ITCHBL,
                   TRT01P = factor(itt$TRT01P, levels = arms),
                   STRAT1R = factor(itt$STRAT1R, levels = sort(unique(itt$STRAT1R))),
                   STRAT2R = factor(itt$STRAT2R, levels = sort(unique(itt$STRAT2R))))
demo_formula <- Y ~ ITCHBL + TRT01P + STRAT1R + STRAT2R
demo_records <- list(y = arr(demo$Y), ITCHBL = arr(demo$ITCHBL), TRT01P = arr(as.character(demo$TRT01P)),
                     STRAT1R = arr(as.character(demo$STRAT1R)), STRAT2R = arr(as.character(demo$STRAT2R)),
                     treatmentLevels = arr(arms), STRAT1RLevels = arr(levels(demo$STRAT1R)), STRAT2RLevels = arr(levels(demo$STRAT2R)))

# ---- the CDISC pilot ADSL: completion of Week 24 by arm, adjusted for age, pooled site and sex ----
pilot_file <- "../shared/data/cdiscpilot01/csv/adsl.csv"
pilot <- NULL
if (file.exists(pilot_file)) {
  p <- read.csv(pilot_file, stringsAsFactors = FALSE)
  p <- p[p$ITTFL == "Y", ]
  parms <- unique(p[order(p$TRT01PN), "TRT01P"])
  pd <- data.frame(Y = as.integer(p$COMP24FL == "Y"), AGE = p$AGE, TRT01P = factor(p$TRT01P, levels = parms),
                   SITEGR1 = factor(as.character(p$SITEGR1), levels = sort(unique(as.character(p$SITEGR1)))),
                   SEX = factor(p$SEX, levels = sort(unique(p$SEX))))
  pilot <- c(list(records = nrow(pd), treatmentLevels = arr(parms)), analyse("pilot", pd, Y ~ AGE + TRT01P + SITEGR1 + SEX, "TRT01P", FALSE))
}

# ---- invented separated data for Firth: every subject of the active arm responds (quasi-complete separation) ----
set.seed(20261204)
n <- 48
sep <- data.frame(ARM = factor(rep(c("PBO", "ACT"), each = n / 2), levels = c("PBO", "ACT")),
                  STRAT = factor(rep(c("A", "B"), times = n / 2), levels = c("A", "B")), BASE = round(rnorm(n, 6, 1.5), 1))
lin <- -0.8 + 1.2 * (sep$ARM == "ACT") + 0.5 * (sep$STRAT == "B") - 0.2 * (sep$BASE - 6)
sep$Y <- rbinom(n, 1, plogis(lin))
sep$Y[sep$ARM == "ACT"] <- 1
sep_records <- list(y = arr(sep$Y), BASE = arr(sep$BASE), ARM = arr(as.character(sep$ARM)), STRAT = arr(as.character(sep$STRAT)))
ml_warning <- character(0)
invisible(withCallingHandlers(glm(Y ~ BASE + ARM + STRAT, family = binomial(), data = sep), warning = function(e) { ml_warning <<- c(ml_warning, conditionMessage(e)); invokeRestart("muffleWarning") }))

# ---- invented completely separated data: the response is 1 exactly when the baseline exceeds 6 ----
m <- 30
comp <- data.frame(ARM = factor(rep(c("PBO", "ACT"), times = m / 2), levels = c("PBO", "ACT")), BASE = round(runif(m, 3, 9), 1))
comp$BASE[comp$BASE == 6] <- 6.1
comp$Y <- as.integer(comp$BASE > 6)
comp_records <- list(y = arr(comp$Y), BASE = arr(comp$BASE), ARM = arr(as.character(comp$ARM)))

# ---- Farrington-Manning and Miettinen-Nurminen against a margin ----
restricted <- function(x1, n1, x2, n2, d) {
  lo <- max(0, -d); hi <- min(1, 1 - d)
  if (hi - lo < 1e-15) return(c(lo + d, lo))
  ll <- function(p2) dbinom(x1, n1, p2 + d, log = TRUE) + dbinom(x2, n2, p2, log = TRUE)
  p2 <- optimize(ll, c(lo, hi), maximum = TRUE, tol = 1e-15)$maximum
  c(p2 + d, p2)
}
score <- function(x1, n1, x2, n2, d, factor) {
  r <- restricted(x1, n1, x2, n2, d)
  (x1 / n1 - x2 / n2 - d) / sqrt((r[1] * (1 - r[1]) / n1 + r[2] * (1 - r[2]) / n2) * factor)
}
fm_case <- function(x1, n1, x2, n2, margin, hypothesis, direction, alpha) {
  better <- if (direction == "higher") 1 else -1
  d0 <- if (hypothesis == "non-inferiority") -better * margin else better * margin
  zz <- score(x1, n1, x2, n2, d0, 1)
  p <- if (direction == "higher") pnorm(-zz) else pnorm(zz)
  N <- n1 + n2; zq <- qnorm(1 - alpha); est <- x1 / n1 - x2 / n2
  mn <- function(d) score(x1, n1, x2, n2, d, N / (N - 1))
  lower <- uniroot(function(d) mn(d) - zq, c(-1 + 1e-12, est), tol = 1e-14)$root
  upper <- uniroot(function(d) mn(d) + zq, c(est, 1 - 1e-12), tol = 1e-14)$root
  list(events1 = x1, n1 = n1, events2 = x2, n2 = n2, margin = margin, hypothesis = hypothesis, direction = direction, alpha = alpha,
       nullDifference = d0, z = zz, p = p, lower = lower, upper = upper, shown = p < alpha)
}
fm <- list(
  fm_case(68, 80, 70, 80, 0.10, "non-inferiority", "higher", 0.025),
  fm_case(150, 200, 160, 205, 0.10, "non-inferiority", "higher", 0.025),
  fm_case(45, 60, 48, 60, 0.05, "non-inferiority", "higher", 0.05),
  fm_case(12, 120, 9, 118, 0.08, "non-inferiority", "lower", 0.025),
  fm_case(80, 100, 62, 100, 0, "superiority", "higher", 0.025),
  fm_case(30, 100, 52, 100, 0.05, "superiority", "lower", 0.025),
  fm_case(19, 20, 18, 20, 0.15, "non-inferiority", "higher", 0.025))

versions <- list(R = R.version.string, brglm2 = as.character(packageVersion("brglm2")), numDeriv = as.character(packageVersion("numDeriv")))
result <- list(
  generator = "tests/OutputForge.Stats.Tests/Oracles/generate_adjusted_logistic_oracles.R",
  versions = versions, level = level,
  demo = c(list(model = "Y ~ ITCHBL + TRT01P + STRAT1R + STRAT2R", records = demo_records), analyse("demo", demo, demo_formula, "TRT01P", FALSE)),
  demoFirth = analyse("demoFirth", demo, demo_formula, "TRT01P", TRUE),
  pilot = pilot,
  separated = c(list(model = "Y ~ BASE + ARM + STRAT", records = sep_records, glmWarnings = arr(ml_warning)), analyse("separated", sep, Y ~ BASE + ARM + STRAT, "ARM", TRUE)),
  complete = c(list(model = "Y ~ BASE + ARM", records = comp_records), analyse("complete", comp, Y ~ BASE + ARM, "ARM", TRUE)),
  farringtonManning = fm)
writeLines(js(result), file.path(out, "adjusted_logistic_oracles.json"))
