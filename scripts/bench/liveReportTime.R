# Times R's full analysis of the live-size data scripts/bench/liveReport.ts wrote (the numbers the
# eight PLUMB formulas of a report read), step by step:
#   Rscript scripts/bench/liveReportTime.R <file> <n> <p> <base> <new rows> <repeats>
# The file holds y then the p columns of x, each n little-endian doubles. The nested test compares
# the model on the first <base> predictors with the full one; predict asks about the first
# <new rows> rows. Prints one line: dwtest's exact setting, then the median elapsed seconds of the
# whole analysis and of each step, in the order of `steps` below.
suppressPackageStartupMessages({
  library(lmtest)
  library(car)
})
args <- commandArgs(trailingOnly = TRUE)
path <- args[1]
n <- as.integer(args[2])
p <- as.integer(args[3])
base <- as.integer(args[4])
new_rows <- as.integer(args[5])
repeats <- as.integer(args[6])
con <- file(path, "rb")
values <- readBin(con, "double", n = n * (p + 1), size = 8, endian = "little")
close(con)
d <- data.frame(y = values[1:n], matrix(values[(n + 1):(n * (p + 1))], nrow = n, ncol = p))
names(d) <- c("y", paste0("x", seq_len(p)))
rm(values)
base_formula <- reformulate(paste0("x", seq_len(base)), response = "y")
new_data <- d[seq_len(new_rows), -1, drop = FALSE]
# dwtest's exact p (the pan algorithm) works on an n x n matrix: beyond a few hundred rows it
# needs gigabytes and O(n^3) time, so it is used only where the engine uses its exact p too.
exact <- n <= 300
invisible(gc())

steps <- c("lm, summary, confint", "anova (nested)", "predict", "influence.measures",
           "dwtest", "bptest", "qqnorm", "vif")
times <- matrix(0, nrow = repeats, ncol = length(steps))
for (r in seq_len(repeats)) {
  t <- numeric(length(steps))
  t[1] <- system.time({
    fit <- lm(y ~ ., data = d)
    s <- summary(fit)
    ci <- confint(fit)
  })[["elapsed"]]
  t[2] <- system.time(nested <- anova(lm(base_formula, data = d), fit))[["elapsed"]]
  t[3] <- system.time({
    mean_band <- predict(fit, newdata = new_data, interval = "confidence")
    new_band <- predict(fit, newdata = new_data, interval = "prediction")
  })[["elapsed"]]
  t[4] <- system.time(influence <- influence.measures(fit))[["elapsed"]]
  t[5] <- system.time(dw <- dwtest(fit, exact = exact))[["elapsed"]]
  t[6] <- system.time(bp <- bptest(fit))[["elapsed"]]
  t[7] <- system.time(qq <- qqnorm(rstudent(fit), plot.it = FALSE))[["elapsed"]]
  t[8] <- system.time(v <- vif(fit))[["elapsed"]]
  times[r, ] <- t
}
cat(exact, median(rowSums(times)), apply(times, 2, median), "\n")
