# Reference values for the stratified responder check on the public CDISC pilot data (CDISCPILOT01):
# CIBIC+ improved (AVAL <= 3) at Week 24 in the efficacy population (EFFFL = 'Y'), records as the dataset has
# them (ANL01FL = 'Y', which keeps its own LOCF records; subjects without a record left out), each Xanomeline
# arm against Placebo, stratified by SITEGR1 (ADSL). R's mantelhaen.test without continuity correction gives the
# Cochran-Mantel-Haenszel statistic and p-value and the Mantel-Haenszel odds ratio with its
# Robins-Breslow-Greenland interval; the per-stratum counts are written too.
#
# Run from the repository root, with the data beside the repository:
#   Rscript tests/OutputForge.Tests/Validation/Oracles/cdiscpilot_cibic_cmh.R ../shared/data/cdiscpilot01/csv \
#     > tests/OutputForge.Tests/Validation/Oracles/cdiscpilot_cibic_cmh.json
# Only numbers derived from the data are written; the data themselves stay outside the repository.
args <- commandArgs(trailingOnly = TRUE)
folder <- args[1]
adsl <- read.csv(file.path(folder, "adsl.csv"), colClasses = "character")
cibic <- read.csv(file.path(folder, "adqscibc.csv"), colClasses = "character")
adsl <- adsl[adsl$EFFFL == "Y", c("USUBJID", "TRT01P", "SITEGR1")]
records <- cibic[cibic$PARAMCD == "CIBICVAL" & cibic$AVISIT == "Week 24" & cibic$ANL01FL == "Y", c("USUBJID", "AVAL")]
stopifnot(!any(duplicated(records$USUBJID)))
subjects <- merge(adsl, records, by = "USUBJID")
subjects$improved <- as.numeric(subjects$AVAL) <= 3
fmt <- function(x) sprintf("%.17g", x)
out <- c()
for (arm in c("Xanomeline Low Dose", "Xanomeline High Dose")) {
  pair <- subjects[subjects$TRT01P %in% c(arm, "Placebo"), ]
  x <- table(factor(pair$TRT01P, levels = c(arm, "Placebo")),
             factor(pair$improved, levels = c(TRUE, FALSE)),
             factor(pair$SITEGR1))
  t <- mantelhaen.test(x, correct = FALSE)
  strata <- paste(sapply(dimnames(x)[[3]], function(k) sprintf("[\"%s\", %d, %d, %d, %d]", k,
    x[1, 1, k], sum(x[1, , k]), x[2, 1, k], sum(x[2, , k]))), collapse = ", ")
  out <- c(out, sprintf("  \"%s\": { \"statistic\": %s, \"p\": %s, \"or\": %s, \"or_lower\": %s, \"or_upper\": %s, \"strata\": [%s] }",
    arm, fmt(t$statistic), fmt(t$p.value), fmt(t$estimate), fmt(t$conf.int[1]), fmt(t$conf.int[2]), strata))
}
cat("{\n")
cat(sprintf("  \"generator\": \"tests/OutputForge.Tests/Validation/Oracles/cdiscpilot_cibic_cmh.R\",\n  \"R\": \"%s\",\n", R.version.string))
cat(paste(out, collapse = ",\n"), "\n}\n")
