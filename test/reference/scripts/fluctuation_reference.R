# Reference values for the fluctuation test's rolling statistic (src/stability/), computed in R
# independently of the project's code, on open series that ship with R's `datasets` package.
#
# For each case: per-time-point losses of two simple forecasts (baseline, candidate), the
# differential d_t = loss(candidate)_t - loss(baseline)_t, and
#   - AR(1) prewhitening (Andrews & Monahan 1992): x = d - mean(d),
#                       a = stats::ar.ols(x, order.max = 1, aic = FALSE, demean = FALSE,
#                       intercept = FALSE)$ar (capped at +-0.97), residuals e = x[-1] - a x[-n]
#   - lag:              floor(sandwich::bwNeweyWest(lm(e ~ 1), kernel = "Bartlett", prewhite = 0))
#   - long-run variance: (n - 1) * sandwich::NeweyWest(lm(e ~ 1), lag = L, prewhite = FALSE,
#                        adjust = FALSE) / (1 - a)^2  (sigma^2 of d on the whole sample)
#   - for comparison only: n * sandwich::NeweyWest(lm(d ~ 1), prewhite = TRUE, adjust = FALSE),
#     sandwich's own prewhitened estimate (it does not demean the residuals, so it differs slightly)
#   - window m = floor(mu * n + 0.5)
#   - rolling sums:     stats::filter(d, rep(1, m), sides = 1) (sum of d[k-m+1..k])
#   - F_k = sum / sqrt(m * sigma^2) for every full window (Giacomini & Rossi 2010, eq. 6)
#   - the one-sided statistic max F, the two-sided max |F|, and where each peaks (1-based
#     first point of the window)
# Writes fluctuation_<case>.json into the folder given as the first argument.
#
# Usage: Rscript --vanilla fluctuation_reference.R OUTDIR
suppressPackageStartupMessages(library(sandwich))
args <- commandArgs(trailingOnly = TRUE)
if (length(args) < 1) stop("usage: Rscript --vanilla fluctuation_reference.R OUTDIR")
out <- args[[1]]

script_dir <- dirname(normalizePath(sub("^--file=", "", grep("^--file=", commandArgs(FALSE), value = TRUE))))
source(file.path(script_dir, "lib", "json_writer.R"))

cases <- list(
  list(
    name = "nile_mu02",
    dataset = "R datasets::Nile (annual flow at Aswan, 1871-1970)",
    baseline = "naive: y[t-1]",
    candidate = "mean of the last 5 values y[t-5..t-1]",
    loss = "absolute",
    mu = 0.2,
    make = function() {
      y <- as.numeric(datasets::Nile)
      t <- 6:length(y)
      b <- abs(y[t] - y[t - 1])
      c <- abs(y[t] - sapply(t, function(s) mean(y[(s - 5):(s - 1)])))
      list(b = b, c = c)
    }
  ),
  list(
    name = "airpassengers_mu03",
    dataset = "R datasets::AirPassengers (monthly, 1949-1960)",
    baseline = "seasonal naive: y[t-12]",
    candidate = "naive: y[t-1]",
    loss = "squared",
    mu = 0.3,
    make = function() {
      y <- as.numeric(datasets::AirPassengers)
      t <- 13:length(y)
      list(b = (y[t] - y[t - 12])^2, c = (y[t] - y[t - 1])^2)
    }
  )
)

for (case in cases) {
  losses <- case$make()
  d <- losses$c - losses$b
  n <- length(d)
  x <- d - mean(d)
  a <- as.numeric(ar.ols(x, order.max = 1, aic = FALSE, demean = FALSE, intercept = FALSE)$ar)
  a <- max(-0.97, min(0.97, a))
  e <- x[-1] - a * x[-n]
  efit <- lm(e ~ 1)
  lag <- floor(bwNeweyWest(efit, kernel = "Bartlett", prewhite = 0))
  sigma2 <- (n - 1) * as.numeric(NeweyWest(efit, lag = lag, prewhite = FALSE, adjust = FALSE)) / (1 - a)^2
  sandwichPrewhite <- n * as.numeric(NeweyWest(lm(d ~ 1), prewhite = TRUE, adjust = FALSE))
  m <- floor(case$mu * n + 0.5)
  sums <- as.numeric(stats::filter(d, rep(1, m), sides = 1))[m:n]
  f <- sums / sqrt(m * sigma2)
  fields <- list(
    generator = str("test/reference/scripts/fluctuation_reference.R"),
    name = str(case$name),
    dataset = str(case$dataset),
    baseline = str(case$baseline),
    candidate = str(case$candidate),
    loss = str(case$loss),
    source = str("R stats::ar.ols, sandwich::bwNeweyWest, sandwich::NeweyWest, stats::filter"),
    n = num(n),
    mu = num(case$mu),
    windowSize = num(m),
    prewhiteningCoefficient = num(a),
    lag = num(lag),
    longRunVariance = num(sigma2),
    sandwichPrewhitened = num(sandwichPrewhite),
    baselineLoss = arr(losses$b),
    candidateLoss = arr(losses$c),
    statistics = arr(f),
    oneSided = num(max(f)),
    oneSidedPeak = num(which.max(f)),
    twoSided = num(max(abs(f))),
    twoSidedPeak = num(which.max(abs(f)))
  )
  writeLines(obj(fields, ""), file.path(out, paste0("fluctuation_", case$name, ".json")))
}
