# Series for the stationary-bootstrap reference tests, and an independent evaluation of the exact
# stationary-bootstrap variance (Politis & Romano 1994, Lemma 1).
#
# Series (all ship with R's 'datasets' package, except the AR(1), which is generated here by a
# formula without any library random-number generator):
#   nile_diff      diff(Nile)                      annual Nile flow at Aswan, first differences
#   lynx_log       log(lynx)                       annual Canadian lynx trappings, natural log
#   sunspot_year   sunspot.year                    yearly sunspot numbers 1700-1988
#   co2_diff       diff(co2)                       Mauna Loa CO2, monthly first differences
#   ar1_phi06      x_t = 0.6 x_{t-1} + e_t, x_0 = 0, n = 1000, with e_t = sqrt(12) (u_t - 1/2),
#                  u_t = s_t / (2^31 - 1), s_t = 16807 s_{t-1} mod (2^31 - 1), s_0 = 20240601
#                  (the Park & Miller 1988 "minimal standard" generator; every product is below
#                  2^46, so it is exact in double precision)
#
# Exact variance, computed here from the circular autocovariances: the stationary-bootstrap
# resample is a stationary sequence whose observations i and i + k come from the same block with
# probability q^k, and are then at circular distance k, so
#   Var*(mean*) = (1/n) [ c_0 + 2 sum_{k=1}^{n-1} (1 - k/n) q^k c_k ],
#   c_k = (1/n) sum_{t=1}^{n} u_t u_{(t + k) mod n},  u = d - mean(d),  q = 1 - 1/b,
# which is Politis & Romano's Lemma 1 rearranged (c_k = C_k + C_{n-k}); a different route to the
# same number than the code under test, which uses the non-circular form.
#
# Usage: Rscript --vanilla bootstrap_series.R OUTDIR
#   -> OUTDIR/bootstrap_series.json, OUTDIR/bootstrap_variance.json

args <- commandArgs(trailingOnly = TRUE)
outdir <- args[1]

num <- function(x) sprintf("%.17g", x)
vec <- function(x) paste0("[", paste(num(x), collapse = ", "), "]")

ar1 <- function(n, phi, seed) {
  s <- seed
  x <- numeric(n)
  prev <- 0
  for (t in seq_len(n)) {
    s <- (16807 * s) %% 2147483647
    e <- sqrt(12) * (s / 2147483647 - 0.5)
    prev <- phi * prev + e
    x[t] <- prev
  }
  x
}

series <- list(
  list(name = "nile_diff", source = "R datasets: diff(Nile)", values = as.numeric(diff(Nile))),
  list(name = "lynx_log", source = "R datasets: log(lynx)", values = as.numeric(log(lynx))),
  list(name = "sunspot_year", source = "R datasets: sunspot.year",
       values = as.numeric(sunspot.year)),
  list(name = "co2_diff", source = "R datasets: diff(co2)", values = as.numeric(diff(co2))),
  list(name = "ar1_phi06",
       source = "AR(1) phi = 0.6, Park-Miller innovations (bootstrap_series.R)",
       values = ar1(1000, 0.6, 20240601))
)

entries <- vapply(series, function(s) {
  sprintf('  {"name": "%s", "source": "%s", "n": %d,\n   "values": %s}',
          s$name, s$source, length(s$values), vec(s$values))
}, character(1))
writeLines(c("{", '"generator": "test/reference/scripts/bootstrap_series.R",',
             '"series": [', paste(entries, collapse = ",\n"), "]", "}"),
           file.path(outdir, "bootstrap_series.json"))

circular_variance <- function(d, b) {
  n <- length(d)
  u <- d - mean(d)
  q <- 1 - 1 / b
  total <- sum(u * u) / n
  for (k in seq_len(n - 1)) {
    ck <- sum(u * u[c((k + 1):n, seq_len(k))]) / n
    total <- total + 2 * (1 - k / n) * q^k * ck
  }
  total / n
}

block_lengths <- c(1, 2.5, 7.5, 20)
rows <- character(0)
for (s in series) {
  for (b in block_lengths) {
    rows <- c(rows, sprintf('  {"series": "%s", "expectedBlockLength": %s, "variance": %s}',
                            s$name, num(b), num(circular_variance(s$values, b))))
  }
}
writeLines(c("{", '"generator": "test/reference/scripts/bootstrap_series.R (circular form of Politis & Romano 1994, Lemma 1)",',
             '"cases": [', paste(rows, collapse = ",\n"), "]", "}"),
           file.path(outdir, "bootstrap_variance.json"))
