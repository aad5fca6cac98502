# Reference values for the categorical-by-visit kind, computed independently in R from the datasets:
# counts and percentages by visit and arm, and the generalized Cochran-Mantel-Haenszel statistics of
# the R package vcdExtra (CMHtest's overall statistics: cor = nonzero correlation, rmeans = row mean
# scores, general = general association), general association also from base R's mantelhaen.test.
# Run from the repository root after writing the default demo study:
#   dotnet run --project src/OutputForge.Cli -- demo --out <folder>
#   Rscript tests/OutputForge.Tests/Oracles/generate_categorical_by_visit_oracles.R <folder>/data
# Writes tests/OutputForge.Tests/Oracles/categorical_by_visit_oracles.json (demo study: SGICITCH) and,
# when ../shared/data/cdiscpilot01/csv is present, pilot_categorical_by_visit_oracles.json (CDISC pilot
# CIBIC+, adqscibc.csv): values only, the pilot data are never copied into the repository.
#
# Modified ridit scores are vcdExtra's "midrank" scores, computed by CMHtest2 within each stratum.
# Selection, as the kind documents it: population flag of ADSL, PARAMCD, ANL01FL = 'Y', DTYPE empty
# (observed) or also DTYPE = the imputation type; percentages of the subjects with a response at the
# visit; strata are the crossed values of the strata variables (from the record dataset when it has
# them, else ADSL); strata with fewer than 2 subjects in a comparison are left out.
# vcdExtra's CMHtest also computes a statistic for every single stratum, with solve(), which stops on a
# stratum whose own covariance matrix is singular (a category or an arm absent from it), although the
# overall statistic is defined. So the per-stratum pieces (n, m, V, A) are taken from vcdExtra's
# CMHtest2 with its per-stratum statistic switched off, and the overall statistic is vcdExtra's CMHtest3
# unchanged. For the general association test the categories empty in every stratum with two or more
# arms present are dropped (their rows of the covariance matrix are zero; the statistic is then of full rank, as the kind's
# pseudo-inverse gives with df = rank).
suppressMessages(library(vcdExtra))
cmh_pieces <- vcdExtra:::CMHtest2
piece_env <- new.env(parent = asNamespace("vcdExtra"))
piece_env$cmh <- function(n, m, A, V, df) c(NA, df, NA)
environment(cmh_pieces) <- piece_env

key <- function(s) gsub("^-+|-+$", "", gsub("[^a-z0-9]+", "-", tolower(s)))
num <- function(v) if (is.na(v)) "null" else sprintf("%.17g", v)

overall <- function(tables, test, J, ridit) {
  informative <- Filter(function(t) sum(rowSums(t) > 0) >= 2, tables)
  keep <- if (test == "general") which(Reduce(`+`, lapply(informative, colSums)) > 0) else seq_len(J)
  scores <- seq_len(J)[keep]
  pieces <- lapply(tables, function(t) cmh_pieces(t[, keep, drop = FALSE], rscores = seq_len(nrow(t)), cscores = if (ridit) "midrank" else scores,
                                                   types = test, details = TRUE))
  all <- vcdExtra:::CMHtest3(pieces, types = test)$table
  # With a single type CMHtest3 loses the name of its degrees of freedom (Df[type] is NA), so df is read
  # from the contrast matrix (its number of rows, which is how CMHtest2 sets Df) and p from pchisq.
  q <- as.numeric(all[test, "Chisq"])
  df <- nrow(pieces[[1]]$A[[test]])
  out <- list(statistic = q, df = df, p = pchisq(q, df, lower.tail = FALSE))
  if (test == "general") {
    x <- array(0, dim = c(nrow(tables[[1]]), length(keep), length(tables)))
    for (k in seq_along(tables)) x[, , k] <- tables[[k]][, keep, drop = FALSE]
    base <- if (length(tables) == 1) NULL else mantelhaen.test(x, correct = FALSE)
    if (!is.null(base)) {
      stopifnot(abs(base$statistic - out$statistic) < 1e-8 * max(1, out$statistic))
      out$base <- as.numeric(base$statistic)
    }
  }
  out
}

variant_records <- function(name, adsl, rec_all, spec) {
  records <- character(0)
  add <- function(row, column, statistic, value)
    records <<- c(records, sprintf('{"variant": "%s", "row": "%s", "column": "%s", "statistic": "%s", "value": %s}',
                                   name, row, column, statistic, num(value)))
  pop <- adsl[adsl[[spec$population]] %in% "Y", ]
  arms <- spec$arms
  control <- arms[1]
  J <- spec$categories
  for (visit in spec$visits) {
    vk <- key(visit)
    rec <- rec_all[rec_all$PARAMCD == spec$parameter & rec_all$ANL01FL %in% "Y" & rec_all$AVISIT == visit &
                   (is.na(rec_all$DTYPE) | rec_all$DTYPE %in% spec$imputation) & !is.na(rec_all$AVAL), ]
    stopifnot(!any(duplicated(rec$USUBJID)))
    rec <- rec[rec$USUBJID %in% pop$USUBJID, ]
    rec$ARM <- pop$TRT01P[match(rec$USUBJID, pop$USUBJID)]
    for (s in spec$strata) {
      rec[[paste0("S_", s)]] <- if (s %in% names(rec_all)) rec[[s]] else adsl[[s]][match(rec$USUBJID, adsl$USUBJID)]
    }
    for (a in arms) {
      x <- rec$AVAL[rec$ARM == a]
      add(paste0(vk, "/n"), key(a), "n", length(x))
      for (j in seq_len(J)) {
        add(paste0(vk, "/category-", j), key(a), "n", sum(x == j))
        add(paste0(vk, "/category-", j), key(a), "percent", if (length(x) == 0) NA else 100 * sum(x == j) / length(x))
      }
      add(paste0(vk, "/missing"), key(a), "n", sum(pop$TRT01P == a) - length(x))
    }
    sets <- if (spec$comparison == "all-arms") list(list(column = "p-value", arms = arms)) else
      lapply(arms[-1], function(a) list(column = paste0("p-value-", key(a)), arms = c(control, a)))
    for (set in sets) {
      r <- rec[rec$ARM %in% set$arms, ]
      stratum <- if (length(spec$strata) == 0) rep("all", nrow(r)) else
        do.call(paste, c(lapply(spec$strata, function(s) r[[paste0("S_", s)]]), sep = " | "))
      r <- r[!is.na(stratum) & !grepl("(^| )NA( |$)", stratum), ]
      stratum <- stratum[!is.na(stratum) & !grepl("(^| )NA( |$)", stratum)]
      sizes <- table(stratum)
      used <- names(sizes)[sizes >= 2]
      tables <- lapply(used, function(s) {
        rs <- r[stratum == s, ]
        t(sapply(set$arms, function(a) tabulate(rs$AVAL[rs$ARM == a], nbins = J)))
      })
      res <- tryCatch(overall(tables, spec$test, J, identical(spec$scores, "modified-ridit")), error = function(e) stop(name, " ", visit, " ", set$column, ": ", conditionMessage(e)))
      add(paste0(vk, "/n"), set$column, "pValue", res$p)
      add(paste0(vk, "/n"), set$column, "statistic", res$statistic)
      add(paste0(vk, "/n"), set$column, "df", res$df)
      add(paste0(vk, "/n"), set$column, "strata", length(used))
      if (!is.null(res$base)) add(paste0(vk, "/n"), set$column, "base-statistic", res$base)
    }
  }
  records
}

write_oracle <- function(file, adsl, rec, variants) {
  records <- unlist(lapply(names(variants), function(n) variant_records(n, adsl, rec, variants[[n]])))
  settings <- sapply(names(variants), function(n) {
    v <- variants[[n]]
    sprintf('"%s": {"imputation": %s, "strata": [%s], "test": "%s", "comparison": "%s", "scores": "%s"}', n,
            if (length(v$imputation) == 0) "null" else sprintf('"%s"', v$imputation),
            paste(sprintf('"%s"', v$strata), collapse = ", "), c(cor = "correlation", rmeans = "row-mean-scores", general = "general-association")[v$test],
            v$comparison, if (is.null(v$scores)) "category-values" else v$scores)
  })
  writeLines(c("{", sprintf('"versions": {"R": "%s", "vcdExtra": "%s"},', R.version.string, as.character(packageVersion("vcdExtra"))),
               '"generator": "tests/OutputForge.Tests/Oracles/generate_categorical_by_visit_oracles.R",',
               '"variants": {', paste(settings, collapse = ",\n"), '},',
               '"records": [', paste(records, collapse = ",\n"), "]", "}"), file)
}

args <- commandArgs(trailingOnly = TRUE)
data <- args[1]
adsl <- read.csv(file.path(data, "adsl.csv"), stringsAsFactors = FALSE, na.strings = "")
adeff <- read.csv(file.path(data, "adeff.csv"), stringsAsFactors = FALSE, na.strings = "")
demo <- function(imputation, strata, test, comparison, scores = "category-values") list(population = "ITTFL", parameter = "SGICITCH",
  visits = c("Week 4", "Week 8", "Week 12"), categories = 7, arms = c("Placebo", "QF-217 10 mg", "QF-217 30 mg"),
  imputation = imputation, strata = strata, test = test, comparison = comparison, scores = scores)
write_oracle("tests/OutputForge.Tests/Oracles/categorical_by_visit_oracles.json", adsl, adeff, list(
  "14.2.4.1" = demo(character(0), c("STRAT1R", "STRAT2R"), "rmeans", "each-vs-control"),
  "14.2.4.2" = demo("LOCF", c("STRAT1R", "STRAT2R"), "rmeans", "each-vs-control"),
  "observed-unstratified-all-general" = demo(character(0), character(0), "general", "all-arms"),
  "observed-region-all-correlation" = demo(character(0), "STRAT1R", "cor", "all-arms"),
  "locf-severity-each-general" = demo("LOCF", "STRAT2R", "general", "each-vs-control"),
  "observed-strata-each-ridit" = demo(character(0), c("STRAT1R", "STRAT2R"), "rmeans", "each-vs-control", "modified-ridit")))

pilot <- "../shared/data/cdiscpilot01/csv"
if (file.exists(file.path(pilot, "adqscibc.csv"))) {
  padsl <- read.csv(file.path(pilot, "adsl.csv"), stringsAsFactors = FALSE, na.strings = "")
  cibic <- read.csv(file.path(pilot, "adqscibc.csv"), stringsAsFactors = FALSE, na.strings = "")
  cibic$SITEGR1 <- as.character(cibic$SITEGR1)
  padsl$SITEGR1 <- as.character(padsl$SITEGR1)
  pilot_spec <- function(imputation, strata, test, comparison, scores = "category-values") list(population = "EFFFL", parameter = "CIBICVAL",
    visits = c("Week 8", "Week 16", "Week 24"), categories = 7, arms = c("Placebo", "Xanomeline Low Dose", "Xanomeline High Dose"),
    imputation = imputation, strata = strata, test = test, comparison = comparison, scores = scores)
  write_oracle("tests/OutputForge.Tests/Oracles/pilot_categorical_by_visit_oracles.json", padsl, cibic, list(
    "14-3.02" = pilot_spec("LOCF", "SITEGR1", "rmeans", "each-vs-control"),
    "observed-unstratified-all-general" = pilot_spec(character(0), character(0), "general", "all-arms"),
    "observed-site-all-correlation" = pilot_spec(character(0), "SITEGR1", "cor", "all-arms"),
    "locf-site-each-general" = pilot_spec("LOCF", "SITEGR1", "general", "each-vs-control"),
    "locf-site-all-ridit" = pilot_spec("LOCF", "SITEGR1", "rmeans", "all-arms", "modified-ridit")))
}
