# Reference values for the subgroup kind, computed independently in R from subject-level data:
# responders n/N (%) per arm and level, the difference in proportions with the Newcombe (1998,
# Stat Med 17:873-890, method 10) hybrid score interval built from base R's Wilson intervals
# (prop.test without continuity correction), and the treatment-by-subgroup interaction
# likelihood-ratio test: anova(glm(y ~ arm + sub), glm(y ~ arm * sub), test = "LRT") on the subjects
# of each active arm and the control.
# Run from the repository root after writing the default demo study:
#   dotnet run --project src/OutputForge.Cli -- demo --out <folder>
#   Rscript tests/OutputForge.Tests/Oracles/generate_subgroup_oracles.R <folder>/data
# Writes tests/OutputForge.Tests/Oracles/demo_subgroup_oracles.json (demo table 14.2.5.1; the demo
# data are pinned by SHA-256 in DemoStudyFingerprintTests). When ../shared/data/cdiscpilot01/csv is
# present it also writes pilot_subgroup_oracles.json: CIBIC+ improved (AVAL <= 3) at Week 24 by
# AGEGR1 and SEX in the CDISC pilot study, values only (the pilot data are never copied).
args <- commandArgs(trailingOnly = TRUE)
records <- character(0)
add <- function(table, row, column, statistic, value) {
  v <- if (is.na(value)) "null" else sprintf("%.17g", value)
  records <<- c(records, sprintf("{\"table\": \"%s\", \"row\": \"%s\", \"column\": \"%s\", \"statistic\": \"%s\", \"value\": %s}",
                                 table, row, column, statistic, v))
}
# A name in key form (docs/results.md, "Keys"), for the ASCII names of these data: signs spelt as words, then
# lower case with every run of other characters one "-".
key <- function(x) {
  for (s in list(c("<=", " le "), c(">=", " ge "), c("<", " lt "), c(">", " gt "), c("=", " eq "), c("\\+", " plus ")))
    x <- gsub(s[1], s[2], x)
  gsub("^-+|-+$", "", gsub("[^a-z0-9]+", "-", tolower(x)))
}
level_keys <- function(variable, values) paste0(key(variable), "/", key(values))
wilson <- function(x, n) as.numeric(prop.test(x, n, correct = FALSE)$conf.int)
newcombe <- function(x1, n1, x2, n2) {
  p1 <- x1 / n1; p2 <- x2 / n2; w1 <- wilson(x1, n1); w2 <- wilson(x2, n2); d <- p1 - p2
  c(d, d - sqrt((p1 - w1[1])^2 + (w2[2] - p2)^2), d + sqrt((w1[2] - p1)^2 + (p2 - w2[1])^2))
}
# subjects: data frame with arm (character), y (0/1), and the subgroup variables.
subgroup_table <- function(table, subjects, arms, arm_keys, variables, levels, minimum = 5) {
  control <- arms[1]
  cells <- function(row, s) {
    for (i in seq_along(arms)) {
      a <- s[s$arm == arms[i], ]
      add(table, row, arm_keys[i], "n", sum(a$y)); add(table, row, arm_keys[i], "N", nrow(a))
      if (nrow(a) > 0) add(table, row, arm_keys[i], "percent", 100 * mean(a$y))
    }
    c0 <- s[s$arm == control, ]
    for (i in seq_along(arms)[-1]) {
      a <- s[s$arm == arms[i], ]
      col <- paste0(arm_keys[i], "-vs-", arm_keys[1])
      if (nrow(a) < minimum || nrow(c0) < minimum) { add(table, row, col, "estimate", NA); next }
      e <- 100 * newcombe(sum(a$y), nrow(a), sum(c0$y), nrow(c0))
      add(table, row, col, "estimate", e[1]); add(table, row, col, "lower", e[2]); add(table, row, col, "upper", e[3])
    }
  }
  cells("overall", subjects)
  for (v in variables) {
    values <- levels[[v]]
    rk <- level_keys(v, values)
    for (j in seq_along(values)) cells(rk[j], subjects[subjects[[v]] %in% values[j], ])
    for (i in seq_along(arms)[-1]) {
      d <- subjects[subjects$arm %in% c(control, arms[i]) & subjects[[v]] %in% values, ]
      d$armf <- factor(d$arm, levels = c(control, arms[i]))
      d$sub <- factor(d[[v]], levels = values)
      a <- anova(glm(y ~ armf + sub, family = binomial, data = d), glm(y ~ armf * sub, family = binomial, data = d), test = "LRT")
      col <- paste0(arm_keys[i], "-vs-", arm_keys[1])
      add(table, paste0(key(v), "/interaction"), col, "pValue", a[2, "Pr(>Chi)"])
      add(table, paste0(key(v), "/interaction"), col, "statistic", a[2, "Deviance"])
      add(table, paste0(key(v), "/interaction"), col, "df", a[2, "Df"])
    }
  }
}
write_records <- function(file) {
  writeLines(paste0("{\n  \"generator\": \"tests/OutputForge.Tests/Oracles/generate_subgroup_oracles.R\",\n  \"r_version\": \"",
    R.version$version.string, "\",\n  \"records\": [\n    ", paste(records, collapse = ",\n    "), "\n  ]\n}"),
    file.path("tests", "OutputForge.Tests", "Oracles", file))
  records <<- character(0)
}

# ---- Demo 14.2.5.1: ITT, ITCHR50 at Week 12 (ANL01FL = Y), AVALC = Y, no record = non-responder ----
data <- args[1]
adsl <- read.csv(file.path(data, "adsl.csv"), stringsAsFactors = FALSE, na.strings = "")
adeff <- read.csv(file.path(data, "adeff.csv"), stringsAsFactors = FALSE, na.strings = "")
itt <- adsl[adsl$ITTFL == "Y", c("USUBJID", "TRT01P", "AGEGR1", "AGEGR1N", "SEX", "REGION1")]
rec <- adeff[adeff$PARAMCD == "ITCHR50" & adeff$AVISIT == "Week 12" & adeff$ANL01FL %in% "Y", c("USUBJID", "AVALC")]
s <- merge(itt, rec, by = "USUBJID", all.x = TRUE)
s$y <- as.integer(s$AVALC %in% "Y")
s$arm <- s$TRT01P
ages <- unique(s[order(s$AGEGR1N), "AGEGR1"])
subgroup_table("14.2.5.1", s, c("Placebo", "QF-217 10 mg", "QF-217 30 mg"), c("placebo", "qf-217-10-mg", "qf-217-30-mg"),
  c("AGEGR1", "SEX", "REGION1"), list(AGEGR1 = ages, SEX = c("F", "M"), REGION1 = sort(unique(s$REGION1))))
write_records("demo_subgroup_oracles.json")

# ---- CDISC pilot: CIBIC+ improved (AVAL <= 3) at Week 24, efficacy population, no record excluded ----
pilot <- file.path("..", "shared", "data", "cdiscpilot01", "csv")
if (file.exists(file.path(pilot, "adqscibc.csv"))) {
  padsl <- read.csv(file.path(pilot, "adsl.csv"), stringsAsFactors = FALSE, na.strings = "")
  cibic <- read.csv(file.path(pilot, "adqscibc.csv"), stringsAsFactors = FALSE, na.strings = "")
  c24 <- cibic[cibic$PARAMCD == "CIBICVAL" & cibic$ANL01FL %in% "Y" & cibic$AVISIT == "Week 24", c("USUBJID", "AVAL")]
  ps <- merge(padsl[padsl$EFFFL == "Y", c("USUBJID", "TRT01P", "AGEGR1", "AGEGR1N", "SEX")], c24, by = "USUBJID")
  ps <- ps[!is.na(ps$AVAL), ]
  ps$y <- as.integer(ps$AVAL <= 3)
  ps$arm <- ps$TRT01P
  subgroup_table("pilot-cibic-subgroups", ps, c("Placebo", "Xanomeline Low Dose", "Xanomeline High Dose"),
    c("placebo", "xanomeline-low-dose", "xanomeline-high-dose"), c("AGEGR1", "SEX"),
    list(AGEGR1 = unique(ps[order(ps$AGEGR1N), "AGEGR1"]), SEX = sort(unique(ps$SEX))))
  write_records("pilot_subgroup_oracles.json")
}
