# Reference values for the seasonal naive scale (src/scaling/seasonalNaiveScale.ts): the in-sample
# mean absolute and mean squared error of the seasonal naive forecast y[t - m], the scale of the
# mean absolute scaled error (Hyndman & Koehler 2006), on open multi-series data that ships with
# R's datasets package. Computed with base R's lagged differences:
#   absolute: mean(abs(diff(y, lag = m)))      squared: mean(diff(y, lag = m)^2)
#
# Writes panel_scaling.json into the folder given as the first argument; numbers with
# sprintf("%.17g"), so the file is byte-reproducible.
#
# Usage: Rscript --vanilla panel_scaling.R OUTDIR
args <- commandArgs(trailingOnly = TRUE)
if (length(args) < 1) stop("usage: Rscript --vanilla panel_scaling.R OUTDIR")
out <- args[[1]]

script_dir <- dirname(normalizePath(sub("^--file=", "", grep("^--file=", commandArgs(FALSE), value = TRUE))))
source(file.path(script_dir, "lib", "json_writer.R"))

datasetEntry <- function(name, dataset, columns, periods) {
  series <- sapply(names(columns), function(id) {
    y <- as.numeric(columns[[id]])
    scales <- sapply(periods, function(m) {
      obj(list(
        period = num(m),
        absolute = num(mean(abs(diff(y, lag = m)))),
        squared = num(mean(diff(y, lag = m)^2))
      ), indent = "            ")
    })
    obj(list(
      id = str(id),
      history = arr(y),
      scales = list_of(scales, "          ")
    ), indent = "        ")
  })
  obj(list(
    name = str(name),
    dataset = str(dataset),
    series = list_of(series, "      ")
  ), indent = "    ")
}

sb <- datasets::Seatbelts
eu <- datasets::EuStockMarkets
entries <- c(
  datasetEntry("seatbelts", "R datasets::Seatbelts (monthly, 1969-1984), six columns",
    list(DriversKilled = sb[, "DriversKilled"], drivers = sb[, "drivers"], front = sb[, "front"],
         rear = sb[, "rear"], kms = sb[, "kms"], VanKilled = sb[, "VanKilled"]),
    periods = c(1, 12)),
  datasetEntry("usaccdeaths", "R datasets::USAccDeaths (monthly, 1973-1978)",
    list(USAccDeaths = datasets::USAccDeaths), periods = c(1, 12)),
  datasetEntry("eustockmarkets", "R datasets::EuStockMarkets (daily closing prices, 1991-1998), first 400 days",
    list(DAX = eu[1:400, "DAX"], SMI = eu[1:400, "SMI"], CAC = eu[1:400, "CAC"],
         FTSE = eu[1:400, "FTSE"]),
    periods = c(1, 5))
)
json <- obj(list(
  generator = str("test/reference/scripts/panel_scaling.R"),
  source = str(paste0("R ", getRversion(),
    ": absolute mean(abs(diff(y, lag = m))), squared mean(diff(y, lag = m)^2)")),
  datasets = list_of(entries, "  ")
), indent = "")
writeLines(json, file.path(out, "panel_scaling.json"))
