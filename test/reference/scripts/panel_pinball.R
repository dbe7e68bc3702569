# Reference values for the pinball loss (src/losses/pinballLoss.ts), the interval score
# (src/losses/intervalScore.ts) and interval coverage (src/losses/intervalCoverage.ts).
#
# Quantile forecasts of open annual series that ship with R's datasets package: at each year t,
# the normal quantiles of the last ten values, q_tau(t) = mean(y[t-10..t-1]) + qnorm(tau) *
# sd(y[t-10..t-1]), for tau in 0.05, 0.1, 0.5, 0.9, 0.95. Then, in base R:
#   - pinball loss per row:  pmax(tau * (y - q), (tau - 1) * (y - q)), and its mean per level;
#   - interval score of the central (1 - alpha) interval [q_{alpha/2}, q_{1-alpha/2}] per row, from
#     Gneiting & Raftery (2007, eq. 43): (u - l) + (2/alpha) (l - y) 1{y < l} + (2/alpha) (y - u) 1{y > u},
#     and its mean, for alpha = 0.1 and 0.2;
#   - coverage: mean(l <= y & y <= u).
#
# Writes panel_pinball.json into the folder given as the first argument; numbers with
# sprintf("%.17g"), so the file is byte-reproducible.
#
# Usage: Rscript --vanilla panel_pinball.R OUTDIR
args <- commandArgs(trailingOnly = TRUE)
if (length(args) < 1) stop("usage: Rscript --vanilla panel_pinball.R OUTDIR")
out <- args[[1]]

script_dir <- dirname(normalizePath(sub("^--file=", "", grep("^--file=", commandArgs(FALSE), value = TRUE))))
source(file.path(script_dir, "lib", "json_writer.R"))

levels <- c(0.05, 0.1, 0.5, 0.9, 0.95)
window <- 10
pinball <- function(y, q, tau) pmax(tau * (y - q), (tau - 1) * (y - q))
intervalScore <- function(y, l, u, alpha) {
  (u - l) + (2 / alpha) * (l - y) * (y < l) + (2 / alpha) * (y - u) * (y > u)
}

makeCase <- function(name, dataset, y) {
  tt <- (window + 1):length(y)
  actual <- y[tt]
  centre <- sapply(tt, function(t) mean(y[(t - window):(t - 1)]))
  spread <- sapply(tt, function(t) sd(y[(t - window):(t - 1)]))
  q <- lapply(levels, function(tau) centre + qnorm(tau) * spread)
  quantiles <- sapply(seq_along(levels), function(k) {
    loss <- pinball(actual, q[[k]], levels[k])
    obj(list(
      level = num(levels[k]),
      values = arr(q[[k]]),
      rowLoss = arr(loss),
      meanLoss = num(mean(loss))
    ), indent = "        ")
  })
  intervals <- sapply(c(0.1, 0.2), function(alpha) {
    l <- q[[match(alpha / 2, levels)]]
    u <- q[[match(1 - alpha / 2, levels)]]
    score <- intervalScore(actual, l, u, alpha)
    obj(list(
      alpha = num(alpha),
      lowerLevel = num(alpha / 2),
      upperLevel = num(1 - alpha / 2),
      rowScore = arr(score),
      meanScore = num(mean(score)),
      coverage = num(mean(l <= actual & actual <= u))
    ), indent = "        ")
  })
  obj(list(
    name = str(name),
    dataset = str(dataset),
    forecast = str(sprintf(
      "mean(y[t-%d..t-1]) + qnorm(tau) * sd(y[t-%d..t-1])", window, window)),
    actual = arr(actual),
    quantiles = list_of(quantiles, "      "),
    intervals = list_of(intervals, "      ")
  ), indent = "    ")
}

cases <- c(
  makeCase("nile", "R datasets::Nile (annual flow, 1871-1970)", as.numeric(datasets::Nile)),
  makeCase("lakehuron", "R datasets::LakeHuron (annual level, 1875-1972)",
           as.numeric(datasets::LakeHuron))
)
json <- obj(list(
  generator = str("test/reference/scripts/panel_pinball.R"),
  source = str(paste0(
    "R ", getRversion(), " base arithmetic: pinball pmax(tau * (y - q), (tau - 1) * (y - q)); ",
    "interval score Gneiting & Raftery (2007, eq. 43) as written; coverage mean(l <= y & y <= u); ",
    "quantile forecasts with stats::qnorm and stats::sd")),
  cases = list_of(cases, "  ")
), indent = "")
writeLines(json, file.path(out, "panel_pinball.json"))
