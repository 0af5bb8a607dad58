# Ebb reference data: public seasonal series from R's datasets, forecast and AER packages
# (Debian r-base-core, r-cran-forecast, r-cran-aer), for checking the automatic model on data
# it was never tuned on (the M3 series are the tuning ground). Monthly and quarterly series that
# are not seasonally adjusted, positive and without blanks; each keeps at most its last 144
# (monthly) or 80 (quarterly) values, the longest M3 histories, and is split as M3 is: the last
# 18 (monthly) or 8 (quarterly) values held out. Beside each series: R forecast's automatic
# exponential smoothing (ets) and Theta method (thetaf) forecasts of that holdout, as references.
#
# Usage:  Rscript --vanilla test/reference/r/public_seasonal.R [output.json]

suppressPackageStartupMessages({ library(forecast); library(AER) })
args <- commandArgs(trailingOnly = TRUE)
out_path <- if (length(args) >= 1L) args[[1L]] else
  file.path("test", "reference", "fixtures", "r-public-seasonal.json")

num <- function(v) paste0("[", paste(sprintf("%.17g", v), collapse = ", "), "]")
get_data <- function(name, package) { e <- new.env(); data(list = name, package = package, envir = e); get(name, envir = e) }

cases <- list(
  list("AirPassengers", AirPassengers), list("UKDriverDeaths", UKDriverDeaths),
  list("Seatbelts front", Seatbelts[, "front"]), list("Seatbelts rear", Seatbelts[, "rear"]),
  list("Seatbelts VanKilled", Seatbelts[, "VanKilled"]), list("USAccDeaths", USAccDeaths),
  list("co2", co2), list("fdeaths", fdeaths), list("mdeaths", mdeaths), list("nottem", nottem),
  list("gas", gas), list("wineind", wineind), list("DutchSales", get_data("DutchSales", "AER")),
  list("UKgas", UKgas), list("JohnsonJohnson", JohnsonJohnson), list("austres", austres),
  list("woolyrnq", woolyrnq), list("UKNonDurables", get_data("UKNonDurables", "AER")),
  list("GermanUnemployment unadjusted", get_data("GermanUnemployment", "AER")[, "unadjusted"]),
  list("USProdIndex unadjusted", get_data("USProdIndex", "AER")[, "unadjusted"])
)

items <- vapply(cases, function(cs) {
  x <- cs[[2]]
  m <- frequency(x)
  keep <- if (m == 12) 144 else 80
  v <- as.numeric(x)
  v <- v[max(1, length(v) - keep + 1):length(v)]
  h <- if (m == 12) 18 else 8
  train <- ts(v[1:(length(v) - h)], frequency = m)
  e <- forecast(ets(train), h = h)
  th <- thetaf(train, h = h)
  paste0("    {\"name\": \"", cs[[1]], "\", \"period\": ", m, ", \"horizon\": ", h,
         ", \"values\": ", num(v),
         ", \"etsModel\": \"", e$method, "\"",
         ", \"ets\": ", num(as.numeric(e$mean)),
         ", \"thetaf\": ", num(as.numeric(th$mean)), "}")
}, "")
writeLines(c("{",
             paste0("  \"source\": \"", R.version.string, "; forecast ", as.character(packageVersion("forecast")),
                    "; AER ", as.character(packageVersion("AER")), "\","),
             paste0("  \"doc\": {\"values\": \"the series, at most its last 144 (monthly) or 80 (quarterly) values\", ",
                    "\"horizon\": \"values held out at the end\", ",
                    "\"ets\": \"forecast::ets fitted to the rest, its point forecasts of the holdout\", ",
                    "\"thetaf\": \"forecast::thetaf on the rest, its point forecasts of the holdout\"},"),
             "  \"cases\": [", paste(items, collapse = ",\n"), "  ]", "}"), out_path)
