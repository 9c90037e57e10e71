# Times R's lm.fit on the design scripts/benchSpeed.ts wrote (the same numbers the engine fits):
#   Rscript scripts/bench/lmFitTime.R <file> <n> <p> <repeats>
# The file holds y then the p columns of x, each n little-endian doubles. Prints one line:
# the median elapsed seconds and the first slope, so the caller can check both fitted alike.
args <- commandArgs(trailingOnly = TRUE)
path <- args[1]
n <- as.integer(args[2])
p <- as.integer(args[3])
repeats <- as.integer(args[4])
con <- file(path, "rb")
values <- readBin(con, "double", n = n * (p + 1), size = 8, endian = "little")
close(con)
y <- values[1:n]
x <- cbind(1, matrix(values[(n + 1):(n * (p + 1))], nrow = n, ncol = p))
rm(values)
invisible(gc())
times <- numeric(repeats)
for (r in seq_len(repeats)) {
  times[r] <- system.time(fit <- lm.fit(x, y))[["elapsed"]]
}
cat(sprintf("%.6f %.17g\n", median(times), fit$coefficients[2]))
