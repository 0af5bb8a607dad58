# Ebb bench reference: base R's stats::HoltWinters on the bench's series, timed per fit here.
#
# Usage: Rscript --vanilla holtwinters_bench.R INPUT OUTPUT
# INPUT: one series a line, "id,period,horizon,v1 v2 ... vn" (the training part only).
# OUTPUT: a "#version,..." line, then per series and seasonality one line
#   id,seasonality,seconds,sse,alpha,beta,gamma,warning,forecast,low80,high80,low95,high95
# where the last five fields hold `horizon` space-separated numbers (%.17g), and
# seconds is the CPU time of one HoltWinters() call (the optimised fit: classic
# start from the first two seasons, constants by optim's L-BFGS-B); see fit_timed.
# A failed fit writes NA fields and its message in `warning`. Needs base R only.

args <- commandArgs(trailingOnly = TRUE)
if (length(args) != 2L) stop("usage: Rscript holtwinters_bench.R INPUT OUTPUT")
lines <- readLines(args[[1L]])
out <- file(args[[2L]], open = "w")
writeLines(paste0("#version,", R.version.string), out)

num <- function(v) paste(sprintf("%.17g", v), collapse = " ")
clean <- function(s) gsub("[,\n\r]", " ", s)

# CPU seconds of this process (user + system). Base R's clock counts whole milliseconds, so a
# fit is repeated until at least 20 ms of CPU time have passed and the time divided by the
# repeats (at most 50); CPU time leaves out other work sharing the machine.
cpu_now <- function() {
  t <- proc.time()
  t[["user.self"]] + t[["sys.self"]]
}

fit_timed <- function(x, seasonal) {
  warning_text <- ""
  repeats <- 0L
  t0 <- cpu_now()
  repeat {
    fit <- tryCatch(
      withCallingHandlers(
        HoltWinters(x, seasonal = seasonal),
        warning = function(w) {
          warning_text <<- conditionMessage(w)
          invokeRestart("muffleWarning")
        }
      ),
      error = function(e) e
    )
    repeats <- repeats + 1L
    used <- cpu_now() - t0
    if (inherits(fit, "error") || used >= 0.02 || repeats >= 50L) break
  }
  list(fit = fit, seconds = used / repeats, warning = warning_text)
}

parse_line <- function(line) {
  f <- strsplit(line, ",", fixed = TRUE)[[1L]]
  list(id = f[[1L]], period = as.integer(f[[2L]]), horizon = as.integer(f[[3L]]),
       values = as.numeric(strsplit(f[[4L]], " ", fixed = TRUE)[[1L]]))
}

# Warm-up (untimed): the first calls load and compile code.
for (line in head(lines, 5L)) {
  s <- parse_line(line)
  for (seasonal in c("multiplicative", "additive")) fit_timed(ts(s$values, frequency = s$period), seasonal)
}

for (i in seq_along(lines)) {
  s <- parse_line(lines[[i]])
  x <- ts(s$values, frequency = s$period)
  for (seasonal in c("multiplicative", "additive")) {
    r <- fit_timed(x, seasonal)
    if (inherits(r$fit, "error")) {
      writeLines(paste(s$id, seasonal, sprintf("%.9g", r$seconds), "NA", "NA", "NA", "NA",
                       clean(conditionMessage(r$fit)), "", "", "", "", "", sep = ","), out)
      next
    }
    fit <- r$fit
    p95 <- predict(fit, n.ahead = s$horizon, prediction.interval = TRUE, level = 0.95)
    p80 <- predict(fit, n.ahead = s$horizon, prediction.interval = TRUE, level = 0.80)
    writeLines(paste(s$id, seasonal, sprintf("%.9g", r$seconds), num(fit$SSE),
                     num(fit$alpha), num(fit$beta), num(fit$gamma), clean(r$warning),
                     num(p95[, "fit"]), num(p80[, "lwr"]), num(p80[, "upr"]),
                     num(p95[, "lwr"]), num(p95[, "upr"]), sep = ","), out)
  }
  if (i %% 100L == 0L || i == length(lines)) message(sprintf("[bench] base R HoltWinters: %d/%d", i, length(lines)))
}
close(out)
