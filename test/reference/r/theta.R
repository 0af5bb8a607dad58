# Ebb reference fixture: the Theta method as R's forecast package implements it in thetaf()
# (forecast 8.x): the 90% autocorrelation seasonality test, classical multiplicative
# decomposition (stats::decompose) of the whole history when seasonal, simple exponential
# smoothing of the adjusted series (forecast::ses, state-space form, level and alpha fitted),
# and a drift of half the least-squares slope of the adjusted series (Hyndman & Billah 2003,
# "Unmasking the Theta method", IJF 19(2)). The data are base R's datasets.
#
# Usage:  Rscript --vanilla test/reference/r/theta.R [output.json]

suppressPackageStartupMessages(library(forecast))
args <- commandArgs(trailingOnly = TRUE)
out_path <- if (length(args) >= 1L) args[[1L]] else
  file.path("test", "reference", "fixtures", "r-theta.json")

num <- function(v) paste0("[", paste(sprintf("%.17g", v), collapse = ", "), "]")

cases <- list(
  list(name = "AirPassengers", x = AirPassengers, h = 24),
  list(name = "UKgas", x = UKgas, h = 8),
  list(name = "nottem", x = nottem, h = 12),
  list(name = "USAccDeaths", x = USAccDeaths, h = 18),
  list(name = "JohnsonJohnson", x = JohnsonJohnson, h = 8),
  list(name = "Nile as quarterly", x = ts(as.numeric(Nile), frequency = 4), h = 8),
  list(name = "WWWusage as monthly", x = ts(as.numeric(WWWusage), frequency = 12), h = 12)
)

items <- vapply(cases, function(cs) {
  f <- thetaf(cs$x, h = cs$h)
  n <- length(cs$x)
  m <- frequency(cs$x)
  r <- as.numeric(acf(cs$x, lag.max = m, plot = FALSE)$acf)[-1]
  seasonal <- m > 1 && n > 2 * m && abs(r[m]) / sqrt((1 + 2 * sum(r[-m]^2)) / n) > qnorm(0.95)
  adj <- if (seasonal) seasadj(decompose(cs$x, type = "multiplicative")) else cs$x
  fit <- ses(adj, h = cs$h)
  paste0("    {\"name\": \"", cs$name, "\", \"period\": ", m,
         ", \"values\": ", num(as.numeric(cs$x)),
         ", \"seasonal\": ", tolower(as.character(seasonal)),
         ", \"alpha\": ", sprintf("%.17g", fit$model$par[["alpha"]]),
         ", \"startLevel\": ", sprintf("%.17g", fit$model$par[["l"]]),
         ", \"drift\": ", sprintf("%.17g", f$model$drift),
         ", \"smoothingSse\": ", sprintf("%.17g", sum(residuals(fit)^2)),
         ", \"forecast\": ", num(as.numeric(f$mean)), "}")
}, "")
writeLines(c("{",
             paste0("  \"source\": \"", R.version.string, "; forecast ", as.character(packageVersion("forecast")),
                    "; forecast::thetaf and forecast::ses\","),
             paste0("  \"doc\": {\"seasonal\": \"the 90% autocorrelation test's decision\", ",
                    "\"alpha\": \"ses on the adjusted series: its fitted smoothing constant\", ",
                    "\"startLevel\": \"ses: its fitted level before the first period\", ",
                    "\"smoothingSse\": \"ses: sum of squared one-step errors on the adjusted scale\", ",
                    "\"drift\": \"half the least-squares slope of the adjusted series\", ",
                    "\"forecast\": \"thetaf point forecasts, element h-1 for period n+h\"},"),
             "  \"cases\": [", paste(items, collapse = ",\n"), "  ]", "}"), out_path)
