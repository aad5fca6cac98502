# Reference values for the linear model, LS means, Kaplan-Meier, log-rank and Cox tests.
# Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_efficacy_oracles.R
# Writes, next to this script: efficacy_lm_data.csv and efficacy_tte_data.csv (invented data drawn
# here with set.seed) and efficacy_oracles.json (values from R's lm and the survival package).
# The CDISC pilot ADTTE is read from ../shared/data/cdiscpilot01/csv/adtte.csv when present; its
# values go into the JSON, the data itself is never copied into the repository.
library(survival)
out <- "tests/OutputForge.Stats.Tests/Oracles"
num <- function(x) ifelse(is.na(x) | !is.finite(x), "null", sprintf("%.17g", x))
arr <- function(x) paste0("[", paste(num(x), collapse = ", "), "]")
obj <- function(...) { v <- list(...); paste0("{", paste(sprintf("\"%s\": %s", names(v), unlist(v)), collapse = ", "), "}") }
str <- function(s) sprintf("\"%s\"", s)

# ---- linear model: 3 arms, numeric baseline, two class covariates, unbalanced ----
set.seed(20261201)
n <- 73
arm <- sample(c("P", "L", "H"), n, replace = TRUE, prob = c(0.4, 0.3, 0.3))
base <- round(runif(n, 4, 10), 1)
strat <- sample(c("MOD", "SEV"), n, replace = TRUE, prob = c(0.6, 0.4))
region <- sample(c("EU", "AM", "AP"), n, replace = TRUE, prob = c(0.5, 0.3, 0.2))
dose <- c(P = 0, L = 10, H = 30)[arm]
y <- round(-1.5 - 0.05 * dose - 0.3 * (base - 7) + ifelse(strat == "SEV", -0.4, 0) +
           c(EU = 0, AM = 0.3, AP = -0.2)[region] + rnorm(n, 0, 1.6), 2)
lmdata <- data.frame(ARM = arm, BASE = base, STRAT = strat, REGION = region, DOSE = dose, Y = y)
write.csv(lmdata, file.path(out, "efficacy_lm_data.csv"), row.names = FALSE, quote = FALSE)
lmdata$ARM <- factor(lmdata$ARM, levels = c("P", "L", "H"))
lmdata$STRAT <- factor(lmdata$STRAT, levels = c("MOD", "SEV"))
lmdata$REGION <- factor(lmdata$REGION, levels = c("EU", "AM", "AP"))
fit <- lm(Y ~ ARM + BASE + STRAT + REGION, data = lmdata)
b <- coef(fit); V <- vcov(fit); df <- fit$df.residual
# LS means by hand: BASE at its observed mean, each other class covariate averaged with weight 1/k.
lsvec <- function(lev) {
  c0 <- c(1, lev == "L", lev == "H", mean(lmdata$BASE), 1/2, 1/3, 1/3)
  names(c0) <- names(b); c0
}
ctr <- function(cv) { est <- sum(cv * b); se <- sqrt(drop(t(cv) %*% V %*% cv)); q <- qt(0.975, df)
  obj(estimate = num(est), se = num(se), lower = num(est - q * se), upper = num(est + q * se),
      t = num(est / se), p = num(2 * pt(-abs(est / se), df))) }
lsm <- sapply(c("P", "L", "H"), function(l) ctr(lsvec(l)))
fitd <- lm(Y ~ DOSE + BASE + STRAT + REGION, data = lmdata)
sd1 <- summary(fitd)$coefficients["DOSE", ]
lm_json <- obj(
  coefficientNames = paste0("[", paste(str(names(b)), collapse = ", "), "]"),
  coefficients = arr(b), standardErrors = arr(sqrt(diag(V))), residualSd = num(summary(fit)$sigma), df = num(df),
  lsmeanP = lsm[["P"]], lsmeanL = lsm[["L"]], lsmeanH = lsm[["H"]],
  diffLvsP = ctr(lsvec("L") - lsvec("P")), diffHvsP = ctr(lsvec("H") - lsvec("P")), diffHvsL = ctr(lsvec("H") - lsvec("L")),
  doseSlope = obj(estimate = num(sd1[1]), se = num(sd1[2]), t = num(sd1[3]), p = num(sd1[4])))

# ---- survival: 3 arms, 2 strata, integer days (many ties), administrative and random censoring ----
set.seed(301)
m <- 180
tarm <- sample(c("P", "L", "H"), m, replace = TRUE)
tstrat <- sample(c("A", "B"), m, replace = TRUE)
rate <- c(P = 1/60, L = 1/85, H = 1/110)[tarm] * ifelse(tstrat == "B", 1.4, 1)
event_day <- ceiling(rexp(m, rate))
cens_day <- pmin(ceiling(runif(m, 20, 300)), 120)
time <- pmin(event_day, cens_day)
cnsr <- as.integer(event_day > cens_day)
ttedata <- data.frame(ARM = tarm, STRAT = tstrat, AVAL = time, CNSR = cnsr)
write.csv(ttedata, file.path(out, "efficacy_tte_data.csv"), row.names = FALSE, quote = FALSE)

km_json <- function(t, e, times) {
  f <- survfit(Surv(t, e) ~ 1, conf.type = "log-log")
  q <- quantile(f, 0.5)
  s <- summary(f, times = times, extend = FALSE)
  obj(n = num(length(t)), events = num(sum(e)), median = num(q$quantile), medianLower = num(q$lower), medianUpper = num(q$upper),
      times = arr(s$time), surv = arr(s$surv), lower = arr(s$lower), upper = arr(s$upper), stdErr = arr(s$std.err))
}
survdiff_json <- function(t, e, g, st = NULL) {
  sd <- if (is.null(st)) survdiff(Surv(t, e) ~ g) else survdiff(Surv(t, e) ~ g + strata(st))
  df <- length(unique(g)) - 1
  obj(chisq = num(sd$chisq), df = num(df), p = num(pchisq(sd$chisq, df, lower.tail = FALSE)))
}
cox_json <- function(t, e, x, ties, st = NULL) {
  f <- if (is.null(st)) coxph(Surv(t, e) ~ x, ties = ties, control = coxph.control(eps = 1e-12, toler.chol = 1e-13, iter.max = 50))
       else coxph(Surv(t, e) ~ x + strata(st), ties = ties, control = coxph.control(eps = 1e-12, toler.chol = 1e-13, iter.max = 50))
  ci <- exp(confint(f))
  obj(coef = num(coef(f)), se = num(sqrt(vcov(f)[1, 1])), hr = num(exp(coef(f))), lower = num(ci[1]), upper = num(ci[2]),
      loglik = num(f$loglik[2]))
}
pair_json <- function(d, active, control, hasStrata) {
  s <- d[d$ARM %in% c(active, control), ]
  x <- as.integer(s$ARM == active); e <- 1 - s$CNSR
  parts <- list(logrank = survdiff_json(s$AVAL, e, x),
                coxEfron = cox_json(s$AVAL, e, x, "efron"), coxBreslow = cox_json(s$AVAL, e, x, "breslow"))
  if (hasStrata) {
    parts$logrankStratified <- survdiff_json(s$AVAL, e, x, s$STRAT)
    parts$coxEfronStratified <- cox_json(s$AVAL, e, x, "efron", s$STRAT)
    parts$coxBreslowStratified <- cox_json(s$AVAL, e, x, "breslow", s$STRAT)
  }
  do.call(obj, parts)
}
arms_json <- function(d, arms, times) {
  do.call(obj, setNames(lapply(arms, function(a) { s <- d[d$ARM == a, ]; km_json(s$AVAL, 1 - s$CNSR, times) }), arms))
}
tte_json <- obj(
  km = arms_json(ttedata, c("P", "L", "H"), c(30, 60, 90, 119)),
  logrank3 = survdiff_json(ttedata$AVAL, 1 - ttedata$CNSR, ttedata$ARM),
  logrank3Stratified = survdiff_json(ttedata$AVAL, 1 - ttedata$CNSR, ttedata$ARM, ttedata$STRAT),
  LvsP = pair_json(ttedata, "L", "P", TRUE), HvsP = pair_json(ttedata, "H", "P", TRUE))

# ---- the CDISC pilot ADTTE (time to first dermatologic event), by actual treatment ----
pilot_file <- "../shared/data/cdiscpilot01/csv/adtte.csv"
pilot_json <- "null"
if (file.exists(pilot_file)) {
  p <- read.csv(pilot_file, stringsAsFactors = FALSE)
  p <- p[p$PARAMCD == "TTDE", ]
  p$ARM <- as.character(p$TRTAN)
  pilot_json <- obj(
    km = arms_json(p, c("0", "54", "81"), c(30, 60, 90, 180)),
    logrank3 = survdiff_json(p$AVAL, 1 - p$CNSR, p$ARM),
    d54vs0 = pair_json(p, "54", "0", FALSE), d81vs0 = pair_json(p, "81", "0", FALSE))
}

# ---- small curves for the quantile rules: flat at exactly 0.5, ending at 0.5, never reaching 0.5 ----
small <- function(t, e) { f <- survfit(Surv(t, e) ~ 1, conf.type = "log-log"); q <- quantile(f, 0.5)
  obj(times = arr(t), events = arr(e), median = num(q$quantile), medianLower = num(q$lower), medianUpper = num(q$upper)) }
small_json <- paste0("[", paste(c(
  small(c(1, 2, 3, 4), c(1, 1, 1, 1)),
  small(c(1, 2, 2, 3, 4, 5, 6, 7, 8, 9), c(1, 1, 0, 1, 0, 1, 1, 0, 1, 1)),
  small(c(2, 4, 6, 8), c(1, 1, 0, 0)),
  small(c(3, 5, 7, 9, 11, 13), c(1, 0, 1, 0, 0, 0)),
  small(c(5, 5, 5, 8, 10, 10, 12, 15, 15, 20, 22, 30), c(1, 1, 0, 1, 1, 1, 0, 1, 0, 1, 0, 0))), collapse = ", "), "]")

versions <- obj(R = str(R.version.string), survival = str(as.character(packageVersion("survival"))))
json <- paste0("{\n\"versions\": ", versions, ",\n\"linearModel\": ", lm_json, ",\n\"timeToEvent\": ", tte_json,
               ",\n\"smallCurves\": ", small_json, ",\n\"pilotAdtte\": ", pilot_json, "\n}\n")
writeLines(json, file.path(out, "efficacy_oracles.json"))
