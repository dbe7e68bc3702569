# Rolling-origin one-step forecasts of an open series by six simple methods, for the tests of the
# k-candidate procedures (superior predictive ability, model confidence set).
#
# Series: co2 (Mauna Loa atmospheric CO2, monthly 1959-1997, 468 values; R's 'datasets' package).
# Origins: after the first 120 months, every month: the forecast for month t uses months 1..t-1
# only (348 forecasts per method). Methods (the baseline first):
#   naive            x_{t-1}
#   seasonal-naive   x_{t-12}
#   mean             mean(x_1..x_{t-1})
#   drift            x_{t-1} + (x_{t-1} - x_1)/(t - 2)
#   ses              simple exponential smoothing with smoothing weight 0.5 (fixed)
#   seasonal-drift   x_{t-12} + (x_{t-1} - x_{t-13})/12 (the seasonal naive forecast plus the
#                    mean of the last 12 monthly first differences)
# Writes OUTDIR/candidates_co2_rolling.csv: timestamp,model,actual,prediction (long, one row per
# method and month), numbers printed with sprintf("%.17g") so the file is byte-reproducible.
#
# Usage: Rscript --vanilla candidates_co2_rolling.R OUTDIR

args <- commandArgs(trailingOnly = TRUE)
outdir <- args[1]
x <- as.numeric(datasets::co2)
n <- length(x)
first <- 121
num <- function(v) sprintf("%.17g", v)

ses <- function(history, weight) {
  level <- history[1]
  for (v in history[-1]) level <- weight * v + (1 - weight) * level
  level
}

rows <- character(0)
for (t in first:n) {
  h <- x[1:(t - 1)]
  m <- length(h)
  forecasts <- c(
    "naive" = h[m],
    "seasonal-naive" = h[m - 11],
    "mean" = mean(h),
    "drift" = h[m] + (h[m] - h[1]) / (m - 1),
    "ses" = ses(h, 0.5),
    "seasonal-drift" = h[m - 11] + mean(diff(h[(m - 12):m]))
  )
  for (name in names(forecasts)) {
    rows <- c(rows, paste(t, name, num(x[t]), num(forecasts[[name]]), sep = ","))
  }
}
writeLines(c("timestamp,model,actual,prediction", rows),
           file.path(outdir, "candidates_co2_rolling.csv"))
