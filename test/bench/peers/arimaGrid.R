# Peer for `npm run bench -- peers` (test/bench/peersBench.ts) only; `npm test` never runs it.
# Base R's stats::arima doing the order search of `trendbrief fit` on an annual series:
# 16 regressions on [1, t] with ARMA(p, q) errors and 16 ARIMA(p, 1, q) with a drift (time as a
# regressor, differenced with the series), p, q in 0..3, each by exact maximum likelihood, the
# lowest AICc of each model kept (AICc = AIC + 2k(k + 1)/(m - k - 1), k parameters with the
# innovation variance, m the observations the likelihood uses; Hurvich & Tsai 1989).
# Mode `fit`: the search on the whole series. Mode `backtest`: the search at each of 20 expanding
# origins (training lengths n - 5 - 19, ..., n - 5) and 5-step forecasts from both chosen models.
# A candidate that stops with an error or whose optimiser reports no convergence is skipped and
# counted. Prints one JSON line.
# Usage: Rscript arimaGrid.R FILE.csv fit|backtest
args <- commandArgs(trailingOnly = TRUE)
if (length(args) != 2 || !(args[2] %in% c("fit", "backtest"))) stop("usage: Rscript arimaGrid.R FILE.csv fit|backtest")
series <- read.csv(args[1])[[2]]
horizon <- 5
origins <- 20
failed <- 0
fits <- 0

aicc <- function(fit) {
  k <- length(fit$coef) + 1
  fit$aic + 2 * k * (k + 1) / (fit$nobs - k - 1)
}

# The lowest-AICc fit of one model over p, q in 0..3; d = 0 regresses on [1, t], d = 1 has a drift.
search <- function(y, d) {
  t <- seq_along(y)
  best <- NULL
  for (p in 0:3) for (q in 0:3) {
    fits <<- fits + 1
    # Warnings are silenced; whether the optimiser converged is read from `code` (0: converged).
    fit <- tryCatch(suppressWarnings(
      if (d == 0) arima(y, order = c(p, 0, q), xreg = cbind(t), method = "ML")
      else arima(y, order = c(p, 1, q), xreg = t, method = "ML")),
      error = function(e) NULL)
    if (is.null(fit) || fit$code != 0) {
      failed <<- failed + 1
      next
    }
    score <- aicc(fit)
    if (is.null(best) || score < best$aicc) best <- list(fit = fit, p = p, q = q, aicc = score)
  }
  best
}

forecast <- function(best, n, d) {
  future <- (n + 1):(n + horizon)
  predict(best$fit, n.ahead = horizon, newxreg = if (d == 0) cbind(t = future) else future)$pred
}

n <- length(series)
if (args[2] == "fit") {
  chosen <- lapply(c(0, 1), function(d) search(series, d))
} else {
  ends <- (n - horizon - origins + 1):(n - horizon)
  for (end in ends) {
    y <- series[1:end]
    chosen <- lapply(c(0, 1), function(d) search(y, d))
    for (d in c(0, 1)) if (!is.null(chosen[[d + 1]])) forecast(chosen[[d + 1]], end, d)
  }
}
orders <- sapply(chosen, function(b) if (is.null(b)) "none" else sprintf("(%d,%d)", b$p, b$q))
cat(sprintf('{"library":"R %s stats::arima","fits":%d,"failed":%d,"trendOrder":"%s","driftOrder":"%s"}\n',
  paste(R.version$major, R.version$minor, sep = "."), fits, failed, orders[1], orders[2]))
