# Ebb reference fixtures: seasonal Holt-Winters and classical decomposition
# as computed by base R (stats::HoltWinters, stats::decompose), the reference
# implementation that Ebb's `classic` start is checked against.
#
# Usage:  Rscript test/reference/r/holtwinters.R [output.json]
# Default output: test/reference/fixtures/r-holtwinters.json (relative to the
# current directory). Needs base R only (no add-on packages).
#
# Tests never run this script; they read the JSON it writes. See
# test/reference/README.md for the schema.

args <- commandArgs(trailingOnly = TRUE)
out_path <- if (length(args) >= 1L) args[[1L]] else
  file.path("test", "reference", "fixtures", "r-holtwinters.json")

FIXED <- list(alpha = 0.3, beta = 0.1, gamma = 0.2)
START_PERIODS <- 2L

# ---------------------------------------------------------------------------
# Minimal JSON writer (base R only). Numbers are written with 17 significant
# digits ("%.17g"), which identifies every IEEE double exactly, so a reader
# such as JSON.parse gets back R's values bit for bit. NA/NaN -> null.
# Vectors wrapped in arr() are always arrays (even of length 1); bare
# length-1 atomics are scalars.
# ---------------------------------------------------------------------------
arr <- function(x) structure(list(x), class = "json_array")

json_num <- function(v) {
  out <- sprintf("%.17g", v)
  out[is.na(v)] <- "null"
  if (any(is.infinite(v))) stop("non-finite number in JSON output")
  out
}

json_str <- function(s) {
  s <- gsub("\\", "\\\\", s, fixed = TRUE)
  s <- gsub("\"", "\\\"", s, fixed = TRUE)
  s <- gsub("\n", "\\n", s, fixed = TRUE)
  s <- gsub("\t", "\\t", s, fixed = TRUE)
  ifelse(is.na(s), "null", paste0("\"", s, "\""))
}

json_atoms <- function(v) {
  if (is.character(v)) json_str(v)
  else if (is.logical(v)) ifelse(is.na(v), "null", ifelse(v, "true", "false"))
  else if (is.numeric(v)) json_num(as.double(v))
  else stop("unsupported atomic type: ", class(v)[1L])
}

to_json <- function(x, indent = 0L) {
  pad <- strrep("  ", indent + 1L)
  end <- strrep("  ", indent)
  if (is.null(x)) return("null")
  if (inherits(x, "json_array")) {
    v <- unclass(x)[[1L]]
    if (is.list(v)) {
      if (length(v) == 0L) return("[]")
      items <- vapply(v, to_json, "", indent = indent + 1L)
      return(paste0("[\n", paste0(pad, items, collapse = ",\n"), "\n", end, "]"))
    }
    # Numeric arrays on one line: compact and still readable in a diff.
    return(paste0("[", paste(json_atoms(v), collapse = ", "), "]"))
  }
  if (is.list(x)) {
    nm <- names(x)
    if (is.null(nm)) return(to_json(arr(x), indent))
    if (length(x) == 0L) return("{}")
    items <- vapply(seq_along(x), function(i)
      paste0(json_str(nm[[i]]), ": ", to_json(x[[i]], indent + 1L)), "")
    return(paste0("{\n", paste0(pad, items, collapse = ",\n"), "\n", end, "}"))
  }
  if (length(x) != 1L) return(to_json(arr(x), indent))
  json_atoms(x)
}

# ---------------------------------------------------------------------------
# Series. R `datasets` series, plus two small deterministic synthetic series
# with odd season lengths (the odd-length moving-average branch), one of them
# crossing zero (additive only) and ending in a partial season.
# ---------------------------------------------------------------------------
synthetic7 <- local({
  t <- 1:70
  ts(round(200 + 1.2 * t + cumsum(4 * sin(0.37 * t^2)) + 25 * sin(2 * pi * t / 7) +
             5 * cos(1.7 * t^1.5), 2),
     start = c(1, 1), frequency = 7)
})
synthetic5neg <- local({
  t <- 1:53
  ts(round(-20 + 0.6 * t + cumsum(2 * sin(0.41 * t^2)) + 15 * cos(2 * pi * t / 5) +
             3 * sin(2.3 * t^1.5), 2),
     start = c(1, 3), frequency = 5)
})

series_list <- list(
  list(name = "AirPassengers", x = datasets::AirPassengers, source = "R datasets"),
  list(name = "co2", x = datasets::co2, source = "R datasets"),
  list(name = "nottem", x = datasets::nottem, source = "R datasets"),
  list(name = "USAccDeaths", x = datasets::USAccDeaths, source = "R datasets"),
  list(name = "UKDriverDeaths", x = datasets::UKDriverDeaths, source = "R datasets"),
  list(name = "ldeaths", x = datasets::ldeaths, source = "R datasets"),
  list(name = "UKgas", x = datasets::UKgas, source = "R datasets"),
  list(name = "JohnsonJohnson", x = datasets::JohnsonJohnson, source = "R datasets"),
  list(name = "austres", x = datasets::austres, source = "R datasets"),
  list(name = "synthetic7", x = synthetic7,
       source = paste("synthetic (deterministic formula in this script):",
                      "round(200 + 1.2 t + cumsum(4 sin(0.37 t^2)) + 25 sin(2 pi t / 7) + 5 cos(1.7 t^1.5), 2), t = 1..70")),
  list(name = "synthetic5neg", x = synthetic5neg,
       source = paste("synthetic (deterministic formula in this script):",
                      "round(-20 + 0.6 t + cumsum(2 sin(0.41 t^2)) + 15 cos(2 pi t / 5) + 3 sin(2.3 t^1.5), 2), t = 1..53"))
)

# ---------------------------------------------------------------------------
# The classic start, computed the way stats::HoltWinters does it internally:
# decompose the first START_PERIODS * f values, regress the non-missing
# moving-average values on 1..k (intercept -> level, slope -> trend), take the
# normalised seasonal figure as the indices.
# ---------------------------------------------------------------------------
classic_start <- function(x, seasonal) {
  f <- frequency(x)
  wind <- START_PERIODS * f
  st <- decompose(ts(x[1L:wind], start = start(x), frequency = f), seasonal)
  dat <- na.omit(st$trend)
  cf <- coef(.lm.fit(x = cbind(1, seq_along(dat)), y = dat))
  list(level = unname(cf[1L]), trend = unname(cf[2L]), season = st$figure,
       window = wind, maValues = as.numeric(dat))
}

coef_list <- function(hw, f) {
  cf <- coef(hw)
  list(a = unname(cf[["a"]]), b = unname(cf[["b"]]),
       s = arr(unname(cf[paste0("s", seq_len(f))])))
}

run_fixed <- function(x, seasonal) {
  f <- frequency(x)
  hw <- HoltWinters(x, alpha = FIXED$alpha, beta = FIXED$beta,
                    gamma = FIXED$gamma, seasonal = seasonal)
  cs <- classic_start(x, seasonal)
  fit <- hw$fitted
  # Cross-check the in-script start against the returned object.
  stopifnot(isTRUE(all.equal(cs$level, unname(fit[1L, "level"]), tolerance = 1e-14)),
            isTRUE(all.equal(cs$trend, unname(fit[1L, "trend"]), tolerance = 1e-14)),
            isTRUE(all.equal(cs$season, unname(as.numeric(fit[1L:f, "season"])),
                             tolerance = 1e-14)))
  list(
    alpha = FIXED$alpha, beta = FIXED$beta, gamma = FIXED$gamma,
    start = list(level = cs$level, trend = cs$trend, season = arr(cs$season),
                 windowLength = cs$window, movingAverage = arr(cs$maValues),
                 firstUpdate = f + 1L),
    SSE = hw$SSE,
    fitted = list(
      xhat = arr(as.numeric(fit[, "xhat"])),
      level = arr(as.numeric(fit[, "level"])),
      trend = arr(as.numeric(fit[, "trend"])),
      season = arr(as.numeric(fit[, "season"]))
    ),
    coefficients = coef_list(hw, f)
  )
}

run_optimised <- function(x, seasonal) {
  f <- frequency(x)
  warn <- NULL
  hw <- tryCatch(
    withCallingHandlers(
      HoltWinters(x, seasonal = seasonal),
      warning = function(w) {
        warn <<- c(warn, conditionMessage(w))
        invokeRestart("muffleWarning")
      }),
    error = function(e) e)
  if (inherits(hw, "error"))
    return(list(error = conditionMessage(hw)))
  list(
    alpha = unname(hw$alpha), beta = unname(hw$beta), gamma = unname(hw$gamma),
    SSE = hw$SSE,
    warning = if (is.null(warn)) NULL else paste(warn, collapse = "; "),
    fitted = list(xhat = arr(as.numeric(hw$fitted[, "xhat"]))),
    coefficients = coef_list(hw, f)
  )
}

run_decompose <- function(x) {
  dm <- decompose(x, type = "multiplicative")
  da <- decompose(x, type = "additive")
  stopifnot(identical(as.numeric(dm$trend), as.numeric(da$trend)))
  list(
    n = length(x),
    trend = arr(as.numeric(da$trend)),
    additive = list(figure = arr(da$figure)),
    multiplicative = if (any(x <= 0)) NULL else list(figure = arr(dm$figure))
  )
}

one_series <- function(s) {
  x <- s$x
  f <- frequency(x)
  n <- length(x)
  positive <- all(x > 0)
  hw <- list()
  for (seasonal in c("multiplicative", "additive")) {
    if (seasonal == "multiplicative" && !positive) {
      hw[seasonal] <- list(NULL)  # written as null
      next
    }
    hw[[seasonal]] <- list(fixed = run_fixed(x, seasonal),
                           optimised = run_optimised(x, seasonal))
  }
  whole <- (n %/% f) * f
  xw <- ts(as.numeric(x)[seq_len(whole)], start = start(x), frequency = f)
  list(
    name = s$name,
    source = s$source,
    frequency = f,
    start = arr(as.numeric(start(x))),
    startCycle = as.integer(cycle(x)[1L]),
    n = n,
    values = arr(as.numeric(x)),
    multiplicativeSkipped = if (positive) NULL else
      "series has zero or negative values",
    holtwinters = hw,
    decompose = run_decompose(x),
    decomposeWholeSeasons = run_decompose(xw)
  )
}

series <- list()
for (s in series_list) series[[s$name]] <- one_series(s)

doc <- list(
  values = "the series, oldest first; observation i (1-based) is values[i-1]",
  holtwinters.fixed = paste(
    "HoltWinters(x, alpha = 0.3, beta = 0.1, gamma = 0.2, seasonal = <key>)",
    "with the default start (start.periods = 2)."),
  fixed.start = paste(
    "level/trend: intercept/slope of the least-squares line through the",
    "non-missing centred moving-average values of decompose(first 2f values),",
    "regressed on 1..k (movingAverage holds those k values); season: that",
    "decomposition's normalised figure, season[i-1] applying to the cycle",
    "position of observation i. The state is used as the state after",
    "observation f; updating starts at observation firstUpdate = f + 1."),
  fixed.fitted = paste(
    "arrays of length n - f; element j (0-based) belongs to observation f + 1 + j.",
    "xhat: one-step forecast of that observation; level and trend: the state",
    "BEFORE that observation's update (level/trend after the previous one);",
    "season: the seasonal value used for that observation (made f steps earlier,",
    "or a start value). xhat = (level + trend) * season (multiplicative) or",
    "level + trend + season (additive)."),
  fixed.SSE = "sum of squared one-step errors over observations f+1..n",
  fixed.coefficients = paste(
    "final state after observation n: a (level), b (trend), s[0..f-1] the",
    "seasonal values for observations n+1..n+f."),
  holtwinters.optimised = paste(
    "HoltWinters(x, seasonal = <key>) with R's default optimiser",
    "(L-BFGS-B from alpha = 0.3, beta = 0.1, gamma = 0.1, bounds [0, 1]);",
    "fitted.xhat aligned as in fixed; warning holds any warning R gave."),
  decompose = paste(
    "decompose(x, type) over all n values: trend is the centred moving average",
    "(length n, null where undefined; identical for both types), figure[i-1]",
    "is the normalised seasonal figure for the cycle position of observation i",
    "(not calendar position; see startCycle). decomposeWholeSeasons: the same",
    "over the first floor(n/f)*f values only (n given inside)."),
  series.start = "the series' time attribute start(x): c(year, cycle position)",
  multiplicative = "null (holtwinters and decompose) when the series has zero or negative values"
)

result <- list(
  description = paste(
    "Reference results from base R for Ebb's Holt-Winters engine tests:",
    "seasonal HoltWinters with fixed and optimised constants, the classic",
    "start values, and classical decomposition."),
  generator = "test/reference/r/holtwinters.R",
  program = "R",
  version = R.version.string,
  fixedConstants = FIXED,
  startPeriods = START_PERIODS,
  doc = doc,
  series = series
)

dir.create(dirname(out_path), recursive = TRUE, showWarnings = FALSE)
con <- file(out_path, open = "w", encoding = "UTF-8")
writeLines(to_json(result), con, useBytes = TRUE)
close(con)
cat("wrote", out_path, "(", length(series), "series )\n")
