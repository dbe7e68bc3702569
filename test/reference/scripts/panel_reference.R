# Reference panel for pooled comparisons (overall, per horizon, per series, scaled): forecasts of
# several series for horizons 1..3 from every origin, and the Diebold-Mariano quantities R
# computes from the definitions in docs/design.md ("Statistics"):
#
#   - row loss L_i (squared or absolute error) of each model, d_i = L^cand_i - L^base_i;
#   - overall:     d_t = mean of d_i over all rows with timestamp t (all series and horizons);
#   - per horizon: d_t^(h) = mean of d_i over the rows with timestamp t and horizon h;
#   - per series:  d_t^(s) = mean of d_i over the rows of series s with timestamp t (all horizons);
#   - scaled:      as overall, after dividing each series' row losses (both models) by that
#                  series' mean baseline row loss (over all its rows and horizons);
#   - on each d (in time order, n values): mean; Newey & West (1987) long-run variance
#     sandwich::NeweyWest(lm(d ~ 1), lag = L, prewhite = FALSE, adjust = FALSE) at
#     L = min(max(floor(sandwich::bwNeweyWest(lm(d ~ 1), kernel = "Bartlett", prewhite = 0)), h - 1), n - 1)
#     with h the largest horizon in the comparison (3 for overall, per series and scaled); the
#     statistic d-bar / sqrt(V); one-sided p = pnorm(statistic, lower.tail = FALSE); the
#     Harvey, Leybourne & Newbold (1997) statistic and p = pt(., n - 1, lower.tail = FALSE); and
#     the equal-weighted cosine (ewc) estimate of Lazarus, Lewis, Stock & Watson (2018), the
#     published formula evaluated in R, with p = pt(., nu, lower.tail = FALSE);
#   - per series, the one-sided p-values (Bartlett and ewc) adjusted with
#     stats::p.adjust(p, "holm") (Holm 1979) and stats::p.adjust(p, "BH") (Benjamini & Hochberg 1995).
#
# Data: R datasets::Seatbelts (monthly, 1969-1984), five columns on very different scales
# (DriversKilled, front, rear, kms, VanKilled). Timestamps are the month numbers 1..192; origins
# o = 12..191, forecast for t = o + h <= 192. Baseline: naive, y[o]; candidate: the mean of the
# last three values, (y[o-2] + y[o-1] + y[o]) / 3.
#
# Writes into the folder given as the first argument:
#   panel_seatbelts_baseline.csv, panel_seatbelts_candidate.csv
#       series,timestamp,horizon,origin,actual,prediction (rows by series, origin, horizon)
#   panel_seatbelts.json   the expected values, each block with its source
# panel_reference.py then repeats the Bartlett values with statsmodels (panel_seatbelts_statsmodels.json).
# Numbers are printed with sprintf("%.17g") so the files are byte-reproducible.
#
# Usage: Rscript --vanilla panel_reference.R OUTDIR
suppressPackageStartupMessages(library(sandwich))

args <- commandArgs(trailingOnly = TRUE)
if (length(args) < 1) stop("usage: Rscript --vanilla panel_reference.R OUTDIR")
out <- args[[1]]

script_dir <- dirname(normalizePath(sub("^--file=", "", grep("^--file=", commandArgs(FALSE), value = TRUE))))
source(file.path(script_dir, "lib", "json_writer.R"))

# --- the panel --------------------------------------------------------------------------------
columns <- c("DriversKilled", "front", "rear", "kms", "VanKilled")
Y <- datasets::Seatbelts[, columns]
horizons <- 1:3
firstOrigin <- 12
rows <- do.call(rbind, lapply(seq_along(columns), function(s) {
  y <- as.numeric(Y[, s])
  T <- length(y)
  do.call(rbind, lapply(firstOrigin:(T - 1), function(o) {
    hs <- horizons[o + horizons <= T]
    data.frame(series = columns[s], seriesIndex = s, timestamp = o + hs, horizon = hs,
               origin = o, actual = y[o + hs], baseline = y[o],
               candidate = mean(y[(o - 2):o]), stringsAsFactors = FALSE)
  }))
}))

writeForecasts <- function(path, prediction) {
  lines <- c(
    "series,timestamp,horizon,origin,actual,prediction",
    paste(rows$series, rows$timestamp, rows$horizon, rows$origin, num(rows$actual),
          num(prediction), sep = ",")
  )
  writeLines(lines, path)
}
writeForecasts(file.path(out, "panel_seatbelts_baseline.csv"), rows$baseline)
writeForecasts(file.path(out, "panel_seatbelts_candidate.csv"), rows$candidate)

lossOf <- function(kind, actual, prediction) {
  switch(kind, squared = (prediction - actual)^2, absolute = abs(prediction - actual))
}

# --- statistics on one differential series ------------------------------------------------------
hlnFactor <- function(n, h) sqrt((n + 1 - 2 * h + h * (h - 1) / n) / n)

ewc <- function(d) {
  n <- length(d)
  nu <- max(2, round(0.4 * n^(2 / 3)))
  u <- d - mean(d)
  tt <- seq_len(n)
  lambda <- sapply(seq_len(nu), function(j) sqrt(2 / n) * sum(cos(pi * j * (tt - 0.5) / n) * u))
  omega2 <- sum(lambda^2) / nu
  statistic <- mean(d) / sqrt(omega2 / n)
  list(nu = nu, omega2 = omega2, statistic = statistic,
       pValue = pt(statistic, df = nu, lower.tail = FALSE))
}

dmStats <- function(time, d, h) {
  n <- length(d)
  stopifnot(all(diff(time) == 1)) # contiguous, so the first and last timestamps describe them
  fit <- lm(d ~ 1)
  bandwidth <- bwNeweyWest(fit, kernel = "Bartlett", prewhite = 0)
  pilot <- floor(4 * (n / 100)^(2 / 9))
  u <- d - mean(d)
  sigma <- sapply(0:pilot, function(j) sum(u[1:(n - j)] * u[(j + 1):n]) / n)
  s0 <- sigma[1] + 2 * sum(sigma[-1])
  s1 <- 2 * sum(seq_len(pilot) * sigma[-1])
  stopifnot(abs(bandwidth - 1.1447 * ((s1 / s0)^2)^(1 / 3) * n^(1 / 3)) < 1e-10 * bandwidth)
  lag <- min(max(floor(bandwidth), h - 1), n - 1)
  # At L = n - 1, NeweyWest's weight vector (lags 0..L+1, the last weight 0) is one longer than
  # the series and sandwich warns that it uses the first n weights: only the zero weight is
  # dropped, so that one warning is muffled.
  variance <- withCallingHandlers(
    NeweyWest(fit, lag = lag, prewhite = FALSE, adjust = FALSE)[1, 1],
    warning = function(w) {
      if (lag == n - 1 && grepl("more weights than observations", conditionMessage(w))) {
        invokeRestart("muffleWarning")
      }
    }
  )
  statistic <- mean(d) / sqrt(variance)
  hln <- statistic * hlnFactor(n, h)
  e <- ewc(d)
  list(
    n = n, mean = mean(d), lag = lag, statistic = statistic,
    pValue = pnorm(statistic, lower.tail = FALSE), ewc = e,
    json = function(indent, extra = list()) obj(c(extra, list(
      n = num(n),
      maxHorizon = num(h),
      timestamps = arr(range(time)),
      d = arr(d),
      mean = num(mean(d)),
      bandwidth = num(bandwidth),
      lag = num(lag),
      longRunVariance = num(variance * n),
      variance = num(variance),
      statistic = num(statistic),
      pValue = num(pnorm(statistic, lower.tail = FALSE)),
      smallSample = obj(list(
        statistic = num(hln),
        pValue = num(pt(hln, df = n - 1, lower.tail = FALSE)),
        degreesOfFreedom = num(n - 1)
      ), indent = paste0(indent, "  ")),
      ewc = obj(list(
        degreesOfFreedom = num(e$nu),
        longRunVariance = num(e$omega2),
        statistic = num(e$statistic),
        pValue = num(e$pValue)
      ), indent = paste0(indent, "  "))
    )), indent = indent)
  )
}

# Mean of x over the rows with each timestamp (only timestamps that have rows), in time order.
perTime <- function(x, timestamp) {
  means <- tapply(x, timestamp, mean)
  list(time = as.numeric(names(means)), d = as.numeric(means))
}

lossBlock <- function(kind) {
  lb <- lossOf(kind, rows$actual, rows$baseline)
  lc <- lossOf(kind, rows$actual, rows$candidate)
  di <- lc - lb
  hmax <- max(rows$horizon)

  overall <- perTime(di, rows$timestamp)
  overallStats <- dmStats(overall$time, overall$d, hmax)

  byHorizon <- sapply(horizons, function(h) {
    keep <- rows$horizon == h
    pt_ <- perTime(di[keep], rows$timestamp[keep])
    dmStats(pt_$time, pt_$d, h)$json("        ", list(horizon = num(h)))
  })

  seriesStats <- lapply(seq_along(columns), function(s) {
    keep <- rows$seriesIndex == s
    pt_ <- perTime(di[keep], rows$timestamp[keep])
    dmStats(pt_$time, pt_$d, max(rows$horizon[keep]))
  })
  pBartlett <- sapply(seriesStats, function(x) x$pValue)
  pEwc <- sapply(seriesStats, function(x) x$ewc$pValue)
  bySeries <- sapply(seq_along(columns), function(s) {
    seriesStats[[s]]$json("        ", list(
      series = str(columns[s]),
      meanBaselineLoss = num(mean(lb[rows$seriesIndex == s])),
      meanCandidateLoss = num(mean(lc[rows$seriesIndex == s]))
    ))
  })

  scale <- tapply(lb, rows$seriesIndex, mean)[as.character(rows$seriesIndex)]
  scaled <- perTime(lc / scale - lb / scale, rows$timestamp)

  obj(list(
    loss = str(kind),
    meanBaselineLoss = num(mean(lb)),
    meanCandidateLoss = num(mean(lc)),
    overall = overallStats$json("      "),
    byHorizon = list_of(byHorizon, "      "),
    bySeries = list_of(bySeries, "      "),
    seriesAdjusted = obj(list(
      series = strs(columns),
      bartlett = obj(list(
        raw = arr(pBartlett),
        holm = arr(p.adjust(pBartlett, "holm")),
        bh = arr(p.adjust(pBartlett, "BH"))
      ), indent = "        "),
      ewc = obj(list(
        raw = arr(pEwc),
        holm = arr(p.adjust(pEwc, "holm")),
        bh = arr(p.adjust(pEwc, "BH"))
      ), indent = "        "),
      source = str(paste0("R ", getRversion(), " stats::p.adjust(p, 'holm') and p.adjust(p, 'BH') ",
                          "on the one-sided per-series p-values (bySeries[].pValue, bySeries[].ewc.pValue)"))
    ), indent = "      "),
    scaled = obj(list(
      scales = obj(setNames(as.list(num(tapply(lb, rows$seriesIndex, mean))), columns),
                   indent = "        "),
      overall = dmStats(scaled$time, scaled$d, hmax)$json("        ")
    ), indent = "      ")
  ), indent = "    ")
}

json <- obj(list(
  generator = str("test/reference/scripts/panel_reference.R"),
  dataset = str("R datasets::Seatbelts (monthly, 1969-1984): DriversKilled, front, rear, kms, VanKilled"),
  series = strs(columns),
  horizons = arr(horizons),
  origins = str(sprintf("%d..%d (month numbers); forecast for t = origin + horizon <= %d",
                        firstOrigin, nrow(Y) - 1, nrow(Y))),
  baseline = str("naive: y[origin]"),
  candidate = str("mean of the last three values: (y[origin-2] + y[origin-1] + y[origin]) / 3"),
  files = obj(list(
    baseline = str("panel_seatbelts_baseline.csv"),
    candidate = str("panel_seatbelts_candidate.csv"),
    rows = num(nrow(rows))
  ), indent = "  "),
  definitions = obj(list(
    d = str("d_i = L(candidate)_i - L(baseline)_i per row; d_t = mean of d_i over the rows at timestamp t (the selection's rows), timestamps in ascending order"),
    timestamps = str("[first, last]: d holds one value for each timestamp first..last"),
    lag = str("L = min(max(floor(bandwidth), maxHorizon - 1), n - 1)"),
    scaled = str("each series' row losses (both models) divided by that series' mean baseline row loss, then pooled as overall")
  ), indent = "  "),
  source = str(sprintf(paste(
    "R %s, sandwich %s: bandwidth = bwNeweyWest(lm(d ~ 1), kernel = 'Bartlett', prewhite = 0);",
    "variance = NeweyWest(lm(d ~ 1), lag = L, prewhite = FALSE, adjust = FALSE)[1, 1];",
    "longRunVariance = n * variance; pValue = pnorm(statistic, lower.tail = FALSE);",
    "smallSample: Harvey, Leybourne & Newbold (1997) factor, pt(., n - 1, lower.tail = FALSE);",
    "ewc: Lazarus, Lewis, Stock & Watson (2018) formula evaluated in R, pt(., nu, lower.tail = FALSE);",
    "per-timestamp means with base::tapply"),
    getRversion(), packageVersion("sandwich"))),
  losses = list_of(c(lossBlock("squared"), lossBlock("absolute")), "  ")
), indent = "")
writeLines(json, file.path(out, "panel_seatbelts.json"))
