# Reference values for the demo study's efficacy tables 14.2.2.1 (continuous, ANCOVA) and 14.2.3.1 /
# 14.2.3.2 (time to event), computed independently in R from the demo datasets.
# Run from the repository root after writing the default demo study:
#   dotnet run --project src/OutputForge.Cli -- demo --out <folder>
#   Rscript tests/OutputForge.Tests/Oracles/generate_demo_efficacy_oracles.R <folder>/data
# Writes tests/OutputForge.Tests/Oracles/demo_efficacy_oracles.json: records keyed like results.json
# (table, row, column, statistic, value). The data are pinned by SHA-256 in DemoStudyFingerprintTests.
# When ../shared/data/cdiscpilot01/csv is present it also writes pilot_efficacy_oracles.json, the same
# computations on the CDISC pilot study (CIBIC+ at Week 24; time to first dermatologic event): values
# only, the pilot data are never copied into the repository.
library(survival)
args <- commandArgs(trailingOnly = TRUE)
data <- args[1]
adsl <- read.csv(file.path(data, "adsl.csv"), stringsAsFactors = FALSE, na.strings = "")
adeff <- read.csv(file.path(data, "adeff.csv"), stringsAsFactors = FALSE, na.strings = "")
adtte <- read.csv(file.path(data, "adtte.csv"), stringsAsFactors = FALSE, na.strings = "")
arms <- c("Placebo", "QF-217 10 mg", "QF-217 30 mg")
keys <- c("placebo", "qf-217-10-mg", "qf-217-30-mg")
records <- character(0)
add <- function(table, row, column, statistic, value) {
  v <- if (is.na(value)) "null" else sprintf("%.17g", value)
  records <<- c(records, sprintf("{\"table\": \"%s\", \"row\": \"%s\", \"column\": \"%s\", \"statistic\": \"%s\", \"value\": %s}",
                                 table, row, column, statistic, v))
}

# ---- 14.2.2.1: ITT, ITCH, ANL01FL = Y, Week 4 / 8 / 12 ----
itt <- adsl[adsl$ITTFL == "Y", c("USUBJID", "TRT01P", "STRAT1R", "STRAT2R")]
for (visit in c("Week 4", "Week 8", "Week 12")) {
  vk <- tolower(gsub(" ", "-", visit))
  rec <- adeff[adeff$PARAMCD == "ITCH" & adeff$ANL01FL %in% "Y" & adeff$AVISIT == visit, ]
  rec <- merge(rec[, c("USUBJID", "BASE", "AVAL", "CHG", "TRT01PN")], itt, by = "USUBJID")
  for (i in seq_along(arms)) {
    a <- rec[rec$TRT01P == arms[i], ]
    for (v in list(c("baseline", "BASE"), c("value", "AVAL"), c("change", "CHG"))) {
      x <- a[[v[2]]]; x <- x[!is.na(x)]
      add("14.2.2.1", paste0(vk, "/", v[1], "/n"), keys[i], "n", length(x))
      add("14.2.2.1", paste0(vk, "/", v[1], "/mean-sd"), keys[i], "mean", mean(x))
      add("14.2.2.1", paste0(vk, "/", v[1], "/mean-sd"), keys[i], "sd", sd(x))
      add("14.2.2.1", paste0(vk, "/", v[1], "/median"), keys[i], "median", median(x))
      add("14.2.2.1", paste0(vk, "/", v[1], "/min-max"), keys[i], "min", min(x))
      add("14.2.2.1", paste0(vk, "/", v[1], "/min-max"), keys[i], "max", max(x))
    }
  }
  m <- rec[!is.na(rec$CHG), ]
  m$TRT <- factor(m$TRT01P, levels = arms)
  m$S1 <- factor(m$STRAT1R); m$S2 <- factor(m$STRAT2R)
  fit <- lm(CHG ~ TRT + BASE + S1 + S2, data = m)
  b <- coef(fit); V <- vcov(fit); df <- fit$df.residual; q <- qt(0.975, df)
  # LS means by hand: BASE at its observed mean, each level of S1 and S2 weighted equally.
  k1 <- nlevels(m$S1); k2 <- nlevels(m$S2)
  lsv <- function(arm) c(1, arm == arms[2], arm == arms[3], mean(m$BASE), rep(1 / k1, k1 - 1), rep(1 / k2, k2 - 1))
  put <- function(row, col, cv, ci = TRUE, se = TRUE, p = FALSE, cirow = NULL, prow = NULL) {
    est <- sum(cv * b); s <- sqrt(drop(t(cv) %*% V %*% cv))
    add("14.2.2.1", row, col, "estimate", est)
    if (se) add("14.2.2.1", row, col, "se", s)
    if (ci) { r <- if (is.null(cirow)) row else cirow; add("14.2.2.1", r, col, "lower", est - q * s); add("14.2.2.1", r, col, "upper", est + q * s) }
    if (p) add("14.2.2.1", prow, col, "pValue", 2 * pt(-abs(est / s), df))
  }
  for (i in seq_along(arms)) {
    add("14.2.2.1", paste0(vk, "/model-n"), keys[i], "n", sum(m$TRT01P == arms[i]))
    put(paste0(vk, "/lsmean"), keys[i], lsv(arms[i]))
  }
  for (i in 2:3) put(paste0(vk, "/lsdiff"), keys[i], lsv(arms[i]) - lsv(arms[1]), cirow = paste0(vk, "/lsdiff-ci"), p = TRUE, prow = paste0(vk, "/lsdiff-p-value"))
  pk <- paste0(vk, "/lsdiff-qf-217-30-mg-vs-qf-217-10-mg")
  put(pk, keys[3], lsv(arms[3]) - lsv(arms[2]), cirow = paste0(pk, "-ci"), p = TRUE, prow = paste0(pk, "-p-value"))
  dfit <- summary(lm(CHG ~ TRT01PN + BASE + S1 + S2, data = m))$coefficients
  add("14.2.2.1", paste0(vk, "/dose-response"), "placebo", "estimate", dfit["TRT01PN", 1])
  add("14.2.2.1", paste0(vk, "/dose-response"), "placebo", "pValue", dfit["TRT01PN", 4])
}

# ---- 14.2.3.1 (TTRESP, stratified, Efron, event probabilities) and 14.2.3.2 (TTDISC, Breslow) ----
tte <- function(table, param, times, stratified, ties, cumulative) {
  d <- merge(adtte[adtte$PARAMCD == param, c("USUBJID", "AVAL", "CNSR")], itt, by = "USUBJID")
  d$E <- 1 - d$CNSR
  for (i in seq_along(arms)) {
    a <- d[d$TRT01P == arms[i], ]
    add(table, "analysed", keys[i], "n", nrow(a))
    add(table, "events", keys[i], "n", sum(a$E))
    add(table, "censored", keys[i], "n", sum(a$CNSR))
    f <- survfit(Surv(AVAL, E) ~ 1, data = a, conf.type = "log-log")
    qm <- quantile(f, 0.5)
    add(table, "median", keys[i], "median", qm$quantile)
    add(table, "median-ci", keys[i], "lower", qm$lower)
    add(table, "median-ci", keys[i], "upper", qm$upper)
    s <- summary(f, times = times, extend = FALSE)
    for (k in seq_along(s$time)) {
      row <- paste0("km-at-", s$time[k])
      if (cumulative) { add(table, row, keys[i], "estimate", 100 * (1 - s$surv[k])); add(table, row, keys[i], "lower", 100 * (1 - s$upper[k])); add(table, row, keys[i], "upper", 100 * (1 - s$lower[k])) }
      else { add(table, row, keys[i], "estimate", 100 * s$surv[k]); add(table, row, keys[i], "lower", 100 * s$lower[k]); add(table, row, keys[i], "upper", 100 * s$upper[k]) }
    }
  }
  for (i in 2:3) {
    p <- d[d$TRT01P %in% arms[c(1, i)], ]
    p$X <- as.integer(p$TRT01P == arms[i])
    sd <- if (stratified) survdiff(Surv(AVAL, E) ~ X + strata(STRAT1R, STRAT2R), data = p) else survdiff(Surv(AVAL, E) ~ X, data = p)
    add(table, "log-rank", keys[i], "statistic", sd$chisq)
    add(table, "log-rank", keys[i], "pValue", pchisq(sd$chisq, 1, lower.tail = FALSE))
    ctl <- coxph.control(eps = 1e-12, toler.chol = 1e-13, iter.max = 50)
    cf <- if (stratified) coxph(Surv(AVAL, E) ~ X + strata(STRAT1R, STRAT2R), data = p, ties = ties, control = ctl)
          else coxph(Surv(AVAL, E) ~ X, data = p, ties = ties, control = ctl)
    ci <- exp(confint(cf))
    add(table, "hazard-ratio", keys[i], "estimate", exp(coef(cf)))
    add(table, "hazard-ratio-ci", keys[i], "lower", ci[1])
    add(table, "hazard-ratio-ci", keys[i], "upper", ci[2])
  }
}
tte("14.2.3.1", "TTRESP", c(29, 57, 85), TRUE, "efron", TRUE)
tte("14.2.3.2", "TTDISC", c(28, 56, 84), FALSE, "breslow", FALSE)

write_records <- function(file) {
  json <- paste0("{\n\"versions\": {\"R\": \"", R.version.string, "\", \"survival\": \"", as.character(packageVersion("survival")),
                 "\"},\n\"records\": [\n", paste(records, collapse = ",\n"), "\n]\n}\n")
  writeLines(json, file.path("tests/OutputForge.Tests/Oracles", file))
  records <<- character(0)
}
write_records("demo_efficacy_oracles.json")

pilot <- "../shared/data/cdiscpilot01/csv"
if (file.exists(file.path(pilot, "adqscibc.csv"))) {
  padsl <- read.csv(file.path(pilot, "adsl.csv"), stringsAsFactors = FALSE, na.strings = "")
  arms <- c("Placebo", "Xanomeline Low Dose", "Xanomeline High Dose")
  keys <- c("placebo", "xanomeline-low-dose", "xanomeline-high-dose")
  # CIBIC+ at Week 24 (ANL01FL = Y, LOCF rows included as the dataset flags them), efficacy population,
  # ANCOVA of AVAL with treatment and pooled site group SITEGR1, dose-response with TRT01PN.
  cibic <- read.csv(file.path(pilot, "adqscibc.csv"), stringsAsFactors = FALSE, na.strings = "")
  c24 <- cibic[cibic$PARAMCD == "CIBICVAL" & cibic$ANL01FL %in% "Y" & cibic$AVISIT == "Week 24", c("USUBJID", "AVAL", "SITEGR1")]
  c24 <- merge(c24, padsl[padsl$EFFFL == "Y", c("USUBJID", "TRT01P", "TRT01PN")], by = "USUBJID")
  for (i in seq_along(arms)) {
    x <- c24$AVAL[c24$TRT01P == arms[i]]; x <- x[!is.na(x)]
    add("pilot-cibic", "week-24/value/n", keys[i], "n", length(x))
    add("pilot-cibic", "week-24/value/mean-sd", keys[i], "mean", mean(x))
    add("pilot-cibic", "week-24/value/mean-sd", keys[i], "sd", sd(x))
    add("pilot-cibic", "week-24/value/median", keys[i], "median", median(x))
  }
  c24 <- c24[!is.na(c24$AVAL), ]
  c24$TRT <- factor(c24$TRT01P, levels = arms); c24$SG <- factor(c24$SITEGR1)
  fit <- lm(AVAL ~ TRT + SG, data = c24)
  b <- coef(fit); V <- vcov(fit); df <- fit$df.residual; q <- qt(0.975, df); k <- nlevels(c24$SG)
  lsv <- function(arm) c(1, arm == arms[2], arm == arms[3], rep(1 / k, k - 1))
  for (i in seq_along(arms)) {
    cv <- lsv(arms[i]); est <- sum(cv * b); se <- sqrt(drop(t(cv) %*% V %*% cv))
    add("pilot-cibic", "week-24/lsmean", keys[i], "estimate", est); add("pilot-cibic", "week-24/lsmean", keys[i], "se", se)
  }
  for (i in 2:3) {
    cv <- lsv(arms[i]) - lsv(arms[1]); est <- sum(cv * b); se <- sqrt(drop(t(cv) %*% V %*% cv))
    add("pilot-cibic", "week-24/lsdiff", keys[i], "estimate", est); add("pilot-cibic", "week-24/lsdiff", keys[i], "se", se)
    add("pilot-cibic", "week-24/lsdiff-ci", keys[i], "lower", est - q * se); add("pilot-cibic", "week-24/lsdiff-ci", keys[i], "upper", est + q * se)
    add("pilot-cibic", "week-24/lsdiff-p-value", keys[i], "pValue", 2 * pt(-abs(est / se), df))
  }
  dfit <- summary(lm(AVAL ~ TRT01PN + SG, data = c24))$coefficients
  add("pilot-cibic", "week-24/dose-response", "placebo", "estimate", dfit["TRT01PN", 1])
  add("pilot-cibic", "week-24/dose-response", "placebo", "pValue", dfit["TRT01PN", 4])

  # Time to first dermatologic event (TTDE), safety population by actual treatment (TRT01A), Efron ties.
  # tte() reads the globals adtte, itt (subjects with their arm in TRT01P), arms and keys.
  adtte <- read.csv(file.path(pilot, "adtte.csv"), stringsAsFactors = FALSE, na.strings = "")
  safety <- padsl[padsl$SAFFL == "Y", ]
  itt <- data.frame(USUBJID = safety$USUBJID, TRT01P = safety$TRT01A, stringsAsFactors = FALSE)
  tte("pilot-ttde", "TTDE", c(30, 60, 90, 180), FALSE, "efron", FALSE)
  write_records("pilot_efficacy_oracles.json")
}
