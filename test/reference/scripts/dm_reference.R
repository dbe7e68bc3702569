# Reference values for the Diebold–Mariano statistics core (src/statistics/).
#
# For each case below: simple h-step forecasts of an open series that ships with R's `datasets`
# package, the loss differential d_t = loss(candidate)_t − loss(baseline)_t, and what R computes
# from it:
#   - autocovariances: stats::acf(d, type = "covariance", demean = TRUE)  (divides by n)
#   - automatic lag:   sandwich::bwNeweyWest(lm(d ~ 1), kernel = "Bartlett", prewhite = 0)
#   - Bartlett:        sandwich::NeweyWest(lm(d ~ 1), lag = L, prewhite = FALSE, adjust = FALSE)
#   - uniform:         sandwich::vcovHAC(lm(d ~ 1), weights = rep(1, L + 1), prewhite = FALSE,
#                      adjust = FALSE)
#   - p-values with stats::pnorm / stats::pt; the Harvey–Leybourne–Newbold factor and the
#     equal-weighted cosine (ewc) estimator are the published formulas evaluated here in R.
#
# Writes, into the folder given as the first argument:
#   dm_<case>.json            the series d and the expected values, each with its source
#   dm_<case>_baseline.csv    the baseline forecasts  (timestamp,horizon,actual,prediction)
#   dm_<case>_candidate.csv   the candidate forecasts (same layout)
# Numbers are printed with sprintf("%.17g") so the files are byte-reproducible.
#
# Usage: Rscript --vanilla dm_reference.R OUTDIR
suppressPackageStartupMessages(library(sandwich))

args <- commandArgs(trailingOnly = TRUE)
if (length(args) < 1) stop("usage: Rscript --vanilla dm_reference.R OUTDIR")
out <- args[[1]]

num <- function(x) {
  stopifnot(all(is.finite(x)))
  sprintf("%.17g", x)
}
str <- function(s) {
  s <- gsub("\\\\", "\\\\\\\\", s)
  s <- gsub("\"", "\\\\\"", s)
  paste0("\"", s, "\"")
}
arr <- function(x) paste0("[", paste(num(x), collapse = ", "), "]")
obj <- function(fields, indent = "  ") {
  keys <- names(fields)
  body <- paste0(indent, "  ", str(keys), ": ", unlist(fields), collapse = ",\n")
  paste0("{\n", body, "\n", indent, "}")
}

# Forecasts of y[t] issued h steps earlier, using only y[1..t-h].
naive <- function(y, t, h) y[t - h]
seasonalNaive <- function(y, t, h, period) {
  # the latest value in the same season that was known at t - h
  y[t - period * ceiling(h / period)]
}
movingAverage <- function(y, t, h, k) mean(y[(t - h - k + 1):(t - h)])

loss <- function(kind, actual, prediction) {
  switch(kind,
    squared = (prediction - actual)^2,
    absolute = abs(prediction - actual)
  )
}

writeForecasts <- function(path, h, actual, prediction) {
  lines <- c(
    "timestamp,horizon,actual,prediction",
    paste(seq_along(actual), h, num(actual), num(prediction), sep = ",")
  )
  writeLines(lines, path)
}

hlnFactor <- function(n, h) sqrt((n + 1 - 2 * h + h * (h - 1) / n) / n)

hacEntry <- function(estimator, rule, lag, variance, n, mean, margin, h, source,
                     usedEstimator = estimator, extra = list()) {
  statistic <- (mean - margin) / sqrt(variance)
  hln <- statistic * hlnFactor(n, h)
  obj(c(list(
    estimator = str(estimator),
    usedEstimator = str(usedEstimator),
    lagRule = str(rule),
    lag = num(lag),
    longRunVariance = num(variance * n),
    variance = num(variance),
    statistic = num(statistic),
    pValue = num(pnorm(statistic, lower.tail = FALSE)),
    pValueTwoSided = num(2 * pnorm(-abs(statistic))),
    smallSample = obj(list(
      statistic = num(hln),
      pValue = num(pt(hln, df = n - 1, lower.tail = FALSE)),
      pValueTwoSided = num(2 * pt(-abs(hln), df = n - 1)),
      degreesOfFreedom = num(n - 1)
    ), indent = "      "),
    source = str(source)
  ), extra), indent = "    ")
}

# Lazarus, Lewis, Stock & Watson (2018): nu = max(2, round(0.4 n^(2/3))),
# Lambda_j = sqrt(2/n) sum_t cos(pi j (t - 1/2) / n) (d_t - dbar), omega^2 = mean(Lambda_j^2).
ewcEntry <- function(d, margin) {
  n <- length(d)
  nu <- max(2, round(0.4 * n^(2 / 3)))
  u <- d - mean(d)
  tt <- seq_len(n)
  lambda <- sapply(seq_len(nu), function(j) sqrt(2 / n) * sum(cos(pi * j * (tt - 0.5) / n) * u))
  omega2 <- sum(lambda^2) / nu
  statistic <- (mean(d) - margin) / sqrt(omega2 / n)
  obj(list(
    degreesOfFreedom = num(nu),
    longRunVariance = num(omega2),
    variance = num(omega2 / n),
    statistic = num(statistic),
    pValue = num(pt(statistic, df = nu, lower.tail = FALSE)),
    pValueTwoSided = num(2 * pt(-abs(statistic), df = nu)),
    source = str(paste(
      "equal-weighted cosine formula (Lazarus, Lewis, Stock & Watson 2018) evaluated in R",
      "with base::cos; p-values stats::pt(statistic, df = nu)"
    ))
  ), indent = "  ")
}

writeCase <- function(name, dataset, y, h, lossKind, margin, first, baselineRule, baselineFun,
                      candidateRule, candidateFun) {
  tt <- first:length(y)
  actual <- y[tt]
  base <- sapply(tt, function(t) baselineFun(y, t, h))
  cand <- sapply(tt, function(t) candidateFun(y, t, h))
  d <- loss(lossKind, actual, cand) - loss(lossKind, actual, base)
  n <- length(d)
  fit <- lm(d ~ 1)

  # Newey & West (1994) pilot quantities, the docs/design.md formula evaluated in R; the bandwidth itself
  # is sandwich's, and the two must agree.
  pilot <- floor(4 * (n / 100)^(2 / 9))
  u <- d - mean(d)
  sigma <- sapply(0:pilot, function(j) sum(u[1:(n - j)] * u[(j + 1):n]) / n)
  s0 <- sigma[1] + 2 * sum(sigma[-1])
  s1 <- 2 * sum(seq_len(pilot) * sigma[-1])
  bandwidth <- bwNeweyWest(fit, kernel = "Bartlett", prewhite = 0)
  stopifnot(abs(bandwidth - 1.1447 * ((s1 / s0)^2)^(1 / 3) * n^(1 / 3)) < 1e-10 * bandwidth)
  autoLag <- min(max(floor(bandwidth), h - 1), n - 1)

  lags <- list(
    list(rule = "auto", lag = autoLag),
    list(rule = "horizon", lag = h - 1),
    list(rule = "fixed", lag = 4)
  )
  entries <- character(0)
  for (l in lags) {
    bartlettSource <- sprintf(
      "R sandwich %s: NeweyWest(lm(d ~ 1), lag = %d, prewhite = FALSE, adjust = FALSE); pnorm, pt",
      packageVersion("sandwich"), l$lag
    )
    vb <- NeweyWest(fit, lag = l$lag, prewhite = FALSE, adjust = FALSE)[1, 1]
    entries <- c(entries, hacEntry("bartlett", l$rule, l$lag, vb, n, mean(d), margin, h,
                                   bartlettSource))
    uniformSource <- sprintf(
      "R sandwich %s: vcovHAC(lm(d ~ 1), weights = rep(1, %d), prewhite = FALSE, adjust = FALSE)",
      packageVersion("sandwich"), l$lag + 1
    )
    vu <- vcovHAC(fit, weights = rep(1, l$lag + 1), prewhite = FALSE, adjust = FALSE)[1, 1]
    if (vu > 0) {
      entries <- c(entries, hacEntry("uniform", l$rule, l$lag, vu, n, mean(d), margin, h,
                                     paste0(uniformSource, "; pnorm, pt")))
    } else {
      # Not positive: the expected result is Bartlett at the same lag (docs/design.md, `uniform`).
      entries <- c(entries, hacEntry("uniform", l$rule, l$lag, vb, n, mean(d), margin, h,
        paste0(uniformSource, " is not positive, so the values are ", bartlettSource),
        usedEstimator = "bartlett", extra = list(uniformLongRunVariance = num(vu * n))
      ))
    }
  }
  gamma <- as.vector(acf(d, lag.max = 5, type = "covariance", demean = TRUE, plot = FALSE)$acf)

  json <- obj(list(
    generator = str("test/reference/scripts/dm_reference.R"),
    name = str(name),
    dataset = str(dataset),
    baseline = str(baselineRule),
    candidate = str(candidateRule),
    loss = str(lossKind),
    horizon = num(h),
    margin = num(margin),
    n = num(n),
    d = arr(d),
    mean = num(mean(d)),
    autocovariances = obj(list(
      values = arr(gamma),
      source = str("R stats::acf(d, lag.max = 5, type = \"covariance\", demean = TRUE)")
    ), indent = "  "),
    autoLag = obj(list(
      pilotLag = num(pilot),
      s0 = num(s0),
      s1 = num(s1),
      bandwidth = num(bandwidth),
      lag = num(autoLag),
      source = str(sprintf(paste(
        "R sandwich %s: bwNeweyWest(lm(d ~ 1), kernel = \"Bartlett\", prewhite = 0);",
        "pilotLag, s0, s1: the Newey & West (1994) formulas evaluated in R;",
        "lag = min(max(floor(bandwidth), h - 1), n - 1)"
      ), packageVersion("sandwich")))
    ), indent = "  "),
    hac = paste0("[\n    ", paste(entries, collapse = ",\n    "), "\n  ]"),
    ewc = ewcEntry(d, margin)
  ), indent = "")
  writeLines(json, file.path(out, paste0("dm_", name, ".json")))
  writeForecasts(file.path(out, paste0("dm_", name, "_baseline.csv")), h, actual, base)
  writeForecasts(file.path(out, paste0("dm_", name, "_candidate.csv")), h, actual, cand)
}

y <- as.numeric(datasets::AirPassengers)
writeCase("airpassengers_h1_squared", "R datasets::AirPassengers (monthly, 1949-1960)", y,
  h = 1, lossKind = "squared", margin = 0, first = 13,
  "naive: y[t-1]", function(y, t, h) naive(y, t, h),
  "seasonal naive: y[t-12]", function(y, t, h) seasonalNaive(y, t, h, 12)
)
writeCase("airpassengers_h3_absolute", "R datasets::AirPassengers (monthly, 1949-1960)", y,
  h = 3, lossKind = "absolute", margin = 0, first = 13,
  "naive: y[t-3]", function(y, t, h) naive(y, t, h),
  "seasonal naive: y[t-12]", function(y, t, h) seasonalNaive(y, t, h, 12)
)

y <- as.numeric(datasets::Nile)
writeCase("nile_h1_absolute", "R datasets::Nile (annual flow, 1871-1970)", y,
  h = 1, lossKind = "absolute", margin = 0, first = 6,
  "naive: y[t-1]", function(y, t, h) naive(y, t, h),
  "moving average of y[t-5..t-1]", function(y, t, h) movingAverage(y, t, h, 5)
)
writeCase("nile_h2_squared_margin", "R datasets::Nile (annual flow, 1871-1970)", y,
  h = 2, lossKind = "squared", margin = 5000, first = 7,
  "naive: y[t-2]", function(y, t, h) naive(y, t, h),
  "moving average of y[t-6..t-2]", function(y, t, h) movingAverage(y, t, h, 5)
)

y <- as.numeric(datasets::lynx)
writeCase("lynx_h2_squared", "R datasets::lynx (annual trappings, 1821-1934)", y,
  h = 2, lossKind = "squared", margin = 0, first = 11,
  "naive: y[t-2]", function(y, t, h) naive(y, t, h),
  "ten-year naive: y[t-10]", function(y, t, h) seasonalNaive(y, t, h, 10)
)

y <- as.numeric(datasets::UKgas)
writeCase("ukgas_h4_absolute", "R datasets::UKgas (quarterly, 1960-1986)", y,
  h = 4, lossKind = "absolute", margin = 0, first = 8,
  "naive: y[t-4]", function(y, t, h) naive(y, t, h),
  "moving average of y[t-7..t-4]", function(y, t, h) movingAverage(y, t, h, 4)
)

y <- as.numeric(datasets::LakeHuron)
writeCase("lakehuron_h1_squared_margin", "R datasets::LakeHuron (annual level, 1875-1972)", y,
  h = 1, lossKind = "squared", margin = 0.05, first = 5,
  "naive: y[t-1]", function(y, t, h) naive(y, t, h),
  "moving average of y[t-4..t-1]", function(y, t, h) movingAverage(y, t, h, 4)
)

y <- as.numeric(datasets::co2)
writeCase("co2_h6_squared", "R datasets::co2 (Mauna Loa, monthly, 1959-1997)", y,
  h = 6, lossKind = "squared", margin = 0, first = 13,
  "naive: y[t-6]", function(y, t, h) naive(y, t, h),
  "seasonal naive: y[t-12]", function(y, t, h) seasonalNaive(y, t, h, 12)
)

# Distribution functions behind the p-values (src/statistics/distributions.ts).
dist <- function(fn, call, args, value) {
  obj(list(fn = str(fn), call = str(call), args = arr(args), value = num(value)), indent = "    ")
}
entries <- character(0)
for (x in c(-30, -8, -3, -1.5, 0, 0.5, 2, 5, 30)) {
  entries <- c(entries,
    dist("standardNormalCdf", sprintf("pnorm(%s)", num(x)), x, pnorm(x)),
    dist("standardNormalUpperTail", sprintf("pnorm(%s, lower.tail = FALSE)", num(x)), x,
         pnorm(x, lower.tail = FALSE)),
    dist("standardNormalTwoSided", sprintf("2 * pnorm(-abs(%s))", num(x)), x, 2 * pnorm(-abs(x))))
}
for (p in c(0.001, 0.025, 0.5, 0.95, 0.999)) {
  entries <- c(entries, dist("standardNormalQuantile", sprintf("qnorm(%s)", num(p)), p, qnorm(p)))
}
for (df in c(1, 2, 5, 30, 455)) {
  for (x in c(-40, -6, -2, 0, 1.5, 4, 40)) {
    entries <- c(entries,
      dist("studentTCdf", sprintf("pt(%s, %s)", num(x), num(df)), c(x, df), pt(x, df)),
      dist("studentTUpperTail", sprintf("pt(%s, %s, lower.tail = FALSE)", num(x), num(df)),
           c(x, df), pt(x, df, lower.tail = FALSE)),
      dist("studentTTwoSided", sprintf("2 * pt(-abs(%s), %s)", num(x), num(df)), c(x, df),
           2 * pt(-abs(x), df)))
  }
  for (p in c(0.001, 0.025, 0.5, 0.95, 0.999)) {
    entries <- c(entries,
      dist("studentTQuantile", sprintf("qt(%s, %s)", num(p), num(df)), c(p, df), qt(p, df)))
  }
}
writeLines(obj(list(
  generator = str("test/reference/scripts/dm_reference.R"),
  source = str(paste("R", getRversion(), "stats::pnorm, qnorm, pt, qt")),
  values = paste0("[\n    ", paste(entries, collapse = ",\n    "), "\n  ]")
), indent = ""), file.path(out, "dm_distributions.json"))
