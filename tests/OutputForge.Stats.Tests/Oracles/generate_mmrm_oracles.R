# Reference values for the mixed model for repeated measures (OutputForge.Stats.Models.Mmrm).
# Run from the repository root:
#   Rscript tests/OutputForge.Stats.Tests/Oracles/generate_mmrm_oracles.R
# Needs the Debian packages r-base-core r-cran-nlme r-cran-emmeans r-cran-pbkrtest r-cran-lme4 r-cran-jsonlite r-cran-numderiv.
# Writes, next to this script: mmrm_data.csv (an invented repeated-measures study drawn here with
# set.seed) and mmrm_oracles.json (the values; R and package versions are recorded inside it).
# The CDISC pilot ADAS-Cog data is read from ../shared/data/cdiscpilot01/dataset-json/adqsadas.json
# when present; only the fitted values go into the JSON, the data itself is never copied.
#
# Sources of each value:
#  - fits: nlme::gls, REML (and ML for unstructured). Unstructured = corSymm + varIdent(visit);
#    compound symmetry = corCompSymm; heterogeneous CS = corCompSymm + varIdent; AR(1) = corAR1;
#    heterogeneous AR(1) = corAR1 + varIdent; Toeplitz = corARMA(p = T - 1, q = 0): a stationary
#    AR(T-1) correlation is parametrised by its T-1 partial autocorrelations in (-1, 1), which map
#    one to one onto the positive definite Toeplitz correlation matrices of size T (Durbin-Levinson),
#    so its REML fit is the Toeplitz fit. nlme's own coefficients and log-likelihood are recorded
#    ("nlme"); nlme stops with a log-likelihood gradient of about 1e-5, so the estimate is then taken to
#    the optimum by Newton steps on the (restricted) log-likelihood written out below with dense
#    matrices, with numDeriv's Richardson-extrapolated derivatives, and all other values are computed
#    there.
#  - LS means and differences: the coefficient vectors of emmeans (its default weighting: other
#    factors equally, BASE at its mean over the records), applied to the polished estimate; emmeans'
#    own estimates, SE and Satterthwaite df (mode = "satterthwaite", which differentiates nlme's
#    finite-difference apVar and is only good to about 1e-2 in the df) are recorded under "emmeans".
#  - Satterthwaite df: 2 (k'Phi k)^2 / (g'A g) with numDeriv's gradient g of k'Phi(theta)k and A the
#    inverse of numDeriv's Hessian of -loglik; multi-df (Type 3): Fai & Cornelius (1996) combination
#    of the eigen-contrasts of L Phi L', written out below.
#  - Type 3 F statistics: the Wald F of the term's columns in the fit with sum-to-zero contrasts (and
#    nlme's anova(type = "marginal") at nlme's own estimate, "nlmeF").
#  - Kenward-Roger: pbkrtest's vcovAdj_internal / Lb_ddf / .KR_adjust, fed with the marginal
#    covariance V and its derivatives dV/dtheta in the parametrisation documented in docs/methods.md.
#    pbkrtest assumes V linear in theta; for the structures that are not (AR(1), heterogeneous CS and
#    AR(1)) the second-derivative term -1/4 R_ij of Kenward & Roger (1997, eq. for Phi_A) is added here
#    by hand. Compound symmetry is also checked against lme4::lmer with a random subject intercept and
#    emmeans(lmer.df = "kenward-roger").
suppressPackageStartupMessages({ library(nlme); library(emmeans); library(pbkrtest); library(lme4); library(jsonlite); library(numDeriv) })
out <- "tests/OutputForge.Stats.Tests/Oracles"
emm_options(opt.digits = FALSE)

# ---- JSON writing with full precision ----
js <- function(x) {
  if (is.null(x)) return("null")
  if (is.list(x)) {
    if (!is.null(names(x))) return(paste0("{", paste(sprintf("\"%s\": %s", names(x), sapply(x, js)), collapse = ", "), "}"))
    return(paste0("[", paste(sapply(x, js), collapse = ", "), "]"))
  }
  if (is.matrix(x)) return(js(lapply(seq_len(nrow(x)), function(i) as.numeric(x[i, ]))))
  if (is.character(x)) { v <- sprintf("\"%s\"", x); return(if (length(x) == 1 && is.null(attr(x, "array"))) v else paste0("[", paste(v, collapse = ", "), "]")) }
  v <- ifelse(is.na(x) | !is.finite(x), "null", sprintf("%.17g", as.numeric(x)))
  if (length(x) == 1 && is.null(attr(x, "array"))) v else paste0("[", paste(v, collapse = ", "), "]")
}
arr <- function(x) { attr(x, "array") <- TRUE; x }

# ---- invented study: 60 subjects x 4 visits, 2 arms, a stratum, a baseline, MAR dropout ----
set.seed(20261204)
nsub <- 60
visits <- c("W04", "W08", "W12", "W16")
subj <- sprintf("MM-%03d", 1:nsub)
arm <- rep(c("PBO", "ACT"), length.out = nsub)
strat <- sample(c("LOW", "HIGH"), nsub, replace = TRUE, prob = c(0.6, 0.4))
base <- round(rnorm(nsub, 30, 6), 1)
sdv <- c(3, 3.6, 4.2, 5)
cor <- outer(1:4, 1:4, function(i, j) 0.75^abs(i - j) * 0.9 + 0.1 * (i == j))
Sigma <- diag(sdv) %*% cor %*% diag(sdv)
mu_pbo <- c(-1, -1.8, -2.4, -2.8); mu_act <- c(-1.5, -3.0, -4.2, -5.2)
rows <- list()
for (s in 1:nsub) {
  e <- drop(t(chol(Sigma)) %*% rnorm(4))
  mu <- if (arm[s] == "ACT") mu_act else mu_pbo
  y <- round(mu - 0.15 * (base[s] - 30) + ifelse(strat[s] == "HIGH", 0.8, 0) + e, 2)
  for (v in 1:4) {
    # Missing at random: the chance of leaving after a visit grows with the last observed worsening.
    if (v > 1 && runif(1) < plogis(-3.6 + 0.35 * y[v - 1])) break
    rows[[length(rows) + 1]] <- data.frame(USUBJID = subj[s], ARM = arm[s], STRAT = strat[s], BASE = base[s],
                                           AVISIT = visits[v], AVISITN = v, CHG = y[v])
  }
}
ana <- do.call(rbind, rows)
# Intermittent gaps as well as dropout: two subjects miss a middle visit.
ana <- ana[!(ana$USUBJID == "MM-007" & ana$AVISIT == "W08") & !(ana$USUBJID == "MM-018" & ana$AVISIT == "W12"), ]
rownames(ana) <- NULL
write.csv(ana, file.path(out, "mmrm_data.csv"), row.names = FALSE, quote = FALSE)

prep <- function(d, armlev, vislev, stratlev) {
  d$ARM <- factor(d$ARM, levels = armlev); d$AVISIT <- factor(d$AVISIT, levels = vislev)
  d$STRAT <- factor(d$STRAT, levels = stratlev); d$USUBJID <- factor(d$USUBJID)
  d[order(d$USUBJID, d$AVISITN), ]
}
ana <- prep(ana, c("PBO", "ACT"), visits, c("LOW", "HIGH"))
form <- CHG ~ ARM + AVISIT + STRAT + BASE + ARM:AVISIT + AVISIT:BASE

ctl <- glsControl(tolerance = 1e-12, msTol = 1e-14, maxIter = 500, msMaxIter = 1000, opt = "nlminb", natural = FALSE)
fit_gls <- function(structure, d, method = "REML") {
  cs <- switch(structure,
    UN = corSymm(form = ~ AVISITN | USUBJID), CS = corCompSymm(form = ~ 1 | USUBJID),
    CSH = corCompSymm(form = ~ 1 | USUBJID), AR1 = corAR1(form = ~ AVISITN | USUBJID),
    ARH = corAR1(form = ~ AVISITN | USUBJID), TOEP = corARMA(form = ~ AVISITN | USUBJID, p = nlevels(d$AVISIT) - 1, q = 0))
  w <- if (structure %in% c("UN", "CSH", "ARH")) varIdent(form = ~ 1 | AVISIT) else NULL
  assign(".mmrm_data", d, envir = globalenv())
  eval(bquote(gls(.(form), data = .mmrm_data, correlation = .(cs), weights = .(w), method = .(method), control = ctl)))
}

# The within-subject covariance matrix Sigma (all visits) of a fit, read from a subject seen at every visit.
sigma_of <- function(fit, d) {
  tv <- nlevels(d$AVISIT)
  full <- names(which(table(d$USUBJID) == tv))[1]
  unname(as.matrix(getVarCov(fit, individual = full)))
}

# theta (the parametrisation of docs/methods.md), dSigma/dtheta and d2Sigma/dtheta dtheta.
structure_derivs <- function(structure, S) {
  tv <- nrow(S); d1 <- list(); d2 <- list(); E <- function(i, j) { m <- matrix(0, tv, tv); m[i, j] <- 1; m[j, i] <- 1; m }
  lag <- abs(outer(1:tv, 1:tv, "-"))
  if (structure == "UN") {
    for (j in 1:tv) for (i in j:tv) d1[[length(d1) + 1]] <- E(i, j)
  } else if (structure == "CS") {
    d1 <- list(matrix(1, tv, tv), diag(tv))
  } else if (structure == "TOEP") {
    for (k in 0:(tv - 1)) d1[[k + 1]] <- (lag == k) * 1
  } else {
    hetero <- structure %in% c("CSH", "ARH")
    rho <- if (structure %in% c("CS", "CSH")) S[1, 2] / sqrt(S[1, 1] * S[2, 2]) else S[1, 2] / sqrt(S[1, 1] * S[2, 2])
    C <- if (structure == "CSH") { m <- matrix(rho, tv, tv); diag(m) <- 1; m } else rho^lag
    dC <- if (structure == "CSH") { m <- matrix(1, tv, tv); diag(m) <- 0; m } else lag * rho^pmax(lag - 1, 0)
    d2C <- if (structure == "CSH") matrix(0, tv, tv) else lag * (lag - 1) * rho^pmax(lag - 2, 0)
    s <- sqrt(diag(S)); ss <- outer(s, s)
    if (hetero) {
      v <- diag(S); np <- tv + 1
      d2 <- vector("list", np * np)
      at <- function(a, b) (a - 1) * np + b
      for (a in 1:tv) {
        ea <- outer(1:tv == a, rep(TRUE, tv)) + outer(rep(TRUE, tv), 1:tv == a)
        d1[[a]] <- C * ss * ea / (2 * v[a])
        for (b in 1:tv) {
          if (a == b) { ex <- ea / 2; d2[[at(a, a)]] <- C * ss * ex * (ex - 1) / v[a]^2 }
          else { m <- (outer(1:tv == a, 1:tv == b) + outer(1:tv == b, 1:tv == a)) * 1; d2[[at(a, b)]] <- C * ss * m / (4 * v[a] * v[b]) }
        }
        d2[[at(a, np)]] <- d2[[at(np, a)]] <- dC * ss * ea / (2 * v[a])
      }
      d1[[np]] <- dC * ss; d2[[at(np, np)]] <- d2C * ss
    } else {
      s2 <- S[1, 1]
      d1 <- list(C, s2 * dC)
      d2 <- list(matrix(0, tv, tv), dC, dC, s2 * d2C)
    }
  }
  list(d1 = d1, d2 = if (length(d2) == 0) NULL else d2)
}

blockdiag_of <- function(d, S) {
  n <- nrow(d); V <- matrix(0, n, n)
  for (id in unique(d$USUBJID)) { r <- which(d$USUBJID == id); v <- d$AVISITN[r]; V[r, r] <- S[v, v] }
  V
}

# ---- the REML (or ML) log-likelihood written out here, in the theta of docs/methods.md ----
theta_of <- function(structure, S) {
  tv <- nrow(S); r <- S[1, 2] / sqrt(S[1, 1] * S[2, 2])
  switch(structure, UN = S[lower.tri(S, diag = TRUE)], CS = c(S[1, 2], S[1, 1] - S[1, 2]),
         CSH = c(diag(S), r), AR1 = c(S[1, 1], S[1, 2] / S[1, 1]), ARH = c(diag(S), r), TOEP = S[1, ])
}
sigma_of_theta <- function(structure, th, tv) {
  lag <- abs(outer(1:tv, 1:tv, "-"))
  switch(structure,
    UN = { S <- matrix(0, tv, tv); S[lower.tri(S, diag = TRUE)] <- th; S + t(S) - diag(diag(S)) },
    CS = matrix(th[1], tv, tv) + diag(th[2], tv),
    CSH = { C <- matrix(th[tv + 1], tv, tv); diag(C) <- 1; outer(sqrt(th[1:tv]), sqrt(th[1:tv])) * C },
    AR1 = th[1] * th[2]^lag,
    ARH = outer(sqrt(th[1:tv]), sqrt(th[1:tv])) * th[tv + 1]^lag,
    TOEP = matrix(th[lag + 1], tv, tv))
}
gls_at <- function(structure, th, d, X, method = "REML") {
  S <- sigma_of_theta(structure, th, nlevels(d$AVISIT))
  if (min(eigen(S, symmetric = TRUE, only.values = TRUE)$values) <= 0) return(NULL)
  # Subject by subject: V is block diagonal.
  rows <- split(seq_len(nrow(d)), d$USUBJID); p <- ncol(X); n <- nrow(X)
  XtViX <- matrix(0, p, p); XtViy <- numeric(p); logdet <- 0
  for (r in rows) {
    v <- d$AVISITN[r]; Si <- S[v, v, drop = FALSE]; Xi <- X[r, , drop = FALSE]
    Vi <- solve(Si); logdet <- logdet + as.numeric(determinant(Si)$modulus)
    XtViX <- XtViX + t(Xi) %*% Vi %*% Xi; XtViy <- XtViy + t(Xi) %*% Vi %*% d$CHG[r]
  }
  Phi <- solve(XtViX); b <- drop(Phi %*% XtViy); quad <- 0
  for (r in rows) { v <- d$AVISITN[r]; e <- d$CHG[r] - X[r, , drop = FALSE] %*% b; quad <- quad + drop(t(e) %*% solve(S[v, v, drop = FALSE], e)) }
  ll <- if (method == "REML") -0.5 * ((n - p) * log(2 * pi) + logdet + as.numeric(determinant(XtViX)$modulus) + quad)
        else -0.5 * (n * log(2 * pi) + logdet + quad)
  list(ll = ll, beta = b, Phi = Phi, S = S)
}
# nlme's optimiser (nlminb, relative tolerance 1e-10 on the objective) stops where the gradient of the
# log-likelihood is still about 1e-5; Newton steps with numDeriv's Richardson-extrapolated gradient and
# Hessian, from the nlme estimate, take theta to the optimum the 1e-6 comparisons need.
polish <- function(structure, th, d, X, method) {
  f <- function(t) { g <- gls_at(structure, t, d, X, method); if (is.null(g)) -Inf else g$ll }
  for (it in 1:20) {
    g <- numDeriv::grad(f, th); H <- numDeriv::hessian(f, th); step <- -solve(H, g)
    len <- 1; while (f(th + len * step) < f(th) - 1e-12 && len > 1e-6) len <- len / 2
    th <- th + len * step
    if (max(abs(step) / (abs(th) + 1e-8)) < 1e-11) break
  }
  list(theta = th, gradient = numDeriv::grad(f, th), hessian = numDeriv::hessian(f, th), f = f)
}
# Satterthwaite: nu = 2 (k'Phi k)^2 / (g' A g), g = numDeriv gradient of k'Phi(theta) k, A = inverse of the
# numDeriv Hessian of -loglik (observed information).
sat_df <- function(k, structure, th, d, X, A) {
  fk <- function(t) drop(t(k) %*% gls_at(structure, t, d, X)$Phi %*% k)
  g <- numDeriv::grad(fk, th); 2 * fk(th)^2 / drop(t(g) %*% A %*% g)
}

# Kenward-Roger: pbkrtest for the part linear in theta, plus the second-derivative term R_ij.
kr_adjusted <- function(structure, at, d, X) {
  S <- at$S; V <- blockdiag_of(d, S)
  der <- structure_derivs(structure, S)
  G <- lapply(der$d1, function(D) blockdiag_of(d, D))
  Phi <- at$Phi
  PhiA <- pbkrtest:::vcovAdj_internal(Phi, list(Sigma = V, G = G, n.ggamma = length(G)), X)
  P <- attr(PhiA, "P"); W <- as.matrix(attr(PhiA, "W"))
  PhiA <- as.matrix(PhiA)
  if (!is.null(der$d2)) {
    Vi <- solve(V); np <- length(G); Rsum <- matrix(0, ncol(X), ncol(X))
    for (a in 1:np) for (b in 1:np) {
      Rab <- t(X) %*% Vi %*% blockdiag_of(d, der$d2[[(a - 1) * np + b]]) %*% Vi %*% X
      Rsum <- Rsum + W[a, b] * Rab
    }
    PhiA <- PhiA - 0.5 * Phi %*% Rsum %*% Phi
  }
  attr(PhiA, "P") <- P; attr(PhiA, "W") <- W
  list(Phi = Phi, PhiA = PhiA, beta = at$beta)
}

kr_contrast <- function(kr, k) {
  list(se = sqrt(drop(t(k) %*% kr$PhiA %*% k)), df = pbkrtest::Lb_ddf(matrix(k, nrow = 1), kr$Phi, kr$PhiA))
}

# The Type 3 hypotheses: sum-to-zero contrasts; term t is "its columns are zero".
type3 <- function(structure, d, th, A, kr = TRUE) {
  old <- options(contrasts = c("contr.sum", "contr.poly")); on.exit(options(old))
  raw <- anova(fit_gls(structure, d), type = "marginal")
  X <- model.matrix(form, d); asg <- attr(X, "assign"); labs <- attr(terms(form), "term.labels")
  at <- gls_at(structure, th, d, X)
  krs <- if (kr) kr_adjusted(structure, at, d, X) else NULL
  lapply(seq_along(labs), function(t) {
    cols <- which(asg == t); q <- length(cols)
    L <- matrix(0, q, ncol(X)); L[cbind(1:q, cols)] <- 1
    lb <- L %*% at$beta
    ev <- eigen(L %*% at$Phi %*% t(L), symmetric = TRUE)
    nus <- sapply(1:q, function(m) sat_df(drop(t(L) %*% ev$vectors[, m]), structure, th, d, X, A))
    EE <- sum(ifelse(nus > 2, nus / (nus - 2), 0))
    e <- list(term = labs[t], numDf = q, F = drop(t(lb) %*% solve(L %*% at$Phi %*% t(L), lb)) / q,
              nlmeF = raw[labs[t], "F-value"], satterthwaiteDf = if (EE > q) 2 * EE / (EE - q) else NA)
    if (kr) {
      st <- pbkrtest:::.KR_adjust(krs$PhiA, krs$Phi, L, krs$beta, 0)
      e <- c(e, list(krF = st$Fstat, krDf = st$ddf, krP = st$p.value))
    }
    e
  })
}

summarise_fit <- function(structure, d, method = "REML", kr = TRUE) {
  f <- fit_gls(structure, d, method)
  X <- model.matrix(form, d)
  pol <- polish(structure, theta_of(structure, sigma_of(f, d)), d, X, method)
  th <- pol$theta; A <- solve(-pol$hessian)
  at <- gls_at(structure, th, d, X, method)
  krs <- if (kr) kr_adjusted(structure, at, d, X) else NULL
  rg <- ref_grid(f, mode = "satterthwaite", data = d)
  sections <- list(lsmeansByVisit = emmeans(rg, ~ ARM | AVISIT), lsmeansOverall = emmeans(rg, ~ ARM),
                   differencesByVisit = contrast(emmeans(rg, ~ ARM | AVISIT), "trt.vs.ctrl"),
                   differencesOverall = contrast(emmeans(rg, ~ ARM), "trt.vs.ctrl"))
  out <- list(structure = structure, method = method,
       coefficientNames = names(coef(f)),
       nlme = list(coefficients = arr(unname(coef(f))), standardErrors = arr(unname(sqrt(diag(vcov(f))))),
                   logLik = as.numeric(logLik(f)), logLikAtPolished = at$ll, gradientNorm = max(abs(numDeriv::grad(pol$f, theta_of(structure, sigma_of(f, d)))))),
       theta = arr(th), gradientAtTheta = arr(pol$gradient),
       coefficients = arr(at$beta), standardErrors = arr(sqrt(diag(at$Phi))), logLik = at$ll, sigma = at$S,
       krAdjustedCovariance = if (kr) unname(krs$PhiA[, ]) else NULL)
  for (nm in names(sections)) {
    emm <- sections[[nm]]; s <- summary(emm, infer = TRUE); L <- emm@linfct
    what <- if ("emmean" %in% names(s)) "emmean" else "estimate"
    out[[nm]] <- lapply(seq_len(nrow(s)), function(i) {
      k <- L[i, ]; est <- sum(k * at$beta); se <- sqrt(drop(t(k) %*% at$Phi %*% k))
      df <- sat_df(k, structure, th, d, X, A); qt975 <- qt(0.975, df)
      c(list(label = paste(as.character(unlist(s[i, intersect(c("ARM", "contrast", "AVISIT"), names(s))])), collapse = " @ "),
             coefficients = arr(as.numeric(k)), estimate = est, se = se, satterthwaiteDf = df,
             lower = est - qt975 * se, upper = est + qt975 * se, p = 2 * pt(-abs(est / se), df),
             emmeans = list(estimate = s[i, what], se = s$SE[i], df = s$df[i])),
        if (kr) { kk <- kr_contrast(krs, k); list(krSe = kk$se, krDf = kk$df) } else NULL)
    })
  }
  if (method == "REML") out$type3 <- type3(structure, d, th, A, kr)
  out
}

study <- list()
for (s in c("UN", "CS", "CSH", "AR1", "ARH", "TOEP")) {
  cat("fitting", s, "\n")
  study[[s]] <- summarise_fit(s, ana)
}
study$UN_ML <- summarise_fit("UN", ana, method = "ML", kr = FALSE)

# Compound symmetry as a random subject intercept (lme4), Kenward-Roger by pbkrtest through emmeans.
lmer_cs <- lmer(CHG ~ ARM + AVISIT + STRAT + BASE + ARM:AVISIT + AVISIT:BASE + (1 | USUBJID), data = ana, REML = TRUE,
                control = lmerControl(optimizer = "bobyqa", optCtrl = list(rhobeg = 0.2, rhoend = 1e-12)))
lk <- summary(emmeans(lmer_cs, ~ ARM | AVISIT, lmer.df = "kenward-roger"))
ld <- summary(contrast(emmeans(lmer_cs, ~ ARM | AVISIT, lmer.df = "kenward-roger"), "trt.vs.ctrl"))
study$CS_lmer <- list(logLik = as.numeric(logLik(lmer_cs)), coefficients = arr(unname(fixef(lmer_cs))),
                      lsmeanSe = arr(lk$SE), lsmeanDf = arr(lk$df), differenceSe = arr(ld$SE), differenceDf = arr(ld$df))

# ---- CDISC pilot ADAS-Cog (11) total: change from baseline at Weeks 8, 16, 24 ----
pilot <- NULL
pilot_file <- "../shared/data/cdiscpilot01/dataset-json/adqsadas.json"
if (file.exists(pilot_file)) {
  j <- fromJSON(pilot_file, simplifyVector = TRUE)
  cols <- j$columns$name
  raw <- as.data.frame(j$rows, stringsAsFactors = FALSE); names(raw) <- cols
  keep <- raw$PARAMCD == "ACTOT" & raw$AVISIT %in% c("Week 8", "Week 16", "Week 24") & raw$EFFFL == "Y" &
    raw$ANL01FL == "Y" & (is.na(raw$DTYPE) | raw$DTYPE == "")
  p <- raw[keep, ]
  pd <- data.frame(USUBJID = p$USUBJID, ARM = p$TRTP, STRAT = p$SITEGR1, BASE = as.numeric(p$BASE),
                   AVISIT = p$AVISIT, AVISITN = match(p$AVISIT, c("Week 8", "Week 16", "Week 24")), CHG = as.numeric(p$CHG))
  pd <- pd[!is.na(pd$CHG) & !is.na(pd$BASE), ]
  pd <- prep(pd, c("Placebo", "Xanomeline Low Dose", "Xanomeline High Dose"), c("Week 8", "Week 16", "Week 24"), sort(unique(pd$STRAT)))
  pilot <- list(records = nrow(pd), subjects = length(unique(pd$USUBJID)), siteGroups = levels(pd$STRAT))
  for (s in c("UN", "CS", "AR1")) {
    cat("pilot", s, "\n")
    pilot[[s]] <- summarise_fit(s, pd)
  }
}

# ---- the Kenward-Roger pipeline above against a published example ----
# Halekoh and Hojsgaard (2014, J Stat Softw 59(9)), sugar beets split plot (data shipped with pbkrtest):
# the harvest effect with whole plots block:harvest as the random intercept has Kenward-Roger F = 15.2 on
# 1 and 2.00 df, p = 0.0599 (values recalled from memory; pbkrtest 0.5.2's KRmodcomp example prints the
# same). The same test through gls (compound symmetry over sowing dates within whole plot) and the
# kr_adjusted()/.KR_adjust path used for every oracle above must reproduce it.
data(beets, package = "pbkrtest")
bd <- data.frame(USUBJID = factor(paste(beets$block, beets$harvest)), AVISIT = beets$sow, AVISITN = as.integer(beets$sow),
                 CHG = beets$sugpct, block = beets$block, harvest = beets$harvest)
bd <- bd[order(bd$USUBJID, bd$AVISITN), ]
form_study <- form
form <- CHG ~ block + AVISIT + harvest
fb <- fit_gls("CS", bd); Xb <- model.matrix(form, bd)
atb <- gls_at("CS", polish("CS", theta_of("CS", sigma_of(fb, bd)), bd, Xb, "REML")$theta, bd, Xb)
krb <- kr_adjusted("CS", atb, bd, Xb)
Lb <- matrix(0, 1, ncol(Xb)); Lb[1, which(colnames(Xb) == "harvestharv2")] <- 1
stb <- pbkrtest:::.KR_adjust(krb$PhiA, krb$Phi, Lb, krb$beta, 0)
form <- form_study
lgb <- lmer(sugpct ~ block + sow + harvest + (1 | block:harvest), data = beets, REML = FALSE)
kmb <- KRmodcomp(lgb, update(lgb, . ~ . - harvest))
stopifnot(abs(stb$Fstat - 15.2) < 0.05, abs(stb$ddf - 2.00) < 0.005, abs(stb$p.value - 0.0599) < 5e-5)
crossCheck <- list(source = "Halekoh and Hojsgaard (2014) J Stat Softw 59(9), sugar beets, harvest effect (recalled from memory)",
                   published = list(F = 15.2, ndf = 1, ddf = 2.00, p = 0.0599),
                   oraclePath = list(F = stb$Fstat, ddf = stb$ddf, p = stb$p.value),
                   KRmodcomp = list(F = getKR(kmb, "Fstat"), ddf = getKR(kmb, "ddf"), p = getKR(kmb, "p.value")))

versions <- list(R = R.version.string, nlme = as.character(packageVersion("nlme")),
                 emmeans = as.character(packageVersion("emmeans")), pbkrtest = as.character(packageVersion("pbkrtest")),
                 lme4 = as.character(packageVersion("lme4")), numDeriv = as.character(packageVersion("numDeriv")))
json <- paste0("{\n\"generator\": \"tests/OutputForge.Stats.Tests/Oracles/generate_mmrm_oracles.R\",\n\"versions\": ", js(versions),
               ",\n\"model\": \"CHG ~ ARM + AVISIT + STRAT + BASE + ARM:AVISIT + AVISIT:BASE\"",
               ",\n\"krCrossCheck\": ", js(crossCheck), ",\n\"study\": ", js(study), ",\n\"pilot\": ", js(pilot), "\n}\n")
writeLines(json, file.path(out, "mmrm_oracles.json"))
