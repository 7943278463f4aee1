# Point-only Croston of R's forecast package over every series of a long-format CSV (series_id, period, quantity),
# in rounds: the file is read once (not timed), "ready" is printed, and then each line read from standard input runs
# one timed pass over every series and prints: series seconds cpu-seconds (elapsed time of the loop only, and R's
# user + system processor time over it). The caller times its
# own rounds in between, so both are measured alternately on the same machine in one run; end of input ends it.
# "Point-only" is forecast's internal croston2(nofits = TRUE): croston() itself also recomputes a fitted value for
# every prefix of the series, which costs about n times more and is not what the batch endpoint returns.
# Used by BatchThroughputBenchmark (RCrostonRounds) to compare the service's CSV batch with R in one run.
suppressPackageStartupMessages(library(forecast))
args <- commandArgs(trailingOnly = TRUE)
d <- read.csv(args[1], colClasses = c("character", "integer", "numeric"))
series <- split(d$quantity, factor(d$series_id, levels = unique(d$series_id)))
input <- file("stdin", open = "r")
cat("ready\n")
flush(stdout())
while (length(readLines(input, n = 1)) > 0) {
    start <- proc.time()
    for (y in series) {
        invisible(forecast:::croston2(y, h = 12, alpha = 0.1, nofits = TRUE))
    }
    took <- proc.time() - start
    cat(length(series), took[["elapsed"]], took[["user.self"]] + took[["sys.self"]], "\n")
    flush(stdout())
}
