# Ebb reference fixture: the 90% autocorrelation seasonality test at the seasonal lag as
# R's forecast package applies it in thetaf() (forecast 8.x, after Hyndman & Billah 2003;
# the test of the M3 competition's Naive2 benchmark, Makridakis & Hibon 2000):
#   seasonal  <=>  n > 2m  and  |r_m| / sqrt((1 + 2 * sum_{k<m} r_k^2) / n) > qnorm(0.95)
# with r_k from stats::acf. The statistic is recomputed here exactly as in forecast::thetaf's
# body (printed into the fixture for the record); the data are base R's datasets.
#
# Usage:  Rscript --vanilla test/reference/r/seasonality_test.R [output.json]

suppressPackageStartupMessages(library(forecast))
args <- commandArgs(trailingOnly = TRUE)
out_path <- if (length(args) >= 1L) args[[1L]] else
  file.path("test", "reference", "fixtures", "r-seasonality-test.json")

num <- function(v) paste0("[", paste(sprintf("%.17g", v), collapse = ", "), "]")

# Public datasets of base R (package datasets); the non-seasonal ones are given a season
# length to test, as a planner's monthly or quarterly range would.
cases <- list(
  list(name = "AirPassengers", x = AirPassengers),
  list(name = "nottem", x = nottem),
  list(name = "USAccDeaths", x = USAccDeaths),
  list(name = "ldeaths", x = ldeaths),
  list(name = "UKgas", x = UKgas),
  list(name = "JohnsonJohnson", x = JohnsonJohnson),
  list(name = "austres", x = austres),
  list(name = "co2", x = co2),
  list(name = "Nile as quarterly", x = ts(as.numeric(Nile), frequency = 4)),
  list(name = "WWWusage as monthly", x = ts(as.numeric(WWWusage), frequency = 12)),
  list(name = "LakeHuron as quarterly", x = ts(as.numeric(LakeHuron), frequency = 4)),
  list(name = "lh as monthly", x = ts(as.numeric(lh), frequency = 12)),
  list(name = "BJsales as monthly", x = ts(as.numeric(BJsales), frequency = 12)),
  list(name = "UKgas first 2 years", x = window(UKgas, end = c(1961, 4)))
)

# forecast::thetaf's test, copied from its body (see the header).
theta_test <- function(x) {
  n <- length(x)
  m <- frequency(x)
  if (m > 1 && !is.constant(x) && n > 2 * m) {
    r <- as.numeric(acf(x, lag.max = m, plot = FALSE)$acf)[-1]
    stat <- sqrt((1 + 2 * sum(r[-m]^2)) / n)
    list(r = r, stat = stat, seasonal = (abs(r[m]) / stat > qnorm(0.95)))
  } else {
    list(r = numeric(0), stat = NA_real_, seasonal = FALSE)
  }
}

items <- vapply(cases, function(cs) {
  t <- theta_test(cs$x)
  paste0("    {\"name\": \"", cs$name, "\", \"period\": ", frequency(cs$x),
         ", \"values\": ", num(as.numeric(cs$x)),
         ", \"acf\": ", num(t$r),
         ", \"stat\": ", if (is.na(t$stat)) "null" else sprintf("%.17g", t$stat),
         ", \"seasonal\": ", tolower(as.character(t$seasonal)), "}")
}, "")
body_text <- paste(deparse(body(thetaf))[grep("acf|stat <-|seasonal <-", deparse(body(thetaf)))], collapse = " ")
writeLines(c("{",
             paste0("  \"source\": \"", R.version.string, "; forecast ", as.character(packageVersion("forecast")),
                    "; test as in forecast::thetaf\","),
             paste0("  \"thetafLines\": \"", gsub("\"", "'", gsub("\\s+", " ", body_text)), "\","),
             "  \"cases\": [", paste(items, collapse = ",\n"), "  ]", "}"), out_path)
