# Reference values for the multiplicity adjustments (src/multiplicity/): adjusted p-values from
# base R's stats::p.adjust(p, "holm") (Holm 1979) and stats::p.adjust(p, "BH") (Benjamini &
# Hochberg 1995) on fixed example families. The cases cover ties, p = 1, p = 0, very small p,
# missing p-values (NA: a test that could not be computed; p.adjust leaves it NA and its default n
# counts the non-missing values only), a single test, and p-values of one-sided t tests on an open
# dataset that ships with R (datasets::sleep, datasets::PlantGrowth, datasets::warpbreaks).
#
# Writes multiplicity_padjust.json into the folder given as the first argument; numbers with
# sprintf("%.17g"), NA as null, so the file is byte-reproducible.
#
# Usage: Rscript --vanilla multiplicity_padjust.R OUTDIR
args <- commandArgs(trailingOnly = TRUE)
if (length(args) < 1) stop("usage: Rscript --vanilla multiplicity_padjust.R OUTDIR")
out <- args[[1]]

num <- function(x) ifelse(is.na(x), "null", sprintf("%.17g", x))
str <- function(s) paste0("\"", gsub("\"", "\\\\\"", s), "\"")
arr <- function(x) paste0("[", paste(num(x), collapse = ", "), "]")

# One-sided t-test p-values (alternative: the group mean exceeds the overall mean of the others),
# a realistic family from open data.
groupTests <- function(y, g) {
  sapply(levels(g), function(l) t.test(y[g == l], y[g != l], alternative = "greater")$p.value)
}
wb <- datasets::warpbreaks
cells <- interaction(wb$wool, wb$tension)

cases <- list(
  list(name = "hand_example", description = "ten p-values with ties, p = 1 and a very small p",
       p = c(0.01, 0.04, 0.03, 0.005, 0.2, 0.04, 1, 1e-12, 0.5, 0.04)),
  list(name = "with_missing", description = "two tests not computable (NA), excluded from m",
       p = c(0.02, NA, 0.001, 0.3, NA, 0.049)),
  list(name = "extremes", description = "p = 0, subnormal and tiny p, p = 1, ties at 1",
       p = c(0, 5e-324, 1e-300, 2.5e-16, 0.9, 1, 1)),
  list(name = "single", description = "a family of one test", p = c(0.03)),
  list(name = "all_missing_but_two", description = "NA first and last",
       p = c(NA, 0.04, 0.01, NA)),
  list(name = "all_equal", description = "every p-value tied", p = rep(0.02, 5)),
  list(name = "warpbreaks_cells",
       description = paste("one-sided t.test p-values, datasets::warpbreaks breaks in each",
                           "wool x tension cell against the rest"),
       p = unname(groupTests(wb$breaks, cells))),
  list(name = "plantgrowth_groups",
       description = "one-sided t.test p-values, datasets::PlantGrowth weight per group vs the rest",
       p = unname(groupTests(datasets::PlantGrowth$weight, datasets::PlantGrowth$group)))
)

entries <- sapply(cases, function(c) {
  paste0(
    "    {\n",
    "      \"name\": ", str(c$name), ",\n",
    "      \"description\": ", str(c$description), ",\n",
    "      \"p\": ", arr(c$p), ",\n",
    "      \"holm\": ", arr(p.adjust(c$p, "holm")), ",\n",
    "      \"bh\": ", arr(p.adjust(c$p, "BH")), "\n",
    "    }"
  )
})
json <- paste0(
  "{\n",
  "  \"generator\": \"test/reference/scripts/multiplicity_padjust.R\",\n",
  "  \"source\": ", str(paste0("R ", getRversion(),
    " stats::p.adjust(p, method = 'holm') and stats::p.adjust(p, method = 'BH'); NA written as null")), ",\n",
  "  \"cases\": [\n", paste(entries, collapse = ",\n"), "\n  ]\n",
  "}"
)
writeLines(json, file.path(out, "multiplicity_padjust.json"))
