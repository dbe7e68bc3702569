# Reference for the data-driven number of EWC cosine terms (src/statistics/ewcCosineTermsRule.ts):
# for series that ship with R's 'datasets' package, the lag-1 autocorrelation from R's acf()
# (divide by n, demeaned) and the rule evaluated here independently of the TypeScript code:
#   rho~ = min(max(rho^ + (1 + 3 rho^)/n, 0.05), 0.97),  w(r) = 2 r / (1 - r)^2,
#   nu   = min(max(2, round(0.4 n^(2/3) (w(0.7) / w(rho~))^(1/3))), max(2, floor(n / 2))).
# R's round() rounds half to even, JavaScript's Math.round half up; the script refuses a tie.
#   Nile            annual Nile flow at Aswan (n = 100)
#   lh              luteinising hormone, 10-minute samples (n = 48)
#   LakeHuron       annual lake level (n = 98)
#   diff(Nile)      first differences (negative lag-1 autocorrelation: the floor applies)
#   log(lynx)       annual Canadian lynx trappings, natural log (n = 114)
# Usage: Rscript --vanilla ewc_cosine_terms.R OUTDIR -> OUTDIR/ewc_cosine_terms.json
args <- commandArgs(trailingOnly = TRUE)
script_dir <- dirname(normalizePath(sub("^--file=", "", grep("^--file=", commandArgs(FALSE), value = TRUE))))
source(file.path(script_dir, "lib", "json_writer.R"))
w <- function(r) 2 * r / (1 - r)^2
rule <- function(n, rho) {
  r <- min(max(rho + (1 + 3 * rho) / n, 0.05), 0.97)
  raw <- 0.4 * n^(2 / 3) * (w(0.7) / w(r))^(1 / 3)
  stopifnot(abs(raw - floor(raw) - 0.5) > 1e-9)
  min(max(2, floor(raw + 0.5)), max(2, floor(n / 2)))
}
series <- list(
  nile = as.numeric(Nile),
  lh = as.numeric(lh),
  lake_huron = as.numeric(LakeHuron),
  nile_diff = diff(as.numeric(Nile)),
  lynx_log = log(as.numeric(lynx))
)
items <- vapply(names(series), function(name) {
  x <- series[[name]]
  rho <- acf(x, lag.max = 1, plot = FALSE, demean = TRUE)$acf[2]
  obj(list(
    name = str(name),
    series = arr(x),
    autocorrelation = num(rho),
    terms = num(rule(length(x), rho))
  ), "    ")
}, character(1))
source_note <- paste0("R ", R.version$major, ".", R.version$minor, " datasets; acf() at lag 1; rule evaluated in R")
json <- paste0("{\n  \"source\": ", str(source_note), ",\n  \"cases\": ", list_of(items, "  "), "\n}\n")
writeLines(json, file.path(args[1], "ewc_cosine_terms.json"), sep = "")
