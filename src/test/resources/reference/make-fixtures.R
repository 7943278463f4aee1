# Reference fixtures for depotcast's forecasting core, made with R and the forecast package.
# Run from this folder:  Rscript make-fixtures.R
# Made with R 4.2.2 and forecast 8.20 from Debian bookworm (r-base-core, r-cran-forecast).
# Output: series.csv (the inputs), croston-ses.csv, tsb.csv, glm-*.csv, distributions.csv.
suppressPackageStartupMessages(library(forecast))
options(digits = 17)
set.seed(20261202)

series <- list(
  s1 = c(1, 0, 0, 0, 2, 0, 0),
  s2 = c(0, 0, 0, 3, 0, 0, 2, 0, 5),
  s3 = c(0, 2, 0, 0, 4, 0, 1, 0, 0, 0, 3, 0),
  s4 = c(0, 3, 0, 0, 5)
)
for (i in 1:8) {
  n <- 24 + 12 * (i %% 4)
  occurs <- rbinom(n, 1, runif(1, 0.15, 0.7))
  series[[paste0("r", i)]] <- occurs * (1 + rpois(n, runif(1, 0.5, 4)))
}
long <- do.call(rbind, lapply(names(series), function(id)
  data.frame(series_id = id, period = seq_along(series[[id]]), quantity = series[[id]])))
write.csv(long, "series.csv", row.names = FALSE, quote = FALSE)

rows <- list()
for (id in names(series)) {
  y <- series[[id]]
  if (sum(y > 0) < 2) next
  for (a in c(0.1, 0.2, 0.35)) {
    cr <- as.numeric(croston(y, h = 1, alpha = a)$mean[1])
    # forecast 8.20 has no SBA option: SBA is Croston times (1 - alpha/2).
    rows[[length(rows) + 1]] <- data.frame(series_id = id, method = "CROSTON", alpha = a, forecast = cr)
    rows[[length(rows) + 1]] <- data.frame(series_id = id, method = "SBA", alpha = a, forecast = cr * (1 - a / 2))
    s <- as.numeric(ses(ts(y), h = 1, alpha = a, initial = "simple")$mean[1])
    rows[[length(rows) + 1]] <- data.frame(series_id = id, method = "SES", alpha = a, forecast = s)
  }
}
write.csv(do.call(rbind, rows), "croston-ses.csv", row.names = FALSE, quote = FALSE)

# TSB: not in forecast 8.20, and tsintermittent is not packaged in Debian. This is an independent R
# implementation of Teunter, Syntetos & Babai (2011) with depotcast's stated start: z = first demand,
# p = share of periods with demand, both set at period 1 and updated from period 2 on.
tsb <- function(y, a, b) {
  z <- y[y > 0][1]; p <- mean(y > 0)
  for (t in 2:length(y)) {
    if (y[t] > 0) { p <- p + b * (1 - p); z <- z + a * (y[t] - z) } else { p <- p - b * p }
  }
  p * z
}
rows <- list()
for (id in names(series)) {
  y <- series[[id]]
  if (sum(y > 0) < 1) next
  for (ab in list(c(0.1, 0.1), c(0.5, 0.2), c(0.3, 0.05)))
    rows[[length(rows) + 1]] <- data.frame(series_id = id, alpha = ab[1], beta = ab[2], forecast = tsb(y, ab[1], ab[2]))
}
write.csv(do.call(rbind, rows), "tsb.csv", row.names = FALSE, quote = FALSE)

# Poisson regression with an exposure offset: a pump-year style data set with three covariates.
n <- 400
d <- data.frame(log_depth = log(runif(n, 10, 90) / 30), age = runif(n, 0, 15), usage = runif(n, 1, 10))
d$exposure <- 365 * d$usage * runif(n, 0.3, 1)
d$count <- rpois(n, d$exposure * exp(log(0.2 / 1000) + 0.5 * d$log_depth + 0.03 * d$age))
write.csv(d, "glm-data.csv", row.names = FALSE, quote = FALSE)
m <- glm(count ~ log_depth + age + usage + offset(log(exposure)), family = poisson, data = d)
s <- summary(m)$coefficients
write.csv(data.frame(term = c("intercept", "log_depth", "age", "usage"), estimate = s[, 1], std_error = s[, 2]),
          "glm-coefficients.csv", row.names = FALSE, quote = FALSE)
write.csv(data.frame(deviance = deviance(m), df_residual = df.residual(m),
                     pearson_dispersion = sum(residuals(m, type = "pearson")^2) / df.residual(m)),
          "glm-summary.csv", row.names = FALSE, quote = FALSE)

# Lead-time demand distributions: quantiles and cdfs from R's stats package.
rows <- list()
for (m in c(0.5, 4, 12.5)) for (p in c(0.8, 0.9, 0.95, 0.99))
  rows[[length(rows) + 1]] <- data.frame(dist = "poisson", mean = m, variance = m, p = p, quantile = qpois(p, m),
                                         cdf_at_quantile = ppois(qpois(p, m), m))
for (mv in list(c(4, 8), c(1.5, 6), c(20, 35))) for (p in c(0.8, 0.9, 0.95, 0.99)) {
  size <- mv[1]^2 / (mv[2] - mv[1])
  q <- qnbinom(p, size = size, mu = mv[1])
  rows[[length(rows) + 1]] <- data.frame(dist = "negative-binomial", mean = mv[1], variance = mv[2], p = p,
                                         quantile = q, cdf_at_quantile = pnbinom(q, size = size, mu = mv[1]))
}
write.csv(do.call(rbind, rows), "distributions.csv", row.names = FALSE, quote = FALSE)
cat("fixtures written with R", R.version.string, "and forecast", as.character(packageVersion("forecast")), "\n")
