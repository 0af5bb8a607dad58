# Ebb bench reference: R's forecast package (Debian r-cran-forecast) on the bench's series:
# its automatic exponential smoothing in state-space form, ets() (Hyndman et al. 2002, 2008:
# error/trend/season family chosen by AICc), and its Theta method, thetaf() (Hyndman & Billah
# 2003). Used as references only, timed here per fit.
#
# Usage: Rscript --vanilla forecast_bench.R INPUT OUTPUT
# INPUT: one series a line, "id,period,horizon,v1 v2 ... vn" (the training part only).
# OUTPUT: a "#version,..." line, then per series and method one line
#   id,method,seconds,sse,alpha,beta,gamma,warning,forecast,low80,high80,low95,high95
# where method is "ets" or "theta", the last five fields hold `horizon` space-separated
# numbers, and seconds is the CPU time of the fit and forecast. alpha/beta/gamma are the
# smoothing constants (NA where the model has none); `warning` names the ets model chosen.
# A failed fit writes NA fields and its message in `warning`.

suppressPackageStartupMessages(library(forecast))
args <- commandArgs(trailingOnly = TRUE)
if (length(args) != 2L) stop("usage: Rscript forecast_bench.R INPUT OUTPUT")
lines <- readLines(args[[1L]])
out <- file(args[[2L]], open = "w")
writeLines(paste0("#version,", R.version.string, "; forecast ", as.character(packageVersion("forecast"))), out)

num <- function(v) paste(sprintf("%.10g", v), collapse = " ")
clean <- function(s) gsub("[,\n\r]", " ", s)
cpu_now <- function() {
  t <- proc.time()
  t[["user.self"]] + t[["sys.self"]]
}
par_or_na <- function(fit, name) if (!is.null(fit$par) && name %in% names(fit$par)) fit$par[[name]] else NA

# Base R's clock counts whole milliseconds: a fast call is repeated until 20 ms of CPU time
# have passed (at most 50 times) and the time divided by the repeats.
run_timed <- function(f) {
  warning_text <- ""
  repeats <- 0L
  t0 <- cpu_now()
  repeat {
    r <- tryCatch(
      withCallingHandlers(f(), warning = function(w) {
        warning_text <<- conditionMessage(w)
        invokeRestart("muffleWarning")
      }),
      error = function(e) e
    )
    repeats <- repeats + 1L
    used <- cpu_now() - t0
    if (inherits(r, "error") || used >= 0.02 || repeats >= 50L) break
  }
  list(value = r, seconds = used / repeats, warning = warning_text)
}

parse_line <- function(line) {
  f <- strsplit(line, ",", fixed = TRUE)[[1L]]
  list(id = f[[1L]], period = as.integer(f[[2L]]), horizon = as.integer(f[[3L]]),
       values = as.numeric(strsplit(f[[4L]], " ", fixed = TRUE)[[1L]]))
}

methods <- list(
  ets = function(x, h) {
    fit <- ets(x)
    list(fc = forecast(fit, h = h, level = c(80, 95)), fit = fit, note = fit$method)
  },
  theta = function(x, h) {
    fc <- thetaf(x, h = h, level = c(80, 95))
    list(fc = fc, fit = fc$model, note = "")
  }
)

write_result <- function(id, name, r) {
  if (inherits(r$value, "error")) {
    writeLines(paste(id, name, sprintf("%.9g", r$seconds), "NA", "NA", "NA", "NA",
                     clean(conditionMessage(r$value)), "", "", "", "", "", sep = ","), out)
    return(invisible())
  }
  fc <- r$value$fc
  fit <- r$value$fit
  res <- as.numeric(residuals(fit))
  sse <- if (length(res)) sum(res^2, na.rm = TRUE) else NA
  note <- paste(c(r$value$note, r$warning)[nzchar(c(r$value$note, r$warning))], collapse = "; ")
  writeLines(paste(id, name, sprintf("%.9g", r$seconds), num(sse),
                   num(par_or_na(fit, "alpha")), num(par_or_na(fit, "beta")), num(par_or_na(fit, "gamma")),
                   clean(note), num(fc$mean), num(fc$lower[, 1]), num(fc$upper[, 1]),
                   num(fc$lower[, 2]), num(fc$upper[, 2]), sep = ","), out)
}

# Warm-up (untimed): the first calls load and compile code.
for (line in head(lines, 3L)) {
  s <- parse_line(line)
  for (m in methods) try(m(ts(s$values, frequency = s$period), s$horizon), silent = TRUE)
}

for (i in seq_along(lines)) {
  s <- parse_line(lines[[i]])
  x <- ts(s$values, frequency = s$period)
  for (name in names(methods)) write_result(s$id, name, run_timed(function() methods[[name]](x, s$horizon)))
  flush(out)
  if (i %% 50L == 0L || i == length(lines)) message(sprintf("[bench] R forecast: %d/%d", i, length(lines)))
}
close(out)
