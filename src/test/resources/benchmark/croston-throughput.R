# Point-only Croston of R's forecast package over every series of a long-format CSV (series_id, period, quantity),
# timed over the loop only (reading the file is not counted). Prints: series seconds. "Point-only" is forecast's
# internal croston2(nofits = TRUE): croston() itself also recomputes a fitted value for every prefix of the series,
# which costs about n times more and is not what the batch endpoint returns.
# Used by BatchThroughputBenchmark to compare the service's CSV batch with R in one run.
suppressPackageStartupMessages(library(forecast))
args <- commandArgs(trailingOnly = TRUE)
d <- read.csv(args[1], colClasses = c("character", "integer", "numeric"))
series <- split(d$quantity, factor(d$series_id, levels = unique(d$series_id)))
start <- proc.time()[["elapsed"]]
for (y in series) {
    invisible(forecast:::croston2(y, h = 12, alpha = 0.1, nofits = TRUE))
}
cat(length(series), proc.time()[["elapsed"]] - start, "\n")
